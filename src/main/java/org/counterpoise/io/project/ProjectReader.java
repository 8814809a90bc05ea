package org.counterpoise.io.project;

import com.google.gson.JsonElement;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Spectrum;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.robust.ToleranceRanges.FrequencyBasis;
import org.counterpoise.core.robust.ToleranceRanges.Range;
import org.counterpoise.core.units.SpectralDensityUnit;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.PhysicalRange;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainMessages;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.TextFiles;
import org.counterpoise.io.text.UnitSystem;

/**
 * Reads a project file (format described in docs/project-file.md). Every problem becomes an
 * {@link InvalidInputException} naming the JSON path, the value found and what is allowed.
 */
public final class ProjectReader {
    /**
     * The largest project file read: 1 MiB. The shipped projects are 1 to 2 kB and a project with
     * every field and a page of notes stays under 20 kB, so the cap leaves fifty times that, while
     * a file of many megabytes (a wrong file chosen, /dev/zero, a log) is refused before it is read.
     */
    public static final long MAX_BYTES = 1L << 20;

    private ProjectReader() {
    }

    /**
     * @param file the project file
     * @return the project and its unknown fields
     * @throws InvalidInputException when the file cannot be read or holds a bad value
     */
    public static LoadedProject read(Path file) {
        String text = TextFiles.readUtf8(file, file.toString(), MAX_BYTES, "project file (.json)");
        return read(file.toString(), text);
    }

    /**
     * @param reader JSON text (at most {@link #MAX_BYTES} characters are read)
     * @return the project and its unknown fields
     */
    public static LoadedProject read(Reader reader) {
        char[] buffer = new char[(int) MAX_BYTES + 1];
        int n = 0;
        try {
            for (int got; n < buffer.length && (got = reader.read(buffer, n, buffer.length - n)) > 0;) {
                n += got;
            }
        } catch (IOException e) {
            throw PlainMessages.unreadable("(project)", e);
        }
        if (n > MAX_BYTES) {
            throw InvalidInputException.unusable("(project)", "is larger than " + TextFiles.size(MAX_BYTES),
                    "a project file is a few kB");
        }
        return read("(project)", new String(buffer, 0, n));
    }

    private static LoadedProject read(String fileName, String text) {
        JsonElement root = StrictJson.parse(fileName, text);
        List<String> unknown = JsonFields.newUnknownList();
        JsonFields top = JsonFields.root(root, unknown, fileName);
        int version = formatVersion(top);
        String name = top.text("name", "Untitled");
        String notes = top.text("notes", "");
        ProjectIdentity identity = IdentityJson.read(top);
        JsonFields structureFields = top.object("structure");
        ModesInput modes = ModesJson.read(structureFields);
        StructureInput structure = modes == null ? structure(structureFields)
                : StructureInput.GIVEN_AS_MODES;
        DisturbanceInput disturbance = disturbance(top.object("disturbance"));
        AbsorberInput absorber = absorber(top.object("absorber"), version);
        JsonFields robust = top.optionalObject("robustness");
        RobustnessInput robustness = robust == null ? null : robustness(robust, absorber.response());
        JsonFields criterion = top.optionalObject(AcceptanceJson.KEY);
        AcceptanceInput acceptance = criterion == null ? null : AcceptanceJson.read(criterion);
        String conventionText = top.text(DISPLAY_CONVENTION, Project.DEFAULT_DISPLAY_CONVENTION.id());
        AmplitudeConvention convention = AmplitudeConvention.byId(conventionText).orElseThrow(() ->
                new InvalidInputException(DISPLAY_CONVENTION, "\"" + PlainText.quote(conventionText) + "\"",
                        "one of " + String.join(", ", AmplitudeConvention.ids())));
        HardwareChoice hardware = HardwareJson.read(top.optionalObject(HardwareJson.KEY));
        AbsorbersInput absorbers = ModesJson.readAbsorbers(top.optionalObject(ModesJson.ABSORBERS));
        UnitSystem units = top.has(DISPLAY_UNITS) ? AcceptanceJson.choice(top, DISPLAY_UNITS, UnitSystem.values(),
                UnitSystem::id) : UnitSystem.SI;
        top.finish();
        if (acceptance != null && absorber.target() != null) {
            throw new InvalidInputException("absorber.target", "given with acceptance",
                    "format 3 names the limit once: in acceptance, with absorber.meet_acceptance true");
        }
        // a target of a format-1 or 2 file becomes the criterion it means (the one migration rule)
        return new LoadedProject(new Project(name, notes, structure, disturbance, absorber, robustness,
                identity, acceptance, convention, hardware, units, modes, absorbers).withTargetAsAcceptance(), unknown);
    }

