package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The command line's messages, one class of problem per check; the exit codes of docs/cli.md. */
class CommandLineMessagesTest {
    private static CliTest.Run run(String... args) {
        return CliTest.run(args);
    }

    @Test
    void versionComesFromTheBuild() throws Exception {
        CliTest.Run r = run("--version");
        assertEquals(Cli.DONE, r.code());
        // The one place the version is kept: pom.xml's <version>, read here independently.
        Matcher m = Pattern.compile("<artifactId>counterpoise</artifactId>\\s*<version>([^<]+)</version>")
                .matcher(Files.readString(Path.of("pom.xml")));
        assertTrue(m.find());
        assertEquals("Counterpoise " + m.group(1), r.out().strip());
    }

    @Test
    void aProjectFileAloneIsRecognisedAndCommandsAreNot(@TempDir Path dir) throws Exception {
        assertTrue(Cli.isProjectFile(new String[] {"presets/pump-skid-mezzanine.json"}));
        assertTrue(Cli.isProjectFile(new String[] {dir.resolve("not-yet.json").toString()}), "reported when opened");
        Path noSuffix = dir.resolve("project");
        Files.writeString(noSuffix, "{}");
        assertTrue(Cli.isProjectFile(new String[] {noSuffix.toString()}));
        assertFalse(Cli.isProjectFile(new String[] {"design"}));
        assertFalse(Cli.isProjectFile(new String[] {"--help"}));
        assertFalse(Cli.isProjectFile(new String[] {"desgn"}));
        assertFalse(Cli.isProjectFile(new String[] {"design", "presets/pump-skid-mezzanine.json"}));
    }

    @Test
    void nonFiniteAndMalformedOptionValuesAreRefusedNamingTheOption() {
        String[][] cases = {
            {"--mass-ratio", "optimum", "--mass-ratio", "NaN"},
            {"--band", "optimum", "--mass-ratio", "0.05", "--band", "0.9:Infinity"},
            {"--fixed-damping", "optimum", "--mass-ratio", "0.05", "--fixed-damping", "NaN"},
            {"--stroke-limit", "optimum", "--mass-ratio", "0.05", "--stroke-limit", "-inf"},
            {"--samples", "robustness", "presets/rooftop-fan-platform.json", "--samples", "1e3"},
            {"--seed", "robustness", "presets/rooftop-fan-platform.json", "--seed", "99999999999999999999"},
            {"--date", "sheet", "presets/pump-skid-mezzanine.json", "-o", "x.pdf", "--date", "2026-02-30"},
        };
        for (String[] c : cases) {
            String[] args = java.util.Arrays.copyOfRange(c, 1, c.length);
            CliTest.Run r = run(args);
            assertEquals(Cli.BAD_INPUT, r.code(), String.join(" ", args));
            assertTrue(r.err().startsWith("error: " + c[0] + ": "), r.err());
            assertFalse(r.err().contains("NaN") || r.err().contains("Infinity") || r.err().contains("Exception")
                    || r.err().contains("java.") || r.err().contains("LocalDate"), r.err());
        }
        assertTrue(run(cases[6]).err().contains("must be a date written YYYY-MM-DD")
                || run(java.util.Arrays.copyOfRange(cases[6], 1, cases[6].length)).err()
                        .contains("must be a date written YYYY-MM-DD"));
    }

    @Test
    void aGridAboveTheCapIsRefusedWithTheCountAndTheMaximumBeforeAnyWork() {
        CliTest.Run r = run("optimum", "--mass-ratio", "0.01:0.1:10000", "--structure-damping", "0:0.1:10000");
        assertEquals(Cli.BAD_INPUT, r.code());
        assertEquals("error: --mass-ratio: 10000 values times --structure-damping 10000 values = 100000000 cases is"
                + " not allowed; at most 100000 cases in one run; use fewer values or split the grid into several runs",
                r.err().strip());
    }

