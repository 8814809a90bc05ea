package org.counterpoise.core.error;

import java.text.MessageFormat;
import java.util.Locale;

/**
 * Every message the core can raise, with its English pattern. Slots {0}, {1}... are filled with
 * the offending values, so a message always says which field, what was given and what is allowed.
 */
public enum Messages {
    /** {0} field, {1} value, {2} allowed. */
    INVALID_VALUE("{0}: {1} is not allowed; {2}"),
    /** {0} field, {1} allowed. */
    MISSING_VALUE("{0}: missing; {1}"),
    /** {0} what was sought, {1} why it is not given, {2} what the user can do. */
    NOT_FOUND("no {0} was found: {1}; {2}"),
    /** {0} file or field, {1} what is wrong with it, {2} what is allowed or what to do. */
    UNUSABLE("{0}: {1}; {2}"),
    /** {0} what was stopped. */
    CANCELLED("{0} was cancelled"),
    /** {0} description of the internal failure. */
    BUG("bug in Counterpoise (please report it): {0}");

    private final String pattern;

    Messages(String pattern) {
        this.pattern = pattern;
    }

    /** @return the English pattern with {n} slots */
    public String pattern() {
        return pattern;
    }

    /**
     * Fills the pattern.
     * @param arguments values for the slots, in order
     * @return the English message
     */
    public String format(Object... arguments) {
        return new MessageFormat(pattern.replace("'", "''"), Locale.ROOT).format(arguments);
    }

    /**
     * Fills the pattern without its leading field slot ("{0}: "), for a message shown beside the
     * field it concerns; a pattern without that slot is filled whole.
     * @param arguments values for the slots, in order ({0} is not used)
     * @return the English message without the field
     */
    public String formatWithoutField(Object... arguments) {
        String field = "{0}: ";
        if (!pattern.startsWith(field)) {
            return format(arguments);
        }
        return new MessageFormat(pattern.substring(field.length()).replace("'", "''"), Locale.ROOT).format(arguments);
    }
}
