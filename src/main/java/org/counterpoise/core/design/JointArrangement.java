package org.counterpoise.core.design;

import java.util.List;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.optim.JointAbsorberProblem;

/**
 * One absorber on each of two modes of a structure, their tunings and dampings designed jointly
 * for the least peak over the band of the whole structure (a project file's
 * {@code "arrangement": "one-per-mode"}, since format 7; docs/several-modes.md).
 *
 * @param modes the indices of the two modes (in the structure's ascending order), one absorber each,
 *     the lower mode first
 * @param points each absorber's point, in the order of {@code modes}
 * @param pointsChosen true for an absorber whose point was not given: the program put it where its
 *     mode's shape value is largest in size
 */
public record JointArrangement(List<Integer> modes, List<String> points, List<Boolean> pointsChosen) {

    /** Validates the arrangement. */
    public JointArrangement {
        modes = List.copyOf(modes);
        points = List.copyOf(points);
        pointsChosen = List.copyOf(pointsChosen);
        int n = JointAbsorberProblem.MODES;
        if (modes.size() != n || points.size() != n || pointsChosen.size() != n) {
            throw new InvalidInputException("absorbers.modes", modes.size() + " modes", "exactly " + n
                    + " modes, one absorber each, with one point each");
        }
        if (modes.get(0) >= modes.get(1)) {
            throw new IllegalArgumentException("bug: the two modes in ascending order, different");
        }
    }
}
