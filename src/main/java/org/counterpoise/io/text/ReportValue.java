package org.counterpoise.io.text;

import java.util.List;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.units.Dimension;

/**
 * The value of one report row, typed, in SI: each renderer decides how it looks (the text report,
 * the tables of the sheet and the wizard through {@link ValueText}; the JSON through
 * {@code io.export.ResultJson}). A value that is not a number says so with its own type
 * ({@link Unbounded}, {@link NotApplicable}), never with NaN or infinity.
 */
public sealed interface ReportValue {

    /**
     * A finite SI value shown in the display unit of its dimension ({@link DisplayUnits}).
     * @param si the value in SI (frequencies in rad/s)
     * @param dimension its dimension (RATIO for a pure number)
     * @param figures significant figures shown
     */
    record Quantity(double si, Dimension dimension, int figures) implements ReportValue {
    }

    /**
     * A value with no finite bound (an undamped resonance); JSON null with {@code <key>_unbounded}.
     * @param dimension the dimension it would have
     * @param why the reason, said by the text report, or empty
     */
    record Unbounded(Dimension dimension, String why) implements ReportValue {
    }

    /** A value that does not exist for this design (JSON null; tables and the text report leave the row out). */
    record NotApplicable() implements ReportValue {
    }

    /**
     * Words; the JSON writes {@code ids} (one per key of the row), or the words themselves when
     * there are no ids.
     * @param text the words shown
     * @param ids the stable identifiers the JSON writes, or empty
     */
    record Words(String text, List<String> ids) implements ReportValue {
        /** Defensive copy. */
        public Words {
            ids = List.copyOf(ids);
        }
    }

    /**
     * A yes-or-no finding (a verdict): the JSON writes the boolean, the tables and the text report
     * the words.
     * @param value the finding
     * @param text the words shown
     */
    record Flag(boolean value, String text) implements ReportValue {
    }

    /**
     * The margin of a value under its limit: limit over value, and in decibels.
     * @param ratio limit over value (0 when the value is unbounded, +infinity when it is zero)
     * @param decibels 20 log10 of the ratio
     */
    record Margin(double ratio, double decibels) implements ReportValue {
    }

    /**
     * Several stable names (the zones a value falls in): the JSON writes them as an array of
     * strings, the tables and the text report the words.
     * @param ids the names the JSON writes
     * @param text the words shown
     */
    record Names(List<String> ids, String text) implements ReportValue {
        /** Defensive copy. */
        public Names {
            ids = List.copyOf(ids);
        }
    }

    /**
     * A number in a unit no {@link Dimension} names (a spectral density): shown and written as is.
     * @param value the value, finite, in {@code unit}
     * @param figures significant figures shown
     * @param unit the unit symbol
     */
    record Level(double value, int figures, String unit) implements ReportValue {
    }

    /**
     * A fraction shown as a percentage, written to JSON as the fraction.
     * @param fraction e.g. 0.1 for 10 %
     * @param figures significant figures of the percentage
     */
    record Percent(double fraction, int figures) implements ReportValue {
    }

    /**
     * A range the design must hold over, +/- a fraction, and whether the project stated it or it took
     * its default (common practice, no source); the JSON writes the fraction and "stated" or "default".
     * @param fraction e.g. 0.05 for +/-5 %
     * @param figures significant figures of the percentage
     * @param stated true when the project stated it
     */
    record PlusMinus(double fraction, int figures, boolean stated) implements ReportValue {
        /** @return "stated" or "default": the JSON's word for where it came from */
        public String origin() {
            return stated ? "stated" : "default";
        }
    }

    /**
     * Two values of one dimension, one per JSON key.
     * @param first before, or the low end
     * @param second after, or the high end
     * @param kind how they relate
     */
    record Pair(ReportValue first, ReportValue second, PairKind kind) implements ReportValue {
    }

