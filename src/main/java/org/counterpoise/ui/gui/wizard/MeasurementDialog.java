package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.GridLayout;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.function.BiConsumer;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JDialog;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSpinner;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.ListSelectionModel;
import javax.swing.SpinnerNumberModel;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.filechooser.FileNameExtensionFilter;
import javax.swing.table.DefaultTableModel;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.identify.ModalModel;
import org.counterpoise.core.identify.ModeShapeRatio;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.chart.IdentificationCharts;
import org.counterpoise.io.measurement.FrfCsv;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.measurement.Identification;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.ui.gui.plot.ChartHost;

/**
 * The structure from a measured frequency response: the engineer picks a CSV file of a driving-point
 * FRF at the absorber point, says what was measured and in which unit, fits one to four modes and
 * takes one of them as the structure. Reading and fitting run off the event thread; a fit started
 * before the last change of the inputs is never shown (each fit carries a number, and only the
 * newest is shown).
 */
final class MeasurementDialog {
    private static final String[] KINDS = {"receptance (displacement per force)", "mobility (velocity per force)",
        "accelerance (acceleration per force)"};
    private static final String CAUTION = "The modal mass is the one at the measured point: the structure's data"
            + " stand for the absorber's point only when the measurement was a driving-point one (force and response"
            + " at the absorber's point, same direction). A fit is as good as the measurement: check the fitted curve"
            + " against the measured one, and measure again with the absorber locked before tuning on site.";

    private final Component owner;
    private final BiConsumer<Identification.Frf, IdentifiedMode> use;
    private final JTextField file = named(new JTextField(28), "measurement.file");
    private final JTextField transferFile = named(new JTextField(28), "measurement.transfer");
    private final JComboBox<String> kind = new JComboBox<>(KINDS);
    private final JTextField unit = named(new JTextField(FrfUnit.si(FrfKind.ACCELERANCE).symbol(), 10),
            "measurement.unit");
    private final JTextField bandLow = named(new JTextField(6), "measurement.bandLow");
    private final JTextField bandHigh = named(new JTextField(6), "measurement.bandHigh");
    private final JSpinner modes = new JSpinner(new SpinnerNumberModel(1, 1, 4, 1));
    private final JCheckBox residuals = new JCheckBox("Residual terms for modes outside the band", true);
    private final JButton fit = new JButton("Fit");
    private final JButton accept = new JButton("Use the selected mode");
    private final JLabel status = new JLabel(" ");
    private final ChartHost chart = new ChartHost("measurement.chart");
    private final DefaultTableModel rows = new DefaultTableModel(new Object[] {"Mode", "Natural frequency",
        "Damping ratio", "Modal mass", "At the absorber's point"}, 0) {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTable table = new JTable(rows);
    private JDialog dialog;
    /** The number of the newest fit; a fit that ends with another number is stale. Event thread only. */
    private long fitNumber;
    private Fitted shown;

    /**
     * @param owner the window it belongs to
     * @param use told, on the event thread, of the fit and the mode the user takes as the structure
     */
    MeasurementDialog(Component owner, BiConsumer<Identification.Frf, IdentifiedMode> use) {
        this.owner = owner;
        this.use = use;
    }

    /** Shows the window, making it the first time. */
    void show() {
        if (dialog == null) {
            dialog = build();
        }
        dialog.setVisible(true);
    }

    private JDialog build() {
        JDialog d = new JDialog(SwingUtilities.getWindowAncestor(owner), "Structure from a measurement");
        d.setName("measurement.dialog");
        kind.setName("measurement.kind");
        kind.setSelectedIndex(FrfKind.ACCELERANCE.ordinal()); // an impact test's accelerometer, the common case
        modes.setName("measurement.modes");
        residuals.setName("measurement.residuals");
        fit.setName("measurement.fit");
        accept.setName("measurement.accept");
        status.setName("measurement.status");
        table.setName("measurement.modesTable");
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        accept.setEnabled(false);
        JButton choose = named(new JButton("Choose\u2026"), "measurement.choose");
        choose.addActionListener(e -> chooseFile(file));
        JButton chooseTransfer = named(new JButton("Choose\u2026"), "measurement.chooseTransfer");
        chooseTransfer.addActionListener(e -> chooseFile(transferFile));
        kind.addActionListener(e -> {
            unit.setText(FrfUnit.si(kindChosen()).symbol());
            inputsChanged();
        });
        fit.addActionListener(e -> startFit());
        accept.addActionListener(e -> acceptSelected());
        table.getSelectionModel().addListSelectionListener(e -> accept.setEnabled(table.getSelectedRow() >= 0));
        DocumentListener typed = new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                inputsChanged();
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                inputsChanged();
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                inputsChanged();
            }
        };
        for (JTextField f : List.of(file, transferFile, unit, bandLow, bandHigh)) {
            f.getDocument().addDocumentListener(typed);
        }
        modes.addChangeListener(e -> inputsChanged());
        residuals.addActionListener(e -> inputsChanged());

