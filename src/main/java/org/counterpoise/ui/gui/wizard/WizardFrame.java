package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.Color;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JButton;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.KeyStroke;
import javax.swing.ListSelectionModel;
import javax.swing.SwingWorker;
import javax.swing.Timer;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.counterpoise.core.design.AchievablePeak;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.RobustnessAnalysis;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.design.RobustnessSettings;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Structure;
import org.counterpoise.io.project.AbsorberInput;
import org.counterpoise.io.project.DisturbanceInput;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.ProjectWriter;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.io.project.StructureInput;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.ui.gui.Themes;
import org.counterpoise.ui.gui.field.ScrollingPage;
import org.counterpoise.ui.gui.session.RecentFiles;
import org.counterpoise.ui.gui.session.WindowPlacement;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The design wizard: a list of steps on the left, the current step in the middle, Back and Next
 * below with the reason when Next is not possible. Every edit recomputes in the background after a
 * short pause; a result is shown only if no edit came after the inputs it was computed from.
 */
public final class WizardFrame extends JFrame {
    /** Pause after the last keystroke before recomputing; the design itself takes a few ms. */
    private static final int PAUSE_MS = 60;

    private final StructureStep structure = new StructureStep(this::edited);
    private final DisturbanceStep disturbance = new DisturbanceStep(this::edited);
    private final GoalStep goal = new GoalStep(this::edited);
    private final ResultStep result = new ResultStep();
    private final RobustnessStep robustness = new RobustnessStep(this::edited);
    private final SheetStep sheet = new SheetStep();
    private final List<Step> steps = List.of(structure, disturbance, goal, result, robustness, sheet);
    private final CardLayout cards = new CardLayout();
    private final JPanel center = new JPanel(cards);
    private final JList<Step> stepList = new JList<>(steps.toArray(new Step[0]));
    private final JLabel status = new JLabel(" ");
    private final JLabel stale = new JLabel(" ");
    private final Action back = action("Back", KeyEvent.VK_B, e -> go(this.current - 1));
    private final Action next = action("Next", KeyEvent.VK_N, e -> go(this.current + 1));
    private final Timer pause = new Timer(PAUSE_MS, e -> recompute());
    private final RecentFiles recent = new RecentFiles();
    private final JMenu recentMenu = new JMenu("Recent files");

    private int current;
    private boolean loading;
    private boolean dirty;
    private Path file;
    private Project base;
    private long generation;
    private long shownGeneration = -1;
    private DesignResult shown;

