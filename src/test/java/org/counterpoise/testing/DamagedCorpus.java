package org.counterpoise.testing;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import com.google.gson.JsonPrimitive;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.Consumer;
import java.util.zip.GZIPOutputStream;

/**
 * Generates the damaged-input corpus under src/test/resources/damaged/generated (project files)
 * and damaged/cases-generated (CSV files for {@code optimum --cases}) from two shipped presets,
 * by rule: every leaf given a wrong type, every unit a wrong or unknown one, every quantity an
 * implausible magnitude, truncations, re-encodings, binary data, nesting, duplicate keys,
 * trailing text and tokens JSON does not have. Deterministic (fixed seed), so the committed files
 * are exactly what this produces; DamagedInputTest checks that they match.
 *
 * <p>Regenerate as src/test/resources/damaged/README.md says. Hand-written cases live in
 * damaged/hand and damaged/cases-hand and are not touched.
 */
public final class DamagedCorpus {
    /** Where the generated project files go, relative to the project folder. */
    public static final Path PROJECTS = Path.of("src/test/resources/damaged/generated");
    /** Where the generated CSV case files go. */
    public static final Path CASES = Path.of("src/test/resources/damaged/cases-generated");

    private static final String[] BASES = {"presets/pump-skid-mezzanine.json", "presets/rooftop-fan-platform.json"};

    private DamagedCorpus() {
    }

    /**
     * Writes the corpus, replacing the generated folders' contents.
     * @param args unused
     * @throws IOException when a file cannot be written
     */
    public static void main(String[] args) throws IOException {
        write(PROJECTS, projects());
        write(CASES, cases());
    }

    private static void write(Path dir, Map<String, byte[]> files) throws IOException {
        Files.createDirectories(dir);
        try (var old = Files.list(dir)) {
            for (Path p : old.toList()) {
                Files.delete(p);
            }
        }
        for (var e : files.entrySet()) {
            Files.write(dir.resolve(e.getKey()), e.getValue());
        }
    }

