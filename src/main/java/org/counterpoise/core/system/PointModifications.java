package org.counterpoise.core.system;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.counterpoise.core.rational.RealPolynomials;

/**
 * The exact transfer functions of a {@link ModalSystem} whose absorbers sit at several points: the
 * rank-one change of the one-point case becomes a rank-k one, k the number of points.
 *
 * <p>Route. With Z = diag(Z_a) the absorbers' dynamic stiffness at each point a (Z_a = A_a / B_a, the
 * sum over the absorbers there) and G the structure's receptances, the Woodbury identity gives
 * H_pq = G_pq - G_pA Z (I + G_AA Z)^-1 G_Aq, and by the Schur complement of the bordered matrix
 * H_pq = det[[I + Z G_AA, Z G_Aq], [G_pA, G_pq]] / det(I + Z G_AA) (the matrix determinant lemma,
 * generalised; e.g. Golub and Van Loan 2013, Matrix Computations, 4th ed., section 2.1.4; the
 * structural modification identity, Ewins 2000, section 6.4). Expanding both determinants in
 * principal minors (Z is diagonal), each term is a product of Z_a over a subset S of the points
 * times a minor of G; G = Phi K^-1 Phi^T with K = diag(kappa_r), so by the Cauchy-Binet formula that
 * minor is a sum over sets R of |S| (or |S| + 1) modes of det Phi(rows, R) det Phi(columns, R) /
 * prod_(r in R) kappa_r. Multiplied by D prod_a B_a (D = prod_r kappa_r):
 * <pre>
 *   numerator   = sum_S prod_(a in S) A_a prod_(a not in S) B_a C(S + p, S + q)
 *   denominator = sum_S prod_(a in S) A_a prod_(a not in S) B_a C(S, S)
 *   C(X, Y)     = sum_(|R| = |X|) det Phi(X, R) det Phi(Y, R) prod_(t not in R) kappa_t
 * </pre>
 * For one point the two sums are B n_pq + A M_pq and B D + A n_aa, {@link ModalSystem}'s own. A
 * term whose rows repeat a point (p or q among the absorbers' points S) vanishes and is skipped.
 * The small determinants of mode-shape values come from Commons Math's LU decomposition.
 */
final class PointModifications {
    private final ModalSystem system;
    private final List<String> points;

    /**
     * @param system the system
     * @param points the distinct points of its absorbers
     */
    PointModifications(ModalSystem system, List<String> points) {
        this.system = system;
        this.points = List.copyOf(points);
    }

    /** @return the denominator, ascending powers of s */
    double[] denominator() {
        return sum(null, null, -1);
    }

    /**
     * @param p response point
     * @param q force point
     * @return the numerator of H_pq
     */
    double[] numerator(String p, String q) {
        return sum(p, q, -1);
    }

    /**
     * The stroke of absorber j at point a is -s^2 H_aq / b_j; every term that does not vanish has
     * B_a (a not in S), which b_j divides exactly, so the division is done by leaving b_j out.
     *
     * @param q force point
     * @param absorber j
     * @return the numerator of the stroke per unit force, times k_ref
     */
    double[] strokeNumerator(String q, int absorber) {
        String a = system.absorbers().get(absorber).point();
        return RealPolynomials.scale(RealPolynomials.shift(sum(a, q, absorber), 2), -1.0);
    }

    private double[] sum(String p, String q, int without) {
        double[] out = {0.0};
        int k = points.size();
        for (int mask = 0; mask < (1 << k); mask++) {
            List<String> rows = new ArrayList<>();
            double[] weight = {1.0};
            boolean repeats = false;
            for (int i = 0; i < k; i++) {
                String a = points.get(i);
                if ((mask & (1 << i)) != 0) {
                    rows.add(a);
                    repeats |= a.equals(p) || a.equals(q);
                    weight = RealPolynomials.multiply(weight, system.absorberNumerator(a));
                } else {
                    weight = RealPolynomials.multiply(weight, system.absorberDenominator(a, without));
                }
            }
            if (repeats) {
                continue; // a repeated row: the minor is zero
            }
            List<String> columns = new ArrayList<>(rows);
            if (p != null) {
                rows.add(p);
                columns.add(q);
            }
            double[] minor = cauchyBinet(rows, columns);
            if (minor.length > 1 || minor[0] != 0.0) {
                out = RealPolynomials.add(out, RealPolynomials.multiply(weight, minor));
            }
        }
        return out;
    }

    /** C(X, Y) = sum over sets R of |X| modes of det Phi(X, R) det Phi(Y, R) prod_(t not in R) kappa_t. */
    private double[] cauchyBinet(List<String> rows, List<String> columns) {
        List<Mode> modes = system.structure().modes();
        int size = rows.size();
        double[] out = {0.0};
        for (int set = 0; set < (1 << modes.size()); set++) {
            if (Integer.bitCount(set) != size) {
                continue;
            }
            double w = determinant(rows, set) * determinant(columns, set);
            if (w == 0.0) {
                continue;
            }
            double[] product = {w};
            for (int t = 0; t < modes.size(); t++) {
                if ((set & (1 << t)) == 0) {
                    product = RealPolynomials.multiply(product, system.modalStiffness(t));
                }
            }
            out = RealPolynomials.add(out, product);
        }
        return out;
    }

    /** det Phi(points, modes in the set); 1 for no point. */
    private double determinant(List<String> at, int set) {
        if (at.isEmpty()) {
            return 1.0;
        }
        double[][] phi = new double[at.size()][at.size()];
        int column = 0;
        for (int r = 0; r < system.structure().size(); r++) {
            if ((set & (1 << r)) != 0) {
                for (int i = 0; i < at.size(); i++) {
                    phi[i][column] = system.structure().modes().get(r).shapeAt(at.get(i));
                }
                column++;
            }
        }
        return at.size() == 1 ? phi[0][0] : new LUDecomposition(new Array2DRowRealMatrix(phi, false)).getDeterminant();
    }
}
