package org.counterpoise.io.sheet;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RunUpStudy;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.runup.RunUpComparison;
import org.counterpoise.core.runup.RunUpReportData;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.chart.ChartTheme;
import org.counterpoise.io.chart.RunUpCharts;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.RunUpReport;
import org.counterpoise.io.text.UnitSystem;

/**
 * The sheet's run-up page. When the project states a run-up rate ({@code disturbance.run_up_rate}),
 * the run-up from rest to 1.25 times the top running speed is computed ({@link RunUpStudy}) and
 * the page gives the peak table (with and without the absorber, the shaft speed of each peak, the
 * steady-state peak over the same speeds) and the envelope charts. Without a rate the page says
 * so and how to get it: no default rate is assumed, because a machine's acceleration ranges from
 * seconds (direct-on-line start) to minutes (soft start, large inertia) and a made-up rate would
 * print figures that look measured (see docs/runup.md).
 */
public final class RunUpPanel {
    /** The page's heading. */
    public static final String TITLE = "Run-up through resonance";
    private static final int CHART_WIDTH = 720;
    private static final int CHART_HEIGHT = 430;

    private RunUpPanel() {
    }

    /**
     * Computes the run-up when the project gives a rate.
     * @param project the project as typed (rate, harmonic order, speed unit)
     * @param design its design
     * @param listener progress and cancellation of the integration
     * @return the page
     */
    public static SheetPanel of(Project project, DesignResult design, ProgressListener listener) {
        OptionalDouble rate;
        try {
            rate = project.runUpRate();
        } catch (InvalidInputException e) {
            return note("The run-up was not computed: " + e.getMessage());
        }
        if (rate.isEmpty()) {
            return note("The run-up through resonance was not computed: the project gives no run-up rate."
                    + " State how fast the shaft speed changes at start and stop (disturbance.run_up_rate in"
                    + " the project file, or the run-up rate on the wizard's disturbance step), or run"
                    + " 'counterpoise runup FILE --rate R'. See docs/runup.md.");
        }
        if (design.study().excitation().kind() == ExcitationKind.BASE_ACCELERATION) {
            return note("The run-up was not computed: a base acceleration of constant amplitude started from rest"
                    + " drives the base away without bound (see docs/runup.md).");
        }
        RunUpStudy.Result result;
        try {
            RunUpStudy study = RunUpStudy.runUp(design, project.disturbance().harmonicOrder(), rate.getAsDouble());
            result = study.run(listener);
        } catch (InvalidInputException e) {
            return note("The run-up was not computed for disturbance.run_up_rate: " + e.problem());
        }
        return of(result, RunUpCharts.speedUnit(project.disturbance()), project.displayUnits());
    }

    /**
     * @param result a computed run-up
     * @param speedUnit the unit of shaft speeds
     * @return the page with the peak table and the charts, in SI
     */
    public static SheetPanel of(RunUpStudy.Result result, Unit speedUnit) {
        return of(result, speedUnit, UnitSystem.SI);
    }

    /**
     * @param result a computed run-up
     * @param speedUnit the unit of shaft speeds
     * @param units the unit system of the peaks and the charts' response axes
     * @return the page with the peak table and the charts
     */
    public static SheetPanel of(RunUpStudy.Result result, Unit speedUnit, UnitSystem units) {
        RunUpReportData d = result.data();
        RunUpComparison c = d.comparison();
        var ramp = c.withAbsorber().ramp();
        String what = d.runDown() ? "run-down" : "run-up";
        List<String> sentences = List.of(
                "A " + what + " at " + QuantityFormat.format(d.shaftRate(), Unit.RPM_PER_SECOND) + " from "
                        + QuantityFormat.format(d.shaftSpeed(ramp.startSpeed()), speedUnit) + " to "
                        + QuantityFormat.format(d.shaftSpeed(ramp.speedAt(ramp.duration())), speedUnit) + " ("
                        + QuantityFormat.number(ramp.duration(), QuantityFormat.FIGURES) + " s), integrated in time"
                        + " with and without the absorber (linear single-mode model, Dormand-Prince 8(5,3)).",
                "The steady-state column is what the machine would reach if it dwelt at each speed it passes;"
                        + " on the charts it is the thin, lighter line beside the envelope met during the " + what + ".");
        List<List<String>> table = new ArrayList<>();
        table.add(List.of("peak during the " + what, "with absorber", "without absorber"));
        for (ResponseKind k : RunUpReportData.QUANTITIES) {
            table.add(List.of(RunUpReport.label(k), RunUpReport.transientPeak(d, c.withAbsorber(), k, speedUnit, units),
                    RunUpReport.transientPeak(d, c.withoutAbsorber(), k, speedUnit, units)));
        }
        table.add(List.of("", "", ""));
        table.add(List.of("steady state, for comparison", "with absorber", "without absorber"));
        for (ResponseKind k : RunUpReportData.QUANTITIES) {
            table.add(List.of(RunUpReport.label(k),
                    RunUpReport.steadyPeak(d, c.steadyWithAbsorber(), k, speedUnit, units),
                    RunUpReport.steadyPeak(d, c.steadyWithoutAbsorber(), k, speedUnit, units)));
        }
        return new SheetPanel(TITLE, sentences, table, List.of(
                RunUpCharts.structure(result, speedUnit, units, ChartTheme.LIGHT, CHART_WIDTH, CHART_HEIGHT),
                RunUpCharts.stroke(result, speedUnit, units, ChartTheme.LIGHT, CHART_WIDTH, CHART_HEIGHT)));
    }

    private static SheetPanel note(String sentence) {
        return new SheetPanel(TITLE, List.of(sentence), List.of(), List.of());
    }
}
