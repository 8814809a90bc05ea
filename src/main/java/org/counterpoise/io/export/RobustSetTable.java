package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.optim.AbsorberSetDesign;
import org.counterpoise.core.optim.RobustSetOptimum;
import org.counterpoise.core.optim.RobustSetProblem;

/**
 * The {@code optimum --absorbers N --structure-range S [--absorber-range A]} output: per case, the
 * least worst-case peak of the set over the ranges, where it occurs, the set's nominal peak, the
 * least-nominal-peak set's peaks beside it, each absorber's tuning and damping, and the
 * certificate; as text, CSV (one line per absorber) or a JSON array. The JSON keys are the
 * constants below and those of {@link AbsorberSetTable} (the one list of this output's keys).
 */
public final class RobustSetTable {
    static final String STRUCTURE_RANGE = "structure_frequency_range";
    static final String ABSORBER_RANGE = "absorber_frequency_range";
    static final String DAMPING_FLOOR = "damping_ratio_floor";
    static final String WORST_PEAK = "worst_peak";
    static final String WORST_STRUCTURE_FACTOR = "worst_structure_frequency_factor";
    static final String WORST_ABSORBER_FACTOR = "worst_absorber_frequency_factor";
    static final String NOMINAL_PEAK = "nominal_peak";
    static final String LEAST_PEAK_NOMINAL = "least_peak_set_peak";
    static final String LEAST_PEAK_WORST = "least_peak_set_worst_peak";
    static final String EXCHANGE_CLOSED = "exchange_closed";

    private RobustSetTable() {
    }

    /**
     * One case solved.
     *
     * @param optimum the robust set
     * @param leastPeakWorst the worst peak of the least-nominal-peak set over the same ranges
     */
    public record Row(RobustSetOptimum optimum, double leastPeakWorst) {
    }

    /**
     * @param rows the cases
     * @param format text, CSV or JSON
     * @return the whole output
     */
    public static String render(List<Row> rows, OptimumTable.Format format) {
        return switch (format) {
            case TEXT -> text(rows);
            case CSV -> csv(rows);
            case JSON -> json(rows);
        };
    }

    private static String text(List<Row> rows) {
        StringBuilder out = new StringBuilder();
        for (Row row : rows) {
            RobustSetOptimum o = row.optimum();
            RobustSetProblem p = o.problem();
            out.append(String.format(Locale.ROOT, "%s, %s tuning: mass ratio %.6g in total, structure damping"
                    + " ratio %.6g, %s%n", AbsorberSetTable.absorbers(p.set().count()), AbsorberSetTable.tuningWord(p.set().tuning()),
                    p.set().massRatio(), p.set().structureDamping(), AbsorberSetTable.band(p.set().bandLow(),
                            p.set().bandHigh())));
            out.append(String.format(Locale.ROOT, "least worst peak over the structure's frequency within +/-%.4g %%"
                    + " and all absorbers' frequencies within +/-%.4g %% together (one spring batch), every damping"
                    + " ratio at least %.4g%n", 100 * p.structureRange(), 100 * p.absorberRange(), p.dampingFloor()));
            out.append(String.format(Locale.ROOT, "worst peak %.10g (structure frequency factor %.6f, absorber factor"
                    + " %.6f); nominal peak %.10g%n", o.worstPeak(), o.worstStructureFactor(), o.worstAbsorberFactor(),
                    o.nominalPeak()));
            out.append(String.format(Locale.ROOT, "the same absorbers tuned for the least nominal peak: nominal peak"
                    + " %.10g, worst peak %.10g%n", o.leastPeak().peak(), row.leastPeakWorst()));
            out.append(o.converged() ? AbsorberSetTable.certificateText(o.certificate())
                    : "NOT FOUND: the worst case did not come within the exchange's tolerance of its lower bound (the"
                            + " numbers are the best point seen, not an optimum)\n");
            out.append(String.format(Locale.ROOT, "%-9s %-12s %-14s %s%n", AbsorberSetTable.ABSORBER,
                    AbsorberSetTable.ABSORBER_MASS_RATIO, AbsorberSetTable.TUNING_RATIO, AbsorberSetTable.DAMPING_RATIO));
            AbsorberSetDesign d = o.design();
            for (int j = 0; j < d.count(); j++) {
                out.append(String.format(Locale.ROOT, "%-9d %-12.6g %-14.10f %.10f%n", j + 1, d.massRatios().get(j),
                        d.tuningRatios().get(j), d.dampingRatios().get(j)));
            }
            out.append('\n');
        }
        return out.toString();
    }

