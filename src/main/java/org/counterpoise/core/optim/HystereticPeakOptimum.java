package org.counterpoise.core.optim;

import org.counterpoise.core.response.HystereticAbsorber;

/**
 * The result of the H-infinity (minimum peak) optimisation of a hysteretic absorber.
 *
 * @param absorber the optimum (mu, f, eta)
 * @param peak the optimum peak of |H| over the band (non-dimensional, see ResponseScale)
 * @param activeSet which maxima are equal at the optimum, in words (e.g. "two interior peaks")
 * @param certified true when the optimality conditions hold and no point of the global scan is lower
 * @param violation the first-order violation measured by the certificate (0 at an exact optimum)
 */
public record HystereticPeakOptimum(HystereticAbsorber absorber, double peak, String activeSet, boolean certified,
        double violation) {
}
