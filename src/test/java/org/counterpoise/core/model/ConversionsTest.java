package org.counterpoise.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.junit.jupiter.api.Test;

/** Input conversions: each the usual relation of the trade (common practice unless a source is named). */
class ConversionsTest {

    @Test
    void staticDeflectionGivesNaturalFrequencySqrtGOverDelta() {
        // f = sqrt(g/delta) / (2 pi) (common practice): 10 mm sag -> 4.984 Hz.
        double k = StructureConversions.stiffnessFromStaticDeflection(500, 0.010);
        Structure s = Structure.of(500, k, 0);
        assertEquals(Math.sqrt(9.80665 / 0.010) / (2 * Math.PI), s.naturalFrequency() / (2 * Math.PI), 1e-12);
        assertEquals(4.984, s.naturalFrequency() / (2 * Math.PI), 5e-4);
    }

    @Test
    void weightMassStiffnessAndFrequencyConvertBothWays() {
        assertEquals(1000.0, StructureConversions.massFromWeight(9806.65), 1e-12);
        double w = 2 * Math.PI * 12;
        double k = StructureConversions.stiffnessFromFrequency(300, w);
        assertEquals(300 * w * w, k, 1e-9);
        assertEquals(300, StructureConversions.massFromFrequency(k, w), 1e-12);
    }

    @Test
    void dampingMeasuresConvertToTheRatio() {
        // Light-damping equivalences (common practice): eta = 2 zeta, Q = 1/(2 zeta), df = 2 zeta fn.
        assertEquals(0.02, DampingConversions.fromLossFactor(0.04), 1e-15);
        assertEquals(0.02, DampingConversions.fromQualityFactor(25), 1e-15);
        assertEquals(0.02, DampingConversions.fromHalfPowerBandwidth(0.4, 10), 1e-15);
    }

    @Test
    void modeShapeScalesEffectiveMassAndStiffnessButNotFrequency() {
        Structure s = new Structure(1000, 4e6, 0.01, 0.5);
        assertEquals(4000, s.effectiveMass(), 1e-9);
        assertEquals(1.6e7, s.effectiveStiffness(), 1e-3);
        assertEquals(Math.sqrt(4000.0), s.naturalFrequency(), 1e-12);
    }

    @Test
    void rotorSpeedTimesHarmonicOrderGivesTheForcingBand() {
        // Blade-pass: 6 blades at 1200 rpm force at 120 Hz.
        FrequencyBand b = FrequencyBand.ofRotor(Unit.REV_PER_MINUTE.toSi(1200), Unit.REV_PER_MINUTE.toSi(1200), 6);
        assertEquals(120.0, Unit.HERTZ.fromSi(b.low()), 1e-12);
    }

    @Test
    void unitsRoundTripAndKnowTheirSpellings() {
        for (Unit u : Unit.values()) {
            assertEquals(3.7, u.fromSi(u.toSi(3.7)), 1e-12, u.name());
            assertEquals(u, Unit.find(u.symbol(), u.dimension()).orElseThrow(), u.name());
        }
        assertEquals(Unit.NEWTON_SECOND_PER_METRE, Unit.find("Ns/m", Dimension.DAMPING_COEFFICIENT).orElseThrow());
        assertEquals(Unit.REV_PER_MINUTE, Unit.find("RPM", Dimension.FREQUENCY).orElseThrow());
        assertEquals(Unit.MICROMETRE, Unit.find("µm", Dimension.LENGTH).orElseThrow());
        assertEquals(Unit.METRE_PER_SECOND_SQUARED, Unit.find("m/s2", Dimension.ACCELERATION).orElseThrow());
        assertTrue(Unit.find("kg", Dimension.LENGTH).isEmpty());
    }

    @Test
    void badValuesNameTheFieldTheValueAndTheRange() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Structure.of(-3, 1e6, 0));
        assertEquals("structure.mass", e.field());
        assertEquals("structure.mass: -3 is not allowed; must be a finite number greater than 0", e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> Structure.of(10, Double.NaN, 0));
        assertEquals("structure.stiffness: not a number is not allowed; must be a finite number greater than 0",
                e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> new Tuning(0, 1, 0.1));
        assertEquals("absorber.mass_ratio", e.field());
        e = assertThrows(InvalidInputException.class, () -> new FrequencyBand(20, 10));
        assertTrue(e.getMessage().contains("must not be below the low end"));
        e = assertThrows(InvalidInputException.class, () -> DampingConversions.fromQualityFactor(0.1));
        assertEquals("structure.damping.q_factor", e.field());
    }

    @Test
    void everyFormConvertsBackToWhereItCameFrom() {
        // The wizard converts a value when its form changes; each inverse must undo its forward relation.
        assertEquals(9806.65, StructureConversions.weightFromMass(1000), 1e-9);
        double w = 2 * Math.PI * 14.2;
        assertEquals(w, StructureConversions.naturalFrequency(1800, StructureConversions.stiffnessFromFrequency(1800, w)),
                1e-12 * w);
        // 10 mm sag <-> 4.984 Hz (common practice, as above), both ways.
        assertEquals(0.010, StructureConversions.staticDeflection(StructureConversions.frequencyFromStaticDeflection(0.010)),
                1e-15);
        assertEquals(4.984, StructureConversions.frequencyFromStaticDeflection(0.010) / (2 * Math.PI), 5e-4);
        assertEquals(0.04, DampingConversions.lossFactor(0.02), 1e-15);
        assertEquals(25, DampingConversions.qualityFactor(0.02), 1e-12);
        assertEquals(0.4, DampingConversions.halfPowerBandwidth(0.02, 10), 1e-15);
        assertTrue(Double.isNaN(DampingConversions.qualityFactor(0)), "Q of an undamped mode is unbounded");
        assertTrue(Double.isNaN(StructureConversions.naturalFrequency(0, 1e6)));
        assertTrue(Double.isNaN(StructureConversions.staticDeflection(0)));
    }
}
