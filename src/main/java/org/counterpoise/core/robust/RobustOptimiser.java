package org.counterpoise.core.robust;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.DoubleUnaryOperator;
import java.util.function.Function;
import java.util.function.ToDoubleFunction;
import java.util.stream.IntStream;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;

/**
 * The robust absorber: for a given mass ratio, the tuning ratio and damping ratio that minimise a
 * {@link RobustCriterion} (the worst peak over the tolerance ranges, or a percentile over sampled
 * builds), under {@link RobustLimits}.
 *
 * <p>Method: exchange (outer approximation, the usual way with semi-infinite minimax problems,
 * e.g. Hettich and Kortanek 1993, SIAM Review 35, section 7). The criterion is the k-th largest
 * peak over all builds; over a finite subset of them it is never larger, for every design. So: (1)
 * minimise the k-th largest over the subset (a few to a few hundred exact peak searches per design,
 * instead of a full worst case of several hundred), by Nelder-Mead in (ln f, ln zeta_a) from each
 * seed, on all cores (from the best seed only when the criterion says so: the percentile), restarted
 * until a restart gains less than a thousandth of the criterion's accuracy; (2) evaluate the full
 * criterion at the minimiser; (3) if it exceeds the subset's value by more than its accuracy
 * ({@link RobustCriterion#accuracy()}: 1e-9 relative for the worst case), add the builds that decide it and repeat
 * from there. When it stops, the subset minimum is a lower bound on the criterion's minimum and the
 * design's full criterion is within 1e-9 of it (for the local minimum Nelder-Mead found; the
 * search starts from each seed, and the tests scan the whole (f, zeta_a) box). The result is never
 * worse than any seed, evaluated exactly as given.
 */
public final class RobustOptimiser {
    /** What a cancelled search says it was. */
    private static final String WHAT = "the robust design";
    private static final int MAX_EXCHANGES = 30;
    private static final int MAX_RESTARTS = 6;
    /** Added to the stroke use of a design over its stroke limit: every allowed design ranks first. */
    private static final double INFEASIBLE = 1e6;

    private RobustOptimiser() {
    }

    /**
     * A robust optimum.
     *
     * @param tuning the tuning found
     * @param value the criterion at it, SI
     * @param evaluation the criterion's evaluation at it (with the worst point for the worst case)
     * @param evaluations full criterion evaluations used
     * @param converged true when the exchange closed its gap
     */
    public record Minimum(Tuning tuning, double value, RobustCriterion.Evaluation evaluation, int evaluations,
            boolean converged) {
    }

    /**
     * The least worst case over the structure and absorber frequency ranges (damping as designed).
     *
     * @param m the mistuning model (nominal structure, disturbance, response)
     * @param massRatio mu
     * @param structureRange ds, fraction
     * @param absorberRange da, fraction
     * @param seeds starting tunings (their mass ratio is replaced by mu)
     * @return the robust design
     */
    public static RobustDesign optimise(Mistuning m, double massRatio, double structureRange, double absorberRange,
            List<Tuning> seeds) {
        return optimise(m, massRatio, ToleranceRanges.stated(structureRange, absorberRange, 0.0), seeds,
                RobustLimits.NONE, ProgressListener.NONE);
    }

    /**
     * The least worst case over the three tolerance ranges.
     *
     * @param m the mistuning model (nominal structure, disturbance, response)
     * @param massRatio mu
     * @param ranges structure frequency, absorber frequency and absorber damping ranges
     * @param seeds starting tunings (their mass ratio is replaced by mu)
     * @param limits what the design may not change
     * @param listener progress and cancellation (asked before every peak evaluation)
     * @return the robust design
     * @throws CoreException with key {@link Messages#CANCELLED} when cancelled
     */
    public static RobustDesign optimise(Mistuning m, double massRatio, ToleranceRanges ranges, List<Tuning> seeds,
            RobustLimits limits, ProgressListener listener) {
        Minimum best = minimise(m, massRatio, RobustCriterion.worstCase(m, ranges), seeds, limits, listener);
        return new RobustDesign(best.tuning(), best.evaluation().worstPoint().orElseThrow(),
                m.peak(Absorber.of(m.structure(), best.tuning()), 1, 1), best.evaluations(), best.converged());
    }

