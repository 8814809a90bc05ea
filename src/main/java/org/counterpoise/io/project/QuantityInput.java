package org.counterpoise.io.project;

import org.counterpoise.core.units.PhysicalRange;
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

    /**
     * The value in SI, refused when its magnitude lies outside the plausible range of its kind:
     * the same rule the file reader applies, so a value typed in the wizard is judged exactly as
     * the same value read from a file.
     * @param field the field id the user knows
     * @return the value in SI
     */
    public double si(String field) {
        PhysicalRange.of(unit.dimension()).check(field, value, unit);
        return si();
    }
}
