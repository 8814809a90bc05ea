package org.counterpoise.core.criteria;

import java.util.List;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponseScale;
import org.counterpoise.core.response.TransferFunctions;
import org.counterpoise.core.system.ModalSystem;

/**
 * The judged response of every excitation order of one system (bare or with the absorber), each
 * as a rational function of the SAME variable g = omega / omega1, omega the design order's forcing
 * frequency: order j runs at f_j omega, so its transfer function in g is G_j(s) = W(i f_j omega1 g)
 * H_j(f_j s) with H_j the structure's response to the order's own kind ({@link TransferFunctions})
 * and W the criterion's weighting. Scaling the coefficient of s^n by f_j^n is exact (one rounding
 * per coefficient), so every G_j stays rational and the exact peak search applies to it. An
 * unbalance order's force grows with the square of its own frequency: its H_j carries s^2, which the
 * scaling turns into (f_j g)^2.
 *
 * <p>{@link #scale(int)} is the SI amplitude of the order's response per unit |G_j| (its own
 * kind and amplitude, {@link ResponseScale}).
 */
final class OrderResponses {
    private final TransferFunction[] weighted;
    private final TransferFunction[] unweighted;
    private final double[] scale;
    private final double[] factor;
    private final double omega1;

    private OrderResponses(TransferFunction[] weighted, TransferFunction[] unweighted, double[] scale,
            double[] factor, double omega1) {
        this.weighted = weighted;
        this.unweighted = unweighted;
        this.scale = scale;
        this.factor = factor;
        this.omega1 = omega1;
    }

    /**
     * @param orders the orders, design order first
     * @param quantity the judged response
     * @param weighting the weighting's numerator and denominator in s = i omega (rad/s, reference 1
     *     rad/s), or null for none
     * @param structure the structure
     * @param tuning the absorber, or null for the bare structure
     * @return the responses
     */
    static OrderResponses of(List<ExcitationOrder> orders, ResponseKind quantity, double[][] weighting,
            Structure structure, Tuning tuning) {
        int n = orders.size();
        TransferFunction[] weighted = new TransferFunction[n];
        TransferFunction[] unweighted = new TransferFunction[n];
        double[] scale = new double[n];
        double[] factor = new double[n];
        double omega1 = structure.naturalFrequency();
        for (int j = 0; j < n; j++) {
            ExcitationOrder order = orders.get(j);
            double f = order.frequencyFactor();
            TransferFunction h = TransferFunctions.of(order.kind(), quantity, structure.dampingRatio(), tuning);
            double[] num = f == 1.0 ? h.numerator() : scaled(h.numerator(), f);
            double[] den = f == 1.0 ? h.denominator() : scaled(h.denominator(), f);
            unweighted[j] = f == 1.0 ? h : TransferFunction.of(num, den);
            if (weighting == null) {
                weighted[j] = unweighted[j];
            } else {
                // W(i omega) with omega = f omega1 g: the coefficient of s^n times (f omega1)^n
                weighted[j] = TransferFunction.of(RealPolynomials.multiply(num, scaled(weighting[0], f * omega1)),
                        RealPolynomials.multiply(den, scaled(weighting[1], f * omega1)));
            }
            scale[j] = Math.abs(ResponseScale.of(structure, order.kind(), order.amplitude(), quantity));
            factor[j] = f;
        }
        return new OrderResponses(weighted, unweighted, scale, factor, omega1);
    }

