package org.counterpoise.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * The one way Counterpoise writes a file: into a hidden temporary file beside the target, then an
 * atomic rename over it (after OpenRocket's safe save), so a crash or a full disk never leaves a
 * half-written project, sheet or export. The finished file gets the ordinary rw-r--r-- permissions
 * where the file system has them (temporary files start private).
 */
public final class AtomicFiles {
    private AtomicFiles() {
    }

    /** Writes the content of a file. */
    @FunctionalInterface
    public interface Body {
        /**
         * @param out the stream to write to (closed by the caller)
         * @throws IOException on a write failure
         */
        void write(OutputStream out) throws IOException;
    }

    /**
     * @param target the file to create or replace
     * @param body writes the content
     * @throws IOException when the folder cannot be written
     */
    public static void write(Path target, Body body) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path temp = Files.createTempFile(absolute.getParent(), "." + absolute.getFileName(), ".part");
        try {
            try (OutputStream out = Files.newOutputStream(temp)) {
                body.write(out);
            }
            if (FileSystems.getDefault().supportedFileAttributeViews().contains("posix")) {
                Files.setPosixFilePermissions(temp, PosixFilePermissions.fromString("rw-r--r--"));
            }
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
    }
}
