package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.identify.ModalModel;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.text.ValueText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Measured against fitted: the FRF's magnitude (logarithmic) and phase over the fitted band, the
 * measured lines as dots, the model as a line, in the unit the file was read in.
 */
public final class IdentificationCharts {
    /** Lines of the drawn model per measured line, so the fitted curve is smooth between them. */
    private static final int SMOOTHING = 8;

    private IdentificationCharts() {
    }

    /**
     * @param measured the fitted band
     * @param model the model
     * @param unit the unit of the values shown
     * @param width pixels
     * @param height pixels
     * @return the magnitude chart
     */
    public static XYChart magnitude(MeasuredFrf measured, ModalModel model, FrfUnit unit, int width, int height) {
        return chart(measured, model, unit, true, width, height);
    }

    /**
     * @param measured the fitted band
     * @param model the model
     * @param unit the unit of the values shown
     * @param width pixels
     * @param height pixels
     * @return the phase chart
     */
    public static XYChart phase(MeasuredFrf measured, ModalModel model, FrfUnit unit, int width, int height) {
        return chart(measured, model, unit, false, width, height);
    }

    private static XYChart chart(MeasuredFrf measured, ModalModel model, FrfUnit unit, boolean magnitude, int width,
            int height) {
        String kind = unit.kind().id();
        XYChart c = new XYChartBuilder().width(width).height(height)
                .title((magnitude ? "Magnitude" : "Phase") + " of the " + kind + ", measured and fitted")
                .xAxisTitle("Frequency (Hz)")
                .yAxisTitle(magnitude ? ValueText.capitalised(kind) + " (" + ChartFactory.pretty(unit.symbol()) + ")"
                        : "Phase (degrees)")
                .build();
        ChartStyle.houseStyle(c.getStyler(), ChartTheme.LIGHT);
        int n = measured.size();
        double[] f = new double[n];
        double[] y = new double[n];
        double low = Double.POSITIVE_INFINITY;
        double high = 0.0;
        for (int i = 0; i < n; i++) {
            f[i] = Unit.HERTZ.fromSi(measured.omega()[i]);
            y[i] = shown(measured.value(i), unit, magnitude);
            if (magnitude && y[i] > 0) {
                low = Math.min(low, y[i]);
                high = Math.max(high, y[i]);
            }
        }
        int m = (n - 1) * SMOOTHING + 1;
        double[] fm = new double[m];
        double[] ym = new double[m];
        for (int j = 0; j < m; j++) {
            double w = measured.omega()[0] + (measured.omega()[n - 1] - measured.omega()[0]) * j / (m - 1);
            fm[j] = Unit.HERTZ.fromSi(w);
            ym[j] = shown(model.value(w, unit.kind()), unit, magnitude);
            if (magnitude && ym[j] > 0) {
                low = Math.min(low, ym[j]);
                high = Math.max(high, ym[j]);
            }
        }
        XYSeries dots = c.addSeries("measured", f, y);
        dots.setMarker(SeriesMarkers.CIRCLE);
        dots.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        dots.setMarkerColor(ChartTheme.LIGHT.before());
        XYSeries line = c.addSeries("fitted, " + model.modes().size() + " mode(s)", fm, ym);
        line.setMarker(SeriesMarkers.NONE);
        line.setLineColor(ChartTheme.LIGHT.after());
        line.setLineStyle(new BasicStroke(1.6f));
        c.getStyler().setMarkerSize(4);
        if (magnitude && high > low) {
            ChartStyle.logAxis(c.getStyler(), false, low / 1.5, high * 1.5);
        }
        return c;
    }

    private static double shown(Complex si, FrfUnit unit, boolean magnitude) {
        return magnitude ? si.abs() / unit.toSi() : Math.toDegrees(si.getArgument());
    }
}
