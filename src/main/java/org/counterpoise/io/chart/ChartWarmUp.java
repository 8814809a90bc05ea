package org.counterpoise.io.chart;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;

/**
 * Paints one chart in the house style (a linear and a logarithmic axis, a legend) into
 * an image nobody sees, so that the chart library's painting classes, the text and shape pipelines and
 * their first compilation are done before a chart is first painted on screen. The wizard calls it on a
 * background thread at start: a chart's first paint on the event thread took 38 to 173 ms of CPU, its
 * repaints 32 to 51 ms (docs/performance.md). Draws nothing anyone uses, so it may run on any thread.
 */
public final class ChartWarmUp {
    private ChartWarmUp() {
    }

    /** Builds and paints the chart once, at a window's usual size. */
    public static void paintOnce() {
        ChartTheme theme = ChartTheme.LIGHT;
        XYChart chart = new XYChartBuilder().width(640).height(400).title("warm-up").xAxisTitle("Frequency (Hz)")
                .yAxisTitle("Displacement (mm)").build();
        ChartStyle.houseStyle(chart.getStyler(), theme);
        int n = 200;
        double[] x = new double[n];
        double[] y = new double[n];
        double[] z = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 5 + 10.0 * i / (n - 1);
            double g = x[i] / 10;
            y[i] = 1 / Math.hypot(1 - g * g, 0.04 * g);
            z[i] = 0.5 * y[i];
        }
        chart.addSeries("without", x, y).setLineColor(theme.before());
        chart.addSeries("with", x, z).setLineColor(theme.after());
        ChartStyle.logAxis(chart.getStyler(), false, 0.1, 100);
        BufferedImage image = new BufferedImage(640, 400, BufferedImage.TYPE_INT_RGB);
        Graphics2D g2 = image.createGraphics();
        try {
            chart.paint(g2, 640, 400);
        } finally {
            g2.dispose();
        }
    }
}
