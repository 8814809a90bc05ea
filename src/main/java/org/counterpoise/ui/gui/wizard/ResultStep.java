package org.counterpoise.ui.gui.wizard;

import static org.counterpoise.core.units.Dimension.LENGTH;

import java.awt.Dimension;
import java.util.Locale;
import java.util.Optional;
import javax.swing.BorderFactory;
import javax.swing.text.BadLocationException;
import javax.swing.text.SimpleAttributeSet;
import javax.swing.text.StyleConstants;
import javax.swing.text.StyledDocument;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.GridLayout;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.JTable;
import javax.swing.JTextPane;
import javax.swing.JToggleButton;
import javax.swing.table.DefaultTableModel;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.Cautions;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.AtomicFiles;
import org.counterpoise.io.chart.ChartFactory;
import org.counterpoise.io.chart.ChartFiles;
import org.counterpoise.io.project.FormatMigration;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.text.DesignContent;
import org.counterpoise.io.text.MeasuredSourceContent;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.ReportContent;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.gui.Themes;
import org.counterpoise.ui.gui.field.QuantityField;
import org.counterpoise.ui.gui.plot.ChartHost;
import org.counterpoise.ui.gui.task.TaskRunner;
import org.knowm.xchart.XYChart;

/** Step 4: the absorber to build, and the response before and after. */
final class ResultStep extends Step {
    /** The step's title in the step list. */
    static final String TITLE = "Result";
    /** What to build and what it achieves first; the inputs echoed last. */
    private static final List<SectionId> ORDER = List.of(SectionId.ABSORBER, SectionId.ACCEPTANCE, SectionId.RESPONSE,
            SectionId.RMS, SectionId.STROKE_AND_FORCES, SectionId.DESIGN, SectionId.TOLERANCE, SectionId.ALTERNATIVE,
            SectionId.STRUCTURE, SectionId.DISTURBANCE, SectionId.PROJECT, SectionId.MONTE_CARLO);
    private final ReportRowsTable rows = new ReportRowsTable("result.table");
    private final ChartHost responseChart = new ChartHost("chart.response");
    private final ChartHost strokeChart = new ChartHost("chart.stroke");
    private final JToggleButton logAxis = new JToggleButton("Log axis", true);
    private static final String READOUT_HINT = "Move the pointer over a chart to read the exact values there.";
    private final JLabel readout = new JLabel(READOUT_HINT);
    private final JTextPane notes = new JTextPane();
    private final JComponent page;
    private final TaskRunner tasks;
    private final SheetStep.Messages messages;
    private final ComparisonPanel comparison;
    private final VerdictPanel verdict = new VerdictPanel();
    private final RunUpView runUp;
    private final RealisationView hardware;
    private final SeveralAbsorbersView several;
    private DesignResult result;
    private DesignCurves curves;
    private Project project;

    /**
     * The result step's tabs other than the first, each a {@link Part} made in an event of its own.
     * @param runUp the run-up tab
     * @param hardware the hardware tab
     * @param comparison the comparison of methods
     * @param several the several-absorbers tab
     */
    record Tabs(Part<RunUpView> runUp, Part<RealisationView> hardware, Part<ComparisonPanel> comparison,
            Part<SeveralAbsorbersView> several) {
        /** @param tasks the wizard's task runner @return the tabs, none made yet */
        static Tabs of(TaskRunner tasks) {
            return new Tabs(new Part<>(() -> new RunUpView(tasks)), new Part<>(() -> new RealisationView(tasks)),
                    new Part<>(ComparisonPanel::new), new Part<>(SeveralAbsorbersView::new));
        }

        /** @return the parts, in the order they are made ahead of the step */
        Part<?>[] all() {
            return new Part<?>[] {runUp, hardware, comparison, several};
        }
    }

