package org.counterpoise.ui.gui.wizard;

import java.util.function.Function;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.io.chart.ChartTheme;
import org.counterpoise.io.chart.MassRatioCharts;
import org.counterpoise.io.text.DisplayUnits;
import org.knowm.xchart.XYChart;

/** The goal step's chart: the least peak an optimally tuned absorber reaches, against its mass ratio. */
final class MassRatioChart {
    private MassRatioChart() {
    }

    /** A recipe for the chart in the current theme (the chart itself lives in ChartFactory). */
    static Function<ChartTheme, XYChart> of(DesignStudy study, DesignResult r, double[] mus, double[] peaks) {
        var unit = DisplayUnits.of(study.response().dimension());
        double[] y = new double[peaks.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = unit.fromSi(peaks[i]);
        }
        double designMu = r.tuning().massRatio();
        double designPeak = unit.fromSi(r.responseAfter().value());
        return theme -> MassRatioCharts.massRatio(mus, y, unit, designMu, designPeak, theme, 560, 260);
    }
}