    /**
     * The least worst case over the three tolerance ranges with the damping ratio at or above a floor
     * (see {@link #minimiseAboveFloor}).
     *
     * @param m the mistuning model (nominal structure, disturbance, response)
     * @param massRatio mu
     * @param ranges structure frequency, absorber frequency and absorber damping ranges
     * @param seeds starting tunings (their mass ratio is replaced by mu)
     * @param limits what the design may not change
     * @param dampingFloor the least damping ratio a buildable damper gives
     * @param listener progress and cancellation
     * @return the robust design
     * @throws CoreException with key {@link Messages#CANCELLED} when cancelled
     */
    public static RobustDesign optimiseAboveFloor(Mistuning m, double massRatio, ToleranceRanges ranges,
            List<Tuning> seeds, RobustLimits limits, double dampingFloor, ProgressListener listener) {
        Minimum best = minimiseAboveFloor(m, massRatio, RobustCriterion.worstCase(m, ranges), seeds, limits,
                dampingFloor, listener);
        return new RobustDesign(best.tuning(), best.evaluation().worstPoint().orElseThrow(),
                m.peak(Absorber.of(m.structure(), best.tuning()), 1, 1), best.evaluations(), best.converged());
    }

    /**
     * The robust optimum with a free damping ratio kept at or above a floor. The free optimum when it
     * needs no less; otherwise the better of the optimum held on the floor (the boundary, where a
     * problem convex near the free optimum has its constrained optimum) and the search over the whole
     * region above the floor seeded with it (the worst case is not convex: a design well above the
     * floor can beat every design on it). The second is taken only when lower by more than 1e-6
     * relative, so a boundary optimum is reported exactly on the floor.
     *
     * @param m the mistuning model
     * @param massRatio mu
     * @param criterion what to minimise
     * @param seeds starting tunings (their mass ratio is replaced by mu)
     * @param limits what the design may not change
     * @param dampingFloor the least damping ratio a buildable damper gives
     * @param listener progress and cancellation
     * @return the best design found at or above the floor (the fixed damping when the limits give one)
     */
    public static Minimum minimiseAboveFloor(Mistuning m, double massRatio, RobustCriterion criterion,
            List<Tuning> seeds, RobustLimits limits, double dampingFloor, ProgressListener listener) {
        Minimum free = minimise(m, massRatio, criterion, seeds, limits, listener.part(0.0, 0.6));
        if (limits.fixedDampingRatio().isPresent() || free.tuning().dampingRatio() >= dampingFloor) {
            return free;
        }
        Minimum held = minimise(m, massRatio, criterion, seeds, limits.dampingHeldAt(dampingFloor),
                listener.part(0.6, 0.8));
        List<Tuning> aboveSeeds = new ArrayList<>(seeds);
        aboveSeeds.add(held.tuning());
        Minimum above = minimise(m, massRatio, criterion, aboveSeeds, limits.dampingAtLeast(dampingFloor),
                listener.part(0.8, 1.0));
        boolean aboveAllowed = limits.strokeUse(m, above.tuning()) <= 1;
        boolean heldAllowed = limits.strokeUse(m, held.tuning()) <= 1;
        boolean takeAbove = aboveAllowed && (!heldAllowed || above.value() < held.value() * (1 - 1e-6));
        return takeAbove ? above : held;
    }