    /** Builds the window with the default preset loaded. */
    public WizardFrame() {
        super("Counterpoise");
        setName("wizard");
        setDefaultCloseOperation(DO_NOTHING_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                closeRequested();
            }
        });
        pause.setRepeats(false);
        for (Step s : steps) {
            center.add(ScrollingPage.of(s.component()), s.title());
        }
        stepList.setName("steps");
        stepList.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        stepList.setFixedCellWidth(190);
        stepList.setBorder(BorderFactory.createEmptyBorder(10, 6, 10, 6));
        stepList.setCellRenderer(new DefaultListCellRenderer() {
            @Override
            public Component getListCellRendererComponent(JList<?> list, Object value, int index, boolean selected,
                    boolean focus) {
                Step s = (Step) value;
                String mark = s.problem() != null ? "  \u25cf" : "";
                JLabel l = (JLabel) super.getListCellRendererComponent(list, (index + 1) + "   " + s.title() + mark,
                        index, selected, focus);
                l.setBorder(BorderFactory.createEmptyBorder(7, 8, 7, 8));
                if (s.problem() != null && !selected) {
                    l.setForeground(new Color(0xb0, 0x2a, 0x1e));
                }
                return l;
            }
        });
        stepList.addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting() && stepList.getSelectedIndex() >= 0 && stepList.getSelectedIndex() != current) {
                go(stepList.getSelectedIndex());
            }
        });
        JButton backButton = new JButton(back);
        backButton.setName("back");
        JButton nextButton = new JButton(next);
        nextButton.setName("next");
        status.setName("status");
        stale.setName("stale");
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 6));
        buttons.add(backButton);
        buttons.add(nextButton);
        JPanel south = new JPanel(new BorderLayout());
        south.setBorder(BorderFactory.createEmptyBorder(2, 12, 2, 6));
        JPanel messages = new JPanel(new BorderLayout());
        messages.add(status, BorderLayout.CENTER);
        messages.add(stale, BorderLayout.EAST);
        south.add(messages, BorderLayout.CENTER);
        south.add(buttons, BorderLayout.EAST);
        JPanel root = new JPanel(new BorderLayout());
        root.add(stepList, BorderLayout.WEST);
        root.add(center, BorderLayout.CENTER);
        root.add(south, BorderLayout.SOUTH);
        setContentPane(root);
        setJMenuBar(menus());
        getRootPane().setDefaultButton(nextButton);
        goal.sizingContext(new GoalStep.SizingContext() {
            @Override
            public Structure structure() {
                try {
                    return new Project(base.name(), base.notes(), structure.input(), base.disturbance(),
                            base.absorber(), null).toStructure();
                } catch (InvalidInputException e) {
                    return null;
                }
            }

            @Override
            public DesignResult design() {
                return shown;
            }
        });
        load(Presets.defaultProject(), null);
        go(0);
        WindowPlacement.restore(this, new Dimension(1280, 800));
    }

    private JMenuBar menus() {
        JMenuBar bar = new JMenuBar();
        JMenu fileMenu = new JMenu("File");
        fileMenu.setMnemonic('f');
        fileMenu.add(item("New from the default scenario", 'n', KeyStroke.getKeyStroke("control N"), e -> {
            if (confirmDiscard()) {
                load(Presets.defaultProject(), null);
            }
        }));
        fileMenu.add(item("Open\u2026", 'o', KeyStroke.getKeyStroke("control O"), e -> open()));
        fileMenu.add(item("Save", 's', KeyStroke.getKeyStroke("control S"), e -> save(false)));
        fileMenu.add(item("Save as\u2026", 'a', KeyStroke.getKeyStroke("control shift S"), e -> save(true)));
        recentMenu.setMnemonic('r');
        fileMenu.add(recentMenu);
        fileMenu.addSeparator();
        JMenu presets = new JMenu("Example scenarios (invented)");
        presets.setName("menu.presets");
        presets.setMnemonic('e');
        for (String name : Presets.names()) {
            JMenuItem it = item(Presets.load(name).project().name(), (char) 0, null, e -> {
                if (confirmDiscard()) {
                    load(Presets.load(name), null);
                }
            });
            it.setName("preset." + name);
            presets.add(it);
        }
        fileMenu.add(presets);
        fileMenu.addSeparator();
        fileMenu.add(item("Quit", 'q', KeyStroke.getKeyStroke("control Q"), e -> closeRequested()));
        JMenu view = new JMenu("View");
        view.setMnemonic('v');
        view.add(item("Light theme", 'l', null, e -> Themes.apply(false, this)));
        view.add(item("Dark theme", 'd', null, e -> Themes.apply(true, this)));
        JMenu help = new JMenu("Help");
        help.setMnemonic('h');
        help.add(item("About Counterpoise", 'a', null, e -> JOptionPane.showMessageDialog(this,
                "Counterpoise: design of dynamic vibration absorbers (tuned mass dampers).\n"
                        + "A preliminary design aid on a single-mode linear model: verify by measurement;\n"
                        + "local codes and licensed engineering practice govern.", "About", JOptionPane.INFORMATION_MESSAGE)));
        bar.add(fileMenu);
        bar.add(view);
        bar.add(help);
        refreshRecent();
        return bar;
    }

    private static JMenuItem item(String text, char mnemonic, KeyStroke key, java.util.function.Consumer<ActionEvent> a) {
        JMenuItem it = new JMenuItem(text);
        if (mnemonic != 0) {
            it.setMnemonic(mnemonic);
        }
        if (key != null) {
            it.setAccelerator(key);
        }
        it.addActionListener(a::accept);
        return it;
    }

    private static Action action(String name, int mnemonic, java.util.function.Consumer<ActionEvent> a) {
        Action act = new AbstractAction(name) {
            @Override
            public void actionPerformed(ActionEvent e) {
                a.accept(e);
            }
        };
        act.putValue(Action.MNEMONIC_KEY, mnemonic);
        return act;
    }

    /** Loads a project into every step (not an edit: the project is clean afterwards). */
    public void load(LoadedProject loaded, Path from) {
        loading = true;
        try {
            base = loaded.project();
            structure.load(base.structure());
            boolean variance = base.absorber().method() == DesignMethod.EXACT_VARIANCE
                    || base.absorber().method() == DesignMethod.MINIMUM_VARIANCE;
            disturbance.load(base.disturbance(), variance
                    && base.disturbance().kind() == org.counterpoise.core.model.ExcitationKind.FORCE);
            goal.load(base.absorber());
            robustness.load(base.toRobustness());
        } finally {
            loading = false;
        }
        file = from;
        dirty = false;
        updateTitle();
        if (!loaded.unknownFields().isEmpty()) {
            status.setText("Note: fields not used from the file: " + String.join(", ", loaded.unknownFields()));
        }
        recompute();
    }

    private void edited() {
        if (loading) {
            return;
        }
        dirty = true;
        updateTitle();
        generation++;
        stale.setText("updating\u2026");
        pause.restart();
    }

    /** Validates every step, then starts the background design of the current inputs. */
    void recompute() {
        pause.stop();
        long gen = ++generation;
        steps.forEach(Step::clearProblems);
        goal.methodProblem(null);
        StructureInput s = attempt(structure, structure::input);
        DisturbanceInput d = attempt(disturbance, disturbance::input);
        AbsorberInput a = attempt(goal, () -> goal.input(base.absorber()));
        RobustnessSettings rs = attempt(robustness, () -> robustness.settings(base.toRobustness()));
        Structure builtStructure = null;
        DesignStudy study = null;
        if (s != null && d != null && a != null && rs != null) {
            Project p = new Project(base.name(), base.notes(), s, d, a, robustnessInput(rs));
            try {
                builtStructure = p.toStructure();
                structure.showDerived(builtStructure);
                disturbance.showDerived(p.toExcitation(), builtStructure);
                if (disturbance.broadband() && goal.method() != DesignMethod.MINIMUM_VARIANCE
                        && goal.method() != DesignMethod.EXACT_VARIANCE) {
                    throw new InvalidInputException("absorber.method", goal.method().id(),
                            "a broadband force needs minimum-variance or exact-variance");
                }
                study = p.toStudy();
            } catch (InvalidInputException e) {
                route(e);
            }
        } else if (s != null) {
            try {
                builtStructure = new Project(base.name(), base.notes(), s, base.disturbance(), base.absorber(), null)
                        .toStructure();
            } catch (InvalidInputException e) {
                route(e);
            }
        }
        if (builtStructure == null) {
            structure.showDerived(null);
        }
        stepList.repaint();
        updateNavigation();
        if (study == null) {
            shown = null;
            shownGeneration = gen;
            result.show(null, null);
            robustness.show(null, null);
            sheet.show(null, base.notes());
            goal.massChart().message("Fix the inputs to see the curve.");
            stale.setText(" ");
            return;
        }
        startDesign(study, gen);
    }

    private <T> T attempt(Step step, java.util.function.Supplier<T> s) {
        try {
            return s.get();
        } catch (InvalidInputException e) {
            if (!step.showProblem(e)) {
                route(e);
            }
            return null;
        }
    }

    private void route(InvalidInputException e) {
        if (e.field().equals("absorber.method")) {
            goal.methodProblem(e.getMessage().substring(e.getMessage().indexOf(':') + 1).strip());
            goal.markProblem(e.getMessage());
            return;
        }
        for (Step s : steps) {
            if (s.showProblem(e)) {
                return;
            }
        }
        status.setText(e.getMessage());
    }

    private RobustnessInput robustnessInput(RobustnessSettings rs) {
        RobustnessInput old = base.robustness();
        return new RobustnessInput(100 * rs.structureRange(), 100 * rs.absorberRange(),
                old == null ? null : old.target(), rs.samples(), rs.seed(),
                old == null ? null : old.structureMass(), old == null ? null : old.structureStiffness(),
                old == null ? null : old.absorberMass(), old == null ? null : old.absorberStiffness(),
                old == null ? null : old.absorberDamping());
    }

    private void startDesign(DesignStudy study, long gen) {
        stale.setText("computing\u2026");
        new SwingWorker<Computed, Void>() {
            @Override
            protected Computed doInBackground() {
                DesignResult r = Designer.design(study);
                return new Computed(r, DesignCurves.of(r));
            }

            @Override
            protected void done() {
                if (gen != generation) {
                    return; // inputs changed meanwhile: never show a stale result as current
                }
                try {
                    Computed c = get();
                    DesignResult r = c.result();
                    shown = r;
                    shownGeneration = gen;
                    result.show(r, c.curves());
                    sheet.show(r, base.notes());
                    if (current == steps.indexOf(sheet)) {
                        sheet.shown();
                    }
                    stale.setText(" ");
                    if (status.getText().startsWith("Note:") == false) {
                        status.setText(" ");
                    }
                    updateNavigation();
                    startRobustness(r, gen);
                    startMassChart(study, r, gen);
                } catch (ExecutionException e) {
                    failed(e.getCause());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        }.execute();
    }

    /** A design and its curves, both computed off the event thread. */
    private record Computed(DesignResult result, DesignCurves curves) {
    }

    private void failed(Throwable cause) {
        shown = null;
        result.show(null, null);
        robustness.show(null, null);
        sheet.show(null, base.notes());
        goal.massChart().message("Fix the inputs to see the curve.");
        if (cause instanceof InvalidInputException bad) {
            route(bad);
        } else {
            java.util.logging.Logger.getLogger("counterpoise").log(java.util.logging.Level.WARNING, "design failed",
                    cause);
            status.setText("The design could not be computed (" + cause.getClass().getSimpleName()
                    + "); please report this case.");
        }
        stale.setText(" ");
        stepList.repaint();
        updateNavigation();
    }

    private void startRobustness(DesignResult r, long gen) {
        robustness.show(r, null);
        new SwingWorker<RobustnessResult, Void>() {
            @Override
            protected RobustnessResult doInBackground() {
                return RobustnessAnalysis.run(r, r.study().robustness());
            }

            @Override
            protected void done() {
                if (gen != generation) {
                    return;
                }
                try {
                    robustness.show(r, get());
                } catch (ExecutionException e) {
                    robustness.show(null, null);
                    status.setText("The robustness study could not be computed: " + e.getCause().getMessage());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        }.execute();
    }

    private void startMassChart(DesignStudy study, DesignResult r, long gen) {
        double[] mus = AchievablePeak.massRatios(0.005, 0.3, 16);
        new SwingWorker<double[], Void>() {
            @Override
            protected double[] doInBackground() {
                return AchievablePeak.overMassRatio(study, mus);
            }

            @Override
            protected void done() {
                if (gen != generation) {
                    return;
                }
                try {
                    goal.massChart().show(massChart(study, r, mus, get()));
                } catch (ExecutionException e) {
                    goal.massChart().message("No optimum peak for this case: " + e.getCause().getMessage());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        }.execute();
    }

    private static XYChart massChart(DesignStudy study, DesignResult r, double[] mus, double[] peaks) {
        var unit = org.counterpoise.io.text.DisplayUnits.of(study.response().dimension());
        XYChart c = new XYChartBuilder().width(560).height(260).xAxisTitle("Mass ratio \u03bc")
                .yAxisTitle("Least peak " + org.counterpoise.ui.gui.field.QuantityField.pretty(unit.symbol())).build();
        c.getStyler().setChartBackgroundColor(Color.WHITE);
        c.getStyler().setPlotBackgroundColor(Color.WHITE);
        c.getStyler().setLegendVisible(false);
        c.getStyler().setXAxisLogarithmic(true);
        c.getStyler().setYAxisLogarithmic(true);
        c.getStyler().setXAxisDecimalPattern("0.###");
        c.getStyler().setYAxisDecimalPattern("0.##########");
        double[] y = new double[peaks.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = unit.fromSi(peaks[i]);
        }
        XYSeries s = c.addSeries("least peak", mus, y);
        s.setLineColor(org.counterpoise.io.chart.ChartFactory.AFTER);
        s.setMarker(SeriesMarkers.CIRCLE);
        s.setMarkerColor(org.counterpoise.io.chart.ChartFactory.AFTER);
        XYSeries now = c.addSeries("this design", new double[] {r.tuning().massRatio()},
                new double[] {unit.fromSi(r.responseAfter().value())});
        now.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        now.setMarkerColor(new Color(0xb3, 0x5c, 0x1e));
        now.setMarker(SeriesMarkers.DIAMOND);
        return c;
    }

    private void go(int index) {
        if (index < 0 || index >= steps.size()) {
            return;
        }
        current = index;
        cards.show(center, steps.get(index).title());
        if (stepList.getSelectedIndex() != index) {
            stepList.setSelectedIndex(index);
        }
        steps.get(index).shown();
        updateNavigation();
    }

    private void updateNavigation() {
        back.setEnabled(current > 0);
        String reason = null;
        for (int i = 0; i <= current; i++) {
            if (steps.get(i).problem() != null) {
                reason = "Next is not possible: " + steps.get(i).title() + ": "
                        + steps.get(i).problem().substring(steps.get(i).problem().indexOf(':') + 1).strip();
                break;
            }
        }
        if (reason == null && current >= 2 && shown == null) {
            reason = "Next is not possible until a design is computed.";
        }
        boolean last = current == steps.size() - 1;
        next.setEnabled(reason == null && !last);
        next.putValue(Action.SHORT_DESCRIPTION, reason);
        if (reason != null) {
            status.setText(reason);
            status.setForeground(new Color(0xb0, 0x2a, 0x1e));
        } else {
            status.setForeground(javax.swing.UIManager.getColor("Label.foreground"));
            if (status.getText().startsWith("Next is not possible")) {
                status.setText(" ");
            }
        }
    }

    private void open() {
        if (!confirmDiscard()) {
            return;
        }
        JFileChooser chooser = new JFileChooser(file == null ? null : file.getParent().toFile());
        chooser.setFileFilter(new FileNameExtensionFilter("Counterpoise project (JSON)", "json"));
        if (chooser.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            openFile(chooser.getSelectedFile().toPath());
        }
    }

    /**
     * @param path a project file to open
     * @return true when it was opened; a bad file is reported and nothing already open is lost
     */
    public boolean openFile(Path path) {
        try {
            LoadedProject p = ProjectReader.read(path);
            p.project().toStudy();
            load(p, path);
            recent.add(path);
            refreshRecent();
            return true;
        } catch (InvalidInputException e) {
            JOptionPane.showMessageDialog(this, "This project cannot be opened:\n" + e.getMessage(), "Open",
                    JOptionPane.WARNING_MESSAGE);
            return false;
        }
    }

    private boolean save(boolean choose) {
        Project p = currentProject();
        if (p == null) {
            JOptionPane.showMessageDialog(this, "Fix the inputs marked in red before saving.", "Save",
                    JOptionPane.WARNING_MESSAGE);
            return false;
        }
        Path target = file;
        if (choose || target == null) {
            JFileChooser chooser = new JFileChooser(file == null ? null : file.getParent().toFile());
            chooser.setFileFilter(new FileNameExtensionFilter("Counterpoise project (JSON)", "json"));
            if (chooser.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) {
                return false;
            }
            target = chooser.getSelectedFile().toPath();
            if (!target.toString().endsWith(".json")) {
                target = target.resolveSibling(target.getFileName() + ".json");
            }
        }
        return saveTo(target);
    }

    /**
     * @param target where to save
     * @return true when saved
     */
    public boolean saveTo(Path target) {
        Project p = currentProject();
        if (p == null) {
            return false;
        }
        try {
            ProjectWriter.save(p, target);
            base = p;
            file = target;
            dirty = false;
            recent.add(target);
            refreshRecent();
            updateTitle();
            return true;
        } catch (IOException e) {
            JOptionPane.showMessageDialog(this, "The project could not be saved to " + target + ":\n" + e.getMessage(),
                    "Save", JOptionPane.WARNING_MESSAGE);
            return false;
        }
    }

    /** @return the project as currently entered, or null when some input is invalid */
    public Project currentProject() {
        try {
            RobustnessSettings rs = robustness.settings(base.toRobustness());
            Project p = new Project(base.name(), base.notes(), structure.input(), disturbance.input(),
                    goal.input(base.absorber()), robustnessInput(rs));
            p.toStudy();
            return p;
        } catch (InvalidInputException e) {
            return null;
        }
    }

    private void refreshRecent() {
        recentMenu.removeAll();
        for (Path p : recent.list()) {
            recentMenu.add(item(p.getFileName().toString(), (char) 0, null, e -> {
                if (confirmDiscard()) {
                    openFile(p);
                }
            }));
        }
        recentMenu.setEnabled(!recent.list().isEmpty());
    }

    private boolean confirmDiscard() {
        if (!dirty) {
            return true;
        }
        int answer = JOptionPane.showConfirmDialog(this, "Save the changes to " + base.name() + "?", "Unsaved changes",
                JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE);
        return answer == JOptionPane.NO_OPTION || (answer == JOptionPane.YES_OPTION && save(false));
    }

    private void closeRequested() {
        if (confirmDiscard()) {
            dispose();
        }
    }

    private void updateTitle() {
        setTitle((dirty ? "\u2022 " : "") + base.name() + (file == null ? "" : " \u2014 " + file.getFileName())
                + " \u2014 Counterpoise");
    }

    // --- for tests: read-only views of the state -------------------------------------------------

    /** @return the result on screen, or null */
    public DesignResult shownResult() {
        return shown;
    }

    /** @return true when the result on screen belongs to the latest inputs */
    public boolean settled() {
        return shownGeneration == generation && !pause.isRunning();
    }

    /** @return true when Next is enabled */
    public boolean nextEnabled() {
        return next.isEnabled();
    }

    /** @return the status line */
    public String statusText() {
        return status.getText();
    }

    /** @param index step to show */
    public void showStep(int index) {
        go(index);
    }

    /** @return the result table's rows as label, value, unit */
    public List<String[]> resultRows() {
        List<String[]> out = new ArrayList<>();
        var t = result.table();
        for (int i = 0; i < t.getRowCount(); i++) {
            out.add(new String[] {String.valueOf(t.getValueAt(i, 0)), String.valueOf(t.getValueAt(i, 1)),
                String.valueOf(t.getValueAt(i, 2))});
        }
        return out;
    }

    /** @return true when there are unsaved changes */
    public boolean dirty() {
        return dirty;
    }

    /** @return the sheet step has drawn its preview */
    public boolean sheetPreviewShown() {
        return sheet.previewShown();
    }

    /** @return the robustness summary line */
    public String robustnessSummary() {
        return robustness.summary();
    }

    /** @param hz a frequency under the pointer @return the readout line */
    public String readoutAt(double hz) {
        result.read(hz);
        return result.readout();
    }
}
