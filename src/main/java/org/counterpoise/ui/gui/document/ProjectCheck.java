package org.counterpoise.ui.gui.document;

import java.io.StringReader;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.error.NotFoundException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.ProjectWriter;

/**
 * The rule for saving: what the wizard writes must reopen, equal, in the wizard and in every
 * command. The file text is read back through the same reader the commands use, and the project
 * is designed, before anything touches the disk. A few milliseconds: run it off the event thread.
 */
public final class ProjectCheck {
    private ProjectCheck() {
    }

    /**
     * @param p the project to save
     * @return the file text, known to reopen equal and to design
     * @throws InvalidInputException naming the field when the project would be refused
     */
    public static String reopenable(Project p) {
        String json = ProjectWriter.toJson(p);
        Project back = ProjectReader.read(new StringReader(json)).project();
        if (!back.equals(p)) {
            throw new InvalidInputException("(project)", "not saved",
                    "the file would not reopen with the values shown; please report this case");
        }
        back.toRobustness();
        try {
            Designer.design(back.toStudy());
        } catch (NotFoundException e) {
            // The inputs are valid; only the optimiser found no certified optimum for them. The
            // project is the user's work and is saved; the design step says what was not found.
        }
        return json;
    }
}
