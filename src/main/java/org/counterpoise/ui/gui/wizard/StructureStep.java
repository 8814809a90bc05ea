package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.math.BigDecimal;
import java.math.MathContext;
import java.time.LocalDate;
import java.util.List;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.model.DampingConversions;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.StructureConversions;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Gravity;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.measurement.Identification;
import org.counterpoise.io.measurement.StructureFromMeasurement;
import org.counterpoise.io.project.DampingInput;
import org.counterpoise.io.project.MeasuredSource;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.StructureInput;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.io.text.MeasuredSourceContent;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.FormSwitch;
import org.counterpoise.ui.gui.field.QuantityField;

/** Step 1: the structure as the engineer knows it, with the derived values shown at once. */
final class StructureStep extends Step {
    /** The step's title in the step list. */
    static final String TITLE = "Structure";
    private static final List<Unit> MASS = UnitChoices.of(Dimension.MASS);
    private static final List<Unit> WEIGHT = UnitChoices.of(Dimension.FORCE);
    private static final List<Unit> STIFFNESS = UnitChoices.of(Dimension.STIFFNESS);
    private static final List<Unit> FREQUENCY = UnitChoices.of(Dimension.FREQUENCY);
    private static final List<Unit> LENGTH = UnitChoices.of(Dimension.LENGTH);
    private static final List<Unit> RATIO = UnitChoices.of(Dimension.RATIO);

    private final JComboBox<String> massForm = new JComboBox<>(new String[] {"mass", "weight"});
    private final QuantityField mass = new QuantityField("structure.mass", "Modal mass of the mode to calm", MASS);
    private final JComboBox<String> stiffnessForm = new JComboBox<>(
            new String[] {"stiffness", "natural frequency", "static deflection"});
    private final QuantityField stiffness = new QuantityField("structure.stiffness",
            "Modal stiffness; or the measured natural frequency; or the static deflection under the structure's own weight",
            STIFFNESS);
    private final JComboBox<String> dampingForm = new JComboBox<>(
            new String[] {"damping ratio \u03b6", "loss factor \u03b7", "Q factor", "half-power bandwidth"});
    private final QuantityField damping = new QuantityField("structure.damping",
            "Modal damping: ratio to critical, loss factor (2\u03b6), Q (1/2\u03b6) or -3 dB bandwidth (2\u03b6 f)",
            RATIO);
    private final QuantityField modeShape = new QuantityField("structure.mode_shape_at_absorber",
            "Mode-shape value at the absorber point, 1 at the antinode: effective mass = modal mass / \u03c6\u00b2",
            RATIO);
    private final JLabel derivedMass = derived("derived.mass");
    private final JLabel derivedStiffness = derived("derived.stiffness");
    private final JLabel derivedFrequency = derived("derived.frequency");
    private final JLabel derivedDamping = derived("derived.damping");
    private final JLabel measuredNote = derived("structure.measured");
    private final JButton fromMeasurement = new JButton("From a measured response\u2026");
    private final JComponent page;
    private MeasurementDialog measurement;
    /** True when the project gives its structure as modes: they are edited in their table, not in the fields. */
    private boolean severalModes;
    /** The modes, edited in place, when the project gives its structure as modes. */
    private final ModesTable modes = new ModesTable(this::commitChoice, this::fieldsValid);

