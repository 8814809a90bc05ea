package org.counterpoise.ui.gui;

import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import javax.swing.SwingUtilities;

/** Runs test code on the Swing event thread and hands back its result or its exception. */
public final class Edt {
    private Edt() {
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
}
