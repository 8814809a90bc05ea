package org.counterpoise.core.system;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.complex.ComplexField;
import org.apache.commons.math3.linear.Array2DRowFieldMatrix;
import org.apache.commons.math3.linear.ArrayFieldVector;
import org.apache.commons.math3.linear.FieldLUDecomposition;
import org.apache.commons.math3.linear.FieldMatrix;
import org.apache.commons.math3.linear.FieldVector;

/**
 * Exact derivatives of ln |H_pq|^2 at one frozen frequency in each absorber's tuning and damping,
 * evaluated from complex values (no polynomial), for a {@link ModalSystem}.
 *
 * <p>With the structure's receptances G (see {@link ModalSystem}) and Z = sum_j z_j,
 * H = (G_pq + Z Delta) / (1 + Z G_aa), Delta = G_pq G_aa - G_pa G_aq, so
 * d ln H / dZ = Delta / (G_pq + Z Delta) - G_aa / (1 + Z G_aa); z_j = mu_j s^2 K_j / (s^2 + K_j)
 * gives dz_j / dK_j = mu_j s^4 / (s^2 + K_j)^2, and K_j = f_j^2 + 2 zeta_j f_j s gives
 * dK_j / d ln f_j = f_j (2 f_j + 2 zeta_j s) and dK_j / d zeta_j = 2 f_j s. Then
 * d ln|H|^2 / dp = 2 Re[(d ln H / dZ)(dz_j / dK_j)(dK_j / dp)]. By the envelope theorem this is
 * also the derivative of a peak's height, taken at the peak's frequency.
 */
public final class AbsorberSensitivity {
    private AbsorberSensitivity() {
    }

    /**
     * @param system the system (at least one absorber)
     * @param forcePoint where the force acts
     * @param responsePoint where the displacement is taken
     * @param g frequency ratio omega / omega_ref
     * @return for each absorber j: {d ln|H|^2 / d ln f_j, d ln|H|^2 / d zeta_j}
     */
    public static double[][] gradient(ModalSystem system, String forcePoint, String responsePoint, double g) {
        List<PointAbsorber> absorbers = system.absorbers();
        Complex s = new Complex(0, g);
        Complex[] dLogH = new Complex[absorbers.size()];
        if (system.absorberPoints().size() > 1) {
            // dH_pq / dZ_a = -H_pa H_aq, the receptances of the modified structure (differentiate the
            // Woodbury form; for one point it is the expression below)
            Complex h = value(system, forcePoint, responsePoint, g);
            for (int j = 0; j < dLogH.length; j++) {
                String a = absorbers.get(j).point();
                dLogH[j] = value(system, a, responsePoint, g).multiply(value(system, forcePoint, a, g)).divide(h).negate();
            }
        } else {
            String a = absorbers.get(0).point();
            Complex gpq = receptance(system, responsePoint, forcePoint, s);
            Complex gaa = receptance(system, a, a, s);
            Complex delta = gpq.multiply(gaa).subtract(receptance(system, responsePoint, a, s)
                    .multiply(receptance(system, a, forcePoint, s)));
            Complex z = pointStiffness(system, a, s);
            Arrays.fill(dLogH, delta.divide(gpq.add(z.multiply(delta))).subtract(gaa.divide(Complex.ONE.add(
                    z.multiply(gaa)))));
        }
        Complex s2 = s.multiply(s);
        double[][] out = new double[absorbers.size()][2];
        for (int j = 0; j < out.length; j++) {
            double[] b = system.spring(j);
            double f = Math.sqrt(b[0]);
            double zeta = f > 0 ? b[1] / (2 * f) : 0.0;
            Complex sum = s2.add(new Complex(b[0], b[1] * g));
            Complex dz = s2.multiply(s2).multiply(system.massRatio(j)).divide(sum.multiply(sum));
            Complex common = dLogH[j].multiply(dz);
            out[j][0] = 2 * common.multiply(new Complex(2 * f * f, 2 * zeta * f * g)).getReal();
            out[j][1] = 2 * common.multiply(new Complex(0, 2 * f * g)).getReal();
        }
        return out;
    }

