package org.counterpoise.core.realisation;

import java.util.Optional;

/**
 * The best absorber whose damping is hysteretic (a complex stiffness k (1 + i eta), as an elastomer
 * is), for the project's structure, disturbance and band, computed exactly, beside the viscous
 * design it replaces.
 *
 * @param tuningRatio absorber frequency sqrt(k/m) over the structure's natural frequency
 * @param lossFactor eta
 * @param peakResponse the least peak of the response that matters over the band, SI
 * @param viscousPeakResponse the viscous design's peak over the same band, SI
 * @param published the published fixed-point (Snowdon) values for the same mass ratio, where the
 *     case is one they cover (undamped structure, force in, displacement out)
 */
public record HystereticOptimum(double tuningRatio, double lossFactor, double peakResponse,
        double viscousPeakResponse, Optional<PublishedHysteretic> published) {

    /**
     * The published values for comparison.
     * @param tuningRatio published optimum tuning ratio
     * @param lossFactor published optimum loss factor
     * @param source author, year, work and equation
     */
    public record PublishedHysteretic(double tuningRatio, double lossFactor, String source) {
    }
}
