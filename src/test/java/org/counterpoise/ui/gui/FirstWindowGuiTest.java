package org.counterpoise.ui.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Container;
import java.util.ArrayList;
import java.util.List;
import javax.swing.AbstractButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JTable;
import javax.swing.MenuElement;
import javax.swing.MenuSelectionManager;
import javax.swing.text.JTextComponent;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.ui.gui.wizard.WizardFrame;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The wizard as the application opens it ({@link GuiMain}): the window with its first step only,
 * the other steps made after it shows (docs/performance.md, "The wizard's first window"). What a
 * user can do before the other steps are made (type, undo, open a scenario, go to a later step)
 * reaches them, and the window ends in the same state as one made with every step at once (the
 * way every other GUI test opens it): the same text in every named field, label, list and button,
 * the same result table, status line and Next. No times are measured or asserted here.
 */
class FirstWindowGuiTest {
    private WizardFrame staged;
    private WizardFrame whole;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(FirstWindowGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(staged);
        Edt.dispose(whole);
    }

    @Test
    void theFirstWindowEndsAsTheWholeOne() throws Exception {
        staged = Edt.call(() -> {
            WizardFrame f = WizardFrame.firstStepOnly();
            f.setVisible(true);
            return f;
        });
        // the first step is there, a later one not yet, and no design runs before every step is made
        assertNotNull(Edt.call(() -> Edt.find(staged.getContentPane(), "structure.mass")));
        assertNull(Edt.call(() -> Edt.find(staged.getContentPane(), "disturbance.harmonic_order")));
        assertFalse(Edt.call(staged::settled));
        assertNotNull(Edt.call(staged::currentProject), "a step not made yet holds no text that is not a number");
        // the first step's derived values are there at once (1800 kg: the default scenario's mass, presets/)
        assertEquals("1800 kg", Edt.call(() -> ((JLabel) Edt.find(staged.getContentPane(), "derived.mass")).getText()));
        Edt.call(() -> {
            staged.makeRestLater();
            return null;
        });
        whole = Edt.call(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        assertSameOnEveryStep();
    }

    @Test
    void whatIsDoneBeforeTheRestIsMadeReachesIt() throws Exception {
        String preset = Presets.names().get(3);
        staged = Edt.call(() -> {
            WizardFrame f = WizardFrame.firstStepOnly();
            f.setVisible(true);
            f.load(Presets.load(preset), null); // as a project file named on the command line
            ((JTextComponent) Edt.find(f.getContentPane(), "structure.mass")).setText("1500");
            return f;
        });
        Edt.waitFor(() -> Edt.callQuietly(staged::dirty), "the typed mass is an edit");
        Edt.call(() -> {
            staged.showStep(1); // a step not made yet is made when shown, with the project as it is now
            return null;
        });
        assertNotNull(Edt.call(() -> Edt.find(staged.getContentPane(), "disturbance.harmonic_order")));
        assertFalse(Edt.call(staged::settled), "the design waits for the other steps");
        Edt.call(() -> {
            staged.makeRestLater();
            staged.showStep(0);
            return null;
        });
        whole = Edt.call(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            f.load(Presets.load(preset), null);
            ((JTextComponent) Edt.find(f.getContentPane(), "structure.mass")).setText("1500");
            return f;
        });
        Edt.waitFor(() -> Edt.callQuietly(whole::dirty), "the same edit in the whole window");
        assertSameOnEveryStep();
        // undo reaches every step of both alike: the scenario as opened, and clean again
        Edt.call(() -> {
            assertTrue(staged.document().undo());
            assertTrue(whole.document().undo());
            return null;
        });
        assertFalse(Edt.call(staged::dirty));
        assertSameOnEveryStep();
    }

