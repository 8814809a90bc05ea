package org.counterpoise.io.commission;

import static org.counterpoise.io.commission.SiteCheckJson.hz;
import static org.counterpoise.io.commission.SiteCheckKey.ABSORBERS;
import static org.counterpoise.io.commission.SiteCheckKey.ABSORBER_FREQUENCY;
import static org.counterpoise.io.commission.SiteCheckKey.ABSORBER_FREQUENCY_SD;
import static org.counterpoise.io.commission.SiteCheckKey.ABSORBER_MASS;
import static org.counterpoise.io.commission.SiteCheckKey.ADVISED;
import static org.counterpoise.io.commission.SiteCheckKey.AFTER_TRIM;
import static org.counterpoise.io.commission.SiteCheckKey.AS_BUILT;
import static org.counterpoise.io.commission.SiteCheckKey.BAND_PEAK;
import static org.counterpoise.io.commission.SiteCheckKey.BEYOND_TRIM_RANGE;
import static org.counterpoise.io.commission.SiteCheckKey.DAMPING;
import static org.counterpoise.io.commission.SiteCheckKey.CLEARANCE;
import static org.counterpoise.io.commission.SiteCheckKey.IMPLIED_STROKE;
import static org.counterpoise.io.commission.SiteCheckKey.DESIGN_STROKE;
import static org.counterpoise.io.commission.SiteCheckKey.DAMPING_OFF;
import static org.counterpoise.io.commission.SiteCheckKey.DAMPING_SD;
import static org.counterpoise.io.commission.SiteCheckKey.DESIGN;
import static org.counterpoise.io.commission.SiteCheckKey.DESIGN_ABSORBER_FREQUENCY;
import static org.counterpoise.io.commission.SiteCheckKey.DESIGN_DAMPING;
import static org.counterpoise.io.commission.SiteCheckKey.FITTED;
import static org.counterpoise.io.commission.SiteCheckKey.FITTED_SET;
import static org.counterpoise.io.commission.SiteCheckKey.FREQUENCY_OFF;
import static org.counterpoise.io.commission.SiteCheckKey.FRF_KIND;
import static org.counterpoise.io.commission.SiteCheckKey.LINES;
import static org.counterpoise.io.commission.SiteCheckKey.MASS_TO_ADD;
import static org.counterpoise.io.commission.SiteCheckKey.PLATES_TO_ADD;
import static org.counterpoise.io.commission.SiteCheckKey.PLATE_MASS;
import static org.counterpoise.io.commission.SiteCheckKey.NORMALISED_RESIDUAL;
import static org.counterpoise.io.commission.SiteCheckKey.OPERATING;
import static org.counterpoise.io.commission.SiteCheckKey.PROJECT;
import static org.counterpoise.io.commission.SiteCheckKey.RESPONSE;
import static org.counterpoise.io.commission.SiteCheckKey.SOURCE;
import static org.counterpoise.io.commission.SiteCheckKey.TARGET_FREQUENCY;
import static org.counterpoise.io.commission.SiteCheckKey.TARGET_MODE;
import static org.counterpoise.io.commission.SiteCheckKey.TARGET_MODE_FREQUENCY;
import static org.counterpoise.io.commission.SiteCheckKey.TARGET_MODE_FREQUENCY_SD;
import static org.counterpoise.io.commission.SiteCheckKey.TRIM_REQUIRED;
import static org.counterpoise.io.commission.SiteCheckKey.WARNINGS;

import com.google.gson.JsonArray;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import java.util.Optional;
import org.counterpoise.core.commission.SetOperatingCheck;
import org.counterpoise.core.commission.AsBuiltSet;
import org.counterpoise.core.commission.CommissioningWarning;
import org.counterpoise.core.commission.SetCommissioning;
import org.counterpoise.io.export.JsonNumbers;

/**
 * The site check of several absorbers as one JSON object; SI units, frequencies in Hz. The single
 * absorber's {@code fitted_absorber} is null and {@code fitted_absorbers} holds one entry per
 * absorber (docs/cli.md, site-check).
 */
public final class SetSiteCheckJson {
    private SetSiteCheckJson() {
    }

    /**
     * @param check the site check
     * @return pretty-printed JSON with a final line break
     */
    public static String toJson(SetSiteCheck check) {
        return toJson(check.project(), Optional.empty(), Optional.of(check));
    }

