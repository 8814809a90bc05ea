package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import org.counterpoise.core.design.Cautions;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.Ids;

/**
 * The design result as one JSON object with SI units in the key names (documented in
 * docs/cli.md). An unbounded value is written as null with a companion key
 * {@code <key>_unbounded: true}; no key ever holds Infinity or NaN.
 */
public final class ResultJson {
    private ResultJson() {
    }

    /**
     * @param r the result
     * @return the JSON object
     */
    public static JsonObject of(DesignResult r) {
        JsonObject o = new JsonObject();
        var study = r.study();
        var s = study.structure();
        o.addProperty("name", study.name());
        o.addProperty("method", study.method().id());
        o.addProperty("method_source", r.methodSource());
        o.addProperty("excitation", Ids.of(study.excitation().kind()));
        number(o, "forcing_frequency_low_Hz", hz(study.excitation().band().low()));
        number(o, "forcing_frequency_high_Hz", hz(study.excitation().band().high()));
        number(o, "mass_ratio", r.tuning().massRatio());
        number(o, "tuning_ratio", r.tuning().tuningRatio());
        number(o, "absorber_damping_ratio", r.tuning().dampingRatio());
        number(o, "structure_mass_kg", s.effectiveMass());
        number(o, "structure_stiffness_N_per_m", s.effectiveStiffness());
        number(o, "structure_frequency_Hz", hz(s.naturalFrequency()));
        number(o, "structure_damping_ratio", s.dampingRatio());
        number(o, "absorber_mass_kg", r.absorber().mass());
        number(o, "absorber_stiffness_N_per_m", r.absorber().stiffness());
        number(o, "absorber_damping_Ns_per_m", r.absorber().damping());
        number(o, "absorber_frequency_Hz", hz(r.absorber().naturalFrequency()));
        number(o, "absorber_static_deflection_m", r.staticDeflection());
        o.addProperty("response_quantity", Ids.of(study.response()));
        o.addProperty("response_unit", study.response().dimension().siSymbol());
        peak(o, "peak_response_before", r.responseBefore());
        peak(o, "peak_response_after", r.responseAfter());
        number(o, "reduction_factor", r.reductionFactor());
        for (ResponseKind k : DesignResult.MOTIONS) {
            String unit = k.dimension().siSymbol().replace("/s^2", "_per_s2").replace("/s", "_per_s");
            peak(o, "peak_" + Ids.of(k).replace('-', '_') + "_before_" + unit, r.motionBefore().get(k));
            peak(o, "peak_" + Ids.of(k).replace('-', '_') + "_after_" + unit, r.motionAfter().get(k));
        }
        peak(o, "peak_stroke_m", r.strokeInBand());
        peak(o, "peak_stroke_run_up_m", r.strokeRunUp());
        number(o, "stroke_clearance_m", r.clearance());
        peak(o, "peak_spring_force_N", r.springForce());
        peak(o, "peak_damper_force_N", r.damperForce());
        peak(o, "peak_absorber_force_N", r.absorberForce());
        double[] coupled = r.coupledNaturalFrequencies().clone();
        for (int i = 0; i < coupled.length; i++) {
            coupled[i] = hz(coupled[i]);
        }
        JsonNumbers.putAll(o, "coupled_natural_frequencies_Hz", coupled);
        number(o, "detuning_stiffer_factor", r.stiffnessDetuning().raiseFactor());
        number(o, "detuning_softer_factor", r.stiffnessDetuning().lowerFactor());
        number(o, "detuning_lighter_factor", r.massDetuning().raiseFactor());
        number(o, "detuning_heavier_factor", r.massDetuning().lowerFactor());
        r.rms().ifPresent(rms -> {
            o.addProperty("spectrum", "white-noise");
            number(o, "psd_level_SI_per_Hz", rms.psdLevel());
            number(o, "rms_before", rms.before());
            number(o, "rms_after", rms.after());
            number(o, "rms_stroke_m", rms.stroke());
        });
        tolerance(o, "structure_frequency", r.structureTolerance());
        tolerance(o, "absorber_frequency", r.absorberTolerance());
        number(o, "tolerance_allowance", DesignResult.TOLERANCE_ALLOWANCE);
        JsonArray warnings = new JsonArray();
        for (Warning w : r.warnings()) {
            JsonObject wo = new JsonObject();
            wo.addProperty("code", w.code());
            wo.addProperty("text", w.text());
            warnings.add(wo);
        }
        o.add("warnings", warnings);
        JsonArray cautions = new JsonArray();
        Cautions.STANDARD.forEach(cautions::add);
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

    private static void tolerance(JsonObject o, String key, org.counterpoise.core.robust.MistuningRange range) {
        number(o, "tolerated_" + key + "_factor_low", range.low());
        number(o, "tolerated_" + key + "_factor_high", range.high());
        if (range.ofBareResponse()) {
            o.addProperty("tolerated_" + key + "_basis", "below allowance times bare structure response");
        }
    }

    private static void peak(JsonObject o, String key, ResponsePeak p) {
        number(o, key, p.value());
    }

    private static void number(JsonObject o, String key, double v) {
        JsonNumbers.put(o, key, v);
    }

    private static double hz(double omega) {
        return Unit.HERTZ.fromSi(omega);
    }
}
