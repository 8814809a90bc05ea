package org.counterpoise.core.optim;

import java.util.Arrays;
import java.util.List;

/**
 * The search shared by the optimisers of several absorbers, whatever their variables: from each
 * seed, sequential linear programming in a trust region ({@link MinimaxTrustRegion}), then Newton's
 * method on the first-order conditions of the active set found ({@link MinimaxKkt}); the lowest
 * result is certified ({@link AbsorberSetCheck}; once, after the last restart, as only the final
 * result's certificate is reported), and a scan point lower than it restarts the search from there
 * (at most {@value #MAX_RESTARTS} times). Seeds after the first {@code pursued} are skipped when they
 * start {@value #SEED_CUTOFF} times above a result already found.
 */
final class MinimaxSearch {
    private static final double[] ACTIVE_TOLERANCES = {1e-8, 1e-6, 1e-4, 1e-3, 1e-2};
    private static final int MAX_RESTARTS = 2;
    private static final double SEED_CUTOFF = 1.2;

    private MinimaxSearch() {
    }

    /**
     * The lowest point found and its certificate.
     *
     * @param point the variables
     * @param peak its exact peak over the band
     * @param certificate the evidence (null from a search run without one: a seed's)
     */
    record Result(double[] point, double peak, AbsorberSetCertificate certificate) {
    }

    /**
     * @param v the variables
     * @param seeds starting points
     * @param pursued how many of the first seeds are always pursued
     * @param scan the coarse global scan, lowest first ({p..., peak})
     * @param counter counts transfer functions built
     * @return the lowest point found, certified or not
     */
    static Result run(MinimaxVariables v, List<double[]> seeds, int pursued, List<double[]> scan,
            EvaluationCounter counter) {
        return run(v, seeds, pursued, scan, counter, true);
    }

    /**
     * @param v the variables
     * @param seeds starting points
     * @param pursued how many of the first seeds are always pursued
     * @param scan the coarse global scan, lowest first ({p..., peak})
     * @param counter counts transfer functions built
     * @param certify false where the point is wanted only as a seed of another search (no certificate)
     * @return the lowest point found
     */
    static Result run(MinimaxVariables v, List<double[]> seeds, int pursued, List<double[]> scan,
            EvaluationCounter counter, boolean certify) {
        double[] best = null;
        double bestPeak = Double.POSITIVE_INFINITY;
        for (int restart = 0; restart <= MAX_RESTARTS; restart++) {
            for (int i = 0; i < seeds.size(); i++) {
                double[] seed = seeds.get(i);
                if (i >= pursued && v.peak(seed) > SEED_CUTOFF * bestPeak) {
                    continue; // as for one absorber: a seed far above an optimum already found is not pursued
                }
                double[] p = localOptimum(v, seed, counter);
                double peak = v.peak(p);
                counter.add(1);
                if (peak < bestPeak) {
                    best = p;
                    bestPeak = peak;
                }
            }
            double[] lowest = scan.get(0);
            if (lowest[lowest.length - 1] >= bestPeak * (1 - AbsorberSetCertificate.NOT_BEATEN)) {
                break;
            }
            seeds = List.of(Arrays.copyOf(lowest, lowest.length - 1));
        }
        return new Result(best, bestPeak, certify ? AbsorberSetCheck.certify(v, best, bestPeak, scan, counter) : null);
    }

    /** Trust-region linear programming, then Newton on the optimality conditions of the active set. */
    static double[] localOptimum(MinimaxVariables v, double[] seed, EvaluationCounter counter) {
        double[] p = MinimaxTrustRegion.minimise(v, seed, counter);
        double peak = v.peak(p);
        for (double tolerance : ACTIVE_TOLERANCES) {
            double[] q = MinimaxKkt.polish(v, p, tolerance, counter);
            if (q != null) {
                double qPeak = v.peak(q);
                counter.add(1);
                if (qPeak <= peak * (1 + 1e-12)) {
                    return q; // the first active set whose conditions are solved without raising the peak
                }
            }
        }
        return p;
    }
}
