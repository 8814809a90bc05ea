package org.counterpoise.ui.gui.wizard;

import java.awt.CardLayout;
import java.awt.Component;
import java.awt.Container;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;
import javax.swing.JPanel;
import javax.swing.Timer;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.gui.field.QuantityField;
import org.counterpoise.ui.gui.field.ScrollingPage;

/**
 * The wizard's steps and the cards that show them. The window opens with the first step made; the
 * others are made when first needed (shown, or read by the design) or, after the window is showing,
 * in order, a piece per event ({@link #makeRestLater}), so the first window waits for the first step
 * only and the event queue runs between the others (docs/performance.md, "The wizard's first
 * window"). Each step, once made, is attached and shown the project by the wizard, and its page
 * takes its place among the cards in step order. Event thread only.
 */
final class StepPages {
    /** Pause before each step made after the window shows (ms). */
    private static final int PAUSE_MS = 20;
    private final List<Page<? extends Step>> pages;
    private final CardLayout cards = new CardLayout();
    private final JPanel center = new JPanel(cards);
    private UnitSystem shownSystem = UnitSystem.SI;

    /**
     * @param pages the steps in order
     * @param prepare attaches a step just made to the document and shows it the project
     */
    StepPages(List<Page<? extends Step>> pages, Consumer<Step> prepare) {
        this.pages = List.copyOf(pages);
        for (Page<? extends Step> p : this.pages) {
            p.whenMade(s -> {
                prepare.accept(s);
                int before = 0;
                for (Page<? extends Step> q : this.pages) {
                    if (q == p) {
                        break;
                    }
                    before += q.made() ? 1 : 0;
                }
                Container page = ScrollingPage.of(s.component());
                center.add(page, p.title(), before);
                if (shownSystem != UnitSystem.SI) {
                    forEachField(page, f -> f.unitSystem(shownSystem));
                }
                center.revalidate();
            });
        }
    }

    /** @return the panel of cards, one per step made */
    JPanel center() {
        return center;
    }

    /** @return how many steps there are */
    int size() {
        return pages.size();
    }

    /** @param index a step @return its page (the step not made by this) */
    Page<? extends Step> page(int index) {
        return pages.get(index);
    }

    /** @param index a step to show, made now if it was not yet @return the step */
    Step show(int index) {
        Step s = pages.get(index).get();
        cards.show(center, pages.get(index).title());
        return s;
    }

    /** @return true once every step is made */
    boolean allMade() {
        return pages.stream().allMatch(Page::made);
    }

    /** Makes every step not made yet, now. */
    void makeAll() {
        pages.forEach(Page::get);
    }

    /**
     * Makes the steps not made yet in order, each in several events (its large parts, its
     * components, then attaching it and showing it the project), each after a short pause (the queue
     * runs between them), and then runs an action.
     * @param then run on the event thread once every step is made
     */
    void makeRestLater(Runnable then) {
        makeRestLater(then, new HashSet<>());
    }

    /**
     * @param then run once every step is made (or failed)
     * @param failed the pages whose making failed (not tried again: the failure was reported once, by
     *     the event thread's handler)
     */
    private void makeRestLater(Runnable then, Set<Page<? extends Step>> failed) {
        // a short pause before each: the window's first paint and what the user does come first
        Timer next = new Timer(PAUSE_MS, e -> {
            if (!center.isDisplayable()) {
                return; // the window was closed meanwhile: nothing more to make, nothing to design
            }
            for (Page<? extends Step> p : pages) {
                if (!p.made() && !failed.contains(p)) {
                    try {
                        if (p.built()) {
                            p.get(); // attached and shown the project: made
                        } else {
                            p.build(); // a part, or its components: attached once built
                        }
                    } catch (RuntimeException | Error bug) {
                        failed.add(p);
                        throw bug;
                    } finally {
                        makeRestLater(then, failed);
                    }
                    return;
                }
            }
            then.run();
        });
        next.setRepeats(false);
        next.start();
    }

    /**
     * Every quantity field of every step offers the system's units first (a number keeps its unit);
     * a step made later does the same when made.
     * @param system the project's unit system
     */
    void showUnitSystem(UnitSystem system) {
        if (system == shownSystem) {
            return;
        }
        shownSystem = system;
        forEachField(center, f -> f.unitSystem(system));
    }

    private static void forEachField(Container root, Consumer<QuantityField> action) {
        for (Component c : root.getComponents()) {
            if (c instanceof QuantityField f) {
                action.accept(f);
            } else if (c instanceof Container sub) {
                forEachField(sub, action);
            }
        }
    }
}
