package org.counterpoise.ui.gui.wizard;

import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Supplier;
import java.util.logging.Level;
import java.util.logging.Logger;
import javax.swing.JLabel;
import javax.swing.Timer;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.AchievablePeak;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.NotFoundException;
import org.counterpoise.core.model.Structure;
import org.counterpoise.io.chart.ChartTheme;
import org.counterpoise.io.project.FormatMigration;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.ComparisonContent;
import org.counterpoise.io.text.ReportComparison;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.gui.document.DesignDocument;
import org.counterpoise.ui.gui.plot.ChartHost;
import org.counterpoise.ui.gui.task.TaskRunner;

/**
 * Turns the document into results on screen: after a short pause it checks every step's fields,
 * routes each problem to the field it belongs to, and computes the design, its robustness study
 * and the mass-ratio curve in the background. A result is shown only for the inputs it was
 * computed from: every change of the document or of a field's text moves {@link #generation()},
 * and the task runner drops results of an older generation.
 */
final class DesignRun {
    /** Pause after the last keystroke before recomputing; the design itself takes a few ms. */
    private static final int PAUSE_MS = 60;

    private final DesignDocument document;
    private final Steps steps;
    private final Consumer<String> status;
    private final Runnable navigation;
    private final Timer pause = new Timer(PAUSE_MS, e -> recompute());
    /** The analyses of recent project states: one state is designed and studied once. */
    private final DesignDossier.Cache dossiers = new DesignDossier.Cache();
    private TaskRunner tasks;
    private long generation;
    private long shownGeneration = -1;
    private DesignResult shown;
    /** False until every step is made; a recompute asked for before then waits for {@link #ready()}. */
    private boolean ready;
    private boolean waiting;

    /**
     * The steps this run reads and fills, each made when first needed ({@link Page}).
     *
     * @param structure step 1
     * @param disturbance step 2
     * @param goal step 3
     * @param hardware step 4
     * @param result step 5
     * @param robustness step 6
     * @param sheet step 7
     */
    record Steps(Page<StructureStep> structure, Page<DisturbanceStep> disturbance, Page<GoalStep> goal,
            Page<HardwareStep> hardware, Page<ResultStep> result, Page<RobustnessStep> robustness,
            Page<SheetStep> sheet) {
        List<Page<? extends Step>> all() {
            return List.of(structure, disturbance, goal, hardware, result, robustness, sheet);
        }

        /**
         * @param tasks the wizard's task runner
         * @param messages the wizard's status line
         * @param sizing what the goal step's change of sizing reads (asked when it is made)
         * @return the wizard's steps, none made yet; the large ones in parts made ahead of them ({@link Part})
         */
        static Steps of(TaskRunner tasks, SheetStep.Messages messages, Supplier<GoalStep.SizingContext> sizing) {
            Part<BalanceGradeForm> balance = new Part<>(BalanceGradeForm::new);
            // the goal step's criterion summary is the wizard's first HTML text, whose making loads Swing's HTML
            // parser and style sheet (70 ms on an idle build machine, measured): in an event of its own, before it
            Part<JLabel> firstHtml = new Part<>(() -> new JLabel("<html>Swing's HTML support, loaded</html>"));
            Part<CriterionForm> criterion = new Part<>(CriterionForm::new);
            Part<ToleranceRangesForm> ranges = new Part<>(ToleranceRangesForm::new);
            ResultStep.Tabs tabs = ResultStep.Tabs.of(tasks);
            return new Steps(new Page<>(StructureStep.TITLE, StructureStep::new),
                    new Page<>(DisturbanceStep.TITLE, () -> new DisturbanceStep(balance.get()), balance),
                    new Page<>(GoalStep.TITLE, () -> {
                        GoalStep goal = new GoalStep(criterion.get(), ranges.get());
                        goal.sizingContext(sizing.get());
                        return goal;
                    }, firstHtml, criterion, ranges), new Page<>(HardwareStep.TITLE, HardwareStep::new),
                    new Page<>(ResultStep.TITLE, () -> new ResultStep(tasks, messages, tabs), tabs.all()),
                    new Page<>(RobustnessStep.TITLE, RobustnessStep::new),
                    new Page<>(SheetStep.TITLE, () -> new SheetStep(tasks, messages)));
        }
    }

    DesignRun(DesignDocument document, Steps steps, Consumer<String> status, Runnable navigation) {
        this.document = document;
        this.steps = steps;
        this.status = status;
        this.navigation = navigation;
        pause.setRepeats(false);
    }

    /** @param runner the runner whose generation is {@link #generation()} */
    void use(TaskRunner runner) {
        this.tasks = runner;
    }

    /** @return grows with every change of the inputs, committed or not */
    long generation() {
        return generation;
    }

