package org.counterpoise.core.remedy;

import java.util.OptionalDouble;
import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;

/**
 * The remedy an absorber replaces: change the structure's stiffness, or its mass, until, without
 * any absorber, its worst response over the forcing band falls to a target. Searched both ways,
 * natural frequency pushed above the band (stiffer, or lighter) and below it (softer, or heavier);
 * the viscous damper of the structure is kept, as it is when a real structure is changed. The worst response
 * is the exact band peak; the stiffness factor is found by Brent's method on a bracket, to a
 * relative accuracy of 1e-10.
 */
public final class StructureDetuning {
    private static final double MAX_STIFFER = 1e4;
    private static final double MIN_SOFTER = 1e-6;
    private static final double MAX_HEAVIER = 1e4;
    private static final double MIN_LIGHTER = 1e-4;

    private StructureDetuning() {
    }

    /**
     * @param structure the bare structure
     * @param excitation excitation kind
     * @param amplitude SI amplitude
     * @param band forcing band
     * @param response response kind that matters
     * @param target SI level to reach (for example what the absorber achieves)
     * @return the stiffness factors that reach it, each empty where no change in range does
     */
    public static DetuningAlternative search(Structure structure, ExcitationKind excitation, double amplitude,
            FrequencyBand band, ResponseKind response, double target) {
        double omega1 = structure.naturalFrequency();
        DoubleUnaryOperator excess = excess(factor -> structure.withStiffnessKeepingDamper(
                structure.modalStiffness() * factor), excitation, amplitude, band, response, target);
        return new DetuningAlternative(target, solve(excess, Math.max(1.0, sq(band.high() / omega1)), MAX_STIFFER),
                solve(excess, Math.min(1.0, sq(band.low() / omega1)), MIN_SOFTER));
    }

    /**
     * @param structure the bare structure
     * @param excitation excitation kind
     * @param amplitude SI amplitude
     * @param band forcing band
     * @param response response kind that matters
     * @param target SI level to reach
     * @return the mass factors that reach it (raise: lighter, lower: heavier), empty where none does
     */
    public static DetuningAlternative searchMass(Structure structure, ExcitationKind excitation, double amplitude,
            FrequencyBand band, ResponseKind response, double target) {
        double omega1 = structure.naturalFrequency();
        DoubleUnaryOperator excess = excess(factor -> structure.withMassKeepingDamper(
                structure.modalMass() * factor), excitation, amplitude, band, response, target);
        // Natural frequency goes as 1/sqrt(mass): above the band needs factor <= (omega1/high)^2.
        return new DetuningAlternative(target, solve(excess, Math.min(1.0, sq(omega1 / band.high())), MIN_LIGHTER),
                solve(excess, Math.max(1.0, sq(omega1 / band.low())), MAX_HEAVIER));
    }

    private static DoubleUnaryOperator excess(DoubleFunction<Structure> change,
            ExcitationKind excitation, double amplitude, FrequencyBand band, ResponseKind response, double target) {
        return factor -> {
            double peak = new SystemResponse(change.apply(factor), null, excitation, amplitude)
                    .peakOver(response, band).value();
            // Compare on a log scale: well conditioned over many decades, finite at a resonance.
            return Double.isInfinite(peak) ? 50.0 : Math.log(peak / target);
        };
    }

    /**
     * Walks geometrically from the band edge towards the limit until the target is met, then
     * refines the crossing with Brent's method.
     */
    private static OptionalDouble solve(DoubleUnaryOperator excess, double start,
            double limit) {
        if (excess.applyAsDouble(1.0) <= 0.0) {
            return OptionalDouble.of(1.0);
        }
        if (excess.applyAsDouble(start) <= 0.0) {
            return OptionalDouble.of(start);
        }
        double ratio = limit > start ? 1.5 : 1.0 / 1.5;
        double previous = start;
        while (limit > start ? previous < limit : previous > limit) {
            double next = limit > start ? Math.min(previous * ratio, limit) : Math.max(previous * ratio, limit);
            if (excess.applyAsDouble(next) <= 0.0) {
                return OptionalDouble.of(new BrentSolver(1e-12, 1e-10).solve(200, excess::applyAsDouble,
                        Math.min(previous, next), Math.max(previous, next)));
            }
            previous = next;
        }
        return OptionalDouble.empty();
    }

    private static double sq(double v) {
        return v * v;
    }
}
