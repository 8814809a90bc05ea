package org.counterpoise.io.chart;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;
import javax.imageio.stream.MemoryCacheImageOutputStream;
import org.knowm.xchart.VectorGraphicsEncoder;
import org.knowm.xchart.XYChart;

/** Encodes charts as PNG (drawn at twice the size, for sharp prints) and SVG. Works headless. */
public final class ChartFiles {
    private static final int SCALE = 2;

    private ChartFiles() {
    }

    /**
     * @param chart the chart
     * @param out where the PNG goes
     * @throws IOException when it cannot be written
     */
    public static void png(XYChart chart, OutputStream out) throws IOException {
        BufferedImage image = new BufferedImage(chart.getWidth() * SCALE, chart.getHeight() * SCALE,
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.scale(SCALE, SCALE);
            chart.paint(g, chart.getWidth(), chart.getHeight());
        } finally {
            g.dispose();
        }
        // In memory, not ImageIO's default file cache: that would be one more temporary file (in
        // the system's temp folder) for a kill to leave behind.
        ImageWriter writer = ImageIO.getImageWritersByFormatName("png").next();
        try (ImageOutputStream stream = new MemoryCacheImageOutputStream(out)) {
            writer.setOutput(stream);
            writer.write(image);
        } finally {
            writer.dispose();
        }
    }

    /**
     * @param chart the chart
     * @param out where the SVG goes
     * @throws IOException when it cannot be written
     */
    public static void svg(XYChart chart, OutputStream out) throws IOException {
        VectorGraphicsEncoder.saveVectorGraphic(chart, out, VectorGraphicsEncoder.VectorGraphicsFormat.SVG);
    }
}
