package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.List;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.DesignContent;
import org.counterpoise.io.text.ReportContent;
import org.counterpoise.io.text.ReportKey;
import org.counterpoise.io.text.ReportRow;
import org.counterpoise.io.text.ReportValue;
import org.counterpoise.io.text.ReportValue.Change;
import org.counterpoise.io.text.ReportValue.Level;
import org.counterpoise.io.text.ReportValue.NotApplicable;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PeakAt;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Reduction;
import org.counterpoise.io.text.ReportValue.Series;
import org.counterpoise.io.text.ReportValue.Tolerance;
import org.counterpoise.io.text.ReportValue.Unbounded;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The design result as one JSON object with SI units in the key names (documented in
 * docs/cli.md): the {@link ReportContent} rendered under the keys of {@link ReportKey}, in that
 * table's order. Frequencies are in Hz, everything else in SI. An unbounded value is written as
 * null with a companion key {@code <key>_unbounded: true}; no key ever holds Infinity or NaN.
 */
public final class ResultJson {
    private ResultJson() {
    }

    /**
     * @param r the result
     * @return the JSON object
     */
    public static JsonObject of(DesignResult r) {
        return of(DesignContent.of(r));
    }

    /**
     * @param content a design's report content
     * @return the JSON object
     */
    public static JsonObject of(ReportContent content) {
        JsonObject o = new JsonObject();
        o.addProperty("name", content.name());
        for (ReportKey key : ReportKey.values()) {
            if (!key.jsonKeys().isEmpty()) {
                content.row(key).ifPresent(row -> write(o, row));
            }
        }
        JsonArray warnings = new JsonArray();
        for (ReportContent.Note w : content.warnings()) {
            JsonObject wo = new JsonObject();
            wo.addProperty("code", w.code());
            wo.addProperty("text", w.text());
            warnings.add(wo);
        }
        o.add("warnings", warnings);
        JsonArray cautions = new JsonArray();
        content.cautions().forEach(cautions::add);
        o.add("cautions", cautions);
        return o;
    }

    /**
     * @param r the result
     * @return pretty-printed JSON text
     */
    public static String toJson(DesignResult r) {
        return JsonNumbers.write(of(r));
    }

    private static void write(JsonObject o, ReportRow row) {
        List<String> keys = row.key().jsonKeys();
        ReportValue v = row.value();
        if (v instanceof Pair p) {
            write(o, keys.get(0), p.first());
            write(o, keys.get(1), p.second());
        } else if (v instanceof Reduction r) {
            write(o, keys.get(0), r.before());
            write(o, keys.get(1), r.after());
            JsonNumbers.put(o, keys.get(2), r.factor());
        } else if (v instanceof Tolerance t) {
            JsonNumbers.put(o, keys.get(0), t.range().low());
            JsonNumbers.put(o, keys.get(1), t.range().high());
            if (t.range().ofBareResponse()) {
                o.addProperty(keys.get(2), "below allowance times bare structure response");
            }
        } else if (v instanceof Words w && !w.ids().isEmpty()) {
            for (int i = 0; i < keys.size(); i++) {
                o.addProperty(keys.get(i), w.ids().get(i));
            }
        } else {
            write(o, keys.get(0), v);
        }
    }

    private static void write(JsonObject o, String key, ReportValue v) {
        if (v instanceof Quantity q) {
            JsonNumbers.put(o, key, json(q.si(), q.dimension()));
        } else if (v instanceof Unbounded) {
            JsonNumbers.put(o, key, Double.POSITIVE_INFINITY);
        } else if (v instanceof NotApplicable) {
            JsonNumbers.put(o, key, Double.NaN);
        } else if (v instanceof Words w) {
            o.addProperty(key, w.text());
        } else if (v instanceof Level l) {
            JsonNumbers.put(o, key, l.value());
        } else if (v instanceof Percent p) {
            JsonNumbers.put(o, key, p.fraction());
        } else if (v instanceof Series s) {
            JsonNumbers.putAll(o, key, s.si().stream().mapToDouble(x -> json(x, s.dimension())).toArray());
        } else if (v instanceof Change c) {
            JsonNumbers.put(o, key, c.factor());
        } else if (v instanceof PeakAt p) {
            write(o, key, p.peak());
        } else {
            throw new IllegalStateException("bug: no JSON form for " + v + " under " + key);
        }
    }

    /** The JSON's units: frequencies in Hz (the keys say _Hz), everything else in SI. */
    private static double json(double si, Dimension d) {
        return d == Dimension.FREQUENCY ? Unit.HERTZ.fromSi(si) : si;
    }
}
