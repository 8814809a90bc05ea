package org.counterpoise.io.project;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.optim.JointAbsorberProblem;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.PlainText;

/**
 * The keys of a structure of several modes ({@code structure.modes}, {@code excitation_point},
 * {@code response_point}) and of {@code absorbers}, read and written in one place (since format 6;
 * docs/project-file.md).
 */
final class ModesJson {
    /** The top-level key of {@link Project#absorbers()}. */
    static final String ABSORBERS = "absorbers";
    static final String MODES = "modes";
    static final String EXCITATION_POINT = "excitation_point";
    static final String RESPONSE_POINT = "response_point";
    static final String NAME = "name";
    static final String NATURAL_FREQUENCY = "natural_frequency";
    static final String DAMPING = "damping";
    static final String MODAL_MASS = "modal_mass";
    static final String MODE_SHAPE = "mode_shape";
    static final String COUNT = "count";
    static final String TUNING = "tuning";
    static final String POINT = "point";
    static final String TARGET_MODE = "target_mode";
    /** Since format 7: {@code one-mode} (the default) or {@code one-per-mode}. */
    static final String ARRANGEMENT = "arrangement";
    /** Since format 7, with one absorber per mode: the two modes' names. */
    static final String ARRANGED_MODES = "modes";
    /** Since format 7, with one absorber per mode: each absorber's point. */
    static final String POINTS = "points";
    /** Since format 8, with absorbers all on one mode: the spillover limit near every other mode. */
    static final String SPILLOVER_LIMIT = "spillover_limit";
    /** The largest spillover limit taken: beyond it a limit says nothing a designer would ask for. */
    static final double MAX_SPILLOVER_LIMIT = 100;

    /** The keys of the single mode, which a structure of several modes gives per mode instead. */
    private static final List<String> SINGLE_MODE_KEYS = List.of("mass", "weight", "stiffness", NATURAL_FREQUENCY,
            "static_deflection", DAMPING, "mode_shape_at_absorber", MeasuredSource.KEY);

    private ModesJson() {
    }

    /**
     * @param s the {@code structure} object
     * @return its modes and points, or null when it gives no {@code modes} (a single mode)
     */
    static ModesInput read(JsonFields s) {
        if (!s.has(MODES)) {
            return null;
        }
        for (String key : SINGLE_MODE_KEYS) {
            if (s.has(key)) {
                throw new InvalidInputException(s.pathOf(key), "given with " + s.pathOf(MODES), "leave it out: with "
                        + s.pathOf(MODES) + " each mode gives its own natural_frequency, damping, modal_mass and mode_shape");
            }
        }
        List<JsonFields> list = s.objectList(MODES);
        if (list.isEmpty()) {
            throw new InvalidInputException(s.pathOf(MODES), "an empty list", "at least one mode {\"name\": ...,"
                    + " \"natural_frequency\": ..., \"modal_mass\": ..., \"mode_shape\": {...}}");
        }
        List<ModeInput> modes = new ArrayList<>();
        for (JsonFields m : list) {
            String name = m.text(NAME);
            if (name.isBlank()) {
                throw new InvalidInputException(m.pathOf(NAME), "\"" + PlainText.quote(name) + "\"", "a name for the mode");
            }
            for (ModeInput earlier : modes) {
                if (earlier.name().equals(name)) {
                    throw new InvalidInputException(m.pathOf(NAME), "\"" + PlainText.quote(name) + "\"",
                            "a name no other mode has (each mode is named once)");
                }
            }
            QuantityInput frequency = m.quantity(NATURAL_FREQUENCY, Dimension.FREQUENCY);
            DampingInput damping = damping(m);
            QuantityInput mass = m.quantity(MODAL_MASS, Dimension.MASS);
            Map<String, Double> shape = m.numberMap(MODE_SHAPE);
            m.finish();
            modes.add(new ModeInput(name, frequency, damping, mass, shape));
        }
        String excitation = s.text(EXCITATION_POINT);
        String response = s.text(RESPONSE_POINT);
        s.finish();
        return new ModesInput(modes, excitation, response);
    }

