package org.counterpoise.core.error;

/**
 * A computation on valid input that could not deliver a result it can stand behind: an optimum
 * that failed its certificate, or a search that reached its iteration limit. Not the user's
 * error (so not an {@link InvalidInputException}), and not a bug; the message says what was
 * sought, why it is not given, and what the user can do.
 */
public final class NotFoundException extends CoreException {
    /**
     * @param sought what was sought, e.g. "certified exact-peak optimum"
     * @param reason why it is not given, in plain words
     * @param advice what the user can do
     */
    public NotFoundException(String sought, String reason, String advice) {
        super(Messages.NOT_FOUND, sought, reason, advice);
    }
}
