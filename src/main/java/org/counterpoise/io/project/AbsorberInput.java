package org.counterpoise.io.project;

import java.util.Objects;
import java.util.OptionalDouble;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.response.ResponseKind;

/**
 * The designer's choices for the absorber.
 *
 * @param massRatio mass ratio, empty when a mass, a target or {@code meetAcceptance} is given
 * @param mass mass budget, or null when a mass ratio is given
 * @param method design method
 * @param response the response to reduce
 * @param hangsVertically true when the spring carries the absorber's weight
 * @param strokeMargin clearance over the computed stroke
 * @param target instead of a mass: the largest allowed peak of the response (lightest absorber
 *     that meets it), or null. Files of format 3 no longer hold it: a target of an older file is
 *     read as the criterion it means plus {@code meetAcceptance} ({@link Project#withTargetAsAcceptance});
 *     a project edited in memory may still hold one, and is written and designed the same way
 * @param maxMassRatio with a target or {@code meetAcceptance}: the largest mass ratio considered
 *     (empty for the default)
 * @param strokeLimit largest allowed peak stroke in band, or null
 * @param fixedDampingRatio a given absorber damping ratio, empty when free
 * @param fixedTuningRatio a given tuning ratio, empty when free
 * @param meetAcceptance instead of a mass ratio, mass or target: the lightest absorber that meets
 *     the project's acceptance criterion (since format 3)
 */
public record AbsorberInput(OptionalDouble massRatio, QuantityInput mass, DesignMethod method, ResponseKind response,
        boolean hangsVertically, double strokeMargin, QuantityInput target, OptionalDouble maxMassRatio,
        QuantityInput strokeLimit, OptionalDouble fixedDampingRatio, OptionalDouble fixedTuningRatio,
        boolean meetAcceptance) {

    /** Absent optional numbers are empty, never null. */
    public AbsorberInput {
        Objects.requireNonNull(massRatio, "massRatio");
        Objects.requireNonNull(maxMassRatio, "maxMassRatio");
        Objects.requireNonNull(fixedDampingRatio, "fixedDampingRatio");
        Objects.requireNonNull(fixedTuningRatio, "fixedTuningRatio");
    }

    /**
     * Choices sized by a mass ratio, a mass or a target (not to meet the criterion).
     * @param massRatio mass ratio, or empty
     * @param mass mass or null
     * @param method design method
     * @param response response to reduce
     * @param hangsVertically spring carries the weight
     * @param strokeMargin clearance over the stroke
     * @param target the largest allowed peak of the response, or null
     * @param maxMassRatio with a target: the largest mass ratio considered
     * @param strokeLimit largest allowed stroke, or null
     * @param fixedDampingRatio a given absorber damping ratio, or empty
     * @param fixedTuningRatio a given tuning ratio, or empty
     */
    public AbsorberInput(OptionalDouble massRatio, QuantityInput mass, DesignMethod method, ResponseKind response,
            boolean hangsVertically, double strokeMargin, QuantityInput target, OptionalDouble maxMassRatio,
            QuantityInput strokeLimit, OptionalDouble fixedDampingRatio, OptionalDouble fixedTuningRatio) {
        this(massRatio, mass, method, response, hangsVertically, strokeMargin, target, maxMassRatio, strokeLimit,
                fixedDampingRatio, fixedTuningRatio, false);
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

    /**
     * @param other a design method
     * @return these choices with it
     */
    public AbsorberInput withMethod(DesignMethod other) {
        return new AbsorberInput(massRatio, mass, other, response, hangsVertically, strokeMargin, target, maxMassRatio,
                strokeLimit, fixedDampingRatio, fixedTuningRatio, meetAcceptance);
    }

    /**
     * The lightest absorber that meets the project's criterion, up to a largest mass ratio, instead
     * of any other size (mass ratio, mass and target are dropped).
     * @param largestRatio the largest mass ratio considered, empty for the default
     * @return these choices sized so
     */
    public AbsorberInput meetingAcceptance(OptionalDouble largestRatio) {
        return new AbsorberInput(OptionalDouble.empty(), null, method, response, hangsVertically, strokeMargin, null,
                largestRatio, strokeLimit, fixedDampingRatio, fixedTuningRatio, true);
    }
}