    @Test
    void magnitudesOutsidePhysicsAreRefusedWithTheRange(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("huge.json");
        Files.writeString(file, Files.readString(Path.of("presets/pump-skid-mezzanine.json"))
                .replace("\"value\": 600", "\"value\": 1e300"));
        CliTest.Run r = run("robustness", file.toString());
        assertEquals(Cli.BAD_INPUT, r.code());
        assertEquals("error: disturbance.amplitude.value: 1e300 N is not allowed; outside what is physically"
                + " plausible for this quantity; allowed magnitudes are 0.000001 N to 1e+10 N", r.err().strip());
        r = run("optimum", "--mass-ratio", "1e-300");
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().contains("allowed magnitudes are 0.00001 to 10"), r.err());
    }

    @Test
    void controlCharactersInArgumentsAndFilesAreShownEscaped(@TempDir Path dir) throws Exception {
        CliTest.Run r = run("design", "\u001b[31mred.json");
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().contains("\\u001b[31mred.json"), r.err());
        assertFalse(r.err().contains("\u001b"));
        Path file = dir.resolve("named.json");
        Files.writeString(file, Files.readString(Path.of("presets/pump-skid-mezzanine.json"))
                .replace("\"kind\": \"force\"", "\"kind\": \"\\u001b]0;title\\u0007\""));
        r = run("design", file.toString());
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().contains("\"\\u001b]0;title\\u0007\" is not allowed"), r.err());
        r = run("desgn\u202e");
        assertTrue(r.err().startsWith("error: desgn\\u202e: is not a command"), r.err());
    }

    @Test
    void anInternalFailureIsOnePlainSentenceWithADetailsFileAndExitOne() throws Exception {
        StringWriter err = new StringWriter();
        int code = Cli.failed(new IllegalStateException("index 3 out of bounds"), new String[] {"design", "x.json"},
                new PrintWriter(err, true));
        assertEquals(Cli.FAILED, code);
        String text = err.toString();
        assertFalse(text.contains("IllegalStateException") || text.contains("\tat ") || text.contains("bounds"), text);
        assertTrue(text.startsWith("error: Counterpoise stopped on an internal problem; this is a bug"), text);
        Path details = Path.of(text.substring(text.indexOf("saved in ") + "saved in ".length()).strip());
        String saved = Files.readString(details);
        assertTrue(saved.contains("IllegalStateException: index 3 out of bounds") && saved.contains("[design, x.json]"));
        Files.delete(details);
        StringWriter oom = new StringWriter();
        assertEquals(Cli.FAILED, Cli.failed(new OutOfMemoryError("Java heap space"), new String[0], new PrintWriter(oom, true)));
        assertTrue(oom.toString().startsWith("error: the computer ran out of memory"), oom.toString());
    }

    @Test
    void usageProblemsAreNamedPlainly() {
        CliTest.Run r = run("design");
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().startsWith("error: FILE: missing; give project file"), r.err());
        r = run("design", "a.json", "b.json");
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().startsWith("error: b.json: is one argument too many"), r.err());
        r = run("design", "--json", "--json", "a.json");
        assertEquals(Cli.BAD_INPUT, r.code());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    /**
     * Found by an independent check (5 Dec 2026): refusals of the optimum named an internal field
     * (absorber.tuning_ratio) with a value nobody typed, blamed --band with "0.0:Infinity" when no band
     * was given or the cause was an undamped pair, and an extreme mode shape printed NaN.
     */
    @Test
    void optimumRefusalsNameTheCauseAndNeverAValueNobodyTyped() {
        String[][] cases = {
            {"--band", "optimum", "--mass-ratio", "0.05", "--band", "1000:2000"},
            {"--band", "optimum", "--mass-ratio", "0.05", "--band", "0.9:1e300"},
            {"--band", "optimum", "--mass-ratio", "0.05", "--excitation", "unbalance", "--response", "acceleration"},
            {"--fixed-damping", "optimum", "--mass-ratio", "0.05", "--fixed-damping", "0"},
            {"--fixed-damping", "optimum", "--mass-ratio", "0.05", "--fixed-damping", "0", "--band", "0.9:1.2"},
            {"--second-mode-shape", "optimum", "--mass-ratio", "0.05", "--absorbers", "2", "--second-mode", "3",
                "--second-mode-shape", "1e300"},
            {"--second-mode-shape", "optimum", "--mass-ratio", "0.05", "--one-per-mode", "--second-mode", "1.5",
                "--second-mode-shape", "1e300"},
        };
        for (String[] c : cases) {
            String[] args = java.util.Arrays.copyOfRange(c, 1, c.length);
            CliTest.Run r = run(args);
            assertEquals(Cli.BAD_INPUT, r.code(), String.join(" ", args));
            assertTrue(r.err().startsWith("error: " + c[0] + ": "), r.err());
            for (String bad : new String[] {"NaN", "Infinity", "Exception", "tuning_ratio", "not a number"}) {
                assertFalse(r.err().contains(bad), bad + " in: " + r.err());
            }
        }
        // the unbounded response is said to grow toward high frequency, and a finite band then works
        assertTrue(run(java.util.Arrays.copyOfRange(cases[2], 1, cases[2].length)).err().contains("toward high frequency"));
        assertEquals(Cli.DONE, run("optimum", "--mass-ratio", "0.05", "--excitation", "unbalance", "--response",
                "acceleration", "--band", "0.5:2").code());
        // the help formats every description (a bare % made picocli warn on standard error)
        CliTest.Run help = run("optimum", "--help");
        assertFalse(help.err().contains("WARN"), help.err());
        assertTrue(run("optimum", "--mass-ratio", "0.05", "--tuning", "individual").out().startsWith("1 absorber,"));
    }
}
