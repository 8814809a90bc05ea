package org.counterpoise.core.runup;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;

/**
 * The equations of motion of the structure with (or without) its absorber, driven at a forcing
 * frequency that changes with time, as a first-order system for Commons Math's integrators.
 *
 * <p>The model is the one {@code core.response.TransferFunctions} solves in the frequency domain
 * (Den Hartog 1956, ch. 3; Warburton 1982, eqs. 1-4), written in absolute coordinates: x1 is the
 * structure at the absorber point (effective mass m1, stiffness k1, damping c1 to the base, see
 * {@link Structure}), x2 the absorber mass m2 on its spring k2 and damper c2 ({@link Absorber#of}),
 * u the base:
 * <pre>
 *   m1 x1'' = F(t) + c1 (u' - x1') + k1 (u - x1) + c2 (x2' - x1') + k2 (x2 - x1)
 *   m2 x2'' =                      - c2 (x2' - x1') - k2 (x2 - x1)
 * </pre>
 * State y = (x1, x1', x2, x2') with the absorber, (x1, x1') without; SI units (m, m/s).
 *
 * <p><b>The drive.</b> With the forcing phase phi(t) and frequency Omega(t) = phi'(t) of a
 * {@link SpeedRamp} and alpha = Omega'(t), every drive is the real part of D(t) e^{i phi}:
 * <ul>
 * <li>force of amplitude F0: F(t) = F0 sin phi (D = -i F0). The amplitude does not depend on speed;
 *   sin rather than cos so that a run-up from rest starts without a step load.</li>
 * <li>rotating unbalance m_u e: the unbalance sits at radius e and angle phi(t) from the x axis,
 *   so its position relative to the rotor centre is e (cos phi, sin phi) and its acceleration
 *   along x is d^2/dt^2 (e cos phi) = -e (Omega^2 cos phi + alpha sin phi). The force it exerts on
 *   the structure is minus its mass times that acceleration:
 *   <pre>  F(t) = m_u e (Omega^2 cos phi + alpha sin phi)     (D = m_u e (Omega^2 - i alpha)).</pre>
 *   The first term is the familiar centrifugal force m_u e Omega^2; the second is the tangential
 *   term of the angular acceleration, positive along x when the rotor speeds up (alpha &gt; 0) and
 *   the unbalance is above the axis (sin phi &gt; 0). The structure's own motion is neglected in the
 *   unbalance's acceleration, as in the frequency-domain model. At rest (Omega = 0, phi = 0) the
 *   force is zero.</li>
 * <li>base displacement of amplitude U0: u(t) = U0 sin phi, u'(t) = U0 Omega cos phi, F = 0.</li>
 * </ul>
 * At constant speed each drive is the frequency-domain drive of {@code TransferFunctions} with a
 * phase of 0 (unbalance) or -pi/2 (force, base displacement): {@link #drivePhase}.
 *
 * <p>A base acceleration of constant amplitude is refused: started from rest it gives the base a
 * mean velocity, so the base (and the structure's absolute displacement) drifts without bound.
 */
public final class RunUpEquations implements FirstOrderDifferentialEquations {
    private final ExcitationKind kind;
    private final double amplitude;
    private final SpeedRamp ramp;
    private final double m1;
    private final double k1;
    private final double c1;
    private final double m2;
    private final double k2;
    private final double c2;
    private final boolean withAbsorber;

