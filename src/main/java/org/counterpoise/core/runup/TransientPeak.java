package org.counterpoise.core.runup;

/**
 * The largest magnitude a quantity reaches during a run-up or run-down, and when.
 *
 * @param value the peak magnitude, SI
 * @param time when it occurs, s from the start of the ramp
 * @param speed the forcing frequency at that time, rad/s
 */
public record TransientPeak(double value, double time, double speed) {
}
