package org.counterpoise.io.project;

import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.StructureConversions;

/**
 * The structure as the user knows it. Exactly one of mass and weight; exactly one of stiffness,
 * natural frequency and static deflection (or stiffness plus natural frequency without a mass).
 * Absent entries are null.
 *
 * @param mass modal mass
 * @param weight weight (mass = weight / standard gravity)
 * @param stiffness modal stiffness
 * @param naturalFrequency natural frequency
 * @param staticDeflection static deflection under its own weight
 * @param damping damping in one of its usual measures
 * @param modeShapeAtAbsorber mode shape value at the absorber point (1 at the antinode)
 * @param measured where the values came from when they were identified from a measurement, or null
 *     when typed (since format 5)
 */
public record StructureInput(QuantityInput mass, QuantityInput weight, QuantityInput stiffness,
        QuantityInput naturalFrequency, QuantityInput staticDeflection, DampingInput damping,
        double modeShapeAtAbsorber, MeasuredSource measured) {

    /** The single-mode section of a project whose structure is given as modes ({@code structure.modes}): empty. */
    public static final StructureInput GIVEN_AS_MODES = new StructureInput(null, null, null, null, null, null, 1.0);

    /**
     * A structure as typed, not from a measurement.
     * @param mass modal mass
     * @param weight weight
     * @param stiffness modal stiffness
     * @param naturalFrequency natural frequency
     * @param staticDeflection static deflection under its own weight
     * @param damping damping
     * @param modeShapeAtAbsorber mode shape value at the absorber point
     */
    public StructureInput(QuantityInput mass, QuantityInput weight, QuantityInput stiffness,
            QuantityInput naturalFrequency, QuantityInput staticDeflection, DampingInput damping,
            double modeShapeAtAbsorber) {
        this(mass, weight, stiffness, naturalFrequency, staticDeflection, damping, modeShapeAtAbsorber, null);
    }

    /**
     * @param source where the values came from, or null when typed
     * @return this structure with it
     */
    public StructureInput withMeasured(MeasuredSource source) {
        return new StructureInput(mass, weight, stiffness, naturalFrequency, staticDeflection, damping,
                modeShapeAtAbsorber, source);
    }

    /** @return the single mode in SI, as given */
    public Structure toStructure() {
        StructureInput s = this;
        if (s.mass() != null && s.weight() != null) {
            throw new InvalidInputException("structure.weight", "given with structure.mass",
                    "give either structure.mass or structure.weight, not both");
        }
        // No mixed double/null conditional here: unboxing its null result was a NullPointerException
        // for the documented form "stiffness and natural frequency without a mass".
        boolean massGiven = s.mass() != null || s.weight() != null;
        double mass = s.mass() != null ? s.mass().positiveSi("structure.mass.value")
                : s.weight() != null ? StructureConversions.massFromWeight(s.weight().si("structure.weight.value")) : Double.NaN;
        int stiffnessForms = count(s.stiffness(), s.naturalFrequency(), s.staticDeflection());
        double stiffness;
        if (!massGiven) {
            if (s.staticDeflection() != null) {
                throw new InvalidInputException("structure.static_deflection", "given without a mass",
                        "a static deflection needs structure.mass or structure.weight beside it");
            }
            if (s.stiffness() == null || s.naturalFrequency() == null) {
                throw InvalidInputException.missing("structure.mass",
                        "give structure.mass or structure.weight, or both structure.stiffness and"
                                + " structure.natural_frequency");
            }
            stiffness = s.stiffness().positiveSi("structure.stiffness.value");
            mass = StructureConversions.massFromFrequency(stiffness,
                    s.naturalFrequency().positiveSi("structure.natural_frequency.value"));
        } else if (stiffnessForms != 1) {
            throw new InvalidInputException("structure", stiffnessForms + " stiffness entries",
                    "with a mass or weight give exactly one of structure.stiffness, structure.natural_frequency"
                            + " and structure.static_deflection");
        } else if (s.stiffness() != null) {
            stiffness = s.stiffness().positiveSi("structure.stiffness.value");
        } else if (s.naturalFrequency() != null) {
            stiffness = StructureConversions.stiffnessFromFrequency(mass,
                    s.naturalFrequency().positiveSi("structure.natural_frequency.value"));
        } else {
            stiffness = StructureConversions.stiffnessFromStaticDeflection(mass,
                    s.staticDeflection().positiveSi("structure.static_deflection.value"));
        }
        double zeta = DampingInput.ratioOf(s.damping(), "structure.damping", Math.sqrt(stiffness / mass));
        return new Structure(mass, stiffness, zeta, s.modeShapeAtAbsorber());
    }

    private static int count(Object... entries) {
        int n = 0;
        for (Object e : entries) {
            if (e != null) {
                n++;
            }
        }
        return n;
    }
}
