package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Container;
import java.awt.FlowLayout;
import java.awt.GridLayout;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.design.RobustnessSettings;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.robust.MonteCarloOutcome;
import org.counterpoise.core.robust.Tolerance;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.chart.MonteCarloCharts;
import org.counterpoise.io.chart.RobustnessCharts;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.io.project.ToleranceKey;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.ReportContent;
import org.counterpoise.io.text.ReportKey;
import org.counterpoise.io.text.ReportRow;
import org.counterpoise.io.text.ReportValue;
import org.counterpoise.io.text.RobustnessContent;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.ItemWords;
import org.counterpoise.ui.gui.field.QuantityField;
import org.counterpoise.ui.gui.field.Sizes;
import org.counterpoise.ui.gui.plot.ChartHost;

/** Step 5: how the design fares when mistuned, the robust alternative and the tolerance Monte Carlo. */
final class RobustnessStep extends Step {
    /** The step's title in the step list. */
    static final String TITLE = "Robustness";
    /** Units offered for each tolerance, in the order of {@link ToleranceKey}. */
    private static final List<List<Unit>> TOLERANCE_UNITS = List.of(
            List.of(Unit.PERCENT, Unit.KILOGRAM, Unit.TONNE),
            List.of(Unit.PERCENT, Unit.KILONEWTON_PER_METRE, Unit.NEWTON_PER_METRE, Unit.NEWTON_PER_MILLIMETRE),
            List.of(Unit.PERCENT, Unit.KILOGRAM, Unit.GRAM),
            List.of(Unit.PERCENT, Unit.KILONEWTON_PER_METRE, Unit.NEWTON_PER_METRE, Unit.NEWTON_PER_MILLIMETRE),
            List.of(Unit.PERCENT, Unit.NEWTON_SECOND_PER_METRE, Unit.KILONEWTON_SECOND_PER_METRE));

    /** The ranges the design must hold over, as the absorber-goal step states them (shown, not edited, here). */
    private final JLabel ranges = new JLabel(" ");
    private final QuantityField target = new QuantityField("robustness.target",
            "Largest acceptable peak of the response that matters; empty for none", UnitChoices.of(Dimension.LENGTH));
    private final QuantityField samples = new QuantityField("robustness.samples",
            "Number of sampled builds in the Monte Carlo", UnitChoices.of(Dimension.RATIO));
    private final QuantityField seed = new QuantityField("robustness.seed",
            "Seed of the Monte Carlo's random numbers: the same seed gives the same result", UnitChoices.of(Dimension.RATIO));
    private final List<JComboBox<Tolerance.Distribution>> distributions = new ArrayList<>();
    private final List<QuantityField> tolerances = new ArrayList<>();
    private final JLabel summary = new JLabel(" ");
    private final ChartHost sensitivity = new ChartHost("chart.sensitivity");
    private final ChartHost histogram = new ChartHost("chart.histogram");
    private final ChartHost mapHolder = new ChartHost("chart.map");
    private final JComponent page;
    /** The summary's text without its width, so it can be rewrapped when the page is resized. */
    private String summaryHtml = "";

