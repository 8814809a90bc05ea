package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.rational.RatioMaximum;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.response.HystereticAbsorber;
import org.counterpoise.core.response.HystereticResponse;

/**
 * The hysteretic absorber's minimum-peak problem in the design variables (f, eta): the response,
 * the band of frequency ratios and the search box. The tuning box is the viscous problem's
 * ({@link PeakProblem#minTuning()}, {@link PeakProblem#maxTuning()}); the loss factor lies in
 * [0, {@link #MAX_LOSS_FACTOR}].
 *
 * @param response the response written out in the absorber term
 * @param gLow low end of the band
 * @param gHigh high end (+infinity for all frequencies above gLow)
 * @param fMin lowest tuning ratio searched
 * @param fMax highest tuning ratio searched
 * @param fixedLossFactor true when eta is held at {@code eta} (the bound eta = 0, or a compound's own)
 * @param eta the held loss factor when {@code fixedLossFactor}
 */
record HystereticProblem(HystereticResponse response, double gLow, double gHigh, double fMin, double fMax,
        boolean fixedLossFactor, double eta) {

    /**
     * The largest loss factor searched: twice the viscous problem's largest damping ratio (the loss
     * factor of that damper at the absorber's own frequency, eta = 2 zeta_a); beyond it the absorber
     * is practically locked.
     */
    static final double MAX_LOSS_FACTOR = 2 * PeakProblem.MAX_DAMPING;

    /** The same problem with eta held at a value. */
    HystereticProblem holding(double lossFactor) {
        return new HystereticProblem(response, gLow, gHigh, fMin, fMax, true, lossFactor);
    }

    /** The same problem with eta free. */
    HystereticProblem free() {
        return new HystereticProblem(response, gLow, gHigh, fMin, fMax, false, 0.0);
    }

    boolean inBox(double f, double lossFactor) {
        return f >= fMin * (1 - 1e-12) && f <= fMax * (1 + 1e-12) && lossFactor >= 0
                && lossFactor <= MAX_LOSS_FACTOR;
    }

    HystereticAbsorber absorber(double f, double lossFactor) {
        return new HystereticAbsorber(response.massRatio(), f, lossFactor);
    }

    /** @return the exact peak of |H| over the band (+infinity when unbounded) */
    double peak(double f, double lossFactor) {
        return response.peak(absorber(f, lossFactor), gLow, gHigh).magnitude();
    }

    /**
     * The candidate maxima of |H|^2 over the band: interior local maxima and the finite band ends.
     * @return {g, 1 for interior or 0 for a band end, |H|^2}, highest first
     */
    List<double[]> candidates(double f, double lossFactor) {
        double[][] pq = response.squaredMagnitude(f, lossFactor);
        List<double[]> out = new ArrayList<>();
        for (double g : RatioMaximum.interiorMaxima(pq[0], pq[1], gLow, gHigh)) {
            out.add(new double[] {g, 1, RatioMaximum.value(pq[0], pq[1], g)});
        }
        out.add(new double[] {gLow, 0, RatioMaximum.value(pq[0], pq[1], gLow)});
        if (Double.isFinite(gHigh)) {
            out.add(new double[] {gHigh, 0, RatioMaximum.value(pq[0], pq[1], gHigh)});
        }
        out.sort((a, b) -> Double.compare(b[2], a[2]));
        return out;
    }

    /** @return ln|H|^2 at g */
    double logSquared(double f, double lossFactor, double g) {
        double[][] pq = response.squaredMagnitude(f, lossFactor);
        return Math.log(RatioMaximum.value(pq[0], pq[1], g));
    }

    /** @return g d/dg ln|H|^2 at g (zero at an interior peak) */
    double frequencySlope(double f, double lossFactor, double g) {
        double[][] pq = response.squaredMagnitude(f, lossFactor);
        return g * (RealPolynomials.derivativeValue(pq[0], g) / RealPolynomials.value(pq[0], g)
                - RealPolynomials.derivativeValue(pq[1], g) / RealPolynomials.value(pq[1], g));
    }

    /**
     * The gradient of ln|H|^2 at a frozen g in the free variables, each scaled: d/d(ln f) and
     * max(eta, 0.01) d/d eta (as the viscous certificate scales zeta_a).
     */
    double[] scaledGradient(double f, double lossFactor, double g) {
        double[] full = response.gradient(f, lossFactor, g);
        return fixedLossFactor ? new double[] {full[0]} : new double[] {full[0], Math.max(lossFactor, 1e-2) * full[1]};
    }

    int freeCount() {
        return fixedLossFactor ? 1 : 2;
    }
}
