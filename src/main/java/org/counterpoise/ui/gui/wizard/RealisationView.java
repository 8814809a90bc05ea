package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Component;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.logging.Level;
import java.util.logging.Logger;
import javax.swing.BorderFactory;
import javax.swing.Box;
import javax.swing.BoxLayout;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.SwingUtilities;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.DefaultTableModel;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.realisation.HardwareCaution;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.Realiser;
import org.counterpoise.io.text.CautionText;
import org.counterpoise.io.text.HardwareContent;
import org.counterpoise.io.text.ReportContent;
import org.counterpoise.io.text.ReportRow;
import org.counterpoise.io.text.ReportSection;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.ReportValue;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.io.text.WarningText;
import org.counterpoise.ui.gui.Themes;
import org.counterpoise.ui.gui.task.TaskRunner;

/**
 * The result step's Hardware tab: the design turned into parts for the project's hardware choices,
 * in the report's sections (part list, checks, tolerances, trim, the tuning procedure and the
 * predicted table). Sized off the event thread after each design ({@code Realiser.realisation}, kept
 * per choice in the design's dossier); a new design or choice clears the tab at once, and a result
 * for an older state is dropped by the task runner, so it is never shown as current. Each check
 * says passes or fails in words, with a symbol, and in colour.
 */
final class RealisationView {
    private final TaskRunner tasks;
    private final JLabel headline = new JLabel(" ");
    private final JPanel sections = new JPanel();
    private final JComponent page;
    private final JScrollPane scroll;
    /** The sections on screen, for tests (empty while none is current). */
    private List<ReportSection> shown = List.of();
    private HardwareChoice shownChoice;
    private final JButton siteCheck = new JButton("Check on site\u2026");
    private final SiteCheckDialog siteDialog;
    private boolean siteCheckable = true;
    /** The project's modes and absorbers (empty for one of each) and hardware choices, for the site check. */
    private Optional<AbsorberLayout> layout = Optional.empty();
    private HardwareChoice choice = HardwareChoice.DEFAULT;
    private static final String SITE_CHECK_TIP = "Compare an operating spectrum and the response measured with the"
            + " absorber fitted with this design: the absorber as built and the trim plates";