    /** How the two values of a {@link Pair} relate. */
    enum PairKind {
        /** without and with the absorber: the text report prints them in two columns */
        BEFORE_AFTER,
        /** a low and a high end ("a to b"; one value when they are equal) */
        RANGE,
        /** two figures of one kind side by side ("a / b") */
        SIDE_BY_SIDE
    }

    /**
     * Several SI values of one dimension, written to JSON as one array.
     * @param si the values in SI, finite
     * @param dimension their dimension
     */
    record Series(List<Double> si, Dimension dimension) implements ReportValue {
        /** Defensive copy. */
        public Series {
            si = List.copyOf(si);
        }
    }

    /**
     * The detuning a design tolerates ({@link ValueText#tolerance}).
     * @param range tolerated frequency factors
     * @param power 1 to show it as a frequency change, 2 as a stiffness change (frequency squared)
     * @param ifUndefined the words when the range is not defined, or empty for the standard words
     */
    record Tolerance(MistuningRange range, int power, String ifUndefined) implements ReportValue {
        /**
         * A tolerance that says the standard words when it is not defined.
         * @param range tolerated frequency factors
         * @param power 1 for a frequency change, 2 for a stiffness change
         */
        public Tolerance(MistuningRange range, int power) {
            this(range, power, "");
        }
    }

    /**
     * A factor shown as the signed change it makes ("+2.29 %"), written to JSON as the factor.
     * @param factor the factor (1 = nominal)
     * @param figures significant figures of the percentage
     */
    record Factor(double factor, int figures) implements ReportValue {
    }

    /**
     * A whole number (a count of samples, a seed), written to JSON as an integer.
     * @param value the number
     */
    record Count(long value) implements ReportValue {
    }

    /**
     * How much the absorber reduces the response that matters.
     * @param before its peak without the absorber, a {@link Quantity} or {@link Unbounded}
     * @param after its peak with the absorber
     * @param factor before over after (+infinity when after is zero or before unbounded)
     * @param decibels 20 log10 of the factor
     */
    record Reduction(ReportValue before, ReportValue after, double factor, double decibels) implements ReportValue {
    }

    /**
     * A change of the bare structure that reaches the absorber's result.
     * @param factor new over old stiffness or mass; NaN when no change in the searched range reaches it
     * @param what the property changed
     * @param naturalFrequency the structure's natural frequency after the change, rad/s
     * @param targetIsZero true when the absorber holds the structure still, which no change can match
     */
    record Change(double factor, Changed what, double naturalFrequency, boolean targetIsZero) implements ReportValue {
        /** @return true when a change in the searched range reaches the target */
        public boolean reachable() {
            return !Double.isNaN(factor);
        }
    }

    /** What a {@link Change} changes. */
    enum Changed {
        /** the structure's stiffness */
        STIFFNESS,
        /** the structure's mass */
        MASS;

        /** @return the word for it */
        public String word() {
            return this == STIFFNESS ? "stiffness" : "mass";
        }
    }

    /**
     * A small record of named values: one element of a JSON array (a check, a procedure step, a row
     * of the predicted response), or a nested object (a step's figures). The JSON writes each field
     * under its key's JSON keys; tables show the fields as columns ({@link ReportTable#grid}); the
     * text report shows {@code text} when it is not empty, else the fields one after another.
     * @param text the words shown for the whole (a procedure step's sentence), or empty
     * @param fields the fields in order
     */
    record Fields(String text, List<Field> fields) implements ReportValue {
        /** Defensive copy. */
        public Fields {
            fields = List.copyOf(fields);
        }
    }

    /**
     * One named value of {@link Fields}.
     * @param key its JSON key (the first of the key's JSON keys; several for a {@link Pair})
     * @param label the column heading, lower case, with the unit left to the value
     * @param value the value, typed, SI
     */
    record Field(ReportKey key, String label, ReportValue value) {
    }

    /**
     * A peak and the frequency it occurs at (the text report names the frequency).
     * @param peak a {@link Quantity} or {@link Unbounded}
     * @param frequency where, rad/s (ignored when unbounded)
     */
    record PeakAt(ReportValue peak, double frequency) implements ReportValue {
    }
}
