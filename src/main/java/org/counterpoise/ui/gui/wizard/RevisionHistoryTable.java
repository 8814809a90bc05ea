package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.ListSelectionModel;
import javax.swing.event.TableModelEvent;
import javax.swing.table.DefaultTableModel;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.project.Revision;
import org.counterpoise.ui.gui.Themes;

/**
 * The sheet's revision history as a small table, oldest first: mark, date, what changed and by
 * whom, each cell edited in place; Add appends a row, Remove deletes the selected one. Every
 * change is one edit of the project (through the owner's callback); a date that is not a calendar
 * date is said under the table and nothing is saved until it is one.
 */
final class RevisionHistoryTable extends JPanel {
    private static final String[] COLUMNS = {"Rev.", "Date", "What changed", "By"};
    private final DefaultTableModel model = new DefaultTableModel(COLUMNS, 0);
    private final JTable table = new JTable(model);
    private final JLabel problem = new JLabel(" ");
    private boolean showing;

    /** @param changed told with the edit's key after every change made by the user */
    RevisionHistoryTable(Consumer<String> changed) {
        super(new BorderLayout(0, 2));
        setName("identity.revisions.panel");
        table.setName("identity.revisions");
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.putClientProperty("terminateEditOnFocusLost", Boolean.TRUE);
        table.setSurrendersFocusOnKeystroke(true);
        table.getColumnModel().getColumn(0).setPreferredWidth(40);
        table.getColumnModel().getColumn(1).setPreferredWidth(140);
        table.getColumnModel().getColumn(2).setPreferredWidth(230);
        table.getColumnModel().getColumn(3).setPreferredWidth(90);
        table.setToolTipText("Earlier issues of the sheet, oldest first; dates as YYYY-MM-DD; double-click a cell to edit it");
        JScrollPane scroll = new JScrollPane(table);
        scroll.setPreferredSize(new Dimension(500, 6 * table.getRowHeight() + 28));
        problem.setName("identity.revisions.message");
        problem.setForeground(Themes.problemColour());
        JButton add = new JButton("Add a revision");
        add.setName("identity.revisions.add");
        add.setMnemonic('a');
        add.addActionListener(e -> {
            stopEditing();
            model.addRow(new Object[] {"", "", "", ""});
            int row = model.getRowCount() - 1;
            table.getSelectionModel().setSelectionInterval(row, row);
            table.editCellAt(row, 0);
            table.requestFocusInWindow();
            changed.accept("identity.revisions.add");
        });
        JButton remove = new JButton("Remove");
        remove.setName("identity.revisions.remove");
        remove.setMnemonic('m');
        remove.setToolTipText("Removes the selected revision");
        remove.addActionListener(e -> {
            int row = table.getSelectedRow();
            if (row >= 0) {
                stopEditing();
                model.removeRow(table.convertRowIndexToModel(row));
                changed.accept("identity.revisions.remove");
            }
        });
        model.addTableModelListener(e -> {
            if (!showing && e.getType() == TableModelEvent.UPDATE) {
                changed.accept("identity.revisions[" + e.getFirstRow() + "]." + e.getColumn());
            }
        });
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        buttons.add(add);
        buttons.add(remove);
        JPanel south = new JPanel(new BorderLayout());
        south.add(buttons, BorderLayout.NORTH);
        south.add(problem, BorderLayout.SOUTH);
        add(scroll, BorderLayout.CENTER);
        add(south, BorderLayout.SOUTH);
    }

    private void stopEditing() {
        if (table.isEditing()) {
            table.getCellEditor().stopCellEditing();
        }
    }

    /**
     * @return the revisions as shown, oldest first
     * @throws InvalidInputException for a date that is not a calendar date (said under the table)
     */
    List<Revision> revisions() {
        List<Revision> out = new ArrayList<>();
        for (int i = 0; i < model.getRowCount(); i++) {
            try {
                out.add(new Revision(cell(i, 0), cell(i, 1), cell(i, 2), cell(i, 3)));
            } catch (InvalidInputException e) {
                problem.setText("Revision " + (i + 1) + ": " + e.problem());
                throw e;
            }
        }
        problem.setText(" ");
        return out;
    }

    private String cell(int row, int column) {
        Object v = model.getValueAt(row, column);
        return v == null ? "" : v.toString();
    }

    /**
     * Shows the project's revisions unless the table already holds them (so a cell being typed in
     * keeps its text).
     * @param history the revisions
     * @param always true to show them even when the table holds a bad date (a project just loaded)
     */
    void show(List<Revision> history, boolean always) {
        List<Revision> shown;
        try {
            shown = revisions();
        } catch (InvalidInputException e) {
            if (!always) {
                return;
            }
            shown = null;
        }
        if (history.equals(shown)) {
            return;
        }
        showing = true;
        try {
            stopEditing();
            model.setRowCount(0);
            for (Revision r : history) {
                model.addRow(new Object[] {r.mark(), r.date(), r.description(), r.by()});
            }
            problem.setText(" ");
        } finally {
            showing = false;
        }
    }

    /** @return the table, for tests */
    JTable table() {
        return table;
    }
}
