package org.counterpoise.bench;

import java.util.concurrent.TimeUnit;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.MethodComparison;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.io.preset.Presets;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * What the wizard's result step computes after an edit (issue 12 target: under 150 ms): a fresh
 * dossier's design, its curves and the comparison of methods (every method's design, worst case and
 * 95th percentile over the tolerance ranges, and strokes). For each shipped preset as it is, and
 * with a run-up rate of 20 rpm/s added (the run-up stroke is then a time integration per method).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ComparisonBenchmark {
    /** Shaft run-up rate added for the "with rate" case, rpm/s, in rad/s^2. */
    private static final double RATE = 20 * 2 * Math.PI / 60;

    @Param({"rooftop-fan-platform", "pump-skid-mezzanine", "bench-beside-compressor",
        "blower-frame-single-speed", "compressor-frame-speed-band"})
    private String preset;

    @Param({"false", "true"})
    private boolean withRate;

    private DesignStudy study;

    /** Loads the preset. */
    @Setup
    public void load() {
        DesignStudy s = Presets.load(preset + ".json").project().toStudy();
        double order = Presets.load(preset + ".json").project().disturbance().harmonicOrder();
        study = withRate ? new DesignStudy(s.name(), s.structure(), s.excitation().withRunUpRate(RATE * order),
                s.response(), s.sizing(), s.method(), s.hangsVertically(), s.strokeMargin(), s.constraints(),
                s.robustness()) : s;
    }

    /** @return the result step's work after an edit: design, curves and comparison of a new state */
    @Benchmark
    public MethodComparison resultStepAfterEdit() {
        DesignDossier dossier = DesignDossier.of(study);
        dossier.curves();
        return dossier.comparison(ProgressListener.NONE);
    }
}
