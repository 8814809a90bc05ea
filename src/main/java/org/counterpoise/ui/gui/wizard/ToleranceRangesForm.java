package org.counterpoise.ui.gui.wizard;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.stream.Collectors;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.ToleranceRanges.FrequencyBasis;
import org.counterpoise.core.robust.ToleranceRanges.Range;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.io.text.ReportRow;
import org.counterpoise.io.text.ToleranceRangeRows;
import org.counterpoise.io.text.TypedNumbers;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.field.Html;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.ItemWords;
import org.counterpoise.ui.gui.field.QuantityField;

/**
 * The ranges the design must hold over, as the absorber-goal step shows them: structure frequency,
 * absorber frequency and absorber damping, each +/- percent, and how the structure's frequency was
 * found. An empty field takes its default, shown in the field as a grey hint marked as common
 * practice. The values live in the project's robustness section ({@code ProjectEdits.ranges}); the
 * robustness step shows them in words ({@link #summary}) and does not edit them.
 */
final class ToleranceRangesForm {
    private final Map<Range, QuantityField> fields = new LinkedHashMap<>();
    private final JComboBox<FrequencyBasis> basis = new JComboBox<>(FrequencyBasis.values());

    ToleranceRangesForm() {
        fields.put(Range.STRUCTURE_FREQUENCY, field(Range.STRUCTURE_FREQUENCY,
                "How far the structure's natural frequency may be off, percent each way"));
        fields.put(Range.ABSORBER_FREQUENCY, field(Range.ABSORBER_FREQUENCY,
                "How far the absorber's natural frequency may be off (spring-rate and mass tolerance, or the"
                        + " tuning adjustment left on site), percent each way"));
        fields.put(Range.ABSORBER_DAMPING, field(Range.ABSORBER_DAMPING,
                "How far the absorber's damping may be off (damper or elastomer tolerance), percent each way"));
        basis.setName("robustness." + RobustnessInput.Ranges.BASIS_KEY);
        ItemWords.show(basis, FrequencyBasis.class, ToleranceRangeRows::words);
    }

    private static QuantityField field(Range range, String tooltip) {
        QuantityField f = new QuantityField("robustness." + RobustnessInput.Ranges.key(range), tooltip,
                List.of(Unit.PERCENT));
        // The default in grey while the field is empty; the note under the fields says what it rests on.
        f.textField().putClientProperty("JTextField.placeholderText",
                TypedNumbers.forEditing(100 * ToleranceRanges.DEFAULT.of(range), Locale.getDefault(Locale.Category.FORMAT))
                        + " (default)");
        return f;
    }

    /**
     * Adds the rows to a form.
     * @param form the form
     */
    void addTo(Form form) {
        form.heading("Tolerances the design must hold over");
        form.row("Structure frequency \u00b1", 'q', fields.get(Range.STRUCTURE_FREQUENCY),
                "The structure's natural frequency is rarely known better than a few percent");
        form.row("Found by", 'y', basis, "How the structure's natural frequency was found: estimated, calculated or"
                + " measured");
        form.row("Absorber frequency \u00b1", 'b', fields.get(Range.ABSORBER_FREQUENCY),
                "Spring-rate and mass tolerance, or the tuning adjustment done on site");
        form.row("Absorber damping \u00b1", 'g', fields.get(Range.ABSORBER_DAMPING),
                "Damper or elastomer tolerance, temperature");
        JLabel note = new JLabel("<html><body style='width: 150pt'>Empty: the grey default holds (common"
                + " practice, no source); every output marks it so.</body></html>");
        note.setName("robustness.rangesNote");
        form.derived("", note);
    }

    /** @return the fields by the key of their project-file field, for the step's problem display */
    Map<String, QuantityField> fieldsByKey() {
        return fields.entrySet().stream().collect(Collectors.toMap(
                e -> "robustness." + RobustnessInput.Ranges.key(e.getKey()), Map.Entry::getValue,
                (a, b) -> a, LinkedHashMap::new));
    }

    /** @return the percent fields */
    List<QuantityField> fields() {
        return List.copyOf(fields.values());
    }

    /** @return the basis list */
    JComboBox<FrequencyBasis> basis() {
        return basis;
    }

    /** @return the ranges as shown (throws InvalidInputException naming a field that is not a number) */
    RobustnessInput.Ranges ranges() {
        return new RobustnessInput.Ranges(percent(Range.STRUCTURE_FREQUENCY), percent(Range.ABSORBER_FREQUENCY),
                percent(Range.ABSORBER_DAMPING), (FrequencyBasis) basis.getSelectedItem());
    }

    private OptionalDouble percent(Range range) {
        QuantityField f = fields.get(range);
        return f.textField().getText().isBlank() ? OptionalDouble.empty() : OptionalDouble.of(f.number());
    }

    /**
     * @param p the project to show
     */
    void show(Project p) {
        RobustnessInput.Ranges r = p.robustness() == null ? RobustnessInput.Ranges.NONE : p.robustness().ranges();
        for (Map.Entry<Range, QuantityField> e : fields.entrySet()) {
            OptionalDouble v = r.percent(e.getKey());
            if (v.isPresent()) {
                Step.showValue(e.getValue(), v.getAsDouble(), Unit.PERCENT);
            } else {
                Step.showValue(e.getValue(), null);
            }
        }
        Step.selectItem(basis, r.basis());
    }

    /**
     * The ranges in the reports' words, for the robustness step: the same values, not a second
     * place to edit them.
     *
     * @param p the project
     * @return one line of HTML
     */
    static String summary(Project p) {
        ToleranceRanges ranges;
        try {
            ranges = p.toRobustness().ranges();
        } catch (InvalidInputException e) {
            return "<html>The ranges on the Absorber goal step are not valid yet.</html>";
        }
        String listed = ToleranceRangeRows.of(ranges).stream()
                .map(ToleranceRangesForm::phrase).collect(Collectors.joining("<br>"));
        return "<html><body style='width: 340pt'>" + listed
                + "<br><i>Set on the Absorber goal step.</i></body></html>";
    }

    private static String phrase(ReportRow row) {
        return Html.escape(ValueText.capitalised(row.label())) + ": " + Html.escape(ValueText.inline(row.value()));
    }
}
