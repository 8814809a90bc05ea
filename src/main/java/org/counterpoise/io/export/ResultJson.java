package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.io.text.DesignContent;
import org.counterpoise.io.text.ReportContent;

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
        ReportJson.put(o, content);
        JsonArray warnings = new JsonArray();
        for (ReportContent.Note w : content.warnings()) {
            JsonObject wo = new JsonObject();
            wo.addProperty("code", w.code());
            wo.addProperty("text", w.text());
            warnings.add(wo);
        }
        content.comparison().ifPresent(c -> ComparisonJson.put(o, c));
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

    /**
     * @param content a design's report content (with its comparison of methods, when it has one)
     * @return pretty-printed JSON text
     */
    public static String toJson(ReportContent content) {
        return JsonNumbers.write(of(content));
    }
}
