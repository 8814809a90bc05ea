package org.counterpoise.core.realisation;

import java.util.Arrays;

/**
 * The minimum tensile strength Rm of a spring wire as its standard tabulates it, per nominal wire
 * diameter, and the stock diameters a spring is wound from. One table per wire, kept as data with
 * its standard, edition and provenance; between two tabulated diameters Rm is interpolated linearly
 * in the logarithm of the diameter (Rm falls close to linearly in log d over the whole range, which
 * is how wire makers fit these tables; common practice).
 *
 * <p>Provenance, stated per table: the standards' text was not available. Where a value was checked
 * in a public transcription it says so; every other value is <em>from memory</em> and must be
 * verified against the standard before a spring is certified. A test checks that the grade SH/DH
 * minimum lies above the grade SM minimum of EN 10270-1 at every diameter, SM as transcribed on a
 * public page of a spring maker (the only complete public transcription found).
 */
public final class WireStrengthTable {

    /**
     * Stock wire diameters, mm: a common-practice series drawn from the nominal diameters that
     * EN 10270-1:2011 tabulates (its tensile-strength table has a row for each; finer steps exist,
     * these are the ones a spring maker usually stocks; common practice). Cold coiling, which
     * EN 13906-1:2013 covers up to d = 20 mm, ends the series.
     */
    static final double[] STOCK_DIAMETERS_MM = {0.5, 0.6, 0.7, 0.8, 0.9, 1.0, 1.2, 1.4, 1.6, 1.8, 2.0, 2.5, 2.8, 3.0,
        3.2, 3.5, 3.8, 4.0, 4.5, 5.0, 5.5, 6.0, 6.5, 7.0, 7.5, 8.0, 8.5, 9.0, 9.5, 10.0, 11.0, 12.0, 13.0, 14.0, 15.0,
        16.0, 17.0, 18.0, 19.0, 20.0};

    /**
     * EN 10270-1:2011, grades SH and DH (the standard gives both grades the same tensile range
     * from 0.30 mm up): minimum Rm, N/mm^2, at {@link #STOCK_DIAMETERS_MM}. The thinner rows the
     * series does not use (2660 at 0.30 mm, 2560 at 0.40 mm, 2510 at 0.45 mm) were checked in public
     * transcriptions of the table and the values here continue them; every value listed here, from
     * 0.5 mm up, is from memory: verify against EN 10270-1:2011, table of tensile strength.
     */
    static final double[] EN10270_1_SH_DH_RM_MIN = {2480, 2410, 2350, 2310, 2270, 2230, 2170, 2110, 2060, 2020, 1980,
        1890, 1850, 1820, 1790, 1760, 1730, 1710, 1660, 1630, 1590, 1560, 1530, 1500, 1480, 1460, 1440, 1420, 1400,
        1380, 1350, 1320, 1290, 1270, 1250, 1230, 1210, 1190, 1170, 1160};

    /**
     * EN 10270-3:2011, X10CrNi18-8 (1.4310), normal tensile strength (NS): minimum Rm, N/mm^2, at
     * the first {@link #EN10270_3_LARGEST} stock diameters (the stainless wire is drawn to 10 mm at
     * most in this series). From memory: verify against EN 10270-3:2011, table of tensile strength.
     */
    static final double[] EN10270_3_1_4310_RM_MIN = {2000, 1980, 1960, 1940, 1920, 1900, 1860, 1830, 1800, 1780, 1750,
        1700, 1670, 1650, 1630, 1600, 1570, 1550, 1500, 1450, 1420, 1400, 1370, 1350, 1320, 1300, 1280, 1250, 1230,
        1200};

    /** How many stock diameters the stainless wire covers (0.5 mm to 10 mm). */
    static final int EN10270_3_LARGEST = 30;

    private WireStrengthTable() {
    }

    /**
     * @param material the wire
     * @return the stock wire diameters this wire comes in, m, ascending (a copy)
     */
    public static double[] stockDiameters(SpringMaterial material) {
        int count = material == SpringMaterial.EN10270_3_1_4310 ? EN10270_3_LARGEST : STOCK_DIAMETERS_MM.length;
        return Arrays.stream(STOCK_DIAMETERS_MM, 0, count).map(mm -> mm * 1e-3).toArray();
    }

    /**
     * The minimum tensile strength at a wire diameter, interpolated linearly in log d between the
     * tabulated diameters.
     *
     * @param material the wire
     * @param diameter d, m, within the stock range of the wire
     * @return minimum Rm, Pa
     */
    static double minimumTensileStrength(SpringMaterial material, double diameter) {
        double[] table = material == SpringMaterial.EN10270_3_1_4310 ? EN10270_3_1_4310_RM_MIN
                : EN10270_1_SH_DH_RM_MIN;
        double mm = diameter * 1e3;
        int last = table.length - 1;
        if (!(mm >= STOCK_DIAMETERS_MM[0] * (1 - 1e-9) && mm <= STOCK_DIAMETERS_MM[last] * (1 + 1e-9))) {
            throw new IllegalArgumentException("bug: wire diameter " + mm + " mm outside the table of " + material);
        }
        int i = 1;
        while (i < last && STOCK_DIAMETERS_MM[i] < mm) {
            i++;
        }
        double x0 = Math.log(STOCK_DIAMETERS_MM[i - 1]);
        double x1 = Math.log(STOCK_DIAMETERS_MM[i]);
        double t = Math.min(1.0, Math.max(0.0, (Math.log(mm) - x0) / (x1 - x0)));
        return (table[i - 1] + t * (table[i] - table[i - 1])) * 1e6;
    }
}
