package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import com.google.gson.Strictness;
import com.google.gson.stream.JsonReader;
import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.counterpoise.io.export.JsonNumbers;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every command's JSON output, for every preset (and each preset with its structure made
 * undamped, where peaks at resonance are unbounded), parses with a STRICT parser: RFC 8259 has no
 * NaN or Infinity, and a lenient reader would hide them.
 */
class JsonOutputTest {
    static Stream<Path> presets() throws IOException {
        try (var files = Files.list(Path.of("presets"))) {
            return files.filter(p -> p.toString().endsWith(".json")).sorted().toList().stream();
        }
    }

    static JsonElement strict(String text) throws IOException {
        JsonReader r = new JsonReader(new StringReader(text));
        r.setStrictness(Strictness.STRICT);
        JsonElement e = JsonParser.parseReader(r);
        assertEquals(com.google.gson.stream.JsonToken.END_DOCUMENT, r.peek(), "one value and nothing after it");
        return e;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("presets")
    void designAndRobustnessJsonIsStrictJsonAlsoWhenValuesAreUnbounded(Path preset, @TempDir Path dir)
            throws IOException {
        Path undamped = dir.resolve("undamped.json");
        Files.writeString(undamped, Files.readString(preset).replaceAll("\"(ratio|loss_factor)\": [0-9.]+", "\"ratio\": 0"));
        for (Path file : List.of(preset, undamped)) {
            for (String[] command : new String[][] {{"design", "--json", file.toString()},
                {"robustness", "--json", "--samples", "300", file.toString()}}) {
                CliTest.Run r = CliTest.run(command);
                if (file == undamped && r.code() == 2) {
                    continue; // a method that needs structure damping may refuse the variant, plainly
                }
                assertEquals(0, r.code(), String.join(" ", command) + ": " + r.err());
                JsonObject o = strict(r.out()).getAsJsonObject();
                assertNoNonFiniteAndFlagsMatch(o, String.join(" ", command));
            }
        }
    }

    @Test
    void optimumJsonIsStrictJson() throws IOException {
        for (String[] command : new String[][] {{"optimum", "--mass-ratio", "0.01:0.2:4", "--json"},
            {"optimum", "--mass-ratio", "0.05", "--structure-damping", "0:0.05:3", "--objective", "variance", "--json"},
            {"optimum", "--mass-ratio", "0.05", "--band", "0.8:1.2", "--excitation", "base-acceleration",
                "--response", "relative-displacement", "--json"}}) {
            CliTest.Run r = CliTest.run(command);
            assertEquals(0, r.code(), r.err());
            JsonArray rows = strict(r.out()).getAsJsonArray();
            assertTrue(rows.size() >= 1);
            for (JsonElement row : rows) {
                assertNoNonFiniteAndFlagsMatch(row.getAsJsonObject(), String.join(" ", command));
            }
        }
    }

    @Test
    void anUnboundedValueIsNullWithAFlagAndTheWriterRefusesWhatSlipsPast() throws IOException {
        JsonObject o = new JsonObject();
        JsonNumbers.put(o, "peak", Double.POSITIVE_INFINITY);
        JsonNumbers.put(o, "sag", Double.NaN);
        JsonNumbers.putAll(o, "peaks", new double[] {1.5, Double.POSITIVE_INFINITY});
        JsonObject back = strict(JsonNumbers.write(o)).getAsJsonObject();
        assertTrue(back.get("peak").isJsonNull());
        assertTrue(back.get("peak_unbounded").getAsBoolean());
        assertTrue(back.get("sag").isJsonNull());
        assertFalse(back.has("sag_unbounded"), "not defined is not unbounded");
        assertEquals(1.5, back.getAsJsonArray("peaks").get(0).getAsDouble(), 0);
        assertTrue(back.getAsJsonArray("peaks").get(1).isJsonNull());
        assertTrue(back.get("peaks_unbounded").getAsBoolean());
        JsonObject raw = new JsonObject();
        raw.addProperty("bad", Double.NaN);
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class, () -> JsonNumbers.write(raw),
                "a NaN that bypassed JsonNumbers.put must fail loudly, not print invalid JSON");
    }

    /** Walks the tree: no number is non-finite, and every null with a _unbounded flag is consistent. */
    private static void assertNoNonFiniteAndFlagsMatch(JsonObject o, String where) {
        for (Map.Entry<String, JsonElement> e : o.entrySet()) {
            JsonElement v = e.getValue();
            if (e.getKey().endsWith("_unbounded")) {
                String key = e.getKey().substring(0, e.getKey().length() - "_unbounded".length());
                assertTrue(o.has(key), where + ": flag without its key " + key);
                assertTrue(o.get(key).isJsonNull() || o.get(key).isJsonArray(), where + ": " + key + " flagged");
            } else if (v.isJsonObject()) {
                assertNoNonFiniteAndFlagsMatch(v.getAsJsonObject(), where + "." + e.getKey());
            } else if (v.isJsonPrimitive() && v.getAsJsonPrimitive().isNumber()) {
                assertTrue(Double.isFinite(v.getAsDouble()), where + ": " + e.getKey());
            } else if (v.isJsonArray()) {
                List<JsonElement> items = new ArrayList<>();
                v.getAsJsonArray().forEach(items::add);
                for (JsonElement item : items) {
                    if (item.isJsonObject()) {
                        assertNoNonFiniteAndFlagsMatch(item.getAsJsonObject(), where + "." + e.getKey());
                    } else if (item.isJsonPrimitive() && item.getAsJsonPrimitive().isNumber()) {
                        assertTrue(Double.isFinite(item.getAsDouble()), where + ": " + e.getKey());
                    }
                }
            }
        }
    }
}
