package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.robust.MonteCarloOutcome;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.text.ReportRow.Amplitude;
import org.counterpoise.io.text.ReportValue.NotApplicable;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.Words;

/** The rows of a tolerance Monte Carlo, the same in the design report, on the sheet and in the robustness study. */
final class MonteCarloRows {
    private MonteCarloRows() {
    }

    /**
     * @param reason why the Monte Carlo was not run
     * @return the one row that says so; the JSON writes the reason's id (e.g. "no-tolerances")
     */
    static ReportRow notRun(MonteCarloOutcome.NotRun reason) {
        return new ReportRow(ReportKey.MONTE_CARLO_NOT_RUN, "not run", "",
                new Words(DesignContent.notRun(reason),
                        List.of(reason.name().toLowerCase(Locale.ROOT).replace('_', '-'))),
                "tolerance Monte Carlo", "");
    }

    /**
     * The rows of a tolerance Monte Carlo, the same on the sheet and in the robustness study.
     * @param mc the Monte Carlo
     * @param d the dimension of the response
     * @return its rows
     */
    static List<ReportRow> of(MonteCarloResult mc, Dimension d) {
        String source = "seeded Monte Carlo over the project's tolerances";
        List<ReportRow> out = new ArrayList<>();
        out.add(new ReportRow(ReportKey.MONTE_CARLO_SAMPLES, "samples", "", new ReportValue.Count(mc.samples()),
                source, ""));
        out.add(new ReportRow(ReportKey.MONTE_CARLO_SEED, "seed", "", new ReportValue.Count(mc.seed()), source, ""));
        out.add(new ReportRow(ReportKey.MONTE_CARLO_MEAN, "mean", "", q(mc.mean(), d), source, ""));
        out.add(new ReportRow(ReportKey.MONTE_CARLO_P50_P90, "P50 / P90", "",
                new Pair(q(mc.p50(), d), q(mc.p90(), d), PairKind.SIDE_BY_SIDE), source, ""));
        out.add(new ReportRow(ReportKey.MONTE_CARLO_P95_P99, "P95 / P99", "",
                new Pair(q(mc.p95(), d), q(mc.p99(), d), PairKind.SIDE_BY_SIDE), source, ""));
        out.add(new ReportRow(ReportKey.MONTE_CARLO_RANGE, "range", "",
                new Pair(q(mc.min(), d), q(mc.max(), d), PairKind.RANGE), source, ""));
        out.replaceAll(r -> r.key() == ReportKey.MONTE_CARLO_SAMPLES || r.key() == ReportKey.MONTE_CARLO_SEED ? r
                : DesignContent.stated(r, Amplitude.DISPLAY));
        out.add(new ReportRow(ReportKey.MONTE_CARLO_EXCEEDING, "probability above the target", "",
                mc.probabilityExceeding().isEmpty() ? new NotApplicable()
                        : new Percent(mc.probabilityExceeding().getAsDouble(), 3), source, ""));
        return out;
    }

    private static ReportValue q(double si, Dimension d) {
        return DesignContent.quantity(si, d);
    }
}
