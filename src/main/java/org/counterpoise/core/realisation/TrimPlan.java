package org.counterpoise.core.realisation;

/**
 * How the absorber is adjusted on site to the structure's measured frequency: trim plates added to
 * or taken from a mass built with the middle of the range fitted, SI.
 *
 * @param structureFrequencyLow the lowest structure natural frequency the trim must cover, rad/s
 * @param structureFrequencyHigh the highest, rad/s
 * @param plateMass one trim plate, kg
 * @param platesFitted plates fitted as built (the middle of the range)
 * @param platesTotal plates supplied (from none fitted to all fitted covers the range)
 * @param percentPerPlate the change of absorber frequency one plate makes, percent (positive)
 * @param platesPerPercent plates per percent of frequency
 */
public record TrimPlan(double structureFrequencyLow, double structureFrequencyHigh, double plateMass,
        int platesFitted, int platesTotal, double percentPerPlate, double platesPerPercent) {
}
