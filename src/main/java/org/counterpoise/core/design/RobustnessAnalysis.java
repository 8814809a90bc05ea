package org.counterpoise.core.design;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.robust.Mistuning;
import org.counterpoise.core.robust.MonteCarloOutcome;
import org.counterpoise.core.robust.RobustDesign;
import org.counterpoise.core.robust.RobustOptimiser;
import org.counterpoise.core.robust.RobustLimits;
import org.counterpoise.core.robust.Sensitivity;
import org.counterpoise.core.robust.SensitivityCurve;
import org.counterpoise.core.robust.SensitivityMap;
import org.counterpoise.core.robust.ToleratedMistuning;
import org.counterpoise.core.robust.WorstCase;
import org.counterpoise.core.tuning.DenHartogEqualPeak;

/**
 * Orchestrates the robustness study of a design: no formulas here, see {@code core.robust}. The
 * Monte Carlo is a part of its own ({@link #monteCarlo}), so that a {@link DesignDossier} computes
 * it once for the sheet and the study alike.
 */
public final class RobustnessAnalysis {
    /** Points on each sensitivity curve (odd, so the nominal is on it). */
    public static final int CURVE_POINTS = 61;
    /** Points along each axis of the map. */
    public static final int MAP_POINTS = 31;
    private static final String WHAT = "the robustness study";

    private RobustnessAnalysis() {
    }

    /**
     * @param design the design to examine
     * @param settings ranges, target and tolerances
     * @return sensitivity curves and map, worst case, the robust design and the Monte Carlo
     */
    public static RobustnessResult run(DesignResult design, RobustnessSettings settings) {
        return run(design, settings, monteCarlo(design, settings, ProgressListener.NONE), ProgressListener.NONE);
    }

    /**
     * The tolerance Monte Carlo of a design, run only when the settings give a tolerance.
     * @param design the design to examine
     * @param settings tolerances, samples, seed and target
     * @param listener progress and cancellation
     * @return the run's result, or why it was not run
     */
    public static MonteCarloOutcome monteCarlo(DesignResult design, RobustnessSettings settings,
            ProgressListener listener) {
        return MonteCarloOutcome.of(mistuning(design.study()), design.absorber(), settings.tolerances(),
                settings.samples(), settings.seed(), settings.target(), listener);
    }

    /**
     * @param design the design to examine
     * @param settings ranges, target and tolerances
     * @param monteCarlo the design's Monte Carlo outcome for these settings
     * @param listener progress (the robust design is most of the work) and cancellation
     * @return sensitivity curves and map, worst case, the robust design and the Monte Carlo
     */
    public static RobustnessResult run(DesignResult design, RobustnessSettings settings, MonteCarloOutcome monteCarlo,
            ProgressListener listener) {
        DesignStudy study = design.study();
        Mistuning m = mistuning(study);
        Absorber a = design.absorber();
        double sRange = settings.structureRange();
        double aRange = settings.absorberRange();
        double curveRange = Math.max(Math.max(sRange, aRange), 0.05);
        listener.checkCancelled(WHAT);
        // the damping floor of the robust design methods (RobustChoice): less damping than any damper
        // gives is not offered, unless the design itself has less (an undamped absorber chosen as such)
        double dampingFloor = Math.min(Designer.PRACTICAL_DAMPING_RATIO, design.tuning().dampingRatio());
        RobustDesign robust = RobustOptimiser.optimiseAboveFloor(m, design.tuning().massRatio(), settings.ranges(),
                seeds(design.tuning()), RobustLimits.NONE, dampingFloor, listener.part(0.0, 0.7));
        Absorber robustAbsorber = Absorber.of(study.structure(), robust.tuning());
        listener.checkCancelled(WHAT);
        Optional<MistuningRange> forTarget = settings.target().isPresent()
                ? Optional.of(ToleratedMistuning.ofStructureForTarget(m, a, settings.target().getAsDouble(), 0.5))
                : Optional.empty();
        SensitivityCurve structureCurve = Sensitivity.structure(m, a, curveRange, CURVE_POINTS);
        SensitivityCurve absorberCurve = Sensitivity.absorberFrequency(m, a, curveRange, CURVE_POINTS);
        SensitivityCurve dampingCurve = Sensitivity.absorberDamping(m, a, 0.5, CURVE_POINTS);
        SensitivityCurve robustCurve = Sensitivity.structure(m, robustAbsorber, curveRange, CURVE_POINTS);
        listener.checkCancelled(WHAT);
        listener.progress(0.8);
        SensitivityMap map = Sensitivity.structureByAbsorber(m, a, curveRange, curveRange, MAP_POINTS);
        listener.checkCancelled(WHAT);
        WorstCase.Point worst = WorstCase.of(m, a, settings.ranges());
        listener.progress(1.0);
        return new RobustnessResult(settings, structureCurve, absorberCurve, dampingCurve, robustCurve, map, worst,
                robust, robustAbsorber, forTarget, monteCarlo);
    }

    /** The seeds of a robust search: the given design and the classical one for its mass ratio. */
    static List<Tuning> seeds(Tuning nominal) {
        return List.of(nominal, DenHartogEqualPeak.tuning(nominal.massRatio()));
    }

    private static Mistuning mistuning(DesignStudy study) {
        return new Mistuning(study.structure(), study.excitation(), study.response());
    }
}
