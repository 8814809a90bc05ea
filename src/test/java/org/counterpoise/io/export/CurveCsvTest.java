package org.counterpoise.io.export;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/**
 * An undamped structure exactly at resonance has an unbounded response: the CSV shows an empty
 * cell there (the usual CSV spelling of "no value"; common practice), never "Infinity" or "NaN",
 * and every other number keeps 17 significant digits so it reads back exactly.
 */
class CurveCsvTest {
    @Test
    void anUnboundedValueIsAnEmptyCellAndOthersReadBackExactly() {
        double omega = 2 * Math.PI * 14.2;
        DesignCurves curves = new DesignCurves(new double[] {omega, 2 * omega}, ResponseKind.DISPLACEMENT,
                new double[] {Double.POSITIVE_INFINITY, 1.25e-4}, new double[] {3.0e-5, Double.NaN},
                new double[] {0.1 / 3, 2.0e-4});
        String[] lines = CurveCsv.of(curves).split("\n", -1);
        assertEquals(4, lines.length, "header, two rows, and the final line feed");
        String[] first = lines[1].split(",", -1);
        assertEquals(14.2, Double.parseDouble(first[0]), 1e-13);
        assertEquals("", first[1]);
        assertEquals(3.0e-5, Double.parseDouble(first[2]));
        assertEquals(0.1 / 3, Double.parseDouble(first[3]));
        String[] second = lines[2].split(",", -1);
        assertEquals(1.25e-4, Double.parseDouble(second[1]));
        assertEquals("", second[2]);
        assertEquals("", lines[3]);
    }
}
