package org.counterpoise.ui.gui.wizard;

import java.util.LinkedHashMap;
import java.util.Map;
import javax.swing.JComponent;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.ui.gui.field.QuantityField;

/** One page of the wizard: its title, its component, and the fields whose problems it shows. */
abstract class Step {
    /** Field-id prefixes this step owns, mapped to the field that shows their problems. */
    private final Map<String, QuantityField> owners = new LinkedHashMap<>();
    private String problem;

    /** @return the title in the step list */
    abstract String title();

    /** @return the page */
    abstract JComponent component();

    /** Called when the step is shown. */
    void shown() {
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
        best.setProblem(e.getMessage().substring(e.getMessage().indexOf(':') + 1).strip());
        problem = e.getMessage();
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
