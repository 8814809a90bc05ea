package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.realisation.Realiser;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.sheet.SheetContent;
import org.counterpoise.io.sheet.SheetFiles;
import org.counterpoise.io.sheet.SheetPanel;
import org.counterpoise.io.sheet.RunUpPanel;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.cli.CliTest.Run;
import org.knowm.xchart.XYChart;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code --units us}: every output path of every preset shows US customary units, the numbers are the
 * SI numbers converted with the exact factors of NIST SP 811:2008 (appendix B), and the JSON's SI keys
 * and values never change with the system.
 */
class UsCustomaryReportTest {
    /** A metric unit symbol standing alone (not "mm" inside "recommended" or "commissioning"). */
    private static final Pattern METRIC = Pattern.compile("\\bmm\\b|kN/m|N\\*s/m|\\bkg\\b|\\bg\\*mm\\b");

    private static List<String> presets() throws IOException {
        List<String> out = new ArrayList<>();
        for (String name : Files.readAllLines(Path.of("presets/index.txt"))) {
            if (!name.isBlank()) {
                out.add("presets/" + name.strip());
            }
        }
        return out;
    }

    private static void assertNoMetricUnit(String what, String text) {
        Matcher m = METRIC.matcher(text);
        assertFalse(m.find(), () -> what + " shows the metric unit \"" + m.group() + "\" in US customary units:\n" + text);
    }

    @Test
    void theUsReportsOfEveryPresetShowNoMetricUnit() throws IOException {
        for (String preset : presets()) {
            Run design = CliTest.run("design", "--units", "us", preset);
            assertEquals(0, design.code(), design.err());
            assertNoMetricUnit("design " + preset, design.out());
            assertTrue(design.out().contains(" lb\n") && design.out().contains(" lbf/in\n")
                    && design.out().contains(" lbf*s/in\n"), design.out());
            Run robustness = CliTest.run("robustness", "--units", "us", preset);
            assertEquals(0, robustness.code(), robustness.err());
            assertNoMetricUnit("robustness " + preset, robustness.out());
        }
    }

    @Test
    void theUsRunUpReportAndChartsShowNoMetricUnit() {
        Run r = CliTest.run("runup", "--units", "us", "--rate", "200", "presets/rooftop-fan-platform.json");
        assertEquals(0, r.code(), r.err());
        assertNoMetricUnit("runup", r.out());
        assertTrue(r.out().contains(" in at "), r.out());
        // a preset with a run-up rate, so that the sheet's run-up page has its charts
        Project frame = ProjectReader.read(Path.of("presets/compressor-frame-speed-band.json")).project()
                .withDisplayUnits(UnitSystem.US_CUSTOMARY);
        DesignResult design = Designer.design(frame.toStudy());
        SheetPanel page = RunUpPanel.of(frame, design, ProgressListener.NONE);
        assertEquals("Structure acceleration (g)", page.charts().get(0).getYAxisTitle());
        assertEquals("Absorber stroke (in)", page.charts().get(1).getYAxisTitle());
        for (List<String> row : page.table()) {
            assertNoMetricUnit("run-up page", String.join(" ", row));
        }
    }

    @Test
    void theUsSheetShowsNoMetricUnitInItsTablesAndCharts() {
        Project pump = ProjectReader.read(Path.of("presets/pump-skid-mezzanine.json")).project();
        DesignDossier dossier = DesignDossier.of(pump.toStudy());
        SheetContent sheet = SheetContent.of(dossier.design(), "", "2026-12-03", "A",
                dossier.monteCarlo(ProgressListener.NONE), pump.identity(), dossier.comparison(ProgressListener.NONE),
                AmplitudeConvention.PEAK, Optional.of(Realiser.realisation(dossier, pump.hardware())),
                UnitSystem.US_CUSTOMARY, null);
        for (ReportTable.Section section : sheet.sections()) {
            for (ReportTable.Row row : section.rows()) {
                assertNoMetricUnit("sheet row " + row.label(), row.value() + " " + row.unit());
            }
        }
        sheet.comparison().orElseThrow().cells().forEach(cells -> assertNoMetricUnit("comparison", cells.toString()));
        sheet.warnings().forEach(w -> assertNoMetricUnit("sheet warning", w));
        List<XYChart> charts = SheetFiles.charts(dossier.design(), dossier.curves(), AmplitudeConvention.PEAK,
                UnitSystem.US_CUSTOMARY);
        assertTrue(charts.get(0).getYAxisTitle().endsWith("(in)"), charts.get(0).getYAxisTitle());
        assertEquals("Absorber stroke (in)", charts.get(1).getYAxisTitle());
    }

