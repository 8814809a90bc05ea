package org.counterpoise.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.io.BufferedReader;
import java.io.File;
import java.io.IOException;
import java.io.InputStreamReader;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kills a process that saves in a loop ({@link SaveLoop}) at seeded random moments, with SIGTERM
 * (shutdown hooks run) and SIGKILL (nothing runs), and checks what a user would find: the file is
 * one complete generation, never older than the last save that had finished, and no temporary file
 * survives (after SIGTERM at once; after SIGKILL once the next save has run in that folder). The
 * moments are random, the assertions are not: they hold whatever the kill interrupted.
 * The safe-save guarantee itself (write, flush, rename) is common practice; see AtomicFiles.
 */
class AtomicFilesKillTest {
    private static final int TRIALS = 30;
    private static final long SEED = 20261203L;
    /** Upper end of the random wait after the writer's first save, in milliseconds. */
    private static final int MAX_DELAY_MS = 120;
    private static final int PARALLEL = 3;

    @Test
    void killedSavesLeaveACompleteFileAndNoTemporaryFile(@TempDir Path dir) throws Exception {
        assumeFalse(System.getProperty("os.name", "").startsWith("Windows"), "SIGTERM and SIGKILL are POSIX signals");
        // Trials are independent (a folder and a seed each), so a few run at once: most of a
        // trial is the writer's JVM starting.
        ExecutorService pool = Executors.newFixedThreadPool(PARALLEL);
        try {
            List<Future<Outcome>> futures = new ArrayList<>();
            Random random = new Random(SEED);
            for (int trial = 0; trial < TRIALS; trial++) {
                Path folder = Files.createDirectory(dir.resolve("trial-" + trial));
                boolean sigkill = random.nextBoolean();
                int delay = random.nextInt(MAX_DELAY_MS);
                int t = trial;
                futures.add(pool.submit(() -> trial(t, folder, sigkill, delay)));
            }
            int kills = 0;
            int tempsAfterKill = 0;
            int unchanged = 0;
            for (Future<Outcome> f : futures) {
                Outcome o;
                try {
                    o = f.get();
                } catch (ExecutionException e) {
                    if (e.getCause() instanceof AssertionError a) {
                        throw a;
                    }
                    throw e;
                }
                kills += o.sigkill ? 1 : 0;
                tempsAfterKill += o.tempLeft ? 1 : 0;
                unchanged += o.firstSave ? 1 : 0;
            }
            System.out.printf("kill test: %d trials (%d SIGTERM, %d SIGKILL); %d SIGKILL trials left a temporary"
                    + " file that the next save removed; %d trials found the writer's first save, the rest a"
                    + " later one%n", TRIALS, TRIALS - kills, kills, tempsAfterKill, unchanged);
        } finally {
            pool.shutdownNow();
        }
    }

    private record Outcome(boolean sigkill, boolean tempLeft, boolean firstSave) {
    }

    private static Outcome trial(int trial, Path dir, boolean sigkill, int delay) throws Exception {
        Path target = dir.resolve("project.json");
        AtomicFiles.write(target, out -> SaveLoop.write(out, 0));
        long first = 1;
        Process writer = start(target, first);
        try (BufferedReader out = new BufferedReader(new InputStreamReader(writer.getInputStream(),
                StandardCharsets.UTF_8))) {
            String line = out.readLine();
            assertEquals("ready", line, () -> "trial " + trial + ": the writer did not start: " + errors(writer));
            Thread.sleep(delay);
            if (sigkill) {
                writer.destroyForcibly();
            } else {
                writer.destroy();
            }
            if (!writer.waitFor(20, TimeUnit.SECONDS)) {
                writer.destroyForcibly();
                fail("trial " + trial + ": the writer did not end after the signal");
            }
        }
        String what = "trial " + trial + " (" + (sigkill ? "SIGKILL" : "SIGTERM") + " after " + delay + " ms)";
        long found = SaveLoop.generationOf(target);
        assertTrue(found >= first, what + ": found generation " + found + ", older than the finished save " + first);
        boolean tempLeft = !others(dir, target).isEmpty();
        if (!sigkill) {
            assertEquals(List.of(), others(dir, target), what + ": the shutdown hook left temporary files");
        }
        // The next save, here in this process, removes what the killed writer left.
        long next = found + 1;
        AtomicFiles.write(target, out -> SaveLoop.write(out, next));
        assertEquals(List.of(), others(dir, target), what + ": a temporary file survived the next save");
        assertEquals(next, SaveLoop.generationOf(target));
        return new Outcome(sigkill, tempLeft, found == first);
    }

    private static Process start(Path target, long firstGeneration) throws IOException, URISyntaxException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String classpath = Stream.of(AtomicFiles.class, SaveLoop.class)
                .map(AtomicFilesKillTest::location).distinct().collect(Collectors.joining(File.pathSeparator));
        return new ProcessBuilder(java, "-Xshare:auto", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Xmx64m",
                "-cp", classpath, SaveLoop.class.getName(), target.toString(), Long.toString(firstGeneration))
                .redirectError(ProcessBuilder.Redirect.PIPE).start();
    }

    private static String location(Class<?> c) {
        try {
            return Path.of(c.getProtectionDomain().getCodeSource().getLocation().toURI()).toString();
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    private static String errors(Process p) {
        try {
            if (!p.waitFor(5, TimeUnit.SECONDS)) {
                p.destroyForcibly().waitFor();
            }
            return new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException | InterruptedException e) {
            return "(no error output)";
        }
    }

    private static List<String> others(Path dir, Path target) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.filter(p -> !p.equals(target)).map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
