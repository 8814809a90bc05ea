package org.counterpoise.io.project;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import com.google.gson.Strictness;
import com.google.gson.stream.JsonReader;
import com.google.gson.stream.JsonToken;
import java.io.IOException;
import java.io.Reader;
import java.math.BigDecimal;
import java.util.HashSet;
import java.util.Set;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.PlainMessages;
import org.counterpoise.io.PlainText;

/**
 * Parses JSON text strictly into a tree: exactly one value, nothing after it, no key twice in one
 * object (at any depth; a lenient parser silently keeps the last one, so the user's file would
 * not mean what it says), no NaN or Infinity words, nesting at most {@link #MAX_DEPTH} deep.
 * Numbers keep their exact text (as BigDecimal), so a message quotes what the user wrote.
 */
final class StrictJson {
    /** A project file nests four levels; 32 leaves room for any future format and stops a stack overflow. */
    static final int MAX_DEPTH = 32;

    private final String file;
    private final PositionReader source;
    private final JsonReader reader;

    private StrictJson(String file, String text) {
        this.file = file;
        this.source = new PositionReader(text);
        this.reader = new JsonReader(source);
        reader.setStrictness(Strictness.STRICT);
    }

    /**
     * @param file the file as the user named it (for messages)
     * @param text the file's text
     * @return the root value
     * @throws InvalidInputException naming the file, the place and the problem
     */
    static JsonElement parse(String file, String text) {
        return new StrictJson(file, text).root();
    }

    private JsonElement root() {
        JsonElement root;
        try {
            if (source.isBlank() || reader.peek() == JsonToken.END_DOCUMENT) {
                throw InvalidInputException.unusable(PlainText.escape(file), "is empty",
                        "a project file is one JSON object { ... } as docs/project-file.md shows");
            }
            root = value("", 0);
        } catch (IOException e) {
            throw PlainMessages.notJson(file, e, source.where());
        }
        boolean trailing;
        try {
            trailing = reader.peek() != JsonToken.END_DOCUMENT;
        } catch (IOException e) {
            trailing = true;
        }
        if (trailing) {
            throw InvalidInputException.unusable(PlainText.escape(file), "has more text after the end of the JSON"
                    + " object, at " + source.where(), "a project file holds exactly one object { ... }; remove what follows it");
        }
        return root;
    }

    private JsonElement value(String path, int depth) throws IOException {
        if (depth > MAX_DEPTH) {
            throw InvalidInputException.unusable(PlainText.escape(file), "nests objects or lists more than "
                    + MAX_DEPTH + " levels deep (at " + source.where() + ")",
                    "a project file nests at most 4 levels, as docs/project-file.md shows");
        }
        switch (reader.peek()) {
            case BEGIN_OBJECT -> {
                JsonObject o = new JsonObject();
                Set<String> seen = new HashSet<>();
                reader.beginObject();
                while (reader.hasNext()) {
                    String key = reader.nextName();
                    String child = path.isEmpty() ? key : path + "." + key;
                    if (!seen.add(key)) {
                        throw InvalidInputException.unusable(PlainText.quote(child), "given twice in the same object"
                                + " (at " + source.where() + ")", "give each field once");
                    }
                    o.add(key, value(child, depth + 1));
                }
                reader.endObject();
                return o;
            }
            case BEGIN_ARRAY -> {
                JsonArray a = new JsonArray();
                reader.beginArray();
                while (reader.hasNext()) {
                    a.add(value(path + "[" + a.size() + "]", depth + 1));
                }
                reader.endArray();
                return a;
            }
            case STRING -> {
                return new JsonPrimitive(reader.nextString());
            }
            case NUMBER -> {
                String literal = reader.nextString();
                try {
                    return new JsonPrimitive(new BigDecimal(literal));
                } catch (NumberFormatException e) {
                    throw new InvalidInputException(PlainText.quote(path), PlainText.quote(literal),
                            "a number whose exponent Counterpoise can read (within 1e-300 to 1e300)");
                }
            }
            case BOOLEAN -> {
                return new JsonPrimitive(reader.nextBoolean());
            }
            case NULL -> {
                reader.nextNull();
                return JsonNull.INSTANCE;
            }
            default -> throw InvalidInputException.unusable(PlainText.escape(file), "is not valid JSON at "
                    + source.where(), "a project file is one JSON object { ... }");
        }
    }

    /**
     * Hands the parser one character per call, so the count of characters handed out marks where
     * the parser stopped (to within the token it was reading) and a message can say line and column.
     */
    private static final class PositionReader extends Reader {
        private final String text;
        private int pos;

        PositionReader(String text) {
            this.text = text;
        }

        @Override
        public int read(char[] buffer, int offset, int length) {
            if (length == 0) {
                return 0;
            }
            if (pos >= text.length()) {
                return -1;
            }
            buffer[offset] = text.charAt(pos++);
            return 1;
        }

        boolean isBlank() {
            return text.isBlank();
        }

        String where() {
            int line = 1;
            int lineStart = 0;
            int end = Math.max(0, Math.min(pos, text.length()) - 1);
            for (int i = 0; i < end; i++) {
                if (text.charAt(i) == '\n') {
                    line++;
                    lineStart = i + 1;
                }
            }
            return "line " + line + ", column " + (end - lineStart + 1);
        }

        @Override
        public void close() {
        }
    }
}
