package org.counterpoise.ui.gui.field;

import java.awt.Color;
import java.awt.FlowLayout;
import java.util.List;
import java.util.Locale;
import javax.swing.DefaultComboBoxModel;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.QuantityInput;

/**
 * A number with a unit selector and an inline message line. What the user typed is never
 * replaced: a bad value shows a red outline and says what is allowed, and the last text stays.
 * Components carry names (the field id, and id + ".unit") so tests can find them.
 */
public final class QuantityField extends JPanel {
    private final String fieldId;
    private final JTextField text = new JTextField(9);
    private final JComboBox<Unit> units = new JComboBox<>();
    private final JLabel message = new JLabel(" ");
    private Runnable onChange = () -> { };

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
        setMinimumSize(getPreferredSize());
        units.setName(fieldId + ".unit");
        units.setRenderer(new javax.swing.DefaultListCellRenderer() {
            @Override
            public java.awt.Component getListCellRendererComponent(javax.swing.JList<?> list, Object value,
                    int index, boolean selected, boolean focus) {
                return super.getListCellRendererComponent(list, value instanceof Unit u ? pretty(u.symbol()) : value,
                        index, selected, focus);
            }
        });
        setUnits(choices);
        message.setName(fieldId + ".message");
        message.setForeground(new Color(0xb0, 0x2a, 0x1e));
        message.setFont(message.getFont().deriveFont(message.getFont().getSize2D() - 1f));
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
        units.addActionListener(e -> onChange.run());
    }

    /** @return the line under the field where problems are said; the form places it */
    public JLabel messageLabel() {
        return message;
    }

    /** @param action run after every edit */
    public void onChange(Runnable action) {
        this.onChange = action;
    }

    /** @param choices new units to offer (the first is selected) */
    public void setUnits(List<Unit> choices) {
        units.setModel(new DefaultComboBoxModel<>(choices.toArray(new Unit[0])));
        units.setVisible(!choices.isEmpty() && !choices.get(0).symbol().isEmpty());
    }

    /** @return the field id */
    public String fieldId() {
        return fieldId;
    }

    /**
     * @return the value as typed
     * @throws InvalidInputException when the text is not a number
     */
    public double number() {
        String t = text.getText().strip().replace(" ", "");
        if (t.indexOf('.') < 0) {
            t = t.replace(',', '.');
        }
        try {
            double v = Double.parseDouble(t);
            if (!Double.isFinite(v)) {
                throw new NumberFormatException();
            }
            return v;
        } catch (NumberFormatException e) {
            throw new InvalidInputException(fieldId, t.isEmpty() ? "an empty field" : "\"" + text.getText() + "\"",
                    "type a number, such as 12.5");
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
        Runnable keep = onChange;
        onChange = () -> { };
        text.setText(format(value));
        if (unit != null) {
            units.setSelectedItem(unit);
        }
        onChange = keep;
    }

    /** Empties the field without firing a change. */
    public void clear() {
        Runnable keep = onChange;
        onChange = () -> { };
        text.setText("");
        onChange = keep;
    }

    /** @param problem what is wrong, or null to clear */
    public void setProblem(String problem) {
        text.putClientProperty("JComponent.outline", problem == null ? null : "error");
        message.setText(problem == null ? " " : problem);
        text.repaint();
    }

    /** @return the text component (for focus and tests) */
    public JTextField textField() {
        return text;
    }

    static String format(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e12) {
            return Long.toString((long) v);
        }
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("(\\.\\d*?)0+$", "$1").replaceAll("\\.$", "")
                .replaceAll("(\\.\\d*?)0+e", "$1e");
    }

    /** @param symbol unit symbol as typed in files @return as shown: N·s/m, m/s² */
    public static String pretty(String symbol) {
        return symbol.replace("*", "\u00b7").replace("^2", "\u00b2");
    }
}
