package org.counterpoise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.jar.Attributes;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * src/main/scripts/counterpoise (copied beside the jar as target/counterpoise; docs/cli.md, "The launcher") as a shell runs it: it finds the jar beside itself,
 * passes the arguments and the exit code through, and gives the JVM its options for a short run
 * plus the user's own. The jar here is a stand-in whose manifest starts {@link Main} on the test
 * class path (the real jar is built after the tests).
 */
class LauncherScriptTest {
    @TempDir
    Path folder;

    record Result(int code, String out) {
    }

    private Result run(Map<String, String> environment, String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of("/bin/sh", folder.resolve("counterpoise").toString()));
        command.addAll(List.of(args));
        ProcessBuilder builder = new ProcessBuilder(command).redirectErrorStream(true);
        builder.environment().put("JAVA_HOME", System.getProperty("java.home"));
        builder.environment().putAll(environment);
        Process p = builder.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        return new Result(p.waitFor(), out);
    }

    private void standInJar() throws Exception {
        Manifest manifest = new Manifest();
        manifest.getMainAttributes().put(Attributes.Name.MANIFEST_VERSION, "1.0");
        manifest.getMainAttributes().put(Attributes.Name.MAIN_CLASS, Main.class.getName());
        List<String> path = new ArrayList<>();
        for (String entry : System.getProperty("java.class.path").split(File.pathSeparator)) {
            path.add(Path.of(entry).toAbsolutePath().toUri().toString());
        }
        manifest.getMainAttributes().put(Attributes.Name.CLASS_PATH, String.join(" ", path));
        try (OutputStream out = Files.newOutputStream(folder.resolve("counterpoise.jar"));
                JarOutputStream jar = new JarOutputStream(out, manifest)) {
            jar.flush();
        }
    }

    @Test
    void passesArgumentsExitCodeAndTheShortRunOptions() throws Exception {
        assumeTrue(Files.isExecutable(Path.of("/bin/sh")), "no POSIX shell on this machine");
        Files.copy(Path.of("src", "main", "scripts", "counterpoise"), folder.resolve("counterpoise"));
        standInJar();

        Result version = run(Map.of("COUNTERPOISE_JAVA_OPTIONS", "-XX:+PrintCommandLineFlags"), "--version");
        assertEquals(0, version.code(), version.out());
        assertTrue(version.out().contains("Counterpoise "), version.out());
        // the JVM prints the flags it was given: the launcher's and the user's own
        assertTrue(version.out().contains("-XX:TieredStopAtLevel=1"), version.out());
        assertTrue(version.out().contains("-XX:+UseSerialGC"), version.out());

        Result missing = run(Map.of(), "design", "no-such-project.json");
        assertEquals(2, missing.code(), missing.out());
        assertTrue(missing.out().contains("error: no-such-project.json: there is no such file"), missing.out());

        Files.delete(folder.resolve("counterpoise.jar"));
        Result noJar = run(Map.of(), "--version");
        assertEquals(1, noJar.code(), noJar.out());
        assertTrue(noJar.out().contains("build it with mvn package"), noJar.out());
    }
}
