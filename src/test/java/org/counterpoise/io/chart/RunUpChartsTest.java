package org.counterpoise.io.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.RunUpStudy;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * The run-up charts draw the numbers of the run-up they are given (no pixel tests): the envelope
 * series are the core's envelope turned into shaft speed and display units, the steady series
 * are the frequency response at the same speeds, and an undamped resonance never reaches the
 * chart library (drawn to the top, named in a note).
 */
class RunUpChartsTest {
    private static final double RPM = 2 * Math.PI / 60;

    private static RunUpStudy.Result fan(String file, double rateRpmPerS) {
        DesignResult d = Designer.design(ProjectReader.readStudy(Path.of(file)));
        return RunUpStudy.runUp(d, 1.0, rateRpmPerS * RPM).run(ProgressListener.NONE);
    }

    @Test
    void seriesAreTheEnvelopeAndTheSteadyStateInShaftSpeedAndDisplayUnits() throws Exception {
        RunUpStudy.Result r = fan("presets/rooftop-fan-platform.json", 200);
        XYChart c = RunUpCharts.structure(r, Unit.REV_PER_MINUTE, ChartTheme.LIGHT, 720, 430);
        Map<String, XYSeries> s = c.getSeriesMap();
        assertEquals(List.of("without absorber, run-up", "with absorber, run-up", "without absorber, steady state",
                "with absorber, steady state"), List.copyOf(s.keySet()));
        double[] speed = r.data().comparison().withAbsorber().envelope().speed();
        double[] with = r.data().comparison().withAbsorber().envelope().of(ResponseKind.DISPLACEMENT);
        XYSeries run = s.get("with absorber, run-up");
        int i = speed.length / 2;
        // harmonic order 1: shaft speed = forcing frequency; rpm = rad/s * 60 / (2 pi); mm = m * 1000
        assertEquals(speed[i] / RPM, run.getXData()[i], 1e-9 * speed[i] / RPM);
        assertEquals(with[i] * 1000, run.getYData()[i], 1e-12 * with[i] * 1000);
        double[] steadyPeak = max(s.get("without absorber, steady state"));
        var peak = r.data().comparison().steadyWithoutAbsorber().get(ResponseKind.DISPLACEMENT);
        assertEquals(peak.value() * 1000, steadyPeak[1], 1e-9 * peak.value() * 1000, "steady curve reaches the peak");
        assertEquals(peak.frequency() / RPM, steadyPeak[0], 1e-9 * peak.frequency() / RPM);
        assertDrawable(c);
        XYChart stroke = RunUpCharts.stroke(r, Unit.HERTZ, ChartTheme.DARK, 640, 300);
        assertEquals(List.of("stroke, run-up", "stroke, steady state"), List.copyOf(stroke.getSeriesMap().keySet()));
        assertEquals("Shaft speed (Hz)", stroke.getXAxisTitle());
        assertDrawable(stroke);
    }

    @Test
    void anUndampedResonanceIsDrawnToTheTopAndNamed(@TempDir Path dir) throws Exception {
        String text = Files.readString(Path.of("presets/rooftop-fan-platform.json"));
        Path file = dir.resolve("undamped.json");
        Files.writeString(file, text.replaceFirst("\"damping\": \\{[^}]*}", "\"damping\": {\"ratio\": 0}"));
        RunUpStudy.Result r = fan(file.toString(), 200);
        XYChart c = RunUpCharts.structure(r, Unit.REV_PER_MINUTE, ChartTheme.LIGHT, 720, 430);
        assertDrawable(c);
        assertTrue(ChartFactory.notes(c).stream().anyMatch(n -> n.startsWith("without absorber, steady state:"
                + " unbounded at 852")), ChartFactory.notes(c).toString());
        assertTrue(c.getSeriesMap().containsKey(ChartFactory.UNBOUNDED_SERIES));
    }

    @Test
    void aSteadyPeakFarAboveAFastEnvelopeIsCutAndNamed() throws Exception {
        RunUpStudy.Result r = fan("presets/rooftop-fan-platform.json", 20_000);
        XYChart c = RunUpCharts.structure(r, Unit.REV_PER_MINUTE, ChartTheme.LIGHT, 720, 430);
        assertDrawable(c);
        var peak = r.data().comparison().steadyWithoutAbsorber().get(ResponseKind.DISPLACEMENT);
        double envelope = r.data().comparison().withoutAbsorber().peak(ResponseKind.DISPLACEMENT).orElseThrow().value();
        assertTrue(peak.value() > RunUpCharts.ENVELOPE_HEADROOM * envelope * 1.08, "a fast passage: the case applies");
        String expected = "without absorber, steady state: above the chart, peak "
                + QuantityFormat.format(peak.value(), DisplayUnits.of(ResponseKind.DISPLACEMENT.dimension())) + " at ";
        assertTrue(ChartFactory.notes(c).stream().anyMatch(n -> n.startsWith(expected)), ChartFactory.notes(c)
                + " should name " + expected);
        double axisTop = c.getStyler().getYAxisMax();
        for (XYSeries s : c.getSeriesMap().values()) {
            for (double v : s.getYData()) {
                assertTrue(v <= axisTop, s.getName() + " stays on the chart");
            }
        }
    }

    private static double[] max(XYSeries s) {
        double[] best = {0, -1};
        for (int i = 0; i < s.getYData().length; i++) {
            if (s.getYData()[i] > best[1]) {
                best = new double[] {s.getXData()[i], s.getYData()[i]};
            }
        }
        return best;
    }

    private static void assertDrawable(XYChart chart) {
        for (XYSeries s : chart.getSeriesMap().values()) {
            for (double v : s.getXData()) {
                assertTrue(Double.isFinite(v), s.getName() + " x " + v);
            }
            for (double v : s.getYData()) {
                assertTrue(Double.isFinite(v), s.getName() + " y " + v);
            }
        }
        BufferedImage image = new BufferedImage(chart.getWidth(), chart.getHeight(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        chart.paint(g, chart.getWidth(), chart.getHeight());
        g.dispose();
    }
}
