package org.counterpoise.io.project;

import java.util.List;

/**
 * A structure given as several modes with mode-shape values at named points (since format 6: the
 * file's {@code structure.modes}, {@code structure.excitation_point} and
 * {@code structure.response_point}).
 *
 * @param modes the modes, in the order written
 * @param excitationPoint the point the force acts at
 * @param responsePoint the point whose displacement is judged
 */
public record ModesInput(List<ModeInput> modes, String excitationPoint, String responsePoint) {

    /** Copies the list. */
    public ModesInput {
        modes = List.copyOf(modes);
    }
}
