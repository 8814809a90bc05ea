package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Window;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.Callable;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.SwingUtilities;
import javax.swing.text.JTextComponent;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.Revision;
import org.counterpoise.io.project.SignOff;
import org.counterpoise.io.project.Signature;
import org.counterpoise.ui.gui.Edt;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sheet's identity in the project details window: document number, revision history (add,
 * edit, remove rows) and sign-off reach the project through the document (Undo takes a row back),
 * a bad date is said where it was typed and not saved, and the saved file holds them all. Same
 * skip/fail rule as the other wizard tests.
 */
class SheetIdentityGuiTest {
    private WizardFrame frame;
    private JDialog dialog;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(SheetIdentityGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(dialog);
        Edt.dispose(frame);
    }

    @Test
    void documentNumberHistoryAndSignOffReachTheSavedProject(@TempDir Path dir) throws Exception {
        open();
        type("project.document_number", "CP-0042");
        type("project.revision", "C");
        click("identity.revisions.add");
        click("identity.revisions.add");
        cell(0, 0, "A");
        cell(0, 1, "2026-09-01");
        cell(0, 2, "First issue");
        cell(0, 3, "M. Okafor");
        cell(1, 0, "B");
        cell(1, 1, "2026-10-15");
        cell(1, 2, "Damper changed");
        assertEquals(List.of(new Revision("A", "2026-09-01", "First issue", "M. Okafor"),
                new Revision("B", "2026-10-15", "Damper changed", "")), identity().history());
        click("identity.revisions.add");
        assertEquals(3, identity().history().size(), "an added row is in the project");
        onEdt(() -> frame.document().undo());
        assertEquals(2, identity().history().size(), "Undo takes the added row back");
        assertEquals(2, onEdt(() -> table().getRowCount()), "and the table shows it");
        // a removed row
        click("identity.revisions.add");
        onEdt(() -> {
            table().getSelectionModel().setSelectionInterval(2, 2);
            return null;
        });
        click("identity.revisions.remove");
        assertEquals(2, identity().history().size());
        type("identity.sign_off.prepared.name", "M. Okafor");
        type("identity.sign_off.prepared.date", "2026-11-30");
        type("identity.sign_off.checked.name", "J. Lindqvist");
        type("identity.sign_off.approved.date", "31/11/2026");
        String message = onEdt(() -> ((JLabel) find("identity.sign_off.message")).getText());
        assertTrue(message.startsWith("Approved") && message.contains("YYYY-MM-DD"), message);
        assertEquals(Signature.BLANK, identity().signOff().approved(), "a bad date is not taken");
        type("identity.sign_off.approved.date", "2026-12-01");
        ProjectIdentity expected = new ProjectIdentity("C", "", "", "", "CP-0042", List.of(
                new Revision("A", "2026-09-01", "First issue", "M. Okafor"),
                new Revision("B", "2026-10-15", "Damper changed", "")), new SignOff(
                        new Signature("M. Okafor", "2026-11-30"), new Signature("J. Lindqvist", ""),
                        new Signature("", "2026-12-01")));
        assertEquals(expected, identity());
        Path file = dir.resolve("identity.json");
        onEdt(() -> {
            frame.saveTo(file);
            return null;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> !frame.dirty() && Files.exists(file)), "saved");
        assertEquals(expected, ProjectReader.read(file).project().identity(), "the saved file holds them");
    }

    private ProjectIdentity identity() throws Exception {
        return onEdt(() -> frame.document().project().identity());
    }

    private JTable table() {
        return (JTable) find("identity.revisions");
    }

    /** Types into a cell through the table's editor, as a user does: the value reaches the model when it stops. */
    private void cell(int row, int column, String text) throws Exception {
        onEdt(() -> {
            JTable t = table();
            t.editCellAt(row, column);
            ((JTextComponent) t.getEditorComponent()).setText(text);
            t.getCellEditor().stopCellEditing();
            return null;
        });
    }

    private void type(String field, String text) throws Exception {
        onEdt(() -> {
            ((JTextComponent) find(field)).setText(text);
            return null;
        });
    }

    private void click(String button) throws Exception {
        onEdt(() -> {
            ((JButton) find(button)).doClick();
            return null;
        });
    }

    private void open() throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.settled() && frame.shownResult() != null), "first design");
        dialog = onEdt(() -> {
            frame.showProjectDetails();
            // this frame's own dialog: Window.getWindows() still lists the disposed dialogs of earlier
            // tests' frames until they are collected, and typing into one of those edits another document
            return (JDialog) Arrays.stream(Window.getWindows()).filter(w -> "project.dialog".equals(w.getName())
                    && w.getOwner() == frame && w.isShowing()).findFirst().orElseThrow();
        });
    }

    private Component find(String name) {
        Component c = Edt.find(dialog.getContentPane(), name);
        assertNotNull(c, name);
        return c;
    }

    private static <T> T onEdt(Callable<T> task) throws Exception {
        return SwingUtilities.isEventDispatchThread() ? task.call() : Edt.call(task);
    }
}
