package org.counterpoise.ui.gui.document;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.project.AbsorberArrangement;
import org.counterpoise.io.project.AbsorbersInput;
import org.counterpoise.io.project.DampingInput;
import org.counterpoise.io.project.ModeInput;
import org.counterpoise.io.project.ModesInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.project.StructureInput;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.TypedNumbers;
import org.counterpoise.io.text.UnitSystem;

/**
 * The structure step's table of modes as plain values: the text of each cell in the display unit
 * system, and the project after a cell is typed, a mode is added or removed, a named point is added,
 * or the points and the absorbers are chosen. What would make the modes unusable is refused with a
 * message naming the mode and the column (the project is then not changed). Plain Java (no Swing), so
 * tests apply exactly what the table applies.
 *
 * <p>Columns: the mode's name, its natural frequency, its damping ratio, its modal mass, then its
 * mode-shape value at each named point in the order the file writes them.
 */
public final class ModesEdits {
    /** The column of the mode's name. */
    public static final int NAME = 0;
    /** The column of the natural frequency, in the display unit of frequency. */
    public static final int FREQUENCY = 1;
    /** The column of the damping ratio (to critical). */
    public static final int DAMPING = 2;
    /** The column of the modal mass, in the display unit of mass. */
    public static final int MASS = 3;
    /** The column of the first named point's mode-shape value. */
    public static final int FIRST_POINT = 4;
    /** The largest damping ratio a mode may have (the reader's limit for structure.modes). */
    public static final double MAX_DAMPING = 0.99;
    /** Figures shown in a cell: enough to keep a value as typed, few enough to hide a unit conversion's tail. */
    private static final int SHOWN_FIGURES = 6;
    /** A mode added after the highest one starts this far above it (a value to type over). */
    private static final double ADDED_MODE_STEP = 1.25;

    private ModesEdits() {
    }

    /**
     * @param m the modes
     * @return the named points in the order written (the first mode's; every mode names the same)
     */
    public static List<String> points(ModesInput m) {
        return List.copyOf(m.modes().get(0).modeShape().keySet());
    }

    /**
     * @param m the modes
     * @param units the display unit system
     * @return the column headings, units named
     */
    public static List<String> headings(ModesInput m, UnitSystem units) {
        List<String> out = new ArrayList<>(List.of("Mode", "Natural frequency (" + unit(Dimension.FREQUENCY, units)
                .symbol() + ")", "Damping ratio", "Modal mass (" + unit(Dimension.MASS, units).symbol() + ")"));
        points(m).forEach(point -> out.add("\u03c6 at " + point));
        return out;
    }

    /**
     * @param m the modes
     * @param units the display unit system
     * @param locale the locale numbers are typed in
     * @return each mode's cells as text to read and to edit, in the order written
     */
    public static List<List<String>> rows(ModesInput m, UnitSystem units, Locale locale) {
        List<String> points = points(m);
        List<List<String>> out = new ArrayList<>();
        for (ModeInput mode : m.modes()) {
            double w = mode.naturalFrequency().si();
            List<String> row = new ArrayList<>(List.of(mode.name(),
                    shown(unit(Dimension.FREQUENCY, units).fromSi(w), locale),
                    shown(DampingInput.ratioOf(mode.damping(), "damping", w), locale),
                    shown(unit(Dimension.MASS, units).fromSi(mode.modalMass().si()), locale)));
            points.forEach(point -> row.add(shown(mode.modeShape().get(point), locale)));
            out.add(row);
        }
        return out;
    }

