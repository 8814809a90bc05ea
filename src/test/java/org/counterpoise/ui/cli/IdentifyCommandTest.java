package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import com.google.gson.stream.JsonReader;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.identify.ModalFit;
import org.counterpoise.io.measurement.FrfCsv;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.project.MeasuredSource;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.core.robust.ToleranceRanges.FrequencyBasis;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.ui.cli.CliTest.Run;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code identify}: the JSON round trip, writing a project's structure, plots and plain refusals. */
class IdentifyCommandTest {
    private static final String FLOOR = "presets/impact-test-floor-frf.csv";

    private static JsonObject strict(String text) {
        JsonReader reader = new JsonReader(new StringReader(text));
        reader.setLenient(false);
        return JsonParser.parseReader(reader).getAsJsonObject();
    }

    @Test
    void jsonCarriesTheFittedModeWithItsUncertainties() {
        Run r = CliTest.run("identify", FLOOR, "--kind", "accelerance", "--band", "15:31", "--json");
        assertEquals(0, r.code(), r.err());
        JsonObject o = strict(r.out());
        assertEquals("least_squares", o.get("method").getAsString());
        assertEquals("accelerance", o.get("frf_kind").getAsString());
        JsonObject mode = o.getAsJsonArray("modes").get(0).getAsJsonObject();
        // the same numbers as the core fit of the same lines (an independent call, SI -> Hz by 2 pi)
        var band = FrfCsv.read(Path.of(FLOOR), FrfUnit.si(FrfKind.ACCELERANCE))
                .within(2 * Math.PI * 15, 2 * Math.PI * 31);
        IdentifiedMode core = ModalFit.fit(band, 1, true).modes().get(0);
        assertEquals(core.naturalFrequency() / (2 * Math.PI), mode.get("frequency_Hz").getAsDouble(), 1e-9);
        assertEquals(core.dampingRatio(), mode.get("damping_ratio").getAsDouble(), 1e-12);
        assertEquals(core.modalMass(), mode.get("modal_mass_kg").getAsDouble(), 1e-6);
        assertEquals(core.modalMassSd().orElseThrow(), mode.get("modal_mass_kg_sd").getAsDouble(), 1e-6);
        assertTrue(mode.get("frequency_Hz_sd").getAsDouble() > 0);
        // the invented floor: 23 Hz, 2 %, 4200 kg (ImpactTestPresetTest)
        assertEquals(23.0, mode.get("frequency_Hz").getAsDouble(), 0.02);
        assertEquals(4200.0, mode.get("modal_mass_kg").getAsDouble(), 150.0);
        JsonObject q = o.getAsJsonObject("fit_quality");
        assertTrue(q.get("normalised_residual").getAsDouble() < 0.05);
        assertEquals(0.9775, q.get("coherence_mean").getAsDouble(), 0.01);
        assertFalse(o.getAsJsonObject("start_estimates").get("half_power").isJsonNull());
        assertEquals(0, q.getAsJsonArray("warnings").size());
    }

    @Test
    void theWrongKindIsFlagged() {
        // the accelerance file read as mobility: no single mode of mobility fits it
        Run r = CliTest.run("identify", FLOOR, "--kind", "mobility", "--no-residuals", "--json");
        assertEquals(0, r.code(), r.err());
        var warnings = strict(r.out()).getAsJsonObject("fit_quality").getAsJsonArray("warnings");
        assertTrue(warnings.toString().contains("POOR_FIT"), warnings.toString());
    }

