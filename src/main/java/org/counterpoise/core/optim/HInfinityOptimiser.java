package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.tuning.ClosedForm;
import org.counterpoise.core.tuning.ClosedForms;
import org.counterpoise.core.tuning.DenHartogEqualPeak;
import org.counterpoise.core.tuning.IoiIkeda;

/**
 * The exact H-infinity absorber: the tuning ratio and damping ratio that minimise the largest
 * value of |H| over the band, for any excitation and response pair, any structure damping and any
 * band, with either variable optionally held fixed.
 *
 * <p>Method. The peak over the band is the largest of finitely many smooth functions of (f,
 * zeta_a): the interior local maxima of |H|^2 (tracked by their stationarity in frequency) and the
 * band ends. At a minimax optimum some of them, the active set, are equal and no convex
 * combination of their gradients can be lowered (Demyanov and Malozemov 1974). Starting from the
 * published closed form nearest to the problem (Den Hartog/Brock, Warburton, Ioi and Ikeda for a
 * damped structure), the optimiser lists the candidate maxima, and for every active set of one,
 * two or three of the highest candidates solves the optimality conditions by Newton's method
 * ({@link ActiveSetNewton}); the bound zeta_a = 0 is tried as well. A solution is accepted only
 * if the exact global peak search ({@link PeakFinder}) confirms that no other maximum is higher
 * and no small move of a free variable lowers the peak. The lowest accepted solution wins. When
 * no active set is accepted (an unusual shape), a Nelder-Mead search on the exact peak finds the
 * neighbourhood of the optimum and the active sets are tried again from there.
 *
 * <p>Why it converges: the optimality conditions are smooth square systems near the solution and
 * the closed-form seeds lie within a few percent of it, inside Newton's region of quadratic
 * convergence; the acceptance test makes a wrong active set harmless. Accuracy: the active values
 * are equal to about 1e-13 relative and the optimum peak agrees with the published exact optimum
 * (Nishihara and Asami 2002) to 1e-12 relative in the tests.
 */
public final class HInfinityOptimiser {
    private static final double ACCEPT = 1e-9;
    private static final double PROBE = 1e-5;
    private static final double SMALL_DAMPING = 0.02;
    private static final double SEED_CUTOFF = 1.2;
    private static final int SCAN_TUNINGS = 16;
    private static final double MIN_DAMPING = 1e-4;
    private static final double MAX_DAMPING = PeakProblem.MAX_DAMPING;
    private static final int SCAN_DAMPINGS = 10;
    private static final int SCAN_BOX_TUNINGS = 48;
    private static final int SCAN_BAND_TUNINGS = 12;
    private static final int SCAN_BOX_DAMPINGS = 15;
    /** A scan point must beat the optimum by this much (relative) to force a restart. */
    private static final double SCAN_MARGIN = 1e-9;
    private static final int MAX_RESTARTS = 4;
    /** A probe must lower the peak by this much (relative) to refute a stationary point. */
    private static final double PROBE_MARGIN = 1e-9;
    private static final int MAX_SIMPLEX_EVALUATIONS = 4000;

    private HInfinityOptimiser() {
    }

    /**
     * @param problem the problem
     * @return the optimum
     * @throws InvalidInputException when every design has an unbounded peak in the band
     */
    public static PeakOptimum optimise(PeakProblem problem) {
        Counter counter = new Counter();
        if (!Double.isNaN(problem.strokeLimit())) {
            PeakOptimum free = unconstrained(problem.withStrokeLimit(Double.NaN), counter);
            if (problem.strokePeak(free.tuning().tuningRatio(), free.tuning().dampingRatio())
                    <= problem.strokeLimit()) {
                return free;
            }
            return strokeLimited(problem, free, counter);
        }
        return unconstrained(problem, counter);
    }

