package org.counterpoise.core.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.optim.AbsorberSetDesign;
import org.counterpoise.core.optim.AbsorberSetOptimiser;
import org.counterpoise.core.optim.AbsorberSetOptimum;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.optim.RobustSetOptimiser;
import org.counterpoise.core.optim.RobustSetOptimum;
import org.counterpoise.core.optim.RobustSetProblem;
import org.counterpoise.core.optim.SetSurroundings;
import org.counterpoise.core.optim.SpilloverLimitedOptimiser;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.ToleratedMistuning;
import org.counterpoise.core.robust.WorstCase;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.ModalPeak;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.system.Spillover;

/**
 * Designs several absorbers on a structure of one or several modes (orchestration only):
 * <ol>
 *   <li>the target mode (named, or the one nearest the band) sets the units: its natural frequency
 *       omega_r and its modal mass as seen at the absorbers' point, m_r / phi_r(a)^2, with mu = total
 *       mass / (m_r / phi_r(a)^2) and the band in ratios g = omega / omega_r;</li>
 *   <li>one absorber: the study's own design (any method) on that mode alone; n absorbers: the exact
 *       least peak of n absorbers of equal mass over the band ({@link AbsorberSetOptimiser}: uniform
 *       spread or individual tuning), or with the method {@code robust-worst-case} the least worst
 *       peak over the project's structure and absorber frequency ranges ({@link RobustSetOptimiser},
 *       damping ratios at least {@link Designer#PRACTICAL_DAMPING_RATIO}; the one absorber compared is
 *       then designed the same way). For a structure of several modes the peak they minimise is the
 *       WHOLE structure's, every mode with the force and the response at their own points
 *       ({@link SetSurroundings}; since 5 Dec 2026: on the gallery-floor preset 0.02765 mm against
 *       0.03519 mm for the set designed on the target mode alone); for one mode it is that mode's, as
 *       before. The non-dimensional tunings go back to SI as omega_j = f_j omega_r, k_j = m_j omega_j^2,
 *       c_j = 2 zeta_j m_j omega_j;</li>
 *   <li>the absorbers are put on the whole structure ({@link ModalSystem}) and its exact response is
 *       taken: the peak over the band at the response point before and after ({@link ModalPeak}),
 *       each mode's peak near its own frequency (spillover, {@link Spillover}) and, for n &gt; 1, the
 *       same with the least-peak single absorber of the same total mass (the gain of the split).</li>
 * </ol>
 * One absorber per mode on two modes ({@link AbsorberLayout#joint}) is designed jointly instead
 * ({@link JointAbsorbersDesigner}). The absorbers are designed for force to displacement over a band;
 * other excitations or responses are refused with a plain message.
 */
public final class SeveralAbsorbersDesigner {
    private SeveralAbsorbersDesigner() {
    }

