package org.counterpoise.core.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.robust.ToleratedMistuning;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.system.AbsorberPeak;
import org.counterpoise.core.system.ModalPeak;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;

/**
 * Each absorber of a set as a workshop builds it (the sheet's "absorbers to build"):
 * <ul>
 *   <li>its own single design ({@link Designer#ofTuning}): the absorber of its own mass, tuning and
 *       damping on the target mode at the absorbers' point, or with one absorber per mode on its own
 *       mode at its own point ({@link #ownMode}); its parts are sized with the same realisation code
 *       as any design, with the strokes, forces and clearance it has WITHIN THE SET
 *       on the whole structure ({@link AbsorberPeak}: its stroke in the band and from rest to the
 *       top of the band, its spring's, damper's and total force in the band). Its figures alone on
 *       the mode would misstate them: in a set each absorber works at its own part of the band and
 *       the others change the motion of the point; also the largest velocity across its damper within
 *       the set. A transient run-up stroke (a project with a run-up rate) stays the absorber's alone:
 *       the set's run-up is not integrated, and the clearance holds it too;</li>
 *   <li>its tolerance within the set: the factors on that absorber's own frequency, the others held,
 *       at which the set's peak over the band at the response point of the whole structure rises by
 *       {@link DesignResult#TOLERANCE_ALLOWANCE} (its spring rate off, its damper kept, as
 *       {@link ToleratedMistuning#ofAbsorber} does for one absorber), searched to
 *       {@link DesignResult#TOLERANCE_SEARCH} each side on the exact peak ({@link ModalPeak}).
 *       This tolerance, not the one of the absorber alone, is the one its parts must hold.</li>
 * </ul>
 *
 * @param set the several absorbers and the whole structure's response
 * @param absorbers each absorber to build, in the set's order
 */
public record AbsorbersToBuild(SeveralAbsorbers set, List<Built> absorbers) {

    /**
     * What the set was tuned for, in words (the source of each absorber's tuning, and the sheet's).
     *
     * @param set the set
     * @return "the least peak over the band", or for a robust set the least worst peak over its ranges
     */
    public static String goal(SeveralAbsorbers set) {
        String structure = set.joint().isPresent() ? "each absorber's mode's frequency within +/-%.3g %% on its own"
                : "the structure's frequency within +/-%.3g %%";
        return set.robust().map(r -> String.format(Locale.ROOT, "the least worst peak over the band with "
                + structure + "%s", 100 * r.structureRange(), r.absorberRange() > 0
                        ? String.format(Locale.ROOT, " and every absorber's within +/-%.3g %% together",
                                100 * r.absorberRange()) : "")).orElse("the least peak over the band");
    }

    /** Copies the list. */
    public AbsorbersToBuild {
        absorbers = List.copyOf(absorbers);
    }

    /**
     * One absorber of the set.
     *
     * @param absorber its mass, spring and damper at its point
     * @param design its own design: this absorber alone on the target mode (or its own mode), with the tolerance within
     *     the set as its absorber tolerance (what its parts are sized from)
     * @param toleranceInSet the tolerated factors on its own frequency within the set
     * @param damperVelocity the largest relative velocity across its damper within the set, over the band
     *     and from rest to the top of the band, m/s (+infinity when unbounded)
     */
    public record Built(PointAbsorber absorber, DesignResult design, MistuningRange toleranceInSet,
            double damperVelocity) {
    }

    /**
     * @param design the study's design on the target mode (its structure is that mode at the absorbers'
     *     point)
     * @param set the several absorbers designed for the same study
     * @return every absorber to build with its own design and tolerance within the set
     */
    public static AbsorbersToBuild of(DesignResult design, SeveralAbsorbers set) {
        DesignStudy targetStudy = design.study().withCriterion(Optional.empty());
        List<Built> out = new ArrayList<>();
        for (int j = 0; j < set.absorbers().size(); j++) {
            PointAbsorber a = set.absorbers().get(j);
            DesignStudy study = ownMode(set.layout(), j).map(targetStudy::withStructure).orElse(targetStudy);
            Structure structure = study.structure();
            MistuningRange tolerance = toleranceInSet(set, j);
            double w = a.frequency();
            // mu_j = m_j / (effective mass of the mode at the point), f_j = omega_j / omega_r,
            // zeta_j = c_j / (2 m_j omega_j): the absorber's own figures on the single-mode structure
            Tuning tuning = new Tuning(a.mass() / structure.effectiveMass(), w / structure.naturalFrequency(),
                    a.damping() / (2 * a.mass() * w));
            DesignResult own = inSet(Designer.ofTuning(study, tuning, "tuned with the other absorbers of its set for "
                    + goal(set) + " (docs/several-modes.md)",
                    "absorber " + (j + 1) + " of " + set.absorbers().size()), set, j, tolerance);
            out.add(new Built(a, own, tolerance, damperVelocity(set, j)));
        }
        return new AbsorbersToBuild(set, out);
    }

    /**
     * @param layout the set's layout
     * @param j an absorber
     * @return with one absorber per mode, absorber j's own mode as seen at its own point (effective mass
     *     m_r / phi_r(p)^2, the mode's frequency and damping: the single-mode reduction of {@link Structure}),
     *     so that its own design, tuning ratio and procedure refer to the mode it is tuned to; empty when
     *     every absorber sits on the target mode
     */
    static Optional<Structure> ownMode(AbsorberLayout layout, int j) {
        return layout.joint().map(joint -> layout.seenAt(joint.modes().get(j), joint.points().get(j)));
    }

