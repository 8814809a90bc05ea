package org.counterpoise.core.remedy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.junit.jupiter.api.Test;

/**
 * The detuning rule (docs/glossary.md) on cases with an answer in closed form. An undamped
 * structure of mass m and stiffness k under a force F has the receptance |X| = F / |k - m w^2|
 * (Den Hartog 1956, Mechanical Vibrations, section 2.2, with no damping), infinite at resonance;
 * moved out of the band [wl, wh], its worst response is at the band edge nearer the resonance.
 */
class DetuningRuleTest {
    private static final double M = 1000;
    private static final double K = M * Math.pow(2 * Math.PI * 10, 2);
    private static final double F = 500;
    private static final double WL = 2 * Math.PI * 9;
    private static final double WH = 2 * Math.PI * 11;
    private static final FrequencyBand BAND = new FrequencyBand(WL, WH);

    @Test
    void undampedStructureMovedOutOfTheBandMeetsTheTargetAtTheNearerEdge() {
        Structure s = Structure.of(M, K, 0.0);
        double target = 2e-4;
        DetuningAlternative stiffness = StructureDetuning.search(s, ExcitationKind.FORCE, F, BAND,
                ResponseKind.DISPLACEMENT, target);
        // stiffer: resonance above the band, F / (c k - m wh^2) = target
        assertEquals((F / target + M * WH * WH) / K, stiffness.raiseFactor().orElseThrow(), 1e-11);
        // softer: resonance below the band, F / (m wl^2 - c k) = target
        assertEquals((M * WL * WL - F / target) / K, stiffness.lowerFactor().orElseThrow(), 1e-11);
        DetuningAlternative mass = StructureDetuning.searchMass(s, ExcitationKind.FORCE, F, BAND,
                ResponseKind.DISPLACEMENT, target);
        // lighter: resonance above, F / (k - c m wh^2) = target; heavier: F / (c m wl^2 - k) = target
        assertEquals((K - F / target) / (M * WH * WH), mass.raiseFactor().orElseThrow(), 1e-11);
        assertEquals((F / target + K) / (M * WL * WL), mass.lowerFactor().orElseThrow(), 1e-11);
    }

    @Test
    void aLargeTargetIsMetWithTheResonanceStillInTheBand() {
        // A damped structure (2 %, damper kept): its resonance peak inside the band falls as it is
        // stiffened (F / (c w) at w = sqrt(k/m), c fixed), so a target a little below today's peak
        // is met long before the resonance leaves the band; the earlier search jumped to the band edge.
        Structure s = Structure.of(M, K, 0.02);
        double today = peak(s, 1.0);
        double target = 0.95 * today;
        double stiffer = StructureDetuning.search(s, ExcitationKind.FORCE, F, BAND, ResponseKind.DISPLACEMENT, target)
                .raiseFactor().orElseThrow();
        assertTrue(stiffer < Math.pow(WH / s.naturalFrequency(), 2), "resonance still in the band: " + stiffer);
        assertEquals(target, peak(s, stiffer), 1e-10 * target);
        // and nothing nearer 1 meets it (a sweep of 2001 factors between 1 and the answer)
        for (int i = 0; i < 2000; i++) {
            double c = 1 + (stiffer - 1) * i / 2000.0;
            assertTrue(peak(s, c) > target, "factor " + c);
        }
    }

    @Test
    void aTargetTheStructureAlreadyMeetsNeedsNoChangeAndAnUnreachableOneHasNone() {
        Structure s = Structure.of(M, K, 0.02);
        DetuningAlternative met = StructureDetuning.search(s, ExcitationKind.FORCE, F, BAND, ResponseKind.DISPLACEMENT,
                1.01 * peak(s, 1.0));
        assertEquals(1.0, met.raiseFactor().orElseThrow());
        assertEquals(1.0, met.lowerFactor().orElseThrow());
        // Acceleration under a force tends to F/m far above resonance whatever the stiffness
        // (mass line; common practice): a softer structure never gets below it.
        double massLine = F / M;
        DetuningAlternative below = StructureDetuning.search(s, ExcitationKind.FORCE, F, BAND, ResponseKind.ACCELERATION,
                0.5 * massLine);
        assertTrue(below.lowerFactor().isEmpty());
    }

    private static double peak(Structure s, double stiffnessFactor) {
        return new SystemResponse(s.withStiffnessKeepingDamper(s.modalStiffness() * stiffnessFactor), null,
                ExcitationKind.FORCE, F).peakOver(ResponseKind.DISPLACEMENT, BAND).value();
    }
}
