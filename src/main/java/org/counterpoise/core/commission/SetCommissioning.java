package org.counterpoise.core.commission;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.realisation.TrimPlan;
import org.counterpoise.core.system.ModalPeak;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.system.Spillover;

/**
 * The commissioning of several absorbers at one point: each absorber as built against what the
 * structure as measured needs, the mass that brings each to its frequency, and what the whole
 * structure does with them as built and after that trim.
 *
 * <p>Each absorber's target frequency is its design's; when the fit freed the target mode's
 * frequency, the set is designed again for the mode as measured (same band, masses and tuning rule,
 * {@link SeveralAbsorbersDesigner#retuned}), since the band, not the mode, sets a set's tunings. At a
 * fixed spring rate omega = sqrt(k / m) (any vibration text, e.g. Den Hartog 1956, Mechanical
 * Vibrations, 4th ed., ch. 1), so the mass that gives the target is m (omega_built / omega_target)^2;
 * the damper stays, so after the trim zeta = c / (2 m' omega_target). Absorbers of equal mass that
 * swap frequencies fit equally well, so the fitted ones are paired with the design's in order of
 * frequency. The peaks are the exact peaks over the band of the displacement at the response point
 * per the project's force ({@link ModalPeak}), on the structure as measured. The trim is advised
 * only when the fit is good and the trims lower that peak ({@link CommissioningWarning#TRIM_DOES_NOT_HELP}
 * otherwise); it is called required when the peak as built exceeds the design's by more than
 * {@link DesignResult#TOLERANCE_ALLOWANCE}, the allowance that the single absorber's check uses.
 *
 * @param built the absorbers as built (paired with the design's in order of frequency)
 * @param corrections one per absorber, in the design's order
 * @param warnings the fit's warnings and those of the trims, in declaration order
 * @param advised whether trims are advised: a good fit whose trims lower the peak
 * @param designPeak the peak over the band with the absorbers as designed, m
 * @param asBuiltPeak the peak with the absorbers as built, on the structure as measured, m (doubtful when the
 *     fit is poor)
 * @param afterTrimPeak the peak after every absorber's mass is trimmed to its target, m
 * @param trimRequired whether the peak as built exceeds the design's by more than the allowance (meaningful
 *     only when advised)
 */
