package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.GridLayout;
import java.util.List;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.design.RobustnessSettings;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.chart.RobustnessCharts;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.QuantityField;
import org.counterpoise.ui.gui.plot.ChartHost;

/** Step 5: how the design fares when mistuned, the robust alternative and the tolerance Monte Carlo. */
final class RobustnessStep extends Step {
    private static final String[] TOLERANCE_KEYS = {"structure_mass", "structure_stiffness", "absorber_mass",
        "absorber_stiffness", "absorber_damping"};
    private static final String[] TOLERANCE_LABELS = {"Structure mass", "Structure stiffness", "Absorber mass",
        "Absorber spring rate", "Absorber damping"};
    private static final List<List<Unit>> TOLERANCE_UNITS = List.of(
            List.of(Unit.PERCENT, Unit.KILOGRAM, Unit.TONNE),
            List.of(Unit.PERCENT, Unit.KILONEWTON_PER_METRE, Unit.NEWTON_PER_METRE, Unit.NEWTON_PER_MILLIMETRE),
            List.of(Unit.PERCENT, Unit.KILOGRAM, Unit.GRAM),
            List.of(Unit.PERCENT, Unit.KILONEWTON_PER_METRE, Unit.NEWTON_PER_METRE, Unit.NEWTON_PER_MILLIMETRE),
            List.of(Unit.PERCENT, Unit.NEWTON_SECOND_PER_METRE, Unit.KILONEWTON_SECOND_PER_METRE));
    /** Distributions as listed; index 0 means no tolerance. Their file ids are in {@link #DISTRIBUTION_IDS}. */
    private static final String[] DISTRIBUTIONS = {"none", "uniform \u00b1", "normal \u03c3"};
    private static final String[] DISTRIBUTION_IDS = {null, "uniform", "normal"};

    private final QuantityField structureRange = new QuantityField("robustness.structure_mistuning",
            "How far the structure's natural frequency may be off, in percent each way", UnitChoices.of(Dimension.RATIO));
    private final QuantityField absorberRange = new QuantityField("robustness.absorber_mistuning",
            "How far the absorber's natural frequency may be off, in percent each way", UnitChoices.of(Dimension.RATIO));
    private final QuantityField target = new QuantityField("robustness.target",
            "Largest acceptable peak of the response that matters; empty for none", UnitChoices.of(Dimension.LENGTH));
    private final QuantityField samples = new QuantityField("robustness.samples",
            "Number of sampled builds in the Monte Carlo", UnitChoices.of(Dimension.RATIO));
    private final QuantityField seed = new QuantityField("robustness.seed",
            "Seed of the Monte Carlo's random numbers: the same seed gives the same result", UnitChoices.of(Dimension.RATIO));
    private final List<JComboBox<String>> distributions = new java.util.ArrayList<>();
    private final List<QuantityField> tolerances = new java.util.ArrayList<>();
    private final JLabel summary = new JLabel(" ");
    private final ChartHost sensitivity = new ChartHost("chart.sensitivity");
    private final ChartHost histogram = new ChartHost("chart.histogram");
    private final ChartHost mapHolder = new ChartHost("chart.map");
    private final JComponent page;
    /** The summary's text without its width, so it can be rewrapped when the page is resized. */
    private String summaryHtml = "";