    /**
     * @return file name to content, for the project commands
     * @throws IOException when a preset cannot be read
     */
    public static Map<String, byte[]> projects() throws IOException {
        Map<String, byte[]> out = new LinkedHashMap<>();
        for (String base : BASES) {
            String text = Files.readString(Path.of(base));
            String tag = base.contains("pump") ? "pump" : "fan";
            JsonObject root = JsonParser.parseString(text).getAsJsonObject();
            // Truncated: cut at 12 places spread over the file (never the whole file).
            byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
            for (int i = 0; i < 12; i++) {
                int cut = (int) ((long) bytes.length * i / 12) + 1;
                out.put(tag + "-truncated-at-" + cut + ".json", java.util.Arrays.copyOf(bytes, cut));
            }
            for (String path : leaves(root, "")) {
                JsonElement v = get(root, path);
                String name = path.replace('.', '_');
                if (path.endsWith("unit")) {
                    String dimension = path.contains("mass") && !path.contains("ratio") || path.contains("absolute")
                            ? "Hz" : "kg";
                    out.put(tag + "-unit-other-dimension-" + name + ".json", edit(root, path, new JsonPrimitive(dimension)));
                    out.put(tag + "-unit-unknown-" + name + ".json", edit(root, path, new JsonPrimitive("furlong")));
                    out.put(tag + "-unit-empty-" + name + ".json", edit(root, path, new JsonPrimitive("")));
                    out.put(tag + "-unit-number-" + name + ".json", edit(root, path, new JsonPrimitive(3)));
                } else if (v.getAsJsonPrimitive().isNumber()) {
                    out.put(tag + "-type-text-for-number-" + name + ".json", edit(root, path, new JsonPrimitive("12")));
                    out.put(tag + "-type-list-for-number-" + name + ".json", edit(root, path, list(1)));
                    out.put(tag + "-type-bool-for-number-" + name + ".json", edit(root, path, new JsonPrimitive(true)));
                    if (!path.equals("format_version")) {
                        out.put(tag + "-magnitude-1e300-" + name + ".json", edit(root, path, new JsonPrimitive(1e300)));
                    }
                    if (!path.equals("format_version") && !path.endsWith("seed")) { // a negative seed is a seed
                        out.put(tag + "-magnitude-negative-" + name + ".json", edit(root, path, new JsonPrimitive(-1)));
                    }
                    if (path.endsWith("value") || path.endsWith("mass_ratio")) {
                        out.put(tag + "-magnitude-1e-300-" + name + ".json",
                                edit(root, path, new JsonPrimitive(1e-300)));
                    }
                } else if (v.getAsJsonPrimitive().isString()) {
                    out.put(tag + "-type-number-for-text-" + name + ".json", edit(root, path, new JsonPrimitive(42)));
                    out.put(tag + "-type-object-for-text-" + name + ".json", edit(root, path, new JsonObject()));
                } else {
                    out.put(tag + "-type-text-for-bool-" + name + ".json", edit(root, path, new JsonPrimitive("yes")));
                }
            }
            // A quantity given as a bare number, and a required section missing or of the wrong shape.
            out.put(tag + "-quantity-as-bare-number.json", edit(root, "disturbance.amplitude", new JsonPrimitive(600)));
            for (String section : new String[] {"structure", "disturbance", "absorber"}) {
                out.put(tag + "-missing-" + section + ".json", remove(root, section));
                out.put(tag + "-list-for-" + section + ".json", edit(root, section, list(1, 2)));
            }
            out.put(tag + "-missing-format-version.json", remove(root, "format_version"));
            out.put(tag + "-format-version-1.5.json", edit(root, "format_version", new JsonPrimitive(1.5)));
            out.put(tag + "-format-version-newer.json", edit(root, "format_version", new JsonPrimitive(99)));
            out.put(tag + "-format-version-zero.json", edit(root, "format_version", new JsonPrimitive(0)));
            // Encodings.
            out.put(tag + "-utf16le-bom.json", concat(new byte[] {(byte) 0xff, (byte) 0xfe},
                    text.getBytes(StandardCharsets.UTF_16LE)));
            out.put(tag + "-utf16be-bom.json", concat(new byte[] {(byte) 0xfe, (byte) 0xff},
                    text.getBytes(StandardCharsets.UTF_16BE)));
            out.put(tag + "-utf16le-no-bom.json", text.getBytes(StandardCharsets.UTF_16LE));
            out.put(tag + "-utf32.json", text.getBytes(Charset.forName("UTF-32")));
            out.put(tag + "-latin1-accented-name.json", text.replace("\"name\": \"", "\"name\": \"Caf\u00e9 ")
                    .getBytes(StandardCharsets.ISO_8859_1));
            out.put(tag + "-utf8-bom-then-truncated.json", concat(new byte[] {(byte) 0xef, (byte) 0xbb, (byte) 0xbf},
                    java.util.Arrays.copyOf(bytes, bytes.length / 2)));
            out.put(tag + "-gzip.json", gzip(bytes));
            // Duplicate keys at every depth.
            out.put(tag + "-duplicate-top.json", text.replaceFirst("\"name\":", "\"name\": \"twice\", \"name\":")
                    .getBytes(StandardCharsets.UTF_8));
            out.put(tag + "-duplicate-in-structure.json", text.replaceFirst("\"structure\": \\{",
                    "\"structure\": {\"mode_shape_at_absorber\": 1,").getBytes(StandardCharsets.UTF_8));
            out.put(tag + "-duplicate-in-quantity.json", text.replaceFirst("\"value\":", "\"value\": 5, \"value\":")
                    .getBytes(StandardCharsets.UTF_8));
            // Trailing content after the object.
            String[] trailers = {"x", "{}", ",", "]", "// end", "\n{\"format_version\": 1}", "null"};
            for (int i = 0; i < trailers.length; i++) {
                out.put(tag + "-trailing-" + (i + 1) + ".json", (text + trailers[i]).getBytes(StandardCharsets.UTF_8));
            }
            // Words and number forms JSON does not have, in place of a number.
            String[] tokens = {"NaN", "Infinity", "-Infinity", "0x10", "007", "+5", ".5", "5.", "1e", "--1"};
            for (int i = 0; i < tokens.length; i++) {
                out.put(tag + "-token-" + (i + 1) + ".json", text.replaceFirst("\"value\": [0-9.]+",
                        "\"value\": " + tokens[i]).getBytes(StandardCharsets.UTF_8));
            }
            out.put(tag + "-number-overflows.json", text.replaceFirst("\"value\": [0-9.]+", "\"value\": 1e400")
                    .getBytes(StandardCharsets.UTF_8));
            out.put(tag + "-number-huge-exponent.json", text.replaceFirst("\"value\": [0-9.]+",
                    "\"value\": 1e99999999999").getBytes(StandardCharsets.UTF_8));
            // Lenient-JSON habits a strict reader refuses.
            out.put(tag + "-single-quotes.json", text.replace('"', '\'').getBytes(StandardCharsets.UTF_8));
            out.put(tag + "-unquoted-keys.json", text.replaceAll("\"([a-z_]+)\":", "$1:").getBytes(StandardCharsets.UTF_8));
            out.put(tag + "-trailing-comma.json", text.replaceFirst("\n}\\s*$", ",\n}\n").getBytes(StandardCharsets.UTF_8));
            out.put(tag + "-comment.json", text.replaceFirst("\\{", "{ /* note */").getBytes(StandardCharsets.UTF_8));
            // Control characters in texts: raw (not JSON) and escaped (JSON, but refused in a name).
            out.put(tag + "-raw-escape-in-name.json", text.replaceFirst("\"name\": \"", "\"name\": \"\u001b[31m")
                    .getBytes(StandardCharsets.UTF_8));
            out.put(tag + "-escaped-escape-in-name.json", text.replaceFirst("\"name\": \"", "\"name\": \"\\\\u001b[2J")
                    .getBytes(StandardCharsets.UTF_8));
            out.put(tag + "-escape-in-unit.json", text.replaceFirst("\"unit\": \"", "\"unit\": \"\\\\u001b]0;x\\\\u0007")
                    .getBytes(StandardCharsets.UTF_8));
        }
        // Deep nesting, whole-file shapes, binary.
        out.put("deep-arrays-100000.json", "[".repeat(100_000).getBytes(StandardCharsets.US_ASCII));
        out.put("deep-objects-200.json", ("{\"format_version\": 1, \"notes\": " + "{\"a\": ".repeat(200) + "1"
                + "}".repeat(200) + "}").getBytes(StandardCharsets.US_ASCII));
        out.put("deep-inside-structure.json", ("{\"format_version\": 1, \"structure\": " + "[".repeat(5000)
                + "]".repeat(5000) + "}").getBytes(StandardCharsets.US_ASCII));
        String[] shapes = {"", " \n\t ", "null", "[]", "42", "\"text\"", "true", "{}", "{\"format_version\": 1}", "{",
            "}", "[{}]"};
        for (int i = 0; i < shapes.length; i++) {
            out.put("shape-" + (i + 1) + ".json", shapes[i].getBytes(StandardCharsets.UTF_8));
        }
        Random random = new Random(20261203L);
        for (int i = 0; i < 6; i++) {
            byte[] noise = new byte[64 << i];
            random.nextBytes(noise);
            out.put("binary-random-" + noise.length + ".json", noise);
        }
        out.put("binary-zeros.json", new byte[4096]);
        out.put("binary-png-header.json", new byte[] {(byte) 0x89, 'P', 'N', 'G', 13, 10, 26, 10, 0, 0, 0, 13});
        out.put("utf8-overlong-slash.json", concat("{\"name\": \"".getBytes(StandardCharsets.US_ASCII),
                new byte[] {(byte) 0xc0, (byte) 0xaf, '"', '}'}));
        out.put("utf8-encoded-surrogate.json", concat("{\"name\": \"".getBytes(StandardCharsets.US_ASCII),
                new byte[] {(byte) 0xed, (byte) 0xa0, (byte) 0x80, '"', '}'}));
        out.put("utf8-cut-sequence-at-end.json", concat("{\"name\": \"".getBytes(StandardCharsets.US_ASCII),
                new byte[] {(byte) 0xe2, (byte) 0x82}));
        return out;
    }

