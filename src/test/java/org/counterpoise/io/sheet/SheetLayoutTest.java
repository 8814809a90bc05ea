package org.counterpoise.io.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.Realiser;
import org.counterpoise.core.realisation.SpringArrangement;
import org.counterpoise.core.realisation.SpringDesign;
import org.counterpoise.core.realisation.SpringMaterial;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.Revision;
import org.counterpoise.io.project.SignOff;
import org.counterpoise.io.project.Signature;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The sheet's layout read back from the PDF: on every page of every preset's sheet no two printed
 * glyphs' boxes overlap (PDFBox's text extraction gives each glyph's position and size), every page has
 * its title block with "k of n", and the identity, revisions and sign-off are printed as given.
 */
class SheetLayoutTest {
    private static final ProjectIdentity IDENTITY = new ProjectIdentity("C", "A. Engineer",
            "Invented client, test site", "2026-11-30", "CP-0042-S",
            List.of(new Revision("A", "2026-10-01", "first issue for comment", "A. Engineer"),
                    new Revision("B", "2026-11-02", "stroke stops added after review", "B. Checker")),
            new SignOff(new Signature("A. Engineer", "2026-11-30"), new Signature("B. Checker", ""), Signature.BLANK));

    static Stream<Path> presets() throws IOException {
        return Files.list(Path.of("presets")).filter(p -> p.toString().endsWith(".json")).sorted();
    }

    @ParameterizedTest
    @MethodSource("presets")
    void noTwoWordsOverlapOnAnyPage(Path preset) throws IOException {
        LoadedProject loaded = ProjectReader.read(preset);
        DesignDossier dossier = DesignDossier.of(loaded.project().toStudy());
        ByteArrayOutputStream pdf = new ByteArrayOutputStream();
        SheetFiles.writeSheet(dossier, loaded.project().notes(), "2026-11-30", "C", IDENTITY,
                List.of(RunUpPanel.of(loaded.project(), dossier.design(), ProgressListener.NONE)), pdf);
        try (PDDocument doc = Loader.loadPDF(pdf.toByteArray())) {
            int pages = doc.getNumberOfPages();
            for (int page = 1; page <= pages; page++) {
                assertNoOverlap(doc, page, preset.getFileName().toString());
                String text = pageText(doc, page);
                assertTrue(text.contains(page + " of " + pages), "page " + page + " has its number in the title block");
                assertTrue(text.contains("CP-0042-S") && text.contains("Invented client, test site"),
                        "page " + page + " has the document number and the client in the title block");
            }
        }
    }

    @Test
    void revisionsAndSignOffArePrintedAsGiven() throws IOException {
        LoadedProject loaded = ProjectReader.read(Path.of("presets", "pump-skid-mezzanine.json"));
        DesignDossier dossier = DesignDossier.of(loaded.project().toStudy());
        ByteArrayOutputStream pdf = new ByteArrayOutputStream();
        SheetFiles.writeSheet(dossier, "", "2026-11-30", "C", IDENTITY, pdf);
        try (PDDocument doc = Loader.loadPDF(pdf.toByteArray())) {
            String first = pageText(doc, 1);
            for (String expected : List.of("first issue for comment", "2026-10-01", "stroke stops added after review",
                    "B. Checker", "this issue", "prepared", "checked", "approved", "signature")) {
                assertTrue(first.contains(expected), "page 1 lacks \"" + expected + "\"");
            }
            // oldest first, then this issue
            assertTrue(first.indexOf("first issue for comment") < first.indexOf("stroke stops added")
                    && first.indexOf("stroke stops added") < first.indexOf("this issue"));
        }
    }

    @Test
    void theSketchFollowsTheDesign() throws IOException {
        for (String name : List.of("pump-skid-mezzanine", "bench-beside-compressor")) {
            LoadedProject loaded = ProjectReader.read(Path.of("presets", name + ".json"));
            DesignResult r = DesignDossier.of(loaded.project().toStudy()).design();
            SketchFigures si = SketchFigures.of(r, Optional.empty(), UnitSystem.SI);
            assertEquals(r.study().hangsVertically(), si.vertical());
            // the clearance the sketch dimensions is the design's (mm with three figures)
            assertEquals(QuantityFormat.number(r.clearance() * 1e3, 3) + " mm", si.clearance());
            assertEquals(QuantityFormat.number(r.absorber().mass(), 3) + " kg", si.mass());
            // 1 in = 25.4 mm and 1 lb = 0.45359237 kg exactly (international yard and pound, 1959)
            SketchFigures us = SketchFigures.of(r, Optional.empty(), UnitSystem.US_CUSTOMARY);
            assertEquals(QuantityFormat.number(r.clearance() / 0.0254, 3) + " in", us.clearance());
            assertEquals(QuantityFormat.number(r.absorber().mass() / 0.45359237, 3) + " lb", us.mass());
        }
    }

