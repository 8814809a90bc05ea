package org.counterpoise.io.project;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.OptionalDouble;
import org.counterpoise.core.robust.ToleranceRanges.FrequencyBasis;
import org.counterpoise.core.robust.ToleranceRanges.Range;
import org.counterpoise.io.AtomicFiles;

/** Writes a project file in the current format, safely: a temporary file, then an atomic rename. */
public final class ProjectWriter {
    private ProjectWriter() {
    }

    /**
     * @param given the project
     * @return the JSON text
     */
    public static String toJson(Project given) {
        // a target typed before criteria existed is written as the criterion it means (format 3)
        Project project = given.withTargetAsAcceptance();
        JsonObject root = new JsonObject();
        root.addProperty("format_version", Project.FORMAT_VERSION);
        root.addProperty("name", project.name());
        if (!project.notes().isEmpty()) {
            root.addProperty("notes", project.notes());
        }
        IdentityJson.write(root, project.identity());
        JsonObject structure = project.modes() == null ? structure(project.structure()) : new JsonObject();
        if (project.modes() != null) {
            ModesJson.write(structure, project.modes());
        }
        root.add("structure", structure);
        root.add("disturbance", disturbance(project.disturbance()));
        root.add("absorber", absorber(project.absorber()));
        if (project.absorbers() != null) {
            root.add(ModesJson.ABSORBERS, ModesJson.write(project.absorbers()));
        }
        if (project.robustness() != null) {
            root.add("robustness", robustness(project.robustness()));
        }
        if (project.acceptance() != null) {
            root.add(AcceptanceJson.KEY, AcceptanceJson.write(project.acceptance()));
        }
        root.addProperty(ProjectReader.DISPLAY_CONVENTION, project.displayConvention().id());
        root.addProperty(ProjectReader.DISPLAY_UNITS, project.displayUnits().id());
        root.add(HardwareJson.KEY, HardwareJson.write(project.hardware(), project.displayUnits()));
        return new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(root) + "\n";
    }

    /**
     * Saves through a temporary file in the same folder and an atomic move, so a crash never
     * leaves a half-written project.
     * @param project the project
     * @param file where to save
     * @throws IOException when the folder cannot be written
     */
    public static void save(Project project, Path file) throws IOException {
        writeAtomically(file, toJson(project));
    }

