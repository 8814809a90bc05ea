package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.system.ModalPeak;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.PointAbsorber;

/**
 * One absorber per mode on a structure of two modes, non-dimensional, all at one point where the
 * force acts and the displacement is taken: mode 1 has omega1 = 1, modal mass 1 and shape value 1
 * there; mode 2 has omega2 = R, modal mass M and shape value phi there; both the damping ratio
 * zeta. The peak of the receptance X k1 / F over the band of frequency ratios g = omega / omega1 is
 * minimised (H-infinity) by the two absorbers' tunings and dampings together.
 *
 * <p>Mass split (the rule of this design, common practice with no single source): each absorber
 * gets the same mass ratio on its own mode, the mode's modal mass as seen at the point being
 * m_r / phi_r^2 (the single-mode structure the rest of the program designs on); so absorber j has
 * mu_j = mu (m_j / phi_j^2) / sum_r (m_r / phi_r^2), mu = sum mu_j the total, relative to m1.
 *
 * @param massRatio total mass ratio mu = (m_a1 + m_a2) / m1
 * @param structureDamping zeta of both modes
 * @param secondModeRatio R = omega2 / omega1 (&gt; 1, at most {@value #MAX_MODE_RATIO})
 * @param secondModeMass M = m2 / m1 (&gt; 0)
 * @param secondModeShape phi, mode 2's shape value at the point, mode 1's being 1 (non-zero)
 * @param bandLow lowest g (&gt;= 0)
 * @param bandHigh highest g (+infinity for all frequencies)
 */
public record JointAbsorberProblem(double massRatio, double structureDamping, double secondModeRatio,
        double secondModeMass, double secondModeShape, double bandLow, double bandHigh) {
    /** Highest ratio of the two natural frequencies taken (as for the spillover of {@code optimum}). */
    public static final double MAX_MODE_RATIO = 100.0;
    /** The number of modes, and of absorbers: one per mode. */
    public static final int MODES = 2;
    /** The structure's one point: where the force acts, the displacement is taken and the absorbers sit. */
    static final String POINT = "structure";

    /** Validates the problem; each message names the quantity a user sets. */
    public JointAbsorberProblem {
        Checks.inOpenRange("mass ratio", massRatio, 0.0, 10.0);
        Checks.inRange("structure damping", structureDamping, 0.0, 0.99);
        if (!(secondModeRatio > 1 && secondModeRatio <= MAX_MODE_RATIO)) {
            throw new InvalidInputException("second mode ratio", Checks.show(secondModeRatio),
                    "a ratio of the second natural frequency to the first, above 1 and at most " + (int) MAX_MODE_RATIO);
        }
        Checks.inOpenRange("second mode mass", secondModeMass, 0.0, 1e6);
        if (!(Double.isFinite(secondModeShape) && secondModeShape != 0.0)) {
            throw new InvalidInputException("second mode shape", Checks.show(secondModeShape),
                    "a finite number other than 0 (an absorber for mode 2 where mode 2 does not move does nothing)");
        }
        PeakProblem.checkBand(bandLow, bandHigh);
    }

    /**
     * @param mode 0 or 1
     * @return its natural frequency over mode 1's
     */
    public double modeFrequency(int mode) {
        return mode == 0 ? 1.0 : secondModeRatio;
    }

    /**
     * @param mode 0 or 1
     * @return its modal mass as seen at the point, m_r / phi_r^2, over m1
     */
    public double seenMass(int mode) {
        return mode == 0 ? 1.0 : secondModeMass / (secondModeShape * secondModeShape);
    }

    /**
     * @param absorber 0 or 1 (the absorber of that mode)
     * @return its mass over m1, by the rule of equal mass ratios on each absorber's own mode
     */
    public double absorberMassRatio(int absorber) {
        return massRatio * seenMass(absorber) / (seenMass(0) + seenMass(1));
    }

    /** @return each absorber's mass over the modal mass of its own mode seen at the point (the same for both) */
    public double ownMassRatio() {
        return massRatio / (seenMass(0) + seenMass(1));
    }

    /** @return the two-mode structure, on the scales omega_ref = omega1 = 1, k_ref = m1 omega1^2 = 1 */
    public ModalStructure structure() {
        return new ModalStructure(List.of(new Mode(1.0, structureDamping, 1.0, Map.of(POINT, 1.0)),
                new Mode(secondModeRatio, structureDamping, secondModeMass, Map.of(POINT, secondModeShape))));
    }

    /**
     * @param tuningRatios f_j = omega_j / omega1 of each absorber
     * @param dampingRatios zeta_j of each
     * @return the design with the masses of the split rule
     */
    public AbsorberSetDesign design(double[] tuningRatios, double[] dampingRatios) {
        List<Double> mu = new ArrayList<>();
        List<Double> f = new ArrayList<>();
        List<Double> z = new ArrayList<>();
        for (int j = 0; j < MODES; j++) {
            mu.add(absorberMassRatio(j));
            f.add(tuningRatios[j]);
            z.add(dampingRatios[j]);
        }
        return new AbsorberSetDesign(mu, f, z);
    }

    /**
     * @param design the two absorbers
     * @return the structure with them at its point (X k1 / F is its transfer function)
     */
    public ModalSystem system(AbsorberSetDesign design) {
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < design.count(); j++) {
            absorbers.add(PointAbsorber.tuned(POINT, design.massRatios().get(j), design.tuningRatios().get(j),
                    design.dampingRatios().get(j)));
        }
        return ModalSystem.of(structure(), absorbers);
    }

    /**
     * @param design the two absorbers
     * @return the exact peak of |X k1 / F| over the band, the whole two-mode structure seen
     */
    public double peak(AbsorberSetDesign design) {
        return ModalPeak.over(system(design), POINT, POINT, bandLow, bandHigh);
    }
}
