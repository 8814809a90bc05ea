package org.counterpoise.core.realisation;

import org.counterpoise.core.units.Dimension;

/**
 * A number a procedure step gives the technician, SI.
 *
 * @param quantity what it is
 * @param value its value, SI
 * @param dimension its dimension
 */
public record StepFigure(StepQuantity quantity, double value, Dimension dimension) {

    /** What a step's number is; the words are in io.text. */
    public enum StepQuantity {
        /** The structure's natural frequency the design expects. */
        EXPECTED_STRUCTURE_FREQUENCY,
        /** The lowest structure frequency the design holds (its peak in band within the allowance). */
        STRUCTURE_RANGE_LOW,
        /** The highest structure frequency the design holds. */
        STRUCTURE_RANGE_HIGH,
        /** Within the structure range, how far the design's peak in band may rise, fraction of it. */
        STRUCTURE_RANGE_ALLOWANCE,
        /**
         * Within the structure range, the response's bound as a fraction of the bare structure's (a design
         * that cancels the response at one speed: its own peak is about nil).
         */
        STRUCTURE_RANGE_ALLOWANCE_OF_BARE,
        /** The absorber frequency to tune to. */
        ABSORBER_TARGET_FREQUENCY,
        /** How far the absorber frequency may be from its target, fraction. */
        ABSORBER_FREQUENCY_TOLERANCE,
        /** The clearance to leave around the mass. */
        CLEARANCE,
        /** The running speed at which to measure. */
        RUNNING_FREQUENCY,
        /** The predicted response at the running speed with the absorber. */
        PREDICTED_RESPONSE,
        /** The predicted largest response over the band with the absorber. */
        PREDICTED_PEAK_IN_BAND,
        /** One trim plate's mass. */
        TRIM_PLATE_MASS,
        /** Plates per percent of frequency. */
        PLATES_PER_PERCENT
    }
}
