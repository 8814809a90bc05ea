package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.OptionalDouble;
import java.util.Set;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.RobustnessAnalysis;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.ToleranceRanges.FrequencyBasis;
import org.counterpoise.core.robust.ToleranceRanges.Range;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.export.RobustnessJson;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The ranges a design must hold over in the project file (docs/project-file.md, format 2): the
 * damping range and the structure frequency basis read, checked and written back; the defaults of
 * issue 12 (structure 5 %, absorber 3 %, damping 20 %, common practice, no source) marked in the
 * JSON; and the migration of version-1 files, whose absent method still means equal-peak.
 */
class ToleranceRangesFileTest {
    /** An invented scenario, in the newest format, with a robustness section to fill. */
    private static final String V2 = """
            {"format_version": 2, "name": "invented ranges scenario",
             "structure": {"mass": {"value": 1000, "unit": "kg"}, "natural_frequency": {"value": 10, "unit": "Hz"},
                           "damping": {"ratio": 0.02}},
             "disturbance": {"kind": "force", "amplitude": {"value": 100, "unit": "N"},
                             "frequency": {"value": 600, "unit": "rpm"}},
             "absorber": {"mass_ratio": 0.05, "method": "equal-peak", "response": "displacement"},
             "robustness": {ROBUSTNESS}}
            """;
    private static final Path KEPT_V1 = Path.of("src/test/resources/golden/v1-project.json");
    private static final Path KEPT_V1_WRITTEN = Path.of("src/test/resources/golden/v1-project-written.json");

    private static Project read(String robustness) {
        LoadedProject loaded = ProjectReader.read(new StringReader(V2.replace("ROBUSTNESS", robustness)));
        assertEquals(0, loaded.unknownFields().size(), loaded.unknownFields().toString());
        return loaded.project();
    }

    @Test
    void eachNewKeyIsReadAsTypedAndTheRestTakeTheirDefaults() {
        Project p = read("\"absorber_damping_range\": 15, \"structure_frequency_basis\": \"measured\"");
        RobustnessInput.Ranges typed = p.robustness().ranges();
        assertEquals(OptionalDouble.of(15), typed.dampingPercent());
        assertEquals(FrequencyBasis.MEASURED, typed.basis());
        assertEquals(OptionalDouble.empty(), typed.structurePercent(), "an absent range stays empty");
        assertEquals(OptionalDouble.empty(), typed.absorberPercent());

        ToleranceRanges r = p.toRobustness().ranges();
        assertEquals(0.15, r.damping(), 1e-15);
        assertEquals(FrequencyBasis.MEASURED, r.structureBasis());
        // Issue 12's defaults, common practice with no source: structure 5 %, absorber 3 %.
        assertEquals(0.05, r.structure(), 1e-15);
        assertEquals(0.03, r.absorber(), 1e-15);
        assertEquals(Set.of(Range.STRUCTURE_FREQUENCY, Range.ABSORBER_FREQUENCY), r.defaulted());
    }

    @Test
    void everyBasisTokenOfTheDocsIsRead() {
        // docs/project-file.md lists these four tokens
        String[] tokens = {"not-stated", "estimated", "calculated", "measured"};
        FrequencyBasis[] meant = {FrequencyBasis.NOT_STATED, FrequencyBasis.ESTIMATED, FrequencyBasis.CALCULATED,
            FrequencyBasis.MEASURED};
        for (int i = 0; i < tokens.length; i++) {
            Project p = read("\"structure_frequency_basis\": \"" + tokens[i] + "\"");
            assertEquals(meant[i], p.toRobustness().ranges().structureBasis(), tokens[i]);
        }
    }

