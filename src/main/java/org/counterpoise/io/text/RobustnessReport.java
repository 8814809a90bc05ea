package org.counterpoise.io.text;

import java.util.Locale;
import org.counterpoise.core.design.Cautions;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.robust.SensitivityCurve;
import org.counterpoise.core.robust.WorstCase;
import org.counterpoise.core.units.Dimension;

/** The plain-text robustness study printed by the command line. */
public final class RobustnessReport {
    private RobustnessReport() {
    }

    /**
     * @param design the design examined
     * @param r its robustness study
     * @return the report
     */
    public static String render(DesignResult design, RobustnessResult r) {
        Dimension d = design.study().response().dimension();
        StringBuilder out = new StringBuilder();
        out.append("Counterpoise robustness study: ").append(design.study().name()).append("\n\n");
        line(out, "design", design.study().method().id() + ", mu " + QuantityFormat.number(design.tuning().massRatio(), 4)
                + ", f " + QuantityFormat.number(design.tuning().tuningRatio(), 4) + ", zeta_a "
                + QuantityFormat.number(design.tuning().dampingRatio(), 4));
        line(out, "response", design.study().response().label() + ", worst in the forcing band");
        line(out, "expected mistuning", "structure frequency +/-" + pct(r.settings().structureRange())
                + ", absorber frequency +/-" + pct(r.settings().absorberRange()));
        out.append('\n');
        WorstCase.Point w = r.worstCase();
        line(out, "nominal peak", DisplayUnits.format(design.responseAfter().value(), d));
        line(out, "worst case of this design", DisplayUnits.format(w.peak(), d) + " (structure " + signed(w.structureFactor())
                + ", absorber " + signed(w.absorberFactor()) + ")");
        line(out, "robust design, same mass", "f " + QuantityFormat.number(r.robust().tuning().tuningRatio(), 4)
                + ", zeta_a " + QuantityFormat.number(r.robust().tuning().dampingRatio(), 4) + ", spring rate "
                + DisplayUnits.format(r.robustAbsorber().stiffness(), Dimension.STIFFNESS) + ", damping "
                + DisplayUnits.format(r.robustAbsorber().damping(), Dimension.DAMPING_COEFFICIENT));
        line(out, "its worst case / nominal", DisplayUnits.format(r.robust().worstCase().peak(), d) + " / "
                + DisplayUnits.format(r.robust().nominalPeak(), d));
        if (!Double.isNaN(r.settings().target())) {
            line(out, "target", DisplayUnits.format(r.settings().target(), d));
            line(out, "structure mistuning within target", r.toleratedForTarget().defined()
                    ? DesignReport.tolerance(r.toleratedForTarget(), 1) : "none: the nominal design misses the target");
        }
        out.append("\nSensitivity: worst response in band against structure frequency\n");
        out.append(String.format(Locale.ROOT, "  %-12s %-18s %s%n", "structure", "this design", "robust design"));
        SensitivityCurve a = r.structureCurve();
        SensitivityCurve b = r.robustStructureCurve();
        double[] f = a.factors();
        for (int i = 0; i < f.length; i += 5) {
            out.append(String.format(Locale.ROOT, "  %-12s %-18s %s%n", signed(f[i]), DisplayUnits.format(a.peaks()[i], d),
                    DisplayUnits.format(b.peaks()[i], d)));
        }
        MonteCarloResult mc = r.monteCarlo();
        out.append("\nTolerance Monte Carlo (").append(mc.samples()).append(" samples, seed ").append(mc.seed())
                .append(")\n");
        line(out, "mean", DisplayUnits.format(mc.mean(), d));
        line(out, "P50 / P90 / P95 / P99", DisplayUnits.format(mc.p50(), d) + " / " + DisplayUnits.format(mc.p90(), d)
                + " / " + DisplayUnits.format(mc.p95(), d) + " / " + DisplayUnits.format(mc.p99(), d));
        line(out, "range", DisplayUnits.format(mc.min(), d) + " to " + DisplayUnits.format(mc.max(), d));
        if (!Double.isNaN(mc.probabilityExceeding())) {
            line(out, "probability above target", QuantityFormat.number(100 * mc.probabilityExceeding(), 3) + " %");
        }
        out.append("\nCautions\n");
        for (String c : Cautions.STANDARD) {
            DesignReport.bullet(out, c);
        }
        return out.toString();
    }

    private static String pct(double fraction) {
        return QuantityFormat.number(100 * fraction, 3) + " %";
    }

    private static String signed(double factor) {
        double p = 100 * (factor - 1);
        return (p > 0 ? "+" : "") + QuantityFormat.number(p, 3) + " %";
    }

    private static void line(StringBuilder out, String label, String value) {
        out.append(String.format(Locale.ROOT, "  %-34s %s%n", label, value));
    }
}
