package org.counterpoise.core.rational;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.TransferFunctions;
import org.counterpoise.testing.DenseSweep;
import org.junit.jupiter.api.Test;

/** The exact peak search against an independent brute force: a dense grid refined by golden section. */
class PeakFinderTest {

    @Test
    void exactPeakAgreesWithDenseGridOnRandomCases() {
        Random random = new Random(7L);
        ResponseKind[] kinds = {ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY, ResponseKind.ACCELERATION,
            ResponseKind.STROKE, ResponseKind.TRANSMITTED_FORCE, ResponseKind.RELATIVE_DISPLACEMENT};
        for (int trial = 0; trial < 300; trial++) {
            Tuning t = new Tuning(0.005 + 0.3 * random.nextDouble(), 0.6 + 0.8 * random.nextDouble(),
                    0.01 + 0.4 * random.nextDouble());
            double zeta1 = random.nextBoolean() ? 0.0 : 0.08 * random.nextDouble();
            ExcitationKind e = random.nextBoolean() ? ExcitationKind.FORCE : ExcitationKind.BASE_DISPLACEMENT;
            ResponseKind r = kinds[random.nextInt(kinds.length)];
            TransferFunction h = TransferFunctions.of(e, r, zeta1, t);
            double lo = random.nextBoolean() ? 0.0 : 2.0 * random.nextDouble();
            double hi = random.nextBoolean() ? 3.0 : lo + 1.5 * random.nextDouble();
            Peak exact = PeakFinder.over(h, lo, hi);
            double brute = bruteForce(h, lo, hi);
            assertEquals(brute, exact.magnitude(), 1e-9 * brute, "trial " + trial + " " + e + " " + r);
            assertEquals(exact.magnitude(), h.magnitude(exact.frequencyRatio()), 1e-9 * exact.magnitude(),
                    "the reported location carries the reported value");
        }
    }

    @Test
    void undampedResonanceInBandIsUnbounded() {
        TransferFunction bare = TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.0, null);
        assertTrue(PeakFinder.over(bare, 0.9, 1.1).unbounded());
        // Below resonance the bare undamped receptance 1/(1 - g^2) is largest at the band's top.
        assertEquals(1.0 / (1.0 - 0.81), PeakFinder.over(bare, 0.5, 0.9).magnitude(), 1e-14);
    }

    @Test
    void singleDegreeOfFreedomPeakIsTheTextbookValue() {
        // Force on a damped single-degree system: max |X|/(F/k) = 1 / (2 zeta sqrt(1 - zeta^2)) at
        // g = sqrt(1 - 2 zeta^2) (common practice; e.g. Thomson, Theory of Vibration, ch. 3).
        double zeta = 0.05;
        Peak p = PeakFinder.overAllFrequencies(
                TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, zeta, null));
        assertEquals(1.0 / (2 * zeta * Math.sqrt(1 - zeta * zeta)), p.magnitude(), 1e-12);
        assertEquals(Math.sqrt(1 - 2 * zeta * zeta), p.frequencyRatio(), 1e-8);
    }

    @Test
    void baseAccelerationToDisplacementIsUnboundedAtZeroFrequency() {
        // Reference table: a base acceleration of fixed amplitude means unbounded base motion as g -> 0.
        TransferFunction h = TransferFunctions.of(ExcitationKind.BASE_ACCELERATION, ResponseKind.DISPLACEMENT, 0.02,
                new Tuning(0.05, 0.95, 0.1));
        assertTrue(PeakFinder.overAllFrequencies(h).unbounded());
        assertTrue(Double.isFinite(PeakFinder.over(h, 0.5, 2).magnitude()));
    }

    static double bruteForce(TransferFunction h, double lo, double hi) {
        return DenseSweep.maximum(h::magnitude, lo, hi, 20000);
    }
}
