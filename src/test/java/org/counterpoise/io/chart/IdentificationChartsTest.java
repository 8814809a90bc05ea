package org.counterpoise.io.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.identify.ModalFit;
import org.counterpoise.core.identify.ModalModel;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.testing.SyntheticFrf;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/** The measured-against-fitted charts draw the data they are given, in the unit asked for. */
class IdentificationChartsTest {
    @Test
    void measuredDotsAndFittedLineInTheFilesUnit() {
        MeasuredFrf data = SyntheticFrf.of(FrfKind.MOBILITY, 18, 28, 41, 0.0, 1, new SyntheticFrf.Mode(23, 0.02, 4200));
        ModalModel model = ModalFit.fit(data, 1, false);
        FrfUnit mmPerSecondPerNewton = FrfUnit.parse("mm/s/N", FrfKind.MOBILITY, "--units");
        XYChart magnitude = IdentificationCharts.magnitude(data, model, mmPerSecondPerNewton, 600, 400);
        XYSeries dots = magnitude.getSeriesMap().get("measured");
        assertEquals(41, dots.getXData().length);
        assertEquals(18.0, dots.getXData()[0], 1e-12);
        // |Y| at the first line, in mm/s/N: 1000 x the SI value
        assertEquals(data.value(0).abs() * 1000.0, dots.getYData()[0], 1e-9 * dots.getYData()[0]);
        assertEquals(2, magnitude.getSeriesMap().size());
        XYChart phase = IdentificationCharts.phase(data, model, mmPerSecondPerNewton, 600, 400);
        // mobility of one mode at resonance is real and positive: phase 0 at 23 Hz (line 20)
        assertEquals(0.0, phase.getSeriesMap().get("measured").getYData()[20], 0.01);
    }
}
