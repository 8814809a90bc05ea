package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;

/**
 * Several absorbers of equal mass on one mode of a structure, non-dimensional: the structure has
 * omega1 = 1, modal mass 1 and damping ratio zeta1; a force acts on it and its displacement, per
 * F / k1, is minimised in peak over the band of frequency ratios g (H-infinity).
 *
 * @param count number of absorbers n (1 to {@link #MAX_COUNT})
 * @param massRatio total mass ratio mu = sum m_j / m1, shared equally
 * @param structureDamping zeta1
 * @param bandLow lowest g (&gt;= 0)
 * @param bandHigh highest g (+infinity for all frequencies)
 * @param tuning uniform spread or individual tuning
 */
public record AbsorberSetProblem(int count, double massRatio, double structureDamping, double bandLow, double bandHigh,
        AbsorberSetTuning tuning) {
    /** Most absorbers on one mode: beyond eight the gain over the uniform spread is negligible and the degree high. */
    public static final int MAX_COUNT = 8;
    /** The tuning ratios searched, as for one absorber (docs/optimiser.md): [0.05, 5]. */
    static final double MIN_TUNING = 0.05;
    static final double MAX_TUNING = 5.0;
    /** The damping ratios searched: [1e-4, 4] (beyond 4 an absorber is practically locked). */
    static final double MIN_DAMPING = 1e-4;
    static final double MAX_DAMPING = PeakProblem.MAX_DAMPING;
    /** The largest total spread (f_max - f_min) / f_centre of the uniform design. */
    static final double MAX_SPREAD = 1.0;

    /** Validates the problem; each message names the option a user sets. */
    public AbsorberSetProblem {
        if (count < 1 || count > MAX_COUNT) {
            throw new InvalidInputException("absorber count", Integer.toString(count), "a whole number from 1 to " + MAX_COUNT);
        }
        Checks.inOpenRange("mass ratio", massRatio, 0.0, 10.0);
        Checks.inRange("structure damping", structureDamping, 0.0, 0.99);
        PeakProblem.checkBand(bandLow, bandHigh);
        Checks.present("tuning", tuning, "uniform or individual");
    }

    /**
     * @param count n
     * @param massRatio total mu
     * @param structureDamping zeta1
     * @param tuning uniform or individual
     * @return the problem over all frequencies
     */
    public static AbsorberSetProblem allFrequencies(int count, double massRatio, double structureDamping,
            AbsorberSetTuning tuning) {
        return new AbsorberSetProblem(count, massRatio, structureDamping, 0.0, Double.POSITIVE_INFINITY, tuning);
    }

    /**
     * @param other another tuning rule
     * @return the same problem with it
     */
    public AbsorberSetProblem with(AbsorberSetTuning other) {
        return new AbsorberSetProblem(count, massRatio, structureDamping, bandLow, bandHigh, other);
    }

    /**
     * @param tuningRatios f_j
     * @param dampingRatios zeta_j
     * @return the design with equal masses mu / n
     */
    public AbsorberSetDesign design(double[] tuningRatios, double[] dampingRatios) {
        List<Double> mu = new ArrayList<>();
        List<Double> f = new ArrayList<>();
        List<Double> z = new ArrayList<>();
        for (int j = 0; j < count; j++) {
            mu.add(massRatio / count);
            f.add(tuningRatios[j]);
            z.add(dampingRatios[j]);
        }
        return new AbsorberSetDesign(mu, f, z);
    }

    /**
     * @param design the absorbers
     * @return the structure (omega1 = 1, m1 = 1) with them, on the scales omega_ref = 1, k_ref = 1
     */
    public ModalSystem system(AbsorberSetDesign design) {
        return system(design, 1.0);
    }

    /**
     * @param design the absorbers
     * @param structureFactor the structure's natural frequency over nominal (stiffness by its square;
     *     modal mass and damping ratio kept)
     * @return the structure so varied with them, on the nominal scales omega_ref = 1, k_ref = 1
     */
    ModalSystem system(AbsorberSetDesign design, double structureFactor) {
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < design.count(); j++) {
            absorbers.add(PointAbsorber.tuned(POINT, design.massRatios().get(j), design.tuningRatios().get(j),
                    design.dampingRatios().get(j)));
        }
        // the nominal scales whatever the factor (ModalSystem.of would scale by the varied mode)
        return new ModalSystem(ModalStructure.singleMode(POINT, structureFactor, structureDamping, 1.0), absorbers,
                1.0, 1.0);
    }

    /**
     * @param design the absorbers
     * @return X k1 / F as an exact rational function of s = i g
     */
    public TransferFunction transferFunction(AbsorberSetDesign design) {
        return system(design).transferFunction(POINT, POINT);
    }

    /**
     * @param design the absorbers
     * @return the exact peak of |X k1 / F| over the band
     */
    public double peak(AbsorberSetDesign design) {
        return PeakFinder.over(transferFunction(design), bandLow, bandHigh).magnitude();
    }

    /** The structure's one point: where the force acts, the displacement is taken and the absorbers sit. */
    static final String POINT = "structure";
}
