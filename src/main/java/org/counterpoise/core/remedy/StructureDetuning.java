package org.counterpoise.core.remedy;

import java.util.OptionalDouble;
import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;

/**
 * The remedy an absorber replaces: change the structure's stiffness, or its mass, until, without
 * any absorber, its worst response over the forcing band is no more than a target (what the
 * absorber design achieves). The viscous damper of the structure is kept, as it is when a real
 * structure is changed.
 *
 * <p>The rule (docs/glossary.md, "detuning"). Let P(c) be the bare structure's exact peak over the
 * band with its stiffness (or mass) multiplied by c, and T the target. Each way (stiffer and
 * softer; lighter and heavier) the alternative is the smallest change that meets the target: the c
 * nearest 1 (in ratio) within the search range with P(c) &lt;= T. P is not monotone in c: while the
 * resonance moves through the band P is the resonance peak, and once it has left, the value at a
 * band edge, with a kink between (and P infinite while an undamped structure's resonance is in the
 * band). So the answer is not "the first factor that takes the resonance out of the band": with a
 * large target (an undamped absorber over a band) it can lie with the resonance still inside, and
 * it is the first crossing of T, not any crossing. P(1) &lt;= T gives 1 (no change needed); no c
 * in the range meeting T gives an empty factor.
 *
 * <p>Method. P is continuous in c (the peak of a continuous function over a closed band; +infinity
 * is capped on the logarithmic scale used, ln(P/T) &lt;= 50, which keeps it continuous where an
 * undamped resonance enters the band). It is walked from 1 outwards on factors spaced 1 % apart
 * while the undamped natural frequency is within a factor 1.5 of the band (factor 2.25 in c), 10 %
 * apart farther out (where P is a smooth power law of c), with the factors that put the undamped
 * natural frequency on either band edge (where the kinks are) walked exactly; the first walked factor that meets T brackets the first crossing with the one before,
 * refined by Commons Math's bracketing Brent solver to 1e-12 relative, keeping the side that meets
 * T. A local minimum of the walk (a dip between walked factors) is refined by Brent's minimiser and,
 * when it reaches T, brackets the crossing the same way. The exact peak is {@link SystemResponse}'s.
 */
public final class StructureDetuning {
    /** Search range, stiffness: up to 10 000 times stiffer, down to a millionth. */
    static final double MAX_STIFFER = 1e4;
    static final double MIN_SOFTER = 1e-6;
    /** Search range, mass: up to 10 000 times heavier, down to 1/10 000. */
    static final double MAX_HEAVIER = 1e4;
    static final double MIN_LIGHTER = 1e-4;
    /** Ratio between walked factors while the natural frequency is near the band (see {@link #NEAR}). */
    private static final double STEP = 1.01;
    /** Ratio between walked factors farther away, where the peak is a smooth power law of the factor. */
    private static final double FAR_STEP = 1.1;
    /** Near the band: the factor within this ratio of a factor that puts the resonance on a band edge. */
    private static final double NEAR = 2.25;
    /** ln(P/T) is capped here, so an unbounded peak stays a finite, continuous value. */
    private static final double CAP = 50.0;

    private StructureDetuning() {
    }

    /**
     * @param structure the bare structure
     * @param excitation excitation kind
     * @param amplitude SI amplitude
     * @param band forcing band
     * @param response response kind that matters
     * @param target SI level to reach (for example what the absorber achieves; finite and &gt; 0)
     * @return the stiffness factors that reach it, each empty where no change in range does
     */
    public static DetuningAlternative search(Structure structure, ExcitationKind excitation, double amplitude,
            FrequencyBand band, ResponseKind response, double target) {
        double omega1 = structure.naturalFrequency();
        DoubleUnaryOperator excess = excess(factor -> structure.withStiffnessKeepingDamper(
                structure.modalStiffness() * factor), excitation, amplitude, band, response, target);
        // the undamped natural frequency sits on a band edge at c = (edge / omega1)^2
        double[] edges = {sq(band.low() / omega1), sq(band.high() / omega1)};
        return new DetuningAlternative(target, firstCrossing(excess, MAX_STIFFER, edges),
                firstCrossing(excess, MIN_SOFTER, edges));
    }

