package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.GridLayout;
import java.util.List;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.design.RobustnessSettings;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.chart.RobustnessCharts;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.QuantityField;
import org.counterpoise.ui.gui.plot.ChartHost;

/** Step 5: how the design fares off-tune, the robust alternative and the tolerance Monte Carlo. */
final class RobustnessStep extends Step {
    private final QuantityField structureRange = new QuantityField("robustness.structure_detuning",
            "How far the structure's natural frequency may be off, in percent each way", List.of(Unit.RATIO));
    private final QuantityField absorberRange = new QuantityField("robustness.absorber_detuning",
            "How far the absorber's natural frequency may be off, in percent each way", List.of(Unit.RATIO));
    private final QuantityField samples = new QuantityField("robustness.samples",
            "Monte Carlo samples (the tolerances come from the project file)", List.of(Unit.RATIO));
    private final JLabel summary = new JLabel(" ");
    private final ChartHost sensitivity = new ChartHost("chart.sensitivity");
    private final ChartHost histogram = new ChartHost("chart.histogram");
    private final ChartHost mapHolder = new ChartHost("chart.map");
    private final JComponent page;

    RobustnessStep(Runnable changed) {
        Form form = new Form();
        form.heading("Expected mistuning");
        form.row("Structure \u00b1 %", 's', structureRange, "Structure natural frequency uncertainty");
        form.row("Absorber \u00b1 %", 'a', absorberRange, "Absorber natural frequency tolerance");
        form.row("Monte Carlo samples", 'm', samples, "Number of sampled builds");
        form.end();
        summary.setName("robustness.summary");
        summary.setBorder(javax.swing.BorderFactory.createEmptyBorder(4, 14, 8, 14));
        JPanel left = new JPanel(new GridLayout(2, 1, 0, 6));
        left.add(sensitivity);
        left.add(histogram);
        JPanel charts = new JPanel(new GridLayout(1, 2, 6, 0));
        charts.add(left);
        charts.add(mapHolder);
        JPanel top = new JPanel(new BorderLayout());
        top.add(form, BorderLayout.CENTER);
        top.add(summary, BorderLayout.SOUTH);
        JPanel p = new JPanel(new BorderLayout());
        p.add(top, BorderLayout.NORTH);
        p.add(charts, BorderLayout.CENTER);
        page = p;
        own("robustness.structure_detuning", structureRange);
        own("robustness.absorber_detuning", absorberRange);
        own("robustness.samples", samples);
        own("robustness", structureRange);
        for (QuantityField f : List.of(structureRange, absorberRange, samples)) {
            f.onChange(changed);
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

    /**
     * @param base the project's settings (target, tolerances, seed)
     * @return the settings with this step's ranges and sample count
     */
    RobustnessSettings settings(RobustnessSettings base) {
        double s = structureRange.number();
        double a = absorberRange.number();
        double n = samples.number();
        if (n != Math.rint(n) || n < 1 || n > 1_000_000) {
            throw new org.counterpoise.core.error.InvalidInputException("robustness.samples",
                    QuantityFormat.number(n, 6), "a whole number from 1 to 1000000");
        }
        return new RobustnessSettings(checkPercent("robustness.structure_detuning", s),
                checkPercent("robustness.absorber_detuning", a), base.target(), base.tolerances(), (int) n, base.seed());
    }

    private static double checkPercent(String field, double v) {
        return org.counterpoise.core.error.Checks.inRange(field, v, 0, 50) / 100;
    }

    void load(RobustnessSettings r) {
        structureRange.show(100 * r.structureRange(), Unit.RATIO);
        absorberRange.show(100 * r.absorberRange(), Unit.RATIO);
        samples.show(r.samples(), Unit.RATIO);
    }

    void show(DesignResult design, RobustnessResult r) {
        if (design == null || r == null) {
            sensitivity.message(design == null ? "Fix the inputs to see the robustness study." : "computing\u2026");
            histogram.message(" ");
            mapHolder.message(" ");
            summary.setText(" ");
            return;
        }
        var unitDim = design.study().response().dimension();
        MonteCarloResult mc = r.monteCarlo();
        summary.setText("<html><body style='width: 760px'>Worst case of this design <b>" + DisplayUnits.format(r.worstCase().peak(), unitDim)
                + "</b>; robust design (f " + QuantityFormat.number(r.robust().tuning().tuningRatio(), 4) + ", \u03b6a "
                + QuantityFormat.number(r.robust().tuning().dampingRatio(), 3) + ") <b>"
                + DisplayUnits.format(r.robust().worstCase().peak(), unitDim) + "</b>. Monte Carlo P50 / P95: "
                + DisplayUnits.format(mc.p50(), unitDim) + " / " + DisplayUnits.format(mc.p95(), unitDim)
                + (Double.isNaN(mc.probabilityExceeding()) ? "" : "; above target "
                        + QuantityFormat.number(100 * mc.probabilityExceeding(), 3) + " %") + "</html>");
        sensitivity.show(theme -> RobustnessCharts.sensitivity(design, r, theme, 420, 320));
        histogram.show(theme -> RobustnessCharts.histogram(design, mc, theme, 420, 320));
        mapHolder.show(theme -> RobustnessCharts.map(design, r, theme, 520, 480, 3));
    }

    String summary() {
        return summary.getText();
    }
}
