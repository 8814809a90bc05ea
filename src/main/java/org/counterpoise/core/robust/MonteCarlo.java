package org.counterpoise.core.robust;

import java.util.Arrays;
import java.util.OptionalDouble;
import java.util.stream.IntStream;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.progress.ProgressListener;

/**
 * Tolerance Monte Carlo: the peak response over the band for many sampled builds, with the
 * structure's mass and stiffness and the absorber's mass, spring rate and damping drawn from their
 * tolerances. All draws come first, in a fixed order, from one seeded Well19937c generator, and
 * the exact peaks are then computed on all cores; so a run with the same seed gives the same
 * result whatever the number of threads. Percentiles are nearest-rank (the sample at rank
 * ceil(p N)), which commute with any increasing function of one varied quantity; the mean is
 * accumulated incrementally, so identical samples give exactly the nominal value.
 *
 * <p>A run can be cancelled through its {@link ProgressListener}: the draws and the peaks are made
 * in blocks of {@value #BLOCK} samples, and the listener is asked between blocks, on the calling
 * thread. Cancelling ends the run with {@link Messages#CANCELLED} and no result. The blocks change
 * neither the order of the draws nor any sample's peak, so an uncancelled run is the same, bit for
 * bit, as one without blocks.
 */
public final class MonteCarlo {
    /** Default number of samples. */
    public static final int DEFAULT_SAMPLES = 10_000;
    private static final int BINS = 40;
    /** Samples between two questions to the listener: a few milliseconds of work. */
    static final int BLOCK = 1024;
    /** What a cancelled run says it was. */
    static final String WHAT = "the Monte Carlo run";

    private MonteCarlo() {
    }

    /**
     * @param m the mistuning model (nominal structure, disturbance, response)
     * @param absorber the nominal absorber
     * @param tolerances the spreads
     * @param samples number of samples (1 to 10 000 000)
     * @param seed random seed
     * @param target the target peak, SI, when one is set
     * @return the distribution of the peak
     */
    public static MonteCarloResult run(Mistuning m, Absorber absorber, ToleranceSet tolerances, int samples,
            long seed, OptionalDouble target) {
        return run(m, absorber, tolerances, samples, seed, target, ProgressListener.NONE);
    }

    /**
     * @param m the mistuning model (nominal structure, disturbance, response)
     * @param absorber the nominal absorber
     * @param tolerances the spreads
     * @param samples number of samples (1 to 10 000 000)
     * @param seed random seed
     * @param target the target peak, SI, if any
     * @param listener progress (a fifth for the draws, the rest for the peaks) and cancellation
     * @return the distribution of the peak
     * @throws CoreException with key {@link Messages#CANCELLED} when the listener cancels or the
     *     thread is interrupted
     */
    public static MonteCarloResult run(Mistuning m, Absorber absorber, ToleranceSet tolerances, int samples,
            long seed, OptionalDouble target, ProgressListener listener) {
        Checks.inRange("samples", samples, 1, 10_000_000);
        Structure s0 = m.structure();
        RandomGenerator random = new Well19937c(seed);
        double[][] draws = new double[samples][5];
        Tolerance[] order = {tolerances.structureMass(), tolerances.structureStiffness(), tolerances.absorberMass(),
            tolerances.absorberStiffness(), tolerances.absorberDamping()};
        double[] nominal = {s0.modalMass(), s0.modalStiffness(), absorber.mass(), absorber.stiffness(),
            absorber.damping()};
        for (int i = 0; i < samples; i++) {
            if (i % BLOCK == 0) {
                listener.checkCancelled(WHAT);
                listener.progress(0.2 * i / samples);
            }
            for (int k = 0; k < 5; k++) {
                Tolerance t = order[k];
                draws[i][k] = switch (t.distribution()) {
                    case NONE -> nominal[k];
                    case UNIFORM -> t.sample(nominal[k], random.nextDouble(), 0);
                    case NORMAL -> t.sample(nominal[k], 0, random.nextGaussian());
                };
            }
        }
        double[] peaks = new double[samples];
        for (int start = 0; start < samples; start += BLOCK) {
            listener.checkCancelled(WHAT);
            listener.progress(0.2 + 0.8 * start / samples);
            // each sample's peak is a pure function of its draw, written to its own slot
            IntStream.range(start, Math.min(samples, start + BLOCK)).parallel().forEach(i -> {
                double[] d = draws[i];
                Structure s = new Structure(d[0], d[1], s0.dampingRatio(), s0.modeShapeAtAbsorber());
                peaks[i] = m.peak(s, new Absorber(d[2], d[3], d[4]));
            });
        }
        listener.checkCancelled(WHAT);
        listener.progress(1.0);
        double mean = 0;
        int above = 0;
        for (int i = 0; i < samples; i++) {
            // an unbounded sample makes the mean unbounded (inf - inf would give NaN)
            mean = Double.isInfinite(mean) ? mean : Double.isInfinite(peaks[i]) ? peaks[i] : mean + (peaks[i] - mean) / (i + 1);
            if (target.isPresent() && peaks[i] > target.getAsDouble()) {
                above++;
            }
        }
        double[] sorted = peaks.clone();
        Arrays.sort(sorted);
        double min = sorted[0];
        double max = sorted[samples - 1];
        double[] edges = new double[BINS + 1];
        int[] counts = new int[BINS];
        double width = (max - min) / BINS;
        for (int b = 0; b <= BINS; b++) {
            edges[b] = min + b * width;
        }
        for (double p : peaks) {
            int bin = width > 0 ? (int) Math.min(BINS - 1, Math.floor((p - min) / width)) : 0;
            counts[bin]++;
        }
        return new MonteCarloResult(samples, seed, m.peak(absorber, 1, 1), mean, rank(sorted, 0.50),
                rank(sorted, 0.90), rank(sorted, 0.95), rank(sorted, 0.99), min, max, target,
                target.isPresent() ? OptionalDouble.of((double) above / samples) : OptionalDouble.empty(), edges,
                counts);
    }

    /** Nearest-rank percentile of sorted data: the value at rank ceil(p N). */
    static double rank(double[] sorted, double p) {
        int r = (int) Math.ceil(p * sorted.length);
        return sorted[Math.max(r, 1) - 1];
    }
}
