package org.counterpoise.core.robust;

import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;

/**
 * How far a built design may be mistuned before its worst response over the forcing band rises by
 * more than an allowance: the structure's natural frequency off (its stiffness, contents or
 * supports not as assumed, damping ratio kept), or the absorber's spring rate off (its damper
 * kept, so its damping ratio moves as 1/sqrt(k2)). Both are computed physically from the exact
 * band peak. From the nominal design the factor is stepped outwards by 0.5 % to the search limit;
 * the first step whose peak exceeds the allowance brackets the crossing, refined by Brent's method
 * to 1e-9. A rise narrower than one step could be missed; the peak varies smoothly with mistuning.
 * A design that cancels the response at its one speed (an undamped absorber tuned to it; the
 * nominal response is zero, so a relative rise means nothing) is judged instead by the response
 * at that speed staying within the allowance times the bare structure's response there.
 */
public final class ToleratedMistuning {
    private static final double STEP = 0.005;

    private ToleratedMistuning() {
    }

    /**
     * @param structure the structure as designed for
     * @param absorber the absorber as designed
     * @param excitation the disturbance
     * @param response the response that matters
     * @param allowance allowed rise of the peak (fraction, &gt; 0)
     * @param searchLimit largest detuning searched each side (fraction, 0 to 0.9)
     * @return tolerated factors of the structure's natural frequency
     */
    public static MistuningRange ofStructure(Structure structure, Absorber absorber, Excitation excitation,
            ResponseKind response, double allowance, double searchLimit) {
        Mistuning m = new Mistuning(structure, excitation, response);
        return search(factor -> m.peak(absorber, factor, 1.0), allowance, searchLimit,
                bare(structure, excitation, response));
    }

    /**
     * @param structure the structure
     * @param absorber the absorber as designed
     * @param excitation the disturbance
     * @param response the response that matters
     * @param allowance allowed rise of the peak (fraction, &gt; 0)
     * @param searchLimit largest detuning searched each side (fraction, 0 to 0.9)
     * @return tolerated factors of the absorber's natural frequency (the spring rate factor is the
     *     square)
     */
    public static MistuningRange ofAbsorber(Structure structure, Absorber absorber, Excitation excitation,
            ResponseKind response, double allowance, double searchLimit) {
        Mistuning m = new Mistuning(structure, excitation, response);
        return search(factor -> m.peak(absorber, 1.0, factor), allowance, searchLimit,
                bare(structure, excitation, response));
    }

    /**
     * The same search for any mistuning whose peak a function gives: one absorber of a set mistuned
     * alone, the set's peak over the band on the whole structure (docs/several-modes.md).
     * @param peakAtFactor the peak, SI, with the mistuned frequency at a factor of its nominal
     * @param allowance allowed rise of the peak (fraction, &gt; 0)
     * @param searchLimit largest detuning searched each side (fraction, 0 to 0.9)
     * @param bare the peak without absorbers, SI (the reference when the nominal response is cancelled)
     * @return the tolerated factors
     */
    public static MistuningRange ofPeak(DoubleUnaryOperator peakAtFactor, double allowance, double searchLimit,
            double bare) {
        return search(peakAtFactor, allowance, searchLimit, bare);
    }

    /**
     * The structure detuning range within which the peak stays at or below an absolute target.
     * @param m the mistuning model
     * @param absorber the absorber
     * @param target the largest allowed peak, SI
     * @param searchLimit largest detuning searched each side (fraction)
     * @return tolerated factors of the structure's natural frequency (allowance: the target over
     *     the nominal peak, minus one); not defined when the nominal design already exceeds it
     */
    public static MistuningRange ofStructureForTarget(Mistuning m, Absorber absorber, double target,
            double searchLimit) {
        DoubleUnaryOperator peak = factor -> m.peak(absorber, factor, 1.0);
        double nominal = peak.applyAsDouble(1.0);
        if (!(nominal <= target) || !(nominal > 0)) {
            return MistuningRange.undefined(target / nominal - 1, searchLimit);
        }
        return within(peak, target, target / nominal - 1, searchLimit);
    }

    /** The bare structure's peak over the band, SI (the reference when a design cancels the response). */
    private static double bare(Structure structure, Excitation excitation, ResponseKind response) {
        return new SystemResponse(structure, null, excitation.kind(), excitation.amplitude())
                .peakOver(response, excitation.band()).value();
    }

    /**
     * A design whose nominal response is below this fraction of the bare structure's cancels it
     * (an undamped absorber tuned to its one speed: exactly zero, up to round-off).
     */
    private static final double CANCELLED = 1e-6;

    private static MistuningRange search(DoubleUnaryOperator peak, double allowance, double searchLimit, double bare) {
        double nominal = peak.applyAsDouble(1.0);
        if (!(nominal >= 0) || Double.isInfinite(nominal)) {
            return MistuningRange.undefined(allowance, searchLimit);
        }
        if (nominal <= CANCELLED * bare && Double.isFinite(bare)) {
            // At its one speed the design cancels the response: the criterion is that response,
            // kept within the allowance of the bare structure's (90 % of the reduction kept).
            MistuningRange r = within(peak, allowance * bare, allowance, searchLimit);
            return new MistuningRange(r.low(), r.high(), allowance, searchLimit, true, true);
        }
        if (!(nominal > 0)) {
            return MistuningRange.undefined(allowance, searchLimit);
        }
        return within(peak, nominal * (1 + allowance), allowance, searchLimit);
    }

    private static MistuningRange within(DoubleUnaryOperator peak, double limit, double allowance, double searchLimit) {
        DoubleUnaryOperator excess = f -> {
            double v = peak.applyAsDouble(f);
            return Double.isInfinite(v) ? 1.0 : Math.log(v / limit);
        };
        return new MistuningRange(crossing(excess, -1, searchLimit), crossing(excess, +1, searchLimit), allowance,
                searchLimit, true);
    }

    private static OptionalDouble crossing(DoubleUnaryOperator excess, int direction, double searchLimit) {
        double previous = 1.0;
        int steps = (int) Math.ceil(searchLimit / STEP);
        for (int i = 1; i <= steps; i++) {
            double factor = 1.0 + direction * Math.min(i * STEP, searchLimit);
            if (excess.applyAsDouble(factor) > 0) {
                return OptionalDouble.of(new BrentSolver(1e-12, 1e-9).solve(200, excess::applyAsDouble,
                        Math.min(previous, factor), Math.max(previous, factor)));
            }
            previous = factor;
        }
        return OptionalDouble.empty();
    }
}