    private static PeakOptimum unconstrained(PeakProblem problem, Counter counter) {
        List<double[]> seeds = seeds(problem);
        Best best = new Best();
        for (int i = 0; i < seeds.size(); i++) {
            double[] seed = seeds.get(i);
            double peak = peakOf(problem, seed[0], seed[1], counter);
            seeds.set(i, new double[] {seed[0], seed[1], peak});
            best.offer(seed[0], seed[1], peak, "seed", false);
        }
        if (!problem.allFrequencies()) {
            seeds.addAll(scan(problem, counter));
        }
        // The classical design is always a candidate (not a start), so the result is never worse.
        Tuning classical = DenHartogEqualPeak.tuning(problem.massRatio());
        double cf = fixedOr(problem.fixedTuning(), classical.tuningRatio());
        double cz = fixedOr(problem.fixedDamping(), classical.dampingRatio());
        best.offer(cf, cz, peakOf(problem, cf, cz, counter), "seed", false);
        if (Double.isInfinite(best.peak)) {
            throw new InvalidInputException("band", problem.bandLow() + ":" + problem.bandHigh(),
                    "the response " + problem.response().label() + " under " + problem.excitation().label()
                            + " has no finite peak in this band for any absorber; choose a band that excludes"
                            + (problem.bandLow() == 0 ? " zero frequency" : " infinite frequency"));
        }
        // Best starting points first; a seed already well above a verified optimum is not pursued.
        seeds.sort((a, b) -> Double.compare(a[2], b[2]));
        for (double[] seed : seeds) {
            if (best.converged && seed[2] > SEED_CUTOFF * best.peak) {
                break;
            }
            solveFrom(problem, seed[0], seed[1], best, counter);
        }
        if (!best.converged) {
            polish(problem, best, counter);
        }
        // Certification, independent of how the design was found: never worse than a coarse scan
        // of the whole search box and the classical designs (restart from any point that beats
        // it), and the first-order minimax conditions hold (MinimaxCertificate).
        List<double[]> scan = globalScan(problem, counter);
        for (int restart = 0; restart < MAX_RESTARTS; restart++) {
            double[] better = null;
            for (double[] point : scan) {
                if (point[2] < best.peak * (1 - SCAN_MARGIN)) {
                    better = point;
                    break;
                }
            }
            if (better == null) {
                break;
            }
            scan.remove(better);
            best.offer(better[0], better[1], better[2], "scan", false);
            solveFrom(problem, better[0], better[1], best, counter);
            if (!best.converged) {
                polish(problem, best, counter);
            }
        }
        double scanBest = scan.isEmpty() ? Double.POSITIVE_INFINITY : scan.get(0)[2];
        for (double[] point : scan) {
            scanBest = Math.min(scanBest, point[2]);
        }
        if (!best.converged) {
            // No active set was solved: Nelder-Mead may have stalled in a narrow valley. Restart it
            // from the best point with smaller simplices (the usual remedy), then certify.
            for (double size : new double[] {0.01, 0.001}) {
                double[] again = nelderMead(problem, new double[] {best.f, best.zeta}, counter, size);
                best.offer(again[0], again[1], peakOf(problem, again[0], again[1], counter), "search", false);
            }
            // and from the best scan points: a flat problem can hold nearby local minima
            for (int i = 0; i < Math.min(3, scan.size()); i++) {
                double[] s0 = scan.get(i);
                double[] again = nelderMead(problem, new double[] {s0[0], s0[1]}, counter, 0.02);
                best.offer(again[0], again[1], peakOf(problem, again[0], again[1], counter), "search", false);
            }
        }
        boolean firstOrder = MinimaxCertificate.isStationary(problem, best.f, best.zeta);
        for (int attempt = 0; attempt < 2 && !firstOrder; attempt++) {
            // a point where the first-order conditions fail has a descent direction: search on
            polish(problem, best, counter);
            firstOrder = MinimaxCertificate.isStationary(problem, best.f, best.zeta);
        }
        counter.count++;
        boolean stationary = firstOrder || noDescentByProbe(problem, best.f, best.zeta, best.peak, counter);
        boolean certified = Double.isFinite(best.peak) && best.peak <= scanBest * (1 + SCAN_MARGIN) && stationary;
        ActiveConstraint constraint = !Double.isNaN(problem.fixedDamping()) ? ActiveConstraint.FIXED_DAMPING
                : !Double.isNaN(problem.fixedTuning()) ? ActiveConstraint.FIXED_TUNING : ActiveConstraint.NONE;
        if (Double.isNaN(problem.fixedTuning()) && (best.f <= problem.minTuning() * (1 + 1e-9)
                || best.f >= problem.maxTuning() * (1 - 1e-9))) {
            constraint = ActiveConstraint.TUNING_SEARCH_BOUND;
        }
        return new PeakOptimum(problem.tuning(best.f, best.zeta), best.peak,
                best.converged || !certified ? best.activeSet : "stationary point of the peak (direct search)",
                counter.count, certified, constraint);
    }

