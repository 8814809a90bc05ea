package org.counterpoise.core.runup;

/**
 * What a long computation reports while it runs, and how it is asked to stop. Both methods have
 * do-nothing defaults, so a caller implements only what it needs. The computation calls them from
 * its own thread, once per integration step; a listener must therefore be cheap and thread-safe
 * (a front end throttles what it shows).
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
}
