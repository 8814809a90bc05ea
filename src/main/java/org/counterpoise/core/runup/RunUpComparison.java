package org.counterpoise.core.runup;

import java.util.EnumMap;
import java.util.Map;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.response.SystemResponse;

/**
 * A run-up (or run-down) with and without the absorber, beside the steady-state peaks over the
 * same speeds. The steady-state peaks come from {@link SystemResponse#peakBetween} (the exact
 * frequency-domain route) over 0 to the ramp's top speed, i.e. what a machine that could dwell at
 * any speed it passes would see.
 *
 * @param withAbsorber the run with the absorber fitted
 * @param withoutAbsorber the run of the bare structure
 * @param steadyWithAbsorber steady-state peaks with the absorber, per quantity of
 *     {@link RunUp#quantities}(true)
 * @param steadyWithoutAbsorber steady-state peaks of the bare structure, per quantity of
 *     {@link RunUp#quantities}(false)
 */
public record RunUpComparison(RunUpResult withAbsorber, RunUpResult withoutAbsorber,
        Map<ResponseKind, ResponsePeak> steadyWithAbsorber, Map<ResponseKind, ResponsePeak> steadyWithoutAbsorber) {

    /** Defensive copies. */
    public RunUpComparison {
        steadyWithAbsorber = Map.copyOf(steadyWithAbsorber);
        steadyWithoutAbsorber = Map.copyOf(steadyWithoutAbsorber);
    }

    /**
     * @param structure the structure
     * @param tuning the absorber
     * @param kind force, unbalance or base displacement
     * @param amplitude SI drive amplitude
     * @param ramp the speed ramp
     * @param start rest for a run-up, steady state for a run-down
     * @param listener progress (first half with the absorber, second half without) and cancellation
     * @return both runs and the steady-state peaks
     */
    public static RunUpComparison of(Structure structure, Tuning tuning, ExcitationKind kind, double amplitude,
            SpeedRamp ramp, RunUp.Start start, ProgressListener listener) {
        RunUpResult with = RunUp.simulate(structure, tuning, kind, amplitude, ramp, start, listener.part(0.0, 0.5));
        RunUpResult without = RunUp.simulate(structure, null, kind, amplitude, ramp, start, listener.part(0.5, 0.5));
        return new RunUpComparison(with, without, steady(structure, tuning, kind, amplitude, ramp),
                steady(structure, null, kind, amplitude, ramp));
    }

    private static Map<ResponseKind, ResponsePeak> steady(Structure structure, Tuning tuning, ExcitationKind kind,
            double amplitude, SpeedRamp ramp) {
        SystemResponse response = new SystemResponse(structure, tuning, kind, amplitude);
        Map<ResponseKind, ResponsePeak> out = new EnumMap<>(ResponseKind.class);
        for (ResponseKind k : RunUp.quantities(tuning != null)) {
            out.put(k, response.peakBetween(k, 0.0, ramp.topSpeed()));
        }
        return out;
    }
}
