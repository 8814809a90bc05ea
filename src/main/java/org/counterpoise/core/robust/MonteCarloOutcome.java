package org.counterpoise.core.robust;

import java.util.Optional;
import java.util.OptionalDouble;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.progress.ProgressListener;

/**
 * What became of the tolerance Monte Carlo of a design: its result, or the reason it was not run.
 * Exactly one of the two is present; reports say the reason in words (a run that was not made is
 * never shown as a distribution of identical samples).
 *
 * @param result the distribution of the peak, when the run was made
 * @param notRun why the run was not made, otherwise
 */
public record MonteCarloOutcome(Optional<MonteCarloResult> result, Optional<NotRun> notRun) {

    /** Why a Monte Carlo run was not made. */
    public enum NotRun {
        /** Every tolerance is "none": each sampled build would be the nominal one. */
        NO_TOLERANCES
    }

    /** Validates the record: exactly one of result and reason. */
    public MonteCarloOutcome {
        if (result.isPresent() == notRun.isPresent()) {
            throw CoreException.bug("a Monte Carlo outcome needs a result or a reason, not both or neither", null);
        }
    }

    /**
     * @param result the distribution
     * @return the outcome of a run that was made
     */
    public static MonteCarloOutcome ran(MonteCarloResult result) {
        return new MonteCarloOutcome(Optional.of(result), Optional.empty());
    }

    /**
     * @param reason why it was not run
     * @return the outcome of a run that was not made
     */
    public static MonteCarloOutcome notRun(NotRun reason) {
        return new MonteCarloOutcome(Optional.empty(), Optional.of(reason));
    }

    /**
     * Runs the Monte Carlo only when a tolerance is given.
     * @param m the mistuning model
     * @param absorber the nominal absorber
     * @param tolerances the spreads
     * @param samples number of samples
     * @param seed random seed
     * @param target the target peak, SI, or NaN
     * @param listener progress and cancellation
     * @return the run's result, or {@link NotRun#NO_TOLERANCES}
     */
    public static MonteCarloOutcome of(Mistuning m, Absorber absorber,
            ToleranceSet tolerances, int samples, long seed, OptionalDouble target,
            ProgressListener listener) {
        if (!tolerances.anyGiven()) {
            return notRun(NotRun.NO_TOLERANCES);
        }
        return ran(MonteCarlo.run(m, absorber, tolerances, samples, seed, target, listener));
    }
}