    /**
     * @param owner the object that may hold {@code damping} (the structure, or one mode)
     * @return the damping given, or null for none
     */
    static DampingInput damping(JsonFields owner) {
        JsonFields d = owner.optionalObject(DAMPING);
        if (d == null) {
            return null;
        }
        DampingInput damping = null;
        int given = 0;
        for (DampingInput.Measure m : DampingInput.Measure.values()) {
            if (d.has(m.key())) {
                given++;
                damping = m == DampingInput.Measure.HALF_POWER_BANDWIDTH
                        ? new DampingInput(m, Double.NaN, d.quantity(m.key(), Dimension.FREQUENCY))
                        : new DampingInput(m, d.number(m.key()), null);
            }
        }
        if (given != 1) {
            throw new InvalidInputException(owner.pathOf(DAMPING), given + " measures",
                    "give exactly one of ratio, loss_factor, q_factor, half_power_bandwidth");
        }
        d.finish();
        return damping;
    }

    /**
     * @param a the {@code absorbers} object, or null when the file has none
     * @return the absorbers' count, tuning, point and target mode, or null for one absorber
     */
    static AbsorbersInput readAbsorbers(JsonFields a) {
        if (a == null) {
            return null;
        }
        String arrangementText = a.text(ARRANGEMENT, Ids.of(AbsorberArrangement.ONE_MODE));
        AbsorberArrangement arrangement = Ids.parse(AbsorberArrangement.class, arrangementText).orElseThrow(() ->
                new InvalidInputException(a.pathOf(ARRANGEMENT), "\"" + PlainText.quote(arrangementText) + "\"",
                        "one of " + Ids.list(AbsorberArrangement.values())));
        if (arrangement == AbsorberArrangement.ONE_PER_MODE) {
            return readOnePerMode(a);
        }
        for (String key : List.of(ARRANGED_MODES, POINTS)) {
            if (a.has(key)) {
                throw new InvalidInputException(a.pathOf(key), "given with all absorbers on one mode",
                        "leave it out, or give \"" + ARRANGEMENT + "\": \"" + Ids.of(AbsorberArrangement.ONE_PER_MODE)
                                + "\" (one absorber on each of two modes)");
            }
        }
        double count = a.number(COUNT);
        if (count != Math.rint(count) || count < 1 || count > AbsorberSetProblem.MAX_COUNT) {
            throw new InvalidInputException(a.pathOf(COUNT), a.shown(COUNT),
                    "a whole number from 1 to " + AbsorberSetProblem.MAX_COUNT);
        }
        String tuningText = a.text(TUNING, Ids.of(AbsorberSetTuning.UNIFORM));
        AbsorberSetTuning tuning = Ids.parse(AbsorberSetTuning.class, tuningText).orElseThrow(() ->
                new InvalidInputException(a.pathOf(TUNING), "\"" + PlainText.quote(tuningText) + "\"",
                        "one of " + Ids.list(AbsorberSetTuning.values())));
        String point = a.has(POINT) ? a.text(POINT) : null;
        String target = a.has(TARGET_MODE) ? a.text(TARGET_MODE) : null;
        Double limit = null;
        if (a.has(SPILLOVER_LIMIT)) {
            limit = a.number(SPILLOVER_LIMIT);
            if (!(limit > 0) || limit > MAX_SPILLOVER_LIMIT) {
                throw new InvalidInputException(a.pathOf(SPILLOVER_LIMIT), a.shown(SPILLOVER_LIMIT),
                        "a number above 0 and at most " + (int) MAX_SPILLOVER_LIMIT + ": the largest peak allowed near"
                                + " each other mode as a multiple of its peak without absorbers (1 = no rise)");
            }
        }
        a.finish();
        return new AbsorbersInput((int) count, tuning, point, target, AbsorberArrangement.ONE_MODE, List.of(),
                List.of(), limit);
    }

