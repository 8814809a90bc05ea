package org.counterpoise.io.text;

import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.optim.ActiveConstraint;

/**
 * The design method's note as people read it: what the method assumed or found, and the
 * constraint that holds an exact-peak optimum back, in words written here only.
 */
public final class MethodNoteText {
    private MethodNoteText() {
    }

    /**
     * @param r a design
     * @return its method note, e.g. "maxima equal at the optimum: ...; active constraint: stroke limit (held during run-up too)"
     */
    public static String of(DesignResult r) {
        ActiveConstraint c = r.activeConstraint();
        return c == ActiveConstraint.NONE ? r.methodNote() : r.methodNote() + "; active constraint: " + words(c);
    }

    /**
     * @param c an active constraint
     * @return its words
     */
    public static String words(ActiveConstraint c) {
        return switch (c) {
            case NONE -> "none";
            case STROKE_LIMIT -> "stroke limit (held during run-up too)";
            case FIXED_DAMPING -> "fixed damping";
            case FIXED_TUNING -> "fixed tuning";
            case TUNING_SEARCH_BOUND -> "tuning-ratio search bound";
            case PRACTICAL_DAMPING_FLOOR -> "damping held at the least a practical damper gives";
        };
    }
}
