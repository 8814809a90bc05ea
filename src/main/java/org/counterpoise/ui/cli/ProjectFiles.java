package org.counterpoise.ui.cli;

import java.nio.file.Path;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.ProjectReader;
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
}
