package org.counterpoise.ui.gui.wizard;

import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Supplier;

/**
 * One step of the wizard, made when first needed (docs/performance.md, "The wizard's first
 * window"): {@link #get} makes it, and the wizard then attaches it to the document, shows it the
 * project and adds its page. A step not made yet has no text typed in it, so its fields are valid
 * and it shows no problem; what it would show is the document's project, which it is shown when
 * made. Event thread only.
 *
 * @param <S> the step
 */
final class Page<S extends Step> {
    private final String title;
    private final Supplier<S> maker;
    private final List<Part<?>> parts;
    private Consumer<Step> whenMade = s -> { };
    private S step;
    /** Made by {@link #build()} but not yet attached: a step in the middle of its making, not counted as made. */
    private S built;

    /**
     * @param title the step's title (as its {@link Step#title()} gives it)
     * @param maker makes the step (from its parts, if any)
     * @param parts large pieces of the step, each made ahead of it in an event of its own by {@link #build()}
     */
    Page(String title, Supplier<S> maker, Part<?>... parts) {
        this.title = title;
        this.maker = maker;
        this.parts = List.of(parts);
    }

    /** @param action told of the step once it is made (before anyone else uses it) */
    void whenMade(Consumer<Step> action) {
        this.whenMade = action;
    }

    /** @return the step's title, without making it */
    String title() {
        return title;
    }

    /**
     * One piece of the step's making, without attaching it or showing it the project: its next part
     * not made yet, or else its components. Called once per event until {@link #built()}, then
     * {@link #get()} attaches it, so a step made in the background chain takes several shorter
     * events instead of one (docs/performance.md, "Long events on the wizard's event thread"). It
     * still counts as not made.
     */
    void build() {
        if (step != null || built != null) {
            return;
        }
        for (Part<?> p : parts) {
            if (!p.made()) {
                p.get();
                return;
            }
        }
        built = maker.get();
    }

    /** @return true when {@link #build()} made the step's components and {@link #get()} has not yet attached them */
    boolean built() {
        return built != null;
    }

    /** @return the step, made now (or its making finished now) if it was not yet */
    S get() {
        if (step == null) {
            step = built != null ? built : maker.get();
            built = null;
            try {
                whenMade.accept(step);
            } catch (RuntimeException | Error failed) {
                // not half made: the step counts as made only once it is attached and shown its project
                step = null;
                throw failed;
            }
        }
        return step;
    }

    /** @return the step if it was made, without making it */
    Optional<S> ifMade() {
        return Optional.ofNullable(step);
    }

    /** @return true once the step was made */
    boolean made() {
        return step != null;
    }

    /** @return the problem the step shows, or null (a step not made shows none) */
    String problem() {
        return step == null ? null : step.problem();
    }

    /** @return true when every field of the step holds a value (a step not made holds no text) */
    boolean fieldsValid() {
        return step == null || step.fieldsValid();
    }
}
