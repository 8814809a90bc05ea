package org.counterpoise.io.project;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Who the project is for and which issue of it this is: printed on the report and the sheet.
 * Every entry is optional; an absent one is the empty string (never null).
 *
 * @param revision revision mark, e.g. "B"
 * @param engineer who designed it
 * @param client client or site the absorber is for
 * @param date date of issue as YYYY-MM-DD, or empty
 */
public record ProjectIdentity(String revision, String engineer, String client, String date) {

    /** No identity given. */
    public static final ProjectIdentity EMPTY = new ProjectIdentity("", "", "", "");

    /** Nulls become empty strings; the date must be a calendar date when given. */
    public ProjectIdentity {
        revision = revision == null ? "" : revision;
        engineer = engineer == null ? "" : engineer;
        client = client == null ? "" : client;
        date = date == null ? "" : date.strip();
        checkDate("date", date);
    }

    /**
     * @param field the field the date came from, for the message
     * @param date a date as typed
     * @throws InvalidInputException when it is not empty and not a calendar date YYYY-MM-DD
     */
    public static void checkDate(String field, String date) {
        if (date.isEmpty()) {
            return;
        }
        try {
            LocalDate.parse(date);
        } catch (DateTimeParseException e) {
            throw new InvalidInputException(field, "\"" + date + "\"", "a date written YYYY-MM-DD, such as 2026-03-31,"
                    + " or nothing");
        }
    }

    /** @return true when nothing is given */
    public boolean isEmpty() {
        return equals(EMPTY);
    }
}
