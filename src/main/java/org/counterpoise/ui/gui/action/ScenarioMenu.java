package org.counterpoise.ui.gui.action;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import java.util.logging.Level;
import java.util.logging.Logger;
import javax.swing.JMenu;
import javax.swing.JMenuItem;
import javax.swing.SwingWorker;
import javax.swing.event.MenuEvent;
import javax.swing.event.MenuListener;
import org.counterpoise.io.preset.Presets;

/**
 * The File menu's example scenarios (invented), one item per preset under its project's name.
 * Reading every preset for its name takes about 0.1 s, too long for the event thread
 * (docs/performance.md, "Long events on the wizard's event thread"): the names are read in the
 * background, from {@link #readSoon()} (once the wizard's steps are made) or when the menu is first
 * opened; until they are there the menu holds one disabled line saying so.
 */
final class ScenarioMenu extends JMenu implements MenuListener {
    /** The disabled line shown until the names are read. */
    static final String READING = "Reading the example scenarios\u2026";
    private static final Logger LOG = Logger.getLogger("counterpoise");
    private final transient Consumer<String> open;
    private boolean reading;

    /** @param open opens a scenario by its preset name */
    ScenarioMenu(Consumer<String> open) {
        super("Example scenarios (invented)");
        this.open = open;
        setName("menu.presets");
        setMnemonic('e');
        addMenuListener(this);
    }

    /** Starts reading the scenarios' names in the background, if not started yet. Event thread. */
    void readSoon() {
        if (reading) {
            return;
        }
        reading = true;
        new SwingWorker<List<String[]>, Void>() {
            @Override
            protected List<String[]> doInBackground() {
                List<String[]> out = new ArrayList<>();
                for (String name : Presets.names()) {
                    out.add(new String[] {name, Presets.load(name).project().name()});
                }
                return out;
            }

            @Override
            protected void done() {
                fill(this);
            }
        }.execute();
    }

    private void fill(SwingWorker<List<String[]>, Void> read) {
        List<String[]> scenarios;
        try {
            scenarios = read.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return;
        } catch (ExecutionException e) {
            // the presets are inside the jar: a failure is a broken build, said once on the menu's line
            LOG.log(Level.SEVERE, "the example scenarios cannot be read", e.getCause());
            removeAll();
            JMenuItem broken = new JMenuItem("The example scenarios cannot be read (a broken installation)");
            broken.setEnabled(false);
            add(broken);
            return;
        }
        removeAll();
        for (String[] scenario : scenarios) {
            JMenuItem it = new JMenuItem(scenario[1]);
            it.setName("preset." + scenario[0]);
            it.addActionListener(a -> open.accept(scenario[0]));
            add(it);
        }
        if (getPopupMenu().isVisible()) {
            getPopupMenu().pack(); // open while they were read: it grows to hold them
        }
    }

    @Override
    public void menuSelected(MenuEvent e) {
        if (getMenuComponentCount() == 0) {
            JMenuItem wait = new JMenuItem(READING);
            wait.setEnabled(false);
            add(wait);
            readSoon();
        }
    }

    @Override
    public void menuDeselected(MenuEvent e) {
        // nothing to do
    }

    @Override
    public void menuCanceled(MenuEvent e) {
        // nothing to do
    }
}
