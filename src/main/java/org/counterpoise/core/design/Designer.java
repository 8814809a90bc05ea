package org.counterpoise.core.design;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.counterpoise.core.criteria.Assessor;
import org.counterpoise.core.criteria.MachineSeverity;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.NotFoundException;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.error.WarningParameter.PeakBand;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.remedy.DetuningAlternative;
import org.counterpoise.core.remedy.StructureDetuning;
import org.counterpoise.core.response.TransferFunctions;
import org.counterpoise.core.robust.ToleratedMistuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.optim.ActiveConstraint;
import org.counterpoise.core.optim.HInfinityOptimiser;
import org.counterpoise.core.optim.MinimumMass;
import org.counterpoise.core.optim.PeakOptimum;
import org.counterpoise.core.optim.PeakProblem;
import org.counterpoise.core.optim.VarianceOptimiser;
import org.counterpoise.core.optim.VarianceOptimum;
import org.counterpoise.core.response.ResponseScale;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.tuning.Assumption;
import org.counterpoise.core.tuning.ClosedForm;
import org.counterpoise.core.tuning.ClosedForms;
import org.counterpoise.core.tuning.DenHartogEqualPeak;
import org.counterpoise.core.tuning.UndampedAbsorber;
import org.counterpoise.core.units.Gravity;

/**
 * The one entry point every front end calls: {@link DesignStudy} in, {@link DesignResult} out.
 * It picks the tuning by the chosen method and gathers the responses; the formulas live in
 * {@code core.tuning}, {@code core.response} and {@code core.remedy}.
 */
public final class Designer {
    private static final double HEAVY_MASS_RATIO = 0.25;
    private static final double LIGHT_MASS_RATIO = 0.005;

    /**
     * The least absorber damping ratio a practical damper gives: 0.01 (1 % of critical). Common
     * practice, no source: a damper fitted to an absorber (viscous, eddy-current or elastomer) adds
     * at least about 1 to 2 % of critical damping once its seals, its own friction and the
     * stiffness of its mountings are counted, and an absorber with no damper at all gets a
     * fraction of a percent from its joints and fixings that nobody can specify or hold. The lower
     * end of that span is taken, so the warning fires only where a design clearly asks for less
     * than any damper will give.
     */
    public static final double PRACTICAL_DAMPING_RATIO = 0.01;

    /** The run-up stroke over the in-band stroke above which the design warns (issue 12: twice). */
    static final double RUN_UP_STROKE_RATIO = 2.0;

    private Designer() {
    }

    /**
     * @param study the inputs
     * @return the design and every figure a report shows
     */
    public static DesignResult design(DesignStudy study) {
        List<Warning> warnings = new ArrayList<>();
        // the constraint that holds an exact-peak optimum back, set where the optimum is found
        ActiveConstraint[] active = {ActiveConstraint.NONE};
        ClosedForm chosen = choose(study, warnings, active);
        return built(study, chosen, warnings, active[0]);
    }

    /**
     * The design of a study whose tuning is already chosen elsewhere (one absorber of a set, tuned
     * with the others by {@link SeveralAbsorbersDesigner}), with every figure a single design has:
     * the responses, strokes, forces and tolerated mistuning of that absorber alone on the study's
     * structure, so that its parts are sized by the same realisation code as any design. The
     * study's sizing and method are not used to choose the tuning.
     *
     * @param study the inputs (structure, disturbance, response, clearance margin)
     * @param tuning the absorber's mass ratio, tuning ratio and damping ratio on the study's structure
     * @param source where the tuning comes from
     * @param note what the tuning is
     * @return the design of that absorber alone
     */
    public static DesignResult ofTuning(DesignStudy study, Tuning tuning, String source, String note) {
        return built(study, new ClosedForm(tuning, source, note), new ArrayList<>(), ActiveConstraint.NONE);
    }

