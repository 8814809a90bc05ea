package org.counterpoise.ui.gui.task;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import javax.swing.JButton;
import javax.swing.SwingUtilities;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.ui.gui.Edt;
import org.junit.jupiter.api.Test;

/**
 * The task runner's two rules, with jobs held on latches so that the order of events is fixed (no
 * timing): a result computed for an older generation is never handed over, and Cancel drops a
 * job's result and says so, while a job that finished before it noticed Cancel is reported done.
 */
class TaskRunnerTest {
    private final AtomicLong generation = new AtomicLong();
    private final List<String> outcomes = new CopyOnWriteArrayList<>();

    @Test
    void aResultForAnOlderGenerationIsDropped() throws Exception {
        TaskRunner runner = new TaskRunner(generation::get, null);
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch bothOver = new CountDownLatch(2);
        SwingUtilities.invokeAndWait(() -> {
            over(runner.current(null, p -> {
                release.await();
                return "old";
            }, r -> outcomes.add("shown " + r), e -> outcomes.add("failed")), bothOver);
            generation.incrementAndGet(); // an edit while the job runs
            over(runner.current(null, p -> "new", r -> outcomes.add("shown " + r), e -> outcomes.add("failed")),
                    bothOver);
        });
        release.countDown();
        assertTrue(bothOver.await(30, TimeUnit.SECONDS));
        assertEquals(List.of("shown new"), outcomes);
    }

    /**
     * Counts down when the worker is DONE, which SwingWorker reports on the event thread after its
     * done() ran. Called on the event thread, so the report cannot have been delivered before.
     */
    private static void over(javax.swing.SwingWorker<?, ?> worker, CountDownLatch latch) {
        worker.addPropertyChangeListener(e -> {
            if ("state".equals(e.getPropertyName()) && e.getNewValue() == javax.swing.SwingWorker.StateValue.DONE) {
                latch.countDown();
            }
        });
    }

    @Test
    void cancelDropsTheResultAndALateCancelStillReportsAFinishedJob() throws Exception {
        TaskBar bar = onEdt(TaskBar::new);
        TaskRunner runner = new TaskRunner(generation::get, bar);
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch over = new CountDownLatch(1);
        SwingUtilities.invokeAndWait(() -> runner.requested("Saving x.json", p -> {
            p.phase("writing");
            started.countDown();
            release.await();
            p.checkCancelled();
            return "written";
        }, r -> {
            outcomes.add("done " + r);
            over.countDown();
        }, e -> over.countDown(), () -> {
            outcomes.add("cancelled");
            over.countDown();
        }));
        assertTrue(started.await(30, TimeUnit.SECONDS));
        flush();
        assertTrue(onEdt(bar::shown).startsWith("Saving x.json"), onEdt(bar::shown));
        assertEquals(Optional.of(TaskBar.State.RUNNING), onEdt(bar::shownState));
        onEdt(() -> {
            cancelButton(bar).doClick();
            return null;
        });
        // the bar decides on the typed state, not on its text: Cancel is off while the job stops
        assertEquals(Optional.of(TaskBar.State.CANCELLING), onEdt(bar::shownState));
        assertEquals("Saving x.json: cancelling\u2026", onEdt(bar::shown));
        assertFalse(onEdt(() -> cancelButton(bar).isEnabled()));
        release.countDown();
        assertTrue(over.await(30, TimeUnit.SECONDS));
        flush();
        assertEquals(List.of("cancelled"), outcomes);
        assertEquals("", onEdt(bar::shown), "the bar is empty again");

        // Cancel pressed after the job's last check: the job's work is done and is reported as done.
        outcomes.clear();
        CountDownLatch past = new CountDownLatch(1);
        CountDownLatch go = new CountDownLatch(1);
        CountDownLatch end = new CountDownLatch(1);
        SwingUtilities.invokeAndWait(() -> runner.requested("Saving y.json", p -> {
            p.checkCancelled();
            past.countDown();
            go.await();
            return "written";
        }, r -> {
            outcomes.add("done " + r);
            end.countDown();
        }, e -> end.countDown(), () -> {
            outcomes.add("cancelled");
            end.countDown();
        }));
        assertTrue(past.await(30, TimeUnit.SECONDS));
        onEdt(() -> {
            cancelButton(bar).doClick();
            return null;
        });
        go.countDown();
        assertTrue(end.await(30, TimeUnit.SECONDS));
        assertEquals(List.of("done written"), outcomes);
    }

    @Test
    void aNewGenerationCancelsTheStaleJobsAndInterruptsThem() throws Exception {
        TaskRunner runner = new TaskRunner(generation::get, null);
        CountDownLatch bothStarted = new CountDownLatch(2);
        CountDownLatch bothStopped = new CountDownLatch(2);
        SwingUtilities.invokeAndWait(() -> {
            // a job that blocks until it is interrupted
            runner.current(null, p -> {
                bothStarted.countDown();
                try {
                    new CountDownLatch(1).await();
                } catch (InterruptedException e) {
                    outcomes.add("blocked job interrupted");
                } finally {
                    bothStopped.countDown();
                }
                return "never";
            }, r -> outcomes.add("shown " + r), e -> outcomes.add("failed"));
            // a long core computation that asks the core's question between its pieces
            runner.current(null, p -> {
                bothStarted.countDown();
                try {
                    while (true) {
                        p.checkCancelled("the long computation"); // ProgressListener's check
                        Thread.onSpinWait();
                    }
                } catch (CoreException e) {
                    outcomes.add("computation stopped: " + e.key());
                    throw e;
                } finally {
                    bothStopped.countDown();
                }
            }, r -> outcomes.add("shown"), e -> outcomes.add("failed"));
        });
        assertTrue(bothStarted.await(30, TimeUnit.SECONDS));
        assertEquals(2, onEdt(runner::currentJobsRunning));
        CountDownLatch fresh = new CountDownLatch(1);
        SwingUtilities.invokeAndWait(() -> {
            generation.incrementAndGet(); // an edit: the two jobs now work for an old state
            runner.current(null, p -> "new", r -> {
                outcomes.add("shown " + r);
                fresh.countDown();
            }, e -> fresh.countDown());
        });
        assertTrue(bothStopped.await(30, TimeUnit.SECONDS), "both stale jobs stopped without finishing");
        assertTrue(fresh.await(30, TimeUnit.SECONDS));
        flush();
        assertEquals(List.of("blocked job interrupted", "computation stopped: CANCELLED", "shown new"),
                outcomes.stream().sorted().toList());
    }

    private static JButton cancelButton(TaskBar bar) {
        for (var c : bar.getComponents()) {
            if ("tasks.cancel".equals(c.getName())) {
                return (JButton) c;
            }
        }
        throw new AssertionError("no Cancel button");
    }

    private static void flush() throws Exception {
        SwingUtilities.invokeAndWait(() -> { });
    }

    private static <T> T onEdt(Callable<T> task) throws Exception {
        return Edt.call(task);
    }
}