    /**
     * @return file name to content, CSV for {@code optimum --cases}
     */
    public static Map<String, byte[]> cases() {
        Map<String, byte[]> out = new LinkedHashMap<>();
        String h = "mass_ratio,structure_damping_ratio,band_low,band_high\n";
        String[] bodies = {"", "\n\n", h, "0.05,0.02\n", "structure_damping_ratio\n0.02\n", h + "0.05,0.02,0.9\n",
            h + "NaN,0,,\n", h + "Infinity,0,,\n", h + "0.05,NaN,,\n", h + "0.05,0,0.9,Infinity\n",
            h + "1e-300,0,,\n", h + "1e300,0,,\n", h + "-0.05,0,,\n", h + "0,0,,\n", h + "abc,0,,\n",
            h + "0.05,-0.1,,\n", h + "0.05,0,1.1,0.9\n", h + "0.05,0,-1,2\n", h + "0.05,0,0x1,2\n",
            h + "0.05;0.02;0.9;1.1\n", "mass_ratio,excitation\n0.05,wind\n", "mass_ratio,response\n0.05,stroke\n",
            "mass_ratio,response\n0.05,\u001b[31m\n", h + "0.05,0.02,0.9,1.1\n0.1,0,,\n0.2,0.02,0.9\n"};
        for (int i = 0; i < bodies.length; i++) {
            out.put("cases-" + (i + 1) + ".csv", bodies[i].getBytes(StandardCharsets.UTF_8));
        }
        String good = h + "0.05,0.02,0.9,1.1\n";
        out.put("cases-utf16.csv", concat(new byte[] {(byte) 0xff, (byte) 0xfe}, good.getBytes(StandardCharsets.UTF_16LE)));
        out.put("cases-latin1.csv", ("mass_ratio,excitation\n0.05,f\u00f6rce\n").getBytes(StandardCharsets.ISO_8859_1));
        Random random = new Random(7L);
        byte[] noise = new byte[512];
        random.nextBytes(noise);
        out.put("cases-binary.csv", noise);
        out.put("cases-zeros.csv", new byte[256]);
        return out;
    }