    @Test
    void usFiguresAreTheSiFiguresConvertedExactly() {
        String si = CliTest.run("design", "presets/rooftop-fan-platform.json").out();
        String us = CliTest.run("design", "--units", "us", "presets/rooftop-fan-platform.json").out();
        // NIST SP 811:2008 B.8: 1 lb = 0.45359237 kg; 1 lbf = 4.4482216152605 N; 1 in = 0.0254 m
        assertEquals(value(si, "absorber mass m2", "kg") / 0.45359237, value(us, "absorber mass m2", "lb"),
                relative(value(us, "absorber mass m2", "lb")));
        assertEquals(value(si, "spring rate k2", "kN/m") * 1e3 / (4.4482216152605 / 0.0254),
                value(us, "spring rate k2", "lbf/in"), relative(value(us, "spring rate k2", "lbf/in")));
        assertEquals(value(si, "damping coefficient c2", "N*s/m") / (4.4482216152605 / 0.0254),
                value(us, "damping coefficient c2", "lbf*s/in"), relative(value(us, "damping coefficient c2",
                        "lbf*s/in")));
        assertEquals(value(si, "static deflection of the spring", "mm") * 1e-3 / 0.0254,
                value(us, "static deflection of the spring", "in"),
                relative(value(us, "static deflection of the spring", "in")));
        // frequencies are Hz and rpm in both systems
        assertEquals(value(si, "absorber natural frequency", "Hz"), value(us, "absorber natural frequency", "Hz"));
    }

    /** Four significant figures are printed: both sides agree to the rounding of the fourth. */
    private static double relative(double v) {
        return Math.abs(v) * 1e-3;
    }

    private static double value(String report, String label, String unit) {
        Matcher m = Pattern.compile("(?m)^  " + Pattern.quote(label) + " +([-0-9.e+]+) " + Pattern.quote(unit)
                + "\\b").matcher(report);
        assertTrue(m.find(), label + " in " + unit + ":\n" + report);
        return Double.parseDouble(m.group(1));
    }

    @Test
    void theJsonKeepsItsSiKeysAndValuesAndABadSystemIsRefusedPlainly() {
        String preset = "presets/pump-skid-mezzanine.json";
        assertEquals(CliTest.run("design", "--json", preset).out(),
                CliTest.run("design", "--json", "--units", "us", preset).out());
        Run bad = CliTest.run("design", "--units", "imperial", preset);
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("--units") && bad.err().contains("si or us"), bad.err());
        assertFalse(bad.err().contains("Exception"), bad.err());
    }

    @Test
    void theProjectsDisplayUnitsApplyUnlessTheOptionOverridesThem(@TempDir Path dir) throws IOException {
        String text = Files.readString(Path.of("presets/pump-skid-mezzanine.json"));
        Path us = dir.resolve("us.json");
        Files.writeString(us, text.replaceFirst("\"display_units\": \"si\"", "\"display_units\": \"us\""));
        assertTrue(Files.readString(us).contains("\"display_units\": \"us\""), "the preset states its system");
        String shown = CliTest.run("design", us.toString()).out();
        assertNoMetricUnit("design of a project shown in US units", shown);
        String overridden = CliTest.run("design", "--units", "si", us.toString()).out();
        assertTrue(overridden.contains(" kN/m\n"), overridden);
        assertEquals(CliTest.run("design", "presets/pump-skid-mezzanine.json").out().replace("\r", ""),
                overridden.replace("\r", ""), "SI output is the same whichever way SI was chosen");
    }
}
