package org.counterpoise.core.criteria;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The likely reactions to weighted r.m.s. acceleration in public transport, ISO 2631-1:1997
 * Annex C, C.2.3 (the ranges overlap in the standard). The end points (below 0.315, above 2 m/s^2)
 * and the overlap are as transcribed in reference/acceptance-criteria.md section 2.2 (from a public
 * library's documentation); the intermediate bounds (0.315-0.63, 0.5-1, 0.8-1.6, 1.25-2.5) are the
 * same in two further independent public implementations, but were not read in the standard: verify
 * them before using them as hard limits. The standard sets no comfort limit: which reaction is
 * acceptable depends on the trip and the activity, and the user chooses it. A value on a shared
 * bound belongs to the lower range (the rule of {@link Zone#contains}).
 */
public enum ComfortReaction {
    NOT_UNCOMFORTABLE("not-uncomfortable", 0.0, 0.315),
    A_LITTLE_UNCOMFORTABLE("a-little-uncomfortable", 0.315, 0.63),
    FAIRLY_UNCOMFORTABLE("fairly-uncomfortable", 0.5, 1.0),
    UNCOMFORTABLE("uncomfortable", 0.8, 1.6),
    VERY_UNCOMFORTABLE("very-uncomfortable", 1.25, 2.5),
    EXTREMELY_UNCOMFORTABLE("extremely-uncomfortable", 2.0, Double.POSITIVE_INFINITY);

    /** Source of the table. */
    public static final String SOURCE = "ISO 2631-1:1997 Annex C, C.2.3 (intermediate bounds as publicly"
            + " transcribed: verify before use as a hard limit)";

    private final String id;
    private final double lower;
    private final double upper;

    ComfortReaction(String id, double lower, double upper) {
        this.id = id;
        this.lower = lower;
        this.upper = upper;
    }

    /** @return the id in project files */
    public String id() {
        return id;
    }

    /** @return lower end of the range, m/s^2 r.m.s. weighted */
    public double lower() {
        return lower;
    }

    /** @return upper end of the range, m/s^2 r.m.s. weighted (+infinity for the last) */
    public double upper() {
        return upper;
    }

    /** @return the range as a zone */
    public Zone zone() {
        return new Zone(id, lower, upper);
    }

    /** @return every id, for messages */
    public static List<String> ids() {
        return Arrays.stream(values()).map(ComfortReaction::id).toList();
    }

    /**
     * @param id an id
     * @return the reaction, if the id names one
     */
    public static Optional<ComfortReaction> byId(String id) {
        return Arrays.stream(values()).filter(r -> r.id.equals(id)).findFirst();
    }
}
