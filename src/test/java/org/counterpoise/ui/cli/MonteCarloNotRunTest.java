package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A project without tolerances: every sampled build would be the nominal design, so the Monte
 * Carlo is not run, and the JSON, the text report and the sheet each say so and why, instead of a
 * distribution of identical samples.
 */
class MonteCarloNotRunTest {
    private static final String NO_TOLERANCES = "presets/pump-skid-mezzanine.json";

    @Test
    void theOutputsSayPlainlyThatTheRunWasNotMadeAndWhy(@TempDir Path dir) throws Exception {
        CliTest.Run json = CliTest.run("robustness", NO_TOLERANCES, "--json", "--samples", "500");
        assertEquals(0, json.code(), json.err());
        JsonObject o = JsonParser.parseString(json.out()).getAsJsonObject();
        assertTrue(o.get("monte_carlo").isJsonNull(), json.out());
        assertEquals("no-tolerances", o.get("monte_carlo_not_run").getAsString());
        assertTrue(o.get("worst_case_peak").getAsDouble() > 0, "the rest of the study is there");

        CliTest.Run text = CliTest.run("robustness", NO_TOLERANCES);
        assertTrue(text.out().matches("(?s).*Tolerance Monte Carlo of the peak in band\n  not run +the project gives no"
                + " tolerances \\(robustness.tolerances\\), so every sampled build would be the nominal design\n.*"),
                text.out());
        assertFalse(text.out().contains("P50 / P90"), text.out());

        Path pdf = dir.resolve("sheet.pdf");
        CliTest.Run sheet = CliTest.run("sheet", NO_TOLERANCES, "-o", pdf.toString());
        assertEquals(0, sheet.code(), sheet.err());
        try (PDDocument doc = Loader.loadPDF(Files.readAllBytes(pdf))) {
            String printed = new PDFTextStripper().getText(doc).replace('\u00a0', ' ').replaceAll("\\s+", " ");
            assertTrue(printed.contains("Tolerance Monte Carlo of the peak in band"), printed);
            assertTrue(printed.contains("the project gives no tolerances"), printed);
        }

        // with tolerances the same commands print the distribution
        CliTest.Run with = CliTest.run("robustness", "presets/rooftop-fan-platform.json", "--json", "--samples", "300");
        JsonObject w = JsonParser.parseString(with.out()).getAsJsonObject();
        assertEquals(300, w.getAsJsonObject("monte_carlo").get("samples").getAsInt());
        assertFalse(w.has("monte_carlo_not_run"));
    }
}
