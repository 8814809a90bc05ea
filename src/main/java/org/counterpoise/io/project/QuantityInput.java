package org.counterpoise.io.project;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
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

    /**
     * The value in SI, refused (in the unit the user typed) unless it is greater than zero and
     * within the plausible range of its kind.
     * @param field the field id the user knows
     * @return the value in SI
     */
    public double positiveSi(String field) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new InvalidInputException(field, Checks.show(value) + " " + unit.symbol(),
                    "must be a finite number greater than 0");
        }
        return si(field);
    }
}
