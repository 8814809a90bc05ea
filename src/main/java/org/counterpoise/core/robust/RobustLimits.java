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
 */
public record RobustLimits(OptionalDouble fixedTuningRatio, OptionalDouble fixedDampingRatio,
        OptionalDouble runUpStrokeLimit) {

    /** Nothing fixed, no stroke limit. */
    public static final RobustLimits NONE = new RobustLimits(OptionalDouble.empty(), OptionalDouble.empty(),
            OptionalDouble.empty());

    /**
     * @param t a tuning
     * @return the same with the fixed tuning and damping ratios put in
     */
    Tuning apply(Tuning t) {
        return new Tuning(t.massRatio(), fixedTuningRatio.orElse(t.tuningRatio()),
                fixedDampingRatio.orElse(t.dampingRatio()));
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
