package org.counterpoise.ui.gui.action;

import java.awt.event.KeyEvent;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import javax.swing.JFrame;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import org.counterpoise.ui.gui.Themes;

/** The wizard's menu bar: File, Edit, View, Help, built from the actions. */
public final class WizardMenus {
    private WizardMenus() {
    }

    /**
     * @param frame the window
     * @param files file actions
     * @param edits undo and redo
     * @param details opens the project details
     * @param preset opens an invented scenario by its preset name
     * @param quit closes the window (asking about unsaved changes)
     * @param unitSystems the View menu's choice of unit system, one item per system
     * @return the menu bar
     */
    public static JMenuBar build(JFrame frame, FileActions files, EditActions edits, Runnable details,
            Consumer<String> preset, Runnable quit, List<JMenuItem> unitSystems) {
        JMenuBar bar = new JMenuBar();
        JMenu fileMenu = new JMenu("File");
        fileMenu.setMnemonic('f');
        files.fill(fileMenu);
        fileMenu.add(new JMenuItem(Actions.of("Project details\u2026", KeyEvent.VK_D,
                Shortcuts.menuKey(KeyEvent.VK_D, true), e -> details.run())));
        fileMenu.addSeparator();
        ScenarioMenu presets = new ScenarioMenu(preset);
        fileMenu.add(presets);
        fileMenu.addSeparator();
        fileMenu.add(new JMenuItem(Actions.of("Quit", KeyEvent.VK_Q, Shortcuts.menuKey(KeyEvent.VK_Q, false),
                e -> quit.run())));
        JMenu edit = new JMenu("Edit");
        edit.setMnemonic('e');
        edit.add(new JMenuItem(edits.undo()));
        edit.add(new JMenuItem(edits.redo()));
        JMenu view = new JMenu("View");
        view.setMnemonic('v');
        view.add(new JMenuItem(Actions.of("Light theme", KeyEvent.VK_L, null, e -> Themes.apply(false, frame))));
        view.add(new JMenuItem(Actions.of("Dark theme", KeyEvent.VK_D, null, e -> Themes.apply(true, frame))));
        view.addSeparator();
        unitSystems.forEach(view::add);
        JMenu help = new JMenu("Help");
        help.setMnemonic('h');
        help.add(new JMenuItem(Actions.of("About Counterpoise", KeyEvent.VK_A, null, e -> JOptionPane.showMessageDialog(
                frame, "Counterpoise: design of dynamic vibration absorbers (tuned mass dampers).\n"
                        + "A preliminary design aid on a single-mode linear model: verify by measurement;\n"
                        + "local codes and licensed engineering practice govern.", "About",
                JOptionPane.INFORMATION_MESSAGE))));
        bar.add(fileMenu);
        bar.add(edit);
        bar.add(view);
        bar.add(help);
        return bar;
    }

    /**
     * Reads the example scenarios' names in the background (the menu's first opening then shows
     * them at once); the wizard asks once its steps are made.
     * @param bar a menu bar from {@link #build}
     */
    public static void readScenariosSoon(JMenuBar bar) {
        Objects.requireNonNull(findScenarios(bar), "bug: the bar has no example scenarios").readSoon();
    }

    private static ScenarioMenu findScenarios(JMenuBar bar) {
        JMenu file = bar.getMenu(0);
        for (int i = 0; i < file.getItemCount(); i++) {
            if (file.getItem(i) instanceof ScenarioMenu s) {
                return s;
            }
        }
        return null;
    }
}
