package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.optim.AbsorberSetOptimum;
import org.counterpoise.core.system.Spillover;

/**
 * The {@code optimum --second-mode} output: each case of {@link AbsorberSetTable} followed by the
 * peak near each mode of the two-mode structure without and with the absorbers (non-dimensional:
 * X k1 / F, frequency ratios g = omega / omega1). The JSON keys are the constants below.
 */
public final class SpilloverTable {
    static final String SPILLOVER = "spillover";
    static final String RATIO = "second_mode_ratio";
    static final String SHAPE = "second_mode_shape";
    static final String MODES = "modes";
    static final String MODE = "mode";
    static final String LOW = "band_low_ratio";
    static final String HIGH = "band_high_ratio";
    static final String BEFORE = "peak_without_absorbers";
    static final String AFTER = "peak_with_absorbers";

    private SpilloverTable() {
    }

    /**
     * The spillover of one case.
     *
     * @param optimum the absorbers designed on mode 1 alone
     * @param ratio omega2 / omega1
     * @param shape mode 2's shape value at the absorbers' point
     * @param spillover the peaks near each mode
     */
    public record Row(AbsorberSetOptimum optimum, double ratio, double shape, Spillover spillover) {
    }

    /**
     * @param cases the absorber tables' rows
     * @param spill the spillover of each, in the same order
     * @param format text, CSV or JSON
     * @return the whole output
     */
    public static String render(List<AbsorberSetTable.Row> cases, List<Row> spill, OptimumTable.Format format) {
        return switch (format) {
            case TEXT -> text(cases, spill);
            case CSV -> csv(spill);
            case JSON -> json(cases, spill);
        };
    }

    private static String text(List<AbsorberSetTable.Row> cases, List<Row> spill) {
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < cases.size(); i++) {
            Row r = spill.get(i);
            out.append(AbsorberSetTable.text(cases.get(i)));
            out.append(String.format(Locale.ROOT, "spillover: a second mode at %.6g times the first, shape %.6g at the"
                    + " absorbers (the absorbers designed on mode 1 alone)%n", r.ratio(), r.shape()));
            out.append(String.format(Locale.ROOT, "%-5s %-14s %-14s %-22s %s%n", MODE, LOW, HIGH, BEFORE, AFTER));
            for (Spillover.ModePeak m : r.spillover().modes()) {
                out.append(String.format(Locale.ROOT, "%-5d %-14s %-14s %-22s %s%n", m.mode() + 1, bandEdge(m.low()),
                        bandEdge(m.high()), number(m.before()), number(m.after())));
            }
            out.append('\n');
        }
        return out.toString();
    }

    /** A band edge as the text table shows it: 6 significant figures, "open" for the band's open top. */
    private static String bandEdge(double v) {
        return Double.isInfinite(v) ? "open" : String.format(Locale.ROOT, "%.6g", v);
    }

    /** A finite peak, or "unbounded" for an infinite one. */
    private static String number(double v) {
        if (Double.isInfinite(v)) {
            return "unbounded";
        }
        return String.format(Locale.ROOT, "%.10g", v);
    }

    private static String csv(List<Row> spill) {
        StringBuilder out = new StringBuilder(String.join(",", AbsorberSetTable.MASS_RATIO,
                AbsorberSetTable.STRUCTURE_DAMPING, AbsorberSetTable.COUNT, AbsorberSetTable.TUNING, RATIO, SHAPE, MODE,
                LOW, HIGH, BEFORE, AFTER)).append('\n');
        for (Row r : spill) {
            for (Spillover.ModePeak m : r.spillover().modes()) {
                out.append(String.format(Locale.ROOT, "%.17g,%.17g,%d,%s,%.17g,%.17g,%d,%s,%s,%s,%s%n",
                        r.optimum().problem().massRatio(), r.optimum().problem().structureDamping(),
                        r.optimum().problem().count(), AbsorberSetTable.tuningWord(r.optimum().problem().tuning()),
                        r.ratio(), r.shape(), m.mode() + 1, csvNumber(m.low()), csvNumber(m.high()), csvNumber(m.before()),
                        csvNumber(m.after())));
            }
        }
        return out.toString();
    }

    /** A number, or "inf" for an open band end (in CSV also an unbounded peak). */
    private static String csvNumber(double v) {
        return Double.isInfinite(v) ? "inf" : String.format(Locale.ROOT, "%.17g", v);
    }

    private static String json(List<AbsorberSetTable.Row> cases, List<Row> spill) {
        JsonArray array = new JsonArray();
        for (int i = 0; i < cases.size(); i++) {
            JsonObject object = AbsorberSetTable.object(cases.get(i));
            Row r = spill.get(i);
            JsonObject s = new JsonObject();
            JsonNumbers.put(s, RATIO, r.ratio());
            JsonNumbers.put(s, SHAPE, r.shape());
            JsonArray modes = new JsonArray();
            for (Spillover.ModePeak m : r.spillover().modes()) {
                JsonObject mode = new JsonObject();
                mode.addProperty(MODE, m.mode() + 1);
                JsonNumbers.put(mode, LOW, m.low());
                JsonNumbers.put(mode, HIGH, m.high());
                JsonNumbers.put(mode, BEFORE, m.before());
                JsonNumbers.put(mode, AFTER, m.after());
                modes.add(mode);
            }
            s.add(MODES, modes);
            object.add(SPILLOVER, s);
            array.add(object);
        }
        return JsonNumbers.write(array);
    }
}
