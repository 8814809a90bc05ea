package org.counterpoise.core.system;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * Each mode's part of a displacement ({@link ModeContributions}) against the modal coordinates of the
 * dense complex LU solve of the equations of motion in modal and absorber coordinates
 * ({@code ModalDirectSolve}, Commons Math), which shares nothing with the factored route.
 */
class ModeContributionsTest {
    private static final List<String> POINTS = List.of("a", "b", "c");

    /**
     * Ten seeded random structures of three modes with none to four absorbers at one, two or three
     * points: every mode's part at every point, for a force at every point, at 201 frequencies,
     * equals the dense solve's phi_r(p) q_r to 1e-9 of the displacement's size, and the parts sum to
     * the dense solve's displacement.
     */
    @Test
    void everyModesPartEqualsTheDenseSolvesModalCoordinate() {
        Random random = new Random(31);
        for (int c = 0; c < 10; c++) {
            List<Mode> modes = new ArrayList<>();
            double w = 1.0;
            for (int r = 0; r < 3; r++) {
                modes.add(new Mode(w, 0.005 + 0.03 * random.nextDouble(), 0.5 + random.nextDouble(), Map.of(
                        "a", 2 * random.nextDouble() - 1, "b", 2 * random.nextDouble() - 1, "c", 2 * random.nextDouble() - 1)));
                w *= 1.2 + random.nextDouble();
            }
            List<PointAbsorber> absorbers = new ArrayList<>();
            int count = c % 5;
            for (int j = 0; j < count; j++) {
                absorbers.add(PointAbsorber.tuned(POINTS.get(random.nextInt(c % 3 + 1)), 0.01 + 0.05 * random.nextDouble(),
                        modes.get(random.nextInt(3)).naturalFrequency() * (0.8 + 0.4 * random.nextDouble()),
                        0.02 + 0.2 * random.nextDouble()));
            }
            ModalSystem system = ModalSystem.of(new ModalStructure(modes), absorbers);
            for (String q : POINTS) {
                for (String p : POINTS) {
                    for (int i = 0; i <= 200; i++) {
                        double omega = 5.0 * (i + 0.5) / 201;
                        Complex[] parts = ModeContributions.at(system, q, p, omega);
                        Complex[] direct = ModalDirectSolve.modeParts(modes, absorbers, q, p, omega);
                        Complex x = ModalDirectSolve.solve(modes, absorbers, q, p, omega)[0];
                        double size = 0;
                        for (Complex d : direct) {
                            size = Math.max(size, d.abs());
                        }
                        Complex sum = Complex.ZERO;
                        for (int r = 0; r < 3; r++) {
                            assertEquals(0.0, parts[r].subtract(direct[r]).abs(), 1e-9 * size,
                                    "case " + c + " mode " + r + " " + q + "->" + p + " at " + omega);
                            sum = sum.add(parts[r]);
                        }
                        assertEquals(0.0, sum.subtract(x).abs(), 1e-9 * size, "sum, case " + c + " at " + omega);
                    }
                }
            }
        }
    }
}
