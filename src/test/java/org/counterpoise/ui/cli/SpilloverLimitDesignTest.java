package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.ProjectWriter;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code absorbers.spillover_limit} (format 8) on a copy of the invented gallery-floor preset: the
 * two absorbers on the bending mode keep the peak near the twisting mode within 0.75 times its peak
 * without absorbers. Checked from what {@code design --json} printed: its absorbers put on the modes
 * in the dense complex LU solve of the equations of motion (Commons Math, {@code ModalDirectSolve})
 * and swept densely give the printed peaks (band, and the twisting mode's neighbourhood from the
 * geometric mean of 8.2 and 9.1 Hz up) to 1e-8; the limit binds and is kept; the least peak with no
 * limit is the preset's own design's. Bad values and the configurations that do not take a limit are
 * refused in plain words naming the field.
 */
class SpilloverLimitDesignTest {
    private static final Path GALLERY = Path.of("presets/gallery-floor-two-modes.json");
    private static final double RPM = 2 * Math.PI / 60;
    private static final double HZ = 2 * Math.PI;

    private static Path withLimit(Path dir, String name, String limit, String method) throws IOException {
        String text = Files.readString(GALLERY).replaceFirst("\"format_version\": \\d+", "\"format_version\": 8")
                .replace("\"exact-peak\"", "\"" + method + "\"")
                .replace("\"count\": 2", "\"count\": 2, \"spillover_limit\": " + limit);
        assertTrue(text.contains("spillover_limit"), "the preset names its count as the test expects");
        Path file = dir.resolve(name);
        Files.writeString(file, text);
        return file;
    }

    private static double sweep(ModalStructure s, List<PointAbsorber> absorbers, double low, double high) {
        return DenseSweep.everyMaximum(w -> ModalDirectSolve.solve(s.modes(), absorbers, "display", "midspan", w)[0]
                .abs(), low, high, 20_000);
    }

    @Test
    void theTwistingModesPeakIsHeldAtItsLimitAndThePrintedPeaksAreTheDenseSolves(@TempDir Path dir)
            throws IOException {
        Path file = withLimit(dir, "limited.json", "0.75", "exact-peak");
        ModalStructure structure = SeveralModes.layout(ProjectReader.read(file).project()).orElseThrow().structure();
        CliTest.Run run = CliTest.run("design", "--json", file.toString());
        assertEquals(0, run.code(), run.err());
        JsonObject s = JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonObject("several_absorbers");
        assertEquals(0.75, s.get("spillover_limit_ratio").getAsDouble(), 0.0);
        assertTrue(s.get("spillover_limit_met").getAsBoolean());
        assertTrue(s.get("certified").getAsBoolean());
        List<PointAbsorber> absorbers = new ArrayList<>();
        JsonArray list = s.getAsJsonArray("absorbers");
        for (int j = 0; j < list.size(); j++) {
            JsonObject o = list.get(j).getAsJsonObject();
            absorbers.add(new PointAbsorber("midspan", o.get("mass_kg").getAsDouble(),
                    o.get("stiffness_N_per_m").getAsDouble(), o.get("damping_Ns_per_m").getAsDouble()));
        }
        double force = 400; // the preset's force at the display
        double band = force * sweep(structure, absorbers, 460 * RPM, 540 * RPM);
        assertEquals(band, s.get("peak_displacement_after_m").getAsDouble(), 1e-8 * band);
        double from = Math.sqrt(8.2 * 9.1) * HZ;
        double bare = force * sweep(structure, List.of(), from, 40 * HZ);
        double twisting = force * sweep(structure, absorbers, from, 40 * HZ);
        JsonObject mode = s.getAsJsonArray("modes").get(1).getAsJsonObject();
        assertEquals("twisting", mode.get("name").getAsString());
        assertEquals(0.75 * bare, mode.get("peak_limit_m").getAsDouble(), 1e-8 * bare);
        assertEquals(twisting, mode.get("peak_displacement_after_m").getAsDouble(), 1e-8 * twisting);
        assertEquals(0.75 * bare, twisting, 1e-5 * bare, "the limit binds, and is kept");
        assertFalse(s.getAsJsonArray("modes").get(0).getAsJsonObject().has("peak_limit_m"), "none on the target mode");
        // the least peak with no limit is the preset's own design's (golden result), and is lower
        JsonObject free = JsonParser.parseString(CliTest.run("design", "--json", GALLERY.toString()).out())
                .getAsJsonObject().getAsJsonObject("several_absorbers");
        double unlimited = free.get("peak_displacement_after_m").getAsDouble();
        assertEquals(unlimited, s.get("unlimited_peak_displacement_m").getAsDouble(), 1e-9 * unlimited);
        assertTrue(band > unlimited, band + " against " + unlimited);

        // the file keeps its limit when written and read back
        Project p = ProjectReader.read(file).project();
        Path again = dir.resolve("again.json");
        ProjectWriter.save(p, again);
        assertTrue(Files.readString(again).contains("\"spillover_limit\": 0.75"));
        assertEquals(p, ProjectReader.read(again).project());
    }

