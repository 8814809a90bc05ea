package org.counterpoise.core.realisation;

/**
 * How the absorber's own frequency is adjusted on site: trim plates added to or taken from a mass built
 * with part of them fitted, SI.
 *
 * @param absorberFrequencyLow the absorber's natural frequency with every supplied plate fitted, rad/s
 * @param absorberFrequencyHigh its natural frequency with every plate taken off, rad/s
 * @param plateMass one trim plate, kg
 * @param platesFitted plates fitted as built
 * @param platesTotal plates supplied
 * @param percentPerPlate the change of absorber frequency one plate makes, percent (positive)
 * @param platesPerPercent plates per percent of frequency
 */
public record TrimPlan(double absorberFrequencyLow, double absorberFrequencyHigh, double plateMass,
        int platesFitted, int platesTotal, double percentPerPlate, double platesPerPercent) {
}
