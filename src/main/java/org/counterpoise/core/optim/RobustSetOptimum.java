package org.counterpoise.core.optim;

/**
 * The least worst-case peak of several absorbers on one mode ({@link RobustSetOptimiser}).
 *
 * @param problem the problem solved
 * @param design each absorber's mass ratio, tuning ratio and damping ratio as drawn
 * @param worstPeak the worst peak of |X k1 / F| over the band and the ranges
 * @param worstStructureFactor the structure frequency factor where it occurs
 * @param worstAbsorberFactor the common absorber frequency factor where it occurs (1 without a range)
 * @param nominalPeak the peak of the design on the nominal structure, absorbers as drawn
 * @param scenarios the builds (structure and absorber factors) the last minimax was solved over
 * @param converged true when the worst case came within {@value RobustSetOptimiser#GAP} (relative)
 *     of the largest peak over those builds, which is a lower bound on the least worst case for the
 *     local optimum found
 * @param certificate the certificate of the minimax over the final builds (equal active peaks,
 *     first-order conditions, coarse scan, random moves: {@link AbsorberSetCertificate})
 * @param leastPeak the least-NOMINAL-peak set of the same absorbers (the seed, for comparison)
 * @param evaluations transfer functions built (a cost measure)
 */
public record RobustSetOptimum(RobustSetProblem problem, AbsorberSetDesign design, double worstPeak,
        double worstStructureFactor, double worstAbsorberFactor, double nominalPeak, int scenarios, boolean converged,
        AbsorberSetCertificate certificate, AbsorberSetOptimum leastPeak, int evaluations) {

    /** @return true when the exchange closed and the final minimax is certified */
    public boolean certified() {
        return converged && certificate.certified();
    }
}
