package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The H-infinity optimum held back by a stroke limit over the run-up [0, g_top] (used by
 * {@link HInfinityOptimiser} when the free optimum's run-up stroke exceeds the limit).
 *
 * <p>Method. For a tuning f the feasible dampings are those whose run-up stroke s(f, zeta_a) is
 * within the limit L; the least of them, zeta_c(f), is found on a logarithmic scan of 16 dampings
 * from 1e-7 to 4 refined by Brent's root finder on ln(s/L) (so a stroke that is not monotone in the
 * damping still gives the first feasible damping). The best feasible design at f is zeta_c(f) when
 * more damping raises the band peak there (the limit binds), otherwise the band peak's minimum over
 * [zeta_c, 4] (Brent's minimiser). That one-variable function of f is scanned over the whole tuning
 * box and minimised by Brent's minimiser around the best scan points. The result is then solved
 * exactly: on the limit by {@link ActiveSetNewton} with the stroke's highest maximum as one more
 * active maximum tied to L; off the limit by the free active sets.
 *
 * <p>Certificate (as for the free optimum, docs/optimiser.md): the run-up stroke is within the
 * limit (1e-9 relative); no feasible point of the global scan of {@link PeakScan#global} is lower
 * by more than 1e-9 relative (a lower one restarts the search from its tuning, at most four
 * times); and the Karush-Kuhn-Tucker conditions with the stroke's active maxima hold
 * ({@link MinimaxCertificate}), or no feasible probe lowers the peak.
 */
final class StrokeLimitedOptimum {
    private static final double MAX_DAMPING = PeakProblem.MAX_DAMPING;
    private static final double LOWEST_SCANNED_DAMPING = 1e-7;
    private static final int DAMPING_SCAN = 16;
    private static final int TUNING_SCAN = 36;
    private static final int BAND_TUNINGS = 12;
    /** A scan point must beat the optimum by this much (relative) to force a restart. */
    private static final double SCAN_MARGIN = 1e-9;
    /** The run-up stroke of a reported design is within the limit to this (relative). */
    static final double FEASIBLE = PeakProblem.STROKE_LIMIT_ROUND_OFF;
    private static final double ACCEPT = 1e-9;
    private static final int MAX_RESTARTS = 4;
    private static final double INFEASIBLE = 1e300;

    private final PeakProblem problem;
    private final EvaluationCounter counter;
    private final double limit;

    private StrokeLimitedOptimum(PeakProblem problem, EvaluationCounter counter) {
        this.problem = problem;
        this.counter = counter;
        this.limit = problem.strokeLimit();
    }

    /**
     * @param problem the problem with its stroke limit
     * @param free the optimum without the limit (its run-up stroke exceeds the limit)
     * @param counter evaluation counter
     * @return the certified (or, failing the certificate, unconverged) optimum within the limit
     */
    static PeakOptimum optimise(PeakProblem problem, PeakOptimum free, EvaluationCounter counter) {
        if (!Double.isNaN(problem.fixedDamping())) {
            throw new InvalidInputException("stroke limit", Checks.show(problem.strokeLimit()),
                    "cannot be met with the absorber damping held fixed (the best design's stroke during run-up"
                            + " exceeds it); free the damping or allow a larger stroke");
        }
        return new StrokeLimitedOptimum(problem, counter).solve(free.tuning().tuningRatio());
    }

    private PeakOptimum solve(double f0) {
        if (!Double.isNaN(problem.fixedTuning())) {
            double[] at = bestAt(f0);
            if (at[1] >= INFEASIBLE) {
                throw unreachable();
            }
            double[] exact = exact(f0, at[0]);
            return result(exact[0], exact[1], exact[2], true);
        }
        List<double[]> scan = new ArrayList<>();
        for (double f : PeakScan.tunings(problem, TUNING_SCAN, BAND_TUNINGS)) {
            double[] at = bestAt(f);
            scan.add(new double[] {f, at[1]});
        }
        scan.sort((a, b) -> Double.compare(a[0], b[0]));
        double[] best = {Double.NaN, Double.NaN, INFEASIBLE};
        best = lower(best, minimiseNear(Math.max(0.5 * f0, problem.minTuning()), Math.min(1.5 * f0, problem.maxTuning()),
                f0));
        for (int i : lowestTwo(scan)) {
            double low = scan.get(Math.max(i - 1, 0))[0];
            double high = scan.get(Math.min(i + 1, scan.size() - 1))[0];
            best = lower(best, minimiseNear(low, high, scan.get(i)[0]));
        }
        if (best[2] >= INFEASIBLE) {
            throw unreachable();
        }
        best = exact(best[0], best[1]);
        // Certificate, part 1: no feasible point of the global scan is lower (restart from one that is).
        PeakScan.GlobalScan global = PeakScan.global(problem, counter, best[2], new double[] {best[0], best[1]});
        double[] lowerPoint = firstFeasibleBelow(global, best[2] * (1 - SCAN_MARGIN));
        for (int restart = 0; restart < MAX_RESTARTS && lowerPoint != null; restart++) {
            double ratio = Math.pow(problem.maxTuning() / problem.minTuning(), 1.0 / (TUNING_SCAN - 1.0));
            double[] again = minimiseNear(Math.max(lowerPoint[0] / ratio, problem.minTuning()),
                    Math.min(lowerPoint[0] * ratio, problem.maxTuning()), lowerPoint[0]);
            if (again[2] < best[2]) {
                best = lower(best, exact(again[0], again[1]));
            }
            lowerPoint = firstFeasibleBelow(global, best[2] * (1 - SCAN_MARGIN));
        }
        boolean scanned = lowerPoint == null;
        return result(best[0], best[1], best[2], scanned);
    }

    /** Certificate, parts 2 and 3, and the result. */
    private PeakOptimum result(double f, double zeta, double peak, boolean scanned) {
        boolean feasible = problem.strokePeak(f, zeta) <= limit * (1 + FEASIBLE);
        boolean stationary = MinimaxCertificate.isStationary(problem, f, zeta)
                || PeakDirectSearch.noDescentByProbe(problem, f, zeta, peak, counter);
        boolean onLimit = problem.strokePeak(f, zeta) >= limit * (1 - MinimaxCertificate.ACTIVE);
        return new PeakOptimum(problem.tuning(f, zeta), peak, onLimit ? "stroke during run-up on its limit"
                : "stationary point within the stroke limit", counter.count(), feasible && scanned && stationary,
                onLimit ? ActiveConstraint.STROKE_LIMIT : ActiveConstraint.NONE);
    }

    /** The lowest scan point below level whose run-up stroke is within the limit, or null. */
    private double[] firstFeasibleBelow(PeakScan.GlobalScan global, double level) {
        for (double[] point = global.firstBelow(level); point != null; point = global.firstBelow(level)) {
            global.remove(point);
            if (problem.strokePeak(point[0], point[1]) <= limit) {
                return point;
            }
        }
        return null;
    }

    /** Brent's minimiser of the best feasible peak over tunings in [low, high]; {f, zeta, peak}. */
    private double[] minimiseNear(double low, double high, double start) {
        UnivariateFunction value = f -> bestAt(f)[1];
        double f = start;
        if (high > low) {
            try {
                UnivariatePointValuePair found = new BrentOptimizer(1e-10, 1e-14).optimize(new MaxEval(500),
                        new UnivariateObjectiveFunction(value), GoalType.MINIMIZE,
                        new SearchInterval(low, high, Math.max(low, Math.min(high, start))));
                f = found.getPoint();
            } catch (TooManyEvaluationsException cap) {
                f = start; // the start is kept; the certificate decides
            }
        }
        double[] at = bestAt(f);
        return new double[] {f, at[0], at[1]};
    }

    /**
     * The best feasible design at tuning f.
     *
     * @return {zeta, peak, least feasible damping}; peak {@link #INFEASIBLE} when no damping up to
     *     the maximum keeps the run-up stroke within the limit
     */
    private double[] bestAt(double f) {
        double least = leastDamping(f);
        if (Double.isNaN(least)) {
            return new double[] {Double.NaN, INFEASIBLE, Double.NaN};
        }
        double onLimit = peak(f, least);
        double step = Math.max(1e-6 * least, 1e-9);
        if (!(peak(f, least + step) < onLimit)) {
            return new double[] {least, onLimit, least}; // more damping does not help: the limit binds
        }
        // the band peak still falls with damping: its minimum over [least, MAX] (in ln zeta)
        UnivariateFunction inLog = v -> peak(f, Math.exp(v));
        double lowLog = Math.log(least + step);
        double highLog = Math.log(MAX_DAMPING);
        try {
            UnivariatePointValuePair found = new BrentOptimizer(1e-12, 1e-14).optimize(new MaxEval(300),
                    new UnivariateObjectiveFunction(inLog), GoalType.MINIMIZE, new SearchInterval(lowLog, highLog, lowLog));
            double zeta = Math.exp(found.getPoint());
            double value = peak(f, zeta);
            return value < onLimit ? new double[] {zeta, value, least} : new double[] {least, onLimit, least};
        } catch (TooManyEvaluationsException cap) {
            return new double[] {least, onLimit, least};
        }
    }

    /**
     * The least absorber damping whose run-up stroke at tuning f is within the limit: the first
     * feasible damping of a logarithmic scan, refined by Brent's root finder between it and the
     * scan point before; NaN when none up to {@link #MAX_DAMPING} is.
     */
    double leastDamping(double f) {
        UnivariateFunction excess = z -> {
            double s = problem.strokePeak(f, z);
            counter.add(1);
            // a capped logarithm: finite at an undamped resonance, so the root finder can bracket
            return Double.isFinite(s) ? Math.min(Math.log(s / limit), 50.0) : 50.0;
        };
        if (excess.value(0.0) <= 0) {
            return 0.0;
        }
        double previous = 0.0;
        for (int i = 0; i < DAMPING_SCAN; i++) {
            double z = LOWEST_SCANNED_DAMPING * Math.pow(MAX_DAMPING / LOWEST_SCANNED_DAMPING, i / (DAMPING_SCAN - 1.0));
            if (excess.value(z) <= 0) {
                try {
                    double root = new BrentSolver(1e-15, 1e-13).solve(300, excess, previous, z);
                    // Brent stops within tolerance on either side: step to the feasible side
                    for (int nudge = 0; nudge < 60 && excess.value(root) > 0; nudge++) {
                        root = Math.min(z, root + Math.max(1e-13 * root, 1e-16) * Math.pow(2, nudge));
                    }
                    return root;
                } catch (MathIllegalStateException | MathIllegalArgumentException notBracketed) {
                    return z;
                }
            }
            previous = z;
        }
        return Double.NaN;
    }

    /**
     * The design solved exactly from (f, zeta): by the active-set conditions with the stroke tied
     * to its limit when the limit binds, by the free active sets otherwise; the start is kept
     * when neither gives a feasible design that is not higher.
     *
     * @return {f, zeta, peak}
     */
    private double[] exact(double f, double zeta) {
        double start = peak(f, zeta);
        double[] best = {f, zeta, start};
        double stroke = problem.strokePeak(f, zeta);
        if (stroke >= limit * (1 - 1e-6)) {
            for (double[] s : onLimitSolutions(f, zeta)) {
                best = lower(best, s);
            }
        } else {
            double[] free = HInfinityOptimiser.freeActiveSet(problem.withStrokeLimit(Double.NaN), f, zeta, counter);
            if (free != null && problem.strokePeak(free[0], free[1]) <= limit) {
                best = lower(best, free);
            }
        }
        return best;
    }

    /** Verified solutions of the active sets that hold the stroke's highest maximum at the limit. */
    private List<double[]> onLimitSolutions(double f, double zeta) {
        List<double[]> out = new ArrayList<>();
        TransferFunction h = problem.transferFunction(f, zeta);
        List<double[]> objective = maxima(h, problem.bandLow(), problem.bandHigh(), problem.bandLow() > 0);
        List<double[]> strokes = maxima(problem.strokeTransferFunction(f, zeta), 0.0, problem.strokeTop(), true);
        int d = (Double.isNaN(problem.fixedTuning()) ? 1 : 0) + 1;
        int n = Math.min(objective.size(), 3);
        List<int[]> sets = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            sets.add(new int[] {i});
        }
        for (int i = 0; i < n && d == 2; i++) {
            for (int j = i + 1; j < n; j++) {
                sets.add(new int[] {i, j});
            }
        }
        double start = peak(f, zeta);
        for (double[] strokeMax : strokes.subList(0, Math.min(2, strokes.size()))) {
            for (int[] set : sets) {
                ActiveSetNewton newton = ActiveSetNewton.withStroke(problem, objective, set, strokeMax[1] > 0,
                        strokeMax[0]);
                if (!newton.isSquare()) {
                    continue;
                }
                double[] s = newton.solve(f, zeta);
                counter.add(newton.evaluations());
                if (s == null || !(s[0] > 0) || !(s[1] >= 0) || !problem.inBox(s[0], s[1])) {
                    continue;
                }
                double active = Math.sqrt(Math.exp(problem.transferFunction(s[0], s[1]).logMagnitudeSquared(s[2])));
                double value = peak(s[0], s[1]);
                if (value <= active * (1 + ACCEPT) && value <= start * (1 + ACCEPT)
                        && problem.strokePeak(s[0], s[1]) <= limit * (1 + FEASIBLE)) {
                    out.add(new double[] {s[0], s[1], value});
                }
            }
        }
        return out;
    }

    /** The maxima of |H| over [low, high]: {x, 1 interior or 0 end, value}, highest first. */
    private static List<double[]> maxima(TransferFunction h, double low, double high, boolean withLowEnd) {
        List<double[]> out = new ArrayList<>();
        for (double g : PeakFinder.interiorMaxima(h, low, high)) {
            out.add(new double[] {g * g, 1, h.magnitude(g)});
        }
        if (withLowEnd) {
            out.add(new double[] {low * low, 0, h.magnitude(low)});
        }
        if (Double.isFinite(high)) {
            out.add(new double[] {high * high, 0, h.magnitude(high)});
        }
        out.removeIf(c -> !Double.isFinite(c[2]) || !(c[2] > 0));
        out.sort((a, b) -> Double.compare(b[2], a[2]));
        return out;
    }

    /** Indices of the two lowest finite values of a scan sorted by tuning. */
    private static List<Integer> lowestTwo(List<double[]> scan) {
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < scan.size(); i++) {
            if (scan.get(i)[1] < INFEASIBLE) {
                order.add(i);
            }
        }
        order.sort((a, b) -> Double.compare(scan.get(a)[1], scan.get(b)[1]));
        return order.subList(0, Math.min(2, order.size()));
    }

    private double peak(double f, double zeta) {
        double p = PeakScan.peakOf(problem, f, zeta, counter);
        return Double.isFinite(p) ? p : INFEASIBLE;
    }

    private static double[] lower(double[] a, double[] b) {
        return b[2] < a[2] ? b : a;
    }

    private InvalidInputException unreachable() {
        return new InvalidInputException("stroke limit", Checks.show(problem.strokeLimit()),
                "no absorber damping up to " + MAX_DAMPING + " keeps the stroke during run-up (from standstill to"
                        + " the top of the band) this small; allow a larger stroke or a heavier absorber");
    }
}
