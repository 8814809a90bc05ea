package org.counterpoise.core.units;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Units a user may type, each with its factor to SI (value_SI = value * factor). Conversions
 * happen only at the edges (files, command line, wizard); the core works in SI throughout.
 *
 * <p>US customary factors are the exact definitions of NIST Special Publication 811 (2008 edition),
 * appendix B: 1 in = 0.0254 m, 1 lb (avoirdupois pound) = 0.45359237 kg, 1 oz = 0.028349523125 kg, and
 * 1 lbf = 0.45359237 kg x 9.80665 m/s^2 = 4.4482216152605 N (the pound-force is defined through standard
 * gravity, so its factor is exact too). Derived units are products and quotients of these, never
 * rounded constants: 1 lbf/in = 4.4482216152605 / 0.0254 N/m.
 */
public enum Unit {
    KILOGRAM("kg", Dimension.MASS, 1.0),
    GRAM("g", Dimension.MASS, 1e-3),
    TONNE("t", Dimension.MASS, 1e3),
    /** The avoirdupois pound (NIST SP 811:2008, B.8). */
    POUND("lb", Dimension.MASS, Us.POUND, "lbm"),
    NEWTON("N", Dimension.FORCE, 1.0),
    KILONEWTON("kN", Dimension.FORCE, 1e3),
    /** The pound-force, lb x standard gravity (NIST SP 811:2008, B.8). */
    POUND_FORCE("lbf", Dimension.FORCE, Us.POUND_FORCE),
    METRE("m", Dimension.LENGTH, 1.0),
    MILLIMETRE("mm", Dimension.LENGTH, 1e-3),
    MICROMETRE("um", Dimension.LENGTH, 1e-6),
    INCH("in", Dimension.LENGTH, Us.INCH),
    /** One thousandth of an inch, the usual unit of vibration amplitude in US practice. */
    MIL("mil", Dimension.LENGTH, 2.54e-5, "thou"),
    NEWTON_PER_METRE("N/m", Dimension.STIFFNESS, 1.0),
    NEWTON_PER_MILLIMETRE("N/mm", Dimension.STIFFNESS, 1e3),
    KILONEWTON_PER_METRE("kN/m", Dimension.STIFFNESS, 1e3),
    KILONEWTON_PER_MILLIMETRE("kN/mm", Dimension.STIFFNESS, 1e6),
    /** A spring rate in pound-force per inch ("lb/in" as spring catalogues write it is read as this). */
    POUND_FORCE_PER_INCH("lbf/in", Dimension.STIFFNESS, Us.POUND_FORCE / Us.INCH, "lb/in"),
    NEWTON_SECOND_PER_METRE("N*s/m", Dimension.DAMPING_COEFFICIENT, 1.0),
    KILONEWTON_SECOND_PER_METRE("kN*s/m", Dimension.DAMPING_COEFFICIENT, 1e3),
    POUND_FORCE_SECOND_PER_INCH("lbf*s/in", Dimension.DAMPING_COEFFICIENT, Us.POUND_FORCE / Us.INCH, "lbf-s/in",
            "lb*s/in", "lb-s/in"),
    RADIAN_PER_SECOND("rad/s", Dimension.FREQUENCY, 1.0),
    HERTZ("Hz", Dimension.FREQUENCY, 2.0 * Math.PI),
    REV_PER_MINUTE("rpm", Dimension.FREQUENCY, 2.0 * Math.PI / 60.0),
    METRE_PER_SECOND("m/s", Dimension.VELOCITY, 1.0),
    MILLIMETRE_PER_SECOND("mm/s", Dimension.VELOCITY, 1e-3),
    INCH_PER_SECOND("in/s", Dimension.VELOCITY, Us.INCH, "ips"),
    METRE_PER_SECOND_SQUARED("m/s^2", Dimension.ACCELERATION, 1.0),
    /**
     * Standard gravity as a unit of acceleration (9.80665 m/s^2, ISO 80000-3), written "g" as both
     * systems' practice writes it; "g0" (its symbol before format 4) is still read. No clash with the
     * gram: symbols are looked up within one dimension.
     */
    STANDARD_GRAVITY("g", Dimension.ACCELERATION, Gravity.STANDARD, "g0", "gn"),
    KILOGRAM_METRE("kg*m", Dimension.UNBALANCE, 1.0),
    GRAM_MILLIMETRE("g*mm", Dimension.UNBALANCE, 1e-6),
    /** Ounce-inch, the unbalance unit of US balancing practice (oz = 0.028349523125 kg, NIST SP 811:2008, B.8). */
    OUNCE_INCH("oz*in", Dimension.UNBALANCE, Us.OUNCE * Us.INCH, "oz-in"),
    RATIO("", Dimension.RATIO, 1.0),
    PERCENT("%", Dimension.RATIO, 0.01),
    /** Shaft speed change per second, the usual way to state a run-up rate. */
    RPM_PER_SECOND("rpm/s", Dimension.ANGULAR_ACCELERATION, 2.0 * Math.PI / 60.0),
    HERTZ_PER_SECOND("Hz/s", Dimension.ANGULAR_ACCELERATION, 2.0 * Math.PI),
    RADIAN_PER_SECOND_SQUARED("rad/s^2", Dimension.ANGULAR_ACCELERATION, 1.0),
    PASCAL("Pa", Dimension.STRESS, 1.0),
    MEGAPASCAL("MPa", Dimension.STRESS, 1e6),
    /** The unit of EN 13906-1's stresses and strengths (equal to the MPa). */
    NEWTON_PER_SQUARE_MILLIMETRE("N/mm^2", Dimension.STRESS, 1e6),
    /** Pound-force per square inch. */
    PSI("psi", Dimension.STRESS, Us.POUND_FORCE / (Us.INCH * Us.INCH), "lbf/in^2"),
    /** 1000 psi, the usual unit of spring stresses in US practice. */
    KSI("ksi", Dimension.STRESS, 1000.0 * Us.POUND_FORCE / (Us.INCH * Us.INCH)),
    TESLA("T", Dimension.FLUX_DENSITY, 1.0),
    MILLITESLA("mT", Dimension.FLUX_DENSITY, 1e-3),
    SECOND("s", Dimension.TIME, 1.0),
    HOUR("h", Dimension.TIME, 3600.0, "hr");

