package org.counterpoise.core.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.error.NotFoundException;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.tuning.ClosedForms;

/**
 * The design methods side by side for one study: each candidate is the study designed by that
 * method ({@link Designer#design} of {@link DesignStudy#withMethod}, so every figure comes by the
 * same route as the design itself), with its worst case and 95th percentile over the study's
 * tolerance ranges ({@link RobustMeasures}, the one place for these figures), its strokes and its
 * spring force.
 *
 * <p><b>Recommended</b> is the candidate with the least worst-case peak over the tolerance ranges.
 * By construction that is robust-worst-case, whose design minimises exactly that figure at the same
 * mass; the comparison does not assume it but computes every candidate's worst case by the same
 * measure, so a test can check it. The user's explicitly chosen method stays the design; the
 * comparison marks it as chosen beside the recommended one, never replacing it silently.
 *
 * <p><b>Same absorber mass.</b> Candidates are designed at the chosen design's mass ratio: a study
 * sized for a target compares the other methods at the mass the chosen design found. Constraints
 * (stroke limit, fixed tuning or damping) are kept for the methods that take them; a method that
 * does not is designed without them, and its candidate says so ({@link Candidate#constrained}).
 *
 * <p>Under a white-noise disturbance the design minimises the rms response and the peak methods do
 * not apply: the comparison then has no candidates and recommends the chosen design.
 *
 * @param candidates the candidates computed, in the order of {@link #COMPARED} (the chosen method
 *     last when it is not one of them)
 * @param leftOut the methods of {@link #COMPARED} not computed, with the reason
 * @param recommended the method recommended
 * @param why why it is recommended
 * @param chosen the method the study chose (its design is the report's design)
 */
