package org.counterpoise.core.system;

import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The exact largest |H(i omega)| over a closed band of angular frequencies [omegaLow, omegaHigh]:
 * the harmonic (minimax, H-infinity over the band) objective. Found by {@link PeakFinder}
 * from the real roots of the derivative of |H|^2, never by sampling.
 *
 * @param omegaLow low end, rad/s (&gt;= 0)
 * @param omegaHigh high end, rad/s (&gt;= omegaLow; +infinity for all frequencies above omegaLow)
 */
public record BandPeak(double omegaLow, double omegaHigh) implements BandObjective {

    /** Checks the band. */
    public BandPeak {
        if (!(omegaLow >= 0) || !(omegaHigh >= omegaLow)) {
            throw new IllegalArgumentException("band must satisfy 0 <= low <= high, got " + omegaLow + ", "
                    + omegaHigh);
        }
    }

    /**
     * @param band a forcing band
     * @return the peak over it
     */
    public static BandPeak over(FrequencyBand band) {
        return new BandPeak(band.low(), band.high());
    }

    /**
     * @param h transfer function in s = i omega / referenceFrequency
     * @param referenceFrequency its scaling, rad/s
     * @return the peak, located as a ratio omega / referenceFrequency
     */
    public Peak peakOf(TransferFunction h, double referenceFrequency) {
        return PeakFinder.over(h, omegaLow / referenceFrequency, omegaHigh / referenceFrequency);
    }

    @Override
    public double of(TransferFunction h, double referenceFrequency) {
        return peakOf(h, referenceFrequency).magnitude();
    }
}
