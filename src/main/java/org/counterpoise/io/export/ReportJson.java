package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import org.counterpoise.core.criteria.AmplitudeConvention;
import java.util.List;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.ReportContent;
import org.counterpoise.io.text.ReportKey;
import org.counterpoise.io.text.ReportRow;
import org.counterpoise.io.text.ReportSection;
import org.counterpoise.io.text.ReportValue;
import org.counterpoise.io.text.ReportValue.Change;
import org.counterpoise.io.text.ReportValue.Count;
import org.counterpoise.io.text.ReportValue.Factor;
import org.counterpoise.io.text.ReportValue.Field;
import org.counterpoise.io.text.ReportValue.Fields;
import org.counterpoise.io.text.ReportValue.Flag;
import org.counterpoise.io.text.ReportValue.Level;
import org.counterpoise.io.text.ReportValue.Margin;
import org.counterpoise.io.text.ReportValue.Names;
import org.counterpoise.io.text.ReportValue.NotApplicable;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;
import org.counterpoise.io.text.ReportValue.PeakAt;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.PlusMinus;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Reduction;
import org.counterpoise.io.text.ReportValue.Series;
import org.counterpoise.io.text.ReportValue.Tolerance;
import org.counterpoise.io.text.ReportValue.Unbounded;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * Report rows into JSON, the one way the design and robustness JSON write them: each row's value
 * under its {@link ReportKey}'s JSON keys, in the order of that table; a key {@code a.b} goes
 * into the object {@code a}. Frequencies are in Hz (the keys say _Hz), everything else in SI; an
 * unbounded value is null with {@code <key>_unbounded: true} and a value that does not apply is
 * null ({@link JsonNumbers}).
 */
final class ReportJson {
    private ReportJson() {
    }

    /**
     * @param o the object to fill
     * @param content the report whose rows are written
     */
    static void put(JsonObject o, ReportContent content) {
        for (ReportKey key : ReportKey.values()) {
            if (key.array()) {
                array(o, key, content);
            } else if (!key.jsonKeys().isEmpty()) {
                content.row(key).ifPresent(row -> write(o, row));
            }
        }
    }

    /** Every row with an array key, in report order, as one element of the array its key names. */
    private static void array(JsonObject o, ReportKey key, ReportContent content) {
        String path = key.jsonKeys().get(0);
        path = path.substring(0, path.length() - 2);
        JsonArray elements = null;
        for (ReportSection section : content.sections()) {
            for (ReportRow row : section.rows()) {
                if (row.key() == key) {
                    if (elements == null) {
                        elements = new JsonArray();
                        parent(o, path).add(leaf(path), elements);
                    }
                    JsonObject element = new JsonObject();
                    write(element, "element", row.value());
                    elements.add(element.get("element"));
                }
            }
        }
    }

    private static void write(JsonObject o, ReportRow row) {
        write(o, row.key().jsonKeys(), row.value());
        // Amplitudes shown in another convention than peak: the peak keys stay (programs read them),
        // the same values in the display convention follow under the keys with its prefix.
        row.amplitude().filter(a -> a.followsDisplay() && a.convention() != AmplitudeConvention.PEAK)
                .ifPresent(a -> {
                    List<String> keys = row.key().jsonKeysIn(a.convention());
                    ReportValue shown = row.shownValue();
                    if (shown instanceof Reduction r) {
                        // the factor is the same in every convention: only the two amplitudes
                        write(o, keys.subList(0, 2), new Pair(r.before(), r.after(), PairKind.BEFORE_AFTER));
                    } else {
                        write(o, keys, shown);
                    }
                });
    }

