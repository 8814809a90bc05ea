package org.counterpoise.core.design;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.locks.ReentrantLock;
import java.util.function.Function;
import java.util.function.Supplier;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.robust.MonteCarloOutcome;

/**
 * Everything computed about one design study, each part computed once: the design, its curves, the
 * tolerance Monte Carlo (or why it was not run), the robustness study and the comparison of methods. Front ends and writers
 * ask the dossier and render what it gives; none of them computes an analysis itself.
 *
 * <p>A part is computed when it is first asked for, on the asking thread, and kept. Two threads
 * asking for the same part at once compute it once: the second waits for the first. A computation
 * that fails or is cancelled keeps nothing, so the next request computes it afresh. The dossier's
 * key is its {@link DesignStudy}, an immutable record compared by value; a {@link Cache} hands out
 * the same dossier for equal studies. The robustness parts use the study's own
 * {@link DesignStudy#robustness()} settings.
 *
 * <p>Thread-safe.
 */
public final class DesignDossier {
    private final DesignStudy study;
    private final Computations computations;
    private final Part<DesignResult> design = new Part<>("the design");
    private final Part<DesignCurves> curves = new Part<>("the design's curves");
    private final Part<MonteCarloOutcome> monteCarlo = new Part<>("the Monte Carlo run");
    private final Part<RobustnessResult> robustness = new Part<>("the robustness study");
    private final Part<MethodComparison> comparison = new Part<>("the comparison of methods");
    /** Parts a higher core layer derives from the design, by key; the most recent {@link #DERIVED_KEPT}. */
    private final Map<Object, Part<Object>> derived = new LinkedHashMap<>(8, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<Object, Part<Object>> eldest) {
            return size() > DERIVED_KEPT;
        }
    };
    /** Derived parts kept per dossier (a few hardware choices tried back and forth). */
    private static final int DERIVED_KEPT = 8;

    /**
     * The analyses a dossier runs. The core's own are {@link #CORE}; tests substitute counting ones
     * (the seam through which "computed once" is checked, in core and in the wizard).
     */
    public interface Computations {
        /** The core's analyses. */
        Computations CORE = new Computations() {
        };

        /**
         * @param study the study
         * @return its design
         */
        default DesignResult design(DesignStudy study) {
            return Designer.design(study);
        }

        /**
         * @param design a design
         * @return its curves
         */
        default DesignCurves curves(DesignResult design) {
            return DesignCurves.of(design);
        }

        /**
         * @param design a design
         * @param listener progress and cancellation
         * @return its Monte Carlo outcome for its study's settings
         */
        default MonteCarloOutcome monteCarlo(DesignResult design, ProgressListener listener) {
            return RobustnessAnalysis.monteCarlo(design, design.study().robustness(), listener);
        }

        /**
         * @param design a design
         * @param monteCarlo its Monte Carlo outcome
         * @param listener progress and cancellation
         * @return its robustness study for its study's settings
         */
        default RobustnessResult robustness(DesignResult design, MonteCarloOutcome monteCarlo,
                ProgressListener listener) {
            return RobustnessAnalysis.run(design, design.study().robustness(), monteCarlo, listener);
        }

        /**
         * @param study a study
         * @param design its design, asked on the calling thread while the other methods' designs
         *     run ({@link MethodComparison#of(DesignStudy, Supplier, ProgressListener)})
         * @param listener progress and cancellation
         * @return the comparison of the design methods for the study
         */
        default MethodComparison comparison(DesignStudy study, Supplier<DesignResult> design,
                ProgressListener listener) {
            return MethodComparison.of(study, design, listener);
        }
    }

    /**
     * @param study the study (the dossier's key)
     * @param computations the analyses to run
     */
    DesignDossier(DesignStudy study, Computations computations) {
        this.study = study;
        this.computations = computations;
    }

    /**
     * A dossier of its own, for a single use (a command); a front end that asks again for the same
     * study uses a {@link Cache}.
     * @param study the study
     * @return its dossier, nothing computed yet
     */
    public static DesignDossier of(DesignStudy study) {
        return new DesignDossier(study, Computations.CORE);
    }

    /** @return the study this dossier is about */
    public DesignStudy study() {
        return study;
    }

    /**
     * @return the design (computed on first request)
     * @throws CoreException the design's own failures (invalid input, no certified optimum), as
     *     {@link Designer#design} throws them; nothing is kept
     */
    public DesignResult design() {
        return design.get(() -> computations.design(study));
    }

    /** @return the design's curves (computed on first request) */
    public DesignCurves curves() {
        DesignResult d = design();
        return curves.get(() -> computations.curves(d));
    }

    /**
     * @param listener progress and cancellation, for this request
     * @return the tolerance Monte Carlo of the design, or why it was not run (computed on first request)
     * @throws CoreException with key {@link Messages#CANCELLED} when cancelled; nothing is kept
     */
    public MonteCarloOutcome monteCarlo(ProgressListener listener) {
        DesignResult d = design();
        return monteCarlo.get(() -> computations.monteCarlo(d, listener));
    }

    /**
     * @param listener progress (a fifth for the Monte Carlo, the rest for the study) and
     *     cancellation, for this request
     * @return the robustness study with the Monte Carlo (computed on first request)
     * @throws CoreException with key {@link Messages#CANCELLED} when cancelled; nothing is kept
     */
    public RobustnessResult robustness(ProgressListener listener) {
        DesignResult d = design();
        return robustness.get(() -> {
            MonteCarloOutcome mc = monteCarlo(listener.part(0.0, 0.2));
            return computations.robustness(d, mc, listener.part(0.2, 0.8));
        });
    }

    /**
     * @param listener progress and cancellation, for this request
     * @return the comparison of the design methods (computed on first request; it designs the study
     *     by every method, so it is not for the event thread). Asked before the design, it makes the
     *     design meanwhile (kept as the dossier's design), beside the other methods' designs.
     * @throws CoreException with key {@link Messages#CANCELLED} when cancelled; nothing is kept; the
     *     design's own failures as {@link #design()} throws them
     */
    public MethodComparison comparison(ProgressListener listener) {
        return comparison.get(() -> computations.comparison(study, this::design, listener));
    }

    /**
     * A part that a higher core layer derives from the design, computed once per key and kept like the
     * dossier's own parts (for the last few keys). core.realisation keeps its realisation per hardware
     * choice here ({@code Realiser.realisation(dossier, choice)}): it sits above core.design, so the
     * dossier cannot name it.
     *
     * @param <T> the part's type
     * @param key what the part is for, compared by value; a record type of the caller's own, so two
     *     callers never share a key
     * @param type the part's type
     * @param compute derives it from the design (on the asking thread, at most once per key at a time)
     * @return the part
     */
    public <T> T derived(Object key, Class<T> type, Function<DesignResult, T> compute) {
        DesignResult d = design();
        Part<Object> part;
        synchronized (derived) {
            part = derived.computeIfAbsent(key, k -> new Part<>("a part derived from the design"));
        }
        return type.cast(part.get(() -> compute.apply(d)));
    }

    /** One part: computed once under its lock; a failure keeps nothing. */
    private static final class Part<T> {
        private final String what;
        private final ReentrantLock lock = new ReentrantLock();
        private volatile T value;

        Part(String what) {
            this.what = what;
        }

        T get(Supplier<T> compute) {
            T known = value;
            if (known != null) {
                return known;
            }
            try {
                lock.lockInterruptibly(); // a job dropped while it waits for another's computation stops here
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new CoreException(Messages.CANCELLED, what);
            }
            try {
                if (value == null) {
                    value = compute.get();
                }
                return value;
            } finally {
                lock.unlock();
            }
        }
    }

    /**
     * The dossiers of the last few studies, keyed by the study: equal studies (the same project
     * state) get the same dossier, so nothing is computed twice for one state, and going back to a
     * recent state (undo) finds its results. Thread-safe.
     */
    public static final class Cache {
        /** Enough for an edit and its undo, and a little more. */
        private static final int KEPT = 4;
        private final Computations computations;
        private final Map<DesignStudy, DesignDossier> recent = new LinkedHashMap<>(8, 0.75f, true) {
            private static final long serialVersionUID = 1L;

            @Override
            protected boolean removeEldestEntry(Map.Entry<DesignStudy, DesignDossier> eldest) {
                return size() > KEPT;
            }
        };

        /** A cache running the core's analyses. */
        public Cache() {
            this(Computations.CORE);
        }

        /** @param computations the analyses its dossiers run */
        public Cache(Computations computations) {
            this.computations = computations;
        }

        /**
         * @param study a study
         * @return its dossier: the one already made for an equal study, or a new one
         */
        public synchronized DesignDossier dossier(DesignStudy study) {
            return recent.computeIfAbsent(study, s -> new DesignDossier(s, computations));
        }
    }
}
