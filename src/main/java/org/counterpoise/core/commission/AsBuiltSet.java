package org.counterpoise.core.commission;

import java.util.List;
import java.util.OptionalDouble;

/**
 * Several absorbers at one point as built, identified from the frequency response measured at that
 * point with all of them fitted ({@link AsBuiltSetFit}); SI.
 *
 * @param absorbers each absorber as built, in the design's order
 * @param targetMode the index of the mode the absorbers were fitted to
 * @param targetModeFrequency that mode's natural frequency used: the design's, or fitted when freed, rad/s
 * @param targetModeFrequencySd its standard uncertainty when fitted (empty when held)
 * @param normalisedResidual sqrt(sum |H_measured - H_model|^2 / sum |H_measured|^2) over the lines used
 * @param lines the number of frequency lines fitted
 * @param warnings what makes the fit doubtful ({@link CommissioningWarning#POOR_FIT} first when present)
 */
public record AsBuiltSet(List<Built> absorbers, int targetMode, double targetModeFrequency,
        OptionalDouble targetModeFrequencySd, double normalisedResidual, int lines,
        List<CommissioningWarning> warnings) {

    /** Copies the lists. */
    public AsBuiltSet {
        absorbers = List.copyOf(absorbers);
        warnings = List.copyOf(warnings);
    }

    /**
     * One absorber as built.
     *
     * @param mass its mass as held in the fit (weighed, or the design's), kg
     * @param frequency its own undamped natural frequency omega_j, rad/s
     * @param frequencySd the standard uncertainty of that, rad/s
     * @param dampingRatio zeta_j = c_j / (2 m_j omega_j)
     * @param dampingRatioSd its standard uncertainty
     */
    public record Built(double mass, double frequency, double frequencySd, double dampingRatio, double dampingRatioSd) {
    }
}
