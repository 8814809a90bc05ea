package org.counterpoise.ui.gui.task;

/** What a background job may tell the task bar, and the question it asks between its phases. */
public interface Progress {
    /** @param what the phase now running, in a few words */
    void phase(String what);

    /**
     * @throws Cancelled when the user pressed Cancel; the job stops here and nothing is shown
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
