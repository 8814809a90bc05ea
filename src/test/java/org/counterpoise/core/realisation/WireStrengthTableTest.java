package org.counterpoise.core.realisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The wire tables against a public transcription of EN 10270-1 and against their own shape. */
class WireStrengthTableTest {

    /**
     * EN 10270-1:2011 grade SM, minimum Rm (N/mm^2) at d (mm), as a spring maker transcribes the
     * standard on its public glossary page (mollificiomodenese.it, "Carbon steel wire EN 10270-1"):
     * a lower grade than SH/DH, so the SH/DH minimum must lie above it at every diameter.
     */
    private static final double[][] SM = {{0.5, 2200}, {1.0, 1980}, {1.6, 1830}, {2.0, 1760}, {2.5, 1690},
        {3.0, 1630}, {4.0, 1530}, {5.0, 1460}, {6.0, 1400}, {8.0, 1310}, {10.0, 1240}, {12.0, 1180}, {16.0, 1090},
        {20.0, 1020}};

    @Test
    void gradeShDhLiesAboveTheTranscribedGradeSmAtEveryDiameter() {
        for (double[] row : SM) {
            double shdh = SpringMaterial.EN10270_1_DH.minimumTensileStrength(row[0] * 1e-3) / 1e6;
            assertTrue(shdh > row[1], row[0] + " mm: " + shdh + " vs SM " + row[1]);
            // and by the margin between the grades the public tables show at 0.30 mm (2660 vs 2370),
            // give or take: 6 % to 16 % of SM (common practice: the grades keep their spacing)
            assertTrue(shdh / row[1] > 1.06 && shdh / row[1] < 1.16, row[0] + " mm: ratio " + shdh / row[1]);
        }
    }

    @Test
    void strengthFallsWithDiameterAndInterpolatesBetweenRows() {
        for (SpringMaterial m : SpringMaterial.values()) {
            double[] stock = m.stockDiameters();
            for (int i = 1; i < stock.length; i++) {
                assertTrue(m.minimumTensileStrength(stock[i]) < m.minimumTensileStrength(stock[i - 1]),
                        m + " at " + stock[i]);
                double between = Math.sqrt(stock[i] * stock[i - 1]);
                double mid = m.minimumTensileStrength(between);
                // at the geometric mean the log-linear interpolation gives the arithmetic mean of the rows
                assertEquals((m.minimumTensileStrength(stock[i]) + m.minimumTensileStrength(stock[i - 1])) / 2, mid,
                        1e-6 * mid, m + " between " + stock[i - 1] + " and " + stock[i]);
            }
        }
        assertEquals(2230e6, SpringMaterial.EN10270_1_SH.minimumTensileStrength(1e-3), 1e-3);
        assertEquals(10e-3, SpringMaterial.EN10270_3_1_4310.stockDiameters()[29], 1e-15);
    }

    @Test
    void permissibleAndUltimateShearAreTheStatedFractionsOfRm() {
        double rm = SpringMaterial.EN10270_1_DH.minimumTensileStrength(3e-3);
        assertEquals(0.56 * rm, SpringMaterial.EN10270_1_DH.permissibleShearStress(3e-3), 1e-6);
        assertEquals(0.67 * rm, SpringMaterial.EN10270_1_DH.ultimateShearStrength(3e-3), 1e-6);
        // Goodman intercept S_se = S_sa / (1 - S_sm / S_su): 241 / (1 - 379 / (0.67 * 1820)) = 241 / 0.68918
        //   = 349.7 MPa at d = 3 mm (Rm 1820 N/mm^2)
        assertEquals(349.7e6, SpringFatigue.enduranceLimit(SpringMaterial.EN10270_1_DH, 3e-3), 0.1e6);
        // at a mean of 300 MPa the amplitude allowed is 349.7 (1 - 300 / 1219.4) = 263.7 MPa
        assertEquals(263.7e6, SpringFatigue.allowableAmplitude(SpringMaterial.EN10270_1_DH, 3e-3, 300e6), 0.1e6);
    }
}
