package org.counterpoise.io.chart;

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
 * The response of the whole structure at its response point without and with several absorbers
 * (every mode, the absorbers at their point), on a logarithmic axis, over the band and the modes
 * around it, in the house style of {@link ChartStyle}. The values come from
 * {@link SeveralAbsorbers#response}; nothing is designed here.
 */
public final class SeveralAbsorbersCharts {
    /** Points of each curve. */
    static final int POINTS = 600;

    private SeveralAbsorbersCharts() {
    }

    /**
     * @param set the absorbers and the structure
     * @param units the display units of the vertical axis
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @return the chart: displacement before and after against frequency in Hz, the band shaded by its edges
     */
    public static XYChart response(SeveralAbsorbers set, UnitSystem units, ChartTheme theme, int width, int height) {
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
                .yAxisTitle("Displacement at " + set.layout().responsePoint() + " (" + ChartFactory.pretty(
                        length.symbol()) + ")").build();
        ChartStyle.houseStyle(c.getStyler(), theme);
        double[] hz = new double[POINTS + 1];
        double[] before = new double[POINTS + 1];
        double[] after = new double[POINTS + 1];
        DoubleUnaryOperator bare = set.response(false);
        DoubleUnaryOperator fitted = set.response(true);
        double smallest = Double.POSITIVE_INFINITY;
        double largest = 0;
        for (int i = 0; i <= POINTS; i++) {
            double w = low + (high - low) * i / POINTS;
            hz[i] = Unit.HERTZ.fromSi(w);
            before[i] = length.fromSi(bare.applyAsDouble(w));
            after[i] = length.fromSi(fitted.applyAsDouble(w));
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
        }
        ChartStyle.logAxis(c.getStyler(), false, smallest / 1.3, largest * 1.3);
        XYSeries b = c.addSeries("without absorbers", hz, before);
        b.setLineColor(theme.before());
        b.setMarker(SeriesMarkers.NONE);
        XYSeries a = c.addSeries("with " + set.absorbers().size() + " absorbers", hz, after);
        a.setLineColor(theme.after());
        a.setMarker(SeriesMarkers.NONE);
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
