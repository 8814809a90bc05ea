package org.counterpoise.io.project;

/**
 * Who prepared, checked and approved this issue of the sheet. A blank line is printed for a hand
 * signature.
 *
 * @param prepared who prepared it
 * @param checked who checked it
 * @param approved who approved it
 */
public record SignOff(Signature prepared, Signature checked, Signature approved) {

    /** Nobody has signed. */
    public static final SignOff BLANK = new SignOff(Signature.BLANK, Signature.BLANK, Signature.BLANK);

    /** Nulls become blank signatures. */
    public SignOff {
        prepared = prepared == null ? Signature.BLANK : prepared;
        checked = checked == null ? Signature.BLANK : checked;
        approved = approved == null ? Signature.BLANK : approved;
    }

    /** @return true when nobody has signed */
    public boolean isBlank() {
        return prepared.isBlank() && checked.isBlank() && approved.isBlank();
    }
}
