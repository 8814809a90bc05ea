package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.WeakHashMap;
import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.ValueText;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.internal.chartpart.Chart;
import org.knowm.xchart.style.AxesChartStyler;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Longer than 400 lines because every design chart now takes the display unit system; the response and
 * stroke charts are the next to move into a class of their own.
 *
 * <p>Builds the response and stroke charts of a design as XChart data, to be painted on any
 * Graphics2D: the wizard's panels, PNG and SVG files and the PDF sheet all use these, and every
 * chart of the package keeps its notes here. The look they share is {@link ChartStyle}; the
 * mass-ratio chart is {@link MassRatioCharts}. Frequencies in Hz, responses in the
 * display units of {@link DisplayUnits}, colours from a {@link ChartTheme}. On a logarithmic axis
 * a value of zero (an undamped absorber holds the structure still at one frequency) is drawn at
 * the axis floor, a decade and a half below the smallest positive value; the axis labels its
 * decades and marks 2 to 9 times each decade with unlabelled minor ticks (every tick is labelled
 * when the axis spans less than about one decade). Values that are unbounded (see
 * {@link PlotRange}) are drawn at the top of the plotting range, marked, and named in the chart's
 * {@link #notes}.
 */
public final class ChartFactory {
    /** Colour of the curve without an absorber (light theme). */
    public static final Color BEFORE = ChartTheme.LIGHT.before();
    /** Colour of the curve with the absorber (light theme). */
    public static final Color AFTER = ChartTheme.LIGHT.after();
    /** Colour of the stroke curve (light theme). */
    public static final Color STROKE = ChartTheme.LIGHT.stroke();
    /** Colour of the forcing band's edges (light theme). */
    public static final Color BAND_EDGE = ChartTheme.LIGHT.band();
    /** Name of the series that marks unbounded values at the top of a chart. */
    public static final String UNBOUNDED_SERIES = "unbounded (drawn to the top)";

    /** Notes of each chart built here (weak keys: a chart forgotten takes its notes with it). */
    private static final Map<Chart<?, ?>, List<String>> NOTES = Collections.synchronizedMap(new WeakHashMap<>());

    private ChartFactory() {
    }

    /**
     * @param chart a chart built by this package
     * @return what the chart says beside its curves, e.g. "without absorber: unbounded at 14.20 Hz";
     *     empty when nothing
     */
    public static List<String> notes(Chart<?, ?> chart) {
        List<String> n = NOTES.get(chart);
        return n == null ? List.of() : List.copyOf(n);
    }

    static void note(Chart<?, ?> chart, String text) {
        NOTES.computeIfAbsent(chart, c -> new ArrayList<>()).add(text);
    }

    /** The response chart in the light (print) theme. */
    public static XYChart response(DesignResult r, DesignCurves curves, boolean logarithmic, int width, int height) {
        return response(r, curves, logarithmic, ChartTheme.LIGHT, width, height);
    }

    /** The response chart as peaks in SI (the arguments as below). */
    public static XYChart response(DesignResult r, DesignCurves curves, boolean logarithmic, ChartTheme theme,
            int width, int height) {
        return response(r, curves, logarithmic, theme, AmplitudeConvention.PEAK, width, height);
    }

    /** The response chart in SI (the arguments as below). */
    public static XYChart response(DesignResult r, DesignCurves curves, boolean logarithmic, ChartTheme theme,
            AmplitudeConvention convention, int width, int height) {
        return response(r, curves, logarithmic, theme, convention, UnitSystem.SI, width, height);
    }

    /**
     * @param r the design result
     * @param curves its curves
     * @param logarithmic true for a logarithmic response axis
     * @param theme colours
     * @param convention the amplitude convention the curves are stated in (the title says it)
     * @param units the unit system of the response axis
     * @param width pixels
     * @param height pixels
     * @return the response before and after, with the forcing band marked; the study's criterion,
     *     when it has one, as a limit line ({@link LimitLines}) where the chart's quantity can show it
     */
    public static XYChart response(DesignResult r, DesignCurves curves, boolean logarithmic, ChartTheme theme,
            AmplitudeConvention convention, UnitSystem units, int width, int height) {
        Dimension d = curves.response().dimension();
        Unit unit = DisplayUnits.of(d, units);
        XYChart chart = base(width, height, capitalised(curves.response().label()) + ", " + convention.label(), unit,
                theme);
        double[] hz = ChartStyle.inUnit(curves.frequency(), Unit.HERTZ);
        double[] before = stated(ChartStyle.inUnit(curves.before(), unit), convention);
        double[] after = stated(ChartStyle.inUnit(curves.after(), unit), convention);
        ResponseKind kind = curves.response();
        DoubleUnaryOperator exactBefore = exact(r, false, kind, unit);
        DoubleUnaryOperator exactAfter = exact(r, true, kind, unit);
        Curve[] lines = {new Curve("without absorber", before, theme.before(), 1.4f, true,
                hz1 -> convention.ofHarmonic(exactBefore.applyAsDouble(hz1))),
            new Curve("with absorber", after, theme.after(), 2.2f, false,
                hz1 -> convention.ofHarmonic(exactAfter.applyAsDouble(hz1)))};
        plot(chart, hz, lines, logarithmic, Double.NaN, resonances(r), theme);
        r.study().criterion().ifPresent(c -> LimitLines.add(chart, c, kind, convention, unit, theme));
        shadeBand(chart, r, theme);
        return chart;
    }

    /** Amplitudes of a steady harmonic (peaks) stated in a convention. */
    private static double[] stated(double[] peaks, AmplitudeConvention convention) {
        double[] out = new double[peaks.length];
        for (int i = 0; i < peaks.length; i++) {
            out[i] = convention.ofHarmonic(peaks[i]);
        }
        return out;
    }

    /** The stroke chart in the light (print) theme. */
    public static XYChart stroke(DesignResult r, DesignCurves curves, boolean logarithmic, int width, int height) {
        return stroke(r, curves, logarithmic, ChartTheme.LIGHT, width, height);
    }

    /** The stroke chart in SI (the arguments as below). */
    public static XYChart stroke(DesignResult r, DesignCurves curves, boolean logarithmic, ChartTheme theme,
            int width, int height) {
        return stroke(r, curves, logarithmic, theme, UnitSystem.SI, width, height);
    }

    /**
     * @param r the design result
     * @param curves its curves
     * @param logarithmic true for a logarithmic axis
     * @param theme colours
     * @param units the unit system of the stroke axis
     * @param width pixels
     * @param height pixels
     * @return the absorber stroke against frequency, with the clearance marked
     */
    public static XYChart stroke(DesignResult r, DesignCurves curves, boolean logarithmic, ChartTheme theme,
            UnitSystem units, int width, int height) {
        Unit unit = DisplayUnits.of(Dimension.LENGTH, units);
        XYChart chart = base(width, height, "Absorber stroke", unit, theme);
        double[] hz = ChartStyle.inUnit(curves.frequency(), Unit.HERTZ);
        double[] stroke = ChartStyle.inUnit(curves.stroke(), unit);
        double clearance = unit.fromSi(r.clearance());
        Curve[] lines = {new Curve("stroke", stroke, theme.stroke(), 2.0f, false,
            exact(r, true, ResponseKind.STROKE, unit))};
        plot(chart, hz, lines, logarithmic, clearance, resonances(r), theme);
        shadeBand(chart, r, theme);
        return chart;
    }

    private static XYChart base(int width, int height, String title, Unit unit, ChartTheme theme) {
        XYChart chart = new XYChartBuilder().width(width).height(height).title(title)
                .xAxisTitle("Forcing frequency (Hz)").yAxisTitle(title + " (" + pretty(unit.symbol()) + ")").build();
        var s = chart.getStyler();
        ChartStyle.houseStyle(s, theme);
        s.setAnnotationLineColor(theme.band());
        s.setAnnotationLineStroke(new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {2f, 3f}, 0f));
        s.setAnnotationTextFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        s.setAnnotationTextFontColor(theme.dark() ? theme.band() : theme.band().darker());
        return chart;
    }

    /**
     * One curve of a chart.
     * @param at the curve's exact value at a frequency in Hz (display unit), for probing
     *     resonances that fall between grid points
     */
    private record Curve(String name, double[] y, Color color, float width, boolean dashed, DoubleUnaryOperator at) {
    }

    /**
     * The frequencies (Hz) where an undamped system's response is unbounded: the structure's own
     * natural frequency when it is undamped, and the coupled natural frequencies when the structure
     * and the absorber are both undamped. The grid rarely holds them exactly, so they are probed.
     */
    private static double[] resonances(DesignResult r) {
        var structure = r.study().structure();
        List<Double> hz = new ArrayList<>();
        if (structure.dampingRatio() == 0) {
            hz.add(Unit.HERTZ.fromSi(structure.naturalFrequency()));
            if (r.tuning().dampingRatio() == 0) {
                for (double w : r.coupledNaturalFrequencies()) {
                    hz.add(Unit.HERTZ.fromSi(w));
                }
            }
        }
        return hz.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static DoubleUnaryOperator exact(DesignResult r, boolean withAbsorber, ResponseKind kind, Unit unit) {
        var study = r.study();
        SystemResponse system = new SystemResponse(study.structure(), withAbsorber ? r.tuning() : null,
                study.excitation().kind(), study.excitation().amplitude());
        return hz -> unit.fromSi(system.amplitudeAt(kind, Unit.HERTZ.toSi(hz)));
    }

    /** The curve with the probed frequencies added where its value there is unbounded. */
    private static double[][] withProbes(double[] x, double[] y, double[] probes, DoubleUnaryOperator at,
            double typical) {
        TreeMap<Double, Double> points = new TreeMap<>();
        for (int i = 0; i < x.length; i++) {
            points.put(x[i], y[i]);
        }
        if (at != null && x.length > 1) {
            for (double f : probes) {
                if (f > x[0] && f < x[x.length - 1]) {
                    double v = at.applyAsDouble(f);
                    if (PlotRange.unbounded(v, typical)) {
                        points.put(f, v);
                    }
                }
            }
        }
        double[][] out = new double[2][points.size()];
        int k = 0;
        for (var e : points.entrySet()) {
            out[0][k] = e.getKey();
            out[1][k++] = e.getValue();
        }
        return out;
    }

    /**
     * Sets the axes and adds the curves, clipped to the plotting range, with unbounded stretches
     * marked at the top and named in the notes.
     */
    private static void plot(XYChart chart, double[] x, Curve[] curves, boolean logarithmic, double level,
            double[] probes, ChartTheme theme) {
        // Points whose frequency is not a finite positive number cannot be placed at all.
        boolean[] keep = new boolean[x.length];
        int n = 0;
        for (int i = 0; i < x.length; i++) {
            keep[i] = Double.isFinite(x[i]) && x[i] > 0;
            n += keep[i] ? 1 : 0;
        }
        double[] hz = ChartStyle.select(x, keep, n);
        double[][] ys = new double[curves.length][];
        for (int k = 0; k < curves.length; k++) {
            ys[k] = ChartStyle.select(curves[k].y(), keep, n);
        }
        double typical = PlotRange.typical(ys);
        double top = Math.max(PlotRange.top(typical, ys), Double.isFinite(level) ? level : 0);
        double bottom = 0;
        for (double[] y : ys) {
            for (double v : y) {
                if (!PlotRange.unbounded(v, typical)) {
                    bottom = Math.min(bottom, v);
                }
            }
        }
        boolean allZero = !(top > 0);
        if (allZero) {
            top = 1;
        }
        double floor = logarithmic ? floor(ys, top) : bottom;
        double xLow = hz.length > 0 ? hz[0] : 1;
        double xHigh = hz.length > 0 ? hz[hz.length - 1] : 2;
        for (double v : hz) {
            xLow = Math.min(xLow, v);
            xHigh = Math.max(xHigh, v);
        }
        if (!(xHigh > xLow)) {
            xLow = xLow * 0.9;
            xHigh = xHigh * 1.1;
        }
        AxesChartStyler s = chart.getStyler();
        s.setXAxisMin(xLow);
        s.setXAxisMax(xHigh);
        s.setxAxisTickLabelsFormattingFunction(ChartNumbers.linearAxis(xLow, xHigh));
        // Curves with the probed resonances, and where each is unbounded, before the axes are set:
        // a chart with notes keeps a band above the plotting range for them, over no curve.
        double[][][] xys = new double[curves.length][][];
        List<double[]> marks = new ArrayList<>();
        for (int k = 0; k < curves.length && hz.length > 0; k++) {
            xys[k] = withProbes(hz, ys[k], probes, curves[k].at(), typical);
            for (double at : PlotRange.unboundedAt(xys[k][0], xys[k][1], typical)) {
                marks.add(new double[] {at, top});
                note(chart, curves[k].name() + ": unbounded at "
                        + QuantityFormat.format(Unit.HERTZ.toSi(at), Unit.HERTZ));
            }
        }
        if (allZero) {
            note(chart, "every value is zero");
        }
        int lines = notes(chart).size();
        if (lines > 0) {
            // The notes take the top left of the plot; the legend goes below the plot, clear of them.
            s.setLegendPosition(Styler.LegendPosition.OutsideS);
            s.setLegendLayout(Styler.LegendLayout.Horizontal);
        }
        double headroom = lines == 0 ? 0 : Math.min(0.45, 0.06 + 0.075 * lines);
        double yTop = logarithmic ? top * 1.6 * Math.pow(top * 1.6 / floor, headroom / (1 - headroom))
                : top * 1.1 + headroom / (1 - headroom) * (top * 1.1 - floor);
        if (logarithmic) {
            ChartStyle.logAxis(s, false, floor, yTop);
        } else {
            s.setYAxisMin(floor);
            s.setYAxisMax(yTop);
            s.setyAxisTickLabelsFormattingFunction(ChartNumbers.linearAxis(floor, yTop));
        }
        chart.getStyler().setYAxisLogarithmic(logarithmic);
        for (int k = 0; k < curves.length && hz.length > 0; k++) {
            Curve c = curves[k];
            line(chart, c.name(), xys[k][0], PlotRange.clip(xys[k][1], typical, floor, top), c.color(), c.width(),
                    c.dashed());
        }
        if (Double.isFinite(level) && level > 0) {
            line(chart, "clearance", new double[] {xLow, xHigh}, new double[] {level, level}, curves[0].color(), 1.0f,
                    true);
        }
        if (!marks.isEmpty()) {
            XYSeries m = chart.addSeries(UNBOUNDED_SERIES, marks.stream().mapToDouble(p -> p[0]).toArray(),
                    marks.stream().mapToDouble(p -> p[1]).toArray());
            m.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            m.setMarker(SeriesMarkers.TRIANGLE_UP);
            m.setMarkerColor(theme.alarm());
            chart.getStyler().setMarkerSize(9);
        }
        ChartStyle.notePanel(chart, theme, logarithmic ? top * 1.6 : top * 1.1);
    }

    /** Marks the forcing band by its two ends (one line for one frequency) and a label at the top. */
    private static void shadeBand(XYChart chart, DesignResult r, ChartTheme theme) {
        double lo = Unit.HERTZ.fromSi(r.study().excitation().band().low());
        double hi = Unit.HERTZ.fromSi(r.study().excitation().band().high());
        if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
            return;
        }
        chart.addAnnotation(new AnnotationLine(lo, true, false));
        if (hi > lo) {
            chart.addAnnotation(new AnnotationLine(hi, true, false));
        }
        Double yMax = chart.getStyler().getYAxisMax();
        Double yMin = chart.getStyler().getYAxisMin();
        if (yMax != null && yMin != null) {
            double y = chart.getStyler().isYAxisLogarithmic() ? yMax / 1.25 : yMax - 0.04 * (yMax - yMin);
            chart.addAnnotation(new AnnotationText(hi > lo ? "forcing band" : "forcing", 0.5 * (lo + hi), y, false));
        }
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

    /**
     * The floor of a logarithmic axis: the decade at or below the smallest positive value, but
     * never more than four decades below the top.
     */
    private static double floor(double[][] curves, double top) {
        double min = Double.POSITIVE_INFINITY;
        for (double[] arr : curves) {
            for (double v : arr) {
                if (v > 0) {
                    min = Math.min(min, v);
                }
            }
        }
        double lowest = top * 1e-4;
        double f = Double.isInfinite(min) ? lowest : Math.max(min / 1.5, lowest);
        return Math.min(f, top / 10);
    }

    /** Unit symbols as typeset: N*s/m as N·s/m, m/s^2 as m/s². */
    public static String pretty(String symbol) {
        return ValueText.pretty(symbol);
    }

    private static String capitalised(String s) {
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
