package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.tuning.DenHartogEqualPeak;

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
    /** A scan point must beat the optimum by this much (relative) to force a restart. */
    private static final double SCAN_MARGIN = 1e-9;
    /** The largest relative amount by which the checked route may value the optimum's peak above the search's. */
    private static final double VALUE_CHECK = 1e-9;
    private static final int MAX_RESTARTS = 4;

    private HInfinityOptimiser() {
    }

    /**
     * @param problem the problem
     * @return the optimum
     * @throws InvalidInputException when every design has an unbounded peak in the band
     */
    public static PeakOptimum optimise(PeakProblem problem) {
        EvaluationCounter counter = new EvaluationCounter();
        if (problem.hasStrokeLimit()) {
            // the limit holds over the run-up [0, strokeTop]: a loose limit leaves the free optimum
            PeakOptimum free = unconstrained(problem.withStrokeLimit(Double.NaN), counter);
            if (problem.strokePeak(free.tuning().tuningRatio(), free.tuning().dampingRatio())
                    <= problem.strokeLimit()) {
                return free;
            }
            return StrokeLimitedOptimum.optimise(problem, free, counter);
        }
        return unconstrained(problem, counter);
    }

    private static PeakOptimum unconstrained(PeakProblem problem, EvaluationCounter counter) {
        List<double[]> seeds = PeakScan.seeds(problem);
        Best best = new Best();
        for (int i = 0; i < seeds.size(); i++) {
            double[] seed = seeds.get(i);
            double peak = PeakScan.peakOf(problem, seed[0], seed[1], counter);
            seeds.set(i, new double[] {seed[0], seed[1], peak});
            best.offer(seed[0], seed[1], peak, "seed", false);
        }
        if (!problem.allFrequencies()) {
            seeds.addAll(PeakScan.seedScan(problem, counter));
        }
        // The classical design is always a candidate (not a start), so the result is never worse.
        Tuning classical = DenHartogEqualPeak.tuning(problem.massRatio());
        double cf = PeakScan.fixedOr(problem.fixedTuning(), classical.tuningRatio());
        double cz = PeakScan.fixedOr(problem.fixedDamping(), classical.dampingRatio());
        best.offer(cf, cz, PeakScan.peakOf(problem, cf, cz, counter), "seed", false);
        if (Double.isInfinite(best.peak)) {
            throw noFinitePeak(problem);
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
        PeakScan.GlobalScan scan = PeakScan.global(problem, counter, best.peak, new double[] {best.f, best.zeta});
        for (int restart = 0; restart < MAX_RESTARTS; restart++) {
            double[] better = scan.firstBelow(best.peak * (1 - SCAN_MARGIN));
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
        double scanBest = scan.lowest();
        if (!best.converged) {
            // No active set was solved: Nelder-Mead may have stalled in a narrow valley. Restart it
            // from the best point with smaller simplices (the usual remedy), then certify.
            for (double size : new double[] {0.01, 0.001}) {
                double[] again = PeakDirectSearch.nelderMead(problem, new double[] {best.f, best.zeta}, counter, size);
                best.offer(again[0], again[1], PeakScan.peakOf(problem, again[0], again[1], counter), "search", false);
            }
            // and from the best scan points: a flat problem can hold nearby local minima
            List<double[]> lowest = scan.resolved();
            for (int i = 0; i < Math.min(3, lowest.size()); i++) {
                double[] s0 = lowest.get(i);
                double[] again = PeakDirectSearch.nelderMead(problem, new double[] {s0[0], s0[1]}, counter, 0.02);
                best.offer(again[0], again[1], PeakScan.peakOf(problem, again[0], again[1], counter), "search", false);
            }
        }
        boolean firstOrder = MinimaxCertificate.isStationary(problem, best.f, best.zeta);
        for (int attempt = 0; attempt < 2 && !firstOrder; attempt++) {
            // a point where the first-order conditions fail has a descent direction: search on
            polish(problem, best, counter);
            firstOrder = MinimaxCertificate.isStationary(problem, best.f, best.zeta);
        }
        counter.add(1);
        boolean stationary = firstOrder || PeakDirectSearch.noDescentByProbe(problem, best.f, best.zeta, best.peak, counter);
        // the printed peak valued again on the route that keeps its accuracy where the expanded |H|^2 loses it
        // (very light absorbers: 447.2098 against 447.2148 at a mass ratio of 1e-5); a difference is said by
        // reporting the larger, the design's true peak, uncertified
        double checked = PeakFinder.overChecked(problem.transferFunction(best.f, best.zeta), problem.bandLow(),
                problem.bandHigh()).magnitude();
        boolean valued = !(checked > best.peak * (1 + VALUE_CHECK));
        double peak = valued ? best.peak : checked;
        boolean certified = Double.isFinite(best.peak) && best.peak <= scanBest * (1 + SCAN_MARGIN) && stationary
                && valued;
        ActiveConstraint constraint = !Double.isNaN(problem.fixedDamping()) ? ActiveConstraint.FIXED_DAMPING
                : !Double.isNaN(problem.fixedTuning()) ? ActiveConstraint.FIXED_TUNING : ActiveConstraint.NONE;
        if (Double.isNaN(problem.fixedTuning()) && (best.f <= problem.minTuning() * (1 + 1e-9)
                || best.f >= problem.maxTuning() * (1 - 1e-9))) {
            constraint = ActiveConstraint.TUNING_SEARCH_BOUND;
        }
        return new PeakOptimum(problem.tuning(best.f, best.zeta), peak,
                best.converged || !certified ? best.activeSet : "stationary point of the peak (direct search)",
                counter.count(), certified, constraint);
    }

    /**
     * The certificate on its own, for a design found by any route: the first-order minimax
     * conditions hold (or no probe lowers the peak) and no point of the global scan or classical
     * design is lower. The same rule {@link #optimise} applies to its own result.
     *
     * @return true when (f, zeta) is certified as the optimum of the problem (no stroke limit)
     */
    static boolean certifies(PeakProblem problem, double f, double zeta) {
        EvaluationCounter counter = new EvaluationCounter();
        double peak = PeakScan.peakOf(problem, f, zeta, counter);
        if (!Double.isFinite(peak)) {
            return false;
        }
        PeakScan.GlobalScan scan = PeakScan.global(problem, counter, peak, new double[] {f, zeta});
        boolean stationary = MinimaxCertificate.isStationary(problem, f, zeta)
                || PeakDirectSearch.noDescentByProbe(problem, f, zeta, peak, counter);
        return peak <= scan.lowest() * (1 + SCAN_MARGIN) && stationary;
    }

    /**
     * The first verified active set of the free problem from a start (as the optimiser tries them),
     * for the stroke-limited search when its best design lies off the limit.
     *
     * @return {f, zeta, peak}, or null when no active set from there is verified
     */
    static double[] freeActiveSet(PeakProblem problem, double f, double zeta, EvaluationCounter counter) {
        Best best = new Best();
        return tryActiveSets(problem, f, zeta, best, counter) ? new double[] {best.f, best.zeta, best.peak} : null;
    }

    /** Nelder-Mead on the exact peak from the best point so far, then the active sets from there. */
    private static void polish(PeakProblem problem, Best best, EvaluationCounter counter) {
        double[] near = PeakDirectSearch.nelderMead(problem, new double[] {best.f, best.zeta}, counter);
        best.offer(near[0], near[1], PeakScan.peakOf(problem, near[0], near[1], counter), "search", false);
        solveFrom(problem, near[0], near[1], best, counter);
        if (Double.isNaN(problem.fixedDamping()) && Double.isNaN(problem.fixedTuning()) && best.zeta < SMALL_DAMPING
                && !best.converged) {
            // the bound zeta_a = 0 is outside Nelder-Mead's logarithmic variables: search on it too
            PeakProblem undamped = problem.withFixedDamping(0.0);
            double[] onBound = PeakDirectSearch.nelderMead(undamped, new double[] {best.f, 0.0}, counter);
            best.offer(onBound[0], 0.0, PeakScan.peakOf(problem, onBound[0], 0.0, counter), "search, absorber damping 0", false);
            tryActiveSets(undamped, onBound[0], 0.0, best, counter);
        }
    }


    /** Tries every active set of up to three of the highest candidate maxima, and the bound zeta_a = 0. */
    private static void solveFrom(PeakProblem problem, double f, double zeta, Best best, EvaluationCounter counter) {
        tryActiveSets(problem, f, zeta, best, counter);
        // The bound zeta_a = 0 can be optimal only over a band that excludes both resonances;
        // try it when the best damping found is already small.
        if (Double.isNaN(problem.fixedDamping()) && !problem.allFrequencies() && best.zeta < SMALL_DAMPING) {
            tryActiveSets(problem.withFixedDamping(0.0), f, 0.0, best, counter);
        }
    }

    /**
     * @return true when an active set was verified; the first verified set ends the search from
     *     this seed (the seeds, closed forms and the best points of a coarse scan, cover the
     *     places where distinct local optima can sit).
     */
    private static boolean tryActiveSets(PeakProblem problem, double f, double zeta, Best best, EvaluationCounter counter) {
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
            ActiveSetNewton newton = ActiveSetNewton.of(problem, candidates, set);
            if (!newton.isSquare()) {
                continue;
            }
            double[] s = newton.solve(f, zeta);
            counter.add(newton.evaluations());
            if (s == null || s[1] < 0 || s[0] <= 0) {
                continue;
            }
            double active = Math.sqrt(Math.exp(problem.transferFunction(s[0], s[1]).logMagnitudeSquared(s[2])));
            double peak = PeakScan.peakOf(problem, s[0], s[1], counter);
            if (peak <= active * (1 + ACCEPT) && isLocalMinimum(problem, s[0], s[1], peak, counter)
                    && MinimaxCertificate.isStationary(problem, s[0], s[1])) {
                best.offer(s[0], s[1], peak, describe(newton.interior(), problem.fixedDamping() == 0.0), true);
                return true;
            }
        }
        return false;
    }

    /** Candidate maxima at a design: {x, 1 for interior or 0 for a band end, value}, highest first. */
    private static List<double[]> candidates(PeakProblem p, double f, double zeta, EvaluationCounter counter) {
        counter.add(1);
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

    private static boolean isLocalMinimum(PeakProblem p, double f, double zeta, double peak, EvaluationCounter counter) {
        double floor = peak * (1 - 1e-12);
        if (Double.isNaN(p.fixedTuning())) {
            if (PeakScan.peakOf(p, f * (1 + PROBE), zeta, counter) < floor || PeakScan.peakOf(p, f * (1 - PROBE), zeta, counter) < floor) {
                return false;
            }
        }
        if (Double.isNaN(p.fixedDamping())) {
            double dz = PROBE * Math.max(zeta, 1e-2);
            if (PeakScan.peakOf(p, f, zeta + dz, counter) < floor) {
                return false;
            }
            if (zeta - dz >= 0 && PeakScan.peakOf(p, f, zeta - dz, counter) < floor) {
                return false;
            }
        }
        return true;
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

    /**
     * Why no absorber gives a finite peak, in words and on the input that causes it (never a value the
     * user did not type, such as an infinite band end): no damping anywhere (every tuning leaves an
     * undamped resonance in reach), a response that grows without bound at high or at zero frequency.
     */
    private static InvalidInputException noFinitePeak(PeakProblem problem) {
        String what = "the response " + problem.response().label() + " under " + problem.excitation().label();
        if (problem.structureDamping() == 0 && problem.fixedDamping() == 0) {
            return new InvalidInputException("fixed absorber damping ratio", "0", "a damping ratio above 0: with no"
                    + " damping in the structure or the absorber, " + what + " is unbounded at a natural frequency"
                    + " of the pair " + (problem.allFrequencies() ? "" : "in this band ") + "for every tuning");
        }
        Tuning classical = DenHartogEqualPeak.tuning(problem.massRatio());
        TransferFunction h = problem.transferFunction(classical.tuningRatio(),
                PeakScan.fixedOr(problem.fixedDamping(), classical.dampingRatio()));
        boolean atHigh = Double.isInfinite(problem.bandHigh()) && h.unboundedAtInfinity();
        boolean atZero = problem.bandLow() == 0 && h.unboundedAtZero();
        String band = problem.bandLow() == 0 && Double.isInfinite(problem.bandHigh()) ? "all frequencies (no band given)"
                : problem.bandLow() + " to " + (Double.isInfinite(problem.bandHigh()) ? "any frequency" : problem.bandHigh());
        if (atHigh || atZero) {
            return new InvalidInputException("band", band, what + " grows without bound toward "
                    + (atHigh ? "high frequency" : "zero frequency") + " for every absorber: give a band of frequency"
                    + " ratios LOW:HIGH that " + (atHigh ? "ends short of it" : "starts above zero"));
        }
        if (Double.isNaN(problem.fixedDamping())) {
            return new InvalidInputException("band", band, "a band where some absorber gives " + what
                    + " a finite peak");
        }
        // the damping is above zero but so small that the resonant peak is beyond what the exact search can value
        return new InvalidInputException("fixed absorber damping ratio", Double.toString(problem.fixedDamping()),
                "a larger damping ratio: with so little damping the peak of " + what + " is too sharp to be valued"
                        + " in double precision");
    }
}
