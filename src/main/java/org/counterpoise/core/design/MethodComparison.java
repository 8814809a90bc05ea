package org.counterpoise.core.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Supplier;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponsePeak;

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
        return of(chosen.study(), () -> chosen, listener);
    }

    /**
     * The comparison, with the chosen design made on the calling thread meanwhile. The candidates
     * need only the mass ratio of the chosen design; when the study fixes it (a mass or a mass
     * ratio, not a target) they start on their own threads at once, beside the chosen design,
     * instead of after it. Either way the comparison is the one {@link #of(DesignResult,
     * ProgressListener)} gives for that design.
     *
     * @param study the study
     * @param chosen its design by its own method (asked once, on the calling thread)
     * @param listener progress (one share per method) and cancellation between methods
     * @return the comparison
     * @throws CoreException with key CANCELLED when cancelled; the design's own failures as it throws them
     */
    public static MethodComparison of(DesignStudy study, Supplier<DesignResult> chosen, ProgressListener listener) {
        DesignMethod method = study.method();
        List<LeftOut> leftOut = new ArrayList<>();
        if (study.excitation().spectrum().isWhiteNoise()) {
            chosen.get();
            COMPARED.forEach(m -> leftOut.add(new LeftOut(m, LeftOutReason.WHITE_NOISE)));
            return new MethodComparison(List.of(), leftOut, method, RecommendationReason.WHITE_NOISE, method);
        }
        List<DesignMethod> methods = new ArrayList<>(COMPARED);
        if (!methods.contains(method)) {
            methods.add(method);
        }
        listener.checkCancelled("the comparison of methods");
        listener.progress(0.0);
        OptionalDouble fixed = fixedMassRatio(study);
        ComparisonCandidates early = fixed.isPresent()
                ? ComparisonCandidates.start(study, methods, fixed.getAsDouble(), listener) : null;
        DesignResult design;
        try {
            design = chosen.get();
        } catch (RuntimeException | Error e) {
            if (early != null) {
                early.drop();
            }
            throw e;
        }
        double mu = design.tuning().massRatio();
        ComparisonCandidates others = early;
        if (others == null || Double.compare(others.massRatio(), mu) != 0) {
            // a study sized for a target (or, never expected, a design at another mass ratio than
            // its study's): the candidates start now, at the mass the design found
            if (others != null) {
                others.drop();
            }
            others = ComparisonCandidates.start(study, methods, mu, listener);
        }
        List<ComparisonCandidates.Outcome> outcomes = others.gather(ComparisonCandidates.chosenOutcome(design,
                others.shared()));
        List<Candidate> candidates = new ArrayList<>();
        for (int i = 0; i < methods.size(); i++) {
            ComparisonCandidates.Outcome o = outcomes.get(i);
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

    /** The mass ratio the study fixes before any design (as {@link Designer} takes it), if it does. */
    private static OptionalDouble fixedMassRatio(DesignStudy study) {
        if (study.sizing().findsMassRatio()) {
            return OptionalDouble.empty();
        }
        try {
            return OptionalDouble.of(study.sizing().massRatioOn(study.structure()));
        } catch (InvalidInputException e) {
            return OptionalDouble.empty(); // the design refuses it, with this message, on the calling thread
        }
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
