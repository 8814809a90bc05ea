package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.optim.ActiveConstraint;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.robust.Mistuning;
import org.counterpoise.core.robust.MonteCarlo;
import org.counterpoise.core.robust.Tolerance;
import org.counterpoise.core.robust.ToleranceSet;
import org.counterpoise.core.tuning.DenHartogEqualPeak;
import org.junit.jupiter.api.Test;

/**
 * The robust methods through the designer, on an invented case (1000 kg at 10 Hz, 2 % damping,
 * 100 N over 9 to 11 Hz), checked against independent evaluations: the worst case and percentile
 * of other designs, the tolerance Monte Carlo run, brute-force mass ratios.
 */
class RobustDesignTest {
    private static final double W1 = 2 * Math.PI * 10;
    private static final Structure STRUCTURE = Structure.of(1000, 1000 * W1 * W1, 0.02);
    private static final Excitation BAND = new Excitation(ExcitationKind.FORCE, 100,
            new FrequencyBand(0.9 * W1, 1.1 * W1));

    private static DesignStudy study(DesignMethod method, AbsorberSizing sizing, DesignConstraints constraints,
            RobustnessSettings robustness) {
        return new DesignStudy("robust test", STRUCTURE, BAND, ResponseKind.DISPLACEMENT, sizing, method, false, 1.5,
                constraints, robustness);
    }

    private static DesignStudy study(DesignMethod method, double mu) {
        return study(method, AbsorberSizing.ofMassRatio(mu), DesignConstraints.NONE, RobustnessSettings.DEFAULT);
    }

    @Test
    void robustWorstCaseIsNoWorseThanTheNominalOptimumAndDenHartogAndNamesItsRanges() {
        DesignStudy robust = study(DesignMethod.ROBUST_WORST_CASE, 0.05);
        DesignResult r = Designer.design(robust);
        double worst = RobustMeasures.worstCase(robust, r.tuning()).peak();
        Tuning nominal = Designer.design(study(DesignMethod.EXACT_PEAK, 0.05)).tuning();
        assertTrue(worst <= RobustMeasures.worstCase(robust, nominal).peak());
        assertTrue(worst <= RobustMeasures.worstCase(robust, DenHartogEqualPeak.tuning(0.05)).peak());
        // the default ranges (5 %, 3 %, 20 %, common practice) are named in the note
        assertTrue(r.methodNote().contains("+/-5.00 %") && r.methodNote().contains("+/-3.00 %")
                && r.methodNote().contains("+/-20.0 %"), r.methodNote());
    }

    @Test
    void percentileIsNeverAboveTheWorstCaseAndTheP95DesignHasTheLeastPercentile() {
        DesignStudy p95 = study(DesignMethod.ROBUST_P95, 0.05);
        DesignResult r = Designer.design(p95);
        Tuning worstCaseDesign = Designer.design(study(DesignMethod.ROBUST_WORST_CASE, 0.05)).tuning();
        Tuning nominal = Designer.design(study(DesignMethod.EXACT_PEAK, 0.05)).tuning();
        double least = RobustMeasures.percentile95(p95, r.tuning());
        // the worst-case design is not a seed of the percentile search: an independent competitor
        assertTrue(least <= RobustMeasures.percentile95(p95, worstCaseDesign), "vs robust worst case");
        assertTrue(least <= RobustMeasures.percentile95(p95, nominal), "vs nominal optimum");
        // uniform builds lie inside the ranges, so a percentile never exceeds the worst case
        for (Tuning t : new Tuning[] {r.tuning(), worstCaseDesign, nominal, DenHartogEqualPeak.tuning(0.05),
            new Tuning(0.05, 1.0, 0.02), new Tuning(0.05, 0.9, 0.3)}) {
            assertTrue(RobustMeasures.percentile95(p95, t) <= RobustMeasures.worstCase(p95, t).peak() * (1 + 1e-12),
                    t.toString());
        }
        assertTrue(r.methodNote().contains("2048 builds drawn uniformly"), r.methodNote());
    }

    @Test
    void withToleranceDistributionsThePercentileIsTheMonteCarloPercentileOfTheSameDraws() {
        ToleranceSet spread = new ToleranceSet(Tolerance.uniform(0.03), Tolerance.normal(0.04), Tolerance.uniform(0.01),
                Tolerance.normal(0.03), Tolerance.uniform(0.2));
        RobustnessSettings settings = RobustnessSettings.DEFAULT;
        settings = new RobustnessSettings(settings.ranges(), OptionalDouble.empty(), spread, 2048, 7L);
        DesignStudy s = study(DesignMethod.ROBUST_P95, AbsorberSizing.ofMassRatio(0.05), DesignConstraints.NONE, settings);
        Tuning t = DenHartogEqualPeak.tuning(0.05);
        // independent route: the tolerance Monte Carlo with the same seed and sample count
        double monteCarlo = MonteCarlo.run(new Mistuning(STRUCTURE, BAND, ResponseKind.DISPLACEMENT),
                Absorber.of(STRUCTURE, t), spread, RobustMeasures.PERCENTILE_SAMPLES, 7L, OptionalDouble.empty()).p95();
        assertEquals(monteCarlo, RobustMeasures.percentile95(s, t), 0.0);
        DesignResult r = Designer.design(s);
        assertTrue(RobustMeasures.percentile95(s, r.tuning()) <= monteCarlo);
        assertTrue(r.methodNote().contains("drawn from the tolerances"), r.methodNote());
    }