    @Test
    void theSketchWithSpringsOverlapsNothing() throws IOException {
        // springs built by hand (the spring sizing is another part's): seated and opposed pairs,
        // vertical and horizontal, SI and US customary; the dimensions and the legend must not collide
        for (String name : List.of("pump-skid-mezzanine", "bench-beside-compressor")) {
            LoadedProject loaded = ProjectReader.read(Path.of("presets", name + ".json"));
            DesignDossier dossier = DesignDossier.of(loaded.project().toStudy());
            DesignResult r = dossier.design();
            Realisation base = Realiser.realise(r, HardwareChoice.DEFAULT);
            for (SpringArrangement arrangement : SpringArrangement.values()) {
                for (UnitSystem units : UnitSystem.values()) {
                    int count = arrangement == SpringArrangement.SEATED ? 3 : 4;
                    SpringDesign spring = new SpringDesign(SpringMaterial.EN10270_1_DH, count, 0.006, 0.040, 6.5, 8.5,
                            0.0912, 0.051, 0.0843, r.absorber().stiffness() / count, r.absorber().stiffness(), 0.0,
                            120, 60, 1e8, List.of(), arrangement, 0, 0.004, 0.2);
                    Realisation realisation = new Realisation(base.choice(), Optional.of(spring), Optional.empty(),
                            base.damper(), base.tolerances(), base.trim(), base.procedure(), base.predicted(),
                            base.warnings());
                    SheetContent content = SheetContent.of(r, "", "2026-11-30", "C",
                            dossier.monteCarlo(ProgressListener.NONE), IDENTITY, dossier.comparison(ProgressListener.NONE),
                            AmplitudeConvention.PEAK, Optional.of(realisation), units, null);
                    SketchFigures sketch = content.sketch().orElseThrow();
                    assertEquals(arrangement == SpringArrangement.OPPOSED_PRELOADED_PAIRS, sketch.opposed());
                    assertEquals(SketchFigures.length(0.0912, units), sketch.freeLength().orElseThrow());
                    ByteArrayOutputStream pdf = new ByteArrayOutputStream();
                    SheetWriter.write(content, List.of(), pdf);
                    try (PDDocument doc = Loader.loadPDF(pdf.toByteArray())) {
                        for (int page = 1; page <= doc.getNumberOfPages(); page++) {
                            assertNoOverlap(doc, page, name + " " + arrangement + " " + units);
                        }
                    }
                }
            }
        }
    }

    @Test
    void theOverlapCheckSeesAnOverlap() throws IOException {
        // the negative control of the check above: two words printed over each other are found
        ByteArrayOutputStream pdf = new ByteArrayOutputStream();
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage(PDRectangle.A4);
            doc.addPage(page);
            SheetType type = new SheetType(doc);
            try (PDPageContentStream s = new PDPageContentStream(doc, page)) {
                type.show(s, "clearance", 100, 500, 9, Color.BLACK, false);
                type.show(s, "stroke", 120, 503, 9, Color.BLACK, false);
                type.show(s, "apart", 100, 300, 9, Color.BLACK, false);
            }
            doc.save(pdf);
        }
        try (PDDocument doc = Loader.loadPDF(pdf.toByteArray())) {
            List<Word> glyphs = words(doc, 1);
            assertEquals("clearance".length() + "stroke".length() + "apart".length(), glyphs.size());
            long overlapping = 0;
            for (Word a : glyphs) {
                for (Word b : glyphs) {
                    overlapping += a != b && a.overlaps(b) ? 1 : 0;
                }
            }
            assertTrue(overlapping > 0, "the words printed over each other overlap");
            List<Word> apart = glyphs.subList(glyphs.size() - "apart".length(), glyphs.size());
            for (Word a : apart) {
                assertTrue(glyphs.stream().noneMatch(b -> b != a && a.overlaps(b)), "\"apart\" overlaps nothing");
            }
        }
    }

    private static void assertNoOverlap(PDDocument doc, int page, String what) throws IOException {
        List<Word> glyphs = words(doc, page);
        for (int i = 0; i < glyphs.size(); i++) {
            Word a = glyphs.get(i);
            for (int j = i + 1; j < glyphs.size() && glyphs.get(j).top < a.bottom; j++) {
                Word b = glyphs.get(j);
                assertTrue(!a.overlaps(b), what + " page " + page + ": \"" + a.text + "\" at " + a + " overlaps \""
                        + b.text + "\" at " + b);
            }
        }
    }

    private static String pageText(PDDocument doc, int page) throws IOException {
        PDFTextStripper stripper = new PDFTextStripper();
        stripper.setStartPage(page);
        stripper.setEndPage(page);
        return stripper.getText(doc).replace('\u00a0', ' ');
    }

    /** Every printed glyph's box on a page, as text extraction sees it, sorted by its top. */
    private static List<Word> words(PDDocument doc, int page) throws IOException {
        List<Word> glyphs = new ArrayList<>();
        PDFTextStripper stripper = new PDFTextStripper() {
            @Override
            protected void processTextPosition(TextPosition p) {
                // glyph by glyph: the stripper's own words merge text printed over other text
                if (!p.getUnicode().isBlank()) {
                    glyphs.add(new Word(p.getUnicode(), p.getXDirAdj(), p.getXDirAdj() + p.getWidthDirAdj(),
                            p.getYDirAdj() - p.getHeightDir(), p.getYDirAdj()));
                }
            }
        };
        stripper.setStartPage(page);
        stripper.setEndPage(page);
        stripper.writeText(doc, new StringWriter());
        glyphs.sort((a, b) -> Float.compare(a.top, b.top));
        return glyphs;
    }

    /** A word's box on the page, points, y downwards (PDFBox's text coordinates). */
    private record Word(String text, float left, float right, float top, float bottom) {
        boolean overlaps(Word o) {
            // half a point of slack: glyph boxes of neighbouring lines may touch
            float slack = 0.5f;
            return left + slack < o.right && o.left + slack < right && top + slack < o.bottom && o.top + slack < bottom;
        }
    }
}