    private static DesignResult built(DesignStudy study, ClosedForm chosen, List<Warning> warnings,
            ActiveConstraint active) {
        Structure structure = study.structure();
        Excitation excitation = study.excitation();
        FrequencyBand band = excitation.band();
        Tuning tuning = chosen.tuning();
        double mu = tuning.massRatio();
        Absorber absorber = Absorber.of(structure, tuning);
        if (structure.dampingRatio() > 0 && chosen.assumptions().contains(Assumption.UNDAMPED_STRUCTURE)) {
            warnings.add(Warning.of(WarningKind.DAMPED_STRUCTURE, study.method().id(), structure.dampingRatio()));
        }

        SystemResponse bare = new SystemResponse(structure, null, excitation.kind(), excitation.amplitude());
        SystemResponse fitted = new SystemResponse(structure, tuning, excitation.kind(), excitation.amplitude());
        ResponseKind kind = study.response();
        ResponsePeak before = bare.peakOver(kind, band);
        ResponsePeak after = fitted.peakOver(kind, band);
        Map<ResponseKind, ResponsePeak> motionBefore = new EnumMap<>(ResponseKind.class);
        Map<ResponseKind, ResponsePeak> motionAfter = new EnumMap<>(ResponseKind.class);
        for (ResponseKind motion : DesignResult.MOTIONS) {
            motionBefore.put(motion, bare.peakOver(motion, band));
            motionAfter.put(motion, fitted.peakOver(motion, band));
        }
        ResponsePeak strokeInBand = fitted.peakOver(ResponseKind.STROKE, band);
        ResponsePeak strokeRunUp = fitted.peakBetween(ResponseKind.STROKE, 0.0, band.high());
        double clearance = study.strokeMargin()
                * (strokeRunUp.unbounded() ? strokeInBand.value() : Math.max(strokeRunUp.value(), strokeInBand.value()));

        double omega1 = structure.naturalFrequency();
        double[] split = UndampedAbsorber.naturalFrequencies(mu, tuning.tuningRatio());
        double[] coupled = {split[0] * omega1, split[1] * omega1};

        boolean noTarget = after.unbounded() || after.value() == 0.0;
        DetuningAlternative none = DetuningAlternative.none(after.value());
        DetuningAlternative detuning = noTarget ? none : StructureDetuning.search(structure, excitation.kind(),
                excitation.amplitude(), band, kind, after.value());
        DetuningAlternative massDetuning = noTarget ? none : StructureDetuning.searchMass(structure,
                excitation.kind(), excitation.amplitude(), band, kind, after.value());

        RunUpStroke runUpStroke = RunUpStroke.of(study, tuning, strokeRunUp);
        MistuningRange structureTolerance = ToleratedMistuning.ofStructure(structure, absorber, excitation, kind,
                DesignResult.TOLERANCE_ALLOWANCE, DesignResult.TOLERANCE_SEARCH);
        MistuningRange absorberTolerance = ToleratedMistuning.ofAbsorber(structure, absorber, excitation, kind,
                DesignResult.TOLERANCE_ALLOWANCE, DesignResult.TOLERANCE_SEARCH);
        addWarnings(warnings, study, mu, tuning, before, after, strokeRunUp, coupled);
        addWarnings(warnings, study, new Built(tuning, strokeInBand, runUpStroke, structureTolerance,
                absorberTolerance));
        OptionalDouble sag = study.hangsVertically() ? OptionalDouble.of(
                Gravity.STANDARD / (absorber.naturalFrequency() * absorber.naturalFrequency())) : OptionalDouble.empty();
        return new DesignResult(study, chosen.source(), chosen.note(), tuning, absorber, sag, before, after, motionBefore,
                motionAfter, strokeInBand, strokeRunUp, clearance,
                fitted.peakOver(ResponseKind.SPRING_FORCE, band), fitted.peakOver(ResponseKind.DAMPER_FORCE, band),
                fitted.peakOver(ResponseKind.ABSORBER_FORCE, band), coupled, detuning, massDetuning,
                structureTolerance, absorberTolerance, warnings, active, runUpStroke,
                study.criterion().map(c -> Assessor.of(c, excitation).acceptance(structure, tuning)),
                ToleranceVerdict.worstCase(study, tuning));
    }

    private static ClosedForm choose(DesignStudy study, List<Warning> warnings, ActiveConstraint[] active) {
        try {
            return chooseUnnamed(study, warnings, active);
        } catch (InvalidInputException e) {
            throw e.renamed(PROBLEM_FIELDS.getOrDefault(e.field(), e.field()));
        }
    }

    /** The optimiser's field names, as the project file names them. */
    private static final Map<String, String> PROBLEM_FIELDS = Map.of("response", "absorber.response",
            "band", "disturbance.band", "stroke limit", "absorber.stroke_limit", "mass ratio", "absorber.mass_ratio",
            "fixed tuning ratio", "absorber.fixed_tuning_ratio", "fixed absorber damping ratio",
            "absorber.fixed_damping_ratio", "target", "absorber.target");

