package org.counterpoise.core.criteria;

import java.util.List;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;

/**
 * A limit that may depend on frequency: straight lines between the given points on log-log axes,
 * that is a power law L(f) = L_i (f / f_i)^k_i on each segment (the form every published criterion
 * curve takes: constant velocity, constant acceleration, f^-1/2 ...), held at the end values outside
 * the points. One point is a flat limit. The curve's frequencies are the limit's range of use; a
 * value judged outside it is judged against the nearest end value, and the verdict says so.
 *
 * <p>On each segment |G(i omega)|^2 / L^2 is P(x) / (Q(x) x^k) with x = omega^2, so its stationary
 * points are the real roots of the polynomial x (P'Q - PQ') - k P Q: the exact peak search works
 * piece by piece for any real exponent.
 *
 * @param points the points, frequency strictly rising
 */
public record LimitCurve(List<Point> points) {

    /**
     * @param frequency frequency, Hz (&gt; 0)
     * @param limit the limit there, SI unit of the criterion's quantity, in its convention (&gt; 0)
     */
    public record Point(double frequency, double limit) {
        /** Validates the point; the message names the point by its two values. */
        public Point {
            if (!(frequency > 0) || Double.isInfinite(frequency)) {
                throw new InvalidInputException("limit curve point", show(frequency, limit),
                        "the frequency must be a finite number of hertz greater than 0");
            }
            if (!(limit > 0) || Double.isInfinite(limit)) {
                throw new InvalidInputException("limit curve point", show(frequency, limit),
                        "the limit must be a finite number greater than 0");
            }
        }

        private static String show(double frequency, double limit) {
            return "(" + Checks.show(frequency) + " Hz, " + Checks.show(limit) + ")";
        }
    }

    /** Validates the curve. */
    public LimitCurve {
        Checks.present("limit curve", points, "at least one point (frequency, limit)");
        if (points.isEmpty()) {
            throw InvalidInputException.missing("limit curve", "at least one point (frequency, limit)");
        }
        for (int i = 0; i < points.size(); i++) {
            Checks.present("limit curve point " + (i + 1), points.get(i), "a frequency and a limit");
        }
        points = List.copyOf(points);
        for (int i = 1; i < points.size(); i++) {
            if (!(points.get(i).frequency() > points.get(i - 1).frequency())) {
                throw new InvalidInputException("limit curve point " + (i + 1),
                        Checks.show(points.get(i).frequency()) + " Hz",
                        "the frequencies must rise from point to point (the previous one is "
                                + Checks.show(points.get(i - 1).frequency()) + " Hz)");
            }
        }
    }

    /**
     * @param limit the limit at every frequency, SI (&gt; 0)
     * @return a flat limit
     */
    public static LimitCurve flat(double limit) {
        return new LimitCurve(List.of(new Point(1.0, limit)));
    }

    /** @return true when the limit is the same at every frequency */
    public boolean isFlat() {
        return points.size() == 1 || points.stream().allMatch(p -> p.limit() == points.get(0).limit());
    }

    /** @return the lowest frequency of the range of use, Hz */
    public double lowFrequency() {
        return points.get(0).frequency();
    }

    /** @return the highest frequency of the range of use, Hz */
    public double highFrequency() {
        return points.get(points.size() - 1).frequency();
    }

    /**
     * @param frequency frequency, Hz (0 and below are below the range: the first value holds)
     * @return the limit there (end values held outside the points)
     */
    public double at(double frequency) {
        if (Double.isNaN(frequency)) {
            throw CoreException.bug("a limit curve was asked for its value at a frequency that is not a number", null);
        }
        if (frequency <= lowFrequency()) {
            return points.get(0).limit();
        }
        if (frequency >= highFrequency()) {
            return points.get(points.size() - 1).limit();
        }
        int i = 1;
        while (points.get(i).frequency() < frequency) {
            i++;
        }
        Point a = points.get(i - 1);
        return a.limit() * Math.pow(frequency / a.frequency(), exponent(i - 1));
    }

    /**
     * @param segment the segment between point {@code segment} and the next
     * @return its log-log slope k, with L proportional to f^k
     */
    public double exponent(int segment) {
        Point a = points.get(segment);
        Point b = points.get(segment + 1);
        return Math.log(b.limit() / a.limit()) / Math.log(b.frequency() / a.frequency());
    }

    /**
     * @param factor a positive factor (a multiplying factor of a base curve)
     * @return this curve with every limit times the factor
     */
    public LimitCurve times(double factor) {
        Checks.positive("limit curve factor", factor);
        return new LimitCurve(points.stream().map(p -> new Point(p.frequency(), p.limit() * factor)).toList());
    }
}
