package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.rational.FactoredPeaks;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.rational.RealRoots;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The design variables of a set of absorbers as the minimax solvers ({@link MinimaxTrustRegion},
 * {@link MinimaxKkt}, {@link AbsorberSetCheck}) see them: a point p in a box, the exact rational
 * transfer function it stands for, its factored ln|H|^2 (well conditioned) and the exact gradient
 * of ln|H|^2 at a frozen frequency. What differs between problems (which absorbers, which
 * structure, which variables) lives in the implementations; the pieces of the peak are found the
 * same way for all of them, here.
 */
interface MinimaxVariables {

    /** @return number of variables */
    int dimension();

    /** @return the box's lower corner */
    double[] lower();

    /** @return the box's upper corner */
    double[] upper();

    /** @return the band's low end, as a frequency ratio g */
    double bandLow();

    /** @return the band's high end (+infinity for all frequencies above the low end) */
    double bandHigh();

    /**
     * @param p the point
     * @return the exact rational H(s) of its design, s = i g
     */
    TransferFunction transferFunction(double[] p);

    /**
     * @param p the point
     * @return ln|H|^2 as a function of x = g^2 from the factored form (each modal and absorber term
     *     on its own, no expanded polynomial)
     */
    DoubleUnaryOperator logMagnitudeSquared(double[] p);

    /**
     * @param p the point
     * @param x squared frequency ratio of a maximum
     * @return d ln|H|^2 / dp at frozen x
     */
    double[] gradient(double[] p, double x);

    /**
     * @param p the point
     * @param x squared frequency ratio
     * @return ln|H|^2 from the factored form
     */
    default double logMagnitudeSquared(double[] p, double x) {
        return logMagnitudeSquared(p).applyAsDouble(x);
    }

    /**
     * Which transfer function a piece of the peak belongs to: its fourth column when it has one
     * (variables judged over several scenarios, {@link RobustSetVariables}), else 0 (one transfer
     * function).
     *
     * @param piece {x, kind, ln|H|^2[, scenario]}
     * @return the scenario's index
     */
    static int scenario(double[] piece) {
        return piece.length > 3 ? (int) piece[3] : 0;
    }

    /**
     * @param p the point
     * @param scenario which transfer function ({@link #scenario(double[])}); one alone by default
     * @param x squared frequency ratio
     * @return ln|H|^2 of that scenario from the factored form
     */
    default double logMagnitudeSquared(double[] p, int scenario, double x) {
        return logMagnitudeSquared(p, x);
    }

    /**
     * @param p the point
     * @param scenario which transfer function; one alone by default
     * @param x squared frequency ratio (&gt; 0)
     * @return x d/dx ln|H|^2 of that scenario
     */
    default double slope(double[] p, int scenario, double x) {
        return slope(p, x);
    }

    /**
     * @param p the point
     * @param scenario which transfer function; one alone by default
     * @param x squared frequency ratio of a maximum
     * @return d ln|H|^2 / dp of that scenario at frozen x
     */
    default double[] gradient(double[] p, int scenario, double x) {
        return gradient(p, x);
    }

    /**
     * @param p the point
     * @param x squared frequency ratio (&gt; 0)
     * @return x d/dx ln|H|^2 (zero at an interior maximum), by central differences in ln x of the
     *     factored form (step 1e-5: truncation about 1e-10, round-off about 1e-11)
     */
    default double slope(double[] p, double x) {
        DoubleUnaryOperator curve = logMagnitudeSquared(p);
        double h = 1e-5;
        return (curve.applyAsDouble(x * Math.exp(h)) - curve.applyAsDouble(x * Math.exp(-h))) / (2 * h);
    }

    /**
     * @param p the point
     * @return the peak over the band from the expanded polynomials alone (for the coarse scan)
     */
    default double polynomialPeak(double[] p) {
        return PeakFinder.over(transferFunction(p), bandLow(), bandHigh()).magnitude();
    }

    /**
     * A lower bound on the peak over the band, cheap next to {@link #polynomialPeak} (which the coarse
     * scan computes only for points this bound does not rule out, {@link AbsorberSetScan#evaluate}).
     *
     * @param p the point
     * @return the largest factored |H| at the frequencies {@link AbsorberSetScan#sampledMaximum} tries
     */
    default double sampledPeak(double[] p) {
        return Math.exp(0.5 * AbsorberSetScan.sampledMaximum(logMagnitudeSquared(p), bandLow(), bandHigh()));
    }

    /**
     * The exact peak over the band: the largest of {@link #maxima}.
     *
     * @param p the point
     * @return max |H| over the band
     */
    default double peak(double[] p) {
        return Math.exp(MinimaxTrustRegion.level(maxima(p)) / 2);
    }

    /**
     * The smooth pieces of the peak: every interior local maximum of |H|^2 in the band and the band's
     * finite ends, the maxima located by {@link FactoredPeaks} (brackets from the poles, a sweep and
     * the polynomial roots, each refined by Brent's method on the factored ln|H|^2; the expanded
     * polynomials alone lose digits at flat or close peaks) and their values from the factored form.
     *
     * @param p the point
     * @return {x = g^2, 1 for interior or 0 for a band end, ln|H|^2}
     */
    default List<double[]> maxima(double[] p) {
        return pieces(p, false);
    }

    /**
     * The maxima and, with {@code shoulders}, also every root of R' in the band (where a peak is
     * about to be born from a shoulder as the design moves): each is |H|^2 at a frozen frequency, a
     * lower bound of the peak, so adding them to a linear model of the peak only makes it truer. Without them the trust
     * region collapses where a new peak rises that the model cannot see (three individually tuned
     * absorbers on a light structure do this).
     *
     * @param p the point
     * @param shoulders true to add the shoulders (marked 2 in the second column)
     * @return {x, 1 interior maximum / 0 band end / 2 shoulder, ln|H|^2}
     */
    default List<double[]> pieces(double[] p, boolean shoulders) {
        TransferFunction h = transferFunction(p);
        DoubleUnaryOperator curve = logMagnitudeSquared(p);
        double low = bandLow() * bandLow();
        double high = bandHigh() * bandHigh();
        List<double[]> out = new ArrayList<>(FactoredPeaks.maxima(h, curve, low, high));
        double[] r = RealPolynomials.quotientDerivativeNumerator(h.magnitudeNumeratorInX(), h.magnitudeDenominatorInX());
        if (shoulders) {
            double[] dr = new double[Math.max(1, r.length - 1)];
            for (int i = 1; i < r.length; i++) {
                dr[i - 1] = i * r[i];
            }
            for (double x : RealRoots.roots(dr, low, Math.min(high, Double.MAX_VALUE))) {
                if (x > low && x < high) {
                    out.add(new double[] {x, 2, curve.applyAsDouble(x)});
                }
            }
        }
        // the low end always (at zero frequency the static response, which no absorber changes)
        out.add(new double[] {low, 0, curve.applyAsDouble(low)});
        if (Double.isFinite(high)) {
            out.add(new double[] {high, 0, curve.applyAsDouble(high)});
        }
        return out;
    }
}
