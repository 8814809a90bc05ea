package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.event.KeyEvent;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import javax.imageio.ImageIO;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.project.AbsorbersInput;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.ModeInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.gui.Edt;
import org.counterpoise.ui.gui.document.ModesEdits;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The structure step's modes table, edited as a user would in a real window (issue 16), on the
 * invented gallery floor of two modes: a typed frequency becomes the project's, marks it changed and
 * is designed (the design's structure is the edited target mode); a mode added and undone; bad values
 * refused under the table with the old value kept; the points and the absorbers chosen; saved to a
 * file that the project reader reads back with the typed values, and reopened to the same table.
 * Screenshots go to target/gui. Same skip/fail rule as the other wizard tests.
 */
class ModesEditingGuiTest {
    private static final Path SHOTS = Path.of("target", "gui");
    private final Locale locale = Locale.getDefault(Locale.Category.FORMAT);
    private WizardFrame frame;
    private JTable table;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(ModesEditingGuiTest.class);
        Files.createDirectories(SHOTS);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(frame);
        Locale.setDefault(Locale.Category.FORMAT, locale);
    }

    @Test
    void theModesAreEditedUndoneRefusedSavedAndReopened(@TempDir Path dir) throws Exception {
        Locale.setDefault(Locale.Category.FORMAT, Locale.US);
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setBounds(0, 0, 1400, 880);
            f.setVisible(true);
            return f;
        });
        settled("first design");
        LoadedProject gallery = Presets.load("gallery-floor-two-modes.json");
        load(gallery);
        onEdt(() -> {
            frame.showStep(0);
            return null;
        });
        table = onEdt(() -> (JTable) Edt.find(frame.getContentPane(), "structure.modes"));
        assertEquals(List.of("bending", "8.2", "0.015", "18000", "0.8", "1"), row(0));
        screenshot("modes-editor");

        // the bending mode's frequency typed: the project's, changed, and the design is of the edited mode
        type(0, ModesEdits.FREQUENCY, "8.35");
        ModeInput bending = onEdt(() -> frame.document().project().modes().modes().get(0));
        assertEquals(new QuantityInput(8.35, Unit.HERTZ), bending.naturalFrequency());
        assertTrue(onEdt(frame::dirty), "the project is marked changed");
        assertEquals("8.35", row(0).get(ModesEdits.FREQUENCY));
        settled("the design of the edited modes");
        // the design's single-mode structure is the target mode (bending, shape 1 at mid-span) at 8.35 Hz
        assertEquals(Unit.HERTZ.toSi(8.35), onEdt(() -> frame.shownResult().study().structure().naturalFrequency()),
                1e-9);
        String shown = onEdt(() -> ((JTextField) Edt.find(frame.getContentPane(), "structure.stiffness")).getText());
        assertEquals(8.35, Double.parseDouble(shown), 1e-12, "the greyed target-mode field follows: " + shown);

        // a mode added, then undone: the typed frequency stays
        click("structure.modes.add");
        assertEquals(3, onEdt(table::getRowCount));
        assertEquals("mode 3", row(2).get(0));
        assertEquals(3, onEdt(() -> frame.document().project().modes().modes().size()));
        screenshot("modes-editor-three-modes");
        click("structure.modes.remove"); // no row selected: said, nothing removed
        assertTrue(problem().contains("click the mode's row first"), problem());
        onEdt(() -> {
            table.setRowSelectionInterval(2, 2);
            return null;
        });
        click("structure.modes.remove");
        assertEquals(2, onEdt(table::getRowCount));
        assertTrue(onEdt(() -> frame.document().undo()));
        assertEquals(3, onEdt(table::getRowCount));
        assertTrue(onEdt(() -> frame.document().undo()));
        assertEquals(2, onEdt(table::getRowCount));
        assertEquals("8.35", row(0).get(ModesEdits.FREQUENCY));
        settled("undone");

        // bad values: refused under the table in plain words, the table and the project keep what they had
        Project before = onEdt(() -> frame.document().project());
        type(1, ModesEdits.MASS, "-5");
        String said = problem();
        assertTrue(said.contains("twisting, modal mass (kg)") && said.contains("greater than 0"), said);
        assertEquals("15000", row(1).get(ModesEdits.MASS));
        screenshot("modes-editor-refused");
        type(0, ModesEdits.DAMPING, "1.5");
        said = problem();
        assertTrue(said.contains("from 0 to 0.99"), said);
        assertEquals("0.015", row(0).get(ModesEdits.DAMPING));
        type(0, ModesEdits.FIRST_POINT + 1, "0"); // bending at mid-span, where the absorbers sit
        assertTrue(problem().contains("midspan"), problem());
        assertEquals("1", row(0).get(ModesEdits.FIRST_POINT + 1));
        onEdt(() -> {
            ((JTextField) Edt.find(frame.getContentPane(), "structure.modes.newPoint")).setText("Midspan");
            return null;
        });
        click("structure.modes.addPoint");
        assertTrue(problem().contains("a name no other point has"), problem());
        for (String bad : List.of("-5", "1.5", "0")) {
            assertFalse(problem().matches(".*(Exception|NaN|Infinity).*"), bad + ": " + problem());
        }
        assertEquals(before, onEdt(() -> frame.document().project()), "nothing refused reached the project");

        // a good edit clears the message; a point added; the absorbers' count and the response point chosen
        onEdt(() -> {
            ((JTextField) Edt.find(frame.getContentPane(), "structure.modes.newPoint")).setText("stair");
            return null;
        });
        click("structure.modes.addPoint");
        assertEquals(" ", problem());
        assertEquals("\u03c6 at stair", onEdt(() -> table.getColumnName(ModesEdits.FIRST_POINT + 2)));
        type(1, ModesEdits.FIRST_POINT + 2, "0.3");
        onEdt(() -> {
            ((JComboBox<?>) Edt.find(frame.getContentPane(), "structure.modes.response")).setSelectedItem("stair");
            return null;
        });
        settled("the new points");

        // saved and read back by the project reader: the typed values, in the file's format
        Path file = dir.resolve("gallery-edited.json");
        onEdt(() -> {
            frame.saveTo(file);
            return null;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> !frame.dirty() && Files.exists(file)), "saved");
        Project back = ProjectReader.read(file).project();
        assertEquals(2, back.modes().modes().size());
        assertEquals(new QuantityInput(8.35, Unit.HERTZ), back.modes().modes().get(0).naturalFrequency());
        assertEquals(new QuantityInput(15000, Unit.KILOGRAM), back.modes().modes().get(1).modalMass());
        assertEquals(0.3, back.modes().modes().get(1).modeShape().get("stair"));
        assertEquals(0.0, back.modes().modes().get(0).modeShape().get("stair"));
        assertEquals("stair", back.modes().responsePoint());
        assertEquals(new AbsorbersInput(2, gallery.project().absorbers().tuning(), "midspan", "bending"),
                back.absorbers());
        assertFalse(Files.readString(file).contains("mode_shape_at_absorber"), "a file of modes keeps its format");

        // reopened: the same table
        List<List<String>> rows = onEdt(() -> ModesTable.shownRows(table.getModel()));
        load(ProjectReader.read(file));
        assertEquals(rows, onEdt(() -> ModesTable.shownRows(table.getModel())));

        // in US customary units the masses are typed in pounds
        onEdt(() -> {
            frame.document().apply(ProjectEdits.displayUnits("units",
                    UnitSystem.US_CUSTOMARY));
            return null;
        });
        assertEquals("Modal mass (lb)", onEdt(() -> table.getColumnName(ModesEdits.MASS)));
        type(1, ModesEdits.MASS, "30000");
        assertEquals(new QuantityInput(30000, Unit.POUND), onEdt(() -> frame.document().project().modes().modes()
                .get(1).modalMass()));
        settled("US customary");
        screenshot("modes-editor-us");

        // on a small screen (960 x 540) every control of the table is within the page's width, none cut
        onEdt(() -> {
            frame.setBounds(0, 0, 960, 540);
            frame.validate();
            return null;
        });
        for (String name : List.of("structure.modes.add", "structure.modes.remove", "structure.modes.newPoint",
                "structure.modes.addPoint", "structure.modes.excitation", "structure.modes.response",
                "structure.modes.count", "structure.modes.absorberPoint", "structure.modes.tuning",
                "structure.modes.target")) {
            assertTrue(onEdt(() -> {
                Component c = Edt.find(frame.getContentPane(), name);
                JScrollPane page = (JScrollPane) SwingUtilities.getAncestorOfClass(JScrollPane.class, c);
                Rectangle r = SwingUtilities.convertRectangle(c.getParent(), c.getBounds(), page.getViewport().getView());
                return r.x + r.width <= page.getViewport().getExtentSize().width;
            }), name + " within the page's width at 960 x 540");
        }
        assertFalse(onEdt(() -> ((JScrollPane) SwingUtilities.getAncestorOfClass(JScrollPane.class, table.getParent()
                .getParent())).getHorizontalScrollBar().isVisible()), "the page needs no scrolling sideways at 960 x 540");
        screenshot("modes-editor-960x540");
    }

    /** A structure of one mode described by its modes, one undoable edit; refused where modes cannot be designed. */
    @Test
    void aSingleModeIsDescribedByItsModesAndUndone() throws Exception {
        Locale.setDefault(Locale.Category.FORMAT, Locale.US);
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setBounds(0, 0, 1400, 880);
            f.setVisible(true);
            return f;
        });
        settled("first design");
        load(Presets.load("rooftop-fan-platform.json"));
        onEdt(() -> {
            frame.showStep(0);
            return null;
        });
        table = onEdt(() -> (JTable) Edt.find(frame.getContentPane(), "structure.modes"));
        assertFalse(onEdt(table::isShowing), "no table for one mode");
        click("structure.modes.asModes");
        assertTrue(problem().contains("disturbance.kind"), problem()); // an unbalance: modes take a force
        assertEquals(null, onEdt(() -> frame.document().project().modes()));

        LoadedProject skid = Presets.load("pump-skid-mezzanine.json");
        load(skid);
        screenshot("modes-editor-one-mode");
        // text that is not a number yet in the single mode's fields: said, nothing described
        JTextField weight = onEdt(() -> (JTextField) Edt.find(frame.getContentPane(), "structure.mass"));
        onEdt(() -> {
            weight.setText("34 kN");
            return null;
        });
        click("structure.modes.asModes");
        assertTrue(problem().contains("not a number yet"), problem());
        assertEquals(null, onEdt(() -> frame.document().project().modes()));
        onEdt(() -> {
            weight.setText("34");
            return null;
        });
        click("structure.modes.asModes");
        assertTrue(onEdt(table::isShowing), "the table of its one mode");
        List<String> mode = row(0);
        assertEquals(List.of("structure", "23.5"), mode.subList(0, 2));
        // the effective modal mass m / phi^2 = (34 kN / 9.80665 m/s^2) / 0.85^2 = 4798.66 kg, six figures
        assertEquals("4798.66", mode.get(ModesEdits.MASS));
        assertEquals("1", mode.get(ModesEdits.FIRST_POINT));
        assertTrue(onEdt(frame::dirty));
        settled("designed as modes");
        screenshot("modes-editor-as-modes");
        assertTrue(onEdt(() -> frame.document().undo()));
        assertEquals(skid.project(), onEdt(() -> frame.document().project()));
        assertFalse(onEdt(table::isShowing), "one mode again");

        // one absorber per mode (format 7): the modes are edited, the arrangement is the file's
        load(Presets.load("frame-bending-and-twisting.json"));
        assertFalse(onEdt(() -> Edt.find(frame.getContentPane(), "structure.modes.count").isEnabled()));
        assertFalse(onEdt(() -> Edt.find(frame.getContentPane(), "structure.modes.target").isEnabled()));
        String arrangement = onEdt(() -> ((JLabel) Edt.find(frame.getContentPane(), "structure.modes.points"))
                .getText());
        assertTrue(arrangement.contains("One absorber per mode, as the file gives them: bending and twisting at"
                + " midspan and corner"), arrangement);
        assertEquals("bending", onEdt(() -> ((JComboBox<?>) Edt.find(frame.getContentPane(), "structure.modes.target"))
                .getSelectedItem()), "the mode the single-mode sections take");
        type(0, ModesEdits.DAMPING, "0.02");
        assertEquals(" ", problem());
        assertEquals("0.02", row(0).get(ModesEdits.DAMPING));
        settled("one absorber per mode, edited");
        // typed with the keyboard into a selected cell: the typing replaces the value, Enter applies it
        onEdt(() -> {
            table.changeSelection(1, ModesEdits.FREQUENCY, false, false);
            table.requestFocusInWindow();
            return null;
        });
        Edt.waitFor(() -> Edt.callQuietly(table::isFocusOwner), "the table has the keyboard");
        Robot keys = new Robot();
        for (int key : new int[] {KeyEvent.VK_1, KeyEvent.VK_4, KeyEvent.VK_PERIOD, KeyEvent.VK_2, KeyEvent.VK_ENTER}) {
            keys.keyPress(key);
            keys.keyRelease(key);
        }
        Edt.waitFor(() -> Edt.callQuietly(() -> new QuantityInput(14.2, Unit.HERTZ).equals(frame.document().project()
                .modes().modes().get(1).naturalFrequency())), "twisting at 14.2 Hz as typed");
        assertEquals("14.2", row(1).get(ModesEdits.FREQUENCY));
        settled("typed with the keyboard");
        screenshot("modes-editor-one-per-mode");
    }

    /** Types into a cell's editor and presses Enter's equivalent (the editor is stopped). */
    private void type(int row, int column, String text) throws Exception {
        onEdt(() -> {
            assertTrue(table.editCellAt(row, column), "cell " + row + "," + column + " is editable");
            JTextField editor = (JTextField) table.getEditorComponent();
            editor.setText(text);
            table.getCellEditor().stopCellEditing();
            return null;
        });
        SwingUtilities.invokeAndWait(() -> { }); // let what the edit posted run
    }

    private void click(String name) throws Exception {
        onEdt(() -> {
            ((JButton) Edt.find(frame.getContentPane(), name)).doClick();
            return null;
        });
    }

    private String problem() throws Exception {
        return onEdt(() -> ((JLabel) Edt.find(frame.getContentPane(), "structure.modes.problem")).getText());
    }

    private List<String> row(int r) throws Exception {
        return onEdt(() -> ModesTable.shownRows(table.getModel()).get(r));
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

    private void screenshot(String name) throws Exception {
        onEdt(() -> {
            JScrollPane page = (JScrollPane) SwingUtilities.getAncestorOfClass(JScrollPane.class,
                    Edt.find(frame.getContentPane(), "structure.modes.problem"));
            page.getVerticalScrollBar().setValue(page.getVerticalScrollBar().getMaximum());
            return null;
        });
        Thread.sleep(600); // let the window paint (not a timing assertion)
        Rectangle bounds = onEdt(() -> frame.getBounds());
        BufferedImage image = new Robot().createScreenCapture(bounds);
        ImageIO.write(image, "png", SHOTS.resolve(name + ".png").toFile());
    }

    private static <T> T onEdt(Callable<T> task) throws Exception {
        return Edt.call(task);
    }
}
