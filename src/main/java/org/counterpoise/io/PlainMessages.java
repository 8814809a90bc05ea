package org.counterpoise.io;

import com.google.gson.stream.MalformedJsonException;
import java.io.EOFException;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.FileSystemLoopException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.counterpoise.core.error.InvalidInputException;

/**
 * The one translation from the exceptions of the file system and the JSON parser to plain
 * messages. It decides on the exception's type, never on its message text, and never passes on
 * a class name or the system's own wording (which is in the system's language and jargon); the
 * one exception is {@link #writeFailure}, where a full disk has no type and only its text tells.
 */
public final class PlainMessages {
    /** For writes only: system error texts (strerror, as the JDK reports them) and their plain words. */
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

    private PlainMessages() {
    }

    /**
     * @param field the file as the user named it (or the option that named it)
     * @param e what reading it raised
     * @return a plain message naming the file, what is wrong and what to do
     */
    public static InvalidInputException unreadable(String field, IOException e) {
        String f = PlainText.escape(field);
        if (e instanceof NoSuchFileException) {
            return InvalidInputException.unusable(f, "there is no such file", "check the name and the folder");
        }
        if (e instanceof AccessDeniedException) {
            return InvalidInputException.unusable(f, "cannot be read: permission denied",
                    "give a file you are allowed to read");
        }
        if (e instanceof NotDirectoryException) {
            return InvalidInputException.unusable(f, "a folder in this path is a file",
                    "check the folders in the path");
        }
        if (e instanceof FileSystemLoopException) {
            return InvalidInputException.unusable(f, "is a link that leads back to itself (a loop of links)",
                    "give the path of the file itself");
        }
        if (e instanceof CharacterCodingException) {
            return InvalidInputException.unusable(f, "is not UTF-8 text", "save it as UTF-8 text");
        }
        if (e instanceof FileSystemException) {
            return InvalidInputException.unusable(f, "cannot be read (the system refused to open it)",
                    "check that the path names a file you may read");
        }
        return InvalidInputException.unusable(f, "cannot be read (the disk or network failed while reading)",
                "check the disk or share and try again");
    }

    /**
     * @param field the file as the user named it
     * @param e what the JSON reader raised
     * @param where "line L, column C" or "" when not known
     * @return a plain message naming the file and the place
     */
    public static InvalidInputException notJson(String field, IOException e, String where) {
        String f = PlainText.escape(field);
        String at = where.isEmpty() ? "" : " at " + where;
        if (e instanceof EOFException) {
            return InvalidInputException.unusable(f, "ends before the JSON text is complete" + at
                    + " (is the file cut short?)", "a project file is one JSON object { ... } with every bracket closed");
        }
        if (e instanceof MalformedJsonException) {
            return InvalidInputException.unusable(f, "is not valid JSON" + at
                    + " (a missing comma, quote or bracket, a comment, or a word that is not a number, text,"
                    + " true, false or null)", "a project file is one JSON object { ... } as docs/project-file.md shows");
        }
        return unreadable(field, e);
    }

    /**
     * The cause of a failed write in plain words, for "PATH cannot be written here (CAUSE)". A full
     * disk, a used-up quota or a read-only disk have no exception type of their own (Java reports
     * a bare IOException carrying the system's error text), so for writes alone the common system
     * texts are recognised, anywhere in the chain of causes (an image or SVG writer wraps them);
     * anything else gets a general phrase, never the system's wording or a file name.
     * @param e a failure while writing
     * @return its cause, lower case, with no file name and no class name
     */
    public static String writeFailure(IOException e) {
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
        if (e instanceof FileSystemLoopException) {
            return "a symbolic link on the path loops";
        }
        for (Throwable t = e; t != null; t = t.getCause()) {
            String os = t instanceof FileSystemException fs ? fs.getReason() : t.getMessage();
            String plain = os == null ? null : osReason(os);
            if (plain != null) {
                return plain;
            }
        }
        return "the disk or network failed while writing";
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
}
