package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.counterpoise.core.design.RobustnessSettings;
import org.counterpoise.core.error.InvalidInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Users' files written before the vocabulary was settled (docs/glossary.md) name the expected
 * mistuning {@code robustness.structure_detuning} and {@code absorber_detuning}. They must still
 * read to the same settings, and are written back under the new names.
 */
class OlderKeyNamesTest {
    private static final Path KEPT_V1_FILE = Path.of("src/test/resources/golden/v1-project-written.json");

    @Test
    void aKeptVersionOneFileWithTheOlderNamesReadsToTheSameSettings() throws IOException {
        String text = Files.readString(KEPT_V1_FILE);
        assertTrue(text.contains("\"structure_detuning\": 8.0"), "the kept file holds the older key");
        assertTrue(text.contains("\"absorber_detuning\": 3.0"), "the kept file holds the older key");

        LoadedProject loaded = ProjectReader.read(KEPT_V1_FILE);
        assertEquals(0, loaded.unknownFields().size(), loaded.unknownFields().toString());
        RobustnessInput r = loaded.project().robustness();
        assertEquals(8.0, r.ranges().structurePercent().getAsDouble());
        assertEquals(3.0, r.ranges().absorberPercent().getAsDouble());
        RobustnessSettings settings = loaded.project().toRobustness();
        assertEquals(0.08, settings.structureRange(), 1e-15);
        assertEquals(0.03, settings.absorberRange(), 1e-15);
    }

    @Test
    void aMigratedFileIsWrittenBackUnderTheNewNamesAndReadsEqual(@TempDir Path dir) throws IOException {
        Project old = ProjectReader.read(KEPT_V1_FILE).project();
        Path saved = dir.resolve("saved.json");
        ProjectWriter.save(old, saved);
        String text = Files.readString(saved);
        assertTrue(text.contains("\"structure_mistuning\": 8.0"), text);
        assertTrue(text.contains("\"absorber_mistuning\": 3.0"), text);
        assertFalse(text.contains("_detuning"), text);
        assertEquals(old, ProjectReader.read(saved).project());
    }

    @Test
    void aFileGivingBothNamesIsRefusedNamingBoth(@TempDir Path dir) throws IOException {
        String text = Files.readString(KEPT_V1_FILE).replace("\"structure_detuning\": 8.0",
                "\"structure_detuning\": 8.0, \"structure_mistuning\": 9.0");
        Path both = dir.resolve("both.json");
        Files.writeString(both, text);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> ProjectReader.read(both));
        assertEquals("robustness.structure_detuning", e.field());
        assertTrue(e.allowed().contains("robustness.structure_mistuning"), e.allowed());
    }
}
