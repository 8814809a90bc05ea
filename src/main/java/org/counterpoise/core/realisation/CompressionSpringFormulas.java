package org.counterpoise.core.realisation;

/**
 * The formulas of EN 13906-1:2013 (cylindrical helical compression springs of round wire,
 * calculation and design) that the spring sizing uses, each once, all SI: d the wire diameter, D
 * the mean coil diameter, n the active coils, G and E the moduli, rho the density. The clause
 * numbers are those of the 2013 edition's contents; the formulas are the standard's (and every
 * spring text's), written here in SI so that no unit factor hides in them.
 */
public final class CompressionSpringFormulas {

    /** The edition every check cites. */
    public static final String STANDARD = "EN 13906-1:2013";

    /**
     * Seating coefficient nu of the buckling formula for both ends guided and held parallel (the
     * absorber mass guided on its axis and the spring seats fixed to base and mass): 0.5
     * (EN 13906-1:2013, 9.14, the case "both ends fixed and guided").
     */
    public static final double SEATING_COEFFICIENT = 0.5;

    /** The smallest spring index w = D/d the standard covers for cold-coiled springs (scope, table 1). */
    public static final double SMALLEST_INDEX = 4.0;
    /** The largest spring index the standard covers for cold-coiled springs (scope, table 1). */
    public static final double LARGEST_INDEX = 20.0;
    /** The fewest active coils the standard covers for cold-coiled springs (scope, table 1). */
    public static final double FEWEST_ACTIVE_COILS = 2.0;
    /** Inactive coils of closed and ground ends: n_t = n + 2 (EN 13906-1:2013, 9.8). */
    public static final double INACTIVE_COILS = 2.0;
    /**
     * Factor on the minimum sum of gaps for a dynamically loaded cold-coiled spring (EN 13906-1:2013,
     * 9.9, as a public transcription gives it: 1.5 for cold-coiled, 2 for hot-coiled springs).
     */
    public static final double DYNAMIC_GAP_FACTOR = 1.5;

    private CompressionSpringFormulas() {
    }

    /**
     * Spring rate R = G d^4 / (8 D^3 n) (EN 13906-1:2013, 9.4).
     *
     * @param shearModulus G, Pa
     * @param wireDiameter d, m
     * @param meanCoilDiameter D, m
     * @param activeCoils n
     * @return R, N/m
     */
    public static double rate(double shearModulus, double wireDiameter, double meanCoilDiameter, double activeCoils) {
        return shearModulus * Math.pow(wireDiameter, 4) / (8 * Math.pow(meanCoilDiameter, 3) * activeCoils);
    }

    /**
     * The mean coil diameter that gives a rate with n active coils: D = (G d^4 / (8 n R))^(1/3), the
     * rate formula (9.4) solved for D.
     *
     * @param shearModulus G, Pa
     * @param wireDiameter d, m
     * @param activeCoils n
     * @param rate R, N/m
     * @return D, m
     */
    public static double meanDiameterForRate(double shearModulus, double wireDiameter, double activeCoils,
            double rate) {
        return Math.cbrt(shearModulus * Math.pow(wireDiameter, 4) / (8 * activeCoils * rate));
    }

    /**
     * Stress correction factor after Bergstraesser, k = (w + 0.5) / (w - 0.75) with w = D/d
     * (EN 13906-1:2013, clause 7).
     *
     * @param springIndex w, &gt; 0.75
     * @return k
     */
    public static double bergstraesser(double springIndex) {
        return (springIndex + 0.5) / (springIndex - 0.75);
    }

    /**
     * Uncorrected shear stress tau = 8 D F / (pi d^3) (EN 13906-1:2013, 9.5).
     *
     * @param force F, N
     * @param wireDiameter d, m
     * @param meanCoilDiameter D, m
     * @return tau, Pa
     */
    public static double shearStress(double force, double wireDiameter, double meanCoilDiameter) {
        return 8 * meanCoilDiameter * force / (Math.PI * Math.pow(wireDiameter, 3));
    }

    /**
     * Corrected shear stress tau_k = k tau (EN 13906-1:2013, 9.5 with the k of clause 7).
     *
     * @param force F, N
     * @param wireDiameter d, m
     * @param meanCoilDiameter D, m
     * @return tau_k, Pa
     */
    public static double correctedShearStress(double force, double wireDiameter, double meanCoilDiameter) {
        return bergstraesser(meanCoilDiameter / wireDiameter) * shearStress(force, wireDiameter, meanCoilDiameter);
    }

