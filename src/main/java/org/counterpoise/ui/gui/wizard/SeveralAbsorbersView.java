package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import javax.swing.BorderFactory;
import javax.swing.DefaultComboBoxModel;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.table.DefaultTableModel;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.criteria.Acceptance;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.chart.ChartTheme;
import org.counterpoise.io.chart.SeveralAbsorbersCharts;
import org.counterpoise.io.text.AbsorbersToBuildContent;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.field.Html;
import org.counterpoise.ui.gui.plot.ChartHost;
import org.knowm.xchart.XYChart;

/**
 * The result step's tab for a project with several modes or absorbers: each absorber to build (a
 * table, the rows of the sheet's "Absorbers to build") and the response of the whole structure
 * without and with them, with each mode's part, at the response point or any other named point (a
 * chart per point, chosen in a list). It shows only what it is given: the design run computes
 * {@link Shown} off the event thread (every point's chart, so a choice only swaps them), and one for
 * an older state never reaches it.
 */
final class SeveralAbsorbersView {
    /** Said when the project has one mode and one absorber. */
    static final String NONE = "This project has one mode and one absorber: the design is on the Steady state tab.";
    private final DefaultTableModel model = new DefaultTableModel() {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTable table = new JTable(model);
    private final JLabel summary = new JLabel(NONE);
    private final ChartHost chart = new ChartHost("chart.several");
    private final JComboBox<String> point = new JComboBox<>();
    /** The charts of what is shown, by point; empty when nothing is. */
    private Map<String, XYChart> charts = Map.of();
    private final JPanel panel = new JPanel(new BorderLayout(0, 6));
    /** True unless the tab says the project has one mode and one absorber. */
    private boolean showing;

    /**
     * What the tab shows, computed off the event thread.
     *
     * @param build the absorbers to build with their tolerance within the set
     * @param table their table in the display units
     * @param summary the peaks over the band before and after, in words
     * @param charts the response before and after and each mode's part, by point: the response point
     *     first, then the structure's other named points in alphabetical order
     */
    record Shown(AbsorbersToBuild build, ReportTable.Grid table, String summary,
            Map<String, XYChart> charts, Optional<Acceptance> acceptance) {
        /** Copies the charts, keeping their order. */
        Shown {
            charts = Collections.unmodifiableMap(new LinkedHashMap<>(charts));
        }

        /** @return the chart at the response point */
        XYChart chart() {
            return charts.values().iterator().next();
        }

        /**
         * @param design the design on the target mode
         * @param layout the project's modes and absorbers
         * @param units the display units
         * @param theme the chart's colours
         * @return the tab's content (several seconds at most: off the event thread)
         */
        static Shown of(DesignResult design, AbsorberLayout layout, UnitSystem units,
                ChartTheme theme) {
            SeveralAbsorbers set = SeveralAbsorbersDesigner.design(design, layout);
            AbsorbersToBuild build = AbsorbersToBuild.of(design, set);
            ReportTable.Grid grid = ReportTable.grid(AbsorbersToBuildContent.table(build), units).orElseThrow();
            String where = set.joint().isPresent() ? ", one per mode, designed jointly, at " + String.join(" and ",
                    set.absorbers().stream().map(PointAbsorber::point).toList()) : " at " + layout.absorberPoint();
            String words = set.absorbers().size() + (set.absorbers().size() == 1 ? " absorber" : " absorbers")
                    + where + "; peak displacement over the band at "
                    + layout.responsePoint() + ": " + DisplayUnits.format(set.peakBefore(), Dimension.LENGTH, units)
                    + " without, " + DisplayUnits.format(set.peakAfter(), Dimension.LENGTH, units) + " with them"
                    + set.robust().map(r -> "; designed for the least worst peak over the ranges: "
                            + DisplayUnits.format(r.set().worstPeak(), Dimension.LENGTH, units) + " at worst ("
                            + (set.joint().isPresent() ? "each absorber designed on its own mode alone: "
                            : "one absorber of the same total mass: ")
                            + DisplayUnits.format(r.alternative().worstPeak(), Dimension.LENGTH, units) + ")")
                    .orElseGet(() -> set.gain().map(g -> " (one absorber of the same total mass: "
                            + DisplayUnits.format(set.single().orElseThrow().peak(), Dimension.LENGTH, units) + ")")
                            .orElse("") + set.joint().map(q -> " (each absorber designed on its own mode alone: "
                            + DisplayUnits.format(q.peak(), Dimension.LENGTH, units) + ")").orElse(""))
                    + set.spillover().map(l -> l.met() ? "; the peak near each other mode within "
                            + DisplayUnits.format(l.ratio(), Dimension.RATIO, units) + " times its peak without absorbers (absorbers.spillover_limit), as"
                            + " asked" : "; spillover limit NOT kept: no design found keeps the peak near each other mode"
                            + " within " + DisplayUnits.format(l.ratio(), Dimension.RATIO, units) + " times its peak without absorbers").orElse("")
                    + (set.certified() ? "" : "; the optimum is NOT certified (the best design seen is shown)") + ".";
            Map<String, XYChart> charts = new LinkedHashMap<>();
            charts.put(layout.responsePoint(), SeveralAbsorbersCharts.response(set, units, theme, 640, 380));
            for (String other : new TreeSet<>(layout.structure().points())) {
                charts.putIfAbsent(other, SeveralAbsorbersCharts.response(set, other, units, theme, 640, 380));
            }
            // the criterion judged on the whole structure (as design and sheet judge it)
            return new Shown(build, grid, words, charts, set.acceptance(design.study()));
        }
    }

    SeveralAbsorbersView() {
        table.setName("result.several");
        table.setAutoResizeMode(JTable.AUTO_RESIZE_ALL_COLUMNS);
        summary.setName("result.several.summary");
        summary.setBorder(BorderFactory.createEmptyBorder(4, 4, 4, 4));
        JScrollPane scroll = new JScrollPane(table);
        point.setName("result.several.point");
        point.addActionListener(e -> {
            XYChart c = charts.get((String) point.getSelectedItem());
            if (c != null) {
                chart.show(c);
            }
        });
        JPanel chartPanel = new JPanel(new BorderLayout(0, 4));
        JPanel choice = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 0));
        JLabel label = new JLabel("Displacement at");
        label.setLabelFor(point);
        choice.add(label);
        choice.add(point);
        chartPanel.add(choice, BorderLayout.NORTH);
        chartPanel.add(chart, BorderLayout.CENTER);
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, scroll, chartPanel);
        split.setResizeWeight(0.3);
        split.setBorder(null);
        panel.add(summary, BorderLayout.NORTH);
        panel.add(split, BorderLayout.CENTER);
        none();
    }

    JPanel component() {
        return panel;
    }

    /** The project has one mode and one absorber. */
    void none() {
        showing = false;
        clear(NONE);
        chart.message(NONE);
    }

    /** The inputs changed: what is on screen is for the old inputs, gone at once (kept only when it says none). */
    void stale() {
        if (showing) {
            computing();
        }
    }

    /** The inputs changed, or the absorbers are being computed: nothing old stays on screen. */
    void computing() {
        showing = true;
        clear("Designing the absorbers on the whole structure\u2026");
        chart.message(" ");
    }

    /** @param why what went wrong, in plain words */
    void failed(String why) {
        showing = true;
        clear(why);
        chart.message(" ");
    }

    /** @param s the new content */
    void show(Shown s) {
        showing = true;
        model.setRowCount(0);
        model.setColumnIdentifiers(s.table().headings().toArray());
        for (List<String> row : s.table().cells()) {
            model.addRow(row.stream().map(ValueText::pretty).toArray());
        }
        // wrapped to the tab's width: the sentence is longer than the table is wide
        summary.setText(Html.label(s.summary()));
        charts = s.charts();
        point.setModel(new DefaultComboBoxModel<>(charts.keySet().toArray(new String[0])));
        point.setEnabled(true);
        chart.show(s.chart());
    }

    /** @return the table's rows as shown (tests) */
    List<List<String>> rows() {
        return ModesTable.shownRows(model);
    }

    private void clear(String words) {
        model.setRowCount(0);
        summary.setText(words);
        charts = Map.of();
        point.setModel(new DefaultComboBoxModel<>());
        point.setEnabled(false);
    }
}
