package org.counterpoise.core.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * Spillover of an absorber tuned to mode 1 of an invented two-mode structure, against dense sweeps of
 * the dense matrix solve ({@link ModalDirectSolve}) refined by golden section in each mode's
 * neighbourhood (an independent route).
 */
class SpilloverTest {

    @Test
    void thePeakNearEachModeMatchesADenseSweepOfTheDirectSolve() {
        for (double[] c : new double[][] {{1.3, 0.8}, {2.5, 1.0}, {1.15, -0.6}}) {
            double w1 = 2 * Math.PI * 5.0;
            List<Mode> modes = List.of(new Mode(w1, 0.02, 2000, Map.of("a", 1.0, "b", 0.4)),
                    new Mode(w1 * c[0], 0.015, 1500, Map.of("a", c[1], "b", 1.0)));
            List<PointAbsorber> absorbers = List.of(PointAbsorber.tuned("a", 100, w1 / 1.05, 0.13));
            ModalSystem system = ModalSystem.of(new ModalStructure(modes), absorbers);
            Spillover s = Spillover.of(system, "a", "a");
            assertEquals(2, s.modes().size());
            for (Spillover.ModePeak m : s.modes()) {
                double high = Double.isInfinite(m.high()) ? 4 * w1 * c[0] : m.high();
                double low = Math.max(m.low(), 0.01 * w1);
                assertEquals(sweep(modes, List.of(), low, high), m.before(), 1e-9 * m.before(), "before, mode " + m.mode());
                assertEquals(sweep(modes, absorbers, low, high), m.after(), 1e-9 * m.after(), "after, mode " + m.mode());
            }
            assertTrue(s.modes().get(0).after() < s.modes().get(0).before() / 3, "the absorber works on mode 1");
        }
    }

    private static double sweep(List<Mode> modes, List<PointAbsorber> absorbers, double low, double high) {
        int n = 20_000;
        double best = 0;
        double at = low;
        for (int i = 0; i <= n; i++) {
            double w = low + (high - low) * i / n;
            double v = ModalDirectSolve.solve(modes, absorbers, "a", "a", w)[0].abs();
            if (v > best) {
                best = v;
                at = w;
            }
        }
        double a = Math.max(low, at - (high - low) / n);
        double b = Math.min(high, at + (high - low) / n);
        double r = (Math.sqrt(5) - 1) / 2;
        for (int i = 0; i < 100; i++) {
            double c = b - r * (b - a);
            double d = a + r * (b - a);
            if (ModalDirectSolve.solve(modes, absorbers, "a", "a", c)[0].abs()
                    > ModalDirectSolve.solve(modes, absorbers, "a", "a", d)[0].abs()) {
                b = d;
            } else {
                a = c;
            }
        }
        return Math.max(best, ModalDirectSolve.solve(modes, absorbers, "a", "a", 0.5 * (a + b))[0].abs());
    }
}
