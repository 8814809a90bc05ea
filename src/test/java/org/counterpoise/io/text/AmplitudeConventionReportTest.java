package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.export.RobustnessJson;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.sheet.SheetContent;
import org.counterpoise.io.sheet.SheetFiles;
import org.counterpoise.io.text.ReportRow.Amplitude;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.knowm.xchart.XYChart;

/**
 * Every response value states its amplitude convention, and a value shown in r.m.s. or
 * peak-to-peak is the peak over sqrt 2 or twice the peak in every output (definitions for one
 * steady harmonic; Harris and Piersol 2002, Shock and Vibration Handbook, ch. 1). The presets are
 * invented scenarios.
 */
class AmplitudeConventionReportTest {
    /** Rows whose values are amplitudes of an oscillation. */
    private static final Set<ReportKey> AMPLITUDE_ROWS = Set.of(ReportKey.DISPLACEMENT_PEAKS,
            ReportKey.VELOCITY_PEAKS, ReportKey.ACCELERATION_PEAKS, ReportKey.RESPONSE_PEAKS, ReportKey.REDUCTION,
            ReportKey.STROKE, ReportKey.STROKE_RUN_UP, ReportKey.SPRING_FORCE, ReportKey.DAMPER_FORCE,
            ReportKey.ABSORBER_FORCE, ReportKey.RMS_BEFORE, ReportKey.RMS_AFTER, ReportKey.RMS_STROKE,
            ReportKey.DETUNING_TARGET, ReportKey.MONTE_CARLO_MEAN, ReportKey.MONTE_CARLO_P50_P90,
            ReportKey.MONTE_CARLO_P95_P99, ReportKey.MONTE_CARLO_RANGE);

    static Stream<String> presets() {
        return Presets.names().stream();
    }

    private static DesignDossier dossier(String preset) {
        return DesignDossier.of(Presets.load(preset).project().toStudy());
    }

    @ParameterizedTest
    @MethodSource("presets")
    void everyResponseRowCarriesItsConvention(String preset) {
        DesignDossier d = dossier(preset);
        ReportContent content = DesignContent.of(d.design(), Presets.load(preset).project().identity(),
                d.monteCarlo(ProgressListener.NONE)).shownIn(AmplitudeConvention.RMS);
        int seen = 0;
        for (ReportSection s : content.sections()) {
            for (ReportRow row : s.rows()) {
                if (AMPLITUDE_ROWS.contains(row.key())) {
                    seen++;
                    Amplitude a = row.amplitude().orElseThrow(() -> new AssertionError(row.key() + " states no convention"));
                    // stroke and forces stay peaks (clearances and fatigue need them); white-noise values are r.m.s.
                    AmplitudeConvention expected = switch (row.key()) {
                        case STROKE, STROKE_RUN_UP, SPRING_FORCE, DAMPER_FORCE, ABSORBER_FORCE -> AmplitudeConvention.PEAK;
                        default -> AmplitudeConvention.RMS;
                    };
                    assertEquals(expected, a.convention(), row.key().name());
                    if (!(row.value() instanceof ReportValue.Reduction)) {
                        assertTrue(row.labelWithSymbol().endsWith("(" + expected.label() + ")"), row.labelWithSymbol());
                    }
                }
            }
        }
        assertTrue(seen >= 8, "the response, stroke and force rows are there: " + seen);
        // the tables of the sheet and the wizard carry the convention in their labels
        List<ReportTable.Section> tables = ReportTable.of(content, Set.of());
        assertTrue(tables.stream().flatMap(t -> t.rows().stream()).filter(r -> r.key() == ReportKey.STROKE)
                .allMatch(r -> r.label().endsWith("(peak)")));
        assertEquals("rms", ResultJson.of(content).get("amplitude_convention").getAsString());
    }

    @ParameterizedTest
    @MethodSource("presets")
    void rmsIsPeakOverRootTwoAndPeakToPeakTwicePeakInTheJson(String preset) {
        DesignResult r = dossier(preset).design();
        JsonObject peak = ResultJson.of(DesignContent.of(r));
        JsonObject rms = ResultJson.of(DesignContent.of(r).shownIn(AmplitudeConvention.RMS));
        JsonObject p2p = ResultJson.of(DesignContent.of(r).shownIn(AmplitudeConvention.PEAK_TO_PEAK));
        assertEquals("peak", peak.get("amplitude_convention").getAsString());
        assertFalse(peak.has("rms_displacement_before_m"), "peak adds no keys");
        for (String key : List.of("displacement_before_m", "displacement_after_m", "velocity_before_m_per_s",
                "velocity_after_m_per_s", "acceleration_before_m_per_s2", "acceleration_after_m_per_s2")) {
            double a = peak.get("peak_" + key).getAsDouble();
            // the peak keys stay as they are in every convention (programs read them)
            assertEquals(a, rms.get("peak_" + key).getAsDouble(), 0.0);
            assertEquals(a / Math.sqrt(2), rms.get("rms_" + key).getAsDouble(), 1e-15 * a, key);
            assertEquals(2 * a, p2p.get("peak_to_peak_" + key).getAsDouble(), 1e-15 * a, key);
        }
        if (!peak.get("peak_response_after").isJsonNull()) {
            double after = peak.get("peak_response_after").getAsDouble();
            assertEquals(after / Math.sqrt(2), rms.get("rms_response_after").getAsDouble(), 1e-15 * after);
        }
        // stroke and forces are peaks in every convention
        assertFalse(rms.has("rms_stroke_run_up_m"));
        assertFalse(rms.has("rms_spring_force_N"));
        assertEquals(peak.get("reduction_factor"), rms.get("reduction_factor"));
    }

