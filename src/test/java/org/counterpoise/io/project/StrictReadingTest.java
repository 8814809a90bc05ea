package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.PhysicalRange;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainText;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The reader's strictness (RFC 8259 JSON: one value; the project format: each key once), its
 * size cap and encoding checks, and the plausibility table, each message checked word for word.
 */
class StrictReadingTest {
    private static final Path PUMP = Path.of("presets/pump-skid-mezzanine.json");

    private static String message(Path dir, String text) throws Exception {
        Path file = dir.resolve("p.json");
        Files.writeString(file, text);
        return assertThrows(InvalidInputException.class, () -> ProjectReader.read(file)).getMessage()
                .replace(file.toString(), "FILE");
    }

    @Test
    void duplicateKeysAreRefusedAtAnyDepthNamingThePath(@TempDir Path dir) throws Exception {
        String pump = Files.readString(PUMP);
        assertEquals("structure.weight: given twice in the same object (at line 6, column 51); give each field once",
                message(dir, pump.replace("\"weight\": {\"value\": 34, \"unit\": \"kN\"},",
                        "\"weight\": {\"value\": 34, \"unit\": \"kN\"}, \"weight\": {\"value\": 3, \"unit\": \"kN\"},")));
        assertTrue(message(dir, pump.replace("{\"value\": 600,", "{\"value\": 600, \"value\": 6,"))
                .startsWith("disturbance.amplitude.value: given twice"));
    }

    @Test
    void trailingTextNestingAndVersionsAreRefused(@TempDir Path dir) throws Exception {
        String pump = Files.readString(PUMP);
        assertTrue(message(dir, pump + "]").startsWith("FILE: has more text after the end of the JSON object, at line"));
        assertTrue(message(dir, "[".repeat(1_000_000)).startsWith("FILE: nests objects or lists more than 32 levels"),
                "no stack overflow on a megabyte of brackets");
        assertEquals("format_version: 1.5 is not allowed; a whole number; this version of Counterpoise reads"
                + " format_version 1 to " + Project.FORMAT_VERSION, message(dir, pump.replaceFirst("\"format_version\": \\d", "\"format_version\": 1.5")));
        assertTrue(message(dir, pump.replaceFirst("\"format_version\": \\d,", "")).startsWith("format_version: missing"));
        assertEquals("FILE: is empty; a project file is one JSON object { ... } as docs/project-file.md shows",
                message(dir, "\n"));
    }

    @Test
    void encodingsOtherThanUtf8AreRefusedWithWhereAndAUtf8MarkIsAccepted(@TempDir Path dir) throws Exception {
        byte[] pump = Files.readAllBytes(PUMP);
        Path file = dir.resolve("bom.json");
        byte[] bom = new byte[pump.length + 3];
        bom[0] = (byte) 0xef;
        bom[1] = (byte) 0xbb;
        bom[2] = (byte) 0xbf;
        System.arraycopy(pump, 0, bom, 3, pump.length);
        Files.write(file, bom);
        assertEquals(ProjectReader.read(PUMP).project(), ProjectReader.read(file).project());
        Files.write(file, Files.readString(PUMP).replace("Pump skid", "Pumpe f\u00fcr").getBytes(StandardCharsets.ISO_8859_1));
        String m = assertThrows(InvalidInputException.class, () -> ProjectReader.read(file)).getMessage();
        assertEquals(file + ": is not UTF-8 text (byte 0xFC at line 3, column 19); save the project file (.json) as"
                + " UTF-8 (editors offer this under Save As or Encoding)", m);
        Files.write(file, Files.readString(PUMP).getBytes(StandardCharsets.UTF_16));
        assertTrue(assertThrows(InvalidInputException.class, () -> ProjectReader.read(file)).getMessage()
                .endsWith("is UTF-16 text, not UTF-8 text; save the project file (.json) as UTF-8"));
    }

    @Test
    void theSizeCapIsCheckedBeforeReading(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("big.json");
        Files.writeString(file, Files.readString(PUMP) + " ".repeat((int) ProjectReader.MAX_BYTES));
        assertEquals(file + ": is larger than 1 MiB, too large for a project file (.json); the limit is 1 MiB",
                assertThrows(InvalidInputException.class, () -> ProjectReader.read(file)).getMessage());
        Files.writeString(file, Files.readString(PUMP) + " ".repeat((int) ProjectReader.MAX_BYTES - 2000));
        assertEquals(ProjectReader.read(PUMP).project(), ProjectReader.read(file).project(), "just under the cap reads");
    }

    @Test
    void physicalRangesShowTheBoundsInTheUsersUnit() {
        assertEquals(2.0, PhysicalRange.MASS.check("m", 2.0, Unit.TONNE), 0);
        assertEquals(0.0, PhysicalRange.MASS.check("m", 0.0, Unit.KILOGRAM), 0, "zero is the model's own check");
        assertEquals("structure.mass.value: 1e-300 kg is not allowed; outside what is physically plausible for this"
                + " quantity; allowed magnitudes are 0.0001 kg to 1e+9 kg", assertThrows(InvalidInputException.class,
                        () -> PhysicalRange.MASS.check("structure.mass.value", 1e-300, Unit.KILOGRAM)).getMessage());
        assertTrue(assertThrows(InvalidInputException.class, () -> PhysicalRange.MASS.check("m", 2e6, Unit.TONNE))
                .getMessage().endsWith("allowed magnitudes are 1e-7 t to 1000000 t"));
        // Every shipped preset lies inside the table: it must never refuse a real project.
        for (String preset : new String[] {"bench-beside-compressor", "blower-frame-single-speed",
            "compressor-frame-speed-band", "pump-skid-mezzanine", "rooftop-fan-platform"}) {
            ProjectReader.read(Path.of("presets/" + preset + ".json")).project().toStudy();
        }
    }

    @Test
    void theEscapeGateShowsControlAndDirectionCharacters() {
        assertEquals("a\\u001b[2Jb\\u000a\\u202e", PlainText.escape("a\u001b[2Jb\n\u202e"));
        assertEquals("line one\n\tline two \\u0007", PlainText.forTerminal("line one\n\tline two \u0007"));
        assertEquals("caf\u00e9 \u00b5m", PlainText.escape("caf\u00e9 \u00b5m"), "ordinary letters untouched");
        assertEquals(PlainText.MAX_QUOTED, PlainText.quote("x".repeat(500)).length());
    }
}
