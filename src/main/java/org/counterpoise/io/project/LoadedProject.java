package org.counterpoise.io.project;

import java.util.List;

/**
 * A project read from a file, and the fields in it that this version does not know (reported to
 * the user, never silently dropped).
 *
 * @param project the project
 * @param unknownFields JSON paths of fields that were not understood
 */
public record LoadedProject(Project project, List<String> unknownFields) {

    /** Defensive copy. */
    public LoadedProject {
        unknownFields = List.copyOf(unknownFields);
    }
}
