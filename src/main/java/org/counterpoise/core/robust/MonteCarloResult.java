package org.counterpoise.core.robust;

import java.util.OptionalDouble;

/**
 * The distribution of the peak response over the band among sampled builds.
 *
 * @param samples number of samples
 * @param seed the random seed (repeat a run with it)
 * @param nominal the nominal peak, SI
 * @param mean mean peak, SI
 * @param p50 median (nearest-rank percentile), SI
 * @param p90 90th percentile, SI
 * @param p95 95th percentile, SI
 * @param p99 99th percentile, SI
 * @param min smallest sampled peak, SI
 * @param max largest sampled peak, SI
 * @param target the target, SI, when one is set
 * @param probabilityExceeding fraction of samples above the target, when a target is set
 * @param binEdges histogram bin edges (bins + 1), SI
 * @param counts samples per bin
 */
public record MonteCarloResult(int samples, long seed, double nominal, double mean, double p50, double p90,
        double p95, double p99, double min, double max, OptionalDouble target, OptionalDouble probabilityExceeding,
        double[] binEdges, int[] counts) {

    /** Defensive copies. */
    public MonteCarloResult {
        binEdges = binEdges.clone();
        counts = counts.clone();
    }

    @Override
    public double[] binEdges() {
        return binEdges.clone();
    }

    @Override
    public int[] counts() {
        return counts.clone();
    }
}
