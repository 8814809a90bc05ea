package org.counterpoise.core.realisation;

/**
 * One row of the predicted response table a technician compares readings against, SI (the
 * response that matters, in the study's quantity, amplitude as the design states it).
 *
 * @param frequency forcing frequency, rad/s
 * @param before the bare structure's response
 * @param after the response with the absorber (+infinity at an undamped coupled natural frequency)
 * @param stroke the absorber's stroke (relative displacement amplitude), m (+infinity there too)
 */
public record PredictedPoint(double frequency, double before, double after, double stroke) {
}
