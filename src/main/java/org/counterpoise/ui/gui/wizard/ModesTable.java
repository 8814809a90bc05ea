package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.event.MouseEvent;
import java.util.ArrayList;
import java.util.EventObject;
import java.util.List;
import java.util.Locale;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import java.util.function.Supplier;
import java.util.function.UnaryOperator;
import javax.swing.BorderFactory;
import javax.swing.BoxLayout;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSpinner;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.SpinnerNumberModel;
import javax.swing.table.JTableHeader;
import javax.swing.text.JTextComponent;
import javax.swing.table.TableModel;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.project.AbsorbersInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.ui.gui.document.Edit;
import org.counterpoise.ui.gui.document.ModesEdits;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.field.Html;
import org.counterpoise.ui.gui.field.ItemWords;

/**
 * The structure step's table of a project's modes (structure.modes in the file), edited in place:
 * each mode's name, natural frequency, damping ratio, modal mass and mode-shape value at each named
 * point in the display unit system; a mode added or removed, a named point added; where the force
 * acts, the response is taken and the absorbers sit, how many there are, their tuning and the mode
 * they are fitted to. Every change is one undoable edit of the document ({@link ModesEdits}); a
 * value refused is said under the table and the table keeps the value it had.
 */
final class ModesTable {
    /** The target-mode list's first entry: no mode named, the one nearest the forcing band. */
    static final String NEAREST = "the mode nearest the band";
    /** The most modes shown at once before the table scrolls. */
    private static final int ROWS_IN_VIEW = 8;
    private final ModeCells model = new ModeCells();
    private final JTable table = new JTable(model) {
        @Override
        public boolean editCellAt(int row, int column, EventObject e) {
            boolean started = super.editCellAt(row, column, e);
            if (started && !(e instanceof MouseEvent) && getEditorComponent() instanceof JTextComponent text) {
                text.selectAll(); // typing into a cell replaces its value, as in a spreadsheet
            }
            return started;
        }

        @Override
        protected JTableHeader createDefaultTableHeader() {
            return new JTableHeader(columnModel) {
                @Override
                public String getToolTipText(MouseEvent e) {
                    int column = columnAtPoint(e.getPoint());
                    return column < 0 ? null : getColumnName(column); // a narrow column's heading, whole
                }
            };
        }
    };
    private final JScrollPane scroll = new JScrollPane(table);
    private final JButton addMode = new JButton("Add a mode");
    private final JButton removeMode = new JButton("Remove the selected mode");
    private final JTextField newPoint = new JTextField(7);
    private final JButton addPoint = new JButton("Add the point");
    private final JButton asModes = new JButton("Describe the structure by its modes");
    private final JLabel heading = new JLabel(" ");
    private final JComboBox<String> excitation = new JComboBox<>();
    private final JComboBox<String> response = new JComboBox<>();
    private final JComboBox<String> absorberPoint = new JComboBox<>();
    private final JSpinner count = new JSpinner(new SpinnerNumberModel(1, 1, AbsorberSetProblem.MAX_COUNT, 1));
    private final JComboBox<AbsorberSetTuning> tuning = new JComboBox<>(AbsorberSetTuning.values());
    private final JComboBox<String> target = new JComboBox<>();
    private final JLabel arrangement = new JLabel(" ");
    private final JLabel problem = new JLabel(" ");
    private final JPanel panel = new JPanel(new BorderLayout(0, 4));
    private final List<JComponent> absorberControls = List.of(absorberPoint, count, tuning, target);
    /** What only a structure given as modes shows: the table and the lines under it. */
    private final List<JComponent> modesParts = new ArrayList<>();
    private JPanel asModesLine;
    private final Consumer<Supplier<Edit>> commit;
    private final BooleanSupplier singleModeTyped;
    /** The project the table shows (every change is made from it). */
    private Project shown;
    /** True while the controls are filled from a project: their listeners write nothing. */
    private boolean filling;

