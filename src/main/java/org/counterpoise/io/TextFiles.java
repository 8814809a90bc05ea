package org.counterpoise.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.Locale;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Reads a small UTF-8 text file the user named, refusing before reading it whole anything that
 * is not one: a folder, a device such as /dev/zero, a pipe, a file above the size cap (read
 * through a bounded stream, so a file that grows or lies about its size is still cut off), binary
 * data, or text in another encoding. Each refusal names the file, what it is and what is allowed.
 */
public final class TextFiles {
    private TextFiles() {
    }

    /**
     * @param file the file
     * @param field how the user named it (the path, or "--cases FILE")
     * @param maxBytes the size cap
     * @param what what the file should be, e.g. "project file (.json)"
     * @return the text, without a UTF-8 byte-order mark
     * @throws InvalidInputException with a plain message
     */
    public static String readUtf8(Path file, String field, long maxBytes, String what) {
        String f = PlainText.escape(field);
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
            throw InvalidInputException.unusable(f, "there is no such file", "check the name and the folder");
        }
        if (!Files.exists(file)) {
            throw InvalidInputException.unusable(f, "is a link that leads to no file (a broken link or a loop of links)",
                    "give the path of the " + what + " itself");
        }
        if (Files.isDirectory(file)) {
            throw InvalidInputException.unusable(f, "is a folder, not a file", "give the path of a " + what);
        }
        if (!Files.isRegularFile(file)) {
            throw InvalidInputException.unusable(f, "is not an ordinary file (a device, pipe or socket)",
                    "give a saved " + what);
        }
        byte[] bytes;
        try {
            long size = Files.size(file);
            if (size > maxBytes) {
                throw tooLarge(f, size, maxBytes, what);
            }
            try (InputStream in = Files.newInputStream(file)) {
                bytes = in.readNBytes((int) maxBytes + 1);
            }
        } catch (IOException e) {
            throw PlainMessages.unreadable(field, e);
        }
        if (bytes.length > maxBytes) {
            throw tooLarge(f, bytes.length, maxBytes, what);
        }
        return decode(bytes, f, what);
    }

    private static InvalidInputException tooLarge(String f, long size, long maxBytes, String what) {
        return InvalidInputException.unusable(f, "is " + (size > maxBytes ? "larger than " + size(maxBytes) : size(size))
                + ", too large for a " + what, "the limit is " + size(maxBytes));
    }

    /**
     * @param bytes the file's bytes
     * @param f the file as named, escaped
     * @param what what the file should be
     * @return the text
     */
    static String decode(byte[] bytes, String f, String what) {
        int start = 0;
        if (bytes.length >= 2 && ((bytes[0] & 0xff) == 0xfe && (bytes[1] & 0xff) == 0xff
                || (bytes[0] & 0xff) == 0xff && (bytes[1] & 0xff) == 0xfe)) {
            throw InvalidInputException.unusable(f, "is UTF-16 text, not UTF-8 text", "save the " + what + " as UTF-8");
        }
        if (bytes.length >= 3 && (bytes[0] & 0xff) == 0xef && (bytes[1] & 0xff) == 0xbb && (bytes[2] & 0xff) == 0xbf) {
            start = 3; // a UTF-8 byte-order mark, as some editors write: harmless, skipped
        }
        for (int i = start; i < bytes.length; i++) {
            if (bytes[i] == 0) {
                throw InvalidInputException.unusable(f, "holds binary data, not text (a zero byte at "
                        + where(bytes, i) + ")", "give a " + what + " saved as UTF-8 text");
            }
        }
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes, start, bytes.length - start);
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult r = decoder.decode(in, out, true);
        if (r.isError()) {
            int at = in.position();
            throw InvalidInputException.unusable(f, "is not UTF-8 text (byte " + String.format(Locale.ROOT, "0x%02X",
                    bytes[at] & 0xff) + " at " + where(bytes, at) + ")", "save the " + what
                    + " as UTF-8 (editors offer this under Save As or Encoding)");
        }
        decoder.flush(out);
        out.flip();
        return out.toString();
    }

    /** Line and column (counted in bytes) of a byte offset. */
    private static String where(byte[] bytes, int offset) {
        int line = 1;
        int lineStart = 0;
        for (int i = 0; i < offset; i++) {
            if (bytes[i] == '\n') {
                line++;
                lineStart = i + 1;
            }
        }
        return "line " + line + ", column " + (offset - lineStart + 1);
    }

    /**
     * @param bytes a size
     * @return it in B, kB or MiB
     */
    public static String size(long bytes) {
        if (bytes >= 1 << 20) {
            return String.format(Locale.ROOT, "%.0f MiB", bytes / 1048576.0).replace(".0 ", " ");
        }
        if (bytes >= 1024) {
            return String.format(Locale.ROOT, "%.0f kB", bytes / 1024.0);
        }
        return bytes + " bytes";
    }
}
