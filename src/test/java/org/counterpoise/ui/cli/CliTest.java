package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.io.project.ProjectReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The command line as a user meets it: exit codes, messages, and JSON equal to the core's result. */
class CliTest {
    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Cli.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void noArgumentsPrintsTheHelp() {
        Run r = run();
        assertEquals(0, r.code());
        assertTrue(r.out().contains("design"), r.out());
    }

    @Test
    void designPrintsAReportWithUnitsAndCautions() {
        Run r = run("design", "presets/rooftop-fan-platform.json");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("spring rate"));
        assertTrue(r.out().contains("kN/m"));
        assertTrue(r.out().contains("Retain the absorber mass fail-safe"));
        assertFalse(r.out().contains("Infinity") || r.out().contains("NaN"));
    }

    @Test
    void designJsonCarriesTheCoreNumbers() {
        Run r = run("design", "--json", "presets/pump-skid-mezzanine.json");
        assertEquals(0, r.code(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        DesignResult expected = Designer.design(ProjectReader.readStudy(Path.of("presets/pump-skid-mezzanine.json")));
        assertEquals(expected.tuning().massRatio(), o.get("mass_ratio").getAsDouble(), 0);
        assertEquals(expected.tuning().tuningRatio(), o.get("tuning_ratio").getAsDouble(), 0);
        assertEquals(expected.absorber().stiffness(), o.get("absorber_stiffness_N_per_m").getAsDouble(), 0);
        assertEquals(expected.responseAfter().value(), o.get("peak_response_after").getAsDouble(), 0);
        assertEquals(expected.strokeInBand().value(), o.get("peak_stroke_m").getAsDouble(), 0);
        for (String key : new String[] {"structure_mass_kg", "structure_frequency_Hz", "absorber_mass_kg",
            "absorber_damping_Ns_per_m", "absorber_frequency_Hz", "response_quantity", "response_unit",
            "peak_response_before", "method", "absorber_damping_ratio"}) {
            assertTrue(o.has(key), key);
        }
    }

    @Test
    void unboundedValuesAreNullWithAFlagInJson(@TempDir Path dir) throws Exception {
        String text = Files.readString(Path.of("presets/rooftop-fan-platform.json"))
                .replace("\"ratio\": 0.02", "\"ratio\": 0");
        Path file = dir.resolve("undamped.json");
        Files.writeString(file, text);
        Run r = run("design", "--json", file.toString());
        assertEquals(0, r.code(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        assertTrue(o.get("peak_response_before").isJsonNull());
        assertTrue(o.get("peak_response_before_unbounded").getAsBoolean());
        assertFalse(r.out().contains("Infinity"));
        Run text2 = run("design", file.toString());
        assertTrue(text2.out().contains("unbounded"));
    }

    @Test
    void badInputExitsTwoWithOneClearMessage(@TempDir Path dir) throws Exception {
        Run missing = run("design", dir.resolve("nothere.json").toString());
        assertEquals(2, missing.code());
        assertEquals("error: " + dir.resolve("nothere.json") + ": there is no such file; check the name and the folder",
                missing.err().strip());
        assertFalse(missing.err().contains("\tat "), "no stack trace");

        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, Files.readString(Path.of("presets/pump-skid-mezzanine.json"))
                .replace("\"value\": 600", "\"value\": -600"));
        Run r = run("design", bad.toString());
        assertEquals(2, r.code());
        assertEquals("error: disturbance.amplitude.value: -600 N is not allowed; must be a finite number greater than 0",
                r.err().strip());

        Run flag = run("design", "--jsn", "x.json");
        assertEquals(2, flag.code());
        assertTrue(flag.err().startsWith("error: --jsn: is not an option of counterpoise design (did you mean --json?)"),
                flag.err());
    }

    @Test
    void optimumPrintsOneRowPerCaseInEveryFormat(@TempDir Path dir) throws Exception {
        Run json = run("optimum", "--mass-ratio", "0.01:0.2:3", "--structure-damping", "0:0.02:2", "--json");
        assertEquals(0, json.code(), json.err());
        var array = JsonParser.parseString(json.out()).getAsJsonArray();
        assertEquals(6, array.size());
        JsonObject first = array.get(0).getAsJsonObject();
        for (String key : new String[] {"mass_ratio", "structure_damping_ratio", "tuning_ratio",
            "absorber_damping_ratio", "peak"}) {
            assertTrue(first.has(key), key);
        }
        // Nishihara and Asami (2002): exact optimum peak for mu = 0.01, undamped structure.
        assertEquals(org.counterpoise.core.tuning.NishiharaAsamiExact.optimumPeak(0.01),
                first.get("peak").getAsDouble(), 1e-9 * first.get("peak").getAsDouble());

        Run csv = run("optimum", "--mass-ratio", "0.05", "--objective", "variance", "--csv");
        assertEquals(0, csv.code(), csv.err());
        String[] lines = csv.out().strip().split("\n");
        assertEquals("mass_ratio,structure_damping_ratio,tuning_ratio,absorber_damping_ratio,variance,converged",
                lines[0]);
        // Warburton (1982): J_opt = sqrt((1 + 3 mu/4) / (mu (1+mu))).
        assertEquals(Math.sqrt((1 + 0.0375) / (0.05 * 1.05)), Double.parseDouble(lines[1].split(",")[4]), 1e-12);

        Path cases = dir.resolve("cases.csv");
        Files.writeString(cases, "mass_ratio,structure_damping_ratio,band_low,band_high\n0.05,0.02,0.9,1.1\n0.1,0,,\n");
        Run fromFile = run("optimum", "--cases", cases.toString());
        assertEquals(0, fromFile.code(), fromFile.err());
        assertEquals(3, fromFile.out().strip().split("\n").length);
    }

    @Test
    void optimumRefusesBadFlagsWithExitTwo() {
        Run r = run("optimum", "--mass-ratio", "-0.1");
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("error: --mass-ratio: -0.1 is not allowed"), r.err());
        r = run("optimum", "--mass-ratio", "0.05", "--band", "2:1");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--band"), r.err());
        r = run("optimum", "--mass-ratio", "0.05", "--excitation", "wind");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--excitation: wind is not allowed; one of force, unbalance"), r.err());
        r = run("optimum", "--mass-ratio", "0.05", "--response", "stroke");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("limit the stroke instead"), r.err());
        r = run("optimum", "--mass-ratio", "0.05", "--structure-damping", "nan");
        assertEquals(2, r.code());
        r = run("optimum", "--mass-ratio", "0.05", "--objective", "variance", "--response", "acceleration");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("infinite"), r.err());
        r = run("optimum");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--mass-ratio: missing"), r.err());
    }

    @Test
    void sheetWritesOnceRefusesToOverwriteAndNamesUnwritablePaths(@TempDir Path dir) throws Exception {
        Path pdf = dir.resolve("a folder with spaces").resolve("pump sheet.pdf");
        Files.createDirectories(pdf.getParent());
        Run first = run("sheet", "presets/pump-skid-mezzanine.json", "-o", pdf.toString());
        assertEquals(0, first.code(), first.err());
        assertTrue(Files.size(pdf) > 10_000);
        Run again = run("sheet", "presets/pump-skid-mezzanine.json", "-o", pdf.toString());
        assertEquals(2, again.code());
        assertEquals("error: --output: " + pdf + " is not allowed; already exists; add --force to replace it, or"
                + " choose another name", again.err().strip());
        assertEquals(0, run("sheet", "presets/pump-skid-mezzanine.json", "-o", pdf.toString(), "--force").code());
        // A folder that cannot exist: its parent is a file.
        Path blocker = dir.resolve("plain-file");
        Files.writeString(blocker, "x");
        Run bad = run("sheet", "presets/pump-skid-mezzanine.json", "-o", blocker.resolve("x.pdf").toString());
        assertEquals(2, bad.code());
        assertTrue(bad.err().startsWith("error: --output: ") && bad.err().contains("cannot be written here"),
                bad.err());
        assertFalse(bad.err().contains("\tat "));
        try (var left = Files.list(pdf.getParent())) {
            assertEquals(1, left.count(), "no temporary files left behind");
        }
        Run missing = run("sheet", "presets/pump-skid-mezzanine.json");
        assertEquals(2, missing.code());
        assertTrue(missing.err().startsWith("error: --output: missing; give the PDF to write"), missing.err());
    }

    @Test
    void robustnessReportsWorstCaseRobustDesignAndMonteCarlo() {
        Run r = run("robustness", "presets/rooftop-fan-platform.json", "--samples", "500", "--json");
        assertEquals(0, r.code(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        assertTrue(o.get("robust_worst_case_peak").getAsDouble() <= o.get("worst_case_peak").getAsDouble());
        assertTrue(o.get("worst_case_peak").getAsDouble() >= o.get("nominal_peak").getAsDouble());
        JsonObject mc = o.getAsJsonObject("monte_carlo");
        assertEquals(500, mc.get("samples").getAsInt());
        assertEquals(7, mc.get("seed").getAsInt());
        assertTrue(mc.get("p50").getAsDouble() <= mc.get("p90").getAsDouble());
        Run text = run("robustness", "presets/rooftop-fan-platform.json", "--samples", "200");
        assertTrue(text.out().contains("\nTolerance Monte Carlo of the peak in band\n"), text.out());
        assertTrue(text.out().lines().anyMatch(l -> l.matches("  samples +200")), text.out());
        assertTrue(text.out().lines().anyMatch(l -> l.matches("  seed +7")), text.out());
        Run bad = run("robustness", "presets/rooftop-fan-platform.json", "--samples", "0");
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("--samples: 0 is not allowed"), bad.err());
    }

    @Test
    void unknownFieldsAreReportedOnStandardError(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("extra.json");
        Files.writeString(file, Files.readString(Path.of("presets/pump-skid-mezzanine.json"))
                .replace("\"name\":", "\"colour\": \"blue\", \"name\":"));
        Run r = run("design", file.toString());
        assertEquals(0, r.code());
        assertTrue(r.err().contains("field colour is not part of the project format"), r.err());
    }
}
