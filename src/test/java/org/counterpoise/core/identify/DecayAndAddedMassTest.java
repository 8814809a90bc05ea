package org.counterpoise.core.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.counterpoise.core.error.InvalidInputException;
import org.junit.jupiter.api.Test;

/** Logarithmic decrement and added mass against the closed forms of a damped oscillator. */
class DecayAndAddedMassTest {
    private static final double WN = 2.0 * Math.PI * 23.0;

    /** x(t) = e^{-zeta omega_n t} cos(omega_d t), sampled at rate fs, plus Gaussian noise (fixed seed). */
    private static double[][] decay(double zeta, double fs, double seconds, double noise) {
        int n = (int) (fs * seconds);
        double wd = WN * Math.sqrt(1 - zeta * zeta);
        double[][] tx = new double[2][n];
        Random r = new Random(42);
        for (int i = 0; i < n; i++) {
            tx[0][i] = i / fs;
            tx[1][i] = Math.exp(-zeta * WN * tx[0][i]) * Math.cos(wd * tx[0][i]) + noise * r.nextGaussian();
        }
        return tx;
    }

    @Test
    void logDecrementMatchesTheClosedForm() {
        // delta = 2 pi zeta / sqrt(1 - zeta^2) for x = e^{-zeta wn t} cos(wd t) (common practice;
        // Thomson and Dahleh 1998, Theory of Vibration with Applications, 5th ed., sec. 2.6, from memory)
        double zeta = 0.02;
        double[][] tx = decay(zeta, 2000.0, 2.0, 0.0);
        LogDecrement d = LogDecrement.of(tx[0], tx[1], 20);
        assertEquals(20, d.cycles());
        assertEquals(2 * Math.PI * zeta / Math.sqrt(1 - zeta * zeta), d.logDecrement(), 1e-4);
        assertEquals(zeta, d.dampingRatio(), zeta * 1e-3); // parabolic peaks at 87 samples per cycle
        assertEquals(WN, d.naturalFrequency(), WN * 1e-5);
        assertTrue(d.logDecrementSd() < 1e-5, "no scatter on exact data: " + d.logDecrementSd());
    }

    @Test
    void noiseShowsAsScatterOfTheFittedLine() {
        double zeta = 0.02;
        LogDecrement d = LogDecrement.of(decay(zeta, 2000.0, 2.0, 0.002)[0], decay(zeta, 2000.0, 2.0, 0.002)[1], 20);
        assertTrue(d.dampingRatioSd() > 0);
        assertEquals(zeta, d.dampingRatio(), Math.max(5 * d.dampingRatioSd(), zeta * 0.03));
    }

    @Test
    void tooManyCyclesAreRefusedPlainly() {
        double[][] tx = decay(0.02, 2000.0, 0.2, 0.0);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> LogDecrement.of(tx[0], tx[1], 50));
        assertEquals("cycles", e.field());
    }

    @Test
    void addedMassMatchesTheClosedForm() {
        // m = 4200 kg, k = m (2 pi 23)^2; adding 300 kg gives f2 = f1 sqrt(m / (m + dm)) (closed form)
        double m = 4200.0;
        double k = m * WN * WN;
        double after = Math.sqrt(k / (m + 300.0));
        AddedMass a = AddedMass.of(WN, after, 300.0);
        assertEquals(m, a.modalMass(), 1e-8 * m);
        assertEquals(k, a.modalStiffness(), 1e-8 * k);
        assertThrows(InvalidInputException.class, () -> AddedMass.of(after, WN, 300.0));
    }
}
