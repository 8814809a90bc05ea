package org.counterpoise.ui.gui.wizard;

import java.awt.FlowLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.DoubleSupplier;
import javax.swing.DefaultComboBoxModel;
import java.util.function.Consumer;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.BalanceGradeInput;
import org.counterpoise.io.project.OrderInput;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.ui.gui.field.FormSwitch;
import org.counterpoise.ui.gui.field.ItemWords;
import org.counterpoise.ui.gui.field.QuantityField;

/**
 * The rotor's other orders on the disturbance step: one row each (harmonic order, kind, amplitude
 * with its unit, and a button to remove it), and a button to add one. The design order is the
 * one given above them; these excite the structure at the same time.
 */
final class OrdersForm {
    /**
     * The order the design is for, as the list offers it.
     *
     * @param harmonicOrder that order's harmonic order, or empty for the governing one
     */
    record DesignOrder(OptionalDouble harmonicOrder) {
        static final DesignOrder GOVERNING = new DesignOrder(OptionalDouble.empty());
    }

    private final JPanel panel = new JPanel(new GridBagLayout());
    private final JButton add = new JButton("Add an order");
    private final List<RowWidgets> rows = new ArrayList<>();
    private final JComboBox<DesignOrder> designFor = new JComboBox<>();
    private final DoubleSupplier ownOrder;
    private Consumer<String> changed = key -> { };
    private Consumer<QuantityField> newField = f -> { };
    private boolean quiet;

    private final class RowWidgets {
        final QuantityField order;
        final JComboBox<ExcitationKind> kind = new JComboBox<>(ExcitationKind.values());
        final QuantityField amplitude;
        final JButton remove = new JButton("Remove");
        /** A balance grade the file gives for this order, kept while no amplitude is typed. */
        BalanceGradeInput grade;

        RowWidgets(int index) {
            // the paths the project's messages name, so a problem shows under its own field
            String prefix = "disturbance.orders[" + index + "]";
            order = new QuantityField(prefix + ".harmonic_order", "Forcing cycles per revolution of this order"
                    + " (2 for twice the shaft speed, the blade count for blade-pass)", UnitChoices.of(Dimension.RATIO));
            amplitude = new QuantityField(prefix + ".amplitude", "The amplitude of this order",
                    UnitChoices.of(ExcitationKind.FORCE.amplitudeDimension()));
            order.textField().setColumns(4);
            kind.setName(prefix + ".kind");
            remove.setName(prefix + ".remove");
            ItemWords.show(kind, ExcitationKind.class, DisturbanceStep::words);
            order.onChange(() -> edited(order.fieldId()));
            amplitude.onChange(() -> {
                if (!amplitude.textField().getText().isBlank()) {
                    grade = null;
                }
                edited(amplitude.fieldId());
            });
            kind.addActionListener(e -> {
                amplitude.setUnits(UnitChoices.of(((ExcitationKind) kind.getSelectedItem()).amplitudeDimension()));
                edited(kind.getName());
            });
            FormSwitch.attachItems(kind, amplitude, k -> UnitChoices.of(k.amplitudeDimension()),
                    (from, to, v) -> Double.NaN, k -> "type the amplitude of this " + DisturbanceStep.words(k));
            newField.accept(order);
            newField.accept(amplitude);
            remove.addActionListener(e -> {
                rows.remove(this);
                renumber();
                layoutRows();
                edited("disturbance.orders");
            });
        }
    }

    /** @param ownOrder the harmonic order of the disturbance's own order (NaN while it is not a number) */
    OrdersForm(DoubleSupplier ownOrder) {
        this.ownOrder = ownOrder;
        designFor.setName("disturbance.design_order");
        ItemWords.show(designFor, DesignOrder.class, d -> d.harmonicOrder().isEmpty()
                ? "the governing order (the worst against the criterion)"
                : "order " + QuantityFormat.number(d.harmonicOrder().getAsDouble(), 4));
        designFor.addActionListener(e -> edited(designFor.getName()));
        panel.setOpaque(false);
        panel.setName("disturbance.orders");
        add.setName("disturbance.orders.add");
        add.setMnemonic('d');
        add.setToolTipText("Another harmonic of the same rotor that shakes the structure at the same time");
        add.addActionListener(e -> {
            RowWidgets r = new RowWidgets(rows.size());
            r.order.show(2, Unit.RATIO);
            r.amplitude.clearBecause("type the amplitude of this order");
            rows.add(r);
            layoutRows();
            r.amplitude.textField().requestFocusInWindow();
            edited("disturbance.orders");
        });
        layoutRows();
    }

