package org.counterpoise.ui.gui.wizard;

import java.util.List;
import javax.swing.table.AbstractTableModel;

/**
 * The modes table's cells as text ({@link ModesTable}): a typed cell is handed on, never stored here;
 * the cells change only when the table shows the project again.
 */
final class ModeCells extends AbstractTableModel {
    private List<String> headings = List.of();
    private List<List<String>> rows = List.of();
    private Typed typed = (r, c, t) -> { };
    /** True while a typed value is handed on (the editor is being closed by the table itself). */
    private boolean storing;

    /** What is told when a cell is typed. */
    @FunctionalInterface
    interface Typed {
        /**
         * @param row the row
         * @param column the column
         * @param text what was typed
         */
        void typed(int row, int column, String text);
    }

    /** @param listener told when a cell is typed with text other than it shows */
    void onTyped(Typed listener) {
        typed = listener;
    }

    /** @return true while a typed value is handed on */
    boolean storing() {
        return storing;
    }

    /**
     * @param newHeadings the column headings
     * @param newRows the cells, row by row
     */
    void update(List<String> newHeadings, List<List<String>> newRows) {
        boolean sameColumns = newHeadings.equals(headings);
        headings = List.copyOf(newHeadings);
        rows = List.copyOf(newRows);
        if (sameColumns) {
            fireTableDataChanged(); // the columns keep their widths
        } else {
            fireTableStructureChanged();
        }
    }

    @Override
    public int getRowCount() {
        return rows.size();
    }

    @Override
    public int getColumnCount() {
        return headings.size();
    }

    @Override
    public String getColumnName(int column) {
        return headings.get(column);
    }

    @Override
    public Class<?> getColumnClass(int column) {
        return String.class;
    }

    @Override
    public Object getValueAt(int row, int column) {
        return rows.get(row).get(column);
    }

    @Override
    public boolean isCellEditable(int row, int column) {
        return true;
    }

    @Override
    public void setValueAt(Object value, int row, int column) {
        String text = String.valueOf(value);
        if (text.equals(rows.get(row).get(column))) {
            return;
        }
        storing = true;
        try {
            typed.typed(row, column, text);
        } finally {
            storing = false;
        }
    }
}
