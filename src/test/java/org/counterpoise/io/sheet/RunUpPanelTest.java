package org.counterpoise.io.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.RunUpStudy;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.junit.jupiter.api.Test;

/**
 * The sheet's run-up page: without a rate it says so and how to get one (no default rate); with
 * one, its table carries the core's peaks and the speeds at which they occur, and the PDF prints
 * the page with both charts.
 */
class RunUpPanelTest {
    private static final Path FAN = Path.of("presets/rooftop-fan-platform.json");

    @Test
    void withoutARateThePageSaysHowToGetOne() {
        LoadedProject loaded = ProjectReader.read(FAN);
        DesignDossier dossier = DesignDossier.of(loaded.project().toStudy());
        SheetPanel panel = RunUpPanel.of(loaded.project(), dossier.design(), ProgressListener.NONE);
        assertEquals(RunUpPanel.TITLE, panel.title());
        assertTrue(panel.table().isEmpty() && panel.charts().isEmpty());
        assertEquals(1, panel.sentences().size());
        assertTrue(panel.sentences().get(0).contains("not computed")
                && panel.sentences().get(0).contains("disturbance.run_up_rate"), panel.sentences().get(0));
    }

    @Test
    void withARateTheTableCarriesThePeaksAndTheSheetPrintsThePage() throws Exception {
        Project p = ProjectReader.read(FAN).project();
        Project rated = new Project(p.name(), p.notes(), p.structure(),
                p.disturbance().withRunUpRate(new QuantityInput(200, Unit.RPM_PER_SECOND)), p.absorber(),
                p.robustness(), p.identity());
        DesignDossier dossier = DesignDossier.of(rated.toStudy());
        SheetPanel panel = RunUpPanel.of(rated, dossier.design(), ProgressListener.NONE);
        assertEquals(2, panel.charts().size());
        // rows: head, 5 peaks, blank, head, 5 steady peaks
        assertEquals(13, panel.table().size());
        var rerun = RunUpStudy.runUp(dossier.design(), 1.0,
                Unit.RPM_PER_SECOND.toSi(200)).run(ProgressListener.NONE);
        var stroke = rerun.data().comparison().withAbsorber().peak(ResponseKind.STROKE).orElseThrow();
        List<String> strokeRow = panel.table().get(4);
        assertEquals("absorber stroke", strokeRow.get(0));
        assertEquals(DisplayUnits.format(stroke.value(), ResponseKind.STROKE.dimension()) + " at "
                + QuantityFormat.format(stroke.speed(), Unit.REV_PER_MINUTE), strokeRow.get(1));
        assertEquals("-", strokeRow.get(2), "no stroke without the absorber");
        ByteArrayOutputStream pdf = new ByteArrayOutputStream();
        SheetFiles.writeSheet(dossier, "", "2026-12-03", "A", ProjectIdentity.EMPTY, List.of(panel), pdf);
        try (PDDocument doc = Loader.loadPDF(pdf.toByteArray())) {
            String text = new PDFTextStripper().getText(doc).replace('\u00a0', ' ');
            assertTrue(text.contains("Run-up through resonance"), text);
            assertTrue(text.contains(strokeRow.get(1)), "the stroke row is printed");
        }
    }
}