    StructureStep() {
        massForm.setName("structure.massForm");
        stiffnessForm.setName("structure.stiffnessForm");
        dampingForm.setName("structure.dampingForm");
        Form form = new Form();
        form.heading("The structure, at the point where the absorber will sit");
        fromMeasurement.setName("structure.fromMeasurement");
        form.row("Measured?", 'f', fromMeasurement,
                "Fit the mode to a measured frequency response (CSV) and take its mass, frequency and damping");
        form.derived("Data from", measuredNote);
        form.row("Given as", 'g', massForm, "Mass, or weight under standard gravity");
        form.row("Value", 'm', mass, "Modal mass or weight");
        form.row("Stiffness given as", 's', stiffnessForm, "How the stiffness is known");
        form.row("Value", 'v', stiffness, "Stiffness, natural frequency or static deflection");
        form.row("Damping given as", 'd', dampingForm, "The measure of damping you have");
        form.row("Value", 'a', damping, "Damping value");
        form.row("Mode shape at absorber \u03c6", 'p', modeShape, "1 at the antinode, less elsewhere");
        form.heading("Derived (effective values at the absorber point)");
        form.derived("Mass", derivedMass);
        form.derived("Stiffness", derivedStiffness);
        form.derived("Natural frequency", derivedFrequency);
        form.derived("Damping ratio", derivedDamping);
        form.end();
        JPanel holder = new JPanel(new BorderLayout(0, 8));
        holder.add(form);
        holder.add(modes.component(), BorderLayout.SOUTH);
        page = new JScrollPane(holder);
        ((JScrollPane) page).setBorder(null);
        own("structure.mass", mass);
        own("structure.weight", mass);
        own("structure", stiffness);
        own("structure.damping", damping);
        own("structure.mode_shape", modeShape);
        massForm.addActionListener(e -> {
            mass.setUnits(massForm.getSelectedIndex() == 0 ? MASS : WEIGHT);
            edited("structure.massForm");
        });
        stiffnessForm.addActionListener(e -> {
            stiffness.setUnits(switch (stiffnessForm.getSelectedIndex()) {
                case 0 -> STIFFNESS;
                case 1 -> FREQUENCY;
                default -> LENGTH;
            });
            edited("structure.stiffnessForm");
        });
        dampingForm.addActionListener(e -> {
            damping.setUnits(dampingForm.getSelectedIndex() == 3 ? FREQUENCY : RATIO);
            edited("structure.dampingForm");
        });
        for (QuantityField f : List.of(mass, stiffness, damping, modeShape)) {
            f.onChange(() -> edited(f.fieldId()));
        }
        convertOnFormChange();
        fromMeasurement.addActionListener(e -> {
            if (measurement == null) {
                measurement = new MeasurementDialog(page, this::useMeasured);
            }
            measurement.show();
        });
    }

    /**
     * Takes a mode fitted to a measurement as the structure: modal mass, natural frequency and damping
     * ratio, mode shape 1 (the measured point is the absorber's), and the fit's uncertainties as the
     * structure's tolerances where the project states none, as one undoable edit.
     * @param fit the fit it came from (its file, method and quality go into structure.measured)
     * @param mode the mode chosen
     * @throws InvalidInputException when the mode cannot be a structure (a mass not above zero, a
     *     damping a design does not take), in plain words
     */
    private void useMeasured(Identification.Frf fit, IdentifiedMode mode) {
        StructureInput s = StructureFromMeasurement.structure(fit, mode, LocalDate.now());
        commitChoice(() -> ProjectEdits.measuredStructure(s, mode));
    }

    /**
     * A change of form converts the value (1800 kg becomes 17652 N, 14.2 Hz becomes the stiffness
     * that gives it with the mass shown); attached after the other listeners, so it runs first.
     */
    private void convertOnFormChange() {
        FormSwitch.attach(massForm, mass, i -> i == 0 ? MASS : WEIGHT,
                (from, to, v) -> to == 1 ? StructureConversions.weightFromMass(v) : v / Gravity.STANDARD,
                i -> i == 0 ? "type the modal mass" : "type the weight");
        FormSwitch.attach(stiffnessForm, stiffness, StructureStep::stiffnessUnits, (from, to, v) -> {
            double m = modalMassOrNaN();
            double w = switch (from) {
                case 0 -> StructureConversions.naturalFrequency(m, v);
                case 1 -> v;
                default -> StructureConversions.frequencyFromStaticDeflection(v);
            };
            return switch (to) {
                case 0 -> m * w * w;
                case 1 -> w;
                default -> StructureConversions.staticDeflection(w);
            };
        }, i -> i == 0 ? "type the stiffness (a mass is needed to convert)" : i == 1 ? "type the natural frequency"
                : "type the static deflection");
        FormSwitch.attach(dampingForm, damping, i -> i == 3 ? FREQUENCY : RATIO, (from, to, v) -> {
            double w = naturalFrequencyOrNaN();
            double zeta = switch (from) {
                case 0 -> v;
                case 1 -> v / 2;
                case 2 -> v > 0 ? 1 / (2 * v) : Double.NaN;
                default -> v / (2 * w);
            };
            return switch (to) {
                case 0 -> zeta;
                case 1 -> DampingConversions.lossFactor(zeta);
                case 2 -> DampingConversions.qualityFactor(zeta);
                default -> DampingConversions.halfPowerBandwidth(zeta, w);
            };
        }, i -> "type the " + dampingForm.getItemAt(i));
    }

