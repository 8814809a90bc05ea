package org.counterpoise.io.export;

import java.util.Locale;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.Ids;

/**
 * The plotted curves of a design as CSV: one row per frequency, one column per curve, every
 * header naming its quantity and SI unit. Numbers carry 17 significant digits, so a curve read
 * back equals the computed one. A value that is unbounded (an undamped structure exactly at
 * resonance) is an empty cell, never "Infinity" or "NaN". Lines end with a line feed on every system.
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
                + name + "_with_absorber_" + unit + ",absorber_stroke_m\n");
        double[] w = curves.frequency();
        double[] before = curves.before();
        double[] after = curves.after();
        double[] stroke = curves.stroke();
        for (int i = 0; i < w.length; i++) {
            out.append(cell(Unit.HERTZ.fromSi(w[i]))).append(',').append(cell(before[i])).append(',')
                    .append(cell(after[i])).append(',').append(cell(stroke[i])).append('\n');
        }
        return out.toString();
    }

    /** A number with 17 significant digits; an unbounded value (undamped, exactly at resonance) is an empty cell. */
    private static String cell(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.17g", v) : "";
    }
}
