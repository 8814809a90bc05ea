package org.counterpoise.bench;

import java.awt.Component;
import java.awt.Container;
import java.awt.Point;
import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.Toolkit;
import java.awt.Window;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import javax.imageio.ImageIO;
import javax.swing.JList;
import javax.swing.JMenu;
import javax.swing.JTabbedPane;
import javax.swing.SwingUtilities;
import org.counterpoise.ui.gui.GuiMain;
import org.counterpoise.ui.gui.wizard.WizardFrame;

/**
 * Long events on the wizard's event thread (issue 17; docs/performance.md, "Long events on the
 * wizard's event thread"). Installs {@link SlowEventLog} (every event dispatched for longer than
 * {@code -Dedt.bound=50} ms), then does what a user does in a first session, with real mouse and
 * key events through {@link Robot}: starts the wizard as the jar does ({@link GuiMain#launch()}),
 * waits for the first design and its background parts, clicks every step in the step list (and on
 * the result step every tab), then opens the File menu and its example scenarios. After each click
 * it waits for the task bar to empty and a second more. Prints every long event (duration, start
 * since the log was installed, phase, event, where its time went), then one line
 * {@code long-events N max M ms} and exits. With {@code -Dedt.shots=FOLDER} it also photographs
 * the screen after each click; with {@code -Dedt.second=true} it then closes the window and opens a
 * second one in the same JVM (what remains once classes are loaded and the code compiled). Run by
 * {@code src/jmh/sh/edt_events.sh} under Xvfb.
 */
public final class EdtEventTime {
    private static final String[] TABS = {"Steady state", "Run-up", "Comparison of methods", "Hardware",
        "Several absorbers"};
    private static Robot robot;
    private static Path shots;
    private static int shot;

    private EdtEventTime() {
    }

    /**
     * @param args none
     * @throws Exception when the event thread or the robot fails (the harness's own failure)
     */
    public static void main(String[] args) throws Exception {
        SlowEventLog log = SlowEventLog.install(Long.getLong("edt.bound", 50));
        String shotFolder = System.getProperty("edt.shots");
        if (shotFolder != null) {
            shots = Files.createDirectories(Path.of(shotFolder));
        }
        robot = new Robot();
        log.phase("start-up");
        GuiMain.launch();
        WizardFrame frame = waitForWizard();
        log.phase("first design");
        waitUntil(() -> frame.settled() && frame.shownResult() != null, 120);
        waitForTasks(frame);
        photograph("start");
        JList<?> steps = (JList<?>) on(() -> find(frame.getContentPane(), "steps"));
        for (int i = 0; i < 7; i++) {
            int index = i;
            log.phase("step " + (i + 1));
            click(on(() -> onScreen(steps, steps.getCellBounds(index, index))));
            waitForTasks(frame);
            if (i == 6) {
                waitUntil(frame::sheetPreviewShown, 60); // drawn in the background
                Thread.sleep(1000); // and painted
            }
            photograph("step" + (i + 1));
            if (i == 4) {
                JTabbedPane tabs = (JTabbedPane) on(() -> find(frame.getContentPane(), "result.views"));
                for (int t : new int[] {1, 2, 3, 4, 0}) {
                    log.phase("result tab " + TABS[t]);
                    click(on(() -> onScreen(tabs, tabs.getBoundsAt(t))));
                    waitForTasks(frame);
                    photograph("step5-tab" + t);
                }
            }
        }
        log.phase("File menu");
        JMenu file = on(() -> frame.getJMenuBar().getMenu(0));
        click(on(() -> onScreen(file, new Rectangle(0, 0, file.getWidth(), file.getHeight()))));
        Thread.sleep(800);
        log.phase("example scenarios");
        JMenu presets = (JMenu) on(() -> find(file.getPopupMenu(), "menu.presets"));
        Point p = on(() -> onScreen(presets, new Rectangle(0, 0, presets.getWidth(), presets.getHeight())));
        robot.mouseMove(p.x, p.y);
        Thread.sleep(1500);
        photograph("presets");
        log.phase("menu closed");
        robot.keyPress(KeyEvent.VK_ESCAPE);
        robot.keyRelease(KeyEvent.VK_ESCAPE);
        robot.keyPress(KeyEvent.VK_ESCAPE);
        robot.keyRelease(KeyEvent.VK_ESCAPE);
        Thread.sleep(800);
        on(() -> true);
        if (Boolean.getBoolean("edt.second")) {
            // a second window in the same JVM: what remains once classes are loaded and code is compiled
            log.phase("second window");
            on(() -> {
                frame.dispose();
                return null;
            });
            GuiMain.launch();
            Thread.sleep(2000);
            WizardFrame second = waitForWizard();
            log.phase("second window's design");
            waitUntil(() -> second.settled() && second.shownResult() != null, 120);
            waitForTasks(second);
        }
        System.out.printf("events dispatched %d; longer than %d ms:%n", log.dispatched(),
                Long.getLong("edt.bound", 50));
        long max = 0;
        for (SlowEventLog.Slow s : log.slow()) {
            System.out.println(s);
            max = Math.max(max, s.durationMs());
        }
        System.out.printf("long-events %d max %d ms%n", log.slow().size(), max);
        System.exit(0);
    }

    private static WizardFrame waitForWizard() throws Exception {
        long giveUp = System.nanoTime() + 60_000_000_000L;
        while (System.nanoTime() < giveUp) {
            for (Window w : Window.getWindows()) {
                if (w instanceof WizardFrame f && w.isShowing()) {
                    return f;
                }
            }
            Thread.sleep(5);
        }
        throw new IllegalStateException("no wizard window within 60 s");
    }

    /** Waits until nothing runs in the background (the task bar empty twice, 0.3 s apart), then a second more. */
    private static void waitForTasks(WizardFrame frame) throws Exception {
        Thread.sleep(300);
        int empty = 0;
        long giveUp = System.nanoTime() + 60_000_000_000L;
        while (empty < 2 && System.nanoTime() < giveUp) {
            empty = on(() -> frame.taskText().isEmpty()) ? empty + 1 : 0;
            Thread.sleep(300);
        }
        Thread.sleep(1000);
    }

    private static void waitUntil(Callable<Boolean> condition, int seconds) throws Exception {
        long giveUp = System.nanoTime() + seconds * 1_000_000_000L;
        while (!on(condition)) {
            if (System.nanoTime() > giveUp) {
                throw new IllegalStateException("the wizard did not settle within " + seconds + " s");
            }
            Thread.sleep(50);
        }
    }

    private static void click(Point at) throws InterruptedException {
        robot.mouseMove(at.x, at.y);
        Thread.sleep(100);
        robot.mousePress(InputEvent.BUTTON1_DOWN_MASK);
        robot.mouseRelease(InputEvent.BUTTON1_DOWN_MASK);
    }

    private static Point onScreen(Component c, Rectangle r) {
        Point origin = c.getLocationOnScreen();
        return new Point(origin.x + r.x + r.width / 2, origin.y + r.y + r.height / 2);
    }

    private static void photograph(String name) throws Exception {
        if (shots == null) {
            return;
        }
        Rectangle screen = new Rectangle(Toolkit.getDefaultToolkit().getScreenSize());
        ImageIO.write(robot.createScreenCapture(screen), "png",
                shots.resolve(String.format("%02d-%s.png", shot++, name)).toFile());
    }

    private static <T> T on(Callable<T> task) throws Exception {
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

    private static Component find(Container root, String name) {
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
