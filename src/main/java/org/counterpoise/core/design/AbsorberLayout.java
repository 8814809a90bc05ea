package org.counterpoise.core.design;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.optim.AbsorberSetOptimiser;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.system.ModalStructure;

/**
 * A structure of one or several modes with several absorbers at one of its points: what a project
 * file of format 6 adds to the single-mode study ({@code structure.modes}, {@code absorbers}). The
 * absorbers share the study's total mass equally and are fitted to one mode, the target; the force
 * acts at one point and the displacement is judged at another. SI units.
 *
 * @param structure the modes, in ascending natural frequency
 * @param modeNames one name per mode, in the same order
 * @param excitationPoint where the force acts
 * @param responsePoint where the displacement is judged
 * @param absorberPoint where every absorber sits
 * @param targetMode the index of the mode the absorbers are fitted to, or empty for the mode nearest
 *     the band ({@link ModalStructure#nearestMode})
 * @param count how many absorbers (1 to {@link AbsorberSetProblem#MAX_COUNT})
 * @param tuning uniform spread or individual tuning of the absorbers ({@link AbsorberSetOptimiser})
 * @param joint one absorber per mode on two modes, designed jointly (then {@code count} is 2, the
 *     target mode is one of the two and {@code absorberPoint} its absorber's point: what the
 *     single-mode sections take); empty when every absorber is on the target mode
 * @param spilloverLimit the largest peak allowed near each mode other than the target, as a multiple
 *     of its peak without absorbers ({@link SeveralAbsorbersDesigner}), or empty for none (the spillover is then
 *     reported, not limited)
 */
public record AbsorberLayout(ModalStructure structure, List<String> modeNames, String excitationPoint,
        String responsePoint, String absorberPoint, OptionalInt targetMode, int count, AbsorberSetTuning tuning,
        Optional<JointArrangement> joint, OptionalDouble spilloverLimit) {
    /** The field a problem of the absorbers' target mode names (a mode that does not move their point). */
    public static final String TARGET_MODE_FIELD = "target mode";

    /** Validates the layout; a message names the field. */
    public AbsorberLayout {
        Checks.present("structure", structure, "a structure of at least one mode");
        modeNames = List.copyOf(modeNames);
        if (modeNames.size() != structure.size()) {
            throw new IllegalArgumentException("bug: one name per mode");
        }
        structure.requirePoint(excitationPoint);
        structure.requirePoint(responsePoint);
        structure.requirePoint(absorberPoint);
        Checks.present("tuning", tuning, "uniform or individual");
        if (count < 1 || count > AbsorberSetProblem.MAX_COUNT) {
            throw new InvalidInputException("absorber count", Integer.toString(count),
                    "a whole number from 1 to " + AbsorberSetProblem.MAX_COUNT);
        }
        if (targetMode.isPresent() && (targetMode.getAsInt() < 0 || targetMode.getAsInt() >= structure.size())) {
            throw new IllegalArgumentException("bug: no mode " + targetMode.getAsInt());
        }
        Checks.present("joint", joint, "an arrangement of one absorber per mode, or none");
        Checks.present("spillover limit", spilloverLimit, "a limit, or none");
        if (spilloverLimit.isPresent() && !(spilloverLimit.getAsDouble() > 0)) {
            throw new InvalidInputException("spillover limit", Checks.show(spilloverLimit.getAsDouble()),
                    "a multiple above 0 of each mode's peak without absorbers");
        }
        joint.ifPresent(j -> {
            j.points().forEach(structure::requirePoint);
            if (j.modes().get(j.modes().size() - 1) >= structure.size() || count != j.modes().size()
                    || targetMode.isEmpty() || !j.modes().contains(targetMode.getAsInt())) {
                throw new IllegalArgumentException("bug: one absorber on each of two modes of the structure, one the target");
            }
        });
    }

    /**
     * Every absorber on one mode (format 6).
     *
     * @param structure the modes
     * @param modeNames their names
     * @param excitationPoint where the force acts
     * @param responsePoint where the displacement is judged
     * @param absorberPoint where every absorber sits
     * @param targetMode their mode, or empty for the one nearest the band
     * @param count how many absorbers
     * @param tuning uniform spread or individual tuning
     */
    public AbsorberLayout(ModalStructure structure, List<String> modeNames, String excitationPoint,
            String responsePoint, String absorberPoint, OptionalInt targetMode, int count, AbsorberSetTuning tuning) {
        this(structure, modeNames, excitationPoint, responsePoint, absorberPoint, targetMode, count, tuning,
                Optional.empty());
    }

    /**
     * With no spillover limit (formats 6 and 7).
     *
     * @param structure the modes
     * @param modeNames their names
     * @param excitationPoint where the force acts
     * @param responsePoint where the displacement is judged
     * @param absorberPoint the target's absorber's point
     * @param targetMode the target mode, or empty
     * @param count how many absorbers
     * @param tuning uniform spread or individual tuning
     * @param joint one absorber per mode, or empty
     */
    public AbsorberLayout(ModalStructure structure, List<String> modeNames, String excitationPoint,
            String responsePoint, String absorberPoint, OptionalInt targetMode, int count, AbsorberSetTuning tuning,
            Optional<JointArrangement> joint) {
        this(structure, modeNames, excitationPoint, responsePoint, absorberPoint, targetMode, count, tuning, joint,
                OptionalDouble.empty());
    }

    /**
     * @param band the forcing band
     * @return the index of the mode the absorbers are fitted to
     */
    public int target(FrequencyBand band) {
        return targetMode.orElseGet(() -> structure.nearestMode(absorberPoint, band.low(), band.high()));
    }

    /**
     * @param band the forcing band
     * @return the target mode's modal mass as seen at the absorbers' point, m_r / phi_r(a)^2, kg
     */
    public double effectiveMass(FrequencyBand band) {
        return seenAt(target(band), absorberPoint).effectiveMass();
    }

    /**
     * @param mode a mode's index
     * @param point a point it moves
     * @return that mode as seen at that point, the single-mode structure an absorber there sees: mass
     *     {@link Mode#massSeenAt}, the mode's natural frequency and damping ratio, shape value 1
     */
    public Structure seenAt(int mode, String point) {
        Mode m = structure.modes().get(mode);
        if (m.shapeAt(point) == 0.0) {
            throw new InvalidInputException(TARGET_MODE_FIELD, modeNames.get(mode),
                    "a mode that moves the absorbers' point " + point + " (its mode-shape value there is 0)");
        }
        double mass = m.massSeenAt(point);
        double w = m.naturalFrequency();
        return new Structure(mass, mass * w * w, m.dampingRatio(), 1.0);
    }
}