    /**
     * @param p a project whose structure is given as modes
     * @param row the mode, in the order written
     * @param column its column ({@link #NAME}, {@link #FREQUENCY}, ...)
     * @param text what was typed
     * @param locale the locale it was typed in
     * @return the project with the cell as typed (a renamed mode keeps its place in the absorbers' fields)
     * @throws InvalidInputException naming the mode and column when the value is refused
     */
    public static Project withCell(Project p, int row, int column, String text, Locale locale) {
        ModesInput m = p.modes();
        UnitSystem units = p.displayUnits();
        ModeInput mode = m.modes().get(row);
        String where = mode.name() + ", " + columnWords(m, column, units);
        if (column == NAME) {
            return renamed(p, row, text.trim(), where);
        }
        double v = TypedNumbers.parse(text, locale, where);
        if (!Double.isFinite(v)) {
            throw new InvalidInputException(where, PlainText.quote(text.trim()), "type a finite number");
        }
        ModeInput next = switch (column) {
            case FREQUENCY -> {
                QuantityInput f = new QuantityInput(v, unit(Dimension.FREQUENCY, units));
                f.positiveSi(where);
                yield new ModeInput(mode.name(), f, mode.damping(), mode.modalMass(), mode.modeShape());
            }
            case DAMPING -> {
                if (!(v >= 0 && v <= MAX_DAMPING)) {
                    throw new InvalidInputException(where, TypedNumbers.forEditing(v, locale),
                            "a damping ratio from 0 to " + TypedNumbers.forEditing(MAX_DAMPING, locale));
                }
                yield new ModeInput(mode.name(), mode.naturalFrequency(), DampingInput.ratio(v), mode.modalMass(),
                        mode.modeShape());
            }
            case MASS -> {
                QuantityInput mass = new QuantityInput(v, unit(Dimension.MASS, units));
                mass.positiveSi(where);
                yield new ModeInput(mode.name(), mode.naturalFrequency(), mode.damping(), mass, mode.modeShape());
            }
            default -> {
                Map<String, Double> shape = new LinkedHashMap<>(mode.modeShape());
                shape.put(points(m).get(column - FIRST_POINT), v);
                yield new ModeInput(mode.name(), mode.naturalFrequency(), mode.damping(), mode.modalMass(), shape);
            }
        };
        List<ModeInput> modes = new ArrayList<>(m.modes());
        modes.set(row, next);
        return usable(p, p.withSeveral(new ModesInput(modes, m.excitationPoint(), m.responsePoint()), p.absorbers()),
                where + " " + text.trim());
    }

    /**
     * A structure given as one mode described by its modes instead: one mode named "structure" at one
     * point named "absorber point", where the force acts, the response is taken and the absorbers sit,
     * with the single mode's natural frequency, its damping as given, the effective modal mass
     * m / phi^2 and shape value 1 there: the structure the single-mode design sees (the layout of a
     * single mode in {@link SeveralModes#layout} is the same). The absorbers keep their count and
     * tuning; where the values came from (a measurement) is not kept.
     * @param p a project whose structure is given as one mode
     * @return the project with its structure as modes
     * @throws InvalidInputException when the single mode is not usable yet, or the project could not
     *     be designed as modes (a disturbance other than a force, a response other than displacement...)
     */
    public static Project asModes(Project p) {
        String what = "Describe the structure by its modes";
        Structure s;
        try {
            s = p.structure().toStructure();
        } catch (InvalidInputException e) {
            throw InvalidInputException.unusable(what, "the structure's fields are not usable yet", e.getMessage());
        }
        Unit hz = unit(Dimension.FREQUENCY, p.displayUnits());
        Unit mass = unit(Dimension.MASS, p.displayUnits());
        ModeInput mode = new ModeInput(SeveralModes.SINGLE_MODE, new QuantityInput(exact(hz.fromSi(
                s.naturalFrequency())), hz), p.structure().damping(), new QuantityInput(exact(mass.fromSi(
                        s.effectiveMass())), mass), Map.of(SeveralModes.SINGLE_POINT, 1.0));
        AbsorbersInput a = p.absorbers();
        AbsorbersInput absorbers = new AbsorbersInput(a == null ? 1 : a.count(), a == null ? AbsorberSetTuning.UNIFORM
                : a.tuning(), SeveralModes.SINGLE_POINT, null);
        Project out = p.withStructure(StructureInput.GIVEN_AS_MODES).withSeveral(new ModesInput(List.of(mode),
                SeveralModes.SINGLE_POINT, SeveralModes.SINGLE_POINT), absorbers);
        try {
            out.toStructure();
        } catch (InvalidInputException e) {
            throw InvalidInputException.unusable(what, "not possible for this project", e.getMessage());
        }
        return out;
    }