    /** @return the panel, a row of the step's form */
    JComponent component() {
        return panel;
    }

    /** @param listener told of every field made for a row (to show the project's problems under it) */
    void onNewField(Consumer<QuantityField> listener) {
        newField = listener;
    }

    /** @param listener told the key of every change a user makes */
    void onChange(Consumer<String> listener) {
        changed = listener;
    }

    /** @return the list of the order the design is for (shown with two orders or more) */
    JComboBox<DesignOrder> designOrderList() {
        return designFor;
    }

    /** @return the order the design is for: empty for the governing one */
    OptionalDouble designOrder() {
        DesignOrder d = (DesignOrder) designFor.getSelectedItem();
        return rows.isEmpty() || d == null ? OptionalDouble.empty() : d.harmonicOrder();
    }

    /**
     * Offers the governing order and every order now typed; keeps the choice while its order is
     * still there.
     */
    void refreshDesignOrders() {
        DesignOrder chosen = (DesignOrder) designFor.getSelectedItem();
        List<DesignOrder> items = new ArrayList<>();
        items.add(DesignOrder.GOVERNING);
        double own = ownOrder.getAsDouble();
        if (Double.isFinite(own)) {
            items.add(new DesignOrder(OptionalDouble.of(own)));
        }
        for (RowWidgets r : rows) {
            double h = r.order.siOrNaN();
            if (Double.isFinite(h) && items.stream().noneMatch(d -> d.harmonicOrder().equals(OptionalDouble.of(h)))) {
                items.add(new DesignOrder(OptionalDouble.of(h)));
            }
        }
        boolean wasQuiet = quiet;
        quiet = true;
        try {
            List<DesignOrder> now = new ArrayList<>();
            for (int i = 0; i < designFor.getItemCount(); i++) {
                now.add(designFor.getItemAt(i));
            }
            if (!now.equals(items)) {
                designFor.setModel(new DefaultComboBoxModel<>(items.toArray(new DesignOrder[0])));
                designFor.setSelectedItem(chosen != null && items.contains(chosen) ? chosen : DesignOrder.GOVERNING);
            }
        } finally {
            quiet = wasQuiet;
        }
        designFor.setEnabled(!rows.isEmpty());
    }

    private void edited(String key) {
        refreshDesignOrders();
        if (!quiet) {
            changed.accept(key);
        }
    }

    /**
     * After a row is removed, the rows below it take their new positions' field ids (the paths the
     * project's messages name), keeping what was typed in them.
     */
    private void renumber() {
        boolean wasQuiet = quiet;
        quiet = true;
        try {
            for (int i = 0; i < rows.size(); i++) {
                RowWidgets old = rows.get(i);
                if (old.order.fieldId().equals("disturbance.orders[" + i + "].harmonic_order")) {
                    continue;
                }
                RowWidgets moved = new RowWidgets(i);
                moved.kind.setSelectedItem(old.kind.getSelectedItem());
                moved.grade = old.grade;
                copy(old.order, moved.order);
                moved.amplitude.setUnits(UnitChoices.of(((ExcitationKind) old.kind.getSelectedItem())
                        .amplitudeDimension()));
                copy(old.amplitude, moved.amplitude);
                rows.set(i, moved);
            }
        } finally {
            quiet = wasQuiet;
        }
    }

    private static void copy(QuantityField from, QuantityField to) {
        double si = from.siOrNaN();
        if (Double.isNaN(si)) {
            to.textField().setText(from.textField().getText());
        } else {
            to.show(from.unit().fromSi(si), from.unit());
        }
    }

