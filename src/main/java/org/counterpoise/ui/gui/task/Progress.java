package org.counterpoise.ui.gui.task;

import org.counterpoise.core.progress.ProgressListener;

/**
 * What a background job may tell the task bar, and the question it asks between its phases. It is
 * also the core's {@link ProgressListener}, so a job hands it straight to a long computation (the
 * Monte Carlo, the robust design, a run-up), which reports its share done and stops on Cancel or
 * when the job is dropped as stale.
 */
public interface Progress extends ProgressListener {
    /** @param what the phase now running, in a few words */
    void phase(String what);

    /**
     * @throws Cancelled when the user pressed Cancel or the job was dropped; the job stops here
     *     and nothing is shown
     */
    void checkCancelled();

    /** Thrown inside a job when the user cancelled it. */
    final class Cancelled extends RuntimeException {
        private static final long serialVersionUID = 1L;

        /** The one kind of cancellation. */
        public Cancelled() {
            super("cancelled", null, false, false);
        }
    }
}
