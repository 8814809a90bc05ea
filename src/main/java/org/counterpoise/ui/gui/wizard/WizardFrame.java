package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.event.KeyEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.UIManager;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.project.FormatMigration;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.text.SeveralAbsorbersContent;
import org.counterpoise.ui.gui.Themes;
import org.counterpoise.ui.gui.action.Actions;
import org.counterpoise.ui.gui.action.EditActions;
import org.counterpoise.ui.gui.action.FileActions;
import org.counterpoise.ui.gui.action.WizardMenus;
import org.counterpoise.ui.gui.document.DesignDocument;
import org.counterpoise.ui.gui.document.DocumentChange;
import org.counterpoise.ui.gui.session.WindowPlacement;
import org.counterpoise.ui.gui.task.TaskBar;
import org.counterpoise.ui.gui.task.TaskRunner;

/**
 * The design wizard's window: a list of steps on the left, the current step in the middle, Back
 * and Next below with the reason when Next is not possible, and the task bar. Layout and
 * navigation only: the project lives in the {@link DesignDocument}, the steps are its views,
 * {@link DesignRun} computes results, and the actions do files, undo and redo.
 */
public final class WizardFrame extends JFrame {
    private final DesignDocument document = new DesignDocument(FileActions.untitled());
    private final TaskBar taskBar = new TaskBar();
    private final JLabel status = new JLabel(" ");
    /** True while the status line shows why Next is disabled (cleared when that reason goes). */
    private boolean statusSaysWhyNextIsOff;
    private final JLabel projectName = new JLabel(" ");
    private final DesignRun run;
    private final TaskRunner tasks;
    private final DesignRun.Steps steps;
    private final StepPages pages;
    private final StepList stepList;
    private final Action back = Actions.of("Back", KeyEvent.VK_B, null, e -> go(this.current - 1));
    private final Action next = Actions.of("Next", KeyEvent.VK_N, null, e -> go(this.current + 1));
    private final FileActions files;
    private final EditActions edits = new EditActions(document);
    private final ProjectDetailsDialog detailsDialog;
    private final UnitSystemControl units = new UnitSystemControl(document);
    private int current;

    /** Builds the window with a new, untitled project, every step made. */
    public WizardFrame() {
        this(true);
    }

