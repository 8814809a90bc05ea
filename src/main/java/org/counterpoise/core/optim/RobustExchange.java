package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

/**
 * The exchange method (outer approximation, the usual method for semi-infinite minimax problems,
 * Hettich and Kortanek 1993, SIAM Review 35, section 7) for the least worst-case peak of a set of
 * absorbers over ranges of builds: what the robust designs of several absorbers on one mode
 * ({@link RobustSetOptimiser}) and of one absorber per mode ({@link RobustJointOptimiser}) share.
 *
 * <p>Over any finite set of builds the largest peak is at most the worst case, for every design. So:
 * (1) start with the given builds (the nominal one and the corners of the ranges); (2) minimise the
 * largest peak over the set ({@link RobustSetVariables}, by {@link MinimaxSearch}); (3) find the
 * design's worst case over the continuum of the ranges; (4) when it exceeds the set's largest peak by
 * more than {@value #GAP} (relative), add that build and go back to (2) from the design found. When
 * the gap closes, the minimax over the final set is certified as the nominal problem's is (equal
 * active peaks, first-order conditions, the coarse scan of the variables judged over every build of
 * the set, random moves), and the design's worst case is within {@value #GAP} of a lower bound on
 * the robust optimum (for the local optimum found).
 */
final class RobustExchange {
    /** The exchange stops when the worst case is within this (relative) of the set's largest peak. */
    static final double GAP = 1e-6;
    private static final int MAX_EXCHANGES = 30;
    /** Builds closer than this fraction of the ranges are one build moved (see {@link #exchange}). */
    private static final double NEAR = 0.05;

    private RobustExchange() {
    }

    /** What differs between the robust problems. */
    interface Builds {
        /**
         * @param builds the builds, each its factors
         * @return the variables judged over them (the largest peak over the builds)
         */
        RobustSetVariables over(List<double[]> builds);

        /**
         * @param p a point of the variables
         * @return its worst build over the continuum of the ranges: {factors..., peak}, the peak on
         *     the variables' scale (as {@link MinimaxVariables#peak})
         */
        double[] worst(double[] p);

        /**
         * @param v the variables over the current builds
         * @param counter counts transfer functions built
         * @return the coarse scan of the box judged over the builds, lowest peak first
         */
        List<double[]> scan(RobustSetVariables v, EvaluationCounter counter);

        /** @return each factor's range (a fraction; 0 where the factor stays 1) */
        double[] ranges();
    }

    /**
     * @param point the least worst-case design found
     * @param worst its worst build: {factors..., peak}
     * @param builds the number of builds the last minimax was judged over
     * @param converged true when the worst case closed to within {@value #GAP} of the set's peak
     * @param certificate the certificate of the minimax over the final builds
     */
    record Result(double[] point, double[] worst, int builds, boolean converged, AbsorberSetCertificate certificate) {
    }

