package org.counterpoise.bench;

import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.TimeUnit;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.robust.Mistuning;
import org.counterpoise.core.robust.MonteCarlo;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.robust.RobustDesign;
import org.counterpoise.core.robust.RobustLimits;
import org.counterpoise.core.robust.RobustOptimiser;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.optim.HInfinityOptimiser;
import org.counterpoise.core.optim.PeakProblem;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.robust.Tolerance;
import org.counterpoise.core.robust.ToleranceSet;
import org.counterpoise.core.tuning.DenHartogEqualPeak;
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
 * 10 000 Monte Carlo samples with exact band peaks (all cores), and one robust design over
 * +/-10 % structure mistuning (with and without +/-2 % absorber mistuning), and the robust
 * worst-case design as the robust-worst-case method makes it (exact nominal optimum computed, then
 * the least worst case over the default ranges: structure +/-5 %, absorber +/-3 %, damping +/-20 %).
 * An invented case: 1000 kg at 10 Hz, 2 % damping, band 9 to 11 Hz, mu = 0.05.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class RobustnessBenchmark {
    private final Structure structure = Structure.of(1000, 1000 * Math.pow(2 * Math.PI * 10, 2), 0.02);
    private final Mistuning mistuning = new Mistuning(structure, new Excitation(ExcitationKind.FORCE, 100,
            new FrequencyBand(2 * Math.PI * 9, 2 * Math.PI * 11)), ResponseKind.DISPLACEMENT);
    private final Absorber absorber = Absorber.of(structure, DenHartogEqualPeak.tuning(0.05));
    private final ToleranceSet spread = new ToleranceSet(Tolerance.uniform(0.05), Tolerance.normal(0.03),
            Tolerance.uniform(0.02), Tolerance.normal(0.03), Tolerance.uniform(0.2));

    /** @return 10 000 samples */
    @Benchmark
    public MonteCarloResult monteCarlo10k() {
        return MonteCarlo.run(mistuning, absorber, spread, 10_000, 1L, OptionalDouble.of(1e-4));
    }

    /** @return the robust design over +/-10 % structure mistuning */
    @Benchmark
    public RobustDesign robustDesignStructure() {
        return RobustOptimiser.optimise(mistuning, 0.05, 0.10, 0.0, List.of(DenHartogEqualPeak.tuning(0.05)));
    }

    /** @return the robust design over +/-10 % structure and +/-2 % absorber mistuning */
    @Benchmark
    public RobustDesign robustDesignBoth() {
        return RobustOptimiser.optimise(mistuning, 0.05, 0.10, 0.02, List.of(DenHartogEqualPeak.tuning(0.05)));
    }

    /**
     * @return the robust worst-case design over the three default ranges, seeded as the design
     *     method seeds it (the exact nominal optimum, computed here, and Den Hartog's design)
     */
    @Benchmark
    public RobustDesign robustWorstCaseDesign() {
        Tuning nominal = HInfinityOptimiser.optimise(PeakProblem.free(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT,
                0.05, 0.02, 0.9, 1.1)).tuning();
        return RobustOptimiser.optimise(mistuning, 0.05, ToleranceRanges.DEFAULT, List.of(nominal,
                DenHartogEqualPeak.tuning(0.05)), RobustLimits.NONE, ProgressListener.NONE);
    }
}