        JPanel inputs = new JPanel(new GridLayout(0, 2, 8, 4));
        JPanel fileRow = new JPanel(new BorderLayout(4, 0));
        fileRow.add(file, BorderLayout.CENTER);
        fileRow.add(choose, BorderLayout.EAST);
        inputs.add(new JLabel("FRF file (.csv: frequency in Hz, real and imaginary or magnitude and phase)"));
        inputs.add(fileRow);
        JPanel transferRow = new JPanel(new BorderLayout(4, 0));
        transferRow.add(transferFile, BorderLayout.CENTER);
        transferRow.add(chooseTransfer, BorderLayout.EAST);
        inputs.add(new JLabel("Transfer FRF to the absorber's point (optional, when it is not the measured one)"));
        inputs.add(transferRow);
        inputs.add(new JLabel("What was measured"));
        inputs.add(kind);
        inputs.add(new JLabel("Unit of the values (response/force, e.g. m/N, mm/s/N, g/lbf)"));
        inputs.add(unit);
        JPanel band = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        band.add(bandLow);
        band.add(new JLabel("to"));
        band.add(bandHigh);
        band.add(new JLabel("Hz (empty: the whole file)"));
        inputs.add(new JLabel("Band to fit"));
        inputs.add(band);
        inputs.add(new JLabel("Modes in the band"));
        inputs.add(modes);
        inputs.add(residuals);
        JPanel fitRow = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        fitRow.add(fit);
        fitRow.add(status);
        inputs.add(fitRow);

        JTextArea caution = new JTextArea(CAUTION, 3, 60);
        caution.setName("measurement.caution");
        caution.setLineWrap(true);
        caution.setWrapStyleWord(true);
        caution.setEditable(false);
        caution.setOpaque(false);

