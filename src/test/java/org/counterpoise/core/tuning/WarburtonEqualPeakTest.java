package org.counterpoise.core.tuning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.TransferFunctions;
import org.junit.jupiter.api.Test;

/** Warburton's fixed-point optima (Warburton 1982, Table I) and the exact identities of the model. */
class WarburtonEqualPeakTest {

    @Test
    void baseAccelerationPairPassesThroughTwoEqualFixedPointsOfThePublishedHeight() {
        // At Warburton's tuning every absorber damping's curve crosses the same two points, of height
        // (1+mu) sqrt(2/mu); two curves of very different damping meet exactly there.
        for (double mu : new double[] {0.02, 0.1, 0.2}) {
            Tuning t = WarburtonEqualPeak.baseAccelerationRelativeDisplacement(mu);
            double height = WarburtonEqualPeak.baseAccelerationRelativeDisplacementHeight(mu);
            int crossings = 0;
            double previous = Double.NaN;
            for (int i = 1; i < 200000; i++) {
                double g = 0.5 + i * 1e-5;
                double d = mag(mu, t.tuningRatio(), 0.01, g) - mag(mu, t.tuningRatio(), 1.0, g);
                if (!Double.isNaN(previous) && (d < 0) != (previous < 0)) {
                    crossings++;
                    assertEquals(height, mag(mu, t.tuningRatio(), 0.5, g), 2e-4 * height);
                }
                previous = d;
            }
            assertEquals(2, crossings);
            double peak = PeakFinder.overAllFrequencies(TransferFunctions.of(ExcitationKind.BASE_ACCELERATION,
                    ResponseKind.RELATIVE_DISPLACEMENT, 0, t)).magnitude();
            assertTrue(peak >= height * (1 - 1e-9) && peak < height * 1.01, "peak " + peak);
        }
    }

    @Test
    void forceAccelerationEqualsUnbalanceDisplacementExactly() {
        // Identity of the model (reference sheet section 2): unbalance-to-displacement equals
        // force-to-acceleration, so one closed form serves both.
        Tuning t = WarburtonEqualPeak.forceAcceleration(0.1);
        for (double g : new double[] {0.3, 0.9, 1.1, 2.5}) {
            double a = TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.ACCELERATION, 0.03, t).magnitude(g);
            double b = TransferFunctions.of(ExcitationKind.UNBALANCE, ResponseKind.DISPLACEMENT, 0.03, t).magnitude(g);
            assertEquals(a, b, 1e-14 * a);
        }
    }

    private static double mag(double mu, double f, double zeta, double g) {
        return TransferFunctions.of(ExcitationKind.BASE_ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT, 0,
                new Tuning(mu, f, zeta)).magnitude(g);
    }
}
