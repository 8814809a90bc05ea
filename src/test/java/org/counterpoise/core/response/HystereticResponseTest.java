package org.counterpoise.core.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.RatioMaximum;
import org.counterpoise.testing.HystereticDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The hysteretic absorber's responses against an independent route: the physical equations of
 * motion with a complex absorber stiffness solved as a 2x2 complex system (Commons Math, {@link
 * HystereticDirectSolve}); its exact peaks against dense sampling refined by golden section; its
 * gradients against central differences.
 */
class HystereticResponseTest {

    @Test
    void everyPairMatchesTheDirectComplexSolve() {
        Random random = new Random(14L);
        double worst = 0;
        for (ExcitationKind e : ExcitationKind.values()) {
            for (ResponseKind r : ResponseKind.values()) {
                for (int trial = 0; trial < 6; trial++) {
                    double zeta1 = trial % 2 == 0 ? 0.0 : 0.1 * random.nextDouble();
                    double mu = 0.01 + 0.4 * random.nextDouble();
                    double f = 0.5 + random.nextDouble();
                    double eta = 0.02 + random.nextDouble();
                    double g = 0.1 + 2.5 * random.nextDouble();
                    HystereticResponse h = HystereticResponse.of(e, r, zeta1, mu);
                    double[] mine = h.value(new HystereticAbsorber(mu, f, eta), g);
                    Complex direct = HystereticDirectSolve.response(e, r, zeta1, mu, f, eta, g);
                    double error = Math.hypot(mine[0] - direct.getReal(), mine[1] - direct.getImaginary()) / direct.abs();
                    worst = Math.max(worst, error);
                    assertTrue(error < 1e-10, e + " " + r + " g " + g + ": " + error);
                    double[][] pq = h.squaredMagnitude(f, eta);
                    double fromPolynomials = Math.sqrt(RatioMaximum.value(pq[0], pq[1], g));
                    assertEquals(direct.abs(), fromPolynomials, 1e-9 * direct.abs(), e + " " + r);
                }
            }
        }
        assertTrue(worst > 0, "the routes are independent, so round-off differs");
    }

