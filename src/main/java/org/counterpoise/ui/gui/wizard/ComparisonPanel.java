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
import org.counterpoise.io.text.ReportComparison;
import org.counterpoise.io.text.ReportKey;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.field.Html;

/**
 * The result step's comparison of design methods, a tab of its own: the {@link ReportTable.Grid} of
 * the report model as a table turned on its side (a column per candidate, the recommended and the
 * chosen one marked in words in the first two rows, the recommended one also in bold), the
 * recommendation, the choice and the notes below it in sentences; and one line for beside the design ({@link #summary()}) saying which method is
 * recommended and whether the design shown is it, so that is never hidden behind the tab. It shows
 * only what it is given; the comparison is computed off the event thread by the design run, and a
 * comparison for an older state never reaches it ({@code ui.gui.task.TaskRunner}).
 */
final class ComparisonPanel {
    private static final String IDLE = "The comparison of methods appears here.";
    private final DefaultTableModel model = new DefaultTableModel() {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    /** Per model column: true for the recommended candidate's (bold). */
    private final List<Boolean> recommended = new ArrayList<>();
    private final JLabel title = new JLabel(" ");
    private final JTextArea sentences = wrapped("result.comparison.notes");
    private final JTextArea summary = wrapped("result.recommendation");
    private final JPanel panel = new JPanel(new BorderLayout(0, 6));
    /** One column per candidate; scrolled sideways when the tab is narrower than they are. */
    private final JTable table = new JTable(model);
    /** The figures' names, the same model's first column, held still while the candidates scroll sideways. */
    private final JTable methods = new JTable(model);
    private final JScrollPane tableScroll = new JScrollPane(table);

    ComparisonPanel() {
        table.setName("result.comparison");
        methods.setName("result.comparison.methods");
        DefaultTableCellRenderer renderer = new DefaultTableCellRenderer() {
            @Override
            public Component getTableCellRendererComponent(JTable t, Object value, boolean selected, boolean focus,
                    int row, int column) {
                JLabel l = (JLabel) super.getTableCellRendererComponent(t, value, selected, focus, row, column);
                int m = t.convertColumnIndexToModel(column);
                boolean best = m < recommended.size() && recommended.get(m);
                l.setFont(l.getFont().deriveFont(best ? Font.BOLD : Font.PLAIN));
                l.setHorizontalAlignment(t.convertColumnIndexToModel(column) == 0 ? LEFT : RIGHT);
                l.setToolTipText(value == null || value.toString().isEmpty() ? null : value.toString());
                return l;
            }
        };
        for (JTable t : List.of(table, methods)) {
            // columns as wide as their widest cell
            t.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
            t.setRowHeight(t.getRowHeight() + 6);
            t.setDefaultRenderer(Object.class, renderer);
        }
        methods.setSelectionModel(table.getSelectionModel());
        methods.getTableHeader().setReorderingAllowed(false);
        tableScroll.setRowHeaderView(methods);
        tableScroll.setCorner(JScrollPane.UPPER_LEFT_CORNER, methods.getTableHeader());
        title.setName("result.comparison.title");
        title.setFont(title.getFont().deriveFont(Font.BOLD));
        title.setBorder(BorderFactory.createEmptyBorder(4, 4, 0, 4));
        sentences.setFont(table.getFont());
        JScrollPane notesScroll = new JScrollPane(sentences);
        notesScroll.setBorder(null);
        notesScroll.setHorizontalScrollBarPolicy(JScrollPane.HORIZONTAL_SCROLLBAR_NEVER);
        JPanel top = new JPanel(new BorderLayout(0, 4));
        top.add(title, BorderLayout.NORTH);
        top.add(tableScroll, BorderLayout.CENTER);
        // the table as tall as its rows (a handful), the sentences take the rest of the tab
        panel.add(top, BorderLayout.NORTH);
        panel.add(notesScroll, BorderLayout.CENTER);
        panel.setMinimumSize(new Dimension(300, 120));
        summary.setToolTipText("The method comparison is on the tab \u201cComparison of methods\u201d.");
        message(IDLE);
    }

    private static JTextArea wrapped(String name) {
        JTextArea area = new JTextArea();
        area.setName(name);
        area.setEditable(false);
        area.setLineWrap(true);
        area.setWrapStyleWord(true);
        area.setOpaque(false);
        area.setBorder(BorderFactory.createEmptyBorder(2, 4, 2, 4));
        return area;
    }

    /** @return the panel (the tab's content) */
    JComponent component() {
        return panel;
    }

    /** @return the one line for beside the design: the recommended method and whether the design shown is it */
    JComponent summary() {
        return summary;
    }

    /**
     * Shows a comparison with one column per candidate and one row per figure, so a figure (the worst
     * case the recommendation rests on) reads across the methods; the first row says in words which
     * candidate is recommended and which chosen.
     *
     * @param comparison the comparison of the design on screen
     */
    void show(ReportComparison comparison) {
        ReportTable.Grid grid = ReportTable.comparison(comparison);
        // the title wraps (an HTML label) rather than being cut off
        title.setText(Html.label(grid.title()));
        int method = methodColumn(comparison);
        List<ReportComparison.Line> lines = comparison.lines();
        List<String> headings = new ArrayList<>();
        headings.add("Figure");
        lines.forEach(l -> headings.add(l.methodId()));
        List<Object[]> rows = new ArrayList<>();
        Object[] isRecommended = new Object[lines.size() + 1];
        Object[] isChosen = new Object[lines.size() + 1];
        isRecommended[0] = "Recommended";
        isChosen[0] = "Design shown";
        for (int i = 0; i < lines.size(); i++) {
            isRecommended[i + 1] = lines.get(i).recommended() ? "yes" : "";
            isChosen[i + 1] = lines.get(i).chosen() ? "yes" : "";
        }
        rows.add(isRecommended);
        rows.add(isChosen);
        for (int c = 0; c < grid.headings().size(); c++) {
            if (c == method) {
                continue;
            }
            Object[] row = new Object[lines.size() + 1];
            row[0] = grid.headings().get(c);
            for (int i = 0; i < lines.size(); i++) {
                row[i + 1] = ValueText.pretty(grid.cells().get(i).get(c));
            }
            rows.add(row);
        }
        recommended.clear();
        recommended.add(false);
        recommended.addAll(grid.recommended());
        model.setDataVector(rows.toArray(Object[][]::new), headings.toArray());
        sentences.setText(String.join("\n\n", grid.sentences().stream().map(s -> "\u2022 " + s).toList()));
        sentences.setCaretPosition(0);
        summary.setText(comparison.chosen());
        summary.setCaretPosition(0);
        packColumns();
        fitRows();
    }

    /** @return the method column's place among the tabled columns */
    private static int methodColumn(ReportComparison comparison) {
        int at = 0;
        for (ReportComparison.Column col : comparison.columns()) {
            if (col.key() == ReportKey.METHOD) {
                return at;
            }
            at += col.tabled() ? 1 : 0;
        }
        throw new IllegalStateException("bug: a comparison without its method column");
    }

    /** Splits the columns between the two tables (method still, figures scrolling) and sizes them to their cells. */
    private void packColumns() {
        while (methods.getColumnCount() > 1) {
            methods.removeColumn(methods.getColumnModel().getColumn(1));
        }
        if (table.getColumnCount() > 0) {
            table.removeColumn(table.getColumnModel().getColumn(0));
        }
        pack(table);
        pack(methods);
        methods.setPreferredScrollableViewportSize(new Dimension(methods.getPreferredSize().width,
                methods.getPreferredSize().height));
    }

    private static void pack(JTable t) {
        for (int c = 0; c < t.getColumnCount(); c++) {
            int width = t.getTableHeader().getDefaultRenderer()
                    .getTableCellRendererComponent(t, t.getColumnName(c), false, false, -1, c)
                    .getPreferredSize().width;
            for (int r = 0; r < t.getRowCount(); r++) {
                width = Math.max(width, t.prepareRenderer(t.getCellRenderer(r, c), r, c).getPreferredSize().width);
            }
            t.getColumnModel().getColumn(c).setPreferredWidth(width + 16);
            t.getColumnModel().getColumn(c).setWidth(width + 16);
        }
    }

    /** The table's pane as tall as its header, its rows and a sideways scroll bar. */
    private void fitRows() {
        int header = table.getTableHeader().getPreferredSize().height;
        int bar = tableScroll.getHorizontalScrollBar().getPreferredSize().height;
        int height = header + Math.max(1, table.getRowCount()) * table.getRowHeight() + bar + 6;
        tableScroll.setPreferredSize(new Dimension(560, height));
        tableScroll.revalidate();
    }

    /** @param text why no comparison is shown (being computed, inputs to fix, failed) */
    void message(String text) {
        title.setText("Comparison of methods");
        recommended.clear();
        model.setDataVector(new Object[0][0], new Object[0]);
        packColumns();
        sentences.setText(text);
        summary.setText(text);
        fitRows();
    }

    /** @return the table's model (for tests) */
    DefaultTableModel model() {
        return model;
    }
}