    /** Inputs changed (an edit, or text that is not a number yet): recompute after a pause. */
    void changed() {
        generation++;
        steps.result().ifMade().ifPresent(r -> { // the parts on screen are for the old inputs: gone at once
            r.hardware().stale();
            r.several().stale();
        });
        if (tasks != null) {
            tasks.cancelStale(); // work for the old inputs stops now, not after the pause
        }
        pause.restart();
    }

    /** Every step is made: the design asked for meanwhile, if any, starts now. */
    void ready() {
        ready = true;
        if (waiting) {
            waiting = false;
            recompute();
        }
    }

    /** @return what the goal step's change of sizing reads: the structure as entered, and the design on screen */
    GoalStep.SizingContext sizingContext() {
        return new GoalStep.SizingContext() {
            @Override
            public Structure structure() {
                try {
                    return document.project().toStructure();
                } catch (InvalidInputException e) {
                    return null;
                }
            }

            @Override
            public DesignResult design() {
                return shown;
            }
        };
    }

    /** @return the result on screen, or null */
    DesignResult shown() {
        return shown;
    }

    /** @return true when the result on screen belongs to the latest inputs */
    boolean settled() {
        return shownGeneration == generation && !pause.isRunning();
    }

    /** @return true when every field on every step holds a value */
    boolean fieldsValid() {
        boolean ok = true;
        for (Page<? extends Step> s : steps.all()) {
            ok &= s.fieldsValid();
        }
        return ok;
    }

    /** Validates every step, then starts the background design of the document's project. */
    void recompute() {
        pause.stop();
        long gen = ++generation;
        if (!ready) {
            waiting = true; // designed once every step is made (the steps read and show it)
            Structure first = null;
            try {
                first = fieldsValid() ? document.project().toStructure() : null;
            } catch (InvalidInputException e) {
                // shown under its field once every step is made
            }
            steps.structure().get().showDerived(first, document.project().displayUnits()); // the first step's derived values, as a whole window has them
            return;
        }
        steps.all().forEach(s -> s.get().clearProblems());
        steps.goal().get().methodProblem(null);
        steps.goal().get().criterionProblem(null);
        Project p = document.project();
        DesignStudy study = null;
        Structure built = null;
        if (fieldsValid()) {
            try {
                built = p.toStructure();
                steps.structure().get().showDerived(built, p.displayUnits());
                steps.disturbance().get().showDerived(p.toExcitation(), built);
                p.runUpRate();
                p.toRobustness();
                study = p.toStudy();
            } catch (InvalidInputException e) {
                route(e);
            }
        }
        if (built == null) {
            steps.structure().get().showDerived(null, p.displayUnits());
        }
        if (study == null) {
            clearResults(gen);
            navigation.run();
            return;
        }
        startDesign(study, p, gen);
        navigation.run();
    }

    private void clearResults(long gen) {
        shown = null;
        shownGeneration = gen;
        steps.result().get().show(null, null);
        steps.result().get().several().failed("Fix the inputs to see the absorbers.");
        steps.robustness().get().show(null, null);
        steps.sheet().get().show(null, document.project());
        steps.goal().get().massChart().message("Fix the inputs to see the curve.");
    }

    /** @param e a problem: shown under its field, or on the status line when no field owns it */
    void route(InvalidInputException e) {
        if (e.field().equals("absorber.method")) {
            steps.goal().get().methodProblem(e.problem());
            steps.goal().get().markProblem(e.problem());
            return;
        }
        if ((e.field().startsWith("acceptance") && !e.field().startsWith("acceptance.limit"))
                || e.field().startsWith("absorber.meet_acceptance")) {
            // the criterion's lists are not number fields: the problem is said under the criterion
            steps.goal().get().criterionProblem(e.problem());
            steps.goal().get().markProblem(e.problem());
            return;
        }
        for (Page<? extends Step> s : steps.all()) {
            if (s.get().showProblem(e)) {
                return;
            }
        }
        status.accept(e.getMessage());
    }

    private void startDesign(DesignStudy study, Project p, long gen) {
        DesignDossier dossier = dossiers.dossier(study);
        tasks.current(null, progress -> {
            dossier.curves(); // the design and its curves, computed once for this state
            return dossier;
        }, (DesignDossier d) -> {
            shown = d.design();
            shownGeneration = gen;
            steps.result().get().designedFrom(p);
            steps.result().get().show(d.design(), d.curves());
            steps.result().get().hardware().design(d, p.hardware(), p.displayUnits(),
                    FormatMigration.isOneModeOneAbsorber(p) ? Optional.empty() : SeveralModes.layout(p));
            steps.sheet().get().show(d, p);
            if (steps.sheet().get().component().isShowing()) {
                steps.sheet().get().shown();
            }
            navigation.run();
            startSeveral(d, p);
            startComparison(d);
            startRobustness(d);
            startMassChart(study, d.design());
        }, e -> failed(e, gen));
    }