    @Test
    void withNoLossItIsTheViscousAbsorberWithNoDamping() {
        // eta = 0 and zeta_a = 0 describe the same undamped absorber: two routes through the algebra
        HystereticResponse h = HystereticResponse.of(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.03, 0.05);
        var viscous = TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.03, new Tuning(0.05, 0.95, 0));
        for (double g = 0.2; g < 2; g += 0.1) {
            assertEquals(viscous.magnitude(g), h.magnitude(new HystereticAbsorber(0.05, 0.95, 0), g),
                    1e-12 * viscous.magnitude(g));
        }
    }

    @Test
    void theExactPeakMatchesDenseSampling() {
        Random random = new Random(7L);
        ExcitationKind[] excitations = ExcitationKind.values();
        ResponseKind[] responses = {ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY, ResponseKind.ACCELERATION,
            ResponseKind.RELATIVE_DISPLACEMENT, ResponseKind.STROKE, ResponseKind.TRANSMITTED_FORCE};
        int checked = 0;
        while (checked < 40) {
            ExcitationKind e = excitations[random.nextInt(excitations.length)];
            ResponseKind r = responses[random.nextInt(responses.length)];
            double zeta1 = random.nextBoolean() ? 0.0 : 0.08 * random.nextDouble();
            double mu = 0.01 + 0.3 * random.nextDouble();
            double f = 0.4 + 1.2 * random.nextDouble();
            double eta = 0.02 + 1.5 * random.nextDouble();
            double low = 0.3 + random.nextDouble();
            double high = low * (1.2 + 2 * random.nextDouble());
            Peak exact = HystereticResponse.of(e, r, zeta1, mu).peak(new HystereticAbsorber(mu, f, eta), low, high);
            double sampled = HystereticDirectSolve.peak(e, r, zeta1, mu, f, eta, low, high, 4000);
            assertEquals(sampled, exact.magnitude(), 1e-9 * sampled, e + " " + r + " [" + low + ", " + high + "]");
            checked++;
        }
    }

    @Test
    void aStiffLossyAbsorberKeepsTheStructuresResonance() {
        // found while measuring: searched in g up to Cauchy's bound (about 1e9), the peak search lost
        // this resonance at g = 0.91 and reported |T(0)| = 1; dense sampling of the direct solve finds it
        double mu = 0.194;
        double zeta1 = 0.059;
        HystereticResponse h = HystereticResponse.of(ExcitationKind.BASE_DISPLACEMENT, ResponseKind.DISPLACEMENT, zeta1, mu);
        Peak exact = h.peak(new HystereticAbsorber(mu, 2.7775, 8), 0, Double.POSITIVE_INFINITY);
        double sampled = HystereticDirectSolve.peak(ExcitationKind.BASE_DISPLACEMENT, ResponseKind.DISPLACEMENT, zeta1,
                mu, 2.7775, 8, 1e-3, 100, 20000);
        assertEquals(sampled, exact.magnitude(), 1e-9 * sampled);
        assertEquals(0.912, exact.frequencyRatio(), 1e-3);
    }

    @Test
    void theGradientMatchesCentralDifferences() {
        HystereticResponse h = HystereticResponse.of(ExcitationKind.BASE_ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT,
                0.02, 0.08);
        double f = 0.93;
        double eta = 0.35;
        for (double g : new double[] {0.0, 0.7, 0.95, 1.1, 2.0}) {
            double[] exact = h.gradient(f, eta, g);
            double step = 1e-6;
            double at = Math.max(g, 1e-7);
            double dLnF = (lnSquared(h, f * Math.exp(step), eta, at) - lnSquared(h, f * Math.exp(-step), eta, at)) / (2 * step);
            double dEta = (lnSquared(h, f, eta + step, at) - lnSquared(h, f, eta - step, at)) / (2 * step);
            assertEquals(dLnF, exact[0], 1e-6 * Math.max(1, Math.abs(dLnF)), "g " + g);
            assertEquals(dEta, exact[1], 1e-6 * Math.max(1, Math.abs(dEta)), "g " + g);
        }
        assertThrows(IllegalArgumentException.class, () -> HystereticResponse.of(ExcitationKind.FORCE,
                ResponseKind.SPRING_FORCE, 0, 0.1).gradient(1, 0.2, 1));
    }

    @Test
    void aBaseAccelerationResponseIsFiniteAtZeroFrequency() {
        // relative displacement under a static base acceleration: the structure's spring carries the
        // two masses, (1 + mu) A / omega1^2, whatever the absorber (statics)
        HystereticResponse h = HystereticResponse.of(ExcitationKind.BASE_ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT,
                0.02, 0.1);
        Peak low = h.peak(new HystereticAbsorber(0.1, 0.9, 0.4), 0.0, 0.0);
        assertEquals(1.1, low.magnitude(), 1e-12);
        // the viscous model's exact peak agrees where the two coincide in kind (the static end)
        assertEquals(PeakFinder.over(TransferFunctions.of(ExcitationKind.BASE_ACCELERATION,
                ResponseKind.RELATIVE_DISPLACEMENT, 0.02, new Tuning(0.1, 0.9, 0.2)), 0, 0).magnitude(), low.magnitude(), 1e-12);
    }

    @Test
    void theModelRefusesANegativeLossFactorWithAPlainMessage() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new HystereticAbsorber(0.05, 1, -0.1));
        assertTrue(e.getMessage().contains("absorber.loss_factor"), e.getMessage());
    }

    private static double lnSquared(HystereticResponse h, double f, double eta, double g) {
        double m = h.magnitude(new HystereticAbsorber(h.massRatio(), f, eta), g);
        return 2 * Math.log(m);
    }
}
