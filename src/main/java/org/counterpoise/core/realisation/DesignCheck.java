package org.counterpoise.core.realisation;

import org.counterpoise.core.units.Dimension;

/**
 * One check of the hardware: a demand against a capacity in the same dimension, SI. It passes when
 * the demand does not exceed the capacity.
 *
 * @param kind what is checked
 * @param demand what the design asks (stress, deflection, frequency ...), SI, finite and &gt;= 0
 * @param capacity what the part allows, SI, finite and &gt; 0
 * @param dimension the dimension of both
 * @param source the standard, equation and edition the capacity comes from (or "common practice")
 */
public record DesignCheck(CheckKind kind, double demand, double capacity, Dimension dimension, String source) {

    /** @return demand over capacity (1 is the limit) */
    public double utilisation() {
        return demand / capacity;
    }

    /** @return true when the demand does not exceed the capacity */
    public boolean passes() {
        return demand <= capacity;
    }
}
