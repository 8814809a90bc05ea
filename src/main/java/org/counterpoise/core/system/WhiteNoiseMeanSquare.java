package org.counterpoise.core.system;

import org.counterpoise.core.rational.MeanSquare;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The mean square of a response to white noise: the H2 objective, taken over all frequencies
 * (white noise has no band). Its value is the non-dimensional J = (1 / 2 pi) times the integral over
 * all real g of |H(i g)|^2, g = omega / omega_ref, computed in closed form by {@link MeanSquare};
 * per unit two-sided spectral density in omega the mean square is omega_ref J (times the square of
 * the system's response scale in SI).
 */
public final class WhiteNoiseMeanSquare implements BandObjective {
    /** The one instance: the objective has no parameters. */
    public static final WhiteNoiseMeanSquare INSTANCE = new WhiteNoiseMeanSquare();

    private WhiteNoiseMeanSquare() {
    }

    @Override
    public double of(TransferFunction h, double referenceFrequency) {
        return MeanSquare.of(h);
    }
}
