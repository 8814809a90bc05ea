package org.counterpoise.ui.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.AWTEvent;
import java.awt.EventQueue;
import java.awt.Toolkit;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JTabbedPane;
import javax.swing.MenuElement;
import javax.swing.MenuSelectionManager;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.ui.gui.wizard.WizardFrame;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * No event of the wizard's event thread runs long while the window makes its steps after the first
 * one, designs, and a user walks every step, every tab of the result step and the File menu's
 * example scenarios (issue 17; the product rule "nothing slower than about 50 ms on the event
 * thread"). A guard against regressions such as every step made in one event (as before issue 17),
 * not a measurement of the 50 ms figure (that is src/jmh/sh/edt_events.sh, docs/performance.md,
 * "Long events on the wizard's event thread"). What is bounded is the event thread's CPU time per
 * event, which a loaded build machine does not stretch as it stretches wall time (2 to 10 times
 * there at load 4 to 10). The bound, 300 ms, is about three times the longest this test saw after
 * the change (72 to 110 ms, run alone on the 2-core build machine), and below what it saw with every
 * step made in one event (450 ms, a throwaway change): a step made whole in one event (up to 170 ms
 * before the change) is not caught; the harness shows that.
 */
class LongEventGuiTest {
    /** Bound on the event thread's CPU time for one event (ms): generous, see the class comment. */
    private static final long BOUND_MS = 300;
    private WizardFrame frame;
    private EventTimes times;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(LongEventGuiTest.class);
        Assumptions.assumeTrue(ManagementFactory.getThreadMXBean().isCurrentThreadCpuTimeSupported(),
                "this JVM does not measure a thread's CPU time");
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(frame);
        if (times != null) {
            times.remove();
        }
    }

    @Test
    void noEventRunsLongWhileTheWizardStartsAndIsWalked() throws Exception {
        times = EventTimes.install();
        frame = Edt.call(() -> {
            WizardFrame f = WizardFrame.firstStepOnly(); // as GuiMain opens it
            f.setVisible(true);
            return f;
        });
        times.record(true); // from the window's showing: the event that makes it is the first window's
        Edt.call(() -> {
            frame.makeRestLater();
            return null;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.settled() && frame.shownResult() != null), "the first design");
        waitForTasks();
        for (int step = 0; step < 7; step++) {
            int s = step;
            Edt.call(() -> {
                frame.showStep(s);
                return null;
            });
            waitForTasks();
            if (step == 4) {
                JTabbedPane tabs = (JTabbedPane) Edt.call(() -> Edt.find(frame.getContentPane(), "result.views"));
                for (int tab : new int[] {1, 2, 3, 4, 0}) {
                    Edt.call(() -> {
                        tabs.setSelectedIndex(tab);
                        return null;
                    });
                    waitForTasks();
                }
            }
        }
        // the File menu's example scenarios, opened as a user opens them: every preset under its project's name
        JMenu scenarios = Edt.call(() -> {
            JMenuBar bar = frame.getJMenuBar();
            JMenu file = bar.getMenu(0);
            JMenu presets = (JMenu) Edt.find(file.getPopupMenu(), "menu.presets");
            MenuSelectionManager.defaultManager().setSelectedPath(
                    new MenuElement[] {bar, file, file.getPopupMenu(), presets, presets.getPopupMenu()});
            return presets;
        });
        List<String> names = Presets.names();
        Edt.waitFor(() -> Edt.callQuietly(() -> scenarios.getItemCount() == names.size()
                && scenarios.getItem(0).isEnabled()), "the example scenarios' names");
        assertEquals(Presets.load(names.get(names.size() - 1)).project().name(),
                Edt.call(() -> scenarios.getItem(names.size() - 1).getText()));
        Edt.call(() -> {
            MenuSelectionManager.defaultManager().clearSelectedPath();
            return null;
        });
        Edt.call(() -> null); // the queue has run past the menu's closing
        times.record(false);
        assertTrue(times.events() > 200, "the timing queue saw the walk's events (" + times.events() + ")");
        List<String> slow = times.longerThan(BOUND_MS);
        System.out.println("LongEventGuiTest: " + times.events() + " events; the longest " + times.longest()
                + "; over 50 ms: " + times.longerThan(50));
        assertTrue(slow.isEmpty(), "events of the event thread over " + BOUND_MS + " ms CPU: " + slow);
    }

    /** Waits for the task bar to be empty twice in a row (the background parts done and shown). */
    private void waitForTasks() throws Exception {
        int empty = 0;
        long end = System.nanoTime() + 60_000_000_000L;
        while (empty < 2 && System.nanoTime() < end) {
            Thread.sleep(200);
            empty = Edt.call(() -> frame.taskText().isEmpty()) ? empty + 1 : 0;
        }
    }

    /** The system event queue, timing each event's CPU time on the event thread while recording. */
    private static final class EventTimes extends EventQueue {
        private final ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        /** An event over 50 ms of CPU: its time and what it was. */
        private record Slow(long ms, String what) {
            @Override
            public String toString() {
                return ms + " ms CPU: " + what;
            }
        }

        private final List<Slow> slow = Collections.synchronizedList(new ArrayList<>());
        private volatile boolean recording;
        private volatile long events;
        private volatile long longestNanos;
        private volatile String longest = "none";

        static EventTimes install() {
            EventTimes q = new EventTimes();
            Toolkit.getDefaultToolkit().getSystemEventQueue().push(q);
            return q;
        }

        void record(boolean on) {
            recording = on;
        }

        void remove() {
            pop();
        }

        long events() {
            return events;
        }

        String longest() {
            return longest;
        }

        List<String> longerThan(long ms) {
            synchronized (slow) {
                return slow.stream().filter(s -> s.ms() > ms).map(Slow::toString).toList();
            }
        }

        @Override
        protected void dispatchEvent(AWTEvent event) {
            if (!recording) {
                super.dispatchEvent(event);
                return;
            }
            long start = threads.getCurrentThreadCpuTime();
            try {
                super.dispatchEvent(event);
            } finally {
                long took = threads.getCurrentThreadCpuTime() - start;
                events++;
                if (took > 50_000_000L) {
                    String what = String.valueOf(event);
                    slow.add(new Slow(took / 1_000_000L, what.length() > 300 ? what.substring(0, 300) : what));
                }
                if (took > longestNanos) {
                    longestNanos = took;
                    longest = String.format(Locale.ROOT, "%d ms CPU", took / 1_000_000L);
                }
            }
        }
    }
}
