package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.List;
import org.counterpoise.io.text.ReportComparison;
import org.counterpoise.io.text.ReportKey;
import org.counterpoise.io.text.ReportValue;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The comparison of methods in the design JSON (docs/cli.md): an array under
 * {@link ReportKey#COMPARISON}, one object per candidate with its columns' keys (SI, frequencies in
 * Hz, null with {@code <key>_unbounded} when unbounded) and the flags recommended, chosen and
 * constraints_applied; the recommended method and the reason's id; the methods left out. Every key
 * comes from {@link ReportKey}.
 */
final class ComparisonJson {
    private ComparisonJson() {
    }

    /**
     * @param o the design's object
     * @param c the comparison
     */
    static void put(JsonObject o, ReportComparison c) {
        JsonArray candidates = new JsonArray();
        for (ReportComparison.Line line : c.lines()) {
            JsonObject item = new JsonObject();
            for (int i = 0; i < c.columns().size(); i++) {
                String key = c.columns().get(i).key().jsonKeys().get(0);
                ReportValue v = line.cells().get(i);
                // words write their id when they have one, as the design's own rows do
                ReportJson.write(item, key, v instanceof Words w && !w.ids().isEmpty()
                        ? new Words(w.ids().get(0), List.of()) : v);
            }
            item.addProperty(key(ReportKey.CONSTRAINTS_APPLIED), line.constrained());
            item.addProperty(key(ReportKey.RECOMMENDED_FLAG), line.recommended());
            item.addProperty(key(ReportKey.CHOSEN_FLAG), line.chosen());
            candidates.add(item);
        }
        o.add(key(ReportKey.COMPARISON), candidates);
        List<String> recommendation = ReportKey.RECOMMENDATION.jsonKeys();
        for (int i = 0; i < recommendation.size(); i++) {
            o.addProperty(recommendation.get(i), c.recommendation().ids().get(i));
        }
        JsonArray leftOut = new JsonArray();
        for (ReportComparison.LeftOut l : c.leftOut()) {
            JsonObject item = new JsonObject();
            item.addProperty(key(ReportKey.METHOD), l.methodId());
            item.addProperty(key(ReportKey.LEFT_OUT_REASON), l.reasonId());
            leftOut.add(item);
        }
        o.add(key(ReportKey.COMPARISON_LEFT_OUT), leftOut);
    }

    private static String key(ReportKey k) {
        return k.jsonKeys().get(0);
    }
}
