package org.counterpoise.core.commission;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.realisation.PartTolerances;
import org.counterpoise.core.realisation.PartTolerances.ToleranceBasis;
import org.counterpoise.core.realisation.TrimPlan;
import org.junit.jupiter.api.Test;

/**
 * The trim by hand: omega_a = sqrt(k / m), so at a fixed spring the mass that moves omega_b to
 * omega_t is m (omega_b / omega_t)^2 (Den Hartog 1956, Mechanical Vibrations, 4th ed., ch. 1).
 */
class TrimCorrectionTest {
    // 100 kg absorber, plates of 1 kg, 5 fitted and 10 supplied; frequency held to 1 %, damping to 15 %
    static final TrimPlan PLAN = new TrimPlan(60, 70, 1.0, 5, 10, 0.5, 2.0);
    static final PartTolerances TOLERANCES = new PartTolerances(0.01, 0.02, 0.15, 0.01, ToleranceBasis.ROBUST_RANGES);

    static AsBuiltAbsorber built(double absorberFrequency, double damping) {
        return new AsBuiltAbsorber(absorberFrequency, 0.01, damping, 0.001, 100.0, OptionalDouble.empty(), 0.05, 0.01,
                200, List.of());
    }

    @Test
    void aPoorFitGetsNoTrimAdvice() {
        // a fit that misses the data may have the frequency wrong in size and sign: no plates, no damper advice
        AsBuiltAbsorber poor = new AsBuiltAbsorber(1.05 * 95, 0.01, 0.3, 0.001, 100.0, OptionalDouble.empty(), 0.05,
                0.2, 200, List.of(CommissioningWarning.POOR_FIT));
        TrimCorrection t = TrimCorrection.of(poor, 0.95, 0.1, 100, PLAN, TOLERANCES);
        assertTrue(!t.advised());
        assertEquals(0, t.platesToAdd());
        assertEquals(List.of(), t.warnings());
    }

    @Test
    void twoPercentHighTakesFourPlatesOn() {
        // target 0.95 * 100 = 95 rad/s; built at 96.9 = 2 % high: 100 (1.02)^2 - 100 = 4.04 kg, 4 plates
        TrimCorrection t = TrimCorrection.of(built(96.9, 0.1), 0.95, 0.1, 100, PLAN, TOLERANCES);
        assertEquals(95.0, t.targetFrequency(), 1e-12);
        assertEquals(0.02, t.frequencyOff(), 1e-12);
        assertEquals(4, t.platesToAdd());
        // after: 96.9 sqrt(100 / 104) / 95 - 1 = 2.0e-4
        assertEquals(96.9 * Math.sqrt(100.0 / 104.0) / 95 - 1, t.frequencyOffAfter(), 1e-12);
        assertTrue(Math.abs(t.frequencyOffAfter()) < 0.001);
        assertTrue(t.warnings().isEmpty());
    }

    @Test
    void threePercentLowTakesPlatesOffAndSixPercentHighRunsOutOfPlates() {
        // 3 % low: 100 (0.97)^2 - 100 = -5.91 kg: 6 plates off, but only 5 are fitted; all 5 off leave it
        // 0.97 sqrt(100 / 95) - 1 = -0.48 % off, inside the 1 % tolerance: no warning
        TrimCorrection low = TrimCorrection.of(built(0.97 * 95, 0.1), 0.95, 0.1, 100, PLAN, TOLERANCES);
        assertEquals(-5, low.platesToAdd());
        assertEquals(0.97 * Math.sqrt(100.0 / 95.0) - 1, low.frequencyOffAfter(), 1e-12);
        assertEquals(List.of(), low.warnings());
        // 2 % low: -3.96 kg: 4 plates off, inside the range
        assertEquals(-4, TrimCorrection.of(built(0.98 * 95, 0.1), 0.95, 0.1, 100, PLAN, TOLERANCES).platesToAdd());
        // 6 % high: 12.36 kg, 12 plates, 5 spare; with all 5 it is still 1.06 sqrt(100 / 105) - 1 = +3.4 % off
        TrimCorrection high = TrimCorrection.of(built(1.06 * 95, 0.1), 0.95, 0.1, 100, PLAN, TOLERANCES);
        assertEquals(5, high.platesToAdd());
        assertTrue(high.warnings().contains(CommissioningWarning.BEYOND_TRIM_RANGE));
    }

    @Test
    void insideTheToleranceNoPlateIsMovedAndDampingIsJudgedOnItsOwn() {
        TrimCorrection t = TrimCorrection.of(built(1.008 * 95, 0.08), 0.95, 0.1, 100, PLAN, TOLERANCES);
        assertTrue(t.frequencyInTolerance());
        // still trimmed to the nearest plate: 100 (1.008^2 - 1) = 1.606 kg, 2 plates
        assertEquals(2, t.platesToAdd());
        assertEquals(-0.2, t.dampingOff(), 1e-12);
        assertEquals(List.of(CommissioningWarning.DAMPING_OUT_OF_TOLERANCE), t.warnings());
    }
}
