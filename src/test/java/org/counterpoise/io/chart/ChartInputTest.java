package org.counterpoise.io.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.RobustnessAnalysis;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.robust.MonteCarloOutcome;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.robust.SensitivityCurve;
import org.counterpoise.core.robust.SensitivityMap;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.export.CurveCsv;
import org.counterpoise.io.project.ProjectReader;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * What the charts do with awkward data (no pixel tests): unbounded values never reach the chart
 * library and are named in notes; random curves with NaN, infinities, zeros on log axes, single
 * points and equal values build, paint and encode without an exception; histogram bins follow
 * Sturges' rule; tick labels are rounded.
 */
class ChartInputTest {
    private static final DesignResult FAN = design("presets/rooftop-fan-platform.json");

    private static DesignResult design(String file) {
        return Designer.design(ProjectReader.readStudy(Path.of(file)));
    }

    /** Every value of every series is finite: nothing the chart library refuses; it paints and encodes. */
    private static void assertDrawable(XYChart chart) throws Exception {
        assertDrawable(chart, true);
    }

    private static void assertDrawable(XYChart chart, boolean encode) throws Exception {
        for (XYSeries s : chart.getSeriesMap().values()) {
            for (double v : s.getXData()) {
                assertTrue(Double.isFinite(v), s.getName() + " x " + v);
            }
            for (double v : s.getYData()) {
                assertTrue(Double.isFinite(v), s.getName() + " y " + v);
            }
        }
        paint(chart);
        if (encode) {
            ChartFiles.png(chart, new ByteArrayOutputStream());
            ChartFiles.svg(chart, new ByteArrayOutputStream());
        }
    }

    private static void paint(Chart<?, ?> chart) {
        BufferedImage image = new BufferedImage(400, 300, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            chart.paint(g, 400, 300);
        } finally {
            g.dispose();
        }
    }

    @Test
    void undampedStructureAtResonanceIsDrawnToTheTopAndNamed() throws Exception {
        DesignResult r = design("src/test/resources/org/counterpoise/io/chart/undamped-at-resonance.json");
        DesignCurves c = DesignCurves.of(r);
        for (boolean log : new boolean[] {true, false}) {
            XYChart chart = ChartFactory.response(r, c, log, 600, 400);
            assertDrawable(chart);
            // The bare undamped structure's response is infinite at its natural frequency, 14.2 Hz
            // (single-degree-of-freedom receptance 1 / (k - m w^2), common practice); with an
            // undamped absorber the coupled modes (the report's 12.70 and 15.88 Hz) are unbounded too.
            List<String> notes = ChartFactory.notes(chart);
            assertTrue(notes.contains("without absorber: unbounded at 14.20 Hz"), notes.toString());
            for (double w : r.coupledNaturalFrequencies()) {
                String at = org.counterpoise.io.text.QuantityFormat.format(w, Unit.HERTZ);
                assertTrue(notes.contains("with absorber: unbounded at " + at), notes + " " + at);
            }
            XYSeries marks = chart.getSeriesMap().get(ChartFactory.UNBOUNDED_SERIES);
            assertNotNull(marks);
            assertEquals(3, marks.getXData().length);
            // Every plotted value lies inside the stated plotting range.
            double top = chart.getStyler().getYAxisMax();
            for (double y : chart.getSeriesMap().get("without absorber").getYData()) {
                assertTrue(y <= top, y + " > " + top);
            }
        }
        XYChart stroke = ChartFactory.stroke(r, c, false, 600, 400);
        assertDrawable(stroke);
        assertEquals(2, ChartFactory.notes(stroke).size(), ChartFactory.notes(stroke).toString());
        // The CSV leaves the unbounded value empty and says so in the status column.
        String csv = CurveCsv.of(c);
        assertFalse(csv.contains("NaN") || csv.contains("Infinity"), "no NaN or Infinity in the CSV");
        assertTrue(csv.lines().anyMatch(l -> l.matches("[^,]+,,[^,]+,[^,]+,unbounded:without_absorber")),
                "an empty field with its status");
        assertTrue(csv.lines().skip(1).allMatch(l -> l.endsWith(",ok") || l.contains(",unbounded:")));
    }

    @Test
    void aDampedDesignHasNoNotes() throws Exception {
        DesignCurves c = DesignCurves.of(FAN);
        XYChart chart = ChartFactory.response(FAN, c, true, 600, 400);
        assertTrue(ChartFactory.notes(chart).isEmpty());
        assertNull(chart.getSeriesMap().get(ChartFactory.UNBOUNDED_SERIES));
        assertTrue(CurveCsv.of(c).lines().skip(1).allMatch(l -> l.endsWith(",ok")));
    }

