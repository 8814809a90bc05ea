package org.counterpoise.io;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import java.util.List;
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
    private static final List<Map.Entry<String, String>> OS_REASONS = List.of(
            Map.entry("no space left on device", "the disk is full"),
            Map.entry("disk quota exceeded", "the disk quota is used up"),
            Map.entry("read-only file system", "the disk is read-only"),
            Map.entry("file too large", "the file is larger than the disk allows"),
            Map.entry("file name too long", "the file name is too long"),
            Map.entry("input/output error", "the disk reported an input/output error"),
            Map.entry("permission denied", "permission denied"),
            Map.entry("operation not permitted", "permission denied"),
            Map.entry("not a directory", "part of the folder path is a file, not a folder"),
            Map.entry("too many levels of symbolic links", "a symbolic link on the path loops"));

    private static final Pattern JAVA_CLASS =
            Pattern.compile("\\b(?:[a-z_$][\\w$]*\\.)+[A-Z][\\w$]*(?:Exception|Error)\\b:?");

    private WriteErrors() {
    }

    private static String osReason(String text) {
        String lower = text.toLowerCase(Locale.ROOT);
        for (Map.Entry<String, String> known : OS_REASONS) {
            if (lower.contains(known.getKey())) {
                return known.getValue();
            }
        }
        return null;
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
        // A library may wrap the disk's failure in its own exception or text (an image or SVG
        // writer does): the system's words, found anywhere in the chain, say more than the wrapper.
        for (Throwable t = e; t != null; t = t.getCause()) {
            String os = t instanceof FileSystemException fs ? fs.getReason() : t.getMessage();
            String plain = os == null ? null : osReason(os);
            if (plain != null) {
                return plain;
            }
        }
        // FileSystemException's message carries the file names (possibly a temporary one); its
        // reason is the operating system's text alone.
        String text = e instanceof FileSystemException fs ? fs.getReason() : e.getMessage();
        if (text == null || text.isBlank()) {
            return "the system refused it without saying why";
        }
        // A wrapped exception's text starts with its class name ("java.io.IOException: ..."): drop it.
        String stripped = JAVA_CLASS.matcher(text).replaceAll("").replaceAll("\\s+", " ").strip();
        return stripped.isEmpty() ? "the system refused it without saying why" : stripped;
    }
}