    /**
     * @param design the study's design on the target mode (its structure is that mode at the absorbers'
     *     point; its absorber's mass is the total)
     * @param layout the structure of several modes, its points, the number and tuning of the absorbers
     * @return the absorbers and the whole structure's response
     */
    public static SeveralAbsorbers design(DesignResult design, AbsorberLayout layout) {
        DesignStudy study = design.study();
        Excitation excitation = study.excitation();
        if (excitation.kind() != ExcitationKind.FORCE || study.response() != ResponseKind.DISPLACEMENT) {
            throw new InvalidInputException("absorbers", "with " + excitation.kind().name().toLowerCase(Locale.ROOT)
                    + " and " + study.response().name().toLowerCase(Locale.ROOT),
                    "several absorbers and several modes are designed for a force (disturbance.kind force) and"
                            + " the displacement (absorber.response displacement)");
        }
        if (layout.joint().isPresent()) {
            return JointAbsorbersDesigner.design(design, layout);
        }
        FrequencyBand band = excitation.band();
        int r = layout.target(band);
        Mode mode = layout.structure().modes().get(r);
        double wr = mode.naturalFrequency();
        double effectiveMass = layout.effectiveMass(band);
        Absorber total = design.absorber();
        List<PointAbsorber> absorbers;
        Optional<PointAbsorber> single = Optional.empty();
        List<PointAbsorber> leastPeakSet = List.of();
        boolean certified = true;
        Optional<SeveralAbsorbers.SpilloverLimit> limit = Optional.empty();
        if (layout.spilloverLimit().isPresent()) {
            refuseSpilloverLimit(layout, study);
        }
        if (layout.count() == 1) {
            absorbers = List.of(new PointAbsorber(layout.absorberPoint(), total.mass(), total.stiffness(), total.damping()));
            if (layout.structure().size() > 1 && !band.isSingle()) {
                // the project's absorber is designed on the target mode alone (by its method); for comparison,
                // one absorber of the same mass designed for the least peak over the band on the whole structure
                AbsorberSetProblem whole = onStructure(new AbsorberSetProblem(1, total.mass() / effectiveMass,
                        mode.dampingRatio(), band.low() / wr, band.high() / wr, AbsorberSetTuning.UNIFORM), layout,
                        layout.structure(), r);
                single = Optional.of(inSi(AbsorberSetOptimiser.optimise(whole).design(), effectiveMass, wr,
                        layout.absorberPoint()).get(0));
            }
        } else {
            if (band.isSingle()) {
                throw new InvalidInputException("absorbers.count", Integer.toString(layout.count()),
                        "1 for one forcing frequency: several absorbers share a band (disturbance.band)");
            }
            AbsorberSetProblem problem = onStructure(new AbsorberSetProblem(layout.count(), total.mass() / effectiveMass,
                    mode.dampingRatio(), band.low() / wr, band.high() / wr, layout.tuning()), layout,
                    layout.structure(), r);
            AbsorberSetProblem oneProblem = problem.withAbsorbers(1, problem.massRatio(), AbsorberSetTuning.UNIFORM);
            if (study.method() == DesignMethod.ROBUST_WORST_CASE) {
                ToleranceRanges ranges = study.robustness().ranges();
                RobustSetOptimum set = RobustSetOptimiser.optimise(robust(problem, ranges));
                absorbers = inSi(set.design(), effectiveMass, wr, layout.absorberPoint());
                leastPeakSet = inSi(set.leastPeak().design(), effectiveMass, wr, layout.absorberPoint());
                certified = set.certified();
                RobustSetOptimum one = RobustSetOptimiser.optimise(robust(oneProblem, ranges));
                single = Optional.of(inSi(one.design(), effectiveMass, wr, layout.absorberPoint()).get(0));
            } else if (layout.spilloverLimit().isPresent()) {
                double ratio = layout.spilloverLimit().getAsDouble();
                List<SpilloverLimitedOptimiser.Window> windows = spilloverWindows(layout, layout.structure(), r, ratio);
                SpilloverLimitedOptimiser.Result set = SpilloverLimitedOptimiser.optimise(problem, windows);
                absorbers = inSi(set.design(), effectiveMass, wr, layout.absorberPoint());
                certified = set.met() && set.certificate() != null && set.certificate().certified();
                SpilloverLimitedOptimiser.Result one = SpilloverLimitedOptimiser.optimise(oneProblem, windows);
                single = Optional.of(inSi(one.design(), effectiveMass, wr, layout.absorberPoint()).get(0));
                double stiffness = effectiveMass * wr * wr;
                limit = Optional.of(new SeveralAbsorbers.SpilloverLimit(ratio,
                        excitation.amplitude() * set.unlimited().peak() / stiffness, set.limited(), set.met(), one.met()));
            } else {
                AbsorberSetOptimum set = AbsorberSetOptimiser.optimise(problem);
                absorbers = inSi(set.design(), effectiveMass, wr, layout.absorberPoint());
                certified = set.certificate().certified();
                AbsorberSetOptimum one = AbsorberSetOptimiser.optimise(oneProblem);
                single = Optional.of(inSi(one.design(), effectiveMass, wr, layout.absorberPoint()).get(0));
            }
        }
        double force = excitation.amplitude();
        ModalSystem after = ModalSystem.of(layout.structure(), absorbers);
        List<SeveralAbsorbers.ModePeak> modes = new ArrayList<>();
        for (Spillover.ModePeak p : Spillover.of(after, layout.excitationPoint(), layout.responsePoint()).modes()) {
            modes.add(new SeveralAbsorbers.ModePeak(p.mode(), force * p.before(), force * p.after()));
        }
        double bare = force * peak(after.bare(), layout, band);
        Optional<SeveralAbsorbers.SingleAbsorber> compared = single.map(a -> new SeveralAbsorbers.SingleAbsorber(a,
                force * peak(ModalSystem.of(layout.structure(), List.of(a)), layout, band),
                structureTolerance(layout, r, List.of(a), band, force, bare)));
        double peakAfter = force * peak(after, layout, band);
        MistuningRange tolerance = structureTolerance(layout, r, absorbers, band, force, bare);
        Optional<SeveralAbsorbers.RobustSet> robust = Optional.empty();
        if (!leastPeakSet.isEmpty()) {
            ToleranceRanges ranges = study.robustness().ranges();
            SeveralAbsorbers.SingleAbsorber one = compared.orElseThrow();
            robust = Optional.of(new SeveralAbsorbers.RobustSet(ranges.structure(), ranges.absorber(),
                    Designer.PRACTICAL_DAMPING_RATIO,
                    new SeveralAbsorbers.Figures(peakAfter, worstPeak(layout, r, absorbers, band, force, ranges), tolerance),
                    figures(layout, r, leastPeakSet, band, force, bare, ranges),
                    new SeveralAbsorbers.Figures(one.peak(), worstPeak(layout, r, List.of(one.absorber()), band, force,
                            ranges), one.structureTolerance())));
        }
        return new SeveralAbsorbers(layout, r, effectiveMass, band, force, absorbers, bare, peakAfter, modes, compared,
                certified, tolerance, robust, Optional.empty(), limit);
    }

