package org.counterpoise.core.design;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.function.DoubleFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.optim.ActiveConstraint;
import org.counterpoise.core.optim.HInfinityOptimiser;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.robust.Mistuning;
import org.counterpoise.core.robust.RobustCriterion;
import org.counterpoise.core.robust.RobustLimits;
import org.counterpoise.core.robust.RobustOptimiser;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.tuning.ClosedForm;

/**
 * The choice of tuning for the robust methods ({@link DesignMethod#robust()}): the least worst
 * case over the tolerance ranges, or the least 95th percentile over the tolerances
 * ({@link RobustMeasures}), for a given mass or the lightest absorber that meets a target, with the
 * design's constraints (fixed tuning ratio, fixed damping ratio, the stroke limit on the nominal
 * design's run-up stroke, see {@link RobustLimits}). Orchestration only: the search is
 * {@link RobustOptimiser}.
 */
final class RobustChoice {
    /** Relative accuracy of the lightest mass ratio that meets a target. */
    static final double MASS_RATIO_ACCURACY = 1e-6;

    private RobustChoice() {
    }

    /**
     * @param study a study with a robust method
     * @param mu the mass ratio
     * @param warnings where a warning goes
     * @param active where the active constraint goes (the stroke limit, when the run-up stroke sits on it)
     * @return the robust tuning, with the ranges or distributions named in its note
     */
    static ClosedForm forMassRatio(DesignStudy study, double mu, List<Warning> warnings, ActiveConstraint[] active) {
        RobustOptimiser.Minimum best = minimum(study, mu);
        return closedForm(study, best, warnings, active, "");
    }

    /**
     * The lightest absorber whose robust criterion meets the target ({@link #lightest}).
     *
     * @param study a study with a robust method
     * @param sizing the target and the largest mass ratio
     * @param warnings where a warning goes
     * @param active where the active constraint goes
     * @return the robust tuning
     */
    static ClosedForm lightestForTarget(DesignStudy study, AbsorberSizing.ByTarget sizing, List<Warning> warnings,
            ActiveConstraint[] active) {
        Lightest found = lightest(x -> minimum(study, x), sizing.target(), sizing.maxMassRatio());
        if (!found.met()) {
            warnings.add(Warning.of(WarningKind.TARGET_NOT_MET, sizing.maxMassRatio()));
            return closedForm(study, found.minimum(), warnings, active, "target not met; ");
        }
        return closedForm(study, found.minimum(), warnings, active, "lightest absorber that meets the target; ");
    }

    /**
     * The outcome of the search for the lightest sufficient absorber.
     *
     * @param minimum the optimum at the mass ratio found (at the largest when none meets the target)
     * @param met true when it meets the target
     * @param lightestConsidered true when even the lightest absorber considered meets it
     */
    record Lightest(RobustOptimiser.Minimum minimum, boolean met, boolean lightestConsidered) {
    }

    /**
     * The lightest absorber whose optimum meets a target: the optimum's value falls as the mass
     * ratio grows (checked in the tests), so the mass ratio is found by Brent's root finder on
     * ln(value / target), to {@value #MASS_RATIO_ACCURACY} relative, on the sufficient side; the
     * lightest considered is min(0.001, largest / 10).
     *
     * @param search the optimum for a mass ratio
     * @param target the largest allowed value, in the optimum's units
     * @param max the largest mass ratio considered
     * @return the lightest sufficient optimum, or the one at the largest mass ratio
     */
    static Lightest lightest(DoubleFunction<RobustOptimiser.Minimum> search, double target, double max) {
        // Brent's last trial is usually the mass ratio it returns: each optimum is found once
        Map<Double, RobustOptimiser.Minimum> found = new HashMap<>();
        DoubleFunction<RobustOptimiser.Minimum> optimumAt = mu -> found.computeIfAbsent(mu, search::apply);
        RobustOptimiser.Minimum atMax = optimumAt.apply(max);
        if (!(atMax.value() <= target)) {
            return new Lightest(atMax, false, false);
        }
        double lowest = Math.min(1e-3, max / 10);
        RobustOptimiser.Minimum atLowest = optimumAt.apply(lowest);
        if (atLowest.value() <= target) {
            return new Lightest(atLowest, true, true);
        }
        double mu;
        try {
            mu = new BrentSolver(MASS_RATIO_ACCURACY, 1e-12).solve(200,
                    x -> Math.log(optimumAt.apply(x).value() / target), lowest, max);
        } catch (MathIllegalStateException | MathIllegalArgumentException noRoot) {
            mu = max; // the largest mass ratio meets the target: keep it
        }
        RobustOptimiser.Minimum at = optimumAt.apply(mu);
        // Brent returns a point within its tolerance on either side; step to the sufficient side
        for (int step = 0; step < 8 && at.value() > target && mu < max; step++) {
            mu = Math.min(max, mu * (1 + MASS_RATIO_ACCURACY));
            at = optimumAt.apply(mu);
        }
        if (at.value() > target) {
            at = atMax;
        }
        return new Lightest(at, true, false);
    }

    /**
     * @param study a study with a robust method
     * @param mu the mass ratio
     * @return the robust optimum for that mass ratio
     */
    static RobustOptimiser.Minimum minimum(DesignStudy study, double mu) {
        return minimum(study, mu, RobustMeasures.mistuning(study), criterion(study));
    }

