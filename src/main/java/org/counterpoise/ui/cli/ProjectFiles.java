package org.counterpoise.ui.cli;

import java.nio.file.Path;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.project.FormatMigration;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.SeveralAbsorbersContent;
import picocli.CommandLine.Model.CommandSpec;

/** Reading a project file for a command: fields the format does not know are noted on standard error. */
final class ProjectFiles {
    private ProjectFiles() {
    }

    static LoadedProject read(CommandSpec spec, Path file) {
        LoadedProject loaded = ProjectReader.read(file);
        for (String unknown : loaded.unknownFields()) {
            spec.commandLine().getErr().println("note: " + PlainText.escape(file.toString()) + ": field "
                    + PlainText.quote(unknown) + " is not part of the project format and was not used");
        }
        return loaded;
    }

    /**
     * Reads a project for a command that takes one absorber on one mode (robustness, sheet, run-up):
     * a project with several modes or absorbers is worked on as one absorber of the total mass on the
     * target mode, and a note on standard error says so instead of leaving them out silently.
     * @param spec the command
     * @param file the project file
     * @return the project
     */
    static LoadedProject readForOneAbsorber(CommandSpec spec, Path file) {
        LoadedProject loaded = read(spec, file);
        if (!FormatMigration.isOneModeOneAbsorber(loaded.project())) {
            SeveralModes.layout(loaded.project());
            spec.commandLine().getErr().println("note: " + PlainText.escape(file.toString()) + ": "
                    + SeveralAbsorbersContent.ONE_ABSORBER_ONLY);
        }
        return loaded;
    }
}
