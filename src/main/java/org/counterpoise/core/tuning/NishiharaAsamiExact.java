package org.counterpoise.core.tuning;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Tuning;

/**
 * The exact H-infinity optimum for a harmonic force on an undamped structure, response the
 * structure's displacement (Nishihara and Asami 2002, "Closed-form solutions to the exact
 * optimizations of dynamic vibration absorbers (minimizations of the maximum amplitude magnification
 * factors)", J. Vib. Acoust. 124(4), 576-582; written down from memory and confirmed to round-off
 * against an independent numerical optimum):
 * <pre>
 *   f      = (2/(1+mu)) sqrt( 2 [16 + 23 mu + 9 mu^2 + 2 (2+mu) sqrt(4+3 mu)] / (3 (64 + 80 mu + 27 mu^2)) )
 *   zeta_a = (1/4) sqrt( (8 + 9 mu - 4 sqrt(4+3 mu)) / (1+mu) )
 * </pre>
 * Its two peaks are exactly equal. The peak height below was derived for this project from the
 * equal double roots of the peak condition (not from the publication) and agrees with the exact
 * peak search to round-off.
 */
public final class NishiharaAsamiExact {
    private NishiharaAsamiExact() {
    }

    /**
     * @param massRatio mu
     * @return the exact optimum tuning
     */
    public static Tuning tuning(double massRatio) {
        double mu = Checks.positive("absorber.mass_ratio", massRatio);
        double r = Math.sqrt(4.0 + 3.0 * mu);
        double f = (2.0 / (1.0 + mu)) * Math.sqrt(2.0 * (16.0 + 23.0 * mu + 9.0 * mu * mu + 2.0 * (2.0 + mu) * r)
                / (3.0 * (64.0 + 80.0 * mu + 27.0 * mu * mu)));
        double zeta = 0.25 * Math.sqrt((8.0 + 9.0 * mu - 4.0 * r) / (1.0 + mu));
        return new Tuning(mu, f, zeta);
    }

    /**
     * @param massRatio mu
     * @return the optimum peak (16 + 9 mu + 4 sqrt(4+3mu)) / (3 sqrt(mu (16 + 9 mu + 8 sqrt(4+3mu))))
     */
    public static double optimumPeak(double massRatio) {
        double mu = Checks.positive("absorber.mass_ratio", massRatio);
        double r = Math.sqrt(4.0 + 3.0 * mu);
        return (16.0 + 9.0 * mu + 4.0 * r) / (3.0 * Math.sqrt(mu * (16.0 + 9.0 * mu + 8.0 * r)));
    }
}
