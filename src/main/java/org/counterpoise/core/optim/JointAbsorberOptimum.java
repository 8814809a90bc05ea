package org.counterpoise.core.optim;

/**
 * One absorber per mode designed jointly, with the sequential design beside it.
 *
 * @param problem the problem solved
 * @param design the joint optimum: each absorber's mass ratio (over m1), tuning ratio f_j = omega_j /
 *     omega1 and damping ratio zeta_j (referred to its own frequency); absorber j is mode j's
 * @param peak the joint optimum's peak of |X k1 / F| over the band, the whole structure seen
 * @param certificate the evidence that it is the minimax optimum
 * @param sequentialDesign each absorber designed on its own mode alone (the usual practice)
 * @param sequentialPeak the peak of the whole structure with the sequential design
 * @param evaluations transfer functions built (a cost measure)
 */
public record JointAbsorberOptimum(JointAbsorberProblem problem, AbsorberSetDesign design, double peak,
        AbsorberSetCertificate certificate, AbsorberSetDesign sequentialDesign, double sequentialPeak, int evaluations) {

    /** @return sequential peak / joint peak (at least 1: the sequential design is one of the joint search's seeds) */
    public double gain() {
        return sequentialPeak / peak;
    }
}
