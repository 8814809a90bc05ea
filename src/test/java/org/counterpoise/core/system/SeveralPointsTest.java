package org.counterpoise.core.system;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * Absorbers at several points of a modal structure (the rank-k change of {@link PointModifications})
 * against the dense complex LU solve of the equations of motion in modal and absorber coordinates
 * ({@code ModalDirectSolve}, Commons Math), which shares nothing with the polynomial route.
 */
class SeveralPointsTest {
    private static final List<String> POINTS = List.of("a", "b", "c");

    /**
     * Twenty seeded random structures of three modes with two to four absorbers at two or three
     * points: every transfer function between the three points, every stroke and the factored value
     * equal the dense solve to 1e-9 at 401 frequencies.
     */
    @Test
    void transferFunctionsAndStrokesMatchTheDenseSolveAt401Frequencies() {
        Random random = new Random(16);
        for (int c = 0; c < 20; c++) {
            List<Mode> modes = randomModes(random);
            List<PointAbsorber> absorbers = new ArrayList<>();
            int count = 2 + random.nextInt(3);
            for (int j = 0; j < count; j++) {
                String point = POINTS.get(j < 2 ? j : random.nextInt(3));
                absorbers.add(PointAbsorber.tuned(point, 0.01 + 0.05 * random.nextDouble(),
                        modes.get(random.nextInt(3)).naturalFrequency() * (0.8 + 0.4 * random.nextDouble()),
                        0.02 + 0.2 * random.nextDouble()));
            }
            ModalSystem system = ModalSystem.of(new ModalStructure(modes), absorbers);
            for (String q : POINTS) {
                List<TransferFunction> strokes = new ArrayList<>();
                for (int j = 0; j < count; j++) {
                    strokes.add(system.strokeTransferFunction(q, j));
                }
                for (String p : POINTS) {
                    TransferFunction h = system.transferFunction(q, p);
                    for (int i = 0; i <= 400; i++) {
                        double w = 4.0 * (i + 0.5) / 401; // 401 frequencies; at zero a stroke is exactly 0
                        Complex[] direct = ModalDirectSolve.solve(modes, absorbers, q, p, w);
                        String where = "case " + c + " " + q + "->" + p + " at " + w;
                        assertComplex(direct[0], h.value(w), system.referenceStiffness(), where);
                        Complex factored = AbsorberSensitivity.value(system, q, p, w).divide(system.referenceStiffness());
                        assertEquals(0.0, factored.subtract(direct[0]).abs(), 1e-9 * direct[0].abs(), "factored " + where);
                        if (p.equals("a")) {
                            for (int j = 0; j < count; j++) {
                                // the dense solve's stroke is y_j - x_a, a difference: at low frequency it
                                // carries round-off of about 1e-16 |x_a|, which the tolerance allows
                                double base = ModalDirectSolve.solve(modes, absorbers, q, absorbers.get(j).point(), w)[0].abs();
                                double[] v = strokes.get(j).value(w);
                                Complex actual = new Complex(v[0], v[1]).divide(system.referenceStiffness());
                                assertEquals(0.0, actual.subtract(direct[1 + j]).abs(), 1e-9 * direct[1 + j].abs()
                                        + 1e-13 * base, "stroke " + j + " " + where);
                            }
                        }
                    }
                }
            }
        }
    }

    /**
     * The rank-k formula taken with one point is the rank-one one: its coefficients equal
     * {@link ModalSystem}'s own one-point route to 1e-12 (the program keeps that route for one point).
     */
    @Test
    void onePointThroughTheRankKFormulaIsTheRankOneRoute() {
        Random random = new Random(1);
        List<Mode> modes = randomModes(random);
        ModalSystem system = ModalSystem.of(new ModalStructure(modes), List.of(PointAbsorber.tuned("b", 0.05, 1.0, 0.1),
                PointAbsorber.tuned("b", 0.03, 1.7, 0.05)));
        PointModifications general = new PointModifications(system, List.of("b"));
        assertCoefficients(system.transferFunction("a", "c").denominator(), general.denominator());
        assertCoefficients(system.transferFunction("a", "c").numerator(), general.numerator("c", "a"));
        assertCoefficients(system.strokeTransferFunction("a", 1).numerator(), general.strokeNumerator("a", 1));
    }

