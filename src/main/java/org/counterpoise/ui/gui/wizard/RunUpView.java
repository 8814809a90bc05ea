package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.GridLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.SwingWorker;
import javax.swing.event.AncestorEvent;
import javax.swing.event.AncestorListener;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.DefaultTableModel;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RunUpStudy;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.runup.RunUpComparison;
import org.counterpoise.core.runup.RunUpReportData;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.chart.ChartNumbers;
import org.counterpoise.io.chart.RunUpCharts;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.RunUpReport;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.field.Html;
import org.counterpoise.ui.gui.plot.ChartHost;
import org.counterpoise.ui.gui.task.TaskRunner;

/**
 * The result step's run-up view: the envelope met while the machine runs up from rest through
 * resonance, with and without the absorber, beside the steady state, and the table of peaks. It
 * runs only while shown, off the event thread on the task bar (progress, Cancel), for the design
 * on screen: a new design clears it and, when it is shown, starts it again; a result for an older
 * design or an older rate is dropped. The shaft acceleration comes from the disturbance step's
 * run-up rate and may be changed here for a quick look (the project keeps its own).
 */
final class RunUpView {
    private static final String[] COLUMNS = {"Peak", "Run-up, with", "Run-up, without", "Steady, with",
        "Steady, without"};
    private final TaskRunner tasks;
    private final JPanel panel = new JPanel(new BorderLayout(0, 4));
    private final JTextField rate = new JTextField(7);
    private final JLabel rateSource = new JLabel();
    private final ChartHost structureChart = new ChartHost("runup.chart.structure");
    private final ChartHost strokeChart = new ChartHost("runup.chart.stroke");
    private final DefaultTableModel table = new DefaultTableModel(COLUMNS, 0) {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private DesignResult design;
    private Project project;
    /** The rate the project gave when the field was last filled from it (rpm/s), or empty. */
    private String projectRateText = "";
    /** Grows with every request; only the latest request's outcome is shown. */
    private long request;
    private long shownRequest = -1;
    private SwingWorker<?, ?> running;

    RunUpView(TaskRunner tasks) {
        this.tasks = tasks;
        rate.setName("runup.rate");
        rate.setToolTipText("Shaft speed change per second at start and stop, rpm/s");
        rate.addActionListener(e -> start());
        JButton compute = new JButton("Compute");
        compute.setName("runup.compute");
        compute.setMnemonic('u');
        compute.addActionListener(e -> start());
        JPanel controls = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        JLabel label = new JLabel("Shaft acceleration");
        label.setLabelFor(rate);
        label.setDisplayedMnemonic('a');
        controls.add(label);
        controls.add(rate);
        controls.add(new JLabel("rpm/s"));
        controls.add(compute);
        controls.add(rateSource);
        JPanel charts = new JPanel(new GridLayout(2, 1, 0, 6));
        charts.add(structureChart);
        charts.add(strokeChart);
        JTable t = new JTable(table);
        t.setName("runup.table");
        // "value at speed" in two lines, so that every column shows its figures whole
        t.setRowHeight(2 * t.getRowHeight() + 4);
        t.setDefaultRenderer(Object.class, twoLines());
        t.getColumnModel().getColumn(0).setPreferredWidth(150);
        JScrollPane tableScroll = new JScrollPane(t);
        tableScroll.setPreferredSize(new Dimension(600, t.getRowHeight() * 5 + t.getTableHeader()
                .getPreferredSize().height + 4));
        panel.add(controls, BorderLayout.NORTH);
        panel.add(charts, BorderLayout.CENTER);
        panel.add(tableScroll, BorderLayout.SOUTH);
        panel.setName("runup.view");
        // The integration runs only when someone looks: shown, it starts for the design on screen.
        panel.addAncestorListener(new AncestorListener() {
            @Override
            public void ancestorAdded(AncestorEvent event) {
                boolean busy = running != null && !running.isDone();
                if (!busy && shownRequest != request) {
                    start();
                }
            }

            @Override
            public void ancestorRemoved(AncestorEvent event) {
            }

            @Override
            public void ancestorMoved(AncestorEvent event) {
            }
        });
        clear("Fix the inputs to see the run-up.");
    }

    /** @return the view, for the result step's tabs */
    JPanel component() {
        return panel;
    }

    /**
     * A new design on screen (or none): what was shown is cleared, and the run-up starts again
     * when the view is shown.
     * @param r the design, or null while none is valid
     * @param p the project it was designed from, or null
     */
    void design(DesignResult r, Project p) {
        design = r;
        project = p;
        request++;
        cancelRunning();
        if (r == null || p == null) {
            clear("Fix the inputs to see the run-up.");
            return;
        }
        String fromProject = projectRate(p);
        if (!fromProject.equals(projectRateText)) {
            projectRateText = fromProject;
            rate.setText(fromProject);
        }
        clear("The run-up is computed when this view is shown.");
        if (panel.isShowing()) {
            start();
        }
    }

    /** Starts the run-up for the design on screen and the rate in the field. */
    void start() {
        long mine = ++request;
        cancelRunning();
        DesignResult r = design;
        Project p = project;
        if (r == null || p == null) {
            clear("Fix the inputs to see the run-up.");
            return;
        }
        rateSource.setText(rate.getText().trim().equals(projectRateText) && !projectRateText.isEmpty()
                ? "from the Disturbance step" : projectRateText.isEmpty() ? "" : "changed here, not saved");
        if (r.study().excitation().kind() == ExcitationKind.BASE_ACCELERATION) {
            clear("No run-up for a base acceleration: a constant acceleration amplitude from rest drives the base"
                    + " away without bound (see docs/runup.md).");
            return;
        }
        double rpmPerSecond;
        try {
            rpmPerSecond = Double.parseDouble(rate.getText().trim());
        } catch (NumberFormatException e) {
            rpmPerSecond = Double.NaN;
        }
        if (!(rpmPerSecond > 0) || !Double.isFinite(rpmPerSecond)) {
            clear(rate.getText().isBlank()
                    ? "Give the shaft acceleration at start and stop above (rpm/s), or the run-up rate on the"
                            + " Disturbance step."
                    : "The shaft acceleration must be a number of rpm/s above 0.");
            return;
        }
        RunUpStudy study;
        try {
            study = RunUpStudy.runUp(r, p.disturbance().harmonicOrder(), Unit.RPM_PER_SECOND.toSi(rpmPerSecond));
            study.ramp(); // a ramp too long to integrate is said here, before any work
        } catch (InvalidInputException e) {
            clear("No run-up at this acceleration: " + e.problem());
            return;
        }
        Unit speedUnit = RunUpCharts.speedUnit(p.disturbance());
        clear("Computing the run-up\u2026");
        running = tasks.current("Run-up through resonance", progress -> {
            progress.phase(QuantityFormat.number(study.ramp().forcingCycles(), 3) + " forcing cycles, twice");
            return study.run(progress);
        }, (RunUpStudy.Result result) -> {
            if (mine == request) {
                show(result, speedUnit, mine);
            }
        }, e -> {
            if (mine == request) {
                clear(e instanceof InvalidInputException bad ? "No run-up: " + bad.problem()
                        : "The run-up could not be computed for these inputs.");
            }
        }, () -> {
            if (mine == request) {
                clear("The run-up was cancelled; press Compute to start it again.");
            }
        });
    }

    private void show(RunUpStudy.Result result, Unit speedUnit, long mine) {
        shownRequest = mine;
        structureChart.show(theme -> RunUpCharts.structure(result, speedUnit, theme, 640, 300));
        strokeChart.show(theme -> RunUpCharts.stroke(result, speedUnit, theme, 640, 300));
        table.setRowCount(0);
        RunUpReportData d = result.data();
        RunUpComparison c = d.comparison();
        for (ResponseKind k : RunUpReportData.QUANTITIES) {
            table.addRow(new Object[] {RunUpReport.label(k),
                ValueText.pretty(RunUpReport.transientPeak(d, c.withAbsorber(), k, speedUnit)),
                ValueText.pretty(RunUpReport.transientPeak(d, c.withoutAbsorber(), k, speedUnit)),
                ValueText.pretty(RunUpReport.steadyPeak(d, c.steadyWithAbsorber(), k, speedUnit)),
                ValueText.pretty(RunUpReport.steadyPeak(d, c.steadyWithoutAbsorber(), k, speedUnit))});
        }
    }

    private static DefaultTableCellRenderer twoLines() {
        return new DefaultTableCellRenderer() {
            @Override
            public Component getTableCellRendererComponent(JTable table, Object value, boolean selected,
                    boolean focus, int row, int column) {
                String text = value == null ? "" : value.toString();
                int at = text.indexOf(" at ");
                String shown = at < 0 ? text : "<html>" + Html.escape(text.substring(0, at)) + "<br>"
                        + Html.escape(text.substring(at + 1)) + "</html>";
                JLabel l = (JLabel) super.getTableCellRendererComponent(table, shown, selected, focus, row, column);
                l.setVerticalAlignment(JLabel.TOP);
                l.setToolTipText(text.isEmpty() ? null : text);
                return l;
            }
        };
    }

    private void clear(String message) {
        structureChart.message(message);
        strokeChart.message(" ");
        table.setRowCount(0);
    }

    private void cancelRunning() {
        if (running != null && !running.isDone()) {
            running.cancel(true);
        }
        running = null;
    }

    /** @return the project's run-up rate in rpm/s as text, or empty when it gives none or a bad one */
    private static String projectRate(Project p) {
        try {
            OptionalDouble r = p.runUpRate();
            return r.isPresent() ? ChartNumbers.label(Unit.RPM_PER_SECOND.fromSi(r.getAsDouble())) : "";
        } catch (InvalidInputException e) {
            return "";
        }
    }

    /** @return the peak table's rows, for tests */
    List<List<String>> rows() {
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < table.getRowCount(); i++) {
            List<String> row = new ArrayList<>();
            for (int j = 0; j < table.getColumnCount(); j++) {
                row.add(String.valueOf(table.getValueAt(i, j)));
            }
            rows.add(row);
        }
        return rows;
    }

    /** @return where the rate in the field comes from, in words, for tests */
    String rateSource() {
        return rateSource.getText();
    }

    /** @return the shaft acceleration field, for tests */
    JTextField rateField() {
        return rate;
    }
}
