package org.counterpoise.ui.gui.wizard;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Supplier;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.ui.gui.document.DesignDocument;
import org.counterpoise.ui.gui.document.DocumentChange;
import org.counterpoise.ui.gui.document.Edit;
import org.counterpoise.ui.gui.field.QuantityField;

/**
 * One page of the wizard, a view of the document: {@link #sync} shows the project's values, and
 * the step's widgets write {@link Edit}s to the document. A widget whose text is not a number yet
 * writes nothing: the step keeps it and shows the problem under it.
 */
abstract class Step {
    /** Field-id prefixes this step owns, mapped to the field that shows their problems. */
    private final Map<String, QuantityField> owners = new LinkedHashMap<>();
    private String problem;
    private boolean syncing;
    private DesignDocument document;
    private Runnable uncommitted = () -> { };

    /** @return the title in the step list */
    abstract String title();

    /** @return the page */
    abstract JComponent component();

    /** Called when the step is shown. */
    void shown() {
    }

    /**
     * @param doc the document this step edits
     * @param onUncommitted told when typed text could not become an edit (not a number yet)
     */
    final void attach(DesignDocument doc, Runnable onUncommitted) {
        this.document = doc;
        this.uncommitted = onUncommitted;
    }

    /**
     * Shows the project's values. Only what differs from the screen is touched, so the field being
     * typed in keeps its text and caret.
     * @param p the project
     * @param kind what changed it; after an edit, a step holding text that is not a number yet is
     *     left alone
     */
    final void sync(Project p, DocumentChange.Kind kind) {
        if (kind == DocumentChange.Kind.SAVED
                || (kind == DocumentChange.Kind.EDITED && !fieldsValid())) {
            return; // an edit elsewhere never overwrites text typed here that is not a number yet
        }
        boolean loaded = kind == DocumentChange.Kind.LOADED;
        syncing = true;
        try {
            showProject(p, loaded);
        } finally {
            syncing = false;
        }
    }

    /**
     * @param p the project to show
     * @param loaded true when the project was just opened
     */
    abstract void showProject(Project p, boolean loaded);

    /**
     * Re-reads this step's widgets and marks those that are not numbers yet.
     * @return true when every widget holds a value
     */
    abstract boolean fieldsValid();

    /**
     * Writes an edit built from the widgets; nothing while the step is being synced. When a widget
     * is not a number yet the frame is told, so it shows the problem and no result.
     * @param build builds the edit (may throw InvalidInputException naming the field)
     */
    final void commit(Supplier<Edit> build) {
        if (syncing || document == null) {
            return;
        }
        Edit edit;
        try {
            edit = build.get();
        } catch (InvalidInputException e) {
            uncommitted.run();
            return;
        }
        Object before = document.project();
        document.apply(edit);
        if (document.project() == before) {
            // Nothing changed in the document (a value typed back as it was, a kind switched back):
            // the views may have held text that was not a number meanwhile, so the design is redone.
            uncommitted.run();
        }
    }

    /**
     * As {@link #commit}, for a pick from a list: one undo step of its own, never merged with the
     * next pick in the same list (as keystrokes in one field are).
     * @param build builds the edit
     */
    final void commitChoice(Supplier<Edit> build) {
        if (syncing || document == null) {
            return;
        }
        document.seal();
        commit(build);
        document.seal();
    }

    /** @return true while {@link #sync} runs */
    final boolean syncing() {
        return syncing;
    }

    /**
     * @param field a field
     * @param q the value to show, or null for an empty field
     */
    static void showValue(QuantityField field, QuantityInput q) {
        if (q == null) {
            if (!field.textField().getText().isBlank()) {
                field.clear();
            }
            return;
        }
        showValue(field, q.value(), q.unit());
    }

    /**
     * Shows a value unless the field already holds it (same number, same unit).
     * @param field a field
     * @param value the number
     * @param unit its unit, or null to keep the field's
     */
    static void showValue(QuantityField field, double value, Unit unit) {
        try {
            if (field.number() == value && (unit == null || unit == field.unit())) {
                return;
            }
        } catch (InvalidInputException e) {
            // not a number on screen: replace it
        }
        field.show(value, unit);
    }

    /**
     * @param combo a list
     * @param index the entry to select; nothing happens when it is already selected
     */
    static void select(JComboBox<?> combo, int index) {
        if (combo.getSelectedIndex() != index) {
            combo.setSelectedIndex(index);
        }
    }

    /**
     * @param <T> the item type
     * @param combo a list of values
     * @param item the value to select; nothing happens when it is already selected
     */
    static <T> void selectItem(JComboBox<T> combo, T item) {
        if (combo.getSelectedItem() != item) {
            combo.setSelectedItem(item);
        }
    }

    /**
     * @param field a field of this step
     * @return true when it holds a number; otherwise its problem is shown
     */
    final boolean check(QuantityField field) {
        try {
            field.number();
            return true;
        } catch (InvalidInputException e) {
            showProblem(e);
            return false;
        }
    }

    /**
     * @param prefix a field-id prefix, e.g. "structure.mass"
     * @param field the field showing problems of fields with that prefix
     */
    final void own(String prefix, QuantityField field) {
        owners.put(prefix, field);
    }

    /**
     * Shows a problem inline if one of this step's fields owns it.
     * @param e the problem
     * @return true when shown here
     */
    final boolean showProblem(InvalidInputException e) {
        QuantityField best = null;
        int bestLength = -1;
        for (var entry : owners.entrySet()) {
            if (e.field().startsWith(entry.getKey()) && entry.getKey().length() > bestLength) {
                best = entry.getValue();
                bestLength = entry.getKey().length();
            }
        }
        if (best == null) {
            return false;
        }
        best.setProblem(e.problem());
        problem = e.problem();
        return true;
    }

    /** @param message a problem shown elsewhere on the step (not under a number field) */
    final void markProblem(String message) {
        problem = message;
    }

    /** Clears every inline problem. */
    final void clearProblems() {
        owners.values().forEach(f -> f.setProblem(null));
        problem = null;
    }

    /** @return the problem shown on this step, or null */
    final String problem() {
        return problem;
    }
}
