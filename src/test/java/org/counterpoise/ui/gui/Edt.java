package org.counterpoise.ui.gui;

import static org.junit.jupiter.api.Assertions.fail;

import java.awt.Component;
import java.awt.Container;
import java.awt.GraphicsEnvironment;
import java.awt.Window;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import javax.swing.SwingUtilities;
import org.junit.jupiter.api.Assumptions;

/**
 * What every GUI test needs, in one place: the display rule (skip with a printed note, or fail
 * when CI requires a display), code run on the Swing event thread, waiting for a condition and
 * finding a component by name.
 */
public final class Edt {
    private Edt() {
    }

    /**
     * What a wizard test class needs before its first window: the display rule of
     * {@link #requireDisplay}, preferences kept in memory (a test never touches the user's) and the
     * light theme.
     * @param testClass the GUI test class
     * @throws Exception when the theme cannot be applied on the event thread
     */
    public static void prepareWizardTests(Class<?> testClass) throws Exception {
        requireDisplay(testClass);
        System.setProperty("counterpoise.prefs", "memory");
        SwingUtilities.invokeAndWait(() -> Themes.apply(false));
    }

    /**
     * Disposes a test's window on the event thread, if it was opened.
     * @param window the window, or null
     * @throws Exception when the event thread fails
     */
    public static void dispose(Window window) throws Exception {
        if (window != null) {
            SwingUtilities.invokeAndWait(window::dispose);
        }
    }

    /**
     * Skips the test class (with a note on the console: Surefire prints no reason for an aborted
     * class) when there is no display, or fails when {@code counterpoise.gui.required} is set.
     * @param testClass the GUI test class
     */
    public static void requireDisplay(Class<?> testClass) {
        boolean display;
        try {
            display = !GraphicsEnvironment.isHeadless()
                    && GraphicsEnvironment.getLocalGraphicsEnvironment().getScreenDevices().length > 0;
        } catch (Throwable e) {
            display = false;
        }
        if (!display) {
            if (Boolean.getBoolean("counterpoise.gui.required")) {
                fail("GUI tests must run in CI but no display is available (is Xvfb installed and running?)");
            }
            System.out.println("NOTE: no display: " + testClass.getSimpleName()
                    + " skipped (run the GUI tests under xvfb-run)");
            Assumptions.abort("no display: the GUI tests are skipped (run them under xvfb-run)");
        }
    }

    /**
     * @param <T> result type
     * @param task what to run on the event thread
     * @return its result
     * @throws Exception what it threw
     */
    public static <T> T call(Callable<T> task) throws Exception {
        AtomicReference<T> out = new AtomicReference<>();
        AtomicReference<Exception> error = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            try {
                out.set(task.call());
            } catch (Exception e) {
                error.set(e);
            }
        });
        if (error.get() != null) {
            throw error.get();
        }
        return out.get();
    }

    /**
     * @param task a condition evaluated on the event thread
     * @return its value, or false when it threw
     */
    public static boolean callQuietly(Callable<Boolean> task) {
        try {
            return call(task);
        } catch (Exception e) {
            return false;
        }
    }

    /**
     * Waits for a condition (generous limit: the tests check behaviour, not speed).
     * @param condition the condition
     * @param what what is awaited, for the failure message
     * @throws InterruptedException when interrupted
     */
    public static void waitFor(BooleanSupplier condition, String what) throws InterruptedException {
        long end = System.nanoTime() + 60_000_000_000L;
        while (System.nanoTime() < end) {
            if (condition.getAsBoolean()) {
                return;
            }
            Thread.sleep(50);
        }
        fail("timed out waiting for: " + what);
    }

    /**
     * @param root where to look
     * @param name the component's name
     * @return the first component of that name below root (depth first), or null
     */
    public static Component find(Container root, String name) {
        for (Component c : root.getComponents()) {
            if (name.equals(c.getName())) {
                return c;
            }
            if (c instanceof Container sub) {
                Component found = find(sub, name);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }
}
