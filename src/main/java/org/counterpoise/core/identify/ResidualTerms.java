package org.counterpoise.core.identify;

import org.apache.commons.math3.complex.Complex;

/**
 * The receptance of modes outside the fitted band, as two real terms: the modes below act as a
 * mass, -1/(M_L omega^2); the modes above as a spring, 1/K_U (Ewins 2000, Modal Testing, 2nd ed.,
 * section 4.4, residual terms).
 *
 * @param lowerInverseMass 1/M_L, 1/kg (0 when not fitted)
 * @param upperCompliance 1/K_U, m/N (0 when not fitted)
 */
public record ResidualTerms(double lowerInverseMass, double upperCompliance) {
    /** No residual terms. */
    public static final ResidualTerms NONE = new ResidualTerms(0.0, 0.0);

    /**
     * @param omega angular frequency, rad/s
     * @return the residual receptance there, m/N
     */
    public Complex receptance(double omega) {
        return new Complex(upperCompliance - lowerInverseMass / (omega * omega), 0.0);
    }
}
