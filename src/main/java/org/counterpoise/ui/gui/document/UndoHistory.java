package org.counterpoise.ui.gui.document;

import java.util.ArrayDeque;
import java.util.Deque;
import org.counterpoise.io.project.Project;

/**
 * Snapshot undo over immutable projects: each entry is the project before an edit. Consecutive
 * edits with the same key (keystrokes in one field) share one entry until something else happens.
 */
final class UndoHistory {
    /** Enough for a working session; the oldest entries go first. */
    private static final int LIMIT = 500;

    private record Entry(Project before, Project after, String key, String label) {
    }

    private final Deque<Entry> undo = new ArrayDeque<>();
    private final Deque<Entry> redo = new ArrayDeque<>();
    private boolean open;

    /**
     * @param before the project before the edit
     * @param after the project after it
     * @param key the edit's key
     * @param label words for the menu
     */
    void record(Project before, Project after, String key, String label) {
        redo.clear();
        Entry top = undo.peek();
        if (open && top != null && top.key().equals(key)) {
            undo.pop();
            if (top.before().equals(after)) {
                open = false; // typed back to where it started: nothing to undo
                return;
            }
            undo.push(new Entry(top.before(), after, key, label));
            return;
        }
        undo.push(new Entry(before, after, key, label));
        open = true;
        while (undo.size() > LIMIT) {
            undo.removeLast();
        }
    }

    /** Ends the current run of same-key edits: the next edit starts a new entry. */
    void seal() {
        open = false;
    }

    /** Forgets everything (a new project). */
    void clear() {
        undo.clear();
        redo.clear();
        open = false;
    }

    /**
     * @return the project before the last edit, or null when there is nothing to undo
     */
    Project undo() {
        open = false;
        Entry e = undo.poll();
        if (e == null) {
            return null;
        }
        redo.push(e);
        return e.before();
    }

    /** @return the project after the last undone edit, or null */
    Project redo() {
        open = false;
        Entry e = redo.poll();
        if (e == null) {
            return null;
        }
        undo.push(e);
        return e.after();
    }

    /** @return the label of the edit Undo would revert, or null */
    String undoLabel() {
        return undo.isEmpty() ? null : undo.peek().label();
    }

    /** @return the label of the edit Redo would make again, or null */
    String redoLabel() {
        return redo.isEmpty() ? null : redo.peek().label();
    }
}
