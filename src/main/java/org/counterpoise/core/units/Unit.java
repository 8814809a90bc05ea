package org.counterpoise.core.units;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Units a user may type, each with its factor to SI (value_SI = value * factor). Conversions
 * happen only at the edges (files, command line, wizard); the core works in SI throughout.
 */
public enum Unit {
    KILOGRAM("kg", Dimension.MASS, 1.0),
    GRAM("g", Dimension.MASS, 1e-3),
    TONNE("t", Dimension.MASS, 1e3),
    NEWTON("N", Dimension.FORCE, 1.0),
    KILONEWTON("kN", Dimension.FORCE, 1e3),
    METRE("m", Dimension.LENGTH, 1.0),
    MILLIMETRE("mm", Dimension.LENGTH, 1e-3),
    MICROMETRE("um", Dimension.LENGTH, 1e-6),
    NEWTON_PER_METRE("N/m", Dimension.STIFFNESS, 1.0),
    NEWTON_PER_MILLIMETRE("N/mm", Dimension.STIFFNESS, 1e3),
    KILONEWTON_PER_METRE("kN/m", Dimension.STIFFNESS, 1e3),
    KILONEWTON_PER_MILLIMETRE("kN/mm", Dimension.STIFFNESS, 1e6),
    NEWTON_SECOND_PER_METRE("N*s/m", Dimension.DAMPING_COEFFICIENT, 1.0),
    KILONEWTON_SECOND_PER_METRE("kN*s/m", Dimension.DAMPING_COEFFICIENT, 1e3),
    RADIAN_PER_SECOND("rad/s", Dimension.FREQUENCY, 1.0),
    HERTZ("Hz", Dimension.FREQUENCY, 2.0 * Math.PI),
    REV_PER_MINUTE("rpm", Dimension.FREQUENCY, 2.0 * Math.PI / 60.0),
    METRE_PER_SECOND("m/s", Dimension.VELOCITY, 1.0),
    MILLIMETRE_PER_SECOND("mm/s", Dimension.VELOCITY, 1e-3),
    METRE_PER_SECOND_SQUARED("m/s^2", Dimension.ACCELERATION, 1.0),
    /** Standard gravity as a unit of acceleration (9.80665 m/s^2, ISO 80000-3). */
    STANDARD_GRAVITY("g0", Dimension.ACCELERATION, Gravity.STANDARD),
    KILOGRAM_METRE("kg*m", Dimension.UNBALANCE, 1.0),
    GRAM_MILLIMETRE("g*mm", Dimension.UNBALANCE, 1e-6),
    RATIO("", Dimension.RATIO, 1.0),
    PERCENT("%", Dimension.RATIO, 0.01),
    /** Shaft speed change per second, the usual way to state a run-up rate. */
    RPM_PER_SECOND("rpm/s", Dimension.ANGULAR_ACCELERATION, 2.0 * Math.PI / 60.0),
    HERTZ_PER_SECOND("Hz/s", Dimension.ANGULAR_ACCELERATION, 2.0 * Math.PI),
    RADIAN_PER_SECOND_SQUARED("rad/s^2", Dimension.ANGULAR_ACCELERATION, 1.0),
    /** N/mm^2, the unit spring standards state stresses in. */
    MEGAPASCAL("MPa", Dimension.STRESS, 1e6),
    PASCAL("Pa", Dimension.STRESS, 1.0);

    private final String symbol;
    private final Dimension dimension;
    private final double factorToSi;

    Unit(String symbol, Dimension dimension, double factorToSi) {
        this.symbol = symbol;
        this.dimension = dimension;
        this.factorToSi = factorToSi;
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
            if (u.dimension == dimension && normalise(u.symbol).equals(s)) {
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
        return s.toLowerCase(Locale.ROOT).equals("g0") ? "g0" : s;
    }
}