    RobustnessStep() {
        Form form = new Form();
        form.heading("Ranges the design must hold over");
        ranges.setName("robustness.ranges");
        form.derived("", ranges);
        form.heading("Target and Monte Carlo");
        form.row("Target (optional)", 't', target, "Largest acceptable peak; the Monte Carlo counts the builds above it");
        form.row("Monte Carlo samples", 'm', samples, "Number of sampled builds");
        form.row("Random seed", 'e', seed, "The same seed repeats the same Monte Carlo");
        form.end();
        Form tolerancesForm = new Form();
        tolerancesForm.heading("Manufacturing tolerances (Monte Carlo)");
        for (ToleranceKey k : ToleranceKey.values()) {
            String id = k.path();
            JComboBox<Tolerance.Distribution> kind = new JComboBox<>(Tolerance.Distribution.values());
            kind.setName(id + ".distribution");
            ItemWords.show(kind, Tolerance.Distribution.class, d -> switch (d) {
                case NONE -> "none";
                case UNIFORM -> "uniform \u00b1";
                case NORMAL -> "normal \u03c3";
            });
            QuantityField value = new QuantityField(id, k.label() + ": percent or an absolute amount",
                    TOLERANCE_UNITS.get(k.ordinal()));
            JPanel both = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
            both.setOpaque(false);
            both.add(kind);
            both.add(value);
            tolerancesForm.row(k.label(), (char) 0, both,
                    "Uniform: every value within \u00b1 the amount; normal: the amount is the standard deviation");
            tolerancesForm.derived("", value.messageLabel());
            distributions.add(kind);
            tolerances.add(value);
            own(id, value);
            kind.addActionListener(e -> {
                value.textField().setEnabled(kind.getSelectedItem() != Tolerance.Distribution.NONE);
                edited(kind.getName());
            });
            value.onChange(() -> edited(id));
        }
        tolerancesForm.end();
        summary.setName("robustness.summary");
        summary.setBorder(BorderFactory.createEmptyBorder(4, 14, 8, 14));
        JPanel left = new JPanel(new GridLayout(2, 1, 0, 6));
        left.add(sensitivity);
        left.add(histogram);
        JPanel charts = new JPanel(new GridLayout(1, 2, 6, 0));
        charts.add(left);
        charts.add(mapHolder);
        JPanel forms = new JPanel(new BorderLayout());
        forms.add(form, BorderLayout.WEST);
        forms.add(tolerancesForm, BorderLayout.CENTER);
        JPanel top = new JPanel(new BorderLayout());
        top.add(forms, BorderLayout.CENTER);
        top.add(summary, BorderLayout.SOUTH);
        JPanel p = new JPanel(new BorderLayout());
        p.add(top, BorderLayout.NORTH);
        p.add(charts, BorderLayout.CENTER);
        // Below this the page scrolls rather than squeezing the charts unreadable.
        charts.setMinimumSize(Sizes.of(620, 420));
        summary.setMinimumSize(Sizes.of(300, 0));
        summary.addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) {
                wrapSummary();
            }
        });
        page = p;
        own("robustness.target", target);
        own("robustness.samples", samples);
        own("robustness.seed", seed);
        own("robustness", target);
        for (QuantityField f : List.of(target, samples, seed)) {
            f.onChange(() -> edited(f.fieldId()));
        }
    }

    @Override
    String title() {
        return TITLE;
    }

    @Override
    JComponent component() {
        return page;
    }

    private void edited(String key) {
        commit(() -> ProjectEdits.robustness(key, input()));
    }

    /** @return the robustness section as shown (throws InvalidInputException naming a field) */
    RobustnessInput input() {
        double n = samples.number();
        if (n != Math.rint(n) || n < 1 || n > 1_000_000) {
            throw new InvalidInputException("robustness.samples", QuantityFormat.number(n, 6),
                    "a whole number from 1 to 1000000");
        }
        double s = seed.number();
        if (s != Math.rint(s) || Math.abs(s) > 1e15) {
            throw new InvalidInputException("robustness.seed", QuantityFormat.number(s, 6), "a whole number");
        }
        RobustnessInput.ToleranceInput[] t = new RobustnessInput.ToleranceInput[ToleranceKey.values().length];
        for (int i = 0; i < t.length; i++) {
            Tolerance.Distribution d = (Tolerance.Distribution) distributions.get(i).getSelectedItem();
            QuantityField f = tolerances.get(i);
            if (d != Tolerance.Distribution.NONE) {
                String id = RobustnessInput.ToleranceInput.token(d);
                t[i] = f.unit() == Unit.PERCENT ? new RobustnessInput.ToleranceInput(id, f.number(), null)
                        : new RobustnessInput.ToleranceInput(id, Double.NaN, f.input());
            }
        }
        // The ranges are the absorber-goal step's; the edit keeps the project's (ProjectEdits.robustness).
        return new RobustnessInput(RobustnessInput.Ranges.NONE,
                target.textField().getText().isBlank() ? null : target.input(), (int) n, (long) s, t[0], t[1], t[2],
                t[3], t[4]);
    }

    @Override
    void showProject(Project p, boolean loaded) {
        RobustnessSettings d = RobustnessSettings.DEFAULT;
        RobustnessInput r = p.robustness();
        List<Unit> targetUnits = GoalStep.unitsOf(p.absorber().response());
        if (!targetUnits.contains(target.unit())) {
            target.setUnits(targetUnits);
        }
        ranges.setText(ToleranceRangesForm.summary(p));
        showValue(target, r == null ? null : r.target());
        showValue(samples, r == null || r.samples() == 0 ? d.samples() : r.samples(), Unit.RATIO);
        showValue(seed, r == null ? d.seed() : r.seed(), Unit.RATIO);
        RobustnessInput.ToleranceInput[] t = new RobustnessInput.ToleranceInput[ToleranceKey.values().length];
        for (ToleranceKey k : ToleranceKey.values()) {
            t[k.ordinal()] = r == null ? null : k.of(r);
        }
        for (int i = 0; i < t.length; i++) {
            Tolerance.Distribution shape = t[i] == null ? Tolerance.Distribution.NONE
                    : t[i].kind().orElse(Tolerance.Distribution.NONE);
            selectItem(distributions.get(i), shape);
            QuantityField f = tolerances.get(i);
            f.textField().setEnabled(shape != Tolerance.Distribution.NONE);
            if (shape == Tolerance.Distribution.NONE) {
                continue;
            }
            if (t[i].absolute() != null) {
                showValue(f, t[i].absolute());
            } else {
                showValue(f, t[i].percent(), Unit.PERCENT);
            }
        }
    }

    @Override
    boolean fieldsValid() {
        boolean ok = check(samples) & check(seed);
        if (!target.textField().getText().isBlank()) {
            ok &= check(target);
        }
        for (int i = 0; i < tolerances.size(); i++) {
            if (distributions.get(i).getSelectedItem() != Tolerance.Distribution.NONE) {
                ok &= check(tolerances.get(i));
            }
        }
        return ok;
    }

    void show(DesignResult design, RobustnessResult r) {
        if (design == null || r == null) {
            sensitivity.message(design == null ? "Fix the inputs to see the robustness study." : "computing\u2026");
            histogram.message(" ");
            mapHolder.message(" ");
            summaryHtml = "";
            summary.setText(" ");
            return;
        }
        MonteCarloOutcome outcome = r.monteCarlo();
        // The figures are the robustness report's rows, in its words for values.
        ReportContent c = RobustnessContent.of(design, r);
        String monteCarlo = outcome.result().isPresent()
                ? "Monte Carlo P50 / P95: " + value(c, ReportKey.MONTE_CARLO_P50_P90) + " / "
                        + value(c, ReportKey.MONTE_CARLO_P95_P99)
                        + (c.row(ReportKey.MONTE_CARLO_EXCEEDING).orElseThrow().shown() ? "; above the target of "
                                + value(c, ReportKey.TARGET) + ": " + value(c, ReportKey.MONTE_CARLO_EXCEEDING) : "")
                : "Monte Carlo not run: " + value(c, ReportKey.MONTE_CARLO_NOT_RUN) + ".";
        summaryHtml = "Worst case of this design <b>" + value(c, ReportKey.WORST_CASE_PEAK)
                + "</b>; robust design (f " + value(c, ReportKey.ROBUST_TUNING_RATIO) + ", \u03b6a "
                + value(c, ReportKey.ROBUST_ABSORBER_DAMPING_RATIO) + ") <b>" + value(c, ReportKey.ROBUST_WORST_CASES)
                + "</b>. " + monteCarlo;
        wrapSummary();
        sensitivity.show(theme -> RobustnessCharts.sensitivity(design, r, theme, 420, 320));
        outcome.result().ifPresentOrElse(
                mc -> histogram.show(theme -> MonteCarloCharts.histogram(design, mc, theme, 420, 320)),
                () -> histogram.message("No histogram: the Monte Carlo was not run (no tolerances given)."));
        mapHolder.show(theme -> RobustnessCharts.map(design, r, theme, 520, 480, 3));
    }

    /**
     * @param c a report
     * @param key one of its rows
     * @return the value in the report's words (the first of a pair)
     */
    private static String value(ReportContent c, ReportKey key) {
        ReportValue v = c.row(key).orElseThrow().value();
        return ValueText.inline(v instanceof ReportValue.Pair p ? p.first() : v);
    }

    /** Wraps the summary to the width it is given (an HTML label wraps only at a width it is given). */
    private void wrapSummary() {
        if (summaryHtml.isEmpty()) {
            summary.setText(" ");
            return;
        }
        // The width that can be seen: when the page scrolls sideways, the label is wider than that.
        Container view = (Container) SwingUtilities.getAncestorOfClass(
                JViewport.class, summary);
        int seen = summary.getWidth();
        if (view != null && summary.getParent() != null && view.getWidth() > 0) {
            seen = Math.min(seen, view.getWidth()
                    - SwingUtilities.convertPoint(summary.getParent(), summary.getX(), 0, view).x);
        }
        int width = Math.max(280, seen <= 0 ? 760 : seen - 40);
        // Swing's HTML takes a CSS px as 1.3 screen pixels (and a pt as one), so the width goes in pt.
        summary.setText("<html><body style='width: " + width + "pt'>" + summaryHtml + "</body></html>");
    }

    /** Says the study was cancelled (instead of a stale or half-made result). */
    void cancelled() {
        sensitivity.message("The robustness study was cancelled; it runs again after the next edit.");
        histogram.message(" ");
        mapHolder.message(" ");
        summaryHtml = "";
        summary.setText(" ");
    }

    String summary() {
        return summary.getText();
    }
}
