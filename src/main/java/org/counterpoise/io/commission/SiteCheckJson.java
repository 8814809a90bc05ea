package org.counterpoise.io.commission;

import static org.counterpoise.io.commission.SiteCheckKey.*;

import com.google.gson.JsonArray;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.commission.AsBuiltAbsorber;
import org.counterpoise.core.commission.CommissioningCheck;
import org.counterpoise.core.commission.CommissioningWarning;
import org.counterpoise.core.commission.OperatingComparison;
import org.counterpoise.core.commission.TrimCorrection;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.export.JsonNumbers;

/** A site check as one JSON object; SI units (amplitudes as peaks), frequencies in Hz. */
public final class SiteCheckJson {
    private SiteCheckJson() {
    }

    /**
     * @param check the site check
     * @return pretty-printed JSON with a final line break
     */
    public static String toJson(SiteCheck check) {
        JsonObject o = new JsonObject();
        o.addProperty(PROJECT.key(), check.project());
        if (check.operating().isPresent()) {
            o.add(OPERATING.key(), operating(check.operating().get()));
        } else {
            o.add(OPERATING.key(), JsonNull.INSTANCE);
        }
        if (check.fitted().isPresent()) {
            o.add(FITTED.key(), fitted(check.fitted().get(), check.design(), check.plan().plateMass()));
        } else {
            o.add(FITTED.key(), JsonNull.INSTANCE);
        }
        return JsonNumbers.write(o);
    }

    static JsonObject operating(SiteCheck.Operating operating) {
        OperatingComparison c = operating.comparison();
        JsonObject o = new JsonObject();
        o.addProperty(SOURCE.key(), operating.file());
        o.addProperty(QUANTITY.key(), c.kind().name().toLowerCase(Locale.ROOT));
        o.addProperty(WITH_ABSORBER.key(), c.withAbsorber());
        JsonNumbers.put(o, RUNNING_FREQUENCY.key(), hz(c.runningFrequency()));
        o.addProperty(RUNNING_GIVEN.key(), operating.runningGiven());
        JsonNumbers.put(o, LINE_FREQUENCY.key(), hz(c.lineFrequency()));
        JsonNumbers.put(o, MEASURED_PEAK.key(), c.measured());
        JsonNumbers.put(o, PREDICTED_PEAK.key(), c.predicted());
        JsonNumbers.put(o, RATIO.key(), c.ratio());
        JsonNumbers.put(o, DRIVE.key(), c.impliedDriveAmplitude() / c.ratio());
        JsonNumbers.put(o, IMPLIED_DRIVE.key(), c.impliedDriveAmplitude());
        JsonNumbers.put(o, DESIGN_STROKE.key(), c.designStroke());
        JsonNumbers.put(o, IMPLIED_STROKE.key(), c.impliedStroke());
        JsonNumbers.put(o, CLEARANCE.key(), c.clearance());
        JsonNumbers.put(o, LARGEST_LINE_FREQUENCY.key(), hz(c.largestLineFrequency()));
        JsonNumbers.put(o, LARGEST_LINE.key(), c.largestLine());
        o.add(WARNINGS.key(), warnings(c.warnings()));
        return o;
    }

