package org.counterpoise.io.measurement;

import static org.counterpoise.io.measurement.IdentificationKey.ADDED_MASS;
import static org.counterpoise.io.measurement.IdentificationKey.BAND;
import static org.counterpoise.io.measurement.IdentificationKey.CIRCLE_FIT;
import static org.counterpoise.io.measurement.IdentificationKey.COHERENCE_MEAN;
import static org.counterpoise.io.measurement.IdentificationKey.CYCLES;
import static org.counterpoise.io.measurement.IdentificationKey.DAMPING;
import static org.counterpoise.io.measurement.IdentificationKey.DAMPING_PAIR_SCATTER;
import static org.counterpoise.io.measurement.IdentificationKey.DAMPING_SD;
import static org.counterpoise.io.measurement.IdentificationKey.FIT_QUALITY;
import static org.counterpoise.io.measurement.IdentificationKey.FREQUENCY;
import static org.counterpoise.io.measurement.IdentificationKey.FREQUENCY_SD;
import static org.counterpoise.io.measurement.IdentificationKey.FREQUENCY_WITH_ADDED_MASS;
import static org.counterpoise.io.measurement.IdentificationKey.FRF_KIND;
import static org.counterpoise.io.measurement.IdentificationKey.FRF_UNIT;
import static org.counterpoise.io.measurement.IdentificationKey.HALF_POWER;
import static org.counterpoise.io.measurement.IdentificationKey.LINES;
import static org.counterpoise.io.measurement.IdentificationKey.LOG_DECREMENT;
import static org.counterpoise.io.measurement.IdentificationKey.LOG_DECREMENT_SD;
import static org.counterpoise.io.measurement.IdentificationKey.LOWER_INVERSE_MASS;
import static org.counterpoise.io.measurement.IdentificationKey.MASS;
import static org.counterpoise.io.measurement.IdentificationKey.MASS_AT_TRANSFER_POINT;
import static org.counterpoise.io.measurement.IdentificationKey.MASS_AT_TRANSFER_POINT_SD;
import static org.counterpoise.io.measurement.IdentificationKey.MASS_SD;
import static org.counterpoise.io.measurement.IdentificationKey.METHOD;
import static org.counterpoise.io.measurement.IdentificationKey.MODE;
import static org.counterpoise.io.measurement.IdentificationKey.MODES;
import static org.counterpoise.io.measurement.IdentificationKey.NORMALISED_RESIDUAL;
import static org.counterpoise.io.measurement.IdentificationKey.RESIDUALS;
import static org.counterpoise.io.measurement.IdentificationKey.SHAPE_RATIO;
import static org.counterpoise.io.measurement.IdentificationKey.SHAPE_RATIO_SD;
import static org.counterpoise.io.measurement.IdentificationKey.SOURCE;
import static org.counterpoise.io.measurement.IdentificationKey.START_ESTIMATES;
import static org.counterpoise.io.measurement.IdentificationKey.STIFFNESS;
import static org.counterpoise.io.measurement.IdentificationKey.TRANSFER;
import static org.counterpoise.io.measurement.IdentificationKey.TRANSFER_FREQUENCY;
import static org.counterpoise.io.measurement.IdentificationKey.UPPER_COMPLIANCE;
import static org.counterpoise.io.measurement.IdentificationKey.WARNINGS;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import java.util.OptionalDouble;
import org.counterpoise.core.identify.FitWarning;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.identify.ModalModel;
import org.counterpoise.core.identify.ModeShapeRatio;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.export.JsonNumbers;

/** An identification as one JSON object; SI units in the key names, frequencies in Hz. */
public final class IdentificationJson {
    private IdentificationJson() {
    }

    /**
     * @param identification what was found
     * @return pretty-printed JSON with a final line break
     */
    public static String toJson(Identification identification) {
        return JsonNumbers.write(object(identification));
    }

    /**
     * @param identification a driving-point FRF fit
     * @param transferFile the transfer FRF's file as the user named it
     * @param mode the mode compared, 1 = lowest
     * @param shape the mode shape at the transfer point relative to the driving point
     * @return the identification's JSON with a {@code transfer} object: file, mode, shape ratio and
     *     its uncertainty, the transfer fit's frequency, the modal mass at the transfer point
     */
    public static String toJson(Identification identification, String transferFile, int mode, ModeShapeRatio shape) {
        JsonObject o = object(identification);
        JsonObject t = new JsonObject();
        t.addProperty(SOURCE.key(), transferFile);
        t.addProperty(MODE.key(), mode);
        JsonNumbers.put(t, SHAPE_RATIO.key(), shape.ratio());
        shape.ratioSd().ifPresent(sd -> JsonNumbers.put(t, SHAPE_RATIO_SD.key(), sd));
        JsonNumbers.put(t, TRANSFER_FREQUENCY.key(), hz(shape.transfer().naturalFrequency()));
        IdentifiedMode at = shape.atTransferPoint();
        JsonNumbers.put(t, MASS_AT_TRANSFER_POINT.key(), at.modalMass());
        at.modalMassSd().ifPresent(sd -> JsonNumbers.put(t, MASS_AT_TRANSFER_POINT_SD.key(), sd));
        o.add(TRANSFER.key(), t);
        return JsonNumbers.write(o);
    }

