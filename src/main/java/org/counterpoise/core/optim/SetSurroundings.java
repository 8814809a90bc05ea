package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.Mode;

/**
 * The whole structure that several absorbers at one point act on, when it has more modes than the
 * one they are designed for: every mode, the force's point and the response's point, in the units of
 * the {@link AbsorberSetProblem} (the target mode's natural frequency 1 and its modal mass as seen at
 * the absorbers' point 1). So the problem's variables, box, mass ratio and band keep their meaning,
 * and its peak becomes the whole structure's exact peak of X k_r / F over the band (k_r the target
 * mode's stiffness seen at the absorbers' point) with the force and the response at their own points:
 * the structure as it is, not the target mode alone.
 *
 * <p>Scaling (exact, any modal model): frequency omega / omega_r, modal mass m / (m_r / phi_r(a)^2),
 * shapes unchanged; a receptance X / F in SI times k_r = (m_r / phi_r(a)^2) omega_r^2 is the scaled
 * structure's receptance.
 *
 * @param structure every mode, scaled (the target's frequency 1, its mass seen at the absorbers' point 1)
 * @param targetMode the index of the mode the absorbers are designed for
 * @param absorberPoint where the absorbers sit
 * @param excitationPoint where the force acts
 * @param responsePoint where the displacement is taken
 */
public record SetSurroundings(ModalStructure structure, int targetMode, String absorberPoint, String excitationPoint,
        String responsePoint) {

    /** Validates the surroundings; a message names the quantity. */
    public SetSurroundings {
        Checks.present("structure", structure, "a structure of modes");
        if (targetMode < 0 || targetMode >= structure.size()) {
            throw new InvalidInputException("target mode", Integer.toString(targetMode + 1),
                    "a mode of the structure, 1 to " + structure.size());
        }
        structure.requirePoint(absorberPoint);
        structure.requirePoint(excitationPoint);
        structure.requirePoint(responsePoint);
        if (structure.modes().get(targetMode).shapeAt(absorberPoint) == 0.0) {
            throw new InvalidInputException("absorber point", absorberPoint,
                    "a point the target mode moves (its mode-shape value there is 0)");
        }
    }

    /**
     * @param si the structure in SI
     * @param targetMode the mode the absorbers are designed for
     * @param absorberPoint where they sit
     * @param excitationPoint where the force acts
     * @param responsePoint where the displacement is taken
     * @return the same structure in the target mode's units (class comment)
     */
    public static SetSurroundings scaled(ModalStructure si, int targetMode, String absorberPoint,
            String excitationPoint, String responsePoint) {
        Mode target = si.modes().get(targetMode);
        double frequency = target.naturalFrequency();
        double mass = target.massSeenAt(absorberPoint);
        List<Mode> modes = new ArrayList<>();
        for (Mode m : si.modes()) {
            modes.add(new Mode(m.naturalFrequency() / frequency, m.dampingRatio(), m.modalMass() / mass, m.shape()));
        }
        return new SetSurroundings(new ModalStructure(modes), targetMode, absorberPoint, excitationPoint,
                responsePoint);
    }

    /** @return the target mode's damping ratio: the problem's structure damping */
    public double targetDamping() {
        return structure.modes().get(targetMode).dampingRatio();
    }

    /**
     * @param factor the target mode's natural frequency over nominal (its stiffness by the square; its
     *     modal mass, damping ratio and shape kept; the other modes as they are)
     * @return the structure so varied
     */
    ModalStructure varied(double factor) {
        return factor == 1.0 ? structure
                : structure.withFrequency(targetMode, factor * structure.modes().get(targetMode).naturalFrequency());
    }
}
