package org.counterpoise.ui.gui.document;

import java.util.function.UnaryOperator;
import org.counterpoise.io.project.Project;

/**
 * One change to the project, as a view asks for it. Consecutive edits with the same key (typing
 * in one field) are undone together.
 *
 * @param key what was edited, usually the project-file field id ("structure.mass")
 * @param label words for the Undo menu, e.g. "structure"
 * @param change the new project from the old one
 */
public record Edit(String key, String label, UnaryOperator<Project> change) {
}
