package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.robust.SensitivityCurve;
import org.counterpoise.core.robust.SensitivityMap;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.HeatMapChart;
import org.knowm.xchart.HeatMapChartBuilder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Charts of a robustness study, as data to paint anywhere: the sensitivity of the design and of
 * the robust design to structure mistuning (with the target line), the map over structure x
 * absorber mistuning (cells at or above the target in the top colour), and the Monte Carlo
 * histogram (with the target line). Unbounded peaks (see {@link PlotRange}) never reach the chart
 * library: they are drawn at the top of the range and named in {@link ChartFactory#notes}.
 */
public final class RobustnessCharts {
    /** The fewest bars a histogram of more than one distinct value is drawn with. */
    static final int MIN_BINS = 5;

    private RobustnessCharts() {
    }

    /** The sensitivity chart in the light (print) theme. */
    public static XYChart sensitivity(DesignResult design, RobustnessResult r, int width, int height) {
        return sensitivity(design, r, ChartTheme.LIGHT, width, height);
    }

    /**
     * @param design the design
     * @param r its robustness study
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @return worst response in band against structure frequency offset, both designs
     */
    public static XYChart sensitivity(DesignResult design, RobustnessResult r, ChartTheme theme, int width,
            int height) {
        Dimension d = design.study().response().dimension();
        Unit unit = DisplayUnits.of(d);
        XYChart chart = new XYChartBuilder().width(width).height(height)
                .title("Peak in band, structure mistuned")
                .xAxisTitle("Structure natural frequency offset (%)")
                .yAxisTitle("Peak (" + ChartFactory.pretty(unit.symbol()) + ")").build();
        ChartFactory.houseStyle(chart.getStyler(), theme);
        // The curves run along the top of the plot; the legend goes below them.
        chart.getStyler().setLegendPosition(Styler.LegendPosition.InsideS);
        double[][] x = {percent(r.structureCurve()), percent(r.robustStructureCurve())};
        double[][] y = {toUnit(r.structureCurve().peaks(), unit), toUnit(r.robustStructureCurve().peaks(), unit)};
        double typical = PlotRange.typical(y);
        double target = unit.fromSi(r.settings().target());
        boolean hasTarget = Double.isFinite(target) && target > 0;
        double top = Math.max(PlotRange.top(typical, y), hasTarget ? target : 0);
        if (!(top > 0)) {
            top = 1;
        }
        double range = 100 * r.settings().structureRange();
        double xLow = -Math.max(range, 1);
        double xHigh = Math.max(range, 1);
        for (double[] xs : x) {
            for (double v : xs) {
                if (Double.isFinite(v)) {
                    xLow = Math.min(xLow, v);
                    xHigh = Math.max(xHigh, v);
                }
            }
        }
        var s = chart.getStyler();
        s.setXAxisMin(xLow);
        s.setXAxisMax(xHigh);
        s.setYAxisMin(0.0);
        s.setYAxisMax(top * 1.1);
        s.setxAxisTickLabelsFormattingFunction(ChartNumbers.linearAxis(xLow, xHigh));
        s.setyAxisTickLabelsFormattingFunction(ChartNumbers.linearAxis(0, top * 1.1));
        String[] names = {"this design", "robust design"};
        Color[] colours = {theme.after(), theme.alternative()};
        List<double[]> marks = new ArrayList<>();
        for (int k = 0; k < 2; k++) {
            boolean[] keep = new boolean[x[k].length];
            int n = 0;
            for (int i = 0; i < keep.length; i++) {
                keep[i] = Double.isFinite(x[k][i]);
                n += keep[i] ? 1 : 0;
            }
            if (n == 0) {
                continue;
            }
            double[] xs = keepOnly(x[k], keep, n);
            double[] ys = keepOnly(y[k], keep, n);
            XYSeries series = chart.addSeries(names[k], xs, PlotRange.clip(ys, typical, 0, top));
            series.setLineColor(colours[k]);
            series.setMarker(SeriesMarkers.NONE);
            series.setLineStyle(k == 1 ? new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                    new float[] {7f, 4f}, 0f) : new BasicStroke(2.2f));
            for (double at : PlotRange.unboundedAt(xs, ys, typical)) {
                marks.add(new double[] {at, top});
                ChartFactory.note(chart, names[k] + ": unbounded at "
                        + String.format(Locale.ROOT, "%+.1f %%", at) + " structure offset");
            }
        }
        if (hasTarget) {
            s.setAnnotationLineColor(theme.alarm());
            s.setAnnotationLineStroke(new BasicStroke(1.4f));
            chart.addAnnotation(new AnnotationLine(target, false, false));
        }
        if (range > 0) {
            for (double edge : new double[] {-range, range}) {
                XYSeries e = chart.addSeries(edge < 0 ? "expected range" : "expected range, high",
                        new double[] {edge, edge}, new double[] {0, top});
                e.setLineColor(theme.band());
                e.setMarker(SeriesMarkers.NONE);
                e.setShowInLegend(edge < 0);
                e.setLineStyle(new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                        new float[] {3f, 3f}, 0f));
            }
        }
        markUnbounded(chart, marks, theme);
        return chart;
    }

    private static void markUnbounded(XYChart chart, List<double[]> marks, ChartTheme theme) {
        if (marks.isEmpty()) {
            return;
        }
        XYSeries m = chart.addSeries(ChartFactory.UNBOUNDED_SERIES, marks.stream().mapToDouble(p -> p[0]).toArray(),
                marks.stream().mapToDouble(p -> p[1]).toArray());
        m.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        m.setMarker(SeriesMarkers.TRIANGLE_UP);
        m.setMarkerColor(theme.alarm());
        chart.getStyler().setMarkerSize(9);
        ChartFactory.notePanel(chart, theme, Double.NaN);
    }

    private static double[] percent(SensitivityCurve c) {
        double[] x = c.factors();
        for (int i = 0; i < x.length; i++) {
            x[i] = 100 * (x[i] - 1);
        }
        return x;
    }

    private static double[] toUnit(double[] si, Unit unit) {
        double[] out = new double[si.length];
        for (int i = 0; i < si.length; i++) {
            out[i] = unit.fromSi(si[i]);
        }
        return out;
    }

    private static double[] keepOnly(double[] v, boolean[] keep, int n) {
        double[] out = new double[n];
        int k = 0;
        for (int i = 0; i < keep.length; i++) {
            if (keep[i]) {
                out[k++] = v[i];
            }
        }
        return out;
    }

    /** The map in the light (print) theme. */
    public static HeatMapChart map(DesignResult design, RobustnessResult r, int width, int height, int every) {
        return map(design, r, ChartTheme.LIGHT, width, height, every);
    }

    /**
     * @param design the design
     * @param r its robustness study
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @param every use every n-th grid point along each axis (readable labels)
     * @return the map of the worst response over structure x absorber frequency offsets
     */
    public static HeatMapChart map(DesignResult design, RobustnessResult r, ChartTheme theme, int width, int height,
            int every) {
        SensitivityMap m = r.map();
        Unit unit = DisplayUnits.of(design.study().response().dimension());
        List<String> xs = new ArrayList<>();
        List<String> ys = new ArrayList<>();
        double[] rows = m.rows();
        double[] cols = m.columns();
        double[][] z = m.peaks();
        double[][] shown = new double[z.length][];
        for (int i = 0; i < z.length; i++) {
            shown[i] = toUnit(z[i], unit);
        }
        double typical = PlotRange.typical(shown);
        double target = unit.fromSi(r.settings().target());
        boolean hasTarget = Double.isFinite(target) && target > 0;
        double max = PlotRange.top(typical, shown);
        double top = hasTarget ? target : max;
        if (!(top > 0)) {
            top = 1;
        }
        List<Number[]> cells = new ArrayList<>();
        double min = Double.POSITIVE_INFINITY;
        int unbounded = 0;
        int step = Math.max(1, every);
        int xi = 0;
        for (int j = 0; j < cols.length; j += step) {
            xs.add(String.format(Locale.ROOT, "%+.1f", 100 * (cols[j] - 1)));
            int yi = 0;
            for (int i = 0; i < rows.length; i += step) {
                if (j == 0) {
                    ys.add(String.format(Locale.ROOT, "%+.1f", 100 * (rows[i] - 1)));
                }
                double v = shown[i][j];
                if (PlotRange.unbounded(v, typical)) {
                    unbounded++;
                    v = Math.max(top, max);
                }
                cells.add(new Number[] {xi, yi, v});
                min = Math.min(min, v);
                yi++;
            }
            xi++;
        }
        String title = "Peak in band (" + ChartFactory.pretty(unit.symbol()) + ")"
                + (hasTarget ? ", red: at or above target" : "");
        HeatMapChart chart = new HeatMapChartBuilder().width(width).height(height).title(title)
                .xAxisTitle("Absorber frequency offset (%)").yAxisTitle("Structure frequency offset (%)").build();
        if (unbounded > 0) {
            ChartFactory.note(chart, "unbounded in " + unbounded + " cells (shown in the top colour)");
            chart.setTitle(title + "; unbounded in " + unbounded + " cells");
        }
        var s = chart.getStyler();
        s.setChartBackgroundColor(theme.background());
        s.setPlotBackgroundColor(theme.plot());
        s.setChartFontColor(theme.text());
        s.setAxisTickLabelsColor(theme.text());
        s.setLegendBackgroundColor(theme.background());
        s.setLegendBorderColor(theme.border());
        s.setChartTitleBoxVisible(false);
        s.setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 13));
        s.setAxisTitleFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        s.setAxisTickLabelsFont(new Font(Font.SANS_SERIF, Font.PLAIN, 9));
        s.setLegendPosition(Styler.LegendPosition.OutsideE);
        s.setShowValue(false);
        s.setToolTipsEnabled(false);
        s.setRangeColors(theme.heat());
        // With a target the colour scale ends at it, so red means at or above the target.
        if (!Double.isFinite(min)) {
            min = top;
        }
        double bottom = Math.min(min, top * 0.9999);
        // The colour bar prints its ends as plain doubles: round them to three significant figures
        // in decimal, so the bar reads 0.072 and not 0.07200000000000001.
        if (bottom > 0) {
            bottom = new java.math.BigDecimal(bottom).round(new java.math.MathContext(3, java.math.RoundingMode.FLOOR))
                    .doubleValue();
        }
        s.setMin(bottom);
        s.setMax(top > 0 ? new java.math.BigDecimal(top).round(new java.math.MathContext(3,
                java.math.RoundingMode.CEILING)).doubleValue() : top);
        s.setHeatMapDecimalValueFormatter(v -> QuantityFormat.number(v, 3));
        if (!cells.isEmpty()) {
            chart.addSeries("peak", xs, ys, cells);
        }
        return chart;
    }

    /** The histogram in the light (print) theme. */
    public static XYChart histogram(DesignResult design, MonteCarloResult mc, int width, int height) {
        return histogram(design, mc, ChartTheme.LIGHT, width, height);
    }

    /**
     * The histogram of the peak among sampled builds. The Monte Carlo counts its samples in equal
     * bins; the chart joins neighbouring bins to about the Freedman-Diaconis width (see
     * {@link #grouping}), but never to fewer than {@link #MIN_BINS} bars. When every sample gives the same peak, or a peak is unbounded,
     * the chart says so in words instead of drawing bars.
     * @param design the design
     * @param mc its Monte Carlo result
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @return the histogram of the peak among sampled builds, with the target line
     */
    public static XYChart histogram(DesignResult design, MonteCarloResult mc, ChartTheme theme, int width,
            int height) {
        Unit unit = DisplayUnits.of(design.study().response().dimension());
        XYChart chart = new XYChartBuilder().width(width).height(height)
                .title("Peak of " + mc.samples() + " sampled builds")
                .xAxisTitle("Peak (" + ChartFactory.pretty(unit.symbol()) + ")").yAxisTitle("Builds").build();
        ChartFactory.houseStyle(chart.getStyler(), theme);
        chart.getStyler().setLegendVisible(false);
        double[] edges = toUnit(mc.binEdges(), unit);
        int[] counts = mc.counts();
        double low = edges.length > 0 ? edges[0] : Double.NaN;
        double high = edges.length > 0 ? edges[edges.length - 1] : Double.NaN;
        if (counts.length == 0 || edges.length != counts.length + 1 || !Double.isFinite(low)
                || !Double.isFinite(high) || PlotRange.unbounded(high, PlotRange.typical(new double[] {low}))) {
            String text = "The peak is unbounded in some sampled builds: no histogram to draw.";
            ChartFactory.note(chart, text);
            return ChartFactory.emptyNote(chart, text, theme);
        }
        for (int i = 1; i < edges.length; i++) {
            if (!Double.isFinite(edges[i]) || edges[i] < edges[i - 1]) {
                String text = Double.isFinite(edges[i]) ? "The Monte Carlo bins are out of order: no histogram to draw."
                        : "The peak is unbounded in some sampled builds: no histogram to draw.";
                ChartFactory.note(chart, text);
                return ChartFactory.emptyNote(chart, text, theme);
            }
        }
        if (!(high > low)) {
            String text = "All " + mc.samples() + " sampled builds give the same peak, "
                    + QuantityFormat.number(low, QuantityFormat.FIGURES) + " " + unit.symbol() + ".";
            ChartFactory.note(chart, text);
            return ChartFactory.emptyNote(chart, text, theme);
        }
        int group = grouping(counts, mc.samples());
        int bars = counts.length / group;
        double[] x = new double[2 * bars + 2];
        double[] y = new double[x.length];
        x[0] = low;
        int tallest = 0;
        for (int b = 0; b < bars; b++) {
            int c = 0;
            for (int k = b * group; k < (b + 1) * group; k++) {
                c += counts[k];
            }
            tallest = Math.max(tallest, c);
            x[2 * b + 1] = edges[b * group];
            y[2 * b + 1] = c;
            x[2 * b + 2] = edges[(b + 1) * group];
            y[2 * b + 2] = c;
        }
        x[x.length - 1] = high;
        var s = chart.getStyler();
        double pad = 0.04 * (high - low);
        double target = unit.fromSi(mc.target());
        double xLow = low - pad;
        double xHigh = high + pad;
        if (Double.isFinite(target) && target > 0 && !PlotRange.unbounded(target, high)) {
            xLow = Math.min(xLow, target - pad);
            xHigh = Math.max(xHigh, target + pad);
            s.setAnnotationLineColor(theme.alarm());
            s.setAnnotationLineStroke(new BasicStroke(1.6f));
            chart.addAnnotation(new AnnotationLine(target, true, false));
        }
        s.setXAxisMin(xLow);
        s.setXAxisMax(xHigh);
        s.setYAxisMin(0.0);
        s.setYAxisMax(Math.max(1.0, tallest * 1.08));
        s.setxAxisTickLabelsFormattingFunction(ChartNumbers.linearAxis(xLow, xHigh));
        s.setyAxisTickLabelsFormattingFunction(ChartNumbers.linearAxis(0, tallest));
        XYSeries series = chart.addSeries("builds", x, y);
        series.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Area);
        series.setFillColor(theme.fill());
        series.setLineColor(theme.after());
        series.setMarker(SeriesMarkers.NONE);
        return chart;
    }

    /**
     * How many neighbouring bins of the Monte Carlo make one bar. The wanted bar width is Freedman
     * and Diaconis' h = 2 IQR n^(-1/3) (Freedman and Diaconis 1981, Z. Wahrscheinlichkeitstheorie
     * verw. Gebiete 57, 453-476), with the quartiles read from the counts by linear interpolation
     * within a bin; when the counts give no quartiles (none counted), Sturges' 1 + log2(n) classes (Sturges 1926, J. Am.
     * Stat. Assoc. 21(153), 65-66). The bar count is the one nearest the wanted count among the
     * divisors of the bin count (more bars on a tie), and at least {@link #MIN_BINS} when there
     * are that many bins.
     * @param counts samples per equal bin
     * @param samples number of samples
     * @return bins per bar
     */
    static int grouping(int[] counts, int samples) {
        int bins = counts.length;
        double q1 = quantile(counts, 0.25);
        double q3 = quantile(counts, 0.75);
        double wanted = q3 > q1 ? bins / (2 * (q3 - q1) * Math.pow(Math.max(1, samples), -1.0 / 3))
                : 1 + Math.log(Math.max(1, samples)) / Math.log(2);
        wanted = Math.max(MIN_BINS, wanted);
        int best = 1;
        for (int g = 1; g <= bins; g++) {
            if (bins % g != 0 || (bins / g < MIN_BINS && bins >= MIN_BINS)) {
                continue;
            }
            if (Math.abs(bins / g - wanted) < Math.abs(bins / best - wanted)) {
                best = g;
            }
        }
        return best;
    }

    /** The p-quantile of binned data, in units of bin widths from the lower edge. */
    private static double quantile(int[] counts, double p) {
        long total = 0;
        for (int c : counts) {
            total += c;
        }
        double rank = p * total;
        long below = 0;
        for (int b = 0; b < counts.length; b++) {
            if (counts[b] > 0 && below + counts[b] >= rank) {
                return b + (rank - below) / counts[b];
            }
            below += counts[b];
        }
        return counts.length;
    }
}
