package org.counterpoise.core.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/**
 * The comfort reactions of ISO 2631-1:1997 Annex C, C.2.3, as publicly transcribed (the end points
 * in jmrplens/phonometry's documentation; the intermediate bounds in two further public
 * implementations, not read in the standard: see the class's javadoc), and the comfort criterion
 * built on them.
 */
class ComfortReactionTest {

    @Test
    void theRangesAreThoseOfAnnexC() {
        // ISO 2631-1:1997 C.2.3: < 0.315 not uncomfortable; 0.315-0.63 a little; 0.5-1 fairly;
        // 0.8-1.6 uncomfortable; 1.25-2.5 very; > 2 extremely uncomfortable (m/s^2, weighted r.m.s.).
        double[][] expected = {{0, 0.315}, {0.315, 0.63}, {0.5, 1.0}, {0.8, 1.6}, {1.25, 2.5},
            {2.0, Double.POSITIVE_INFINITY}};
        ComfortReaction[] reactions = ComfortReaction.values();
        assertEquals(expected.length, reactions.length);
        for (int i = 0; i < reactions.length; i++) {
            assertEquals(expected[i][0], reactions[i].lower(), 0, reactions[i].id());
            assertEquals(expected[i][1], reactions[i].upper(), 0, reactions[i].id());
        }
    }

    @Test
    void theRangesOverlapAsInTheStandard() {
        // ISO 2631-1:1997 C.2.3 prints overlapping ranges: 0.55 m/s^2 is both "a little" and
        // "fairly uncomfortable".
        assertTrue(ComfortReaction.A_LITTLE_UNCOMFORTABLE.zone().contains(0.55));
        assertTrue(ComfortReaction.FAIRLY_UNCOMFORTABLE.zone().contains(0.55));
        for (int i = 1; i < ComfortReaction.values().length - 1; i++) {
            ComfortReaction r = ComfortReaction.values()[i];
            ComfortReaction next = ComfortReaction.values()[i + 1];
            assertTrue(next.lower() < r.upper(), r.id() + " overlaps " + next.id());
        }
        // the first two meet at 0.315 without overlap; 0.315 itself is "not uncomfortable" by the
        // lower-zone rule of Zone.contains
        assertEquals(ComfortReaction.NOT_UNCOMFORTABLE.upper(), ComfortReaction.A_LITTLE_UNCOMFORTABLE.lower(), 0);
        assertTrue(ComfortReaction.NOT_UNCOMFORTABLE.zone().contains(0.315));
        assertFalse(ComfortReaction.A_LITTLE_UNCOMFORTABLE.zone().contains(0.315));
    }

    @Test
    void idsRoundTrip() {
        for (ComfortReaction r : ComfortReaction.values()) {
            assertEquals(Optional.of(r), ComfortReaction.byId(r.id()));
        }
        assertEquals(Optional.empty(), ComfortReaction.byId("comfy"));
        assertEquals(List.of("not-uncomfortable", "a-little-uncomfortable", "fairly-uncomfortable", "uncomfortable",
                "very-uncomfortable", "extremely-uncomfortable"), ComfortReaction.ids());
    }

    @Test
    void theComfortLimitIsTheUpperEndOfTheAcceptedReaction() {
        HumanComfort seat = new HumanComfort(FrequencyWeighting.WK, ComfortReaction.A_LITTLE_UNCOMFORTABLE);
        assertEquals(0.63, seat.limit().at(6.3), 0);
        assertTrue(seat.limit().isFlat());
        assertEquals(ResponseKind.ACCELERATION, seat.quantity());
        assertEquals(AmplitudeConvention.RMS, seat.convention());
        assertEquals(Optional.of(FrequencyWeighting.WK), seat.weighting());
        // several orders add as the root of the sum of squares (ISO 2631-1:1997 Eq. 9)
        assertEquals(OrderCombination.TOGETHER, seat.combination());
        assertEquals(6, seat.zones().size());
        assertTrue(seat.source().contains("ISO 2631-1:1997"));
    }

    @Test
    void aComfortCriterionNeedsAnUpperEndAndAWholeBodyWeighting() {
        InvalidInputException none = assertThrows(InvalidInputException.class,
                () -> new HumanComfort(FrequencyWeighting.WD, ComfortReaction.EXTREMELY_UNCOMFORTABLE));
        assertEquals("acceptance.acceptable", none.field());
        InvalidInputException wm = assertThrows(InvalidInputException.class,
                () -> new HumanComfort(FrequencyWeighting.WM, ComfortReaction.UNCOMFORTABLE));
        assertEquals("acceptance.weighting", wm.field());
    }
}
