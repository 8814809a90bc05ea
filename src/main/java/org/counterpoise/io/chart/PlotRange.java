package org.counterpoise.io.chart;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * What of a curve may be drawn, and where the plotting range ends. The chart library refuses
 * infinite values and an undamped resonance has no finite peak, so no value that is NaN, infinite
 * or enormous reaches it:
 * <ul>
 * <li>a value counts as <em>unbounded</em> when it is infinite, NaN, or more than
 * {@link #UNBOUNDED_FACTOR} times the chart's typical level (the median of its finite non-zero
 * magnitudes); on the frequency grid such a value only occurs next to an undamped resonance, whose
 * exact peak is infinite;</li>
 * <li>the plotting range ends at the largest value that is not unbounded; an unbounded stretch of a
 * curve is drawn up to that top edge, marked there, and named in the chart's notes with the
 * frequency of its largest value ("unbounded at 14.20 Hz").</li>
 * </ul>
 * The same rule decides which CSV fields are left empty, so a chart and an export agree.
 */
public final class PlotRange {
    /** A value this many times the typical level, or more, counts as unbounded. */
    public static final double UNBOUNDED_FACTOR = 1e6;

    private PlotRange() {
    }

    /**
     * @param curves the curves of one chart (any may hold NaN or infinities)
     * @return the median of the finite non-zero magnitudes, or NaN when there is none
     */
    public static double typical(double[]... curves) {
        int n = 0;
        for (double[] c : curves) {
            n += c.length;
        }
        double[] all = new double[n];
        int k = 0;
        for (double[] c : curves) {
            for (double v : c) {
                if (Double.isFinite(v) && v != 0) {
                    all[k++] = Math.abs(v);
                }
            }
        }
        if (k == 0) {
            return Double.NaN;
        }
        double[] finite = Arrays.copyOf(all, k);
        Arrays.sort(finite);
        return finite[k / 2];
    }

    /**
     * @param v a value
     * @param typical the chart's typical level ({@link #typical}); NaN when it has none
     * @return true when the value is infinite, NaN or enormous against the typical level
     */
    public static boolean unbounded(double v, double typical) {
        return !Double.isFinite(v) || (Double.isFinite(typical) && Math.abs(v) > UNBOUNDED_FACTOR * typical);
    }

    /**
     * @param typical the chart's typical level
     * @param curves its curves
     * @return the largest value that is not unbounded, or 0 when there is none
     */
    public static double top(double typical, double[]... curves) {
        double top = 0;
        for (double[] c : curves) {
            for (double v : c) {
                if (!unbounded(v, typical)) {
                    top = Math.max(top, v);
                }
            }
        }
        return top;
    }

    /**
     * @param x the abscissae (same length as y)
     * @param y a curve
     * @param typical the chart's typical level
     * @return the abscissa of the largest value (or of the first non-finite one) of each unbounded
     *     stretch of the curve, in order
     */
    public static List<Double> unboundedAt(double[] x, double[] y, double typical) {
        List<Double> at = new ArrayList<>();
        int i = 0;
        while (i < y.length) {
            if (!unbounded(y[i], typical) || !Double.isFinite(x[i])) {
                i++;
                continue;
            }
            int worst = i;
            while (i < y.length && unbounded(y[i], typical)) {
                if (Double.isFinite(x[i]) && (!Double.isFinite(y[i]) && Double.isFinite(y[worst])
                        || Double.isFinite(y[worst]) && y[i] > y[worst])) {
                    worst = i;
                }
                i++;
            }
            at.add(x[worst]);
        }
        return at;
    }

    /**
     * @param y a curve
     * @param typical the chart's typical level
     * @param floor the lowest value drawn (the floor of a logarithmic axis, or minus the ceiling)
     * @param ceiling the top of the plotting range
     * @return a copy in which unbounded values sit at the ceiling and every value lies in [floor, ceiling]
     */
    public static double[] clip(double[] y, double typical, double floor, double ceiling) {
        double[] out = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            double v = y[i];
            out[i] = unbounded(v, typical) && !(v < 0) ? ceiling : Math.max(floor, Math.min(ceiling, v));
        }
        return out;
    }
}
