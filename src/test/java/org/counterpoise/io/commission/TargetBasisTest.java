package org.counterpoise.io.commission;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.counterpoise.core.robust.MistuningRange;
import org.junit.jupiter.api.Test;

/**
 * The site check's line on where its target comes from follows the sheet's procedure rule (common
 * practice of this program, docs/realisation.md, step COMPUTE_ABSORBER_TARGET): a measured frequency
 * inside the range the design holds is said to be inside it, with the range's ends in Hz; outside it,
 * the procedure's "design again". An end beyond the search is given at the search limit, as the
 * procedure gives it.
 */
class TargetBasisTest {
    private static final double HZ = 2 * Math.PI;

    @Test
    void insideAndOutsideTheRangeAreSaidWithItsEnds() {
        MistuningRange range = new MistuningRange(OptionalDouble.of(0.95), OptionalDouble.empty(), 0.1, 0.3, true,
                false);
        String inside = SiteCheckReport.targetBasis(10.4 * HZ, 10 * HZ, range, "why", "the kept frequency");
        assertTrue(inside.contains("inside the range the design holds (9.500 Hz to 13.00 Hz)"), inside);
        assertTrue(inside.contains("keeps the kept frequency, which also leaves the peak within 10.0 %"), inside);
        String below = SiteCheckReport.targetBasis(9.4 * HZ, 10 * HZ, range, "why", "the kept frequency");
        assertTrue(below.contains("outside the range the design holds (9.500 Hz to 13.00 Hz)"), below);
        assertTrue(below.contains("design again"), below);
        String above = SiteCheckReport.targetBasis(13.2 * HZ, 10 * HZ, range, "why", "the kept frequency");
        assertTrue(above.contains("outside the range"), above);
    }
}
