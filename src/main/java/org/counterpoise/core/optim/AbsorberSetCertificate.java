package org.counterpoise.core.optim;

/**
 * The evidence that a design of several absorbers is the minimax optimum, as reported.
 *
 * @param activePeaks maxima of |H| within 1e-6 relative of the peak (the active set)
 * @param activeSpread 1 - smallest / largest of the active maxima (equal peaks: at most 1e-9)
 * @param stationarity relative violation of the first-order minimax conditions (the least-norm
 *     convex combination of the active maxima's exact gradients, each variable scaled by its
 *     largest component, or 1e-2 of the largest over all variables when that is more; at most 1e-4)
 * @param scanPoints designs of the coarse global scan of the variables
 * @param scanBest the lowest peak among them (not below the optimum by more than 1e-9 relative)
 * @param perturbations small random moves of the variables tried (10^-6 to 10^-2, in the solver's
 *     variables ln f, spread, ln zeta)
 * @param perturbationLeast the least of (peak after a move) / (optimum peak) - 1 (at least -1e-9)
 * @param certified true when every condition above holds
 */
public record AbsorberSetCertificate(int activePeaks, double activeSpread, double stationarity, int scanPoints,
        double scanBest, int perturbations, double perturbationLeast, boolean certified) {
    /** Active maxima must be equal to this, relative. */
    public static final double EQUAL_PEAKS = 1e-9;
    /** Largest violation of the first-order conditions. */
    public static final double STATIONARY = 1e-4;
    /** No scan point or perturbation may be lower by more than this, relative. */
    public static final double NOT_BEATEN = 1e-9;
}