    private static List<Unit> stiffnessUnits(int form) {
        return switch (form) {
            case 0 -> STIFFNESS;
            case 1 -> FREQUENCY;
            default -> LENGTH;
        };
    }

    /** @return the modal mass shown (from a weight if so given), kg; NaN when not a number yet */
    private double modalMassOrNaN() {
        double v = mass.siOrNaN();
        return massForm.getSelectedIndex() == 0 ? v : v / Gravity.STANDARD;
    }

    /** @return the natural frequency the fields shown give, rad/s; NaN when they do not give one */
    private double naturalFrequencyOrNaN() {
        double v = stiffness.siOrNaN();
        return switch (stiffnessForm.getSelectedIndex()) {
            case 0 -> StructureConversions.naturalFrequency(modalMassOrNaN(), v);
            case 1 -> v;
            default -> StructureConversions.frequencyFromStaticDeflection(v);
        };
    }

    private void edited(String key) {
        commit(() -> ProjectEdits.structure(key, input()));
    }

    @Override
    void showProject(Project p, boolean loaded) {
        severalModes = p.modes() != null;
        modes.show(p);
        for (JComponent c : List.of(massForm, mass.textField(), stiffnessForm, stiffness.textField(), dampingForm,
                damping.textField(), modeShape.textField(), fromMeasurement)) {
            c.setEnabled(!severalModes);
        }
        if (severalModes) {
            // the modes are edited in their table; the greyed fields show the target mode at the
            // absorbers' point, the single mode the design uses (never the fields of a project shown before)
            showTargetMode(p);
            measuredNote.setText("the modes in the table below; shown: the mode the design targets");
            measuredNote.setToolTipText(null);
            return;
        }
        load(p.structure());
        MeasuredSource m = p.structure().measured();
        measuredNote.setText(m == null ? "typed (not from a measurement)" : "measured: "
                + (m.file().isEmpty() ? "" : m.file() + ", ") + (m.date().isEmpty() ? "" : m.date() + ", ")
                + "typing a value replaces it");
        measuredNote.setToolTipText(m == null ? null : MeasuredSourceContent.methodWords(m.method()));
    }

    /**
     * Shows the target mode as a single mode (effective modal mass m_r / phi_r(a)^2, its natural
     * frequency, its damping ratio, shape value 1), or empty fields when the file's modes do not give one.
     */
    private void showTargetMode(Project p) {
        Structure target;
        try {
            target = p.toStructure();
        } catch (InvalidInputException e) {
            for (QuantityField f : List.of(mass, stiffness, damping, modeShape)) {
                showValue(f, null);
            }
            return;
        }
        select(massForm, 0);
        Unit massUnit = DisplayUnits.of(Dimension.MASS, p.displayUnits()); // the unit the modes table shows
        // six figures, as the table: a pound value's conversion tail is not shown
        showValue(mass, new BigDecimal(massUnit.fromSi(target.modalMass())).round(new MathContext(6)).doubleValue(),
                massUnit);
        select(stiffnessForm, 1);
        showValue(stiffness, Unit.HERTZ.fromSi(target.naturalFrequency()), Unit.HERTZ);
        select(dampingForm, DampingInput.Measure.RATIO.ordinal());
        showValue(damping, target.dampingRatio(), Unit.RATIO);
        showValue(modeShape, 1.0, Unit.RATIO);
    }

