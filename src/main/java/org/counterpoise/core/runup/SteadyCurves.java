package org.counterpoise.core.runup;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.response.SystemResponse;

/**
 * The steady-state amplitudes over the speeds of a ramp, drawn beside the run-up envelope: the
 * frequency response's amplitude (the same quantity the envelope tracks) with and without the
 * absorber at each forcing frequency of a grid from 0 to the ramp's top speed, with the exact
 * steady-state peak frequencies added so that the curve shows the peak the tables give. The values
 * come from {@link SystemResponse} (the one route of the frequency-domain design); an undamped
 * resonance gives an infinite value, which only a chart's range rule may turn into a mark.
 *
 * @param speed forcing frequencies, rad/s, ascending
 * @param withAbsorber per quantity of {@link RunUp#quantities}(true), the amplitude at each speed, SI
 * @param withoutAbsorber per quantity of {@link RunUp#quantities}(false), the amplitude at each speed, SI
 */
public record SteadyCurves(double[] speed, Map<ResponseKind, double[]> withAbsorber,
        Map<ResponseKind, double[]> withoutAbsorber) {

    /** Grid points of a curve, besides the peak frequencies. */
    public static final int POINTS = 400;

    /** Defensive copies. */
    public SteadyCurves {
        speed = speed.clone();
        withAbsorber = copy(withAbsorber);
        withoutAbsorber = copy(withoutAbsorber);
    }

    /**
     * @param structure the structure
     * @param tuning the absorber
     * @param kind force, unbalance or base displacement
     * @param amplitude SI drive amplitude
     * @param comparison the run-up whose speeds and steady peaks the curves accompany
     * @return the curves over 0 to the ramp's top speed
     */
    public static SteadyCurves of(Structure structure, Tuning tuning, ExcitationKind kind, double amplitude,
            RunUpComparison comparison) {
        double top = Checks.positive("run_up.final_speed", comparison.withAbsorber().ramp().topSpeed());
        double[] grid = new double[POINTS + 1];
        for (int i = 0; i <= POINTS; i++) {
            grid[i] = top * i / POINTS;
        }
        double[] extra = peakFrequencies(comparison, top);
        double[] speeds = Arrays.copyOf(grid, grid.length + extra.length);
        System.arraycopy(extra, 0, speeds, grid.length, extra.length);
        Arrays.sort(speeds);
        return new SteadyCurves(speeds, amplitudes(new SystemResponse(structure, tuning, kind, amplitude), speeds),
                amplitudes(new SystemResponse(structure, null, kind, amplitude), speeds));
    }

    /** @return a copy of the forcing frequencies, rad/s */
    @Override
    public double[] speed() {
        return speed.clone();
    }

    /**
     * @param withAbsorber true for the curve with the absorber fitted
     * @param kind a quantity
     * @return a copy of its amplitudes, SI (infinite at an undamped resonance)
     * @throws IllegalArgumentException when that side does not have the quantity
     */
    public double[] of(boolean withAbsorber, ResponseKind kind) {
        double[] v = (withAbsorber ? this.withAbsorber : this.withoutAbsorber).get(kind);
        if (v == null) {
            throw new IllegalArgumentException(kind + " has no steady curve " + (withAbsorber ? "with" : "without")
                    + " the absorber");
        }
        return v.clone();
    }

    private static double[] peakFrequencies(RunUpComparison comparison, double top) {
        return Stream.of(comparison.steadyWithAbsorber(), comparison.steadyWithoutAbsorber())
                .flatMap(m -> m.values().stream()).mapToDouble(ResponsePeak::frequency)
                .filter(w -> w > 0 && w < top && Double.isFinite(w)).distinct().toArray();
    }

    private static Map<ResponseKind, double[]> amplitudes(SystemResponse response, double[] speeds) {
        Map<ResponseKind, double[]> out = new EnumMap<>(ResponseKind.class);
        List<ResponseKind> kinds = RunUp.quantities(response.tuning() != null);
        for (ResponseKind k : kinds) {
            double[] v = new double[speeds.length];
            for (int i = 0; i < speeds.length; i++) {
                v[i] = response.amplitudeAt(k, speeds[i]);
            }
            out.put(k, v);
        }
        return out;
    }

    private static Map<ResponseKind, double[]> copy(Map<ResponseKind, double[]> m) {
        Map<ResponseKind, double[]> out = new EnumMap<>(ResponseKind.class);
        m.forEach((k, v) -> out.put(k, v.clone()));
        return Map.copyOf(out);
    }
}