    private static String csv(List<Row> rows) {
        StringBuilder out = new StringBuilder(String.join(",", AbsorberSetTable.MASS_RATIO,
                AbsorberSetTable.STRUCTURE_DAMPING, AbsorberSetTable.COUNT, AbsorberSetTable.TUNING, STRUCTURE_RANGE,
                ABSORBER_RANGE, DAMPING_FLOOR, AbsorberSetTable.ABSORBER, "absorber_" + AbsorberSetTable.ABSORBER_MASS_RATIO,
                AbsorberSetTable.TUNING_RATIO, AbsorberSetTable.DAMPING_RATIO, WORST_PEAK, NOMINAL_PEAK,
                LEAST_PEAK_NOMINAL, LEAST_PEAK_WORST, AbsorberSetTable.CONVERGED)).append('\n');
        for (Row row : rows) {
            RobustSetOptimum o = row.optimum();
            RobustSetProblem p = o.problem();
            AbsorberSetDesign d = o.design();
            for (int j = 0; j < d.count(); j++) {
                out.append(String.format(Locale.ROOT,
                        "%.17g,%.17g,%d,%s,%.17g,%.17g,%.17g,%d,%.17g,%.17g,%.17g,%.17g,%.17g,%.17g,%.17g,%s%n",
                        p.set().massRatio(), p.set().structureDamping(), d.count(),
                        AbsorberSetTable.tuningWord(p.set().tuning()), p.structureRange(), p.absorberRange(),
                        p.dampingFloor(), j + 1, d.massRatios().get(j), d.tuningRatios().get(j), d.dampingRatios().get(j),
                        o.worstPeak(), o.nominalPeak(), o.leastPeak().peak(), row.leastPeakWorst(), o.certified()));
            }
        }
        return out.toString();
    }

    private static String json(List<Row> rows) {
        JsonArray array = new JsonArray();
        for (Row row : rows) {
            RobustSetOptimum o = row.optimum();
            RobustSetProblem p = o.problem();
            JsonObject object = new JsonObject();
            JsonNumbers.put(object, AbsorberSetTable.MASS_RATIO, p.set().massRatio());
            JsonNumbers.put(object, AbsorberSetTable.STRUCTURE_DAMPING, p.set().structureDamping());
            object.addProperty(AbsorberSetTable.COUNT, p.set().count());
            object.addProperty(AbsorberSetTable.TUNING, AbsorberSetTable.tuningWord(p.set().tuning()));
            JsonNumbers.put(object, STRUCTURE_RANGE, p.structureRange());
            JsonNumbers.put(object, ABSORBER_RANGE, p.absorberRange());
            JsonNumbers.put(object, DAMPING_FLOOR, p.dampingFloor());
            JsonNumbers.put(object, WORST_PEAK, o.worstPeak());
            JsonNumbers.put(object, WORST_STRUCTURE_FACTOR, o.worstStructureFactor());
            JsonNumbers.put(object, WORST_ABSORBER_FACTOR, o.worstAbsorberFactor());
            JsonNumbers.put(object, NOMINAL_PEAK, o.nominalPeak());
            JsonNumbers.put(object, LEAST_PEAK_NOMINAL, o.leastPeak().peak());
            JsonNumbers.put(object, LEAST_PEAK_WORST, row.leastPeakWorst());
            JsonArray absorbers = new JsonArray();
            AbsorberSetDesign d = o.design();
            for (int j = 0; j < d.count(); j++) {
                JsonObject a = new JsonObject();
                JsonNumbers.put(a, AbsorberSetTable.ABSORBER_MASS_RATIO, d.massRatios().get(j));
                JsonNumbers.put(a, AbsorberSetTable.TUNING_RATIO, d.tuningRatios().get(j));
                JsonNumbers.put(a, AbsorberSetTable.DAMPING_RATIO, d.dampingRatios().get(j));
                absorbers.add(a);
            }
            object.add(AbsorberSetTable.ABSORBER, absorbers);
            AbsorberSetTable.certify(object, o.certificate());
            object.addProperty(EXCHANGE_CLOSED, o.converged());
            object.addProperty(AbsorberSetTable.CONVERGED, o.certified());
            object.addProperty(AbsorberSetTable.STATUS, o.certified() ? "certified" : "not found");
            array.add(object);
        }
        return JsonNumbers.write(array);
    }
}
