package org.counterpoise.core.optim;

import org.counterpoise.core.model.Tuning;

/**
 * The result of an H2 (minimum mean square) absorber optimisation.
 *
 * @param tuning the optimum (mu, f, zeta_a)
 * @param variance the optimum mean square J (non-dimensional, see MeanSquare and ResponseScale)
 * @param evaluations mean squares computed
 * @param converged true when the gradient vanished to the stated tolerance
 */
public record VarianceOptimum(Tuning tuning, double variance, int evaluations, boolean converged) {
}
