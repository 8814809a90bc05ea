package org.counterpoise.core.design;

import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.response.SystemResponse;

/**
 * The frequency-response curves of a design, for plots and exports: the response that matters
 * without and with the absorber, and the absorber stroke, on one frequency grid. The grid is
 * uniform from 20 % of the structure's natural frequency (or 80 % of the band's low end, whichever
 * is lower) to 2.5 times it (or 1.5 times the top of the band, whichever is higher) and also holds the band ends and the exact peak frequencies, so
 * a plotted peak is the reported peak. SI values; frequencies in rad/s; every value is finite
 * (a grid point that falls exactly on an undamped resonance is moved off it by one part in 1e9).
 *
 * @param frequency grid, rad/s, ascending
 * @param response the response that matters
 * @param before its amplitude without the absorber, SI
 * @param after its amplitude with the absorber, SI
 * @param stroke absorber stroke amplitude, m
 */
public record DesignCurves(double[] frequency, ResponseKind response, double[] before, double[] after,
        double[] stroke) {
    private static final int POINTS = 600;

    /** Defensive copies. */
    public DesignCurves {
        frequency = frequency.clone();
        before = before.clone();
        after = after.clone();
        stroke = stroke.clone();
    }

    /**
     * @param r a design result
     * @return its curves
     */
    public static DesignCurves of(DesignResult r) {
        Structure s = r.study().structure();
        Excitation e = r.study().excitation();
        SystemResponse bare = new SystemResponse(s, null, e.kind(), e.amplitude());
        SystemResponse fitted = new SystemResponse(s, r.tuning(), e.kind(), e.amplitude());
        double omega1 = s.naturalFrequency();
        double low = Math.min(0.2 * omega1, 0.8 * e.band().low());
        double high = Math.max(2.5 * omega1, 1.5 * e.band().high());
        TreeSet<Double> grid = new TreeSet<>();
        for (int i = 0; i < POINTS; i++) {
            grid.add(low + (high - low) * i / (POINTS - 1));
        }
        grid.add(e.band().low());
        grid.add(e.band().high());
        for (ResponsePeak p : List.of(bare.peakBetween(r.study().response(), low, high),
                fitted.peakBetween(r.study().response(), low, high), fitted.peakBetween(ResponseKind.STROKE, low, high))) {
            if (!p.unbounded()) {
                grid.add(p.frequency());
            }
        }
        double[] w = grid.stream().mapToDouble(Double::doubleValue).toArray();
        ResponseKind kind = r.study().response();
        double[] before = new double[w.length];
        double[] after = new double[w.length];
        double[] stroke = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            if (Double.isInfinite(bare.amplitudeAt(kind, w[i])) || Double.isInfinite(fitted.amplitudeAt(kind, w[i]))
                    || Double.isInfinite(fitted.amplitudeAt(ResponseKind.STROKE, w[i]))) {
                w[i] *= 1 + 1e-9;
            }
            before[i] = bare.amplitudeAt(kind, w[i]);
            after[i] = fitted.amplitudeAt(kind, w[i]);
            stroke[i] = fitted.amplitudeAt(ResponseKind.STROKE, w[i]);
        }
        return new DesignCurves(w, kind, before, after, stroke);
    }

    @Override
    public double[] frequency() {
        return frequency.clone();
    }

    @Override
    public double[] before() {
        return before.clone();
    }

    @Override
    public double[] after() {
        return after.clone();
    }

    @Override
    public double[] stroke() {
        return stroke.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DesignCurves c && Arrays.equals(frequency, c.frequency) && response == c.response
                && Arrays.equals(before, c.before) && Arrays.equals(after, c.after) && Arrays.equals(stroke, c.stroke);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(frequency) * 31 + Arrays.hashCode(after);
    }

    @Override
    public String toString() {
        return "DesignCurves[" + frequency.length + " points, " + response + "]";
    }
}