    private static JsonObject fitted(SiteCheck.Fitted fitted, DesignResult design, double plateMass) {
        CommissioningCheck c = fitted.check();
        AsBuiltAbsorber b = c.built();
        TrimCorrection t = c.trim();
        JsonObject o = new JsonObject();
        o.addProperty(SOURCE.key(), fitted.file());
        o.addProperty(FRF_KIND.key(), fitted.unit().kind().id());
        o.addProperty(LINES.key(), b.lines());
        JsonNumbers.put(o, ABSORBER_FREQUENCY.key(), hz(b.absorberFrequency()));
        JsonNumbers.put(o, ABSORBER_FREQUENCY_SD.key(), hz(b.absorberFrequencySd()));
        JsonNumbers.put(o, DESIGN_ABSORBER_FREQUENCY.key(), hz(design.absorber().naturalFrequency()));
        JsonNumbers.put(o, DAMPING.key(), b.dampingRatio());
        JsonNumbers.put(o, DAMPING_SD.key(), b.dampingRatioSd());
        JsonNumbers.put(o, DESIGN_DAMPING.key(), design.tuning().dampingRatio());
        JsonNumbers.put(o, STRUCTURE_FREQUENCY.key(), hz(b.structureFrequency()));
        o.addProperty(STRUCTURE_FITTED.key(), b.structureFrequencySd().isPresent());
        if (b.structureFrequencySd().isPresent()) {
            JsonNumbers.put(o, STRUCTURE_FREQUENCY_SD.key(), hz(b.structureFrequencySd().getAsDouble()));
        }
        JsonNumbers.put(o, NORMALISED_RESIDUAL.key(), b.normalisedResidual());
        List<CommissioningWarning> all = new ArrayList<>(b.warnings());
        all.addAll(t.warnings());
        o.add(WARNINGS.key(), warnings(all));
        JsonObject trim = new JsonObject();
        JsonNumbers.put(trim, TARGET_FREQUENCY.key(), hz(t.targetFrequency()));
        JsonNumbers.put(trim, FREQUENCY_OFF.key(), t.frequencyOff());
        JsonNumbers.put(trim, FREQUENCY_TOLERANCE.key(), t.frequencyTolerance());
        trim.addProperty(IN_TOLERANCE.key(), t.frequencyInTolerance());
        trim.addProperty(ADVISED.key(), t.advised());
        if (t.advised()) {
            trim.addProperty(PLATES_TO_ADD.key(), t.platesToAdd());
        } else {
            trim.add(PLATES_TO_ADD.key(), JsonNull.INSTANCE);
        }
        JsonNumbers.put(trim, PLATE_MASS.key(), plateMass);
        JsonNumbers.put(trim, FREQUENCY_OFF_AFTER.key(), t.frequencyOffAfter());
        JsonNumbers.put(trim, DAMPING_OFF.key(), t.dampingOff());
        JsonNumbers.put(trim, DAMPING_TOLERANCE.key(), t.dampingTolerance());
        o.add(TRIM.key(), trim);
        JsonNumbers.put(o, ABSORBER_MASS.key(), c.absorberMass());
        JsonObject peak = new JsonObject();
        peak.addProperty(RESPONSE.key(), c.response().kind().name().toLowerCase(Locale.ROOT));
        JsonNumbers.put(peak, DESIGN.key(), c.response().design());
        JsonNumbers.put(peak, AS_BUILT.key(), c.response().asBuilt());
        JsonNumbers.put(peak, AFTER_TRIM.key(), c.response().afterTrim());
        peak.addProperty(TRIM_REQUIRED.key(), c.response().trimRequired());
        o.add(BAND_PEAK.key(), peak);
        JsonNumbers.put(o, MEASURED_PEAK_FREQUENCY.key(), hz(c.measuredPeakFrequency()));
        JsonNumbers.put(o, MEASURED_PEAK_FRF.key(), c.measuredPeak());
        JsonNumbers.put(o, DESIGN_PEAK_FREQUENCY.key(), hz(c.designPeakFrequency()));
        JsonNumbers.put(o, DESIGN_PEAK_FRF.key(), c.designPeak());
        JsonArray rows = new JsonArray();
        for (CommissioningCheck.Row r : c.rows()) {
            JsonObject row = new JsonObject();
            JsonNumbers.put(row, FREQUENCY.key(), hz(r.frequency()));
            JsonNumbers.put(row, MEASURED.key(), r.measured());
            JsonNumbers.put(row, DESIGN.key(), r.design());
            JsonNumbers.put(row, AS_BUILT.key(), r.asBuilt());
            rows.add(row);
        }
        o.add(ROWS.key(), rows);
        return o;
    }

    static JsonArray warnings(List<CommissioningWarning> warnings) {
        JsonArray a = new JsonArray();
        warnings.forEach(w -> a.add(w.name()));
        return a;
    }

    static double hz(double omega) {
        return Unit.HERTZ.fromSi(omega);
    }
}
