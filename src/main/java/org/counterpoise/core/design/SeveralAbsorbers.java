package org.counterpoise.core.design;

import java.util.List;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.system.AbsorberSensitivity;
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
 * @param structureTolerance the factors on the target mode's natural frequency (its stiffness by the
 *     square, its mass, damping and shape kept) within which the peak over the band stays within
 *     {@link DesignResult#TOLERANCE_ALLOWANCE} of {@code peakAfter} (searched to
 *     {@link DesignResult#TOLERANCE_SEARCH} each side)
 * @param certified true when the optimum of the absorbers' tunings is certified (docs/several-modes.md;
 *     true for one absorber, designed by the study's own method); when false, {@code absorbers} is the
 *     best design seen
 * @param joint with one absorber per mode ({@link AbsorberLayout#joint}): the sequential design beside
 *     the joint one; else empty
 */
public record SeveralAbsorbers(AbsorberLayout layout, int targetMode, double effectiveMass, FrequencyBand band,
        double forceAmplitude, List<PointAbsorber> absorbers, double peakBefore, double peakAfter,
        List<ModePeak> modes, Optional<SingleAbsorber> single, boolean certified, MistuningRange structureTolerance,
        Optional<Sequential> joint) {

    /** Copies the lists. */
    public SeveralAbsorbers {
        absorbers = List.copyOf(absorbers);
        modes = List.copyOf(modes);
    }

    /**
     * Absorbers all on the target mode (no sequential design to compare).
     *
     * @param layout the structure and absorbers
     * @param targetMode the target mode's index
     * @param effectiveMass its modal mass at the absorbers' point, kg
     * @param band the forcing band, rad/s
     * @param forceAmplitude the force, N
     * @param absorbers each absorber
     * @param peakBefore the peak over the band without absorbers, m
     * @param peakAfter the peak with them, m
     * @param modes each mode's peak
     * @param single one absorber of the same total mass, or empty
     * @param certified true when certified
     * @param structureTolerance the tolerance to the target mode's frequency
     */
    public SeveralAbsorbers(AbsorberLayout layout, int targetMode, double effectiveMass, FrequencyBand band,
            double forceAmplitude, List<PointAbsorber> absorbers, double peakBefore, double peakAfter,
            List<ModePeak> modes, Optional<SingleAbsorber> single, boolean certified, MistuningRange structureTolerance) {
        this(layout, targetMode, effectiveMass, band, forceAmplitude, absorbers, peakBefore, peakAfter, modes, single,
                certified, structureTolerance, Optional.empty());
    }

    /**
     * One absorber per mode designed in sequence, each on its own mode alone (the usual practice), for
     * comparison with the joint design (docs/several-modes.md).
     *
     * @param absorbers the two absorbers, in the order of {@link JointArrangement#modes}
     * @param peak the peak over the band at the response point with them, m
     */
    public record Sequential(List<PointAbsorber> absorbers, double peak) {
        /** Copies the list. */
        public Sequential {
            absorbers = List.copyOf(absorbers);
        }
    }

    /** @return the sequential design's peak over the joint one's (at least 1), with one absorber per mode */
    public Optional<Double> jointGain() {
        return joint.map(s -> s.peak() / peakAfter);
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
     * @param structureTolerance its tolerance to the target mode's frequency, as the set's
     */
    public record SingleAbsorber(PointAbsorber absorber, double peak, MistuningRange structureTolerance) {
    }

    /**
     * The displacement amplitude at the response point per the force at the excitation point, of the
     * whole structure (every mode), from its factored form, each modal and absorber term evaluated on its
     * own ({@link AbsorberSensitivity#value}; the expanded transfer function of {@link ModalSystem} loses
     * digits between close peaks of several light absorbers, docs/several-modes.md).
     *
     * @param withAbsorbers true with the absorbers, false the bare structure
     * @return the amplitude, m, at an angular frequency, rad/s
     */
    public DoubleUnaryOperator response(boolean withAbsorbers) {
        ModalSystem with = ModalSystem.of(layout.structure(), absorbers);
        ModalSystem system = withAbsorbers ? with : with.bare();
        String force = layout.excitationPoint();
        String at = layout.responsePoint();
        double scale = system.responseScale(force, forceAmplitude, at);
        double reference = system.referenceFrequency();
        return omega -> scale * AbsorberSensitivity.value(system, force, at, omega / reference).abs();
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
