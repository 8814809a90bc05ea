package org.counterpoise.core.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * Spillover of an absorber tuned to mode 1 of an invented two-mode structure, against dense sweeps of
 * the dense matrix solve ({@link ModalDirectSolve}) refined by golden section ({@link DenseSweep}) in each mode's
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
        return DenseSweep.maximum(w -> ModalDirectSolve.solve(modes, absorbers, "a", "a", w)[0].abs(), low, high, 20_000);
    }
}
