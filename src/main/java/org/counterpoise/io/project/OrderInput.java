package org.counterpoise.io.project;

import org.counterpoise.core.model.ExcitationKind;

/**
 * Another harmonic of the rotor as the user gave it, beside the disturbance's own: its harmonic
 * order (forcing cycles per revolution of the same shaft), what it is, and its amplitude (or, for
 * an unbalance, a balance grade instead).
 *
 * @param harmonicOrder forcing cycles per revolution (&gt; 0), different from every other order's
 * @param kind what this order is
 * @param amplitude its amplitude, or null when a balance grade gives it
 * @param balanceGrade for an unbalance: the balance grade that gives its amplitude, or null
 */
public record OrderInput(double harmonicOrder, ExcitationKind kind, QuantityInput amplitude,
        BalanceGradeInput balanceGrade) {

    /**
     * @param harmonicOrder forcing cycles per revolution
     * @param kind what this order is
     * @param amplitude its amplitude
     * @return an order with an amplitude
     */
    public static OrderInput of(double harmonicOrder, ExcitationKind kind, QuantityInput amplitude) {
        return new OrderInput(harmonicOrder, kind, amplitude, null);
    }

    /**
     * @param d a disturbance
     * @return its own order (the one its kind, amplitude and harmonic order describe)
     */
    public static OrderInput ofDisturbance(DisturbanceInput d) {
        return new OrderInput(d.harmonicOrder(), d.kind(), d.amplitude(), d.balanceGrade());
    }
}
