package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RobustnessResult;
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
 * absorber mistuning (cells at or above the target in the top colour); the Monte Carlo histogram
 * is drawn by {@link MonteCarloCharts}. Unbounded peaks (see {@link PlotRange}) never reach the chart
 * library: they are drawn at the top of the range and named in {@link ChartFactory#notes}.
 */
public final class RobustnessCharts {
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
        ChartStyle.houseStyle(chart.getStyler(), theme);
        // The curves run along the top of the plot; the legend goes below them.
        chart.getStyler().setLegendPosition(Styler.LegendPosition.InsideS);
        double[][] x = {percent(r.structureCurve()), percent(r.robustStructureCurve())};
        double[][] y = {ChartStyle.inUnit(r.structureCurve().peaks(), unit), ChartStyle.inUnit(r.robustStructureCurve().peaks(), unit)};
        double typical = PlotRange.typical(y);
        double target = unit.fromSi(r.settings().target().orElse(0.0)); // 0: no target line
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
            double[] xs = ChartStyle.select(x[k], keep, n);
            double[] ys = ChartStyle.select(y[k], keep, n);
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
        ChartStyle.notePanel(chart, theme, Double.NaN);
    }

    private static double[] percent(SensitivityCurve c) {
        double[] x = c.factors();
        for (int i = 0; i < x.length; i++) {
            x[i] = 100 * (x[i] - 1);
        }
        return x;
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
            shown[i] = ChartStyle.inUnit(z[i], unit);
        }
        double typical = PlotRange.typical(shown);
        double target = unit.fromSi(r.settings().target().orElse(0.0)); // 0: no target line
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
        ChartStyle.frame(s, theme, 9);
        s.setLegendBackgroundColor(theme.background());
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
            bottom = new BigDecimal(bottom).round(new MathContext(3, RoundingMode.FLOOR))
                    .doubleValue();
        }
        s.setMin(bottom);
        s.setMax(top > 0 ? new BigDecimal(top).round(new MathContext(3,
                RoundingMode.CEILING)).doubleValue() : top);
        s.setHeatMapDecimalValueFormatter(v -> QuantityFormat.number(v, 3));
        if (!cells.isEmpty()) {
            chart.addSeries("peak", xs, ys, cells);
        }
        return chart;
    }
}