    /**
     * @param m the mistuning model
     * @param massRatio mu
     * @param criterion what to minimise
     * @param seeds starting tunings (their mass ratio is replaced by mu; fixed ratios are put in)
     * @param limits what the design may not change
     * @param listener progress and cancellation
     * @return the best design found, never worse than a seed that meets the stroke limit
     */
    public static Minimum minimise(Mistuning m, double massRatio, RobustCriterion criterion, List<Tuning> seeds,
            RobustLimits limits, ProgressListener listener) {
        int[] count = {0};
        Set<VariedBuild> subset = new LinkedHashSet<>(criterion.initialBuilds());
        Minimum best = null;
        List<Tuning> starts = new ArrayList<>();
        for (Tuning seed : seeds) {
            listener.checkCancelled(WHAT);
            Tuning exact = limits.apply(new Tuning(massRatio, seed.tuningRatio(), seed.dampingRatio()));
            RobustCriterion.Evaluation e = evaluate(m, criterion, exact, count);
            Minimum candidate = new Minimum(exact, e.value(), e, count[0], false);
            best = better(m, limits, candidate, best);
            if (e.value() > 0 && Double.isFinite(e.value()) && criterion.searchFromEverySeed()) {
                subset.addAll(e.deciding());
                starts.add(exact);
            }
        }
        if (!criterion.searchFromEverySeed() && best.value() > 0 && Double.isFinite(best.value())) {
            subset.addAll(best.evaluation().deciding());
            starts.add(best.tuning());
        }
        if (starts.isEmpty()) {
            // zero (the response underflows in SI) or unbounded everywhere: nothing to compare, no search
            return best;
        }
        boolean converged = false;
        for (int exchange = 0; exchange < MAX_EXCHANGES && !converged; exchange++) {
            listener.progress(Math.min(0.9, exchange / 6.0));
            List<VariedBuild> builds = List.copyOf(subset);
            ToDoubleFunction<Tuning> lower = t -> logKthLargest(builds, criterion.rank(), Absorber.of(m.structure(), t),
                    listener);
            // the starts are independent searches: run on all cores, the best taken in start order
            // the first search roams (steps of 3 % in f, 25 % in zeta_a); later ones correct the
            // design for the builds just added, from where it is, with steps ten times smaller
            double reach = exchange == 0 ? 1.0 : 0.1;
            List<Tuning> ends = starts.parallelStream()
                    .map(start -> search(m, lower, start, limits, criterion.accuracy(), reach, listener)).toList();
            Tuning found = null;
            double foundLower = Double.POSITIVE_INFINITY;
            for (Tuning t : ends) {
                double v = penalised(m, limits, lower, t);
                if (found == null || v < foundLower) {
                    found = t;
                    foundLower = v;
                }
            }
            RobustCriterion.Evaluation e = evaluate(m, criterion, found, count);
            best = better(m, limits, new Minimum(found, e.value(), e, count[0], false), best);
            converged = Math.log(e.value()) <= foundLower + criterion.accuracy();
            subset.addAll(e.deciding());
            starts = List.of(found);
        }
        listener.progress(1.0);
        return new Minimum(best.tuning(), best.value(), best.evaluation(), count[0], converged);
    }

    private static RobustCriterion.Evaluation evaluate(Mistuning m, RobustCriterion criterion, Tuning t, int[] count) {
        count[0]++;
        return criterion.evaluate(Absorber.of(m.structure(), t));
    }

    /** The better of two: one within the stroke limit first, then the lower criterion; the first among equals. */
    private static Minimum better(Mistuning m, RobustLimits limits, Minimum candidate, Minimum best) {
        if (best == null) {
            return candidate;
        }
        boolean candidateAllowed = limits.strokeUse(m, candidate.tuning()) <= 1;
        boolean bestAllowed = limits.strokeUse(m, best.tuning()) <= 1;
        if (candidateAllowed != bestAllowed) {
            return candidateAllowed ? candidate : best;
        }
        if (!candidateAllowed) {
            return limits.strokeUse(m, candidate.tuning()) < limits.strokeUse(m, best.tuning()) ? candidate : best;
        }
        return candidate.value() < best.value() ? candidate : best;
    }

    /** ln of the k-th largest peak over the builds (-infinity when zero). */
    private static double logKthLargest(List<VariedBuild> builds, int k, Absorber a, ProgressListener listener) {
        listener.checkCancelled(WHAT);
        if (k == 1) {
            double max = 0;
            for (VariedBuild b : builds) {
                max = Math.max(max, b.peak(a));
            }
            return Math.log(max);
        }
        // k-th largest of the subset (k-th largest of all builds is never smaller); a subset
        // smaller than k has none: the lower bound is then 0
        if (builds.size() < k) {
            return Double.NEGATIVE_INFINITY;
        }
        double[] peaks = new double[builds.size()];
        // each peak into its own slot, on all cores: the sorted result does not depend on the threads
        IntStream.range(0, peaks.length).parallel().forEach(i -> peaks[i] = builds.get(i).peak(a));
        Arrays.sort(peaks);
        return Math.log(peaks[peaks.length - k]);
    }