    /**
     * @param commit writes an edit to the document as one undo step (the step's route for a pick)
     * @param singleModeTyped true when the single mode's fields all hold numbers (what is described by
     *     modes is the project's single mode: text not yet a number would be lost)
     */
    ModesTable(Consumer<Supplier<Edit>> commit, BooleanSupplier singleModeTyped) {
        this.commit = commit;
        this.singleModeTyped = singleModeTyped;
        table.setName("structure.modes");
        table.putClientProperty("terminateEditOnFocusLost", Boolean.TRUE);
        table.getTableHeader().setReorderingAllowed(false);
        addMode.setName("structure.modes.add");
        removeMode.setName("structure.modes.remove");
        newPoint.setName("structure.modes.newPoint");
        addPoint.setName("structure.modes.addPoint");
        asModes.setName("structure.modes.asModes");
        asModes.setToolTipText("One mode at one point (\"absorber point\"), the effective modal mass m/\u03c6\u00b2 there:"
                + " then add modes and points");
        excitation.setName("structure.modes.excitation");
        response.setName("structure.modes.response");
        absorberPoint.setName("structure.modes.absorberPoint");
        count.setName("structure.modes.count");
        tuning.setName("structure.modes.tuning");
        target.setName("structure.modes.target");
        arrangement.setName("structure.modes.points");
        problem.setName("structure.modes.problem");
        problem.setForeground(new Color(0xB0, 0x20, 0x20));
        ItemWords.show(tuning, AbsorberSetTuning.class, t -> t == AbsorberSetTuning.UNIFORM
                ? "uniform spread" : "each its own");
        scroll.setPreferredSize(new Dimension(560, 96));
        heading.setFont(heading.getFont().deriveFont(Font.BOLD));
        panel.setBorder(BorderFactory.createEmptyBorder(0, 12, 0, 0)); // in line with the form's headings
        panel.add(heading, BorderLayout.NORTH);
        panel.add(scroll, BorderLayout.CENTER);
        panel.add(controls(), BorderLayout.SOUTH);
        panel.setVisible(false);
        listen();
    }

    private JPanel controls() {
        JPanel out = new JPanel();
        out.setLayout(new BoxLayout(out, BoxLayout.Y_AXIS));
        modesParts.add(scroll);
        modesParts.add(line(addMode, removeMode, labelled("New point", newPoint), addPoint));
        modesParts.add(line(labelled("Force at", excitation), labelled("Response at", response)));
        modesParts.add(line(labelled("Absorbers", count), labelled("at", absorberPoint), labelled("tuned", tuning)));
        modesParts.add(line(labelled("Fitted to", target)));
        modesParts.add(line(arrangement));
        modesParts.subList(1, modesParts.size()).forEach(out::add);
        asModesLine = line(asModes);
        out.add(asModesLine);
        out.add(line(problem));
        return out;
    }

    private void listen() {
        model.onTyped((row, column, text) -> change("structure.modes.cell",
                p -> ModesEdits.withCell(p, row, column, text, Locale.getDefault(Locale.Category.FORMAT))));
        addMode.addActionListener(e -> change("structure.modes.add", ModesEdits::withModeAdded));
        asModes.addActionListener(e -> change("structure.modes.asModes", p -> {
            if (!singleModeTyped.getAsBoolean()) {
                throw InvalidInputException.unusable("Describe the structure by its modes", "a field above is not a"
                        + " number yet", "correct it first");
            }
            return ModesEdits.asModes(p);
        }));
        removeMode.addActionListener(e -> {
            int row = table.getSelectedRow();
            change("structure.modes.remove", p -> {
                if (row < 0) {
                    throw InvalidInputException.unusable("Remove a mode", "no mode is selected",
                            "click the mode's row first");
                }
                return ModesEdits.withModeRemoved(p, row);
            });
        });
        Runnable pointAdded = () -> change("structure.modes.addPoint",
                p -> ModesEdits.withPointAdded(p, newPoint.getText()));
        addPoint.addActionListener(e -> pointAdded.run());
        newPoint.addActionListener(e -> pointAdded.run());
        excitation.addActionListener(e -> change("structure.modes.excitation",
                p -> ModesEdits.withPoints(p, picked(excitation), p.modes().responsePoint())));
        response.addActionListener(e -> change("structure.modes.response",
                p -> ModesEdits.withPoints(p, p.modes().excitationPoint(), picked(response))));
        absorberPoint.addActionListener(e -> absorbersChanged("structure.modes.absorberPoint"));
        tuning.addActionListener(e -> absorbersChanged("structure.modes.tuning"));
        target.addActionListener(e -> absorbersChanged("structure.modes.target"));
        count.addChangeListener(e -> absorbersChanged("structure.modes.count"));
    }

    private void absorbersChanged(String key) {
        change(key, p -> ModesEdits.withAbsorbers(p, (Integer) count.getValue(), (AbsorberSetTuning) tuning
                .getSelectedItem(), picked(absorberPoint), target.getSelectedIndex() <= 0 ? null : picked(target)));
    }

    /** Makes the change from the project shown; a refusal is said under the table, which keeps what it had. */
    private void change(String key, UnaryOperator<Project> edit) {
        if (filling || shown == null) {
            return;
        }
        Project next;
        try {
            next = edit.apply(shown);
        } catch (InvalidInputException e) {
            Project keep = shown;
            shown = null;
            show(keep);
            problem.setText(wrapped(e.getMessage()));
            return;
        }
        problem.setText(" ");
        if (key.equals("structure.modes.addPoint")) {
            newPoint.setText("");
        }
        commit.accept(() -> ProjectEdits.modes(key, next));
    }

