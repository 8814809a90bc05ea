package org.counterpoise.core.model;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.units.Gravity;

/**
 * The ways engineers know a structure, turned into mass and stiffness. All SI; each method
 * names its field ids so a bad value is reported against what the user typed.
 */
public final class StructureConversions {
    private StructureConversions() {
    }

    /**
     * Mass from a weight under standard gravity: m = W / g0.
     * @param weight weight, N
     * @return mass, kg
     */
    public static double massFromWeight(double weight) {
        return Checks.positive("structure.weight", weight) / Gravity.STANDARD;
    }

    /**
     * Stiffness from mass and natural frequency: k = m omega^2.
     * @param mass kg
     * @param naturalFrequency rad/s
     * @return stiffness, N/m
     */
    public static double stiffnessFromFrequency(double mass, double naturalFrequency) {
        Checks.positive("structure.mass", mass);
        Checks.positive("structure.natural_frequency", naturalFrequency);
        return mass * naturalFrequency * naturalFrequency;
    }

    /**
     * Mass from stiffness and natural frequency: m = k / omega^2.
     * @param stiffness N/m
     * @param naturalFrequency rad/s
     * @return mass, kg
     */
    public static double massFromFrequency(double stiffness, double naturalFrequency) {
        Checks.positive("structure.stiffness", stiffness);
        Checks.positive("structure.natural_frequency", naturalFrequency);
        return stiffness / (naturalFrequency * naturalFrequency);
    }

    /**
     * Stiffness from the static deflection of a mass under its own weight: k = m g0 / delta, so
     * omega = sqrt(g0 / delta) (common practice; a statement of Hooke's law under gravity).
     * @param mass kg
     * @param staticDeflection m
     * @return stiffness, N/m
     */
    public static double stiffnessFromStaticDeflection(double mass, double staticDeflection) {
        Checks.positive("structure.mass", mass);
        Checks.positive("structure.static_deflection", staticDeflection);
        return mass * Gravity.STANDARD / staticDeflection;
    }

    /**
     * Weight under standard gravity: W = m g0 (the inverse of {@link #massFromWeight}).
     * @param mass kg
     * @return weight, N
     */
    public static double weightFromMass(double mass) {
        return mass * Gravity.STANDARD;
    }

    /**
     * Natural frequency of a mass on a spring: omega = sqrt(k / m) (the inverse of
     * {@link #stiffnessFromFrequency}). NaN when the mass is not positive or the stiffness negative.
     * @param mass kg
     * @param stiffness N/m
     * @return natural frequency, rad/s
     */
    public static double naturalFrequency(double mass, double stiffness) {
        return mass > 0 && stiffness >= 0 ? Math.sqrt(stiffness / mass) : Double.NaN;
    }

    /**
     * Static deflection of a mass under its own weight on the spring that gives it this natural
     * frequency: delta = g0 / omega^2 (common practice; the inverse of
     * {@link #frequencyFromStaticDeflection}). NaN when the frequency is not positive.
     * @param naturalFrequency rad/s
     * @return static deflection, m
     */
    public static double staticDeflection(double naturalFrequency) {
        return naturalFrequency > 0 ? Gravity.STANDARD / (naturalFrequency * naturalFrequency) : Double.NaN;
    }

    /**
     * Natural frequency from the static deflection under the own weight: omega = sqrt(g0 / delta)
     * (common practice). NaN when the deflection is not positive.
     * @param staticDeflection m
     * @return natural frequency, rad/s
     */
    public static double frequencyFromStaticDeflection(double staticDeflection) {
        return staticDeflection > 0 ? Math.sqrt(Gravity.STANDARD / staticDeflection) : Double.NaN;
    }
}
