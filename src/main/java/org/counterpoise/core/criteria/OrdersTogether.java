package org.counterpoise.core.criteria;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.rational.RealRoots;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The largest combined value of several orders over the band, judged together against a flat
 * limit (the convention's rule for a sum of harmonics at distinct frequencies:
 * {@link AmplitudeConvention#ofSum}).
 *
 * <p>R.m.s.: the mean square is M(x) = sum_j (a_j^2 / 2) P_j(x) / Q_j(x), with x = g^2 and
 * |G_j|^2 = P_j / Q_j, one rational function P/Q over the common denominator Q = prod Q_j; its
 * interior maxima are among the real roots of P'Q - PQ' (as {@link PeakFinder}
 * does for one order), and the band ends are the other
 * candidates. Each candidate is evaluated from the sum itself, so round-off in the expanded
 * polynomial can move a candidate slightly (a cost of second order in the value) but never
 * over-state the maximum.
 *
 * <p>Peak and peak-to-peak: the sum of amplitudes sum_j a_j |G_j| is not rational in x; its maximum
 * is found by {@link ScanMaximum} seeded with each order's own interior maxima.
 */
final class OrdersTogether {
    private OrdersTogether() {
    }

    /**
     * @param r the responses (bounded in the band)
     * @param gLow band start
     * @param gHigh band end
     * @return {g, r.m.s. of the sum} at the maximum
     */
    static double[] rms(OrderResponses r, double gLow, double gHigh) {
        int n = r.size();
        double[] weight = new double[n];
        double[][] p = new double[n][];
        double[][] q = new double[n][];
        for (int j = 0; j < n; j++) {
            TransferFunction h = r.transfer(j);
            p[j] = h.magnitudeNumeratorInX();
            q[j] = h.magnitudeDenominatorInX();
            // each P_j and Q_j divided by its largest coefficient: the roots do not move, the
            // common polynomials stay far from overflow and underflow
            double pSize = largest(p[j]);
            double qSize = largest(q[j]);
            p[j] = RealPolynomials.scale(p[j], 1.0 / pSize);
            q[j] = RealPolynomials.scale(q[j], 1.0 / qSize);
            weight[j] = 0.5 * r.scale(j) * r.scale(j) * pSize / qSize;
        }
        double[] best = {gLow, meanSquare(r, gLow * gLow)};
        if (gHigh <= gLow) {
            return new double[] {best[0], Math.sqrt(best[1])};
        }
        offer(best, r, gHigh * gHigh);
        double[] numerator = {0.0};
        double[] denominator = {1.0};
        for (int j = 0; j < n; j++) {
            numerator = RealPolynomials.add(RealPolynomials.multiply(numerator, q[j]),
                    RealPolynomials.scale(RealPolynomials.multiply(p[j], denominator), weight[j]));
            denominator = RealPolynomials.multiply(denominator, q[j]);
        }
        double xLow = gLow * gLow;
        double xHigh = gHigh * gHigh;
        double[] slope = RealPolynomials.quotientDerivativeNumerator(numerator, denominator);
        for (double x : RealRoots.rootsAndCriticalPoints(slope, xLow, xHigh)) {
            if (x > xLow && x < xHigh) {
                offer(best, r, x);
            }
        }
        return new double[] {best[0], Math.sqrt(best[1])};
    }

    /**
     * @param r the responses (bounded in the band)
     * @param gLow band start
     * @param gHigh band end
     * @return {g, sum of amplitudes} at the maximum
     */
    static double[] amplitudeSum(OrderResponses r, double gLow, double gHigh) {
        return ScanMaximum.of(g -> {
            double sum = 0.0;
            for (int j = 0; j < r.size(); j++) {
                sum += r.amplitude(j, g);
            }
            return sum;
        }, gLow, gHigh, seeds(r, IntStream.range(0, r.size()).toArray(), gLow, gHigh, null));
    }

    /**
     * @param r the responses
     * @param members the orders whose maxima seed a scan
     * @param gLow band start
     * @param gHigh band end
     * @param curve a limit curve whose points are seeds too, or null
     * @return each member's interior maxima of |G_j| and the curve's points, as g of the design order
     */
    static double[] seeds(OrderResponses r, int[] members, double gLow, double gHigh, LimitCurve curve) {
        List<Double> out = new ArrayList<>();
        for (int j : members) {
            for (double g : PeakFinder.interiorMaxima(r.transfer(j), gLow, gHigh)) {
                out.add(g);
            }
            if (curve != null) {
                for (LimitCurve.Point point : curve.points()) {
                    out.add(r.ratioAt(j, point.frequency()));
                }
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static double meanSquare(OrderResponses r, double x) {
        double sum = 0.0;
        for (int j = 0; j < r.size(); j++) {
            double a = r.scale(j);
            sum += 0.5 * a * a * r.transfer(j).magnitudeSquared(x);
        }
        return sum;
    }

    private static void offer(double[] best, OrderResponses r, double x) {
        double value = meanSquare(r, x);
        if (value > best[1]) {
            best[0] = Math.sqrt(x);
            best[1] = value;
        }
    }

    private static double largest(double[] c) {
        double size = 0.0;
        for (double v : c) {
            size = Math.max(size, Math.abs(v));
        }
        return size > 0 ? size : 1.0;
    }
}