    private static JsonObject object(Identification identification) {
        JsonObject o = new JsonObject();
        o.addProperty(METHOD.key(), identification.method());
        o.addProperty(SOURCE.key(), identification.source());
        JsonArray modes = new JsonArray();
        if (identification instanceof Identification.Frf f) {
            o.addProperty(FRF_KIND.key(), f.unit().kind().id());
            o.addProperty(FRF_UNIT.key(), f.unit().symbol());
            MeasuredFrf d = f.fitted();
            JsonNumbers.putAll(o, BAND.key(), new double[] {hz(d.omega()[0]), hz(d.omega()[d.size() - 1])});
            o.addProperty(LINES.key(), d.size());
            f.model().modes().forEach(m -> modes.add(mode(m)));
            o.add(MODES.key(), modes);
            ModalModel model = f.model();
            if (model.residuals().lowerInverseMass() != 0 || model.residuals().upperCompliance() != 0) {
                JsonObject r = new JsonObject();
                JsonNumbers.put(r, LOWER_INVERSE_MASS.key(), model.residuals().lowerInverseMass());
                JsonNumbers.put(r, UPPER_COMPLIANCE.key(), model.residuals().upperCompliance());
                o.add(RESIDUALS.key(), r);
            } else {
                o.add(RESIDUALS.key(), JsonNull.INSTANCE);
            }
            JsonObject q = new JsonObject();
            JsonNumbers.put(q, NORMALISED_RESIDUAL.key(), model.normalisedResidual());
            JsonNumbers.put(q, COHERENCE_MEAN.key(), model.meanCoherence());
            JsonArray warnings = new JsonArray();
            FitWarning.of(model, d).forEach(w -> warnings.add(w.name()));
            q.add(WARNINGS.key(), warnings);
            o.add(FIT_QUALITY.key(), q);
            JsonObject starts = new JsonObject();
            starts.add(HALF_POWER.key(), f.halfPower().<JsonElement>map(IdentificationJson::mode)
                    .orElse(JsonNull.INSTANCE));
            if (f.circle().isPresent()) {
                JsonObject c = mode(f.circle().get().mode());
                c.remove(DAMPING_SD.key());
                JsonNumbers.put(c, DAMPING_PAIR_SCATTER.key(), f.circle().get().mode().dampingRatioSd());
                starts.add(CIRCLE_FIT.key(), c);
            } else {
                starts.add(CIRCLE_FIT.key(), JsonNull.INSTANCE);
            }
            o.add(START_ESTIMATES.key(), starts);
        } else if (identification instanceof Identification.Decay d) {
            JsonObject m = new JsonObject();
            JsonNumbers.put(m, FREQUENCY.key(), hz(d.decay().naturalFrequency()));
            m.add(FREQUENCY_SD.key(), JsonNull.INSTANCE);
            JsonNumbers.put(m, DAMPING.key(), d.decay().dampingRatio());
            JsonNumbers.put(m, DAMPING_SD.key(), d.decay().dampingRatioSd());
            m.add(MASS.key(), JsonNull.INSTANCE);
            m.add(MASS_SD.key(), JsonNull.INSTANCE);
            m.add(STIFFNESS.key(), JsonNull.INSTANCE);
            modes.add(m);
            o.add(MODES.key(), modes);
            JsonNumbers.put(o, LOG_DECREMENT.key(), d.decay().logDecrement());
            JsonNumbers.put(o, LOG_DECREMENT_SD.key(), d.decay().logDecrementSd());
            o.addProperty(CYCLES.key(), d.decay().cycles());
        } else if (identification instanceof Identification.Added a) {
            JsonObject m = new JsonObject();
            JsonNumbers.put(m, FREQUENCY.key(), hz(a.result().naturalFrequency()));
            m.add(FREQUENCY_SD.key(), JsonNull.INSTANCE);
            m.add(DAMPING.key(), JsonNull.INSTANCE);
            m.add(DAMPING_SD.key(), JsonNull.INSTANCE);
            JsonNumbers.put(m, MASS.key(), a.result().modalMass());
            m.add(MASS_SD.key(), JsonNull.INSTANCE);
            JsonNumbers.put(m, STIFFNESS.key(), a.result().modalStiffness());
            modes.add(m);
            o.add(MODES.key(), modes);
            JsonNumbers.put(o, ADDED_MASS.key(), a.addedMass());
            JsonNumbers.put(o, FREQUENCY_WITH_ADDED_MASS.key(), hz(a.frequencyAfter()));
        }
        return o;
    }

    private static JsonObject mode(IdentifiedMode m) {
        JsonObject o = new JsonObject();
        JsonNumbers.put(o, FREQUENCY.key(), hz(m.naturalFrequency()));
        JsonNumbers.put(o, FREQUENCY_SD.key(), hz(m.naturalFrequencySd()));
        JsonNumbers.put(o, DAMPING.key(), m.dampingRatio());
        JsonNumbers.put(o, DAMPING_SD.key(), m.dampingRatioSd());
        JsonNumbers.put(o, MASS.key(), m.modalMass());
        JsonNumbers.put(o, MASS_SD.key(), m.modalMassSd());
        JsonNumbers.put(o, STIFFNESS.key(), m.modalStiffness());
        return o;
    }

    private static double hz(double omega) {
        return Unit.HERTZ.fromSi(omega);
    }

    private static OptionalDouble hz(OptionalDouble omega) {
        return omega.isPresent() ? OptionalDouble.of(hz(omega.getAsDouble())) : omega;
    }
}
