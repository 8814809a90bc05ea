package org.counterpoise.core.response;

import org.counterpoise.core.rational.MeanSquare;
import org.counterpoise.core.system.WhiteNoiseMeanSquare;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;

/**
 * The root mean square (rms) response to white noise of one-sided power spectral density G0 (per
 * hertz). With H the non-dimensional response and s the SI value of a non-dimensional response of
 * 1 per unit input amplitude ({@link ResponseScale}), the mean square is
 * sigma^2 = integral over f from 0 to infinity of s^2 |H(2 pi f / omega1)|^2 G0 df
 * = s^2 G0 omega1 J / 2, where J = (1/2 pi) integral over all real g of |H(i g)|^2 dg is the
 * non-dimensional mean square ({@link MeanSquare}). For one degree of freedom under a force this
 * is Miles' equation, sigma^2 = (pi / 2) f_n Q G0 / k^2 (Miles 1954, J. Aeronaut. Sci. 21(11)).
 */
public final class RandomResponse {
    private RandomResponse() {
    }

    /**
     * @param structure the structure
     * @param tuning the absorber on it, or null for the bare structure
     * @param excitation force or base acceleration
     * @param psdLevel one-sided PSD, N^2/Hz or (m/s^2)^2/Hz
     * @param response the response kind
     * @return the rms response, SI (+infinity when the mean square diverges)
     */
    public static double rms(Structure structure, Tuning tuning, ExcitationKind excitation, double psdLevel,
            ResponseKind response) {
        SingleModeSystem system = SingleModeSystem.of(structure, tuning);
        double j = WhiteNoiseMeanSquare.INSTANCE.of(system, excitation, response);
        double scale = system.responseScale(excitation, 1.0, response);
        return Math.abs(scale) * Math.sqrt(psdLevel * structure.naturalFrequency() * j / 2.0);
    }
}
