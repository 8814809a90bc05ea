package org.counterpoise.io.export;

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
     * @param converged true when the optimum is certified (docs/optimiser.md); false: not found
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
        return whole(Format.TEXT, rows, valueKey);
    }

    /**
     * @param rows rows
     * @param valueKey "peak" or "variance"
     * @return CSV with a header line
     */
    public static String csv(List<Row> rows, String valueKey) {
        return whole(Format.CSV, rows, valueKey);
    }

    /**
     * @param rows rows
     * @param valueKey "peak" or "variance"
     * @return a JSON array of objects
     */
    public static String json(List<Row> rows, String valueKey) {
        return whole(Format.JSON, rows, valueKey);
    }

    /** The output formats of the table. */
    public enum Format {
        /** aligned text with a header line */
        TEXT,
        /** CSV with a header line */
        CSV,
        /** a JSON array of objects */
        JSON
    }

    private static String whole(Format format, List<Row> rows, String valueKey) {
        StringBuilder out = new StringBuilder();
        Streamed table = new Streamed(format, valueKey);
        out.append(table.start());
        for (Row r : rows) {
            out.append(table.row(r));
        }
        return out.append(table.end()).toString();
    }

    /**
     * The table written row by row, so a long batch goes out as its rows are found and is never
     * held whole: the text is exactly that of {@link #text}, {@link #csv} or {@link #json}.
     * Use: {@link #start()}, then {@link #row} per row in order, then {@link #end()}.
     */
    public static final class Streamed {
        private final Format format;
        private final String valueKey;
        private boolean first = true;

        /**
         * @param format the output format
         * @param valueKey "peak" or "variance"
         */
        public Streamed(Format format, String valueKey) {
            this.format = format;
            this.valueKey = valueKey;
        }

        /** @return the header (an opening bracket for JSON) */
        public String start() {
            return switch (format) {
                case TEXT -> String.format(Locale.ROOT, "%-12s %-24s %-14s %-22s %-16s %s%n", "mass_ratio",
                        "structure_damping_ratio", "tuning_ratio", "absorber_damping_ratio", valueKey, "note");
                case CSV -> "mass_ratio,structure_damping_ratio,tuning_ratio,absorber_damping_ratio," + valueKey
                        + ",converged\n";
                case JSON -> "[";
            };
        }

        /**
         * @param r the next row
         * @return its text
         */
        public String row(Row r) {
            return switch (format) {
                case TEXT -> String.format(Locale.ROOT, "%-12.6g %-24.6g %-14.10f %-22.10f %-16.12g %s%n",
                        r.massRatio(), r.structureDamping(), r.tuningRatio(), r.absorberDamping(), r.value(), note(r));
                case CSV -> String.format(Locale.ROOT, "%.17g,%.17g,%.17g,%.17g,%.17g,%s%n", r.massRatio(),
                        r.structureDamping(), r.tuningRatio(), r.absorberDamping(), r.value(), r.converged());
                case JSON -> jsonRow(r);
            };
        }

        /** @return the end of the table (the closing bracket for JSON) */
        public String end() {
            if (format != Format.JSON) {
                return "";
            }
            return first ? "]\n" : "\n]\n";
        }

        private String jsonRow(Row r) {
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
            o.addProperty("status", r.converged() ? "certified" : "not found");
            // the pretty-printed object, indented one level as an element of the array
            String object = JsonNumbers.write(o).stripTrailing().replace("\n", "\n  ");
            String separator = first ? "\n  " : ",\n  ";
            first = false;
            return separator + object;
        }
    }

    private static String note(Row r) {
        String set = r.activeSet().isEmpty() ? "" : r.activeSet();
        return r.converged() ? set : "NOT FOUND: no certified optimum (the numbers are the best point seen, not an optimum)";
    }
}
