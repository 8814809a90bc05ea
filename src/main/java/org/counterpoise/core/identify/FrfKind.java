package org.counterpoise.core.identify;

import org.apache.commons.math3.complex.Complex;

/**
 * What a frequency response function measures per newton of force: displacement (receptance,
 * m/N), velocity (mobility, m/s/N) or acceleration (accelerance, m/s^2/N). For harmonic motion
 * each is the one before times i omega (common practice; Ewins 2000, Modal Testing: Theory,
 * Practice and Application, 2nd ed., section 2.2).
 */
public enum FrfKind {
    /** displacement per force, m/N. */
    RECEPTANCE("receptance", 0),
    /** velocity per force, m/s/N. */
    MOBILITY("mobility", 1),
    /** acceleration per force, m/s^2/N. */
    ACCELERANCE("accelerance", 2);

    private final String id;
    private final int power;

    FrfKind(String id, int power) {
        this.id = id;
        this.power = power;
    }

    /** @return the id used on the command line and in files */
    public String id() {
        return id;
    }

    /**
     * @param value an FRF value of this kind, SI
     * @param omega its angular frequency, rad/s
     * @param target the kind wanted
     * @return the value as {@code target}: multiplied by (i omega)^(target power - this power)
     */
    public Complex convert(Complex value, double omega, FrfKind target) {
        Complex result = value;
        int steps = target.power - power;
        Complex iw = new Complex(0.0, omega);
        for (int i = 0; i < Math.abs(steps); i++) {
            result = steps > 0 ? result.multiply(iw) : result.divide(iw);
        }
        return result;
    }
}