public record SetCommissioning(AsBuiltSet built, List<Correction> corrections, List<CommissioningWarning> warnings,
        boolean advised, double designPeak, double asBuiltPeak, double afterTrimPeak, boolean trimRequired) {

    /** Copies the lists. */
    public SetCommissioning {
        corrections = List.copyOf(corrections);
        warnings = List.copyOf(warnings);
    }

    /**
     * One absorber's correction.
     *
     * @param designFrequency its design's own frequency, rad/s
     * @param targetFrequency the frequency the structure as measured needs, rad/s
     * @param frequencyOff omega_built / omega_target - 1
     * @param massToAdd the mass that brings it to the target at its spring rate, kg (negative: to take off);
     *     0 when no trim is advised
     * @param designDampingRatio its design's damping ratio
     * @param dampingOff zeta_built / zeta_design - 1 (0 for an undamped design)
     * @param platesToAdd with its trim plates known and a trim advised: the whole plates to add (negative:
     *     to take off), the nearest to the mass to add within the plates supplied and fitted; else empty
     * @param plateMass one of its trim plates, kg (0 when its plates are not known)
     * @param beyondTrimRange whether even every plate supplied (or none) leaves it further from its target
     *     than its part tolerance on frequency
     */
    public record Correction(double designFrequency, double targetFrequency, double frequencyOff, double massToAdd,
            double designDampingRatio, double dampingOff, OptionalInt platesToAdd, double plateMass,
            boolean beyondTrimRange) {
    }

    /**
     * An absorber's trim plates as supplied ({@link TrimPlan}) and the part tolerance on its own frequency
     * ({@link org.counterpoise.core.realisation.PartTolerances#absorberFrequency}), from its hardware.
     *
     * @param plan its trim plates
     * @param frequencyTolerance the fraction its own frequency may be off
     */
    public record Plates(TrimPlan plan, double frequencyTolerance) {
    }

    /** Weighed masses further than this factor from the design's are refused: another absorber needs a design. */
    static final double WEIGHED_FACTOR = 2.0;

    /**
     * @param design the several absorbers as designed
     * @param measured the driving-point FRF at their point with all of them fitted
     * @param freeStructure whether to fit the target mode's natural frequency too
     * @param weighed each absorber's mass as weighed (kg, in the design's order), or an empty list for the design's
     * @return the check
     */
    public static SetCommissioning of(SeveralAbsorbers design, MeasuredFrf measured, boolean freeStructure,
            List<Double> weighed) {
        return of(design, measured, freeStructure, weighed, List.of());
    }

    /**
     * The check with each absorber's trim plates: a trim is a whole number of plates within those supplied
     * and fitted (the mass after the trim, and the peak after it, are those of the plates), as the single
     * absorber's {@link TrimCorrection}; {@link CommissioningWarning#BEYOND_TRIM_RANGE} when an absorber's
     * plates cannot bring it within its part tolerance of its target.
     *
     * @param design the several absorbers as designed
     * @param measured the driving-point FRF at their point with all of them fitted
     * @param freeStructure whether to fit the target mode's natural frequency too
     * @param weighed each absorber's mass as weighed (kg, in the design's order), or an empty list for the design's
     * @param plates each absorber's plates in the design's order (empty for one whose hardware is not sized),
     *     or an empty list for none known (the trims are then masses)
     * @return the check
     */
    public static SetCommissioning of(SeveralAbsorbers design, MeasuredFrf measured, boolean freeStructure,
            List<Double> weighed, List<Optional<Plates>> plates) {
        if (!plates.isEmpty() && plates.size() != design.absorbers().size()) {
            throw new IllegalArgumentException("bug: one trim plan per absorber");
        }
        List<PointAbsorber> designed = design.absorbers();
        List<PointAbsorber> held = held(designed, weighed);
        AbsorberLayout layout = design.layout();
        ModalStructure structure = layout.structure();
        int target = design.targetMode();
        AsBuiltSet built = pairedByFrequency(AsBuiltSetFit.fit(structure, target, held, measured, freeStructure),
                designed);
        double designMode = structure.modes().get(target).naturalFrequency();
        ModalStructure asMeasured = built.targetModeFrequency() == designMode ? structure
                : structure.withFrequency(target, built.targetModeFrequency());
        List<PointAbsorber> targets = SeveralAbsorbersDesigner.retuned(design, built.targetModeFrequency());
        List<CommissioningWarning> warnings = new ArrayList<>(built.warnings());
        if (Math.abs(built.targetModeFrequency() / designMode - 1) > CommissioningWarning.STRUCTURE_FAR) {
            warnings.add(CommissioningWarning.STRUCTURE_FREQUENCY_FAR);
        }
        List<PointAbsorber> asBuilt = new ArrayList<>();
        List<PointAbsorber> trimmed = new ArrayList<>();
        double[] massToAdd = new double[designed.size()];
        List<PlateTrim> plateTrims = new ArrayList<>();
        for (int j = 0; j < designed.size(); j++) {
            AsBuiltSet.Built b = built.absorbers().get(j);
            double targetFrequency = targets.get(j).frequency();
            double ratio = b.frequency() / targetFrequency;
            massToAdd[j] = b.mass() * (ratio * ratio - 1.0);
            PointAbsorber now = PointAbsorber.tuned(designed.get(j).point(), b.mass(), b.frequency(), b.dampingRatio());
            asBuilt.add(now);
            double toAdd = massToAdd[j];
            Optional<PlateTrim> plateTrim = plates.isEmpty() ? Optional.empty()
                    : plates.get(j).map(p -> PlateTrim.of(p, b.mass(), b.frequency(), targetFrequency, toAdd));
            plateTrims.add(plateTrim.orElse(null));
            double added = plateTrim.map(PlateTrim::mass).orElse(massToAdd[j]);
            trimmed.add(new PointAbsorber(now.point(), b.mass() + added, now.stiffness(), now.damping()));
        }
        FrequencyBand band = design.band();
        double force = design.forceAmplitude();
        double asBuiltPeak = force * peak(asMeasured, asBuilt, layout, band);
        double afterTrim = force * peak(asMeasured, trimmed, layout, band);
        boolean advised = !warnings.contains(CommissioningWarning.POOR_FIT);
        // with a spillover limit the targets keep it on the structure as measured (or say they cannot), and a
        // trim that brings a set breaking the limit nearer to it helps even where it raises the band's peak
        boolean nearerTheLimit = false;
        if (layout.spilloverLimit().isPresent()) {
            double ratio = layout.spilloverLimit().getAsDouble();
            double measuredTarget = built.targetModeFrequency();
            if (worstSpillover(asMeasured, targets, layout, measuredTarget, ratio) > 1 + 1e-6) {
                warnings.add(CommissioningWarning.SPILLOVER_LIMIT_NOT_KEPT);
            }
            double now = worstSpillover(asMeasured, asBuilt, layout, measuredTarget, ratio);
            nearerTheLimit = now > 1 && worstSpillover(asMeasured, trimmed, layout, measuredTarget, ratio) < now;
        }
        if (advised && afterTrim > asBuiltPeak && !nearerTheLimit) {
            warnings.add(CommissioningWarning.TRIM_DOES_NOT_HELP);
            advised = false;
        }
        if (!warnings.contains(CommissioningWarning.POOR_FIT)
                && plateTrims.stream().anyMatch(t -> t != null && t.beyondRange())) {
            warnings.add(CommissioningWarning.BEYOND_TRIM_RANGE);
        }
        List<Correction> corrections = new ArrayList<>();
        for (int j = 0; j < designed.size(); j++) {
            PointAbsorber d = designed.get(j);
            AsBuiltSet.Built b = built.absorbers().get(j);
            double designZeta = d.damping() / (2 * d.mass() * d.frequency());
            double targetFrequency = targets.get(j).frequency();
            PlateTrim t = plateTrims.get(j);
            boolean fitGood = !warnings.contains(CommissioningWarning.POOR_FIT);
            corrections.add(new Correction(d.frequency(), targetFrequency, b.frequency() / targetFrequency - 1.0,
                    advised ? massToAdd[j] : 0.0, designZeta,
                    designZeta > 0 ? b.dampingRatio() / designZeta - 1.0 : 0.0,
                    advised && t != null ? OptionalInt.of(t.plates()) : OptionalInt.empty(),
                    plates.isEmpty() ? 0.0 : plates.get(j).map(p -> p.plan().plateMass()).orElse(0.0),
                    fitGood && t != null && t.beyondRange()));
        }
        return new SetCommissioning(built, corrections, warnings, advised, design.peakAfter(), asBuiltPeak,
                advised ? afterTrim : asBuiltPeak, asBuiltPeak > design.peakAfter() * (1 + DesignResult.TOLERANCE_ALLOWANCE));
    }

    /**
     * A trim in whole plates: the nearest whole number to the mass to add, within the plates spare (to
     * add) and fitted (to take off); beyond the range when the plates were short and even the last of
     * them leaves the frequency further from the target than the part tolerance (as {@link TrimCorrection}).
     */
    private record PlateTrim(int plates, double mass, boolean beyondRange) {
        static PlateTrim of(Plates p, double mass, double frequency, double target, double massToAdd) {
            TrimPlan plan = p.plan();
            int wanted = (int) Math.round(massToAdd / plan.plateMass());
            int spare = plan.platesTotal() - plan.platesFitted();
            int n = Math.max(-plan.platesFitted(), Math.min(spare, wanted));
            double added = n * plan.plateMass();
            // omega = sqrt(k / m) at the spring rate as built: the frequency with n plates more
            double after = frequency * Math.sqrt(mass / (mass + added)) / target - 1.0;
            return new PlateTrim(n, added, n != wanted && Math.abs(after) > p.frequencyTolerance());
        }
    }

    /** The masses the fit holds: the design's, or each as weighed (within a factor of 2 of its design's). */
    private static List<PointAbsorber> held(List<PointAbsorber> designed, List<Double> weighed) {
        if (weighed.isEmpty()) {
            return designed;
        }
        if (weighed.size() != designed.size()) {
            throw new InvalidInputException("absorber masses as weighed", weighed.size() + " values",
                    designed.size() + " masses, one per absorber in the design's order, or none for the design's");
        }
        List<PointAbsorber> held = new ArrayList<>();
        for (int j = 0; j < designed.size(); j++) {
            PointAbsorber d = designed.get(j);
            double m = Checks.positive("absorber " + (j + 1) + " mass as weighed", weighed.get(j));
            if (m > WEIGHED_FACTOR * d.mass() || m < d.mass() / WEIGHED_FACTOR) {
                throw new InvalidInputException("absorber " + (j + 1) + " mass as weighed", Checks.show(m) + " kg",
                        "within half to twice the design's " + Checks.show(d.mass()) + " kg (a different absorber"
                                + " needs a new design)");
            }
            // weighed with its plates, on its spring and damper as built: the design's frequency and damping
            // ratio start the fit, its mass is the scale's
            held.add(PointAbsorber.tuned(d.point(), m, d.frequency(), d.damping() / (2 * d.mass() * d.frequency())));
        }
        return held;
    }

    /**
     * Absorbers of equal mass are told apart by nothing but their frequencies: the fitted ones are put
     * in the order of the design's frequencies (the lowest fitted with the lowest designed).
     */
    private static AsBuiltSet pairedByFrequency(AsBuiltSet fitted, List<PointAbsorber> designed) {
        List<AsBuiltSet.Built> b = fitted.absorbers();
        double m = b.get(0).mass();
        if (b.stream().anyMatch(x -> Math.abs(x.mass() - m) > 1e-9 * m)) {
            return fitted;
        }
        List<AsBuiltSet.Built> byFrequency = new ArrayList<>(b);
        byFrequency.sort(Comparator.comparingDouble(AsBuiltSet.Built::frequency));
        List<Integer> designOrder = new ArrayList<>();
        for (int j = 0; j < designed.size(); j++) {
            designOrder.add(j);
        }
        designOrder.sort(Comparator.comparingDouble(j -> designed.get(j).frequency()));
        AsBuiltSet.Built[] paired = new AsBuiltSet.Built[b.size()];
        for (int rank = 0; rank < b.size(); rank++) {
            paired[designOrder.get(rank)] = byFrequency.get(rank);
        }
        return new AsBuiltSet(List.of(paired), fitted.targetMode(), fitted.targetModeFrequency(),
                fitted.targetModeFrequencySd(), fitted.normalisedResidual(), fitted.lines(), fitted.warnings());
    }

    private static double peak(ModalStructure structure, List<PointAbsorber> absorbers, AbsorberLayout layout,
            FrequencyBand band) {
        return ModalPeak.over(ModalSystem.of(structure, absorbers), layout.excitationPoint(), layout.responsePoint(),
                band.low(), band.high());
    }

    /**
     * @return the largest, over every mode but the target, of the peak near it with these absorbers
     *     over the limit there (the ratio times its peak without them): above 1 where the limit is broken
     */
    private static double worstSpillover(ModalStructure structure, List<PointAbsorber> absorbers, AbsorberLayout layout,
            double targetFrequency, double ratio) {
        int target = -1;
        for (int i = 0; i < structure.size(); i++) {
            if (structure.modes().get(i).naturalFrequency() == targetFrequency) {
                target = i;
            }
        }
        double worst = 0;
        Spillover spillover = Spillover.of(ModalSystem.of(structure, absorbers), layout.excitationPoint(),
                layout.responsePoint());
        for (Spillover.ModePeak p : spillover.modes()) {
            Optional<Double> limit = SeveralAbsorbers.SpilloverLimit.near(p.mode(), p.before(), target, ratio);
            if (limit.isPresent()) {
                worst = Math.max(worst, p.after() / limit.get());
            }
        }
        return worst;
    }
}
