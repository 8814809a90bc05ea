package org.counterpoise.core.design;

import java.util.OptionalDouble;
import org.counterpoise.core.error.Checks;

/**
 * What the designer cannot change: a stroke clearance the absorber must stay within, a given
 * damper (an elastomer, a stock damper) or a given tuning. An empty value means "free".
 *
 * @param strokeLimit largest allowed peak absorber stroke from standstill to the top of the band (the
 *     run-up, steady state) at the design amplitude, m
 * @param fixedDampingRatio the absorber damping ratio zeta_a, held fixed
 * @param fixedTuningRatio the tuning ratio f, held fixed
 */
public record DesignConstraints(OptionalDouble strokeLimit, OptionalDouble fixedDampingRatio,
        OptionalDouble fixedTuningRatio) {

    /** No constraints. */
    public static final DesignConstraints NONE =
            new DesignConstraints(OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty());

    /** Validates the given values. */
    public DesignConstraints {
        Checks.present("absorber.stroke_limit", strokeLimit, "a stroke limit or none");
        Checks.present("absorber.fixed_damping_ratio", fixedDampingRatio, "a damping ratio or none");
        Checks.present("absorber.fixed_tuning_ratio", fixedTuningRatio, "a tuning ratio or none");
        strokeLimit.ifPresent(v -> Checks.positive("absorber.stroke_limit", v));
        fixedDampingRatio.ifPresent(v -> Checks.inRange("absorber.fixed_damping_ratio", v, 0.0, 4.0));
        fixedTuningRatio.ifPresent(v -> Checks.inOpenRange("absorber.fixed_tuning_ratio", v, 0.0, 20.0));
    }

    /** @return true when any constraint is given */
    public boolean any() {
        return strokeLimit.isPresent() || fixedDampingRatio.isPresent() || fixedTuningRatio.isPresent();
    }
}
