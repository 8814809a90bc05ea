package org.counterpoise.io.project;

import org.counterpoise.core.units.Unit;

/**
 * A number as the user gave it, with its unit.
 *
 * @param value the number
 * @param unit its unit
 */
public record QuantityInput(double value, Unit unit) {

    /** @return the value in SI */
    public double si() {
        return unit.toSi(value);
    }
}
