package org.counterpoise.io.project;

import java.time.LocalDate;
import java.util.List;
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
 * @param documentNumber the document or drawing number of the sheet, or empty (since format 4)
 * @param history earlier revisions, oldest first (since format 4; never null)
 * @param signOff prepared, checked and approved (since format 4; never null)
 */
public record ProjectIdentity(String revision, String engineer, String client, String date, String documentNumber,
        List<Revision> history, SignOff signOff) {

    /** No identity given. */
    public static final ProjectIdentity EMPTY = new ProjectIdentity("", "", "", "");

    /**
     * An identity without document number, history or sign-off (as format 3 had).
     * @param revision revision mark
     * @param engineer who designed it
     * @param client client or site
     * @param date date of issue, YYYY-MM-DD or empty
     */
    public ProjectIdentity(String revision, String engineer, String client, String date) {
        this(revision, engineer, client, date, "", List.of(), SignOff.BLANK);
    }

    /** Nulls become empty strings; the date must be a calendar date when given. */
    public ProjectIdentity {
        revision = revision == null ? "" : revision;
        engineer = engineer == null ? "" : engineer;
        client = client == null ? "" : client;
        date = date == null ? "" : date.strip();
        checkDate("date", date);
        documentNumber = documentNumber == null ? "" : documentNumber.strip();
        history = history == null ? List.of() : List.copyOf(history);
        signOff = signOff == null ? SignOff.BLANK : signOff;
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
