package org.counterpoise.core.commission;

import java.util.List;
import java.util.OptionalDouble;

/**
 * The absorber as built, identified from a frequency response measured on the structure with the
 * absorber fitted (SI).
 *
 * @param absorberFrequency the absorber's own undamped natural frequency omega_a, rad/s
 * @param absorberFrequencySd its standard uncertainty from the fit, rad/s
 * @param dampingRatio the absorber's damping ratio zeta_a = c2 / (2 m2 omega_a)
 * @param dampingRatioSd its standard uncertainty
 * @param structureFrequency the structure's natural frequency used: the design's, or fitted when it
 *     was freed, rad/s
 * @param structureFrequencySd its standard uncertainty when fitted (empty when held)
 * @param massRatio the absorber mass over the structure's effective mass, as held in the fit
 * @param normalisedResidual sqrt(sum |H_measured - H_model|^2 / sum |H_measured|^2) over the lines used
 * @param lines the number of frequency lines fitted
 * @param warnings what makes the fit doubtful, in declaration order
 */
public record AsBuiltAbsorber(double absorberFrequency, double absorberFrequencySd, double dampingRatio,
        double dampingRatioSd, double structureFrequency, OptionalDouble structureFrequencySd, double massRatio,
        double normalisedResidual, int lines, List<CommissioningWarning> warnings) {

    /** Copies the warnings. */
    public AsBuiltAbsorber {
        warnings = List.copyOf(warnings);
    }

    /** @return the tuning ratio as built, f = omega_a / omega_1 */
    public double tuningRatio() {
        return absorberFrequency / structureFrequency;
    }
}
