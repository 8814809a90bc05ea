package org.counterpoise.io.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.ComfortReaction;
import org.counterpoise.core.criteria.FrequencyWeighting;
import org.counterpoise.core.criteria.HumanComfort;
import org.counterpoise.core.criteria.LimitCurve;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Unit;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;

/**
 * The limit drawn on a response chart is the chart's value that just meets the limit, for one
 * steady harmonic: displacement x, velocity omega x, acceleration omega^2 x (definition of a
 * harmonic motion), r.m.s. = peak / sqrt 2 (definition), a weighted limit L / |W(f)|.
 */
class LimitLinesTest {
    private static XYChart chart(double low, double high, double yLow, double yHigh) {
        XYChart c = new XYChartBuilder().width(400).height(300).build();
        c.getStyler().setXAxisMin(low);
        c.getStyler().setXAxisMax(high);
        ChartStyle.logAxis(c.getStyler(), false, yLow, yHigh);
        return c;
    }

    @Test
    void anRmsVelocityLimitOnAPeakDisplacementChartIsRootTwoVOverOmega() {
        // 2.8 mm/s r.m.s. at 20 Hz: peak velocity 2.8 sqrt2 mm/s, displacement peak v / (2 pi f)
        double expected = 2.8e-3 * Math.sqrt(2) / (2 * Math.PI * 20);
        assertEquals(expected, LimitLines.at(LimitCurve.flat(2.8e-3), AmplitudeConvention.RMS, Optional.empty(),
                -1, AmplitudeConvention.PEAK, 20), 1e-15);
        assertEquals(Optional.of(-1), LimitLines.derivatives(ResponseKind.VELOCITY, ResponseKind.DISPLACEMENT));
        assertEquals(Optional.of(2), LimitLines.derivatives(ResponseKind.DISPLACEMENT, ResponseKind.ACCELERATION));
        XYChart c = chart(5, 50, 1e-3, 1);
        assertTrue(LimitLines.add(c, new UserLimit(ResponseKind.VELOCITY, AmplitudeConvention.RMS,
                LimitCurve.flat(2.8e-3)), ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK, Unit.MILLIMETRE,
                ChartTheme.LIGHT));
        var s = c.getSeriesMap().get("limit (peak)");
        double[] x = s.getXData();
        double[] y = s.getYData();
        for (int i = 0; i < x.length; i += 40) {
            assertEquals(1e3 * 2.8e-3 * Math.sqrt(2) / (2 * Math.PI * x[i]), y[i], 1e-12 * y[i]);
        }
    }

    @Test
    void aWeightedLimitIsTheLimitOverTheWeightingAndAPeakToPeakOneTwicePeak() {
        HumanComfort comfort = new HumanComfort(FrequencyWeighting.WK, ComfortReaction.NOT_UNCOMFORTABLE);
        double hz = 8;
        double atEight = LimitLines.at(comfort.limit(), AmplitudeConvention.RMS, comfort.weighting(), 0,
                AmplitudeConvention.RMS, hz);
        assertEquals(0.315 / FrequencyWeighting.WK.factorAt(hz), atEight, 1e-12);
        double p2p = LimitLines.at(comfort.limit(), AmplitudeConvention.RMS, comfort.weighting(), 0,
                AmplitudeConvention.PEAK_TO_PEAK, hz);
        assertEquals(2 * Math.sqrt(2) * atEight, p2p, 1e-12);
        // a curve: held at its ends outside its points, power law between them
        LimitCurve curve = new LimitCurve(List.of(new LimitCurve.Point(10, 1e-3), new LimitCurve.Point(40, 4e-3)));
        assertEquals(2e-3, LimitLines.at(curve, AmplitudeConvention.PEAK, Optional.empty(), 0,
                AmplitudeConvention.PEAK, 20), 1e-15);
        assertEquals(1e-3, LimitLines.at(curve, AmplitudeConvention.PEAK, Optional.empty(), 0,
                AmplitudeConvention.PEAK, 3), 0.0);
    }

    @Test
    void aForceLimitIsNotDrawnOnAMotionChart() {
        XYChart c = chart(5, 50, 1e-3, 1);
        assertFalse(LimitLines.add(c, new UserLimit(ResponseKind.TRANSMITTED_FORCE, AmplitudeConvention.PEAK,
                LimitCurve.flat(100)), ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK, Unit.MILLIMETRE,
                ChartTheme.LIGHT));
        assertTrue(c.getSeriesMap().isEmpty());
        assertEquals(Optional.empty(), LimitLines.derivatives(ResponseKind.RELATIVE_DISPLACEMENT,
                ResponseKind.DISPLACEMENT));
    }

    @Test
    void theLineStaysInsideThePlotAndTheAxisWidensToShowIt() {
        XYChart c = chart(5, 50, 1e-3, 1e-2);
        // 0.5 mm flat: above the axis top of 0.01 mm: the axis widens (by at most two decades) to show it
        LimitLines.add(c, new UserLimit(ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK, LimitCurve.flat(5e-4)),
                ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK, Unit.MILLIMETRE, ChartTheme.LIGHT);
        assertTrue(c.getStyler().getYAxisMax() >= 0.5 * 1.6 - 1e-12, "top " + c.getStyler().getYAxisMax());
        for (double y : c.getSeriesMap().get("limit (peak)").getYData()) {
            assertTrue(y <= c.getStyler().getYAxisMax() && y >= c.getStyler().getYAxisMin());
        }
    }
}
