package org.counterpoise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import com.google.gson.JsonPrimitive;
import com.google.gson.stream.JsonReader;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.ui.cli.Cli;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Golden results: the complete {@code --json} output of {@code design} and {@code robustness} for
 * every preset, for the project-file example in docs/project-file.md, for two kept version-1
 * project files and one kept version-2 file, and of {@code optimum} for the README's example, as stored under
 * {@code src/test/resources/golden/}. Each case runs through {@link Cli#run} in process, exactly as a
 * user's command does, and is compared key by key with the stored output.
 *
 * <p>The reference is the program's own earlier output, reviewed by a person when it was written:
 * this test does not prove the numbers right (the other tests do that against published formulas
 * and independent routes); it proves that a refactoring left them where they were. A deliberate
 * change is rewritten with
 * {@code mvn -q test -Dtest=GoldenResultTest -Dcounterpoise.golden.update=true}, reviewed in the
 * diff, and named as a fix in the commit message (DEVELOPERS.md, "Golden results").
 *
 * <p>Tolerances: every number to 1e-9 relative (floor 1e-300 absolute, for zeros), the Monte Carlo
 * summary to 1e-12 (its draws are sequential from one seeded generator and each sample's peak is a
 * pure function of its draw, so the run is independent of the thread count); strings, booleans,
 * nulls, array lengths and the set of keys exactly.
 */
class GoldenResultTest {
    /** Where the goldens live, relative to the project directory (Maven's working directory). */
    static final Path GOLDEN = Path.of("src", "test", "resources", "golden");
    /** System property that rewrites the goldens instead of comparing. */
    static final String UPDATE = "counterpoise.golden.update";

    static final double RELATIVE = 1e-9;
    static final double MONTE_CARLO_RELATIVE = 1e-12;
    static final double ABSOLUTE_FLOOR = 1e-300;

    /** The README's optimum example, as typed there (the README line breaks are ignored). */
    static final String README_OPTIMUM = "optimum --mass-ratio 0.01:0.2:5 --structure-damping 0.02 --band 0.9:1.2";

    /** Version-1 project files kept verbatim: a preset as shipped, and one written by ProjectWriter. */
    static final List<String> KEPT_V1_FILES = List.of("v1-project", "v1-project-written");

    /**
     * A version-2 project file kept verbatim: the compressor preset as shipped in format 2, sized by
     * {@code absorber.target}, which format 3 reads as a criterion to meet (docs/project-file.md).
     */
    static final List<String> KEPT_V2_FILES = List.of("v2-target");

    /**
     * One golden case.
     *
     * @param name the golden file's name without ".json"
     * @param args the command line (the project file is resolved when the case runs)
     */
    record Case(String name, List<String> args) {
        @Override
        public String toString() {
            return name;
        }
    }

    static List<Case> cases() {
        List<Case> cases = new ArrayList<>();
        for (String preset : presetNames()) {
            projectCases(cases, preset.replaceFirst("\\.json$", ""), Path.of("presets", preset).toString());
        }
        projectCases(cases, "docs-project-file-example", docsExampleFile().toString());
        for (String kept : KEPT_V1_FILES) {
            projectCases(cases, kept, GOLDEN.resolve(kept + ".json").toString());
        }
        for (String kept : KEPT_V2_FILES) {
            projectCases(cases, kept, GOLDEN.resolve(kept + ".json").toString());
        }
        List<String> optimum = new ArrayList<>(List.of(README_OPTIMUM.split(" ")));
        optimum.add("--json");
        cases.add(new Case("readme-optimum.optimum", optimum));
        return cases;
    }

    private static void projectCases(List<Case> cases, String name, String file) {
        cases.add(new Case(name + ".design", List.of("design", "--json", file)));
        cases.add(new Case(name + ".robustness", List.of("robustness", "--json", file)));
    }

    static List<String> presetNames() {
        try {
            return Files.readAllLines(Path.of("presets", "index.txt")).stream().map(String::strip)
                    .filter(l -> !l.isEmpty() && !l.startsWith("#")).toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The example project of docs/project-file.md (its first json block), written to target/. */
    static Path docsExampleFile() {
        try {
            String doc = Files.readString(Path.of("docs", "project-file.md"));
            Matcher m = Pattern.compile("```json\\R(.*?)```", Pattern.DOTALL).matcher(doc);
            assertTrue(m.find(), "docs/project-file.md has no ```json example block");
            Path file = Path.of("target", "golden-input", "docs-project-file-example.json");
            Files.createDirectories(file.getParent());
            Files.writeString(file, m.group(1));
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void outputEqualsTheGolden(Case c) throws IOException {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Cli.run(c.args().toArray(String[]::new), new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, c + ": " + String.join(" ", c.args()) + " failed: " + err);
        Path golden = GOLDEN.resolve(c.name() + ".json");
        if (Boolean.getBoolean(UPDATE)) {
            Files.createDirectories(GOLDEN);
            Files.writeString(golden, out.toString());
            return;
        }
        assertTrue(Files.exists(golden), "no golden " + golden + "; write it with mvn -q test"
                + " -Dtest=GoldenResultTest -D" + UPDATE + "=true and review it");
        List<String> differences = new ArrayList<>();
        compare("$", parse(Files.readString(golden)), parse(out.toString()), false, differences);
        if (!differences.isEmpty()) {
            fail(c + " (" + String.join(" ", c.args()) + ") differs from " + golden + " at "
                    + differences.size() + " path(s):\n  " + String.join("\n  ", differences));
        }
    }

    /** No golden file is left over from a case that no longer exists (it would never be checked). */
    @Test
    void everyGoldenFileBelongsToACase() throws IOException {
        Set<String> expected = new TreeSet<>();
        cases().forEach(c -> expected.add(c.name() + ".json"));
        KEPT_V1_FILES.forEach(k -> expected.add(k + ".json"));
        KEPT_V2_FILES.forEach(k -> expected.add(k + ".json"));
        Set<String> found = new TreeSet<>();
        try (Stream<Path> files = Files.list(GOLDEN)) {
            files.forEach(f -> found.add(f.getFileName().toString()));
        }
        found.removeAll(expected);
        assertTrue(found.isEmpty(), "golden files without a case: " + found);
    }

    /** The README's optimum example is still the one checked here. */
    @Test
    void readmeStillShowsTheOptimumExample() throws IOException {
        String readme = Files.readString(Path.of("README.md")).replaceAll("\\s+", " ");
        assertTrue(readme.contains(README_OPTIMUM), "README.md no longer shows `" + README_OPTIMUM
                + "`; update README_OPTIMUM and its golden");
    }

    /**
     * The kept project files stay version-1 files as written (a later format must migrate them on
     * load, never rewrite them here) and load without unknown fields.
     */
    @Test
    void keptVersionOneFilesStillLoadCleanly() throws IOException {
        for (String kept : KEPT_V1_FILES) {
            Path file = GOLDEN.resolve(kept + ".json");
            JsonObject raw = JsonParser.parseString(Files.readString(file)).getAsJsonObject();
            assertEquals(1, raw.get("format_version").getAsInt(), file + " must stay a version-1 file");
            LoadedProject loaded = ProjectReader.read(file);
            assertEquals(List.of(), loaded.unknownFields(), file.toString());
        }
        JsonObject written = JsonParser.parseString(Files.readString(GOLDEN.resolve("v1-project-written.json")))
                .getAsJsonObject();
        for (String section : new String[] {"notes", "structure", "disturbance", "absorber", "robustness"}) {
            assertTrue(written.has(section), "v1-project-written.json lacks " + section);
        }
        assertEquals(5, written.getAsJsonObject("robustness").getAsJsonObject("tolerances").size(),
                "v1-project-written.json fills every tolerance");
        for (String kept : KEPT_V2_FILES) {
            Path file = GOLDEN.resolve(kept + ".json");
            JsonObject raw = JsonParser.parseString(Files.readString(file)).getAsJsonObject();
            assertEquals(2, raw.get("format_version").getAsInt(), file + " must stay a version-2 file");
            assertTrue(raw.getAsJsonObject("absorber").has("target"), file + " keeps its absorber.target");
            assertEquals(List.of(), ProjectReader.read(file).unknownFields(), file.toString());
        }
    }

    /** The comparison itself reports every difference, each with its path, old and new value. */
    @Test
    void comparisonListsEveryDifference() {
        JsonElement old = parse("{\"a\": 1.0, \"b\": [1, 2, 3], \"c\": \"x\", \"d\": null, \"gone\": true,"
                + " \"monte_carlo\": {\"p50\": 2.0}, \"same\": 0.0, \"e\": 5.0}");
        JsonElement now = parse("{\"a\": 1.00000001, \"b\": [1, 2], \"c\": \"y\", \"d\": 0, \"new\": 1,"
                + " \"monte_carlo\": {\"p50\": 2.00000000001}, \"same\": 0.0, \"e\": 5.000000000001}");
        List<String> differences = new ArrayList<>();
        compare("$", old, now, false, differences);
        List<String> withoutFigures = differences.stream()
                .map(d -> d.replaceFirst(" \\(relative difference .*\\)$", ""))
                .toList();
        assertEquals(List.of("$.a: was 1.0, now 1.00000001",
                "$.b: array length was 3, now 2", "$.c: was \"x\", now \"y\"", "$.d: was null, now 0",
                "$.gone: missing now (was true)",
                "$.monte_carlo.p50: was 2.0, now 2.00000000001", "$.new: extra now (1)"), withoutFigures);
    }

    /** Parses leniently, so that a bare NaN or Infinity in an output is still compared, not refused. */
    static JsonElement parse(String text) {
        JsonReader reader = new JsonReader(new StringReader(text));
        reader.setLenient(true);
        return JsonParser.parseReader(reader);
    }

    /**
     * Collects every difference between old and new below a path.
     *
     * @param path JSON path of the two values
     * @param old the golden value
     * @param now the value computed now
     * @param monteCarlo true inside the Monte Carlo summary (tighter tolerance)
     * @param differences where the differences go, one line each
     */
    static void compare(String path, JsonElement old, JsonElement now, boolean monteCarlo, List<String> differences) {
        if (old.isJsonObject() && now.isJsonObject()) {
            JsonObject o = old.getAsJsonObject();
            JsonObject n = now.getAsJsonObject();
            Set<String> keys = new TreeSet<>(o.keySet());
            keys.addAll(n.keySet());
            for (String key : keys) {
                String p = path + "." + key;
                if (!n.has(key)) {
                    differences.add(p + ": missing now (was " + o.get(key) + ")");
                } else if (!o.has(key)) {
                    differences.add(p + ": extra now (" + n.get(key) + ")");
                } else {
                    compare(p, o.get(key), n.get(key), monteCarlo || key.equals("monte_carlo"), differences);
                }
            }
        } else if (old.isJsonArray() && now.isJsonArray()) {
            JsonArray o = old.getAsJsonArray();
            JsonArray n = now.getAsJsonArray();
            if (o.size() != n.size()) {
                differences.add(path + ": array length was " + o.size() + ", now " + n.size());
            }
            for (int i = 0; i < Math.min(o.size(), n.size()); i++) {
                compare(path + "[" + i + "]", o.get(i), n.get(i), monteCarlo, differences);
            }
        } else if (old.isJsonPrimitive() && now.isJsonPrimitive()) {
            JsonPrimitive o = old.getAsJsonPrimitive();
            JsonPrimitive n = now.getAsJsonPrimitive();
            if (o.isNumber() && n.isNumber()) {
                double a = o.getAsDouble();
                double b = n.getAsDouble();
                if (!close(a, b, monteCarlo ? MONTE_CARLO_RELATIVE : RELATIVE)) {
                    differences.add(path + ": was " + o + ", now " + n + " (relative difference "
                            + Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b)) + ")");
                }
            } else if (!o.equals(n) || o.isNumber() != n.isNumber()) {
                differences.add(path + ": was " + o + ", now " + n);
            }
        } else if (!(old.isJsonNull() && now.isJsonNull())) {
            differences.add(path + ": was " + old + ", now " + now);
        }
    }

    /** Equal to a relative tolerance, with an absolute floor for zeros; non-finite values exactly. */
    static boolean close(double a, double b, double relative) {
        if (!Double.isFinite(a) || !Double.isFinite(b)) {
            return Double.compare(a, b) == 0;
        }
        return Math.abs(a - b) <= Math.max(relative * Math.max(Math.abs(a), Math.abs(b)), ABSOLUTE_FLOOR);
    }
}
