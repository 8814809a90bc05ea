package org.counterpoise.core.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Messages;
import org.junit.jupiter.api.Test;

/**
 * Limit curves: straight lines on log-log axes between points, that is a power law per segment
 * (the form of every published criterion curve; checked here against the power law written out by
 * hand), held flat outside the points; and plain messages for bad points.
 */
class LimitCurveTest {

    private static final LimitCurve CURVE = new LimitCurve(List.of(new LimitCurve.Point(1, 0.01),
            new LimitCurve.Point(4, 0.005), new LimitCurve.Point(8, 0.005), new LimitCurve.Point(80, 0.05)));

    @Test
    void exponentsAreTheLogLogSlopes() {
        // 0.01 -> 0.005 over two octaves: f^-1/2; flat; 0.005 -> 0.05 over a decade: f^1.
        assertEquals(-0.5, CURVE.exponent(0), 1e-15);
        assertEquals(0.0, CURVE.exponent(1), 1e-15);
        assertEquals(1.0, CURVE.exponent(2), 1e-14);
    }

    @Test
    void insideASegmentTheLimitIsItsPowerLaw() {
        // L(f) = L_i (f / f_i)^k_i, by hand: 0.01 * 2^-0.5 at 2 Hz, 0.005 at 6 Hz, 0.005 * 20 / 8 at 20 Hz.
        assertEquals(0.01 / Math.sqrt(2), CURVE.at(2), 1e-17);
        assertEquals(0.005, CURVE.at(6), 1e-17);
        assertEquals(0.0125, CURVE.at(20), 1e-16);
        assertEquals(0.01 * Math.pow(3.3, -0.5), CURVE.at(3.3), 1e-17);
    }

    @Test
    void atTheCornersTheLimitIsThePoint() {
        assertEquals(0.01, CURVE.at(1), 0);
        assertEquals(0.005, CURVE.at(4), 1e-18);
        assertEquals(0.005, CURVE.at(8), 1e-18);
        assertEquals(0.05, CURVE.at(80), 0);
    }

    @Test
    void outsideItsRangeTheCurveHoldsItsEndValues() {
        assertEquals(1, CURVE.lowFrequency());
        assertEquals(80, CURVE.highFrequency());
        assertEquals(0.01, CURVE.at(0.2), 0);
        assertEquals(0.05, CURVE.at(500), 0);
    }

    @Test
    void flatLimits() {
        LimitCurve flat = LimitCurve.flat(2e-3);
        assertTrue(flat.isFlat());
        assertEquals(2e-3, flat.at(0.01), 0);
        assertEquals(2e-3, flat.at(1e4), 0);
        assertTrue(new LimitCurve(List.of(new LimitCurve.Point(1, 3), new LimitCurve.Point(80, 3))).isFlat());
        assertFalse(CURVE.isFlat());
    }

    @Test
    void timesScalesEveryPointAndKeepsTheSlopes() {
        LimitCurve office = CURVE.times(4);
        assertEquals(4 * CURVE.at(2.5), office.at(2.5), 1e-17);
        assertEquals(4 * CURVE.at(30), office.at(30), 1e-16);
        for (int i = 0; i < 3; i++) {
            assertEquals(CURVE.exponent(i), office.exponent(i), 1e-14);
        }
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> CURVE.times(0));
        assertEquals("limit curve factor", e.field());
    }

    @Test
    void pointsOutOfOrderAreNamedByTheirPlace() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new LimitCurve(List.of(
                new LimitCurve.Point(1, 1e-3), new LimitCurve.Point(10, 1e-3), new LimitCurve.Point(10, 2e-3))));
        assertEquals("limit curve point 3", e.field());
        assertEquals("limit curve point 3: 10 Hz is not allowed; the frequencies must rise from point to point"
                + " (the previous one is 10 Hz)", e.getMessage());
    }

    @Test
    void aBadPointIsNamedByItsValues() {
        InvalidInputException f = assertThrows(InvalidInputException.class, () -> new LimitCurve.Point(0, 5e-3));
        assertEquals("limit curve point: (0 Hz, 0.005) is not allowed; the frequency must be a finite number of"
                + " hertz greater than 0", f.getMessage());
        InvalidInputException l = assertThrows(InvalidInputException.class, () -> new LimitCurve.Point(12.5, -1));
        assertEquals("limit curve point: (12.5 Hz, -1) is not allowed; the limit must be a finite number greater"
                + " than 0", l.getMessage());
        InvalidInputException n = assertThrows(InvalidInputException.class,
                () -> new LimitCurve.Point(Double.NaN, 1));
        assertTrue(n.getMessage().contains("(not a number Hz, 1)"), n.getMessage());
        assertThrows(InvalidInputException.class, () -> new LimitCurve.Point(3, Double.POSITIVE_INFINITY));
    }

    @Test
    void emptyOrMissingPointsAreMissing() {
        InvalidInputException empty = assertThrows(InvalidInputException.class, () -> new LimitCurve(List.of()));
        assertEquals("limit curve: missing; at least one point (frequency, limit)", empty.getMessage());
        List<LimitCurve.Point> withHole = new ArrayList<>();
        withHole.add(new LimitCurve.Point(1, 1));
        withHole.add(null);
        InvalidInputException hole = assertThrows(InvalidInputException.class, () -> new LimitCurve(withHole));
        assertEquals("limit curve point 2", hole.field());
    }

    @Test
    void aFrequencyThatIsNoNumberIsABugNotAnAnswer() {
        // Zero (the bottom of a band that starts at rest) is below the range and gets the first value.
        assertEquals(0.01, CURVE.at(0), 0);
        CoreException e = assertThrows(CoreException.class, () -> CURVE.at(Double.NaN));
        assertEquals(Messages.BUG, e.key());
    }

    @Test
    void theCurveIsACopy() {
        List<LimitCurve.Point> points = new ArrayList<>(List.of(new LimitCurve.Point(1, 1), new LimitCurve.Point(2, 2)));
        LimitCurve c = new LimitCurve(points);
        points.add(new LimitCurve.Point(3, 3));
        assertEquals(2, c.points().size());
    }
}