    /**
     * The site check of the limited gallery floor with its invented demo file, the bending mode's frequency
     * fitted: the targets it gives, put on the floor as measured in the dense solve, keep the twisting
     * neighbourhood within 0.75 times that floor's bare peak there; a limit no design keeps is said.
     */
    @Test
    void theSiteCheckKeepsTheLimitOnTheStructureAsMeasured(@TempDir Path dir) throws IOException {
        Path file = withLimit(dir, "limited.json", "0.75", "exact-peak");
        CliTest.Run run = CliTest.run("site-check", file.toString(), "--fitted-frf",
                "presets/gallery-floor-fitted-frf.csv", "--free-structure", "--json");
        assertEquals(0, run.code(), run.err());
        JsonObject s = JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonObject("fitted_absorbers");
        assertFalse(s.getAsJsonArray("warnings").toString().contains("SPILLOVER"), s.toString());
        double bending = s.get("target_mode_frequency_Hz").getAsDouble() * HZ;
        ModalStructure floor = SeveralModes.layout(ProjectReader.read(file).project()).orElseThrow().structure()
                .withFrequency(0, bending);
        List<PointAbsorber> targets = new ArrayList<>();
        for (var e : s.getAsJsonArray("absorbers")) {
            JsonObject a = e.getAsJsonObject();
            targets.add(PointAbsorber.tuned("midspan", 450, a.get("target_absorber_frequency_Hz").getAsDouble() * HZ,
                    a.get("design_damping_ratio").getAsDouble()));
        }
        double from = Math.sqrt(bending * 9.1 * HZ);
        double bare = sweep(floor, List.of(), from, 40 * HZ);
        double kept = sweep(floor, targets, from, 40 * HZ);
        assertTrue(kept <= 0.75 * bare * (1 + 1e-4), kept + " above " + 0.75 * bare);

        Path tight = withLimit(dir, "tight.json", "0.05", "exact-peak");
        CliTest.Run none = CliTest.run("site-check", tight.toString(), "--fitted-frf",
                "presets/gallery-floor-fitted-frf.csv", "--free-structure", "--json");
        assertEquals(0, none.code(), none.err());
        assertTrue(none.out().contains("SPILLOVER_LIMIT_NOT_KEPT"), none.out());
    }

    @Test
    void badLimitsAndConfigurationsThatTakeNoneAreRefusedPlainly(@TempDir Path dir) throws IOException {
        for (String bad : new String[] {"0", "-1", "101", "\"x\""}) {
            CliTest.Run run = CliTest.run("design", withLimit(dir, "bad.json", bad, "exact-peak").toString());
            assertEquals(Cli.BAD_INPUT, run.code(), bad);
            assertTrue(run.err().contains("absorbers.spillover_limit"), run.err());
        }
        CliTest.Run robust = CliTest.run("design", withLimit(dir, "robust.json", "1", "robust-worst-case").toString());
        assertEquals(Cli.BAD_INPUT, robust.code());
        assertTrue(robust.err().contains("absorbers.spillover_limit") && robust.err().contains("robust-worst-case"),
                robust.err());
        String one = Files.readString(withLimit(dir, "one.json", "1", "exact-peak")).replace("\"count\": 2",
                "\"count\": 1");
        Files.writeString(dir.resolve("one.json"), one);
        CliTest.Run single = CliTest.run("design", dir.resolve("one.json").toString());
        assertEquals(Cli.BAD_INPUT, single.code());
        assertTrue(single.err().contains("absorbers.spillover_limit") && single.err().contains("absorbers.count"),
                single.err());
        // a structure of one mode has no other mode to limit; one absorber per mode takes no limit
        Path rig = dir.resolve("rig.json");
        Files.writeString(rig, Files.readString(Path.of("presets/split-mass-test-rig.json"))
                .replace("\"format_version\": 6", "\"format_version\": 8")
                .replace("\"count\": 3,", "\"count\": 3, \"spillover_limit\": 1,"));
        CliTest.Run oneMode = CliTest.run("design", rig.toString());
        assertEquals(Cli.BAD_INPUT, oneMode.code());
        assertTrue(oneMode.err().contains("absorbers.spillover_limit") && oneMode.err().contains("structure.modes"),
                oneMode.err());
        Path frame = dir.resolve("frame.json");
        Files.writeString(frame, Files.readString(Path.of("presets/frame-bending-and-twisting.json"))
                .replace("\"format_version\": 7", "\"format_version\": 8")
                .replace("\"arrangement\": \"one-per-mode\",", "\"arrangement\": \"one-per-mode\", \"spillover_limit\": 1,"));
        CliTest.Run perMode = CliTest.run("design", frame.toString());
        assertEquals(Cli.BAD_INPUT, perMode.code());
        assertTrue(perMode.err().contains("absorbers.spillover_limit") && perMode.err().contains("one absorber per mode"),
                perMode.err());
        for (CliTest.Run r : new CliTest.Run[] {robust, single, oneMode, perMode}) {
            assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), r.err());
        }
    }
}
