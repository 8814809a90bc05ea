package org.counterpoise.io.export;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.robust.SensitivityCurve;

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
        JsonObject o = new JsonObject();
        o.addProperty("name", design.study().name());
        o.addProperty("response_quantity", design.study().response().name().toLowerCase(java.util.Locale.ROOT)
                .replace('_', '-'));
        o.addProperty("response_unit", design.study().response().dimension().siSymbol());
        o.addProperty("structure_detuning_range", r.settings().structureRange());
        o.addProperty("absorber_detuning_range", r.settings().absorberRange());
        number(o, "target", r.settings().target());
        o.addProperty("nominal_peak", design.responseAfter().value());
        o.addProperty("worst_case_peak", r.worstCase().peak());
        o.addProperty("worst_case_structure_factor", r.worstCase().structureFactor());
        o.addProperty("worst_case_absorber_factor", r.worstCase().absorberFactor());
        o.addProperty("robust_tuning_ratio", r.robust().tuning().tuningRatio());
        o.addProperty("robust_absorber_damping_ratio", r.robust().tuning().dampingRatio());
        o.addProperty("robust_absorber_stiffness_N_per_m", r.robustAbsorber().stiffness());
        o.addProperty("robust_absorber_damping_Ns_per_m", r.robustAbsorber().damping());
        o.addProperty("robust_worst_case_peak", r.robust().worstCase().peak());
        o.addProperty("robust_nominal_peak", r.robust().nominalPeak());
        number(o, "target_structure_factor_low", r.toleratedForTarget().low());
        number(o, "target_structure_factor_high", r.toleratedForTarget().high());
        o.add("structure_sensitivity", curve(r.structureCurve()));
        o.add("robust_structure_sensitivity", curve(r.robustStructureCurve()));
        o.add("absorber_sensitivity", curve(r.absorberCurve()));
        o.add("absorber_damping_sensitivity", curve(r.dampingCurve()));
        MonteCarloResult mc = r.monteCarlo();
        JsonObject m = new JsonObject();
        m.addProperty("samples", mc.samples());
        m.addProperty("seed", mc.seed());
        m.addProperty("mean", mc.mean());
        m.addProperty("p50", mc.p50());
        m.addProperty("p90", mc.p90());
        m.addProperty("p95", mc.p95());
        m.addProperty("p99", mc.p99());
        m.addProperty("min", mc.min());
        m.addProperty("max", mc.max());
        number(m, "probability_exceeding_target", mc.probabilityExceeding());
        JsonArray edges = new JsonArray();
        for (double e : mc.binEdges()) {
            edges.add(e);
        }
        JsonArray counts = new JsonArray();
        for (int c : mc.counts()) {
            counts.add(c);
        }
        m.add("histogram_edges", edges);
        m.add("histogram_counts", counts);
        o.add("monte_carlo", m);
        return new GsonBuilder().setPrettyPrinting().serializeNulls().create().toJson(o) + "\n";
    }

    private static JsonObject curve(SensitivityCurve c) {
        JsonObject o = new JsonObject();
        JsonArray f = new JsonArray();
        JsonArray p = new JsonArray();
        for (double v : c.factors()) {
            f.add(v);
        }
        for (double v : c.peaks()) {
            p.add(v);
        }
        o.add("factors", f);
        o.add("peaks", p);
        return o;
    }

    private static void number(JsonObject o, String key, double v) {
        if (Double.isFinite(v)) {
            o.addProperty(key, v);
        } else {
            o.add(key, JsonNull.INSTANCE);
        }
    }
}