    @Test
    void statedRangesAreWrittenBackAndEmptyOnesStayAbsent(@TempDir Path dir) throws IOException {
        Project p = read("\"structure_mistuning\": 7.5, \"absorber_damping_range\": 25,"
                + " \"structure_frequency_basis\": \"calculated\"");
        Path saved = dir.resolve("saved.json");
        ProjectWriter.save(p, saved);
        JsonObject r = JsonParser.parseString(Files.readString(saved)).getAsJsonObject().getAsJsonObject("robustness");
        assertEquals(7.5, r.get("structure_mistuning").getAsDouble());
        assertEquals(25, r.get("absorber_damping_range").getAsDouble());
        assertEquals("calculated", r.get("structure_frequency_basis").getAsString());
        assertFalse(r.has("absorber_mistuning"), "an empty range is not written as a number");
        assertEquals(p, ProjectReader.read(saved).project());

        Project none = read("\"seed\": 3");
        String text = ProjectWriter.toJson(none);
        for (String key : new String[] {"structure_mistuning", "absorber_mistuning", "absorber_damping_range",
            "structure_frequency_basis"}) {
            assertFalse(text.contains(key), key + " was not stated, so it is not written: " + text);
        }
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"structure_mistuning\": -1|robustness.structure_mistuning: -1 is not allowed; percent each way, from 0 to 50",
        "\"structure_mistuning\": 60|robustness.structure_mistuning: 60 is not allowed; percent each way, from 0 to 50",
        "\"absorber_mistuning\": 50.5|robustness.absorber_mistuning: 50.5 is not allowed; percent each way, from 0 to 50",
        "\"absorber_damping_range\": -5|robustness.absorber_damping_range: -5 is not allowed; percent each way, from 0 to 90",
        "\"absorber_damping_range\": 95|robustness.absorber_damping_range: 95 is not allowed; percent each way, from 0 to 90",
        "\"structure_frequency_basis\": \"guessed\"|robustness.structure_frequency_basis: \"guessed\" is not allowed; one of"
                + " not-stated, estimated, calculated, measured",
        "\"absorber_damping_range\": \"20 %\"|robustness.absorber_damping_range: \"20 %\" is not allowed; must be a number",
    })
    void badRangesAreRefusedNamingTheFieldAndWhatIsAllowed(String robustness, String message) {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> ProjectReader.read(new StringReader(V2.replace("ROBUSTNESS", robustness))).project().toStudy());
        assertEquals(message, e.getMessage());
    }

    @Test
    void anAbsentMethodMeansEqualPeakInVersionOneAndTheRecommendedMethodInVersionTwo() {
        String noMethod = V2.replace("\"method\": \"equal-peak\", ", "").replace("ROBUSTNESS", "");
        assertEquals(DesignMethod.ROBUST_WORST_CASE, DesignMethod.RECOMMENDED);
        assertEquals(DesignMethod.RECOMMENDED,
                ProjectReader.read(new StringReader(noMethod)).project().absorber().method());
        String v1 = noMethod.replace("\"format_version\": 2", "\"format_version\": 1");
        assertEquals(DesignMethod.EQUAL_PEAK, ProjectReader.read(new StringReader(v1)).project().absorber().method());
    }

    @Test
    void aKeptVersionOneFileWithoutItsMethodDesignsAsEqualPeakAndIsWrittenBackInTheCurrentFormat(@TempDir Path dir)
            throws IOException {
        String kept = Files.readString(KEPT_V1);
        assertTrue(kept.contains("\"method\": \"equal-peak\","), "the kept file states its method");
        Path noMethod = dir.resolve("no method.json");
        Files.writeString(noMethod, kept.replace("\"method\": \"equal-peak\",", ""));
        Project old = ProjectReader.read(noMethod).project();
        Project stated = ProjectReader.read(KEPT_V1).project();
        assertEquals(stated, old, "a version-1 file without a method means what it always meant");
        DesignResult a = Designer.design(old.toStudy());
        DesignResult b = Designer.design(stated.toStudy());
        assertEquals(b.tuning(), a.tuning());

        Path saved = dir.resolve("saved.json");
        ProjectWriter.save(old, saved);
        JsonObject written = JsonParser.parseString(Files.readString(saved)).getAsJsonObject();
        assertEquals(Project.FORMAT_VERSION, written.get("format_version").getAsInt());
        assertEquals(8, Project.FORMAT_VERSION);
        assertEquals("equal-peak", written.getAsJsonObject("absorber").get("method").getAsString(),
                "a file this version writes always names its method");
        assertEquals(old, ProjectReader.read(saved).project());
    }

    @Test
    void theOlderDetuningKeysOfAVersionOneFileGiveTheSameRanges() {
        // v1-project-written.json: structure_detuning 8, absorber_detuning 3, as a user's file of format 1
        ToleranceRanges r = ProjectReader.read(KEPT_V1_WRITTEN).project().toRobustness().ranges();
        assertEquals(0.08, r.structure(), 1e-15);
        assertEquals(0.03, r.absorber(), 1e-15);
        assertEquals(Set.of(Range.ABSORBER_DAMPING), r.defaulted(), "the damping range was not stated then");
        assertEquals(FrequencyBasis.NOT_STATED, r.structureBasis());
    }

    @Test
    void aNewerFormatIsRefusedWithAPlainMessage() {
        String newer = V2.replace("\"format_version\": 2", "\"format_version\": 9").replace("ROBUSTNESS", "");
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> ProjectReader.read(new StringReader(newer)));
        assertEquals("format_version", e.field());
        assertEquals("format_version: 9 is not allowed; this file was written by a newer Counterpoise; this version"
                + " of Counterpoise reads format_version 1 to 8", e.getMessage());
    }

    @Test
    void theJsonMarksEachRangeStatedOrDefault() {
        Project p = read("\"absorber_mistuning\": 4, \"structure_frequency_basis\": \"estimated\"");
        DesignResult design = Designer.design(p.toStudy());
        RobustnessResult r = RobustnessAnalysis.run(design, p.toRobustness().withSampling(200, 1));
        for (JsonObject json : new JsonObject[] {
            JsonParser.parseString(RobustnessJson.toJson(design, r)).getAsJsonObject(),
            JsonParser.parseString(ResultJson.toJson(design)).getAsJsonObject()}) {
            assertEquals(0.04, json.get("absorber_mistuning_range").getAsDouble(), 1e-15);
            assertEquals("stated", json.get("absorber_mistuning_range_origin").getAsString());
            // the defaults of issue 12, common practice with no source
            assertEquals(0.05, json.get("structure_mistuning_range").getAsDouble(), 1e-15);
            assertEquals("default", json.get("structure_mistuning_range_origin").getAsString());
            assertEquals(0.20, json.get("absorber_damping_range").getAsDouble(), 1e-15);
            assertEquals("default", json.get("absorber_damping_range_origin").getAsString());
            assertEquals("estimated", json.get("structure_frequency_basis").getAsString());
        }
    }

    @Test
    void aProjectWithoutARobustnessSectionHasNoneAfterARoundTrip() {
        Project p = ProjectReader.read(new StringReader(V2.replace(",\n \"robustness\": {ROBUSTNESS}", "")))
                .project();
        assertNull(p.robustness());
        assertEquals(ToleranceRanges.DEFAULT, p.toRobustness().ranges());
        assertEquals(p, ProjectReader.read(new StringReader(ProjectWriter.toJson(p))).project());
    }
}
