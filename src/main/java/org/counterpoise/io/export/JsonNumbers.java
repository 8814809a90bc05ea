package org.counterpoise.io.export;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.Strictness;
import java.util.OptionalDouble;

/**
 * Numbers into JSON the one way every export writes them: JSON has no NaN or Infinity, so an
 * unbounded value (an undamped structure at resonance) is null with a companion
 * {@code <key>_unbounded: true}, and a value that is not defined (a static deflection when nothing hangs)
 * is null alone. The writer is strict, so a non-finite number that slipped past fails loudly
 * instead of printing invalid JSON.
 */
public final class JsonNumbers {
    private JsonNumbers() {
    }

    /**
     * @param o the object
     * @param key the key
     * @param v the value (any double)
     */
    public static void put(JsonObject o, String key, double v) {
        if (Double.isFinite(v)) {
            o.addProperty(key, v);
        } else {
            o.add(key, JsonNull.INSTANCE);
            if (Double.isInfinite(v)) {
                o.addProperty(key + "_unbounded", true);
            }
        }
    }

    /**
     * @param o the object
     * @param key the key
     * @param v the value when there is one; empty (not given, not applicable) is written as null
     */
    public static void put(JsonObject o, String key, OptionalDouble v) {
        if (v.isPresent()) {
            put(o, key, v.getAsDouble());
        } else {
            o.add(key, JsonNull.INSTANCE);
        }
    }

    /**
     * A list of numbers under {@code key}; non-finite entries are null, and when one of them is
     * unbounded the object also gets {@code <key>_unbounded: true}.
     * @param o the object
     * @param key the key
     * @param values the values
     */
    public static void putAll(JsonObject o, String key, double[] values) {
        JsonArray a = new JsonArray();
        boolean unbounded = false;
        for (double v : values) {
            if (Double.isFinite(v)) {
                a.add(v);
            } else {
                a.add(JsonNull.INSTANCE);
                unbounded |= Double.isInfinite(v);
            }
        }
        o.add(key, a);
        if (unbounded) {
            o.addProperty(key + "_unbounded", true);
        }
    }

    /**
     * @param e the tree
     * @return pretty-printed strict JSON and a final line break
     */
    public static String write(JsonElement e) {
        return new GsonBuilder().setPrettyPrinting().serializeNulls().disableHtmlEscaping()
                .setStrictness(Strictness.STRICT).create().toJson(e) + "\n";
    }
}
