package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.MultivariateFunction;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.counterpoise.core.error.NotFoundException;
import org.counterpoise.core.response.HystereticResponse;

/**
 * The exact H-infinity optimum of a hysteretic absorber (complex stiffness k (1 + i eta), no
 * dashpot): the tuning ratio f and loss factor eta whose peak of |H| over the band is least, for
 * the problem's excitation and response pair, mass ratio, structure damping and band, by the method
 * of the viscous {@link HInfinityOptimiser} (docs/optimiser.md, docs/realisation.md):
 * <ol>
 *   <li>a global scan of the exact band peak over the box (48 tunings log-spaced plus 12 over the
 *       band, times eta = 0 and 15 loss factors log-spaced over [1e-3, 8]);</li>
 *   <li>from its three best points and two seeds (the viscous optimum's tuning with the loss factor
 *       that damper has at the absorber's own frequency, eta = 2 zeta_a; and the fixed-point design
 *       f = 1/(1+mu), eta = sqrt(mu (3 + 2 mu)/(2 + mu)), see {@code HystereticFixedPoints}), a
 *       Nelder-Mead search on the exact peak in (ln f, eta) reaches the neighbourhood, and the
 *       optimality conditions of every active set of one, two or three of the four highest maxima
 *       (eta free, or on its bound 0) are solved exactly ({@link HystereticActiveSet});</li>
 *   <li>the lowest solution is certified: no scan point is lower by more than 1e-9 relative (a lower
 *       one restarts step 2 from it, at most four times) and the first-order conditions hold to
 *       1e-4 ({@link HystereticCertificate}).</li>
 * </ol>
 * Fixed tuning or damping and a stroke limit of the viscous problem are not applied: the hysteretic
 * optimum is always the free one.
 */
public final class HystereticOptimiser {
    private static final int RESTARTS = 4;
    private static final double SCAN_TOLERANCE = 1e-9;

    private HystereticOptimiser() {
    }

    /**
     * @param problem the viscous problem whose excitation, response, mass ratio, structure damping,
     *     band and tuning box are used
     * @return the certified optimum, or the best found with {@code certified} false
     */
    public static HystereticPeakOptimum optimise(PeakProblem problem) {
        HystereticProblem p = of(problem);
        List<double[]> scan = scan(p);
        List<double[]> seeds = new ArrayList<>(scan.subList(0, Math.min(3, scan.size())));
        PeakOptimum viscous = HInfinityOptimiser.optimise(PeakProblem.free(problem.excitation(), problem.response(),
                problem.massRatio(), problem.structureDamping(), problem.bandLow(), problem.bandHigh()));
        double fv = viscous.tuning().tuningRatio();
        seeds.add(new double[] {clamp(fv, p.fMin(), p.fMax()), Math.min(2 * viscous.tuning().dampingRatio(),
                HystereticProblem.MAX_LOSS_FACTOR)});
        double mu = problem.massRatio();
        seeds.add(new double[] {clamp(HystereticFixedPoints.tuningRatio(mu), p.fMin(), p.fMax()),
                HystereticFixedPoints.lossFactor(mu)});
        Best best = new Best();
        for (double[] seed : seeds) {
            solveFrom(p, seed[0], seed[1], best);
        }
        for (int restart = 0; restart < RESTARTS; restart++) {
            double[] lower = null;
            for (double[] point : scan) {
                if (point[2] < best.peak * (1 - SCAN_TOLERANCE)) {
                    lower = point;
                    break;
                }
            }
            if (lower == null) {
                break;
            }
            solveFrom(p, lower[0], lower[1], best);
            if (lower[2] < best.peak * (1 - SCAN_TOLERANCE)) {
                best.offer(p, lower[0], lower[1], "a point of the global scan", false);
                break;
            }
        }
        if (!Double.isFinite(best.peak)) {
            throw new NotFoundException("finite peak of an elastomer absorber", "no tuning and loss factor gives the"
                    + " response a finite peak over this band", "choose a band that excludes zero frequency");
        }
        boolean scanAgrees = scan.isEmpty() || scan.get(0)[2] >= best.peak * (1 - SCAN_TOLERANCE);
        double violation = HystereticCertificate.violation(p, best.f, best.eta);
        boolean certified = best.exact && scanAgrees && violation <= HystereticCertificate.VIOLATION_LIMIT;
        return new HystereticPeakOptimum(p.absorber(best.f, best.eta), best.peak, best.activeSet, certified,
                violation);
    }

    /**
     * The exact peak of a hysteretic design on the problem's band.
     * @param problem the problem
     * @param f tuning ratio
     * @param eta loss factor
     * @return the peak of |H| over the band (non-dimensional)
     */
    public static double peakOf(PeakProblem problem, double f, double eta) {
        return of(problem).peak(f, eta);
    }

    static HystereticProblem of(PeakProblem problem) {
        HystereticResponse response = HystereticResponse.of(problem.excitation(), problem.response(),
                problem.structureDamping(), problem.massRatio());
        return new HystereticProblem(response, problem.bandLow(), problem.bandHigh(), problem.minTuning(),
                problem.maxTuning(), false, 0.0);
    }