    /** The exact peak of a two-point design equals a dense sweep of the dense solve, refined by golden section, to 1e-9. */
    @Test
    void thePeakOfTwoPointsMatchesADenseSweep() {
        List<Mode> modes = List.of(new Mode(1.0, 0.01, 1.0, Map.of("a", 1.0, "b", 0.3, "c", 0.7)),
                new Mode(2.5, 0.01, 1.0, Map.of("a", -0.4, "b", 1.0, "c", 0.5)),
                new Mode(4.0, 0.02, 1.0, Map.of("a", 0.2, "b", 0.6, "c", -1.0)));
        List<PointAbsorber> absorbers = List.of(PointAbsorber.tuned("a", 0.025, 0.96, 0.1),
                PointAbsorber.tuned("b", 0.025, 2.4, 0.1));
        ModalSystem system = ModalSystem.of(new ModalStructure(modes), absorbers);
        double peak = ModalPeak.over(system, "c", "c", 0.0, 6.0);
        double sweep = DenseSweep.maximum(w -> ModalDirectSolve.solve(modes, absorbers, "c", "c", w)[0].abs(), 0.0, 6.0,
                200_000);
        assertEquals(sweep, peak, 1e-9 * sweep);
    }

    /**
     * The exact gradient for absorbers at two points (dH_pq / dZ_a = -H_pa H_aq) against central
     * differences of ln |H|^2 of the dense solve at the same frequency.
     */
    @Test
    void theGradientAtSeveralPointsMatchesFiniteDifferencesOfTheDenseSolve() {
        List<Mode> modes = randomModes(new Random(7));
        double[] f = {0.95, 1.9, 1.1};
        double[] zeta = {0.08, 0.05, 0.1};
        String[] at = {"a", "b", "b"};
        for (double g : new double[] {0.8, 1.0, 1.7, 2.3}) {
            double[][] grad = AbsorberSensitivity.gradient(twoPoints(modes, f, zeta, at), "c", "a", g);
            for (int j = 0; j < 3; j++) {
                double h = 1e-6;
                double[] fp = f.clone();
                double[] fm = f.clone();
                fp[j] *= Math.exp(h);
                fm[j] *= Math.exp(-h);
                double df = (logMagnitude(modes, fp, zeta, at, g) - logMagnitude(modes, fm, zeta, at, g)) / (2 * h);
                assertEquals(df, grad[j][0], 1e-6 * (1 + Math.abs(df)), "d/d ln f_" + j + " at g " + g);
                double[] zp = zeta.clone();
                double[] zm = zeta.clone();
                zp[j] += h;
                zm[j] -= h;
                double dz = (logMagnitude(modes, f, zp, at, g) - logMagnitude(modes, f, zm, at, g)) / (2 * h);
                assertEquals(dz, grad[j][1], 1e-6 * (1 + Math.abs(dz)), "d/d zeta_" + j + " at g " + g);
            }
        }
    }

    private static ModalSystem twoPoints(List<Mode> modes, double[] f, double[] zeta, String[] at) {
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < f.length; j++) {
            absorbers.add(PointAbsorber.tuned(at[j], 0.03, f[j], zeta[j]));
        }
        return ModalSystem.of(new ModalStructure(modes), absorbers);
    }

    private static double logMagnitude(List<Mode> modes, double[] f, double[] zeta, String[] at, double g) {
        ModalSystem system = twoPoints(modes, f, zeta, at);
        double w = g * system.referenceFrequency();
        return Math.log(Math.pow(ModalDirectSolve.solve(modes, system.absorbers(), "c", "a", w)[0].abs(), 2));
    }

    private static List<Mode> randomModes(Random random) {
        List<Mode> modes = new ArrayList<>();
        double w = 1.0;
        for (int r = 0; r < 3; r++) {
            modes.add(new Mode(w, 0.005 + 0.03 * random.nextDouble(), 0.5 + random.nextDouble(), Map.of(
                    "a", 2 * random.nextDouble() - 1, "b", 2 * random.nextDouble() - 1, "c", 2 * random.nextDouble() - 1)));
            w *= 1.2 + 1.5 * random.nextDouble();
        }
        return modes;
    }

    private static void assertCoefficients(double[] expected, double[] actual) {
        assertEquals(expected.length, actual.length);
        double scale = 0;
        for (double e : expected) {
            scale = Math.max(scale, Math.abs(e));
        }
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], actual[i], 1e-12 * scale, "coefficient " + i);
        }
    }

    private static void assertComplex(Complex expected, double[] scaled, double kRef, String what) {
        Complex actual = new Complex(scaled[0] / kRef, scaled[1] / kRef);
        assertEquals(0.0, actual.subtract(expected).abs(), 1e-9 * expected.abs(), what);
    }
}
