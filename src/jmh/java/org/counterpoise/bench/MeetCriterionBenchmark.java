package org.counterpoise.bench;

import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.LimitCurve;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.Designer;
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
 * A design to meet the criterion, as {@code design} on the command line runs it: the lightest
 * absorber up to a mass ratio of 0.25 by the preset's method (exact-peak or a robust method), for
 * the preset's own criterion when it carries one, else a flat peak limit on its response that its
 * own design just meets (so the answer lies near the preset's mass ratio). Beside it, the
 * preset's design by the same method at its own mass ratio, the cost of one design.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
@Fork(1)
public class MeetCriterionBenchmark {

    @Param({"rooftop-fan-platform", "pump-skid-mezzanine", "bench-beside-compressor",
        "blower-frame-single-speed", "compressor-frame-speed-band"})
    private String preset;

    @Param({"exact-peak", "robust-worst-case"})
    private String method;

    private DesignStudy study;
    private DesignStudy atMassRatio;

    /** Loads the preset and states the goal. */
    @Setup
    public void load() {
        DesignStudy s = Presets.load(preset + ".json").project().toStudy()
                .withMethod(DesignMethod.byId(method).orElseThrow());
        Criterion criterion = s.criterion().orElseGet(() -> {
            DesignResult own = Designer.design(s);
            return new UserLimit(s.response(), AmplitudeConvention.PEAK, LimitCurve.flat(own.responseAfter().value()));
        });
        atMassRatio = s;
        study = s.withCriterion(Optional.of(criterion))
                .withSizing(new AbsorberSizing.MeetCriterion(AbsorberSizing.DEFAULT_MAX_MASS_RATIO), s.constraints());
    }

    /** @return the design that meets the criterion with the least absorber */
    @Benchmark
    public DesignResult meetCriterion() {
        return Designer.design(study);
    }

    /** @return the preset's own design by the same method at its own mass ratio (the baseline) */
    @Benchmark
    public DesignResult atItsMassRatio() {
        return Designer.design(atMassRatio);
    }
}
