package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.RunUpStudy;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.runup.Envelope;
import org.counterpoise.core.runup.RunUpReportData;
import org.counterpoise.core.runup.RunUpResult;
import org.counterpoise.core.runup.SteadyCurves;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.DisturbanceInput;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.RunUpReport;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The run-up charts: the response envelope met during the ramp (the largest magnitude in each
 * forcing cycle) against the shaft speed, with and without the absorber, beside the steady-state
 * amplitude of the same quantity at each speed (a thin, lighter line). One chart for the structure's response,
 * one for the absorber stroke. They draw numbers they are given (computed by
 * {@link RunUpStudy#run}) in the house style of {@link ChartStyle}; an unbounded steady-state
 * value (an undamped resonance) never reaches the chart library: it is drawn to the top edge and
 * named in the chart's notes ({@link PlotRange}).
 */
public final class RunUpCharts {
    /** A steady state is drawn up to this multiple of the envelope's peak, and cut above it. */
    static final double ENVELOPE_HEADROOM = 3.0;

    private RunUpCharts() {
    }

    /**
     * The envelope of the structure's response, with and without the absorber, and the steady state.
     * @param result the computed run-up
     * @param speedUnit the unit of the shaft speed axis (rpm or Hz)
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @return the chart
     */
    public static XYChart structure(RunUpStudy.Result result, Unit speedUnit, ChartTheme theme, int width,
            int height) {
        return structure(result, speedUnit, UnitSystem.SI, theme, width, height);
    }

    /**
     * The envelope of the structure's response, with and without the absorber, and the steady state.
     * @param result the computed run-up
     * @param speedUnit the unit of the shaft speed axis (rpm or Hz)
     * @param units the unit system of the response axis
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @return the chart
     */
    public static XYChart structure(RunUpStudy.Result result, Unit speedUnit, UnitSystem units, ChartTheme theme,
            int width, int height) {
        ResponseKind k = result.study().structureQuantity();
        RunUpReportData d = result.data();
        Unit y = DisplayUnits.of(k.dimension(), units);
        List<Line> lines = List.of(
                envelope(d, d.comparison().withoutAbsorber(), k, "without absorber, " + direction(d), theme.before(),
                        speedUnit, y),
                envelope(d, d.comparison().withAbsorber(), k, "with absorber, " + direction(d), theme.after(), speedUnit,
                        y),
                steady(d, result.steady(), false, k, "without absorber, steady state", theme.before(), speedUnit, y),
                steady(d, result.steady(), true, k, "with absorber, steady state", theme.after(), speedUnit, y));
        return chart(capitalised(RunUpReport.label(k)) + " during the " + direction(d), k, lines, speedUnit, y, theme,
                width, height, band(result, speedUnit));
    }

    /**
     * The envelope of the absorber stroke and its steady state.
     * @param result the computed run-up
     * @param speedUnit the unit of the shaft speed axis (rpm or Hz)
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @return the chart
     */
    public static XYChart stroke(RunUpStudy.Result result, Unit speedUnit, ChartTheme theme, int width, int height) {
        return stroke(result, speedUnit, UnitSystem.SI, theme, width, height);
    }

    /**
     * The envelope of the absorber stroke and its steady state.
     * @param result the computed run-up
     * @param speedUnit the unit of the shaft speed axis (rpm or Hz)
     * @param units the unit system of the stroke axis
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @return the chart
     */
    public static XYChart stroke(RunUpStudy.Result result, Unit speedUnit, UnitSystem units, ChartTheme theme,
            int width, int height) {
        RunUpReportData d = result.data();
        Unit y = DisplayUnits.of(ResponseKind.STROKE.dimension(), units);
        List<Line> lines = List.of(
                envelope(d, d.comparison().withAbsorber(), ResponseKind.STROKE, "stroke, " + direction(d), theme.stroke(),
                        speedUnit, y),
                steady(d, result.steady(), true, ResponseKind.STROKE, "stroke, steady state", theme.stroke(), speedUnit,
                        y));
        return chart("Absorber stroke during the " + direction(d), ResponseKind.STROKE, lines, speedUnit, y, theme,
                width, height, band(result, speedUnit));
    }

    /**
     * The unit of the shaft speed axis: the unit the project states its speeds in when that is
     * Hz or rpm, otherwise rpm (the trade's unit of shaft speed, common practice).
     * @param disturbance the disturbance as typed
     * @return Hz or rpm
     */
    public static Unit speedUnit(DisturbanceInput disturbance) {
        Unit typed = disturbance.isBand() ? disturbance.bandUnit()
                : disturbance.frequency() == null ? null : disturbance.frequency().unit();
        return typed == Unit.HERTZ ? Unit.HERTZ : Unit.REV_PER_MINUTE;
    }

    /** One curve: x in the speed unit, y in the display unit; a steady state is drawn thin and lighter. */
    private record Line(String name, double[] x, double[] y, Color color, boolean steady) {
    }

    private static Line envelope(RunUpReportData d, RunUpResult r, ResponseKind k, String name, Color color,
            Unit speedUnit, Unit y) {
        Envelope e = r.envelope();
        return new Line(name, shaft(d, e.speed(), speedUnit), ChartStyle.inUnit(e.of(k), y), color, false);
    }

    private static Line steady(RunUpReportData d, SteadyCurves s, boolean withAbsorber, ResponseKind k, String name,
            Color color, Unit speedUnit, Unit y) {
        return new Line(name, shaft(d, s.speed(), speedUnit), ChartStyle.inUnit(s.of(withAbsorber, k), y), color, true);
    }

    /** Forcing frequencies (rad/s) as shaft speeds in the unit of the axis. */
    private static double[] shaft(RunUpReportData d, double[] forcing, Unit speedUnit) {
        double[] out = new double[forcing.length];
        for (int i = 0; i < forcing.length; i++) {
            out[i] = speedUnit.fromSi(d.shaftSpeed(forcing[i]));
        }
        return out;
    }

    /** @return the running speeds {low, high} as shaft speeds in the axis unit */
    private static double[] band(RunUpStudy.Result result, Unit speedUnit) {
        FrequencyBand b = result.study().design().study().excitation().band();
        return new double[] {speedUnit.fromSi(result.data().shaftSpeed(b.low())),
            speedUnit.fromSi(result.data().shaftSpeed(b.high()))};
    }

    private static XYChart chart(String title, ResponseKind k, List<Line> lines, Unit speedUnit, Unit unit,
            ChartTheme theme, int width, int height, double[] band) {
        XYChart c = new XYChartBuilder().width(width).height(height).title(title)
                .xAxisTitle("Shaft speed (" + ChartFactory.pretty(speedUnit.symbol()) + ")")
                .yAxisTitle(capitalised(RunUpReport.label(k)) + " (" + ChartFactory.pretty(unit.symbol()) + ")")
                .build();
        ChartStyle.houseStyle(c.getStyler(), theme);
        double[][] ys = lines.stream().map(Line::y).toArray(double[][]::new);
        double typical = PlotRange.typical(ys);
        double top = PlotRange.top(typical, ys);
        if (!(top > 0) || !Double.isFinite(top)) {
            String text = "No response to draw: every value is zero or unbounded.";
            ChartFactory.note(c, text);
            return ChartStyle.emptyNote(c, text, theme);
        }
        double ceiling = top * 1.08;
        // The envelope is what the chart is about: a steady state far above it (an undamped or very
        // lightly damped resonance) is cut at three times the envelope's peak and its peak named in
        // a note, so that it does not flatten the envelope to the axis.
        double envelopeTop = PlotRange.top(typical, lines.stream().filter(l -> !l.steady()).map(Line::y)
                .toArray(double[][]::new));
        if (envelopeTop > 0) {
            ceiling = Math.min(ceiling, ENVELOPE_HEADROOM * envelopeTop * 1.08);
        }
        double xMax = 0;
        List<double[]> marks = new ArrayList<>();
        for (Line line : lines) {
            for (double v : line.x()) {
                if (Double.isFinite(v)) {
                    xMax = Math.max(xMax, v);
                }
            }
            List<Double> unbounded = PlotRange.unboundedAt(line.x(), line.y(), typical);
            for (double at : unbounded) {
                marks.add(new double[] {at, ceiling});
                ChartFactory.note(c, line.name() + ": unbounded at "
                        + QuantityFormat.number(at, QuantityFormat.FIGURES) + " " + speedUnit.symbol());
            }
            int highest = highest(line.y(), typical);
            if (unbounded.isEmpty() && highest >= 0 && line.y()[highest] > ceiling) {
                marks.add(new double[] {line.x()[highest], ceiling});
                ChartFactory.note(c, line.name() + ": above the chart, peak "
                        + QuantityFormat.format(unit.toSi(line.y()[highest]), unit) + " at "
                        + QuantityFormat.number(line.x()[highest], QuantityFormat.FIGURES) + " " + speedUnit.symbol());
            }
            XYSeries s = c.addSeries(line.name(), line.x(), PlotRange.clip(line.y(), typical, 0.0, ceiling));
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setMarker(SeriesMarkers.NONE);
            // The steady state is thin and lighter, not dashed: the chart library draws a curve of
            // many short segments, each starting its dash pattern afresh, so a dash would look solid.
            Color c0 = line.color();
            s.setLineColor(line.steady() ? new Color(c0.getRed(), c0.getGreen(), c0.getBlue(), 150) : c0);
            s.setLineStyle(new BasicStroke(line.steady() ? 1.3f : 2.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        }
        var s = c.getStyler();
        s.setXAxisMin(0.0);
        s.setXAxisMax(xMax > 0 ? xMax : 1.0);
        s.setYAxisMin(0.0);
        s.setYAxisMax(ceiling * 1.12);
        s.setLegendPosition(Styler.LegendPosition.InsideNW);
        s.setxAxisTickLabelsFormattingFunction(ChartNumbers.linearAxis(0.0, xMax));
        s.setyAxisTickLabelsFormattingFunction(ChartNumbers.linearAxis(0.0, ceiling));
        if (!marks.isEmpty()) {
            XYSeries m = c.addSeries(ChartFactory.UNBOUNDED_SERIES, marks.stream().mapToDouble(p -> p[0]).toArray(),
                    marks.stream().mapToDouble(p -> p[1]).toArray());
            m.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            m.setMarker(SeriesMarkers.TRIANGLE_UP);
            m.setMarkerColor(theme.alarm());
            s.setMarkerSize(9);
        }
        // the running speeds, marked as the frequency-response charts mark the forcing band
        s.setAnnotationLineColor(theme.band());
        s.setAnnotationLineStroke(new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {2f, 3f}, 0f));
        s.setAnnotationTextFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        s.setAnnotationTextFontColor(theme.dark() ? theme.band() : theme.band().darker());
        if (Double.isFinite(band[0]) && Double.isFinite(band[1]) && band[1] <= xMax) {
            c.addAnnotation(new AnnotationLine(band[0], true, false));
            if (band[1] > band[0]) {
                c.addAnnotation(new AnnotationLine(band[1], true, false));
            }
            c.addAnnotation(new AnnotationText(band[1] > band[0] ? "running speeds" : "running speed",
                    0.5 * (band[0] + band[1]), ceiling * 1.07, false));
        }
        // the notes' box sits at the left below the legend, where a run-up from rest is still quiet
        ChartStyle.notePanel(c, theme, 0.3 * ceiling);
        return c;
    }

    /** @return the index of the largest value that is not unbounded, or -1 */
    private static int highest(double[] y, double typical) {
        int best = -1;
        for (int i = 0; i < y.length; i++) {
            if (!PlotRange.unbounded(y[i], typical) && (best < 0 || y[i] > y[best])) {
                best = i;
            }
        }
        return best;
    }

    private static String direction(RunUpReportData d) {
        return d.runDown() ? "run-down" : "run-up";
    }

    private static String capitalised(String s) {
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
