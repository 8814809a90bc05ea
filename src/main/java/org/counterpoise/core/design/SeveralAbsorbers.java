package org.counterpoise.core.design;

import java.util.List;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;

/**
 * The design of several absorbers on a structure of one or several modes, and what they do to the
 * whole structure (made by {@link SeveralAbsorbersDesigner}). SI units; peaks are displacement
 * amplitudes at the response point, m.
 *
 * @param layout the structure, its points, the number of absorbers and their tuning rule
 * @param targetMode the index of the mode the absorbers were fitted to
 * @param effectiveMass that mode's modal mass as seen at the absorbers' point, kg
 * @param band the forcing band, rad/s
 * @param forceAmplitude the force amplitude at the excitation point, N
 * @param absorbers each absorber: its mass, spring and damper
 * @param peakBefore the peak over the band without absorbers (+infinity when unbounded)
 * @param peakAfter the peak over the band with the absorbers
 * @param modes each mode's peak near its own frequency, before and after (spillover), in the
 *     structure's order
 * @param single one absorber of the same total mass, least peak over the band on the target mode,
 *     and its peak on the whole structure; empty for one absorber
 * @param certified true when the optimum of the absorbers' tunings is certified (docs/several-modes.md;
 *     true for one absorber, designed by the study's own method)
 */
public record SeveralAbsorbers(AbsorberLayout layout, int targetMode, double effectiveMass, FrequencyBand band,
        double forceAmplitude, List<PointAbsorber> absorbers, double peakBefore, double peakAfter,
        List<ModePeak> modes, Optional<SingleAbsorber> single, boolean certified) {

    /** Copies the lists. */
    public SeveralAbsorbers {
        absorbers = List.copyOf(absorbers);
        modes = List.copyOf(modes);
    }

    /**
     * A mode's peak near its own natural frequency (between the geometric means of its frequency and
     * its neighbours'), without and with the absorbers.
     *
     * @param mode index of the mode
     * @param before displacement amplitude, m (+infinity when unbounded)
     * @param after displacement amplitude, m (+infinity when unbounded)
     */
    public record ModePeak(int mode, double before, double after) {
    }

    /**
     * One absorber of the same total mass, for comparison.
     *
     * @param absorber its mass, spring and damper
     * @param peak the peak over the band at the response point with it, m
     */
    public record SingleAbsorber(PointAbsorber absorber, double peak) {
    }

    /**
     * The displacement amplitude at the response point per the force at the excitation point, of the
     * whole structure (every mode), from its exact transfer function ({@link ModalSystem}).
     *
     * @param withAbsorbers true with the absorbers, false the bare structure
     * @return the amplitude, m, at an angular frequency, rad/s
     */
    public DoubleUnaryOperator response(boolean withAbsorbers) {
        ModalSystem with = ModalSystem.of(layout.structure(), absorbers);
        ModalSystem system = withAbsorbers ? with : with.bare();
        TransferFunction h = system.transferFunction(layout.excitationPoint(), layout.responsePoint());
        double scale = system.responseScale(layout.excitationPoint(), forceAmplitude, layout.responsePoint());
        double reference = system.referenceFrequency();
        return omega -> scale * h.magnitude(omega / reference);
    }

    /** @return the total mass of the absorbers, kg */
    public double totalMass() {
        return absorbers.stream().mapToDouble(PointAbsorber::mass).sum();
    }

    /** @return the single absorber's peak over this design's peak (above 1: the split pays), when compared */
    public Optional<Double> gain() {
        return single.map(s -> s.peak() / peakAfter);
    }
}
