package org.counterpoise.core.system;

import java.util.List;
import org.apache.commons.math3.complex.Complex;

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
        String a = absorbers.get(0).point();
        Complex s = new Complex(0, g);
        Complex gpq = receptance(system, responsePoint, forcePoint, s);
        Complex gaa = receptance(system, a, a, s);
        Complex delta = gpq.multiply(gaa).subtract(receptance(system, responsePoint, a, s)
                .multiply(receptance(system, a, forcePoint, s)));
        Complex s2 = s.multiply(s);
        Complex[] k = new Complex[absorbers.size()];
        Complex z = Complex.ZERO;
        for (int j = 0; j < k.length; j++) {
            double[] b = system.spring(j);
            k[j] = new Complex(b[0], b[1] * g);
            z = z.add(s2.multiply(k[j]).multiply(system.massRatio(j)).divide(s2.add(k[j])));
        }
        Complex dLogH = delta.divide(gpq.add(z.multiply(delta))).subtract(gaa.divide(Complex.ONE.add(z.multiply(gaa))));
        double[][] out = new double[k.length][2];
        for (int j = 0; j < k.length; j++) {
            double[] b = system.spring(j);
            double f = Math.sqrt(b[0]);
            double zeta = f > 0 ? b[1] / (2 * f) : 0.0;
            Complex sum = s2.add(k[j]);
            Complex dz = s2.multiply(s2).multiply(system.massRatio(j)).divide(sum.multiply(sum));
            Complex common = dLogH.multiply(dz);
            out[j][0] = 2 * common.multiply(new Complex(2 * f * f, 2 * zeta * f * g)).getReal();
            out[j][1] = 2 * common.multiply(new Complex(0, 2 * f * g)).getReal();
        }
        return out;
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