    /**
     * A new mode after the others: a copy of the last one written, named "mode N", at a natural
     * frequency a quarter above the highest (rounded to three figures), for the user to type over.
     * @param p a project whose structure is given as modes
     * @return the project with it
     */
    public static Project withModeAdded(Project p) {
        ModesInput m = p.modes();
        ModeInput last = m.modes().get(m.modes().size() - 1);
        double highest = m.modes().stream().mapToDouble(x -> x.naturalFrequency().si()).max().orElseThrow();
        Unit hz = unit(Dimension.FREQUENCY, p.displayUnits());
        double f = new BigDecimal(hz.fromSi(highest) * ADDED_MODE_STEP).round(new MathContext(3)).doubleValue();
        int n = m.modes().size() + 1;
        while (named(m, "mode " + n) >= 0) {
            n++;
        }
        List<ModeInput> modes = new ArrayList<>(m.modes());
        modes.add(new ModeInput("mode " + n, new QuantityInput(f, hz), last.damping(), last.modalMass(),
                last.modeShape()));
        return p.withSeveral(new ModesInput(modes, m.excitationPoint(), m.responsePoint()), p.absorbers());
    }

    /**
     * @param p a project whose structure is given as modes
     * @param row the mode to remove, in the order written
     * @return the project without it
     * @throws InvalidInputException when it is the last mode, or a mode the absorbers name
     */
    public static Project withModeRemoved(Project p, int row) {
        ModesInput m = p.modes();
        String name = m.modes().get(row).name();
        if (m.modes().size() == 1) {
            throw InvalidInputException.unusable("Remove mode " + name, "it is the only mode",
                    "a structure keeps at least one mode");
        }
        AbsorbersInput a = p.absorbers();
        if (a != null && (name.equals(a.targetMode()) || a.modes().contains(name))) {
            throw InvalidInputException.unusable("Remove mode " + name, "the absorbers are fitted to it",
                    "fit them to another mode first");
        }
        List<ModeInput> modes = new ArrayList<>(m.modes());
        modes.remove(row);
        return usable(p, p.withSeveral(new ModesInput(modes, m.excitationPoint(), m.responsePoint()), a),
                "Remove mode " + name);
    }

    /**
     * @param p a project whose structure is given as modes
     * @param typed the new point's name; every mode's shape value there starts at 0
     * @return the project with it
     * @throws InvalidInputException when the name is blank or another point's (in any letter case)
     */
    public static Project withPointAdded(Project p, String typed) {
        String name = typed.trim();
        ModesInput m = p.modes();
        if (name.isEmpty()) {
            throw new InvalidInputException("New point", "an empty name", "type the point's name, e.g. \"quarter span\"");
        }
        for (String point : points(m)) {
            if (point.equalsIgnoreCase(name)) {
                throw new InvalidInputException("New point", "\"" + PlainText.quote(name) + "\"",
                        "a name no other point has (\"" + PlainText.quote(point) + "\" is taken)");
            }
        }
        List<ModeInput> modes = new ArrayList<>();
        for (ModeInput mode : m.modes()) {
            Map<String, Double> shape = new LinkedHashMap<>(mode.modeShape());
            shape.put(name, 0.0);
            modes.add(new ModeInput(mode.name(), mode.naturalFrequency(), mode.damping(), mode.modalMass(), shape));
        }
        return p.withSeveral(new ModesInput(modes, m.excitationPoint(), m.responsePoint()), p.absorbers());
    }

    /**
     * @param p a project whose structure is given as modes
     * @param excitation the named point the force acts at
     * @param response the named point whose displacement is judged
     * @return the project with them
     * @throws InvalidInputException when the modes could not be designed so
     */
    public static Project withPoints(Project p, String excitation, String response) {
        ModesInput m = p.modes();
        return usable(p, p.withSeveral(new ModesInput(m.modes(), excitation, response), p.absorbers()),
                "Force at " + excitation + ", response at " + response);
    }

