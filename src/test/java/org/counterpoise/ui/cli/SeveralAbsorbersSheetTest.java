package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.ValueText;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The sheet of a project with several absorbers, written by the {@code sheet} command and read back
 * with PDFBox's text extraction: every absorber to build is on it with the figures of the design
 * ({@link SeveralAbsorbersDesigner}, the same numbers as {@code design} reports) to the printed
 * precision, each with its own parts and tuning step; the pages render (PNGs kept under
 * target/sheets to look at).
 */
class SeveralAbsorbersSheetTest {

    @ParameterizedTest
    @ValueSource(strings = {"gallery-floor-two-modes", "split-mass-test-rig"})
    void theSheetListsEveryAbsorberToBuildWithTheDesignsFigures(String name) throws IOException {
        Path preset = Path.of("presets", name + ".json");
        LoadedProject loaded = ProjectReader.read(preset);
        DesignResult design = DesignDossier.of(loaded.project().toStudy()).design();
        SeveralAbsorbers set = SeveralAbsorbersDesigner.design(design, SeveralModes.layout(loaded.project())
                .orElseThrow());
        AbsorbersToBuild build = AbsorbersToBuild.of(design, set);
        Path out = Path.of("target", "sheets");
        Files.createDirectories(out);
        Path pdf = out.resolve(name + "-several.pdf");
        StringWriter err = new StringWriter();
        int code = Cli.run(new String[] {"sheet", preset.toString(), "-o", pdf.toString(), "--date", "2026-12-05",
            "--revision", "C", "--force"}, new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(0, code, err.toString());

        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String text = new PDFTextStripper().getText(doc).replace('\u00a0', ' ');
            Files.writeString(out.resolve(name + "-several.txt"), text);
            String flowing = text.replaceAll("\\s+", " "); // a sentence wrapped across lines reads as one
            int n = set.absorbers().size();
            List<String> expected = new ArrayList<>(List.of("Absorbers to build", "revision C", "2026-12-05",
                    "Several absorbers and modes", "(one absorber of the total mass, for comparison)",
                    "Retain the absorber mass fail-safe", "Local codes, standards and licensed engineering practice govern"));
            for (int j = 0; j < n; j++) {
                PointAbsorber a = set.absorbers().get(j);
                expected.add("Absorber " + (j + 1) + " of " + n + ": its own parts");
                expected.add("Absorber " + (j + 1) + " of " + n + " \u00b7 Part list");
                expected.add("Absorber " + (j + 1) + " of " + n + " \u00b7 Its own tuning");
                expected.add(printed(a.frequency(), Unit.HERTZ));
                expected.add(printed(a.mass(), Unit.KILOGRAM));
                expected.add(printed(a.stiffness(), Unit.KILONEWTON_PER_METRE));
                expected.add(printed(a.damping(), Unit.NEWTON_SECOND_PER_METRE));
                expected.add(QuantityFormat.number(a.damping() / (2 * a.mass() * a.frequency()), QuantityFormat.FIGURES));
                expected.add(ValueText.tolerance(build.absorbers().get(j).toleranceInSet(), 1));
            }
            for (String e : expected) {
                assertTrue(flowing.contains(e), name + ": the sheet lacks \"" + e + "\"");
            }
            for (String never : List.of("NaN", "Infinity", "the sheet and the wizard do not",
                    "'design' reports the several absorbers", "Exception")) {
                assertFalse(flowing.contains(never), name + ": the sheet says \"" + never + "\"");
            }
            PDFRenderer renderer = new PDFRenderer(doc);
            for (int i = 0; i < doc.getNumberOfPages(); i++) {
                BufferedImage image = renderer.renderImageWithDPI(i, 60);
                ImageIO.write(image, "png", out.resolve(name + "-several-page-" + (i + 1) + ".png").toFile());
            }
            // the design's own pages (2 to 8, SheetTest) plus the table and one part of a page or more per absorber
            assertTrue(doc.getNumberOfPages() >= 3 + n && doc.getNumberOfPages() <= 10 + 2 * n,
                    name + ": pages " + doc.getNumberOfPages());
        }
    }

    private static String printed(double si, Unit unit) {
        return QuantityFormat.number(unit.fromSi(si), QuantityFormat.FIGURES);
    }

    /**
     * With elastomer hardware the set's absorbers get no parts (an element's own optimum would replace the
     * set's tuning) and each absorber's page says so in plain words; the sheet is still written.
     */
    @Test
    void anElastomerSetSaysWhyItsAbsorbersHaveNoParts(@TempDir Path dir) throws IOException {
        String json = Files.readString(Path.of("presets", "split-mass-test-rig.json"));
        JsonObject o = JsonParser.parseString(json).getAsJsonObject();
        o.add("hardware", JsonParser.parseString("{\"spring\": \"elastomer\", \"spring_count\": 0,"
                + " \"damper\": \"elastomer-loss\", \"elastomer\": {\"dynamic_to_static_ratio\": 1.3,"
                + " \"loss_factor\": 0.2}}"));
        Path project = dir.resolve("rig-elastomer.json");
        Files.writeString(project, o.toString());
        Path pdf = dir.resolve("rig-elastomer.pdf");
        StringWriter err = new StringWriter();
        int code = Cli.run(new String[] {"sheet", project.toString(), "-o", pdf.toString(), "--force"},
                new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(0, code, err.toString());
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String flowing = new PDFTextStripper().getText(doc).replace('\u00a0', ' ').replaceAll("\\s+", " ");
            assertTrue(flowing.contains("An elastomer element is not sized for an absorber of a set"), flowing);
            assertFalse(flowing.contains("Absorber 1 of 3 \u00b7 Part list"), "no parts for an elastomer set");
        }
    }
}
