package org.counterpoise.core.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/**
 * The generic vibration criterion curves VC-A to VC-G, one-third-octave band r.m.s. velocity, flat
 * from 1 to 80 Hz (Amick et al. 2005). VC-A = 2000 micro-inch/s, stated 50 um/s, and a factor of
 * two per letter: E. E. Ungar (Acentech, "Virtually vibration-free facility"). The metric rounding
 * below VC-C is from memory (see the enum's javadoc).
 */
class VibrationCriterionCurveTest {

    @Test
    void levelsAsStated() {
        double[] expected = {50e-6, 25e-6, 12.5e-6, 6.25e-6, 3.12e-6, 1.56e-6, 0.78e-6};
        VibrationCriterionCurve[] curves = VibrationCriterionCurve.values();
        assertEquals(expected.length, curves.length);
        for (int i = 0; i < curves.length; i++) {
            assertEquals(expected[i], curves[i].velocity(), 0, curves[i].id());
        }
    }

    @Test
    void eachLetterHalvesTheLevel() {
        VibrationCriterionCurve[] curves = VibrationCriterionCurve.values();
        for (int i = 1; i < curves.length; i++) {
            // exact halving, then rounded to three figures (3.125 -> 3.12 ...)
            assertEquals(0.5, curves[i].velocity() / curves[i - 1].velocity(), 0.002, curves[i].id());
        }
    }

    @Test
    void vcAIsTwoThousandMicroInchesPerSecond() {
        // 2000 micro-inch/s = 50.8 um/s, stated in metric as 50 um/s (within 2 %).
        assertEquals(2000 * 25.4e-9, VibrationCriterionCurve.VC_A.velocity(), 0.02 * 2000 * 25.4e-9);
    }

    @Test
    void flatFromOneToEightyHertz() {
        for (VibrationCriterionCurve c : VibrationCriterionCurve.values()) {
            LimitCurve curve = c.curve();
            assertTrue(curve.isFlat(), c.id());
            assertEquals(1, curve.lowFrequency());
            assertEquals(80, curve.highFrequency());
            for (double f : new double[] {1, 4, 8, 31.5, 80}) {
                assertEquals(c.velocity(), curve.at(f), 0, c.id() + " at " + f + " Hz");
            }
        }
    }

    @Test
    void theEquipmentCriterionJudgesEachOrderInRmsVelocity() {
        EquipmentVibration table = new EquipmentVibration(VibrationCriterionCurve.VC_C);
        assertEquals(ResponseKind.VELOCITY, table.quantity());
        assertEquals(AmplitudeConvention.RMS, table.convention());
        assertEquals(OrderCombination.EACH_ORDER, table.combination());
        assertEquals(12.5e-6, table.limit().at(29.6), 0);
        assertTrue(table.source().contains("Amick"));
    }
}
