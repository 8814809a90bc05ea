package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.optim.AbsorberSetCertificate;
import org.counterpoise.core.optim.AbsorberSetDesign;
import org.counterpoise.core.optim.AbsorberSetOptimum;
import org.counterpoise.core.optim.AbsorberSetTuning;

/**
 * The {@code optimum --absorbers N} output: per case, the optimum peak, the single absorber of the
 * same total mass beside it, each absorber's mass ratio, tuning ratio and damping ratio, and the
 * certificate; as text, CSV (one line per absorber) or a JSON array. The JSON keys are the
 * constants below (the one list of this output's keys).
 */
public final class AbsorberSetTable {
    static final String MASS_RATIO = "mass_ratio";
    static final String STRUCTURE_DAMPING = "structure_damping_ratio";
    static final String COUNT = "absorbers";
    static final String TUNING = "tuning";
    static final String PEAK = "peak";
    static final String SINGLE_PEAK = "single_absorber_peak";
    static final String ABSORBER = "absorber";
    static final String ABSORBER_MASS_RATIO = "mass_ratio";
    static final String TUNING_RATIO = "tuning_ratio";
    static final String DAMPING_RATIO = "absorber_damping_ratio";
    static final String CERTIFICATE = "certificate";
    static final String ACTIVE_PEAKS = "active_peaks";
    static final String ACTIVE_SPREAD = "active_peak_spread";
    static final String STATIONARITY = "stationarity";
    static final String SCAN_POINTS = "scan_points";
    static final String SCAN_BEST = "scan_lowest_peak";
    static final String PERTURBATIONS = "perturbations";
    static final String PERTURBATION_LEAST = "perturbation_least_change";
    static final String CONVERGED = "converged";
    static final String STATUS = "status";

    private AbsorberSetTable() {
    }

    /**
     * One case solved.
     *
     * @param optimum the optimum of several absorbers
     * @param singlePeak the certified optimum peak of one absorber of the same total mass
     */
    public record Row(AbsorberSetOptimum optimum, double singlePeak) {
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

    static String tuningWord(AbsorberSetTuning t) {
        return t.name().toLowerCase(Locale.ROOT);
    }

    private static String text(List<Row> rows) {
        StringBuilder out = new StringBuilder();
        for (Row row : rows) {
            out.append(text(row)).append('\n');
        }
        return out.toString();
    }

    /**
     * @param row one case
     * @return its text block (no blank line after it)
     */
    static String text(Row row) {
        StringBuilder out = new StringBuilder();
        {
            AbsorberSetOptimum o = row.optimum();
            AbsorberSetCertificate c = o.certificate();
            out.append(String.format(Locale.ROOT, "%s, %s tuning: mass ratio %.6g in total, structure damping"
                    + " ratio %.6g, %s%n", absorbers(o.problem().count()), tuningWord(o.problem().tuning()), o.problem().massRatio(),
                    o.problem().structureDamping(), band(o)));
            out.append(String.format(Locale.ROOT, "peak %.12g (one absorber of the same total mass: %.12g)%n", o.peak(),
                    row.singlePeak()));
            out.append(certificateText(c));
            out.append(String.format(Locale.ROOT, "%-9s %-12s %-14s %s%n", ABSORBER, ABSORBER_MASS_RATIO, TUNING_RATIO,
                    DAMPING_RATIO));
            AbsorberSetDesign d = o.design();
            for (int j = 0; j < d.count(); j++) {
                out.append(String.format(Locale.ROOT, "%-9d %-12.6g %-14.10f %.10f%n", j + 1, d.massRatios().get(j),
                        d.tuningRatios().get(j), d.dampingRatios().get(j)));
            }
        }
        return out.toString();
    }

    /**
     * @param c a certificate
     * @return its line of the text output
     */
    static String certificateText(AbsorberSetCertificate c) {
        return c.certified() ? String.format(Locale.ROOT, "certified: %d equal peaks (to %.1e), first-order"
                + " conditions to %.1e, none of %d scanned designs and %d small moves lower%n", c.activePeaks(),
                c.activeSpread(), c.stationarity(), c.scanPoints(), c.perturbations())
                : "NOT FOUND: no certified optimum (the numbers are the best point seen, not an optimum)\n";
    }