    /**
     * The fallback first-order test, on values: where the gradient test fails only because the
     * optimum is too flat in one variable to locate it to round-off (a very narrow band, a tiny
     * damping), no move of 10^-1 ... 10^-8 (relative in f; times max(zeta_a, 0.01) in zeta_a) in
     * any of the eight directions of the (f, zeta_a) plane, inside the box, lowers the peak by more
     * than 1e-9 relative.
     */
    private static boolean noDescentByProbe(PeakProblem p, double f, double zeta, double peak, Counter counter) {
        double floor = peak * (1 - PROBE_MARGIN);
        boolean tuningFree = Double.isNaN(p.fixedTuning());
        boolean dampingFree = Double.isNaN(p.fixedDamping());
        for (int k = 1; k <= 8; k++) {
            double h = Math.pow(10, -k);
            for (int a = -1; a <= 1; a++) {
                for (int b = -1; b <= 1; b++) {
                    if ((a == 0 && b == 0) || (a != 0 && !tuningFree) || (b != 0 && !dampingFree)) {
                        continue;
                    }
                    double ft = f * (1 + a * h);
                    double zt = zeta + b * h * Math.max(zeta, 1e-2);
                    if (zt < 0 || !p.inBox(ft, zt)) {
                        continue;
                    }
                    if (peakOf(p, ft, zt, counter) < floor) {
                        return false;
                    }
                }
            }
        }
        return true;
    }

    /** Nelder-Mead on the exact peak from the best point so far, then the active sets from there. */
    private static void polish(PeakProblem problem, Best best, Counter counter) {
        double[] near = nelderMead(problem, new double[] {best.f, best.zeta}, counter);
        best.offer(near[0], near[1], peakOf(problem, near[0], near[1], counter), "search", false);
        solveFrom(problem, near[0], near[1], best, counter);
        if (Double.isNaN(problem.fixedDamping()) && Double.isNaN(problem.fixedTuning()) && best.zeta < SMALL_DAMPING
                && !best.converged) {
            // the bound zeta_a = 0 is outside Nelder-Mead's logarithmic variables: search on it too
            PeakProblem undamped = problem.withFixedDamping(0.0);
            double[] onBound = nelderMead(undamped, new double[] {best.f, 0.0}, counter);
            best.offer(onBound[0], 0.0, peakOf(problem, onBound[0], 0.0, counter), "search, absorber damping 0", false);
            tryActiveSets(undamped, onBound[0], 0.0, best, counter);
        }
    }