    /** A spillover limit is taken by the least-peak design of 2 to 8 absorbers on a structure of several modes. */
    private static void refuseSpilloverLimit(AbsorberLayout layout, DesignStudy study) {
        String field = "absorbers.spillover_limit";
        String given = Checks.show(layout.spilloverLimit().getAsDouble());
        if (layout.structure().size() == 1) {
            throw new InvalidInputException(field, given, "a structure of several modes (a limit keeps the peak near"
                    + " the other modes), or leave it out");
        }
        if (layout.count() == 1) {
            throw new InvalidInputException(field, given + " with one absorber", "2 to " + AbsorberSetProblem.MAX_COUNT
                    + " absorbers (absorbers.count), or leave it out: one absorber is the project's own design");
        }
        if (study.method() == DesignMethod.ROBUST_WORST_CASE) {
            throw new InvalidInputException(field, given + " with the method robust-worst-case", "another method (the"
                    + " set is then the least peak with the limit kept), or leave it out: the robust design of a set does"
                    + " not take a spillover limit yet");
        }
    }

    /**
     * Where the peak is limited, in the set problem's units (frequency over omega_r, receptance times
     * k_r = (m_r / phi_r(a)^2) omega_r^2): the neighbourhood of every mode but the target, as
     * {@link Spillover} takes it, at the ratio times that mode's peak there without absorbers (a mode
     * unbounded without absorbers, undamped, is given no limit).
     */
    private static List<SpilloverLimitedOptimiser.Window> spilloverWindows(AbsorberLayout layout,
            ModalStructure structure, int target, double ratio) {
        Mode mode = structure.modes().get(target);
        double wr = mode.naturalFrequency();
        double stiffness = mode.massSeenAt(layout.absorberPoint()) * wr * wr;
        ModalSystem bare = ModalSystem.of(structure, List.of());
        List<SpilloverLimitedOptimiser.Window> windows = new ArrayList<>();
        for (Spillover.ModePeak p : Spillover.of(bare, layout.excitationPoint(), layout.responsePoint()).modes()) {
            SeveralAbsorbers.SpilloverLimit.near(p.mode(), p.before(), target, ratio).ifPresent(limit -> windows.add(
                    new SpilloverLimitedOptimiser.Window(p.low() / wr, p.high() / wr, limit * stiffness)));
        }
        return windows;
    }