        JPanel results = new JPanel(new BorderLayout(0, 6));
        chart.setPreferredSize(new Dimension(640, 300));
        results.add(chart, BorderLayout.CENTER);
        JScrollPane tableScroll = new JScrollPane(table);
        tableScroll.setPreferredSize(new Dimension(640, 110));
        results.add(tableScroll, BorderLayout.SOUTH);

        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 6));
        JButton close = named(new JButton("Close"), "measurement.close");
        close.addActionListener(e -> d.setVisible(false));
        buttons.add(accept);
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
        // a file dropped on the window is the driving-point FRF, fitted at once; on its own field, the transfer FRF
        FileDrop.install(file, this::startFit, content);
        FileDrop.install(transferFile, this::startFit);
        chart.message("Choose a file (or drop one here) and press Fit.");
        d.pack();
        d.setLocationRelativeTo(owner);
        return d;
    }

    private void chooseFile(JTextField into) {
        JFileChooser chooser = new JFileChooser();
        chooser.setFileFilter(new FileNameExtensionFilter("Measured FRF (.csv, .txt)", "csv", "txt"));
        if (chooser.showOpenDialog(dialog) == JFileChooser.APPROVE_OPTION) {
            into.setText(chooser.getSelectedFile().getPath());
            startFit();
        }
    }

    private FrfKind kindChosen() {
        return FrfKind.values()[kind.getSelectedIndex()];
    }

    /** An input changed: what is shown no longer fits it. */
    private void inputsChanged() {
        fitNumber++;
        showModel(null);
        status.setText("Inputs changed: press Fit.");
    }

    /** What a fit needs, read on the event thread; parsed and checked on the worker. */
    private record FitInputs(String file, String transfer, FrfKind kind, String unit, String low, String high,
            int modes, boolean residuals) {
    }

    /**
     * The driving-point fit, and the modes of the transfer FRF's fit (empty without one).
     * @param driving the driving-point fit
     * @param transferModes the modes fitted to the transfer FRF, or empty
     */
    record Fitted(Identification.Frf driving, List<IdentifiedMode> transferModes) {
        /** @return mode i as the absorber's point sees it (the driving point's mode without a transfer FRF) */
        IdentifiedMode atAbsorber(int i) {
            IdentifiedMode m = driving.model().modes().get(i);
            return transferModes.isEmpty() ? m : ModeShapeRatio.of(m, transferModes).atTransferPoint();
        }
    }

    private void startFit() {
        long number = ++fitNumber;
        FitInputs in = new FitInputs(file.getText().strip(), transferFile.getText().strip(), kindChosen(),
                unit.getText().strip(),
                bandLow.getText().strip(), bandHigh.getText().strip(), (Integer) modes.getValue(),
                residuals.isSelected());
        status.setText("Fitting\u2026");
        fit.setEnabled(false);
        new SwingWorker<Fitted, Void>() {
            @Override
            protected Fitted doInBackground() {
                return fitted(in);
            }

            @Override
            protected void done() {
                fit.setEnabled(true);
                if (number != fitNumber) {
                    return; // the inputs changed while it ran: a newer fit or none stands
                }
                try {
                    Fitted f = get();
                    showModel(f);
                    status.setText(quality(f.driving().model()));
                } catch (ExecutionException e) {
                    showModel(null);
                    status.setText(e.getCause() instanceof CoreException c ? c.getMessage()
                            : "The fit could not be made from this file.");
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        }.execute();
    }

    /** Reads, cuts to the band and fits; every problem is an InvalidInputException in plain words. */
    static Fitted fitted(FitInputs in) {
        if (in.file().isEmpty()) {
            throw InvalidInputException.missing("FRF file", "a CSV file (.csv) of the measured FRF");
        }
        FrfUnit u = FrfUnit.parse(in.unit(), in.kind(), "unit of the values");
        Identification.Frf driving = Identification.Frf.fit(Path.of(in.file()).toString(), u,
                band(FrfCsv.read(Path.of(in.file()), u), in), in.modes(), in.residuals());
        if (in.transfer().isEmpty()) {
            return new Fitted(driving, List.of());
        }
        // the transfer FRF is fitted as the driving point's: same unit, band, modes and residual terms
        Identification.Frf transfer = Identification.Frf.fit(in.transfer(), u,
                band(FrfCsv.read(Path.of(in.transfer()), u), in), in.modes(), in.residuals());
        return new Fitted(driving, transfer.model().modes());
    }

    private static MeasuredFrf band(MeasuredFrf all, FitInputs in) {
        if (in.low().isEmpty() && in.high().isEmpty()) {
            return all;
        }
        double lo = in.low().isEmpty() ? 0 : hertz(in.low(), "band from");
        double hi = in.high().isEmpty() ? Double.MAX_VALUE : hertz(in.high(), "band to");
        return all.within(Unit.HERTZ.toSi(lo), hi == Double.MAX_VALUE ? hi : Unit.HERTZ.toSi(hi));
    }

    private static double hertz(String text, String field) {
        try {
            double v = Double.parseDouble(text.replace(',', '.'));
            if (v >= 0 && Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // falls through to the plain message
        }
        throw new InvalidInputException(field, text, "a frequency in Hz, 0 or more");
    }

    private static String quality(ModalModel m) {
        String coherence = m.meanCoherence().isPresent()
                ? ", mean coherence " + QuantityFormat.number(m.meanCoherence().getAsDouble(), 3) : "";
        return "Fitted " + m.lines() + " lines: normalised residual "
                + QuantityFormat.number(100 * m.normalisedResidual(), 3) + " %" + coherence + ".";
    }

    private void showModel(Fitted fitted) {
        rows.setRowCount(0);
        accept.setEnabled(false);
        shown = fitted;
        if (fitted == null) {
            chart.message("No fit for the inputs shown.");
            return;
        }
        Identification.Frf f = fitted.driving();
        chart.show(IdentificationCharts.magnitude(f.fitted(), f.model(), f.unit(), 640, 300));
        List<IdentifiedMode> found = f.model().modes();
        for (int i = 0; i < found.size(); i++) {
            IdentifiedMode m = found.get(i);
            rows.addRow(new Object[] {i + 1,
                withSd(Unit.HERTZ.fromSi(m.naturalFrequency()), m.naturalFrequencySd().isPresent()
                        ? Unit.HERTZ.fromSi(m.naturalFrequencySd().getAsDouble()) : Double.NaN, "Hz"),
                withSd(m.dampingRatio(), m.dampingRatioSd().orElse(Double.NaN), ""),
                withSd(m.modalMass(), m.modalMassSd().orElse(Double.NaN), "kg"), atAbsorber(fitted, i)});
        }
        if (!found.isEmpty()) {
            table.setRowSelectionInterval(0, 0);
        }
    }

    /** The modal mass the absorber's point sees, from the transfer FRF; the refusal in words when it has no such mode. */
    private static String atAbsorber(Fitted fitted, int i) {
        if (fitted.transferModes().isEmpty()) {
            return "the measured point";
        }
        try {
            IdentifiedMode at = fitted.atAbsorber(i);
            return withSd(at.modalMass(), at.modalMassSd().orElse(Double.NaN), "kg");
        } catch (InvalidInputException e) {
            return "no such mode in the transfer FRF";
        }
    }

    private static String withSd(double value, double sd, String unit) {
        String u = unit.isEmpty() ? "" : " " + unit;
        String v = QuantityFormat.number(value, 4);
        return Double.isNaN(sd) ? v + u : v + " \u00b1 " + QuantityFormat.number(sd, 2) + u + " (1 sd)";
    }

    private void acceptSelected() {
        int row = table.getSelectedRow();
        if (shown == null || row < 0 || row >= shown.driving().model().modes().size()) {
            return;
        }
        try {
            use.accept(shown.driving(), shown.atAbsorber(row));
            dialog.setVisible(false);
        } catch (InvalidInputException e) {
            status.setText(e.getMessage());
        }
    }

    private static <T extends Component> T named(T c, String name) {
        c.setName(name);
        return c;
    }
}
