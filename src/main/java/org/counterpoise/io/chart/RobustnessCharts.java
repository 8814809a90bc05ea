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
 * histogram (with the target line).
 */
public final class RobustnessCharts {
    private static final Color DESIGN = ChartFactory.AFTER;
    private static final Color ROBUST = new Color(0x6a, 0x3d, 0x9a);

    private RobustnessCharts() {
    }

    /**
     * @param design the design
     * @param r its robustness study
     * @param width pixels
     * @param height pixels
     * @return worst response in band against structure frequency offset, both designs
     */
    public static XYChart sensitivity(DesignResult design, RobustnessResult r, int width, int height) {
        Dimension d = design.study().response().dimension();
        Unit unit = DisplayUnits.of(d);
        XYChart chart = new XYChartBuilder().width(width).height(height)
                .title("Peak in band, structure off-tune")
                .xAxisTitle("Structure natural frequency offset (%)")
                .yAxisTitle("Peak " + ChartFactory.pretty(unit.symbol())).build();
        style(chart.getStyler());
        curve(chart, "this design", r.structureCurve(), unit, DESIGN, false);
        curve(chart, "robust design", r.robustStructureCurve(), unit, ROBUST, true);
        if (!Double.isNaN(r.settings().target())) {
            chart.getStyler().setAnnotationLineColor(new Color(0xb0, 0x2a, 0x1e));
            chart.getStyler().setAnnotationLineStroke(new BasicStroke(1.4f));
            chart.addAnnotation(new AnnotationLine(unit.fromSi(r.settings().target()), false, false));
        }
        double range = 100 * r.settings().structureRange();
        if (range > 0) {
            double top = unit.fromSi(maxOf(r));
            for (double edge : new double[] {-range, range}) {
                XYSeries s = chart.addSeries(edge < 0 ? "expected range" : "expected range, high",
                        new double[] {edge, edge}, new double[] {0, top});
                s.setLineColor(ChartFactory.BAND_EDGE);
                s.setMarker(SeriesMarkers.NONE);
                s.setShowInLegend(edge < 0);
                s.setLineStyle(new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                        new float[] {3f, 3f}, 0f));
            }
        }
        return chart;
    }

    private static double maxOf(RobustnessResult r) {
        double m = 0;
        for (double v : r.structureCurve().peaks()) {
            m = Math.max(m, v);
        }
        for (double v : r.robustStructureCurve().peaks()) {
            m = Math.max(m, v);
        }
        return m;
    }

    private static void curve(XYChart chart, String name, SensitivityCurve c, Unit unit, Color color, boolean dashed) {
        double[] x = c.factors();
        double[] y = c.peaks();
        for (int i = 0; i < x.length; i++) {
            x[i] = 100 * (x[i] - 1);
            y[i] = unit.fromSi(y[i]);
        }
        XYSeries s = chart.addSeries(name, x, y);
        s.setLineColor(color);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineStyle(dashed ? new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                new float[] {7f, 4f}, 0f) : new BasicStroke(2.2f));
    }

    /**
     * @param design the design
     * @param r its robustness study
     * @param width pixels
     * @param height pixels
     * @param every use every n-th grid point along each axis (readable labels)
     * @return the map of the worst response over structure x absorber frequency offsets
     */
    public static HeatMapChart map(DesignResult design, RobustnessResult r, int width, int height, int every) {
        SensitivityMap m = r.map();
        Unit unit = DisplayUnits.of(design.study().response().dimension());
        List<String> xs = new ArrayList<>();
        List<String> ys = new ArrayList<>();
        double[] rows = m.rows();
        double[] cols = m.columns();
        double[][] z = m.peaks();
        List<Number[]> cells = new ArrayList<>();
        double min = Double.POSITIVE_INFINITY;
        double max = 0;
        int xi = 0;
        for (int j = 0; j < cols.length; j += every) {
            xs.add(String.format(Locale.ROOT, "%+.1f", 100 * (cols[j] - 1)));
            int yi = 0;
            for (int i = 0; i < rows.length; i += every) {
                if (j == 0) {
                    ys.add(String.format(Locale.ROOT, "%+.1f", 100 * (rows[i] - 1)));
                }
                double v = unit.fromSi(z[i][j]);
                cells.add(new Number[] {xi, yi, v});
                min = Math.min(min, v);
                max = Math.max(max, v);
                yi++;
            }
            xi++;
        }
        HeatMapChart chart = new HeatMapChartBuilder().width(width).height(height)
                .title("Peak in band (" + ChartFactory.pretty(unit.symbol()) + ")"
                        + (Double.isNaN(r.settings().target()) ? "" : ", red: at or above target"))
                .xAxisTitle("Absorber frequency offset (%)").yAxisTitle("Structure frequency offset (%)").build();
        var s = chart.getStyler();
        s.setChartBackgroundColor(Color.WHITE);
        s.setChartTitleBoxVisible(false);
        s.setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 13));
        s.setAxisTitleFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        s.setAxisTickLabelsFont(new Font(Font.SANS_SERIF, Font.PLAIN, 9));
        s.setLegendPosition(Styler.LegendPosition.OutsideE);
        s.setShowValue(false);
        s.setRangeColors(new Color[] {new Color(0x1b, 0x7f, 0x79), new Color(0xe9, 0xd8, 0x5a), new Color(0xb0, 0x2a, 0x1e)});
        // With a target the colour scale ends at it, so red means at or above the target.
        double top = Double.isNaN(r.settings().target()) ? max : unit.fromSi(r.settings().target());
        double bottom = Math.min(min, top * 0.9999);
        double magnitude = Math.pow(10, Math.floor(Math.log10(bottom)) - 2);
        s.setMin(Math.floor(bottom / magnitude) * magnitude); // three significant figures on the scale
        s.setMax(top);
        s.setDecimalPattern("#,##0.####");
        s.setHeatMapValueDecimalPattern("#,##0.####");
        s.setHeatMapDecimalValueFormatter(v -> org.counterpoise.io.text.QuantityFormat.number(v, 3));
        chart.addSeries("peak", xs, ys, cells);
        return chart;
    }

    /**
     * @param design the design
     * @param mc its Monte Carlo result
     * @param width pixels
     * @param height pixels
     * @return the histogram of the peak among sampled builds, with the target line
     */
    public static XYChart histogram(DesignResult design, MonteCarloResult mc, int width, int height) {
        Unit unit = DisplayUnits.of(design.study().response().dimension());
        XYChart chart = new XYChartBuilder().width(width).height(height)
                .title("Peak of " + mc.samples() + " sampled builds")
                .xAxisTitle("Peak " + ChartFactory.pretty(unit.symbol())).yAxisTitle("Builds").build();
        style(chart.getStyler());
        double[] edges = mc.binEdges();
        int[] counts = mc.counts();
        double[] x = new double[2 * counts.length + 2];
        double[] y = new double[x.length];
        x[0] = unit.fromSi(edges[0]);
        y[0] = 0;
        for (int b = 0; b < counts.length; b++) {
            x[2 * b + 1] = unit.fromSi(edges[b]);
            y[2 * b + 1] = counts[b];
            x[2 * b + 2] = unit.fromSi(edges[b + 1]);
            y[2 * b + 2] = counts[b];
        }
        x[x.length - 1] = unit.fromSi(edges[edges.length - 1]);
        y[y.length - 1] = 0;
        if (x[x.length - 1] <= x[0]) {
            // All samples equal (no tolerance): draw one narrow bar.
            double w = Math.max(Math.abs(x[0]) * 1e-3, 1e-12);
            x = new double[] {x[0] - w, x[0] - w, x[0] + w, x[0] + w};
            y = new double[] {0, mc.samples(), mc.samples(), 0};
        }
        XYSeries s = chart.addSeries("builds", x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Area);
        s.setFillColor(new Color(0x0b, 0x6e, 0x69, 0x88));
        s.setLineColor(DESIGN);
        s.setMarker(SeriesMarkers.NONE);
        chart.getStyler().setLegendVisible(false);
        if (!Double.isNaN(mc.target())) {
            chart.getStyler().setAnnotationLineColor(new Color(0xb0, 0x2a, 0x1e));
            chart.getStyler().setAnnotationLineStroke(new BasicStroke(1.6f));
            chart.addAnnotation(new AnnotationLine(unit.fromSi(mc.target()), true, false));
        }
        return chart;
    }

    private static void style(org.knowm.xchart.style.XYStyler s) {
        ChartFactory.houseStyle(s);
        s.setXAxisDecimalPattern("#,##0.###");
        s.setYAxisDecimalPattern("#,##0.#####");
    }
}
