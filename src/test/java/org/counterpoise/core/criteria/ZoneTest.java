package org.counterpoise.core.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Zones: a value on a boundary belongs to the lower zone (ISO 20816-1:2016, 6.3.2.3). */
class ZoneTest {

    @Test
    void aValueOnABoundaryBelongsToTheLowerZone() {
        Zone a = new Zone("A", 0, 1.4e-3);
        Zone b = new Zone("B", 1.4e-3, 2.8e-3);
        assertTrue(a.contains(1.4e-3));
        assertFalse(b.contains(1.4e-3));
        assertTrue(b.contains(2.8e-3));
        assertTrue(b.contains(Math.nextUp(1.4e-3)));
        assertFalse(a.contains(Math.nextUp(1.4e-3)));
    }

    @Test
    void zeroBelongsToTheLowestZoneAndInfinityToNone() {
        Zone a = new Zone("A", 0, 1.4e-3);
        Zone d = new Zone("D", 4.5e-3, Double.POSITIVE_INFINITY);
        assertTrue(a.contains(0));
        assertFalse(d.contains(0));
        assertTrue(d.contains(1.0));
        assertFalse(a.contains(-1e-9));
    }

    @Test
    void everyValueFallsInExactlyOneMachineZone() {
        // ISO 10816-3:2009 Table A.2, group 2 rigid: 1.4 / 2.8 / 4.5 mm/s.
        List<Zone> zones = MachineClass.GROUP_2_RIGID.zones();
        for (double v : new double[] {0, 1e-4, 1.4e-3, 1.41e-3, 2.8e-3, 4.5e-3, 4.6e-3, 1}) {
            long n = zones.stream().filter(z -> z.contains(v)).count();
            assertEquals(1, n, "value " + v);
        }
        assertEquals("B", zones.stream().filter(z -> z.contains(2.8e-3)).findFirst().orElseThrow().id());
        assertEquals("C", zones.stream().filter(z -> z.contains(4.5e-3)).findFirst().orElseThrow().id());
        assertEquals("D", zones.stream().filter(z -> z.contains(4.6e-3)).findFirst().orElseThrow().id());
    }
}
