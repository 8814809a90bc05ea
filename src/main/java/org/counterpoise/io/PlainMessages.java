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
import org.counterpoise.core.error.InvalidInputException;

/**
 * The one translation from the exceptions of the file system and the JSON parser to plain
 * messages. It decides on the exception's type, never on its message text, and never passes on
 * a class name or the system's own wording (which is in the system's language and jargon).
 */
public final class PlainMessages {
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
}
