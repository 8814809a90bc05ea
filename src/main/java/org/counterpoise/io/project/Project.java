package org.counterpoise.io.project;

import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignConstraints;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.RobustnessSettings;
import org.counterpoise.core.robust.Tolerance;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.ToleranceRanges.Range;
import org.counterpoise.core.robust.ToleranceSet;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.DampingConversions;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Spectrum;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.StructureConversions;
import org.counterpoise.core.response.ResponseKind;

/**
 * A project as the user entered it (units and measures kept as typed), and its conversion to the
 * core's SI {@link DesignStudy}. Problems are reported against the project-file field names.
 *
 * @param name project name
 * @param notes free text
 * @param structure the structure as known
 * @param disturbance the disturbance
 * @param absorber the designer's choices
 * @param robustness expected mistuning, target and tolerances, or null for the defaults
 * @param identity revision, engineer, client or site and date (never null; empty when not given)
 */
public record Project(String name, String notes, StructureInput structure, DisturbanceInput disturbance,
        AbsorberInput absorber, RobustnessInput robustness, ProjectIdentity identity) {

    /** The name of a project that has not been named yet. */
    public static final String UNTITLED = "Untitled";

    /** Absent name, notes and identity get their empty values. */
    public Project {
        name = name == null || name.isBlank() ? UNTITLED : name;
        notes = notes == null ? "" : notes;
        identity = identity == null ? ProjectIdentity.EMPTY : identity;
    }

    /**
     * A project without identity details (revision, engineer, client, date).
     * @param name project name
     * @param notes free text
     * @param structure the structure as known
     * @param disturbance the disturbance
     * @param absorber the designer's choices
     * @param robustness robustness settings, or null for the defaults
     */
    public Project(String name, String notes, StructureInput structure, DisturbanceInput disturbance,
            AbsorberInput absorber, RobustnessInput robustness) {
        this(name, notes, structure, disturbance, absorber, robustness, ProjectIdentity.EMPTY);
    }

    /**
     * The project-file format version this build writes. Version 2 (issue 12) changed the meaning of
     * an absent {@code absorber.method}: recommended ({@link DesignMethod#RECOMMENDED}) instead of
     * equal-peak; version-1 files are read as they always meant ({@link #defaultMethod}).
     */
    public static final int FORMAT_VERSION = 2;

    /** The oldest project-file format version this build reads (and migrates on load). */
    public static final int OLDEST_FORMAT_VERSION = 1;

    /**
     * @param formatVersion the file's format version ({@link #OLDEST_FORMAT_VERSION} to {@link #FORMAT_VERSION})
     * @return the method a file of that version means when it gives no {@code absorber.method}
     */
    public static DesignMethod defaultMethod(int formatVersion) {
        return formatVersion < 2 ? DesignMethod.EQUAL_PEAK : DesignMethod.RECOMMENDED;
    }

    /** Response kinds a design may reduce (those of the structure). */
    public static final List<ResponseKind> DESIGN_RESPONSES = List.of(ResponseKind.DISPLACEMENT,
            ResponseKind.VELOCITY, ResponseKind.ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT,
            ResponseKind.TRANSMITTED_FORCE);

    /** @return the structure in SI */
    public Structure toStructure() {
        StructureInput s = structure;
        if (s.mass() != null && s.weight() != null) {
            throw new InvalidInputException("structure.weight", "given with structure.mass",
                    "give either structure.mass or structure.weight, not both");
        }
        // No mixed double/null conditional here: unboxing its null result was a NullPointerException
        // for the documented form "stiffness and natural frequency without a mass".
        boolean massGiven = s.mass() != null || s.weight() != null;
        double mass = s.mass() != null ? s.mass().positiveSi("structure.mass.value")
                : s.weight() != null ? StructureConversions.massFromWeight(s.weight().si("structure.weight.value")) : Double.NaN;
        int stiffnessForms = count(s.stiffness(), s.naturalFrequency(), s.staticDeflection());
        double stiffness;
        if (!massGiven) {
            if (s.staticDeflection() != null) {
                throw new InvalidInputException("structure.static_deflection", "given without a mass",
                        "a static deflection needs structure.mass or structure.weight beside it");
            }
            if (s.stiffness() == null || s.naturalFrequency() == null) {
                throw InvalidInputException.missing("structure.mass",
                        "give structure.mass or structure.weight, or both structure.stiffness and"
                                + " structure.natural_frequency");
            }
            stiffness = s.stiffness().positiveSi("structure.stiffness.value");
            mass = StructureConversions.massFromFrequency(stiffness,
                    s.naturalFrequency().positiveSi("structure.natural_frequency.value"));
        } else if (stiffnessForms != 1) {
            throw new InvalidInputException("structure", stiffnessForms + " stiffness entries",
                    "with a mass or weight give exactly one of structure.stiffness, structure.natural_frequency"
                            + " and structure.static_deflection");
        } else if (s.stiffness() != null) {
            stiffness = s.stiffness().positiveSi("structure.stiffness.value");
        } else if (s.naturalFrequency() != null) {
            stiffness = StructureConversions.stiffnessFromFrequency(mass,
                    s.naturalFrequency().positiveSi("structure.natural_frequency.value"));
        } else {
            stiffness = StructureConversions.stiffnessFromStaticDeflection(mass,
                    s.staticDeflection().positiveSi("structure.static_deflection.value"));
        }
        double zeta = dampingRatio(s.damping(), Math.sqrt(stiffness / mass));
        return new Structure(mass, stiffness, zeta, s.modeShapeAtAbsorber());
    }

    private static double dampingRatio(DampingInput d, double omega) {
        if (d == null) {
            return 0.0;
        }
        return switch (d.measure()) {
            case RATIO -> Checks.inRange("structure.damping.ratio", d.value(), 0.0, 0.99);
            case LOSS_FACTOR -> DampingConversions.fromLossFactor(d.value());
            case Q_FACTOR -> DampingConversions.fromQualityFactor(d.value());
            case HALF_POWER_BANDWIDTH -> DampingConversions.fromHalfPowerBandwidth(
                    d.bandwidth().si("structure.damping.half_power_bandwidth.value"), omega);
        };
    }

    /** @return the excitation in SI */
    public Excitation toExcitation() {
        DisturbanceInput d = disturbance;
        double order = Checks.positive("disturbance.harmonic_order", d.harmonicOrder());
        FrequencyBand band;
        if (d.isBand()) {
            Checks.positive("disturbance.band.low", d.bandLow());
            Checks.positive("disturbance.band.high", d.bandHigh());
            if (d.bandHigh() < d.bandLow()) {
                throw new InvalidInputException("disturbance.band.high", Checks.show(d.bandHigh()),
                        "must not be below disturbance.band.low (" + Checks.show(d.bandLow()) + ")");
            }
            band = FrequencyBand.ofRotor(d.bandUnit().toSi(d.bandLow()), d.bandUnit().toSi(d.bandHigh()), order);
        } else {
            double w = d.frequency().positiveSi("disturbance.frequency.value");
            band = FrequencyBand.ofRotor(w, w, order);
        }
        Spectrum spectrum = Spectrum.HARMONIC;
        if (d.spectrum() != null && d.spectrum().kind() == Spectrum.Kind.WHITE_NOISE) {
            spectrum = Spectrum.whiteNoise(Checks.positive("disturbance.spectrum.psd.value",
                    d.spectrum().psdUnit().toSi(d.spectrum().psdValue())));
        }
        Excitation e = new Excitation(d.kind(), d.amplitude().positiveSi("disturbance.amplitude.value"), band,
                spectrum);
        // the core's rate is the forcing frequency's (the shaft's times the harmonic order)
        OptionalDouble shaftRate = runUpRate();
        return shaftRate.isPresent() ? e.withRunUpRate(shaftRate.getAsDouble() * order) : e;
    }

    /**
     * @return the shaft's angular acceleration at start and stop, rad/s^2, when the file states
     *     {@code disturbance.run_up_rate}
     */
    public OptionalDouble runUpRate() {
        QuantityInput rate = disturbance.runUpRate();
        return rate == null ? OptionalDouble.empty()
                : OptionalDouble.of(rate.positiveSi("disturbance.run_up_rate.value"));
    }

    /** @return the study the core designs */
    public DesignStudy toStudy() {
        AbsorberInput a = absorber;
        Structure s = toStructure();
        AbsorberSizing sizing;
        int sizes = (a.massRatio().isPresent() ? 1 : 0) + (a.mass() == null ? 0 : 1) + (a.target() == null ? 0 : 1);
        if (sizes > 1) {
            throw new InvalidInputException("absorber", sizes + " sizes given",
                    "give one of absorber.mass_ratio, absorber.mass and absorber.target");
        } else if (a.target() != null) {
            sizing = AbsorberSizing.ofTarget(a.target().positiveSi("absorber.target.value"),
                    a.maxMassRatio().orElse(AbsorberSizing.DEFAULT_MAX_MASS_RATIO));
        } else if (a.massRatio().isPresent()) {
            sizing = AbsorberSizing.ofMassRatio(a.massRatio().getAsDouble());
        } else if (a.mass() != null) {
            sizing = AbsorberSizing.ofMass(a.mass().positiveSi("absorber.mass.value"));
        } else {
            throw InvalidInputException.missing("absorber.mass_ratio",
                    "give absorber.mass_ratio, absorber.mass or absorber.target");
        }
        DesignConstraints constraints = new DesignConstraints(
                a.strokeLimit() == null ? OptionalDouble.empty()
                        : OptionalDouble.of(a.strokeLimit().positiveSi("absorber.stroke_limit.value")),
                a.fixedDampingRatio(), a.fixedTuningRatio());
        return new DesignStudy(name, s, toExcitation(), a.response(), sizing, a.method(), a.hangsVertically(),
                a.strokeMargin(), constraints, toRobustness());
    }

    /** @return the robustness settings in SI (the defaults where the project gives none) */
    public RobustnessSettings toRobustness() {
        RobustnessInput r = robustness;
        if (r == null) {
            return RobustnessSettings.DEFAULT;
        }
        RobustnessSettings d = RobustnessSettings.DEFAULT;
        RobustnessInput.Ranges given = r.ranges();
        ToleranceRanges ranges = ToleranceRanges.of(percentRange(given, Range.STRUCTURE_FREQUENCY),
                percentRange(given, Range.ABSORBER_FREQUENCY), percentRange(given, Range.ABSORBER_DAMPING),
                given.basis());
        OptionalDouble target = r.target() == null ? OptionalDouble.empty()
                : OptionalDouble.of(r.target().positiveSi("robustness.target.value"));
        ToleranceSet set = new ToleranceSet(tolerance(ToleranceKey.STRUCTURE_MASS, r),
                tolerance(ToleranceKey.STRUCTURE_STIFFNESS, r), tolerance(ToleranceKey.ABSORBER_MASS, r),
                tolerance(ToleranceKey.ABSORBER_STIFFNESS, r), tolerance(ToleranceKey.ABSORBER_DAMPING, r));
        return new RobustnessSettings(ranges, target, set,
                r.samples() == 0 ? d.samples() : r.samples(), r.seed());
    }

    /** A range in percent as stated, checked, as a fraction; empty when not stated. */
    private static OptionalDouble percentRange(RobustnessInput.Ranges given, Range range) {
        OptionalDouble percent = given.percent(range);
        if (percent.isEmpty()) {
            return percent;
        }
        double p = percent.getAsDouble();
        double max = RobustnessInput.Ranges.maxPercent(range);
        if (!(p >= 0 && p <= max)) {
            throw new InvalidInputException("robustness." + RobustnessInput.Ranges.key(range), Checks.show(p),
                    "percent each way, from 0 to " + Checks.show(max));
        }
        return OptionalDouble.of(p / 100);
    }

    private static Tolerance tolerance(ToleranceKey key, RobustnessInput r) {
        String field = key.path();
        RobustnessInput.ToleranceInput t = key.of(r);
        if (t == null) {
            return Tolerance.NONE;
        }
        Tolerance.Distribution kind = t.kind().orElseThrow(() -> new InvalidInputException(
                field + ".distribution", "\"" + t.distribution() + "\"", RobustnessInput.ToleranceInput.tokens()));
        if (!Double.isNaN(t.percent()) == (t.absolute() != null)) {
            throw new InvalidInputException(field, "percent and absolute", "give either percent or absolute");
        }
        if (t.absolute() != null) {
            return new Tolerance(kind, Checks.nonNegative(field + ".absolute.value", t.absolute().si(field + ".absolute.value")), false);
        }
        return new Tolerance(kind, Checks.inRange(field + ".percent", t.percent(), 0, 90) / 100, true);
    }

    private static int count(Object... entries) {
        int n = 0;
        for (Object e : entries) {
            if (e != null) {
                n++;
            }
        }
        return n;
    }
}
