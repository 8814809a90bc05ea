package org.counterpoise.core.identify;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Rational-fraction polynomial fit (Richardson and Formenti 1982, "Parameter estimation from
 * frequency response measurements using rational fraction polynomials", Proc. 1st IMAC): the
 * receptance is written H(s) = N(s)/D(s) with s = i omega, D monic of degree 2n for n modes, N of
 * degree 2n - 1 (2n when residual terms are wanted, so a constant is left for the modes above).
 * The linearised equations N(s_k) - H_k D(s_k) = 0 are solved in least squares by SVD (Commons
 * Math); the poles are the roots of D (Commons Math Laguerre solver), each pair p, conj(p) giving
 * omega_n = |p| and zeta = -Re(p)/|p|; the residue A = N(p)/D'(p) gives the driving-point modal
 * mass m = Re(1 / (2 i Im(p) A)), since 1/(m (s - p)(s - conj p)) has the residue 1/(m (p - conj p)).
 *
 * <p>Instead of the publication's orthogonal polynomials, s is scaled by the band's top frequency,
 * which keeps the monomial basis well enough conditioned for the 1..4 modes allowed here. The
 * linearised problem weights the lines by |D|, so it is a start for {@link ModalFit}, not the answer.
 */
public final class RationalFraction {
    /** The most modes one fit takes. */
    public static final int MAX_MODES = 4;

    private RationalFraction() {
    }

    /** Laguerre steps allowed for all the roots together (a few dozen per root suffice when it converges). */
    static final int ROOT_STEPS = 100_000;

    /**
     * @param measured the measurement, any kind (converted to receptance)
     * @param modes the number of modes, 1..4
     * @param residuals whether to leave a constant for the modes above the band
     * @return the modes by increasing frequency
     * @throws InvalidInputException when fewer than {@code modes} damped modes are found
     */
    public static List<IdentifiedMode> fit(MeasuredFrf measured, int modes, boolean residuals) {
        if (modes < 1 || modes > MAX_MODES) {
            throw new InvalidInputException("modes", Integer.toString(modes), "1 to " + MAX_MODES + " modes");
        }
        MeasuredFrf h = measured.as(FrfKind.RECEPTANCE);
        int n = h.size();
        int denominator = 2 * modes;
        int numerator = residuals ? denominator : denominator - 1;
        int unknowns = numerator + 1 + denominator;
        if (2 * n < unknowns + 2) {
            throw new InvalidInputException("band", n + " lines", "at least " + (unknowns / 2 + 2)
                    + " lines in the band for " + modes + " modes");
        }
        double w0 = h.omega()[n - 1];
        double scale = 0.0;
        for (int k = 0; k < n; k++) {
            scale = Math.max(scale, h.value(k).abs());
        }
        double[][] a = new double[2 * n][unknowns];
        double[] b = new double[2 * n];
        for (int k = 0; k < n; k++) {
            Complex x = new Complex(0.0, h.omega()[k] / w0);
            Complex hk = h.value(k).divide(scale);
            Complex power = Complex.ONE;
            for (int j = 0; j <= Math.max(numerator, denominator); j++) {
                if (j <= numerator) {
                    a[2 * k][j] = power.getReal();
                    a[2 * k + 1][j] = power.getImaginary();
                }
                Complex hp = hk.multiply(power);
                if (j < denominator) {
                    a[2 * k][numerator + 1 + j] = -hp.getReal();
                    a[2 * k + 1][numerator + 1 + j] = -hp.getImaginary();
                } else if (j == denominator) {
                    b[2 * k] = hp.getReal();
                    b[2 * k + 1] = hp.getImaginary();
                }
                power = power.multiply(x);
            }
        }
        RealVector c = new SingularValueDecomposition(new Array2DRowRealMatrix(a, false)).getSolver()
                .solve(new ArrayRealVector(b, false));
        double[] num = new double[numerator + 1];
        double[] den = new double[denominator + 1];
        for (int j = 0; j <= numerator; j++) {
            num[j] = c.getEntry(j);
        }
        for (int j = 0; j < denominator; j++) {
            den[j] = c.getEntry(numerator + 1 + j);
        }
        den[denominator] = 1.0;
        Complex[] roots;
        try {
            // bounded: the two-argument form allows unlimited steps and may never return
            roots = new LaguerreSolver(1e-14).solveAllComplex(den, 0.0, ROOT_STEPS);
        } catch (TooManyEvaluationsException e) {
            roots = new Complex[0]; // no modes found: refused below in plain words
        }
        List<IdentifiedMode> found = new ArrayList<>();
        for (Complex root : roots) {
            if (root.getImaginary() > 0 && root.getReal() < 0) {
                Complex p = root.multiply(w0);
                Complex residue = evaluate(num, root).divide(evaluate(derivative(den), root)).multiply(scale * w0);
                double mass = Complex.ONE.divide(new Complex(0.0, 2.0 * p.getImaginary()).multiply(residue)).getReal();
                found.add(IdentifiedMode.of(p.abs(), -p.getReal() / p.abs(), mass));
            }
        }
        if (found.size() < modes) {
            throw new InvalidInputException("modes", Integer.toString(modes),
                    found.size() + " damped mode(s) found in the band; ask for fewer modes or choose a band around them");
        }
        found.sort(Comparator.comparingDouble(IdentifiedMode::naturalFrequency));
        return found;
    }

    private static Complex evaluate(double[] coefficients, Complex x) {
        Complex sum = Complex.ZERO;
        for (int j = coefficients.length - 1; j >= 0; j--) {
            sum = sum.multiply(x).add(coefficients[j]);
        }
        return sum;
    }

    private static double[] derivative(double[] coefficients) {
        double[] d = new double[coefficients.length - 1];
        for (int j = 1; j < coefficients.length; j++) {
            d[j - 1] = j * coefficients[j];
        }
        return d;
    }
}
