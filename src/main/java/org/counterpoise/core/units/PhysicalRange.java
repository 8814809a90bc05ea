package org.counterpoise.core.units;

import java.math.BigDecimal;
import java.math.MathContext;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * The one table of physically plausible magnitudes, per kind of quantity, used by the project
 * reader and the command-line options. A value outside is refused with the range, so that a typo
 * (1e-300 kg, 1e300 N) cannot send the solvers into overflow, underflow or endless iteration.
 * Only the magnitude is checked, and zero passes: whether zero or a negative value is allowed is
 * the model's own check ({@link Checks#positive}), which says so in its own words. The bounds are
 * generous on purpose (common practice: several decades beyond any absorber application).
 */
public enum PhysicalRange {
    /** From a 0.1 g lab specimen to 10^6 t: modal masses of tall towers and long bridges are 10^6 to 10^8 kg. */
    MASS(Dimension.MASS, 1e-4, 1e9),
    /** From 1 uN (a lab shaker's smallest force) to the weight of the heaviest mass above, 10^10 N. */
    FORCE(Dimension.FORCE, 1e-6, 1e10),
    /** From 1 pm (below any measurable vibration) to 100 m (the static deflection g/(2 pi f)^2 of a 0.05 Hz mode is 99 m). */
    LENGTH(Dimension.LENGTH, 1e-12, 100),
    /** From 1 mN/m to 10^15 N/m: a 10^9 kg mass at 160 Hz; lab springs start around 1 N/m. */
    STIFFNESS(Dimension.STIFFNESS, 1e-3, 1e15),
    /** Up to 2*10^12 N s/m, the critical damping 2 sqrt(k m) of the largest mass on the highest stiffness above. */
    DAMPING_COEFFICIENT(Dimension.DAMPING_COEFFICIENT, 1e-9, 2e12),
    /**
     * From 10^-5 Hz (a half-power bandwidth of a very lightly damped 0.05 Hz tower mode is 10^-4 Hz)
     * to 100 kHz (tool chatter absorbers work up to a few kHz). Stored in rad/s.
     */
    FREQUENCY(Dimension.FREQUENCY, 2 * Math.PI * 1e-5, 2 * Math.PI * 1e5),
    /** From 1 pm/s to 1 km/s. */
    VELOCITY(Dimension.VELOCITY, 1e-12, 1e3),
    /** From 1 nm/s^2 (seismometer floor) to 10^5 m/s^2 (about 10^4 g, shock tables). */
    ACCELERATION(Dimension.ACCELERATION, 1e-9, 1e5),
    /** From 1 ug*m (a balanced small rotor) to 10^6 kg*m (far beyond a turbine rotor's unbalance). */
    UNBALANCE(Dimension.UNBALANCE, 1e-9, 1e6),
    /**
     * Shaft angular acceleration of a run-up, from 10^-4 rad/s^2 (about 0.001 rpm/s, a turbine's
     * slowest warm-up) to 10^5 rad/s^2 (about 10^6 rpm/s, far beyond a motor's direct-on-line start).
     */
    ANGULAR_ACCELERATION(Dimension.ANGULAR_ACCELERATION, 1e-4, 1e5),
    /** From 1 Pa to 10^11 Pa (100 GPa, beyond any wire's tensile strength of about 2 to 3 GPa). */
    STRESS(Dimension.STRESS, 1.0, 1e11),
    /** From 1 uT (far below any magnet gap) to 100 T (beyond the strongest laboratory magnets). */
    FLUX_DENSITY(Dimension.FLUX_DENSITY, 1e-6, 100),
    /** From 1 s to 10^12 s (about 30 000 years, beyond any service life). */
    TIME(Dimension.TIME, 1.0, 1e12),
    /** mu = m2/m1: below 10^-5 no absorber does anything measurable; above 10 it is no longer an add-on. */
    MASS_RATIO(Dimension.RATIO, 1e-5, 10),
    /** Order of the disturbing harmonic of the running speed: half-order whirl up to a blade-pass order of 1000. */
    HARMONIC_ORDER(Dimension.RATIO, 0.01, 1000);

    private final Dimension dimension;
    private final double low;
    private final double high;

    PhysicalRange(Dimension dimension, double low, double high) {
        this.dimension = dimension;
        this.low = low;
        this.high = high;
    }

    /** @return the smallest plausible magnitude, SI */
    public double low() {
        return low;
    }

    /** @return the largest plausible magnitude, SI */
    public double high() {
        return high;
    }

    /**
     * @param dimension a kind of quantity
     * @return its range (for RATIO, the mass ratio's; other ratios have their own constants)
     */
    public static PhysicalRange of(Dimension dimension) {
        for (PhysicalRange r : values()) {
            if (r.dimension == dimension) {
                return r;
            }
        }
        throw new IllegalArgumentException("no range for " + dimension);
    }

    /**
     * @param field field id the user knows
     * @param value the value in {@code unit}
     * @param unit the unit the user typed (null for a pure number)
     * @return the value when its magnitude is zero or within the range
     * @throws InvalidInputException naming the range in the user's unit
     */
    public double check(String field, double value, Unit unit) {
        double si = unit == null ? value : unit.toSi(value);
        double m = Math.abs(si);
        if (Double.isNaN(si) || si != 0 && (m < low || m > high)) {
            String symbol = unit == null ? "" : " " + unit.symbol();
            throw new InvalidInputException(field, Checks.show(value) + symbol, "outside what is physically plausible"
                    + " for this quantity; allowed magnitudes are " + shown(unit, low) + symbol + " to "
                    + shown(unit, high) + symbol);
        }
        return value;
    }

    private static String shown(Unit unit, double si) {
        double v = unit == null ? si : unit.fromSi(si);
        BigDecimal d = new BigDecimal(v).round(new MathContext(3)).stripTrailingZeros();
        double m = Math.abs(v);
        return m >= 1e-4 && m < 1e7 ? d.toPlainString() : d.toString().replace("E", "e");
    }
}
