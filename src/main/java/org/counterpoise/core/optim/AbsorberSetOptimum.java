package org.counterpoise.core.optim;

/**
 * The minimax (H-infinity) optimum of several absorbers on one mode.
 *
 * @param problem the problem solved
 * @param design each absorber's mass ratio, tuning ratio and damping ratio
 * @param peak the optimum peak of |X k1 / F| over the band
 * @param certificate the evidence that it is the optimum
 * @param evaluations transfer functions built (a cost measure)
 */
public record AbsorberSetOptimum(AbsorberSetProblem problem, AbsorberSetDesign design, double peak,
        AbsorberSetCertificate certificate, int evaluations) {
}
