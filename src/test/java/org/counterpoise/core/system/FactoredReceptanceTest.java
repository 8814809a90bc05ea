package org.counterpoise.core.system;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The prepared primitive evaluator of |H|^2 against an independent route, the equations of motion of
 * the modes and absorbers solved as a dense complex system by Commons Math's LU decomposition
 * ({@code ModalDirectSolve}), and against the general factored route ({@link AbsorberSensitivity#value})
 * it replaces in the optimisers: random invented structures of 1 to 4 modes with four named points,
 * 0 to 4 absorbers at one, two or three points, at frequencies through their resonances.
 */
class FactoredReceptanceTest {
    private static final String[] POINTS = {"a", "b", "c", "d"};

    @Test
    void equalsTheDenseSolveAndTheGeneralFactoredRoute() {
        Random random = new Random(11);
        int checked = 0;
        for (int trial = 0; trial < 200; trial++) {
            int n = 1 + random.nextInt(4);
            List<Mode> modes = new ArrayList<>();
            for (int r = 0; r < n; r++) {
                Map<String, Double> shape = new HashMap<>();
                for (String p : POINTS) {
                    shape.put(p, 2 * random.nextDouble() - 1);
                }
                modes.add(new Mode(2 * Math.PI * (5 + 20 * random.nextDouble()), 0.002 + 0.05 * random.nextDouble(),
                        100 + 5000 * random.nextDouble(), shape));
            }
            ModalStructure structure = new ModalStructure(modes);
            int points = 1 + random.nextInt(3);
            int count = random.nextInt(5);
            List<PointAbsorber> absorbers = new ArrayList<>();
            for (int j = 0; j < count; j++) {
                absorbers.add(PointAbsorber.tuned(POINTS[random.nextInt(points)], 5 + 100 * random.nextDouble(),
                        2 * Math.PI * (4 + 25 * random.nextDouble()), 0.001 + 0.2 * random.nextDouble()));
            }
            ModalSystem system = ModalSystem.of(structure, absorbers);
            String force = POINTS[random.nextInt(4)];
            String response = POINTS[random.nextInt(4)];
            FactoredReceptance h = FactoredReceptance.of(system, force, response);
            for (int i = 0; i < 40; i++) {
                double w = 2 * Math.PI * (0.5 + 35 * random.nextDouble());
                double g = w / system.referenceFrequency();
                double fast = h.magnitudeSquared(g);
                double general = AbsorberSensitivity.value(system, force, response, g).abs();
                assertEquals(general * general, fast, 1e-11 * general * general, "trial " + trial + " at " + w);
                double direct = ModalDirectSolve.solve(structure.modes(), absorbers, force, response, w)[0].abs()
                        * system.referenceStiffness();
                assertEquals(direct * direct, fast, 1e-8 * direct * direct, "trial " + trial + " at " + w);
                checked++;
            }
        }
        assertEquals(8000, checked);
    }
}
