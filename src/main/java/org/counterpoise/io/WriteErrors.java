package org.counterpoise.io;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * The one place where a failed write is put into plain words. Java reports most disk failures
 * with a bare {@link IOException} whose text is the operating system's error string (a full disk
 * has no exception type of its own), so the common strings are recognised here and turned into
 * words a user can act on; any other string is passed on without its file names and without
 * Java's class names.
 */
public final class WriteErrors {
    /** Operating-system error strings (strerror, as the JDK reports them) and their plain words. */
    private static final Map<String, String> OS_REASONS = Map.of(
            "no space left on device", "the disk is full",
            "disk quota exceeded", "the disk quota is used up",
            "read-only file system", "the disk is read-only",
            "file too large", "the file is larger than the disk allows",
            "file name too long", "the file name is too long",
            "input/output error", "the disk reported an input/output error",
            "permission denied", "permission denied",
            "operation not permitted", "permission denied",
            "not a directory", "part of the folder path is a file, not a folder",
            "too many levels of symbolic links", "a symbolic link on the path loops");

    private static final Pattern JAVA_CLASS =
            Pattern.compile("\\b(?:[a-z_$][\\w$]*\\.)+[A-Z][\\w$]*(?:Exception|Error)\\b:?");

    private WriteErrors() {
    }

    /**
     * @param e a failure while writing
     * @return its cause in plain words, lower case, with no file name and no class name
     */
    public static String reason(IOException e) {
        if (e instanceof FileWriteException f) {
            return f.problem();
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof NoSuchFileException) {
            return "its folder does not exist";
        }
        if (e instanceof NotDirectoryException) {
            return "part of the folder path is a file, not a folder";
        }
        // FileSystemException's message carries the file names (possibly a temporary one); its
        // reason is the operating system's text alone.
        String text = e instanceof FileSystemException fs ? fs.getReason() : e.getMessage();
        if (text == null || text.isBlank()) {
            return "the system refused it without saying why";
        }
        String plain = OS_REASONS.get(text.strip().toLowerCase(Locale.ROOT));
        if (plain != null) {
            return plain;
        }
        // A wrapped exception's text starts with its class name ("java.io.IOException: ..."): drop it.
        String stripped = JAVA_CLASS.matcher(text).replaceAll("").strip();
        return stripped.isEmpty() ? "the system refused it without saying why" : stripped;
    }
}