    /**
     * Solid length of a cold-coiled spring with closed and ground ends, Lc = n_t d (EN 13906-1:2013,
     * 9.10, with the nominal diameter for d_max).
     *
     * @param totalCoils n_t
     * @param wireDiameter d, m
     * @return Lc, m
     */
    public static double solidLength(double totalCoils, double wireDiameter) {
        return totalCoils * wireDiameter;
    }

    /**
     * Minimum sum of the gaps between active coils at the largest working load of a cold-coiled
     * spring, Sa = (0.0015 D^2 / d + 0.1 d) n, times {@link #DYNAMIC_GAP_FACTOR} under dynamic
     * load (EN 13906-1:2013, 9.9; both terms are lengths, so the formula holds in any one unit).
     *
     * @param wireDiameter d, m
     * @param meanCoilDiameter D, m
     * @param activeCoils n
     * @param dynamic true when the spring is loaded dynamically
     * @return Sa, m
     */
    public static double minimumGapSum(double wireDiameter, double meanCoilDiameter, double activeCoils,
            boolean dynamic) {
        double gaps = (0.0015 * meanCoilDiameter * meanCoilDiameter / wireDiameter + 0.1 * wireDiameter) * activeCoils;
        return dynamic ? DYNAMIC_GAP_FACTOR * gaps : gaps;
    }

    /**
     * First natural (surge) frequency of a spring with both ends fixed, excited at one end,
     * f_e = d / (2 pi n D^2) sqrt(G / (2 rho)) in Hz, returned as omega_e = 2 pi f_e
     * (EN 13906-1:2013, 9.12, which writes it as 3.56e3 d / (n D^2) sqrt(G / rho) with d, D in mm, G
     * in N/mm^2 and rho in kg/dm^3; the same formula).
     *
     * @param shearModulus G, Pa
     * @param density rho, kg/m^3
     * @param wireDiameter d, m
     * @param meanCoilDiameter D, m
     * @param activeCoils n
     * @return omega_e, rad/s
     */
    public static double surgeFrequency(double shearModulus, double density, double wireDiameter,
            double meanCoilDiameter, double activeCoils) {
        double hertz = wireDiameter / (2 * Math.PI * activeCoils * meanCoilDiameter * meanCoilDiameter)
                * Math.sqrt(shearModulus / (2 * density));
        return 2 * Math.PI * hertz;
    }

    /**
     * Theoretical buckling deflection s_K = L0 (0.5 / (1 - G/E)) (1 - sqrt(1 - ((1 - G/E) / (0.5 +
     * G/E)) (pi D / (nu L0))^2)) (EN 13906-1:2013, 9.14). When the root is imaginary the spring
     * does not buckle at any deflection: the result is then empty (negative), and the caller takes
     * the deflection to solid as the limit.
     *
     * @param shearModulus G, Pa
     * @param youngsModulus E, Pa
     * @param freeLength L0, m
     * @param meanCoilDiameter D, m
     * @param seatingCoefficient nu
     * @return s_K, m, or -1 when the spring cannot buckle
     */
    public static double bucklingDeflection(double shearModulus, double youngsModulus, double freeLength,
            double meanCoilDiameter, double seatingCoefficient) {
        double ratio = shearModulus / youngsModulus;
        double slenderness = Math.PI * meanCoilDiameter / (seatingCoefficient * freeLength);
        double radicand = 1 - (1 - ratio) / (0.5 + ratio) * slenderness * slenderness;
        if (radicand < 0) {
            return -1;
        }
        return freeLength * 0.5 / (1 - ratio) * (1 - Math.sqrt(radicand));
    }

    /**
     * Mass of a spring: rho (pi d^2 / 4) (pi D n_t) (wire length of n_t coils; common practice).
     *
     * @param density rho, kg/m^3
     * @param wireDiameter d, m
     * @param meanCoilDiameter D, m
     * @param totalCoils n_t
     * @return kg
     */
    public static double mass(double density, double wireDiameter, double meanCoilDiameter, double totalCoils) {
        return density * Math.PI * wireDiameter * wireDiameter / 4 * Math.PI * meanCoilDiameter * totalCoils;
    }
}