    /**
     * @param project the project's name
     * @param operating the operating check, if a spectrum was given
     * @param fitted the check with the absorbers fitted, if a response was given
     * @return pretty-printed JSON with a final line break: {@code operating} as for one absorber (its
     *     stroke figures those of the absorber nearest its clearance) with {@code absorbers}, each
     *     absorber's design stroke, stroke under the site's force and clearance; {@code fitted_absorber}
     *     null; {@code fitted_absorbers} the check with them fitted, or null
     */
    public static String toJson(String project, Optional<SetOperatingSite> operating, Optional<SetSiteCheck> fitted) {
        JsonObject o = new JsonObject();
        o.addProperty(PROJECT.key(), project);
        if (operating.isPresent()) {
            SetOperatingSite op = operating.get();
            SetOperatingCheck check = op.check();
            JsonObject common = SiteCheckJson.operating(new SiteCheck.Operating(op.file(), op.unit(), op.convention(),
                    op.runningGiven(), check.comparison()));
            JsonArray strokes = new JsonArray();
            for (int j = 0; j < check.designStrokes().size(); j++) {
                JsonObject one = new JsonObject();
                JsonNumbers.put(one, DESIGN_STROKE.key(), check.designStrokes().get(j));
                JsonNumbers.put(one, IMPLIED_STROKE.key(), check.designStrokes().get(j) * check.comparison().ratio());
                JsonNumbers.put(one, CLEARANCE.key(), check.clearances().get(j));
                strokes.add(one);
            }
            common.add(ABSORBERS.key(), strokes);
            o.add(OPERATING.key(), common);
        } else {
            o.add(OPERATING.key(), JsonNull.INSTANCE);
        }
        o.add(FITTED.key(), JsonNull.INSTANCE);
        o.add(FITTED_SET.key(), fitted.isPresent() ? fitted(fitted.get()) : JsonNull.INSTANCE);
        return JsonNumbers.write(o);
    }

    private static JsonObject fitted(SetSiteCheck check) {
        SetCommissioning c = check.check();
        AsBuiltSet built = c.built();
        JsonObject set = new JsonObject();
        set.addProperty(SOURCE.key(), check.file());
        set.addProperty(FRF_KIND.key(), check.unit().kind().id());
        set.addProperty(LINES.key(), built.lines());
        set.addProperty(TARGET_MODE.key(), check.design().layout().modeNames().get(built.targetMode()));
        JsonNumbers.put(set, TARGET_MODE_FREQUENCY.key(), hz(built.targetModeFrequency()));
        if (built.targetModeFrequencySd().isPresent()) {
            JsonNumbers.put(set, TARGET_MODE_FREQUENCY_SD.key(), hz(built.targetModeFrequencySd().getAsDouble()));
        }
        JsonNumbers.put(set, NORMALISED_RESIDUAL.key(), built.normalisedResidual());
        set.add(WARNINGS.key(), SiteCheckJson.warnings(c.warnings()));
        boolean advised = c.advised();
        set.addProperty(ADVISED.key(), advised);
        JsonArray absorbers = new JsonArray();
        for (int j = 0; j < built.absorbers().size(); j++) {
            AsBuiltSet.Built a = built.absorbers().get(j);
            SetCommissioning.Correction k = c.corrections().get(j);
            JsonObject one = new JsonObject();
            JsonNumbers.put(one, ABSORBER_MASS.key(), a.mass());
            JsonNumbers.put(one, ABSORBER_FREQUENCY.key(), hz(a.frequency()));
            JsonNumbers.put(one, ABSORBER_FREQUENCY_SD.key(), hz(a.frequencySd()));
            JsonNumbers.put(one, DESIGN_ABSORBER_FREQUENCY.key(), hz(k.designFrequency()));
            JsonNumbers.put(one, TARGET_FREQUENCY.key(), hz(k.targetFrequency()));
            JsonNumbers.put(one, FREQUENCY_OFF.key(), k.frequencyOff());
            JsonNumbers.put(one, DAMPING.key(), a.dampingRatio());
            JsonNumbers.put(one, DAMPING_SD.key(), a.dampingRatioSd());
            JsonNumbers.put(one, DESIGN_DAMPING.key(), k.designDampingRatio());
            JsonNumbers.put(one, DAMPING_OFF.key(), k.dampingOff());
            if (advised) {
                JsonNumbers.put(one, MASS_TO_ADD.key(), k.massToAdd());
            } else {
                one.add(MASS_TO_ADD.key(), JsonNull.INSTANCE);
            }
            if (k.platesToAdd().isPresent()) {
                one.addProperty(PLATES_TO_ADD.key(), k.platesToAdd().getAsInt());
            } else {
                one.add(PLATES_TO_ADD.key(), JsonNull.INSTANCE);
            }
            if (k.plateMass() > 0) {
                JsonNumbers.put(one, PLATE_MASS.key(), k.plateMass());
            } else {
                one.add(PLATE_MASS.key(), JsonNull.INSTANCE);
            }
            one.addProperty(BEYOND_TRIM_RANGE.key(), k.beyondTrimRange());
            absorbers.add(one);
        }
        set.add(ABSORBERS.key(), absorbers);
        JsonObject peak = new JsonObject();
        peak.addProperty(RESPONSE.key(), "displacement");
        JsonNumbers.put(peak, DESIGN.key(), c.designPeak());
        JsonNumbers.put(peak, AS_BUILT.key(), c.asBuiltPeak());
        if (advised) {
            JsonNumbers.put(peak, AFTER_TRIM.key(), c.afterTrimPeak());
            peak.addProperty(TRIM_REQUIRED.key(), c.trimRequired());
        } else {
            peak.add(AFTER_TRIM.key(), JsonNull.INSTANCE);
            peak.add(TRIM_REQUIRED.key(), JsonNull.INSTANCE);
        }
        set.add(BAND_PEAK.key(), peak);
        return set;
    }
}
