package org.counterpoise.io.project;

import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.response.ResponseKind;

/**
 * The designer's choices for the absorber.
 *
 * @param massRatio mass ratio, or NaN when a mass is given
 * @param mass mass budget, or null when a mass ratio is given
 * @param method design method
 * @param response the response to reduce
 * @param hangsVertically true when the spring carries the absorber's weight
 * @param strokeMargin clearance over the computed stroke
 * @param target instead of a mass: the largest allowed peak of the response (lightest absorber
 *     that meets it), or null
 * @param maxMassRatio with a target: the largest mass ratio considered (NaN for the default)
 * @param strokeLimit largest allowed peak stroke in band, or null
 * @param fixedDampingRatio a given absorber damping ratio, or NaN
 * @param fixedTuningRatio a given tuning ratio, or NaN
 */
public record AbsorberInput(double massRatio, QuantityInput mass, DesignMethod method, ResponseKind response,
        boolean hangsVertically, double strokeMargin, QuantityInput target, double maxMassRatio,
        QuantityInput strokeLimit, double fixedDampingRatio, double fixedTuningRatio) {

    /**
     * Choices without constraints or target.
     * @param massRatio mass ratio or NaN
     * @param mass mass or null
     * @param method design method
     * @param response response to reduce
     * @param hangsVertically spring carries the weight
     * @param strokeMargin clearance over the stroke
     */
    public AbsorberInput(double massRatio, QuantityInput mass, DesignMethod method, ResponseKind response,
            boolean hangsVertically, double strokeMargin) {
        this(massRatio, mass, method, response, hangsVertically, strokeMargin, null, Double.NaN, null, Double.NaN,
                Double.NaN);
    }
}
