package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.List;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.DisplayUnits;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Builds the charts of a design as XChart data, to be painted on any Graphics2D: the wizard's
 * panels, PNG and SVG files and the PDF sheet all use these. Frequencies in Hz, responses in the
 * display units of {@link DisplayUnits}. On a logarithmic axis a value of zero (an undamped
 * absorber holds the structure still at one frequency) is drawn at the axis floor, a decade and a
 * half below the smallest positive value.
 */
public final class ChartFactory {
    /** Colour of the curve without an absorber. */
    public static final Color BEFORE = new Color(0x8a, 0x8f, 0x98);
    /** Colour of the curve with the absorber. */
    public static final Color AFTER = new Color(0x0b, 0x6e, 0x69);
    /** Colour of the stroke curve. */
    public static final Color STROKE = new Color(0xb3, 0x5c, 0x1e);
    /** Colour of the forcing band's edges. */
    public static final Color BAND_EDGE = new Color(0xc9, 0x8f, 0x00);

    private ChartFactory() {
    }

    /**
     * @param r the design result
     * @param curves its curves
     * @param logarithmic true for a logarithmic response axis
     * @param width pixels
     * @param height pixels
     * @return the response before and after, with the forcing band shaded
     */
    public static XYChart response(DesignResult r, DesignCurves curves, boolean logarithmic, int width, int height) {
        Dimension d = curves.response().dimension();
        Unit unit = DisplayUnits.of(d);
        XYChart chart = base(width, height, capitalised(curves.response().label()), unit, logarithmic);
        double[] hz = toHz(curves.frequency());
        double[] before = toUnit(curves.before(), unit);
        double[] after = toUnit(curves.after(), unit);
        double top = max(after, before);
        double floor = logarithmic ? floor(before, after, top) : 0.0;
        range(chart, floor, top, logarithmic);
        shadeBand(chart, r, floor, top);
        line(chart, "without absorber", hz, clean(before, floor), BEFORE, 1.4f, true);
        line(chart, "with absorber", hz, clean(after, floor), AFTER, 2.2f, false);
        return chart;
    }

    /**
     * @param r the design result
     * @param curves its curves
     * @param logarithmic true for a logarithmic axis
     * @param width pixels
     * @param height pixels
     * @return the absorber stroke against frequency, with the clearance marked
     */
    public static XYChart stroke(DesignResult r, DesignCurves curves, boolean logarithmic, int width, int height) {
        Unit unit = DisplayUnits.of(Dimension.LENGTH);
        XYChart chart = base(width, height, "Absorber stroke", unit, logarithmic);
        double[] hz = toHz(curves.frequency());
        double[] stroke = toUnit(curves.stroke(), unit);
        double clearance = unit.fromSi(r.clearance());
        double top = Math.max(max(stroke, stroke), clearance);
        double floor = logarithmic ? floor(stroke, stroke, top) : 0.0;
        range(chart, floor, top, logarithmic);
        shadeBand(chart, r, floor, top);
        line(chart, "stroke", hz, clean(stroke, floor), STROKE, 2.0f, false);
        line(chart, "clearance", new double[] {hz[0], hz[hz.length - 1]}, new double[] {clearance, clearance},
                STROKE, 1.0f, true);
        return chart;
    }

