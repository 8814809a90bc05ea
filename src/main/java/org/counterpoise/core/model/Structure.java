package org.counterpoise.core.model;

import org.counterpoise.core.error.Checks;

/**
 * The structure (the trade also says "primary system"): one mode, described by its modal mass, modal stiffness and viscous
 * damping ratio, and by the value of the mode shape at the point where the absorber is attached.
 *
 * <p>With the mode shape normalised so that the modal mass belongs to a unit value at the
 * reference point, an absorber at a point where the mode shape is phi sees the effective mass
 * m1 = m_modal / phi^2 and stiffness k1 = k_modal / phi^2 (the natural frequency and damping ratio
 * are unchanged). This is the usual single-mode reduction, e.g. Den Hartog (1956), Mechanical
 * Vibrations, 4th ed., section 3.3, and Warburton (1982), section 2. All units SI.
 *
 * @param modalMass modal mass, kg (&gt; 0)
 * @param modalStiffness modal stiffness, N/m (&gt; 0)
 * @param dampingRatio viscous damping ratio zeta1 of the mode (0 &lt;= zeta1 &lt; 1)
 * @param modeShapeAtAbsorber mode shape value phi at the absorber point (0 &lt; phi &lt;= 1)
 */
public record Structure(double modalMass, double modalStiffness, double dampingRatio,
        double modeShapeAtAbsorber) {

    /** Validates every field on construction. */
    public Structure {
        Checks.positive("structure.mass", modalMass);
        Checks.positive("structure.stiffness", modalStiffness);
        Checks.inRange("structure.damping", dampingRatio, 0.0, 0.99);
        Checks.inRange("structure.mode_shape_at_absorber", modeShapeAtAbsorber, 1e-3, 1.0);
    }

    /**
     * A structure with the absorber at the antinode (phi = 1).
     * @param mass mass, kg
     * @param stiffness stiffness, N/m
     * @param dampingRatio damping ratio zeta1
     * @return the structure
     */
    public static Structure of(double mass, double stiffness, double dampingRatio) {
        return new Structure(mass, stiffness, dampingRatio, 1.0);
    }

    /** @return effective mass at the absorber point m1 = m_modal / phi^2, kg */
    public double effectiveMass() {
        return modalMass / (modeShapeAtAbsorber * modeShapeAtAbsorber);
    }

    /** @return effective stiffness at the absorber point k1 = k_modal / phi^2, N/m */
    public double effectiveStiffness() {
        return modalStiffness / (modeShapeAtAbsorber * modeShapeAtAbsorber);
    }

    /** @return effective viscous damping coefficient c1 = 2 zeta1 sqrt(k1 m1), N*s/m */
    public double effectiveDampingCoefficient() {
        return 2.0 * dampingRatio * Math.sqrt(effectiveStiffness() * effectiveMass());
    }

    /** @return undamped natural frequency omega1 = sqrt(k/m), rad/s */
    public double naturalFrequency() {
        return Math.sqrt(modalStiffness / modalMass);
    }

    /**
     * @param stiffness new modal stiffness, N/m
     * @return this structure with another stiffness and the same viscous damper (c1 kept, so the
     *     damping ratio changes as 1/sqrt(k)), which is what stiffening a real structure does
     */
    public Structure withStiffnessKeepingDamper(double stiffness) {
        // c1 = 2 zeta sqrt(k m) kept: zeta' = zeta sqrt(k / k'), written as a ratio so that
        // sqrt(k m) cannot underflow or overflow (it did at 1e-300 kg, giving 0/0)
        double zeta = dampingRatio * Math.sqrt(modalStiffness / stiffness);
        return new Structure(modalMass, stiffness, Math.min(zeta, 0.99), modeShapeAtAbsorber);
    }

    /**
     * @param mass new modal mass, kg
     * @return this structure with another mass and the same viscous damper (c1 kept)
     */
    public Structure withMassKeepingDamper(double mass) {
        double zeta = dampingRatio * Math.sqrt(modalMass / mass); // c1 kept, as a ratio (see above)
        return new Structure(mass, modalStiffness, Math.min(zeta, 0.99), modeShapeAtAbsorber);
    }

    /**
     * @param factor scale of the natural frequency (1.05 = 5 % high), by scaling the stiffness
     * @return the mistuned structure with the same damping ratio
     */
    public Structure withFrequencyScaledBy(double factor) {
        return new Structure(modalMass, modalStiffness * factor * factor, dampingRatio, modeShapeAtAbsorber);
    }
}
