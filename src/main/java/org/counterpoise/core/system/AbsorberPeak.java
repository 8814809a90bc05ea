package org.counterpoise.core.system;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.rational.FactoredPeaks;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The exact peak over a band of what one absorber of a {@link ModalSystem} does while it works with
 * the others: its stroke, the velocity across its damper, its spring's force, its damper's force or the
 * two together, per unit
 * harmonic force at a point of the structure.
 *
 * <p>The absorber j (mass m, spring k, damper c) at point a moves as y = x_a (k + i c omega) /
 * (k - m omega^2 + i c omega), so its stroke is y - x_a = x_a m omega^2 / (k - m omega^2 + i c omega)
 * (the equation of motion of the absorber's mass; any vibration text, e.g. Den Hartog 1956,
 * <i>Mechanical Vibrations</i>, 4th ed., section 3.2). The spring carries k (y - x_a), the damper
 * i c omega (y - x_a), the two together (k + i c omega)(y - x_a). x_a is the displacement of the
 * absorbers' point in the whole structure with every absorber on it, taken on the factored form
 * ({@link AbsorberSensitivity#value}); the peak is then found on that factored value the way
 * {@link ModalPeak} finds the receptance's: the polynomial search on the expanded stroke transfer
 * function ({@link ModalSystem#strokeTransferFunction}, times k or c s or k + c s) decides
 * whether it is unbounded and gives one candidate, {@link FactoredPeaks} brackets and refines the
 * interior maxima, and the band's finite ends count too.
 *
 * @param frequency where the peak is, rad/s (0 when it lies at the low end 0)
 * @param value the peak per unit force: m/N for the stroke, m/(s N) for the velocity, N/N for a force
 *     (+infinity when unbounded)
 */
public record AbsorberPeak(double frequency, double value) {

    /** What of the absorber is taken. */
    public enum Quantity {
        /** The stroke, absorber mass displacement minus the point's. */
        STROKE,
        /** The relative velocity across the damper, omega times the stroke. */
        VELOCITY,
        /** The force in the spring, k times the stroke. */
        SPRING_FORCE,
        /** The force in the damper, c omega times the stroke. */
        DAMPER_FORCE,
        /** The force the absorber puts on the structure, |k + i c omega| times the stroke. */
        ABSORBER_FORCE
    }

    /** @return true when the peak is unbounded (an undamped resonance in the band) */
    public boolean unbounded() {
        return Double.isInfinite(value);
    }

    /**
     * @param system the structure with its absorbers
     * @param forcePoint where the force acts
     * @param absorber the absorber's index in {@link ModalSystem#absorbers()}
     * @param quantity what of it is taken
     * @param low low end of the band, rad/s (&gt;= 0)
     * @param high high end, rad/s (&gt;= low; +infinity for all frequencies above low)
     * @return the peak over the band per unit force
     */
    public static AbsorberPeak over(ModalSystem system, String forcePoint, int absorber, Quantity quantity, double low,
            double high) {
        TransferFunction stroke = system.strokeTransferFunction(forcePoint, absorber);
        PointAbsorber a = system.absorbers().get(absorber);
        double w = system.referenceFrequency();
        TransferFunction h = TransferFunction.of(RealPolynomials.multiply(stroke.numerator(), weight(a, quantity, w)),
                stroke.denominator());
        double k = system.referenceStiffness();
        double gLow = low / w;
        double gHigh = high / w;
        Peak polynomial = PeakFinder.over(h, gLow, gHigh);
        if (polynomial.unbounded()) {
            return new AbsorberPeak(polynomial.frequencyRatio() * w, Double.POSITIVE_INFINITY);
        }
        DoubleUnaryOperator lnSquared = x -> lnMagnitudeSquared(system, forcePoint, a, quantity, Math.sqrt(x));
        double bestX = gLow * gLow;
        double best = lnSquared.applyAsDouble(bestX);
        if (Double.isFinite(gHigh) && lnSquared.applyAsDouble(gHigh * gHigh) > best) {
            bestX = gHigh * gHigh;
            best = lnSquared.applyAsDouble(bestX);
        }
        double xp = polynomial.frequencyRatio() * polynomial.frequencyRatio();
        if (Double.isFinite(xp) && lnSquared.applyAsDouble(xp) > best) {
            bestX = xp;
            best = lnSquared.applyAsDouble(xp);
        }
        for (double[] maximum : FactoredPeaks.maxima(h, lnSquared, gLow * gLow, gHigh * gHigh)) {
            if (maximum[2] > best) {
                bestX = maximum[0];
                best = maximum[2];
            }
        }
        return new AbsorberPeak(Math.sqrt(bestX) * w, Math.exp(0.5 * best) / k);
    }

    /** The quantity's factor on the stroke, as a polynomial in s = i omega / omega_ref (ascending powers). */
    private static double[] weight(PointAbsorber a, Quantity quantity, double omegaRef) {
        return switch (quantity) {
            case STROKE -> new double[] {1.0};
            case VELOCITY -> new double[] {0.0, omegaRef};
            case SPRING_FORCE -> new double[] {a.stiffness()};
            case DAMPER_FORCE -> new double[] {0.0, a.damping() * omegaRef};
            case ABSORBER_FORCE -> new double[] {a.stiffness(), a.damping() * omegaRef};
        };
    }

    /** ln of |quantity|^2 per unit force times k_ref, from the factored displacement of the point. */
    private static double lnMagnitudeSquared(ModalSystem system, String forcePoint, PointAbsorber a, Quantity quantity,
            double g) {
        double omega = g * system.referenceFrequency();
        Complex xa = AbsorberSensitivity.value(system, forcePoint, a.point(), g);
        Complex inertia = new Complex(a.mass() * omega * omega, 0.0);
        Complex dynamic = new Complex(a.stiffness() - a.mass() * omega * omega, a.damping() * omega);
        Complex stroke = xa.multiply(inertia).divide(dynamic);
        double factor = switch (quantity) {
            case STROKE -> 1.0;
            case VELOCITY -> omega;
            case SPRING_FORCE -> a.stiffness();
            case DAMPER_FORCE -> a.damping() * omega;
            case ABSORBER_FORCE -> Math.hypot(a.stiffness(), a.damping() * omega);
        };
        double magnitude = stroke.abs() * factor;
        return magnitude > 0 ? 2 * Math.log(magnitude) : Double.NEGATIVE_INFINITY;
    }
}
