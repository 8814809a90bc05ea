package org.counterpoise.core.model;

import org.counterpoise.core.error.Checks;

/**
 * Another harmonic of the same rotor that excites the structure at the same time as the design
 * order (the {@link Excitation}'s own kind, amplitude and band): 1x unbalance beside a blade-pass
 * force, say. Its forcing frequency is always {@code frequencyFactor} times the design order's.
 *
 * @param kind what this order is (a force or an unbalance; base motion too)
 * @param amplitude amplitude in the SI unit of {@link ExcitationKind#amplitudeDimension()} (&gt; 0)
 * @param frequencyFactor this order's forcing frequency over the design order's (&gt; 0, not 1):
 *     its harmonic order over the design order's harmonic order
 */
public record ExcitationOrder(ExcitationKind kind, double amplitude, double frequencyFactor) {

    /** Validates the record. */
    public ExcitationOrder {
        Checks.present("disturbance.orders.kind", kind, "one of force, unbalance, base-displacement,"
                + " base-acceleration");
        Checks.positive("disturbance.orders.amplitude", amplitude);
        Checks.positive("disturbance.orders.harmonic_order", frequencyFactor);
    }
}
