package org.counterpoise.core.commission;

import org.apache.commons.math3.complex.Complex;

/**
 * The structure with an absorber as two masses, solved directly from its equations of motion, an
 * independent route for the tests (it shares nothing with the project's transfer functions):
 * (k1 + k2 - w^2 m1 + i w (c1 + c2)) X1 - (k2 + i w c2) X2 = F and
 * -(k2 + i w c2) X1 + (k2 - w^2 m2 + i w c2) X2 = 0 (Den Hartog 1956, Mechanical Vibrations,
 * 4th ed., sec. 3.2), by Cramer's rule.
 */
final class TwoMassReference {
    private TwoMassReference() {
    }

    /**
     * @return the receptance X1 / F at w, m/N; m2 = 0 gives the bare structure
     */
    static Complex receptance(double m1, double k1, double c1, double m2, double k2, double c2, double w) {
        if (m2 == 0) {
            return Complex.ONE.divide(new Complex(k1 - w * w * m1, w * c1));
        }
        Complex coupling = new Complex(k2, w * c2);
        Complex a11 = new Complex(k1 + k2 - w * w * m1, w * (c1 + c2));
        Complex a22 = new Complex(k2 - w * w * m2, w * c2);
        return a22.divide(a11.multiply(a22).subtract(coupling.multiply(coupling)));
    }

    /** @return the accelerance -w^2 X1 / F, m/s^2/N */
    static Complex accelerance(double m1, double k1, double c1, double m2, double k2, double c2, double w) {
        return receptance(m1, k1, c1, m2, k2, c2, w).multiply(-w * w);
    }
}