    @Test
    void textReportShowsValuesAndCautions() {
        Run r = CliTest.run("identify", FLOOR);
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("natural frequency") && r.out().contains("Hz +/- "), r.out());
        assertTrue(r.out().contains("licensed engineering practice"), r.out());
    }

    @Test
    void theChosenModeGoesIntoTheProjectKeepingTheRest(@TempDir Path dir) throws Exception {
        Path project = dir.resolve("floor.json");
        Files.copy(Path.of("presets/pump-skid-mezzanine.json"), project); // no robustness section
        Project before = ProjectReader.read(project).project();
        Run r = CliTest.run("identify", FLOOR, "--write-structure", project.toString(), "--mode", "1");
        assertEquals(0, r.code(), r.err());
        Project after = ProjectReader.read(project).project();
        assertEquals(before.disturbance(), after.disturbance());
        assertEquals(before.absorber(), after.absorber());
        assertEquals(before.name(), after.name());
        assertEquals(23.0, after.toStructure().naturalFrequency() / (2 * Math.PI), 0.02);
        assertEquals(4200.0, after.toStructure().modalMass(), 150.0);
        // the structure says where it came from (format 5, structure.measured)
        MeasuredSource source = after.structure().measured();
        assertEquals("least_squares", source.method());
        assertEquals(Path.of(FLOOR).getFileName().toString(), source.file());
        assertEquals(LocalDate.now().toString(), source.date());
        assertTrue(source.normalisedResidual().getAsDouble() < 0.1, "the demo file's fit is close");
        assertTrue(source.modalMassSd().getAsDouble() > 0 && source.naturalFrequencySd().getAsDouble() > 0);
        CliTest.Run designed = CliTest.run("design", project.toString());
        assertEquals(0, designed.code(), "the written project designs");
        assertTrue(designed.out().contains("structure data from a measurement"), designed.out());
        // the fit's standard uncertainties become normal tolerances of the structure (percent):
        // mass u_m, stiffness k = m omega^2 by first-order propagation sqrt(u_m^2 + (2 u_w)^2)
        IdentifiedMode core = ModalFit.fit(FrfCsv.read(Path.of(FLOOR), FrfUnit.si(FrfKind.ACCELERANCE)), 1, true)
                .modes().get(0);
        double um = core.modalMassSd().orElseThrow() / core.modalMass();
        double uw = core.naturalFrequencySd().orElseThrow() / core.naturalFrequency();
        assertEquals("normal", after.robustness().structureMass().distribution());
        assertEquals(100 * um, after.robustness().structureMass().percent(), 1e-3 * 100 * um);
        assertEquals(100 * Math.hypot(um, 2 * uw), after.robustness().structureStiffness().percent(),
                1e-3 * 100 * Math.hypot(um, 2 * uw));
        assertEquals(0, CliTest.run("robustness", project.toString(), "--samples", "200").code(),
                "and its tolerances run");
    }

    @Test
    void tolerancesTheUserTypedAreKept(@TempDir Path dir) throws Exception {
        Path project = dir.resolve("fan.json");
        Files.copy(Path.of("presets/rooftop-fan-platform.json"), project); // states both structure tolerances
        Project before = ProjectReader.read(project).project();
        assertEquals(0, CliTest.run("identify", FLOOR, "--write-structure", project.toString()).code());
        Project after = ProjectReader.read(project).project();
        // the tolerances and ranges typed are kept; how the frequency was found, not stated before, is now "measured"
        assertEquals(before.robustness().withRanges(new RobustnessInput.Ranges(
                before.robustness().ranges().structurePercent(), before.robustness().ranges().absorberPercent(),
                before.robustness().ranges().dampingPercent(), FrequencyBasis.MEASURED)), after.robustness());
        assertEquals(4200.0, after.toStructure().modalMass(), 150.0);
    }

    @Test
    void plotsAreWrittenAndNotReplacedWithoutForce(@TempDir Path dir) {
        Path png = dir.resolve("fit.png");
        assertEquals(0, CliTest.run("identify", FLOOR, "--plot", png.toString()).code());
        assertTrue(Files.isRegularFile(png) && Files.isRegularFile(dir.resolve("fit-phase.png")));
        Run again = CliTest.run("identify", FLOOR, "--plot", png.toString());
        assertEquals(Cli.BAD_INPUT, again.code());
        assertTrue(again.err().contains("--force"), again.err());
    }

    @Test
    void decayAndAddedMassAnswerFromTheirInputs(@TempDir Path dir) throws Exception {
        // x = e^{-zeta wn t} cos(wd t), zeta = 0.03, 12 Hz: delta = 2 pi zeta / sqrt(1 - zeta^2) (closed form)
        StringBuilder csv = new StringBuilder("time_s;response_mm_s\n");
        double wn = 2 * Math.PI * 12;
        for (int i = 0; i < 2000; i++) {
            double t = i / 1000.0;
            csv.append(String.format(Locale.ROOT, "%.4f;%.8f%n", t,
                    Math.exp(-0.03 * wn * t) * Math.cos(wn * Math.sqrt(1 - 0.0009) * t)).replace('.', ','));
        }
        Path decay = dir.resolve("decay.csv");
        Files.writeString(decay, csv.toString());
        Run d = CliTest.run("identify", decay.toString(), "--decay", "--cycles", "10", "--json");
        assertEquals(0, d.code(), d.err());
        JsonObject m = strict(d.out()).getAsJsonArray("modes").get(0).getAsJsonObject();
        assertEquals(0.03, m.get("damping_ratio").getAsDouble(), 0.03 * 2e-3);
        assertEquals(12.0, m.get("frequency_Hz").getAsDouble(), 12.0 * 1e-4);
        // added mass: m = dm f2^2 / (f1^2 - f2^2) (closed form): 300 kg moving 23 Hz to 22.2 Hz
        Run a = CliTest.run("identify", "--added-mass", "300", "--frequencies", "23,22.2", "--json");
        assertEquals(0, a.code(), a.err());
        double mass = strict(a.out()).getAsJsonArray("modes").get(0).getAsJsonObject().get("modal_mass_kg")
                .getAsDouble();
        assertEquals(300 * 22.2 * 22.2 / (23 * 23 - 22.2 * 22.2), mass, 1e-9);
    }

    @Test
    void badCellsAreNamedByFileLineAndColumn(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "# comment\nfrequency_Hz,real,imag\n10,1e-5,2e-6\n10.5,oops,2e-6\n");
        Run r = CliTest.run("identify", bad.toString());
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().contains("line 4, column 2 (real)") && r.err().contains("oops"), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
        Path noPhase = dir.resolve("mag.csv");
        Files.writeString(noPhase, "frequency_Hz,magnitude\n10,1\n11,2\n12,3\n13,2\n14,1\n");
        Run h = CliTest.run("identify", noPhase.toString());
        assertEquals(Cli.BAD_INPUT, h.code());
        assertTrue(h.err().contains("header") && h.err().contains("magnitude,phase_deg"), h.err());
        Path backwards = dir.resolve("back.csv");
        Files.writeString(backwards, "frequency_Hz;real;imag\n10;1;0\n9,5;1;0\n");
        Run b = CliTest.run("identify", backwards.toString());
        assertEquals(Cli.BAD_INPUT, b.code());
        assertTrue(b.err().contains("line 3, column 1") && b.err().contains("increasing"), b.err());
        Run u = CliTest.run("identify", FLOOR, "--units", "kg/N");
        assertEquals(Cli.BAD_INPUT, u.code());
        assertTrue(u.err().contains("--units") && u.err().contains("m/s^2"), u.err());
        Run m = CliTest.run("identify", FLOOR, "--modes", "7");
        assertEquals(Cli.BAD_INPUT, m.code());
        assertTrue(m.err().contains("--modes"), m.err());
    }

    @Test
    void semicolonsDecimalCommasAndAZeroHertzLineAreRead(@TempDir Path dir) throws Exception {
        // the shipped floor file rewritten as a spreadsheet in a decimal-comma locale would save it,
        // with a 0 Hz line in front: the same fit (ImpactTestPresetTest's floor)
        StringBuilder b = new StringBuilder("frequency_Hz;real;imag;coherence\n0;0;0;0\n");
        for (String line : Files.readAllLines(Path.of(FLOOR))) {
            if (!line.startsWith("#") && !line.startsWith("frequency")) {
                b.append(line.replace(',', ';').replace('.', ',')).append('\n');
            }
        }
        Path file = dir.resolve("comma.csv");
        Files.writeString(file, b.toString());
        Run comma = CliTest.run("identify", file.toString(), "--json");
        Run plain = CliTest.run("identify", FLOOR, "--json");
        assertEquals(0, comma.code(), comma.err());
        JsonObject a = strict(comma.out());
        JsonObject p = strict(plain.out());
        assertEquals(p.get("lines").getAsInt(), a.get("lines").getAsInt());
        assertEquals(p.getAsJsonArray("modes").toString(), a.getAsJsonArray("modes").toString());
    }

    @Test
    void magnitudeAndPhaseInUsUnitsReadAsTheSameFrf(@TempDir Path dir) throws Exception {
        // a receptance of 1e-6 m/N at phase -90 degrees, written in in/lbf: 1e-6 / 0.0254 * 4.4482216152605
        double inPerLbf = 1e-6 / 0.0254 * 4.4482216152605;
        Path file = dir.resolve("us.csv");
        StringBuilder b = new StringBuilder("freq_Hz,mag_in_per_lbf,phase_deg\n");
        for (int i = 0; i < 6; i++) {
            b.append(10 + i).append(',').append(inPerLbf).append(",-90\n");
        }
        Files.writeString(file, b.toString());
        var frf = FrfCsv.read(file, FrfUnit.parse("in/lbf", FrfKind.RECEPTANCE, "--units"));
        assertEquals(0.0, frf.real()[0], 1e-18);
        assertEquals(-1e-6, frf.imaginary()[0], 1e-15);
    }
}