    @Test
    void randomCurvesNeverBreakTheChartBuilders() throws Exception {
        Random random = new Random(20261203L);
        double[] specials = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0.0, -0.0, 1e300,
            -1e300, 1e-300, Double.MIN_VALUE, 1.0};
        double[] badFrequencies = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0.0, -3.0};
        for (int trial = 0; trial < 50; trial++) {
            int n = switch (trial % 5) {
                case 0 -> 1;
                case 1 -> 2;
                default -> random.nextInt(60);
            };
            double[] w = new double[n];
            double[][] y = new double[3][n];
            double equal = random.nextDouble() * 1e-3;
            for (int i = 0; i < n; i++) {
                // Frequencies come from a grid: an awkward one is missing (NaN, infinite, zero, negative).
                w[i] = random.nextInt(12) == 0 ? badFrequencies[random.nextInt(badFrequencies.length)] : 1 + 200.0 * i / n;
                for (double[] curve : y) {
                    curve[i] = switch (trial % 4) {
                        case 0 -> equal;
                        case 1 -> 0.0;
                        default -> random.nextInt(6) == 0 ? specials[random.nextInt(specials.length)]
                                : Math.exp(-12 + 10 * random.nextDouble());
                    };
                }
            }
            DesignCurves c = new DesignCurves(w, ResponseKind.DISPLACEMENT, y[0], y[1], y[2]);
            String where = "trial " + trial;
            // Painting checks what the library accepts; encoding every tenth chart checks the files.
            boolean encode = trial % 10 == 0;
            ChartTheme theme = trial % 2 == 0 ? ChartTheme.LIGHT : ChartTheme.DARK;
            for (boolean log : new boolean[] {true, false}) {
                assertDrawable(ChartFactory.response(FAN, c, log, theme, 400, 300), encode);
                assertDrawable(ChartFactory.stroke(FAN, c, log, theme, 400, 300), encode);
            }
            String csv = CurveCsv.of(c);
            assertFalse(csv.contains("NaN") || csv.contains("Infinity"), where);
            assertDrawable(MassRatioCharts.massRatio(w, y[0], Unit.MILLIMETRE, y[1].length > 0 ? y[1][0] : Double.NaN,
                    y[2].length > 0 ? y[2][0] : Double.NaN, theme, 400, 300), encode);
        }
    }

    @Test
    void randomRobustnessDataNeverBreakTheRobustnessCharts() throws Exception {
        RobustnessResult base = RobustnessAnalysis.run(FAN, FAN.study().robustness());
        Random random = new Random(7L);
        double[] specials = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0.0, 1e300};
        for (int trial = 0; trial < 40; trial++) {
            int n = trial % 4 == 0 ? 1 : 1 + random.nextInt(30);
            double[] factors = new double[n];
            double[] peaks = new double[n];
            double[] edges = new double[n + 1];
            int[] counts = new int[n];
            double[][] cells = new double[n][n];
            for (int i = 0; i < n; i++) {
                factors[i] = random.nextInt(10) == 0 ? specials[random.nextInt(specials.length)] : 0.8 + 0.4 * i / n;
                peaks[i] = random.nextInt(5) == 0 ? specials[random.nextInt(specials.length)] : random.nextDouble();
                counts[i] = random.nextInt(100);
                for (int j = 0; j < n; j++) {
                    cells[i][j] = random.nextInt(7) == 0 ? specials[random.nextInt(specials.length)] : random.nextDouble();
                }
            }
            for (int i = 0; i <= n; i++) {
                edges[i] = trial % 3 == 0 ? 1e-4 : random.nextInt(15) == 0 ? specials[random.nextInt(specials.length)]
                        : 1e-4 * (1 + i);
            }
            SensitivityCurve curve = new SensitivityCurve(factors, peaks);
            MonteCarloResult mc = new MonteCarloResult(1 + random.nextInt(5000), 1, 1e-4, 1e-4, 1e-4, 1e-4, 1e-4, 1e-4,
                    edges[0], edges[n], trial % 2 == 0 ? OptionalDouble.empty() : OptionalDouble.of(1.5e-4),
                    OptionalDouble.of(0.1), edges, counts);
            RobustnessResult r = new RobustnessResult(base.settings(), curve, curve, curve, curve,
                    new SensitivityMap(factors, factors, cells), base.worstCase(), base.robust(), base.robustAbsorber(),
                    base.toleratedForTarget(), MonteCarloOutcome.ran(mc));
            ChartTheme theme = trial % 2 == 0 ? ChartTheme.LIGHT : ChartTheme.DARK;
            assertDrawable(RobustnessCharts.sensitivity(FAN, r, theme, 400, 300), false);
            assertDrawable(MonteCarloCharts.histogram(FAN, mc, theme, 400, 300), false);
            paint(RobustnessCharts.map(FAN, r, theme, 400, 300, 1 + random.nextInt(3)));
        }
    }

    @Test
    void histogramBarsFollowFreedmanDiaconisWithAMinimum() {
        // Freedman and Diaconis (1981), Z. Wahrscheinlichkeitstheorie verw. Gebiete 57, 453-476: bar
        // width h = 2 IQR n^(-1/3). Counts spread evenly over 40 bins have IQR = 20 bins, so the
        // wanted bar count is 40 / (40 n^(-1/3)) = n^(1/3); the bars are joined bins, a divisor of 40.
        int[] even = new int[40];
        java.util.Arrays.fill(even, 25); // n = 1000: n^(1/3) = 10 bars
        assertEquals(10, 40 / MonteCarloCharts.grouping(even, 1000));
        java.util.Arrays.fill(even, 1000); // n = 40 000: 34.2 wanted, 40 is nearest
        assertEquals(40, 40 / MonteCarloCharts.grouping(even, 40_000));
        java.util.Arrays.fill(even, 200); // n = 8000: 20 bars
        assertEquals(20, 40 / MonteCarloCharts.grouping(even, 8000));
        // Few samples: n^(1/3) = 2.2, raised to the minimum of 5 bars.
        int[] few = new int[40];
        few[3] = 4;
        few[30] = 6;
        assertEquals(MonteCarloCharts.MIN_BINS, 40 / MonteCarloCharts.grouping(few, 10));
        // Counts that give no quartiles: Sturges (1926), J. Am. Stat. Assoc. 21(153), 65-66,
        // 1 + log2(10 000) = 14.3 classes: 10 bars are nearer than 20.
        assertEquals(10, 40 / MonteCarloCharts.grouping(new int[40], 10_000));
    }

    @Test
    void coincidingSamplesGiveASentenceNotAZeroWidthBar() throws Exception {
        double[] edges = new double[41];
        java.util.Arrays.fill(edges, 2e-4);
        int[] counts = new int[40];
        counts[0] = 500;
        MonteCarloResult mc = new MonteCarloResult(500, 1, 2e-4, 2e-4, 2e-4, 2e-4, 2e-4, 2e-4, 2e-4, 2e-4,
                OptionalDouble.empty(), OptionalDouble.empty(), edges, counts);
        XYChart chart = MonteCarloCharts.histogram(FAN, mc, 400, 300);
        assertDrawable(chart);
        assertNull(chart.getSeriesMap().get("builds"));
        assertEquals(List.of("All 500 sampled builds give the same peak, 0.2000 mm."), ChartFactory.notes(chart));
    }

    @Test
    void tickLabelsAreRoundedWithoutTrailingZeros() {
        assertEquals("0.072", ChartNumbers.label(0.07200000000000001));
        assertEquals("0.3", ChartNumbers.label(0.30000000000000004));
        assertEquals("1200", ChartNumbers.label(1200.0000000000002));
        assertEquals("1.5e-05", ChartNumbers.label(1.5e-5));
        assertEquals("0", ChartNumbers.linearAxis(0, 1).apply(1.3e-17));
        assertEquals("-0.25", ChartNumbers.linearAxis(-1, 1).apply(-0.25));
        var small = ChartNumbers.linearAxis(0, 0.00014);
        assertEquals(List.of("0.00008", "0.0001", "0.00012"), List.of(small.apply(8e-5), small.apply(1.0000000000000002e-4),
                small.apply(1.2e-4)));
        assertEquals("0.072", ChartNumbers.linearAxis(0.06, 0.16).apply(0.07200000000000001));
    }

    @Test
    void logAxesLabelDecadesAndEveryTickWhenNarrow() {
        XYChart wide = ChartFactory.response(FAN, DesignCurves.of(FAN), true, 600, 400);
        assertTrue(wide.getStyler().isYAxisLogarithmic());
        assertTrue(wide.getStyler().isYAxisLogarithmicDecadeOnly());
        assertTrue(wide.getStyler().getYAxisMax() / wide.getStyler().getYAxisMin() >= 10, "at least one decade");
        XYChart narrow = MassRatioCharts.massRatio(new double[] {0.02, 0.05}, new double[] {0.30, 0.12}, Unit.MILLIMETRE,
                0.05, 0.12, ChartTheme.LIGHT, 400, 300);
        assertFalse(narrow.getStyler().isYAxisLogarithmicDecadeOnly(), "a narrow axis labels 2..9 too");
    }

    @Test
    void darkThemeColoursReachTheChart() {
        XYChart chart = ChartFactory.response(FAN, DesignCurves.of(FAN), true, ChartTheme.DARK, 600, 400);
        assertEquals(ChartTheme.DARK.background(), chart.getStyler().getChartBackgroundColor());
        assertEquals(ChartTheme.DARK.plot(), chart.getStyler().getPlotBackgroundColor());
        assertEquals(ChartTheme.DARK.text(), chart.getStyler().getChartFontColor());
        assertEquals(ChartTheme.DARK.after(), chart.getSeriesMap().get("with absorber").getLineColor());
        assertTrue(ChartTheme.DARK.dark());
        assertFalse(ChartTheme.LIGHT.dark());
    }
}
