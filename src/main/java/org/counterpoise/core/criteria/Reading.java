package org.counterpoise.core.criteria;

import java.util.List;
import java.util.OptionalInt;

/**
 * The criterion's measure of one system (bare or with the absorber) over the forcing band, where it
 * is worst against the limit.
 *
 * @param value the measure where value over limit is largest over the band: SI unit of the
 *     criterion's quantity, in its convention, weighted where the criterion weights, the orders
 *     combined as the criterion combines them; +infinity when unbounded (an undamped structure
 *     forced at its natural frequency), see {@link #unbounded()}
 * @param limit the limit at that point, SI
 * @param worstFrequency the design order's forcing frequency there, rad/s
 * @param governingOrder for criteria that judge each order on its own: the index in
 *     {@code Excitation.orders()} of the order that governs (0 is the design order); empty when the
 *     orders are judged together
 * @param zones ids of the zones (or comfort reactions) the value falls in; empty when the
 *     criterion has none
 * @param outsideRange true when the worst point lies outside the limit curve's range of use (the
 *     end value was held)
 */
public record Reading(double value, double limit, double worstFrequency, OptionalInt governingOrder,
        List<String> zones, boolean outsideRange) {

    /** Defensive copy. */
    public Reading {
        zones = List.copyOf(zones);
    }

    /** @return true when the measure has no finite bound over the band */
    public boolean unbounded() {
        return Double.isInfinite(value);
    }

    /** @return value over limit: at most 1 passes (+infinity when unbounded) */
    public double utilisation() {
        return value / limit;
    }

    /** @return true when the value does not exceed the limit */
    public boolean passes() {
        return value <= limit;
    }

    /** @return limit over value, the margin as a factor (above 1 passes; 0 when unbounded) */
    public double marginRatio() {
        return limit / value;
    }

    /** @return the margin in decibels, 20 log10(limit / value): positive passes (-infinity when unbounded) */
    public double marginDecibels() {
        return 20.0 * Math.log10(marginRatio());
    }
}