    private static String band(AbsorberSetOptimum o) {
        return band(o.problem().bandLow(), o.problem().bandHigh());
    }

    /**
     * @param lo the band's low end, frequency ratio
     * @param hi its high end (+infinity: open)
     * @return the band in words
     */
    static String band(double lo, double hi) {
        if (lo == 0 && Double.isInfinite(hi)) {
            return "all frequencies";
        }
        return Double.isInfinite(hi) ? String.format(Locale.ROOT, "frequency ratios from %.6g up", lo)
                : String.format(Locale.ROOT, "frequency ratios %.6g to %.6g", lo, hi);
    }

    private static String csv(List<Row> rows) {
        StringBuilder out = new StringBuilder(String.join(",", MASS_RATIO, STRUCTURE_DAMPING, COUNT, TUNING, ABSORBER,
                "absorber_" + ABSORBER_MASS_RATIO, TUNING_RATIO, DAMPING_RATIO, PEAK, SINGLE_PEAK, CONVERGED)).append('\n');
        for (Row row : rows) {
            AbsorberSetOptimum o = row.optimum();
            AbsorberSetDesign d = o.design();
            for (int j = 0; j < d.count(); j++) {
                out.append(String.format(Locale.ROOT, "%.17g,%.17g,%d,%s,%d,%.17g,%.17g,%.17g,%.17g,%.17g,%s%n",
                        o.problem().massRatio(), o.problem().structureDamping(), d.count(), tuningWord(o.problem().tuning()),
                        j + 1, d.massRatios().get(j), d.tuningRatios().get(j), d.dampingRatios().get(j), o.peak(),
                        row.singlePeak(), o.certificate().certified()));
            }
        }
        return out.toString();
    }

    private static String json(List<Row> rows) {
        JsonArray array = new JsonArray();
        for (Row row : rows) {
            array.add(object(row));
        }
        return JsonNumbers.write(array);
    }

    /**
     * @param row one case
     * @return its JSON object
     */
    static JsonObject object(Row row) {
        {
            AbsorberSetOptimum o = row.optimum();
            JsonObject object = new JsonObject();
            JsonNumbers.put(object, MASS_RATIO, o.problem().massRatio());
            JsonNumbers.put(object, STRUCTURE_DAMPING, o.problem().structureDamping());
            object.addProperty(COUNT, o.problem().count());
            object.addProperty(TUNING, tuningWord(o.problem().tuning()));
            JsonNumbers.put(object, PEAK, o.peak());
            JsonNumbers.put(object, SINGLE_PEAK, row.singlePeak());
            JsonArray absorbers = new JsonArray();
            AbsorberSetDesign d = o.design();
            for (int j = 0; j < d.count(); j++) {
                JsonObject a = new JsonObject();
                JsonNumbers.put(a, ABSORBER_MASS_RATIO, d.massRatios().get(j));
                JsonNumbers.put(a, TUNING_RATIO, d.tuningRatios().get(j));
                JsonNumbers.put(a, DAMPING_RATIO, d.dampingRatios().get(j));
                absorbers.add(a);
            }
            object.add(ABSORBER, absorbers);
            certify(object, o.certificate());
            return object;
        }
    }

    /**
     * Adds a certificate's object and the status keys.
     *
     * @param object the case's JSON object
     * @param c its certificate
     */
    static void certify(JsonObject object, AbsorberSetCertificate c) {
        JsonObject cert = new JsonObject();
        cert.addProperty(ACTIVE_PEAKS, c.activePeaks());
        JsonNumbers.put(cert, ACTIVE_SPREAD, c.activeSpread());
        JsonNumbers.put(cert, STATIONARITY, c.stationarity());
        cert.addProperty(SCAN_POINTS, c.scanPoints());
        JsonNumbers.put(cert, SCAN_BEST, c.scanBest());
        cert.addProperty(PERTURBATIONS, c.perturbations());
        JsonNumbers.put(cert, PERTURBATION_LEAST, c.perturbationLeast());
        object.add(CERTIFICATE, cert);
        object.addProperty(CONVERGED, c.certified());
        object.addProperty(STATUS, c.certified() ? "certified" : "not found");
    }

    /** @return "1 absorber" or "n absorbers" */
    static String absorbers(int n) {
        return n == 1 ? "1 absorber" : n + " absorbers";
    }
}
