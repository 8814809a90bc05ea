package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.Window;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import javax.imageio.ImageIO;
import javax.swing.AbstractButton;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.RootPaneContainer;
import javax.swing.SwingUtilities;
import org.counterpoise.core.commission.SetCommissioning;
import org.counterpoise.io.commission.SetSiteRun;
import org.counterpoise.io.commission.SiteCheck;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.ui.gui.Edt;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The site check in a real window: the pump-skid preset with its two invented site files
 * (SitePresetTest made them: the pump line 1.35 times the model's, an absorber built 5 % stiff)
 * gives what {@code site-check} gives; a changed input or design clears it; a bad file is named in
 * plain words. Same skip/fail rule as the other wizard tests.
 */
class SiteCheckGuiTest {
    private static final Path PUMP = Path.of("presets", "pump-skid-mezzanine.json");
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(SiteCheckGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        for (Window w : onEdt(() -> frame == null ? new Window[0] : frame.getOwnedWindows())) {
            Edt.dispose(w);
        }
        Edt.dispose(frame);
    }

    @Test
    void theSiteFilesGiveTheAbsorberAsBuiltAndAnInputChangeClearsIt() throws Exception {
        JDialog dialog = openDialog();
        onEdt(() -> {
            ((JTextField) find(dialog, "siteCheck.spectrumFile")).setText("presets/pump-skid-operating-spectrum.csv");
            ((JTextField) find(dialog, "siteCheck.frfFile")).setText("presets/pump-skid-fitted-frf.csv");
            ((AbstractButton) find(dialog, "siteCheck.check")).doClick();
            return null;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.hardwareView().siteDialog().shown() != null), "the check");
        SiteCheck shown = onEdt(() -> frame.hardwareView().siteDialog().shown());
        assertEquals(1.35, shown.operating().orElseThrow().comparison().ratio(), 1e-4);
        assertEquals(5, shown.fitted().orElseThrow().check().trim().platesToAdd());
        String report = onEdt(() -> ((JTextArea) find(dialog, "siteCheck.report")).getText());
        assertTrue(report.contains("add 5 plates"), report);
        assertTrue(report.contains("licensed engineering practice"), report);
        // another unit: what is on screen is no longer for the inputs
        onEdt(() -> {
            ((JTextField) find(dialog, "siteCheck.spectrumUnit")).setText("in/s");
            return null;
        });
        assertNull(onEdt(() -> frame.hardwareView().siteDialog().shown()));
        assertEquals("", onEdt(() -> ((JTextArea) find(dialog, "siteCheck.report")).getText()));
    }

    @Test
    void aFileThatIsNotASpectrumIsNamedInPlainWords() throws Exception {
        JDialog dialog = openDialog();
        onEdt(() -> {
            ((JTextField) find(dialog, "siteCheck.spectrumFile")).setText("presets/pump-skid-mezzanine.json");
            ((AbstractButton) find(dialog, "siteCheck.check")).doClick();
            return null;
        });
        JLabel status = (JLabel) find(dialog, "siteCheck.status");
        Edt.waitFor(() -> Edt.callQuietly(() -> !status.getText().startsWith("Checking")
                && !status.getText().startsWith("Inputs")), "the refusal");
        String text = onEdt(status::getText);
        assertTrue(text.contains("pump-skid-mezzanine.json"), text);
        assertTrue(!text.contains("Exception") && !text.contains("NaN"), text);
        assertNull(onEdt(() -> frame.hardwareView().siteDialog().shown()));
    }

    /**
     * Several absorbers at one point (the invented gallery floor and its invented measurement with both
     * absorbers fitted, GallerySitePresetTest): the wizard checks them on the whole structure as
     * {@code site-check} does, each absorber's trim in whole plates, and draws the chart; a screenshot is
     * kept in target/gui.
     */
    @Test
    void severalAbsorbersAreCheckedOnTheWholeStructure() throws Exception {
        JDialog dialog = openDialog(Path.of("presets", "gallery-floor-two-modes.json"));
        onEdt(() -> {
            ((JTextField) find(dialog, "siteCheck.frfFile")).setText("presets/gallery-floor-fitted-frf.csv");
            ((AbstractButton) find(dialog, "siteCheck.check")).doClick();
            return null;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.hardwareView().siteDialog().shownSet() != null),
                "the check of the two absorbers");
        SetSiteRun shown = onEdt(() -> frame.hardwareView().siteDialog().shownSet());
        SetCommissioning check = shown.fitted().orElseThrow().check();
        // the same figures as the command (SiteCheckCommandTest): absorber 1 on a spring 4 % stiff, 2 on one 3 % soft
        assertEquals(4, check.corrections().get(0).platesToAdd().getAsInt());
        assertEquals(-3, check.corrections().get(1).platesToAdd().getAsInt());
        String report = onEdt(() -> ((JTextArea) find(dialog, "siteCheck.report")).getText());
        assertTrue(report.contains("absorber 2: trim") && report.contains("take off 3 trim plates"), report);
        assertTrue(report.contains("licensed engineering practice"), report);
        Thread.sleep(600); // let the window paint (not a timing assertion)
        Rectangle bounds = onEdt(dialog::getBounds);
        Files.createDirectories(Path.of("target", "gui"));
        ImageIO.write(new Robot().createScreenCapture(bounds), "png",
                Path.of("target", "gui", "site-check-several.png").toFile());
    }

    private JDialog openDialog() throws Exception {
        return openDialog(PUMP);
    }

    private JDialog openDialog(Path project) throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.load(ProjectReader.read(project), project);
            f.setVisible(true);
            return f;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.settled() && frame.shownResult() != null
                && frame.hardwareView().shownChoice() != null), "the design and hardware");
        onEdt(() -> {
            ((AbstractButton) Edt.find(frame.hardwareView().component(), "hardware.siteCheck")).doClick();
            return null;
        });
        return onEdt(() -> {
            for (Window w : frame.getOwnedWindows()) {
                if (w instanceof JDialog d && "siteCheck.dialog".equals(d.getName()) && d.isShowing()) {
                    return d;
                }
            }
            throw new AssertionError("the site-check window is not showing");
        });
    }

    private static Component find(RootPaneContainer root, String name) {
        Component c = Edt.find(root.getContentPane(), name);
        assertNotNull(c, name);
        return c;
    }

    private static <T> T onEdt(Callable<T> task) throws Exception {
        return SwingUtilities.isEventDispatchThread() ? task.call() : Edt.call(task);
    }
}