    /**
     * The coarse global scan that certifies an optimum: the band peak on a grid over the whole
     * search box (48 tunings log-spaced over [minTuning, maxTuning], plus 12 spread over the band
     * itself, times the damping 0 and 15 values log-spaced over [1e-3, MAX_DAMPING]), and the
     * classical designs (Den Hartog, the published equal-peak form of the pair, Ioi and Ikeda,
     * Nishihara and Asami) where they lie in the box. Sorted by peak, lowest first.
     */
    static List<double[]> globalScan(PeakProblem p, Counter counter) {
        List<Double> tunings = new ArrayList<>();
        if (!Double.isNaN(p.fixedTuning())) {
            tunings.add(p.fixedTuning());
        } else {
            for (int i = 0; i < SCAN_BOX_TUNINGS; i++) {
                tunings.add(p.minTuning() * Math.pow(p.maxTuning() / p.minTuning(), i / (SCAN_BOX_TUNINGS - 1.0)));
            }
            if (!p.allFrequencies()) {
                double top = Double.isFinite(p.bandHigh()) ? p.bandHigh() : 2 * Math.max(p.bandLow(), 0.5);
                for (int i = 0; i < SCAN_BAND_TUNINGS; i++) {
                    double f = p.bandLow() + (top - p.bandLow()) * (i + 0.5) / SCAN_BAND_TUNINGS;
                    if (f >= p.minTuning() && f <= p.maxTuning()) {
                        tunings.add(f);
                    }
                }
            }
        }
        List<Double> dampings = new ArrayList<>();
        if (!Double.isNaN(p.fixedDamping())) {
            dampings.add(p.fixedDamping());
        } else {
            dampings.add(0.0);
            for (int j = 0; j < SCAN_BOX_DAMPINGS; j++) {
                dampings.add(1e-3 * Math.pow(PeakProblem.MAX_DAMPING / 1e-3, j / (SCAN_BOX_DAMPINGS - 1.0)));
            }
        }
        List<double[]> points = new ArrayList<>();
        for (double f : tunings) {
            for (double zeta : dampings) {
                points.add(new double[] {f, zeta, peakOf(p, f, zeta, counter)});
            }
        }
        for (Tuning t : classicalDesigns(p)) {
            double f = fixedOr(p.fixedTuning(), t.tuningRatio());
            double zeta = fixedOr(p.fixedDamping(), t.dampingRatio());
            points.add(new double[] {f, zeta, peakOf(p, f, zeta, counter)});
        }
        points.removeIf(point -> !Double.isFinite(point[2]));
        points.sort((a, b) -> Double.compare(a[2], b[2]));
        return points;
    }

    /** The published designs that apply to the problem's pair and mass ratio. */
    private static List<Tuning> classicalDesigns(PeakProblem p) {
        double mu = p.massRatio();
        List<Tuning> out = new ArrayList<>();
        out.add(DenHartogEqualPeak.tuning(mu));
        ClosedForms.equalPeak(p.excitation(), p.response(), mu).map(ClosedForm::tuning).ifPresent(out::add);
        if (p.excitation() == ExcitationKind.FORCE && p.response() == ResponseKind.DISPLACEMENT) {
            out.add(org.counterpoise.core.tuning.NishiharaAsamiExact.tuning(mu));
            if (p.structureDamping() > 0) {
                out.add(IoiIkeda.tuning(mu, Math.min(p.structureDamping(), 0.1)));
            }
        }
        return out;
    }