    private void failed(Throwable cause, long gen) {
        clearResults(gen);
        if (cause instanceof InvalidInputException bad) {
            route(bad);
        } else if (cause instanceof NotFoundException notFound) {
            status.accept(notFound.getMessage()); // a plain sentence: no certified optimum, what to try
        } else {
            Logger.getLogger("counterpoise").log(Level.WARNING, "design failed", cause);
            status.accept("The design could not be computed for these inputs; please report this case.");
        }
        navigation.run();
    }

    /**
     * Several modes or absorbers (format 6): the absorbers on the whole structure, their tolerances within
     * the set and the response curves, off the event thread (an optimiser and exact peak searches);
     * dropped if the state changed.
     */
    private void startSeveral(DesignDossier dossier, Project p) {
        SeveralAbsorbersView view = steps.result().get().several();
        Optional<AbsorberLayout> layout;
        try {
            layout = SeveralModes.layout(p);
        } catch (InvalidInputException bad) {
            view.failed(bad.getMessage());
            return;
        }
        if (layout.isEmpty()) {
            view.none();
            return;
        }
        UnitSystem units = p.displayUnits();
        ChartTheme theme = ChartHost.currentTheme();
        view.computing();
        DesignResult design = dossier.design();
        tasks.current("Several absorbers", progress -> SeveralAbsorbersView.Shown.of(design, layout.get(),
                units, theme), shown -> {
                    view.show(shown);
                    // the verdict above the result is the whole structure's, as design and sheet give it
                    shown.acceptance().ifPresent(a -> steps.result().get().verdict().show(a,
                            VerdictPanel.orderNames(design, p)));
                }, e -> {
                    if (e instanceof CoreException plain) {
                        view.failed(plain.getMessage());
                    } else {
                        Logger.getLogger("counterpoise").log(Level.WARNING, "several absorbers failed", e);
                        view.failed("The several absorbers could not be computed for these inputs.");
                    }
                });
    }

    /**
     * The comparison of methods: several designs, so off the event thread; dropped if the state changed.
     * Started with every new design (not when its tab is shown): the line beside the design names the
     * recommended method, and the dossier computes it once per state, after the design is on screen.
     */
    private void startComparison(DesignDossier dossier) {
        DesignStudy study = dossier.study();
        steps.result().get().comparison().message("Comparing the design methods\u2026");
        tasks.current(null, progress -> ComparisonContent.of(dossier.comparison(progress), study),
                (ReportComparison c) -> steps.result().get().comparison().show(c), e -> {
                    Logger.getLogger("counterpoise").log(Level.WARNING, "comparison failed", e);
                    steps.result().get().comparison().message("The comparison of methods could not be computed for these"
                            + " inputs.");
                });
    }

    private void startRobustness(DesignDossier dossier) {
        DesignResult r = dossier.design();
        steps.robustness().get().show(r, null);
        tasks.current("Robustness study and Monte Carlo", progress -> {
            progress.phase(r.study().robustness().tolerances().anyGiven()
                    ? r.study().robustness().samples() + " sampled builds" : "worst case and robust design");
            RobustnessResult result = dossier.robustness(progress);
            progress.checkCancelled();
            return result;
        }, (RobustnessResult result) -> steps.robustness().get().show(r, result), e -> {
            steps.robustness().get().show(null, null);
            if (e instanceof InvalidInputException bad) {
                route(bad);
                navigation.run();
            } else {
                Logger.getLogger("counterpoise").log(Level.WARNING, "robustness failed", e);
                status.accept("The robustness study could not be computed for these inputs.");
            }
        }, () -> {
            steps.robustness().get().cancelled();
            status.accept("The robustness study was cancelled; it runs again after the next edit.");
        });
    }

    private void startMassChart(DesignStudy study, DesignResult r) {
        if (study.excitation().spectrum().isWhiteNoise()) {
            // The curve is of harmonic peaks (exact-peak designs); white noise is judged by rms values.
            steps.goal().get().massChart().message("This curve is for a harmonic disturbance; under white noise the"
                    + " design is judged by its rms response (see the Result step).");
            return;
        }
        double[] mus = AchievablePeak.massRatios(0.005, 0.3, 16);
        tasks.current(null, progress -> AchievablePeak.overMassRatio(study, mus),
                (double[] peaks) -> steps.goal().get().massChart().show(MassRatioChart.of(study, r, mus, peaks)),
                e -> steps.goal().get().massChart().message("No optimum peak for this case: " + e.getMessage()));
    }
}
