package org.counterpoise.io.chart;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.units.Unit;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The chart of how the least reachable peak falls as the absorber grows: one point per mass
 * ratio, on logarithmic axes, with this design marked. It draws numbers it is given (it computes
 * no design) in the house style of {@link ChartStyle}.
 */
public final class MassRatioCharts {
    private MassRatioCharts() {
    }

    /**
     * The least peak reachable for each mass ratio, on logarithmic axes, with this design marked.
     * @param massRatios mass ratios (x)
     * @param leastPeaks least peak for each, in the display unit
     * @param unit the display unit of the response
     * @param massRatio this design's mass ratio
     * @param peak this design's peak, in the display unit
     * @param theme colours
     * @param width pixels
     * @param height pixels
     * @return the chart
     */
    public static XYChart massRatio(double[] massRatios, double[] leastPeaks, Unit unit, double massRatio, double peak,
            ChartTheme theme, int width, int height) {
        XYChart c = new XYChartBuilder().width(width).height(height).xAxisTitle("Mass ratio \u03bc")
                .yAxisTitle("Least peak (" + ChartFactory.pretty(unit.symbol()) + ")").build();
        ChartStyle.houseStyle(c.getStyler(), theme);
        // The legend tells the curve of least peaks from this design's diamond.
        List<double[]> points = new ArrayList<>();
        for (int i = 0; i < Math.min(massRatios.length, leastPeaks.length); i++) {
            if (massRatios[i] > 0 && Double.isFinite(massRatios[i]) && leastPeaks[i] > 0
                    && Double.isFinite(leastPeaks[i])) {
                points.add(new double[] {massRatios[i], leastPeaks[i]});
            }
        }
        boolean here = massRatio > 0 && Double.isFinite(massRatio) && peak > 0 && Double.isFinite(peak);
        if (points.isEmpty() && !here) {
            ChartFactory.note(c, "no finite least peak to draw");
            return ChartStyle.emptyNote(c, "no finite least peak to draw", theme);
        }
        double[] x = points.stream().mapToDouble(p -> p[0]).toArray();
        double[] y = points.stream().mapToDouble(p -> p[1]).toArray();
        double[] xr = span(x, here ? massRatio : Double.NaN);
        double[] yr = span(y, here ? peak : Double.NaN);
        for (int i = 0; i < x.length; i++) {
            x[i] = Math.max(x[i], xr[0]);
            y[i] = Math.max(y[i], yr[0]);
        }
        ChartStyle.logAxis(c.getStyler(), true, xr[0] / 1.2, xr[1] * 1.2);
        ChartStyle.logAxis(c.getStyler(), false, yr[0] / 1.3, yr[1] * 1.3);
        if (x.length > 0) {
            XYSeries s = c.addSeries("least peak", x, y);
            s.setLineColor(theme.after());
            s.setMarker(SeriesMarkers.CIRCLE);
            s.setMarkerColor(theme.after());
        }
        if (here) {
            XYSeries now = c.addSeries("this design", new double[] {massRatio}, new double[] {peak});
            now.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            now.setMarkerColor(theme.stroke());
            now.setMarker(SeriesMarkers.DIAMOND);
        }
        c.getStyler().setMarkerSize(6);
        return c;
    }

    /** Smallest and largest of the values and an extra point (NaN: none); never equal. */
    private static double[] span(double[] v, double extra) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (double a : v) {
            lo = Math.min(lo, a);
            hi = Math.max(hi, a);
        }
        if (!Double.isNaN(extra)) {
            lo = Math.min(lo, extra);
            hi = Math.max(hi, extra);
        }
        if (!(hi > lo)) {
            lo = hi / 2;
            hi = hi * 2;
        }
        // A logarithmic axis over more than twelve decades tells nothing: the rest sits at its floor.
        return new double[] {Math.max(lo, hi * 1e-12), hi};
    }
}
