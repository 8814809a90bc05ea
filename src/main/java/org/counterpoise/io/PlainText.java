package org.counterpoise.io;

/**
 * The one gate between text that came from a file or an argument and the user's terminal or
 * dialog: control characters, escape sequences and invisible direction marks are shown as
 * {@code \u001b}-style escapes, never sent raw (a raw ESC could recolour or rewrite the
 * terminal; a direction override could make a message read backwards).
 */
public final class PlainText {
    /** Longest value quoted back to the user; a longer one is cut with an ellipsis. */
    public static final int MAX_QUOTED = 60;

    private PlainText() {
    }

    /**
     * For one-line messages: every control character is escaped, line breaks and tabs too.
     * @param text any text (null gives "")
     * @return text safe to print
     */
    public static String escape(String text) {
        return escape(text, false);
    }

    /**
     * For multi-line reports: line breaks and tabs are kept, every other control character escaped.
     * @param text any text (null gives "")
     * @return text safe to print
     */
    public static String forTerminal(String text) {
        return escape(text, true);
    }

    /**
     * A value quoted back to the user: escaped and cut to {@link #MAX_QUOTED} characters.
     * @param text the value as given
     * @return the quotable text
     */
    public static String quote(String text) {
        String safe = escape(text);
        return safe.length() > MAX_QUOTED ? safe.substring(0, MAX_QUOTED - 3) + "..." : safe;
    }

    private static String escape(String text, boolean keepLines) {
        if (text == null) {
            return "";
        }
        StringBuilder out = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean keep = !unsafe(c) || keepLines && (c == '\n' || c == '\t');
            if (keep) {
                if (out != null) {
                    out.append(c);
                }
                continue;
            }
            if (out == null) {
                out = new StringBuilder(text.length() + 16).append(text, 0, i);
            }
            out.append(String.format("\\u%04x", (int) c));
        }
        return out == null ? text : out.toString();
    }

    /** C0 and C1 controls, DEL, bidirectional marks and overrides, and lone surrogate halves. */
    private static boolean unsafe(char c) {
        return c < 0x20 || c >= 0x7f && c <= 0x9f || c >= 0x200e && c <= 0x200f || c >= 0x202a && c <= 0x202e
                || c >= 0x2066 && c <= 0x2069 || c == 0xfeff || c == 0xfffe || c == 0xffff;
    }
}
