package org.counterpoise.core.response;

/**
 * The largest SI amplitude of a response over a frequency range.
 *
 * @param frequency where it occurs, rad/s
 * @param value the amplitude in SI; +infinity when the response has no finite maximum there
 */
public record ResponsePeak(double frequency, double value) {

    /** @return true when unbounded (an undamped resonance, or a limit at 0 or infinity) */
    public boolean unbounded() {
        return Double.isInfinite(value);
    }
}