    private void layoutRows() {
        panel.removeAll();
        int y = 0;
        if (!rows.isEmpty()) {
            String[] heads = {"Order", "Kind", "Amplitude"};
            for (int x = 0; x < heads.length; x++) {
                panel.add(new JLabel(heads[x]), at(x, y));
            }
            y++;
        }
        for (RowWidgets r : rows) {
            panel.add(r.order, at(0, y));
            panel.add(r.kind, at(1, y));
            panel.add(r.amplitude, at(2, y));
            panel.add(r.remove, at(3, y));
            y++;
            GridBagConstraints m = at(0, y++);
            m.gridwidth = 4;
            JPanel messages = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 0));
            messages.setOpaque(false);
            messages.add(r.order.messageLabel());
            messages.add(r.amplitude.messageLabel());
            panel.add(messages, m);
        }
        GridBagConstraints b = at(0, y);
        b.gridwidth = 4;
        JLabel none = new JLabel(rows.isEmpty() ? "None: only the order above." : "");
        none.setEnabled(false);
        JPanel line = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        line.setOpaque(false);
        line.add(add);
        if (rows.isEmpty()) {
            line.add(new JLabel("  "));
            line.add(none);
        }
        panel.add(line, b);
        panel.revalidate();
        panel.repaint();
    }

    private static GridBagConstraints at(int x, int y) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridx = x;
        c.gridy = y;
        c.anchor = GridBagConstraints.LINE_START;
        c.insets = new Insets(1, 0, 1, 6);
        return c;
    }

    /**
     * @return the orders as shown
     * @throws InvalidInputException naming the field of the first row that is not a number
     */
    List<OrderInput> orders() {
        List<OrderInput> out = new ArrayList<>();
        for (RowWidgets r : rows) {
            ExcitationKind k = (ExcitationKind) r.kind.getSelectedItem();
            boolean kept = r.grade != null && r.amplitude.textField().getText().isBlank()
                    && k == ExcitationKind.UNBALANCE;
            out.add(new OrderInput(r.order.number(), k, kept ? null : r.amplitude.input(), kept ? r.grade : null));
        }
        return out;
    }

    /** @return true when the row's amplitude must be a number (no balance grade from the file gives it) */
    private boolean needsAmplitude(RowWidgets r) {
        return !(r.grade != null && r.amplitude.textField().getText().isBlank());
    }

    /** @return the fields of every row, for the step's check and problem display */
    List<QuantityField> fields() {
        List<QuantityField> out = new ArrayList<>();
        for (RowWidgets r : rows) {
            out.add(r.order);
            if (needsAmplitude(r)) {
                out.add(r.amplitude);
            }
        }
        return out;
    }

    /**
     * Shows the project's orders; rows are made or removed only when the count differs, so the
     * field being typed in keeps its text.
     * @param orders the orders
     * @param designOrder the order the design is for, empty for the governing one
     */
    void show(List<OrderInput> orders, OptionalDouble designOrder) {
        quiet = true;
        try {
            if (orders.size() != rows.size()) {
                rows.clear();
                for (int i = 0; i < orders.size(); i++) {
                    rows.add(new RowWidgets(i));
                }
                layoutRows();
            }
            for (int i = 0; i < orders.size(); i++) {
                OrderInput o = orders.get(i);
                RowWidgets r = rows.get(i);
                Step.selectItem(r.kind, o.kind());
                if (r.amplitude.unit() == null || r.amplitude.unit().dimension() != o.kind().amplitudeDimension()) {
                    r.amplitude.setUnits(UnitChoices.of(o.kind().amplitudeDimension()));
                }
                Step.showValue(r.order, o.harmonicOrder(), Unit.RATIO);
                r.grade = o.balanceGrade();
                Step.showValue(r.amplitude, o.amplitude());
                if (o.amplitude() == null && o.balanceGrade() != null) {
                    r.amplitude.textField().putClientProperty("JTextField.placeholderText", "balance grade");
                }
            }
            refreshDesignOrders();
            Step.selectItem(designFor, new DesignOrder(designOrder));
        } finally {
            quiet = false;
        }
    }
}
