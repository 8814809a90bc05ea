package org.counterpoise.core.optim;

/**
 * One absorber per mode designed jointly on a {@link JointAbsorberSetup}, with the sequential design
 * beside it; in the setup's units.
 *
 * @param setup the setup solved
 * @param design the joint optimum: each absorber's mass, own frequency and damping ratio (referred to
 *     its own frequency); absorber j is designed mode j's
 * @param peak the joint optimum's peak over the band of the displacement at the response point per
 *     unit force at the excitation point, the whole structure seen
 * @param certificate the evidence that it is the minimax optimum (when not certified, {@code design}
 *     is the best design seen)
 * @param sequentialDesign each absorber designed on its own mode alone (the usual practice)
 * @param sequentialPeak the peak with the sequential design
 * @param evaluations transfer functions built (a cost measure)
 */
public record JointAbsorberResult(JointAbsorberSetup setup, AbsorberSetDesign design, double peak,
        AbsorberSetCertificate certificate, AbsorberSetDesign sequentialDesign, double sequentialPeak, int evaluations) {

    /** @return sequential peak / joint peak (at least 1: the sequential design is one of the joint search's seeds) */
    public double gain() {
        return sequentialPeak / peak;
    }
}