    /** The top-level key of {@link Project#displayUnits()} (since format 4). */
    static final String DISPLAY_UNITS = "display_units";

    /** The top-level key of {@link Project#displayConvention()}. */
    static final String DISPLAY_CONVENTION = "display_convention";

    /**
     * Reads and converts in one step.
     * @param file the project file
     * @return the study
     */
    public static DesignStudy readStudy(Path file) {
        return read(file).project().toStudy();
    }

    /**
     * The file's format version: {@link Project#OLDEST_FORMAT_VERSION} to {@link Project#FORMAT_VERSION}.
     * An older version is migrated while it is read (where a version changed the meaning of an
     * absent field, the reader asks {@link Project#defaultMethod}); a newer one is refused, since
     * this build cannot know what its fields mean.
     */
    private static int formatVersion(JsonFields top) {
        double v = top.number("format_version");
        String reads = "this version of Counterpoise reads format_version " + Project.OLDEST_FORMAT_VERSION
                + " to " + Project.FORMAT_VERSION;
        if (v != Math.rint(v) || v < Project.OLDEST_FORMAT_VERSION) {
            throw new InvalidInputException("format_version", top.shown("format_version"), "a whole number; " + reads);
        }
        if (v > Project.FORMAT_VERSION) {
            throw new InvalidInputException("format_version", top.shown("format_version"),
                    "this file was written by a newer Counterpoise; " + reads);
        }
        return (int) v;
    }

    private static RobustnessInput robustness(JsonFields r, ResponseKind response) {
        OptionalDouble[] ranges = new OptionalDouble[Range.values().length];
        for (Range range : Range.values()) {
            ranges[range.ordinal()] = rangePercent(r, range);
        }
        String basisText = r.text(RobustnessInput.Ranges.BASIS_KEY, Ids.of(FrequencyBasis.NOT_STATED));
        FrequencyBasis basis = Ids.parse(FrequencyBasis.class, basisText).orElseThrow(() -> new InvalidInputException(
                r.pathOf(RobustnessInput.Ranges.BASIS_KEY), "\"" + PlainText.quote(basisText) + "\"",
                "one of " + Ids.list(FrequencyBasis.values())));
        QuantityInput target = r.optionalQuantity("target", response.dimension());
        double samples = r.number("samples", 0);
        if (samples != Math.rint(samples) || samples < 0 || samples > 1_000_000) {
            throw new InvalidInputException(r.pathOf("samples"), r.shown("samples"),
                    "a whole number from 1 to 1000000");
        }
        double seed = r.number("seed", 1);
        if (seed != Math.rint(seed) || Math.abs(seed) > 1e15) {
            throw new InvalidInputException(r.pathOf("seed"), r.shown("seed"),
                    "a whole number from -10^15 to 10^15");
        }
        JsonFields t = r.optionalObject("tolerances");
        RobustnessInput.ToleranceInput[] tol = new RobustnessInput.ToleranceInput[ToleranceKey.values().length];
        if (t != null) {
            for (ToleranceKey k : ToleranceKey.values()) {
                JsonFields one = t.optionalObject(k.key());
                if (one != null) {
                    tol[k.ordinal()] = new RobustnessInput.ToleranceInput(one.text("distribution"),
                            one.number("percent", Double.NaN), one.optionalQuantity("absolute", k.dimension()));
                    one.finish();
                }
            }
            t.finish();
        }
        r.finish();
        return new RobustnessInput(new RobustnessInput.Ranges(ranges[Range.STRUCTURE_FREQUENCY.ordinal()],
                ranges[Range.ABSORBER_FREQUENCY.ordinal()], ranges[Range.ABSORBER_DAMPING.ordinal()], basis), target,
                (int) samples, (long) seed, tol[0], tol[1], tol[2],
                tol[3], tol[4]);
    }