public record MethodComparison(List<Candidate> candidates, List<LeftOut> leftOut, DesignMethod recommended,
        RecommendationReason why, DesignMethod chosen) {

    /** The methods compared, in the order shown: the one list. */
    public static final List<DesignMethod> COMPARED = List.of(DesignMethod.EQUAL_PEAK, DesignMethod.EXACT_PEAK,
            DesignMethod.ROBUST_WORST_CASE, DesignMethod.ROBUST_P95, DesignMethod.UNDAMPED_SINGLE_SPEED);

    /** Threads that design the candidates (daemons, so they never hold the program open). */
    private static final ExecutorService CANDIDATE_THREADS = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "method-comparison");
        t.setDaemon(true);
        return t;
    });

    /** Relative difference of worst cases taken as a tie (the recommended method then wins the tie). */
    static final double TIE = 1e-9;

    /** Defensive copies. */
    public MethodComparison {
        candidates = List.copyOf(candidates);
        leftOut = List.copyOf(leftOut);
    }

    /**
     * One method's design, as the comparison shows it. SI throughout.
     *
     * @param method the method
     * @param tuning mass ratio, tuning ratio, absorber damping ratio
     * @param nominalPeak the peak of the response that matters over the band, nominal
     * @param worstPeak its worst case over the tolerance ranges ({@link RobustMeasures#worstCase}),
     *     +infinity when unbounded
     * @param p95 its 95th percentile over the tolerance ranges ({@link RobustMeasures#percentile95}),
     *     +infinity when unbounded
     * @param strokeInBand the absorber's peak stroke in band
     * @param strokeRunUp the absorber's peak stroke during run-up, with its basis
     * @param springForce the peak spring force in band
     * @param constrained false when the study's constraints were left out because this method does
     *     not take them
     */
    public record Candidate(DesignMethod method, Tuning tuning, ResponsePeak nominalPeak, double worstPeak,
            double p95, ResponsePeak strokeInBand, RunUpStroke strokeRunUp, ResponsePeak springForce,
            boolean constrained) {

        /**
         * @param d a design
         * @param constrained whether the study's constraints applied
         * @return its candidate, measured over the design's study's tolerance ranges
         */
        static Candidate of(DesignResult d, boolean constrained) {
            Tuning t = d.tuning();
            return new Candidate(d.study().method(), t, d.responseAfter(),
                    RobustMeasures.worstCase(d.study(), t).peak(), RobustMeasures.percentile95(d.study(), t),
                    d.strokeInBand(), d.runUpStroke(), d.springForce(), constrained);
        }
    }

    /**
     * A method the comparison could not compute.
     * @param method the method
     * @param reason why
     */
    public record LeftOut(DesignMethod method, LeftOutReason reason) {
    }

    /** Why a method is not among the candidates (the words are in {@code io.text}). */
    public enum LeftOutReason {
        /** No published closed form exists for the disturbance and response. */
        NO_CLOSED_FORM,
        /** The optimum could not be certified. */
        NO_CERTIFIED_OPTIMUM,
        /** An undamped absorber works at one speed only, and the band is not one speed. */
        NOT_ONE_SPEED,
        /** A white-noise disturbance: the design minimises the rms response, not a peak. */
        WHITE_NOISE,
        /** The method does not take this study's inputs. */
        NOT_FOR_THIS_STUDY
    }

    /** Why the recommended method is recommended (the words are in {@code io.text}). */
    public enum RecommendationReason {
        /**
         * It has the least worst-case peak over the tolerance ranges among the designs with at least
         * a practical damper's damping.
         */
        LEAST_WORST_CASE,
        /** A white-noise disturbance: the peak methods do not apply, the chosen rms design stands. */
        WHITE_NOISE
    }

    /**
     * @param chosen the study's own design (the chosen candidate is this design, not a second one)
     * @param listener progress (one share per method) and cancellation between methods
     * @return the comparison
     * @throws CoreException with key CANCELLED when cancelled
     */
    public static MethodComparison of(DesignResult chosen, ProgressListener listener) {
        DesignStudy study = chosen.study();
        DesignMethod method = study.method();
        List<LeftOut> leftOut = new ArrayList<>();
        if (study.excitation().spectrum().isWhiteNoise()) {
            COMPARED.forEach(m -> leftOut.add(new LeftOut(m, LeftOutReason.WHITE_NOISE)));
            return new MethodComparison(List.of(), leftOut, method, RecommendationReason.WHITE_NOISE, method);
        }
        List<DesignMethod> methods = new ArrayList<>(COMPARED);
        if (!methods.contains(method)) {
            methods.add(method);
        }
        double mu = chosen.tuning().massRatio();
        listener.checkCancelled("the comparison of methods");
        listener.progress(0.0);
        // The candidates are independent designs: each on a thread of its own, gathered in the
        // order of the methods, so the output is the sequential one. Plain threads, not the common
        // pool: a pool thread that waits on its own inner parallel work may help by running a whole
        // other design, which would keep this one waiting. Every design is a pure function of its
        // study (its own parallel parts write into slots), so no figure depends on the threads.
        Thread caller = Thread.currentThread();
        ProgressListener shared = sharedBy(listener, caller);
        AtomicInteger done = new AtomicInteger();
        List<Future<Outcome>> futures = new ArrayList<>();
        for (DesignMethod m : methods) {
            futures.add(CANDIDATE_THREADS.submit(() -> {
                Outcome o = outcome(chosen, m, mu, shared);
                shared.progress((double) done.incrementAndGet() / methods.size());
                return o;
            }));
        }
        List<Outcome> outcomes = new ArrayList<>();
        try {
            for (Future<Outcome> f : futures) {
                outcomes.add(f.get());
            }
        } catch (InterruptedException e) {
            futures.forEach(f -> f.cancel(true));
            Thread.currentThread().interrupt();
            throw new CoreException(Messages.CANCELLED, "the comparison of methods");
        } catch (ExecutionException e) {
            // outcome() returns every exception as a value; only an Error gets here
            if (e.getCause() instanceof Error error) {
                throw error;
            }
            throw new IllegalStateException(e.getCause());
        }
        List<Candidate> candidates = new ArrayList<>();
        for (int i = 0; i < methods.size(); i++) {
            Outcome o = outcomes.get(i);
            if (o.failure() != null) {
                throw o.failure();
            }
            o.candidate().ifPresent(candidates::add);
            DesignMethod m = methods.get(i);
            o.reason().ifPresent(r -> leftOut.add(new LeftOut(m, r)));
        }
        listener.checkCancelled("the comparison of methods");
        listener.progress(1.0);
        return new MethodComparison(candidates, leftOut, leastWorstCase(candidates),
                RecommendationReason.LEAST_WORST_CASE, method);
    }

    /**
     * What one method gave: its candidate, or why it was left out, or the exception to rethrow on
     * the caller's thread (a cancellation), so no exception crosses the pool's threads re-wrapped.
     */
    private record Outcome(Optional<Candidate> candidate, Optional<LeftOutReason> reason, RuntimeException failure) {
    }

    private static Outcome outcome(DesignResult chosen, DesignMethod m, double mu, ProgressListener listener) {
        DesignStudy study = chosen.study();
        try {
            listener.checkCancelled("the comparison of methods");
            if (m == study.method()) {
                return new Outcome(Optional.of(Candidate.of(chosen, true)), Optional.empty(), null);
            }
            Optional<LeftOutReason> why = notApplicable(study, m, mu);
            if (why.isPresent()) {
                return new Outcome(Optional.empty(), why, null);
            }
            return new Outcome(Optional.of(candidate(study, m, mu)), Optional.empty(), null);
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
     * interrupted (a front end dropping a stale job interrupts the caller, not the pool).
     */
    private static ProgressListener sharedBy(ProgressListener listener, Thread caller) {
        return new ProgressListener() {
            @Override
            public void progress(double fraction) {
                listener.progress(fraction);
            }

            @Override
            public boolean cancelled() {
                return listener.cancelled() || caller.isInterrupted();
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

    /**
     * The candidate with the least worst case among those a practical damper can give (damping
     * ratio at least {@link Designer#PRACTICAL_DAMPING_RATIO}; an undamped or notch design is shown
     * but not recommended: its damping cannot be built or held, and its run-up stroke grows without
     * bound); among all when none can. A tie goes to the recommended method, then to the first.
     */
    private static DesignMethod leastWorstCase(List<Candidate> candidates) {
        List<Candidate> buildable = candidates.stream()
                .filter(c -> c.tuning().dampingRatio() >= Designer.PRACTICAL_DAMPING_RATIO).toList();
        List<Candidate> among = buildable.isEmpty() ? candidates : buildable;
        Candidate best = among.get(0);
        for (Candidate c : among) {
            boolean tie = Math.abs(c.worstPeak() - best.worstPeak()) <= TIE * Math.abs(best.worstPeak())
                    || c.worstPeak() == best.worstPeak();
            if (c.worstPeak() < best.worstPeak() && !tie || tie && c.method() == DesignMethod.RECOMMENDED) {
                best = c;
            }
        }
        return best.method();
    }

    /** @return the candidate of the chosen method */
    public Optional<Candidate> chosenCandidate() {
        return candidate(chosen);
    }

    /** @return the candidate of the recommended method */
    public Optional<Candidate> recommendedCandidate() {
        return candidate(recommended);
    }

    /**
     * @param m a method
     * @return its candidate, if it was computed
     */
    public Optional<Candidate> candidate(DesignMethod m) {
        return candidates.stream().filter(c -> c.method() == m).findFirst();
    }
}
