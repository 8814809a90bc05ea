package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.OptionalDouble;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.counterpoise.io.project.MeasuredSource;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.ProjectWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A structure identified from a measurement says so on every output (issue 15): the text report, the
 * JSON (SI numbers) and the sheet; a typed structure says nothing of it (the goldens hold that).
 */
class MeasuredStructureOutputTest {

    @Test
    void everyOutputSaysTheStructureWasMeasured(@TempDir Path dir) throws Exception {
        Project pump = ProjectReader.read(Path.of("presets/pump-skid-mezzanine.json")).project();
        MeasuredSource source = new MeasuredSource("least_squares", "skid impact.csv", "2026-12-04",
                OptionalDouble.of(0.0123), OptionalDouble.of(2 * Math.PI * 0.011), OptionalDouble.of(0.0004),
                OptionalDouble.of(41.0));
        Path file = dir.resolve("measured.json");
        ProjectWriter.save(pump.withStructure(pump.structure().withMeasured(source)), file);

        CliTest.Run text = CliTest.run("design", file.toString());
        assertEquals(0, text.code(), text.err());
        assertTrue(text.out().contains("structure data from a measurement"), text.out());
        assertTrue(text.out().contains("least-squares fit of the FRF"), text.out());
        assertTrue(text.out().contains("skid impact.csv"), text.out());
        // 0.0123 as a percentage to 2 figures; 41 kg to 2 figures
        assertTrue(text.out().contains("1.2 %"), text.out());
        assertTrue(text.out().contains("41 kg"), text.out());

        CliTest.Run json = CliTest.run("design", "--json", file.toString());
        assertEquals(0, json.code(), json.err());
        JsonObject m = JsonParser.parseString(json.out()).getAsJsonObject().getAsJsonObject("structure_measured");
        assertEquals("least_squares", m.get("method_id").getAsString());
        assertEquals("skid impact.csv", m.get("file").getAsString());
        assertEquals("2026-12-04", m.get("date").getAsString());
        assertEquals(0.0123, m.get("normalised_residual").getAsDouble(), 1e-15);
        assertEquals(0.011, m.get("natural_frequency_sd_Hz").getAsDouble(), 1e-12);
        assertEquals(0.0004, m.get("damping_ratio_sd").getAsDouble(), 1e-15);
        assertEquals(41.0, m.get("modal_mass_sd_kg").getAsDouble(), 1e-12);

        Path pdf = dir.resolve("sheet.pdf");
        CliTest.Run sheet = CliTest.run("sheet", file.toString(), "-o", pdf.toString());
        assertEquals(0, sheet.code(), sheet.err());
        try (PDDocument doc = Loader.loadPDF(Files.readAllBytes(pdf))) {
            String printed = new PDFTextStripper().getText(doc).replace('\u00a0', ' ').replaceAll("\\s+", " ");
            assertTrue(printed.contains("Structure data from a measurement"), "the sheet names the source");
            assertTrue(printed.contains("skid impact.csv"), "the sheet names the file");
        }

        CliTest.Run typed = CliTest.run("design", "presets/pump-skid-mezzanine.json");
        assertFalse(typed.out().contains("structure data from a measurement"), typed.out());
    }
}
