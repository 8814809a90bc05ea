package org.counterpoise.core.identify;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Frequency and damping from a free decay by the logarithmic decrement (common practice; e.g.
 * Thomson and Dahleh 1998, Theory of Vibration with Applications, 5th ed., section 2.6, from
 * memory): over N cycles delta = (1/N) ln(x_0 / x_N), zeta = delta / sqrt(4 pi^2 + delta^2), and
 * the damped period T_d = (t_N - t_0)/N, so omega_n = 2 pi / (T_d sqrt(1 - zeta^2)).
 *
 * <p>The peaks are the largest sample of each positive half-cycle (between zero crossings),
 * refined by a parabola through it and its neighbours; a half-cycle whose largest sample is the
 * record's first or last is skipped (it is not a stationary peak). For x(t) = e^{-zeta omega_n t}
 * cos(omega_d t + phase) the stationary peaks are exactly one damped period apart and their ratio is
 * exactly e^{delta}, so the method has no bias for one mode. The scatter is the standard error of
 * the slope of a straight line fitted to ln(peak) against cycle number (Commons Math
 * SimpleRegression), turned into zeta's by d zeta/d delta = 4 pi^2 / (4 pi^2 + delta^2)^{3/2}.
 *
 * @param naturalFrequency omega_n, rad/s
 * @param dampingRatio zeta
 * @param logDecrement delta over the cycles used
 * @param logDecrementSd standard error of the fitted slope (0 when only two peaks are used)
 * @param dampingRatioSd the same scatter as a damping ratio
 * @param cycles the number of cycles N used
 */
public record LogDecrement(double naturalFrequency, double dampingRatio, double logDecrement, double logDecrementSd,
        double dampingRatioSd, int cycles) {

    /**
     * @param time sample times, s, increasing
     * @param response the response (any unit), decaying about zero
     * @param cycles the number of cycles to use, or 0 for every cycle found
     * @return the estimate
     */
    public static LogDecrement of(double[] time, double[] response, int cycles) {
        if (time.length != response.length || time.length < 8) {
            throw new InvalidInputException("decay", time.length + " samples",
                    "at least 8 samples, one response per time");
        }
        for (int i = 0; i < time.length; i++) {
            if (!Double.isFinite(time[i]) || !Double.isFinite(response[i])) {
                throw new InvalidInputException("decay.row[" + i + "]", "not finite", "finite numbers");
            }
            if (i > 0 && !(time[i] > time[i - 1])) {
                throw new InvalidInputException("decay.time[" + i + "]", Checks.show(time[i]),
                        "times in increasing order");
            }
        }
        List<double[]> peaks = peaks(time, response);
        int available = peaks.size() - 1;
        if (available < 1) {
            throw new InvalidInputException("decay", peaks.size() + " peak(s)",
                    "a record of at least two full cycles of a decaying oscillation about zero");
        }
        int n = cycles == 0 ? available : cycles;
        if (n < 1 || n > available) {
            throw new InvalidInputException("cycles", Integer.toString(cycles), "1 to " + available
                    + " (the cycles found in the record)");
        }
        double delta = Math.log(peaks.get(0)[1] / peaks.get(n)[1]) / n;
        if (!(delta > 0)) {
            throw new InvalidInputException("decay", "a response that does not decay",
                    "a free decay, each peak lower than the one before");
        }
        SimpleRegression line = new SimpleRegression();
        for (int j = 0; j <= n; j++) {
            line.addData(j, Math.log(peaks.get(j)[1]));
        }
        double deltaSd = n >= 2 ? line.getSlopeStdErr() : 0.0;
        double q = 4.0 * Math.PI * Math.PI + delta * delta;
        double zeta = delta / Math.sqrt(q);
        double dampedPeriod = (peaks.get(n)[0] - peaks.get(0)[0]) / n;
        double wn = 2.0 * Math.PI / (dampedPeriod * Math.sqrt(1.0 - zeta * zeta));
        return new LogDecrement(wn, zeta, delta, deltaSd, deltaSd * 4.0 * Math.PI * Math.PI / (q * Math.sqrt(q)), n);
    }

    /** @return (time, value) of each stationary positive peak, one per positive half-cycle */
    private static List<double[]> peaks(double[] t, double[] x) {
        List<double[]> found = new ArrayList<>();
        int i = 0;
        while (i < x.length) {
            if (x[i] <= 0) {
                i++;
                continue;
            }
            int start = i;
            int best = i;
            while (i < x.length && x[i] > 0) {
                if (x[i] > x[best]) {
                    best = i;
                }
                i++;
            }
            if (best > 0 && best < x.length - 1 && best >= start) {
                found.add(refine(t, x, best));
            }
        }
        return found;
    }

    private static double[] refine(double[] t, double[] x, int k) {
        double y0 = x[k - 1];
        double y1 = x[k];
        double y2 = x[k + 1];
        double curvature = y0 - 2.0 * y1 + y2;
        if (!(curvature < 0)) {
            return new double[] {t[k], y1};
        }
        double p = 0.5 * (y0 - y2) / curvature; // vertex offset in steps, |p| <= 1/2
        double h = 0.5 * (t[k + 1] - t[k - 1]);
        return new double[] {t[k] + p * h, y1 - 0.25 * (y0 - y2) * p};
    }
}
