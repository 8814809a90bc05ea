package org.counterpoise.io.project;

import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.counterpoise.core.design.RobustnessSettings;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.robust.Tolerance;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.ToleranceSet;
import org.counterpoise.core.robust.ToleranceRanges.FrequencyBasis;
import org.counterpoise.core.robust.ToleranceRanges.Range;

/**
 * The robustness section of a project as typed. Absent entries are empty (or null for a quantity
 * or tolerance).
 *
 * @param ranges the ranges the design must hold over, as typed (never null; {@link Ranges#NONE} when none)
 * @param target largest acceptable peak of the response that matters, or null
 * @param samples Monte Carlo samples (0 for the default)
 * @param seed Monte Carlo seed
 * @param structureMass tolerance of the structure's mass, or null
 * @param structureStiffness tolerance of the structure's stiffness, or null
 * @param absorberMass tolerance of the absorber's mass, or null
 * @param absorberStiffness tolerance of the absorber's spring rate, or null
 * @param absorberDamping tolerance of the absorber's damping coefficient, or null
 */
public record RobustnessInput(Ranges ranges, QuantityInput target, int samples, long seed,
        ToleranceInput structureMass, ToleranceInput structureStiffness, ToleranceInput absorberMass,
        ToleranceInput absorberStiffness, ToleranceInput absorberDamping) {

    /** A section without ranges is one with none stated. */
    public RobustnessInput {
        ranges = ranges == null ? Ranges.NONE : ranges;
    }

    /**
     * @param r the ranges as now typed
     * @return this section with them
     */
    public RobustnessInput withRanges(Ranges r) {
        return new RobustnessInput(r, target, samples, seed, structureMass, structureStiffness, absorberMass,
                absorberStiffness, absorberDamping);
    }

    /**
     * @param t another target, or null for none
     * @return this section with it
     */
    public RobustnessInput withTarget(QuantityInput t) {
        return new RobustnessInput(ranges, t, samples, seed, structureMass, structureStiffness, absorberMass,
                absorberStiffness, absorberDamping);
    }

    /** @return these settings in SI (the defaults where the section gives none) */
    public RobustnessSettings toSettings() {
        RobustnessInput r = this;
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

    /**
     * The ranges the design must hold over, as typed in the project file (percent each way), and how
     * the structure's natural frequency was found. An empty range takes its default
     * ({@code core.robust.ToleranceRanges}), which every output marks as such.
     *
     * @param structurePercent {@code robustness.structure_mistuning}, when stated
     * @param absorberPercent {@code robustness.absorber_mistuning}, when stated
     * @param dampingPercent {@code robustness.absorber_damping_range}, when stated
     * @param basis {@code robustness.structure_frequency_basis} ({@link FrequencyBasis#NOT_STATED} when absent)
     */
    public record Ranges(OptionalDouble structurePercent, OptionalDouble absorberPercent,
            OptionalDouble dampingPercent, FrequencyBasis basis) {

        /** Nothing stated. */
        public static final Ranges NONE = new Ranges(OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalDouble.empty(), FrequencyBasis.NOT_STATED);

        /** Absent numbers are empty, never null; an absent basis is not stated. */
        public Ranges {
            Objects.requireNonNull(structurePercent, "structurePercent");
            Objects.requireNonNull(absorberPercent, "absorberPercent");
            Objects.requireNonNull(dampingPercent, "dampingPercent");
            basis = basis == null ? FrequencyBasis.NOT_STATED : basis;
        }

        /**
         * @param structure structure frequency range, percent
         * @param absorber absorber frequency range, percent
         * @return the two frequency ranges stated, damping range and basis not
         */
        public static Ranges ofFrequencies(double structure, double absorber) {
            return new Ranges(OptionalDouble.of(structure), OptionalDouble.of(absorber), OptionalDouble.empty(),
                    FrequencyBasis.NOT_STATED);
        }

        /** The key of {@link #basis} in the project file's {@code robustness} object. */
        public static final String BASIS_KEY = "structure_frequency_basis";

        /**
         * @param range one of the three ranges
         * @return its key in the project file's {@code robustness} object: the one list of them
         */
        public static String key(Range range) {
            return switch (range) {
                case STRUCTURE_FREQUENCY -> "structure_mistuning";
                case ABSORBER_FREQUENCY -> "absorber_mistuning";
                case ABSORBER_DAMPING -> "absorber_damping_range";
            };
        }

        /**
         * @param range one of the three ranges
         * @return the key under which files written before the vocabulary was settled
         *     (docs/glossary.md) gave it, still read; empty when it has no older name
         */
        public static Optional<String> olderKey(Range range) {
            return switch (range) {
                case STRUCTURE_FREQUENCY -> Optional.of("structure_detuning");
                case ABSORBER_FREQUENCY -> Optional.of("absorber_detuning");
                case ABSORBER_DAMPING -> Optional.empty();
            };
        }

        /**
         * @param range one of the three ranges
         * @return the largest value a project may state, percent each way (the frequencies up to
         *     50 %, the damping up to 90 %, as {@code core.robust.ToleranceRanges} accepts)
         */
        public static double maxPercent(Range range) {
            return range == Range.ABSORBER_DAMPING ? 90 : 50;
        }

        /**
         * @param range one of the three ranges
         * @return it as typed, percent each way, when stated
         */
        public OptionalDouble percent(Range range) {
            return switch (range) {
                case STRUCTURE_FREQUENCY -> structurePercent;
                case ABSORBER_FREQUENCY -> absorberPercent;
                case ABSORBER_DAMPING -> dampingPercent;
            };
        }

        /**
         * @param range one of the three ranges
         * @param percent its new value as typed, or empty
         * @return these ranges with it
         */
        public Ranges with(Range range, OptionalDouble percent) {
            return new Ranges(range == Range.STRUCTURE_FREQUENCY ? percent : structurePercent,
                    range == Range.ABSORBER_FREQUENCY ? percent : absorberPercent,
                    range == Range.ABSORBER_DAMPING ? percent : dampingPercent, basis);
        }

        /** @return true when nothing is stated */
        public boolean isEmpty() {
            return equals(NONE);
        }
    }

    /**
     * A tolerance as typed: a distribution and either a percent or an absolute value with unit.
     *
     * @param distribution the file's token: "uniform", "normal" or "none" (see {@link #token})
     * @param percent half-width (uniform) or standard deviation (normal) in percent, or NaN
     * @param absolute the same as an absolute quantity, or null
     */
    public record ToleranceInput(String distribution, double percent, QuantityInput absolute) {

        /** The project file's token of each distribution: the one list, read and written from here. */
        private static final Map<Tolerance.Distribution, String> TOKENS = Map.of(Tolerance.Distribution.NONE,
                "none", Tolerance.Distribution.UNIFORM, "uniform", Tolerance.Distribution.NORMAL, "normal");

        /**
         * @param d a distribution
         * @return its token in project files
         */
        public static String token(Tolerance.Distribution d) {
            return TOKENS.get(d);
        }

        /** @return the distribution the token names, empty when the token is not one of {@link #tokens} */
        public Optional<Tolerance.Distribution> kind() {
            return TOKENS.entrySet().stream().filter(e -> e.getValue().equals(distribution)).map(Map.Entry::getKey)
                    .findFirst();
        }

        /** @return the tokens, for messages */
        public static String tokens() {
            return "one of uniform, normal, none";
        }
    }
}
