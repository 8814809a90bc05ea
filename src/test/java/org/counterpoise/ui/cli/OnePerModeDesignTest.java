package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code design} of one absorber per mode, designed jointly (format 7), on the invented preset
 * {@code frame-bending-and-twisting.json}, checked from what the command printed: the absorbers of
 * its JSON (mass, stiffness, damping, point) are put on the structure's modes in the dense complex LU
 * solve of the equations of motion (Commons Math; {@link ModalDirectSolve}, which shares nothing
 * with the polynomial route), and a dense sweep of that solve over the forcing band, every sampled
 * maximum refined by golden section, gives the peaks before, after (joint) and with the sequential
 * design: they equal the printed ones to 1e-9.
 */
class OnePerModeDesignTest {
    private static final String FRAME = "presets/frame-bending-and-twisting.json";
    private static final double RPM = 2 * Math.PI / 60;

    @Test
    void thePrintedPeaksEqualADenseSweepOfTheDirectSolve() {
        Project p = ProjectReader.read(Path.of(FRAME)).project();
        AbsorberLayout layout = SeveralModes.layout(p).orElseThrow();
        CliTest.Run run = CliTest.run("design", "--json", FRAME);
        assertEquals(0, run.code(), run.err());
        JsonObject s = JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonObject("several_absorbers");
        assertEquals("one-per-mode", s.get("tuning").getAsString());
        assertEquals("certified", s.get("status").getAsString());
        ModalStructure structure = layout.structure();
        // the preset: 250 N at the corner, the displacement at the corner, 400 to 960 rpm
        double force = 250;
        double low = 400 * RPM;
        double high = 960 * RPM;
        List<PointAbsorber> joint = absorbers(s.getAsJsonArray("absorbers"));
        List<PointAbsorber> sequential = absorbers(s.getAsJsonArray("sequential_absorbers"));
        assertEquals(List.of("midspan", "corner"), joint.stream().map(PointAbsorber::point).toList());
        double before = force * sweep(structure, List.of(), low, high);
        double after = force * sweep(structure, joint, low, high);
        double inSequence = force * sweep(structure, sequential, low, high);
        assertEquals(before, s.get("peak_displacement_before_m").getAsDouble(), 1e-9 * before, "before");
        assertEquals(after, s.get("peak_displacement_after_m").getAsDouble(), 1e-9 * after, "after, joint");
        assertEquals(inSequence, s.get("sequential_peak_displacement_m").getAsDouble(), 1e-9 * inSequence,
                "after, sequential");
        assertEquals(inSequence / after, s.get("joint_gain").getAsDouble(), 1e-8);
        assertTrue(after < inSequence, after + " against " + inSequence);
        // the mass split: equal mass ratios on each mode as seen at its absorber's point, 2400 / 1^2 and 900 / 1^2
        assertEquals(150 * 2400 / 3300.0, joint.get(0).mass(), 1e-9);
        assertEquals(150 * 900 / 3300.0, joint.get(1).mass(), 1e-9);
        // each absorber's damping ratio is c / (2 m omega_a), referred to its own frequency
        JsonObject first = s.getAsJsonArray("absorbers").get(0).getAsJsonObject();
        assertEquals(joint.get(0).damping() / (2 * joint.get(0).mass() * joint.get(0).frequency()),
                first.get("damping_ratio").getAsDouble(), 1e-12);
        assertEquals("bending", first.get("mode").getAsString());

        CliTest.Run text = CliTest.run("design", FRAME);
        assertEquals(0, text.code(), text.err());
        assertTrue(text.out().contains("gain of the joint design"), text.out());
        assertTrue(text.out().contains("One absorber per mode: the sections other than"), text.out());
    }

    /**
     * Modes 2.5 apart of equal modal mass, everything at one point (an invented case): the joint design
     * puts the upper mode's absorber at the edge of its neighbourhood, as `optimum --one-per-mode` does
     * for R = 2.5 (docs/several-modes.md), and the report says so; site-check refuses the project plainly.
     */
    @Test
    void anAbsorberAtItsNeighbourhoodsEdgeIsSaidAndSiteCheckRefuses(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("close.json");
        Files.writeString(file, """
                {"format_version": 7, "name": "Invented two-mode beam",
                 "structure": {"modes": [{"name": "first", "natural_frequency": {"value": 4, "unit": "Hz"},
                                          "damping": {"ratio": 0.01}, "modal_mass": {"value": 1000, "unit": "kg"},
                                          "mode_shape": {"p": 1.0}},
                                         {"name": "second", "natural_frequency": {"value": 10, "unit": "Hz"},
                                          "damping": {"ratio": 0.01}, "modal_mass": {"value": 1000, "unit": "kg"},
                                          "mode_shape": {"p": 1.0}}],
                               "excitation_point": "p", "response_point": "p"},
                 "disturbance": {"kind": "force", "amplitude": {"value": 100, "unit": "N"},
                                 "band": {"low": 1, "high": 25, "unit": "Hz"}},
                 "absorber": {"mass_ratio": 0.05, "method": "exact-peak"},
                 "absorbers": {"arrangement": "one-per-mode", "modes": ["first", "second"]}}
                """);
        CliTest.Run run = CliTest.run("design", "--json", file.toString());
        assertEquals(0, run.code(), run.err());
        JsonObject root = JsonParser.parseString(run.out()).getAsJsonObject();
        JsonObject second = root.getAsJsonObject("several_absorbers").getAsJsonArray("absorbers").get(1)
                .getAsJsonObject();
        assertTrue(second.get("point_chosen").getAsBoolean());
        // sqrt(4 * 10) Hz: the geometric mean of the two natural frequencies
        assertEquals(Math.sqrt(40), second.get("frequency_Hz").getAsDouble(), 1e-9);
        assertTrue(root.get("cautions").toString().contains("absorber 2 (mode second) is tuned to the edge"), run.out());
        CliTest.Run check = CliTest.run("site-check", file.toString(), "--fitted-frf",
                "presets/gallery-floor-fitted-frf.csv");
        assertEquals(2, check.code());
        assertEquals("error: absorbers.arrangement: \"one-per-mode\" is not allowed; absorbers all on one mode for"
                + " site-check: one absorber per mode is not yet checked against a measurement", check.err().strip());
    }

    private static List<PointAbsorber> absorbers(JsonArray list) {
        List<PointAbsorber> out = new ArrayList<>();
        for (int j = 0; j < list.size(); j++) {
            JsonObject o = list.get(j).getAsJsonObject();
            out.add(new PointAbsorber(o.get("point").getAsString(), o.get("mass_kg").getAsDouble(),
                    o.get("stiffness_N_per_m").getAsDouble(), o.get("damping_Ns_per_m").getAsDouble()));
        }
        return out;
    }

    /** |X / F| over the band by the dense solve: a sweep of 20 000 steps, every local maximum refined. */
    private static double sweep(ModalStructure s, List<PointAbsorber> absorbers, double low, double high) {
        DoubleUnaryOperator magnitude = w -> ModalDirectSolve.solve(s.modes(), absorbers, "corner", "corner", w)[0].abs();
        int samples = 20_000;
        return DenseSweep.everyMaximum(magnitude, low, high, samples);
    }
}