    JPanel component() {
        return panel;
    }

    /**
     * @param p the project: its modes shown, or, when it gives its structure as one mode, only the
     *     button that describes it by its modes
     */
    void show(Project p) {
        if (!p.equals(shown)) {
            problem.setText(" ");
        }
        shown = p;
        boolean given = p.modes() != null;
        panel.setVisible(true);
        modesParts.forEach(c -> c.setVisible(given));
        asModesLine.setVisible(!given);
        heading.setText(given ? "The structure's modes (double-click a cell to change it)"
                : "Several modes, named points or several absorbers?");
        if (!given) {
            return;
        }
        if (table.isEditing() && !model.storing()) {
            table.getCellEditor().cancelCellEditing();
        }
        filling = true;
        try {
            model.update(ModesEdits.headings(p.modes(), p.displayUnits()),
                    ModesEdits.rows(p.modes(), p.displayUnits(), Locale.getDefault(Locale.Category.FORMAT)));
            fitRows(model.getRowCount());
            List<String> points = ModesEdits.points(p.modes());
            fill(excitation, points, p.modes().excitationPoint());
            fill(response, points, p.modes().responsePoint());
            AbsorbersInput a = p.absorbers() == null ? new AbsorbersInput(1, AbsorberSetTuning.UNIFORM, null, null)
                    : p.absorbers();
            fill(absorberPoint, points, a.point());
            count.setValue(a.count());
            tuning.setSelectedItem(a.tuning());
            List<String> targets = new ArrayList<>(List.of(NEAREST));
            p.modes().modes().forEach(m -> targets.add(m.name()));
            // with one absorber per mode the single-mode sections take the first of its modes by default
            fill(target, targets, a.targetMode() != null ? a.targetMode() : a.onePerMode() ? a.modes().get(0) : NEAREST);
            absorberControls.forEach(c -> c.setEnabled(!a.onePerMode()));
            arrangement.setText(a.onePerMode() ? wrapped("One absorber per mode, as the file gives them: "
                    + String.join(" and ", a.modes()) + (a.points().isEmpty() ? "" : " at " + String.join(" and ",
                            a.points())) + " (their count, tuning and points are not edited here)") : " ");
            removeMode.setEnabled(p.modes().modes().size() > 1);
        } finally {
            filling = false;
        }
    }

    /** Every mode in view without scrolling, up to {@link #ROWS_IN_VIEW}; the page scrolls past that. */
    private void fitRows(int rows) {
        int height = table.getTableHeader().getPreferredSize().height + table.getRowHeight()
                * Math.max(2, Math.min(rows, ROWS_IN_VIEW)) + 6;
        if (scroll.getPreferredSize().height != height) {
            scroll.setPreferredSize(new Dimension(560, height));
            panel.revalidate();
        }
    }

    /** @return the rows as shown (tests) */
    List<List<String>> rows() {
        return shownRows(model);
    }

    /** @return the message under the table, or blank (tests) */
    String problem() {
        return problem.getText();
    }

    /**
     * @param model a table's model
     * @return its cells as shown, row by row (what the tests compare)
     */
    static List<List<String>> shownRows(TableModel model) {
        List<List<String>> out = new ArrayList<>();
        for (int r = 0; r < model.getRowCount(); r++) {
            List<String> row = new ArrayList<>();
            for (int c = 0; c < model.getColumnCount(); c++) {
                row.add(String.valueOf(model.getValueAt(r, c)));
            }
            out.add(row);
        }
        return out;
    }

    private static void fill(JComboBox<String> combo, List<String> items, String selected) {
        boolean same = combo.getItemCount() == items.size();
        for (int i = 0; same && i < items.size(); i++) {
            same = items.get(i).equals(combo.getItemAt(i));
        }
        if (!same) {
            combo.removeAllItems();
            items.forEach(combo::addItem);
        }
        combo.setSelectedItem(selected);
        if (selected == null) {
            combo.setSelectedIndex(-1);
        }
    }

    private static String picked(JComboBox<String> combo) {
        return (String) combo.getSelectedItem();
    }

    private static String wrapped(String message) {
        return "<html><div style='width:560px'>" + Html.escape(PlainText.escape(message)) + "</div></html>";
    }

    private static JPanel labelled(String words, JComponent field) {
        JPanel p = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        JLabel l = new JLabel(words);
        l.setLabelFor(field);
        p.add(l);
        p.add(field);
        return p;
    }

    private static JPanel line(JComponent... parts) {
        JPanel p = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        for (JComponent c : parts) {
            p.add(c);
        }
        p.setAlignmentX(0f);
        return p;
    }
}
