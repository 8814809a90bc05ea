package org.counterpoise.ui.gui.wizard;

import static org.counterpoise.core.units.Dimension.FREQUENCY;
import static org.counterpoise.core.units.Dimension.MASS;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.table.DefaultTableModel;
import javax.swing.table.TableModel;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.system.Mode;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitSystem;

/**
 * The structure step's read-only table of a project's modes (structure.modes in the file): each
 * mode's name, natural frequency, damping ratio, modal mass and mode-shape value at each named point,
 * and where the force acts, the response is taken and the absorbers sit. Not edited here: the file
 * gives them.
 */
final class ModesTable {
    private final DefaultTableModel model = new DefaultTableModel() {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTable table = new JTable(model);
    private final JLabel points = new JLabel(" ");
    private final JPanel panel = new JPanel(new BorderLayout(0, 4));

    ModesTable() {
        table.setName("structure.modes");
        points.setName("structure.modes.points");
        JScrollPane scroll = new JScrollPane(table);
        scroll.setPreferredSize(new Dimension(520, 110));
        JLabel heading = new JLabel("The structure's modes (from the project file, not edited here)");
        heading.setFont(heading.getFont().deriveFont(Font.BOLD));
        panel.add(heading, BorderLayout.NORTH);
        panel.add(scroll, BorderLayout.CENTER);
        panel.add(points, BorderLayout.SOUTH);
        panel.setVisible(false);
    }

    JPanel component() {
        return panel;
    }

    /** @param p the project: its modes shown, or the table hidden when it gives one mode */
    void show(Project p) {
        model.setRowCount(0);
        Optional<AbsorberLayout> layout;
        try {
            layout = p.modes() == null ? Optional.empty() : SeveralModes.layout(p);
        } catch (InvalidInputException bad) {
            panel.setVisible(true);
            model.setColumnCount(0);
            points.setText("The modes cannot be read: " + bad.getMessage());
            return;
        }
        panel.setVisible(layout.isPresent());
        if (layout.isEmpty()) {
            return;
        }
        AbsorberLayout l = layout.get();
        UnitSystem units = p.displayUnits();
        List<Mode> modes = l.structure().modes();
        TreeSet<String> named = new TreeSet<>();
        modes.forEach(m -> named.addAll(m.shape().keySet()));
        List<String> heads = new ArrayList<>(List.of("Mode", "Natural frequency", "Damping ratio", "Modal mass"));
        named.forEach(point -> heads.add("\u03c6 at " + point));
        model.setColumnIdentifiers(heads.toArray());
        for (int r = 0; r < modes.size(); r++) {
            Mode m = modes.get(r);
            List<String> row = new ArrayList<>(List.of(l.modeNames().get(r),
                    DisplayUnits.format(m.naturalFrequency(), FREQUENCY, units),
                    QuantityFormat.number(m.dampingRatio(), QuantityFormat.FIGURES),
                    DisplayUnits.format(m.modalMass(), MASS, units)));
            named.forEach(point -> row.add(m.shape().containsKey(point)
                    ? QuantityFormat.number(m.shapeAt(point), QuantityFormat.FIGURES) : "\u2013"));
            model.addRow(row.toArray());
        }
        points.setText("Force at " + l.excitationPoint() + ", response at " + l.responsePoint() + ", " + l.joint()
                .map(j -> "one absorber per mode: " + l.modeNames().get(j.modes().get(0)) + " at " + j.points().get(0)
                        + ", " + l.modeNames().get(j.modes().get(1)) + " at " + j.points().get(1))
                .orElse("absorbers at " + l.absorberPoint()) + ".");
    }

    /** @return the rows as shown (tests) */
    List<List<String>> rows() {
        return shownRows(model);
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
}
