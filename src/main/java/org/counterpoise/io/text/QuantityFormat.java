package org.counterpoise.io.text;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;
import org.counterpoise.core.units.Unit;

/**
 * SI values as text in a display unit, with a fixed number of significant figures. Infinite
 * values become the word "unbounded" and NaN the words "not available": a report never shows
 * "Infinity" or "NaN".
 */
public final class QuantityFormat {
    /** Significant figures used in reports. */
    public static final int FIGURES = 4;

    private QuantityFormat() {
    }

    /**
     * @param siValue value in SI
     * @param unit display unit
     * @return e.g. "12.35 mm"
     */
    public static String format(double siValue, Unit unit) {
        String number = number(unit.fromSi(siValue), FIGURES);
        if (!Double.isFinite(siValue) || unit.symbol().isEmpty()) {
            return number;
        }
        return number + " " + unit.symbol();
    }

    /**
     * @param value a plain number
     * @param figures significant figures
     * @return the number rounded, plain for 1e-4 &lt;= |v| &lt; 1e7, else with an exponent
     */
    public static String number(double value, int figures) {
        if (Double.isNaN(value)) {
            return "not available";
        }
        if (Double.isInfinite(value)) {
            return "unbounded";
        }
        if (value == 0.0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(figures));
        double abs = Math.abs(value);
        if (abs >= 1e-4 && abs < 1e7) {
            // Keep trailing zeros so every value shows the same number of significant figures.
            int exponent = rounded.precision() - rounded.scale() - 1;
            return rounded.setScale(Math.max(0, figures - 1 - exponent), RoundingMode.HALF_EVEN)
                    .toPlainString();
        }
        return String.format(Locale.ROOT, "%." + (figures - 1) + "e", rounded.doubleValue());
    }
}
