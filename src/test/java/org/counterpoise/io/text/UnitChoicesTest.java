package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.junit.jupiter.api.Test;

/** Every dimension offers its display unit first, only units of that dimension, each once. */
class UnitChoicesTest {
    @Test
    void eachListStartsWithTheDisplayUnitAndHoldsOnlyItsDimension() {
        for (Dimension d : Dimension.values()) {
            var units = UnitChoices.of(d);
            assertEquals(DisplayUnits.of(d), units.get(0), d.name());
            assertEquals(units.size(), new HashSet<>(units).size(), d.name());
            for (Unit u : units) {
                assertEquals(d, u.dimension(), d + " offers " + u);
            }
        }
    }

    @Test
    void everyUnitWithASymbolIsOfferedSomewhere() {
        for (Unit u : Unit.values()) {
            if (u.dimension() != Dimension.RATIO) {
                assertTrue(UnitChoices.of(u.dimension()).contains(u), u + " cannot be picked in the wizard");
            }
        }
    }
}
