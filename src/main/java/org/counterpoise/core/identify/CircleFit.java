package org.counterpoise.core.identify;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Circle fit of the mobility near a peak (Kennedy and Pancu 1947; Ewins 2000, Modal Testing:
 * Theory, Practice and Application, 2nd ed., section 4.3).
 *
 * <p>For one mode with viscous damping the mobility Y = 1/(c + i (m omega - k/omega)) traces a
 * circle of diameter 1/c through the origin, centred on the real axis. The circle is fitted
 * algebraically (least squares of x^2 + y^2 + D x + E y + F over the lines near the peak, solved by
 * SVD); the natural frequency is where the angle swept per unit frequency is largest
 * (interpolated by a parabola; measured in omega - omega_n^2/omega, see {@code fastestSweep}); the damping comes from each pair of lines a above and b below,
 * zeta = (omega_a^2 - omega_b^2) / (2 omega_n (omega_a tan(theta_a/2) + omega_b tan(theta_b/2)))
 * with theta the angle at the centre from the resonance point (Ewins 2000, section 4.3, in the
 * viscous form; exact for one mode); the modal mass from the diameter, m = 1/(2R 2 zeta omega_n).
 * A constant residual only shifts the circle, so the fit is not biased by it.
 *
 * @param centre the circle's centre, SI mobility
 * @param radius its radius, SI mobility
 * @param mode the mode; dampingRatioSd is the scatter (standard deviation) of the pair estimates
 * @param lines the number of lines fitted
 */
public record CircleFit(Complex centre, double radius, IdentifiedMode mode, int lines) {

    /**
     * @param measured the measurement, any kind (converted to mobility)
     * @return the circle through the lines whose |Y| is at least half the peak's
     */
    public static CircleFit fit(MeasuredFrf measured) {
        MeasuredFrf y = measured.as(FrfKind.MOBILITY);
        int n = y.size();
        int peak = 0;
        for (int i = 1; i < n; i++) {
            if (y.value(i).abs() > y.value(peak).abs()) {
                peak = i;
            }
        }
        double floor = 0.5 * y.value(peak).abs();
        int from = peak;
        int to = peak;
        while (from > 0 && (y.value(from - 1).abs() >= floor || to - from < 4)) {
            from--;
        }
        while (to < n - 1 && (y.value(to + 1).abs() >= floor || to - from < 4)) {
            to++;
        }
        if (to - from < 4 || peak == 0 || peak == n - 1) {
            throw new InvalidInputException("band", "too few lines around the peak for a circle",
                    "at least 5 lines near the resonance, the peak inside the band");
        }
        int m = to - from + 1;
        double[][] a = new double[m][];
        double[] b = new double[m];
        for (int i = 0; i < m; i++) {
            Complex v = y.value(from + i);
            a[i] = new double[] {v.getReal(), v.getImaginary(), 1.0};
            b[i] = -(v.getReal() * v.getReal() + v.getImaginary() * v.getImaginary());
        }
        RealVector def = new SingularValueDecomposition(new Array2DRowRealMatrix(a, false)).getSolver()
                .solve(new ArrayRealVector(b, false));
        Complex centre = new Complex(-def.getEntry(0) / 2.0, -def.getEntry(1) / 2.0);
        double radius = Math.sqrt(centre.abs() * centre.abs() - def.getEntry(2));
        double[] w = new double[m];
        double[] theta = new double[m];
        for (int i = 0; i < m; i++) {
            w[i] = y.omega()[from + i];
            theta[i] = y.value(from + i).subtract(centre).getArgument();
            if (i > 0) { // unwrap
                theta[i] += 2.0 * Math.PI * Math.rint((theta[i - 1] - theta[i]) / (2.0 * Math.PI));
            }
        }
        double wn = 0.0;
        for (int pass = 0; pass < 4; pass++) {
            wn = fastestSweep(w, theta, wn);
        }
        double thetaN = interpolate(w, theta, wn);
        List<Double> zetas = new ArrayList<>();
        for (int ia = 0; ia < m; ia++) {
            for (int ib = 0; ib < m; ib++) {
                if (w[ia] > wn && w[ib] < wn) {
                    double ta = Math.tan(Math.abs(theta[ia] - thetaN) / 2.0);
                    double tb = Math.tan(Math.abs(theta[ib] - thetaN) / 2.0);
                    zetas.add((w[ia] * w[ia] - w[ib] * w[ib]) / (2.0 * wn * (w[ia] * ta + w[ib] * tb)));
                }
            }
        }
        double zeta = zetas.stream().mapToDouble(Double::doubleValue).average().orElseThrow();
        double var = zetas.stream().mapToDouble(z -> (z - zeta) * (z - zeta)).sum() / Math.max(1, zetas.size() - 1);
        double mass = 1.0 / (2.0 * radius * 2.0 * zeta * wn);
        IdentifiedMode mode = new IdentifiedMode(wn, zeta, mass, OptionalDouble.empty(),
                OptionalDouble.of(Math.sqrt(var)), OptionalDouble.empty());
        return new CircleFit(centre, radius, mode, m);
    }

    /**
     * The frequency of the largest sweep rate |d theta / d nu|, nu = omega - omega_0^2/omega,
     * refined by a parabola. On the viscous mobility circle tan((theta - theta_n)/2) = m nu / c
     * when omega_0 = omega_n, so the rate in nu is largest exactly at omega_n; in omega itself
     * (omega_0 = 0, the first pass) the largest rate lies about zeta^2/2 below omega_n. A few passes
     * with omega_0 from the pass before converge on omega_n.
     */
    private static double fastestSweep(double[] w, double[] theta, double w0) {
        int m = w.length;
        double[] mid = new double[m - 1];
        double[] rate = new double[m - 1];
        int best = 0;
        for (int i = 0; i < m - 1; i++) {
            double nu0 = w[i] - w0 * w0 / w[i];
            double nu1 = w[i + 1] - w0 * w0 / w[i + 1];
            mid[i] = 0.5 * (nu0 + nu1);
            rate[i] = Math.abs(theta[i + 1] - theta[i]) / (nu1 - nu0);
            if (rate[i] > rate[best]) {
                best = i;
            }
        }
        if (best == 0 || best == m - 2) {
            return frequencyOf(mid[best], w0);
        }
        // vertex of the parabola through three (frequency, rate) points
        double x0 = mid[best - 1];
        double x1 = mid[best];
        double x2 = mid[best + 1];
        double d0 = (rate[best] - rate[best - 1]) / (x1 - x0);
        double d1 = (rate[best + 1] - rate[best]) / (x2 - x1);
        double second = (d1 - d0) / (x2 - x0);
        if (!(second < 0)) {
            return frequencyOf(x1, w0);
        }
        double vertex = 0.5 * (x0 + x1) - d0 / (2.0 * second);
        return frequencyOf(Math.min(x2, Math.max(x0, vertex)), w0);
    }

    /** @return the omega &gt; 0 with omega - w0^2/omega = nu */
    private static double frequencyOf(double nu, double w0) {
        return 0.5 * (nu + Math.sqrt(nu * nu + 4.0 * w0 * w0));
    }

    private static double interpolate(double[] x, double[] y, double at) {
        int i = 0;
        while (i < x.length - 2 && x[i + 1] < at) {
            i++;
        }
        return y[i] + (y[i + 1] - y[i]) * (at - x[i]) / (x[i + 1] - x[i]);
    }
}
