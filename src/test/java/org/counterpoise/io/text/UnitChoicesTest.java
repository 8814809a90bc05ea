package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.junit.jupiter.api.Test;

/** Every dimension offers its display unit first, only units of that dimension, each once, in both systems. */
class UnitChoicesTest {
    @Test
    void eachListStartsWithTheDisplayUnitAndHoldsOnlyItsDimension() {
        for (UnitSystem system : UnitSystem.values()) {
            for (Dimension d : Dimension.values()) {
                var units = UnitChoices.of(d, system);
                assertEquals(DisplayUnits.of(d, system), units.get(0), d.name());
                assertEquals(units.size(), new HashSet<>(units).size(), d.name());
                for (Unit u : units) {
                    assertEquals(d, u.dimension(), d + " offers " + u);
                }
            }
        }
    }

    @Test
    void everyUnitWithASymbolIsOfferedInEitherSystem() {
        for (UnitSystem system : UnitSystem.values()) {
            for (Unit u : Unit.values()) {
                if (u.dimension() != Dimension.RATIO) {
                    assertTrue(UnitChoices.of(u.dimension(), system).contains(u), u + " cannot be picked in " + system);
                }
            }
        }
    }

    @Test
    void siKeepsTodaysDisplayUnitsAndUsShowsAWorkshopsUnits() {
        assertEquals(List.of(Unit.KILOGRAM, Unit.NEWTON, Unit.MILLIMETRE, Unit.KILONEWTON_PER_METRE,
                Unit.NEWTON_SECOND_PER_METRE, Unit.HERTZ, Unit.MILLIMETRE_PER_SECOND, Unit.METRE_PER_SECOND_SQUARED,
                Unit.GRAM_MILLIMETRE), List.of(Dimension.MASS, Dimension.FORCE, Dimension.LENGTH, Dimension.STIFFNESS,
                Dimension.DAMPING_COEFFICIENT, Dimension.FREQUENCY, Dimension.VELOCITY, Dimension.ACCELERATION,
                Dimension.UNBALANCE).stream().map(DisplayUnits::of).toList());
        assertEquals(List.of("lb", "lbf", "in", "lbf/in", "lbf*s/in", "Hz", "in/s", "g", "oz*in", "ksi"),
                List.of(Dimension.MASS, Dimension.FORCE, Dimension.LENGTH, Dimension.STIFFNESS,
                        Dimension.DAMPING_COEFFICIENT, Dimension.FREQUENCY, Dimension.VELOCITY, Dimension.ACCELERATION,
                        Dimension.UNBALANCE, Dimension.STRESS).stream()
                        .map(d -> DisplayUnits.of(d, UnitSystem.US_CUSTOMARY).symbol()).toList());
    }
}
