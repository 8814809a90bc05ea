package org.counterpoise.io.project;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.ArrayList;
import java.util.List;

/**
 * The project's identity at the top level of a project file, read and written here: the one list of
 * its keys. Revision, engineer, client and date since format 1; the document number, the revision
 * history ({@code revisions}, oldest first) and the sign-off (prepared, checked, approved) since
 * format 4. Every key is optional; a date is YYYY-MM-DD. See docs/project-file.md.
 */
final class IdentityJson {
    static final String REVISION = "revision";
    static final String ENGINEER = "engineer";
    static final String CLIENT = "client";
    static final String DATE = "date";
    static final String DOCUMENT_NUMBER = "document_number";
    static final String REVISIONS = "revisions";
    static final String MARK = "mark";
    static final String DESCRIPTION = "description";
    static final String BY = "by";
    static final String SIGN_OFF = "sign_off";
    static final String PREPARED = "prepared";
    static final String CHECKED = "checked";
    static final String APPROVED = "approved";
    static final String NAME = "name";

    private IdentityJson() {
    }

    /**
     * @param top the file's top-level object
     * @return the identity (empty entries where keys are absent)
     */
    static ProjectIdentity read(JsonFields top) {
        String date = top.text(DATE, "");
        ProjectIdentity.checkDate(top.pathOf(DATE), date.strip());
        List<Revision> history = new ArrayList<>();
        for (JsonFields r : top.objectList(REVISIONS)) {
            history.add(new Revision(r.text(MARK, ""), date(r), r.text(DESCRIPTION, ""), r.text(BY, "")));
            r.finish();
        }
        SignOff signOff = SignOff.BLANK;
        JsonFields s = top.optionalObject(SIGN_OFF);
        if (s != null) {
            signOff = new SignOff(signature(s.optionalObject(PREPARED)), signature(s.optionalObject(CHECKED)),
                    signature(s.optionalObject(APPROVED)));
            s.finish();
        }
        return new ProjectIdentity(top.text(REVISION, ""), top.text(ENGINEER, ""), top.text(CLIENT, ""), date,
                top.text(DOCUMENT_NUMBER, ""), history, signOff);
    }

    private static Signature signature(JsonFields s) {
        if (s == null) {
            return Signature.BLANK;
        }
        Signature out = new Signature(s.text(NAME, ""), date(s));
        s.finish();
        return out;
    }

    /** A date checked under its own path, so that the message names which revision or signature. */
    private static String date(JsonFields o) {
        String date = o.text(DATE, "").strip();
        ProjectIdentity.checkDate(o.pathOf(DATE), date);
        return date;
    }

    /**
     * @param root the file's top-level object
     * @param id the identity: only what is given is written
     */
    static void write(JsonObject root, ProjectIdentity id) {
        putText(root, REVISION, id.revision());
        putText(root, ENGINEER, id.engineer());
        putText(root, CLIENT, id.client());
        putText(root, DATE, id.date());
        putText(root, DOCUMENT_NUMBER, id.documentNumber());
        if (!id.history().isEmpty()) {
            JsonArray revisions = new JsonArray();
            for (Revision r : id.history()) {
                JsonObject o = new JsonObject();
                putText(o, MARK, r.mark());
                putText(o, DATE, r.date());
                putText(o, DESCRIPTION, r.description());
                putText(o, BY, r.by());
                revisions.add(o);
            }
            root.add(REVISIONS, revisions);
        }
        if (!id.signOff().isBlank()) {
            JsonObject s = new JsonObject();
            signature(s, PREPARED, id.signOff().prepared());
            signature(s, CHECKED, id.signOff().checked());
            signature(s, APPROVED, id.signOff().approved());
            root.add(SIGN_OFF, s);
        }
    }

    private static void signature(JsonObject parent, String key, Signature s) {
        if (!s.isBlank()) {
            JsonObject o = new JsonObject();
            putText(o, NAME, s.name());
            putText(o, DATE, s.date());
            parent.add(key, o);
        }
    }

    private static void putText(JsonObject o, String key, String text) {
        if (!text.isEmpty()) {
            o.addProperty(key, text);
        }
    }
}
