package org.counterpoise.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The writer the kill test runs in a separate JVM: saves numbered generations of a file through
 * {@link AtomicFiles} in an endless loop and prints "ready" after its first complete save. Each
 * generation is self-checking, so a reader can tell a complete file from a torn one.
 */
public final class SaveLoop {
    static final int LINES = 4000;

    private SaveLoop() {
    }

    /**
     * @param args the file to save, the first generation number
     * @throws IOException when a save fails (the test then finds the process ended)
     */
    public static void main(String[] args) throws IOException {
        Path target = Path.of(args[0]);
        long generation = Long.parseLong(args[1]);
        boolean ready = false;
        while (true) {
            long g = generation++;
            AtomicFiles.write(target, out -> write(out, g));
            if (!ready) {
                System.out.println("ready");
                System.out.flush();
                ready = true;
            }
        }
    }

    /** Writes generation {@code g}: a header, numbered lines tied to g, and a closing line. */
    static void write(OutputStream out, long g) throws IOException {
        StringBuilder text = new StringBuilder("generation ").append(g).append('\n');
        for (int i = 0; i < LINES; i++) {
            text.append(g).append(' ').append(i).append(' ').append(Long.toHexString(mix(g, i))).append('\n');
        }
        text.append("end ").append(g).append('\n');
        out.write(text.toString().getBytes(StandardCharsets.UTF_8));
    }

    /**
     * @param file a file written by {@link #write}
     * @return its generation
     * @throws IOException when it cannot be read
     * @throws AssertionError when it is not one complete generation
     */
    static long generationOf(Path file) throws IOException {
        String[] lines = Files.readString(file, StandardCharsets.UTF_8).split("\n", -1);
        if (lines.length != LINES + 3 || !lines[0].startsWith("generation ") || !lines[LINES + 2].isEmpty()) {
            throw new AssertionError(file + " is not a complete generation (" + lines.length + " lines)");
        }
        long g = Long.parseLong(lines[0].substring("generation ".length()));
        for (int i = 0; i < LINES; i++) {
            String expected = g + " " + i + " " + Long.toHexString(mix(g, i));
            if (!lines[i + 1].equals(expected)) {
                throw new AssertionError(file + " line " + (i + 2) + " is torn: " + lines[i + 1]);
            }
        }
        if (!lines[LINES + 1].equals("end " + g)) {
            throw new AssertionError(file + " lacks its closing line");
        }
        return g;
    }

    private static long mix(long g, long i) {
        long x = g * 0x9E3779B97F4A7C15L + i;
        x ^= x >>> 31;
        return x * 0xBF58476D1CE4E5B9L;
    }
}
