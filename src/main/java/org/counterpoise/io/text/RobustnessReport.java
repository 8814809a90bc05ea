package org.counterpoise.io.text;

import java.util.Locale;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.robust.SensitivityCurve;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.text.ReportSection.SectionId;

/**
 * The plain-text robustness study printed by the command line: {@link RobustnessContent} rendered
 * as aligned lines, with the sensitivity of both designs to the structure's frequency as a table.
 */
public final class RobustnessReport {
    private RobustnessReport() {
    }

    /**
     * @param design the design examined
     * @param r its robustness study
     * @return the report
     */
    public static String render(DesignResult design, RobustnessResult r) {
        return render(design, r, AmplitudeConvention.PEAK);
    }

    /**
     * @param design the design examined
     * @param r its robustness study
     * @param display the convention response values are stated in
     * @return the report
     */
    public static String render(DesignResult design, RobustnessResult r, AmplitudeConvention display) {
        return render(design, r, display, UnitSystem.SI);
    }

    /**
     * @param design the design examined
     * @param r its robustness study
     * @param display the convention response values are stated in
     * @param units the unit system quantities are shown in
     * @return the report
     */
    public static String render(DesignResult design, RobustnessResult r, AmplitudeConvention display,
            UnitSystem units) {
        ReportContent content = RobustnessContent.of(design, r).shownIn(display).in(units);
        Dimension d = design.study().response().dimension();
        StringBuilder out = new StringBuilder();
        out.append("Counterpoise robustness study: ").append(content.name()).append('\n');
        for (ReportSection section : content.sections()) {
            if (section.id() == SectionId.MONTE_CARLO) {
                sensitivity(out, r, d, display, units);
            }
            DesignReport.section(out, section, units);
        }
        out.append("\nCautions\n");
        for (String c : content.cautions()) {
            DesignReport.bullet(out, c);
        }
        return out.toString();
    }

    private static void sensitivity(StringBuilder out, RobustnessResult r, Dimension d, AmplitudeConvention display,
            UnitSystem units) {
        out.append("\nSensitivity: worst response in band (" + display.label() + ") against structure frequency\n");
        out.append(String.format(Locale.ROOT, "  %-12s %-18s %s%n", "structure", "this design", "robust design"));
        SensitivityCurve a = r.structureCurve();
        SensitivityCurve b = r.robustStructureCurve();
        double[] f = a.factors();
        for (int i = 0; i < f.length; i += 5) {
            out.append(String.format(Locale.ROOT, "  %-12s %-18s %s%n", ValueText.signedPercent(f[i], 3),
                    DisplayUnits.format(display.ofHarmonic(a.peaks()[i]), d, units),
                    DisplayUnits.format(display.ofHarmonic(b.peaks()[i]), d, units)));
        }
    }
}
