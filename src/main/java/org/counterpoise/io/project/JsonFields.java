package org.counterpoise.io.project;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.PhysicalRange;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainText;

/**
 * Reads one JSON object field by field, naming each problem by its path in the file, and keeps
 * track of the keys it did not use so that unknown fields are reported rather than ignored.
 */
final class JsonFields {
    private final JsonObject object;
    private final String path;
    private final Set<String> used = new LinkedHashSet<>();
    private final List<String> unknown;

    JsonFields(JsonObject object, String path, List<String> unknown) {
        this.object = object;
        this.path = path;
        this.unknown = unknown;
    }

    static JsonFields root(JsonElement element, List<String> unknown, String fileName) {
        if (element == null || !element.isJsonObject()) {
            throw InvalidInputException.unusable(PlainText.escape(fileName), "holds " + describe(element)
                    + " instead of one JSON object { ... }", "a project file is one object, as docs/project-file.md shows");
        }
        return new JsonFields(element.getAsJsonObject(), "", unknown);
    }

    String pathOf(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    boolean has(String key) {
        return object.has(key) && !object.get(key).isJsonNull();
    }

    JsonFields object(String key) {
        JsonElement e = require(key, "an object { ... }");
        if (!e.isJsonObject()) {
            throw new InvalidInputException(pathOf(key), describe(e), "must be an object { ... }");
        }
        return new JsonFields(e.getAsJsonObject(), pathOf(key), unknown);
    }

    /**
     * A list of objects, each read with its path {@code key[i]}; an absent key is an empty list.
     */
    List<JsonFields> objectList(String key) {
        if (!has(key)) {
            used.add(key);
            return List.of();
        }
        JsonElement e = require(key, "a list [ ... ]");
        if (!e.isJsonArray()) {
            throw new InvalidInputException(pathOf(key), describe(e), "must be a list [ {...}, {...} ]");
        }
        List<JsonFields> out = new ArrayList<>();
        for (JsonElement item : e.getAsJsonArray()) {
            String itemPath = pathOf(key) + "[" + out.size() + "]";
            if (!item.isJsonObject()) {
                throw new InvalidInputException(itemPath, describe(item), "must be an object { ... }");
            }
            out.add(new JsonFields(item.getAsJsonObject(), itemPath, unknown));
        }
        return out;
    }

    /**
     * An object whose every value is a number, such as {@code {"midspan": 1.0, "edge": 0.4}}; each
     * key is a name the user chose. An absent key is an error.
     * @return the names and numbers, in the order written
     */
    Map<String, Double> numberMap(String key) {
        JsonFields o = object(key);
        Map<String, Double> out = new LinkedHashMap<>();
        for (String name : o.object.keySet()) {
            out.put(name, o.number(name));
        }
        return out;
    }

    /**
     * A list of texts, such as {@code ["bending", "twisting"]}, each checked as {@link #text} is. An
     * absent key is an error.
     * @return the texts, in the order written
     */
    List<String> textList(String key) {
        JsonElement e = require(key, "a list of texts [\"...\", \"...\"]");
        if (!e.isJsonArray()) {
            throw new InvalidInputException(pathOf(key), describe(e), "must be a list of texts [\"...\", \"...\"]");
        }
        List<String> out = new ArrayList<>();
        for (JsonElement item : e.getAsJsonArray()) {
            out.add(checkedText(pathOf(key) + "[" + out.size() + "]", item));
        }
        return out;
    }

    /** @return true when the key holds a text in quotes */
    boolean isText(String key) {
        return has(key) && object.get(key).isJsonPrimitive() && object.get(key).getAsJsonPrimitive().isString();
    }

    JsonFields optionalObject(String key) {
        return has(key) ? object(key) : null;
    }

    double number(String key) {
        JsonElement e = require(key, "a number");
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isNumber()) {
            throw new InvalidInputException(pathOf(key), describe(e), "must be a number");
        }
        double v = e.getAsDouble();
        if (!Double.isFinite(v)) {
            throw new InvalidInputException(pathOf(key), describe(e), "must be a finite number");
        }
        return v;
    }

    double number(String key, double fallback) {
        return has(key) ? number(key) : fallback;
    }

    String text(String key) {
        return checkedText(pathOf(key), require(key, "a text in quotes"));
    }

    private static String checkedText(String path, JsonElement e) {
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isString()) {
            throw new InvalidInputException(path, describe(e), "must be a text in quotes");
        }
        String text = e.getAsString();
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c < 0x20 && c != '\n' && c != '\t' && c != '\r' || c >= 0x7f && c <= 0x9f) {
                throw new InvalidInputException(path, describe(e), "a text without control characters"
                        + " (line breaks and tabs are allowed)");
            }
        }
        return text;
    }

    String text(String key, String fallback) {
        return has(key) ? text(key) : fallback;
    }

    boolean bool(String key, boolean fallback) {
        if (!has(key)) {
            used.add(key);
            return fallback;
        }
        JsonElement e = object.get(key);
        used.add(key);
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isBoolean()) {
            throw new InvalidInputException(pathOf(key), describe(e), "must be true or false");
        }
        return e.getAsBoolean();
    }

    /** A quantity {"value": number, "unit": "symbol"} of the given dimension. */
    QuantityInput quantity(String key, Dimension dimension) {
        JsonFields q = object(key);
        double value = q.number("value");
        Unit unit = unit(q, "unit", dimension);
        PhysicalRange.of(dimension).check(q.pathOf("value"), value, unit);
        q.finish();
        return new QuantityInput(value, unit);
    }

    QuantityInput optionalQuantity(String key, Dimension dimension) {
        return has(key) ? quantity(key, dimension) : null;
    }

    static Unit unit(JsonFields fields, String key, Dimension dimension) {
        String symbol = fields.text(key);
        return Unit.find(symbol, dimension).orElseThrow(() -> new InvalidInputException(fields.pathOf(key),
                "\"" + PlainText.quote(symbol) + "\"", "allowed units: " + Unit.symbolsOf(dimension)));
    }

    /** Records every key not read as unknown. */
    void finish() {
        for (String key : object.keySet()) {
            if (!used.contains(key)) {
                unknown.add(pathOf(key));
            }
        }
    }

    private JsonElement require(String key, String expected) {
        used.add(key);
        if (!has(key)) {
            throw InvalidInputException.missing(pathOf(key), "expected " + expected);
        }
        return object.get(key);
    }

    /** @return the value of a key as the user wrote it, for a message */
    String shown(String key) {
        return describe(object.get(key));
    }

    static String describe(JsonElement e) {
        if (e == null || e.isJsonNull()) {
            return "null";
        }
        if (e.isJsonPrimitive()) {
            JsonPrimitive p = e.getAsJsonPrimitive();
            return p.isString() ? "\"" + PlainText.quote(p.getAsString()) + "\"" : PlainText.quote(p.toString());
        }
        if (e.isJsonObject()) {
            return "an object { ... }";
        }
        return "a list [ ... ]";
    }

    static List<String> newUnknownList() {
        return new ArrayList<>();
    }
}
