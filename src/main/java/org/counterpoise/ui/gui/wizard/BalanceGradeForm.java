package org.counterpoise.ui.gui.wizard;

import java.util.List;
import java.util.function.Consumer;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.BalanceGradeInput;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.ItemWords;
import org.counterpoise.ui.gui.field.QuantityField;

/**
 * A rotating unbalance given by its balance quality grade (ISO 21940-11: grade G, rotor mass and
 * maximum service speed) instead of m&middot;e, on the disturbance step. Shown only for an
 * unbalance; the permissible residual unbalance it gives is shown under it.
 */
final class BalanceGradeForm {
    /** How the unbalance is given. */
    enum Source {
        /** Its amplitude m&middot;e. */
        AMPLITUDE,
        /** Its balance quality grade. */
        GRADE
    }

    static final String PATH = "disturbance.balance_grade";

    private final JComboBox<Source> source = new JComboBox<>(Source.values());
    private final QuantityField grade = new QuantityField(PATH + ".grade",
            "The balance quality grade G (ISO 21940-11): G 6.3 is 6.3 mm/s", UnitChoices.of(Dimension.VELOCITY));
    private final QuantityField rotorMass = new QuantityField(PATH + ".rotor_mass", "The mass of the rotor",
            UnitChoices.of(Dimension.MASS));
    private final QuantityField maxSpeed = new QuantityField(PATH + ".max_speed",
            "The rotor's maximum service speed (the grade is stated for it)",
            List.of(Unit.REV_PER_MINUTE, Unit.HERTZ, Unit.RADIAN_PER_SECOND));
    private final JLabel unbalance = StructureStep.derived("derived.balanceGrade");
    private JLabel[] labels = new JLabel[0];
    private JLabel sourceLabel;
    private JLabel unbalanceLabel;
    private Consumer<String> changed = key -> { };

    BalanceGradeForm() {
        source.setName(PATH + ".source");
        ItemWords.show(source, Source.class, s -> switch (s) {
            case AMPLITUDE -> "its amplitude m\u00b7e";
            case GRADE -> "its balance quality grade (ISO 21940-11)";
        });
        source.addActionListener(e -> {
            showRows(true);
            changed.accept(source.getName());
        });
        for (QuantityField f : fields()) {
            f.onChange(() -> {
                derive();
                changed.accept(f.fieldId());
            });
        }
    }

    /**
     * Adds the list of sources to a form (under the kind).
     * @param form the form
     */
    void addSourceTo(Form form) {
        sourceLabel = form.row("Unbalance given by", 'u', source, "The unbalance m\u00b7e, or the balance grade it"
                + " was balanced to");
    }

    /**
     * Adds the grade's rows to a form (where the amplitude would be).
     * @param form the form
     */
    void addGradeTo(Form form) {
        labels = new JLabel[] {
            form.row("Balance grade G", 'g', grade, "G 0.4 to G 4000; fans and pumps are often G 6.3 (common practice)"),
            form.row("Rotor mass", 'm', rotorMass, "The mass of the rotating part"),
            form.row("Maximum service speed", 'x', maxSpeed, "The highest speed the rotor runs at in service"),
        };
        unbalanceLabel = form.derived("Permissible residual unbalance", unbalance);
    }

    /** @param listener told the key of every change a user makes */
    void onChange(Consumer<String> listener) {
        changed = listener;
    }

    /**
     * Shows the rows that apply.
     * @param unbalanceKind true when the disturbance is a rotating unbalance
     */
    void showRows(boolean unbalanceKind) {
        if (sourceLabel != null) {
            Form.showRow(sourceLabel, source, unbalanceKind);
        }
        boolean byGrade = unbalanceKind && usesGrade();
        QuantityField[] f = fields().toArray(new QuantityField[0]);
        for (int i = 0; i < labels.length; i++) {
            Form.showRow(labels[i], f[i], byGrade);
        }
        if (unbalanceLabel != null) {
            Form.showRow(unbalanceLabel, unbalance, byGrade);
        }
    }

    /** @return true when the grade gives the unbalance */
    boolean usesGrade() {
        return source.getSelectedItem() == Source.GRADE;
    }

    /** @return the grade, rotor mass and speed fields */
    List<QuantityField> fields() {
        return List.of(grade, rotorMass, maxSpeed);
    }

    /**
     * @return the grade as shown
     * @throws InvalidInputException naming the field that is not a number
     */
    BalanceGradeInput input() {
        return new BalanceGradeInput(grade.input(), rotorMass.input(), maxSpeed.input());
    }

    /**
     * @param g the grade the project gives, or null when it gives the amplitude
     */
    void show(BalanceGradeInput g) {
        Step.selectItem(source, g == null ? Source.AMPLITUDE : Source.GRADE);
        if (g != null) {
            Step.showValue(grade, g.grade());
            Step.showValue(rotorMass, g.rotorMass());
            Step.showValue(maxSpeed, g.maxSpeed());
        }
        derive();
    }

    /** The unbalance the grade permits, in g&middot;mm (one formula, in the core's BalanceGrade). */
    private void derive() {
        try {
            double u = input().toCore(PATH).permissibleUnbalance();
            unbalance.setText(QuantityFormat.format(u, Unit.GRAM_MILLIMETRE).replace("*", "\u00b7")
                    + "  (U = G m / \u03a9)");
        } catch (InvalidInputException e) {
            unbalance.setText("\u2014");
        }
    }
}