    private static void write(JsonObject o, List<String> keys, ReportValue v) {
        if (v instanceof Pair p && p.first() instanceof Margin a && p.second() instanceof Margin b
                && keys.size() == 4) {
            write(o, keys.get(0), number(a.ratio()));
            write(o, keys.get(1), number(b.ratio()));
            write(o, keys.get(2), number(a.decibels()));
            write(o, keys.get(3), number(b.decibels()));
        } else if (v instanceof Pair p) {
            write(o, keys.get(0), p.first());
            write(o, keys.get(1), p.second());
        } else if (v instanceof Reduction r) {
            write(o, keys.get(0), r.before());
            write(o, keys.get(1), r.after());
            write(o, keys.get(2), number(r.factor()));
        } else if (v instanceof Tolerance t) {
            write(o, keys.get(0), number(t.range().low().orElse(Double.NaN)));
            write(o, keys.get(1), number(t.range().high().orElse(Double.NaN)));
            if (t.range().ofBareResponse() && keys.size() > 2) {
                write(o, keys.get(2), new Words("below allowance times bare structure response", List.of()));
            }
        } else if (v instanceof PlusMinus p) {
            write(o, keys.get(0), new Percent(p.fraction(), p.figures()));
            write(o, keys.get(1), new Words(p.origin(), List.of()));
        } else if (v instanceof Words w && !w.ids().isEmpty()) {
            for (int i = 0; i < keys.size(); i++) {
                write(o, keys.get(i), new Words(w.ids().get(i), List.of()));
            }
        } else {
            write(o, keys.get(0), v);
        }
    }

    /**
     * @param root the object to write into
     * @param path the JSON key ({@code a.b} for key b of the nested object a)
     * @param v the value, in the JSON's units
     */
    static void write(JsonObject root, String path, ReportValue v) {
        JsonObject o = parent(root, path);
        String key = leaf(path);
        if (v instanceof Fields f) {
            JsonObject fields = new JsonObject();
            for (Field field : f.fields()) {
                write(fields, field.key().jsonKeys(), field.value());
            }
            o.add(key, fields);
        } else if (v instanceof Quantity q) {
            JsonNumbers.put(o, key, json(q.si(), q.dimension()));
        } else if (v instanceof Unbounded) {
            JsonNumbers.put(o, key, Double.POSITIVE_INFINITY);
        } else if (v instanceof NotApplicable) {
            JsonNumbers.put(o, key, Double.NaN);
        } else if (v instanceof Words w) {
            o.addProperty(key, w.text());
        } else if (v instanceof Flag f) {
            o.addProperty(key, f.value());
        } else if (v instanceof Names n) {
            JsonArray a = new JsonArray();
            n.ids().forEach(a::add);
            o.add(key, a);
        } else if (v instanceof Margin m) {
            JsonNumbers.put(o, key, m.ratio());
        } else if (v instanceof Level l) {
            JsonNumbers.put(o, key, l.value());
        } else if (v instanceof Percent p) {
            JsonNumbers.put(o, key, p.fraction());
        } else if (v instanceof Series s) {
            JsonNumbers.putAll(o, key, s.si().stream().mapToDouble(x -> json(x, s.dimension())).toArray());
        } else if (v instanceof Change c) {
            JsonNumbers.put(o, key, c.factor());
        } else if (v instanceof Factor f) {
            JsonNumbers.put(o, key, f.factor());
        } else if (v instanceof Count c) {
            o.addProperty(key, c.value());
        } else if (v instanceof PeakAt p) {
            write(o, key, p.peak());
        } else {
            throw new IllegalStateException("bug: no JSON form for " + v + " under " + key);
        }
    }

    /** The object a path's last key goes in ({@code a.b.c}: c in b in a), made when missing. */
    private static JsonObject parent(JsonObject root, String path) {
        JsonObject o = root;
        String[] parts = path.split("\\.");
        for (int i = 0; i < parts.length - 1; i++) {
            if (!o.has(parts[i]) || !o.get(parts[i]).isJsonObject()) {
                o.add(parts[i], new JsonObject());
            }
            o = o.getAsJsonObject(parts[i]);
        }
        return o;
    }

    private static String leaf(String path) {
        return path.substring(path.lastIndexOf('.') + 1);
    }

    /** The JSON's units: frequencies in Hz (the keys say _Hz), everything else in SI. */
    private static double json(double si, Dimension d) {
        return d == Dimension.FREQUENCY ? Unit.HERTZ.fromSi(si) : si;
    }

    /** A plain number (a factor): null when not defined, null and unbounded when infinite. */
    private static ReportValue number(double v) {
        if (Double.isNaN(v)) {
            return new NotApplicable();
        }
        return Double.isInfinite(v) ? new Unbounded(Dimension.RATIO, "") : new Quantity(v, Dimension.RATIO, 4);
    }
}
