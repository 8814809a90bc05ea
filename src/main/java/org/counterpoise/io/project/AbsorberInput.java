package org.counterpoise.io.project;

import java.util.Objects;
import java.util.OptionalDouble;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.response.ResponseKind;

/**
 * The designer's choices for the absorber.
 *
 * @param massRatio mass ratio, empty when a mass or a target is given
 * @param mass mass budget, or null when a mass ratio is given
 * @param method design method
 * @param response the response to reduce
 * @param hangsVertically true when the spring carries the absorber's weight
 * @param strokeMargin clearance over the computed stroke
 * @param target instead of a mass: the largest allowed peak of the response (lightest absorber
 *     that meets it), or null
 * @param maxMassRatio with a target: the largest mass ratio considered (empty for the default)
 * @param strokeLimit largest allowed peak stroke in band, or null
 * @param fixedDampingRatio a given absorber damping ratio, empty when free
 * @param fixedTuningRatio a given tuning ratio, empty when free
 */
public record AbsorberInput(OptionalDouble massRatio, QuantityInput mass, DesignMethod method, ResponseKind response,
        boolean hangsVertically, double strokeMargin, QuantityInput target, OptionalDouble maxMassRatio,
        QuantityInput strokeLimit, OptionalDouble fixedDampingRatio, OptionalDouble fixedTuningRatio) {

    /** Absent optional numbers are empty, never null. */
    public AbsorberInput {
        Objects.requireNonNull(massRatio, "massRatio");
        Objects.requireNonNull(maxMassRatio, "maxMassRatio");
        Objects.requireNonNull(fixedDampingRatio, "fixedDampingRatio");
        Objects.requireNonNull(fixedTuningRatio, "fixedTuningRatio");
    }

    /**
     * Choices without constraints or target.
     * @param massRatio mass ratio, or empty when a mass is given
     * @param mass mass or null
     * @param method design method
     * @param response response to reduce
     * @param hangsVertically spring carries the weight
     * @param strokeMargin clearance over the stroke
     */
    public AbsorberInput(OptionalDouble massRatio, QuantityInput mass, DesignMethod method, ResponseKind response,
            boolean hangsVertically, double strokeMargin) {
        this(massRatio, mass, method, response, hangsVertically, strokeMargin, null, OptionalDouble.empty(), null,
                OptionalDouble.empty(), OptionalDouble.empty());
    }
}
