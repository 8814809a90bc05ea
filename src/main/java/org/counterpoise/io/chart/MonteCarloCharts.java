package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The histogram of a Monte Carlo's peaks, as data to paint anywhere, with the rule that groups
 * the Monte Carlo's equal bins into bars. Unbounded or degenerate samples are said in words
 * (see {@link ChartFactory#notes}) instead of drawn.
 */
public final class MonteCarloCharts {
    /** The fewest bars a histogram of more than one distinct value is drawn with. */
    static final int MIN_BINS = 5;

    private MonteCarloCharts() {
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
        ChartStyle.houseStyle(chart.getStyler(), theme);
        chart.getStyler().setLegendVisible(false);
        double[] edges = ChartStyle.inUnit(mc.binEdges(), unit);
        int[] counts = mc.counts();
        double low = edges.length > 0 ? edges[0] : Double.NaN;
        double high = edges.length > 0 ? edges[edges.length - 1] : Double.NaN;
        if (counts.length == 0 || edges.length != counts.length + 1 || !Double.isFinite(low)
                || !Double.isFinite(high) || PlotRange.unbounded(high, PlotRange.typical(new double[] {low}))) {
            String text = "The peak is unbounded in some sampled builds: no histogram to draw.";
            ChartFactory.note(chart, text);
            return ChartStyle.emptyNote(chart, text, theme);
        }
        for (int i = 1; i < edges.length; i++) {
            if (!Double.isFinite(edges[i]) || edges[i] < edges[i - 1]) {
                String text = Double.isFinite(edges[i]) ? "The Monte Carlo bins are out of order: no histogram to draw."
                        : "The peak is unbounded in some sampled builds: no histogram to draw.";
                ChartFactory.note(chart, text);
                return ChartStyle.emptyNote(chart, text, theme);
            }
        }
        if (!(high > low)) {
            String text = "All " + mc.samples() + " sampled builds give the same peak, "
                    + QuantityFormat.number(low, QuantityFormat.FIGURES) + " " + unit.symbol() + ".";
            ChartFactory.note(chart, text);
            return ChartStyle.emptyNote(chart, text, theme);
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
        double target = unit.fromSi(mc.target().orElse(0.0)); // 0: no target line
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
