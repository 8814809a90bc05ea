package org.counterpoise.core.tuning;

import org.counterpoise.core.model.Tuning;

/**
 * A published closed-form tuning picked for an excitation and response pair.
 *
 * @param tuning the tuning
 * @param source author, year and work it comes from
 * @param note what it assumes, in one sentence
 */
public record ClosedForm(Tuning tuning, String source, String note) {
}
