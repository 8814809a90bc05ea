package org.counterpoise.core.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Supplier;
import org.counterpoise.core.design.MethodComparison.Candidate;
import org.counterpoise.core.design.MethodComparison.LeftOutReason;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.error.NotFoundException;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.tuning.ClosedForms;

/**
 * The other methods' candidates of a {@link MethodComparison} at one mass ratio, each designed on
 * a thread of its own and gathered in the order of the methods, so the output is the sequential one. Plain threads,
 * not the common pool: a pool thread that waits on its own inner parallel work may help by
 * running a whole other design, which would keep this one waiting. Every design is a pure
 * function of its study (its own parallel parts write into slots), so no figure depends on the
 * threads.
 */
final class ComparisonCandidates {
    /** Threads that design the candidates (daemons, so they never hold the program open). */
    private static final ExecutorService CANDIDATE_THREADS = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "method-comparison");
        t.setDaemon(true);
        return t;
    });

    private final double massRatio;
    private final ProgressListener shared;
    private final AtomicBoolean dropped = new AtomicBoolean();
    private final AtomicInteger done = new AtomicInteger();
    private final List<Future<Outcome>> futures = new ArrayList<>();
    private final int count;

    private ComparisonCandidates(double massRatio, ProgressListener listener, int count) {
        this.massRatio = massRatio;
        this.shared = sharedBy(listener, Thread.currentThread(), dropped);
        this.count = count;
    }

    /**
     * @param study the study
     * @param methods the methods compared, in order (the study's own is left to the caller)
     * @param mu the mass ratio every candidate is designed at
     * @param listener progress (one share per method) and cancellation
     * @return the candidates, started
     */
    static ComparisonCandidates start(DesignStudy study, List<DesignMethod> methods, double mu,
            ProgressListener listener) {
        ComparisonCandidates c = new ComparisonCandidates(mu, listener, methods.size());
        for (DesignMethod m : methods) {
            c.futures.add(m == study.method() ? null : CANDIDATE_THREADS.submit(() -> c.counted(outcome(study, m,
                    mu, c.shared))));
        }
        return c;
    }

    /** @return the mass ratio the candidates are designed at */
    double massRatio() {
        return massRatio;
    }

    /** @return the listener as the candidates' threads ask it */
    ProgressListener shared() {
        return shared;
    }

    private Outcome counted(Outcome o) {
        shared.progress((double) done.incrementAndGet() / count);
        return o;
    }

    /**
     * Drops the candidates: one not yet started is skipped (it asks the listener first), one
     * running finishes its design (a design takes no listener); their outcomes are never read.
     */
    void drop() {
        dropped.set(true);
    }

    /**
     * @param chosen the chosen method's outcome, for its place in the order
     * @return every method's outcome, in the order of the methods
     */
    List<Outcome> gather(Outcome chosen) {
        List<Outcome> outcomes = new ArrayList<>();
        try {
            for (Future<Outcome> f : futures) {
                outcomes.add(f == null ? counted(chosen) : f.get());
            }
        } catch (InterruptedException e) {
            drop();
            futures.forEach(f -> {
                if (f != null) {
                    f.cancel(true);
                }
            });
            Thread.currentThread().interrupt();
            throw new CoreException(Messages.CANCELLED, "the comparison of methods");
        } catch (ExecutionException e) {
            // outcome() returns every exception as a value; only an Error gets here
            if (e.getCause() instanceof Error error) {
                throw error;
            }
            throw new IllegalStateException(e.getCause());
        }
        return outcomes;
    }

    /**
     * What one method gave: its candidate, or why it was left out, or the exception to rethrow on
     * the caller's thread (a cancellation), so no exception crosses the pool's threads re-wrapped.
     */
    record Outcome(Optional<Candidate> candidate, Optional<LeftOutReason> reason, RuntimeException failure) {
    }

    /**
     * @param chosen the study's own design (its candidate is this design, not a second one)
     * @param listener cancellation
     * @return its outcome
     */
    static Outcome chosenOutcome(DesignResult chosen, ProgressListener listener) {
        return outcomeOf(() -> {
            listener.checkCancelled("the comparison of methods");
            return new Outcome(Optional.of(Candidate.of(chosen, true)), Optional.empty(), null);
        });
    }

    private static Outcome outcome(DesignStudy study, DesignMethod m, double mu, ProgressListener listener) {
        return outcomeOf(() -> {
            listener.checkCancelled("the comparison of methods");
            Optional<LeftOutReason> why = notApplicable(study, m, mu);
            if (why.isPresent()) {
                return new Outcome(Optional.empty(), why, null);
            }
            return new Outcome(Optional.of(candidate(study, m, mu)), Optional.empty(), null);
        });
    }

    private static Outcome outcomeOf(Supplier<Outcome> compute) {
        try {
            return compute.get();
        } catch (NotFoundException e) {
            return new Outcome(Optional.empty(), Optional.of(LeftOutReason.NO_CERTIFIED_OPTIMUM), null);
        } catch (InvalidInputException e) {
            return new Outcome(Optional.empty(), Optional.of(LeftOutReason.NOT_FOR_THIS_STUDY), null);
        } catch (RuntimeException e) {
            return new Outcome(Optional.empty(), Optional.empty(), e);
        }
    }

    /**
     * The listener as the pool's threads ask it: cancelled also when the calling thread is
     * interrupted (a front end dropping a stale job interrupts the caller, not the pool) and when
     * the candidates are dropped (the chosen design failed).
     */
    private static ProgressListener sharedBy(ProgressListener listener, Thread caller, AtomicBoolean dropped) {
        return new ProgressListener() {
            @Override
            public void progress(double fraction) {
                listener.progress(fraction);
            }

            @Override
            public boolean cancelled() {
                return dropped.get() || listener.cancelled() || caller.isInterrupted();
            }
        };
    }

    private static Optional<LeftOutReason> notApplicable(DesignStudy study, DesignMethod m, double mu) {
        if (m == DesignMethod.EQUAL_PEAK
                && ClosedForms.equalPeak(study.excitation().kind(), study.response(), mu).isEmpty()) {
            return Optional.of(LeftOutReason.NO_CLOSED_FORM);
        }
        if (m == DesignMethod.UNDAMPED_SINGLE_SPEED && !study.excitation().band().isSingle()) {
            return Optional.of(LeftOutReason.NOT_ONE_SPEED);
        }
        return Optional.empty();
    }

    /** The study by another method at the same mass, with the constraints when the method takes them. */
    private static Candidate candidate(DesignStudy study, DesignMethod m, double mu) {
        AbsorberSizing sizing = study.sizing().findsMassRatio() ? AbsorberSizing.ofMassRatio(mu) : study.sizing();
        DesignStudy constrained;
        try {
            constrained = study.withSizing(sizing, study.constraints()).withMethod(m);
        } catch (InvalidInputException e) {
            // the method does not take the constraints: compared without them, and said so
            return Candidate.of(Designer.design(study.withSizing(sizing, DesignConstraints.NONE).withMethod(m)),
                    !study.constraints().any());
        }
        return Candidate.of(Designer.design(constrained), true);
    }
}
