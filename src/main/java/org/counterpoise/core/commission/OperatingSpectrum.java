package org.counterpoise.core.commission;

import java.util.Arrays;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.response.ResponseKind;

/**
 * A response spectrum measured in operation at the absorber's point, SI, each line's amplitude as a
 * peak (zero to peak) value.
 *
 * @param omega the lines' frequencies, rad/s, increasing
 * @param amplitude each line's peak amplitude, SI (&gt;= 0)
 * @param kind the quantity: structure displacement, velocity or acceleration
 */
public record OperatingSpectrum(double[] omega, double[] amplitude, ResponseKind kind) {
    /** Fewest lines accepted. */
    public static final int MINIMUM_LINES = 3;

    /** Validates and copies the lines. */
    public OperatingSpectrum {
        if (kind != ResponseKind.DISPLACEMENT && kind != ResponseKind.VELOCITY && kind != ResponseKind.ACCELERATION) {
            throw new InvalidInputException("spectrum.quantity", String.valueOf(kind),
                    "displacement, velocity or acceleration of the structure");
        }
        if (omega.length < MINIMUM_LINES || amplitude.length != omega.length) {
            throw new InvalidInputException("spectrum", omega.length + " lines",
                    "at least " + MINIMUM_LINES + " lines, each with a frequency and an amplitude");
        }
        for (int i = 0; i < omega.length; i++) {
            Checks.positive("spectrum.frequency[" + i + "]", omega[i]);
            Checks.inRange("spectrum.amplitude[" + i + "]", amplitude[i], 0.0, Double.MAX_VALUE);
            if (i > 0 && !(omega[i] > omega[i - 1])) {
                throw new InvalidInputException("spectrum.frequency[" + i + "]", Checks.show(omega[i]),
                        "frequencies in increasing order, each line once");
            }
        }
        omega = omega.clone();
        amplitude = amplitude.clone();
    }

    /**
     * @param low lowest frequency, rad/s
     * @param high highest frequency, rad/s
     * @return the index of the largest line from low to high, or -1 when no line lies there
     */
    public int largestBetween(double low, double high) {
        int at = -1;
        for (int i = 0; i < omega.length; i++) {
            if (omega[i] >= low && omega[i] <= high && (at < 0 || amplitude[i] > amplitude[at])) {
                at = i;
            }
        }
        return at;
    }

    /** @return the median spacing of the lines, rad/s */
    public double lineSpacing() {
        double[] d = new double[omega.length - 1];
        for (int i = 1; i < omega.length; i++) {
            d[i - 1] = omega[i] - omega[i - 1];
        }
        Arrays.sort(d);
        return d[d.length / 2];
    }
}
