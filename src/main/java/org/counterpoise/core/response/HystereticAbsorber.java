package org.counterpoise.core.response;

import org.counterpoise.core.error.Checks;

/**
 * An absorber whose damping is hysteretic, as an elastomer's is: mass m2 on a complex stiffness
 * k2 (1 + i eta) to the structure, no viscous dashpot. Non-dimensional as the viscous model
 * ({@link TransferFunctions}): mu = m2 / m1, f = sqrt(k2 / m2) / omega1, and the absorber term of
 * the equations of motion is the constant K = f^2 (1 + i eta) in place of K(s) = f^2 + 2 zeta_a f s.
 *
 * <p>The loss factor eta is the ratio of the energy lost per radian of a cycle to the peak strain
 * energy, independent of frequency. A viscous damper c on the same spring has the loss factor
 * eta = c omega / k2 at the frequency omega (it grows with frequency): 2 zeta_a at the absorber's
 * own frequency, 2 zeta_a g / f at the frequency ratio g. A constant complex stiffness has no causal
 * time-domain model valid at all frequencies (its impulse response starts before the impulse;
 * Crandall 1970, "The role of damping in vibration theory", J. Sound Vib. 11(1) 3-18), so it is a
 * steady-state (frequency-domain) model only: the run-up in the time domain stays viscous.
 *
 * @param massRatio mu &gt; 0
 * @param tuningRatio f &gt; 0 (from the dynamic stiffness, the real part)
 * @param lossFactor eta &gt;= 0
 */
public record HystereticAbsorber(double massRatio, double tuningRatio, double lossFactor) {

    /** Validates the record. */
    public HystereticAbsorber {
        Checks.inOpenRange("absorber.mass_ratio", massRatio, 0.0, 10.0);
        Checks.inOpenRange("absorber.tuning_ratio", tuningRatio, 0.0, 100.0);
        Checks.inRange("absorber.loss_factor", lossFactor, 0.0, 20.0);
    }
}
