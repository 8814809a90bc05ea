package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.GridLayout;
import java.util.List;
import java.util.Optional;
import javax.swing.BorderFactory;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JDialog;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.io.chart.SiteCheckCharts;
import org.counterpoise.io.commission.SetSiteCheck;
import org.counterpoise.io.commission.SetSiteRun;
import org.counterpoise.io.commission.SiteCheck;
import org.counterpoise.io.commission.SiteCheckReport;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.gui.plot.ChartHost;
import org.counterpoise.ui.gui.task.TaskRunner;

/**
 * The design on screen against site measurements at the absorber's point (as {@code site-check}):
 * an operating spectrum against the model, and the response measured with the absorber fitted,
 * with the absorber as built and the trim plates. The check runs off the event thread; a result for
 * inputs or a design that changed since it started is never shown (each check carries a number, and
 * the task runner drops results for an older document).
 */
final class SiteCheckDialog {
    private static final String[] KINDS = {"receptance (displacement per force)", "mobility (velocity per force)",
        "accelerance (acceleration per force)"};
    private static final String CAUTION = "Both measurements are taken at the absorber's point (several absorbers:"
            + " the response at their point, the spectrum at the project's response point). Secure every absorber mass"
            + " before any work on it and measure with the machine stopped and isolated; a disturbance larger than"
            + " the project's scales the strokes and the forces with it. Follow local codes and licensed practice.";

    /**
     * The design the check is made against.
     * @param project the project's name
     * @param design the design
     * @param realisation its hardware (trim plan, part tolerances)
     * @param units the display unit system
     * @param layout the project's modes and absorbers at one point, or empty for one absorber on one mode
     * @param hardware the project's hardware choices (each absorber's trim plates, for several)
     */
    record Basis(String project, DesignResult design, Realisation realisation, UnitSystem units,
            Optional<AbsorberLayout> layout, HardwareChoice hardware) {
    }

    /** What a check found: one absorber's ({@link SiteCheck}) or several absorbers' ({@link SetSiteRun}). */
    sealed interface Checked permits One, Several {
    }

    /** @param check one absorber's check */
    record One(SiteCheck check) implements Checked {
    }

    /** @param run several absorbers' check */
    record Several(SetSiteRun run) implements Checked {
    }

    private final Component owner;
    private final TaskRunner tasks;
    private final JTextField spectrumFile = named(new JTextField(28), "siteCheck.spectrumFile");
    private final JTextField spectrumUnit = named(new JTextField("mm/s", 8), "siteCheck.spectrumUnit");
    private final JComboBox<AmplitudeConvention> convention = new JComboBox<>(AmplitudeConvention.values());
    {
        // the convention's own words (peak, r.m.s., peak-to-peak), not its constant's name
        convention.setRenderer(new DefaultListCellRenderer() {
            @Override
            public Component getListCellRendererComponent(JList<?> list, Object value, int index, boolean selected,
                    boolean focus) {
                return super.getListCellRendererComponent(list, value instanceof AmplitudeConvention c ? c.label()
                        : value, index, selected, focus);
            }
        });
    }
    private final JTextField running = named(new JTextField(6), "siteCheck.running");
    private final JCheckBox withAbsorber = named(new JCheckBox("Measured with the absorber fitted"),
            "siteCheck.withAbsorber");
    private final JTextField frfFile = named(new JTextField(28), "siteCheck.frfFile");
    private final JComboBox<String> kind = new JComboBox<>(KINDS);
    private final JTextField frfUnit = named(new JTextField(FrfUnit.si(FrfKind.ACCELERANCE).symbol(), 10),
            "siteCheck.frfUnit");
    private final JCheckBox freeStructure = named(new JCheckBox("Fit the structure's frequency too"),
            "siteCheck.freeStructure");
    private final JTextField weighed = named(new JTextField(8), "siteCheck.weighed");
    private final JButton check = named(new JButton("Check"), "siteCheck.check");
    private final JLabel status = named(new JLabel(" "), "siteCheck.status");
    private final ChartHost chart = new ChartHost("siteCheck.chart");
    private final JTextArea report = named(new JTextArea(16, 60), "siteCheck.report");
    private JDialog dialog;
    private Basis basis;
    /** The number of the newest check; one that ends with another number is stale. Event thread only. */
    private long number;
    private Checked shown;

