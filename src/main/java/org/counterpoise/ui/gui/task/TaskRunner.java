package org.counterpoise.ui.gui.task;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import java.util.function.LongSupplier;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.Messages;

/**
 * Runs work off the event thread and hands the outcome back on it. Two rules:
 * <ul>
 * <li>stale results are dropped: a job is tagged with the document generation it was computed
 * from, and its result is shown only if the generation is still the same when it ends (a result
 * for an old state is never shown as current); when a job for a newer generation starts, the
 * jobs of older ones are cancelled and their threads interrupted, so a long computation for a
 * state nobody looks at any more stops at its next check instead of running on;</li>
 * <li>long jobs the user asked for (saving, the sheet, exports, the Monte Carlo) appear on the
 * {@link TaskBar} with their phase and a Cancel button; cancelling drops the result, and jobs check
 * for it between their phases (a file write that started completes, or leaves the old file).</li>
 * </ul>
 */
public final class TaskRunner {
    private final LongSupplier generation;
    private final TaskBar bar;
    /** Jobs of {@link #current} still running, with the generation they were started for; event thread only. */
    private final List<Running> currentJobs = new ArrayList<>();

    private record Running(long generation, SwingWorker<?, ?> worker, AtomicBoolean cancel) {
    }

    /**
     * @param generation the document's current generation
     * @param bar where visible jobs show their progress
     */
    public TaskRunner(LongSupplier generation, TaskBar bar) {
        this.generation = generation;
        this.bar = bar;
    }

    /**
     * A job: runs on a worker thread.
     * @param <T> its result
     */
    @FunctionalInterface
    public interface Job<T> {
        /**
         * @param progress where to report phases and check for Cancel
         * @return the result
         * @throws Exception any failure, handed to the failure callback
         */
        T run(Progress progress) throws Exception;
    }

    /**
     * Runs a job whose result describes the document as it is now: dropped if the document
     * changed before it ended.
     * @param <T> result type
     * @param title what runs, for the task bar; null to run without showing it
     * @param job the work
     * @param done called on the event thread with a current result
     * @param failed called on the event thread with the failure of a current job
     * @return the worker (its state turns DONE after the callbacks ran)
     */
    public <T> SwingWorker<T, Void> current(String title, Job<T> job, Consumer<T> done, Consumer<Throwable> failed) {
        return current(title, job, done, failed, () -> { });
    }

    /**
     * As {@link #current(String, Job, Consumer, Consumer)}, and told when the user cancelled it.
     * @param <T> result type
     * @param title what runs, for the task bar; null to run without showing it
     * @param job the work
     * @param done called on the event thread with a current result
     * @param failed called on the event thread with the failure of a current job
     * @param cancelled called on the event thread when the user cancelled a current job
     * @return the worker (its state turns DONE after the callbacks ran)
     */
    public <T> SwingWorker<T, Void> current(String title, Job<T> job, Consumer<T> done, Consumer<Throwable> failed,
            Runnable cancelled) {
        long started = generation.getAsLong();
        cancelStale();
        AtomicBoolean cancel = new AtomicBoolean();
        SwingWorker<T, Void> worker = start(title, job, cancel, r -> {
            if (generation.getAsLong() == started) {
                done.accept(r);
            }
        }, e -> {
            if (generation.getAsLong() == started) {
                failed.accept(e);
            }
        }, () -> {
            if (generation.getAsLong() == started) {
                cancelled.run();
            }
        });
        Running running = new Running(started, worker, cancel);
        currentJobs.add(running);
        worker.addPropertyChangeListener(e -> {
            if (worker.isDone()) {
                currentJobs.remove(running);
            }
        });
        return worker;
    }

    /**
     * Cancels every job of {@link #current} started for an older generation than the document's
     * now, and interrupts its thread; its outcome is dropped. Called when a job for a new generation
     * starts; a front end may call it as soon as the document changes. Event thread.
     */
    public void cancelStale() {
        long now = generation.getAsLong();
        for (Running r : List.copyOf(currentJobs)) {
            if (r.generation() < now) {
                r.cancel().set(true);
                r.worker().cancel(true);
                currentJobs.remove(r);
            }
        }
    }

    /** @return how many jobs of {@link #current} are still running (for tests) */
    int currentJobsRunning() {
        return currentJobs.size();
    }

    /**
     * Runs a job the user asked for (a save, an export): its outcome is reported whatever the
     * document did meanwhile.
     * @param <T> result type
     * @param title what runs, for the task bar
     * @param job the work
     * @param done called on the event thread with the result
     * @param failed called on the event thread with the failure
     * @param cancelled called on the event thread when the user cancelled it
     * @return the worker (its state turns DONE after the callbacks ran)
     */
    public <T> SwingWorker<T, Void> requested(String title, Job<T> job, Consumer<T> done, Consumer<Throwable> failed,
            Runnable cancelled) {
        return start(title, job, new AtomicBoolean(), done, failed, cancelled);
    }

    private <T> SwingWorker<T, Void> start(String title, Job<T> job, AtomicBoolean cancel, Consumer<T> done,
            Consumer<Throwable> failed, Runnable cancelled) {
        TaskBar.Entry entry = title == null || bar == null ? null : bar.add(title, () -> cancel.set(true));
        AtomicInteger shownPercent = new AtomicInteger(-1);
        Progress progress = new Progress() {
            @Override
            public void phase(String what) {
                if (entry != null) {
                    SwingUtilities.invokeLater(() -> entry.phase(what));
                }
            }

            @Override
            public void checkCancelled() {
                if (cancelled() || Thread.currentThread().isInterrupted()) {
                    throw new Progress.Cancelled();
                }
            }

            @Override
            public boolean cancelled() {
                return cancel.get();
            }

            @Override
            public void progress(double fraction) {
                // throttled: the event thread hears of a whole percent at most once
                int now = (int) Math.floor(100 * Math.min(1.0, Math.max(0.0, fraction)));
                if (entry != null && now > shownPercent.getAndAccumulate(now, Math::max)) {
                    SwingUtilities.invokeLater(() -> entry.percent(now));
                }
            }
        };
        SwingWorker<T, Void> worker = new SwingWorker<T, Void>() {
            @Override
            protected T doInBackground() throws Exception {
                progress.checkCancelled();
                return job.run(progress); // a job that finished is reported as finished, even if Cancel came late
            }

            @Override
            protected void done() {
                if (entry != null) {
                    entry.remove();
                }
                try {
                    T result = get();
                    done.accept(result);
                } catch (CancellationException e) {
                    cancelled.run();
                } catch (ExecutionException e) {
                    if (isCancellation(e.getCause())) {
                        cancelled.run();
                    } else {
                        failed.accept(e.getCause());
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        };
        worker.execute();
        return worker;
    }

    /** @return true for a job's own stop on Cancel: the task bar's kind, or the core's (typed, by key) */
    private static boolean isCancellation(Throwable t) {
        return t instanceof Progress.Cancelled || t instanceof CoreException c && c.key() == Messages.CANCELLED;
    }
}