    private static ClosedForm chooseUnnamed(DesignStudy study, List<Warning> warnings,
            ActiveConstraint[] active) {
        Excitation excitation = study.excitation();
        Structure structure = study.structure();
        if (study.sizing() instanceof AbsorberSizing.ByTarget target) {
            return study.method().robust() ? RobustChoice.lightestForTarget(study, target, warnings, active)
                    : lightestForTarget(study, target, warnings, active);
        }
        if (study.sizing() instanceof AbsorberSizing.MeetCriterion meet) {
            return CriterionChoice.lightest(study, meet, warnings, active);
        }
        double mu = study.sizing().massRatioOn(structure);
        return switch (study.method()) {
            case EQUAL_PEAK -> ClosedForms.equalPeak(excitation.kind(), study.response(), mu)
                    .orElseThrow(() -> noClosedForm(study));
            case MINIMUM_VARIANCE -> ClosedForms.minimumVariance(excitation.kind(), study.response(), mu)
                    .orElseThrow(() -> noClosedForm(study));
            case UNDAMPED_SINGLE_SPEED -> new ClosedForm(
                    UndampedAbsorber.tuning(mu, excitation.band().centre() / structure.naturalFrequency()),
                    "Frahm (1909), US patent 989958; Den Hartog (1956), Mechanical Vibrations, section 3.2",
                    "tuned to one forcing frequency");
            case EXACT_PEAK -> exactPeak(study, peakProblem(study, mu), warnings, active);
            case ROBUST_WORST_CASE, ROBUST_P95 -> RobustChoice.forMassRatio(study, mu, warnings, active);
            case EXACT_VARIANCE -> {
                VarianceOptimum o = VarianceOptimiser.optimise(PeakProblem.allFrequencies(excitation.kind(),
                        study.response(), mu, structure.dampingRatio()));
                if (!o.converged()) {
                    throw new NotFoundException("certified exact-variance optimum", "the search could not confirm that"
                            + " no other tuning and damping gives a smaller mean square", NOT_FOUND_ADVICE);
                }
                yield new ClosedForm(o.tuning(), EXACT_SOURCE,
                        "exact minimum of the mean square under white noise over all frequencies");
            }
        };
    }

    private static final String NOT_FOUND_ADVICE = "choose another method (equal-peak or robust-worst-case), or change"
            + " the band or the mass ratio slightly";

    static final String EXACT_SOURCE = "exact optimum computed by Counterpoise (docs/optimiser.md),"
            + " checked against Nishihara and Asami (2002), Crandall and Mark (1963) and Warburton (1982)";

    /**
     * The non-dimensional problem of a study; one forcing frequency is treated as all frequencies.
     * @param study the study
     * @param mu the mass ratio
     * @return the problem the exact-peak design solves (public for the hardware realisation, which
     *     optimises other absorber models over the same band)
     */
    public static PeakProblem peakProblem(DesignStudy study, double mu) {
        Structure s = study.structure();
        FrequencyBand band = study.excitation().band();
        double omega1 = s.naturalFrequency();
        DesignConstraints c = study.constraints();
        double[] g = band.isSingle() ? singleSpeedBand(study.excitation().kind(), study.response(), mu,
                s.dampingRatio(), band.low() / omega1) : new double[] {band.low() / omega1, band.high() / omega1};
        PeakProblem p = PeakProblem.free(study.excitation().kind(), study.response(), mu, s.dampingRatio(), g[0],
                g[1]);
        if (c.fixedDampingRatio().isPresent()) {
            p = p.withFixedDamping(c.fixedDampingRatio().getAsDouble());
        }
        if (c.fixedTuningRatio().isPresent()) {
            p = p.withFixedTuning(c.fixedTuningRatio().getAsDouble());
        }
        if (c.strokeLimit().isPresent()) {
            // the limit holds during run-up, from standstill to the top of the band (the same
            // range as DesignResult.strokeRunUp), not only in the band
            p = p.withStrokeLimit(c.strokeLimit().getAsDouble() / ResponseScale.referenceLength(s,
                    study.excitation().kind(), study.excitation().amplitude()), band.high() / omega1);
        }
        return p;
    }

