package org.counterpoise.ui.gui;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLightLaf;
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
}