    /**
     * A range in percent, empty when absent. Files written before the vocabulary was settled
     * (docs/glossary.md) call the frequency ranges {@code *_detuning}; that older key is still read
     * as the new one (and written back under the new one), and a file may not give both.
     */
    private static OptionalDouble rangePercent(JsonFields r, Range range) {
        String key = RobustnessInput.Ranges.key(range);
        String olderKey = RobustnessInput.Ranges.olderKey(range).orElse(key);
        if (!olderKey.equals(key) && r.has(key) && r.has(olderKey)) {
            throw new InvalidInputException(r.pathOf(olderKey), r.shown(olderKey),
                    "give only " + r.pathOf(key) + " (" + olderKey + " is its older name)");
        }
        String given = r.has(olderKey) ? olderKey : key;
        return r.has(given) ? OptionalDouble.of(r.number(given)) : OptionalDouble.empty();
    }

    private static StructureInput structure(JsonFields s) {
        QuantityInput mass = s.optionalQuantity("mass", Dimension.MASS);
        QuantityInput weight = s.optionalQuantity("weight", Dimension.FORCE);
        QuantityInput stiffness = s.optionalQuantity("stiffness", Dimension.STIFFNESS);
        QuantityInput frequency = s.optionalQuantity("natural_frequency", Dimension.FREQUENCY);
        QuantityInput deflection = s.optionalQuantity("static_deflection", Dimension.LENGTH);
        DampingInput damping = ModesJson.damping(s);
        double phi = s.number("mode_shape_at_absorber", 1.0);
        JsonFields m = s.optionalObject(MeasuredSource.KEY);
        MeasuredSource measured = m == null ? null : MeasuredSource.read(m);
        s.finish();
        return new StructureInput(mass, weight, stiffness, frequency, deflection, damping, phi, measured);
    }

