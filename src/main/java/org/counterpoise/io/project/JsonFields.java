package org.counterpoise.io.project;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;

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

    static JsonFields root(JsonElement element, List<String> unknown) {
        if (element == null || !element.isJsonObject()) {
            throw new InvalidInputException("(file)", describe(element), "the file must hold one JSON object");
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
        JsonElement e = require(key, "a text in quotes");
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isString()) {
            throw new InvalidInputException(pathOf(key), describe(e), "must be a text in quotes");
        }
        return e.getAsString();
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
        q.finish();
        return new QuantityInput(value, unit);
    }

    QuantityInput optionalQuantity(String key, Dimension dimension) {
        return has(key) ? quantity(key, dimension) : null;
    }

    static Unit unit(JsonFields fields, String key, Dimension dimension) {
        String symbol = fields.text(key);
        return Unit.find(symbol, dimension).orElseThrow(() -> new InvalidInputException(fields.pathOf(key),
                "\"" + symbol + "\"", "allowed units: " + Unit.symbolsOf(dimension)));
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

    static String describe(JsonElement e) {
        if (e == null || e.isJsonNull()) {
            return "null";
        }
        if (e.isJsonPrimitive()) {
            JsonPrimitive p = e.getAsJsonPrimitive();
            return p.isString() ? "\"" + p.getAsString() + "\"" : p.toString();
        }
        String s = e.toString();
        return s.length() > 40 ? s.substring(0, 37) + "..." : s;
    }

    static List<String> newUnknownList() {
        return new ArrayList<>();
    }
}
