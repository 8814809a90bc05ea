package org.counterpoise.bench;

import java.util.concurrent.TimeUnit;
import org.counterpoise.core.optim.JointAbsorberOptimiser;
import org.counterpoise.core.optim.JointAbsorberOptimum;
import org.counterpoise.core.optim.JointAbsorberProblem;
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
 * Time of one certified joint design of one absorber per mode on a two-mode structure (sequential
 * design, scan, search, certificate included): mu = 0.05 in total, zeta = 0.01, all frequencies,
 * modes 2.5 apart of equal modal mass (the docs' example) and modes 20 apart (the flat case, which
 * also runs the second search). Run with the command in docs/performance.md.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class JointAbsorberBenchmark {
    private final JointAbsorberProblem close = new JointAbsorberProblem(0.05, 0.01, 2.5, 1.0, 1.0, 0.0,
            Double.POSITIVE_INFINITY);
    private final JointAbsorberProblem farApart = new JointAbsorberProblem(0.05, 0.01, 20.0, 1.0, 1.0, 0.0,
            Double.POSITIVE_INFINITY);

    /** @return modes 2.5 apart */
    @Benchmark
    public JointAbsorberOptimum modesTwoAndAHalfApart() {
        return JointAbsorberOptimiser.optimise(close);
    }

    /** @return modes 20 apart */
    @Benchmark
    public JointAbsorberOptimum modesTwentyApart() {
        return JointAbsorberOptimiser.optimise(farApart);
    }
}
