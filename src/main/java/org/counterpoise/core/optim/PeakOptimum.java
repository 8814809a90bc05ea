package org.counterpoise.core.optim;

import org.counterpoise.core.model.Tuning;

/**
 * The result of an H-infinity (minimum peak) absorber optimisation.
 *
 * @param tuning the optimum (mu, f, zeta_a)
 * @param peak the optimum peak of |H| over the band (non-dimensional, see ResponseScale)
 * @param activeSet which maxima are equal at the optimum, in words (e.g. "two interior peaks")
 * @param evaluations transfer functions built (a cost measure)
 * @param converged true when the optimality conditions were solved and verified
 * @param activeConstraint the designer's constraint that holds the optimum back
 */
public record PeakOptimum(Tuning tuning, double peak, String activeSet, int evaluations, boolean converged,
        ActiveConstraint activeConstraint) {
}
