package org.counterpoise.io.project;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.Mode;
import org.counterpoise.io.PlainText;

/**
 * A project's structure of several modes and several absorbers (format 6) in SI, and the checks that
 * name the file's fields: the {@link AbsorberLayout} the core designs, and the single-mode structure
 * the rest of the program sees (the target mode at the absorbers' point). A project of one mode and
 * one absorber has no layout and designs exactly as format 5 did.
 */
public final class SeveralModes {
    /** The point of a structure given as one mode: where the force acts, the response is taken and the absorbers sit. */
    public static final String SINGLE_POINT = "absorber point";
    /** The name of the mode of a structure given as one mode. */
    public static final String SINGLE_MODE = "structure";

    private SeveralModes() {
    }

    /**
     * @param p a project
     * @return the structure of several modes and the absorbers as the core designs them; empty for a
     *     project of one mode and one absorber
     * @throws InvalidInputException naming the field, for a point or mode that does not exist or a
     *     disturbance or sizing that several modes or absorbers do not take
     */
    public static Optional<AbsorberLayout> layout(Project p) {
        if (FormatMigration.isOneModeOneAbsorber(p)) {
            return Optional.empty();
        }
        AbsorbersInput a = p.absorbers() == null ? new AbsorbersInput(1, AbsorberSetTuning.UNIFORM, null, null)
                : p.absorbers();
        checkDisturbance(p, a);
        if (a.onePerMode() && p.modes() == null) {
            throw new InvalidInputException(ModesJson.ABSORBERS + "." + ModesJson.ARRANGEMENT, "\""
                    + Ids.of(a.arrangement()) + "\" without structure.modes", "\"" + Ids.of(AbsorberArrangement.ONE_MODE)
                    + "\" for a structure of one mode; one absorber per mode needs the structure as its modes"
                    + " (structure.modes)");
        }
        if (a.spilloverLimit() != null && a.count() == 1) {
            throw new InvalidInputException(ModesJson.ABSORBERS + "." + ModesJson.SPILLOVER_LIMIT,
                    Checks.show(a.spilloverLimit()) + " with one absorber", "2 to " + AbsorberSetProblem.MAX_COUNT
                            + " absorbers (absorbers.count), or leave it out: one absorber is the project's own design");
        }
        if (a.spilloverLimit() != null && p.absorber().method() == DesignMethod.ROBUST_WORST_CASE) {
            throw new InvalidInputException(ModesJson.ABSORBERS + "." + ModesJson.SPILLOVER_LIMIT,
                    Checks.show(a.spilloverLimit()) + " with the method robust-worst-case (absorber.method, the default)",
                    "another absorber.method (the set is then the least peak with the limit kept), or leave it out: the"
                            + " robust design of a set does not take a spillover limit yet");
        }
        if (p.modes() == null) {
            if (a.spilloverLimit() != null) {
                throw new InvalidInputException(ModesJson.ABSORBERS + "." + ModesJson.SPILLOVER_LIMIT,
                        Checks.show(a.spilloverLimit()), "leave it out for a structure of one mode (a spillover limit"
                                + " keeps the peak near the structure's other modes: give them in structure.modes)");
            }
            if (a.point() != null || a.targetMode() != null) {
                String key = a.point() != null ? ModesJson.POINT : ModesJson.TARGET_MODE;
                String given = a.point() != null ? a.point() : a.targetMode();
                throw new InvalidInputException(ModesJson.ABSORBERS + "." + key, "\"" + PlainText.quote(given) + "\"",
                        "leave it out for a structure of one mode (points and modes are named in structure.modes)");
            }
            Structure s = p.structure().toStructure();
            ModalStructure one = ModalStructure.singleMode(SINGLE_POINT, s.naturalFrequency(), s.dampingRatio(),
                    s.effectiveMass());
            return Optional.of(new AbsorberLayout(one, List.of(SINGLE_MODE), SINGLE_POINT, SINGLE_POINT, SINGLE_POINT,
                    OptionalInt.empty(), a.count(), a.tuning()));
        }
        ModesInput modes = p.modes();
        List<ModeInput> given = new ArrayList<>(modes.modes());
        List<Mode> core = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int i = 0; i < given.size(); i++) {
            core.add(mode(given.get(i), i, given.get(0)));
        }
        // the core keeps modes in ascending frequency (a stable sort): the names follow the same order
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < core.size(); i++) {
            order.add(i);
        }
        order.sort(Comparator.comparingDouble(i -> core.get(i).naturalFrequency()));
        order.forEach(i -> names.add(given.get(i).name()));
        ModalStructure structure = new ModalStructure(core);
        String points = PlainText.quote(String.join(", ", given.get(0).modeShape().keySet()));
        point("structure." + ModesJson.EXCITATION_POINT, modes.excitationPoint(), structure, points);
        point("structure." + ModesJson.RESPONSE_POINT, modes.responsePoint(), structure, points);
        if (a.onePerMode()) {
            return Optional.of(OnePerMode.layout(a, structure, names, modes, points));
        }
        if (a.point() == null) {
            throw InvalidInputException.missing(ModesJson.ABSORBERS + "." + ModesJson.POINT,
                    "a structure of several modes needs the point the absorbers sit at: one of " + points);
        }
        point(ModesJson.ABSORBERS + "." + ModesJson.POINT, a.point(), structure, points);
        OptionalInt target = OptionalInt.empty();
        if (a.targetMode() != null) {
            int index = names.indexOf(a.targetMode());
            if (index < 0) {
                throw new InvalidInputException(ModesJson.ABSORBERS + "." + ModesJson.TARGET_MODE,
                        "\"" + PlainText.quote(a.targetMode()) + "\"", "the name of one of structure.modes: "
                                + PlainText.quote(String.join(", ", names)));
            }
            if (structure.modes().get(index).shapeAt(a.point()) == 0.0) {
                throw new InvalidInputException(ModesJson.ABSORBERS + "." + ModesJson.TARGET_MODE,
                        "\"" + PlainText.quote(a.targetMode()) + "\"", "a mode that moves the absorbers' point " + PlainText.quote(a.point())
                                + " (its mode_shape there is 0)");
            }
            target = OptionalInt.of(index);
        }
        return Optional.of(new AbsorberLayout(structure, names, modes.excitationPoint(), modes.responsePoint(),
                a.point(), target, a.count(), a.tuning(), Optional.empty(), a.spilloverLimit() == null
                        ? OptionalDouble.empty() : OptionalDouble.of(a.spilloverLimit())));
    }

    /**
     * @param e a problem found in a project
     * @return true when it is a problem of the structure (its modes and points) or of the absorbers,
     *     not of another section (the disturbance, the absorber goal...)
     */
    public static boolean ofStructureOrAbsorbers(InvalidInputException e) {
        return e.field().startsWith("structure") || e.field().startsWith(ModesJson.ABSORBERS)
                || e.field().equals(AbsorberLayout.TARGET_MODE_FIELD);
    }

    /**
     * @param p a project whose structure is given as several modes
     * @return the target mode as seen at the absorbers' point: a single mode of the effective modal
     *     mass m_r / phi_r(a)^2, the mode's natural frequency and damping ratio, and shape value 1
     */
    static Structure targetStructure(Project p) {
        AbsorberLayout layout = layout(p).orElseThrow();
        FrequencyBand band = band(p);
        return layout.seenAt(layout.target(band), layout.absorberPoint());
    }

    /**
     * Refuses what several modes or absorbers do not take yet, naming the field (called when a
     * project becomes a study, so every command refuses it the same way).
     * @param p a project
     */
    static void check(Project p) {
        layout(p);
    }

    /** The forcing band of the disturbance's own order, rad/s. */
    private static FrequencyBand band(Project p) {
        return new RotorOrders(p.disturbance(), p.runUpRate()).excitation(0).band();
    }

    private static void checkDisturbance(Project p, AbsorbersInput a) {
        DisturbanceInput d = p.disturbance();
        String what = p.modes() != null ? "with structure.modes" : "with absorbers.count " + a.count();
        if (a.onePerMode()) {
            what = "with one absorber per mode";
        }
        if (d.kind() != ExcitationKind.FORCE) {
            throw new InvalidInputException("disturbance.kind", "\"" + Ids.of(d.kind()) + "\"",
                    "\"force\" " + what + " (several modes and absorbers are designed for a force acting at a point)");
        }
        if (p.absorber().response() != ResponseKind.DISPLACEMENT) {
            throw new InvalidInputException("absorber.response", "\"" + Ids.of(p.absorber().response()) + "\"",
                    "\"displacement\" " + what + " (the displacement at structure.response_point)");
        }
        if (d.spectrum() != null || !d.orders().isEmpty()) {
            throw new InvalidInputException(d.spectrum() != null ? "disturbance.spectrum" : "disturbance.orders",
                    "given " + what, "one harmonic order without a spectrum: several modes and absorbers take one"
                            + " harmonic force over a band or at one frequency");
        }
        if (a.onePerMode() && !d.isBand()) {
            throw new InvalidInputException("disturbance.frequency", "one forcing frequency with absorbers.arrangement \""
                    + Ids.of(a.arrangement()) + "\"", "a band of forcing frequencies (disturbance.band): one absorber"
                            + " per mode is designed for the least peak (or least worst peak) over a band");
        }
        if (a.count() > 1 && !d.isBand()) {
            throw new InvalidInputException(ModesJson.ABSORBERS + "." + ModesJson.COUNT, Integer.toString(a.count()),
                    "1 with one forcing frequency (disturbance.frequency): several absorbers share a band of"
                            + " frequencies (disturbance.band)");
        }
        // the criterion is judged on the whole structure, the sizing to meet it on the target mode alone: refused
        // for every project of several modes or absorbers, whatever the count
        if (p.absorber().meetAcceptance() || p.absorber().target() != null) {
            throw new InvalidInputException(p.absorber().meetAcceptance() ? "absorber.meet_acceptance"
                    : "absorber.target", (p.absorber().meetAcceptance() ? "true " : "a target ") + what,
                    "the total mass of the absorbers: absorber.mass or absorber.mass_ratio (a structure of several"
                            + " modes is judged on every mode, and sized to a criterion on none yet)");
        }
    }

    /** One mode in SI; its mode shape must name the same points as the first mode's. */
    private static Mode mode(ModeInput m, int i, ModeInput first) {
        String path = "structure." + ModesJson.MODES + "[" + i + "]";
        double w = m.naturalFrequency().positiveSi(path + "." + ModesJson.NATURAL_FREQUENCY + ".value");
        double zeta = DampingInput.ratioOf(m.damping(), path + "." + ModesJson.DAMPING, w);
        double mass = m.modalMass().positiveSi(path + "." + ModesJson.MODAL_MASS + ".value");
        Map<String, Double> shape = m.modeShape();
        if (shape.isEmpty()) {
            throw new InvalidInputException(path + "." + ModesJson.MODE_SHAPE, "no points",
                    "at least one named point with its mode-shape value, e.g. {\"midspan\": 1.0}");
        }
        if (!shape.keySet().equals(first.modeShape().keySet())) {
            throw new InvalidInputException(path + "." + ModesJson.MODE_SHAPE, "points "
                    + PlainText.quote(String.join(", ", shape.keySet())), "the same named points as structure.modes[0]: "
                    + PlainText.quote(String.join(", ", first.modeShape().keySet())));
        }
        if (zeta > 0.99) {
            throw new InvalidInputException(path + "." + ModesJson.DAMPING, Double.toString(zeta),
                    "a damping ratio from 0 to 0.99");
        }
        return new Mode(w, zeta, mass, shape);
    }

    static void point(String field, String name, ModalStructure structure, String points) {
        if (!structure.points().contains(name)) {
            throw new InvalidInputException(field, "\"" + PlainText.quote(name) + "\"",
                    "one of the points the modes name: " + points);
        }
    }
}
