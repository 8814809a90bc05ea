package org.counterpoise.core.criteria;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/** The families of acceptance criteria; the id is the project file's {@code acceptance.criterion}. */
public enum CriterionKind {
    /** A limit the user states: quantity, convention, value or curve. */
    USER_LIMIT("user-limit"),
    /** ISO 2631-1:1997 weighted r.m.s. acceleration against the comfort reactions of its Annex C. */
    HUMAN_COMFORT("human-comfort"),
    /** Base curve times multiplying factor for people in buildings (ISO 10137:2007 Annex C). */
    BUILDING("building"),
    /** Evaluation zones A to D of machine vibration severity (ISO 20816-3, formerly ISO 10816-3). */
    MACHINE("machine"),
    /** Generic vibration criterion curves VC-A to VC-G for sensitive equipment. */
    EQUIPMENT("equipment");

    private final String id;

    CriterionKind(String id) {
        this.id = id;
    }

    /** @return the id in project files */
    public String id() {
        return id;
    }

    /** @return every id, for messages */
    public static List<String> ids() {
        return Arrays.stream(values()).map(CriterionKind::id).toList();
    }

    /**
     * @param id an id
     * @return the kind, if the id names one
     */
    public static Optional<CriterionKind> byId(String id) {
        return Arrays.stream(values()).filter(k -> k.id.equals(id)).findFirst();
    }
}
