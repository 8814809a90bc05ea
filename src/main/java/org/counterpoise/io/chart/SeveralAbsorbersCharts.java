package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.UnitSystem;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The response of the whole structure at a named point without and with several absorbers (every
 * mode, the absorbers at their point), and each mode's part of it with the absorbers (dashed), on a
 * logarithmic axis, over the band and the modes around it, in the house style of {@link ChartStyle}.
 * The values come from {@link SeveralAbsorbers#response} and {@link SeveralAbsorbers#modeParts};
 * nothing is designed here.
 */
public final class SeveralAbsorbersCharts {
    /** Points of each curve. */
    static final int POINTS = 600;

    private SeveralAbsorbersCharts() {
    }

    /** Dash patterns of the modes' parts, in turn. */
    private static final float[][] DASHES = {{6f, 4f}, {2f, 3f}, {9f, 3f, 2f, 3f}, {12f, 5f}};

    /**
     * @param set the absorbers and the structure
     * @param units the display units of the vertical axis
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @return the chart at the design's response point
     */
    public static XYChart response(SeveralAbsorbers set, UnitSystem units, ChartTheme theme, int width, int height) {
        return response(set, set.layout().responsePoint(), units, theme, width, height);
    }

    /**
     * @param set the absorbers and the structure
     * @param point a named point of the structure
     * @param units the display units of the vertical axis
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @return the chart: displacement before and after and each mode's part after, against frequency in
     *     Hz, the band marked by its edges
     */
    public static XYChart response(SeveralAbsorbers set, String point, UnitSystem units, ChartTheme theme, int width,
            int height) {
        Unit length = DisplayUnits.of(Dimension.LENGTH, units);
        double low = set.band().low();
        double high = set.band().high();
        for (Mode m : set.layout().structure().modes()) {
            low = Math.min(low, m.naturalFrequency());
            high = Math.max(high, m.naturalFrequency());
        }
        low *= 0.7;
        high *= 1.3;
        XYChart c = new XYChartBuilder().width(width).height(height).xAxisTitle("Frequency (Hz)")
                .yAxisTitle("Displacement at " + point + " (" + ChartFactory.pretty(
                        length.symbol()) + ")").build();
        ChartStyle.houseStyle(c.getStyler(), theme);
        double[] hz = new double[POINTS + 1];
        double[] before = new double[POINTS + 1];
        double[] after = new double[POINTS + 1];
        DoubleUnaryOperator bare = set.response(false, point);
        DoubleUnaryOperator fitted = set.response(true, point);
        int modes = set.layout().structure().size();
        double[][] parts = new double[modes][POINTS + 1];
        DoubleFunction<double[]> modeParts = set.modeParts(point);
        double smallest = Double.POSITIVE_INFINITY;
        double largest = 0;
        for (int i = 0; i <= POINTS; i++) {
            double w = low + (high - low) * i / POINTS;
            hz[i] = Unit.HERTZ.fromSi(w);
            before[i] = length.fromSi(bare.applyAsDouble(w));
            after[i] = length.fromSi(fitted.applyAsDouble(w));
            double[] part = modes > 1 ? modeParts.apply(w) : new double[0];
            for (int r = 0; r < part.length; r++) {
                parts[r][i] = length.fromSi(part[r]);
            }
            for (double v : new double[] {before[i], after[i]}) {
                if (v > 0 && Double.isFinite(v)) {
                    smallest = Math.min(smallest, v);
                    largest = Math.max(largest, v);
                }
            }
        }
        if (!(largest > 0)) {
            return ChartStyle.emptyNote(c, "no finite response to draw", theme);
        }
        for (int i = 0; i <= POINTS; i++) {
            before[i] = Math.min(Math.max(before[i], smallest), largest);
            after[i] = Math.min(Math.max(after[i], smallest), largest);
            for (int r = 0; r < modes && modes > 1; r++) {
                // a part far below the curves is clipped to the axis' floor (drawn along it)
                parts[r][i] = Math.min(Math.max(parts[r][i], smallest), largest);
            }
        }
        ChartStyle.logAxis(c.getStyler(), false, smallest / 1.3, largest * 1.3);
        XYSeries b = c.addSeries("without absorbers", hz, before);
        b.setLineColor(theme.before());
        b.setMarker(SeriesMarkers.NONE);
        XYSeries a = c.addSeries("with " + set.absorbers().size() + " absorbers", hz, after);
        a.setLineColor(theme.after());
        a.setMarker(SeriesMarkers.NONE);
        for (int r = 0; r < modes && modes > 1; r++) {
            XYSeries m = c.addSeries("mode " + set.layout().modeNames().get(r) + ", its part with absorbers", hz,
                    parts[r]);
            m.setLineColor(theme.after());
            m.setMarker(SeriesMarkers.NONE);
            m.setLineStyle(new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                    DASHES[r % DASHES.length], 0f));
        }
        double[] edge = {smallest / 1.3, largest * 1.3};
        double[] edges = set.band().isSingle() ? new double[] {set.band().low()}
                : new double[] {set.band().low(), set.band().high()};
        for (double w : edges) {
            double f = Unit.HERTZ.fromSi(w);
            XYSeries e = c.addSeries(w == set.band().low() ? "band" : "band ", new double[] {f, f}, edge);
            e.setLineColor(theme.grid().darker());
            e.setMarker(SeriesMarkers.NONE);
            e.setShowInLegend(w == set.band().low());
        }
        return c;
    }
}
