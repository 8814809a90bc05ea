package org.counterpoise.ui.gui;

import java.nio.file.Path;
import java.util.logging.Level;
import java.util.logging.Logger;
import javax.swing.JOptionPane;
import javax.swing.SwingUtilities;
import org.counterpoise.io.chart.ChartWarmUp;
import org.counterpoise.ui.gui.wizard.WizardFrame;

/** Starts the wizard: look and feel first, then the window on the event thread. */
public final class GuiMain {
    private GuiMain() {
    }

    /** Opens the wizard. Unexpected failures are logged and shown as a short message, never a stack trace. */
    public static void launch() {
        open(null);
    }

    /**
     * Opens the wizard on a project file (as {@code java -jar counterpoise.jar FILE.json} does); a
     * file that cannot be opened is reported in the wizard, which then starts as usual.
     * @param project the project file, or null for a new project
     */
    public static void open(Path project) {
        Thread.setDefaultUncaughtExceptionHandler((thread, e) -> {
            Logger.getLogger("counterpoise").log(Level.SEVERE, "unexpected failure", e);
            SwingUtilities.invokeLater(() -> JOptionPane.showMessageDialog(null,
                    "Something went wrong inside Counterpoise (a bug, not your input). Your inputs are kept;"
                            + " please report what you were doing.", "Counterpoise", JOptionPane.ERROR_MESSAGE));
        });
        SwingUtilities.invokeLater(() -> {
            Themes.apply(false);
            // the first step only before the window shows; the others (and then the first design)
            // one per event after it, so the window is up sooner and answers meanwhile
            WizardFrame frame = WizardFrame.firstStepOnly();
            frame.setVisible(true);
            if (project != null) {
                frame.openFile(project);
            }
            frame.makeRestLater();
            warmUpCharts();
        });
    }

    /**
     * A chart painted once into an image on a background thread of low priority, so that the first
     * chart painted on screen does not load and compile the painting code on the event thread
     * ({@link ChartWarmUp}). A failure there only loses the head start.
     */
    private static void warmUpCharts() {
        Thread warmUp = new Thread(() -> {
            try {
                ChartWarmUp.paintOnce();
            } catch (RuntimeException e) {
                Logger.getLogger("counterpoise").log(Level.FINE, "chart warm-up failed", e);
            }
        }, "chart warm-up");
        warmUp.setDaemon(true);
        warmUp.setPriority(Thread.MIN_PRIORITY);
        warmUp.start();
    }
}
