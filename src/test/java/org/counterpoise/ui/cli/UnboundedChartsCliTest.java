package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An undamped structure excited exactly at its natural frequency has an unbounded response there
 * (receptance 1 / (k - m w^2), common practice). The sheet, its plots and its CSV must still be
 * written (exit 0), with the unbounded value stated in words, never as NaN or Infinity.
 */
class UnboundedChartsCliTest {
    private static final String PROJECT = "src/test/resources/org/counterpoise/io/chart/undamped-at-resonance.json";

    @Test
    void sheetPlotsAndCsvOfAnUndampedResonanceAreWrittenWithTheirNote(@TempDir Path dir) throws Exception {
        Path pdf = dir.resolve("sheet.pdf");
        CliTest.Run run = CliTest.run("sheet", PROJECT, "-o", pdf.toString(), "--plots",
                dir.resolve("plots").toString(), "--csv", dir.resolve("csv").toString());
        assertEquals(0, run.code(), run.err());
        assertFalse(run.err().contains("bug"), run.err());
        String text;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            text = new PDFTextStripper().getText(doc);
        }
        assertTrue(text.contains("Note: without absorber: unbounded at 14.20 Hz"), text);
        assertFalse(text.contains("Infinity") || text.contains("NaN"));
        for (String f : List.of("response.png", "response.svg", "stroke.png", "stroke.svg")) {
            assertTrue(Files.size(dir.resolve("plots").resolve(f)) > 1000, f);
        }
        String svg = Files.readString(dir.resolve("plots").resolve("response.svg"));
        assertFalse(svg.contains("Infinity") || svg.contains("NaN"), "the SVG holds no non-finite coordinate");
        List<String> csv = Files.readAllLines(dir.resolve("csv").resolve("curves.csv"));
        assertTrue(csv.get(0).endsWith(",status"));
        assertTrue(csv.stream().anyMatch(l -> l.contains(",,") && l.endsWith(",unbounded:without_absorber")),
                "the unbounded value is an empty field, named in the status");
        assertTrue(csv.stream().noneMatch(l -> l.contains("NaN") || l.contains("Infinity")));
    }
}
