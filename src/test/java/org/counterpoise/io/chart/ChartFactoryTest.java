package org.counterpoise.io.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.file.Path;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.ProjectReader;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;

/** The charts as data (no pixel tests): series values equal the design curves; files encode headless. */
class ChartFactoryTest {

    @Test
    void responseChartCarriesTheCurvesInDisplayUnitsAndEncodesHeadless() throws Exception {
        DesignResult r = Designer.design(ProjectReader.readStudy(Path.of("presets/rooftop-fan-platform.json")));
        DesignCurves c = DesignCurves.of(r);
        XYChart chart = ChartFactory.response(r, c, true, 600, 400);
        var after = chart.getSeriesMap().get("with absorber");
        double[] y = after.getYData();
        double[] x = after.getXData();
        for (int i = 0; i < y.length; i += 50) {
            assertEquals(Unit.MILLIMETRE.fromSi(c.after()[i]), y[i], 1e-12 * y[i]);
            assertEquals(Unit.HERTZ.fromSi(c.frequency()[i]), x[i], 1e-12 * x[i]);
        }
        // The exact peak is a grid point, so the plotted maximum is the reported one.
        double plottedMax = 0;
        double[] bandHz = {Unit.HERTZ.fromSi(r.study().excitation().band().low()),
            Unit.HERTZ.fromSi(r.study().excitation().band().high())};
        for (int i = 0; i < y.length; i++) {
            if (x[i] >= bandHz[0] && x[i] <= bandHz[1]) {
                plottedMax = Math.max(plottedMax, y[i]);
            }
        }
        assertEquals(Unit.MILLIMETRE.fromSi(r.responseAfter().value()), plottedMax, 1e-12 * plottedMax);
        ByteArrayOutputStream png = new ByteArrayOutputStream();
        ChartFiles.png(chart, png);
        byte[] head = java.util.Arrays.copyOf(png.toByteArray(), 4);
        assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G'}, head);
        ByteArrayOutputStream svg = new ByteArrayOutputStream();
        ChartFiles.svg(ChartFactory.stroke(r, c, false, 600, 400), svg);
        assertTrue(svg.toString(java.nio.charset.StandardCharsets.UTF_8).contains("<svg"));
    }
}
