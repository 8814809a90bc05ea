package org.counterpoise.core.error;

/** The one unchecked exception family of the core. Its message is complete English text. */
public class CoreException extends RuntimeException {
    private final Messages key;

    /**
     * @param key the message key
     * @param arguments values for the key's pattern
     */
    public CoreException(Messages key, Object... arguments) {
        super(key.format(arguments));
        this.key = key;
    }

    /**
     * Wraps an unexpected failure as a bug, keeping the cause for the log.
     * @param description what went wrong
     * @param cause the original exception
     * @return an exception whose message says "bug"
     */
    public static CoreException bug(String description, Throwable cause) {
        CoreException e = new CoreException(Messages.BUG, description);
        e.initCause(cause);
        return e;
    }

    /** @return the message key */
    public Messages key() {
        return key;
    }
}
