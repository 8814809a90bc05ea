package org.counterpoise.core.system;

import org.counterpoise.core.rational.TransferFunction;

/**
 * A number that rates a frequency response, for optimisers and robustness studies to minimise or
 * compare without knowing which system produced it: the exact peak of |H| over a band
 * ({@link BandPeak}, the H-infinity measure over that band) or the mean square under white noise
 * ({@link WhiteNoiseMeanSquare}, the H2 measure). Both work on any real rational H, however many
 * modes and absorbers it comes from.
 */
public interface BandObjective {

    /**
     * @param h transfer function in s = i omega / referenceFrequency
     * @param referenceFrequency the scaling of h's variable, rad/s
     * @return the objective of h, in h's own (non-dimensional) units; +infinity when unbounded
     */
    double of(TransferFunction h, double referenceFrequency);

    /**
     * The objective of one response of a system.
     * @param system the system
     * @param excitation where and how it is driven
     * @param response the response rated
     * @param <E> the system's excitation type
     * @param <R> the system's response type
     * @return the objective of that transfer function, in its non-dimensional units
     */
    default <E, R> double of(LinearSystem<E, R> system, E excitation, R response) {
        return of(system.transferFunction(excitation, response), system.referenceFrequency());
    }
}