    @ParameterizedTest
    @MethodSource("presets")
    void rmsIsPeakOverRootTwoInTheTextTheSheetAndTheChart(String preset) {
        DesignDossier d = dossier(preset);
        DesignResult r = d.design();
        double peak = r.motionAfter().get(ResponseKind.VELOCITY).value();
        String expected = DisplayUnits.format(peak / Math.sqrt(2), Dimension.VELOCITY);
        ReportContent rms = DesignContent.of(r).shownIn(AmplitudeConvention.RMS);
        String text = DesignReport.render(rms);
        String line = text.lines().filter(l -> l.contains("structure velocity (r.m.s.)")).findFirst().orElseThrow();
        assertTrue(line.strip().endsWith(expected), line + " ends with " + expected);
        SheetContent sheet = SheetContent.of(r, "", "2026-01-01", "A", d.monteCarlo(ProgressListener.NONE),
                Presets.load(preset).project().identity(), d.comparison(ProgressListener.NONE), AmplitudeConvention.RMS);
        String cell = sheet.sections().stream().flatMap(s -> s.rows().stream())
                .filter(row -> row.key() == ReportKey.VELOCITY_PEAKS).findFirst().orElseThrow().value();
        assertTrue(cell.endsWith(expected.replace(" mm/s", "")), cell + " ends with " + expected);
        XYChart peakChart = SheetFiles.charts(r, d.curves()).get(0);
        XYChart rmsChart = SheetFiles.charts(r, d.curves(), AmplitudeConvention.RMS).get(0);
        double[] a = peakChart.getSeriesMap().get("with absorber").getYData();
        double[] b = rmsChart.getSeriesMap().get("with absorber").getYData();
        for (int i = 0; i < a.length; i += 37) {
            assertEquals(a[i] / Math.sqrt(2), b[i], 1e-12 * a[i] + 1e-300);
        }
        assertTrue(rmsChart.getTitle().endsWith("r.m.s."), rmsChart.getTitle());
    }

    @Test
    void robustnessJsonStatesTheConventionAndAddsItsKeys() {
        DesignDossier d = dossier(Presets.names().get(0));
        JsonObject peak = JsonParser.parseString(RobustnessJson.toJson(d.design(), d.robustness(ProgressListener.NONE)))
                .getAsJsonObject();
        JsonObject rms = JsonParser.parseString(RobustnessJson.toJson(d.design(), d.robustness(ProgressListener.NONE),
                AmplitudeConvention.RMS)).getAsJsonObject();
        assertEquals("peak", peak.get("amplitude_convention").getAsString());
        assertEquals("rms", rms.get("amplitude_convention").getAsString());
        double nominal = peak.get("nominal_peak").getAsDouble();
        assertEquals(nominal / Math.sqrt(2), rms.get("nominal_rms").getAsDouble(), 1e-15 * nominal);
        double worst = peak.get("worst_case_peak").getAsDouble();
        assertEquals(worst / Math.sqrt(2), rms.get("worst_case_rms").getAsDouble(), 1e-15 * worst);
    }

    @Test
    void keysInAnotherConventionReplaceTheWordPeakOrTakeThePrefix() {
        assertEquals(List.of("rms_displacement_before_m", "rms_displacement_after_m"),
                ReportKey.DISPLACEMENT_PEAKS.jsonKeysIn(AmplitudeConvention.RMS));
        assertEquals(List.of("worst_case_peak_to_peak"), ReportKey.WORST_CASE_PEAK.jsonKeysIn(
                AmplitudeConvention.PEAK_TO_PEAK));
        assertEquals(List.of("monte_carlo.rms_mean"), ReportKey.MONTE_CARLO_MEAN.jsonKeysIn(AmplitudeConvention.RMS));
        assertEquals(ReportKey.DISPLACEMENT_PEAKS.jsonKeys(), ReportKey.DISPLACEMENT_PEAKS.jsonKeysIn(
                AmplitudeConvention.PEAK));
    }

    @Test
    void anUnboundedValueStaysUnboundedInEveryConvention() {
        ReportValue u = new ReportValue.Unbounded(Dimension.LENGTH, "why");
        assertEquals(u, Amplitudes.stated(u, AmplitudeConvention.RMS));
        ReportValue q = new ReportValue.Quantity(2.0, Dimension.LENGTH, 4);
        assertEquals(new ReportValue.Quantity(4.0, Dimension.LENGTH, 4),
                Amplitudes.stated(q, AmplitudeConvention.PEAK_TO_PEAK));
        assertEquals(Optional.empty(), new ReportRow(ReportKey.MASS_RATIO, "mass ratio", "", q, "", "").amplitude());
    }
}
