package org.counterpoise.core.robust;

import java.util.OptionalDouble;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;

/**
 * What a robust design may not change: a given tuning ratio, a given damping ratio, and a limit on
 * the absorber's stroke during run-up. The stroke limit applies to the NOMINAL design's steady-state
 * stroke over [0, top of the band] (the run-up stroke, the same definition the exact-peak method
 * uses), not to its worst case over the tolerances: the clearance is set on the design as built and
 * measured, and the stroke's own tolerance sensitivity is shown by the robustness study.
 *
 * @param fixedTuningRatio f held fixed, when given
 * @param fixedDampingRatio zeta_a held fixed, when given
 * @param runUpStrokeLimit largest allowed run-up stroke of the nominal design, m, when given
 * @param dampingFloor the least damping ratio a free damping may take (0: none; the search box's own
 *     lower end, 1e-5, still holds)
 */
public record RobustLimits(OptionalDouble fixedTuningRatio, OptionalDouble fixedDampingRatio,
        OptionalDouble runUpStrokeLimit, double dampingFloor) {

    /** Nothing fixed, no stroke limit. */
    public static final RobustLimits NONE = new RobustLimits(OptionalDouble.empty(), OptionalDouble.empty(),
            OptionalDouble.empty());

    /**
     * Limits without a damping floor.
     *
     * @param fixedTuningRatio f held fixed, when given
     * @param fixedDampingRatio zeta_a held fixed, when given
     * @param runUpStrokeLimit largest allowed run-up stroke of the nominal design, m, when given
     */
    public RobustLimits(OptionalDouble fixedTuningRatio, OptionalDouble fixedDampingRatio,
            OptionalDouble runUpStrokeLimit) {
        this(fixedTuningRatio, fixedDampingRatio, runUpStrokeLimit, 0.0);
    }

    /**
     * @param floor the least damping ratio
     * @return the same limits with the damping held at the floor
     */
    public RobustLimits dampingHeldAt(double floor) {
        return new RobustLimits(fixedTuningRatio, OptionalDouble.of(floor), runUpStrokeLimit, 0.0);
    }

    /**
     * @param floor the least damping ratio
     * @return the same limits with the damping free at or above the floor
     */
    public RobustLimits dampingAtLeast(double floor) {
        return new RobustLimits(fixedTuningRatio, fixedDampingRatio, runUpStrokeLimit, floor);
    }

    /**
     * @param t a tuning
     * @return the same with the fixed tuning and damping ratios put in, and the damping raised to the floor
     */
    Tuning apply(Tuning t) {
        return new Tuning(t.massRatio(), fixedTuningRatio.orElse(t.tuningRatio()),
                fixedDampingRatio.orElse(Math.max(dampingFloor, t.dampingRatio())));
    }

    /**
     * @param m the mistuning model (its nominal structure and disturbance)
     * @param t a tuning
     * @return the nominal design's run-up stroke over its limit (at most 1 when allowed; 0 without
     *     a limit)
     */
    double strokeUse(Mistuning m, Tuning t) {
        if (runUpStrokeLimit.isEmpty()) {
            return 0;
        }
        double stroke = new SystemResponse(m.structure(), t, m.excitation().kind(), m.excitation().amplitude())
                .peakBetween(ResponseKind.STROKE, 0.0, m.excitation().band().high()).value();
        return stroke / runUpStrokeLimit.getAsDouble();
    }
}
