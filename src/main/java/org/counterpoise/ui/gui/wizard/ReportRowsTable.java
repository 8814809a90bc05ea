package org.counterpoise.ui.gui.wizard;

import java.awt.Component;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.DefaultTableModel;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.ValueText;

/**
 * Sections of the report model as one read-only table of quantity, value and unit: a heading row
 * per section, each row's source and caution under the pointer on its label, and a cell too narrow
 * for its text shown whole under the pointer. The result step's table and the hardware tab's rows.
 */
final class ReportRowsTable {
    /** Each table row's source and caution, shown under the pointer on its label. */
    private final List<String> rowNotes = new ArrayList<>();
    private final DefaultTableModel model = new DefaultTableModel(new String[] {"Quantity", "Value", "Unit"}, 0) {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTable table = new JTable(model);

    /** @param name the table's component name */
    ReportRowsTable(String name) {
        table.setName(name);
        table.setRowHeight(table.getRowHeight() + 4);
        table.getColumnModel().getColumn(0).setPreferredWidth(230);
        table.getColumnModel().getColumn(1).setPreferredWidth(150);
        table.getColumnModel().getColumn(2).setPreferredWidth(60);
        table.setDefaultRenderer(Object.class, wholeUnderPointer(JLabel.LEFT));
        table.getColumnModel().getColumn(0).setCellRenderer(labelWithNote());
        table.getColumnModel().getColumn(1).setCellRenderer(wholeUnderPointer(JLabel.RIGHT));
    }

    /** @param sections the sections to show, in order (replacing what was shown) */
    void show(List<ReportTable.Section> sections) {
        clear();
        for (ReportTable.Section section : sections) {
            model.addRow(new Object[] {"\u2014 " + section.title(), "", ""});
            rowNotes.add("");
            for (ReportTable.Row row : section.rows()) {
                model.addRow(new Object[] {row.label(), row.value(), ValueText.pretty(row.unit())});
                rowNotes.add(row.note());
            }
        }
    }

    /** Empties the table. */
    void clear() {
        model.setRowCount(0);
        rowNotes.clear();
    }

    /** @return the table */
    JTable table() {
        return table;
    }

    /** @return its rows */
    DefaultTableModel model() {
        return model;
    }

    /**
     * @param alignment the text's alignment
     * @return a renderer showing the whole text under the pointer
     */
    static DefaultTableCellRenderer wholeUnderPointer(int alignment) {
        DefaultTableCellRenderer r = new DefaultTableCellRenderer() {
            @Override
            public Component getTableCellRendererComponent(JTable t, Object value, boolean selected,
                    boolean focus, int row, int column) {
                JLabel l = (JLabel) super.getTableCellRendererComponent(t, value, selected, focus, row, column);
                l.setToolTipText(value == null || value.toString().isEmpty() ? null : value.toString());
                return l;
            }
        };
        r.setHorizontalAlignment(alignment);
        return r;
    }

    /** The label cell: under the pointer, the row's source and caution (or the whole label when it has none). */
    private DefaultTableCellRenderer labelWithNote() {
        return new DefaultTableCellRenderer() {
            @Override
            public Component getTableCellRendererComponent(JTable t, Object value, boolean selected,
                    boolean focus, int row, int column) {
                JLabel l = (JLabel) super.getTableCellRendererComponent(t, value, selected, focus, row, column);
                int m = t.convertRowIndexToModel(row);
                String note = m < rowNotes.size() ? rowNotes.get(m) : "";
                String text = value == null ? "" : value.toString();
                l.setToolTipText(!note.isEmpty() ? text + ": " + note : text.isEmpty() ? null : text);
                return l;
            }
        };
    }
}
