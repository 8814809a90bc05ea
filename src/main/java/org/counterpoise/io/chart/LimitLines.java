package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import java.util.Optional;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.FrequencyWeighting;
import org.counterpoise.core.criteria.LimitCurve;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Unit;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.AxesChartStyler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Draws a limit (flat or a {@link LimitCurve} over frequency) on a response chart whose x axis is
 * the forcing frequency in Hz, in the chart's own quantity, convention and unit: the sheet's and
 * the wizard's response charts both use it. The limit is stated on the criterion's quantity, in its
 * convention, possibly frequency-weighted; the chart plots another quantity unweighted, so each
 * point of the line is the chart's value that would just meet the limit at that frequency, for
 * one steady harmonic:
 * <ul>
 * <li>weighting: the weighted value is |W(f)| times the unweighted one, so the line is L / |W(f)|;
 * <li>quantity: each time derivative of a harmonic motion multiplies its amplitude by
 *     omega = 2 pi f (displacement, velocity, acceleration; definition of a harmonic);
 * <li>convention: through {@link AmplitudeConvention#ofHarmonic} (peak of the limit, then the
 *     chart's convention).
 * </ul>
 * A limit on a force cannot be drawn on a motion chart, nor a motion limit on a force chart, nor
 * the relative motion on an absolute one: {@link #add} then draws nothing and says so by its
 * result. Outside the curve's points the limit is held at its end values, as the verdict holds it.
 */
public final class LimitLines {
    /** Name of the series that draws the limit. */
    public static final String SERIES = "limit";
    private static final int POINTS = 241;

    private LimitLines() {
    }

    /**
     * The criterion's limit on a response chart.
     * @param chart the chart, its axes already set (x in Hz)
     * @param criterion the criterion
     * @param shown the quantity the chart plots
     * @param convention the convention of the chart's curves
     * @param unit the chart's y unit
     * @param theme colours
     * @return true when the line was drawn
     */
    public static boolean add(XYChart chart, Criterion criterion, ResponseKind shown, AmplitudeConvention convention,
            Unit unit, ChartTheme theme) {
        return add(chart, criterion.limit(), criterion.quantity(), criterion.convention(), criterion.weighting(),
                shown, convention, unit, theme);
    }

    /**
     * A limit on a response chart.
     * @param chart the chart, its axes already set (x in Hz)
     * @param limit the limit, SI unit of {@code quantity}, in {@code limitConvention}
     * @param quantity the quantity the limit is stated on
     * @param limitConvention the convention the limit is stated in
     * @param weighting the weighting the limit applies, if any
     * @param shown the quantity the chart plots
     * @param convention the convention of the chart's curves
     * @param unit the chart's y unit
     * @param theme colours
     * @return true when the line was drawn; false when the chart's quantity cannot show the limit's
     */
    public static boolean add(XYChart chart, LimitCurve limit, ResponseKind quantity,
            AmplitudeConvention limitConvention, Optional<FrequencyWeighting> weighting, ResponseKind shown,
            AmplitudeConvention convention, Unit unit, ChartTheme theme) {
        Optional<Integer> derivatives = derivatives(quantity, shown);
        AxesChartStyler s = chart.getStyler();
        if (derivatives.isEmpty() || s.getXAxisMin() == null || s.getXAxisMax() == null) {
            return false;
        }
        double low = s.getXAxisMin();
        double high = s.getXAxisMax();
        double[] hz = new double[POINTS];
        double[] y = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            hz[i] = low * Math.pow(high / low, i / (POINTS - 1.0));
            y[i] = unit.fromSi(at(limit, limitConvention, weighting, derivatives.get(), convention, hz[i]));
        }
        fitAxis(chart, y);
        double yLow = s.getYAxisMin();
        double yHigh = s.getYAxisMax();
        for (int i = 0; i < POINTS; i++) {
            // past the plotting range (a weighting's skirts) the line runs along the edge
            y[i] = Math.max(yLow, Math.min(yHigh, Double.isFinite(y[i]) ? y[i] : yHigh));
        }
        XYSeries series = chart.addSeries(SERIES + " (" + convention.label() + ")", hz, y);
        series.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        series.setLineColor(theme.alarm());
        series.setMarker(SeriesMarkers.NONE);
        series.setLineStyle(new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                new float[] {9f, 3f, 2f, 3f}, 0f));
        return true;
    }

    /**
     * @param limit the limit curve, SI
     * @param limitConvention its convention
     * @param weighting its weighting, if any
     * @param derivatives time derivatives from the limit's quantity to the chart's (may be negative)
     * @param convention the chart's convention
     * @param hz a frequency, Hz
     * @return the chart's value, SI, that just meets the limit at that frequency
     */
    static double at(LimitCurve limit, AmplitudeConvention limitConvention, Optional<FrequencyWeighting> weighting,
            int derivatives, AmplitudeConvention convention, double hz) {
        double stated = limit.at(hz);
        double unweighted = weighting.map(w -> stated / w.factorAt(hz)).orElse(stated);
        double peak = unweighted / limitConvention.ofHarmonic(1.0);
        return convention.ofHarmonic(peak * Math.pow(2 * Math.PI * hz, derivatives));
    }

    /**
     * @param quantity the limit's quantity
     * @param shown the chart's quantity
     * @return how many time derivatives lead from the limit's quantity to the chart's, when one
     *     can be drawn on the other
     */
    static Optional<Integer> derivatives(ResponseKind quantity, ResponseKind shown) {
        if (quantity == shown) {
            return Optional.of(0);
        }
        Optional<Integer> a = order(quantity);
        Optional<Integer> b = order(shown);
        // from velocity (1) to displacement (0): one integration, -1 derivative, x = v / omega
        return a.isPresent() && b.isPresent() ? Optional.of(b.get() - a.get()) : Optional.empty();
    }

    private static Optional<Integer> order(ResponseKind k) {
        return switch (k) {
            case DISPLACEMENT -> Optional.of(0);
            case VELOCITY -> Optional.of(1);
            case ACCELERATION -> Optional.of(2);
            default -> Optional.empty();
        };
    }

    /** Widens the y axis, when needed, so that the limit shows where it is finite (within 4 decades of the top). */
    private static void fitAxis(XYChart chart, double[] y) {
        AxesChartStyler s = chart.getStyler();
        if (s.getYAxisMin() == null || s.getYAxisMax() == null) {
            return;
        }
        double lo = s.getYAxisMin();
        double hi = s.getYAxisMax();
        double min = Double.POSITIVE_INFINITY;
        double max = 0;
        for (double v : y) {
            if (Double.isFinite(v) && v > 0) {
                min = Math.min(min, v);
                max = Math.max(max, v);
            }
        }
        if (!(max > 0)) {
            return;
        }
        if (s.isYAxisLogarithmic()) {
            double newHi = Math.min(Math.max(hi, max * 1.6), hi * 1e2);
            double newLo = Math.max(Math.min(lo, min / 1.6), newHi * 1e-5);
            if (newHi != hi || newLo != lo) {
                ChartStyle.logAxis(s, false, newLo, newHi);
            }
        } else if (max * 1.1 > hi && max < hi * 10) {
            s.setYAxisMax(max * 1.1);
            s.setyAxisTickLabelsFormattingFunction(ChartNumbers.linearAxis(lo, max * 1.1));
        }
    }
}
