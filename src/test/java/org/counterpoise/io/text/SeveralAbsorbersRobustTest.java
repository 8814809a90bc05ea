package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A project of several absorbers with the method robust-worst-case (an invented copy of the
 * test-rig preset, src/test/resources/several/split-mass-robust.json): the set is designed for the
 * least worst case over the project's ranges and reported beside the least-peak set and one absorber.
 * The worst peak is checked against a brute force of the dense complex LU solve of the equations of
 * motion (Commons Math; {@link ModalDirectSolve}), a grid over the mode's frequency and the absorbers'
 * common factor, each with a dense frequency sweep refined by golden section.
 */
class SeveralAbsorbersRobustTest {
    private static final Path PROJECT = Path.of("src/test/resources/several/split-mass-robust.json");

    @Test
    void theSetIsDesignedForTheWorstCaseAndReportedBesideTheOthers() throws Exception {
        Project project = ProjectReader.read(PROJECT).project();
        DesignResult design = Designer.design(project.toStudy());
        AbsorberLayout layout = SeveralModes.layout(project).orElseThrow();
        SeveralAbsorbers d = SeveralAbsorbersDesigner.design(design, layout);
        SeveralAbsorbers.RobustSet r = d.robust().orElseThrow();
        assertEquals(0.05, r.structureRange(), 0.0, "default structure range");
        assertEquals(0.03, r.absorberRange(), 0.0, "default absorber range");
        assertTrue(d.certified());
        for (PointAbsorber a : d.absorbers()) {
            assertTrue(a.damping() / (2 * a.mass() * a.frequency()) >= 0.01 * (1 - 1e-12), "damping floor");
        }
        // designed for it: a lower worst case than the least-peak set, and no lower nominal peak
        assertTrue(r.set().worstPeak() < r.leastPeakSet().worstPeak(), r.toString());
        assertTrue(r.set().nominalPeak() >= r.leastPeakSet().nominalPeak() * (1 - 1e-9), r.toString());
        assertEquals(d.peakAfter(), r.set().nominalPeak(), 0.0);
        // brute force of the worst case: no grid point above it, the best within the grid's spacing
        double brute = bruteWorst(d, 0.05, 0.03);
        assertTrue(brute <= r.set().worstPeak() * (1 + 1e-9), brute + " above " + r.set().worstPeak());
        assertTrue(brute >= r.set().worstPeak() * (1 - 2e-3), brute + " far below " + r.set().worstPeak());

        ReportContent content = SeveralAbsorbersContent.with(DesignContent.of(design), d);
        JsonObject json = JsonParser.parseString(ResultJson.toJson(content)).getAsJsonObject()
                .getAsJsonObject("several_absorbers");
        assertEquals("robust-worst-case", json.get("designed_for").getAsString());
        assertEquals(0.05, json.get("robust_structure_frequency_range").getAsDouble(), 0.0);
        assertEquals(0.01, json.get("robust_damping_ratio_floor").getAsDouble(), 0.0);
        JsonArray compared = json.getAsJsonArray("compared");
        assertEquals(3, compared.size());
        assertEquals("least_peak_set", compared.get(1).getAsJsonObject().get("design").getAsString());
        assertEquals(r.leastPeakSet().worstPeak(), compared.get(1).getAsJsonObject().get("worst_peak_displacement_m")
                .getAsDouble(), 0.0);
        assertTrue(content.cautions().contains(SeveralAbsorbersContent.ROBUST_SPLIT));
        assertTrue(!content.cautions().contains(SeveralAbsorbersContent.NOMINAL_SPLIT));
    }

    /**
     * The gallery floor (two close modes, two individually tuned absorbers) with robust-worst-case:
     * the worst peak on the whole structure (the target mode's frequency varied, the other mode kept)
     * against the brute force of the direct solve of both modes and both absorbers.
     */
    @Test
    void onTwoModesTheWorstPeakOfTheWholeStructureIsTheDirectSolves(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("gallery-robust.json");
        Files.writeString(file, Files.readString(Path.of("presets/gallery-floor-two-modes.json"))
                .replace("\"exact-peak\"", "\"robust-worst-case\""));
        Project project = ProjectReader.read(file).project();
        SeveralAbsorbers d = SeveralAbsorbersDesigner.design(Designer.design(project.toStudy()),
                SeveralModes.layout(project).orElseThrow());
        SeveralAbsorbers.RobustSet r = d.robust().orElseThrow();
        assertEquals(2, d.layout().structure().size());
        double brute = bruteWorst(d, 0.05, 0.03);
        assertTrue(brute <= r.set().worstPeak() * (1 + 1e-9), brute + " above " + r.set().worstPeak());
        assertTrue(brute >= r.set().worstPeak() * (1 - 2e-3), brute + " far below " + r.set().worstPeak());
        assertTrue(d.certified());
    }

    /** Largest peak of the direct solve over a grid of the target mode's factor (21) and the absorbers' (7). */
    private static double bruteWorst(SeveralAbsorbers d, double s, double a) {
        List<Mode> nominal = d.layout().structure().modes();
        Mode m = nominal.get(d.targetMode());
        double best = 0;
        for (int i = 0; i <= 20; i++) {
            double sigma = 1 - s + 2 * s * i / 20;
            List<Mode> modes = new ArrayList<>(nominal);
            modes.set(d.targetMode(), new Mode(m.naturalFrequency() * sigma, m.dampingRatio(), m.modalMass(), m.shape()));
            for (int k = 0; k <= 6; k++) {
                double alpha = 1 - a + 2 * a * k / 6;
                List<PointAbsorber> built = new ArrayList<>();
                for (PointAbsorber b : d.absorbers()) {
                    built.add(new PointAbsorber(b.point(), b.mass(), b.stiffness() * alpha * alpha, b.damping()));
                }
                best = Math.max(best, d.forceAmplitude() * DenseSweep.maximum(w -> ModalDirectSolve.solve(modes, built,
                        d.layout().excitationPoint(), d.layout().responsePoint(), w)[0].abs(), d.band().low(),
                        d.band().high(), 1500));
            }
        }
        return best;
    }
}