    RobustnessStep() {
        Form form = new Form();
        form.heading("Expected mistuning");
        form.row("Structure \u00b1 %", 's', structureRange, "Structure natural frequency uncertainty");
        form.row("Absorber \u00b1 %", 'a', absorberRange, "Absorber natural frequency tolerance");
        form.row("Target (optional)", 't', target, "Largest acceptable peak; the Monte Carlo counts the builds above it");
        form.row("Monte Carlo samples", 'm', samples, "Number of sampled builds");
        form.row("Random seed", 'e', seed, "The same seed repeats the same Monte Carlo");
        form.end();
        Form tolerancesForm = new Form();
        tolerancesForm.heading("Manufacturing tolerances (Monte Carlo)");
        for (int i = 0; i < TOLERANCE_KEYS.length; i++) {
            String id = "robustness.tolerances." + TOLERANCE_KEYS[i];
            JComboBox<String> kind = new JComboBox<>(DISTRIBUTIONS);
            kind.setName(id + ".distribution");
            QuantityField value = new QuantityField(id, TOLERANCE_LABELS[i] + ": percent or an absolute amount",
                    TOLERANCE_UNITS.get(i));
            JPanel both = new JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.LEFT, 0, 0));
            both.setOpaque(false);
            both.add(kind);
            both.add(value);
            tolerancesForm.row(TOLERANCE_LABELS[i], (char) 0, both,
                    "Uniform: every value within \u00b1 the amount; normal: the amount is the standard deviation");
            tolerancesForm.derived("", value.messageLabel());
            distributions.add(kind);
            tolerances.add(value);
            own(id, value);
            kind.addActionListener(e -> {
                value.textField().setEnabled(kind.getSelectedIndex() != 0);
                edited(kind.getName());
            });
            value.onChange(() -> edited(id));
        }
        tolerancesForm.end();
        summary.setName("robustness.summary");
        summary.setBorder(javax.swing.BorderFactory.createEmptyBorder(4, 14, 8, 14));
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
        charts.setMinimumSize(new java.awt.Dimension(620, 420));
        summary.setMinimumSize(new java.awt.Dimension(300, 0));
        summary.addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent e) {
                wrapSummary();
            }
        });
        page = p;
        own("robustness.structure_mistuning", structureRange);
        own("robustness.absorber_mistuning", absorberRange);
        own("robustness.target", target);
        own("robustness.samples", samples);
        own("robustness.seed", seed);
        own("robustness", structureRange);
        for (QuantityField f : List.of(structureRange, absorberRange, target, samples, seed)) {
            f.onChange(() -> edited(f.fieldId()));
        }
    }

    @Override
    String title() {
        return "Robustness";
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
        RobustnessInput.ToleranceInput[] t = new RobustnessInput.ToleranceInput[TOLERANCE_KEYS.length];
        for (int i = 0; i < t.length; i++) {
            String id = DISTRIBUTION_IDS[distributions.get(i).getSelectedIndex()];
            QuantityField f = tolerances.get(i);
            if (id != null) {
                t[i] = f.unit() == Unit.PERCENT ? new RobustnessInput.ToleranceInput(id, f.number(), null)
                        : new RobustnessInput.ToleranceInput(id, Double.NaN, f.input());
            }
        }
        return new RobustnessInput(structureRange.number(), absorberRange.number(),
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
        showValue(structureRange, r == null || Double.isNaN(r.structureMistuningPercent())
                ? 100 * d.structureRange() : r.structureMistuningPercent(), Unit.RATIO);
        showValue(absorberRange, r == null || Double.isNaN(r.absorberMistuningPercent())
                ? 100 * d.absorberRange() : r.absorberMistuningPercent(), Unit.RATIO);
        showValue(target, r == null ? null : r.target());
        showValue(samples, r == null || r.samples() == 0 ? d.samples() : r.samples(), Unit.RATIO);
        showValue(seed, r == null ? d.seed() : r.seed(), Unit.RATIO);
        RobustnessInput.ToleranceInput[] t = r == null ? new RobustnessInput.ToleranceInput[5]
                : new RobustnessInput.ToleranceInput[] {r.structureMass(), r.structureStiffness(), r.absorberMass(),
                    r.absorberStiffness(), r.absorberDamping()};
        for (int i = 0; i < t.length; i++) {
            int index = t[i] == null ? 0 : java.util.Arrays.asList(DISTRIBUTION_IDS).indexOf(t[i].distribution());
            select(distributions.get(i), Math.max(index, 0));
            QuantityField f = tolerances.get(i);
            f.textField().setEnabled(index > 0);
            if (t[i] == null || index <= 0) {
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
        boolean ok = check(structureRange) & check(absorberRange) & check(samples) & check(seed);
        if (!target.textField().getText().isBlank()) {
            ok &= check(target);
        }
        for (int i = 0; i < tolerances.size(); i++) {
            if (distributions.get(i).getSelectedIndex() != 0) {
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
        var unitDim = design.study().response().dimension();
        MonteCarloResult mc = r.monteCarlo();
        summaryHtml = ("Worst case of this design <b>" + DisplayUnits.format(r.worstCase().peak(), unitDim)
                + "</b>; robust design (f " + QuantityFormat.number(r.robust().tuning().tuningRatio(), 4) + ", \u03b6a "
                + QuantityFormat.number(r.robust().tuning().dampingRatio(), 3) + ") <b>"
                + DisplayUnits.format(r.robust().worstCase().peak(), unitDim) + "</b>. Monte Carlo P50 / P95: "
                + DisplayUnits.format(mc.p50(), unitDim) + " / " + DisplayUnits.format(mc.p95(), unitDim)
                + (Double.isNaN(mc.probabilityExceeding()) ? "" : "; above the target of "
                        + DisplayUnits.format(r.settings().target(), unitDim) + ": "
                        + QuantityFormat.number(100 * mc.probabilityExceeding(), 3) + " %"));
        wrapSummary();
        sensitivity.show(theme -> RobustnessCharts.sensitivity(design, r, theme, 420, 320));
        histogram.show(theme -> RobustnessCharts.histogram(design, mc, theme, 420, 320));
        mapHolder.show(theme -> RobustnessCharts.map(design, r, theme, 520, 480, 3));
    }

    /** Wraps the summary to the width it is given (an HTML label wraps only at a width it is given). */
    private void wrapSummary() {
        if (summaryHtml.isEmpty()) {
            summary.setText(" ");
            return;
        }
        // The width that can be seen: when the page scrolls sideways, the label is wider than that.
        java.awt.Container view = (java.awt.Container) javax.swing.SwingUtilities.getAncestorOfClass(
                javax.swing.JViewport.class, summary);
        int seen = summary.getWidth();
        if (view != null && summary.getParent() != null && view.getWidth() > 0) {
            seen = Math.min(seen, view.getWidth()
                    - javax.swing.SwingUtilities.convertPoint(summary.getParent(), summary.getX(), 0, view).x);
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
