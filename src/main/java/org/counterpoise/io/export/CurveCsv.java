package org.counterpoise.io.export;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.chart.PlotRange;
import org.counterpoise.io.project.Ids;

/**
 * The plotted curves of a design as CSV: one row per frequency, one column per curve, every
 * header naming its quantity and SI unit, and a last column {@code status}. Numbers carry 17
 * significant digits, so a curve read back equals the computed one. A value that is unbounded
 * (an undamped resonance; the rule of {@link PlotRange}, the same as the charts') is written as an
 * empty field, never as NaN or Infinity, and the row's status names the curves left empty
 * ({@code unbounded:without_absorber;with_absorber}); otherwise the status is {@code ok}.
 */
public final class CurveCsv {
    private CurveCsv() {
    }

    /**
     * @param curves the curves
     * @return CSV text with a header line
     */
    public static String of(DesignCurves curves) {
        String name = Ids.of(curves.response()).replace('-', '_');
        String unit = curves.response().dimension().siSymbol().replace("/", "_per_").replace("^2", "2")
                .replace("*", "");
        StringBuilder out = new StringBuilder("frequency_Hz," + name + "_without_absorber_" + unit + ","
                + name + "_with_absorber_" + unit + ",absorber_stroke_m,status\n");
        double[] w = curves.frequency();
        double[] before = curves.before();
        double[] after = curves.after();
        double[] stroke = curves.stroke();
        // The typical levels of the charts: response before and after share one chart, the stroke has its own.
        double response = PlotRange.typical(before, after);
        double strokeTypical = PlotRange.typical(stroke);
        for (int i = 0; i < w.length; i++) {
            List<String> unbounded = new ArrayList<>();
            out.append(field(Unit.HERTZ.fromSi(w[i]), Double.NaN, "frequency", unbounded)).append(',')
                    .append(field(before[i], response, "without_absorber", unbounded)).append(',')
                    .append(field(after[i], response, "with_absorber", unbounded)).append(',')
                    .append(field(stroke[i], strokeTypical, "absorber_stroke", unbounded)).append(',')
                    .append(unbounded.isEmpty() ? "ok" : "unbounded:" + String.join(";", unbounded)).append('\n');
        }
        return out.toString();
    }

    private static String field(double v, double typical, String name, List<String> unbounded) {
        if (PlotRange.unbounded(v, typical)) {
            unbounded.add(name);
            return "";
        }
        return String.format(Locale.ROOT, "%.17g", v);
    }
}
