package org.counterpoise.core.design;

import java.util.List;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.optim.ActiveConstraint;
import org.counterpoise.core.optim.MinimumMass;
import org.counterpoise.core.optim.PeakOptimum;
import org.counterpoise.core.response.ResponseScale;
import org.counterpoise.core.robust.RobustCriterion;
import org.counterpoise.core.robust.RobustOptimiser;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.tuning.ClosedForm;

/**
 * The design goal "meet the criterion" ({@link AbsorberSizing.MeetCriterion}): the lightest absorber
 * whose tuning and damping, optimised for the criterion's own measure ({@link CriterionGoal}), meet
 * the study's criterion over the band: as designed for exact-peak, in the worst case over the
 * tolerance ranges for robust-worst-case, in 95 % of the builds for robust-p95. When no mass ratio
 * up to the largest can, the best at the largest and how far it misses
 * ({@link WarningKind#CRITERION_NOT_MET}). When the bare structure already meets it, the lightest
 * absorber considered (which then meets it too) is designed for comparison and
 * {@link WarningKind#NO_ABSORBER_NEEDED} says that none is needed: a report must still show a
 * design, and the engineer sees first that the bare structure passes.
 *
 * <p>The mass ratio is searched as the target sizing searches it (the optimum's utilisation falls as
 * the mass ratio grows): for exact-peak on a criterion that is a fixed multiple of the study's
 * peak response, exactly the target route ({@link MinimumMass}, the certified H-infinity optimum
 * at each ratio); otherwise {@link RobustChoice#lightest} on the exchange search of
 * {@link RobustOptimiser} at each ratio (for exact-peak over no tolerances at all). A criterion
 * judged at one speed is judged at that speed (as the verdict judges it), except that a criterion on
 * the study's peak response by exact-peak follows the exact-peak treatment of one speed (all
 * frequencies, see {@link Designer#singleSpeedBand}).
 */
final class CriterionChoice {

    private CriterionChoice() {
    }

    /**
     * @param study a study with a criterion and the exact-peak or a robust method
     * @param sizing the largest mass ratio
     * @param warnings where a warning goes
     * @param active where the active constraint goes
     * @return the design
     */
    static ClosedForm lightest(DesignStudy study, AbsorberSizing.MeetCriterion sizing, List<Warning> warnings,
            ActiveConstraint[] active) {
        CriterionGoal goal = CriterionGoal.of(study);
        double max = sizing.maxMassRatio();
        if (!study.method().robust() && goal.peakOfStudyResponse()) {
            MinimumMass.Result r = Designer.lightestExactPeak(study, goal.target(), max);
            PeakOptimum o = r.optimum();
            Tuning t = o.tuning();
            // the optimum's own peak (over all frequencies for one speed, as it was designed), SI
            double achieved = o.peak() * ResponseScale.of(study.structure(), study.excitation().kind(),
                    study.excitation().amplitude(), study.response());
            boolean lightestConsidered = r.reachable() && t.massRatio() == lowest(max);
            warn(study, goal, warnings, r.reachable(), lightestConsidered, achieved / goal.target(), t, max);
            ClosedForm exact = Designer.exactPeakResult(study, o, warnings, active);
            return new ClosedForm(t, exact.source(), sizingNote(r.reachable()) + exact.note());
        }
        RobustCriterion criterion = criterionOver(study, goal);
        RobustChoice.Lightest found = RobustChoice.lightest(
                mu -> RobustChoice.minimum(study, mu, goal.model(), criterion), goal.target(), max);
        RobustOptimiser.Minimum best = found.minimum();
        warn(study, goal, warnings, found.met(), found.lightestConsidered(), best.value() / goal.target(),
                best.tuning(), max);
        String note = study.method().robust() ? RobustChoice.note(study)
                : "least value over limit of the criterion, as designed";
        return RobustChoice.closedFormNoted(study, best, warnings, active, sizingNote(found.met()) + note);
    }

    /** The lightest mass ratio the searches consider (as {@link MinimumMass} and {@link RobustChoice#lightest}). */
    static double lowest(double max) {
        return Math.min(1e-3, max / 10);
    }

    /**
     * @param study the study
     * @param goal its criterion as a measure
     * @return what is minimised over the builds: the worst case over the tolerance ranges, the 95th
     *     percentile over the study's builds, or (exact-peak) the nominal value alone
     */
    static RobustCriterion criterionOver(DesignStudy study, CriterionGoal goal) {
        return switch (study.method()) {
            case ROBUST_WORST_CASE -> RobustCriterion.worstCase(goal.model(), study.robustness().ranges());
            case ROBUST_P95 -> RobustCriterion.percentile(goal.model(), RobustMeasures.sample(study),
                    RobustMeasures.PERCENTILE);
            default -> RobustCriterion.worstCase(goal.model(), ToleranceRanges.stated(0, 0, 0));
        };
    }

    private static String sizingNote(boolean met) {
        return met ? "lightest absorber that meets the criterion; " : "criterion not met; ";
    }

    private static void warn(DesignStudy study, CriterionGoal goal, List<Warning> warnings, boolean met,
            boolean lightestConsidered, double utilisation, Tuning t, double max) {
        if (!met) {
            warnings.add(Double.isFinite(utilisation)
                    ? Warning.of(WarningKind.CRITERION_NOT_MET, max, utilisation, study.method().id())
                    : Warning.of(WarningKind.CRITERION_NOT_MET_UNBOUNDED, max));
            return;
        }
        if (lightestConsidered && goal.bare() <= 1) {
            warnings.add(Warning.of(WarningKind.NO_ABSORBER_NEEDED, goal.bare(), t.massRatio()));
        }
    }
}
