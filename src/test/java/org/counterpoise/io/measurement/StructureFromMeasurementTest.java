package org.counterpoise.io.measurement;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.StructureInput;
import org.junit.jupiter.api.Test;

/** An identified mode as a project's structure section. */
class StructureFromMeasurementTest {

    @Test
    void valuesAreWrittenToFiveSignificantFigures() {
        IdentifiedMode mode = IdentifiedMode.of(2 * Math.PI * 22.99595644, 0.0198760550519, 4206.74049507);
        StructureInput s = StructureFromMeasurement.structure(mode);
        // rounding by hand to 5 significant figures
        assertEquals(4206.7, s.mass().value(), 0.0);
        assertEquals(Unit.KILOGRAM, s.mass().unit());
        assertEquals(22.996, s.naturalFrequency().value(), 0.0);
        assertEquals(Unit.HERTZ, s.naturalFrequency().unit());
        assertEquals(0.019876, s.damping().value(), 0.0);
        assertEquals(1.0, s.modeShapeAtAbsorber(), 0.0);
    }

    @Test
    void aModeThatCannotBeAStructureIsRefusedInPlainWords() {
        // a negative residue: the point is not a driving point (Ewins 2000, sec. 4.4: driving-point
        // modal constants are positive)
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> StructureFromMeasurement.structure(IdentifiedMode.of(100.0, 0.02, -50.0)));
        assertEquals(-1, e.getMessage().indexOf("Exception"), e.getMessage());
    }
}
