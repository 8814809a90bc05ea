package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.SeveralAbsorbersContent;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
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

    /**
     * Each absorber's figures within the set ({@code in_set}) against an independent route: the
     * equations of motion of the whole structure with the absorbers the JSON gives, solved as a dense
     * complex system by Commons Math's LU ({@link ModalDirectSolve}), swept densely and refined by golden
     * section ({@link DenseSweep}), to 1e-7: the stroke's peak over the band and from rest, the spring
     * force k |stroke|, the damper force c omega |stroke|, the damper velocity omega |stroke|, and the
     * clearance, the stroke margin (1.5 in the preset) times the larger stroke.
     */
    @Test
    void theJsonGivesEachAbsorbersFiguresWithinTheSet() {
        Project p = ProjectReader.read(Path.of(GALLERY)).project();
        AbsorberLayout layout = SeveralModes.layout(p).orElseThrow();
        SeveralAbsorbers core = SeveralAbsorbersDesigner.design(Designer.design(p.toStudy()), layout);
        CliTest.Run json = CliTest.run("design", "--json", GALLERY);
        assertEquals(0, json.code(), json.err());
        JsonObject s = JsonParser.parseString(json.out()).getAsJsonObject().getAsJsonObject("several_absorbers");
        JsonArray absorbers = s.getAsJsonArray("absorbers");
        JsonArray inSet = s.getAsJsonArray("in_set");
        assertEquals(absorbers.size(), inSet.size());
        List<PointAbsorber> given = new ArrayList<>();
        for (int j = 0; j < absorbers.size(); j++) {
            JsonObject o = absorbers.get(j).getAsJsonObject();
            given.add(new PointAbsorber(layout.absorberPoint(), o.get("mass_kg").getAsDouble(),
                    o.get("stiffness_N_per_m").getAsDouble(), o.get("damping_Ns_per_m").getAsDouble()));
        }
        double low = core.band().low();
        double high = core.band().high();
        for (int j = 0; j < given.size(); j++) {
            int index = j;
            PointAbsorber a = given.get(j);
            JsonObject o = inSet.get(j).getAsJsonObject();
            DoubleUnaryOperator stroke = w -> core.forceAmplitude() * ModalDirectSolve.solve(layout.structure().modes(),
                    given, layout.excitationPoint(), layout.responsePoint(), w)[1 + index].abs();
            double inBand = DenseSweep.maximum(stroke, low, high, 20_000);
            double fromRest = DenseSweep.maximum(stroke, 0.0, high, 20_000);
            assertEquals(inBand, o.get("stroke_in_band_m").getAsDouble(), 1e-7 * inBand, "absorber " + j);
            assertEquals(fromRest, o.get("stroke_from_rest_m").getAsDouble(), 1e-7 * fromRest, "absorber " + j);
            assertEquals(1.5 * Math.max(inBand, fromRest), o.get("clearance_m").getAsDouble(), 1e-7 * fromRest);
            double spring = DenseSweep.maximum(w -> a.stiffness() * stroke.applyAsDouble(w), low, high, 20_000);
            assertEquals(spring, o.get("spring_force_N").getAsDouble(), 1e-7 * spring, "absorber " + j);
            double damper = DenseSweep.maximum(w -> a.damping() * w * stroke.applyAsDouble(w), low, high, 20_000);
            assertEquals(damper, o.get("damper_force_N").getAsDouble(), 1e-7 * damper, "absorber " + j);
            double velocity = DenseSweep.maximum(w -> w * stroke.applyAsDouble(w), 0.0, high, 20_000);
            assertEquals(velocity, o.get("damper_velocity_m_per_s").getAsDouble(), 1e-7 * velocity, "absorber " + j);
            double lowFactor = o.get("tolerated_own_frequency_factor_low").getAsDouble();
            assertTrue(lowFactor > 0.8 && lowFactor < 1.0, "a tolerance below its own frequency: " + lowFactor);
        }
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
