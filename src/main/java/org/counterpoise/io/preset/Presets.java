package org.counterpoise.io.preset;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.ProjectReader;

/**
 * The invented demo scenarios shipped inside the jar (the presets/ folder, listed in its
 * index.txt). The first one is the default project.
 */
public final class Presets {
    private static final String FOLDER = "/presets/";

    private Presets() {
    }

    /** @return the file names of the shipped presets, in index order */
    public static List<String> names() {
        try (InputStream in = Presets.class.getResourceAsStream(FOLDER + "index.txt")) {
            if (in == null) {
                throw CoreException.bug("the preset index is missing from the build", null);
            }
            List<String> out = new ArrayList<>();
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\\R")) {
                if (!line.isBlank()) {
                    out.add(line.strip());
                }
            }
            return out;
        } catch (IOException e) {
            throw CoreException.bug("the preset index cannot be read", e);
        }
    }

    /**
     * @param name a file name from {@link #names()}
     * @return the preset project
     */
    public static LoadedProject load(String name) {
        try (InputStream in = Presets.class.getResourceAsStream(FOLDER + name)) {
            if (in == null) {
                throw CoreException.bug("preset " + name + " is missing from the build", null);
            }
            return ProjectReader.read(new InputStreamReader(in, StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw CoreException.bug("preset " + name + " cannot be read", e);
        }
    }

    /** @return the default project (the first preset) */
    public static LoadedProject defaultProject() {
        return load(names().get(0));
    }
}
