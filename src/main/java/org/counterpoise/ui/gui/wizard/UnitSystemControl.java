package org.counterpoise.ui.gui.wizard;

import java.awt.FlowLayout;
import java.util.List;
import javax.swing.ButtonGroup;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JMenuItem;
import javax.swing.JPanel;
import javax.swing.JRadioButtonMenuItem;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.gui.document.DesignDocument;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.field.ItemWords;

/**
 * The unit system every value of the wizard is shown in (result tables, charts' axes, the unit a
 * field offers first): a list under the project's name, on every step, and the same choice in the
 * View menu. It is the project's ({@link Project#displayUnits()}): a pick is one edit of the
 * document (Undo takes it back) and is saved with the project; values typed keep their own units.
 */
final class UnitSystemControl {
    private final DesignDocument document;
    private final JComboBox<UnitSystem> list = new JComboBox<>(UnitSystem.values());
    private final List<JRadioButtonMenuItem> menuItems;
    private final JPanel panel = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
    private boolean showing;

    UnitSystemControl(DesignDocument document) {
        this.document = document;
        list.setName("display.units");
        ItemWords.show(list, UnitSystem.class, UnitSystemControl::words);
        list.setToolTipText("Shows every value in SI or in US customary units; what you type keeps its own unit");
        list.addActionListener(e -> picked((UnitSystem) list.getSelectedItem()));
        // no mnemonic of its own (every letter is taken on some step): the View menu reaches it from the keyboard
        JLabel label = new JLabel("Units");
        label.setLabelFor(list);
        panel.setOpaque(false);
        panel.add(label);
        panel.add(list);
        ButtonGroup group = new ButtonGroup();
        menuItems = List.of(UnitSystem.values()).stream().map(system -> {
            JRadioButtonMenuItem item = new JRadioButtonMenuItem(switch (system) {
                case SI -> "Units: SI (kg, N, mm, Hz)";
                case US_CUSTOMARY -> "Units: US customary (lb, lbf, in, rpm)";
            });
            item.setName("menu.units." + system.id());
            item.addActionListener(e -> picked(system));
            group.add(item);
            return item;
        }).toList();
        menuItems.get(0).setMnemonic('s');
        menuItems.get(1).setMnemonic('u');
        show(document.project());
    }

    static String words(UnitSystem system) {
        return switch (system) {
            case SI -> "SI";
            case US_CUSTOMARY -> "US customary";
        };
    }

    private void picked(UnitSystem system) {
        if (showing || system == null || system == document.project().displayUnits()) {
            return;
        }
        document.seal();
        document.apply(ProjectEdits.displayUnits("display.units", system));
        document.seal();
    }

    /** @param p the project now: the list and the menu show its unit system */
    void show(Project p) {
        showing = true;
        try {
            if (list.getSelectedItem() != p.displayUnits()) {
                list.setSelectedItem(p.displayUnits());
            }
            menuItems.get(p.displayUnits().ordinal()).setSelected(true);
        } finally {
            showing = false;
        }
    }

    /** @return the list with its label, for the window's header */
    JComponent component() {
        return panel;
    }

    /** @return the View menu's items, one per system */
    List<JMenuItem> menuItems() {
        return List.copyOf(menuItems);
    }
}