    ResultStep(TaskRunner tasks, SheetStep.Messages messages, Tabs tabs) {
        this.tasks = tasks;
        this.messages = messages;
        this.runUp = tabs.runUp().get();
        this.hardware = tabs.hardware().get();
        this.comparison = tabs.comparison().get();
        this.several = tabs.several().get();
        JTable t = rows.table();
        notes.setName("result.notes");
        notes.setEditable(false);
        notes.setOpaque(false);
        notes.setBorder(BorderFactory.createEmptyBorder(4, 4, 4, 4));
        writeNotes(List.of());
        JScrollPane notesScroll = new JScrollPane(notes);
        notesScroll.setName("result.notes.scroll");
        notesScroll.setBorder(null);
        notesScroll.setHorizontalScrollBarPolicy(JScrollPane.HORIZONTAL_SCROLLBAR_NEVER);
        // Warnings and cautions are sentences: wrapped in their own pane, never cut off in a table cell.
        JScrollPane tableScroll = new JScrollPane(t);
        tableScroll.setPreferredSize(new Dimension(470, 330));
        tableScroll.setMinimumSize(new Dimension(300, 120));
        notesScroll.setPreferredSize(new Dimension(470, 220));
        notesScroll.setMinimumSize(new Dimension(300, 100));
        // which method is recommended and whether this design is it, beside the design on every tab
        JPanel design = new JPanel(new BorderLayout(0, 4));
        // the verdict first (with "no absorber is needed" when the bare structure passes), then the line
        // on the method
        JPanel above = new JPanel(new BorderLayout());
        above.add(verdict.component(), BorderLayout.NORTH);
        above.add(comparison.summary(), BorderLayout.CENTER);
        design.add(above, BorderLayout.NORTH);
        design.add(tableScroll, BorderLayout.CENTER);
        design.setMinimumSize(new Dimension(300, 160));
        JSplitPane left = new JSplitPane(JSplitPane.VERTICAL_SPLIT, design, notesScroll);
        left.setResizeWeight(0.6);
        left.setBorder(null);
        JPanel charts = new JPanel(new GridLayout(2, 1, 0, 6));
        charts.add(responseChart);
        charts.add(strokeChart);
        charts.setMinimumSize(new Dimension(360, 300));
        JPanel controls = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        logAxis.setName("result.log");
        logAxis.setMnemonic('l');
        logAxis.addActionListener(e -> redraw());
        logAxis.setToolTipText("Logarithmic response axis");
        JButton png = new JButton("Charts as PNG\u2026");
        png.setToolTipText("Export the response and stroke charts as PNG images");
        png.setMnemonic('p');
        png.addActionListener(e -> export(true));
        JButton svg = new JButton("Charts as SVG\u2026");
        svg.setToolTipText("Export the response and stroke charts as SVG drawings");
        svg.setMnemonic('v');
        svg.addActionListener(e -> export(false));
        controls.add(logAxis);
        controls.add(png);
        controls.add(svg);
        readout.setName("result.readout");
        for (ChartHost host : List.of(responseChart, strokeChart)) {
            // A new chart (or none) clears the readout: it never describes an old result.
            host.onPointer(hz -> {
                if (Double.isNaN(hz)) {
                    readout.setText(READOUT_HINT);
                } else {
                    read(hz);
                }
            });
        }
        JPanel right = new JPanel(new BorderLayout());
        right.add(controls, BorderLayout.NORTH);
        right.add(charts, BorderLayout.CENTER);
        right.add(readout, BorderLayout.SOUTH);
        JTabbedPane views = new JTabbedPane();
        views.setName("result.views");
        views.addTab("Steady state", right);
        views.addTab("Run-up", runUp.component());
        views.addTab("Comparison of methods", comparison.component());
        views.addTab("Hardware", hardware.component());
        views.addTab("Several absorbers", several.component());
        views.setMnemonicAt(0, 's');
        views.setMnemonicAt(1, 'u');
        views.setMnemonicAt(2, 'm');
        views.setMnemonicAt(3, 'h');
        views.setMnemonicAt(4, 'a');
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, left, views);
        split.setResizeWeight(0.36);
        split.setBorder(null);
        page = split;
    }

    /** @return the tab of several modes or absorbers */
    SeveralAbsorbersView several() {
        return several;
    }

    @Override
    String title() {
        return TITLE;
    }

    @Override
    void showProject(Project p, boolean loaded) {
        // Results arrive from the design task (see show).
    }

    @Override
    boolean fieldsValid() {
        return true;
    }

    @Override
    JComponent component() {
        return page;
    }

    /**
     * @param r the new result, or null while none is valid
     * @param c its curves (computed with it, off the event thread)
     */
    void show(DesignResult r, DesignCurves c) {
        result = r;
        runUp.design(r, r == null ? null : project);
        rows.clear();
        // several modes or absorbers: the verdict is the whole structure's, shown when the several-absorbers
        // tab has computed it (DesignRun); the target mode's alone is never shown
        boolean wholeStructure = project != null && !FormatMigration.isOneModeOneAbsorber(project);
        if (r == null || r.acceptance().isEmpty() || wholeStructure) {
            verdict.none();
        } else {
            verdict.show(r.acceptance().get(), VerdictPanel.orderNames(r, project));
        }
        if (r == null) {
            hardware.design(null, null, UnitSystem.SI);
            comparison.message("Fix the inputs to see the comparison of methods.");
            curves = null;
            writeNotes(List.of());
            responseChart.message("Fix the inputs to see the design.");
            strokeChart.message(" ");
            return;
        }
        curves = c;
        // the project's unit system, as the charts and the readout use (the report's sections hold SI)
        ReportContent content = MeasuredSourceContent.with(DesignContent.of(r, ProjectIdentity.EMPTY, Optional.empty(),
                project == null ? UnitSystem.SI : project.displayUnits()),
                project == null ? null : project.structure().measured());
        List<ReportTable.Section> sections = new ArrayList<>(ReportTable.of(content, Set.of()));
        if (project != null && !FormatMigration.isOneModeOneAbsorber(project)) {
            // the table's acceptance would be the target mode's alone: the panel above gives the whole structure's
            sections.removeIf(sec -> sec.id() == SectionId.ACCEPTANCE);
        }
        if (r.rms().isPresent()) {
            // Under white noise the design is judged by rms values: they stand in for the harmonic peaks.
            sections.removeIf(sec -> sec.id() == SectionId.RESPONSE);
        }
        sections.sort(Comparator.comparingInt(sec -> ORDER.indexOf(sec.id())));
        rows.show(sections);
        writeNotes(content.warnings().stream().map(ReportContent.Note::text).toList());
        redraw();
    }

    /** Writes the design's warnings (first, in the problem colour) and the standing cautions, wrapped. */
    private void writeNotes(List<String> warnings) {
        StyledDocument doc = notes.getStyledDocument();
        SimpleAttributeSet heading = new SimpleAttributeSet();
        StyleConstants.setBold(heading, true);
        SimpleAttributeSet warning = new SimpleAttributeSet();
        StyleConstants.setForeground(warning, Themes.problemColour());
        SimpleAttributeSet plain = new SimpleAttributeSet();
        try {
            doc.remove(0, doc.getLength());
            if (!warnings.isEmpty()) {
                doc.insertString(doc.getLength(), warnings.size() == 1 ? "Warning\n" : "Warnings\n", heading);
                for (String w : warnings) {
                    doc.insertString(doc.getLength(), "\u2022 " + w + "\n", warning);
                }
                doc.insertString(doc.getLength(), "\n", plain);
            }
            doc.insertString(doc.getLength(), "Cautions\n", heading);
            doc.insertString(doc.getLength(), String.join("\n", Cautions.STANDARD.stream().map(c -> "\u2022 " + c)
                    .toList()), plain);
        } catch (BadLocationException e) {
            throw new IllegalStateException("bug: writing at the end of the notes", e);
        }
        notes.setCaretPosition(0);
    }

    private void redraw() {
        if (result == null) {
            return;
        }
        DesignResult r = result;
        DesignCurves c = curves;
        boolean log = logAxis.isSelected();
        // in the project's display convention (axis title and values), with the criterion's limit line
        AmplitudeConvention shown = project == null ? AmplitudeConvention.PEAK : project.displayConvention();
        UnitSystem system = project == null ? UnitSystem.SI : project.displayUnits();
        responseChart.show(theme -> ChartFactory.response(r, c, log, theme, shown, system, 640, 300));
        strokeChart.show(theme -> ChartFactory.stroke(r, c, false, theme, system, 640, 300));
    }

    /** Shows the exact values at a frequency (Hz) under the pointer. */
    void read(double hz) {
        if (result == null || !(hz > 0)) {
            return;
        }
        double w = Unit.HERTZ.toSi(hz);
        var study = result.study();
        SystemResponse bare = new SystemResponse(study.structure(), null, study.excitation().kind(),
                study.excitation().amplitude());
        SystemResponse fitted = new SystemResponse(study.structure(), result.tuning(), study.excitation().kind(),
                study.excitation().amplitude());
        ResponseKind k = study.response();
        // every response value says its convention (the project's display convention)
        AmplitudeConvention shown = project == null ? AmplitudeConvention.PEAK : project.displayConvention();
        UnitSystem system = project == null ? UnitSystem.SI : project.displayUnits();
        readout.setText(String.format(Locale.ROOT, "At %.4g Hz (%s):  without %s,  with %s,  stroke %s", hz,
                shown.label(), pretty(DisplayUnits.format(shown.ofHarmonic(bare.amplitudeAt(k, w)), k.dimension(), system)),
                pretty(DisplayUnits.format(shown.ofHarmonic(fitted.amplitudeAt(k, w)), k.dimension(), system)),
                DisplayUnits.format(shown.ofHarmonic(fitted.amplitudeAt(ResponseKind.STROKE, w)), LENGTH, system)));
    }

    String readout() {
        return readout.getText();
    }

    private static String pretty(String s) {
        return QuantityField.pretty(s);
    }

    private void export(boolean png) {
        if (result == null) {
            return;
        }
        JFileChooser chooser = new JFileChooser();
        chooser.setFileSelectionMode(JFileChooser.DIRECTORIES_ONLY);
        chooser.setDialogTitle("Folder for response and stroke charts");
        if (chooser.showSaveDialog(page) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path dir = chooser.getSelectedFile().toPath();
        String ext = png ? ".png" : ".svg";
        List<XYChart> charts = List.of(responseChart.chart(), strokeChart.chart());
        tasks.requested("Exporting the charts as " + (png ? "PNG" : "SVG"), progress -> {
            String[] names = {"response", "stroke"};
            for (int i = 0; i < charts.size(); i++) {
                progress.checkCancelled();
                progress.phase(names[i] + ext);
                XYChart chart = charts.get(i);
                AtomicFiles.write(dir.resolve(names[i] + ext), out -> {
                    if (png) {
                        ChartFiles.png(chart, out);
                    } else {
                        ChartFiles.svg(chart, out);
                    }
                });
            }
            return dir;
        }, d -> messages.say("Wrote response" + ext + " and stroke" + ext + " to " + d + "."),
                e -> JOptionPane.showMessageDialog(page, "The charts could not be written to " + dir + ": "
                        + e.getMessage(), "Export", JOptionPane.WARNING_MESSAGE),
                () -> messages.say("The chart export was cancelled."));
    }

    /** @return the verdict panel, for tests */
    VerdictPanel verdict() {
        return verdict;
    }

    DefaultTableModel table() {
        return rows.model();
    }

    /** @param p the project the next result shown is designed from (its run-up rate, order, speed unit) */
    void designedFrom(Project p) {
        project = p;
    }

    /** @return the run-up view, for tests */
    RunUpView runUp() {
        return runUp;
    }

    /** @return the hardware tab (sized after the design; see {@code DesignRun}) */
    RealisationView hardware() {
        return hardware;
    }

    /** @return the comparison of methods (computed after the design; see {@code DesignRun}) */
    ComparisonPanel comparison() {
        return comparison;
    }
}