    /**
     * @param structure the structure (effective values at the absorber point are used)
     * @param tuning the absorber on it, or null for the bare structure
     * @param kind force, unbalance or base displacement
     * @param amplitude SI amplitude of the drive (N, kg*m or m)
     * @param ramp the forcing frequency against time
     */
    public RunUpEquations(Structure structure, Tuning tuning, ExcitationKind kind, double amplitude, SpeedRamp ramp) {
        if (kind == ExcitationKind.BASE_ACCELERATION) {
            throw new InvalidInputException("disturbance.kind", "base-acceleration",
                    "a run-up needs a force, an unbalance or a base displacement; a base acceleration of"
                            + " constant amplitude started from rest moves the base without bound");
        }
        this.kind = kind;
        this.amplitude = amplitude;
        this.ramp = ramp;
        this.m1 = structure.effectiveMass();
        this.k1 = structure.effectiveStiffness();
        this.c1 = structure.effectiveDampingCoefficient();
        this.withAbsorber = tuning != null;
        if (withAbsorber) {
            Absorber a = Absorber.of(structure, tuning);
            this.m2 = a.mass();
            this.k2 = a.stiffness();
            this.c2 = a.damping();
        } else {
            this.m2 = 0.0;
            this.k2 = 0.0;
            this.c2 = 0.0;
        }
    }

    /**
     * @param kind the excitation kind
     * @return the phase of the time-domain drive relative to the frequency-domain one (drive
     *     amplitude times cos(phi + phase) at constant speed), rad
     */
    public static double drivePhase(ExcitationKind kind) {
        return kind == ExcitationKind.UNBALANCE ? 0.0 : -0.5 * Math.PI;
    }

    @Override
    public int getDimension() {
        return withAbsorber ? 4 : 2;
    }

    @Override
    public void computeDerivatives(double t, double[] y, double[] yDot) {
        double x1 = y[0];
        double v1 = y[1];
        yDot[0] = v1;
        yDot[1] = structureAcceleration(t, y);
        if (withAbsorber) {
            yDot[2] = y[3];
            yDot[3] = (-c2 * (y[3] - v1) - k2 * (y[2] - x1)) / m2;
        }
    }

    /**
     * @param t time, s
     * @param y state
     * @return x1'', m/s^2
     */
    public double structureAcceleration(double t, double[] y) {
        double x1 = y[0];
        double v1 = y[1];
        double sum = force(t) + c1 * (baseVelocity(t) - v1) + k1 * (baseDisplacement(t) - x1);
        if (withAbsorber) {
            sum += c2 * (y[3] - v1) + k2 * (y[2] - x1);
        }
        return sum / m1;
    }

    /**
     * @param t time, s
     * @return the external force on the structure F(t), N (zero for a base displacement)
     */
    public double force(double t) {
        double phi = ramp.phaseAt(t);
        return switch (kind) {
            case FORCE -> amplitude * Math.sin(phi);
            case UNBALANCE -> {
                double omega = ramp.speedAt(t);
                yield amplitude * (omega * omega * Math.cos(phi) + ramp.acceleration() * Math.sin(phi));
            }
            default -> 0.0;
        };
    }

    /**
     * @param t time, s
     * @return u(t), m
     */
    public double baseDisplacement(double t) {
        return kind == ExcitationKind.BASE_DISPLACEMENT ? amplitude * Math.sin(ramp.phaseAt(t)) : 0.0;
    }

    /**
     * @param t time, s
     * @return u'(t), m/s
     */
    public double baseVelocity(double t) {
        return kind == ExcitationKind.BASE_DISPLACEMENT
                ? amplitude * ramp.speedAt(t) * Math.cos(ramp.phaseAt(t)) : 0.0;
    }

    /** @return true when the absorber is part of the system */
    public boolean withAbsorber() {
        return withAbsorber;
    }

    /** @return the absorber spring rate k2, N/m (0 without an absorber) */
    public double absorberStiffness() {
        return k2;
    }

    /**
     * An upper bound of the undamped natural frequencies: the square root of the trace of
     * M^-1 K, (k1 + k2)/m1 + k2/m2, which is the sum of the squared natural frequencies.
     * @return rad/s
     */
    public double naturalFrequencyBound() {
        double trace = (k1 + k2) / m1 + (withAbsorber ? k2 / m2 : 0.0);
        return Math.sqrt(trace);
    }

    /** @return the speed ramp */
    public SpeedRamp ramp() {
        return ramp;
    }
}
