package org.counterpoise.ui.gui.field;

import java.awt.Color;
import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.event.HierarchyBoundsAdapter;
import java.awt.event.HierarchyEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BiConsumer;
import javax.swing.DefaultComboBoxModel;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.text.TypedNumbers;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.Themes;

/**
 * A number with a unit selector and an inline message line. What the user typed is never
 * replaced: a bad value shows a red outline and says what is allowed, and the last text stays.
 * Numbers are read and written in the user's locale ({@link TypedNumbers}); picking another unit
 * converts the number, so the physical quantity stays what it was.
 * Components carry names (the field id, and id + ".unit") so tests can find them.
 */
public final class QuantityField extends JPanel {
    /** The colour of problems said under a field. */
    private final String fieldId;
    private final JTextField text = new JTextField(9);
    private final JComboBox<Unit> units = new JComboBox<>();
    private final JLabel message = new JLabel(" ");
    private Runnable onChange = () -> { };
    private BiConsumer<Unit, Unit> unitListener = (from, to) -> { };
    /** The unit the number in the text is in (the selection before the user's pick). */
    private Unit shownUnit;
    /** How a grouped number was read; shown while there is no problem. */
    private String hint;
    /** Why the field was emptied when its quantity changed form, until something is typed. */
    private String clearedBecause;
    private boolean problemShown;
    private String messageText = " ";
    private int wrappedAt = -1;
    /** Counts values shown from a project (not typed), so remembered values of other forms can be forgotten. */
    private int shownValues;
    private boolean quiet;
    /** The unit system whose units a standard list offers first (see {@link #unitSystem}). */
    private UnitSystem system = UnitSystem.SI;

