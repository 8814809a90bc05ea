package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Window;
import java.awt.datatransfer.DataFlavor;
import java.awt.datatransfer.Transferable;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import javax.swing.AbstractButton;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.RootPaneContainer;
import javax.swing.SwingUtilities;
import javax.swing.TransferHandler;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.model.Structure;
import org.counterpoise.io.project.MeasuredSource;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.testing.SyntheticFrf;
import org.counterpoise.testing.SyntheticFrf.Mode;
import org.counterpoise.ui.gui.Edt;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The structure from a measurement, in a real window (issue 15): the invented impact-test file is
 * fitted off the event thread, its mode becomes the structure as one undoable edit that records where
 * it came from, the design follows, and a bad file is named in plain words. Same skip/fail rule as the
 * other wizard tests.
 */
class MeasurementGuiTest {
    private static final String DEMO = "presets/impact-test-floor-frf.csv";
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(MeasurementGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        for (Window w : onEdt(() -> frame == null ? new Window[0] : frame.getOwnedWindows())) {
            Edt.dispose(w);
        }
        Edt.dispose(frame);
    }

    @Test
    void aMeasuredModeBecomesTheStructureAndUndoTakesItBack() throws Exception {
        open();
        Structure before = onEdt(() -> frame.document().project().toStructure());
        RobustnessInput robustnessBefore = onEdt(() -> frame.document().project().robustness());
        JDialog dialog = openDialog();
        onEdt(() -> {
            ((JTextField) find(dialog, "measurement.file")).setText(DEMO);
            ((AbstractButton) find(dialog, "measurement.fit")).doClick();
            return null;
        });
        JTable table = (JTable) find(dialog, "measurement.modesTable");
        Edt.waitFor(() -> Edt.callQuietly(() -> table.getRowCount() == 1), "the fit of the demo file");
        String status = onEdt(() -> ((JLabel) find(dialog, "measurement.status")).getText());
        assertTrue(status.startsWith("Fitted "), status);
        onEdt(() -> {
            ((AbstractButton) find(dialog, "measurement.accept")).doClick();
            return null;
        });
        // the invented floor: 23 Hz, 2 % damping, 4200 kg at the driving point (the file's own header;
        // the fit's accuracy on it is checked in ImpactTestPresetTest)
        Structure measured = onEdt(() -> frame.document().project().toStructure());
        assertEquals(23.0, measured.naturalFrequency() / (2 * Math.PI), 0.05);
        assertEquals(0.02, measured.dampingRatio(), 0.002);
        assertEquals(4200.0, measured.modalMass(), 150.0);
        MeasuredSource source = onEdt(() -> frame.document().project().structure().measured());
        assertNotNull(source, "the structure says it was measured");
        assertEquals("impact-test-floor-frf.csv", source.file());
        // the fit's uncertainties become the structure's tolerances unless the project states its own
        RobustnessInput tolerances = onEdt(() -> frame.document().project().robustness());
        if (robustnessBefore != null && robustnessBefore.structureMass() != null) {
            assertEquals(robustnessBefore.structureMass(), tolerances.structureMass(), "the user's tolerance kept");
        } else {
            assertEquals("normal", tolerances.structureMass().distribution(), "the fit's uncertainty");
        }
        String note = onEdt(() -> ((JLabel) find(frame, "structure.measured")).getText());
        assertTrue(note.contains("impact-test-floor-frf.csv"), note);
        settled("the design of the measured structure");

        onEdt(() -> frame.document().undo());
        assertEquals(before, onEdt(() -> frame.document().project().toStructure()), "one undo step");
        assertNull(onEdt(() -> frame.document().project().structure().measured()));
        assertEquals(robustnessBefore, onEdt(() -> frame.document().project().robustness()), "tolerances too");
    }

