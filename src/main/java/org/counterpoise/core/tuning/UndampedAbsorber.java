package org.counterpoise.core.tuning;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Tuning;

/**
 * The classical undamped absorber for one fixed forcing frequency (Frahm 1909, US patent 989958;
 * Den Hartog 1956, section 3.2): tuned so that omega_a equals the forcing frequency, it holds the
 * structure still there and moves with X2 = -F/k2. Fitting it splits the one resonance into two,
 * at the roots of Omega^4 - (1 + (1+mu) f^2) Omega^2 + f^2 = 0 (Omega = natural frequency /
 * omega1), which a machine passes through when it starts and stops.
 */
public final class UndampedAbsorber {
    private UndampedAbsorber() {
    }

    /**
     * @param massRatio mu
     * @param forcingRatio g = omega_forcing / omega1
     * @return f = g, zeta_a = 0
     */
    public static Tuning tuning(double massRatio, double forcingRatio) {
        return new Tuning(Checks.positive("absorber.mass_ratio", massRatio),
                Checks.positive("disturbance.frequency", forcingRatio), 0.0);
    }

    /**
     * The two natural frequencies of the undamped structure with the undamped absorber.
     * @param massRatio mu
     * @param tuningRatio f
     * @return {Omega_low, Omega_high} as ratios to omega1, ascending
     */
    public static double[] naturalFrequencies(double massRatio, double tuningRatio) {
        double f2 = tuningRatio * tuningRatio;
        double b = 1.0 + (1.0 + massRatio) * f2;
        double disc = Math.sqrt(b * b - 4.0 * f2);
        double high = 0.5 * (b + disc);
        double low = f2 / high; // product of the roots is f^2: avoids cancellation
        return new double[] {Math.sqrt(low), Math.sqrt(high)};
    }
}
