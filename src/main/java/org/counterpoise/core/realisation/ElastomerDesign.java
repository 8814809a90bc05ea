package org.counterpoise.core.realisation;

import java.util.List;

/**
 * An elastomer element that realises the absorber: its stiffness and the loss factor it must have,
 * from the exact hysteretic optimum, all SI.
 *
 * @param dynamicStiffness the stiffness at the working frequency the element must have, N/m
 * @param staticStiffness what a static load test on the element shows (dynamic over the ratio), N/m
 * @param dynamicToStaticRatio the ratio assumed
 * @param lossFactorNeeded the loss factor the design needs
 * @param optimum the hysteretic optimum and the viscous design beside it
 * @param checks the loss-factor check (needed against the compound's)
 */
public record ElastomerDesign(double dynamicStiffness, double staticStiffness, double dynamicToStaticRatio,
        double lossFactorNeeded, HystereticOptimum optimum, List<DesignCheck> checks) {

    /** Defensive copy. */
    public ElastomerDesign {
        checks = List.copyOf(checks);
    }
}
