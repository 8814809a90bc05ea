package org.counterpoise.core.realisation;

import java.util.List;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.realisation.PartTolerances.ToleranceBasis;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.robust.ToleranceRanges;

/**
 * The tolerance each part must be made to so that the built absorber's frequency and damping stay
 * inside what the design holds over.
 *
 * <p>The absorber frequency and damping ranges: a robust design holds over the project's tolerance
 * ranges ({@link ToleranceBasis#ROBUST_RANGES}); any other design over the absorber mistuning at
 * which its peak rises by {@link DesignResult#TOLERANCE_ALLOWANCE} (the narrower side, made
 * symmetric; {@link ToleranceBasis#ALLOWED_RISE}), with the project's damping range (the design
 * computes no damping mistuning of its own). Where the tolerated mistuning is not defined (a zero
 * or unbounded nominal response) the project's ranges are used.
 *
 * <p>The spring rate: with f = sqrt(k / m) / (2 pi), df/f = (dk/k - dm/m) / 2 to first order, so a
 * frequency tolerance t_f with a mass tolerance t_m leaves t_k = 2 t_f - t_m for the rate. The
 * sizing uses the exact form instead, so that every corner of the part tolerances keeps the
 * frequency inside +/- t_f: sqrt((1 + t_k) / (1 - t_m)) &lt;= 1 + t_f and
 * sqrt((1 - t_k) / (1 + t_m)) &gt;= 1 - t_f, i.e.
 * t_k = min((1 + t_f)^2 (1 - t_m) - 1, 1 - (1 - t_f)^2 (1 + t_m)), which agrees with 2 t_f - t_m
 * to second order. When that is not positive the mass tolerance alone uses the whole frequency
 * tolerance: {@link WarningKind#MASS_TOLERANCE_TOO_LOOSE}, and the rate tolerance is 0.
 */
public final class ToleranceSizing {

    private ToleranceSizing() {
    }

    /**
     * @param design the design
     * @param choice the hardware choices (the mass tolerance)
     * @param warnings where a too-loose mass tolerance is reported
     * @return the part tolerances
     */
    public static PartTolerances of(DesignResult design, HardwareChoice choice, List<Warning> warnings) {
        ToleranceRanges ranges = design.study().robustness().ranges();
        double frequency = ranges.absorber();
        ToleranceBasis basis = ToleranceBasis.ROBUST_RANGES;
        MistuningRange tolerated = design.absorberTolerance();
        if (!design.study().method().robust() && tolerated.defined()) {
            frequency = symmetric(tolerated);
            basis = ToleranceBasis.ALLOWED_RISE;
        }
        double mass = choice.massTolerance();
        double rate = rateTolerance(frequency, mass);
        if (rate <= 0.0) {
            warnings.add(Warning.of(WarningKind.MASS_TOLERANCE_TOO_LOOSE, mass, frequency));
            rate = 0.0;
        }
        return new PartTolerances(mass, rate, ranges.damping(), frequency, basis);
    }

    /**
     * @param frequency the absorber frequency tolerance t_f, +/- fraction
     * @param mass the mass tolerance t_m, +/- fraction
     * @return the spring rate tolerance t_k that keeps every corner within t_f (may be &lt;= 0)
     */
    public static double rateTolerance(double frequency, double mass) {
        double up = (1 + frequency) * (1 + frequency) * (1 - mass) - 1;
        double down = 1 - (1 - frequency) * (1 - frequency) * (1 + mass);
        return Math.min(up, down);
    }

    /**
     * @param range a tolerated mistuning (factors on the absorber frequency)
     * @return the narrower side as a +/- fraction (the search limit where a side was not closed)
     */
    static double symmetric(MistuningRange range) {
        double below = 1.0 - range.low().orElse(1.0 - range.searchLimit());
        double above = range.high().orElse(1.0 + range.searchLimit()) - 1.0;
        return Math.max(0.0, Math.min(below, above));
    }
}
