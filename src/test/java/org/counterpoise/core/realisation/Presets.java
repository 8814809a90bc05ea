package org.counterpoise.core.realisation;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.io.project.ProjectReader;

/** The shipped presets (invented demo scenarios) and their designs, each designed once per test run. */
final class Presets {
    private static final Map<Path, DesignResult> DESIGNS = new ConcurrentHashMap<>();

    private Presets() {
    }

    static List<Path> files() {
        try {
            return Files.readAllLines(Path.of("presets", "index.txt")).stream().map(String::strip)
                    .filter(l -> !l.isEmpty() && !l.startsWith("#")).map(l -> Path.of("presets", l)).toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static DesignResult design(Path file) {
        return DESIGNS.computeIfAbsent(file, f -> Designer.design(ProjectReader.readStudy(f)));
    }

    static DesignResult fan() {
        return design(Path.of("presets", "rooftop-fan-platform.json"));
    }
}
