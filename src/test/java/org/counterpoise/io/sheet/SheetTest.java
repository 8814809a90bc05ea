package org.counterpoise.io.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.text.QuantityFormat;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The PDF sheet of every preset, read back with PDFBox's text extraction (the printed absorber
 * parameters and responses equal the design result to the printed precision) and rendered page by
 * page (it must render; the PNGs are kept under target/sheets to look at).
 */
class SheetTest {

    static Stream<Path> presets() throws IOException {
        return Files.list(Path.of("presets")).filter(p -> p.toString().endsWith(".json")).sorted();
    }

    @ParameterizedTest
    @MethodSource("presets")
    void sheetPrintsTheDesignNumbersAndRenders(Path preset) throws IOException {
        LoadedProject loaded = ProjectReader.read(preset);
        DesignDossier dossier = DesignDossier.of(loaded.project().toStudy());
        DesignResult r = dossier.design();
        Path out = Path.of("target", "sheets");
        Files.createDirectories(out);
        String name = preset.getFileName().toString().replace(".json", "");
        Path pdf = out.resolve(name + ".pdf");
        SheetFiles.writeSheet(dossier, loaded.project().notes(), pdf, "2026-12-02", "B", true, "-o");

        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String text = new PDFTextStripper().getText(doc).replace('\u00a0', ' ');
            for (String expected : List.of(
                    printed(r.absorber().mass(), Unit.KILOGRAM) + " kg",
                    printed(r.absorber().stiffness(), Unit.KILONEWTON_PER_METRE) + " kN/m",
                    printed(r.absorber().damping(), Unit.NEWTON_SECOND_PER_METRE) + " N\u00b7s/m",
                    printed(r.clearance(), Unit.MILLIMETRE) + " mm",
                    printed(r.springForce().value(), Unit.NEWTON) + " N",
                    printed(r.absorber().naturalFrequency(), Unit.HERTZ) + " Hz",
                    QuantityFormat.number(r.tuning().massRatio(), 4),
                    "revision B", "2026-12-02", "1 of", "Retain the absorber mass fail-safe",
                    "Local codes, standards and licensed engineering practice govern")) {
                assertTrue(text.contains(expected), "sheet lacks \"" + expected + "\"");
            }
            assertTrue(text.contains("Invented demo scenario"), "the preset's notes say it is invented");
            PDFRenderer renderer = new PDFRenderer(doc);
            for (int i = 0; i < doc.getNumberOfPages(); i++) {
                BufferedImage image = renderer.renderImageWithDPI(i, 60);
                assertTrue(image.getWidth() > 400 && image.getHeight() > 600);
                ImageIO.write(image, "png", out.resolve(name + "-page-" + (i + 1) + ".png").toFile());
            }
            // the verdict against the preset's criterion adds its table to the summary
            assertTrue(doc.getNumberOfPages() >= 2 && doc.getNumberOfPages() <= 8, "pages " + doc.getNumberOfPages());
        }
    }

    private static String printed(double si, Unit unit) {
        return QuantityFormat.number(unit.fromSi(si), QuantityFormat.FIGURES);
    }

    @org.junit.jupiter.api.Test
    void exportsRoundTripAndRefuseToOverwrite(@org.junit.jupiter.api.io.TempDir Path dir) throws IOException {
        DesignDossier dossier = DesignDossier.of(ProjectReader.readStudy(Path.of("presets/pump-skid-mezzanine.json")));
        DesignResult r = dossier.design();
        Path folder = dir.resolve("exports with spaces");
        List<Path> files = SheetFiles.writeExports(dossier, folder, false, "--csv");
        assertEquals(6, files.size());
        for (Path f : files) {
            assertTrue(Files.size(f) > 100, f.toString());
        }
        // CSV round trip: the curves read back equal the computed response at the same frequencies.
        var response = new org.counterpoise.core.response.SystemResponse(r.study().structure(), r.tuning(),
                r.study().excitation().kind(), r.study().excitation().amplitude());
        List<String> lines = Files.readAllLines(folder.resolve("curves.csv"));
        assertEquals("frequency_Hz,displacement_without_absorber_m,displacement_with_absorber_m,absorber_stroke_m,status",
                lines.get(0));
        for (String line : lines.subList(1, lines.size())) {
            String[] cells = line.split(",");
            double omega = Unit.HERTZ.toSi(Double.parseDouble(cells[0]));
            double after = response.amplitudeAt(r.study().response(), omega);
            assertEquals(after, Double.parseDouble(cells[2]), 1e-12 * after);
            double stroke = response.amplitudeAt(org.counterpoise.core.response.ResponseKind.STROKE, omega);
            assertEquals(stroke, Double.parseDouble(cells[3]), 1e-12 * stroke);
            assertEquals("ok", cells[4]);
        }
        var e = org.junit.jupiter.api.Assertions.assertThrows(
                org.counterpoise.core.error.InvalidInputException.class,
                () -> SheetFiles.writeExports(dossier, folder, false, "--csv"));
        assertTrue(e.getMessage().contains("already exists; add --force"), e.getMessage());
        SheetFiles.writeExports(dossier, folder, true, "--csv");
    }
}
