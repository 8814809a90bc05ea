package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.List;
import java.util.Locale;

/** The rows of the {@code optimum} command as an aligned table, CSV or JSON. */
public final class OptimumTable {
    private OptimumTable() {
    }

    /**
     * One optimum.
     *
     * @param massRatio mu
     * @param structureDamping zeta1
     * @param tuningRatio optimum f
     * @param absorberDamping optimum zeta_a
     * @param value optimum peak or variance
     * @param activeSet which maxima are equal (peak objective), or empty
     * @param converged true when verified
     */
    public record Row(double massRatio, double structureDamping, double tuningRatio, double absorberDamping,
            double value, String activeSet, boolean converged) {
    }

    /**
     * @param rows rows
     * @param valueKey "peak" or "variance"
     * @return aligned text with a header line
     */
    public static String text(List<Row> rows, String valueKey) {
        StringBuilder out = new StringBuilder(String.format(Locale.ROOT, "%-12s %-24s %-14s %-22s %-16s %s%n",
                "mass_ratio", "structure_damping_ratio", "tuning_ratio", "absorber_damping_ratio", valueKey,
                "note"));
        for (Row r : rows) {
            out.append(String.format(Locale.ROOT, "%-12.6g %-24.6g %-14.10f %-22.10f %-16.12g %s%n", r.massRatio(),
                    r.structureDamping(), r.tuningRatio(), r.absorberDamping(), r.value(), note(r)));
        }
        return out.toString();
    }

    /**
     * @param rows rows
     * @param valueKey "peak" or "variance"
     * @return CSV with a header line
     */
    public static String csv(List<Row> rows, String valueKey) {
        StringBuilder out = new StringBuilder("mass_ratio,structure_damping_ratio,tuning_ratio,absorber_damping_ratio,"
                + valueKey + ",converged\n");
        for (Row r : rows) {
            out.append(String.format(Locale.ROOT, "%.17g,%.17g,%.17g,%.17g,%.17g,%s%n", r.massRatio(),
                    r.structureDamping(), r.tuningRatio(), r.absorberDamping(), r.value(), r.converged()));
        }
        return out.toString();
    }

    /**
     * @param rows rows
     * @param valueKey "peak" or "variance"
     * @return a JSON array of objects
     */
    public static String json(List<Row> rows, String valueKey) {
        JsonArray array = new JsonArray();
        for (Row r : rows) {
            JsonObject o = new JsonObject();
            JsonNumbers.put(o, "mass_ratio", r.massRatio());
            JsonNumbers.put(o, "structure_damping_ratio", r.structureDamping());
            JsonNumbers.put(o, "tuning_ratio", r.tuningRatio());
            JsonNumbers.put(o, "absorber_damping_ratio", r.absorberDamping());
            JsonNumbers.put(o, valueKey, r.value());
            if (!r.activeSet().isEmpty()) {
                o.addProperty("active_set", r.activeSet());
            }
            o.addProperty("converged", r.converged());
            array.add(o);
        }
        return JsonNumbers.write(array);
    }

    private static String note(Row r) {
        String set = r.activeSet().isEmpty() ? "" : r.activeSet();
        return r.converged() ? set : (set.isEmpty() ? "" : set + "; ") + "not verified (best found)";
    }
}
