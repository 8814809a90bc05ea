package org.counterpoise.core.commission;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.realisation.PartTolerances;
import org.counterpoise.core.realisation.TrimPlan;

/**
 * What to do on site once the absorber as built is known: how far its frequency and damping are
 * from what the structure needs, and how many trim plates to add (positive) or take off (negative).
 *
 * <p>The target is the design's tuning ratio f times the structure's natural frequency, the one
 * measured (when the fit freed it) or the design's. At a fixed spring rate omega_a = sqrt(k / m)
 * (any vibration text, e.g. Den Hartog 1956, Mechanical Vibrations, 4th ed., ch. 1), so the mass
 * that gives the target is m (omega_built / omega_target)^2; the plates are that mass change over
 * one plate's mass, rounded to the nearest whole plate. The plates are given inside the part
 * tolerance too (the trim is cheap and brings the response nearer the design's); whether the
 * absorber as built is inside its tolerance is reported beside them.
 *
 * @param targetFrequency the absorber frequency the structure needs, rad/s
 * @param frequencyOff (omega_built / omega_target - 1), fraction
 * @param frequencyTolerance the part tolerance on the absorber's frequency, fraction
 * @param advised whether plates are advised at all: not when the fit of the absorber as built is poor
 *     (its frequency, and so the plates, could be wrong in size and sign)
 * @param platesToAdd plates to add (negative: to take off), the nearest whole number; 0 when not advised
 * @param frequencyOffAfter what remains of the frequency error after that trim, fraction
 * @param dampingOff (zeta_built / zeta_design - 1), fraction (0 for an undamped design)
 * @param dampingTolerance the part tolerance on the damping, fraction
 * @param warnings what calls for more than trim plates
 */
public record TrimCorrection(double targetFrequency, double frequencyOff, double frequencyTolerance, boolean advised,
        int platesToAdd,
        double frequencyOffAfter, double dampingOff, double dampingTolerance, List<CommissioningWarning> warnings) {

    /** Copies the warnings. */
    public TrimCorrection {
        warnings = List.copyOf(warnings);
    }

    /**
     * @return the same finding with no plates advised, since they would not lower the peak
     *     ({@link CommissioningWarning#TRIM_DOES_NOT_HELP} added)
     */
    TrimCorrection notHelping() {
        List<CommissioningWarning> more = new ArrayList<>(warnings);
        more.add(CommissioningWarning.TRIM_DOES_NOT_HELP);
        return new TrimCorrection(targetFrequency, frequencyOff, frequencyTolerance, false, 0, frequencyOff,
                dampingOff, dampingTolerance, more);
    }

    /** @return whether the absorber's frequency is inside its part tolerance as built */
    public boolean frequencyInTolerance() {
        return Math.abs(frequencyOff) <= frequencyTolerance;
    }

    /**
     * @param built the absorber as built
     * @param designTuningRatio the design's tuning ratio f
     * @param designDampingRatio the design's absorber damping ratio
     * @param absorberMass the absorber mass as built (with its fitted plates), kg
     * @param trim the trim plan supplied with the absorber
     * @param tolerances the part tolerances
     * @return what to do
     */
    public static TrimCorrection of(AsBuiltAbsorber built, double designTuningRatio, double designDampingRatio,
            double absorberMass, TrimPlan trim, PartTolerances tolerances) {
        double target = designTuningRatio * built.structureFrequency();
        double off = built.absorberFrequency() / target - 1.0;
        List<CommissioningWarning> warnings = new ArrayList<>();
        if (built.warnings().contains(CommissioningWarning.POOR_FIT)) {
            return new TrimCorrection(target, off, tolerances.absorberFrequency(), false, 0, off, 0.0,
                    tolerances.damping(), warnings);
        }
        double ratio = built.absorberFrequency() / target;
        double needed = absorberMass * ratio * ratio - absorberMass;
        int plates = (int) Math.round(needed / trim.plateMass());
        int spare = trim.platesTotal() - trim.platesFitted();
        boolean shortOfPlates = plates > spare || -plates > trim.platesFitted();
        plates = Math.max(-trim.platesFitted(), Math.min(spare, plates));
        double after = built.absorberFrequency()
                * Math.sqrt(absorberMass / (absorberMass + plates * trim.plateMass())) / target - 1.0;
        // short of plates matters only when even all of them leave the absorber outside its tolerance
        if (shortOfPlates && Math.abs(after) > tolerances.absorberFrequency()) {
            warnings.add(CommissioningWarning.BEYOND_TRIM_RANGE);
        }
        double dampingOff = designDampingRatio > 0 ? built.dampingRatio() / designDampingRatio - 1.0 : 0.0;
        if (designDampingRatio > 0 && Math.abs(dampingOff) > tolerances.damping()) {
            warnings.add(CommissioningWarning.DAMPING_OUT_OF_TOLERANCE);
        }
        return new TrimCorrection(target, off, tolerances.absorberFrequency(), true, plates, after, dampingOff,
                tolerances.damping(), warnings);
    }
}
