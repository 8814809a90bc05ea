package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.atomic.AtomicInteger;
import javax.swing.SwingUtilities;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.robust.MonteCarloOutcome;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.ui.gui.Edt;
import org.counterpoise.ui.gui.task.TaskRunner;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * One project state, everything the wizard shows and saves of it: the robustness study, the sheet
 * preview and the saved sheet together run the Monte Carlo once, and no analysis runs on the event
 * thread (counted through the dossier's computation seam; no timing).
 */
class SheetStepDossierGuiTest {
    private final AtomicInteger designs = new AtomicInteger();
    private final AtomicInteger monteCarlos = new AtomicInteger();
    private final AtomicInteger studies = new AtomicInteger();
    private final List<String> onEventThread = new CopyOnWriteArrayList<>();
    private final List<String> said = new CopyOnWriteArrayList<>();

    @BeforeAll
    static void display() {
        Edt.requireDisplay(SheetStepDossierGuiTest.class);
    }

    /** The core's analyses, counted, with a note of any that ran on the event thread. */
    private final DesignDossier.Computations counting = new DesignDossier.Computations() {
        @Override
        public DesignResult design(DesignStudy study) {
            note("design");
            designs.incrementAndGet();
            return DesignDossier.Computations.CORE.design(study);
        }

        @Override
        public DesignCurves curves(DesignResult design) {
            note("curves");
            return DesignDossier.Computations.CORE.curves(design);
        }

        @Override
        public MonteCarloOutcome monteCarlo(DesignResult design, ProgressListener listener) {
            note("Monte Carlo");
            monteCarlos.incrementAndGet();
            return DesignDossier.Computations.CORE.monteCarlo(design, listener);
        }

        @Override
        public RobustnessResult robustness(DesignResult design, MonteCarloOutcome monteCarlo,
                ProgressListener listener) {
            note("robustness");
            studies.incrementAndGet();
            return DesignDossier.Computations.CORE.robustness(design, monteCarlo, listener);
        }

        private void note(String what) {
            if (SwingUtilities.isEventDispatchThread()) {
                onEventThread.add(what);
            }
        }
    };

    @Test
    void theRobustnessStepThePreviewAndTheSavedSheetShareOneMonteCarloRun(@TempDir Path dir) throws Exception {
        Project project = ProjectReader.read(Path.of("presets", "rooftop-fan-platform.json")).project();
        DesignDossier.Cache cache = new DesignDossier.Cache(counting);
        TaskRunner tasks = new TaskRunner(() -> 0L, null);
        Path pdf = dir.resolve("sheet.pdf");
        AtomicInteger robustnessShown = new AtomicInteger();
        SheetStep sheet = Edt.call(() -> new SheetStep(tasks, said::add));
        Edt.call(() -> {
            // as the wizard does for one state: the design's dossier, then the robustness study,
            // the preview and a save, all started at once
            DesignDossier d = cache.dossier(project.toStudy());
            tasks.current("Robustness study and Monte Carlo", p -> d.robustness(p),
                    r -> robustnessShown.incrementAndGet(), e -> said.add("failed: " + e));
            sheet.show(cache.dossier(project.toStudy()), project);
            sheet.shown();
            sheet.writeSheet(pdf);
            return null;
        });
        Edt.waitFor(() -> Edt.callQuietly(sheet::previewShown), "the sheet preview");
        Edt.waitFor(() -> robustnessShown.get() == 1, "the robustness study");
        Edt.waitFor(() -> said.stream().anyMatch(s -> s.startsWith("Saved the sheet")), "the saved sheet: " + said);
        assertTrue(Files.size(pdf) > 10_000, "a whole sheet was written");
        assertEquals(1, monteCarlos.get(), "one Monte Carlo run for one project state");
        assertEquals(1, designs.get());
        assertEquals(1, studies.get());
        assertEquals(List.of(), onEventThread, "analyses that ran on the event thread");
    }
}
