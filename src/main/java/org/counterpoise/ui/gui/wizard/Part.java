package org.counterpoise.ui.gui.wizard;

import java.util.function.Supplier;

/**
 * A large piece of a step (a tab, a form), made once: ahead of its step in an event of its own
 * when the wizard makes its steps after the first window ({@link Page#build()}), or by the step's
 * maker when the step is needed sooner. So no event makes a whole large step (docs/performance.md,
 * "Long events on the wizard's event thread"). Event thread only.
 *
 * @param <T> the piece
 */
final class Part<T> implements Supplier<T> {
    private final Supplier<T> maker;
    private T made;

    /** @param maker makes the piece */
    Part(Supplier<T> maker) {
        this.maker = maker;
    }

    /** @return the piece, made now if it was not yet */
    @Override
    public T get() {
        if (made == null) {
            made = maker.get();
        }
        return made;
    }

    /** @return true once the piece was made */
    boolean made() {
        return made != null;
    }
}
