package org.counterpoise.ui.cli;

import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.Locale;
import java.util.regex.Pattern;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.text.UnitSystem;
import picocli.CommandLine;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * Reads option values. Each converter refuses with what is allowed, in plain words (picocli's own
 * messages name Java types); numbers must be plain finite decimals, never NaN or Infinity.
 */
final class Converters {
    /** A decimal number as people write it: optional sign, digits, optional fraction and exponent. */
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d{1,3})?");
    private static final Pattern NON_FINITE = Pattern.compile("(?i)[+-]?(nan|inf|infinity)");
    private static final Pattern WHOLE = Pattern.compile("[+-]?\\d{1,18}");

    private Converters() {
    }

    static void register(CommandLine cl) {
        ITypeConverter<Double> real = Converters::real;
        ITypeConverter<Integer> whole = text -> (int) whole(text, Integer.MIN_VALUE, Integer.MAX_VALUE);
        ITypeConverter<Long> wholeLong = text -> whole(text, Long.MIN_VALUE, Long.MAX_VALUE);
        cl.registerConverter(Double.class, real).registerConverter(double.class, real)
                .registerConverter(Integer.class, whole).registerConverter(int.class, whole)
                .registerConverter(Long.class, wholeLong).registerConverter(long.class, wholeLong)
                .registerConverter(LocalDate.class, Converters::date).registerConverter(Path.class, Converters::path)
                .registerConverter(AmplitudeConvention.class, Converters::convention)
                .registerConverter(UnitSystem.class, Converters::unitSystem);
    }

    private static UnitSystem unitSystem(String text) {
        String wanted = text.strip().toLowerCase(Locale.ROOT);
        for (UnitSystem s : UnitSystem.values()) {
            if (s.id().equals(wanted)) {
                return s;
            }
        }
        throw new TypeConversionException("must be si or us");
    }

    private static AmplitudeConvention convention(String text) {
        return AmplitudeConvention.byId(text.strip()).orElseThrow(() -> new TypeConversionException(
                "must be one of " + String.join(", ", AmplitudeConvention.ids())));
    }

    /**
     * @param text an option's text
     * @return the number, finite
     * @throws TypeConversionException saying what is allowed
     */
    static double real(String text) {
        String t = text.strip();
        if (DECIMAL.matcher(t).matches()) {
            double v = Double.parseDouble(t);
            if (Double.isFinite(v)) {
                return v;
            }
        }
        throw new TypeConversionException("must be a finite decimal number such as 0.05 or 2.5e-3");
    }

    /**
     * @param text a value as typed
     * @return it quoted for a message; the words for not-a-number and infinity are described, not
     *     echoed, so that no message ever shows them as if they were results
     */
    static String shown(String text) {
        return NON_FINITE.matcher(text.strip()).matches() ? "a word for a value that is not a finite number"
                : "\"" + PlainText.quote(text) + "\"";
    }

    private static long whole(String text, long min, long max) {
        String t = text.strip();
        if (WHOLE.matcher(t).matches()) {
            long v = Long.parseLong(t);
            if (v >= min && v <= max) {
                return v;
            }
        }
        throw new TypeConversionException("must be a whole number written with digits only, such as 500");
    }

    private static LocalDate date(String text) {
        try {
            return LocalDate.parse(text.strip());
        } catch (DateTimeParseException e) {
            throw new TypeConversionException("must be a date written YYYY-MM-DD, such as 2026-03-14");
        }
    }

    private static Path path(String text) {
        try {
            return Path.of(text);
        } catch (InvalidPathException e) {
            throw new TypeConversionException("must be a file name without control characters");
        }
    }
}
