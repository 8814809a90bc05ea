package org.counterpoise.ui.gui.field;

import java.util.Arrays;
import java.util.List;
import java.util.function.Function;
import java.util.function.IntFunction;
import javax.swing.JComboBox;
import org.counterpoise.core.units.Unit;

/**
 * A list of forms for one field's quantity (mass or weight; stiffness, natural frequency or static
 * deflection; mass ratio or absorber mass...). Picking another form converts the value, so the
 * physical quantity stays what it was: a mass ratio of 0.05 becomes the absorber mass it means,
 * never 0.05 kg. Where there is no conversion the field shows the value last typed in that form,
 * or is emptied with a line saying what to type. Text that is not a number yet is left as typed.
 */
public final class FormSwitch {
    /** Converts a value between two forms. */
    @FunctionalInterface
    public interface Conversion {
        /**
         * @param from index of the form the value is in
         * @param to index of the form wanted
         * @param siValue the value in SI units of the old form
         * @return the value in SI units of the new form, or NaN when it cannot be converted
         */
        double convert(int from, int to, double siValue);
    }

    /**
     * Converts a value between two forms named by the list's items.
     * @param <T> the item type (an enum of forms)
     */
    @FunctionalInterface
    public interface ItemConversion<T> {
        /**
         * @param from the form the value is in
         * @param to the form wanted
         * @param siValue the value in SI units of the old form
         * @return the value in SI units of the new form, or NaN when it cannot be converted
         */
        double convert(T from, T to, double siValue);
    }

    private FormSwitch() {
    }

    /**
     * As {@link #attach(JComboBox, QuantityField, IntFunction, Conversion, IntFunction)}, for a list
     * whose items are the forms themselves (an enum), so no caller decides by position.
     * @param <T> the item type
     * @param forms the list of forms
     * @param field the field holding the value
     * @param units the units of each form
     * @param conversion the conversion between forms
     * @param whenCleared what to say under the field when it is emptied, for each form
     */
    public static <T> void attachItems(JComboBox<T> forms, QuantityField field, Function<T, List<Unit>> units,
            ItemConversion<T> conversion, Function<T, String> whenCleared) {
        attach(forms, field, i -> units.apply(forms.getItemAt(i)),
                (from, to, v) -> conversion.convert(forms.getItemAt(from), forms.getItemAt(to), v),
                i -> whenCleared.apply(forms.getItemAt(i)));
    }

    /**
     * Listens to the list of forms; attach it after the list's other listeners, so the value is
     * converted before they read the field (Swing notifies the last listener first).
     * @param forms the list of forms
     * @param field the field holding the value
     * @param units the units of each form
     * @param conversion the conversion between forms
     * @param whenCleared what to say under the field when it is emptied, for each form
     */
    public static void attach(JComboBox<?> forms, QuantityField field, IntFunction<List<Unit>> units,
            Conversion conversion, IntFunction<String> whenCleared) {
        int count = forms.getItemCount();
        double[] remembered = new double[count];
        Arrays.fill(remembered, Double.NaN);
        int[] shown = {forms.getSelectedIndex()};
        int[] project = {field.shownValues()};
        forms.addActionListener(e -> {
            int from = shown[0];
            int to = forms.getSelectedIndex();
            shown[0] = to;
            if (from == to || from < 0 || to < 0) {
                return;
            }
            if (project[0] != field.shownValues()) {
                Arrays.fill(remembered, Double.NaN); // another project was shown: its values are not this one's
                project[0] = field.shownValues();
            }
            double si = field.siOrNaN();
            if (Double.isNaN(si) && !field.textField().getText().isBlank()) {
                field.setUnits(units.apply(to)); // not a number yet: keep the text, the problem stays shown
                return;
            }
            remembered[from] = si;
            double converted = Double.isNaN(si) ? Double.NaN : conversion.convert(from, to, si);
            if (!(Double.isFinite(converted) && converted >= 0)) {
                converted = remembered[to];
            }
            field.convertTo(units.apply(to), converted, whenCleared.apply(to));
        });
    }
}