    /**
     * The optimum on the stroke limit, when the free optimum's stroke exceeds it. More absorber
     * damping lowers the stroke, so the limit then holds with equality at the optimum: for each
     * tuning the least damping that meets it, zeta_c(f), is found by Brent's root finder, and the
     * band peak along that curve is minimised over f by Brent's minimiser (relative accuracy 1e-10
     * in f). Needs the damping to be free.
     */
    private static PeakOptimum strokeLimited(PeakProblem problem, PeakOptimum free, Counter counter) {
        if (!Double.isNaN(problem.fixedDamping())) {
            throw new InvalidInputException("stroke limit", org.counterpoise.core.error.Checks.show(problem.strokeLimit()),
                    "cannot be met with the absorber damping held fixed (the best design's stroke exceeds it);"
                            + " free the damping or allow a larger stroke");
        }
        double limit = problem.strokeLimit();
        java.util.function.DoubleUnaryOperator dampingOnLimit = f -> {
            org.apache.commons.math3.analysis.UnivariateFunction excess = z -> {
                counter.count++;
                return Math.log(problem.strokePeak(f, z) / limit);
            };
            if (excess.value(MAX_DAMPING) > 0) {
                return Double.NaN;
            }
            if (excess.value(MIN_DAMPING) <= 0) {
                return MIN_DAMPING;
            }
            try {
                return new org.apache.commons.math3.analysis.solvers.BrentSolver(1e-14, 1e-12)
                        .solve(200, excess, MIN_DAMPING, MAX_DAMPING);
            } catch (org.apache.commons.math3.exception.MathIllegalStateException
                    | org.apache.commons.math3.exception.MathIllegalArgumentException notBracketed) {
                return Double.NaN; // treated as "no damping meets the limit at this tuning"
            }
        };
        double f0 = free.tuning().tuningRatio();
        if (!Double.isNaN(problem.fixedTuning())) {
            double z = dampingOnLimit.applyAsDouble(f0);
            if (Double.isNaN(z)) {
                throw unreachable(problem);
            }
            return new PeakOptimum(problem.tuning(f0, z), peakOf(problem, f0, z, counter), "stroke on its limit",
                    counter.count, true, ActiveConstraint.STROKE_LIMIT);
        }
        org.apache.commons.math3.analysis.UnivariateFunction alongLimit = f -> {
            double z = dampingOnLimit.applyAsDouble(f);
            double peak = Double.isNaN(z) ? 1e300 : peakOf(problem, f, z, counter);
            return Double.isFinite(peak) ? peak : 1e300;
        };
        double low = Math.max(0.5 * f0, problem.minTuning());
        double high = Math.min(1.5 * f0, problem.maxTuning());
        double[] found = minimiseAlongLimit(alongLimit, low, high, f0);
        // Certification on the limit curve: a coarse scan of tunings over the whole search box;
        // a point that beats the local minimum restarts Brent's search around it.
        int points = 24;
        double[] grid = new double[points];
        for (int i = 0; i < points; i++) {
            grid[i] = problem.minTuning() * Math.pow(problem.maxTuning() / problem.minTuning(), i / (points - 1.0));
        }
        double scanBest = Double.POSITIVE_INFINITY;
        double scanAt = Double.NaN;
        for (double f : grid) {
            double v = alongLimit.value(f);
            if (v < scanBest) {
                scanBest = v;
                scanAt = f;
            }
        }
        if (scanBest < found[1] * (1 - SCAN_MARGIN)) {
            double ratio = Math.pow(problem.maxTuning() / problem.minTuning(), 1.0 / (points - 1.0));
            double[] again = minimiseAlongLimit(alongLimit, Math.max(scanAt / ratio, problem.minTuning()),
                    Math.min(scanAt * ratio, problem.maxTuning()), scanAt);
            if (again[1] < found[1]) {
                found = again;
            }
        }
        if (found[1] >= 1e300) {
            throw unreachable(problem);
        }
        double f = found[0];
        double z = dampingOnLimit.applyAsDouble(f);
        boolean certified = found[1] <= Math.min(scanBest, 1e300) * (1 + SCAN_MARGIN) && !Double.isNaN(z);
        if (Double.isNaN(z)) {
            throw unreachable(problem);
        }
        return new PeakOptimum(problem.tuning(f, z), peakOf(problem, f, z, counter), "stroke on its limit",
                counter.count, certified, ActiveConstraint.STROKE_LIMIT);
    }

