package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What {@code sheet} may replace and what it writes: only ordinary files (never a folder, pipe or
 * the project being read, even with --force), the documented files per option, and all of them or
 * none. Messages name the option and the path and carry no Java class name (common practice for a
 * command line; docs/cli.md).
 */
class SheetCommandFilesTest {
    private static final String PRESET = "presets/pump-skid-mezzanine.json";

    @Test
    void aFolderAPipeOrTheProjectItselfIsNeverReplaced(@TempDir Path dir) throws Exception {
        Path folder = Files.createDirectory(dir.resolve("out"));
        CliTest.Run r = CliTest.run("sheet", PRESET, "-o", folder.toString(), "--force");
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("error: --output: " + folder), r.err());
        assertTrue(r.err().contains("is a folder"), r.err());
        assertTrue(Files.isDirectory(folder));

        Path fifo = dir.resolve("pipe");
        if (new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor() == 0) {
            r = CliTest.run("sheet", PRESET, "-o", fifo.toString(), "--force");
            assertEquals(2, r.code());
            assertTrue(r.err().startsWith("error: --output: " + fifo), r.err());
            assertTrue(r.err().contains("is a device, pipe or socket, not an ordinary file"), r.err());
            assertTrue(Files.exists(fifo, LinkOption.NOFOLLOW_LINKS) && !Files.isRegularFile(fifo),
                    "the pipe is still a pipe");
        }

        Path project = Files.copy(Path.of(PRESET), dir.resolve("project.json"));
        byte[] before = Files.readAllBytes(project);
        r = CliTest.run("sheet", project.toString(), "-o", project.toString(), "--force");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("is the project file being read"), r.err());
        assertEquals(new String(before), Files.readString(project));
        assertFalse(r.err().matches("(?s).*\\b[a-z]+\\.[a-z.]+\\.[A-Z]\\w*(Exception|Error).*"), r.err());
        List<String> expected = Files.exists(fifo, LinkOption.NOFOLLOW_LINKS) ? List.of("out", "pipe", "project.json")
                : List.of("out", "project.json");
        assertEquals(expected, names(dir), "no temporary files, nothing new");
    }

    @Test
    void csvWritesTheDataPlotsAlsoTheChartsAndAFailureWritesNothing(@TempDir Path dir) throws IOException {
        Path pdf = dir.resolve("sheet.pdf");
        CliTest.Run r = CliTest.run("sheet", PRESET, "-o", pdf.toString(), "--csv", dir.resolve("data").toString(),
                "--plots", dir.resolve("plots").toString());
        assertEquals(0, r.code(), r.err());
        assertEquals(List.of("curves.csv", "result.json"), names(dir.resolve("data")));
        assertEquals(List.of("curves.csv", "response.png", "response.svg", "result.json", "stroke.png", "stroke.svg"),
                names(dir.resolve("plots")));
        assertEquals(9, r.out().strip().split("\n").length, r.out());

        // The export folder cannot be made (a file is in the way): the sheet is not written either.
        Path blocker = Files.writeString(dir.resolve("blocker"), "x");
        Path pdf2 = dir.resolve("second.pdf");
        r = CliTest.run("sheet", PRESET, "-o", pdf2.toString(), "--csv", blocker.resolve("data").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("error: --csv: " + blocker.resolve("data")), r.err());
        assertTrue(r.err().contains("cannot be written here"), r.err());
        assertFalse(Files.exists(pdf2), "all or none: the sheet was not written");
        assertEquals(List.of("blocker", "data", "plots", "sheet.pdf"), names(dir));
    }

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