    /** @return the modes table's rows as shown (tests) */
    List<List<String>> modeRows() {
        return modes.rows();
    }

    /** @return the message under the modes table, or blank (tests) */
    String modesProblem() {
        return modes.problem();
    }

    @Override
    boolean fieldsValid() {
        if (severalModes) {
            return true;
        }
        boolean ok = true;
        for (QuantityField f : List.of(mass, stiffness, damping, modeShape)) {
            ok &= check(f);
        }
        return ok;
    }

    @Override
    String title() {
        return TITLE;
    }

    @Override
    JComponent component() {
        return page;
    }

    /** @return the structure as typed (throws InvalidInputException naming the field) */
    StructureInput input() {
        QuantityInput m = mass.input();
        QuantityInput k = stiffness.input();
        int sf = stiffnessForm.getSelectedIndex();
        int df = dampingForm.getSelectedIndex();
        DampingInput d = df == 3 ? new DampingInput(DampingInput.Measure.HALF_POWER_BANDWIDTH, Double.NaN, damping.input())
                : new DampingInput(DampingInput.Measure.values()[df], damping.number(), null);
        boolean weight = massForm.getSelectedIndex() == 1;
        return new StructureInput(weight ? null : m, weight ? m : null, sf == 0 ? k : null, sf == 1 ? k : null,
                sf == 2 ? k : null, d, modeShape.number());
    }

    private void load(StructureInput s) {
        if (s.weight() != null) {
            select(massForm, 1);
            showValue(mass, s.weight());
        } else if (s.mass() != null) {
            select(massForm, 0);
            showValue(mass, s.mass());
        } else {
            showValue(mass, null);
        }
        QuantityInput k = s.stiffness() != null ? s.stiffness() : s.naturalFrequency() != null
                ? s.naturalFrequency() : s.staticDeflection();
        select(stiffnessForm, s.stiffness() != null ? 0 : s.naturalFrequency() != null ? 1 : 2);
        showValue(stiffness, k);
        DampingInput d = s.damping() == null ? DampingInput.ratio(0) : s.damping();
        select(dampingForm, d.measure().ordinal());
        if (d.measure() == DampingInput.Measure.HALF_POWER_BANDWIDTH) {
            showValue(damping, d.bandwidth());
        } else {
            showValue(damping, d.value(), Unit.RATIO);
        }
        showValue(modeShape, s.modeShapeAtAbsorber(), Unit.RATIO);
    }

    /**
     * @param s the structure, or null when the input is not valid
     * @param units the project's display units (mass and stiffness shown in them)
     */
    void showDerived(Structure s, UnitSystem units) {
        if (s == null) {
            for (JLabel l : List.of(derivedMass, derivedStiffness, derivedFrequency, derivedDamping)) {
                l.setText("\u2014");
            }
            return;
        }
        derivedMass.setText(DisplayUnits.format(s.effectiveMass(), Dimension.MASS, units));
        derivedStiffness.setText(DisplayUnits.format(s.effectiveStiffness(), Dimension.STIFFNESS, units));
        derivedFrequency.setText(QuantityFormat.number(Unit.HERTZ.fromSi(s.naturalFrequency()), 4) + " Hz  ("
                + QuantityFormat.format(s.naturalFrequency(), Unit.REV_PER_MINUTE) + ")");
        derivedDamping.setText(QuantityFormat.number(s.dampingRatio(), 3));
    }

    static JLabel derived(String name) {
        JLabel l = new JLabel("\u2014");
        l.setName(name);
        return l;
    }
}
