package org.counterpoise.bench;

import java.util.concurrent.TimeUnit;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.optim.RobustSetOptimiser;
import org.counterpoise.core.optim.RobustSetOptimum;
import org.counterpoise.core.optim.RobustSetProblem;
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
 * Time of one certified least worst-case design of three absorbers on one damped mode (zeta1 = 0.01,
 * mu = 0.05 in total, all frequencies): the structure's frequency within +/-5 %, and with the
 * absorbers' common factor within +/-3 % too; uniform spread and individual tuning (which includes
 * the robust uniform design it starts from). Every one includes the least-peak set it is seeded
 * with. Run with the command in docs/performance.md.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 5)
@Measurement(iterations = 4, time = 5)
@Fork(1)
public class RobustSetBenchmark {
    private final AbsorberSetProblem uniform = AbsorberSetProblem.allFrequencies(3, 0.05, 0.01,
            AbsorberSetTuning.UNIFORM);
    private final RobustSetProblem structureOnly = new RobustSetProblem(uniform, 0.05, 0.0, 0.01);
    private final RobustSetProblem bothRanges = new RobustSetProblem(uniform, 0.05, 0.03, 0.01);
    private final RobustSetProblem individual = new RobustSetProblem(uniform.with(AbsorberSetTuning.INDIVIDUAL), 0.05,
            0.0, 0.01);

    /** @return three absorbers, uniform spread, structure range only */
    @Benchmark
    public RobustSetOptimum threeUniformStructure() {
        return RobustSetOptimiser.optimise(structureOnly);
    }

    /** @return three absorbers, uniform spread, structure and absorber ranges */
    @Benchmark
    public RobustSetOptimum threeUniformBoth() {
        return RobustSetOptimiser.optimise(bothRanges);
    }

    /** @return three absorbers, individual tuning, structure range only */
    @Benchmark
    public RobustSetOptimum threeIndividualStructure() {
        return RobustSetOptimiser.optimise(individual);
    }
}
