package org.counterpoise.ui.gui.wizard;

import java.awt.Color;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.io.chart.ChartFactory;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.ui.gui.field.QuantityField;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/** The goal step's chart: the least peak an optimally tuned absorber reaches, against its mass ratio. */
final class MassRatioChart {
    private MassRatioChart() {
    }

    static XYChart of(DesignStudy study, DesignResult r, double[] mus, double[] peaks) {
        var unit = DisplayUnits.of(study.response().dimension());
        XYChart c = new XYChartBuilder().width(560).height(260).xAxisTitle("Mass ratio \u03bc")
                .yAxisTitle("Least peak " + QuantityField.pretty(unit.symbol())).build();
        c.getStyler().setChartBackgroundColor(Color.WHITE);
        c.getStyler().setPlotBackgroundColor(Color.WHITE);
        c.getStyler().setLegendVisible(false);
        c.getStyler().setXAxisLogarithmic(true);
        c.getStyler().setYAxisLogarithmic(true);
        c.getStyler().setXAxisDecimalPattern("0.###");
        c.getStyler().setYAxisDecimalPattern("0.##########");
        double[] y = new double[peaks.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = unit.fromSi(peaks[i]);
        }
        XYSeries s = c.addSeries("least peak", mus, y);
        s.setLineColor(ChartFactory.AFTER);
        s.setMarker(SeriesMarkers.CIRCLE);
        s.setMarkerColor(ChartFactory.AFTER);
        XYSeries now = c.addSeries("this design", new double[] {r.tuning().massRatio()},
                new double[] {unit.fromSi(r.responseAfter().value())});
        now.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        now.setMarkerColor(new Color(0xb3, 0x5c, 0x1e));
        now.setMarker(SeriesMarkers.DIAMOND);
        return c;
    }
}
