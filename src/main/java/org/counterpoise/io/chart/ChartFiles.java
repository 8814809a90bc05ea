package org.counterpoise.io.chart;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.VectorGraphicsEncoder;
import org.knowm.xchart.XYChart;

/** Writes charts as PNG (at 2x for sharp prints) and SVG. Works headless. */
public final class ChartFiles {
    private ChartFiles() {
    }

    /**
     * @param chart the chart
     * @param file the PNG file to write
     * @throws IOException when it cannot be written
     */
    public static void png(XYChart chart, Path file) throws IOException {
        Path temp = Files.createTempFile(file.toAbsolutePath().getParent(), ".chart", ".png");
        try {
            BitmapEncoder.saveBitmapWithDPI(chart, temp.toString(), BitmapEncoder.BitmapFormat.PNG, 192);
            Files.move(temp, file, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    /**
     * @param chart the chart
     * @param file the SVG file to write
     * @throws IOException when it cannot be written
     */
    public static void svg(XYChart chart, Path file) throws IOException {
        Path temp = Files.createTempFile(file.toAbsolutePath().getParent(), ".chart", ".svg");
        try (var out = Files.newOutputStream(temp)) {
            VectorGraphicsEncoder.saveVectorGraphic(chart, out, VectorGraphicsEncoder.VectorGraphicsFormat.SVG);
        }
        try {
            Files.move(temp, file, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(temp);
        }
    }
}
