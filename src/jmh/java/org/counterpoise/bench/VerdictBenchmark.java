package org.counterpoise.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.Assessor;
import org.counterpoise.core.criteria.BuildingAxis;
import org.counterpoise.core.criteria.BuildingVibration;
import org.counterpoise.core.criteria.ComfortReaction;
import org.counterpoise.core.criteria.FrequencyWeighting;
import org.counterpoise.core.criteria.HumanComfort;
import org.counterpoise.core.criteria.LimitCurve;
import org.counterpoise.core.criteria.MachineClass;
import org.counterpoise.core.criteria.MachineSeverity;
import org.counterpoise.core.criteria.RoomUse;
import org.counterpoise.core.criteria.SeverityZone;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
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
 * Time of one call of the verdict's fast path, {@link Assessor#utilisation}, the call a search for
 * the lightest absorber that meets a criterion repeats: an invented floor (1500 kg at 9 Hz, 2 %
 * damping) with an absorber (mu = 0.06), a fan's unbalance over 7 to 11 Hz, alone or with a
 * blade-pass force at 6x and a motor force at 2x. Run with the command in docs/performance.md.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class VerdictBenchmark {
    private static final double TWO_PI = 2 * Math.PI;
    private final Structure floor = Structure.of(1500, 1500 * Math.pow(TWO_PI * 9, 2), 0.02);
    private final Tuning absorber = new Tuning(0.06, 0.94, 0.14);
    private final Excitation fan = new Excitation(ExcitationKind.UNBALANCE, 0.05,
            new FrequencyBand(TWO_PI * 7, TWO_PI * 11));
    private final Excitation orders = fan.withOtherOrders(List.of(new ExcitationOrder(ExcitationKind.FORCE, 30, 6.0),
            new ExcitationOrder(ExcitationKind.FORCE, 60, 2.0)));
    private final Assessor oneOrder = Assessor.of(new UserLimit(ResponseKind.VELOCITY, AmplitudeConvention.RMS,
            LimitCurve.flat(1e-3)), fan);
    private final Assessor machineThreeOrders = Assessor.of(new MachineSeverity(MachineClass.GROUP_2_FLEXIBLE,
            SeverityZone.B), orders);
    private final Assessor comfortThreeOrders = Assessor.of(new HumanComfort(FrequencyWeighting.WK,
            ComfortReaction.A_LITTLE_UNCOMFORTABLE), orders);
    private final Assessor buildingThreeOrders = Assessor.of(new BuildingVibration(BuildingAxis.VERTICAL,
            RoomUse.QUIET_OFFICE), orders);
    private final Assessor peakSumThreeOrders = Assessor.of(new UserLimit(ResponseKind.DISPLACEMENT,
            AmplitudeConvention.PEAK, LimitCurve.flat(1e-4)), orders);

    /** @return one order, flat r.m.s. limit: one exact peak search */
    @Benchmark
    public double oneOrderFlat() {
        return oneOrder.utilisation(floor, absorber);
    }

    /** @return three orders together in r.m.s. (machine severity): one rational function */
    @Benchmark
    public double machineThreeOrders() {
        return machineThreeOrders.utilisation(floor, absorber);
    }

    /** @return three orders together, weighted by Wk (ISO 2631-1 comfort) */
    @Benchmark
    public double comfortThreeOrders() {
        return comfortThreeOrders.utilisation(floor, absorber);
    }

    /** @return three orders each against the building base curve, piece by piece */
    @Benchmark
    public double buildingThreeOrders() {
        return buildingThreeOrders.utilisation(floor, absorber);
    }

    /** @return three orders together as a sum of amplitudes: scan plus Brent */
    @Benchmark
    public double peakSumThreeOrders() {
        return peakSumThreeOrders.utilisation(floor, absorber);
    }
}
