package org.counterpoise.core.criteria;

/**
 * The evaluation zones of machine vibration severity (ISO 20816-1:2016, 6.3.2.3): A newly
 * commissioned; B unrestricted long-term operation; C unsatisfactory for long-term operation, run
 * only for a limited period; D severe enough to cause damage.
 */
public enum SeverityZone {
    A, B, C, D
}