    @Test
    void aTransferFrfGivesTheMassTheAbsorbersPointSees(@TempDir Path dir) throws Exception {
        // a mode of generalised mass 4200 kg with shape 1 at the measured point and 0.6 at the absorber's:
        // modal constants phi_j phi_k / M (Ewins 2000, Modal Testing, 2nd ed., sec. 2.6), so the absorber's
        // point sees 4200 / 0.36 = 11 666.7 kg, written to 5 significant figures: 11 667 kg (by hand)
        Path driving = csv(dir, "driving.csv", SyntheticFrf.of(FrfKind.ACCELERANCE, 15, 31, 161, 0.0, 1,
                new Mode(23.0, 0.02, 4200.0)));
        Path transfer = csv(dir, "transfer.csv", SyntheticFrf.of(FrfKind.ACCELERANCE, 15, 31, 161, 0.0, 2,
                new Mode(23.0, 0.02, 4200.0 / 0.6)));
        open();
        JDialog dialog = openDialog();
        onEdt(() -> {
            ((JTextField) find(dialog, "measurement.file")).setText(driving.toString());
            ((JTextField) find(dialog, "measurement.transfer")).setText(transfer.toString());
            ((AbstractButton) find(dialog, "measurement.fit")).doClick();
            return null;
        });
        JTable table = (JTable) find(dialog, "measurement.modesTable");
        Edt.waitFor(() -> Edt.callQuietly(() -> table.getRowCount() == 1), "the two fits");
        onEdt(() -> {
            ((AbstractButton) find(dialog, "measurement.accept")).doClick();
            return null;
        });
        assertEquals(11667.0, onEdt(() -> frame.document().project().toStructure().effectiveMass()), 1e-9);
    }

    private static Path csv(Path dir, String name, MeasuredFrf frf) throws IOException {
        StringBuilder b = new StringBuilder("frequency_Hz,real,imag\n");
        for (int i = 0; i < frf.size(); i++) {
            b.append(String.format(Locale.ROOT, "%.6f,%.9e,%.9e%n", frf.omega()[i] / (2 * Math.PI), frf.real()[i],
                    frf.imaginary()[i]));
        }
        return Files.writeString(dir.resolve(name), b.toString());
    }

    @Test
    void aFileDroppedOnTheWindowIsFitted() throws Exception {
        open();
        JDialog dialog = openDialog();
        File demo = new File(DEMO);
        boolean taken = onEdt(() -> {
            JComponent content = (JComponent) dialog.getContentPane();
            return content.getTransferHandler().importData(new TransferHandler.TransferSupport(content,
                    new Transferable() {
                        @Override
                        public DataFlavor[] getTransferDataFlavors() {
                            return new DataFlavor[] {DataFlavor.javaFileListFlavor};
                        }

                        @Override
                        public boolean isDataFlavorSupported(DataFlavor flavor) {
                            return DataFlavor.javaFileListFlavor.equals(flavor);
                        }

                        @Override
                        public Object getTransferData(DataFlavor flavor) {
                            return List.of(demo);
                        }
                    }));
        });
        assertTrue(taken, "the window takes a dropped file");
        assertEquals(demo.getPath(), onEdt(() -> ((JTextField) find(dialog, "measurement.file")).getText()));
        JTable table = (JTable) find(dialog, "measurement.modesTable");
        Edt.waitFor(() -> Edt.callQuietly(() -> table.getRowCount() == 1), "the fit of the dropped file");
    }

    @Test
    void aFileThatIsNotAnFrfIsNamedInPlainWords() throws Exception {
        open();
        JDialog dialog = openDialog();
        onEdt(() -> {
            ((JTextField) find(dialog, "measurement.file")).setText("presets/pump-skid-mezzanine.json");
            ((AbstractButton) find(dialog, "measurement.fit")).doClick();
            return null;
        });
        JLabel status = (JLabel) find(dialog, "measurement.status");
        Edt.waitFor(() -> Edt.callQuietly(() -> !status.getText().startsWith("Fitting")
                && !status.getText().startsWith("Inputs")), "the refusal");
        String text = onEdt(status::getText);
        assertTrue(text.contains("pump-skid-mezzanine.json"), text);
        assertTrue(!text.contains("Exception") && !text.contains("NaN"), text);
        assertEquals(0, onEdt(() -> ((JTable) find(dialog, "measurement.modesTable")).getRowCount()));
    }

    private JDialog openDialog() throws Exception {
        onEdt(() -> {
            ((AbstractButton) find(frame, "structure.fromMeasurement")).doClick();
            return null;
        });
        return onEdt(() -> {
            for (Window w : frame.getOwnedWindows()) {
                if (w instanceof JDialog d && "measurement.dialog".equals(d.getName()) && d.isShowing()) {
                    return d;
                }
            }
            throw new AssertionError("the measurement window is not showing");
        });
    }

    private void open() throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        settled("first design");
        onEdt(() -> {
            frame.showStep(0);
            return null;
        });
    }

    private void settled(String what) throws InterruptedException {
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.settled() && frame.shownResult() != null), what);
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