    /** The robust problem of the set on the target mode: the project's two frequency ranges, the practical damping floor. */
    private static RobustSetProblem robust(AbsorberSetProblem problem, ToleranceRanges ranges) {
        return new RobustSetProblem(problem, ranges.structure(), ranges.absorber(), Designer.PRACTICAL_DAMPING_RATIO);
    }

    private static SeveralAbsorbers.Figures figures(AbsorberLayout layout, int mode, List<PointAbsorber> absorbers,
            FrequencyBand band, double force, double bare, ToleranceRanges ranges) {
        return new SeveralAbsorbers.Figures(force * peak(ModalSystem.of(layout.structure(), absorbers), layout, band),
                worstPeak(layout, mode, absorbers, band, force, ranges),
                structureTolerance(layout, mode, absorbers, band, force, bare));
    }

    /**
     * The worst peak over the band of the whole structure with the target mode's natural frequency
     * anywhere in its range (stiffness by the square; mass, damping and shape kept) and every
     * absorber's natural frequency off by one common factor in its range (spring rates by the
     * square, masses and dampers kept): the search of {@link WorstCase#over}.
     */
    private static double worstPeak(AbsorberLayout layout, int mode, List<PointAbsorber> absorbers, FrequencyBand band,
            double force, ToleranceRanges ranges) {
        double wr = layout.structure().modes().get(mode).naturalFrequency();
        return WorstCase.over((s, a) -> {
            List<PointAbsorber> built = new ArrayList<>();
            for (PointAbsorber b : absorbers) {
                built.add(a == 1.0 ? b : new PointAbsorber(b.point(), b.mass(), b.stiffness() * a * a, b.damping()));
            }
            return force * peak(ModalSystem.of(s == 1.0 ? layout.structure()
                    : layout.structure().withFrequency(mode, s * wr), built), layout, band);
        }, ranges.structure(), ranges.absorber()).peak();
    }

    /**
     * How far the target mode's natural frequency may be off (its stiffness by the square; mass,
     * damping and shape kept; the other modes as they are) before the peak over the band rises by
     * the allowance: the same search as a single design's ({@link ToleratedMistuning}), on the exact
     * peak of the whole structure. Several absorbers spread over a band are chosen for this.
     */
    static MistuningRange structureTolerance(AbsorberLayout layout, int mode, List<PointAbsorber> absorbers,
            FrequencyBand band, double force, double bare) {
        double wr = layout.structure().modes().get(mode).naturalFrequency();
        return ToleratedMistuning.ofPeak(factor -> force * peak(ModalSystem.of(factor == 1.0 ? layout.structure()
                : layout.structure().withFrequency(mode, factor * wr), absorbers), layout, band),
                DesignResult.TOLERANCE_ALLOWANCE, DesignResult.TOLERANCE_SEARCH, bare);
    }