    /**
     * @param problem the builds' variables, worst case and scan
     * @param initial the first builds (the nominal one first, then the corners): kept throughout
     * @param seeds start points of the first minimax, each clamped into the box
     * @param pursued how many of them are pursued: all in their order, or the given number with the
     *     least largest peak over the first builds
     * @param counter counts transfer functions built
     * @return the design with the least worst case found, and the evidence
     */
    static Result run(Builds problem, List<double[]> initial, List<double[]> seeds, int pursued,
            EvaluationCounter counter) {
        List<double[]> builds = new ArrayList<>(initial);
        int fixed = builds.size();
        RobustSetVariables v = problem.over(builds);
        List<double[]> starts = new ArrayList<>();
        for (double[] seed : seeds) {
            starts.add(clamp(v, seed));
        }
        if (pursued < starts.size()) {
            // each start's largest peak over the first builds, computed once
            Map<double[], Double> largest = new IdentityHashMap<>();
            for (double[] start : starts) {
                largest.put(start, v.peak(start));
            }
            starts.sort(Comparator.comparingDouble(largest::get));
            starts = starts.subList(0, pursued);
        }
        double[] p = null;
        double best = Double.POSITIVE_INFINITY;
        for (double[] start : starts) {
            double[] q = MinimaxSearch.localOptimum(v, start, counter);
            double peak = v.peak(q);
            if (peak < best) {
                p = q;
                best = peak;
            }
        }
        double[] worst = null;
        AbsorberSetCertificate certificate = null;
        boolean converged = false;
        for (int exchange = 0; exchange < MAX_EXCHANGES && !converged; exchange++) {
            worst = problem.worst(p);
            if (peakOf(worst) <= v.peak(p) * (1 + GAP)) {
                // the gap is closed: certify the minimax over this set (a lower scan point restarts it)
                MinimaxSearch.Result r = MinimaxSearch.run(v, List.of(p), 1, problem.scan(v, counter), counter);
                p = r.point();
                certificate = r.certificate();
                worst = problem.worst(p);
                converged = peakOf(worst) <= r.peak() * (1 + GAP);
                if (converged) {
                    break;
                }
            }
            exchange(problem.ranges(), builds, fixed, Arrays.copyOf(worst, worst.length - 1));
            v = problem.over(builds);
            p = MinimaxSearch.localOptimum(v, p, counter);
            certificate = null;
        }
        if (certificate == null) {
            certificate = AbsorberSetCheck.certify(v, p, v.peak(p), problem.scan(v, counter), counter);
            worst = problem.worst(p);
        }
        return new Result(p, worst, builds.size(), converged, certificate);
    }

    /** @return the first builds: the nominal one (every factor 1), then the corners of the ranges, the first factor outermost */
    static List<double[]> nominalAndCorners(double[] ranges) {
        List<double[]> corners = new ArrayList<>();
        corners.add(new double[0]);
        for (double range : ranges) {
            List<double[]> longer = new ArrayList<>();
            for (double[] c : corners) {
                for (double f : range > 0 ? new double[] {1 - range, 1 + range} : new double[] {1.0}) {
                    double[] d = Arrays.copyOf(c, c.length + 1);
                    d[c.length] = f;
                    longer.add(d);
                }
            }
            corners = longer;
        }
        List<double[]> builds = new ArrayList<>();
        double[] nominal = new double[ranges.length];
        Arrays.fill(nominal, 1.0);
        builds.add(nominal);
        for (double[] c : corners) {
            if (!Arrays.equals(c, nominal)) {
                builds.add(c);
            }
        }
        return builds;
    }

    private static double peakOf(double[] worst) {
        return worst[worst.length - 1];
    }

    /**
     * Adds the worst build found, or moves an earlier worst build (not the nominal one or a corner)
     * that lies within {@value #NEAR} of the ranges of it: an interior worst case moves a little as the
     * design moves, and two builds a hair apart make the same peak twice, which leaves the
     * first-order conditions of the minimax singular (Newton then stops short of equal peaks).
     * The exchange of Remez's algorithm does the same with its reference points.
     */
    private static void exchange(double[] ranges, List<double[]> builds, int fixed, double[] worst) {
        for (int k = fixed; k < builds.size(); k++) {
            double[] b = builds.get(k);
            double distance = 0;
            for (int d = 0; d < ranges.length; d++) {
                distance = Math.max(distance, ranges[d] > 0 ? Math.abs(b[d] - worst[d]) / ranges[d] : 0.0);
            }
            if (distance <= NEAR) {
                builds.set(k, worst);
                return;
            }
        }
        builds.add(worst);
    }

    static double[] clamp(MinimaxVariables v, double[] p) {
        double[] lo = v.lower();
        double[] hi = v.upper();
        double[] q = p.clone();
        for (int k = 0; k < q.length; k++) {
            q[k] = Math.min(hi[k], Math.max(lo[k], q[k]));
        }
        return q;
    }
}