    RealisationView(TaskRunner tasks) {
        this.tasks = tasks;
        siteCheck.setName("hardware.siteCheck");
        siteCheck.setToolTipText(SITE_CHECK_TIP);
        siteCheck.setEnabled(false);
        headline.setName("hardware.headline");
        headline.setFont(headline.getFont().deriveFont(Font.BOLD, headline.getFont().getSize2D() + 1f));
        headline.setBorder(BorderFactory.createEmptyBorder(6, 8, 6, 8));
        sections.setName("hardware.sections");
        sections.setLayout(new BoxLayout(sections, BoxLayout.Y_AXIS));
        sections.setBorder(BorderFactory.createEmptyBorder(0, 8, 8, 8));
        JPanel top = new JPanel(new BorderLayout());
        top.add(sections, BorderLayout.NORTH);
        scroll = new JScrollPane(top);
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        JPanel head = new JPanel(new BorderLayout());
        head.add(headline, BorderLayout.CENTER);
        JPanel action = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 4));
        action.add(siteCheck);
        head.add(action, BorderLayout.EAST);
        JPanel p = new JPanel(new BorderLayout());
        p.add(head, BorderLayout.NORTH);
        p.add(scroll, BorderLayout.CENTER);
        page = p;
        siteDialog = new SiteCheckDialog(p, tasks);
        siteCheck.addActionListener(e -> siteDialog.show());
        message("Fix the inputs to see the hardware.");
    }

    /** @return the tab's page */
    JComponent component() {
        return page;
    }

    /**
     * A new design is on screen: the tab is cleared at once and the hardware sized in the background
     * for the choices it was designed with.
     * @param dossier the design's dossier, or null while no design is valid
     * @param choice the project's hardware choices
     * @param units the project's display unit system (the tables, warnings and procedure are shown in it)
     */
    void design(DesignDossier dossier, HardwareChoice choice, UnitSystem units) {
        design(dossier, choice, units, Optional.empty());
    }

    /**
     * As {@link #design(DesignDossier, HardwareChoice, UnitSystem)}, with the project's modes and
     * absorbers: the site check takes one absorber, or several absorbers at one point (checked against
     * the whole structure); one absorber per mode is not checked yet, so it is not offered then.
     * @param dossier the design's dossier, or null while no design is valid
     * @param choice the project's hardware choices
     * @param units the project's display unit system
     * @param layout the modes and absorbers, empty for one absorber on one mode
     */
    void design(DesignDossier dossier, HardwareChoice choice, UnitSystem units, Optional<AbsorberLayout> layout) {
        siteCheckable = layout.isEmpty() || layout.get().joint().isEmpty();
        this.layout = layout;
        this.choice = choice;
        siteCheck.setToolTipText(siteCheckable ? SITE_CHECK_TIP : "The site check does not take one absorber per"
                + " mode yet");
        if (dossier == null) {
            message("Fix the inputs to see the hardware.");
            return;
        }
        message("Sizing the hardware\u2026");
        tasks.current(null, progress -> {
            Realisation r = Realiser.realisation(dossier, choice);
            DesignResult d = dossier.design();
            return new Sized(r, HardwareContent.sections(r, d, units), units, d);
        }, this::show, e -> {
            if (e instanceof CoreException plain) {
                message("The hardware cannot be sized: " + plain.getMessage());
            } else {
                Logger.getLogger("counterpoise").log(Level.WARNING, "realisation failed", e);
                message("The hardware could not be sized for these inputs; please report this case.");
            }
        });
    }

    /** A realisation and its report sections, made off the event thread. */
    private record Sized(Realisation realisation, List<ReportSection> sections, UnitSystem units, DesignResult design) {
    }

    private void message(String text) {
        shown = List.of();
        shownChoice = null;
        siteCheck.setEnabled(false);
        siteDialog.basis(null);
        sections.removeAll();
        headline.setForeground(null);
        headline.setText(text);
        sections.revalidate();
        sections.repaint();
    }

    private void show(Sized sized) {
        Realisation r = sized.realisation();
        boolean all = r.checks().stream().allMatch(c -> c.passes());
        headline.setText(all ? "\u2713 Every check of the parts passes" : "\u2717 Not every check of the parts passes");
        headline.setForeground(all ? Themes.passColour() : Themes.problemColour());
        sections.removeAll();
        if (!r.warnings().isEmpty()) {
            JTextArea warnings = wrapped(String.join("\n", r.warnings().stream().map(w -> "\u2022 " + WarningText.of(w, sized.units()))
                    .toList()));
            warnings.setName("hardware.warnings");
            warnings.setForeground(Themes.problemColour());
            add("Warnings", warnings);
        }
        for (ReportSection section : sized.sections()) {
            add(section.title(), render(section, sized.units()));
        }
        // the cautions this hardware carries (the standing ones are under the result's notes)
        JTextArea cautions = wrapped(String.join("\n", HardwareCaution.of(r.choice()).stream()
                .map(c -> "\u2022 " + CautionText.of(c)).toList()));
        cautions.setName("hardware.cautions");
        add("Cautions for this hardware", cautions);
        shown = sized.sections();
        shownChoice = r.choice();
        siteCheck.setEnabled(siteCheckable);
        siteDialog.basis(!siteCheckable ? null : new SiteCheckDialog.Basis(sized.design().study().name(),
                sized.design(), r, sized.units(), layout, choice));
        sections.revalidate();
        sections.repaint();
        // a new realisation is read from its top (the part list), whatever was scrolled to before
        SwingUtilities.invokeLater(() -> scroll.getVerticalScrollBar().setValue(0));
    }

    private JComponent render(ReportSection section, UnitSystem units) {
        if (section.id() == SectionId.PROCEDURE) {
            List<String> lines = new ArrayList<>();
            for (ReportTable.Row row : rows(section, units)) {
                lines.add(row.label() + ". " + row.value());
            }
            JTextArea text = wrapped(String.join("\n", lines));
            text.setName("hardware.procedure");
            return text;
        }
        return ReportTable.grid(section, units).<JComponent>map(g -> grid(section, g)).orElseGet(() -> {
            ReportRowsTable table = new ReportRowsTable("hardware." + section.id().name().toLowerCase(Locale.ROOT));
            table.show(List.of(new ReportTable.Section(section.id(), "", rows(section, units))));
            table.model().removeRow(0); // the section's title is above the table
            // the words of a value (the spring and damper kinds, what the tolerances hold to) get room
            table.table().getColumnModel().getColumn(0).setPreferredWidth(220);
            table.table().getColumnModel().getColumn(1).setPreferredWidth(260);
            table.table().getColumnModel().getColumn(2).setPreferredWidth(50);
            return withHeader(table.table());
        });
    }

    private static List<ReportTable.Row> rows(ReportSection section, UnitSystem units) {
        ReportContent one = new ReportContent("", List.of(section), List.of(), List.of(), Optional.empty(), units);
        return ReportTable.of(one, Set.of()).stream().flatMap(s -> s.rows().stream()).toList();
    }

    /** A grid (checks, predicted table); a column of typed pass-or-fail flags says it with a symbol and colour. */
    private static JComponent grid(ReportSection section, ReportTable.Grid g) {
        DefaultTableModel model = new DefaultTableModel(g.headings().toArray(), 0) {
            @Override
            public boolean isCellEditable(int row, int column) {
                return false;
            }
        };
        g.cells().forEach(line -> model.addRow(line.toArray()));
        JTable table = new JTable(model);
        table.setName("hardware." + section.id().name().toLowerCase(Locale.ROOT));
        if (model.getColumnCount() > 1) {
            table.getColumnModel().getColumn(0).setPreferredWidth(190); // the check's words, or the frequency
        }
        table.setRowHeight(table.getRowHeight() + 4);
        table.setDefaultRenderer(Object.class, ReportRowsTable.wholeUnderPointer(JLabel.LEFT));
        List<Boolean> passes = flags(section);
        int verdict = flagColumn(section);
        if (verdict >= 0 && passes.size() == model.getRowCount()) {
            table.getColumnModel().getColumn(verdict).setCellRenderer(new DefaultTableCellRenderer() {
                @Override
                public Component getTableCellRendererComponent(JTable t, Object value, boolean selected,
                        boolean focus, int row, int column) {
                    boolean ok = passes.get(t.convertRowIndexToModel(row));
                    String words = ok ? "\u2713 passes" : "\u2717 FAILS";
                    JLabel l = (JLabel) super.getTableCellRendererComponent(t, words, selected, focus, row, column);
                    Color colour = ok ? Themes.passColour() : Themes.problemColour();
                    l.setForeground(selected ? l.getForeground() : colour);
                    l.setFont(l.getFont().deriveFont(ok ? Font.PLAIN : Font.BOLD));
                    return l;
                }
            });
        }
        return withHeader(table);
    }

    /** @return each row's typed pass-or-fail flag, in order (empty when the section has none) */
    private static List<Boolean> flags(ReportSection section) {
        List<Boolean> out = new ArrayList<>();
        for (ReportRow row : section.rows()) {
            if (row.value() instanceof ReportValue.Fields f) {
                f.fields().stream().filter(x -> x.value() instanceof ReportValue.Flag).findFirst()
                        .ifPresent(x -> out.add(((ReportValue.Flag) x.value()).value()));
            }
        }
        return out;
    }

    /** @return the grid column of the flag (fields without a label are not columns), or -1 */
    private static int flagColumn(ReportSection section) {
        if (section.rows().isEmpty() || !(section.rows().get(0).value() instanceof ReportValue.Fields f)) {
            return -1;
        }
        List<ReportValue.Field> columns = f.fields().stream().filter(x -> !x.label().isEmpty()).toList();
        for (int i = 0; i < columns.size(); i++) {
            if (columns.get(i).value() instanceof ReportValue.Flag) {
                return i;
            }
        }
        return -1;
    }

    private static JComponent withHeader(JTable table) {
        JPanel p = new JPanel(new BorderLayout());
        p.add(table.getTableHeader(), BorderLayout.NORTH);
        p.add(table, BorderLayout.CENTER);
        return p;
    }

    private static JTextArea wrapped(String text) {
        JTextArea area = new JTextArea(text);
        area.setEditable(false);
        area.setLineWrap(true);
        area.setWrapStyleWord(true);
        area.setOpaque(false);
        area.setFont(new JLabel().getFont());
        area.setCaretPosition(0); // the caret at the end would scroll the page to the text's end
        // a wrapped text's height follows its width, known only once laid out: the page is laid out again
        // when the width changes, or it keeps the unwrapped height (one line a paragraph) and cuts off
        // what is below (seen when the tab was first laid out with no other change after it)
        area.addComponentListener(new ComponentAdapter() {
            private int laidOutWidth = -1;

            @Override
            public void componentResized(ComponentEvent e) {
                if (area.getWidth() != laidOutWidth) {
                    laidOutWidth = area.getWidth();
                    area.revalidate();
                }
            }
        });
        return area;
    }

    private void add(String title, JComponent body) {
        JLabel heading = new JLabel(title);
        heading.setFont(heading.getFont().deriveFont(Font.BOLD));
        heading.setBorder(BorderFactory.createEmptyBorder(10, 0, 3, 0));
        heading.setAlignmentX(Component.LEFT_ALIGNMENT);
        body.setAlignmentX(Component.LEFT_ALIGNMENT);
        sections.add(heading);
        sections.add(body);
        sections.add(Box.createVerticalStrut(2));
    }

    /** @return the sections shown (empty while none is current), for tests */
    List<ReportSection> shown() {
        return shown;
    }

    /** @return the site-check window, for tests */
    SiteCheckDialog siteDialog() {
        return siteDialog;
    }

    /** @return the choices the realisation on screen was sized for, or null while none is current */
    HardwareChoice shownChoice() {
        return shownChoice;
    }

    /** The inputs changed: what is on screen is for an older state, so it goes at once. */
    void stale() {
        if (shownChoice != null) {
            message("Sizing the hardware\u2026");
        }
    }
}
