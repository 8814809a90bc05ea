package org.counterpoise.io.text;

import java.util.Optional;
import org.counterpoise.core.criteria.AmplitudeConvention;

/**
 * One line of the report.
 *
 * @param key its stable identity and JSON keys
 * @param label what it is, lower case (tables capitalise it)
 * @param symbol the symbol in the trade's notation (Greek letters and subscripts), or empty; the
 *     text report spells it in ASCII ({@link ValueText#ascii})
 * @param value the value, typed, in SI; a row that {@link Amplitude#followsDisplay follows the
 *     display convention} holds its amplitudes as peaks and shows them through {@link #shownValue}
 * @param source which method, standard or input gave it, or empty
 * @param caution what to keep in mind when using it, or empty
 * @param amplitude the amplitude convention its values are stated in, when they are amplitudes of
 *     an oscillation; empty for everything else
 */
public record ReportRow(ReportKey key, String label, String symbol, ReportValue value, String source,
        String caution, Optional<Amplitude> amplitude) {

    /**
     * How a row's oscillating values are stated.
     *
     * @param convention the convention shown
     * @param followsDisplay true when the row shows the user's display convention (the response of
     *     the structure); false when its convention is fixed by what it is (peak stroke and forces,
     *     which clearances and fatigue need; r.m.s. of a random response)
     */
    public record Amplitude(AmplitudeConvention convention, boolean followsDisplay) {
        /** A response value in the display convention, peak until the user picks another. */
        public static final Amplitude DISPLAY = new Amplitude(AmplitudeConvention.PEAK, true);
        /** A peak that stays a peak (stroke, forces). */
        public static final Amplitude FIXED_PEAK = new Amplitude(AmplitudeConvention.PEAK, false);
        /** An r.m.s. value that stays r.m.s. (the response to white noise). */
        public static final Amplitude FIXED_RMS = new Amplitude(AmplitudeConvention.RMS, false);
    }

    /**
     * A row whose value is no amplitude.
     * @param key its stable identity and JSON keys
     * @param label what it is
     * @param symbol its symbol, or empty
     * @param value the value
     * @param source where it comes from, or empty
     * @param caution what to keep in mind, or empty
     */
    public ReportRow(ReportKey key, String label, String symbol, ReportValue value, String source, String caution) {
        this(key, label, symbol, value, source, caution, Optional.empty());
    }

    /** Null-safe amplitude. */
    public ReportRow {
        amplitude = amplitude == null ? Optional.empty() : amplitude;
    }

    /** @return the label followed by the symbol when there is one, and the convention in brackets */
    public String labelWithSymbol() {
        return (symbol.isEmpty() ? label : label + " " + symbol) + conventionSuffix();
    }

    /**
     * @return " (r.m.s.)" and the like for an amplitude row, else empty (a reduction factor is the
     *     same in every convention and says none)
     */
    public String conventionSuffix() {
        if (value instanceof ReportValue.Reduction) {
            return "";
        }
        return amplitude.map(a -> " (" + a.convention().label() + ")").orElse("");
    }

    /** @return the value as shown: amplitudes that follow the display convention stated in it */
    public ReportValue shownValue() {
        return amplitude.filter(Amplitude::followsDisplay)
                .map(a -> Amplitudes.stated(value, a.convention())).orElse(value);
    }

    /**
     * @param display the convention the user picked
     * @return this row showing it, when the row follows the display convention; else this row
     */
    public ReportRow shownIn(AmplitudeConvention display) {
        if (amplitude.isEmpty() || !amplitude.get().followsDisplay()) {
            return this;
        }
        return new ReportRow(key, label, symbol, value, source, caution,
                Optional.of(new Amplitude(display, true)));
    }

    /** @return true when renderers of tables and text show this row (a value that does not apply is left out) */
    public boolean shown() {
        if (value instanceof ReportValue.Pair p) {
            return !(p.first() instanceof ReportValue.NotApplicable && p.second() instanceof ReportValue.NotApplicable);
        }
        return !(value instanceof ReportValue.NotApplicable);
    }
}