    /** One absorber on each of two named modes: two absorbers, each its own tuning (since format 7). */
    private static AbsorbersInput readOnePerMode(JsonFields a) {
        int n = JointAbsorberProblem.MODES;
        if (a.has(COUNT) && a.number(COUNT) != n) {
            throw new InvalidInputException(a.pathOf(COUNT), a.shown(COUNT), n + " with one absorber per mode"
                    + " (one absorber on each of the two modes of " + a.pathOf(ARRANGED_MODES) + "), or leave it out");
        }
        if (a.has(TUNING)) {
            throw new InvalidInputException(a.pathOf(TUNING), a.shown(TUNING), "leave it out with one absorber per mode:"
                    + " each absorber gets its own frequency and damping, chosen together");
        }
        if (a.has(SPILLOVER_LIMIT)) {
            throw new InvalidInputException(a.pathOf(SPILLOVER_LIMIT), a.shown(SPILLOVER_LIMIT), "leave it out with one"
                    + " absorber per mode (a spillover limit is taken with the absorbers all on one mode)");
        }
        List<String> modes = a.textList(ARRANGED_MODES);
        if (modes.size() != n || modes.get(0).equals(modes.get(1))) {
            throw new InvalidInputException(a.pathOf(ARRANGED_MODES), modes.size() + " names " + PlainText.quote(
                    String.join(", ", modes)), "the names of exactly two different modes of structure.modes,"
                            + " e.g. [\"bending\", \"twisting\"] (one absorber per mode)");
        }
        List<String> points = a.has(POINTS) ? a.textList(POINTS) : List.of();
        if (a.has(POINTS) && points.size() != n) {
            throw new InvalidInputException(a.pathOf(POINTS), points.size() + " points", "two named points, one per"
                    + " mode in the order of " + a.pathOf(ARRANGED_MODES) + " (or leave it out)");
        }
        String point = a.has(POINT) ? a.text(POINT) : null;
        String target = a.has(TARGET_MODE) ? a.text(TARGET_MODE) : null;
        a.finish();
        return new AbsorbersInput(n, AbsorberSetTuning.INDIVIDUAL, point, target, AbsorberArrangement.ONE_PER_MODE,
                modes, points);
    }

    /**
     * @param structure the {@code structure} object to fill
     * @param modes the modes and points
     */
    static void write(JsonObject structure, ModesInput modes) {
        JsonArray list = new JsonArray();
        for (ModeInput m : modes.modes()) {
            JsonObject o = new JsonObject();
            o.addProperty(NAME, m.name());
            o.add(NATURAL_FREQUENCY, ProjectWriter.quantity(m.naturalFrequency()));
            if (m.damping() != null) {
                o.add(DAMPING, ProjectWriter.damping(m.damping()));
            }
            o.add(MODAL_MASS, ProjectWriter.quantity(m.modalMass()));
            JsonObject shape = new JsonObject();
            m.modeShape().forEach(shape::addProperty);
            o.add(MODE_SHAPE, shape);
            list.add(o);
        }
        structure.add(MODES, list);
        structure.addProperty(EXCITATION_POINT, modes.excitationPoint());
        structure.addProperty(RESPONSE_POINT, modes.responsePoint());
    }

    /**
     * @param a the absorbers' count, tuning, point and target
     * @return the {@code absorbers} object
     */
    static JsonObject write(AbsorbersInput a) {
        JsonObject o = new JsonObject();
        if (a.onePerMode()) {
            o.addProperty(ARRANGEMENT, Ids.of(a.arrangement()));
            o.add(ARRANGED_MODES, texts(a.modes()));
            if (!a.points().isEmpty()) {
                o.add(POINTS, texts(a.points()));
            }
        } else {
            o.addProperty(COUNT, a.count());
            o.addProperty(TUNING, Ids.of(a.tuning()));
            if (a.spilloverLimit() != null) {
                o.addProperty(SPILLOVER_LIMIT, a.spilloverLimit());
            }
        }
        if (a.point() != null) {
            o.addProperty(POINT, a.point());
        }
        if (a.targetMode() != null) {
            o.addProperty(TARGET_MODE, a.targetMode());
        }
        return o;
    }

    private static JsonArray texts(List<String> texts) {
        JsonArray out = new JsonArray();
        texts.forEach(out::add);
        return out;
    }
}