    /**
     * The same for a structure of several modes with absorbers, driven by a force at one point and
     * judged at another ({@link ModalSystem}): its displacement transfer function in g = omega /
     * omega_ref, times s^p for velocity (p = 1) or acceleration (p = 2), and the SI scale times
     * omega_ref^p (harmonic motion: v = omega x, a = omega^2 x). Every order must be a force at the
     * same point (a project of several modes takes one force order).
     *
     * @param orders the orders, design order first, each a force
     * @param quantity displacement, velocity or acceleration of the response point
     * @param weighting the weighting's numerator and denominator, or null for none
     * @param system the modes and absorbers
     * @param forcePoint where the force acts
     * @param responsePoint where the response is judged
     * @return the responses
     */
    static OrderResponses ofModes(List<ExcitationOrder> orders, ResponseKind quantity, double[][] weighting,
            ModalSystem system, String forcePoint, String responsePoint) {
        int power = switch (quantity) {
            case DISPLACEMENT -> 0;
            case VELOCITY -> 1;
            case ACCELERATION -> 2;
            default -> throw new IllegalArgumentException("bug: a structure of several modes judged on " + quantity);
        };
        TransferFunction x = system.transferFunction(forcePoint, responsePoint);
        double[] sp = new double[power + 1];
        sp[power] = 1.0;
        TransferFunction h = TransferFunction.of(RealPolynomials.multiply(x.numerator(), sp), x.denominator());
        double omega1 = system.referenceFrequency();
        int n = orders.size();
        TransferFunction[] weighted = new TransferFunction[n];
        TransferFunction[] unweighted = new TransferFunction[n];
        double[] scale = new double[n];
        double[] factor = new double[n];
        for (int j = 0; j < n; j++) {
            ExcitationOrder order = orders.get(j);
            if (order.kind() != ExcitationKind.FORCE) {
                throw new IllegalArgumentException("bug: a structure of several modes driven by " + order.kind());
            }
            double f = order.frequencyFactor();
            double[] num = f == 1.0 ? h.numerator() : scaled(h.numerator(), f);
            double[] den = f == 1.0 ? h.denominator() : scaled(h.denominator(), f);
            unweighted[j] = f == 1.0 ? h : TransferFunction.of(num, den);
            weighted[j] = weighting == null ? unweighted[j]
                    : TransferFunction.of(RealPolynomials.multiply(num, scaled(weighting[0], f * omega1)),
                            RealPolynomials.multiply(den, scaled(weighting[1], f * omega1)));
            scale[j] = system.responseScale(forcePoint, order.amplitude(), responsePoint) * Math.pow(omega1, power);
            factor[j] = f;
        }
        return new OrderResponses(weighted, unweighted, scale, factor, omega1);
    }

    /** @return the number of orders */
    int size() {
        return weighted.length;
    }

    /** @return G_j, the judged (weighted) response of order j in g */
    TransferFunction transfer(int j) {
        return weighted[j];
    }

    /** @return the SI amplitude of order j's response per unit |G_j| */
    double scale(int j) {
        return scale[j];
    }

    /** @return f_j, order j's frequency over the design order's */
    double factor(int j) {
        return factor[j];
    }

    /** @return the structure's natural frequency omega1, rad/s */
    double referenceFrequency() {
        return omega1;
    }

    /**
     * @param j the order
     * @param g the design order's frequency ratio
     * @return order j's own frequency there, Hz
     */
    double hertz(int j, double g) {
        return factor[j] * g * omega1 / (2.0 * Math.PI);
    }

    /**
     * @param j the order
     * @param hertz a frequency of order j, Hz
     * @return the design order's frequency ratio g at which order j runs at that frequency
     */
    double ratioAt(int j, double hertz) {
        return 2.0 * Math.PI * hertz / (factor[j] * omega1);
    }

    /**
     * @param j the order
     * @param g the design order's frequency ratio
     * @return order j's SI response amplitude there (weighted where the criterion weights)
     */
    double amplitude(int j, double g) {
        return scale[j] * weighted[j].magnitude(g);
    }

    /**
     * Where an undamped system is forced at one of its natural frequencies inside the band the
     * response has no bound. A weighting has no pole on the frequency axis, so this is read from the
     * unweighted response, whose undamped denominator the exact search recognises.
     *
     * @param j the order
     * @param gLow band start
     * @param gHigh band end
     * @return the g of an unbounded response in the band, or -1 when the response is bounded there
     */
    double unboundedAt(int j, double gLow, double gHigh) {
        if (!unweighted[j].undamped()) {
            return -1;
        }
        Peak peak = PeakFinder.over(unweighted[j], gLow, gHigh);
        return peak.unbounded() ? peak.frequencyRatio() : -1;
    }

    /** @return c_n times factor^n */
    static double[] scaled(double[] c, double factor) {
        double[] out = new double[c.length];
        double power = 1.0;
        for (int n = 0; n < c.length; n++) {
            out[n] = c[n] * power;
            power *= factor;
        }
        return out;
    }
}
