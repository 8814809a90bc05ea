package org.counterpoise.bench;

import java.util.concurrent.TimeUnit;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.optim.HInfinityOptimiser;
import org.counterpoise.core.optim.PeakOptimum;
import org.counterpoise.core.optim.PeakProblem;
import org.counterpoise.core.optim.VarianceOptimiser;
import org.counterpoise.core.optim.VarianceOptimum;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.TransferFunctions;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Time of one exact design on a damped structure (zeta1 = 0.02, mu = 0.05), force to
 * displacement: the H-infinity optimum over all frequencies and over a band, the H2 optimum, and
 * one exact peak search. Run with the command in docs/performance.md.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class OptimiserBenchmark {
    private final PeakProblem allFrequencies =
            PeakProblem.allFrequencies(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.05, 0.02);
    private final PeakProblem band = new PeakProblem(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.05, 0.02,
            0.9, 1.2, Double.NaN, Double.NaN);
    private final Tuning tuning = new Tuning(0.05, 0.95, 0.13);

    /** @return the H-infinity optimum over all frequencies */
    @Benchmark
    public PeakOptimum hInfinityAllFrequencies() {
        return HInfinityOptimiser.optimise(allFrequencies);
    }

    /** @return the H-infinity optimum over the band 0.9 to 1.2 */
    @Benchmark
    public PeakOptimum hInfinityBand() {
        return HInfinityOptimiser.optimise(band);
    }

    /** @return the H2 optimum */
    @Benchmark
    public VarianceOptimum h2() {
        return VarianceOptimiser.optimise(allFrequencies);
    }

    /** @return one exact peak search, transfer function built included */
    @Benchmark
    public Peak peakSearch() {
        return PeakFinder.overAllFrequencies(TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT,
                0.02, tuning));
    }
}
