package org.counterpoise.core.remedy;

/**
 * Stiffness changes of the bare structure that bring its worst response over the band down to a
 * target level. A factor of 1.0 means no change is needed; NaN means no change in the searched
 * range (stiffer up to 10 000 times, softer down to one millionth) reaches the target.
 *
 * @param target the SI level aimed at
 * @param stifferFactor new stiffness over old, &gt;= 1, or NaN
 * @param softerFactor new stiffness over old, &lt;= 1, or NaN
 */
public record DetuningAlternative(double target, double stifferFactor, double softerFactor) {

    /** @return true when stiffening alone can reach the target */
    public boolean stifferReachable() {
        return !Double.isNaN(stifferFactor);
    }

    /** @return true when softening alone can reach the target */
    public boolean softerReachable() {
        return !Double.isNaN(softerFactor);
    }
}
