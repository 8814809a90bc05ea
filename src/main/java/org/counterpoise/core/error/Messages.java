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
    /** {0} field, {2} allowed. */
    MISSING_VALUE("{0}: missing; {1}"),
    /** {0} field, {1} the other field. */
    CONFLICTING_FIELDS("{0}: give either {0} or {1}, not both"),
    /** {0} unit symbol, {1} field, {2} allowed units. */
    UNKNOWN_UNIT("{1}: unit \"{0}\" is not known here; allowed units: {2}"),
    /** {0} description of the internal failure. */
    BUG("bug in Counterpoise (please report it): {0}"),
    /** {0} method, {1} reason. */
    METHOD_NOT_APPLICABLE("method {0} cannot be used here: {1}");

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
}