    /**
     * @param file destination
     * @param text content
     * @throws IOException when the folder cannot be written
     */
    public static void writeAtomically(Path file, String text) throws IOException {
        AtomicFiles.write(file, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
    }

    private static JsonObject structure(StructureInput s) {
        JsonObject o = new JsonObject();
        put(o, "mass", s.mass());
        put(o, "weight", s.weight());
        put(o, "stiffness", s.stiffness());
        put(o, "natural_frequency", s.naturalFrequency());
        put(o, "static_deflection", s.staticDeflection());
        if (s.damping() != null) {
            o.add("damping", damping(s.damping()));
        }
        o.addProperty("mode_shape_at_absorber", s.modeShapeAtAbsorber());
        if (s.measured() != null) {
            o.add(MeasuredSource.KEY, measured(s.measured()));
        }
        return o;
    }

    /**
     * @param damping a damping in its measure
     * @return its {@code damping} object
     */
    static JsonObject damping(DampingInput damping) {
        JsonObject d = new JsonObject();
        if (damping.measure() == DampingInput.Measure.HALF_POWER_BANDWIDTH) {
            d.add(damping.measure().key(), quantity(damping.bandwidth()));
        } else {
            d.addProperty(damping.measure().key(), damping.value());
        }
        return d;
    }

    private static JsonObject measured(MeasuredSource m) {
        JsonObject o = new JsonObject();
        o.addProperty("method", m.method());
        if (!m.file().isEmpty()) {
            o.addProperty("file", m.file());
        }
        if (!m.date().isEmpty()) {
            o.addProperty("date", m.date());
        }
        putNumber(o, MeasuredSource.RESIDUAL, m.normalisedResidual());
        m.naturalFrequencySd().ifPresent(sd -> o.addProperty(MeasuredSource.FREQUENCY_SD_HZ, sd / (2.0 * Math.PI)));
        putNumber(o, MeasuredSource.DAMPING_SD, m.dampingRatioSd());
        putNumber(o, MeasuredSource.MASS_SD_KG, m.modalMassSd());
        return o;
    }

    private static JsonObject disturbance(DisturbanceInput d) {
        JsonObject o = new JsonObject();
        o.addProperty("kind", Ids.of(d.kind()));
        OrdersJson.writeAmplitude(o, OrderInput.ofDisturbance(d));
        if (d.isBand()) {
            JsonObject band = new JsonObject();
            band.addProperty("low", d.bandLow());
            band.addProperty("high", d.bandHigh());
            band.addProperty("unit", d.bandUnit().symbol());
            o.add("band", band);
        } else {
            o.add("frequency", quantity(d.frequency()));
        }
        o.addProperty("harmonic_order", d.harmonicOrder());
        if (d.runUpRate() != null) {
            o.add("run_up_rate", quantity(d.runUpRate()));
        }
        if (d.spectrum() != null) {
            JsonObject spectrum = new JsonObject();
            spectrum.addProperty("kind", Ids.of(d.spectrum().kind()));
            if (d.spectrum().psdUnit() != null) {
                JsonObject psd = new JsonObject();
                psd.addProperty("value", d.spectrum().psdValue());
                psd.addProperty("unit", d.spectrum().psdUnit().symbol());
                spectrum.add("psd", psd);
            }
            o.add("spectrum", spectrum);
        }
        OrdersJson.writeOrders(o, d);
        return o;
    }

    private static JsonObject absorber(AbsorberInput a) {
        JsonObject o = new JsonObject();
        putNumber(o, "mass_ratio", a.massRatio());
        put(o, "mass", a.mass());
        o.addProperty("method", a.method().id());
        o.addProperty("response", Ids.of(a.response()));
        o.addProperty("hangs_vertically", a.hangsVertically());
        o.addProperty("stroke_margin", a.strokeMargin());
        if (a.meetAcceptance()) {
            o.addProperty(ProjectReader.MEET_ACCEPTANCE, true);
        }
        putNumber(o, "max_mass_ratio", a.maxMassRatio());
        put(o, "stroke_limit", a.strokeLimit());
        putNumber(o, "fixed_damping_ratio", a.fixedDampingRatio());
        putNumber(o, "fixed_tuning_ratio", a.fixedTuningRatio());
        return o;
    }

    private static JsonObject robustness(RobustnessInput r) {
        JsonObject o = new JsonObject();
        for (Range range : Range.values()) {
            putNumber(o, RobustnessInput.Ranges.key(range), r.ranges().percent(range));
        }
        if (r.ranges().basis() != FrequencyBasis.NOT_STATED) {
            o.addProperty(RobustnessInput.Ranges.BASIS_KEY, Ids.of(r.ranges().basis()));
        }
        put(o, "target", r.target());
        if (r.samples() > 0) {
            o.addProperty("samples", r.samples());
        }
        o.addProperty("seed", r.seed());
        JsonObject t = new JsonObject();
        for (ToleranceKey k : ToleranceKey.values()) {
            RobustnessInput.ToleranceInput value = k.of(r);
            if (value != null) {
                JsonObject one = new JsonObject();
                one.addProperty("distribution", value.distribution());
                putNumber(one, "percent", value.percent());
                put(one, "absolute", value.absolute());
                t.add(k.key(), one);
            }
        }
        if (!t.isEmpty()) {
            o.add("tolerances", t);
        }
        return o;
    }

    private static void putNumber(JsonObject o, String key, double v) {
        // a tolerance's percent, NaN when it is given as an absolute amount
        if (!Double.isNaN(v)) {
            o.addProperty(key, v);
        }
    }

    private static void putNumber(JsonObject o, String key, OptionalDouble v) {
        v.ifPresent(x -> o.addProperty(key, x));
    }

    private static void put(JsonObject o, String key, QuantityInput q) {
        if (q != null) {
            o.add(key, quantity(q));
        }
    }

    static JsonObject quantity(QuantityInput q) {
        JsonObject o = new JsonObject();
        o.addProperty("value", q.value());
        o.addProperty("unit", q.unit().symbol());
        return o;
    }
}
