package org.counterpoise.ui.gui.action;

import java.awt.event.KeyEvent;
import javax.swing.Action;
import javax.swing.JRootPane;
import org.counterpoise.ui.gui.document.DesignDocument;

/** Undo and Redo of every edit, enabled and labelled from the document's history. */
public final class EditActions {
    private final DesignDocument document;
    private final Action undo;
    private final Action redo;

    /** @param document the document whose edits are undone */
    public EditActions(DesignDocument document) {
        this.document = document;
        undo = Actions.of("Undo", KeyEvent.VK_U, Shortcuts.menuKey(KeyEvent.VK_Z, false), e -> document.undo());
        redo = Actions.of("Redo", KeyEvent.VK_R, Shortcuts.menuKey(KeyEvent.VK_Y, false), e -> document.redo());
        document.addListener(change -> refresh());
        refresh();
    }

    /** @return Undo (Ctrl+Z) */
    public Action undo() {
        return undo;
    }

    /** @return Redo (Ctrl+Y, and Ctrl+Shift+Z) */
    public Action redo() {
        return redo;
    }

    /** @param root a window's root pane: Ctrl+Z, Ctrl+Y and Ctrl+Shift+Z work wherever the focus is */
    public void bind(JRootPane root) {
        Shortcuts.bind(root, undo);
        Shortcuts.bind(root, redo, Shortcuts.menuKey(KeyEvent.VK_Z, true));
    }

    private void refresh() {
        String u = document.undoLabel();
        String r = document.redoLabel();
        undo.setEnabled(u != null);
        redo.setEnabled(r != null);
        undo.putValue(Action.NAME, u == null ? "Undo" : "Undo " + u);
        redo.putValue(Action.NAME, r == null ? "Redo" : "Redo " + r);
    }
}
