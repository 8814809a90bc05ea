package org.counterpoise.core.tuning;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.junit.jupiter.api.Test;

/** The undamped absorber (Den Hartog 1956, section 3.2). */
class UndampedAbsorberTest {

    @Test
    void tunedToResonanceTheSplitFrequenciesAreThePublishedPair() {
        // f = 1: Omega^2 = 1 + mu/2 -/+ sqrt(mu + mu^2/4) (Den Hartog 1956, eq. 3.10).
        for (double mu : new double[] {0.01, 0.1, 0.2, 0.5}) {
            double[] w = UndampedAbsorber.naturalFrequencies(mu, 1.0);
            assertEquals(1 + mu / 2 - Math.sqrt(mu + mu * mu / 4), w[0] * w[0], 1e-14);
            assertEquals(1 + mu / 2 + Math.sqrt(mu + mu * mu / 4), w[1] * w[1], 1e-14);
        }
        // mu = 0.2 gives natural frequencies 0.80 and 1.25 times the original (Den Hartog 1956,
        // Fig. 3.3, a value of the trade recalled from memory: 0.8 x 1.25 = 1).
        double[] w = UndampedAbsorber.naturalFrequencies(0.2, 1.0);
        assertEquals(0.80, w[0], 0.005);
        assertEquals(1.25, w[1], 0.005);
    }

    @Test
    void atTheTunedSpeedTheStructureStandsStillAndTheAbsorberMovesForceOverK2() {
        Structure s = Structure.of(800, 3.2e6, 0.01);
        double omega = 0.9 * s.naturalFrequency();
        Tuning t = UndampedAbsorber.tuning(0.05, 0.9);
        SystemResponse r = new SystemResponse(s, t, ExcitationKind.FORCE, 500);
        assertEquals(0.0, r.amplitudeAt(ResponseKind.DISPLACEMENT, omega), 1e-15);
        double k2 = Absorber.of(s, t).stiffness();
        // Stroke = X2 - X1 = X2 when X1 = 0; |X2| = F/k2 (Den Hartog 1956, section 3.2).
        assertEquals(500 / k2, r.amplitudeAt(ResponseKind.STROKE, omega), 1e-12 * 500 / k2);
        // And the spring force then balances the applied force exactly.
        assertEquals(500, r.amplitudeAt(ResponseKind.SPRING_FORCE, omega), 1e-9);
    }
}
