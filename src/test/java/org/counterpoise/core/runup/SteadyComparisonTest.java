package org.counterpoise.core.runup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.tuning.DenHartogEqualPeak;
import org.counterpoise.testing.DirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The run-up's steady-state comparison (the peaks beside the transient ones, and the curves drawn
 * beside the envelope) against an independent route: the equations of motion solved as a 2x2
 * complex system ({@link DirectSolve}) on a brute-force grid of 20 001 forcing frequencies from 0
 * to the ramp's top speed, refined by golden-section search around the grid's largest value.
 */
class SteadyComparisonTest {
    /** An invented structure: 1000 kg at 10 Hz, 2 % damping; unbalance 0.05 kg*m. */
    private static final Structure STRUCTURE = Structure.of(1000.0, 1000.0 * Math.pow(2 * Math.PI * 10, 2), 0.02);
    private static final Tuning TUNING = DenHartogEqualPeak.tuning(0.05);
    private static final double UNBALANCE = 0.05;

    @Test
    void steadyPeaksAndCurvesEqualTheFrequencyDomainBruteForce() {
        double w1 = STRUCTURE.naturalFrequency();
        SpeedRamp ramp = SpeedRamp.runUp(1.25 * w1, 2e-3 * w1 * w1);
        RunUpComparison c = RunUpComparison.of(STRUCTURE, TUNING, ExcitationKind.UNBALANCE, UNBALANCE, ramp,
                RunUp.Start.REST, ProgressListener.NONE);
        SteadyCurves curves = SteadyCurves.of(STRUCTURE, TUNING, ExcitationKind.UNBALANCE, UNBALANCE, c);
        for (boolean with : new boolean[] {true, false}) {
            for (ResponseKind k : RunUp.quantities(with)) {
                ResponsePeak peak = (with ? c.steadyWithAbsorber() : c.steadyWithoutAbsorber()).get(k);
                double[] brute = bruteForcePeak(with, k, ramp.topSpeed());
                assertEquals(brute[1], peak.value(), 1e-9 * brute[1], (with ? "with " : "without ") + k + " peak");
                assertEquals(brute[0], peak.frequency(), 1e-5 * brute[0], (with ? "with " : "without ") + k + " speed");
                double[] speeds = curves.speed();
                double[] values = curves.of(with, k);
                for (int i = 0; i < speeds.length; i += 37) {
                    double direct = direct(with, k, speeds[i]);
                    assertEquals(direct, values[i], 1e-9 * Math.max(direct, brute[1] * 1e-6), k + " at " + speeds[i]);
                }
                double curveMax = 0;
                for (double v : values) {
                    curveMax = Math.max(curveMax, v);
                }
                assertEquals(peak.value(), curveMax, 1e-12 * peak.value(), k + ": the curve passes through the peak");
            }
        }
    }

    /** @return {frequency, value} of the largest amplitude over 0 to top, by grid and golden section */
    private static double[] bruteForcePeak(boolean with, ResponseKind k, double top) {
        int n = 20_000;
        int best = 0;
        double bestValue = -1;
        for (int i = 0; i <= n; i++) {
            double v = direct(with, k, top * i / n);
            if (v > bestValue) {
                bestValue = v;
                best = i;
            }
        }
        double a = top * Math.max(0, best - 1) / n;
        double b = top * Math.min(n, best + 1) / n;
        double g = (Math.sqrt(5) - 1) / 2;
        for (int it = 0; it < 200; it++) {
            double x1 = b - g * (b - a);
            double x2 = a + g * (b - a);
            if (direct(with, k, x1) > direct(with, k, x2)) {
                b = x2;
            } else {
                a = x1;
            }
        }
        double w = 0.5 * (a + b);
        double v = direct(with, k, w);
        return v >= bestValue ? new double[] {w, v} : new double[] {top * best / n, bestValue};
    }

    /** The amplitude of a quantity at w by the direct complex solve, unbalance force m_u e w^2. */
    private static double direct(boolean with, ResponseKind k, double w) {
        double m1 = STRUCTURE.effectiveMass();
        double k1 = STRUCTURE.effectiveStiffness();
        double c1 = 2 * STRUCTURE.dampingRatio() * Math.sqrt(k1 * m1);
        double m2 = TUNING.massRatio() * m1;
        double wa = TUNING.tuningRatio() * STRUCTURE.naturalFrequency();
        double k2 = m2 * wa * wa;
        double c2 = 2 * TUNING.dampingRatio() * m2 * wa;
        Complex force = new Complex(UNBALANCE * w * w, 0);
        double x1;
        double stroke = 0;
        if (with) {
            Complex[] x = DirectSolve.solve(m1, k1, c1, m2, k2, c2, w, force, Complex.ZERO);
            x1 = x[0].abs();
            stroke = x[1].subtract(x[0]).abs();
        } else {
            // the bare structure: m1 x'' + c1 x' + k1 x = F, X = F / (k1 - m1 w^2 + i c1 w)
            x1 = force.divide(new Complex(k1 - m1 * w * w, c1 * w)).abs();
        }
        return switch (k) {
            case DISPLACEMENT -> x1;
            case VELOCITY -> w * x1;
            case ACCELERATION -> w * w * x1;
            case STROKE -> stroke;
            case SPRING_FORCE -> k2 * stroke;
            default -> throw new IllegalArgumentException(k.toString());
        };
    }

    @Test
    void curvesSpanTheRampAndRefuseAQuantityNotTracked() {
        double w1 = STRUCTURE.naturalFrequency();
        SpeedRamp ramp = SpeedRamp.runUp(1.25 * w1, 2e-3 * w1 * w1);
        RunUpComparison c = RunUpComparison.of(STRUCTURE, TUNING, ExcitationKind.FORCE, 100.0, ramp,
                RunUp.Start.REST, ProgressListener.NONE);
        SteadyCurves curves = SteadyCurves.of(STRUCTURE, TUNING, ExcitationKind.FORCE, 100.0, c);
        double[] s = curves.speed();
        assertEquals(0.0, s[0]);
        assertEquals(1.25 * w1, s[s.length - 1], 1e-12 * w1);
        for (int i = 1; i < s.length; i++) {
            assertTrue(s[i] >= s[i - 1], "ascending");
        }
        // static deflection at zero speed under a force: F/k1 (common practice)
        assertEquals(100.0 / STRUCTURE.effectiveStiffness(), curves.of(false, ResponseKind.DISPLACEMENT)[0],
                1e-12 * 100.0 / STRUCTURE.effectiveStiffness());
        assertThrows(IllegalArgumentException.class,
                () -> curves.of(false, ResponseKind.STROKE));
    }
}