    /**
     * All absorbers on one mode (the arrangement of one absorber per mode is kept as the file gives it).
     * @param p a project whose structure is given as modes
     * @param count how many absorbers share the mass, 1 to {@link AbsorberSetProblem#MAX_COUNT}
     * @param tuning uniform spread or individual tuning
     * @param point the named point they sit at
     * @param targetMode the mode they are fitted to, or null for the mode nearest the forcing band
     * @return the project with them
     * @throws InvalidInputException when the modes and the disturbance could not be designed so
     */
    public static Project withAbsorbers(Project p, int count, AbsorberSetTuning tuning, String point,
            String targetMode) {
        if (count < 1 || count > AbsorberSetProblem.MAX_COUNT) {
            throw new InvalidInputException("Absorbers", Integer.toString(count),
                    "a whole number from 1 to " + AbsorberSetProblem.MAX_COUNT);
        }
        // the file's spillover limit stays with the absorbers while there are several (one absorber takes none)
        Double limit = p.absorbers() == null || count == 1 ? null : p.absorbers().spilloverLimit();
        return usable(p, p.withSeveral(p.modes(), new AbsorbersInput(count, tuning, point, targetMode,
                AbsorberArrangement.ONE_MODE, List.of(), List.of(), limit)), count + " absorbers at " + point);
    }

    private static Project renamed(Project p, int row, String name, String where) {
        ModesInput m = p.modes();
        ModeInput mode = m.modes().get(row);
        if (name.isEmpty()) {
            throw new InvalidInputException(where, "an empty name", "type the mode's name, e.g. \"bending\"");
        }
        int other = named(m, name);
        if (other >= 0 && other != row) {
            throw new InvalidInputException(where, "\"" + PlainText.quote(name) + "\"",
                    "a name no other mode has (each mode is named once)");
        }
        List<ModeInput> modes = new ArrayList<>(m.modes());
        modes.set(row, new ModeInput(name, mode.naturalFrequency(), mode.damping(), mode.modalMass(), mode.modeShape()));
        AbsorbersInput a = p.absorbers();
        if (a != null) {
            String target = mode.name().equals(a.targetMode()) ? name : a.targetMode();
            List<String> arranged = a.modes().stream().map(x -> x.equals(mode.name()) ? name : x).toList();
            a = new AbsorbersInput(a.count(), a.tuning(), a.point(), target, a.arrangement(), arranged, a.points(),
                    a.spilloverLimit());
        }
        return p.withSeveral(new ModesInput(modes, m.excitationPoint(), m.responsePoint()), a);
    }

    /**
     * The edited project unless it turns modes that could be designed into modes that cannot: the
     * target mode seen at the absorbers' point ({@link Project#toStructure}, which checks every mode,
     * point and absorber field). Modes that were already unusable (a file opened so) take any edit, so
     * their problems can be mended one at a time; the design says what is still wrong. A problem of
     * another section (a disturbance that several modes do not take, found first) is left for the
     * design to report under its own field.
     */
    private static Project usable(Project before, Project after, String what) {
        if (modesProblem(before) != null) {
            return after;
        }
        InvalidInputException problem = modesProblem(after);
        if (problem != null) {
            throw InvalidInputException.unusable(what, "not taken", problem.getMessage());
        }
        return after;
    }

    /** @return the problem of the project's modes, points or absorbers, or null when it has none */
    private static InvalidInputException modesProblem(Project p) {
        try {
            p.toStructure();
            return null;
        } catch (InvalidInputException e) {
            return SeveralModes.ofStructureOrAbsorbers(e) ? e : null;
        }
    }

    private static int named(ModesInput m, String name) {
        for (int i = 0; i < m.modes().size(); i++) {
            if (m.modes().get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    private static String columnWords(ModesInput m, int column, UnitSystem units) {
        return switch (column) {
            case NAME -> "name";
            case FREQUENCY -> "natural frequency (" + unit(Dimension.FREQUENCY, units).symbol() + ")";
            case DAMPING -> "damping ratio";
            case MASS -> "modal mass (" + unit(Dimension.MASS, units).symbol() + ")";
            default -> "mode shape at " + points(m).get(column - FIRST_POINT);
        };
    }

    private static Unit unit(Dimension d, UnitSystem units) {
        return DisplayUnits.of(d, units);
    }

    /** Twelve figures: a unit conversion's last-bit tail (23.500000000000004 Hz) is not written to the file. */
    private static double exact(double v) {
        return new BigDecimal(v).round(new MathContext(12)).doubleValue();
    }

    private static String shown(double v, Locale locale) {
        return TypedNumbers.forEditing(v == 0 ? 0 : new BigDecimal(v).round(new MathContext(SHOWN_FIGURES))
                .doubleValue(), locale);
    }
}