    /** Brent's minimiser of the peak along the stroke limit over [low, high]; {f, value}. */
    private static double[] minimiseAlongLimit(org.apache.commons.math3.analysis.UnivariateFunction alongLimit,
            double low, double high, double start) {
        if (!(high > low)) {
            return new double[] {low, alongLimit.value(low)};
        }
        try {
            org.apache.commons.math3.optim.univariate.UnivariatePointValuePair best =
                    new org.apache.commons.math3.optim.univariate.BrentOptimizer(1e-10, 1e-14).optimize(
                            new MaxEval(500), new org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction(
                                    alongLimit), GoalType.MINIMIZE,
                            new org.apache.commons.math3.optim.univariate.SearchInterval(low, high,
                                    Math.max(low, Math.min(high, start))));
            return new double[] {best.getPoint(), best.getValue()};
        } catch (TooManyEvaluationsException limit) {
            return new double[] {start, alongLimit.value(start)};
        }
    }

    private static InvalidInputException unreachable(PeakProblem problem) {
        return new InvalidInputException("stroke limit", org.counterpoise.core.error.Checks.show(problem.strokeLimit()),
                "no absorber damping up to " + MAX_DAMPING + " keeps the stroke this small; allow a larger stroke or"
                        + " a heavier absorber");
    }

    /** The closed-form seeds: published optimum for the pair, and for a band one tuned inside it. */
    static List<double[]> seeds(PeakProblem p) {
        List<double[]> seeds = new ArrayList<>();
        double mu = p.massRatio();
        Tuning base = ClosedForms.equalPeak(p.excitation(), p.response(), mu).map(ClosedForm::tuning)
                .orElse(DenHartogEqualPeak.tuning(mu));
        if (p.structureDamping() > 0 && p.excitation() == ExcitationKind.FORCE
                && p.response() == ResponseKind.DISPLACEMENT) {
            base = IoiIkeda.tuning(mu, Math.min(p.structureDamping(), 0.1));
        }
        seeds.add(new double[] {fixedOr(p.fixedTuning(), base.tuningRatio()),
            fixedOr(p.fixedDamping(), base.dampingRatio())});

        if (!p.allFrequencies()) {
            double top = Double.isInfinite(p.bandHigh()) ? 2 * Math.max(p.bandLow(), 0.5) : p.bandHigh();
            double centre = 0.5 * (p.bandLow() + top);
            seeds.add(new double[] {fixedOr(p.fixedTuning(), centre), fixedOr(p.fixedDamping(), 0.3 * base.dampingRatio())});
            seeds.add(new double[] {fixedOr(p.fixedTuning(), centre), fixedOr(p.fixedDamping(), base.dampingRatio())});
        }
        return seeds;
    }

    private static double fixedOr(double fixed, double value) {
        return Double.isNaN(fixed) ? value : fixed;
    }

    /** Tries every active set of up to three of the highest candidate maxima, and the bound zeta_a = 0. */
    private static void solveFrom(PeakProblem problem, double f, double zeta, Best best, Counter counter) {
        tryActiveSets(problem, f, zeta, best, counter);
        // The bound zeta_a = 0 can be optimal only over a band that excludes both resonances;
        // try it when the best damping found is already small.
        if (Double.isNaN(problem.fixedDamping()) && !problem.allFrequencies() && best.zeta < SMALL_DAMPING) {
            tryActiveSets(problem.withFixedDamping(0.0), f, 0.0, best, counter);
        }
    }

    /**
     * A coarse scan of the band peak over tuning inside and around the band and damping over three
     * decades, whose three best points seed the active-set search: over a band the optimum can sit
     * far from any closed form (tuned inside the band, lightly damped).
     */
    private static List<double[]> scan(PeakProblem p, Counter counter) {
        double top = Double.isInfinite(p.bandHigh()) ? Math.max(2.0, 2 * p.bandLow()) : p.bandHigh();
        double fLow = Math.max(0.05, 0.7 * Math.min(p.bandLow(), 1.0));
        double fHigh = Math.max(1.2, 1.2 * top);
        List<double[]> points = new ArrayList<>();
        for (int i = 0; i < SCAN_TUNINGS; i++) {
            double f = Double.isNaN(p.fixedTuning()) ? fLow * Math.pow(fHigh / fLow, i / (SCAN_TUNINGS - 1.0))
                    : p.fixedTuning();
            for (int j = 0; j < SCAN_DAMPINGS; j++) {
                double zeta = Double.isNaN(p.fixedDamping()) ? 0.002 * Math.pow(500, j / (SCAN_DAMPINGS - 1.0))
                        : p.fixedDamping();
                points.add(new double[] {f, zeta, peakOf(p, f, zeta, counter)});
            }
        }
        points.sort((a, b) -> Double.compare(a[2], b[2]));
        return new ArrayList<>(points.subList(0, Math.min(3, points.size())));
    }