    /** @param everyStep true to make every step now; false for the first one (the others by {@link #makeRestLater()}) */
    private WizardFrame(boolean everyStep) {
        super("Counterpoise");
        setName("wizard");
        setDefaultCloseOperation(DO_NOTHING_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                closeRequested();
            }
        });
        DesignRun[] holder = new DesignRun[1];
        tasks = new TaskRunner(() -> holder[0].generation(), taskBar);
        steps = DesignRun.Steps.of(tasks, this::say, () -> holder[0].sizingContext());
        run = new DesignRun(document, steps, this::say, this::updateNavigation);
        holder[0] = run;
        run.use(tasks);
        Project first = document.project();
        pages = new StepPages(steps.all(), s -> {
            s.attach(document, () -> {
                run.changed();
                updateTitle();
            });
            // the first project, then today's: a field left alone (inactive) holds what it held made with the window
            s.sync(first, DocumentChange.Kind.LOADED);
            if (document.project() != first) {
                s.sync(document.project(), DocumentChange.Kind.LOADED);
            }
        });
        if (everyStep) {
            pages.makeAll();
            run.ready();
        } else {
            pages.page(0).get();
        }
        files = new FileActions(this, document, tasks, run::fieldsValid, this::say);
        stepList = new StepList(pages, this::go, () -> current);
        detailsDialog = new ProjectDetailsDialog(this, document, files, edits);
        setContentPane(layoutRoot());
        setJMenuBar(WizardMenus.build(this, files, edits, this::showDetails,
                name -> files.whenDiscarded(() -> load(Presets.load(name), null)), this::closeRequested,
                units.menuItems()));
        if (everyStep) {
            scenariosSoon();
        }
        files.bind(getRootPane());
        edits.bind(getRootPane());
        document.addListener(this::documentChanged);
        documentChanged(new DocumentChange(DocumentChange.Kind.LOADED, document.project(), null));
        go(0);
        WindowPlacement.restore(this, new Dimension(1280, 800));
    }

    /**
     * The window with its first step only, up sooner (docs/performance.md, "The wizard's first window"): shown,
     * then the other steps made by {@link #makeRestLater()}, or each when first needed before that.
     * @return the window, not yet shown
     */
    public static WizardFrame firstStepOnly() {
        return new WizardFrame(false);
    }

    /** Makes the steps not made yet, a piece per event (the window answers between them), then designs the project. */
    public void makeRestLater() {
        pages.makeRestLater(() -> {
            run.ready();
            scenariosSoon();
        });
    }

    /** Reads the example scenarios' names in the background (their menu's first opening then waits for none). */
    private void scenariosSoon() {
        WizardMenus.readScenariosSoon(getJMenuBar());
    }

    private JPanel layoutRoot() {
        JButton backButton = new JButton(back);
        backButton.setName("back");
        JButton nextButton = new JButton(next);
        nextButton.setName("next");
        status.setName("status");
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 6));
        buttons.add(backButton);
        buttons.add(nextButton);
        JPanel south = new JPanel(new BorderLayout());
        south.setBorder(BorderFactory.createEmptyBorder(2, 12, 2, 6));
        JPanel messages = new JPanel(new BorderLayout());
        messages.add(status, BorderLayout.CENTER);
        messages.add(taskBar, BorderLayout.EAST);
        south.add(messages, BorderLayout.CENTER);
        south.add(buttons, BorderLayout.EAST);
        JButton project = new JButton("Project details\u2026");
        project.setName("project.open");
        project.setMnemonic('j');
        project.setToolTipText("Name, revision, date of issue, engineer, client or site, notes");
        project.addActionListener(e -> showDetails());
        projectName.setName("project.title");
        projectName.setFont(projectName.getFont().deriveFont(Font.BOLD));
        JPanel header = new JPanel(new BorderLayout(0, 4));
        header.setBorder(BorderFactory.createEmptyBorder(10, 14, 0, 10));
        header.add(projectName, BorderLayout.NORTH);
        header.add(project, BorderLayout.WEST);
        header.add(units.component(), BorderLayout.SOUTH);
        JPanel west = new JPanel(new BorderLayout());
        west.add(header, BorderLayout.NORTH);
        west.add(stepList, BorderLayout.CENTER);
        JPanel root = new JPanel(new BorderLayout());
        root.add(west, BorderLayout.WEST);
        root.add(pages.center(), BorderLayout.CENTER);
        root.add(south, BorderLayout.SOUTH);
        getRootPane().setDefaultButton(nextButton);
        return root;
    }

    private void showDetails() {
        detailsDialog.show();
    }

    private void documentChanged(DocumentChange change) {
        boolean reload = change.kind() != DocumentChange.Kind.EDITED && change.kind() != DocumentChange.Kind.SAVED;
        for (Page<? extends Step> s : steps.all()) {
            s.ifMade().ifPresent(made -> made.sync(change.project(), change.kind()));
        }
        units.show(change.project());
        pages.showUnitSystem(change.project().displayUnits());
        if (reload) {
            detailsDialog.load(change.project());
        } else {
            detailsDialog.sync(change.project());
        }
        if (change.note() != null) {
            say(change.note());
        } else if (change.kind() == DocumentChange.Kind.LOADED) {
            say(" ");
        }
        updateTitle();
        if (change.kind() != DocumentChange.Kind.SAVED) {
            if (reload) {
                run.changed();
                run.recompute();
            } else {
                run.changed();
            }
        }
    }

    private void say(String text) {
        statusSaysWhyNextIsOff = false;
        status.setText(text);
        status.setForeground(UIManager.getColor("Label.foreground"));
    }

    /**
     * Loads a project into every step (not an edit: the project is clean afterwards).
     * @param loaded the project
     * @param from its file, or null
     */
    public void load(LoadedProject loaded, Path from) {
        document.load(loaded.project(), from);
        if (!loaded.unknownFields().isEmpty()) {
            say("Note: fields not used from the file: " + String.join(", ", loaded.unknownFields()));
        }
        if (!FormatMigration.isOneModeOneAbsorber(loaded.project())) {
            say("Note: " + SeveralAbsorbersContent.IN_THE_WIZARD);
        }
    }

    private void go(int index) {
        if (index < 0 || index >= pages.size()) {
            return;
        }
        current = index;
        Step shown = pages.show(index);
        if (stepList.getSelectedIndex() != index) {
            stepList.setSelectedIndex(index);
        }
        shown.shown();
        updateNavigation();
    }

    private void updateNavigation() {
        stepList.repaint();
        back.setEnabled(current > 0);
        String reason = null;
        for (int i = 0; i <= current; i++) {
            String problem = pages.page(i).problem();
            if (problem != null) {
                reason = "Next is not possible: " + pages.page(i).title() + ": "
                        + problem;
                break;
            }
        }
        if (reason == null && current >= 2 && run.shown() == null) {
            reason = "Next is not possible until a design is computed.";
        }
        next.setEnabled(reason == null && current < pages.size() - 1);
        next.putValue(Action.SHORT_DESCRIPTION, reason);
        if (reason != null) {
            status.setText(reason);
            status.setForeground(Themes.problemColour());
            statusSaysWhyNextIsOff = true;
        } else if (statusSaysWhyNextIsOff) {
            say(" ");
        }
    }

    private void closeRequested() {
        files.whenDiscarded(this::dispose);
    }

    private void updateTitle() {
        Path file = document.file();
        String name = document.project().name();
        projectName.setText(name.length() > 26 ? name.substring(0, 25) + "\u2026" : name);
        projectName.setToolTipText(name);
        setTitle((document.dirty() ? "\u2022 " : "") + document.project().name()
                + (file == null ? "" : " \u2014 " + file.getFileName()) + " \u2014 Counterpoise");
    }

    // --- for tests: read-only views of the state, and the actions a user would take ----------------

    /** @return the document (the project, undo and redo) */
    public DesignDocument document() {
        return document;
    }

    /**
     * @param path a project file to open
     * @return true when it was opened; a bad file is reported and nothing already open is lost
     */
    public boolean openFile(Path path) {
        return files.openFile(path);
    }

    /** @param target where to save (in the background; {@link #dirty()} turns false when done) */
    public void saveTo(Path target) {
        files.saveTo(target, null);
    }

    /** @return the project as edited, or null when some field on screen does not hold a value */
    public Project currentProject() {
        return run.fieldsValid() ? document.project() : null;
    }

    /** @return the result on screen, or null */
    public DesignResult shownResult() {
        return run.shown();
    }

    /** @return true when the result on screen belongs to the latest inputs */
    public boolean settled() {
        return run.settled();
    }

    /** @return true when Next is enabled */
    public boolean nextEnabled() {
        return next.isEnabled();
    }

    /** @return the status line */
    public String statusText() {
        return status.getText();
    }

    /** @return what the task bar shows, or empty while nothing runs */
    public String taskText() {
        return taskBar.shown();
    }

    /** @param index step to show */
    public void showStep(int index) {
        go(index);
    }

    /** Opens the project details window. */
    public void showProjectDetails() {
        showDetails();
    }

    /** @return the result table's rows as label, value, unit */
    public List<String[]> resultRows() {
        List<String[]> out = new ArrayList<>();
        var t = steps.result().get().table();
        for (int i = 0; i < t.getRowCount(); i++) {
            out.add(new String[] {String.valueOf(t.getValueAt(i, 0)), String.valueOf(t.getValueAt(i, 1)),
                String.valueOf(t.getValueAt(i, 2))});
        }
        return out;
    }

    /** @return the result step's hardware tab (package tests) */
    RealisationView hardwareView() {
        return steps.result().get().hardware();
    }

    /** @return true when there are unsaved changes */
    public boolean dirty() {
        return document.dirty();
    }

    /** @return the sheet step has drawn its preview */
    public boolean sheetPreviewShown() {
        return steps.sheet().get().previewShown();
    }

    /** @return the robustness summary line */
    public String robustnessSummary() {
        return steps.robustness().get().summary();
    }

    /** @param hz a frequency under the pointer @return the readout line */
    public String readoutAt(double hz) {
        steps.result().get().read(hz);
        return steps.result().get().readout();
    }
}
