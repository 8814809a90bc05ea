package org.counterpoise.ui.gui.field;

import java.awt.Dimension;

/**
 * Component sizes in pixels. The steps also use the physical {@code core.units.Dimension}; they
 * take pixel sizes from here, so neither of the two Dimension types has to be written with its
 * full package name.
 */
public final class Sizes {
    private Sizes() {
    }

    /**
     * @param width width in pixels
     * @param height height in pixels
     * @return a new size (Swing keeps the object it is given, so each call makes its own)
     */
    public static Dimension of(int width, int height) {
        return new Dimension(width, height);
    }
}
