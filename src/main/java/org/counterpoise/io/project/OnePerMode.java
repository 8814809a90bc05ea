package org.counterpoise.io.project;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.JointArrangement;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.Mode;
import org.counterpoise.io.PlainText;

/**
 * The layout of one absorber on each of two named modes, designed jointly (the file's
 * {@code "arrangement": "one-per-mode"}, since format 7), and the checks that name the file's fields.
 * Each absorber's point: its entry of {@code absorbers.points}; else {@code absorbers.point}; else the
 * named point where its mode's shape value is largest in size (the first written on a tie). The
 * target mode (what the single-mode sections of a report take): {@code absorbers.target_mode}, one
 * of the two, else the first of {@code absorbers.modes}.
 */
final class OnePerMode {
    private static final String MODES = ModesJson.ABSORBERS + "." + ModesJson.ARRANGED_MODES;

    private OnePerMode() {
    }

    /**
     * @param a the absorbers as given
     * @param structure the structure's modes in ascending frequency
     * @param names their names in the same order
     * @param modes the modes as given (the points in the order written)
     * @param points the named points, for messages
     * @return the layout
     */
    static AbsorberLayout layout(AbsorbersInput a, ModalStructure structure, List<String> names, ModesInput modes,
            String points) {
        if (a.point() != null && !a.points().isEmpty()) {
            throw new InvalidInputException(ModesJson.ABSORBERS + "." + ModesJson.POINT, "\"" + PlainText.quote(a.point())
                    + "\" with " + ModesJson.ABSORBERS + "." + ModesJson.POINTS, "one of them: point (both absorbers"
                            + " there) or points (each absorber's)");
        }
        List<Integer> index = new ArrayList<>();
        for (int i = 0; i < a.modes().size(); i++) {
            int r = names.indexOf(a.modes().get(i));
            if (r < 0) {
                throw new InvalidInputException(MODES + "[" + i + "]", "\"" + PlainText.quote(a.modes().get(i)) + "\"",
                        "the name of one of structure.modes: " + PlainText.quote(String.join(", ", names)));
            }
            index.add(r);
        }
        if (structure.modes().get(index.get(0)).naturalFrequency() == structure.modes().get(index.get(1))
                .naturalFrequency()) {
            throw new InvalidInputException(MODES, PlainText.quote(String.join(", ", a.modes())),
                    "two modes of different natural frequencies (one absorber is tuned to each)");
        }
        List<String> pointOf = new ArrayList<>();
        List<Boolean> chosen = new ArrayList<>();
        for (int i = 0; i < index.size(); i++) {
            Mode mode = structure.modes().get(index.get(i));
            String field;
            String point;
            if (!a.points().isEmpty()) {
                field = ModesJson.ABSORBERS + "." + ModesJson.POINTS + "[" + i + "]";
                point = a.points().get(i);
            } else if (a.point() != null) {
                field = ModesJson.ABSORBERS + "." + ModesJson.POINT;
                point = a.point();
            } else {
                field = null;
                point = largest(mode, modes.modes().get(0).modeShape().keySet());
            }
            if (field == null) {
                field = "structure." + ModesJson.MODES + "[" + modes.modes().stream().map(ModeInput::name).toList()
                        .indexOf(a.modes().get(i)) + "]." + ModesJson.MODE_SHAPE;
            } else {
                SeveralModes.point(field, point, structure, points);
            }
            {
                if (mode.shapeAt(point) == 0.0) {
                    throw new InvalidInputException(field, "\"" + PlainText.quote(point) + "\"", "a point that mode "
                            + PlainText.quote(a.modes().get(i)) + " moves (its mode_shape there is 0): its absorber"
                            + " would do nothing");
                }
            }
            pointOf.add(point);
            chosen.add(a.points().isEmpty() && a.point() == null);
        }
        int target = index.get(0);
        if (a.targetMode() != null) {
            target = names.indexOf(a.targetMode());
            if (!index.contains(target)) {
                throw new InvalidInputException(ModesJson.ABSORBERS + "." + ModesJson.TARGET_MODE,
                        "\"" + PlainText.quote(a.targetMode()) + "\"", "one of the modes of " + MODES + ": "
                                + PlainText.quote(String.join(", ", a.modes())) + " (the mode the single-mode sections take)");
            }
        }
        // the core takes the two modes in ascending frequency
        boolean swap = index.get(0) > index.get(1);
        JointArrangement joint = new JointArrangement(swap ? List.of(index.get(1), index.get(0)) : index,
                swap ? List.of(pointOf.get(1), pointOf.get(0)) : pointOf, swap ? List.of(chosen.get(1), chosen.get(0))
                        : chosen);
        String targetPoint = joint.points().get(joint.modes().indexOf(target));
        return new AbsorberLayout(structure, names, modes.excitationPoint(), modes.responsePoint(), targetPoint,
                OptionalInt.of(target), index.size(), AbsorberSetTuning.INDIVIDUAL, Optional.of(joint));
    }

    /** The point where the mode's shape value is largest in size, the first written on a tie. */
    private static String largest(Mode mode, Iterable<String> written) {
        String best = null;
        for (String point : written) {
            if (best == null || Math.abs(mode.shapeAt(point)) > Math.abs(mode.shapeAt(best))) {
                best = point;
            }
        }
        return best;
    }
}
