package org.counterpoise.ui.gui.field;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The wizard's one HTML escape (HTML 4.01, section 5.3.2: the character entity references of &amp;, &lt;, &gt;). */
class HtmlTest {
    @Test
    void escapesTheThreeMarkupCharactersAndNothingElse() {
        assertEquals("R&amp;D floor &lt;2 mm&gt; at 50 % \"rated\"", Html.escape("R&D floor <2 mm> at 50 % \"rated\""));
        // the ampersand first, so an entity already in the text shows as typed, not as its character
        assertEquals("&amp;lt;", Html.escape("&lt;"));
    }

    @Test
    void wrapsAtAWidthInPointsAndLabels() {
        assertEquals("<html><body style='width: 220pt'>a &lt; b</body></html>", Html.wrapped("a < b", 220));
        assertEquals("<html>x &amp; y</html>", Html.label("x & y"));
    }
}
