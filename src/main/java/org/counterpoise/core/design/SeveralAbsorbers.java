package org.counterpoise.core.design;

import java.util.List;
import java.util.Optional;
import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.criteria.Acceptance;
import org.counterpoise.core.criteria.Assessor;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.system.AbsorberSensitivity;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.ModeContributions;
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
 * @param single one absorber of the same total mass designed on the whole structure, least peak over
 *     the band (least worst case over the ranges when the set is, {@code robust}; under the same
 *     spillover limit when there is one), and its peak; for the project's one absorber on a structure of
 *     several modes over a band, the same for comparison with that design (made on the target mode
 *     alone); else empty
 * @param structureTolerance the factors on the target mode's natural frequency (its stiffness by the
 *     square, its mass, damping and shape kept) within which the peak over the band stays within
 *     {@link DesignResult#TOLERANCE_ALLOWANCE} of {@code peakAfter} (searched to
 *     {@link DesignResult#TOLERANCE_SEARCH} each side)
 * @param certified true when the optimum of the absorbers' tunings is certified (docs/several-modes.md;
 *     true for one absorber, designed by the study's own method); when false, {@code absorbers} is the
 *     best design seen
 * @param robust for several absorbers designed by {@code robust-worst-case}: the ranges and the
 *     figures of this set, the least-peak set and one absorber over them; empty otherwise
 * @param joint with one absorber per mode ({@link AbsorberLayout#joint}): the sequential design beside
 *     the joint one; else empty
 * @param spillover with a spillover limit ({@link AbsorberLayout#spilloverLimit}): the design's
 *     standing against it; else empty
 */
public record SeveralAbsorbers(AbsorberLayout layout, int targetMode, double effectiveMass, FrequencyBand band,
        double forceAmplitude, List<PointAbsorber> absorbers, double peakBefore, double peakAfter,
        List<ModePeak> modes, Optional<SingleAbsorber> single, boolean certified, MistuningRange structureTolerance,
        Optional<RobustSet> robust, Optional<Sequential> joint, Optional<SpilloverLimit> spillover) {

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
     * @param robust the robust set's figures, or empty
     */
    public SeveralAbsorbers(AbsorberLayout layout, int targetMode, double effectiveMass, FrequencyBand band,
            double forceAmplitude, List<PointAbsorber> absorbers, double peakBefore, double peakAfter,
            List<ModePeak> modes, Optional<SingleAbsorber> single, boolean certified, MistuningRange structureTolerance,
            Optional<RobustSet> robust) {
        this(layout, targetMode, effectiveMass, band, forceAmplitude, absorbers, peakBefore, peakAfter, modes, single,
                certified, structureTolerance, robust, Optional.empty(), Optional.empty());
    }

    /**
     * With no spillover limit.
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
     * @param robust the robust set's figures, or empty
     * @param joint the sequential design, or empty
     */
    public SeveralAbsorbers(AbsorberLayout layout, int targetMode, double effectiveMass, FrequencyBand band,
            double forceAmplitude, List<PointAbsorber> absorbers, double peakBefore, double peakAfter,
            List<ModePeak> modes, Optional<SingleAbsorber> single, boolean certified, MistuningRange structureTolerance,
            Optional<RobustSet> robust, Optional<Sequential> joint) {
        this(layout, targetMode, effectiveMass, band, forceAmplitude, absorbers, peakBefore, peakAfter, modes, single,
                certified, structureTolerance, robust, joint, Optional.empty());
    }

    /**
     * A set designed with the peak near each other mode limited (docs/several-modes.md, "Spillover
     * limited").
     *
     * @param ratio the largest peak allowed near each mode other than the target, as a multiple of
     *     its peak without absorbers
     * @param unlimitedPeak the least peak over the band with no limit, m (what the limit costs)
     * @param limited true when the unlimited design broke the limit, so the design differs from it
     * @param met true when every mode's peak is within its limit; false when no design found keeps
     *     them (the design shown came nearest)
     * @param singleMet the same for the one absorber of the same total mass compared (designed under
     *     the same limit)
     */
    public record SpilloverLimit(double ratio, double unlimitedPeak, boolean limited, boolean met, boolean singleMet) {
        /**
         * The limit's rule, in one place (the designer's windows, the report and the site check take it
         * from here): near every mode but the target, the ratio times that mode's peak without absorbers.
         *
         * @param mode index of a mode
         * @param peakBefore the peak near it without absorbers (its neighbourhood as
         *     {@code core.system.Spillover} takes it), in any units
         * @param targetMode index of the mode the absorbers are fitted to
         * @param ratio the limit's ratio
         * @return the largest peak allowed near that mode, in the peak's units; empty for the target mode
         *     and where the mode is unbounded without absorbers (undamped: no finite multiple of it)
         */
        public static Optional<Double> near(int mode, double peakBefore, int targetMode, double ratio) {
            if (mode == targetMode || !Double.isFinite(peakBefore)) {
                return Optional.empty();
            }
            return Optional.of(ratio * peakBefore);
        }
    }

    /**
     * @param p a mode's peaks
     * @return the largest peak allowed near that mode, m: the limit's ratio times its peak without
     *     absorbers; empty for the target mode, with no limit, or where the mode is unbounded without absorbers
     */
    public Optional<Double> spilloverLimitOf(ModePeak p) {
        return spillover.flatMap(s -> SpilloverLimit.near(p.mode(), p.before(), targetMode, s.ratio()));
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

    /**
     * @return with one absorber per mode, the sequential design's peak over the joint one's (at least 1);
     *     for the robust joint design the same of the worst peaks over the ranges (its nominal peak is
     *     above the least by design; below 1 only when the robust optimum was not found)
     */
    public Optional<Double> jointGain() {
        if (joint.isPresent() && robust.isPresent()) {
            return robust.map(r -> r.alternative().worstPeak() / r.set().worstPeak());
        }
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
     * The set designed for the least worst-case peak (method {@code robust-worst-case}) and what it
     * is compared with, each on the whole structure over the same ranges.
     *
     * @param structureRange the target mode's natural frequency may be off by +/- this fraction (with
     *     one absorber per mode: each designed mode's, each on its own)
     * @param absorberRange every absorber's natural frequency may be off by +/- this fraction, all
     *     by the same factor (one spring batch)
     * @param dampingFloor no absorber's damping ratio is below this
     * @param set this set (the absorbers above)
     * @param leastPeakSet the same absorbers tuned for the least nominal peak (with one absorber per
     *     mode: jointly)
     * @param alternative what the usual practice would build instead: for absorbers on one mode, one
     *     absorber of the same total mass designed for the least worst case too (the
     *     {@link SeveralAbsorbers#single} absorber); with one absorber per mode, the sequential design
     *     (each absorber the least peak on its own mode alone, {@link SeveralAbsorbers#joint})
     */
    public record RobustSet(double structureRange, double absorberRange, double dampingFloor, Figures set,
            Figures leastPeakSet, Figures alternative) {
    }

    /**
     * A design's figures over the ranges, on the whole structure.
     *
     * @param nominalPeak the peak displacement over the band, structure and absorbers as designed, m
     * @param worstPeak the largest peak over the band and the ranges, m
     * @param structureTolerance how far the target mode's frequency may be off, as
     *     {@link SeveralAbsorbers#structureTolerance}
     */
    public record Figures(double nominalPeak, double worstPeak, MistuningRange structureTolerance) {
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
        return response(withAbsorbers, layout.responsePoint());
    }

    /**
     * The displacement amplitude at a named point of the structure under the design's force.
     *
     * @param withAbsorbers true with the absorbers, false the bare structure
     * @param point a named point of the structure
     * @return the amplitude, m, at an angular frequency, rad/s
     */
    public DoubleUnaryOperator response(boolean withAbsorbers, String point) {
        ModalSystem with = ModalSystem.of(layout.structure(), absorbers);
        ModalSystem system = withAbsorbers ? with : with.bare();
        String force = layout.excitationPoint();
        system.structure().requirePoint(point);
        double scale = system.responseScale(force, forceAmplitude, point);
        double reference = system.referenceFrequency();
        return omega -> scale * AbsorberSensitivity.value(system, force, point, omega / reference).abs();
    }

    /**
     * Each mode's part of the displacement at a named point with the absorbers on
     * ({@link ModeContributions}): which mode a peak belongs to, and what the absorbers left of each.
     *
     * @param point a named point of the structure
     * @return the amplitudes of phi_r(p) q_r, m, one per mode, at an angular frequency, rad/s
     */
    public DoubleFunction<double[]> modeParts(String point) {
        ModalSystem system = ModalSystem.of(layout.structure(), absorbers);
        String force = layout.excitationPoint();
        system.structure().requirePoint(point);
        return omega -> {
            Complex[] parts = ModeContributions.at(system, force, point, omega);
            double[] out = new double[parts.length];
            for (int r = 0; r < parts.length; r++) {
                out[r] = forceAmplitude * parts[r].abs();
            }
            return out;
        };
    }

    /** @return the total mass of the absorbers, kg */
    public double totalMass() {
        return absorbers.stream().mapToDouble(PointAbsorber::mass).sum();
    }

    /** @return the single absorber's peak over this design's peak (above 1: the split pays), when compared */
    public Optional<Double> gain() {
        return absorbers.size() > 1 ? single.map(s -> s.peak() / peakAfter) : Optional.empty();
    }

    /**
     * @param study the study the set was designed for (its criterion and force)
     * @return its criterion judged on the whole structure, bare and with these absorbers, at the
     *     response point ({@link Assessor#acceptance(ModalSystem, String, String)}); empty without a criterion
     */
    public Optional<Acceptance> acceptance(DesignStudy study) {
        return acceptanceOf(study);
    }

    /**
     * @param single the study's design on the target mode
     * @return that design with its verdict replaced by the whole structure's (what every output shows for a
     *     project of several modes or absorbers)
     */
    public DesignResult judged(DesignResult single) {
        return single.withAcceptance(acceptanceOf(single.study()));
    }

    private Optional<Acceptance> acceptanceOf(DesignStudy study) {
        return study.criterion().map(c -> Assessor.of(c, study.excitation()).acceptance(ModalSystem.of(
                layout.structure(), absorbers), layout.excitationPoint(), layout.responsePoint()));
    }
}
