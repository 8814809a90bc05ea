package org.counterpoise;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** The layering rules of DEVELOPERS.md, checked on the import lines of src/main/java. */
class ArchitectureTest {
    private static final Path ROOT = Path.of("src/main/java/org/counterpoise");

    private static List<String> violations(String layer, String... forbidden) throws IOException {
        List<String> out = new ArrayList<>();
        try (Stream<Path> files = Files.walk(ROOT.resolve(layer))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                for (String line : Files.readAllLines(f)) {
                    String t = line.strip();
                    if (!t.startsWith("import ")) {
                        continue;
                    }
                    for (String bad : forbidden) {
                        if (t.startsWith("import " + bad) || t.startsWith("import static " + bad)) {
                            out.add(f + ": " + t);
                        }
                    }
                }
            }
        }
        return out;
    }

    @Test
    void coreImportsNoUserInterfaceFileOrDocumentCode() throws IOException {
        assertEquals(List.of(), violations("core", "java.awt", "javax.swing", "java.util.prefs", "com.google.gson",
                "org.knowm", "org.apache.pdfbox", "picocli", "org.counterpoise.io", "org.counterpoise.ui",
                "java.io.File", "java.nio.file"));
    }

    @Test
    void ioImportsNoSwingAndNoUserInterface() throws IOException {
        assertEquals(List.of(), violations("io", "javax.swing", "org.knowm.xchart.XChartPanel", "org.counterpoise.ui"));
    }

    @Test
    void nothingOutsideTheUserInterfaceImportsIt() throws IOException {
        assertEquals(List.of(), violations("core", "org.counterpoise.ui"));
        assertEquals(List.of(), violations("io", "org.counterpoise.ui"));
    }

    @Test
    void commandLineImportsNoSwing() throws IOException {
        assertEquals(List.of(), violations("ui/cli", "javax.swing", "org.counterpoise.ui.gui"));
    }
}