    /**
     * @param study a study (its constraints and the seeds' response)
     * @param mu the mass ratio
     * @param model what a build is judged by
     * @param criterion what is minimised over the builds
     * @return the optimum for that mass ratio with the damping at or above the practical floor
     */
    static RobustOptimiser.Minimum minimum(DesignStudy study, double mu, Mistuning model, RobustCriterion criterion) {
        // A free optimum below the damping any damper gives (typically a notch at one speed) is a
        // design nobody can build: the search keeps the damping at or above that floor
        return RobustOptimiser.minimiseAboveFloor(model, mu, criterion, seeds(study, mu), limits(study),
                Designer.PRACTICAL_DAMPING_RATIO, ProgressListener.NONE);
    }

    /**
     * @param study a study with a robust method
     * @param t its robust tuning
     * @return true when the damping ratio was held at the practical floor (not given by the designer)
     */
    private static boolean onDampingFloor(DesignStudy study, Tuning t) {
        return study.constraints().fixedDampingRatio().isEmpty()
                && t.dampingRatio() == Designer.PRACTICAL_DAMPING_RATIO;
    }

    static RobustCriterion criterion(DesignStudy study) {
        return study.method() == DesignMethod.ROBUST_P95 ? RobustMeasures.percentileCriterion(study)
                : RobustMeasures.worstCaseCriterion(study);
    }

    /** The exact nominal optimum (with the fixed ratios, without the stroke limit) and the classical design. */
    private static List<Tuning> seeds(DesignStudy study, double mu) {
        DesignConstraints c = study.constraints();
        DesignStudy free = new DesignStudy(study.name(), study.structure(), study.excitation(), study.response(),
                AbsorberSizing.ofMassRatio(mu), study.method(), study.hangsVertically(), study.strokeMargin(),
                new DesignConstraints(OptionalDouble.empty(), c.fixedDampingRatio(), c.fixedTuningRatio()),
                study.robustness());
        // the nominal optimum is only a seed here (the robust design is never worse than it), so an
        // uncertified one is still a useful start
        Tuning nominal = HInfinityOptimiser.optimise(Designer.peakProblem(free, mu)).tuning();
        return RobustnessAnalysis.seeds(nominal);
    }

    private static RobustLimits limits(DesignStudy study) {
        DesignConstraints c = study.constraints();
        return new RobustLimits(c.fixedTuningRatio(), c.fixedDampingRatio(), c.strokeLimit());
    }

    private static ClosedForm closedForm(DesignStudy study, RobustOptimiser.Minimum best, List<Warning> warnings,
            ActiveConstraint[] active, String sizing) {
        return closedFormNoted(study, best, warnings, active, sizing + note(study));
    }

    /**
     * @param study the study
     * @param best the optimum found
     * @param warnings where a warning goes
     * @param active where the active constraint goes
     * @param note the method note
     * @return the design, checked against the stroke limit
     */
    static ClosedForm closedFormNoted(DesignStudy study, RobustOptimiser.Minimum best, List<Warning> warnings,
            ActiveConstraint[] active, String note) {
        DesignConstraints c = study.constraints();
        double stroke = c.strokeLimit().isPresent() ? runUpStroke(study, best.tuning()) : 0;
        if (c.strokeLimit().isPresent() && stroke > c.strokeLimit().getAsDouble() * (1 + 1e-9)) {
            throw new InvalidInputException("absorber.stroke_limit", Checks.show(c.strokeLimit().getAsDouble()),
                    "cannot be met: no tuning and damping keeps the run-up stroke within it; allow a larger stroke,"
                            + " a heavier absorber, or free the damping");
        }
        if (!best.converged()) {
            warnings.add(Warning.of(WarningKind.OPTIMUM_NOT_VERIFIED));
        }
        // the limit holds the design back when the search ended on it (the search's accuracy)
        active[0] = c.strokeLimit().isPresent() && stroke >= c.strokeLimit().getAsDouble() * (1 - 1e-4)
                ? ActiveConstraint.STROKE_LIMIT
                : onDampingFloor(study, best.tuning()) ? ActiveConstraint.PRACTICAL_DAMPING_FLOOR : ActiveConstraint.NONE;
        return new ClosedForm(best.tuning(), Designer.EXACT_SOURCE, note);
    }

    private static double runUpStroke(DesignStudy study, Tuning t) {
        return new SystemResponse(study.structure(), t, study.excitation().kind(),
                study.excitation().amplitude()).peakBetween(ResponseKind.STROKE, 0.0,
                        study.excitation().band().high()).value();
    }

    /** Names the ranges or distributions the criterion used. */
    static String note(DesignStudy study) {
        ToleranceRanges r = study.robustness().ranges();
        String ranges = String.format(Locale.ROOT, "the structure's frequency within +/-%.3g %%, the absorber's within"
                + " +/-%.3g %% and its damping within +/-%.3g %%", 100 * r.structure(), 100 * r.absorber(),
                100 * r.damping());
        if (study.method() != DesignMethod.ROBUST_P95) {
            return "least worst case with " + ranges;
        }
        return RobustMeasures.sample(study).fromDistributions()
                ? String.format(Locale.ROOT, "least 95th percentile over %d builds drawn from the tolerances (seed %d)",
                        RobustMeasures.PERCENTILE_SAMPLES, study.robustness().seed())
                : String.format(Locale.ROOT, "least 95th percentile over %d builds drawn uniformly with %s (seed %d)",
                        RobustMeasures.PERCENTILE_SAMPLES, ranges, study.robustness().seed());
    }
}
