package org.counterpoise.ui.gui.session;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.Dimension;
import java.awt.Rectangle;
import org.junit.jupiter.api.Test;

/**
 * Where the window goes on screens people have: 1366 x 768 (a common laptop), and 1920 x 1080 at
 * 200 % scaling, which Java lays out as 960 x 540. Plain geometry, no display needed.
 */
class WindowPlacementTest {
    private static final Dimension PREFERRED = new Dimension(1280, 800);
    private static final Dimension MIN = WindowPlacement.SMALLEST;

    @Test
    void firstWindowIsCentredAndNeverLargerThanTheScreen() {
        // 1366 x 768 with a 40-pixel task bar at the bottom: 1280 wide fits, 800 high does not.
        Rectangle laptop = new Rectangle(0, 0, 1366, 728);
        assertEquals(new Rectangle(43, 0, 1280, 728), WindowPlacement.place(null, PREFERRED, laptop, MIN));
        Rectangle scaled = new Rectangle(0, 0, 960, 540);
        assertEquals(new Rectangle(0, 0, 960, 540), WindowPlacement.place(null, PREFERRED, scaled, MIN));
        Rectangle large = new Rectangle(0, 0, 1920, 1080);
        assertEquals(new Rectangle(320, 140, 1280, 800), WindowPlacement.place(null, PREFERRED, large, MIN));
    }

    @Test
    void rememberedPlaceIsKeptWhenItFitsAndPulledOntoTheScreenWhenNot() {
        Rectangle screen = new Rectangle(0, 0, 1366, 768);
        Rectangle fits = new Rectangle(100, 50, 1000, 600);
        assertEquals(fits, WindowPlacement.place(fits, PREFERRED, screen, MIN));
        // Saved on a 2560 x 1440 monitor to the right: shrunk to the screen and moved onto it.
        Rectangle elsewhere = new Rectangle(1800, 300, 2000, 1200);
        assertEquals(new Rectangle(0, 0, 1366, 768), WindowPlacement.place(elsewhere, PREFERRED, screen, MIN));
        // Half off the right edge: moved left so the whole window shows.
        Rectangle offEdge = new Rectangle(900, 100, 800, 500);
        assertEquals(new Rectangle(566, 100, 800, 500), WindowPlacement.place(offEdge, PREFERRED, screen, MIN));
        // A second screen to the left (negative coordinates) is a screen like any other.
        Rectangle left = new Rectangle(-1920, 0, 1920, 1080);
        Rectangle onLeft = new Rectangle(-1500, 100, 1200, 700);
        assertEquals(onLeft, WindowPlacement.place(onLeft, PREFERRED, left, MIN));
        // Shrunk below the smallest usable size by hand: grown back to it.
        Rectangle tiny = new Rectangle(10, 10, 200, 100);
        assertEquals(new Rectangle(10, 10, MIN.width, MIN.height), WindowPlacement.place(tiny, PREFERRED, screen, MIN));
    }
}