    @Test
    void targetSizingGivesTheLightestAbsorberWhoseWorstCaseMeetsTheTarget() {
        // the robust optimum's worst case falls as the mass ratio grows (checked here on a scan)
        double previous = Double.POSITIVE_INFINITY;
        for (double mu : new double[] {0.01, 0.02, 0.04, 0.06, 0.1, 0.15, 0.25}) {
            double v = RobustChoice.minimum(study(DesignMethod.ROBUST_WORST_CASE, mu), mu).value();
            assertTrue(v < previous, "mu " + mu);
            previous = v;
        }
        double target = RobustChoice.minimum(study(DesignMethod.ROBUST_WORST_CASE, 0.05), 0.05).value();
        DesignStudy sized = study(DesignMethod.ROBUST_WORST_CASE, AbsorberSizing.ofTarget(target, 0.25),
                DesignConstraints.NONE, RobustnessSettings.DEFAULT);
        DesignResult r = Designer.design(sized);
        double mu = r.tuning().massRatio();
        assertEquals(0.05, mu, 1e-4);
        assertTrue(RobustMeasures.worstCase(sized, r.tuning()).peak() <= target * (1 + 1e-9));
        double lighter = mu * (1 - 1e-4);
        assertTrue(RobustChoice.minimum(study(DesignMethod.ROBUST_WORST_CASE, lighter), lighter).value() > target);
        assertTrue(r.warnings().stream().noneMatch(w -> w.kind() == WarningKind.TARGET_NOT_MET));
        // a target no absorber up to the largest ratio meets: the largest, with the warning
        DesignResult none = Designer.design(study(DesignMethod.ROBUST_WORST_CASE, AbsorberSizing.ofTarget(target / 20,
                0.25), DesignConstraints.NONE, RobustnessSettings.DEFAULT));
        assertEquals(0.25, none.tuning().massRatio(), 0.0);
        assertTrue(none.warnings().stream().anyMatch(w -> w.kind() == WarningKind.TARGET_NOT_MET));
    }

    @Test
    void constraintsHoldForTheRobustMethods() {
        DesignResult free = Designer.design(study(DesignMethod.ROBUST_WORST_CASE, 0.05));
        double runUp = free.strokeRunUp().value();
        double limit = 0.8 * runUp;
        DesignStudy limited = study(DesignMethod.ROBUST_WORST_CASE, AbsorberSizing.ofMassRatio(0.05),
                new DesignConstraints(OptionalDouble.of(limit), OptionalDouble.empty(), OptionalDouble.empty()),
                RobustnessSettings.DEFAULT);
        DesignResult r = Designer.design(limited);
        // the run-up stroke: steady-state stroke over [0, top of the band] (independent evaluation)
        double stroke = new SystemResponse(STRUCTURE, r.tuning(), ExcitationKind.FORCE, 100)
                .peakBetween(ResponseKind.STROKE, 0, BAND.band().high()).value();
        assertTrue(stroke <= limit * (1 + 1e-9), stroke + " > " + limit);
        assertEquals(stroke, r.strokeRunUp().value(), 1e-12 * stroke);
        // the limit is active: it costs worst case, and it sits on the limit
        assertTrue(RobustMeasures.worstCase(limited, r.tuning()).peak()
                >= RobustMeasures.worstCase(limited, free.tuning()).peak());
        assertTrue(stroke >= limit * (1 - 1e-4), stroke + " well inside " + limit);
        assertEquals(ActiveConstraint.STROKE_LIMIT, r.activeConstraint());
        assertEquals(ActiveConstraint.NONE, free.activeConstraint());

        DesignResult fixed = Designer.design(study(DesignMethod.ROBUST_P95, AbsorberSizing.ofMassRatio(0.05),
                new DesignConstraints(OptionalDouble.empty(), OptionalDouble.of(0.08), OptionalDouble.of(0.97)),
                RobustnessSettings.DEFAULT));
        assertEquals(0.97, fixed.tuning().tuningRatio(), 0.0);
        assertEquals(0.08, fixed.tuning().dampingRatio(), 0.0);
        // a limit no tuning meets is refused in plain words, naming the field
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Designer.design(study(
                DesignMethod.ROBUST_WORST_CASE, AbsorberSizing.ofMassRatio(0.05), new DesignConstraints(
                        OptionalDouble.of(runUp * 1e-3), OptionalDouble.empty(), OptionalDouble.empty()),
                RobustnessSettings.DEFAULT)));
        assertEquals("absorber.stroke_limit", e.field());
        // the closed forms still refuse them
        assertThrows(InvalidInputException.class, () -> study(DesignMethod.EQUAL_PEAK, AbsorberSizing.ofTarget(1e-4,
                0.2), DesignConstraints.NONE, RobustnessSettings.DEFAULT));
    }
}
