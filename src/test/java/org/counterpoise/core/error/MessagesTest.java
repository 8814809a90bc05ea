package org.counterpoise.core.error;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** Message-key consistency (after Hipparchus' LocalizedFormatsAbstractTest): slots and their filling. */
class MessagesTest {
    /** How many values each message is given by the code that raises it. */
    private static final Map<Messages, Integer> ARGUMENTS = Map.of(Messages.INVALID_VALUE, 3,
            Messages.MISSING_VALUE, 2, Messages.UNUSABLE, 3, Messages.CANCELLED, 1, Messages.BUG, 1);

    @Test
    void everyKeyHasAsManySlotsAsItIsGivenValuesAndFillsThemAll() {
        assertEquals(Messages.values().length, ARGUMENTS.size(), "every key listed here");
        for (Messages m : Messages.values()) {
            int highest = -1;
            Matcher slot = Pattern.compile("\\{(\\d)}").matcher(m.pattern());
            while (slot.find()) {
                highest = Math.max(highest, Integer.parseInt(slot.group(1)));
            }
            int given = ARGUMENTS.get(m);
            assertEquals(given, highest + 1, m + " slots");
            Object[] values = new Object[given];
            for (int i = 0; i < given; i++) {
                values[i] = "v" + i;
            }
            String text = m.format(values);
            assertFalse(text.contains("{"), m + ": " + text);
        }
        // Apostrophes are literal (MessageFormat would swallow them otherwise).
        assertEquals("a: it's is not allowed; x", Messages.INVALID_VALUE.format("a", "it's", "x"));
    }
}
