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
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.chart.RobustnessCharts;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.QuantityField;
import org.counterpoise.ui.gui.plot.ChartHost;
import org.knowm.xchart.XChartPanel;

/** Step 5: how the design fares off-tune, the robust alternative and the tolerance Monte Carlo. */
final class RobustnessStep extends Step {
    private final QuantityField structureRange = new QuantityField("robustness.structure_detuning",
            "How far the structure's natural frequency may be off, in percent each way", UnitChoices.of(Dimension.RATIO));
    private final QuantityField absorberRange = new QuantityField("robustness.absorber_detuning",
            "How far the absorber's natural frequency may be off, in percent each way", UnitChoices.of(Dimension.RATIO));
    private final QuantityField samples = new QuantityField("robustness.samples",
            "Monte Carlo samples (the tolerances come from the project file)", UnitChoices.of(Dimension.RATIO));
    private final JLabel summary = new JLabel(" ");
    private final ChartHost sensitivity = new ChartHost("chart.sensitivity");
    private final ChartHost histogram = new ChartHost("chart.histogram");
    private final JPanel mapHolder = new JPanel(new BorderLayout());
    private final JComponent page;
    /** The summary's text without its width, so it can be rewrapped when the page is resized. */
    private String summaryHtml = "";

    RobustnessStep(Runnable changed) {
        Form form = new Form();
        form.heading("Expected mistuning");
        form.row("Structure \u00b1 %", 's', structureRange, "Structure natural frequency uncertainty");
        form.row("Absorber \u00b1 %", 'a', absorberRange, "Absorber natural frequency tolerance");
        form.row("Monte Carlo samples", 'm', samples, "Number of sampled builds");
        form.end();
        summary.setName("robustness.summary");
        summary.setBorder(javax.swing.BorderFactory.createEmptyBorder(4, 14, 8, 14));
        mapHolder.setName("chart.map");
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
            mapHolder.removeAll();
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
                + (Double.isNaN(mc.probabilityExceeding()) ? "" : "; above target "
                        + QuantityFormat.number(100 * mc.probabilityExceeding(), 3) + " %"));
        wrapSummary();
        sensitivity.show(RobustnessCharts.sensitivity(design, r, 420, 320));
        histogram.show(RobustnessCharts.histogram(design, mc, 420, 320));
        mapHolder.removeAll();
        mapHolder.add(new XChartPanel<>(RobustnessCharts.map(design, r, 520, 480, 3)), BorderLayout.CENTER);
        mapHolder.revalidate();
        mapHolder.repaint();
    }

    /** Wraps the summary to the width it is given (an HTML label wraps only at a width it is given). */
    private void wrapSummary() {
        if (summaryHtml.isEmpty()) {
            summary.setText(" ");
            return;
        }
        int width = Math.max(280, summary.getWidth() == 0 ? 760 : summary.getWidth() - 40);
        // Swing's HTML takes a CSS px as 1.3 screen pixels (and a pt as one), so the width goes in pt.
        summary.setText("<html><body style='width: " + width + "pt'>" + summaryHtml + "</body></html>");
    }

    String summary() {
        return summary.getText();
    }
}
