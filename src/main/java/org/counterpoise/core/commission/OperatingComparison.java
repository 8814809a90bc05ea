package org.counterpoise.core.commission;

import java.util.List;
import org.counterpoise.core.response.ResponseKind;

/**
 * An operating measurement against the model's prediction, SI, amplitudes as peaks.
 *
 * @param runningFrequency the running frequency the model is evaluated at (stated, the project's single
 *     speed, or over a band the line found), rad/s
 * @param lineFrequency the frequency of the line compared, rad/s
 * @param kind the quantity compared
 * @param measured the measured amplitude at that line
 * @param predicted the model's amplitude at the running frequency for the project's disturbance
 * @param ratio measured over predicted: the disturbance the site shows over the project's
 * @param impliedDriveAmplitude the project's disturbance amplitude times the ratio (its SI unit)
 * @param designStroke the design's largest stroke (band or run-up), m
 * @param impliedStroke that stroke under the disturbance the site shows, m
 * @param clearance the design's stroke clearance, m
 * @param withAbsorber whether the absorber was fitted when measured
 * @param warnings what calls for attention
 * @param largestLineFrequency the frequency of the spectrum's largest line, rad/s
 * @param largestLine its amplitude
 */
public record OperatingComparison(double runningFrequency, double lineFrequency, ResponseKind kind, double measured,
        double predicted, double ratio, double impliedDriveAmplitude, double designStroke, double impliedStroke,
        double clearance, boolean withAbsorber, List<CommissioningWarning> warnings, double largestLineFrequency,
        double largestLine) {

    /** Copies the warnings. */
    public OperatingComparison {
        warnings = List.copyOf(warnings);
    }
}
