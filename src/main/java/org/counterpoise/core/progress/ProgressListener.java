package org.counterpoise.core.progress;

import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.Messages;

/**
 * What a long computation of the core (a run-up integration, a Monte Carlo run, a robust design)
 * reports while it runs, and how it is asked to stop. Both methods have do-nothing defaults, so a
 * caller implements only what it needs; the algorithm never calls a front end directly. The
 * computation calls them from the thread that started it, between pieces of work; a listener must
 * be cheap (a front end throttles what it shows).
 */
public interface ProgressListener {

    /** A listener that shows nothing and never cancels. */
    ProgressListener NONE = new ProgressListener() {
    };

    /**
     * @param fraction the share of the work done, 0 to 1
     */
    default void progress(double fraction) {
    }

    /** @return true when the caller wants the computation to stop as soon as it can */
    default boolean cancelled() {
        return false;
    }

    /**
     * The one check a computation makes between its pieces: the listener's wish or an interrupt of
     * the running thread (a front end that drops a stale job interrupts it) both stop it.
     *
     * @param what what stops, for the message ("the Monte Carlo run")
     * @throws CoreException with key {@link Messages#CANCELLED}; the computation returns nothing,
     *     so no partial result can be shown as complete
     */
    default void checkCancelled(String what) {
        if (cancelled() || Thread.currentThread().isInterrupted()) {
            throw new CoreException(Messages.CANCELLED, what);
        }
    }

    /**
     * @param offset the share of the whole done before this part, 0 to 1
     * @param share this part's share of the whole, 0 to 1
     * @return a listener for one part of a longer computation: it reports into [offset, offset +
     *     share] and cancels with this one
     */
    default ProgressListener part(double offset, double share) {
        ProgressListener whole = this;
        return new ProgressListener() {
            @Override
            public void progress(double fraction) {
                whole.progress(offset + share * fraction);
            }

            @Override
            public boolean cancelled() {
                return whole.cancelled();
            }
        };
    }
}
