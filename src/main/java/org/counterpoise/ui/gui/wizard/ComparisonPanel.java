package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.DefaultTableModel;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.ValueText;

/**
 * The result step's comparison of design methods: the {@link ReportTable.Grid} of the report model
 * as a table (the recommended line in bold), its recommendation and notes below it. It shows only
 * what it is given; the comparison is computed off the event thread by the design run, and a
 * comparison for an older state never reaches it ({@code ui.gui.task.TaskRunner}).
 */
final class ComparisonPanel {
    private final DefaultTableModel model = new DefaultTableModel() {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final List<Boolean> recommended = new ArrayList<>();
    private final JLabel title = new JLabel(" ");
    private final JTextArea sentences = new JTextArea();
    private final JPanel panel = new JPanel(new BorderLayout(0, 4));
    private final JTable table = new JTable(model);

    ComparisonPanel() {
        table.setName("result.comparison");
        // columns as wide as their widest cell, scrolled sideways when the pane is narrow
        table.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
        table.setRowHeight(table.getRowHeight() + 4);
        table.setDefaultRenderer(Object.class, new DefaultTableCellRenderer() {
            @Override
            public Component getTableCellRendererComponent(JTable t, Object value, boolean selected, boolean focus,
                    int row, int column) {
                JLabel l = (JLabel) super.getTableCellRendererComponent(t, value, selected, focus, row, column);
                int m = t.convertRowIndexToModel(row);
                boolean best = m < recommended.size() && recommended.get(m);
                l.setFont(l.getFont().deriveFont(best ? Font.BOLD : Font.PLAIN));
                l.setHorizontalAlignment(column == 0 ? LEFT : RIGHT);
                l.setToolTipText(value == null || value.toString().isEmpty() ? null : value.toString());
                return l;
            }
        });
        title.setName("result.comparison.title");
        title.setFont(title.getFont().deriveFont(Font.BOLD));
        sentences.setName("result.comparison.notes");
        sentences.setEditable(false);
        sentences.setLineWrap(true);
        sentences.setWrapStyleWord(true);
        sentences.setOpaque(false);
        sentences.setBorder(BorderFactory.createEmptyBorder(2, 4, 2, 4));
        JScrollPane tableScroll = new JScrollPane(table);
        tableScroll.setPreferredSize(new Dimension(560, 150));
        JScrollPane notesScroll = new JScrollPane(sentences);
        notesScroll.setBorder(null);
        notesScroll.setPreferredSize(new Dimension(560, 90));
        panel.add(title, BorderLayout.NORTH);
        panel.add(tableScroll, BorderLayout.CENTER);
        panel.add(notesScroll, BorderLayout.SOUTH);
        panel.setMinimumSize(new Dimension(300, 120));
        message("The comparison of methods appears here.");
    }

    /** @return the panel */
    JComponent component() {
        return panel;
    }

    /** @param grid the comparison of the design on screen */
    void show(ReportTable.Grid grid) {
        // the title wraps (an HTML label) rather than being cut off
        title.setText("<html>" + grid.title().replace("&", "&amp;").replace("<", "&lt;") + "</html>");
        recommended.clear();
        recommended.addAll(grid.recommended());
        model.setDataVector(grid.cells().stream().map(r -> r.stream().map(ValueText::pretty).toArray())
                .toArray(Object[][]::new), grid.headings().toArray());
        sentences.setText(String.join("\n", grid.sentences().stream().map(s -> "\u2022 " + s).toList()));
        sentences.setCaretPosition(0);
        packColumns();
    }

    private void packColumns() {
        for (int c = 0; c < table.getColumnCount(); c++) {
            int width = table.getTableHeader().getDefaultRenderer()
                    .getTableCellRendererComponent(table, table.getColumnName(c), false, false, -1, c)
                    .getPreferredSize().width;
            for (int r = 0; r < table.getRowCount(); r++) {
                width = Math.max(width, table.prepareRenderer(table.getCellRenderer(r, c), r, c).getPreferredSize().width);
            }
            table.getColumnModel().getColumn(c).setPreferredWidth(width + 14);
        }
    }

    /** @param text why no comparison is shown (being computed, inputs to fix, failed) */
    void message(String text) {
        title.setText("Method comparison");
        recommended.clear();
        model.setDataVector(new Object[0][0], new Object[0]);
        sentences.setText(text);
    }

    /** @return the table's model (for tests) */
    DefaultTableModel model() {
        return model;
    }
}
