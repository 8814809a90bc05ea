package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
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
 * @param surroundings the whole structure the absorbers act on, in the mode's units, when it has
 *     other modes (the peak is then the whole structure's, {@link SetSurroundings}); empty for the
 *     mode alone
 */
public record AbsorberSetProblem(int count, double massRatio, double structureDamping, double bandLow, double bandHigh,
        AbsorberSetTuning tuning, Optional<SetSurroundings> surroundings) {
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
        Checks.present("surroundings", surroundings, "the whole structure, or none");
        if (surroundings.isPresent() && surroundings.get().targetDamping() != structureDamping) {
            throw new InvalidInputException("structure damping", Checks.show(structureDamping),
                    "the target mode's own damping ratio, " + Checks.show(surroundings.get().targetDamping()));
        }
    }

    /**
     * The problem on the mode alone.
     *
     * @param count n
     * @param massRatio total mu
     * @param structureDamping zeta1
     * @param bandLow lowest g
     * @param bandHigh highest g
     * @param tuning uniform or individual
     */
    public AbsorberSetProblem(int count, double massRatio, double structureDamping, double bandLow, double bandHigh,
            AbsorberSetTuning tuning) {
        this(count, massRatio, structureDamping, bandLow, bandHigh, tuning, Optional.empty());
    }

    /**
     * @param whole the whole structure in the mode's units
     * @return the same problem on the whole structure (its structure damping must be the target mode's)
     */
    public AbsorberSetProblem on(SetSurroundings whole) {
        return new AbsorberSetProblem(count, massRatio, structureDamping, bandLow, bandHigh, tuning, Optional.of(whole));
    }

    /** @return the same problem on the mode alone (the design the program made before the whole structure was seen) */
    public AbsorberSetProblem modeAlone() {
        return new AbsorberSetProblem(count, massRatio, structureDamping, bandLow, bandHigh, tuning);
    }

    /**
     * @param otherCount another number of absorbers
     * @param otherMassRatio their total mass ratio
     * @param otherTuning their tuning rule
     * @return the same structure and band with those absorbers
     */
    public AbsorberSetProblem withAbsorbers(int otherCount, double otherMassRatio, AbsorberSetTuning otherTuning) {
        return new AbsorberSetProblem(otherCount, otherMassRatio, structureDamping, bandLow, bandHigh, otherTuning,
                surroundings);
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
        return withAbsorbers(count, massRatio, other);
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
        String at = surroundings.map(SetSurroundings::absorberPoint).orElse(POINT);
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < design.count(); j++) {
            absorbers.add(PointAbsorber.tuned(at, design.massRatios().get(j), design.tuningRatios().get(j),
                    design.dampingRatios().get(j)));
        }
        // the nominal scales whatever the factor (ModalSystem.of would scale by the varied mode)
        ModalStructure structure = surroundings.map(w -> w.varied(structureFactor))
                .orElseGet(() -> ModalStructure.singleMode(POINT, structureFactor, structureDamping, 1.0));
        return new ModalSystem(structure, absorbers, 1.0, 1.0);
    }

    /** @return where the force acts: the structure's one point, or the whole structure's excitation point */
    String forcePoint() {
        return surroundings.map(SetSurroundings::excitationPoint).orElse(POINT);
    }

    /** @return where the displacement is taken */
    String responsePoint() {
        return surroundings.map(SetSurroundings::responsePoint).orElse(POINT);
    }

    /**
     * @param design the absorbers
     * @return X k1 / F as an exact rational function of s = i g
     */
    public TransferFunction transferFunction(AbsorberSetDesign design) {
        return system(design).transferFunction(forcePoint(), responsePoint());
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