    private static DisturbanceInput disturbance(JsonFields d) {
        String kindText = d.text("kind");
        ExcitationKind kind = Ids.parse(ExcitationKind.class, kindText).orElseThrow(() -> new InvalidInputException(
                d.pathOf("kind"), "\"" + PlainText.quote(kindText) + "\"", "one of " + Ids.list(ExcitationKind.values())));
        double order = PhysicalRange.HARMONIC_ORDER.check(d.pathOf("harmonic_order"), d.number("harmonic_order", 1.0),
                null);
        OrderInput own = OrdersJson.amplitudeOf(d, kind, order);
        QuantityInput amplitude = own.amplitude();
        QuantityInput runUpRate = d.optionalQuantity("run_up_rate", Dimension.ANGULAR_ACCELERATION);
        QuantityInput frequency = d.optionalQuantity("frequency", Dimension.FREQUENCY);
        JsonFields band = d.optionalObject("band");
        if ((frequency == null) == (band == null)) {
            throw new InvalidInputException(d.pathOf("frequency"),
                    frequency == null ? "neither frequency nor band given" : "both frequency and band given",
                    "give either disturbance.frequency or disturbance.band");
        }
        SpectrumInput spectrum = spectrum(d.optionalObject("spectrum"), kind);
        DisturbanceInput out;
        if (band != null) {
            double low = band.number("low");
            double high = band.number("high");
            Unit unit = JsonFields.unit(band, "unit", Dimension.FREQUENCY);
            PhysicalRange.FREQUENCY.check(band.pathOf("low"), low, unit);
            PhysicalRange.FREQUENCY.check(band.pathOf("high"), high, unit);
            band.finish();
            out = new DisturbanceInput(kind, amplitude, null, low, high, unit, order, null, spectrum);
        } else {
            out = new DisturbanceInput(kind, amplitude, frequency, Double.NaN, Double.NaN, null, order, null, spectrum);
        }
        List<OrderInput> orders = OrdersJson.orders(d);
        OptionalDouble designOrder = OrdersJson.designOrder(d);
        d.finish();
        return out.withRunUpRate(runUpRate).withBalanceGrade(own.balanceGrade()).withOrders(orders, designOrder);
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
        Spectrum.Kind k = Ids.parse(Spectrum.Kind.class, text).orElseThrow(() -> new InvalidInputException(
                s.pathOf("kind"), "\"" + PlainText.quote(text) + "\"", "one of " + Ids.list(Spectrum.Kind.values())));
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

    /** A number the file may leave out: empty when absent. */
    private static OptionalDouble optionalNumber(JsonFields o, String key) {
        return o.has(key) ? OptionalDouble.of(o.number(key)) : OptionalDouble.empty();
    }

    /**
     * @param a the absorber object
     * @param version the file's format version: an absent method means what that version said
     *     ({@link FormatMigration#defaultMethod})
     */
    private static AbsorberInput absorber(JsonFields a, int version) {
        OptionalDouble ratio = a.has("mass_ratio") ? OptionalDouble.of(
                PhysicalRange.MASS_RATIO.check(a.pathOf("mass_ratio"), a.number("mass_ratio"), null))
                : OptionalDouble.empty();
        QuantityInput mass = a.optionalQuantity("mass", Dimension.MASS);
        String methodText = a.text("method", FormatMigration.defaultMethod(version).id());
        DesignMethod method = DesignMethod.byId(methodText).orElseThrow(() -> new InvalidInputException(
                a.pathOf("method"), "\"" + PlainText.quote(methodText) + "\"", "one of " + DesignMethod.ids()));
        String responseText = a.text("response", Ids.of(ResponseKind.DISPLACEMENT));
        ResponseKind response = Ids.parse(ResponseKind.class, responseText)
                .filter(Project.DESIGN_RESPONSES::contains)
                .orElseThrow(() -> new InvalidInputException(a.pathOf("response"), "\"" + PlainText.quote(responseText) + "\"",
                        "one of " + Ids.list(Project.DESIGN_RESPONSES.toArray(new ResponseKind[0]))));
        boolean hangs = a.bool("hangs_vertically", false);
        double margin = a.number("stroke_margin", DesignStudy.DEFAULT_STROKE_MARGIN);
        if (version >= 3 && a.has("target")) {
            throw new InvalidInputException(a.pathOf("target"), a.shown("target"), "format 3 states the limit as"
                    + " the acceptance criterion: {\"criterion\": \"user-limit\", \"quantity\": \""
                    + Ids.of(response) + "\", \"convention\": \"peak\", \"limit\": {...}} with absorber."
                    + MEET_ACCEPTANCE + " true (format 1 and 2 files with a target are read so)");
        }
        QuantityInput target = a.optionalQuantity("target", response.dimension());
        boolean meet = a.bool(MEET_ACCEPTANCE, false);
        OptionalDouble maxMassRatio = optionalNumber(a, "max_mass_ratio");
        QuantityInput strokeLimit = a.optionalQuantity("stroke_limit", Dimension.LENGTH);
        OptionalDouble fixedDamping = optionalNumber(a, "fixed_damping_ratio");
        OptionalDouble fixedTuning = optionalNumber(a, "fixed_tuning_ratio");
        a.finish();
        return new AbsorberInput(ratio, mass, method, response, hangs, margin, target, maxMassRatio, strokeLimit,
                fixedDamping, fixedTuning, meet);
    }

    /** The key of {@link AbsorberInput#meetAcceptance()} in the {@code absorber} object. */
    static final String MEET_ACCEPTANCE = "meet_acceptance";
}
