package org.counterpoise.io.chart;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.function.Function;
import org.counterpoise.io.text.QuantityFormat;

/**
 * Numbers on chart tick labels: rounded with {@link QuantityFormat#number} (the one rounding rule
 * of reports and readouts) to six significant figures, then without trailing zeros, so a tick is
 * "0.072" and never "0.07200000000000001" or "0.07200". A linear axis writes all its ticks with
 * one number of decimals.
 */
public final class ChartNumbers {
    private static final int FIGURES = 6;

    private ChartNumbers() {
    }

    /**
     * @param value a tick value
     * @return its label
     */
    public static String label(double value) {
        String s = QuantityFormat.number(value, FIGURES);
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        String exponent = e < 0 ? "" : s.substring(e);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "");
            if (mantissa.endsWith(".")) {
                mantissa = mantissa.substring(0, mantissa.length() - 1);
            }
        }
        return mantissa + exponent;
    }

    /**
     * @param low the axis' lower end
     * @param high the axis' upper end
     * @return labels for a linear axis over that range: a tick within rounding noise of zero reads "0"
     */
    public static Function<Double, String> linearAxis(double low, double high) {
        double noise = 1e-9 * Math.max(Math.abs(low), Math.abs(high));
        double span = high - low > 0 ? high - low : Math.max(Math.abs(high), Math.abs(low));
        if (!(span > 0) || !Double.isFinite(span) || span < 1e-12 || span > 1e12) {
            return v -> Math.abs(v) <= noise ? "0" : label(v);
        }
        // One number of decimals for the whole axis (three digits finer than its span), so the ticks
        // of one axis read alike: 0.00008, 0.0001, 0.00012 and not 8e-05 beside 0.0001.
        int decimals = Math.max(0, 3 - (int) Math.floor(Math.log10(span)));
        return v -> {
            if (Math.abs(v) <= noise || !Double.isFinite(v)) {
                return Double.isFinite(v) ? "0" : label(v);
            }
            String s = new BigDecimal(v).setScale(decimals, RoundingMode.HALF_EVEN).stripTrailingZeros()
                    .toPlainString();
            return s.equals("-0") ? "0" : s;
        };
    }
}
