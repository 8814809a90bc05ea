package org.counterpoise.core.system;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.rational.TransferFunction;

/**
 * A structure of several modes with any number of absorbers attached at one of its points, and its
 * exact transfer functions, built as products and sums of low-degree polynomials: no determinant
 * is expanded.
 *
 * <p>Route. In the scaled variable s = i omega / omega_ref, each mode r contributes the modal
 * dynamic stiffness kappa_r(s) = (m_r / m_ref)(s^2 + 2 zeta_r nu_r s + nu_r^2), nu_r = omega_r /
 * omega_ref, m_ref = k_ref / omega_ref^2, and the bare structure's receptance (times k_ref) is
 * G_pq = sum_r phi_r(p) phi_r(q) / kappa_r (modal superposition; Ewins 2000, Modal Testing, 2nd
 * ed., eq. 2.43). Absorber j at point a adds the dynamic stiffness z_j = mu_j s^2 K_j / (s^2 + K_j),
 * K_j = f_j^2 + 2 zeta_j f_j s, mu_j = m_j / m_ref, f_j = omega_j / omega_ref (the force a mass on a
 * spring and damper puts back on its base), and together Z = sum_j z_j = A / B. A point stiffness
 * at one point is a rank-one change of the structure's dynamic stiffness, so the
 * Sherman-Morrison formula gives the receptance with the absorbers exactly:
 * H_pq = G_pq - G_pa Z G_aq / (1 + Z G_aa)
 * (the structural modification identity; e.g. Ewins 2000, section 6.4). With D = prod_r kappa_r,
 * G_pq = n_pq / D where n_pq = sum_r phi_r(p) phi_r(q) prod_(t != r) kappa_t, and the minor
 * n_pq n_aa - n_pa n_aq is divisible by D exactly:
 * M_pq = sum_(r &lt; s) (phi_r(p) phi_s(a) - phi_s(p) phi_r(a)) (phi_r(q) phi_s(a) - phi_s(q) phi_r(a))
 * prod_(t != r, s) kappa_t, so that
 * <pre>
 *   H_pq(s) = (B n_pq + A M_pq) / (B D + A n_aa)
 * </pre>
 * with every polynomial a product of factors of degree two. For one mode (phi = 1) this is
 * H = 1 / (kappa_1 + sum_j z_j), the single absorber's receptance for n = 1 (the reference sheet's
 * (s^2 + K) / Delta). The absorber's stroke follows from y_j - x_a = -s^2 x_a / (s^2 + K_j) and
 * M_aq = 0: stroke_j = -s^2 (B / b_j) n_aq / (B D + A n_aa), b_j = s^2 + K_j.
 *
 * <p>Absorbers at several different points are a rank-k change, k the number of points: the same
 * identity with a k x k matrix, in {@link PointModifications}; with one point the route above is
 * taken unchanged. SI units; immutable.
 *
 * @param structure the modal structure
 * @param absorbers the absorbers (may be empty), at one or several points
 * @param referenceFrequency omega_ref, rad/s (&gt; 0)
 * @param referenceStiffness k_ref, N/m (&gt; 0): transfer functions give receptance times k_ref
 */
