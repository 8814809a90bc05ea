package org.counterpoise.ui.gui.document;

/** Told after every change of the document, on the thread that made it (the event thread in the wizard). */
@FunctionalInterface
public interface DocumentListener {
    /** @param change what changed */
    void documentChanged(DocumentChange change);
}
