package org.counterpoise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The exit codes of docs/cli.md as the shell sees them, through {@link Main} in a separate JVM
 * without a display: 0 done, 2 bad input or usage; a project file alone prints its report.
 */
class MainProcessTest {
    record Result(int code, String out, String err) {
    }

    static Result java(String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Djava.awt.headless=true", "-cp", System.getProperty("java.class.path"), Main.class.getName()));
        command.addAll(List.of(args));
        File errFile = File.createTempFile("main-err", ".txt");
        Process p = new ProcessBuilder(command).redirectError(errFile).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        int code = p.waitFor();
        String err = java.nio.file.Files.readString(errFile.toPath());
        errFile.delete();
        return new Result(code, out, err);
    }

    @Test
    void exitCodesAndTheProjectFileShortcutWithoutADisplay() throws Exception {
        Result report = java("presets/pump-skid-mezzanine.json");
        assertEquals(0, report.code(), report.err());
        assertTrue(report.out().startsWith("No display: printing the design report of presets/pump-skid-mezzanine.json"),
                report.out());
        assertTrue(report.out().contains("Counterpoise absorber design: Pump skid on a mezzanine"), report.out());
        Result missing = java("no-such-project.json");
        assertEquals(2, missing.code());
        assertEquals("error: no-such-project.json: there is no such file; check the name and the folder",
                missing.err().strip());
        Result usage = java("design", "--nope");
        assertEquals(2, usage.code());
        Result version = java("--version");
        assertEquals(0, version.code());
        assertTrue(version.out().startsWith("Counterpoise "), version.out());
    }
}
