package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Several absorbers designed for the least peak over the band while the peak near each of the
 * structure's other modes stays within a limit: spillover constrained, not only reported.
 *
 * <p>Problem: minimise P(p), the exact peak of |H| over the band, subject to P_k(p) &lt;= L_k, the
 * exact peak of |H| over window k (the neighbourhood of another mode, as {@code Spillover} takes it),
 * for every window. Method (the parametric, level-set form of a constrained minimax, a standard
 * device stated from memory; its correctness is the argument that follows): for a level t let phi(t) = min_p max(P(p), max_k (t / L_k) P_k(p)), the
 * minimax of the band and the windows weighted by t / L_k, solved by the machinery of the unlimited
 * problem ({@link MinimaxSearch}: every window's maxima are further smooth pieces of one minimax, as a
 * robust problem's builds are). A design with max(...) &lt;= t has P &lt;= t and every P_k &lt;= L_k, and
 * conversely; so the least feasible peak is the least t with phi(t) &lt;= t. phi(t) - t is positive at
 * the unlimited optimum's peak (when a limit is broken there) and negative once t is large enough for
 * a feasible design; the root is bracketed by growing t by half at a time and found by Commons Math's
 * bracketing Brent solver on the feasible side (relative accuracy {@value #ACCURACY}); the design at
 * the root is then certified as a minimax point of its weighted problem (equal active peaks,
 * first-order conditions, the coarse scan, random moves: {@link AbsorberSetCheck}), which are the
 * first-order conditions of the limited problem with the weights as multipliers.
 */
public final class SpilloverLimitedOptimiser {
    /** Relative accuracy of the level t of the least feasible peak. */
    static final double ACCURACY = 1e-7;
    /** Growth of the level while bracketing, and how many times it may grow. */
    private static final double GROWTH = 1.5;
    private static final int MAX_GROWTHS = 16;
    private static final int MAX_EVALUATIONS = 80;

    private SpilloverLimitedOptimiser() {
    }

    /**
     * A window of frequency in which the peak is limited.
     *
     * @param low its low end, as a frequency ratio of the problem (&gt;= 0)
     * @param high its high end (+infinity for none)
     * @param limit the largest peak of |H| allowed there, in the problem's units (&gt; 0, finite)
     */
    public record Window(double low, double high, double limit) {
        /** Validates the window. */
        public Window {
            if (!(low >= 0) || !(high > low)) {
                throw new InvalidInputException("spillover window", Checks.show(low) + " to " + Checks.show(high),
                        "a range of frequency ratios from 0 or more to a higher end");
            }
            if (!(limit > 0) || Double.isInfinite(limit)) {
                throw new InvalidInputException("spillover limit", Checks.show(limit), "a finite peak above 0");
            }
        }
    }

    /**
     * The limited design.
     *
     * @param design the absorbers
     * @param peak its exact peak over the band
     * @param windowPeaks its exact peak over each window, in the windows' order
     * @param limited true when a limit was broken by the unlimited optimum, so the design differs from it
     * @param met true when every window's peak is within its limit (to {@value #ACCURACY} relative)
     * @param certificate the weighted minimax's evidence at the level found (the unlimited optimum's when
     *     no limit was broken; null when the limits cannot be met within the box)
     * @param unlimited the least peak with no limit
     * @param evaluations transfer functions built
     */
    public record Result(AbsorberSetDesign design, double peak, List<Double> windowPeaks, boolean limited, boolean met,
            AbsorberSetCertificate certificate, AbsorberSetOptimum unlimited, int evaluations) {
        /** Copies the list. */
        public Result {
            windowPeaks = List.copyOf(windowPeaks);
        }
    }

    /**
     * @param problem the absorbers, structure (with its other modes, {@link SetSurroundings}) and band
     * @param windows where the peak is limited, with the limits
     * @return the least band peak with every window within its limit, or the unlimited optimum when
     *     it already keeps them
     */
    public static Result optimise(AbsorberSetProblem problem, List<Window> windows) {
        EvaluationCounter counter = new EvaluationCounter();
        AbsorberSetOptimum free = AbsorberSetOptimiser.optimise(problem);
        counter.add(free.evaluations());
        AbsorberSetVariables layout = new AbsorberSetVariables(problem);
        double[] start = layout.pointOf(free.design());
        List<Double> freePeaks = windowPeaks(layout, windows, start);
        if (within(freePeaks, windows)) {
            return new Result(free.design(), free.peak(), freePeaks, false, true, free.certificate(), free,
                    counter.count());
        }
        Levels levels = new Levels(layout, windows, start, counter);
        double low = free.peak();
        double high = low;
        boolean feasible = false;
        for (int i = 0; i < MAX_GROWTHS && !feasible; i++) {
            low = high;
            high = low * GROWTH;
            feasible = levels.gap(high) <= 0;
        }
        if (!feasible) {
            // no design in the box keeps the limits: the one that comes nearest, said so (met = false)
            double[] p = levels.point(high);
            return new Result(layout.design(p), layout.peak(p), windowPeaks(layout, windows, p), true, false, null, free,
                    counter.count());
        }
        double level = new BracketingNthOrderBrentSolver(ACCURACY, ACCURACY * low * 1e-3, 0.0, 5)
                .solve(MAX_EVALUATIONS, levels::gap, low, high, AllowedSolution.BELOW_SIDE);
        MinimaxVariables weighted = levels.variables(level);
        List<double[]> scan = AbsorberSetScan.scan(layout, weighted, counter);
        MinimaxSearch.Result r = MinimaxSearch.run(weighted, List.of(levels.point(level)), 1, scan, counter, true);
        double[] p = r.point();
        List<Double> peaks = windowPeaks(layout, windows, p);
        return new Result(layout.design(p), layout.peak(p), peaks, true, within(peaks, windows), r.certificate(), free,
                counter.count());
    }

    private static List<Double> windowPeaks(MinimaxVariables layout, List<Window> windows, double[] p) {
        List<Double> out = new ArrayList<>();
        for (Window w : windows) {
            out.add(new WindowVariables(layout, w.low(), w.high(), 1.0).peak(p));
        }
        return out;
    }

    private static boolean within(List<Double> peaks, List<Window> windows) {
        for (int k = 0; k < windows.size(); k++) {
            if (peaks.get(k) > windows.get(k).limit() * (1 + ACCURACY)) {
                return false;
            }
        }
        return true;
    }

    /** phi(t) - t for the root finder, each level's design kept (warm starts from the nearest one solved). */
    private static final class Levels {
        private final AbsorberSetVariables layout;
        private final List<Window> windows;
        private final double[] unlimited;
        private final EvaluationCounter counter;
        private final Map<Double, double[]> points = new HashMap<>();
        private double[] last;

        Levels(AbsorberSetVariables layout, List<Window> windows, double[] unlimited, EvaluationCounter counter) {
            this.layout = layout;
            this.windows = windows;
            this.unlimited = unlimited;
            this.counter = counter;
            this.last = unlimited;
        }

        /** @return the band and every window weighted by t / L_k, as one minimax */
        MinimaxVariables variables(double t) {
            List<MinimaxVariables> pieces = new ArrayList<>();
            pieces.add(layout);
            for (Window w : windows) {
                pieces.add(new WindowVariables(layout, w.low(), w.high(), t / w.limit()));
            }
            return new RobustSetVariables(layout, pieces, layout.lower());
        }

        /** @return phi(t) - t: the least weighted peak at level t, from the last design and the unlimited one */
        double gap(double t) {
            MinimaxVariables v = variables(t);
            double[] best = null;
            double bestPeak = Double.POSITIVE_INFINITY;
            for (double[] seed : new double[][] {last, unlimited}) {
                double[] p = MinimaxSearch.localOptimum(v, seed, counter);
                double peak = v.peak(p);
                if (peak < bestPeak) {
                    best = p;
                    bestPeak = peak;
                }
            }
            points.put(t, best);
            last = best;
            return bestPeak - t;
        }

        /** @return the design found at level t (solved again if the solver did not keep it) */
        double[] point(double t) {
            if (!points.containsKey(t)) {
                gap(t);
            }
            return points.get(t);
        }
    }
}
