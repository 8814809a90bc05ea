package org.counterpoise.io.chart;

import java.awt.Color;
import java.awt.Font;
import java.util.List;
import org.counterpoise.core.units.Unit;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.AxesChartStyler;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The house style every chart of this package shares, apart from what any one chart shows: the
 * look of an XY chart, logarithmic axes, the box of notes, the chart that only says why it is
 * empty, and values converted to a display unit.
 */
final class ChartStyle {
    private ChartStyle() {
    }

    /**
     * The look every Counterpoise XY chart shares: light grid, small sans-serif type, colours of
     * the theme.
     * @param s the chart's styler
     * @param theme colours
     */
    static void houseStyle(XYStyler s, ChartTheme theme) {
        frame(s, theme, 10);
        s.setPlotBorderVisible(true);
        s.setPlotBorderColor(theme.border());
        s.setPlotGridLinesColor(theme.grid());
        s.setAxisTickMarksColor(theme.border());
        s.setLegendBackgroundColor(theme.plot());
        s.setLegendPosition(Styler.LegendPosition.InsideNE);
        s.setLegendFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        s.setMarkerSize(0);
        s.setAntiAlias(true);
        // The wizard shows values in its own readout; the chart library's pointer aids stay off.
        s.setToolTipsEnabled(false);
        s.setCursorEnabled(false);
        s.setZoomEnabled(false);
    }

    /**
     * What every chart of the package shares, XY charts and the heat map alike: backgrounds, text
     * colour, the legend's border, and the type of titles and tick labels.
     * @param s the chart's styler
     * @param theme colours
     * @param tickPoints size of the tick labels' type, in points
     */
    static void frame(AxesChartStyler s, ChartTheme theme, int tickPoints) {
        s.setChartBackgroundColor(theme.background());
        s.setPlotBackgroundColor(theme.plot());
        s.setChartFontColor(theme.text());
        s.setAxisTickLabelsColor(theme.text());
        s.setLegendBorderColor(theme.border());
        s.setChartTitleBoxVisible(false);
        s.setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 13));
        s.setAxisTitleFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        s.setAxisTickLabelsFont(new Font(Font.SANS_SERIF, Font.PLAIN, tickPoints));
    }

    /**
     * A logarithmic axis over [low, high] that labels its decades and marks 2 to 9 times each decade
     * with unlabelled minor ticks; when it spans less than about one decade it labels every tick,
     * so it never shows an axis without a number.
     */
    static void logAxis(AxesChartStyler s, boolean xAxis, double low, double high) {
        boolean fewDecades = Math.log10(high / low) < 1.3;
        String pattern = low < 1e-4 || high > 1e6 ? "0.##E0" : "0.##########";
        if (xAxis) {
            s.setXAxisLogarithmic(true);
            s.setXAxisMin(low);
            s.setXAxisMax(high);
            s.setXAxisLogarithmicDecadeOnly(!fewDecades);
            s.setXAxisDecimalPattern(pattern);
        } else {
            s.setYAxisLogarithmic(true);
            s.setYAxisMin(low);
            s.setYAxisMax(high);
            s.setYAxisLogarithmicDecadeOnly(!fewDecades);
            s.setYAxisDecimalPattern(pattern);
        }
    }

    /**
     * Writes the chart's notes in a box at the left of its plot, its lower edge at a given height
     * (the axes' ranges must be set).
     * @param chart the chart
     * @param theme colours
     * @param above the height the box's lower edge sits at, in data units; NaN for near the top
     */
    static void notePanel(XYChart chart, ChartTheme theme, double above) {
        List<String> notes = ChartFactory.notes(chart);
        AxesChartStyler s = chart.getStyler();
        if (notes.isEmpty() || s.getXAxisMin() == null || s.getXAxisMax() == null || s.getYAxisMin() == null
                || s.getYAxisMax() == null) {
            return;
        }
        double x0 = s.getXAxisMin();
        double x1 = s.getXAxisMax();
        double y0 = s.getYAxisMin();
        double y1 = s.getYAxisMax();
        double x = s.isXAxisLogarithmic() ? x0 * Math.pow(x1 / x0, 0.015) : x0 + 0.015 * (x1 - x0);
        double lines = Math.min(0.5, 0.03 + 0.07 * notes.size());
        double y = !Double.isNaN(above) ? above
                : s.isYAxisLogarithmic() ? y1 / Math.pow(y1 / y0, lines) : y1 - lines * (y1 - y0);
        chart.addAnnotation(new NoteBox(notes, x, y, theme.plot(), theme.alarm()));
    }

    /** A chart with nothing to draw but a note in the middle of its plot. */
    static XYChart emptyNote(XYChart c, String text, ChartTheme theme) {
        c.getStyler().setXAxisLogarithmic(false);
        c.getStyler().setYAxisLogarithmic(false);
        c.getStyler().setXAxisMin(0.0);
        c.getStyler().setXAxisMax(1.0);
        c.getStyler().setYAxisMin(0.0);
        c.getStyler().setYAxisMax(1.0);
        c.getStyler().setAxisTicksVisible(false);
        c.getStyler().setAnnotationTextFontColor(theme.text());
        c.getStyler().setAnnotationTextFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        XYSeries blank = c.addSeries(" ", new double[] {0, 1}, new double[] {0, 0});
        blank.setLineColor(new Color(0, 0, 0, 0));
        blank.setMarker(SeriesMarkers.NONE);
        blank.setShowInLegend(false);
        c.addAnnotation(new AnnotationText(text, 0.5, 0.5, false));
        return c;
    }

    /**
     * @param si values in SI
     * @param unit the unit to show them in
     * @return the values in that unit (a new array)
     */
    static double[] inUnit(double[] si, Unit unit) {
        double[] out = new double[si.length];
        for (int i = 0; i < si.length; i++) {
            out[i] = unit.fromSi(si[i]);
        }
        return out;
    }

    /** The first {@code n} values whose {@code keep} is true, in order. */
    static double[] select(double[] v, boolean[] keep, int n) {
        double[] out = new double[n];
        int k = 0;
        for (int i = 0; i < v.length && i < keep.length; i++) {
            if (keep[i]) {
                out[k++] = v[i];
            }
        }
        return out;
    }
}
