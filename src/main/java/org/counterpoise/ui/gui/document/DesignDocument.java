package org.counterpoise.ui.gui.document;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.counterpoise.io.project.Project;

/**
 * The project being edited: one immutable {@link Project}, the file it belongs to, whether it has
 * changed since it was saved, and the undo history. Views write {@link Edit}s and redraw on
 * {@link DocumentListener} events; nothing else holds project state. Not thread-safe: the wizard
 * uses it on the event thread only (tests may use it from one thread, without Swing).
 */
public final class DesignDocument {
    private final List<DocumentListener> listeners = new ArrayList<>();
    private final UndoHistory history = new UndoHistory();
    private Project project;
    private Project saved;
    private Path file;
    private long generation;

    /** @param initial the first project (treated as saved: nothing to lose yet) */
    public DesignDocument(Project initial) {
        project = ProjectEdits.consistent(initial).project();
        saved = project;
    }

    /** @param l told after every change */
    public void addListener(DocumentListener l) {
        listeners.add(l);
    }

    /** @return the project now */
    public Project project() {
        return project;
    }

    /** @return the file the project was opened from or saved to, or null */
    public Path file() {
        return file;
    }

    /** @return true when the project differs from the one last loaded or saved */
    public boolean dirty() {
        return !project.equals(saved);
    }

    /** @return a number that grows with every change of the project (for the stale-result rule) */
    public long generation() {
        return generation;
    }

    /**
     * Starts over with a project (opened, a preset, or new); the history is cleared.
     * @param p the project
     * @param from its file, or null
     */
    public void load(Project p, Path from) {
        history.clear();
        project = ProjectEdits.consistent(p).project();
        saved = project;
        file = from;
        generation++;
        fire(DocumentChange.Kind.LOADED, null);
    }

    /**
     * Applies an edit; an edit that changes nothing is ignored.
     * @param edit the edit
     */
    public void apply(Edit edit) {
        ProjectEdits.Consistent next = ProjectEdits.consistent(edit.change().apply(project));
        if (next.project().equals(project)) {
            return;
        }
        history.record(project, next.project(), edit.key(), edit.label());
        project = next.project();
        generation++;
        fire(DocumentChange.Kind.EDITED, next.note());
    }

    /** Makes the next edit a separate undo step even if it is in the same field. */
    public void seal() {
        history.seal();
    }

    /** @return true when an edit was undone */
    public boolean undo() {
        Project before = history.undo();
        if (before == null) {
            return false;
        }
        project = before;
        generation++;
        fire(DocumentChange.Kind.UNDONE, null);
        return true;
    }

    /** @return true when an undone edit was made again */
    public boolean redo() {
        Project after = history.redo();
        if (after == null) {
            return false;
        }
        project = after;
        generation++;
        fire(DocumentChange.Kind.REDONE, null);
        return true;
    }

    /** @return what Undo would revert, or null when nothing */
    public String undoLabel() {
        return history.undoLabel();
    }

    /** @return what Redo would make again, or null when nothing */
    public String redoLabel() {
        return history.redoLabel();
    }

    /**
     * Records a completed save. Edits made while it was running keep the document dirty.
     * @param written the project that was written
     * @param to the file
     */
    public void saved(Project written, Path to) {
        saved = written;
        file = to;
        history.seal();
        fire(DocumentChange.Kind.SAVED, null);
    }

    private void fire(DocumentChange.Kind kind, String note) {
        DocumentChange change = new DocumentChange(kind, project, note);
        for (DocumentListener l : List.copyOf(listeners)) {
            l.documentChanged(change);
        }
    }
}
