package org.counterpoise.core.criteria;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.rational.RealRoots;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The exact largest utilisation of ONE order against a limit curve over the band: the largest of
 * u(g) = c |G(i g)| / L(f(g)), c the order's SI scale in the criterion's convention and f its own
 * frequency in Hz, proportional to g.
 *
 * <p>The band is cut at the frequencies of the curve's points. On each piece L is proportional
 * to f^k (k = 0 outside the curve's range, where the end value is held), so with x = g^2 and
 * |G|^2 = P(x)/Q(x), u^2 is proportional to P / (Q x^k), whose stationary points are the real roots
 * of S(x) = x (P'Q - PQ') - k P Q, that is s_m = sum over i + j = m of (i - j - k) p_i q_j (the
 * class comment of {@link LimitCurve}). The candidates are those roots inside the piece, found by
 * {@link RealRoots} with the roots of S' as in {@link PeakFinder},
 * and every piece's ends (the band ends and the curve's points): the largest candidate is the
 * maximum, for any real exponent k, without sampling.
 */
final class CurvePeak {
    private CurvePeak() {
    }

    /**
     * @param responses the orders' responses (bounded in the band: checked by the caller)
     * @param order the order judged
     * @param convention the criterion's convention
     * @param curve the limit
     * @param gLow band start, design order's ratio
     * @param gHigh band end
     * @return {g, utilisation} at the maximum
     */
    static double[] of(OrderResponses responses, int order, AmplitudeConvention convention, LimitCurve curve,
            double gLow, double gHigh) {
        TransferFunction h = responses.transfer(order);
        double[] best = {gLow, utilisation(responses, order, convention, curve, gLow * gLow)};
        if (gHigh <= gLow) {
            return best;
        }
        List<Double> ends = new ArrayList<>();
        ends.add(gLow);
        for (LimitCurve.Point point : curve.points()) {
            double g = responses.ratioAt(order, point.frequency());
            if (g > gLow && g < gHigh) {
                ends.add(g);
            }
        }
        ends.add(gHigh);
        double[] p = h.magnitudeNumeratorInX();
        double[] q = h.magnitudeDenominatorInX();
        for (int i = 0; i + 1 < ends.size(); i++) {
            double a = ends.get(i);
            double b = ends.get(i + 1);
            double k = exponentOn(curve, responses.hertz(order, Math.sqrt(a * b)));
            offer(best, responses, order, convention, curve, b * b);
            for (double x : RealRoots.rootsAndCriticalPoints(stationary(p, q, k), a * a, b * b)) {
                if (x > a * a && x < b * b) {
                    offer(best, responses, order, convention, curve, x);
                }
            }
        }
        return best;
    }

    /** S(x) = x (P'Q - PQ') - k P Q, coefficient by coefficient (the class comment). */
    static double[] stationary(double[] p, double[] q, double k) {
        double[] s = new double[p.length + q.length - 1];
        for (int i = 0; i < p.length; i++) {
            for (int j = 0; j < q.length; j++) {
                double weight = (i - j) - k;
                if (weight != 0.0) {
                    s[i + j] += weight * p[i] * q[j];
                }
            }
        }
        return RealPolynomials.trim(s);
    }

    /** @return the log-log slope of the curve at a frequency (0 outside its points) */
    static double exponentOn(LimitCurve curve, double hertz) {
        List<LimitCurve.Point> points = curve.points();
        if (points.size() < 2 || hertz <= curve.lowFrequency() || hertz >= curve.highFrequency()) {
            return 0.0;
        }
        int segment = 0;
        while (points.get(segment + 1).frequency() < hertz) {
            segment++;
        }
        return curve.exponent(segment);
    }

    private static void offer(double[] best, OrderResponses responses, int order, AmplitudeConvention convention,
            LimitCurve curve, double x) {
        double u = utilisation(responses, order, convention, curve, x);
        if (u > best[1]) {
            best[0] = Math.sqrt(x);
            best[1] = u;
        }
    }

    private static double utilisation(OrderResponses responses, int order, AmplitudeConvention convention,
            LimitCurve curve, double x) {
        double magnitude = Math.sqrt(responses.transfer(order).magnitudeSquared(x));
        double g = Math.sqrt(x);
        return convention.ofHarmonic(responses.scale(order) * magnitude) / curve.at(responses.hertz(order, g));
    }
}
