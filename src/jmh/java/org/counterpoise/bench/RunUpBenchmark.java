package org.counterpoise.bench;

import java.util.concurrent.TimeUnit;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.runup.RunUp;
import org.counterpoise.core.runup.RunUpResult;
import org.counterpoise.core.runup.SpeedRamp;
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
 * One run-up of 500 forcing cycles through resonance with the absorber fitted (issue target:
 * under 50 ms). An invented case: 1000 kg at 10 Hz, 2 % damping, Den Hartog absorber mu = 0.05,
 * unbalance 0.05 kg*m, from rest to 1.25 times the natural frequency.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class RunUpBenchmark {
    private final Structure structure = Structure.of(1000, 1000 * Math.pow(2 * Math.PI * 10, 2), 0.02);
    private final Tuning tuning = DenHartogEqualPeak.tuning(0.05);
    private final double top = 1.25 * structure.naturalFrequency();
    /** 500 cycles: phi(T) = top^2 / (2 alpha) = 500 * 2 pi. */
    private final SpeedRamp ramp = SpeedRamp.runUp(top, top * top / (2.0 * 500 * 2.0 * Math.PI));

    /** @return the run-up with the absorber */
    @Benchmark
    public RunUpResult runUp500Cycles() {
        return RunUp.simulate(structure, tuning, ExcitationKind.UNBALANCE, 0.05, ramp, RunUp.Start.REST,
                ProgressListener.NONE);
    }
}
