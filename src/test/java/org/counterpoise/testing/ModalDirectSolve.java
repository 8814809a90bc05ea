package org.counterpoise.testing;

import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.complex.ComplexField;
import org.apache.commons.math3.linear.Array2DRowFieldMatrix;
import org.apache.commons.math3.linear.ArrayFieldVector;
import org.apache.commons.math3.linear.FieldLUDecomposition;
import org.apache.commons.math3.linear.FieldMatrix;
import org.apache.commons.math3.linear.FieldVector;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.PointAbsorber;

/**
 * An independent route to the response of a modal structure with absorbers: the equations of
 * motion in the modal coordinates q_r and the absorbers' absolute displacements y_j, assembled as
 * dense matrices M, C, K and solved at one frequency by Commons Math's complex LU decomposition.
 * Lagrange's equations with T = sum m_r q_r'^2 / 2 + sum m_j y_j'^2 / 2 and
 * V = sum k_r q_r^2 / 2 + sum k_j (y_j - x_a)^2 / 2, x_a = sum phi_r(a) q_r (the same with c for the
 * dissipation function); the generalised force of a force F at q is phi_r(q) F. Nothing of the
 * production polynomial route is used.
 */
public final class ModalDirectSolve {
    private ModalDirectSolve() {
    }

    /**
     * @return the complex displacement at responsePoint per unit force at forcePoint, and each
     *     absorber's stroke y_j - x_a after it, at angular frequency w (SI)
     */
    public static Complex[] solve(List<Mode> modes, List<PointAbsorber> absorbers, String forcePoint,
            String responsePoint, double w) {
        FieldVector<Complex> u = coordinates(modes, absorbers, forcePoint, w);
        Complex[] out = new Complex[1 + absorbers.size()];
        out[0] = displacement(modes, u, responsePoint);
        for (int j = 0; j < absorbers.size(); j++) {
            out[1 + j] = u.getEntry(modes.size() + j).subtract(displacement(modes, u, absorbers.get(j).point()));
        }
        return out;
    }

    /**
     * @return each mode's part phi_r(p) q_r of the displacement at responsePoint per unit force at
     *     forcePoint, at angular frequency w (SI)
     */
    public static Complex[] modeParts(List<Mode> modes, List<PointAbsorber> absorbers, String forcePoint,
            String responsePoint, double w) {
        FieldVector<Complex> u = coordinates(modes, absorbers, forcePoint, w);
        Complex[] out = new Complex[modes.size()];
        for (int i = 0; i < modes.size(); i++) {
            out[i] = u.getEntry(i).multiply(modes.get(i).shapeAt(responsePoint));
        }
        return out;
    }

    private static FieldVector<Complex> coordinates(List<Mode> modes, List<PointAbsorber> absorbers, String forcePoint,
            double w) {
        int r = modes.size();
        int n = r + absorbers.size();
        FieldMatrix<Complex> z = new Array2DRowFieldMatrix<>(ComplexField.getInstance(), n, n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                z.setEntry(i, j, Complex.ZERO);
            }
        }
        for (int i = 0; i < r; i++) {
            Mode m = modes.get(i);
            double k = m.modalMass() * m.naturalFrequency() * m.naturalFrequency();
            double c = 2 * m.dampingRatio() * m.naturalFrequency() * m.modalMass();
            z.setEntry(i, i, new Complex(k - m.modalMass() * w * w, c * w));
        }
        for (int j = 0; j < absorbers.size(); j++) {
            PointAbsorber ab = absorbers.get(j);
            Complex spring = new Complex(ab.stiffness(), ab.damping() * w);
            int y = r + j;
            z.setEntry(y, y, spring.subtract(ab.mass() * w * w));
            for (int i = 0; i < r; i++) {
                double pi = modes.get(i).shapeAt(ab.point());
                z.setEntry(i, y, z.getEntry(i, y).subtract(spring.multiply(pi)));
                z.setEntry(y, i, z.getEntry(y, i).subtract(spring.multiply(pi)));
                for (int l = 0; l < r; l++) {
                    double pl = modes.get(l).shapeAt(ab.point());
                    z.setEntry(i, l, z.getEntry(i, l).add(spring.multiply(pi * pl)));
                }
            }
        }
        Complex[] force = new Complex[n];
        for (int i = 0; i < n; i++) {
            force[i] = i < r ? new Complex(modes.get(i).shapeAt(forcePoint)) : Complex.ZERO;
        }
        return new FieldLUDecomposition<>(z).getSolver().solve(new ArrayFieldVector<>(force));
    }

    private static Complex displacement(List<Mode> modes, FieldVector<Complex> u, String point) {
        Complex x = Complex.ZERO;
        for (int i = 0; i < modes.size(); i++) {
            x = x.add(u.getEntry(i).multiply(modes.get(i).shapeAt(point)));
        }
        return x;
    }
}
