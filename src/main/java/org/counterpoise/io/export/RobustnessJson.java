package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.robust.SensitivityCurve;
import org.counterpoise.io.text.RobustnessContent;

/** The robustness study as one JSON object; keys documented in docs/cli.md, values in SI. */
public final class RobustnessJson {
    private RobustnessJson() {
    }

    /**
     * @param design the design examined
     * @param r the study
     * @return pretty-printed JSON
     */
    public static String toJson(DesignResult design, RobustnessResult r) {
        return toJson(design, r, AmplitudeConvention.PEAK);
    }

    /**
     * @param design the design examined
     * @param r the study
     * @param display the convention response values are also stated in (the sensitivity curves
     *     and the histogram stay peaks, as their keys say)
     * @return pretty-printed JSON
     */
    public static String toJson(DesignResult design, RobustnessResult r, AmplitudeConvention display) {
        JsonObject o = new JsonObject();
        o.addProperty("name", design.study().name());
        ReportJson.put(o, RobustnessContent.of(design, r).shownIn(display));
        // The curves are series, written from the result; they come before the Monte Carlo
        // summary, which ends with its histogram (the documented key order).
        // Without tolerances the Monte Carlo is not run: "monte_carlo" is null and
        // "monte_carlo_not_run" (a row of the report) says why; docs/cli.md lists the reasons.
        JsonObject m = o.has("monte_carlo") ? o.remove("monte_carlo").getAsJsonObject() : null;
        o.add("structure_sensitivity", curve(r.structureCurve()));
        o.add("robust_structure_sensitivity", curve(r.robustStructureCurve()));
        o.add("absorber_sensitivity", curve(r.absorberCurve()));
        o.add("absorber_damping_sensitivity", curve(r.dampingCurve()));
        if (m == null || r.monteCarlo().result().isEmpty()) {
            o.add("monte_carlo", JsonNull.INSTANCE);
            return JsonNumbers.write(o);
        }
        MonteCarloResult mc = r.monteCarlo().result().get();
        JsonNumbers.putAll(m, "histogram_edges", mc.binEdges());
        JsonArray counts = new JsonArray();
        for (int c : mc.counts()) {
            counts.add(c);
        }
        m.add("histogram_counts", counts);
        o.add("monte_carlo", m);
        return JsonNumbers.write(o);
    }

    private static JsonObject curve(SensitivityCurve c) {
        JsonObject o = new JsonObject();
        JsonNumbers.putAll(o, "factors", c.factors());
        JsonNumbers.putAll(o, "peaks", c.peaks());
        return o;
    }
}
