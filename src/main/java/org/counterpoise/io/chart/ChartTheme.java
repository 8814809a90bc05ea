package org.counterpoise.io.chart;

import java.awt.Color;

/**
 * The colours of a chart, passed to the chart builders as data, so the same chart can be drawn for
 * paper (light, the sheet and the exported files) and on a dark screen (the wizard's dark look).
 *
 * @param background the chart's ground around the plot
 * @param plot the plot area
 * @param grid grid lines
 * @param border plot and legend borders
 * @param text titles, tick labels, legend text
 * @param before the curve without the absorber
 * @param after the curve with the absorber (and this design in robustness charts)
 * @param stroke the absorber stroke curve
 * @param band the forcing band's edges and label
 * @param alternative the robust design
 * @param alarm target lines, and notes of values off the chart
 * @param fill the histogram's bars
 * @param heat the heat map's colour scale, low to high
 */
public record ChartTheme(Color background, Color plot, Color grid, Color border, Color text, Color before,
        Color after, Color stroke, Color band, Color alternative, Color alarm, Color fill, Color[] heat) {

    /** For paper and for the light look: white ground, dark ink. */
    public static final ChartTheme LIGHT = new ChartTheme(Color.WHITE, Color.WHITE, new Color(0xe6, 0xe8, 0xeb),
            new Color(0xc8, 0xcc, 0xd2), new Color(0x1d, 0x23, 0x2b), new Color(0x8a, 0x8f, 0x98),
            new Color(0x0b, 0x6e, 0x69), new Color(0xb3, 0x5c, 0x1e), new Color(0xc9, 0x8f, 0x00),
            new Color(0x6a, 0x3d, 0x9a), new Color(0xb0, 0x2a, 0x1e), new Color(0x0b, 0x6e, 0x69, 0x88),
            new Color[] {new Color(0x1b, 0x7f, 0x79), new Color(0xe9, 0xd8, 0x5a), new Color(0xb0, 0x2a, 0x1e)});

    /**
     * For the dark look: the ground of FlatLaf's dark panels, light ink, and curve colours lifted
     * so that they keep their contrast on it.
     */
    public static final ChartTheme DARK = new ChartTheme(new Color(0x3c, 0x3f, 0x41), new Color(0x2b, 0x2d, 0x30),
            new Color(0x45, 0x49, 0x4e), new Color(0x5e, 0x63, 0x69), new Color(0xdf, 0xe1, 0xe5),
            new Color(0x9a, 0xa0, 0xa8), new Color(0x3f, 0xc1, 0xb7), new Color(0xf0, 0x8a, 0x4b),
            new Color(0xe6, 0xb4, 0x22), new Color(0xb3, 0x92, 0xf0), new Color(0xff, 0x6b, 0x5e),
            new Color(0x3f, 0xc1, 0xb7, 0x88),
            new Color[] {new Color(0x1b, 0x7f, 0x79), new Color(0xe9, 0xd8, 0x5a), new Color(0xe0, 0x4a, 0x3c)});

    /** Defensive copy of the colour scale. */
    public ChartTheme {
        heat = heat.clone();
    }

    @Override
    public Color[] heat() {
        return heat.clone();
    }

    /** @return true for the dark theme's ground */
    public boolean dark() {
        return (background.getRed() + background.getGreen() + background.getBlue()) < 3 * 128;
    }
}
