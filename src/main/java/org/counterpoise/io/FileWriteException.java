package org.counterpoise.io;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A file that could not be written or was refused, in plain words. The message names the
 * destination the user chose (never a temporary file) and carries no exception class name, so
 * a command or dialog can show it as it is.
 */
public final class FileWriteException extends IOException {
    private final transient Path path;
    private final String problem;

    /**
     * @param path the destination as the user gave it
     * @param problem what is wrong, as the rest of a sentence that starts with the path, e.g.
     *     "cannot be written here (the disk is full); the file already there is unchanged"
     */
    public FileWriteException(Path path, String problem) {
        super(path + " " + problem);
        this.path = path;
        this.problem = problem;
    }

    /** @return the destination as the user gave it */
    public Path path() {
        return path;
    }

    /** @return what is wrong, without the path (the message is the path, a space, and this) */
    public String problem() {
        return problem;
    }
}
