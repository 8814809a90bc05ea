package org.counterpoise.io.project;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One mode of a structure of several modes, as the user entered it (since format 6).
 *
 * @param name the mode's name, unique in the project (e.g. "bending")
 * @param naturalFrequency undamped natural frequency
 * @param damping its damping in one of the usual measures, or null for undamped
 * @param modalMass modal mass, for the mode-shape values given
 * @param modeShape the mode-shape value at each named point, in the order written
 */
public record ModeInput(String name, QuantityInput naturalFrequency, DampingInput damping, QuantityInput modalMass,
        Map<String, Double> modeShape) {

    /** Keeps the points in the order written. */
    public ModeInput {
        modeShape = Collections.unmodifiableMap(new LinkedHashMap<>(modeShape));
    }
}
