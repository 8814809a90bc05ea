package org.counterpoise.testing;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.complex.ComplexField;
import org.apache.commons.math3.linear.Array2DRowFieldMatrix;
import org.apache.commons.math3.linear.ArrayFieldVector;
import org.apache.commons.math3.linear.FieldLUDecomposition;
import org.apache.commons.math3.linear.FieldMatrix;
import org.apache.commons.math3.linear.FieldVector;

/**
 * An independent route to the two-mass system's harmonic response: the physical equations of
 * motion in absolute coordinates, solved as a 2x2 complex linear system by Commons Math's LU
 * decomposition. Nothing from the production algebra is used.
 *
 * <pre>
 *   m1 x1'' + c1 (x1' - u') + k1 (x1 - u) + c2 (x1' - x2') + k2 (x1 - x2) = F(t)
 *   m2 x2'' + c2 (x2' - x1') + k2 (x2 - x1) = 0
 * </pre>
 */
public final class DirectSolve {
    private DirectSolve() {
    }

    /**
     * @return complex amplitudes {X1, X2} at angular frequency w for force amplitude force and
     *     base displacement amplitude base (physical units)
     */
    public static Complex[] solve(double m1, double k1, double c1, double m2, double k2, double c2,
            double w, Complex force, Complex base) {
        Complex iw = new Complex(0, w);
        Complex d11 = new Complex(k1 + k2 - m1 * w * w, (c1 + c2) * w);
        Complex d12 = new Complex(-k2, -c2 * w);
        Complex d22 = new Complex(k2 - m2 * w * w, c2 * w);
        FieldMatrix<Complex> a = new Array2DRowFieldMatrix<>(ComplexField.getInstance(), 2, 2);
        a.setEntry(0, 0, d11);
        a.setEntry(0, 1, d12);
        a.setEntry(1, 0, d12);
        a.setEntry(1, 1, d22);
        Complex rhs1 = force.add(base.multiply(new Complex(k1, 0).add(iw.multiply(c1))));
        FieldVector<Complex> b = new ArrayFieldVector<>(new Complex[] {rhs1, Complex.ZERO});
        FieldVector<Complex> x = new FieldLUDecomposition<>(a).getSolver().solve(b);
        return new Complex[] {x.getEntry(0), x.getEntry(1)};
    }
}