public record ModalSystem(ModalStructure structure, List<PointAbsorber> absorbers, double referenceFrequency,
        double referenceStiffness) implements LinearSystem<String, String> {

    /** Validates the system. */
    public ModalSystem {
        Checks.present("structure", structure, "a structure of at least one mode");
        Checks.present("absorbers", absorbers, "a list of absorbers (it may be empty)");
        Checks.positive("reference frequency", referenceFrequency);
        Checks.positive("reference stiffness", referenceStiffness);
        absorbers = List.copyOf(absorbers);
        for (int j = 0; j < absorbers.size(); j++) {
            structure.requirePoint(absorbers.get(j).point());
        }
    }

    /**
     * @param structure the structure
     * @param absorbers the absorbers
     * @return the system scaled by its lowest mode: omega_ref = omega_1, k_ref = m_1 omega_1^2
     */
    public static ModalSystem of(ModalStructure structure, List<PointAbsorber> absorbers) {
        Mode first = structure.modes().get(0);
        double w = first.naturalFrequency();
        return new ModalSystem(structure, absorbers, w, first.modalMass() * w * w);
    }

    /** @return the same structure without absorbers, on the same scales */
    public ModalSystem bare() {
        return new ModalSystem(structure, List.of(), referenceFrequency, referenceStiffness);
    }

    /**
     * @param forcePoint where a harmonic force acts
     * @param responsePoint where the displacement is wanted
     * @return the receptance times k_ref, exact rational in s = i omega / omega_ref
     */
    @Override
    public TransferFunction transferFunction(String forcePoint, String responsePoint) {
        structure.requirePoint(forcePoint);
        structure.requirePoint(responsePoint);
        double[] den = denominator();
        if (absorbers.isEmpty()) {
            return nonZero(sumOverModes(responsePoint, forcePoint), den, responsePoint);
        }
        List<String> points = absorberPoints();
        if (points.size() > 1) {
            return nonZero(new PointModifications(this, points).numerator(responsePoint, forcePoint), den, responsePoint);
        }
        String a = points.get(0);
        double[] b = absorberDenominator(a, -1);
        double[] num = RealPolynomials.add(RealPolynomials.multiply(b, sumOverModes(responsePoint, forcePoint)),
                RealPolynomials.multiply(absorberNumerator(a), minor(responsePoint, forcePoint, a)));
        return nonZero(num, den, responsePoint);
    }

    /**
     * @param forcePoint where a harmonic force acts
     * @param absorber index of the absorber
     * @return its stroke (absorber displacement minus the point's) per unit force, times k_ref
     */
    public TransferFunction strokeTransferFunction(String forcePoint, int absorber) {
        structure.requirePoint(forcePoint);
        if (absorber < 0 || absorber >= absorbers.size()) {
            throw new InvalidInputException("absorber", String.valueOf(absorber + 1),
                    "a number from 1 to " + absorbers.size());
        }
        List<String> points = absorberPoints();
        String a = absorbers.get(absorber).point();
        if (points.size() > 1) {
            return nonZero(new PointModifications(this, points).strokeNumerator(forcePoint, absorber), denominator(), a);
        }
        double[] others = absorberDenominator(a, absorber);
        double[] num = RealPolynomials.scale(RealPolynomials.shift(RealPolynomials.multiply(others,
                sumOverModes(a, forcePoint)), 2), -1.0);
        return nonZero(num, denominator(), a);
    }

    @Override
    public double responseScale(String forcePoint, double amplitude, String responsePoint) {
        return amplitude / referenceStiffness;
    }

    /** @return B D + A n_aa (D alone without absorbers) */
    private double[] denominator() {
        double[] d = productOfModes(-1, -1);
        if (absorbers.isEmpty()) {
            return d;
        }
        List<String> points = absorberPoints();
        if (points.size() > 1) {
            return new PointModifications(this, points).denominator();
        }
        String a = points.get(0);
        return RealPolynomials.add(RealPolynomials.multiply(absorberDenominator(a, -1), d),
                RealPolynomials.multiply(absorberNumerator(a), sumOverModes(a, a)));
    }

    /** @return the distinct points of the absorbers, in the order they first appear */
    public List<String> absorberPoints() {
        List<String> out = new ArrayList<>();
        for (PointAbsorber ab : absorbers) {
            if (!out.contains(ab.point())) {
                out.add(ab.point());
            }
        }
        return out;
    }

    private TransferFunction nonZero(double[] num, double[] den, String responsePoint) {
        if (RealPolynomials.lowestPower(num) == num.length) {
            throw new InvalidInputException("response point", responsePoint,
                    "a point that some mode moves (every mode-shape value there, or at the force's point, is 0)");
        }
        return TransferFunction.of(num, den);
    }

    /** kappa_r(s) = (m_r / m_ref)(s^2 + 2 zeta_r nu_r s + nu_r^2), ascending powers. */
    double[] modalStiffness(int r) {
        Mode m = structure.modes().get(r);
        double nu = m.naturalFrequency() / referenceFrequency;
        double massRatio = m.modalMass() * referenceFrequency * referenceFrequency / referenceStiffness;
        return RealPolynomials.scale(new double[] {nu * nu, 2 * m.dampingRatio() * nu, 1.0}, massRatio);
    }

    /** prod over modes t other than r and s of kappa_t (pass -1 to exclude none). */
    private double[] productOfModes(int r, int s) {
        double[] out = {1.0};
        for (int t = 0; t < structure.size(); t++) {
            if (t != r && t != s) {
                out = RealPolynomials.multiply(out, modalStiffness(t));
            }
        }
        return out;
    }

    /** n_pq = sum_r phi_r(p) phi_r(q) prod_(t != r) kappa_t. */
    private double[] sumOverModes(String p, String q) {
        double[] out = {0.0};
        for (int r = 0; r < structure.size(); r++) {
            Mode m = structure.modes().get(r);
            double w = m.shapeAt(p) * m.shapeAt(q);
            if (w != 0.0) {
                out = RealPolynomials.add(out, RealPolynomials.scale(productOfModes(r, -1), w));
            }
        }
        return out;
    }

    /** M_pq = (n_pq n_aa - n_pa n_aq) / D, written out so that no division is needed. */
    private double[] minor(String p, String q, String a) {
        double[] out = {0.0};
        List<Mode> modes = structure.modes();
        for (int r = 0; r < modes.size(); r++) {
            for (int s = r + 1; s < modes.size(); s++) {
                Mode mr = modes.get(r);
                Mode ms = modes.get(s);
                double w = (mr.shapeAt(p) * ms.shapeAt(a) - ms.shapeAt(p) * mr.shapeAt(a))
                        * (mr.shapeAt(q) * ms.shapeAt(a) - ms.shapeAt(q) * mr.shapeAt(a));
                if (w != 0.0) {
                    out = RealPolynomials.add(out, RealPolynomials.scale(productOfModes(r, s), w));
                }
            }
        }
        return out;
    }

    /** b_j(s) = s^2 + K_j(s) with K_j = f_j^2 + 2 zeta_j f_j s in the scaled variable. */
    double[] spring(int j) {
        PointAbsorber ab = absorbers.get(j);
        double w = referenceFrequency;
        return new double[] {ab.stiffness() / (ab.mass() * w * w), ab.damping() / (ab.mass() * w), 1.0};
    }

    /** mu_j = m_j / m_ref. */
    double massRatio(int j) {
        return absorbers.get(j).mass() * referenceFrequency * referenceFrequency / referenceStiffness;
    }

    /**
     * B_a = prod_j b_j over the absorbers at point a (all of them for one point), leaving out one.
     *
     * @param a the point
     * @param without the absorber left out (-1: none)
     */
    double[] absorberDenominator(String a, int without) {
        double[] out = {1.0};
        for (int j = 0; j < absorbers.size(); j++) {
            if (j != without && absorbers.get(j).point().equals(a)) {
                out = RealPolynomials.multiply(out, spring(j));
            }
        }
        return out;
    }

    /**
     * A_a = sum_j a_j prod_(i != j) b_i over the absorbers at point a, a_j = mu_j s^2 K_j.
     *
     * @param a the point
     */
    double[] absorberNumerator(String a) {
        double[] out = {0.0};
        for (int j = 0; j < absorbers.size(); j++) {
            if (!absorbers.get(j).point().equals(a)) {
                continue;
            }
            double[] b = spring(j);
            double[] term = RealPolynomials.scale(RealPolynomials.shift(new double[] {b[0], b[1]}, 2), massRatio(j));
            for (int i = 0; i < absorbers.size(); i++) {
                if (i != j && absorbers.get(i).point().equals(a)) {
                    term = RealPolynomials.multiply(term, spring(i));
                }
            }
            out = RealPolynomials.add(out, term);
        }
        return out;
    }
}