    /** The objective with the stroke limit: a design over the limit ranks after every design within it. */
    private static double penalised(Mistuning m, RobustLimits limits, ToDoubleFunction<Tuning> objective, Tuning t) {
        double use = limits.strokeUse(m, t);
        if (use > 1) {
            return INFEASIBLE + Math.log(use);
        }
        double v = objective.applyAsDouble(t);
        return Double.isNaN(v) ? Double.POSITIVE_INFINITY : v;
    }

    /** Nelder-Mead in the free coordinates of (ln f, ln zeta_a), restarted while it gains. */
    private static Tuning search(Mistuning m, ToDoubleFunction<Tuning> objective, Tuning start, RobustLimits limits,
            double accuracy, double reach, ProgressListener listener) {
        boolean tuningFree = limits.fixedTuningRatio().isEmpty();
        boolean dampingFree = limits.fixedDampingRatio().isEmpty();
        int n = (tuningFree ? 1 : 0) + (dampingFree ? 1 : 0);
        if (n == 0) {
            return start;
        }
        double mu = start.massRatio();
        // With a damping floor the damping coordinate is w, zeta_a = floor exp(w^2): every w is at or
        // above the floor and the floor itself (w = 0) is an ordinary point of the simplex, where a
        // wall in ln zeta_a would stall it. Without one, the coordinate is ln zeta_a.
        double floor = limits.dampingFloor();
        DoubleUnaryOperator dampingOf = floor > 0 ? w -> floor * Math.exp(w * w) : Math::exp;
        // null outside the search box (f in 0.05 to 20, zeta_a in 1e-5 to 4), which ranks last
        Function<double[], Tuning> tuningOf = v -> {
            int i = 0;
            double f = tuningFree ? Math.exp(v[i++]) : start.tuningRatio();
            double zeta = dampingFree ? dampingOf.applyAsDouble(v[i]) : start.dampingRatio();
            boolean inBox = (!tuningFree || f > 0.05 && f < 20) && (!dampingFree || zeta > 1e-5 && zeta < 4);
            return inBox ? new Tuning(mu, f, zeta) : null;
        };
        ObjectiveFunction fn = new ObjectiveFunction(v -> {
            listener.checkCancelled(WHAT);
            Tuning t = tuningOf.apply(v);
            return t == null ? Double.POSITIVE_INFINITY : penalised(m, limits, objective, t);
        });
        double[] x = new double[n];
        double[] steps = new double[n];
        int i = 0;
        if (tuningFree) {
            steps[i] = 0.03 * reach;
            x[i++] = Math.log(start.tuningRatio());
        }
        if (dampingFree) {
            steps[i] = 0.25 * reach;
            x[i] = floor > 0 ? Math.sqrt(Math.log(Math.max(start.dampingRatio(), floor) / floor))
                    : Math.log(Math.max(start.dampingRatio(), 1e-3));
        }
        double value = fn.getObjectiveFunction().value(x);
        Tuning best = start;
        double bestValue = penalised(m, limits, objective, start);
        for (int restart = 0; restart < MAX_RESTARTS; restart++) {
            PointValuePair p;
            try {
                p = new SimplexOptimizer(1e-3 * accuracy, 1e-14).optimize(new MaxEval(2000), fn, GoalType.MINIMIZE,
                        new InitialGuess(x), new NelderMeadSimplex(steps));
            } catch (TooManyEvaluationsException e) {
                break;
            }
            boolean gained = p.getValue() < value - 1e-3 * accuracy;
            if (p.getValue() < value) {
                x = p.getPoint();
                value = p.getValue();
            }
            if (!gained) {
                break;
            }
            for (int k = 0; k < n; k++) {
                steps[k] *= 0.5;
            }
        }
        Tuning found = tuningOf.apply(x);
        return found != null && value < bestValue ? found : best;
    }
}
