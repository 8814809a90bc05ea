package org.counterpoise.core.units;

/** Standard gravity. */
public final class Gravity {
    /** Standard acceleration of gravity, 9.80665 m/s^2 (CGPM 1901; ISO 80000-3). */
    public static final double STANDARD = 9.80665;

    private Gravity() {
    }
}
