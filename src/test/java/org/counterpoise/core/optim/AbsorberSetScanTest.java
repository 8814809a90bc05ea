package org.counterpoise.core.optim;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The coarse scan searches a point's exact peak only where a lower bound does not rule it out of
 * the two lowest ({@link AbsorberSetScan#evaluate}). Checked against brute force: the polynomial peak
 * search of every point, sorted as the scan sorts (a stable sort in the points' order), must give
 * the same two lowest rows, bit for bit, and every bound must lie below the point's exact peak.
 */
class AbsorberSetScanTest {

    @Test
    void theTwoLowestAreThoseOfSearchingEveryPoint() {
        List<MinimaxVariables> cases = new ArrayList<>();
        for (int n : new int[] {2, 3}) {
            for (AbsorberSetTuning tuning : AbsorberSetTuning.values()) {
                cases.add(new AbsorberSetVariables(AbsorberSetProblem.allFrequencies(n, 0.05, 0.02, tuning)));
            }
        }
        cases.add(new AbsorberSetVariables(new AbsorberSetProblem(3, 0.1, 0.0, 0.7, 1.3, AbsorberSetTuning.UNIFORM)));
        cases.add(new AbsorberSetVariables(new AbsorberSetProblem(2, 0.02, 0.01, 0.9, Double.POSITIVE_INFINITY,
                AbsorberSetTuning.INDIVIDUAL)));
        for (MinimaxVariables v : cases) {
            AbsorberSetVariables layout = (AbsorberSetVariables) v;
            List<double[]> points = layout.problem().tuning() == AbsorberSetTuning.UNIFORM
                    ? strip(AbsorberSetScan.scan(layout, new EvaluationCounter())) : AbsorberSetScan.random(v);
            compare(v, points);
        }
    }

    @Test
    void robustBuildsToo() {
        AbsorberSetProblem set = AbsorberSetProblem.allFrequencies(2, 0.05, 0.01, AbsorberSetTuning.UNIFORM);
        RobustSetVariables v = new RobustSetVariables(set, List.of(new double[] {1, 1}, new double[] {0.95, 1},
                new double[] {1.05, 1}), 0.01);
        compare(v, AbsorberSetScan.random(v).subList(0, 200));
    }

    /** Brute force: every point's polynomial peak, then the same stable sort. */
    private static void compare(MinimaxVariables v, List<double[]> points) {
        EvaluationCounter counter = new EvaluationCounter();
        List<double[]> scan = AbsorberSetScan.evaluate(v, points, counter);
        List<double[]> all = new ArrayList<>();
        for (double[] p : points) {
            double[] row = Arrays.copyOf(p, p.length + 1);
            row[p.length] = v.polynomialPeak(p);
            all.add(row);
        }
        all.sort(Comparator.comparingDouble(r -> r[r.length - 1]));
        int d = v.dimension();
        assertEquals(points.size(), scan.size());
        assertArrayEquals(Arrays.copyOf(all.get(0), d), Arrays.copyOf(scan.get(0), d), "lowest point");
        assertArrayEquals(all.get(1), scan.get(1), "second point and its polynomial peak");
        assertEquals(v.peak(Arrays.copyOf(all.get(0), d)), scan.get(0)[d], "lowest taken again on the factored route");
        assertTrue(counter.count() < points.size() / 2, "searched " + counter.count() + " of " + points.size());
        for (int i = 0; i < 40; i++) {
            double[] p = points.get(i);
            double bound = v.sampledPeak(p);
            assertTrue(bound <= v.peak(p) * (1 + 1e-9), "bound " + bound + " above the peak " + v.peak(p));
        }
    }

    private static List<double[]> strip(List<double[]> rows) {
        List<double[]> out = new ArrayList<>();
        for (double[] r : rows) {
            out.add(Arrays.copyOf(r, r.length - 1));
        }
        return out;
    }
}