    private final String symbol;
    private final Dimension dimension;
    private final double factorToSi;
    private final List<String> aliases;

    Unit(String symbol, Dimension dimension, double factorToSi, String... aliases) {
        this.symbol = symbol;
        this.dimension = dimension;
        this.factorToSi = factorToSi;
        this.aliases = List.of(aliases);
    }

    /** The exact US customary definitions the factors above are built from (NIST SP 811:2008, appendix B). */
    private static final class Us {
        /** 1 in = 0.0254 m exactly. */
        static final double INCH = 0.0254;
        /** 1 lb = 0.45359237 kg exactly. */
        static final double POUND = 0.45359237;
        /** 1 oz = 1/16 lb = 0.028349523125 kg exactly. */
        static final double OUNCE = POUND / 16.0;
        /** 1 lbf = 0.45359237 kg x 9.80665 m/s^2 = 4.4482216152605 N exactly. */
        static final double POUND_FORCE = 4.4482216152605;

        private Us() {
        }
    }

    /** @return the symbol as typed in files and on the command line */
    public String symbol() {
        return symbol;
    }

    /** @return the kind of quantity */
    public Dimension dimension() {
        return dimension;
    }

    /**
     * @param value a value in this unit
     * @return the value in SI
     */
    public double toSi(double value) {
        return value * factorToSi;
    }

    /**
     * @param siValue a value in SI
     * @return the value in this unit
     */
    public double fromSi(double siValue) {
        return siValue / factorToSi;
    }

    /**
     * Finds a unit by symbol within one dimension. Accepts a few spellings users type
     * ("N.s/m", "Ns/m", "m/s2", "rad/sec", "RPM", "µm").
     * @param symbol the symbol
     * @param dimension the dimension it must have
     * @return the unit, or empty when none of that dimension has this symbol
     */
    public static Optional<Unit> find(String symbol, Dimension dimension) {
        String s = normalise(symbol);
        for (Unit u : values()) {
            if (u.dimension == dimension && (normalise(u.symbol).equals(s)
                    || u.aliases.stream().anyMatch(a -> normalise(a).equals(s)))) {
                return Optional.of(u);
            }
        }
        return Optional.empty();
    }

    /**
     * @param dimension a dimension
     * @return the symbols accepted for it, comma separated
     */
    public static String symbolsOf(Dimension dimension) {
        List<String> out = new ArrayList<>();
        for (Unit u : values()) {
            if (u.dimension == dimension && !u.symbol.isEmpty()) {
                out.add(u.symbol);
            }
        }
        return String.join(", ", out);
    }

    private static String normalise(String symbol) {
        String s = symbol.trim().replace("µ", "u").replace("μ", "u").replace("·", "*").replace(".", "*")
                .replace(" ", "").replace("sec", "s").replace("^", "");
        if (s.equals("Ns/m")) {
            s = "N*s/m";
        }
        if (s.equals("kNs/m")) {
            s = "kN*s/m";
        }
        if (s.equalsIgnoreCase("rpm") || s.equalsIgnoreCase("r/min")) {
            return "rpm";
        }
        if (s.equalsIgnoreCase("rpm/s") || s.equalsIgnoreCase("r/min/s")) {
            return "rpm/s";
        }
        if (s.equalsIgnoreCase("hz/s")) {
            return "Hz/s";
        }
        if (s.equalsIgnoreCase("hz")) {
            return "Hz";
        }
        return s.equalsIgnoreCase("g0") ? "g0" : s;
    }
}
