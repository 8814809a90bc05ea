package org.counterpoise.core.remedy;

/**
 * Changes of the bare structure that bring its worst response over the band down to a target:
 * one that raises its natural frequency above the band, one that lowers it below. For a
 * stiffness change the factors are new over old stiffness (raise: stiffer, &gt; 1; lower: softer,
 * &lt; 1); for a mass change, new over old mass (raise: lighter, &lt; 1; lower: heavier, &gt; 1). A
 * factor of 1.0 means no change is needed; NaN means no change in the searched range (10 000 times
 * either way for stiffness and mass, down to one millionth of the stiffness) reaches the target.
 *
 * @param target the SI level aimed at
 * @param raiseFactor the change that raises the natural frequency, or NaN
 * @param lowerFactor the change that lowers it, or NaN
 */
public record DetuningAlternative(double target, double raiseFactor, double lowerFactor) {
}
