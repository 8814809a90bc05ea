package org.counterpoise.core.system;

import java.util.List;

/**
 * |H_pq(i g)|^2 of a {@link ModalSystem} from its factored form, as {@link AbsorberSensitivity#value}
 * computes it (the same formulas, each modal and absorber term on its own), prepared once per system
 * and pair of points and evaluated in primitive complex arithmetic: the optimisers call it thousands
 * of times per design, and the general route's map lookups of mode shapes and complex objects were
 * about half of a robust design's time (JFR, 5 Dec 2026). One point of absorbers: H = (G_pq + Z Delta)
 * / (1 + Z G_aa), Delta = G_pq G_aa - G_pa G_aq; two points: the Woodbury identity with its 2 x 2
 * system solved by Cramer's rule; more points: the general route. G_xy = sum_r phi_r(x) phi_r(y) /
 * kappa_r (modal superposition; Ewins 2000, Modal Testing, 2nd ed., eq. 2.43), Z_a = sum_j mu_j s^2
 * K_j / (s^2 + K_j) over the absorbers at a. Checked against {@link AbsorberSensitivity#value} and
 * the dense LU solve in FactoredReceptanceTest.
 */
public final class FactoredReceptance {
    private final ModalSystem system;
    private final String forcePoint;
    private final String responsePoint;
    private final int modes;
    /** kappa_r(i g) = k0 - k2 g^2 + i k1 g. */
    private final double[] k0;
    private final double[] k1;
    private final double[] k2;
    /** phi_r(response) phi_r(force), and phi_r(response), phi_r(force), phi_r(a_i) by point. */
    private final double[] pq;
    private final double[] atResponse;
    private final double[] atForce;
    private final double[][] atPoint;
    /** Per point: the absorbers' mu_j, f_j^2 and 2 zeta_j f_j. */
    private final double[][] mu;
    private final double[][] kReal;
    private final double[][] kImag;

    private FactoredReceptance(ModalSystem system, String forcePoint, String responsePoint) {
        this.system = system;
        this.forcePoint = forcePoint;
        this.responsePoint = responsePoint;
        this.modes = system.structure().size();
        k0 = new double[modes];
        k1 = new double[modes];
        k2 = new double[modes];
        pq = new double[modes];
        atResponse = new double[modes];
        atForce = new double[modes];
        List<String> points = system.absorberPoints();
        atPoint = new double[points.size()][modes];
        for (int r = 0; r < modes; r++) {
            Mode m = system.structure().modes().get(r);
            double[] kappa = system.modalStiffness(r);
            k0[r] = kappa[0];
            k1[r] = kappa[1];
            k2[r] = kappa[2];
            atResponse[r] = m.shapeAt(responsePoint);
            atForce[r] = m.shapeAt(forcePoint);
            pq[r] = atResponse[r] * atForce[r];
            for (int i = 0; i < points.size(); i++) {
                atPoint[i][r] = m.shapeAt(points.get(i));
            }
        }
        mu = new double[points.size()][];
        kReal = new double[points.size()][];
        kImag = new double[points.size()][];
        for (int i = 0; i < points.size(); i++) {
            int count = 0;
            for (PointAbsorber a : system.absorbers()) {
                count += a.point().equals(points.get(i)) ? 1 : 0;
            }
            mu[i] = new double[count];
            kReal[i] = new double[count];
            kImag[i] = new double[count];
            int c = 0;
            for (int j = 0; j < system.absorbers().size(); j++) {
                if (system.absorbers().get(j).point().equals(points.get(i))) {
                    double[] b = system.spring(j);
                    mu[i][c] = system.massRatio(j);
                    kReal[i][c] = b[0];
                    kImag[i][c] = b[1];
                    c++;
                }
            }
        }
    }

    /**
     * @param system the structure with its absorbers
     * @param forcePoint where the force acts
     * @param responsePoint where the displacement is taken
     * @return the prepared evaluator
     */
    public static FactoredReceptance of(ModalSystem system, String forcePoint, String responsePoint) {
        return new FactoredReceptance(system, forcePoint, responsePoint);
    }