    /**
     * @param set the absorbers
     * @param j the absorber mistuned
     * @return the factors on absorber j's own frequency (k_j by the factor squared, c_j kept) within
     *     which the set's peak over the band rises at most by the allowance
     */
    static MistuningRange toleranceInSet(SeveralAbsorbers set, int j) {
        AbsorberLayout layout = set.layout();
        double force = set.forceAmplitude();
        return ToleratedMistuning.ofPeak(factor -> force * ModalPeak.over(ModalSystem.of(layout.structure(),
                mistuned(set.absorbers(), j, factor)), layout.excitationPoint(), layout.responsePoint(),
                set.band().low(), set.band().high()), DesignResult.TOLERANCE_ALLOWANCE,
                DesignResult.TOLERANCE_SEARCH, set.peakBefore());
    }

    /**
     * @param absorbers the set
     * @param j the absorber mistuned
     * @param factor the factor on its own frequency
     * @return the set with absorber j's spring rate times factor squared, its mass and damper kept
     */
    public static List<PointAbsorber> mistuned(List<PointAbsorber> absorbers, int j, double factor) {
        List<PointAbsorber> out = new ArrayList<>(absorbers);
        PointAbsorber a = absorbers.get(j);
        out.set(j, new PointAbsorber(a.point(), a.mass(), a.stiffness() * factor * factor, a.damping()));
        return out;
    }

    /**
     * The absorber's own design with what it has within the set: the set's structure tolerance (so its
     * tuning step keeps its frequency over the range the set holds), its own frequency's tolerance within
     * the set, and its strokes, forces and clearance on the whole structure with the other absorbers.
     */
    private static DesignResult inSet(DesignResult d, SeveralAbsorbers set, int j, MistuningRange tolerance) {
        AbsorberLayout layout = set.layout();
        ModalSystem system = ModalSystem.of(layout.structure(), set.absorbers());
        double low = set.band().low();
        double high = set.band().high();
        ResponsePeak strokeInBand = peak(system, layout, set, j, AbsorberPeak.Quantity.STROKE, low, high);
        ResponsePeak strokeRunUp = peak(system, layout, set, j, AbsorberPeak.Quantity.STROKE, 0.0, high);
        double clearance = d.study().strokeMargin() * (strokeRunUp.unbounded() ? strokeInBand.value()
                : Math.max(strokeRunUp.value(), strokeInBand.value()));
        RunUpStroke runUp = d.runUpStroke().basis() == RunUpStroke.Basis.TRANSIENT ? d.runUpStroke()
                : new RunUpStroke(strokeRunUp, d.runUpStroke().basis());
        if (runUp.basis() == RunUpStroke.Basis.TRANSIENT && !runUp.peak().unbounded()) {
            // the transient run-up stroke is the absorber's alone (the set's run-up is not integrated); the
            // spring and the stroke check use it, so the clearance must hold it too
            clearance = Math.max(clearance, d.study().strokeMargin() * runUp.peak().value());
        }
        return new DesignResult(d.study(), d.methodSource(), d.methodNote(), d.tuning(), d.absorber(),
                d.staticDeflection(), d.responseBefore(), d.responseAfter(), d.motionBefore(), d.motionAfter(),
                strokeInBand, strokeRunUp, clearance,
                peak(system, layout, set, j, AbsorberPeak.Quantity.SPRING_FORCE, low, high),
                peak(system, layout, set, j, AbsorberPeak.Quantity.DAMPER_FORCE, low, high),
                peak(system, layout, set, j, AbsorberPeak.Quantity.ABSORBER_FORCE, low, high),
                d.coupledNaturalFrequencies(), d.stiffnessDetuning(), d.massDetuning(), structureTolerance(set, j),
                tolerance, d.warnings(), d.activeConstraint(), runUp, d.acceptance(), d.afterWorstCase());
    }

    /**
     * The range of its mode's natural frequency the set holds, for absorber j's procedure: the target
     * mode's (the set's) when every absorber is on it; with one absorber per mode, that absorber's own
     * mode's, found by the same search on the whole structure ({@link SeveralAbsorbersDesigner#structureTolerance}).
     */
    private static MistuningRange structureTolerance(SeveralAbsorbers set, int j) {
        return set.layout().joint().map(joint -> SeveralAbsorbersDesigner.structureTolerance(set.layout(),
                joint.modes().get(j), set.absorbers(), set.band(), set.forceAmplitude(), set.peakBefore()))
                .orElse(set.structureTolerance());
    }

    /** The largest relative velocity across absorber j's damper within the set, band and run-up, m/s. */
    private static double damperVelocity(SeveralAbsorbers set, int j) {
        AbsorberLayout layout = set.layout();
        ModalSystem system = ModalSystem.of(layout.structure(), set.absorbers());
        double inBand = peak(system, layout, set, j, AbsorberPeak.Quantity.VELOCITY, set.band().low(),
                set.band().high()).value();
        double fromRest = peak(system, layout, set, j, AbsorberPeak.Quantity.VELOCITY, 0.0, set.band().high()).value();
        return Double.isFinite(fromRest) ? Math.max(inBand, fromRest) : inBand;
    }

    private static ResponsePeak peak(ModalSystem system, AbsorberLayout layout, SeveralAbsorbers set, int j,
            AbsorberPeak.Quantity quantity, double low, double high) {
        AbsorberPeak p = AbsorberPeak.over(system, layout.excitationPoint(), j, quantity, low, high);
        return new ResponsePeak(p.frequency(), p.unbounded() ? Double.POSITIVE_INFINITY : set.forceAmplitude() * p.value());
    }
}
