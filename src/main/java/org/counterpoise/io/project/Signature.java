package org.counterpoise.io.project;

/**
 * One line of a sign-off: who and when (both optional; an absent one is the empty string).
 *
 * @param name the person
 * @param date YYYY-MM-DD, or empty
 */
public record Signature(String name, String date) {

    /** Nobody has signed. */
    public static final Signature BLANK = new Signature("", "");

    /** Nulls become empty strings; the date must be a calendar date when given. */
    public Signature {
        name = name == null ? "" : name.strip();
        date = date == null ? "" : date.strip();
        ProjectIdentity.checkDate("identity.sign_off date", date);
    }

    /** @return true when neither name nor date is given */
    public boolean isBlank() {
        return name.isEmpty() && date.isEmpty();
    }
}
