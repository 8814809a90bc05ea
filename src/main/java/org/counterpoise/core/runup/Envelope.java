package org.counterpoise.core.runup;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.counterpoise.core.response.ResponseKind;

/**
 * The response envelope of a run-up: the largest magnitude of each quantity in consecutive
 * windows of one forcing cycle (a window also closes after two periods of the structure's natural
 * frequency, so that the first, very slow cycles near rest are split too). For each window the
 * time and forcing frequency at its middle are kept, for plots against time or speed.
 *
 * @param time middle of each window, s
 * @param speed forcing frequency at the middle of each window, rad/s
 * @param values per quantity, the largest magnitude in each window, SI
 */
public record Envelope(double[] time, double[] speed, Map<ResponseKind, double[]> values) {

    /** Defensive copies. */
    public Envelope {
        time = time.clone();
        speed = speed.clone();
        Map<ResponseKind, double[]> copy = new EnumMap<>(ResponseKind.class);
        values.forEach((k, v) -> copy.put(k, v.clone()));
        values = Map.copyOf(copy);
    }

    /** @return the number of windows */
    public int size() {
        return time.length;
    }

    /** @return a copy of the window times, s */
    @Override
    public double[] time() {
        return time.clone();
    }

    /** @return a copy of the window speeds, rad/s */
    @Override
    public double[] speed() {
        return speed.clone();
    }

    /**
     * @param kind a quantity of {@link RunUp#quantities}
     * @return a copy of its envelope, SI
     * @throws IllegalArgumentException when the quantity was not tracked
     */
    public double[] of(ResponseKind kind) {
        double[] v = values.get(kind);
        if (v == null) {
            throw new IllegalArgumentException(kind + " was not tracked");
        }
        return v.clone();
    }

    /** @return the quantities tracked */
    public List<ResponseKind> quantities() {
        return values.keySet().stream().sorted().toList();
    }
}
