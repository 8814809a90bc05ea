package org.counterpoise.io.project;

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
}
