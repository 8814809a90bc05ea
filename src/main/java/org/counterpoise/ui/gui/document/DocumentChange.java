package org.counterpoise.ui.gui.document;

import org.counterpoise.io.project.Project;

/**
 * What happened to the document.
 *
 * @param kind the kind of change
 * @param project the project now
 * @param note a side effect the user must see (e.g. a target cleared because its quantity
 *     changed), or null
 */
public record DocumentChange(Kind kind, Project project, String note) {

    /** Kinds of change. */
    public enum Kind {
        /** a project was loaded or started (history cleared) */
        LOADED,
        /** an edit from a view */
        EDITED,
        /** an edit undone */
        UNDONE,
        /** an undone edit made again */
        REDONE,
        /** the project was written to a file */
        SAVED
    }
}
