package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * For a structure of several modes the acceptance verdict is the whole structure's: the invented
 * gallery floor (two modes 11 % apart, force at the display, response at mid-span) with a criterion
 * added, its verdict before and after checked against an independent route, the equations of motion
 * of the modes (and absorbers) solved as a dense complex system by Commons Math's LU
 * ({@link ModalDirectSolve}), swept densely over the band and refined by golden section
 * ({@link DenseSweep}): r.m.s. = peak / sqrt 2 and a = omega^2 x for harmonic motion (any vibration
 * text); the limit curve is the criterion's own table (data, not the search under test).
 */
class SeveralModesAcceptanceTest {

    private static Path withCriterion(Path dir, String acceptance) throws IOException {
        return withCriterion(dir, acceptance, "presets/gallery-floor-two-modes.json");
    }

    private static Path withCriterion(Path dir, String acceptance, String preset) throws IOException {
        String text = Files.readString(Path.of(preset));
        String edited = text.replaceFirst("\"display_convention\"", "\"acceptance\": " + acceptance
                + ",\n  \"display_convention\"");
        return Files.writeString(dir.resolve("gallery with criterion.json"), edited);
    }

    @Test
    void aLimitCurveIsJudgedOnTheWholeStructureBeforeAndAfter(@TempDir Path dir) throws IOException {
        Path file = withCriterion(dir, "{\"criterion\": \"building\", \"direction\": \"vertical\","
                + " \"room_use\": \"general-office\"}");
        Project p = ProjectReader.read(file).project();
        AbsorberLayout layout = SeveralModes.layout(p).orElseThrow();
        SeveralAbsorbers set = SeveralAbsorbersDesigner.design(Designer.design(p.toStudy()), layout);
        Criterion criterion = p.toStudy().criterion().orElseThrow();
        CliTest.Run run = CliTest.run("design", "--json", file.toString());
        assertEquals(0, run.code(), run.err());
        JsonObject a = JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonObject("acceptance");
        for (boolean after : new boolean[] {false, true}) {
            List<PointAbsorber> absorbers = after ? set.absorbers() : List.of();
            // the utilisation: r.m.s. acceleration at mid-span over the curve's limit at that frequency
            DoubleUnaryOperator utilisation = w -> set.forceAmplitude() * w * w * ModalDirectSolve.solve(
                    layout.structure().modes(), absorbers, layout.excitationPoint(), layout.responsePoint(), w)[0]
                    .abs() / Math.sqrt(2) / criterion.limit().at(w / (2 * Math.PI));
            double worst = DenseSweep.maximum(utilisation, set.band().low(), set.band().high(), 20_000);
            String side = after ? "after" : "before";
            double reported = a.get("value_" + side).getAsDouble() / a.get("limit_" + side).getAsDouble();
            assertEquals(worst, reported, 1e-6 * worst, side);
        }
        assertTrue(JsonParser.parseString(run.out()).getAsJsonObject().get("cautions").toString()
                .contains("judged on the whole structure"), run.out());
    }

    /** Three light absorbers on one mode (the invented test rig), where the expanded form is least well conditioned. */
    @Test
    void threeLightAbsorbersAreJudgedAsTheDenseSolveGives(@TempDir Path dir) throws IOException {
        flatLimit(withCriterion(dir, "{\"criterion\": \"machine\", \"machine\": \"group-2-flexible\","
                + " \"zone\": \"B\"}", "presets/split-mass-test-rig.json"));
    }

    @Test
    void aFlatLimitOnTheVelocityIsTheWholeStructuresPeakRms(@TempDir Path dir) throws IOException {
        flatLimit(withCriterion(dir, "{\"criterion\": \"machine\", \"machine\": \"group-2-flexible\","
                + " \"zone\": \"B\"}"));
    }

    private static void flatLimit(Path file) throws IOException {
        Project p = ProjectReader.read(file).project();
        AbsorberLayout layout = SeveralModes.layout(p).orElseThrow();
        SeveralAbsorbers set = SeveralAbsorbersDesigner.design(Designer.design(p.toStudy()), layout);
        CliTest.Run run = CliTest.run("design", "--json", file.toString());
        assertEquals(0, run.code(), run.err());
        JsonObject a = JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonObject("acceptance");
        for (boolean after : new boolean[] {false, true}) {
            List<PointAbsorber> absorbers = after ? set.absorbers() : List.of();
            double rms = DenseSweep.maximum(w -> set.forceAmplitude() * w * ModalDirectSolve.solve(
                    layout.structure().modes(), absorbers, layout.excitationPoint(), layout.responsePoint(), w)[0]
                    .abs() / Math.sqrt(2), set.band().low(), set.band().high(), 20_000);
            String side = after ? "after" : "before";
            assertEquals(rms, a.get("value_" + side).getAsDouble(), 1e-6 * rms, side);
        }
    }

    /**
     * Sizing to meet the criterion is made on the target mode alone, the verdict on the whole structure:
     * with several modes it is refused even for one absorber, naming the field (a plain message).
     */
    @Test
    void sizingToMeetTheCriterionIsRefusedForSeveralModesEvenWithOneAbsorber(@TempDir Path dir) throws IOException {
        Path file = withCriterion(dir, "{\"criterion\": \"building\", \"direction\": \"vertical\","
                + " \"room_use\": \"general-office\"}");
        String edited = Files.readString(file).replace("\"count\": 2", "\"count\": 1")
                .replace("\"mass\": {\"value\": 900, \"unit\": \"kg\"},", "\"meet_acceptance\": true,");
        Files.writeString(file, edited);
        CliTest.Run run = CliTest.run("design", file.toString());
        assertEquals(Cli.BAD_INPUT, run.code(), run.out());
        assertTrue(run.err().contains("absorber.meet_acceptance") && run.err().contains("several"), run.err());
        assertTrue(!run.err().contains("Exception"), run.err());
    }
}