    /**
     * @param g frequency ratio omega / omega_ref (&gt;= 0)
     * @return |H_pq(i g)|^2, times k_ref^2
     */
    public double magnitudeSquared(double g) {
        int points = atPoint.length;
        if (points > 2) {
            double h = AbsorberSensitivity.value(system, forcePoint, responsePoint, g).abs();
            return h * h;
        }
        // 1 / kappa_r for every mode
        double x = g * g;
        double[] invRe = new double[modes];
        double[] invIm = new double[modes];
        double gpqRe = 0;
        double gpqIm = 0;
        for (int r = 0; r < modes; r++) {
            double re = k0[r] - k2[r] * x;
            double im = k1[r] * g;
            double den = re * re + im * im;
            invRe[r] = re / den;
            invIm[r] = -im / den;
            gpqRe += pq[r] * invRe[r];
            gpqIm += pq[r] * invIm[r];
        }
        if (points == 0) {
            return gpqRe * gpqRe + gpqIm * gpqIm;
        }
        double[] z = new double[2];
        if (points == 1) {
            pointStiffness(0, x, g, z);
            double[] ra = receptance(atResponse, atPoint[0], invRe, invIm);
            double[] af = receptance(atPoint[0], atForce, invRe, invIm);
            double[] aa = receptance(atPoint[0], atPoint[0], invRe, invIm);
            // Delta = G_pq G_aa - G_pa G_aq
            double dRe = gpqRe * aa[0] - gpqIm * aa[1] - (ra[0] * af[0] - ra[1] * af[1]);
            double dIm = gpqRe * aa[1] + gpqIm * aa[0] - (ra[0] * af[1] + ra[1] * af[0]);
            double nRe = gpqRe + z[0] * dRe - z[1] * dIm;
            double nIm = gpqIm + z[0] * dIm + z[1] * dRe;
            double mRe = 1 + z[0] * aa[0] - z[1] * aa[1];
            double mIm = z[0] * aa[1] + z[1] * aa[0];
            return (nRe * nRe + nIm * nIm) / (mRe * mRe + mIm * mIm);
        }
        // two points: (I + Z G_AA) y = Z G_Aq, H = G_pq - G_pA y (Woodbury), by Cramer's rule
        double[] z0 = new double[2];
        double[] z1 = new double[2];
        pointStiffness(0, x, g, z0);
        pointStiffness(1, x, g, z1);
        double[] g00 = receptance(atPoint[0], atPoint[0], invRe, invIm);
        double[] g01 = receptance(atPoint[0], atPoint[1], invRe, invIm);
        double[] g11 = receptance(atPoint[1], atPoint[1], invRe, invIm);
        double[] g0q = receptance(atPoint[0], atForce, invRe, invIm);
        double[] g1q = receptance(atPoint[1], atForce, invRe, invIm);
        double[] gp0 = receptance(atResponse, atPoint[0], invRe, invIm);
        double[] gp1 = receptance(atResponse, atPoint[1], invRe, invIm);
        double[] a = times(z0, g00);
        a[0] += 1;
        double[] b = times(z0, g01);
        double[] c = times(z1, g01);
        double[] d = times(z1, g11);
        d[0] += 1;
        double[] e = times(z0, g0q);
        double[] f = times(z1, g1q);
        double[] det = minus(times(a, d), times(b, c));
        double[] y0 = divide(minus(times(e, d), times(b, f)), det);
        double[] y1 = divide(minus(times(a, f), times(c, e)), det);
        double[] t0 = times(gp0, y0);
        double[] t1 = times(gp1, y1);
        double hRe = gpqRe - t0[0] - t1[0];
        double hIm = gpqIm - t0[1] - t1[1];
        return hRe * hRe + hIm * hIm;
    }

    /** Z at point i: sum_j mu_j s^2 K_j / (s^2 + K_j), s^2 = -x, K_j = f_j^2 + i 2 zeta_j f_j g. */
    private void pointStiffness(int i, double x, double g, double[] out) {
        double re = 0;
        double im = 0;
        for (int j = 0; j < mu[i].length; j++) {
            double kr = kReal[i][j];
            double ki = kImag[i][j] * g;
            double br = kr - x;
            double den = br * br + ki * ki;
            // K / (K - x)
            double qr = (kr * br + ki * ki) / den;
            double qi = (ki * br - kr * ki) / den;
            re -= mu[i][j] * x * qr;
            im -= mu[i][j] * x * qi;
        }
        out[0] = re;
        out[1] = im;
    }

    private double[] receptance(double[] phiX, double[] phiY, double[] invRe, double[] invIm) {
        double re = 0;
        double im = 0;
        for (int r = 0; r < modes; r++) {
            double w = phiX[r] * phiY[r];
            re += w * invRe[r];
            im += w * invIm[r];
        }
        return new double[] {re, im};
    }

    private static double[] times(double[] u, double[] v) {
        return new double[] {u[0] * v[0] - u[1] * v[1], u[0] * v[1] + u[1] * v[0]};
    }

    private static double[] minus(double[] u, double[] v) {
        return new double[] {u[0] - v[0], u[1] - v[1]};
    }

    private static double[] divide(double[] u, double[] v) {
        double den = v[0] * v[0] + v[1] * v[1];
        return new double[] {(u[0] * v[0] + u[1] * v[1]) / den, (u[1] * v[0] - u[0] * v[1]) / den};
    }
}