    private static List<String> leaves(JsonObject o, String prefix) {
        List<String> out = new ArrayList<>();
        for (var e : o.entrySet()) {
            String path = prefix.isEmpty() ? e.getKey() : prefix + "." + e.getKey();
            if (e.getValue().isJsonObject()) {
                out.addAll(leaves(e.getValue().getAsJsonObject(), path));
            } else if (e.getValue().isJsonPrimitive()) {
                out.add(path);
            }
        }
        return out;
    }

    private static JsonElement get(JsonObject root, String path) {
        JsonElement e = root;
        for (String k : path.split("\\.")) {
            e = e.getAsJsonObject().get(k);
        }
        return e;
    }

    private static byte[] edit(JsonObject root, String path, JsonElement value) {
        return change(root, path, (parentAndKey) -> ((JsonObject) parentAndKey[0]).add((String) parentAndKey[1], value));
    }

    private static byte[] remove(JsonObject root, String path) {
        return change(root, path, (parentAndKey) -> ((JsonObject) parentAndKey[0]).remove((String) parentAndKey[1]));
    }

    private static byte[] change(JsonObject root, String path, Consumer<Object[]> action) {
        JsonObject copy = root.deepCopy();
        String[] keys = path.split("\\.");
        JsonObject parent = copy;
        for (int i = 0; i < keys.length - 1; i++) {
            parent = parent.getAsJsonObject(keys[i]);
        }
        action.accept(new Object[] {parent, keys[keys.length - 1]});
        return (new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(copy) + "\n")
                .getBytes(StandardCharsets.UTF_8);
    }

    private static JsonArray list(int... values) {
        JsonArray a = new JsonArray();
        for (int v : values) {
            a.add(v);
        }
        return a;
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    private static byte[] gzip(byte[] data) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (GZIPOutputStream z = new GZIPOutputStream(bytes) {
            {
                def.setLevel(9);
            }
        }) {
            z.write(data);
        }
        byte[] out = bytes.toByteArray();
        out[4] = out[5] = out[6] = out[7] = 0; // no time stamp, so the file is the same on every run
        out[9] = 3;
        return out;
    }
}
