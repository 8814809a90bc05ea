package org.counterpoise.core.design;

import java.util.List;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.robust.Mistuning;
import org.counterpoise.core.robust.MonteCarlo;
import org.counterpoise.core.robust.RobustDesign;
import org.counterpoise.core.robust.RobustOptimiser;
import org.counterpoise.core.robust.Sensitivity;
import org.counterpoise.core.robust.ToleratedMistuning;
import org.counterpoise.core.robust.WorstCase;
import org.counterpoise.core.tuning.DenHartogEqualPeak;

/** Orchestrates the robustness study of a design: no formulas here, see {@code core.robust}. */
public final class RobustnessAnalysis {
    /** Points on each sensitivity curve (odd, so the nominal is on it). */
    public static final int CURVE_POINTS = 61;
    /** Points along each axis of the map. */
    public static final int MAP_POINTS = 31;

    private RobustnessAnalysis() {
    }

    /**
     * @param design the design to examine
     * @param settings ranges, target and tolerances
     * @return sensitivity curves and map, worst case, the robust design and the Monte Carlo
     */
    public static RobustnessResult run(DesignResult design, RobustnessSettings settings) {
        DesignStudy study = design.study();
        Mistuning m = new Mistuning(study.structure(), study.excitation(), study.response());
        Absorber a = design.absorber();
        double sRange = settings.structureRange();
        double aRange = settings.absorberRange();
        double curveRange = Math.max(Math.max(sRange, aRange), 0.05);
        RobustDesign robust = robustDesign(m, design.tuning(), sRange, aRange);
        Absorber robustAbsorber = Absorber.of(study.structure(), robust.tuning());
        MistuningRange forTarget = Double.isNaN(settings.target())
                ? new MistuningRange(Double.NaN, Double.NaN, Double.NaN, curveRange, false)
                : ToleratedMistuning.ofStructureForTarget(m, a, settings.target(), 0.5);
        return new RobustnessResult(settings,
                Sensitivity.structure(m, a, curveRange, CURVE_POINTS),
                Sensitivity.absorberFrequency(m, a, curveRange, CURVE_POINTS),
                Sensitivity.absorberDamping(m, a, 0.5, CURVE_POINTS),
                Sensitivity.structure(m, robustAbsorber, curveRange, CURVE_POINTS),
                Sensitivity.structureByAbsorber(m, a, curveRange, curveRange, MAP_POINTS),
                WorstCase.of(m, a, sRange, aRange), robust, robustAbsorber, forTarget,
                MonteCarlo.run(m, a, settings.tolerances(), settings.samples(), settings.seed(), settings.target()));
    }

    /**
     * The robust design for a mass ratio, seeded by the given tuning and the classical design.
     * @param m the mistuning model
     * @param nominal the nominal design's tuning (its mass ratio is used)
     * @param structureRange ds
     * @param absorberRange da
     * @return the robust design
     */
    public static RobustDesign robustDesign(Mistuning m, Tuning nominal, double structureRange, double absorberRange) {
        return RobustOptimiser.optimise(m, nominal.massRatio(), structureRange, absorberRange,
                List.of(nominal, DenHartogEqualPeak.tuning(nominal.massRatio())));
    }
}