    /**
     * @param structure the bare structure
     * @param excitation excitation kind
     * @param amplitude SI amplitude
     * @param band forcing band
     * @param response response kind that matters
     * @param target SI level to reach (finite and &gt; 0)
     * @return the mass factors that reach it (raise: lighter, lower: heavier), empty where none does
     */
    public static DetuningAlternative searchMass(Structure structure, ExcitationKind excitation, double amplitude,
            FrequencyBand band, ResponseKind response, double target) {
        double omega1 = structure.naturalFrequency();
        DoubleUnaryOperator excess = excess(factor -> structure.withMassKeepingDamper(
                structure.modalMass() * factor), excitation, amplitude, band, response, target);
        // natural frequency goes as 1/sqrt(mass): on a band edge at c = (omega1 / edge)^2
        double[] edges = {sq(omega1 / band.low()), sq(omega1 / band.high())};
        return new DetuningAlternative(target, firstCrossing(excess, MIN_LIGHTER, edges),
                firstCrossing(excess, MAX_HEAVIER, edges));
    }

    private static DoubleUnaryOperator excess(DoubleFunction<Structure> change,
            ExcitationKind excitation, double amplitude, FrequencyBand band, ResponseKind response, double target) {
        return factor -> {
            double peak = new SystemResponse(change.apply(factor), null, excitation, amplitude)
                    .peakOver(response, band).value();
            // Compare on a log scale: well conditioned over many decades, capped at a resonance.
            return Double.isFinite(peak) ? Math.min(Math.log(peak / target), CAP) : CAP;
        };
    }

    /**
     * The factor nearest 1 towards {@code end} whose excess is &lt;= 0 (see the class comment).
     *
     * @param excess ln(P(c)/T), capped
     * @param end the far end of the search range
     * @param kinks factors to walk through exactly (those in range are inserted in the walk)
     * @return the factor, 1.0 when no change is needed, empty when none in range meets the target
     */
    static OptionalDouble firstCrossing(DoubleUnaryOperator excess, double end, double[] kinks) {
        if (excess.applyAsDouble(1.0) <= 0.0) {
            return OptionalDouble.of(1.0);
        }
        boolean up = end > 1.0;
        double nearLow = Math.min(kinks[0], kinks[1]) / NEAR;
        double nearHigh = Math.max(kinks[0], kinks[1]) * NEAR;
        double beforePrevious = Double.NaN;
        double previousBefore = Double.NaN;
        double previous = 1.0;
        double previousExcess = excess.applyAsDouble(1.0);
        while (up ? previous < end : previous > end) {
            boolean near = previous >= nearLow && previous <= nearHigh;
            double ratio = near ? STEP : FAR_STEP;
            double next = up ? Math.min(previous * ratio, end) : Math.max(previous / ratio, end);
            for (double kink : new double[] {kinks[0], kinks[1], nearLow, nearHigh}) {
                if (up ? kink > previous && kink < next : kink < previous && kink > next) {
                    next = kink;
                }
            }
            double nextExcess = excess.applyAsDouble(next);
            if (nextExcess <= 0.0) {
                return OptionalDouble.of(crossing(excess, previous, next));
            }
            if (!Double.isNaN(beforePrevious) && previousExcess < previousBefore && previousExcess < nextExcess) {
                // a local minimum of the walk: does the dip between its neighbours reach the target?
                double dip = lowestBetween(excess, beforePrevious, next, previous);
                if (excess.applyAsDouble(dip) <= 0.0) {
                    return OptionalDouble.of(crossing(excess, beforePrevious, dip));
                }
            }
            beforePrevious = previous;
            previousBefore = previousExcess;
            previous = next;
            previousExcess = nextExcess;
        }
        return OptionalDouble.empty();
    }

    /** The crossing between a factor above the target (outside) and one at or below it (inside). */
    private static double crossing(DoubleUnaryOperator excess, double outside, double inside) {
        try {
            // BELOW_SIDE: the returned factor itself meets the target (excess <= 0)
            return new BracketingNthOrderBrentSolver(1e-12, 1e-300, 1e-15, 5).solve(300, excess::applyAsDouble,
                    Math.min(outside, inside), Math.max(outside, inside), AllowedSolution.BELOW_SIDE);
        } catch (MathIllegalStateException | MathIllegalArgumentException notConverged) {
            return inside; // the walked factor meets the target: keep it
        }
    }

    /** Brent's minimiser of the excess between two walked factors (in ln c). */
    private static double lowestBetween(DoubleUnaryOperator excess, double a, double b, double start) {
        double low = Math.log(Math.min(a, b));
        double high = Math.log(Math.max(a, b));
        try {
            UnivariatePointValuePair found = new BrentOptimizer(1e-12, 1e-15).optimize(new MaxEval(200),
                    new UnivariateObjectiveFunction(v -> excess.applyAsDouble(Math.exp(v))), GoalType.MINIMIZE,
                    new SearchInterval(low, high, Math.log(start)));
            return Math.exp(found.getPoint());
        } catch (MathIllegalStateException notConverged) {
            return start;
        }
    }

    private static double sq(double v) {
        return v * v;
    }
}
