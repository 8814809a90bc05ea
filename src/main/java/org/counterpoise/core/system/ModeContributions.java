package org.counterpoise.core.system;

import java.util.HashMap;
import java.util.Map;
import org.apache.commons.math3.complex.Complex;

/**
 * Each mode's part of the displacement at a point of a {@link ModalSystem} under a harmonic force, with
 * every absorber on the structure: x_p = sum_r phi_r(p) q_r, where the modal coordinate obeys
 * kappa_r q_r = phi_r(q) F + sum_j phi_r(a_j) F_j, kappa_r = m_r (omega_r^2 - omega^2 + 2 i zeta_r
 * omega_r omega), and absorber j at point a_j pushes the structure with F_j = (k_j + i c_j omega)
 * (y_j - x_a) = (k_j + i c_j omega) m_j omega^2 / (k_j - m_j omega^2 + i c_j omega) x_a (modal
 * superposition of classically damped modes, Ewins 2000, <i>Modal Testing</i>, 2nd ed., section 2.3;
 * the absorber's equation of motion as in {@link AbsorberPeak}). The points' displacements x_a come
 * from the factored form ({@link AbsorberSensitivity#value}). The parts sum to the displacement;
 * their sizes show which mode a peak belongs to and what the absorbers left of each.
 */
public final class ModeContributions {
    private ModeContributions() {
    }

    /**
     * @param system the structure with its absorbers (or none)
     * @param forcePoint where the unit force acts
     * @param responsePoint where the displacement is taken
     * @param omega the forcing frequency, rad/s (&gt;= 0)
     * @return phi_r(p) q_r for each mode r in the structure's order, m/N
     */
    public static Complex[] at(ModalSystem system, String forcePoint, String responsePoint, double omega) {
        system.structure().requirePoint(forcePoint);
        system.structure().requirePoint(responsePoint);
        Map<String, Complex> pointMotion = new HashMap<>();
        Map<String, Complex> pointForce = new HashMap<>();
        double g = omega / system.referenceFrequency();
        for (PointAbsorber a : system.absorbers()) {
            Complex x = pointMotion.computeIfAbsent(a.point(), point -> AbsorberSensitivity.value(system, forcePoint,
                    point, g).divide(system.referenceStiffness()));
            Complex spring = new Complex(a.stiffness(), a.damping() * omega);
            Complex force = spring.multiply(a.mass() * omega * omega).divide(spring.subtract(a.mass() * omega * omega))
                    .multiply(x);
            pointForce.merge(a.point(), force, Complex::add);
        }
        Complex[] out = new Complex[system.structure().size()];
        for (int r = 0; r < out.length; r++) {
            Mode m = system.structure().modes().get(r);
            double wr = m.naturalFrequency();
            Complex kappa = new Complex(m.modalMass() * (wr * wr - omega * omega),
                    2 * m.modalMass() * m.dampingRatio() * wr * omega);
            Complex load = new Complex(m.shapeAt(forcePoint));
            for (Map.Entry<String, Complex> f : pointForce.entrySet()) {
                load = load.add(f.getValue().multiply(m.shapeAt(f.getKey())));
            }
            out[r] = load.divide(kappa).multiply(m.shapeAt(responsePoint));
        }
        return out;
    }
}