    /**
     * The band of frequency ratios a peak design uses for ONE forcing frequency g0: all frequencies
     * (which also covers start-up and mistuning), unless the response has no finite peak there for
     * any absorber (a pole at zero frequency, or a response growing without bound with frequency,
     * such as velocity under unbalance); then the run-up [0, g0], the speeds passed on start-up;
     * and when that too is unbounded, the octave either side of the speed [g0 / 2, 2 g0].
     * Whether a peak is finite does not depend on the absorber's tuning or (positive) damping, so
     * Den Hartog's design decides it.
     */
    static double[] singleSpeedBand(ExcitationKind kind, ResponseKind response, double mu, double zeta1, double g0) {
        Tuning probe = DenHartogEqualPeak.tuning(mu);
        TransferFunction h = TransferFunctions.of(kind, response, zeta1, probe);
        double[][] choices = {{0.0, Double.POSITIVE_INFINITY}, {0.0, g0}, {0.5 * g0, 2 * g0}};
        for (double[] c : choices) {
            if (Double.isFinite(PeakFinder.over(h, c[0], c[1]).magnitude())) {
                return c;
            }
        }
        return choices[2];
    }

    private static ClosedForm exactPeak(DesignStudy study, PeakProblem problem, List<Warning> warnings,
            ActiveConstraint[] active) {
        return exactPeakResult(study, HInfinityOptimiser.optimise(problem), warnings, active);
    }

    static ClosedForm exactPeakResult(DesignStudy study, PeakOptimum o, List<Warning> warnings,
            ActiveConstraint[] active) {
        if (!o.converged()) {
            throw new NotFoundException("certified exact-peak optimum", "the search could not confirm that no other"
                    + " tuning and damping gives a lower peak", NOT_FOUND_ADVICE);
        }
        if (study.excitation().band().isSingle()) {
            PeakProblem used = peakProblem(study, o.tuning().massRatio());
            PeakBand over = used.allFrequencies() ? PeakBand.ALL_FREQUENCIES
                    : used.bandLow() == 0 ? PeakBand.RUN_UP : PeakBand.OCTAVE;
            warnings.add(Warning.of(WarningKind.SINGLE_FREQUENCY_EXACT, over.name()));
        }
        active[0] = o.activeConstraint();
        return new ClosedForm(o.tuning(), EXACT_SOURCE, "maxima equal at the optimum: " + o.activeSet());
    }

    private static ClosedForm lightestForTarget(DesignStudy study, AbsorberSizing.ByTarget sizing,
            List<Warning> warnings, ActiveConstraint[] active) {
        MinimumMass.Result r = lightestExactPeak(study, sizing.target(), sizing.maxMassRatio());
        if (!r.reachable()) {
            warnings.add(Warning.of(WarningKind.TARGET_NOT_MET, sizing.maxMassRatio()));
        }
        ClosedForm exact = exactPeakResult(study, r.optimum(), warnings, active);
        return new ClosedForm(exact.tuning(), exact.source(), (r.reachable() ? "lightest absorber that meets the"
                + " target; " : "target not met; ") + exact.note());
    }

    /**
     * @param study a study (its response, band and constraints)
     * @param target the largest allowed peak of the study's response, SI
     * @param maxMassRatio the largest mass ratio considered
     * @return the lightest exact-peak optimum that meets the target, or the one at the largest ratio
     */
    static MinimumMass.Result lightestExactPeak(DesignStudy study, double target, double maxMassRatio) {
        Structure s = study.structure();
        Excitation e = study.excitation();
        double scale = ResponseScale.of(s, e.kind(), e.amplitude(), study.response());
        return MinimumMass.find(peakProblem(study, maxMassRatio), target / scale, maxMassRatio);
    }

    private static InvalidInputException noClosedForm(DesignStudy study) {
        return new InvalidInputException("absorber.method", study.method().id(),
                "no published " + study.method().id() + " closed form exists for "
                        + study.excitation().kind().label() + " with response '" + study.response().label()
                        + "'; choose a response it covers (for equal-peak: displacement or transmitted force"
                        + " under force, displacement under base displacement, acceleration or relative"
                        + " displacement under base acceleration, acceleration under force, displacement under"
                        + " unbalance) or another method");
    }

