package org.counterpoise.core.tuning;

import java.util.Set;
import org.counterpoise.core.model.Tuning;

/**
 * A published closed-form tuning picked for an excitation and response pair, or a computed one.
 *
 * @param tuning the tuning
 * @param source author, year and work it comes from
 * @param note what it assumes, in one sentence (for people; decisions read {@code assumptions})
 * @param assumptions what it assumes, as values code decides on
 */
public record ClosedForm(Tuning tuning, String source, String note, Set<Assumption> assumptions) {

    /** Defensive copy. */
    public ClosedForm {
        assumptions = Set.copyOf(assumptions);
    }

    /**
     * A tuning that assumes nothing beyond the model.
     *
     * @param tuning the tuning
     * @param source author, year and work it comes from
     * @param note what it found or assumed, in one sentence
     */
    public ClosedForm(Tuning tuning, String source, String note) {
        this(tuning, source, note, Set.of());
    }
}
