package org.counterpoise.core.realisation;

import java.util.List;

/**
 * Helical compression springs that realise the absorber's spring rate, to EN 13906-1, all SI. When
 * there are several they stand in parallel and share the load equally.
 *
 * @param material the wire
 * @param count springs in parallel (&gt;= 1)
 * @param wireDiameter d, m, from the stock series
 * @param meanCoilDiameter D, m
 * @param activeCoils n (may end in a fraction: quarter coils)
 * @param totalCoils n_t (active plus the closed, ground ends)
 * @param freeLength L0, m
 * @param solidLength Lc, m
 * @param installedLength the length under the static load, m (the free length when nothing rests on it;
 *     with opposed pairs, the length of the more loaded spring under its preload and static share)
 * @param ratePerSpring R = G d^4 / (8 D^3 n), N/m
 * @param totalRate count times the rate per spring, N/m
 * @param rateDeviation total rate over the design's spring rate, minus one
 * @param staticLoadPerSpring the steady load on one spring, N (with opposed pairs, the preload plus the
 *     static share, on the more loaded spring)
 * @param dynamicLoadPerSpring the amplitude of the load on one spring at the worst of band and run-up, N
 * @param serviceCycles load cycles over the service life
 * @param checks stress, fatigue, buckling, surge and solid-length checks
 * @param arrangement seated under the mass, or opposed preloaded pairs (then {@code count} is even)
 * @param preloadPerSpring the assembly preload of each spring of an opposed pair, N (0 when seated)
 * @param minimumGapSum Sa, the least sum of gaps between active coils left at the largest working
 *     load (EN 13906-1:2013, 9.9), m
 * @param massPerSpring the mass of one spring, kg
 */
public record SpringDesign(SpringMaterial material, int count, double wireDiameter, double meanCoilDiameter,
        double activeCoils, double totalCoils, double freeLength, double solidLength, double installedLength,
        double ratePerSpring, double totalRate, double rateDeviation, double staticLoadPerSpring,
        double dynamicLoadPerSpring, double serviceCycles, List<DesignCheck> checks, SpringArrangement arrangement,
        double preloadPerSpring, double minimumGapSum, double massPerSpring) {

    /** Defensive copy. */
    public SpringDesign {
        checks = List.copyOf(checks);
    }

    /**
     * The foundation's form (seated springs, no preload, gaps and mass not stated), kept so that
     * records built by hand before the sizing landed still compile.
     *
     * @param material the wire
     * @param count springs in parallel
     * @param wireDiameter d, m
     * @param meanCoilDiameter D, m
     * @param activeCoils n
     * @param totalCoils n_t
     * @param freeLength L0, m
     * @param solidLength Lc, m
     * @param installedLength length under the static load, m
     * @param ratePerSpring N/m
     * @param totalRate N/m
     * @param rateDeviation total rate over the design's, minus one
     * @param staticLoadPerSpring N
     * @param dynamicLoadPerSpring N
     * @param serviceCycles cycles
     * @param checks the checks
     */
    public SpringDesign(SpringMaterial material, int count, double wireDiameter, double meanCoilDiameter,
            double activeCoils, double totalCoils, double freeLength, double solidLength, double installedLength,
            double ratePerSpring, double totalRate, double rateDeviation, double staticLoadPerSpring,
            double dynamicLoadPerSpring, double serviceCycles, List<DesignCheck> checks) {
        this(material, count, wireDiameter, meanCoilDiameter, activeCoils, totalCoils, freeLength, solidLength,
                installedLength, ratePerSpring, totalRate, rateDeviation, staticLoadPerSpring, dynamicLoadPerSpring,
                serviceCycles, checks, SpringArrangement.SEATED, 0.0, 0.0, 0.0);
    }

    /** @return the outside coil diameter D + d, m */
    public double outsideDiameter() {
        return meanCoilDiameter + wireDiameter;
    }

    /** @return the spring index w = D/d */
    public double springIndex() {
        return meanCoilDiameter / wireDiameter;
    }

    /** @return true when every check passes */
    public boolean passes() {
        return checks.stream().allMatch(DesignCheck::passes);
    }
}
