package org.counterpoise.core.identify;

import java.util.ArrayList;
import java.util.List;

/**
 * What makes a fitted model doubtful; its words are written in {@code io}. The limits are common
 * practice for judging a modal fit, with no single source.
 */
public enum FitWarning {
    /** The model misses more than {@link #POOR_FIT_LIMIT} of the data (normalised residual). */
    POOR_FIT,
    /** A modal mass is zero or negative: not a driving point, the wrong FRF kind, or a mode not in the data. */
    MASS_NOT_POSITIVE,
    /** A fitted natural frequency lies outside the fitted band: extrapolated, less certain. */
    MODE_OUTSIDE_BAND,
    /** The mean coherence is below {@link #LOW_COHERENCE_LIMIT}: noise, leakage or non-linearity. */
    LOW_COHERENCE;

    /** Normalised residual above which the fit is called poor. */
    public static final double POOR_FIT_LIMIT = 0.1;
    /** Mean coherence below which the measurement is called doubtful. */
    public static final double LOW_COHERENCE_LIMIT = 0.8;

    /**
     * @param model a fitted model
     * @param fitted the lines it was fitted to
     * @return its warnings, in declaration order
     */
    public static List<FitWarning> of(ModalModel model, MeasuredFrf fitted) {
        List<FitWarning> found = new ArrayList<>();
        if (model.normalisedResidual() > POOR_FIT_LIMIT) {
            found.add(POOR_FIT);
        }
        if (model.modes().stream().anyMatch(m -> !(m.modalMass() > 0))) {
            found.add(MASS_NOT_POSITIVE);
        }
        double low = fitted.omega()[0];
        double high = fitted.omega()[fitted.size() - 1];
        if (model.modes().stream().anyMatch(m -> m.naturalFrequency() < low || m.naturalFrequency() > high)) {
            found.add(MODE_OUTSIDE_BAND);
        }
        if (model.meanCoherence().isPresent() && model.meanCoherence().getAsDouble() < LOW_COHERENCE_LIMIT) {
            found.add(LOW_COHERENCE);
        }
        return found;
    }
}
