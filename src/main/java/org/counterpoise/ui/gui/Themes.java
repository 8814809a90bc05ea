package org.counterpoise.ui.gui;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;
import java.awt.Color;
import java.awt.Window;
import javax.swing.SwingUtilities;

/** The light and dark looks (FlatLaf), HiDPI aware. */
public final class Themes {
    private Themes() {
    }

    /**
     * Installs a theme and refreshes the open windows.
     * @param dark true for the dark theme
     * @param windows windows to refresh
     */
    public static void apply(boolean dark, Window... windows) {
        if (dark) {
            FlatDarkLaf.setup();
        } else {
            FlatLightLaf.setup();
        }
        for (Window w : windows) {
            SwingUtilities.updateComponentTreeUI(w);
        }
    }

    /**
     * The colour of a problem's words in the current theme: a dark red on light grounds, a light
     * red on dark ones (the dark red was hard to read on the dark theme). Read it when the words
     * are shown, so a theme change applies from the next message on.
     * @return the colour
     */
    public static Color problemColour() {
        return FlatLaf.isLafDark() ? new Color(0xff, 0x8a, 0x7d) : new Color(0xb0, 0x2a, 0x1e);
    }

    /**
     * The colour of a verdict that passes, in the current theme (a dark green on light grounds, a
     * light green on dark ones). Never the only sign: the words say pass or fail too.
     * @return the colour
     */
    public static Color passColour() {
        return FlatLaf.isLafDark() ? new Color(0x8c, 0xd9, 0x8c) : new Color(0x1e, 0x6e, 0x2a);
    }
}
