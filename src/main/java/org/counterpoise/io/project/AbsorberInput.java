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
 */
public record AbsorberInput(double massRatio, QuantityInput mass, DesignMethod method, ResponseKind response,
        boolean hangsVertically, double strokeMargin) {
}
