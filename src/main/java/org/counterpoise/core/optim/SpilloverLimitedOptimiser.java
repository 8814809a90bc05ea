package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
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
 * a feasible design; the level is grown by half at a time until a design within the limits is found,
 * then bisected between the highest level where none was found and the least band peak of a design
 * within them found so far (relative accuracy {@value #ACCURACY}). phi comes from local searches, so it
 * may depend on where they start: every level's result counts and the bracket only narrows, so the
 * final design is always one within the limits. It is then certified as a minimax point of its
 * weighted problem (equal active peaks, first-order conditions, the coarse scan, random moves:
 * {@link AbsorberSetCheck}); those are the first-order conditions of the limited problem with the
 * weights as multipliers only when its weighted peak equals the level, which is checked (otherwise the
 * lower design is kept, within the limits, and not certified).
 */
public final class SpilloverLimitedOptimiser {
    /** Relative accuracy of the level t of the least feasible peak. */
    static final double ACCURACY = 1e-7;
    /** Growth of the level while bracketing, and how many times it may grow. */
    private static final double GROWTH = 1.5;
    private static final int MAX_GROWTHS = 16;
    private static final int MAX_BISECTIONS = 60;

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
     *     no limit was broken; null when no design found keeps the limits)
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
        // grow the level from the unlimited optimum's peak until a design within the limits is found
        double low = free.peak();
        double level = low;
        for (int i = 0; i < MAX_GROWTHS && levels.best == null; i++) {
            level *= GROWTH;
            levels.search(level);
            if (levels.best == null) {
                low = level;
            }
        }
        if (levels.best == null) {
            // no design found keeps the limits (local searches from the level's designs, up to GROWTH^16 times the
            // unlimited peak): the one that came nearest, said so (met = false)
            double[] p = levels.last;
            return new Result(layout.design(p), layout.peak(p), windowPeaks(layout, windows, p), true, false, null, free,
                    counter.count());
        }
        // bisection between the highest level where no design within the limits was found and the least band peak
        // of a design within them found so far (every level's result counts, so the bracket only narrows)
        for (int i = 0; i < MAX_BISECTIONS && levels.bestPeak - low > ACCURACY * levels.bestPeak; i++) {
            double t = 0.5 * (low + levels.bestPeak);
            if (!levels.search(t)) {
                low = t;
            }
        }
        // certify the weighted minimax at the least feasible level found; its first-order conditions are the limited
        // problem's only when the weighted peak equals the level (a lower point of the final search is kept, within
        // the limits, but not certified)
        level = levels.bestPeak;
        MinimaxVariables weighted = levels.variables(level);
        List<double[]> scan = AbsorberSetScan.scan(layout, weighted, counter);
        MinimaxSearch.Result r = MinimaxSearch.run(weighted, List.of(levels.best), 1, scan, counter, true);
        double[] p = r.peak() <= level ? r.point() : levels.best;
        boolean atLevel = r.peak() >= level * (1 - 10 * ACCURACY);
        AbsorberSetCertificate certificate = atLevel ? r.certificate() : new AbsorberSetCertificate(
                r.certificate().activePeaks(), r.certificate().activeSpread(), r.certificate().stationarity(),
                r.certificate().scanPoints(), r.certificate().scanBest(), r.certificate().perturbations(),
                r.certificate().perturbationLeast(), false);
        List<Double> peaks = windowPeaks(layout, windows, p);
        return new Result(layout.design(p), layout.peak(p), peaks, true, within(peaks, windows), certificate, free,
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

    /**
     * The searches at each level: the local optimum of the band and the windows weighted t / L_k,
     * from the last level's design, the best design within the limits so far and the unlimited
     * optimum; every result within the limits is kept when its band peak is the least so far.
     */
    private static final class Levels {
        private final AbsorberSetVariables layout;
        private final List<Window> windows;
        private final double[] unlimited;
        private final EvaluationCounter counter;
        private double[] last;
        /** The design within the limits of least band peak found so far, or null. */
        private double[] best;
        private double bestPeak = Double.POSITIVE_INFINITY;

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

        /**
         * @param t the level
         * @return true when a design within the limits with band peak at most t was found at this level
         */
        boolean search(double t) {
            MinimaxVariables v = variables(t);
            double[] found = null;
            double foundPeak = Double.POSITIVE_INFINITY;
            for (double[] seed : best == null ? new double[][] {last, unlimited} : new double[][] {last, best, unlimited}) {
                double[] p = MinimaxSearch.localOptimum(v, seed, counter);
                double peak = v.peak(p);
                if (peak < foundPeak) {
                    found = p;
                    foundPeak = peak;
                }
            }
            last = found;
            boolean feasible = foundPeak <= t;
            if (feasible) {
                double band = layout.peak(found);
                if (band < bestPeak && within(windowPeaks(layout, windows, found), windows)) {
                    best = found;
                    bestPeak = band;
                }
            }
            return feasible;
        }
    }
}
