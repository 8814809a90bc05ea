package org.counterpoise.core.units;

import java.util.Arrays;
import java.util.Optional;

/**
 * Units of a one-sided power spectral density per hertz, each with its factor to SI (N^2/Hz for a
 * force, (m/s^2)^2/Hz for an acceleration), and the dimension of the quantity whose spectrum it is.
 */
public enum SpectralDensityUnit {
    NEWTON_SQUARED_PER_HERTZ("N^2/Hz", Dimension.FORCE, 1.0),
    KILONEWTON_SQUARED_PER_HERTZ("kN^2/Hz", Dimension.FORCE, 1e6),
    ACCELERATION_SQUARED_PER_HERTZ("(m/s^2)^2/Hz", Dimension.ACCELERATION, 1.0),
    /** g0^2/Hz, the usual unit of vibration-test spectra (g0 = 9.80665 m/s^2). */
    GRAVITY_SQUARED_PER_HERTZ("g0^2/Hz", Dimension.ACCELERATION, Gravity.STANDARD * Gravity.STANDARD);

    private final String symbol;
    private final Dimension of;
    private final double factorToSi;

    SpectralDensityUnit(String symbol, Dimension of, double factorToSi) {
        this.symbol = symbol;
        this.of = of;
        this.factorToSi = factorToSi;
    }

    /** @return the symbol as typed in files */
    public String symbol() {
        return symbol;
    }

    /** @return the dimension of the quantity whose spectrum this measures */
    public Dimension of() {
        return of;
    }

    /**
     * @param value a value in this unit
     * @return the value in SI (N^2/Hz or (m/s^2)^2/Hz)
     */
    public double toSi(double value) {
        return value * factorToSi;
    }

    /**
     * @param symbol a symbol
     * @param of the dimension of the quantity
     * @return the unit with that symbol for that quantity
     */
    public static Optional<SpectralDensityUnit> bySymbol(String symbol, Dimension of) {
        return Arrays.stream(values()).filter(u -> u.symbol.equals(symbol) && u.of == of).findFirst();
    }

    /**
     * @param of the dimension of the quantity
     * @return the symbols allowed for it, comma separated
     */
    public static String symbols(Dimension of) {
        return String.join(", ", Arrays.stream(values()).filter(u -> u.of == of).map(u -> u.symbol).toList());
    }
}