    private static XYChart base(int width, int height, String title, Unit unit, boolean logarithmic) {
        XYChart chart = new XYChartBuilder().width(width).height(height).title(title)
                .xAxisTitle("Forcing frequency (Hz)").yAxisTitle(title + " (" + pretty(unit.symbol()) + ")").build();
        var s = chart.getStyler();
        houseStyle(s);
        s.setYAxisLogarithmic(logarithmic);
        s.setXAxisDecimalPattern("#,##0.##");
        s.setYAxisDecimalPattern(logarithmic ? "0.##########" : "#,##0.#####");
        s.setAnnotationLineColor(BAND_EDGE);
        s.setAnnotationLineStroke(new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {2f, 3f}, 0f));
        s.setAnnotationTextFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        s.setAnnotationTextFontColor(BAND_EDGE.darker());
        return chart;
    }

    /** Marks the forcing band by its two ends (one line for one frequency) and a label. */
    /**
     * The look every Counterpoise XY chart shares: white ground, light grid, small sans-serif type.
     * @param s the chart's styler
     */
    static void houseStyle(org.knowm.xchart.style.XYStyler s) {
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setPlotBorderVisible(true);
        s.setPlotBorderColor(new Color(0xc8, 0xcc, 0xd2));
        s.setPlotGridLinesColor(new Color(0xe6, 0xe8, 0xeb));
        s.setLegendPosition(Styler.LegendPosition.InsideNE);
        s.setLegendBorderColor(new Color(0xc8, 0xcc, 0xd2));
        s.setChartTitleBoxVisible(false);
        s.setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 13));
        s.setAxisTitleFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        s.setAxisTickLabelsFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        s.setLegendFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        s.setMarkerSize(0);
        s.setAntiAlias(true);
    }

    private static void shadeBand(XYChart chart, DesignResult r, double floor, double top) {
        double lo = Unit.HERTZ.fromSi(r.study().excitation().band().low());
        double hi = Unit.HERTZ.fromSi(r.study().excitation().band().high());
        chart.addAnnotation(new AnnotationLine(lo, true, false));
        if (hi > lo) {
            chart.addAnnotation(new AnnotationLine(hi, true, false));
        }
        chart.addAnnotation(new AnnotationText(hi > lo ? "forcing band" : "forcing", 0.5 * (lo + hi),
                floor > 0 ? top * 1.3 : top * 1.04, false));
    }

    private static void line(XYChart chart, String name, double[] x, double[] y, Color color, float width,
            boolean dashed) {
        XYSeries series = chart.addSeries(name, x, y);
        series.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        series.setLineColor(color);
        series.setMarker(SeriesMarkers.NONE);
        series.setLineStyle(dashed ? new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                new float[] {6f, 4f}, 0f) : new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
    }

    /** Values at or below the floor (zeros on a log axis) drawn at the floor. */
    static double[] clean(double[] v, double floor) {
        double[] out = v.clone();
        for (int i = 0; i < out.length; i++) {
            if (!(out[i] > floor)) {
                out[i] = floor;
            }
        }
        return out;
    }

    /** The axis floor: the smallest positive value, but never more than four decades below the top. */
    private static double floor(double[] a, double[] b, double top) {
        double min = Double.POSITIVE_INFINITY;
        for (double[] arr : List.of(a, b)) {
            for (double v : arr) {
                if (v > 0) {
                    min = Math.min(min, v);
                }
            }
        }
        if (Double.isInfinite(min) || !(top > 0)) {
            return 1e-12;
        }
        return Math.max(min / 1.5, top * 1e-4);
    }

    private static void range(XYChart chart, double floor, double top, boolean logarithmic) {
        if (top > 0) {
            chart.getStyler().setYAxisMax(logarithmic ? top * 1.6 : top * 1.1);
            chart.getStyler().setYAxisMin(logarithmic ? floor : 0.0);
        }
    }

    private static double max(double[] a, double[] b) {
        double m = 0;
        for (double v : a) {
            m = Math.max(m, v);
        }
        for (double v : b) {
            m = Math.max(m, v);
        }
        return m;
    }

    private static double[] toHz(double[] omega) {
        double[] out = new double[omega.length];
        for (int i = 0; i < omega.length; i++) {
            out[i] = Unit.HERTZ.fromSi(omega[i]);
        }
        return out;
    }

    private static double[] toUnit(double[] si, Unit unit) {
        double[] out = new double[si.length];
        for (int i = 0; i < si.length; i++) {
            out[i] = unit.fromSi(si[i]);
        }
        return out;
    }

    /** Unit symbols as typeset: N*s/m as N·s/m, m/s^2 as m/s². */
    public static String pretty(String symbol) {
        return symbol.replace("*", "\u00b7").replace("^2", "\u00b2");
    }

    private static String capitalised(String s) {
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

}
