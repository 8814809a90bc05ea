package org.counterpoise.core.optim;

import java.util.List;

/**
 * The least worst-case peak of one absorber per mode ({@link RobustJointOptimiser}); peaks in the
 * setup's units (displacement at the response point per unit force at the excitation point).
 *
 * @param problem the problem solved
 * @param design each absorber's mass, own frequency and damping ratio as drawn
 * @param worstPeak the worst peak over the band and the ranges
 * @param worstBuild where it occurs: the lower designed mode's frequency factor, the upper's, the
 *     absorbers' common factor
 * @param nominalPeak the design's peak on the nominal structure, absorbers as drawn
 * @param builds the number of builds the last minimax was solved over
 * @param converged true when the worst case came within {@value RobustExchange#GAP} (relative) of the
 *     largest peak over those builds, a lower bound on the least worst case for the local optimum found
 * @param certificate the certificate of the minimax over the final builds ({@link AbsorberSetCertificate})
 * @param leastPeak the joint least-NOMINAL-peak design and the sequential one (the seeds, for comparison)
 * @param evaluations transfer functions built (a cost measure)
 */
public record RobustJointResult(RobustJointProblem problem, AbsorberSetDesign design, double worstPeak,
        List<Double> worstBuild, double nominalPeak, int builds, boolean converged, AbsorberSetCertificate certificate,
        JointAbsorberResult leastPeak, int evaluations) {

    /** Copies the list. */
    public RobustJointResult {
        worstBuild = List.copyOf(worstBuild);
    }

    /** @return true when the exchange closed and the final minimax is certified */
    public boolean certified() {
        return converged && certificate.certified();
    }
}