    @Test
    void theExampleScenariosOpenedBeforeTheirNamesAreReadFillWhenRead() throws Exception {
        // the names are read in the background once every step is made; opened before, the menu says it is reading
        staged = Edt.call(() -> {
            WizardFrame f = WizardFrame.firstStepOnly();
            f.setVisible(true);
            return f;
        });
        JMenu scenarios = Edt.call(() -> {
            JMenuBar bar = staged.getJMenuBar();
            JMenu file = bar.getMenu(0);
            JMenu presets = (JMenu) Edt.find(file.getPopupMenu(), "menu.presets");
            MenuSelectionManager.defaultManager().setSelectedPath(
                    new MenuElement[] {bar, file, file.getPopupMenu(), presets, presets.getPopupMenu()});
            // in the same event as the opening: the reading has only started (its result comes in a later event)
            assertEquals(1, presets.getItemCount());
            assertEquals("Reading the example scenarios\u2026", presets.getItem(0).getText());
            assertFalse(presets.getItem(0).isEnabled());
            return presets;
        });
        List<String> names = Presets.names();
        Edt.waitFor(() -> Edt.callQuietly(() -> scenarios.getItemCount() == names.size()), "the scenarios' names");
        for (int i = 0; i < names.size(); i++) {
            int k = i;
            // each item: the preset's project name (presets/, invented scenarios), enabled, named after its file
            assertEquals(Presets.load(names.get(k)).project().name(), Edt.call(() -> scenarios.getItem(k).getText()));
            assertTrue(Edt.call(() -> scenarios.getItem(k).isEnabled()));
            assertEquals("preset." + names.get(k), Edt.call(() -> scenarios.getItem(k).getName()));
        }
        Edt.call(() -> {
            MenuSelectionManager.defaultManager().clearSelectedPath();
            return null;
        });
    }

    /** Waits for both windows' designs, then compares every step of the two. */
    private void assertSameOnEveryStep() throws Exception {
        for (WizardFrame f : List.of(staged, whole)) {
            Edt.waitFor(() -> Edt.callQuietly(() -> f.settled() && f.shownResult() != null), "the design");
        }
        assertEquals(rows(staged), rows(whole), "the result table");
        for (int step = 0; step < 7; step++) {
            int i = step;
            for (WizardFrame f : List.of(staged, whole)) {
                Edt.call(() -> {
                    f.showStep(i);
                    return null;
                });
            }
            // the background parts (comparison, robustness, sheet preview) may end at different moments:
            // compared once both windows are alike twice in a row with nothing on their task bars
            long end = System.nanoTime() + 60_000_000_000L;
            int alike = 0;
            while (alike < 2 && System.nanoTime() < end) {
                Thread.sleep(300);
                alike = Edt.call(() -> whole.taskText().isEmpty() && staged.taskText().isEmpty()
                        && shown(whole).equals(shown(staged))) ? alike + 1 : 0;
            }
            assertEquals(Edt.call(() -> shown(whole)), Edt.call(() -> shown(staged)), "step " + (i + 1));
            assertEquals(Edt.call(whole::statusText), Edt.call(staged::statusText), "status line on step " + (i + 1));
            assertEquals(Edt.call(whole::nextEnabled), Edt.call(staged::nextEnabled), "Next on step " + (i + 1));
        }
        assertEquals(Edt.call(whole::getTitle), Edt.call(staged::getTitle));
    }

    private static List<String> rows(WizardFrame f) throws Exception {
        List<String> out = new ArrayList<>();
        for (String[] r : Edt.call(f::resultRows)) {
            out.add(String.join(" | ", r));
        }
        return out;
    }

    /** @return name = what it shows, for every named text, label, list, button and table below the window */
    private static List<String> shown(WizardFrame f) {
        List<String> out = new ArrayList<>();
        collect(f.getContentPane(), out);
        return out;
    }

    private static void collect(Container root, List<String> out) {
        for (Component c : root.getComponents()) {
            if (c.getName() != null) {
                String what = null;
                if (c instanceof JTextComponent t) {
                    what = t.getText();
                } else if (c instanceof JLabel l) {
                    what = l.getText();
                } else if (c instanceof JComboBox<?> b) {
                    what = String.valueOf(b.getSelectedItem());
                } else if (c instanceof AbstractButton b) {
                    what = b.getText() + (b.isSelected() ? " (selected)" : "");
                } else if (c instanceof JTable t) {
                    what = t.getRowCount() + " rows";
                }
                if (what != null) {
                    out.add(c.getName() + " = " + what + (c.isEnabled() ? "" : " (disabled)"));
                }
            }
            if (c instanceof Container sub) {
                collect(sub, out);
            }
        }
    }
}