    /**
     * H_pq at one frequency from the factored form (G_pq + Z Delta) / (1 + Z G_aa), each modal and
     * absorber term evaluated on its own: no expanded polynomial, so no loss of digits at sharp or
     * flat peaks (the check of the expanded transfer function's value near an optimum).
     *
     * @param system the system
     * @param forcePoint where the force acts
     * @param responsePoint where the displacement is taken
     * @param g frequency ratio omega / omega_ref
     * @return H_pq(i g), times k_ref
     */
    public static Complex value(ModalSystem system, String forcePoint, String responsePoint, double g) {
        Complex s = new Complex(0, g);
        Complex gpq = receptance(system, responsePoint, forcePoint, s);
        if (system.absorbers().isEmpty()) {
            return gpq;
        }
        List<String> points = system.absorberPoints();
        if (points.size() > 1) {
            return severalPoints(system, points, forcePoint, responsePoint, s, gpq);
        }
        String a = points.get(0);
        Complex gaa = receptance(system, a, a, s);
        Complex delta = gpq.multiply(gaa).subtract(receptance(system, responsePoint, a, s)
                .multiply(receptance(system, a, forcePoint, s)));
        Complex z = pointStiffness(system, a, s);
        return gpq.add(z.multiply(delta)).divide(Complex.ONE.add(z.multiply(gaa)));
    }

    /** Z_a = sum_j mu_j s^2 K_j / (s^2 + K_j) over the absorbers at point a, times 1 / k_ref. */
    private static Complex pointStiffness(ModalSystem system, String a, Complex s) {
        Complex s2 = s.multiply(s);
        Complex z = Complex.ZERO;
        for (int j = 0; j < system.absorbers().size(); j++) {
            if (system.absorbers().get(j).point().equals(a)) {
                double[] b = system.spring(j);
                Complex k = new Complex(b[0], b[1] * s.getImaginary());
                z = z.add(s2.multiply(k).multiply(system.massRatio(j)).divide(s2.add(k)));
            }
        }
        return z;
    }

    /**
     * Absorbers at k points: H_pq = G_pq - G_pA y with (I + Z G_AA) y = Z G_Aq (the Woodbury
     * identity; {@link PointModifications}), the k x k system solved by Commons Math's complex LU.
     */
    private static Complex severalPoints(ModalSystem system, List<String> points, String forcePoint,
            String responsePoint, Complex s, Complex gpq) {
        int k = points.size();
        FieldMatrix<Complex> m = new Array2DRowFieldMatrix<>(ComplexField.getInstance(), k, k);
        Complex[] right = new Complex[k];
        for (int i = 0; i < k; i++) {
            Complex z = pointStiffness(system, points.get(i), s);
            for (int l = 0; l < k; l++) {
                Complex entry = z.multiply(receptance(system, points.get(i), points.get(l), s));
                m.setEntry(i, l, i == l ? entry.add(Complex.ONE) : entry);
            }
            right[i] = z.multiply(receptance(system, points.get(i), forcePoint, s));
        }
        FieldVector<Complex> y = new FieldLUDecomposition<>(m).getSolver().solve(new ArrayFieldVector<>(right));
        Complex h = gpq;
        for (int i = 0; i < k; i++) {
            h = h.subtract(receptance(system, responsePoint, points.get(i), s).multiply(y.getEntry(i)));
        }
        return h;
    }

    /** G_pq(s) = sum_r phi_r(p) phi_r(q) / kappa_r(s), times k_ref. */
    private static Complex receptance(ModalSystem system, String p, String q, Complex s) {
        Complex out = Complex.ZERO;
        for (int r = 0; r < system.structure().size(); r++) {
            Mode m = system.structure().modes().get(r);
            double[] kappa = system.modalStiffness(r);
            Complex value = new Complex(kappa[0] - kappa[2] * s.getImaginary() * s.getImaginary(),
                    kappa[1] * s.getImaginary());
            out = out.add(new Complex(m.shapeAt(p) * m.shapeAt(q)).divide(value));
        }
        return out;
    }
}