    private static void addWarnings(List<Warning> warnings, DesignStudy study, double mu, Tuning tuning,
            ResponsePeak before, ResponsePeak after, ResponsePeak strokeRunUp, double[] coupled) {
        FrequencyBand band = study.excitation().band();
        if (before.unbounded()) {
            warnings.add(Warning.of(WarningKind.RESONANT_UNDAMPED));
        }
        if (!before.unbounded() && !after.unbounded() && after.value() > before.value()) {
            warnings.add(Warning.of(WarningKind.WORSE_WITH_ABSORBER));
        }
        if (mu > HEAVY_MASS_RATIO) {
            warnings.add(Warning.of(WarningKind.HEAVY_ABSORBER, mu));
        }
        if (mu < LIGHT_MASS_RATIO) {
            warnings.add(Warning.of(WarningKind.LIGHT_ABSORBER, mu));
        }
        if (study.method() != DesignMethod.UNDAMPED_SINGLE_SPEED && band.isSingle()) {
            warnings.add(Warning.of(WarningKind.SINGLE_FREQUENCY));
        }
        if (study.method() == DesignMethod.UNDAMPED_SINGLE_SPEED && !band.isSingle()) {
            warnings.add(Warning.of(WarningKind.UNDAMPED_IN_BAND));
        }
        if (coupled[0] < band.low()) {
            warnings.add(Warning.of(WarningKind.START_UP_RESONANCE, coupled[0], coupled[1]));
        }
        MachineSeverity.supportWarning(study.criterion(), study.structure().naturalFrequency(), band.high())
                .ifPresent(warnings::add);
        if (strokeRunUp.unbounded()) {
            warnings.add(Warning.of(WarningKind.UNBOUNDED_TRANSIT_STROKE));
        }
        if (tuning.dampingRatio() == 0.0 && !band.isSingle()) {
            warnings.add(Warning.of(WarningKind.NO_DAMPING));
        }
    }

    /** What the issue-12 warnings look at: the built design's tuning, strokes and tolerated ranges. */
    private record Built(Tuning tuning, ResponsePeak strokeInBand, RunUpStroke runUp, MistuningRange structure,
            MistuningRange absorber) {
    }

    private static void addWarnings(List<Warning> warnings, DesignStudy study, Built d) {
        ToleranceRanges stated = study.robustness().ranges();
        String method = study.method().id();
        narrower(warnings, WarningKind.STRUCTURE_TOLERANCE_NARROW, d.structure(), stated.structure(), method);
        narrower(warnings, WarningKind.ABSORBER_TOLERANCE_NARROW, d.absorber(), stated.absorber(), method);
        double zeta = d.tuning().dampingRatio();
        if (zeta > 0.0 && zeta < PRACTICAL_DAMPING_RATIO) {
            warnings.add(Warning.of(WarningKind.DAMPING_BELOW_PRACTICAL, zeta, PRACTICAL_DAMPING_RATIO));
        }
        ResponsePeak runUp = d.runUp().peak();
        if (runUp.unbounded()) {
            return; // UNBOUNDED_TRANSIT_STROKE says it
        }
        String basis = d.runUp().basis().name();
        if (!d.strokeInBand().unbounded() && runUp.value() > RUN_UP_STROKE_RATIO * d.strokeInBand().value()) {
            warnings.add(Warning.of(WarningKind.RUN_UP_STROKE_LARGE, runUp.value(), d.strokeInBand().value(), basis));
        }
        study.constraints().strokeLimit().ifPresent(limit -> {
            // an exact-peak design held on the limit sits there to round-off, which is not over it
            if (runUp.value() > limit * (1 + PeakProblem.STROKE_LIMIT_ROUND_OFF)) {
                warnings.add(Warning.of(WarningKind.RUN_UP_OVER_STROKE_LIMIT, runUp.value(), limit, basis));
            }
        });
    }

    /** Warns when a tolerated range (peak rising at most 10 %) ends inside the stated +/- range. */
    private static void narrower(List<Warning> warnings, WarningKind kind, MistuningRange tolerated, double stated,
            String method) {
        if (!tolerated.defined() || stated <= 0.0) {
            return;
        }
        double low = tolerated.low().orElse(1.0 - tolerated.searchLimit()) - 1.0;
        double high = tolerated.high().orElse(1.0 + tolerated.searchLimit()) - 1.0;
        if (low > -stated || high < stated) {
            warnings.add(Warning.of(kind, low, high, stated, method));
        }
    }
}