    /**
     * The absorbers the same set would be if designed for the structure as measured, its target mode
     * at another natural frequency (its modal mass, damping and shape kept): what each absorber as
     * built should be trimmed to. Several absorbers are designed again for the same band, masses and
     * tuning rule (the band, not the mode, sets their tunings: on the gallery floor a mode 3 % low
     * moves them by 0.4 %, where scaling them with the mode would move them 3 % and raise the peak);
     * one absorber keeps the design's tuning ratio, as the single absorber's site check does.
     *
     * @param set the absorbers as designed
     * @param targetModeFrequency the target mode's natural frequency as measured, rad/s
     * @return the absorbers as they should be, in the set's order
     */
    public static List<PointAbsorber> retuned(SeveralAbsorbers set, double targetModeFrequency) {
        if (set.layout().joint().isPresent()) {
            throw new InvalidInputException("absorbers.arrangement", "\"one-per-mode\"", "absorbers all on one"
                    + " mode: the absorbers of one per mode are not yet designed again for a measured structure");
        }
        double wr = set.layout().structure().modes().get(set.targetMode()).naturalFrequency();
        List<PointAbsorber> designed = set.absorbers();
        if (targetModeFrequency == wr) {
            return designed;
        }
        if (designed.size() == 1) {
            PointAbsorber a = designed.get(0);
            double zeta = a.damping() / (2 * a.mass() * a.frequency());
            return List.of(PointAbsorber.tuned(a.point(), a.mass(), a.frequency() * targetModeFrequency / wr, zeta));
        }
        Mode mode = set.layout().structure().modes().get(set.targetMode());
        FrequencyBand band = set.band();
        ModalStructure measured = set.layout().structure().withFrequency(set.targetMode(), targetModeFrequency);
        // the structure keeps its modes in ascending frequency: the target may have passed a neighbour
        int target = measured.modes().indexOf(new Mode(targetModeFrequency, mode.dampingRatio(), mode.modalMass(),
                mode.shape()));
        if (target < 0) {
            throw new IllegalStateException("bug: the measured target mode is not in its structure");
        }
        AbsorberSetProblem problem = onStructure(new AbsorberSetProblem(designed.size(),
                set.totalMass() / set.effectiveMass(), mode.dampingRatio(), band.low() / targetModeFrequency,
                band.high() / targetModeFrequency, set.layout().tuning()), set.layout(), measured, target);
        // a project that limits the spillover keeps its limit, judged on the structure as measured
        AbsorberSetDesign design = set.layout().spilloverLimit().isPresent()
                ? SpilloverLimitedOptimiser.optimise(problem, spilloverWindows(set.layout(), measured, target,
                        set.layout().spilloverLimit().getAsDouble())).design()
                : AbsorberSetOptimiser.optimise(problem).design();
        return inSi(design, set.effectiveMass(), targetModeFrequency, set.layout().absorberPoint());
    }

    /**
     * The set's problem on the whole structure when it has more than one mode (the absorbers then see
     * every mode, and the force and the response at their own points: {@link SetSurroundings}); on the
     * target mode alone otherwise, as before (the same problem exactly).
     */
    private static AbsorberSetProblem onStructure(AbsorberSetProblem problem, AbsorberLayout layout,
            ModalStructure structure, int target) {
        if (structure.size() == 1) {
            return problem;
        }
        return problem.on(SetSurroundings.scaled(structure, target, layout.absorberPoint(), layout.excitationPoint(),
                layout.responsePoint()));
    }

    private static double peak(ModalSystem system, AbsorberLayout layout, FrequencyBand band) {
        return ModalPeak.over(system, layout.excitationPoint(), layout.responsePoint(), band.low(), band.high());
    }

    /** mu_j, f_j, zeta_j on a mode (omega_r, effective mass) to SI absorbers. */
    private static List<PointAbsorber> inSi(AbsorberSetDesign d, double effectiveMass, double wr, String point) {
        List<PointAbsorber> out = new ArrayList<>();
        for (int j = 0; j < d.count(); j++) {
            out.add(PointAbsorber.tuned(point, d.massRatios().get(j) * effectiveMass, d.tuningRatios().get(j) * wr,
                    d.dampingRatios().get(j)));
        }
        return out;
    }
}
