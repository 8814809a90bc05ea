package org.counterpoise.core.response;

import org.counterpoise.core.rational.TransferFunction;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.testing.Quadrature;
import org.junit.jupiter.api.Test;

/** The rms response to white noise against Miles' equation and a direct numerical integral. */
class RandomResponseTest {

    @Test
    void singleDegreeOfFreedomUnderAForceFollowsMilesEquation() {
        // Miles (1954), J. Aeronaut. Sci. 21(11): sigma_x^2 = (pi / 2) f_n Q G0 / k^2, Q = 1 / (2 zeta).
        Structure s = Structure.of(250, 250 * Math.pow(2 * Math.PI * 7.5, 2), 0.03);
        double g0 = 40; // N^2/Hz
        double fn = 7.5;
        double q = 1 / (2 * 0.03);
        double miles = Math.sqrt(Math.PI / 2 * fn * q * g0) / s.modalStiffness();
        double rms = RandomResponse.rms(s, null, ExcitationKind.FORCE, g0, ResponseKind.DISPLACEMENT);
        assertEquals(miles, rms, 1e-12 * miles);
    }

    @Test
    void withAnAbsorberTheRmsEqualsTheIntegralOfTheSpectrumTimesTheGainSquared() {
        // Independent route: sigma^2 = integral over f of |H_SI(2 pi f)|^2 G0 df by quadrature of
        // the non-dimensional |H|^2 (Quadrature), scaled here by hand: H_SI = H / k1 for a force.
        Structure s = Structure.of(1000, 1000 * Math.pow(2 * Math.PI * 3, 2), 0.01);
        Tuning t = new Tuning(0.05, 0.95, 0.12);
        double g0 = 0.5;
        TransferFunction h = TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.01, t);
        // Quadrature.meanSquare = (1/2 pi) integral over all g; the one-sided integral over f is
        // (omega1 / 2 pi) * (1/2) integral over all g = omega1 / 2 * meanSquare.
        double expected = Math.sqrt(g0 * s.naturalFrequency() / 2 * Quadrature.meanSquare(h)) / s.modalStiffness();
        double rms = RandomResponse.rms(s, t, ExcitationKind.FORCE, g0, ResponseKind.DISPLACEMENT);
        assertEquals(expected, rms, 1e-7 * expected);
    }
}
