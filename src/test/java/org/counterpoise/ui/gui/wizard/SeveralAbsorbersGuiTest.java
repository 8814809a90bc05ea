package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CopyOnWriteArrayList;
import javax.imageio.ImageIO;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JTabbedPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.Edt;
import org.counterpoise.ui.gui.plot.ChartHost;
import org.counterpoise.ui.gui.task.TaskRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * A project with several modes and absorbers in the wizard: the structure step shows the modes
 * (their editing: ModesEditingGuiTest), the result step's tab "Several absorbers" shows each absorber with the figures the
 * design computes (SeveralAbsorbersDesigner, computed here on the test thread), their tolerance
 * within the set, and the whole structure's response before and after, whose sampled peak in the
 * band is the exact peak to within the sampling; a project of one absorber says so and keeps nothing
 * of the last; saving and reopening keeps the absorbers. Screenshots go to target/gui. Same
 * skip/fail rule as the other wizard tests.
 */
class SeveralAbsorbersGuiTest {
    private static final Path SHOTS = Path.of("target", "gui");
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(SeveralAbsorbersGuiTest.class);
        Files.createDirectories(SHOTS);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(frame);
    }

    @Test
    void theAbsorbersAndTheModesAreShownAndSurviveSaveAndReopen(@TempDir Path dir) throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setSize(1400, 880);
            f.setVisible(true);
            return f;
        });
        settled("first design");
        LoadedProject gallery = Presets.load("gallery-floor-two-modes.json");
        load(gallery);
        DesignResult design = DesignDossier.of(gallery.project().toStudy()).design();
        SeveralAbsorbers set = SeveralAbsorbersDesigner.design(design, SeveralModes.layout(gallery.project())
                .orElseThrow());
        AbsorbersToBuild build = AbsorbersToBuild.of(design, set);
        JTable absorbers = onEdt(() -> (JTable) Edt.find(frame.getContentPane(), "result.several"));
        Edt.waitFor(() -> Edt.callQuietly(() -> absorbers.getRowCount() == 2), "the two absorbers");
        for (int j = 0; j < 2; j++) {
            PointAbsorber a = set.absorbers().get(j);
            String row = row(absorbers, j);
            for (String e : new String[] {printed(a.mass(), Unit.KILOGRAM) + " kg",
                printed(a.frequency(), Unit.HERTZ) + " Hz", printed(a.stiffness(), Unit.KILONEWTON_PER_METRE) + " kN/m",
                printed(a.damping(), Unit.NEWTON_SECOND_PER_METRE), "midspan",
                ValueText.tolerance(build.absorbers().get(j).toleranceInSet(), 1)}) {
                assertTrue(row.contains(e), "absorber " + (j + 1) + " row lacks " + e + ": " + row);
            }
        }
        // the curve after, sampled at 601 frequencies, peaks in the band at most at the exact peak and within 3 % of it
        XYChart chart = onEdt(() -> ((ChartHost) Edt.find(frame.getContentPane(), "chart.several")).chart());
        assertNotNull(chart);
        XYSeries after = chart.getSeriesMap().get("with 2 absorbers");
        double low = Unit.HERTZ.fromSi(set.band().low());
        double high = Unit.HERTZ.fromSi(set.band().high());
        double sampled = 0;
        double[] x = after.getXData();
        double[] y = after.getYData();
        for (int i = 0; i < x.length; i++) {
            if (x[i] >= low && x[i] <= high) {
                sampled = Math.max(sampled, Unit.MILLIMETRE.toSi(y[i]));
            }
        }
        assertTrue(sampled <= set.peakAfter() * (1 + 1e-9) && sampled > 0.97 * set.peakAfter(),
                sampled + " against " + set.peakAfter());
        // every named point has its chart, the response point first; choosing one shows its chart at once
        @SuppressWarnings("unchecked")
        JComboBox<String> point = onEdt(() -> (JComboBox<String>) Edt.find(frame.getContentPane(), "result.several.point"));
        assertEquals(List.of("midspan", "display"), onEdt(() -> List.of(point.getItemAt(0), point.getItemAt(1))));
        assertEquals(2, onEdt(point::getItemCount));
        assertNotNull(chart.getSeriesMap().get("mode bending, its part with absorbers"));
        onEdt(() -> {
            point.setSelectedItem("display");
            return null;
        });
        String title = onEdt(() -> ((ChartHost) Edt.find(frame.getContentPane(), "chart.several")).chart()
                .getYAxisTitle());
        assertTrue(title.contains("display"), title);
        String summary = onEdt(() -> ((JLabel) Edt.find(frame.getContentPane(), "result.several.summary")).getText());
        assertTrue(summary.contains("peak displacement over the band"), summary);
        onEdt(() -> {
            frame.showStep(4);
            JTabbedPane views = (JTabbedPane) Edt.find(frame.getContentPane(), "result.views");
            views.setSelectedIndex(views.indexOfTab("Several absorbers"));
            return null;
        });
        screenshot("several-absorbers");

        // the structure step: the modes, as the file gives them (edited in ModesEditingGuiTest)
        JTable modes = onEdt(() -> (JTable) Edt.find(frame.getContentPane(), "structure.modes"));
        assertEquals(2, onEdt(modes::getRowCount));
        assertEquals("bending", onEdt(() -> modes.getValueAt(0, 0)));
        assertEquals("twisting", onEdt(() -> modes.getValueAt(1, 0)));
        assertTrue(String.valueOf(onEdt(() -> modes.getValueAt(1, 1))).contains("9.1"), "9.1 Hz");
        // the greyed single-mode fields show the target mode at the absorbers' point (the bending mode,
        // 18 t with shape value 1 at mid-span: 18 000 kg at 8.2 Hz), not a project shown before
        String massShown = onEdt(() -> ((JTextField) Edt.find(frame.getContentPane(), "structure.mass")).getText());
        String frequencyShown = onEdt(() -> ((JTextField) Edt.find(frame.getContentPane(), "structure.stiffness"))
                .getText());
        assertEquals(18000.0, Double.parseDouble(massShown.replace(",", "").replace(" ", "")), 1e-6, massShown);
        assertEquals(8.2, Double.parseDouble(frequencyShown.replace(",", "").replace(" ", "")), 1e-9, frequencyShown);
        onEdt(() -> {
            frame.showStep(0);
            return null;
        });
        screenshot("several-modes-structure");

        // a project of one absorber: nothing of the last is left on the tab
        load(Presets.load("blower-frame-single-speed.json"));
        Edt.waitFor(() -> Edt.callQuietly(() -> absorbers.getRowCount() == 0), "no absorbers of the last project");
        assertEquals(SeveralAbsorbersView.NONE, onEdt(() -> ((JLabel) Edt.find(frame.getContentPane(),
                "result.several.summary")).getText()));
        assertTrue(onEdt(() -> !modes.isShowing()), "no modes table for one mode");

        // saved and reopened, the absorbers are the same
        load(gallery);
        Edt.waitFor(() -> Edt.callQuietly(() -> absorbers.getRowCount() == 2), "the absorbers again");
        Path file = dir.resolve("gallery.json");
        onEdt(() -> {
            frame.saveTo(file);
            return null;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> !frame.dirty() && Files.exists(file)), "saved");
        LoadedProject reopened = ProjectReader.read(file);
        assertEquals(gallery.project().absorbers(), reopened.project().absorbers());
        assertEquals(gallery.project().modes(), reopened.project().modes());
        String first = row(absorbers, 0);
        load(reopened);
        try {
            Edt.waitFor(() -> Edt.callQuietly(() -> absorbers.getRowCount() == 2), "the reopened absorbers");
        } catch (AssertionError e) {
            throw new AssertionError(onEdt(() -> ((JLabel) Edt.find(frame.getContentPane(),
                    "result.several.summary")).getText()) + " / " + onEdt(frame::statusText), e);
        }
        assertEquals(first, row(absorbers, 0));
    }

    @Test
    void theSheetSavedFromTheWizardListsEveryAbsorberToBuild(@TempDir Path dir) throws Exception {
        Project project = ProjectReader.read(Path.of("presets", "split-mass-test-rig.json")).project();
        TaskRunner tasks = new TaskRunner(() -> 0L, null);
        List<String> said = new CopyOnWriteArrayList<>();
        Path pdf = dir.resolve("rig.pdf");
        SheetStep sheet = Edt.call(() -> new SheetStep(tasks, said::add));
        Edt.call(() -> {
            sheet.show(DesignDossier.of(project.toStudy()), project);
            sheet.writeSheet(pdf);
            return null;
        });
        Edt.waitFor(() -> said.stream().anyMatch(m -> m.startsWith("Saved the sheet")), "the saved sheet: " + said);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            for (String e : List.of("Absorbers to build", "Absorber 1 of 3: its own parts",
                    "Absorber 3 of 3: its own parts", "This project has several absorbers: every absorber to build")) {
                assertTrue(text.contains(e), "the wizard's sheet lacks " + e);
            }
        }
    }

    /** One absorber per mode (format 7, the invented frame): the tab names each absorber's point and the sequential peak. */
    @Test
    void oneAbsorberPerModeIsShownWithEachPointAndTheSequentialPeak() throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setSize(1400, 880);
            f.setVisible(true);
            return f;
        });
        settled("first design");
        LoadedProject project = Presets.load("frame-bending-and-twisting.json");
        load(project);
        SeveralAbsorbers set = SeveralAbsorbersDesigner.design(DesignDossier.of(project.project().toStudy()).design(),
                SeveralModes.layout(project.project()).orElseThrow());
        JTable absorbers = onEdt(() -> (JTable) Edt.find(frame.getContentPane(), "result.several"));
        Edt.waitFor(() -> Edt.callQuietly(() -> absorbers.getRowCount() == 2), "the two absorbers");
        assertTrue(row(absorbers, 0).contains("midspan"), row(absorbers, 0));
        assertTrue(row(absorbers, 1).contains("corner"), row(absorbers, 1));
        String summary = onEdt(() -> ((JLabel) Edt.find(frame.getContentPane(), "result.several.summary")).getText());
        assertTrue(summary.contains("one per mode, designed jointly, at midspan and corner"), summary);
        assertTrue(summary.contains(DisplayUnits.format(set.joint().orElseThrow().peak(), Dimension.LENGTH,
                UnitSystem.SI)), summary);
    }

    private void load(LoadedProject p) throws Exception {
        onEdt(() -> {
            frame.load(p, null);
            return null;
        });
        settled(p.project().name());
    }

    private void settled(String what) throws InterruptedException {
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.settled() && frame.shownResult() != null), what);
    }

    private static String row(JTable t, int r) throws Exception {
        return onEdt(() -> {
            StringBuilder s = new StringBuilder();
            for (int c = 0; c < t.getColumnCount(); c++) {
                s.append(t.getValueAt(r, c)).append(" | ");
            }
            return s.toString().replace('\u00a0', ' ');
        });
    }

    private static String printed(double si, Unit unit) {
        return QuantityFormat.number(unit.fromSi(si), QuantityFormat.FIGURES);
    }

    private void screenshot(String name) throws Exception {
        Thread.sleep(600); // let the window paint (not a timing assertion)
        Rectangle bounds = onEdt(() -> frame.getBounds());
        BufferedImage image = new Robot().createScreenCapture(bounds);
        ImageIO.write(image, "png", SHOTS.resolve(name + ".png").toFile());
    }

    private static <T> T onEdt(Callable<T> task) throws Exception {
        return Edt.call(task);
    }
}