    /**
     * @return true when an active set was verified; the first verified set ends the search from
     *     this seed (the seeds, closed forms and the best points of a coarse scan, cover the
     *     places where distinct local optima can sit).
     */
    private static boolean tryActiveSets(PeakProblem problem, double f, double zeta, Best best, Counter counter) {
        List<double[]> candidates = candidates(problem, f, zeta, counter);
        int n = Math.min(candidates.size(), 4);
        List<int[]> sets = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                sets.add(new int[] {i, j});
            }
        }
        for (int i = 0; i < n; i++) {
            sets.add(new int[] {i});
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                for (int k = j + 1; k < n; k++) {
                    sets.add(new int[] {i, j, k});
                }
            }
        }
        for (int[] set : sets) {
            boolean[] interior = new boolean[set.length];
            double[] x = new double[set.length];
            for (int i = 0; i < set.length; i++) {
                interior[i] = candidates.get(set[i])[1] > 0;
                x[i] = candidates.get(set[i])[0];
            }
            ActiveSetNewton newton = new ActiveSetNewton(problem, interior, x);
            if (!newton.isSquare()) {
                continue;
            }
            double[] s = newton.solve(f, zeta);
            counter.count += newton.evaluations();
            if (s == null || s[1] < 0 || s[0] <= 0) {
                continue;
            }
            double active = Math.sqrt(Math.exp(problem.transferFunction(s[0], s[1]).logMagnitudeSquared(s[2])));
            double peak = peakOf(problem, s[0], s[1], counter);
            if (peak <= active * (1 + ACCEPT) && isLocalMinimum(problem, s[0], s[1], peak, counter)
                    && MinimaxCertificate.isStationary(problem, s[0], s[1])) {
                best.offer(s[0], s[1], peak, describe(interior, problem.fixedDamping() == 0.0), true);
                return true;
            }
        }
        return false;
    }

    /** Candidate maxima at a design: {x, 1 for interior or 0 for a band end, value}, highest first. */
    private static List<double[]> candidates(PeakProblem p, double f, double zeta, Counter counter) {
        counter.count++;
        TransferFunction h = p.transferFunction(f, zeta);
        List<double[]> out = new ArrayList<>();
        for (double g : PeakFinder.interiorMaxima(h, p.bandLow(), p.bandHigh())) {
            out.add(new double[] {g * g, 1, h.magnitude(g)});
        }
        if (p.bandLow() > 0) {
            out.add(new double[] {p.bandLow() * p.bandLow(), 0, h.magnitude(p.bandLow())});
        }
        if (Double.isFinite(p.bandHigh())) {
            out.add(new double[] {p.bandHigh() * p.bandHigh(), 0, h.magnitude(p.bandHigh())});
        }
        out.removeIf(c -> !Double.isFinite(c[2]));
        out.sort((a, b) -> Double.compare(b[2], a[2]));
        return out;
    }

    private static boolean isLocalMinimum(PeakProblem p, double f, double zeta, double peak, Counter counter) {
        double floor = peak * (1 - 1e-12);
        if (Double.isNaN(p.fixedTuning())) {
            if (peakOf(p, f * (1 + PROBE), zeta, counter) < floor || peakOf(p, f * (1 - PROBE), zeta, counter) < floor) {
                return false;
            }
        }
        if (Double.isNaN(p.fixedDamping())) {
            double dz = PROBE * Math.max(zeta, 1e-2);
            if (peakOf(p, f, zeta + dz, counter) < floor) {
                return false;
            }
            if (zeta - dz >= 0 && peakOf(p, f, zeta - dz, counter) < floor) {
                return false;
            }
        }
        return true;
    }

    private static double peakOf(PeakProblem p, double f, double zeta, Counter counter) {
        counter.count++;
        if (!p.inBox(f, zeta)) {
            return Double.POSITIVE_INFINITY; // outside the search box: never built, never reported
        }
        Peak peak = PeakFinder.over(p.transferFunction(f, zeta), p.bandLow(), p.bandHigh());
        return peak.magnitude();
    }

    private static double[] nelderMead(PeakProblem p, double[] start, Counter counter) {
        return nelderMead(p, start, counter, 0.05);
    }

    private static double[] nelderMead(PeakProblem p, double[] start, Counter counter, double size) {
        // Search in logarithms so that f and zeta_a stay positive without bounds.
        // The box is kept by clamping each trial into it and adding the distance outside as a
        // penalty (a continuous exact penalty), so no trial is ever built outside the box.
        double lowF = Math.log(p.minTuning());
        double highF = Math.log(p.maxTuning());
        double lowZ = Math.log(1e-8);
        double highZ = Math.log(PeakProblem.MAX_DAMPING);
        double[] guess = {clamp(Math.log(start[0]), lowF, highF), clamp(Math.log(Math.max(start[1], 1e-4)), lowZ, highZ)};
        double[] bestSeen = {Double.POSITIVE_INFINITY, guess[0], guess[1]};
        ObjectiveFunction objective = new ObjectiveFunction(v -> {
            double a = clamp(v[0], lowF, highF);
            double b = clamp(v[1], lowZ, highZ);
            double value = Math.log(peakOf(p, Math.exp(a), Math.exp(b), counter));
            if (value < bestSeen[0]) {
                bestSeen[0] = value;
                bestSeen[1] = a;
                bestSeen[2] = b;
            }
            return value + Math.abs(v[0] - a) + Math.abs(v[1] - b);
        });
        try {
            new SimplexOptimizer(1e-12, 1e-14).optimize(new MaxEval(MAX_SIMPLEX_EVALUATIONS), objective,
                    GoalType.MINIMIZE, new InitialGuess(guess), new NelderMeadSimplex(new double[] {size, 6 * size}));
        } catch (TooManyEvaluationsException limit) {
            // the best point seen is kept; certification decides whether it is an optimum
        }
        return new double[] {Math.exp(bestSeen[1]), Math.exp(bestSeen[2])};
    }

    private static double clamp(double v, double low, double high) {
        return Math.max(low, Math.min(high, v));
    }

    private static String describe(boolean[] interior, boolean undamped) {
        int inside = 0;
        for (boolean b : interior) {
            if (b) {
                inside++;
            }
        }
        int ends = interior.length - inside;
        List<String> parts = new ArrayList<>();
        if (inside > 0) {
            parts.add(inside == 1 ? "one interior peak" : inside + " equal interior peaks");
        }
        if (ends > 0) {
            parts.add(ends == 1 ? "one band end" : "both band ends");
        }
        return String.join(" and ", parts) + (undamped ? ", absorber damping at its bound 0" : "");
    }

    private static final class Counter {
        private int count;
    }

    private static final class Best {
        private double f;
        private double zeta;
        private double peak = Double.POSITIVE_INFINITY;
        private String activeSet = "none";
        private boolean converged;

        void offer(double f, double zeta, double peak, String activeSet, boolean converged) {
            // A verified solution replaces an unverified one of the same height.
            if (peak < this.peak * (1 - 1e-14) || (converged && !this.converged && peak <= this.peak * (1 + 1e-12))) {
                this.f = f;
                this.zeta = zeta;
                this.peak = peak;
                this.activeSet = activeSet;
                this.converged = converged;
            }
        }
    }
}
