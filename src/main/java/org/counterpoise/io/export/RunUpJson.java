package org.counterpoise.io.export;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonObject;
import java.util.Map;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.runup.RunUp;
import org.counterpoise.core.runup.RunUpReportData;
import org.counterpoise.core.runup.RunUpResult;
import org.counterpoise.core.runup.SpeedRamp;
import org.counterpoise.core.runup.TransientPeak;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.RunUpReport;

/**
 * The run-up (or run-down) as one JSON object with SI units in the key names (documented in
 * docs/cli.md): {@code with_absorber} and {@code without_absorber}, each with the peak of every
 * quantity during the ramp ({@code peak_<quantity>_<unit>}, {@code speed_at_peak_<quantity>_rpm},
 * {@code time_at_peak_<quantity>_s}) and the steady-state peak over the same speeds
 * ({@code steady_peak_<quantity>_<unit>}, {@code speed_at_steady_peak_<quantity>_rpm}). Speeds are
 * shaft speeds in rpm. An unbounded steady-state peak is null with {@code <key>_unbounded: true};
 * no key ever holds Infinity or NaN.
 */
public final class RunUpJson {
    private RunUpJson() {
    }

    /**
     * @param d the study
     * @return the JSON object
     */
    public static JsonObject of(RunUpReportData d) {
        JsonObject o = new JsonObject();
        SpeedRamp ramp = d.comparison().withAbsorber().ramp();
        o.addProperty("name", d.name());
        o.addProperty("direction", d.runDown() ? "run-down" : "run-up");
        o.addProperty("start", d.runDown() ? "steady-state" : "rest");
        o.addProperty("harmonic_order", d.harmonicOrder());
        number(o, "rate_rpm_per_s", Unit.RPM_PER_SECOND.fromSi(d.shaftRate()));
        number(o, "start_speed_rpm", rpm(d, ramp.startSpeed()));
        number(o, "end_speed_rpm", rpm(d, ramp.speedAt(ramp.duration())));
        number(o, "duration_s", ramp.duration());
        number(o, "forcing_cycles", ramp.forcingCycles());
        number(o, "relative_tolerance", RunUp.DEFAULT_TOLERANCE);
        o.add("with_absorber", side(d, d.comparison().withAbsorber(), d.comparison().steadyWithAbsorber()));
        o.add("without_absorber", side(d, d.comparison().withoutAbsorber(), d.comparison().steadyWithoutAbsorber()));
        return o;
    }

    /**
     * @param d the study
     * @return pretty-printed JSON, one object, ending in a newline
     */
    public static String toJson(RunUpReportData d) {
        return new GsonBuilder().setPrettyPrinting().serializeNulls().disableHtmlEscaping().create().toJson(of(d))
                + "\n";
    }

    private static JsonObject side(RunUpReportData d, RunUpResult r, Map<ResponseKind, ResponsePeak> steady) {
        JsonObject o = new JsonObject();
        for (ResponseKind k : RunUpReportData.QUANTITIES) {
            TransientPeak p = r.peak(k).orElse(null);
            if (p == null) {
                continue;
            }
            String name = RunUpReport.label(k).replace(' ', '_');
            String unit = unit(k);
            number(o, "peak_" + name + "_" + unit, p.value());
            number(o, "speed_at_peak_" + name + "_rpm", rpm(d, p.speed()));
            number(o, "time_at_peak_" + name + "_s", p.time());
            ResponsePeak s = steady.get(k);
            number(o, "steady_peak_" + name + "_" + unit, s.value());
            number(o, "speed_at_steady_peak_" + name + "_rpm", rpm(d, s.frequency()));
        }
        return o;
    }

    private static String unit(ResponseKind k) {
        return k.dimension().siSymbol().replace("/s^2", "_per_s2").replace("/s", "_per_s");
    }

    private static double rpm(RunUpReportData d, double forcingFrequency) {
        return Unit.REV_PER_MINUTE.fromSi(d.shaftSpeed(forcingFrequency));
    }

    private static void number(JsonObject o, String key, double v) {
        JsonNumbers.put(o, key, v);
    }
}
