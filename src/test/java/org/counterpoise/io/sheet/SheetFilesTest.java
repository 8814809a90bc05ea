package org.counterpoise.io.sheet;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.AtomicFiles;
import org.counterpoise.io.project.ProjectReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The sheet and its exports are one set: a failure while writing the k-th file (a disk that
 * fills) leaves every file that was there before byte for byte as it was, adds nothing, and
 * removes a folder the request created. Common practice for exports that belong together.
 */
class SheetFilesTest {
    private static final List<String> EXPORTS = List.of("curves.csv", "result.json", "response.png", "response.svg",
            "stroke.png", "stroke.svg");

    @ParameterizedTest
    @ValueSource(ints = {0, 3, 6})
    void aFullDiskAtTheKthFileLeavesThePreviousSetAsItWas(int k, @TempDir Path dir) throws IOException {
        DesignDossier before = design("presets/rooftop-fan-platform.json");
        DesignDossier now = design("presets/pump-skid-mezzanine.json");
        Path folder = dir.resolve("exports");
        Path pdf = dir.resolve("sheet.pdf");
        new SheetFiles.Outputs(before).sheet(pdf, "", "2026-12-01", "A", "--output").data(folder, "--plots")
                .charts(folder, "--plots").write(false);
        Map<String, byte[]> previous = contents(dir);
        assertEquals(7, previous.size());

        SheetFiles.Outputs outputs = new SheetFiles.Outputs(now).data(folder, "--plots").charts(folder, "--plots")
                .sheet(pdf, "", "2026-12-03", "B", "--output");
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> outputs.write(true, (index, body) -> index == k ? fullAfter(200, body) : body));
        Path failed = outputs.paths().get(k);
        String option = k == 6 ? "--output" : "--plots";
        assertEquals(option + ": " + failed + " is not allowed; cannot be written here (the disk is full); nothing"
                + " was changed", e.getMessage());
        Map<String, byte[]> after = contents(dir);
        assertEquals(previous.keySet(), after.keySet(), "no file added or removed, no temporary file");
        for (String name : previous.keySet()) {
            assertArrayEquals(previous.get(name), after.get(name), name + " changed");
        }
        // and the same request without the fault writes all seven
        assertEquals(7, outputs.write(true).size());
        assertFalse(java.util.Arrays.equals(previous.get("exports/result.json"),
                Files.readAllBytes(folder.resolve("result.json"))));
    }

    @Test
    void aFailedExportIntoANewFolderLeavesNoFolder(@TempDir Path dir) {
        Path folder = dir.resolve("new").resolve("exports");
        SheetFiles.Outputs outputs = new SheetFiles.Outputs(design("presets/pump-skid-mezzanine.json"))
                .data(folder, "--csv");
        assertThrows(InvalidInputException.class, () -> outputs.write(false, (i, body) -> fullAfter(0, body)));
        assertFalse(Files.exists(dir.resolve("new")), "the folders this request created are gone again");
        assertEquals(List.of(folder.resolve("curves.csv"), folder.resolve("result.json")), outputs.write(false));
    }

    @Test
    void theProjectFileAndTwoOutputsOnOnePathAreRefused(@TempDir Path dir) throws IOException {
        DesignDossier r = design("presets/pump-skid-mezzanine.json");
        Path project = Files.copy(Path.of("presets/pump-skid-mezzanine.json"), dir.resolve("result.json"));
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new SheetFiles.Outputs(r)
                .sparing(project, "the project file being read").data(dir, "--csv").write(true));
        assertEquals("--csv: " + project + " is not allowed; is the project file being read; choose another name",
                e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> new SheetFiles.Outputs(r)
                .sheet(dir.resolve("curves.csv"), "", "2026-12-03", "A", "--output").data(dir, "--csv"));
        assertTrue(e.getMessage().startsWith("--csv: " + dir.resolve("curves.csv") + " is not allowed; is also where"
                + " the sheet goes (--output)"), e.getMessage());
        assertEquals(List.of("result.json"), names(dir));
    }

    private static DesignDossier design(String preset) {
        return DesignDossier.of(ProjectReader.readStudy(Path.of(preset)));
    }

    /** The body as written to a disk that fills after {@code bytes} bytes. */
    private static AtomicFiles.Body fullAfter(int bytes, AtomicFiles.Body body) {
        return out -> body.write(new FilterOutputStream(out) {
            private long written;

            @Override
            public void write(int b) throws IOException {
                write(new byte[] {(byte) b}, 0, 1);
            }

            @Override
            public void write(byte[] b, int off, int len) throws IOException {
                if (written + len > bytes) {
                    throw new IOException("No space left on device");
                }
                out.write(b, off, len);
                written += len;
            }
        });
    }

    private static Map<String, byte[]> contents(Path dir) throws IOException {
        Map<String, byte[]> all = new LinkedHashMap<>();
        try (Stream<Path> files = Files.walk(dir)) {
            for (Path p : files.filter(Files::isRegularFile).sorted().toList()) {
                all.put(dir.relativize(p).toString(), Files.readAllBytes(p));
            }
        }
        return all;
    }

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
