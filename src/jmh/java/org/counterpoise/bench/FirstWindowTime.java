package org.counterpoise.bench;

import java.awt.Window;
import java.lang.reflect.InvocationTargetException;
import java.time.Duration;
import java.time.Instant;
import javax.swing.SwingUtilities;
import org.counterpoise.ui.gui.GuiMain;

/**
 * The wizard's first window (issue 17; docs/performance.md, "The wizard's first window"): the
 * time from the process's start until the wizard's frame is showing and the event queue has run
 * once after that. Calls {@link GuiMain#launch()} as the jar's {@code main} does with no
 * arguments, polls {@link Window#getWindows()} every millisecond until the frame named "wizard" is
 * showing, then waits for an empty task on the event thread, and prints one line
 * {@code first-window <seconds>} (the process's start from {@link ProcessHandle}, to the
 * operating system's clock tick) and exits. Run by {@code src/jmh/sh/first_window.sh}, which
 * starts a fresh JVM per run under Xvfb.
 */
public final class FirstWindowTime {
    private FirstWindowTime() {
    }

    /**
     * @param args none
     * @throws InterruptedException never expected
     * @throws InvocationTargetException never expected
     */
    public static void main(String[] args) throws InterruptedException, InvocationTargetException {
        GuiMain.launch();
        long giveUp = System.nanoTime() + 60_000_000_000L;
        while (!showing()) {
            if (System.nanoTime() > giveUp) {
                System.err.println("first-window: no wizard window within 60 s (a launch error dialog?)");
                System.exit(1);
            }
            Thread.sleep(1);
        }
        SwingUtilities.invokeAndWait(() -> { });
        Instant ready = Instant.now();
        Instant start = ProcessHandle.current().info().startInstant().orElseThrow();
        System.out.printf("first-window %.3f%n", Duration.between(start, ready).toNanos() / 1e9);
        System.exit(0);
    }

    private static boolean showing() {
        for (Window w : Window.getWindows()) {
            if ("wizard".equals(w.getName()) && w.isShowing()) {
                return true;
            }
        }
        return false;
    }
}
