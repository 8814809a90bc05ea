package org.counterpoise.io.project;

/**
 * One entry of the revision history printed on the sheet.
 *
 * @param mark revision mark, e.g. "A"
 * @param date YYYY-MM-DD, or empty
 * @param description what changed
 * @param by who made the change
 */
public record Revision(String mark, String date, String description, String by) {

    /** Nulls become empty strings; the date must be a calendar date when given. */
    public Revision {
        mark = mark == null ? "" : mark.strip();
        date = date == null ? "" : date.strip();
        description = description == null ? "" : description.strip();
        by = by == null ? "" : by.strip();
        ProjectIdentity.checkDate("identity.revisions date", date);
    }
}
