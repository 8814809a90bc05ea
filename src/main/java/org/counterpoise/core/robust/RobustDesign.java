package org.counterpoise.core.robust;

import org.counterpoise.core.model.Tuning;

/**
 * A design chosen for its worst case over a mistuning range.
 *
 * @param tuning the robust tuning
 * @param worstCase where and how bad its worst case is (SI peak)
 * @param nominalPeak its peak at nominal tuning, SI
 * @param evaluations worst-case evaluations used
 * @param converged true when the search met its tolerance
 */
public record RobustDesign(Tuning tuning, WorstCase.Point worstCase, double nominalPeak, int evaluations,
        boolean converged) {
}
