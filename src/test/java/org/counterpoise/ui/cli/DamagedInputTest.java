package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.RandomAccessFile;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.counterpoise.testing.DamagedCorpus;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every command that reads a file, on every file of the damaged-input corpus
 * (src/test/resources/damaged, see its README): exit code 2 and one plain message that names the
 * file or field, with no exception name, stack trace, Java package, raw control character,
 * temporary file name, NaN or Infinity. The rule is the owner's (DEVELOPERS.md): bad input always
 * gets a plain message.
 */
class DamagedInputTest {
    private static final Path ROOT = Path.of("src/test/resources/damaged");
    private static final Pattern JARGON = Pattern.compile(
            "[A-Z][a-zA-Z]+(Exception|Error)|java\\.|javax\\.|at org\\.|com\\.google|picocli|\\tat |\\.part\\b");
    private static final Pattern NON_FINITE = Pattern.compile("\\bNaN\\b|Infinity");
    private static final Pattern RAW_CONTROL = Pattern.compile("[\\x00-\\x08\\x0b-\\x1f\\x7f-\\x9f]");
    /** A field id as the reader and the options name them: a JSON path or an option. */
    private static final Pattern FIELD = Pattern.compile("(--[a-z-]+( \\S+)?|[a-z_]+(\\.[a-z_]+|\\[\\d+])*|\\S+ line \\d+.*)");

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Cli.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    static Stream<Path> projectFiles() throws IOException {
        List<Path> all = new ArrayList<>();
        for (String dir : new String[] {"generated", "hand"}) {
            try (var files = Files.list(ROOT.resolve(dir))) {
                files.filter(p -> !p.getFileName().toString().equals("README.md")).sorted().forEach(all::add);
            }
        }
        return all.stream();
    }

    static Stream<Path> caseFiles() throws IOException {
        List<Path> all = new ArrayList<>();
        for (String dir : new String[] {"cases-generated", "cases-hand"}) {
            try (var files = Files.list(ROOT.resolve(dir))) {
                files.sorted().forEach(all::add);
            }
        }
        return all.stream();
    }

    @Test
    void theCorpusIsLargeAndIsWhatTheGeneratorWrites() throws IOException {
        Map<String, byte[]> projects = DamagedCorpus.projects();
        Map<String, byte[]> cases = DamagedCorpus.cases();
        for (var e : projects.entrySet()) {
            assertArrayEquals(e.getValue(), Files.readAllBytes(ROOT.resolve("generated").resolve(e.getKey())),
                    e.getKey() + ": regenerate the corpus (see DamagedCorpus)");
        }
        for (var e : cases.entrySet()) {
            assertArrayEquals(e.getValue(), Files.readAllBytes(ROOT.resolve("cases-generated").resolve(e.getKey())),
                    e.getKey());
        }
        try (var files = Files.list(ROOT.resolve("generated"))) {
            assertEquals(new TreeSet<>(projects.keySet()),
                    new TreeSet<>(files.map(p -> p.getFileName().toString()).toList()), "no stale generated files");
        }
        assertTrue(projectFiles().count() + caseFiles().count() >= 150, "the issue asks for at least 150 inputs");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("projectFiles")
    void everyCommandRefusesADamagedProjectPlainly(Path file, @TempDir Path dir) {
        String f = file.toString();
        Path pdf = dir.resolve("out.pdf");
        String[][] commands = {{"design", f}, {"design", "--json", f}, {"robustness", "--samples", "200", f},
            {"robustness", "--json", "--samples", "200", f}, {"sheet", f, "-o", pdf.toString()}};
        for (String[] command : commands) {
            assertPlainRefusal(run(command), String.join(" ", command), f);
        }
        assertFalse(Files.exists(pdf), "no sheet written for a refused project");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("caseFiles")
    void optimumRefusesADamagedCasesFilePlainly(Path file) {
        assertPlainRefusal(run("optimum", "--cases", file.toString()), "optimum --cases " + file, file.toString());
    }

    /** Things that cannot be committed as files: a folder, a missing file, a device, a pipe, a loop, a huge file. */
    @Test
    void filesThatAreNotSmallRegularFilesAreRefusedBeforeTheyAreRead(@TempDir Path dir) throws Exception {
        List<Path> bad = new ArrayList<>(List.of(dir, dir.resolve("missing.json"), dir.resolve("no-folder/x.json")));
        Path loopA = dir.resolve("loop-a.json");
        Path loopB = dir.resolve("loop-b.json");
        Files.createSymbolicLink(loopA, loopB);
        Files.createSymbolicLink(loopB, loopA);
        bad.add(loopA);
        Path huge = dir.resolve("huge.json");
        try (RandomAccessFile r = new RandomAccessFile(huge.toFile(), "rw")) {
            r.setLength(3L << 30); // 3 GiB, sparse: refused on its size, never read
        }
        bad.add(huge);
        Path justOver = dir.resolve("just-over.json");
        Files.writeString(justOver, "{" + " ".repeat(1 << 20) + "}");
        bad.add(justOver);
        if (Files.exists(Path.of("/dev/zero"))) {
            bad.add(Path.of("/dev/zero"));
        }
        Path fifo = dir.resolve("pipe.json");
        if (new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor() == 0) {
            bad.add(fifo); // opening a pipe with no writer would block: it must be refused unopened
        }
        for (Path p : bad) {
            for (String[] command : new String[][] {{"design", p.toString()}, {"robustness", p.toString()},
                {"sheet", p.toString(), "-o", dir.resolve("o.pdf").toString()}, {"optimum", "--cases", p.toString()}}) {
                assertPlainRefusal(run(command), String.join(" ", command), p.toString());
            }
        }
        assertTrue(run("design", huge.toString()).err().contains("the limit is 1 MiB"));
        assertTrue(run("design", dir.toString()).err().contains("is a folder, not a file"));
    }

    static void assertPlainRefusal(Run r, String command, String file) {
        String err = r.err();
        assertEquals(2, r.code(), command + "\nout: " + head(r.out()) + "\nerr: " + err);
        assertTrue(err.startsWith("error: "), command + ": " + err);
        String first = err.lines().findFirst().orElse("");
        String subject = first.substring("error: ".length(), Math.max("error: ".length(), first.indexOf(": ", 7)));
        assertTrue(subject.contains(file) || subject.contains(Path.of(file).getFileName().toString())
                || FIELD.matcher(subject).matches(), command + ": names no file or field: " + err);
        assertFalse(JARGON.matcher(err).find(), command + ": jargon: " + err);
        assertFalse(NON_FINITE.matcher(err).find(), command + ": NaN or Infinity: " + err);
        assertFalse(RAW_CONTROL.matcher(err).find(), command + ": raw control character: " + err);
        assertTrue(err.lines().count() <= 3, command + ": one short message: " + err);
    }

    private static String head(String s) {
        return s.length() > 300 ? s.substring(0, 300) : s;
    }
}
