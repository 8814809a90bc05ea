/**
 * Acceptance criteria: what a response is judged against (a user's limit, ISO 2631-1 comfort,
 * building curves, machine severity zones, vibration criterion curves), the amplitude convention a
 * value is stated in, the frequency weightings and limit curves as data with their standard and
 * edition, and the exact verdict before and after. Depends on the layers below it (core.error,
 * core.units, core.rational, core.model, core.response) and Commons Math, never on tuning, remedy,
 * runup, robust, optim or design.
 */
package org.counterpoise.core.criteria;
