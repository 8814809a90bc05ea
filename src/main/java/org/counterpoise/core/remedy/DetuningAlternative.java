package org.counterpoise.core.remedy;

import java.util.OptionalDouble;

/**
 * The changes of the bare structure that bring its peak over the band down to a target (what the
 * absorber design achieves): each way, the smallest change whose band peak is at or below the
 * target (the factor nearest 1 in the search range; the rule is in {@link StructureDetuning} and
 * docs/glossary.md, "detuning"). For a stiffness change the factors are new over old stiffness
 * (raise: stiffer, &gt; 1; lower: softer, &lt; 1); for a mass change, new over old mass (raise:
 * lighter, &lt; 1; lower: heavier, &gt; 1). A factor of 1.0 means no change is needed; an empty factor
 * means no change in the searched range (10 000 times either way for stiffness and mass, down to
 * one millionth of the stiffness) reaches the target, or that no search was made because the
 * target is zero or unbounded (see {@link #none}).
 *
 * @param target the SI level aimed at
 * @param raiseFactor the change that raises the natural frequency, when one reaches the target
 * @param lowerFactor the change that lowers it, when one reaches the target
 */
public record DetuningAlternative(double target, OptionalDouble raiseFactor, OptionalDouble lowerFactor) {

    /**
     * @param target the SI level (unbounded or zero: no change of the structure is sought)
     * @return an alternative with no factor
     */
    public static DetuningAlternative none(double target) {
        return new DetuningAlternative(target, OptionalDouble.empty(), OptionalDouble.empty());
    }
}
