package org.counterpoise.core.error;

/** Input that cannot be used: names the field, the value given and what is allowed. */
public final class InvalidInputException extends CoreException {
    private final String field;
    private final String value;
    private final String allowed;

    /**
     * @param field the field id, e.g. {@code structure.mass}
     * @param value the value given, as text
     * @param allowed what is allowed, in words
     */
    public InvalidInputException(String field, String value, String allowed) {
        super(Messages.INVALID_VALUE, field, value, allowed);
        this.field = field;
        this.value = value;
        this.allowed = allowed;
    }

    /**
     * For a field that must be given and is not.
     * @param field the field id
     * @param allowed what is expected there
     * @return the exception
     */
    public static InvalidInputException missing(String field, String allowed) {
        return new InvalidInputException(Messages.MISSING_VALUE, field, "", allowed);
    }

    /**
     * For a file or field that cannot be used as a whole (a folder, not UTF-8, not valid JSON...).
     * @param field the file or field the user knows
     * @param problem what is wrong, in plain words
     * @param allowed what is allowed, or what to do
     * @return the exception
     */
    public static InvalidInputException unusable(String field, String problem, String allowed) {
        return new InvalidInputException(Messages.UNUSABLE, field, problem, allowed);
    }

    private InvalidInputException(Messages key, String field, String value, String allowed) {
        super(key, key == Messages.UNUSABLE ? new Object[] {field, value, allowed} : new Object[] {field, allowed});
        this.field = field;
        this.value = value;
        this.allowed = allowed;
    }

    /** @return the field id */
    public String field() {
        return field;
    }

    /** @return the offending value as text (empty when missing) */
    public String value() {
        return value;
    }

    /** @return what is wrong and what is allowed, without the field (to show beside the field itself) */
    public String problem() {
        return key() == Messages.MISSING_VALUE ? key().formatWithoutField(field, allowed)
                : key().formatWithoutField(field, value, allowed);
    }

    /** @return what is allowed */
    public String allowed() {
        return allowed;
    }

    /**
     * The same problem reported under a different field name (for example the CLI option or the
     * JSON path the value came from).
     * @param newField the field name the user knows
     * @return a copy naming that field
     */
    public InvalidInputException renamed(String newField) {
        if (value.isEmpty() && key() == Messages.MISSING_VALUE) {
            return missing(newField, allowed);
        }
        if (key() == Messages.UNUSABLE) {
            return unusable(newField, value, allowed);
        }
        return new InvalidInputException(newField, value, allowed);
    }
}
