package org.counterpoise.core.commission;

import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;

/**
 * The response that matters (the design's), its exact peak over the band, for the absorber as
 * designed, as built and as built after the trim advised: whether the frequency is inside its part
 * tolerance says how the parts were made, this says what the structure will do.
 *
 * <p>The trim is called required when the response as built exceeds the design's by more than
 * {@link DesignResult#TOLERANCE_ALLOWANCE} (the same allowance that defines the design's tolerated
 * mistuning). A trim plate changes the mass only: the spring rate and damping coefficient stay, so
 * the damping ratio goes as c / (2 m omega_a).
 *
 * @param kind the response that matters
 * @param design its peak over the band with the absorber as designed (SI)
 * @param asBuilt its peak with the absorber as built, on the structure as measured (SI)
 * @param afterTrim its peak after the plates advised (equal to {@code asBuilt} when none are)
 * @param trimRequired whether the response as built exceeds the design's by more than the allowance
 */
public record BuiltResponse(ResponseKind kind, double design, double asBuilt, double afterTrim, boolean trimRequired) {

    /**
     * @param design the design
     * @param built the absorber as built
     * @param trim the trim advised
     * @param mass the absorber mass as built, kg
     * @param plateMass one trim plate, kg
     * @return the responses
     */
    static BuiltResponse of(DesignResult design, AsBuiltAbsorber built, TrimCorrection trim, double mass,
            double plateMass) {
        ResponseKind kind = design.study().response();
        Structure measured = AsBuiltFit.withFrequency(design.study().structure(), built.structureFrequency());
        double m1 = measured.effectiveMass();
        double asBuilt = peak(measured, new Tuning(mass / m1, built.tuningRatio(), built.dampingRatio()), design);
        double afterTrim = asBuilt;
        if (trim.advised() && trim.platesToAdd() != 0) {
            double trimmed = mass + trim.platesToAdd() * plateMass;
            double omegaA = built.absorberFrequency() * Math.sqrt(mass / trimmed);
            double zeta = built.dampingRatio() * mass * built.absorberFrequency() / (trimmed * omegaA);
            afterTrim = peak(measured, new Tuning(trimmed / m1, omegaA / built.structureFrequency(), zeta), design);
        }
        double designed = design.responseAfter().value();
        return new BuiltResponse(kind, designed, asBuilt, afterTrim,
                asBuilt > designed * (1 + DesignResult.TOLERANCE_ALLOWANCE));
    }

    /** @return the same responses with no trim made: after it, as built; not required */
    BuiltResponse withoutTrim() {
        return new BuiltResponse(kind, design, asBuilt, asBuilt, trimRequired);
    }

    private static double peak(Structure structure, Tuning tuning, DesignResult design) {
        Excitation e = design.study().excitation();
        return new SystemResponse(structure, tuning, e.kind(), e.amplitude())
                .peakOver(design.study().response(), e.band()).value();
    }
}