    /**
     * @param owner the window it belongs to
     * @param tasks runs the check off the event thread, dropping results for an older document
     */
    SiteCheckDialog(Component owner, TaskRunner tasks) {
        this.owner = owner;
        this.tasks = tasks;
    }

    /** Shows the window, making it the first time. */
    void show() {
        if (dialog == null) {
            dialog = build();
        }
        dialog.setVisible(true);
    }

    /**
     * The design on screen changed (null: none is valid): what the window shows is for an older one.
     * @param current the design to check against
     */
    void basis(Basis current) {
        basis = current;
        inputsChanged(current == null ? "No valid design: fix the inputs first." : "The design changed: press Check.");
    }

    /** @return one absorber's check on screen, or null, for tests */
    SiteCheck shown() {
        return shown instanceof One one ? one.check() : null;
    }

    /** @return several absorbers' check on screen, or null, for tests */
    SetSiteRun shownSet() {
        return shown instanceof Several several ? several.run() : null;
    }

    private JDialog build() {
        JDialog d = new JDialog(SwingUtilities.getWindowAncestor(owner), "Check on site");
        d.setName("siteCheck.dialog");
        convention.setName("siteCheck.convention");
        convention.setSelectedItem(AmplitudeConvention.RMS); // what vibration meters read
        kind.setName("siteCheck.kind");
        kind.setSelectedIndex(FrfKind.ACCELERANCE.ordinal());
        kind.addActionListener(e -> {
            frfUnit.setText(FrfUnit.si(FrfKind.values()[kind.getSelectedIndex()]).symbol());
            inputsChanged("Inputs changed: press Check.");
        });
        check.addActionListener(e -> startCheck());
        DocumentListener typed = new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                inputsChanged("Inputs changed: press Check.");
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                inputsChanged("Inputs changed: press Check.");
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                inputsChanged("Inputs changed: press Check.");
            }
        };
        for (JTextField f : List.of(spectrumFile, spectrumUnit, running, frfFile, frfUnit, weighed)) {
            f.getDocument().addDocumentListener(typed);
        }
        for (JCheckBox b : List.of(withAbsorber, freeStructure)) {
            b.addActionListener(e -> inputsChanged("Inputs changed: press Check."));
        }
        convention.addActionListener(e -> inputsChanged("Inputs changed: press Check."));

        JPanel inputs = new JPanel(new GridLayout(0, 2, 8, 4));
        inputs.add(new JLabel("Operating spectrum (.csv: frequency in Hz, amplitude per line)"));
        inputs.add(fileRow(spectrumFile, "siteCheck.chooseSpectrum", "Spectrum (.csv, .txt)"));
        inputs.add(new JLabel("Unit of the amplitudes (mm/s, in/s, um, mil, m/s^2, g ...)"));
        JPanel unitRow = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        unitRow.add(spectrumUnit);
        unitRow.add(convention);
        unitRow.add(withAbsorber);
        inputs.add(unitRow);
        inputs.add(new JLabel("Running frequency, Hz (empty: the largest line in the band)"));
        inputs.add(running);
        inputs.add(new JLabel("Response with the absorber fitted (.csv FRF at the absorber's point)"));
        inputs.add(fileRow(frfFile, "siteCheck.chooseFrf", "Measured FRF (.csv, .txt)"));
        inputs.add(new JLabel("What was measured, and the unit of the values (response/force)"));
        JPanel kindRow = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        kindRow.add(kind);
        kindRow.add(frfUnit);
        inputs.add(kindRow);
        inputs.add(new JLabel("Absorber mass as weighed, kg (several: 450; 452; empty: the design's)"));
        inputs.add(weighed);
        inputs.add(freeStructure);
        JPanel checkRow = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        checkRow.add(check);
        checkRow.add(status);
        inputs.add(checkRow);

        report.setEditable(false);
        report.setFont(new Font(Font.MONOSPACED, Font.PLAIN, report.getFont().getSize()));
        chart.setPreferredSize(new Dimension(640, 280));
        JSplitPane results = new JSplitPane(JSplitPane.VERTICAL_SPLIT, chart, new JScrollPane(report));
        results.setResizeWeight(0.5);

        JTextArea caution = new JTextArea(CAUTION, 2, 60);
        caution.setName("siteCheck.caution");
        caution.setLineWrap(true);
        caution.setWrapStyleWord(true);
        caution.setEditable(false);
        caution.setOpaque(false);
        JButton close = named(new JButton("Close"), "siteCheck.close");
        close.addActionListener(e -> d.setVisible(false));
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 6));
        buttons.add(close);
        JPanel south = new JPanel(new BorderLayout());
        south.add(caution, BorderLayout.CENTER);
        south.add(buttons, BorderLayout.SOUTH);

        JPanel content = new JPanel(new BorderLayout(0, 8));
        content.setBorder(BorderFactory.createEmptyBorder(10, 10, 6, 10));
        content.add(inputs, BorderLayout.NORTH);
        content.add(results, BorderLayout.CENTER);
        content.add(south, BorderLayout.SOUTH);
        d.setContentPane(content);
        FileDrop.install(spectrumFile, () -> { });
        FileDrop.install(frfFile, () -> { });
        chart.message("Choose one file or both (or drop each on its field), and press Check.");
        check.setEnabled(basis != null);
        d.pack();
        d.setLocationRelativeTo(owner);
        return d;
    }

    private JPanel fileRow(JTextField field, String name, String filter) {
        JButton choose = named(new JButton("Choose\u2026"), name);
        choose.addActionListener(e -> {
            JFileChooser chooser = new JFileChooser();
            chooser.setFileFilter(new FileNameExtensionFilter(filter, "csv", "txt"));
            if (chooser.showOpenDialog(dialog) == JFileChooser.APPROVE_OPTION) {
                field.setText(chooser.getSelectedFile().getPath());
            }
        });
        JPanel row = new JPanel(new BorderLayout(4, 0));
        row.add(field, BorderLayout.CENTER);
        row.add(choose, BorderLayout.EAST);
        return row;
    }

    private void inputsChanged(String words) {
        number++;
        show(null);
        status.setText(words);
        check.setEnabled(basis != null);
    }

    /** What a check needs, read on the event thread; parsed and checked on the worker. */
    record Inputs(String spectrumFile, String spectrumUnit, AmplitudeConvention convention, String running,
            boolean withAbsorber, String frfFile, FrfKind kind, String frfUnit, boolean freeStructure, String weighed) {
    }

    private void startCheck() {
        if (basis == null) {
            return;
        }
        long started = ++number;
        Basis against = basis;
        Inputs in = new Inputs(spectrumFile.getText().strip(), spectrumUnit.getText().strip(),
                (AmplitudeConvention) convention.getSelectedItem(), running.getText().strip(), withAbsorber.isSelected(),
                frfFile.getText().strip(), FrfKind.values()[kind.getSelectedIndex()], frfUnit.getText().strip(),
                freeStructure.isSelected(), weighed.getText().strip());
        status.setText("Checking\u2026");
        check.setEnabled(false);
        tasks.current(null, progress -> SiteCheckInputs.checked(in, against), result -> {
            check.setEnabled(basis != null);
            if (started == number) {
                show(result);
                status.setText("Checked against the design on screen.");
            }
        }, e -> {
            check.setEnabled(basis != null);
            if (started == number) {
                show(null);
                status.setText(e instanceof CoreException plain ? plain.getMessage()
                        : "The check could not be made from these files.");
            }
        });
    }

    private void show(Checked result) {
        shown = result;
        if (dialog == null) {
            return;
        }
        if (result == null) {
            report.setText("");
            chart.message("No check for the inputs shown.");
            return;
        }
        if (result instanceof One one) {
            SiteCheck check = one.check();
            report.setText(SiteCheckReport.render(check));
            if (check.fitted().isPresent()) {
                SiteCheck.Fitted f = check.fitted().get();
                chart.show(SiteCheckCharts.magnitude(f.lines(), check.design().study().structure(),
                        check.design().tuning(), f.check().built(), f.unit(), 640, 280));
            } else {
                chart.message("Give the response with the absorber fitted to see it against the design.");
            }
        } else if (result instanceof Several several) {
            SetSiteRun run = several.run();
            report.setText(run.report());
            if (run.fitted().isPresent()) {
                SetSiteCheck f = run.fitted().get();
                chart.show(SiteCheckCharts.setMagnitude(f.lines(), run.design(), f.check().built(), f.unit(), 640,
                        280));
            } else {
                chart.message("Give the response with the absorbers fitted to see it against the design.");
            }
        }
        report.setCaretPosition(0);
        // the split pane holding the chart lays itself out again only when told (seen under Xvfb)
        dialog.getContentPane().validate();
        dialog.repaint();
    }

    private static <T extends Component> T named(T c, String name) {
        c.setName(name);
        return c;
    }
}