    /**
     * @param fieldId the project-file field this edits, e.g. "structure.mass"
     * @param tooltip what the quantity is
     * @param choices the units offered (empty for a plain number)
     */
    public QuantityField(String fieldId, String tooltip, List<Unit> choices) {
        super(new FlowLayout(FlowLayout.LEFT, 4, 0));
        this.fieldId = fieldId;
        setOpaque(false);
        text.setName(fieldId);
        text.setToolTipText(tooltip);
        text.setHorizontalAlignment(JTextField.RIGHT);
        // Never squeeze a field to nothing when its form is short of room.
        text.setMinimumSize(text.getPreferredSize());
        units.setName(fieldId + ".unit");
        units.setRenderer(new DefaultListCellRenderer() {
            @Override
            public Component getListCellRendererComponent(JList<?> list, Object value,
                    int index, boolean selected, boolean focus) {
                return super.getListCellRendererComponent(list, value instanceof Unit u ? pretty(u.symbol()) : value,
                        index, selected, focus);
            }
        });
        setUnits(choices);
        message.setName(fieldId + ".message");
        message.setForeground(Themes.problemColour());
        message.setFont(message.getFont().deriveFont(message.getFont().getSize2D() - 1f));
        // A long message wraps within the form instead of running off a small window.
        message.addHierarchyBoundsListener(new HierarchyBoundsAdapter() {
            @Override
            public void ancestorResized(HierarchyEvent e) {
                wrapMessage();
            }
        });
        add(text);
        add(units);
        text.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                onChange.run();
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                onChange.run();
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                onChange.run();
            }
        });
        units.addActionListener(e -> {
            if (!quiet) {
                unitPicked();
            }
        });
    }

    /** Never less than the text and its unit list: a form short of room scrolls instead of clipping them. */
    @Override
    public Dimension getMinimumSize() {
        return isMinimumSizeSet() ? super.getMinimumSize() : getPreferredSize();
    }

    /** @return the line under the field where problems are said; the form places it */
    public JLabel messageLabel() {
        return message;
    }

    /** @param action run after every edit */
    public void onChange(Runnable action) {
        this.onChange = action;
    }

    /** @param listener told (old unit, new unit) after the user picked another unit and the number followed */
    public void onUnitChange(BiConsumer<Unit, Unit> listener) {
        unitListener = listener;
    }

    /**
     * @param choices new units to offer (the first is selected; the number is not converted); a
     *     dimension's standard list (io.text.UnitChoices) is offered in the field's unit system
     */
    public void setUnits(List<Unit> choices) {
        boolean wasQuiet = quiet;
        quiet = true;
        try {
            units.setModel(new DefaultComboBoxModel<>(SystemUnits.inSystem(choices, system).toArray(new Unit[0])));
        } finally {
            quiet = wasQuiet;
        }
        shownUnit = unit();
        units.setVisible(!choices.isEmpty() && !choices.get(0).symbol().isEmpty());
    }

    /**
     * @param shown the unit system: a standard unit list offers its units first, an empty field selects
     *     its display unit, a number keeps its unit (never reinterpreted); fires no change
     */
    public void unitSystem(UnitSystem shown) {
        if (shown == system) {
            return;
        }
        system = shown;
        List<Unit> now = new ArrayList<>();
        for (int i = 0; i < units.getItemCount(); i++) {
            now.add(units.getItemAt(i));
        }
        List<Unit> offered = SystemUnits.inSystem(now, shown);
        Unit kept = unit();
        quietly(() -> {
            units.setModel(new DefaultComboBoxModel<>(offered.toArray(new Unit[0])));
            if (!text.getText().isBlank() && kept != null) {
                units.setSelectedItem(kept);
            }
            shownUnit = unit();
        });
    }

    /** @return the field id */
    public String fieldId() {
        return fieldId;
    }

    /**
     * @return the value as typed, read with the decimal and grouping marks of the user's locale
     * @throws InvalidInputException when the text is not a number, or not one the locale reads for sure
     */
    public double number() {
        if (clearedBecause != null && text.getText().isBlank()) {
            throw new InvalidInputException(fieldId, "an empty field", clearedBecause);
        }
        double v = TypedNumbers.parse(text.getText(), locale(), fieldId);
        // A grouped number is echoed as read, so "1,800" can never pass for something it is not.
        hint = TypedNumbers.grouped(text.getText(), locale()) ? "read as " + TypedNumbers.forEditing(v, locale())
                : null;
        if (!problemShown) {
            setProblem(null);
        }
        return v;
    }

    /** @return the value in SI, or NaN when the text is not a number (nothing is reported) */
    public double siOrNaN() {
        try {
            double v = TypedNumbers.parse(text.getText(), locale(), fieldId);
            Unit u = unit();
            return u == null ? v : u.toSi(v);
        } catch (InvalidInputException e) {
            return Double.NaN;
        }
    }

    /** @return the value with its unit */
    public QuantityInput input() {
        return new QuantityInput(number(), unit());
    }

    /** @return the selected unit */
    public Unit unit() {
        return (Unit) units.getSelectedItem();
    }

    /**
     * Shows a value without firing a change.
     * @param value the number
     * @param unit its unit (must be one of the offered)
     */
    public void show(double value, Unit unit) {
        quietly(() -> {
            text.setText(TypedNumbers.forEditing(value, locale()));
            if (unit != null) {
                units.setSelectedItem(unit);
            }
            shownUnit = unit();
            hint = null;
            clearedBecause = null;
            shownValues++;
        });
    }

    /**
     * Empties the field without firing a change, and says under it why until something is typed.
     * @param why the reason and what to type, e.g. "the target was for a displacement: type a velocity"
     */
    public void clearBecause(String why) {
        quietly(() -> {
            text.setText("");
            hint = null;
            clearedBecause = why;
        });
    }

    /** Empties the field without firing a change. */
    public void clear() {
        quietly(() -> {
            text.setText("");
            hint = null;
            clearedBecause = null;
        });
    }

    /**
     * The quantity this field holds changed form (mass ratio to mass, stiffness to natural
     * frequency...): offers the new units and shows the same physical value in the first of them,
     * or, when there is no conversion, empties the field and says what to type. Fires one change.
     * @param choices the units of the new form
     * @param siValue the value in the new form, SI; NaN when there is no conversion
     * @param whenCleared what to say under an emptied field, e.g. "type the target in mm/s"
     */
    public void convertTo(List<Unit> choices, double siValue, String whenCleared) {
        quietly(() -> {
            setUnits(choices);
            Unit first = unit();
            if (Double.isFinite(siValue)) {
                text.setText(TypedNumbers.forEditing(first == null ? siValue : first.fromSi(siValue), locale()));
                clearedBecause = null;
            } else {
                text.setText("");
                clearedBecause = whenCleared;
            }
            hint = null;
        });
        setProblem(null);
        onChange.run();
    }

    /**
     * Multiplies the number shown (for a field whose unit follows another field's); fires no change.
     * @param factor the factor
     */
    public void scale(double factor) {
        try {
            double v = TypedNumbers.parse(text.getText(), locale(), fieldId);
            quietly(() -> text.setText(TypedNumbers.forEditing(v * factor, locale())));
        } catch (InvalidInputException e) {
            // Nothing readable to convert: what was typed stays as it is.
        }
    }

    /** @param problem what is wrong, or null to clear (a note on how the number was read stays) */
    public void setProblem(String problem) {
        text.putClientProperty("JComponent.outline", problem == null ? null : "error");
        Color muted = UIManager.getColor("Label.disabledForeground");
        message.setForeground(problem == null && muted != null ? muted : Themes.problemColour());
        messageText = problem != null ? problem : hint != null ? hint : " ";
        problemShown = problem != null;
        wrapMessage();
        text.repaint();
    }

    /** @return how many values were shown from a project so far (not typed by the user) */
    int shownValues() {
        return shownValues;
    }

    /** Sets the message, wrapped to the room its form has right of the label column. */
    private void wrapMessage() {
        // The room visible, not the form's width: a message wider than the window would keep its form wide.
        Container area = (Container) SwingUtilities.getAncestorOfClass(
                JViewport.class, message);
        if (area == null) {
            area = message.getParent();
        }
        int room = 0;
        if (area != null && area.getWidth() > 0 && message.getParent() != null) {
            int x = SwingUtilities.convertPoint(message.getParent(), message.getX(), 0, area).x;
            room = area.getWidth() - x - 16;
        }
        String plain = messageText;
        if (room <= 0 || message.getFontMetrics(message.getFont()).stringWidth(plain) <= room) {
            wrappedAt = -1;
            if (!plain.equals(message.getText())) {
                message.setText(plain);
            }
            return;
        }
        if (room == wrappedAt && message.getText().contains(Html.escape(plain))) {
            return;
        }
        wrappedAt = room;
        message.setText(Html.wrapped(plain, Math.max(120, room)));
    }

    /** @return the text component (for focus and tests) */
    public JTextField textField() {
        return text;
    }

    /** @return the locale numbers are typed in (read each time: the user or a test may change it) */
    static Locale locale() {
        return Locale.getDefault(Locale.Category.FORMAT);
    }

    /** Runs a programmatic change without telling the listeners. */
    private void quietly(Runnable change) {
        Runnable keep = onChange;
        boolean wasQuiet = quiet;
        onChange = () -> { };
        quiet = true;
        try {
            change.run();
        } finally {
            quiet = wasQuiet;
            onChange = keep;
        }
    }

    /** The user picked another unit: the number follows, so the physical value stays what it was. */
    private void unitPicked() {
        Unit now = unit();
        Unit before = shownUnit;
        shownUnit = now;
        if (before != null && now != null && before != now && before.dimension() == now.dimension()) {
            try {
                double v = TypedNumbers.parse(text.getText(), locale(), fieldId);
                quietly(() -> text.setText(TypedNumbers.forEditing(now.fromSi(before.toSi(v)), locale())));
                unitListener.accept(before, now);
            } catch (InvalidInputException e) {
                // Not a number yet: nothing to convert, and the text stays as typed.
            }
        }
        onChange.run();
    }

    /** @param symbol unit symbol as typed in files @return as shown: N·s/m, m/s² */
    public static String pretty(String symbol) {
        return ValueText.pretty(symbol);
    }
}
