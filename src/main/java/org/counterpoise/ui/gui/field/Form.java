package org.counterpoise.ui.gui.field;

import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSeparator;

/** One form layout used on every step: labels right-aligned, fields left, messages under fields. */
public final class Form extends JPanel {
    private int row;

    /** An empty form. */
    public Form() {
        super(new GridBagLayout());
        setOpaque(false);
        setBorder(BorderFactory.createEmptyBorder(8, 12, 8, 12));
    }

    /**
     * @param title a section heading
     */
    public void heading(String title) {
        JLabel l = new JLabel(title);
        l.setFont(l.getFont().deriveFont(Font.BOLD, l.getFont().getSize2D() + 1f));
        GridBagConstraints c = constraints(0, row++);
        c.gridwidth = 3;
        c.anchor = GridBagConstraints.LINE_START;
        c.insets = new Insets(row == 1 ? 0 : 14, 0, 2, 0);
        add(l, c);
        GridBagConstraints s = constraints(0, row++);
        s.gridwidth = 3;
        s.fill = GridBagConstraints.HORIZONTAL;
        add(new JSeparator(), s);
    }

    /**
     * @param label the label
     * @param mnemonic key for Alt+key focus, or 0
     * @param field the field
     * @param tooltip what it is
     * @return the row's label (to hide the row with {@link #showRow})
     */
    public JLabel row(String label, char mnemonic, JComponent field, String tooltip) {
        JLabel l = new JLabel(label);
        l.setToolTipText(tooltip);
        if (mnemonic != 0) {
            l.setDisplayedMnemonic(mnemonic);
            l.setLabelFor(field instanceof QuantityField q ? q.textField() : field);
        }
        GridBagConstraints lc = constraints(0, row);
        lc.anchor = GridBagConstraints.LINE_END;
        lc.insets = new Insets(3, 0, 3, 10);
        add(l, lc);
        GridBagConstraints fc = constraints(1, row);
        fc.anchor = GridBagConstraints.LINE_START;
        add(field, fc);
        row++;
        if (field instanceof QuantityField q) {
            GridBagConstraints mc = constraints(1, row++);
            mc.anchor = GridBagConstraints.LINE_START;
            mc.insets = new Insets(0, 6, 2, 0);
            add(q.messageLabel(), mc);
        }
        return l;
    }

    /**
     * Shows or hides a row (the layout closes the gap of a hidden one).
     * @param label the row's label, as {@link #row} returned it
     * @param field the row's field
     * @param visible true to show it
     */
    public static void showRow(JLabel label, JComponent field, boolean visible) {
        label.setVisible(visible);
        field.setVisible(visible);
        if (field instanceof QuantityField q) {
            q.messageLabel().setVisible(visible);
        }
    }

    /**
     * @param label the label
     * @param value a read-only value (derived quantity)
     * @return the row's label (to hide the row with {@link #showRow})
     */
    public JLabel derived(String label, JLabel value) {
        JLabel l = new JLabel(label);
        l.setEnabled(false);
        GridBagConstraints lc = constraints(0, row);
        lc.anchor = GridBagConstraints.LINE_END;
        lc.insets = new Insets(2, 0, 2, 10);
        add(l, lc);
        GridBagConstraints fc = constraints(1, row++);
        fc.anchor = GridBagConstraints.LINE_START;
        fc.insets = new Insets(2, 6, 2, 0);
        add(value, fc);
        return l;
    }

    /** Pushes the rows to the top. */
    public void end() {
        GridBagConstraints c = constraints(0, row++);
        c.weighty = 1;
        c.gridwidth = 3;
        add(new JLabel(), c);
        GridBagConstraints filler = constraints(2, 0);
        filler.weightx = 1;
        add(new JLabel(), filler);
    }

    private static GridBagConstraints constraints(int x, int y) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridx = x;
        c.gridy = y;
        c.insets = new Insets(3, 0, 3, 0);
        return c;
    }
}
