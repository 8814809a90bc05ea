package org.counterpoise.core.robust;

import java.util.EnumSet;
import java.util.OptionalDouble;
import java.util.Set;
import org.counterpoise.core.error.Checks;

/**
 * The ranges a design must hold over: how far the structure's natural frequency, the absorber's
 * natural frequency and the absorber's damping may be from nominal, each as a +/- fraction. A range
 * the project does not state takes a default; which ones did is kept, so every output can mark the
 * defaults as common practice.
 *
 * @param structure the structure's natural frequency may be off by +/- this fraction (0 to 0.5)
 * @param absorber the absorber's natural frequency may be off by +/- this fraction (0 to 0.5)
 * @param damping the absorber's damping coefficient may be off by +/- this fraction (0 to 0.9)
 * @param structureBasis how the structure's natural frequency was found
 * @param defaulted the ranges that were not stated and took their default
 */
public record ToleranceRanges(double structure, double absorber, double damping, FrequencyBasis structureBasis,
        Set<Range> defaulted) {

    /**
     * Default structure range when none is stated: +/- 5 %. Common practice, no published source (a
     * structure's frequency is rarely known better than a few percent).
     */
    public static final double DEFAULT_STRUCTURE = 0.05;
    /** Default absorber frequency range: +/- 3 % (spring rate and mass tolerance). Common practice, no source. */
    public static final double DEFAULT_ABSORBER = 0.03;
    /** Default absorber damping range: +/- 20 % (dampers and elastomers). Common practice, no source. */
    public static final double DEFAULT_DAMPING = 0.20;

    /** The three ranges. */
    public enum Range {
        /** The structure's natural frequency. */
        STRUCTURE_FREQUENCY,
        /** The absorber's natural frequency. */
        ABSORBER_FREQUENCY,
        /** The absorber's damping coefficient. */
        ABSORBER_DAMPING
    }

    /** How the structure's natural frequency was found (shown beside its range). */
    public enum FrequencyBasis {
        /** Not said. */
        NOT_STATED,
        /** Estimated (hand calculation, experience). */
        ESTIMATED,
        /** Calculated (a finite-element or other model). */
        CALCULATED,
        /** Measured on the structure. */
        MEASURED
    }

    /** Nothing stated: every range at its default. */
    public static final ToleranceRanges DEFAULT = of(OptionalDouble.empty(), OptionalDouble.empty(),
            OptionalDouble.empty(), FrequencyBasis.NOT_STATED);

    /** Validates the record; copies the set. */
    public ToleranceRanges {
        Checks.inRange("robustness.structure_mistuning", structure, 0.0, 0.5);
        Checks.inRange("robustness.absorber_mistuning", absorber, 0.0, 0.5);
        Checks.inRange("robustness.absorber_damping_range", damping, 0.0, 0.9);
        Checks.present("robustness.structure_frequency_basis", structureBasis,
                "not-stated, estimated, calculated or measured");
        defaulted = defaulted.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(defaulted));
    }

    /**
     * Ranges as stated, each empty one at its default.
     *
     * @param structure the structure frequency range, fraction, when stated
     * @param absorber the absorber frequency range, fraction, when stated
     * @param damping the absorber damping range, fraction, when stated
     * @param basis how the structure's frequency was found
     * @return the ranges
     */
    public static ToleranceRanges of(OptionalDouble structure, OptionalDouble absorber, OptionalDouble damping,
            FrequencyBasis basis) {
        Set<Range> defaulted = EnumSet.noneOf(Range.class);
        if (structure.isEmpty()) {
            defaulted.add(Range.STRUCTURE_FREQUENCY);
        }
        if (absorber.isEmpty()) {
            defaulted.add(Range.ABSORBER_FREQUENCY);
        }
        if (damping.isEmpty()) {
            defaulted.add(Range.ABSORBER_DAMPING);
        }
        return new ToleranceRanges(structure.orElse(DEFAULT_STRUCTURE), absorber.orElse(DEFAULT_ABSORBER),
                damping.orElse(DEFAULT_DAMPING), basis, defaulted);
    }

    /**
     * Ranges all stated (tests, the command line).
     *
     * @param structure structure frequency range, fraction
     * @param absorber absorber frequency range, fraction
     * @param damping absorber damping range, fraction
     * @return the ranges, none defaulted
     */
    public static ToleranceRanges stated(double structure, double absorber, double damping) {
        return new ToleranceRanges(structure, absorber, damping, FrequencyBasis.NOT_STATED, Set.of());
    }

    /**
     * @param range one of the three
     * @return true when it took its default
     */
    public boolean isDefault(Range range) {
        return defaulted.contains(range);
    }

    /**
     * @param range one of the three
     * @return its half-width, fraction
     */
    public double of(Range range) {
        return switch (range) {
            case STRUCTURE_FREQUENCY -> structure;
            case ABSORBER_FREQUENCY -> absorber;
            case ABSORBER_DAMPING -> damping;
        };
    }
}