    /** @return every scan point {f, eta, peak}, lowest peak first */
    static List<double[]> scan(HystereticProblem p) {
        List<Double> tunings = new ArrayList<>();
        double ratio = p.fMax() / p.fMin();
        for (int i = 0; i < 48; i++) {
            tunings.add(p.fMin() * Math.pow(ratio, i / 47.0));
        }
        if (Double.isFinite(p.gHigh())) {
            for (int i = 0; i < 12; i++) {
                double f = p.gLow() + (p.gHigh() - p.gLow()) * (i + 0.5) / 12;
                if (f >= p.fMin() && f <= p.fMax()) {
                    tunings.add(f);
                }
            }
        }
        List<double[]> out = new ArrayList<>();
        for (double f : tunings) {
            out.add(new double[] {f, 0.0, p.peak(f, 0.0)});
            for (int j = 0; j < 15; j++) {
                double eta = 1e-3 * Math.pow(HystereticProblem.MAX_LOSS_FACTOR / 1e-3, j / 14.0);
                out.add(new double[] {f, eta, p.peak(f, eta)});
            }
        }
        out.sort((a, b) -> Double.compare(a[2], b[2]));
        return out;
    }

    /** Nelder-Mead to the neighbourhood, then the active sets with eta free and on its bound 0. */
    private static void solveFrom(HystereticProblem p, double f0, double eta0, Best best) {
        double[] near = nelderMead(p, f0, eta0);
        best.offer(p, near[0], near[1], "the neighbourhood search", false);
        tryActiveSets(p, near[0], near[1], best);
        if (near[1] < 0.05) {
            tryActiveSets(p.holding(0.0), near[0], 0.0, best);
        }
    }

    private static void tryActiveSets(HystereticProblem p, double f, double eta, Best best) {
        List<double[]> candidates = p.candidates(f, eta);
        int n = Math.min(4, candidates.size());
        for (int[] set : subsets(n)) {
            HystereticActiveSet system = new HystereticActiveSet(p, candidates, set);
            if (!system.isSquare()) {
                continue;
            }
            double[] solution = system.solve(f, eta);
            if (solution != null) {
                HystereticProblem free = p.free();
                if (HystereticCertificate.violation(free, solution[0], solution[1])
                        <= HystereticCertificate.VIOLATION_LIMIT) {
                    best.offer(free, solution[0], solution[1], describe(candidates, set), true);
                }
            }
        }
    }

    /** Every subset of one to three of the first n indices that contains index 0. */
    private static List<int[]> subsets(int n) {
        List<int[]> out = new ArrayList<>();
        out.add(new int[] {0});
        for (int i = 1; i < n; i++) {
            out.add(new int[] {0, i});
        }
        for (int i = 1; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                out.add(new int[] {0, i, j});
            }
        }
        return out;
    }

    private static String describe(List<double[]> candidates, int[] set) {
        int interior = 0;
        for (int i : set) {
            interior += candidates.get(i)[1] > 0 ? 1 : 0;
        }
        int ends = set.length - interior;
        String[] words = {"no", "one", "two", "three"};
        if (ends == 0) {
            return interior == 1 ? "one interior peak" : words[interior] + " interior peaks";
        }
        return words[interior] + " interior peak" + (interior == 1 ? "" : "s") + " and " + words[ends]
                + " band end" + (ends == 1 ? "" : "s");
    }

    private static double[] nelderMead(HystereticProblem p, double f0, double eta0) {
        double lnMin = Math.log(p.fMin());
        double lnMax = Math.log(p.fMax());
        MultivariateFunction objective = u -> {
            double lnF = clamp(u[0], lnMin, lnMax);
            double eta = clamp(u[1], 0.0, HystereticProblem.MAX_LOSS_FACTOR);
            double penalty = Math.abs(u[0] - lnF) + Math.abs(u[1] - eta);
            return Math.log(p.peak(Math.exp(lnF), eta)) + penalty;
        };
        double[] start = {Math.log(f0), eta0};
        try {
            PointValuePair result = new SimplexOptimizer(1e-12, 1e-14).optimize(new MaxEval(600),
                    new ObjectiveFunction(objective), GoalType.MINIMIZE, new InitialGuess(start),
                    new NelderMeadSimplex(new double[] {0.05, Math.max(0.02, 0.2 * eta0)}));
            start = result.getPoint();
        } catch (TooManyEvaluationsException cap) {
            // the cap keeps the cost bounded; the start stands, and the active sets still run from it
        }
        return new double[] {Math.exp(clamp(start[0], lnMin, lnMax)),
            clamp(start[1], 0.0, HystereticProblem.MAX_LOSS_FACTOR)};
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }

    /** The lowest design so far; an exact (active-set) solution wins a tie with a search point. */
    private static final class Best {
        private double f;
        private double eta;
        private double peak = Double.POSITIVE_INFINITY;
        private String activeSet = "none";
        private boolean exact;

        void offer(HystereticProblem p, double candidateF, double candidateEta, String what, boolean solved) {
            double value = p.peak(candidateF, candidateEta);
            boolean lower = value < peak * (1 - 1e-12);
            boolean tieButExact = solved && !exact && value <= peak * (1 + 1e-9);
            if (lower || tieButExact) {
                f = candidateF;
                eta = candidateEta;
                peak = value;
                activeSet = what;
                exact = solved;
            }
        }
    }
}
