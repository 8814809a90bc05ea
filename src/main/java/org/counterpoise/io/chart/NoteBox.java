package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.util.List;
import org.knowm.xchart.internal.chartpart.Annotation;

/**
 * A boxed note on a chart, its lower left corner at a point given in data units: the chart's
 * notes ("unbounded at 14.20 Hz"). It draws its own text on a copy of the graphics, because the
 * chart library's text box left the PDF bridge unable to draw the legend's line samples.
 */
final class NoteBox extends Annotation {
    private static final int PAD = 5;
    private final List<String> lines;
    private final double x;
    private final double y;
    private final Color ground;
    private final Color ink;
    private final Font font = new Font(Font.SANS_SERIF, Font.PLAIN, 10);

    NoteBox(List<String> lines, double x, double y, Color ground, Color ink) {
        super(true);
        this.lines = List.copyOf(lines);
        this.x = x;
        this.y = y;
        this.ground = ground;
        this.ink = ink;
    }

    @Override
    public void paint(Graphics2D graphics) {
        if (!isVisible || lines.isEmpty()) {
            return;
        }
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setFont(font);
            FontMetrics m = g.getFontMetrics();
            int width = 0;
            for (String line : lines) {
                width = Math.max(width, m.stringWidth(line));
            }
            int height = lines.size() * m.getHeight() + 2 * PAD;
            width += 2 * PAD;
            int left = Math.max(1, Math.min(getXAxisScreenValue(x), chart.getWidth() - width - 1));
            int top = Math.max(1, getYAxisScreenValue(y) - height);
            g.setColor(ground);
            g.fillRect(left, top, width, height);
            g.setColor(ink);
            g.setStroke(new BasicStroke(1f));
            g.drawRect(left, top, width, height);
            int baseline = top + PAD + m.getAscent();
            for (String line : lines) {
                g.drawString(line, left + PAD, baseline);
                baseline += m.getHeight();
            }
        } finally {
            g.dispose();
        }
    }
}
