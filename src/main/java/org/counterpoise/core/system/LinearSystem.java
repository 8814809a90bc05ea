package org.counterpoise.core.system;

import org.counterpoise.core.rational.TransferFunction;

/**
 * A linear time-invariant vibrating system that yields, for a response at a point and an
 * excitation, the exact rational transfer function between them. For a lumped model with mass,
 * damping and stiffness matrices M, C, K, a force pattern b and a response row c, this is
 * H(s) = c^T (M s^2 + C s + K)^-1 b (for example Ewins 2000, <i>Modal Testing</i>, ch. 2); for the
 * structure with one absorber it is the closed two-degree-of-freedom algebra of
 * {@code core.response.TransferFunctions}.
 *
 * <p>Transfer functions are in a scaled variable s = i omega / {@link #referenceFrequency()}, so
 * that polynomial coefficients stay of moderate size; {@link #responseScale} converts a magnitude
 * of the scaled function to SI. Implementations are immutable and safe to share between threads.
 *
 * @param <E> how the system is excited (for example a kind of drive, or a point where a force acts)
 * @param <R> which response is wanted (for example a kind of response, or a point and a quantity)
 */
public interface LinearSystem<E, R> {

    /** @return the frequency omega_ref that scales the transfer functions' variable, rad/s (&gt; 0) */
    double referenceFrequency();

    /**
     * @param excitation where and how the system is driven
     * @param response the response wanted
     * @return H(s) in s = i omega / omega_ref, exact rational, per unit of the drive's own reference
     * @throws IllegalArgumentException when the response does not exist in this system
     */
    TransferFunction transferFunction(E excitation, R response);

    /**
     * @param excitation where and how the system is driven
     * @param amplitude SI amplitude of the drive
     * @param response the response wanted
     * @return the SI value of the response when |H| = 1 (so the SI amplitude at omega is this times
     *     |H(i omega / omega_ref)|)
     */
    double responseScale(E excitation, double amplitude, R response);
}
