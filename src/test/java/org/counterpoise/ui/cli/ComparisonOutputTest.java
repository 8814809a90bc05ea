package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.MethodComparison;
import org.counterpoise.core.design.MethodComparison.Candidate;
import org.counterpoise.core.design.RunUpStroke;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.runup.RunUp;
import org.counterpoise.core.runup.SpeedRamp;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The comparison of methods as {@code design} prints it: the JSON array's keys and values, and the text. */
class ComparisonOutputTest {
    private static final Set<String> CANDIDATE_KEYS = Set.of("method", "mass_ratio", "tuning_ratio",
            "absorber_damping_ratio", "nominal_peak", "worst_case_peak", "p95_peak", "peak_stroke_m",
            "peak_stroke_run_up_m", "peak_stroke_run_up_basis", "peak_spring_force_N", "constraints_applied",
            "recommended", "chosen");

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"rooftop-fan-platform", "compressor-frame-speed-band", "blower-frame-single-speed"})
    void theJsonComparisonHoldsEveryCandidatesFiguresAndTheTopLevelStaysTheChosenDesign(String preset) {
        Path file = Path.of("presets", preset + ".json");
        CliTest.Run run = CliTest.run("design", file.toString(), "--json");
        assertEquals(0, run.code(), run.err());
        JsonObject json = JsonParser.parseString(run.out()).getAsJsonObject();
        DesignDossier dossier = DesignDossier.of(ProjectReader.read(file).project().toStudy());
        DesignResult design = dossier.design();
        MethodComparison c = dossier.comparison(ProgressListener.NONE);
        JsonArray array = json.getAsJsonArray("comparison");
        assertEquals(c.candidates().size(), array.size());
        int recommended = 0;
        int chosen = 0;
        for (int i = 0; i < array.size(); i++) {
            JsonObject o = array.get(i).getAsJsonObject();
            Candidate k = c.candidates().get(i);
            for (String key : CANDIDATE_KEYS) {
                assertTrue(o.has(key), key);
            }
            assertEquals(k.method().id(), o.get("method").getAsString());
            assertNumber(k.tuning().massRatio(), o.get("mass_ratio"));
            assertNumber(k.tuning().tuningRatio(), o.get("tuning_ratio"));
            assertNumber(k.tuning().dampingRatio(), o.get("absorber_damping_ratio"));
            assertNumber(k.nominalPeak().value(), o.get("nominal_peak"));
            assertNumber(k.worstPeak(), o.get("worst_case_peak"));
            assertNumber(k.p95(), o.get("p95_peak"));
            assertNumber(k.strokeInBand().value(), o.get("peak_stroke_m"));
            assertNumber(k.strokeRunUp().peak().value(), o.get("peak_stroke_run_up_m"));
            // a project that states its run-up rate gets the integrated run-up; one that does not, the steady state
            assertEquals(ProjectReader.read(file).project().runUpRate().isPresent() ? "transient" : "steady-state",
                    o.get("peak_stroke_run_up_basis").getAsString());
            assertNumber(k.springForce().value(), o.get("peak_spring_force_N"));
            assertTrue(o.get("worst_case_peak").getAsDouble() > 0, "a real figure");
            recommended += o.get("recommended").getAsBoolean() ? 1 : 0;
            chosen += o.get("chosen").getAsBoolean() ? 1 : 0;
            assertEquals(k.method() == c.chosen(), o.get("chosen").getAsBoolean());
        }
        assertEquals(1, recommended);
        assertEquals(1, chosen);
        assertEquals(c.recommended().id(), json.get("recommended_method").getAsString());
        assertEquals("least-worst-case", json.get("recommendation_reason").getAsString());
        // The top-level design fields stay those of the chosen design.
        assertEquals(design.study().method().id(), json.get("method").getAsString());
        assertNumber(design.tuning().tuningRatio(), json.get("tuning_ratio"));
        JsonArray leftOut = json.getAsJsonArray("comparison_left_out");
        assertEquals(c.leftOut().size(), leftOut.size());
        for (int i = 0; i < leftOut.size(); i++) {
            JsonObject o = leftOut.get(i).getAsJsonObject();
            assertEquals(c.leftOut().get(i).method().id(), o.get("method").getAsString());
            assertEquals(c.leftOut().get(i).reason().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'),
                    o.get("reason").getAsString());
        }
    }

    private static void assertNumber(double expected, JsonElement actual) {
        assertEquals(expected, actual.getAsDouble(), 1e-12 * Math.abs(expected));
    }

    @Test
    void theTextReportHasTheComparisonSection(@TempDir Path dir) throws Exception {
        // the shipped preset uses the recommended method; here the project chooses exact-peak explicitly
        String text = Files.readString(Path.of("presets/compressor-frame-speed-band.json"));
        assertTrue(text.contains("\"method\": \"robust-worst-case\""));
        Path file = dir.resolve("exact.json");
        Files.writeString(file, text.replace("\"method\": \"robust-worst-case\"", "\"method\": \"exact-peak\""));
        CliTest.Run run = CliTest.run("design", file.toString());
        assertEquals(0, run.code(), run.err());
        List<String> lines = run.out().lines().toList();
        int at = lines.indexOf(lines.stream().filter(l -> l.startsWith("Method comparison")).findFirst().orElseThrow());
        assertTrue(lines.get(at + 1).contains("Worst case"));
        assertTrue(lines.get(at + 3).contains("exact-peak (chosen)"), lines.get(at + 3));
        assertTrue(lines.get(at + 4).contains("robust-worst-case (recommended)"), lines.get(at + 4));
        assertTrue(run.out().contains("The design shown is exact-peak, as the project chose"));
        assertFalse(run.out().contains("NaN") || run.out().contains("Infinity"));
    }

    /** A run-up rate in the project file reaches the core study and makes the run-up stroke a time integration. */
    @Test
    void aRunUpRateInTheFileGivesTheTransientRunUpStroke(@TempDir Path dir) throws Exception {
        String text = Files.readString(Path.of("presets/rooftop-fan-platform.json"))
                .replace("\"harmonic_order\"", "\"run_up_rate\": {\"value\": 30, \"unit\": \"rpm/s\"},\n    \"harmonic_order\"");
        Path file = dir.resolve("ramped.json");
        Files.writeString(file, text);
        Project p = ProjectReader.read(file).project();
        double order = p.disturbance().harmonicOrder();
        assertEquals(Unit.RPM_PER_SECOND.toSi(30) * order, p.toExcitation().runUpRate().orElseThrow(), 1e-12);
        CliTest.Run run = CliTest.run("design", file.toString(), "--json");
        assertEquals(0, run.code(), run.err());
        JsonObject json = JsonParser.parseString(run.out()).getAsJsonObject();
        DesignResult design = DesignDossier.of(p.toStudy()).design();
        double direct = RunUp.simulate(design.study().structure(), design.tuning(), design.study().excitation().kind(),
                design.study().excitation().amplitude(), SpeedRamp.runUp(1.25 * design.study().excitation().band().high(),
                        Unit.RPM_PER_SECOND.toSi(30) * order), RunUp.Start.REST, ProgressListener.NONE)
                .peak(ResponseKind.STROKE).orElseThrow().value();
        for (JsonElement e : json.getAsJsonArray("comparison")) {
            JsonObject o = e.getAsJsonObject();
            assertEquals("transient", o.get("peak_stroke_run_up_basis").getAsString());
            if (o.get("chosen").getAsBoolean()) {
                assertNumber(direct, o.get("peak_stroke_run_up_m"));
            }
        }
        assertEquals(RunUpStroke.Basis.TRANSIENT, design.runUpStroke().basis());
    }
}
