package org.counterpoise.io.export;

import com.google.gson.JsonArray;
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
        number(o, "structure_mistuning_range", r.settings().structureRange());
        number(o, "absorber_mistuning_range", r.settings().absorberRange());
        number(o, "target", r.settings().target());
        number(o, "nominal_peak", design.responseAfter().value());
        number(o, "worst_case_peak", r.worstCase().peak());
        number(o, "worst_case_structure_factor", r.worstCase().structureFactor());
        number(o, "worst_case_absorber_factor", r.worstCase().absorberFactor());
        number(o, "robust_tuning_ratio", r.robust().tuning().tuningRatio());
        number(o, "robust_absorber_damping_ratio", r.robust().tuning().dampingRatio());
        number(o, "robust_absorber_stiffness_N_per_m", r.robustAbsorber().stiffness());
        number(o, "robust_absorber_damping_Ns_per_m", r.robustAbsorber().damping());
        number(o, "robust_worst_case_peak", r.robust().worstCase().peak());
        number(o, "robust_nominal_peak", r.robust().nominalPeak());
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
        number(m, "mean", mc.mean());
        number(m, "p50", mc.p50());
        number(m, "p90", mc.p90());
        number(m, "p95", mc.p95());
        number(m, "p99", mc.p99());
        number(m, "min", mc.min());
        number(m, "max", mc.max());
        number(m, "probability_exceeding_target", mc.probabilityExceeding());
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

    private static void number(JsonObject o, String key, double v) {
        JsonNumbers.put(o, key, v);
    }
}
