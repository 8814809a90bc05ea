package org.counterpoise.io.project;

import com.google.gson.JsonElement;
import com.google.gson.JsonParseException;
import com.google.gson.JsonParser;
import com.google.gson.stream.JsonReader;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Spectrum;
import org.counterpoise.core.units.SpectralDensityUnit;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;

/**
 * Reads a project file (format described in docs/project-file.md). Every problem becomes an
 * {@link InvalidInputException} naming the JSON path, the value found and what is allowed.
 */
public final class ProjectReader {
    private ProjectReader() {
    }

    /**
     * @param file the project file
     * @return the project and its unknown fields
     * @throws InvalidInputException when the file cannot be read or holds a bad value
     */
    public static LoadedProject read(Path file) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new InvalidInputException("(file)", file.toString(), "must be a readable project file ("
                    + e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage()) + ")");
        }
        return read(new StringReader(text));
    }

    /**
     * @param reader JSON text
     * @return the project and its unknown fields
     */
    public static LoadedProject read(Reader reader) {
        JsonElement root;
        try {
            JsonReader json = new JsonReader(reader);
            json.setStrictness(com.google.gson.Strictness.STRICT);
            root = JsonParser.parseReader(json);
        } catch (JsonParseException | IllegalStateException e) {
            String detail = e.getMessage() == null ? "" : e.getMessage().replaceAll("\\s*See https?://\\S+", "");
            throw new InvalidInputException("(file)", "not valid JSON", "must be a JSON object; " + detail);
        }
        List<String> unknown = JsonFields.newUnknownList();
        JsonFields top = JsonFields.root(root, unknown);
        int version = (int) top.number("format_version");
        if (version != Project.FORMAT_VERSION) {
            throw new InvalidInputException("format_version", Integer.toString(version),
                    "this version of Counterpoise reads format_version " + Project.FORMAT_VERSION);
        }
        String name = top.text("name", "Untitled");
        String notes = top.text("notes", "");
        StructureInput structure = structure(top.object("structure"));
        DisturbanceInput disturbance = disturbance(top.object("disturbance"));
        AbsorberInput absorber = absorber(top.object("absorber"));
        JsonFields robust = top.optionalObject("robustness");
        RobustnessInput robustness = robust == null ? null : robustness(robust, absorber.response());
        top.finish();
        return new LoadedProject(new Project(name, notes, structure, disturbance, absorber, robustness), unknown);
    }

    /**
     * Reads and converts in one step.
     * @param file the project file
     * @return the study
     */
    public static DesignStudy readStudy(Path file) {
        return read(file).project().toStudy();
    }

    private static RobustnessInput robustness(JsonFields r, ResponseKind response) {
        double structure = r.number("structure_detuning", Double.NaN);
        double absorber = r.number("absorber_detuning", Double.NaN);
        QuantityInput target = r.optionalQuantity("target", response.dimension());
        double samples = r.number("samples", 0);
        if (samples != Math.rint(samples) || samples < 0 || samples > 1_000_000) {
            throw new InvalidInputException(r.pathOf("samples"), Double.toString(samples),
                    "a whole number from 1 to 1000000");
        }
        double seed = r.number("seed", 1);
        if (seed != Math.rint(seed)) {
            throw new InvalidInputException(r.pathOf("seed"), Double.toString(seed), "a whole number");
        }
        JsonFields t = r.optionalObject("tolerances");
        RobustnessInput.ToleranceInput[] tol = new RobustnessInput.ToleranceInput[5];
        String[] keys = {"structure_mass", "structure_stiffness", "absorber_mass", "absorber_stiffness",
            "absorber_damping"};
        Dimension[] dims = {Dimension.MASS, Dimension.STIFFNESS, Dimension.MASS, Dimension.STIFFNESS,
            Dimension.DAMPING_COEFFICIENT};
        if (t != null) {
            for (int i = 0; i < keys.length; i++) {
                JsonFields one = t.optionalObject(keys[i]);
                if (one != null) {
                    tol[i] = new RobustnessInput.ToleranceInput(one.text("distribution"),
                            one.number("percent", Double.NaN), one.optionalQuantity("absolute", dims[i]));
                    one.finish();
                }
            }
            t.finish();
        }
        r.finish();
        return new RobustnessInput(structure, absorber, target, (int) samples, (long) seed, tol[0], tol[1], tol[2],
                tol[3], tol[4]);
    }

    private static StructureInput structure(JsonFields s) {
        QuantityInput mass = s.optionalQuantity("mass", Dimension.MASS);
        QuantityInput weight = s.optionalQuantity("weight", Dimension.FORCE);
        QuantityInput stiffness = s.optionalQuantity("stiffness", Dimension.STIFFNESS);
        QuantityInput frequency = s.optionalQuantity("natural_frequency", Dimension.FREQUENCY);
        QuantityInput deflection = s.optionalQuantity("static_deflection", Dimension.LENGTH);
        DampingInput damping = null;
        JsonFields d = s.optionalObject("damping");
        if (d != null) {
            int given = 0;
            for (DampingInput.Measure m : DampingInput.Measure.values()) {
                if (d.has(m.key())) {
                    given++;
                    damping = m == DampingInput.Measure.HALF_POWER_BANDWIDTH
                            ? new DampingInput(m, Double.NaN, d.quantity(m.key(), Dimension.FREQUENCY))
                            : new DampingInput(m, d.number(m.key()), null);
                }
            }
            if (given != 1) {
                throw new InvalidInputException("structure.damping", given + " measures",
                        "give exactly one of ratio, loss_factor, q_factor, half_power_bandwidth");
            }
            d.finish();
        }
        double phi = s.number("mode_shape_at_absorber", 1.0);
        s.finish();
        return new StructureInput(mass, weight, stiffness, frequency, deflection, damping, phi);
    }

    private static DisturbanceInput disturbance(JsonFields d) {
        String kindText = d.text("kind");
        ExcitationKind kind = Ids.parse(ExcitationKind.class, kindText).orElseThrow(() -> new InvalidInputException(
                d.pathOf("kind"), "\"" + kindText + "\"", "one of " + Ids.list(ExcitationKind.values())));
        QuantityInput amplitude = d.quantity("amplitude", kind.amplitudeDimension());
        double order = d.number("harmonic_order", 1.0);
        QuantityInput frequency = d.optionalQuantity("frequency", Dimension.FREQUENCY);
        JsonFields band = d.optionalObject("band");
        if ((frequency == null) == (band == null)) {
            throw new InvalidInputException(d.pathOf("frequency"), frequency == null ? "neither" : "both",
                    "give either disturbance.frequency or disturbance.band");
        }
        SpectrumInput spectrum = spectrum(d.optionalObject("spectrum"), kind);
        DisturbanceInput out;
        if (band != null) {
            double low = band.number("low");
            double high = band.number("high");
            Unit unit = JsonFields.unit(band, "unit", Dimension.FREQUENCY);
            band.finish();
            out = new DisturbanceInput(kind, amplitude, null, low, high, unit, order, spectrum);
        } else {
            out = new DisturbanceInput(kind, amplitude, frequency, Double.NaN, Double.NaN, null, order, spectrum);
        }
        d.finish();
        return out;
    }

    /**
     * The optional spectrum; absent (every file written before spectra existed, including those
     * with the exact-variance method) means harmonic, which is what those files meant.
     */
    private static SpectrumInput spectrum(JsonFields s, ExcitationKind kind) {
        if (s == null) {
            return null;
        }
        String text = s.text("kind");
        Spectrum.Kind k = java.util.Arrays.stream(Spectrum.Kind.values()).filter(x -> x.id().equals(text)).findFirst()
                .orElseThrow(() -> new InvalidInputException(s.pathOf("kind"), "\"" + text + "\"",
                        "one of harmonic, white-noise"));
        SpectrumInput out;
        if (k == Spectrum.Kind.WHITE_NOISE) {
            JsonFields psd = s.object("psd");
            double value = psd.number("value");
            String unitText = psd.text("unit");
            SpectralDensityUnit unit = SpectralDensityUnit.bySymbol(unitText, kind.amplitudeDimension())
                    .orElseThrow(() -> new InvalidInputException(psd.pathOf("unit"), "\"" + unitText + "\"",
                            SpectralDensityUnit.symbols(kind.amplitudeDimension()).isEmpty()
                                    ? "white noise is a force or a base acceleration"
                                    : "allowed units: " + SpectralDensityUnit.symbols(kind.amplitudeDimension())));
            psd.finish();
            out = SpectrumInput.whiteNoise(value, unit);
        } else {
            out = new SpectrumInput(k, Double.NaN, null);
        }
        s.finish();
        return out;
    }

    private static AbsorberInput absorber(JsonFields a) {
        double ratio = a.has("mass_ratio") ? a.number("mass_ratio") : Double.NaN;
        QuantityInput mass = a.optionalQuantity("mass", Dimension.MASS);
        String methodText = a.text("method", DesignMethod.EQUAL_PEAK.id());
        DesignMethod method = DesignMethod.byId(methodText).orElseThrow(() -> new InvalidInputException(
                a.pathOf("method"), "\"" + methodText + "\"", "one of " + DesignMethod.ids()));
        String responseText = a.text("response", Ids.of(ResponseKind.DISPLACEMENT));
        ResponseKind response = Ids.parse(ResponseKind.class, responseText)
                .filter(Project.DESIGN_RESPONSES::contains)
                .orElseThrow(() -> new InvalidInputException(a.pathOf("response"), "\"" + responseText + "\"",
                        "one of " + Ids.list(Project.DESIGN_RESPONSES.toArray(new ResponseKind[0]))));
        boolean hangs = a.bool("hangs_vertically", false);
        double margin = a.number("stroke_margin", DesignStudy.DEFAULT_STROKE_MARGIN);
        QuantityInput target = a.optionalQuantity("target", response.dimension());
        double maxMassRatio = a.number("max_mass_ratio", Double.NaN);
        QuantityInput strokeLimit = a.optionalQuantity("stroke_limit", Dimension.LENGTH);
        double fixedDamping = a.number("fixed_damping_ratio", Double.NaN);
        double fixedTuning = a.number("fixed_tuning_ratio", Double.NaN);
        a.finish();
        return new AbsorberInput(ratio, mass, method, response, hangs, margin, target, maxMassRatio, strokeLimit,
                fixedDamping, fixedTuning);
    }
}
