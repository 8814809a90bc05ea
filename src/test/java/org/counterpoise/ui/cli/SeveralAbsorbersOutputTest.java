package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.SeveralAbsorbersContent;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A project of several modes and absorbers (format 6) on the command line: the text report's section,
 * the JSON's {@code several_absorbers} holding the core's figures (SI, Hz), the cautions, and the note
 * of the commands that take one absorber. The presets are invented.
 */
class SeveralAbsorbersOutputTest {
    private static final String GALLERY = "presets/gallery-floor-two-modes.json";

    @Test
    void theJsonHoldsTheCoresFiguresAndTheTextShowsTheSection() {
        Project p = ProjectReader.read(Path.of(GALLERY)).project();
        SeveralAbsorbers core = SeveralAbsorbersDesigner.design(Designer.design(p.toStudy()),
                SeveralModes.layout(p).orElseThrow());
        CliTest.Run json = CliTest.run("design", "--json", GALLERY);
        assertEquals(0, json.code(), json.err());
        JsonObject root = JsonParser.parseString(json.out()).getAsJsonObject();
        JsonObject s = root.getAsJsonObject("several_absorbers");
        assertEquals(2, s.get("count").getAsInt());
        assertEquals("individual", s.get("tuning").getAsString());
        assertEquals("display", s.get("excitation_point").getAsString());
        assertEquals("midspan", s.get("response_point").getAsString());
        assertEquals("midspan", s.get("absorber_point").getAsString());
        assertEquals("bending", s.get("target_mode").getAsString());
        assertEquals(8.2, s.get("target_mode_frequency_Hz").getAsDouble(), 1e-12);
        assertEquals(18000, s.get("target_mode_effective_mass_kg").getAsDouble(), 1e-9);
        assertEquals(900, s.get("total_mass_kg").getAsDouble(), 1e-9);
        JsonArray absorbers = s.getAsJsonArray("absorbers");
        assertEquals(2, absorbers.size());
        for (int j = 0; j < 2; j++) {
            PointAbsorber a = core.absorbers().get(j);
            JsonObject o = absorbers.get(j).getAsJsonObject();
            assertEquals(a.mass(), o.get("mass_kg").getAsDouble(), 1e-12 * a.mass());
            assertEquals(a.stiffness(), o.get("stiffness_N_per_m").getAsDouble(), 1e-12 * a.stiffness());
            assertEquals(a.damping(), o.get("damping_Ns_per_m").getAsDouble(), 1e-12 * a.damping());
            assertEquals(a.frequency() / (2 * Math.PI), o.get("frequency_Hz").getAsDouble(), 1e-12 * a.frequency());
            // zeta = c / (2 m omega), referred to the absorber's own frequency (DEVELOPERS.md, conventions)
            assertEquals(a.damping() / (2 * a.mass() * a.frequency()), o.get("damping_ratio").getAsDouble(), 1e-12);
        }
        assertEquals(core.peakBefore(), s.get("peak_displacement_before_m").getAsDouble(), 1e-12 * core.peakBefore());
        assertEquals(core.peakAfter(), s.get("peak_displacement_after_m").getAsDouble(), 1e-12 * core.peakAfter());
        JsonArray modes = s.getAsJsonArray("modes");
        assertEquals(2, modes.size());
        assertEquals("twisting", modes.get(1).getAsJsonObject().get("name").getAsString());
        assertEquals(core.modes().get(1).after(),
                modes.get(1).getAsJsonObject().get("peak_displacement_after_m").getAsDouble(), 1e-12);
        assertEquals(core.single().orElseThrow().peak(), s.get("single_absorber_peak_displacement_m").getAsDouble(),
                1e-12 * core.peakAfter());
        assertEquals(core.gain().orElseThrow(), s.get("gain").getAsDouble(), 1e-12);
        assertTrue(s.get("certified").getAsBoolean());
        assertTrue(root.get("cautions").toString().contains("Several modes: the sections other than"), json.out());

        CliTest.Run text = CliTest.run("design", GALLERY);
        assertEquals(0, text.code(), text.err());
        assertTrue(text.out().contains("Several absorbers and modes"), text.out());
        assertTrue(text.out().contains("near mode twisting"), text.out());
        assertTrue(text.out().contains("gain of the split"), text.out());
    }

    @Test
    void aProjectOfOneModeAndOneAbsorberHasNoSuchSection() {
        CliTest.Run json = CliTest.run("design", "--json", "presets/pump-skid-mezzanine.json");
        assertEquals(0, json.code(), json.err());
        assertFalse(JsonParser.parseString(json.out()).getAsJsonObject().has("several_absorbers"));
    }

    @Test
    void aBadFieldExitsTwoWithOnePlainLine(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad point.json");
        Files.writeString(bad, Files.readString(Path.of(GALLERY)).replace("\"response_point\": \"midspan\"",
                "\"response_point\": \"desk\""));
        CliTest.Run r = CliTest.run("design", bad.toString());
        assertEquals(2, r.code());
        assertEquals("error: structure.response_point: \"desk\" is not allowed; one of the points the modes name:"
                + " display, midspan", r.err().strip());
    }

    @Test
    void aMeasuredModeIsNotWrittenBesideSeveralModes(@TempDir Path dir) throws Exception {
        Path project = dir.resolve("gallery.json");
        Files.copy(Path.of(GALLERY), project);
        String before = Files.readString(project);
        CliTest.Run r = CliTest.run("identify", "presets/impact-test-floor-frf.csv", "--write-structure",
                project.toString());
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains("gives structure.modes"), r.err());
        assertEquals(before, Files.readString(project), "the project is left as it was");
    }

    @Test
    void robustnessSaysItTakesOneAbsorberAndTheSheetListsThemAll(@TempDir Path dir) throws Exception {
        CliTest.Run robustness = CliTest.run("robustness", "--json", "presets/split-mass-test-rig.json");
        assertEquals(0, robustness.code(), robustness.err());
        assertTrue(robustness.err().contains(SeveralAbsorbersContent.ONE_ABSORBER_ONLY), robustness.err());
        Path pdf = dir.resolve("sheet.pdf");
        CliTest.Run sheet = CliTest.run("sheet", "presets/split-mass-test-rig.json", "-o", pdf.toString());
        assertEquals(0, sheet.code(), sheet.err());
        try (PDDocument doc = Loader.loadPDF(Files.readAllBytes(pdf))) {
            String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(text.contains("This project has several absorbers: every absorber to build"), text);
            assertTrue(text.contains("Absorber 3 of 3: its own parts"), text);
        }
    }
}
