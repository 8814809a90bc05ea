package org.counterpoise.testing;

import org.apache.commons.math3.complex.Complex;

/**
 * Driving-point FRFs of the structure with an absorber, from {@link DirectSolve} (the equations of
 * motion solved directly; nothing of the production algebra): a force at the structure, no base motion.
 */
public final class TwoMassReference {
    private TwoMassReference() {
    }

    /** @return the receptance X1 / F at w, m/N; m2 = 0 gives the bare structure */
    public static Complex receptance(double m1, double k1, double c1, double m2, double k2, double c2, double w) {
        return DirectSolve.solve(m1, k1, c1, m2, k2, c2, w, Complex.ONE, Complex.ZERO)[0];
    }

    /** @return the accelerance -w^2 X1 / F, m/s^2/N */
    public static Complex accelerance(double m1, double k1, double c1, double m2, double k2, double c2, double w) {
        return receptance(m1, k1, c1, m2, k2, c2, w).multiply(-w * w);
    }
}
