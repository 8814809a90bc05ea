package org.counterpoise.core.criteria;

import java.util.Locale;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The frequency weightings of whole-body vibration, as data: the corner frequencies, quality
 * factors and gain of the four stages of ISO 2631-1:1997 Annex A (band-limiting high-pass and
 * low-pass, acceleration-velocity transition, upward step), the same filters as ISO 8041-1:2017
 * Formulae (1) to (5) and Table 3. A corner at infinity removes its stage's factor.
 *
 * <pre>
 *   H(s) = Hh Hl Ht Hs, s = i 2 pi f, w_i = 2 pi f_i
 *   Hh = 1 / (1 + sqrt2 w1/s + (w1/s)^2)           Hl = 1 / (1 + sqrt2 s/w2 + (s/w2)^2)
 *   Ht = K (1 + s/w3) / (1 + s/(Q4 w4) + (s/w4)^2)
 *   Hs = (w5/w6)^2 (1 + s/(Q5 w5) + (s/w5)^2) / (1 + s/(Q6 w6) + (s/w6)^2)
 * </pre>
 *
 * The constants of Wk and Wd are those of ISO 2631-1:1997 Annex A as three independent public
 * implementations give them (all agree); Wm is ISO 2631-2:2003 Annex A as given by ISO 8041-1:2017.
 * The resulting factors are checked against the tables the standards print: ISO 2631-1:1997 Table 3
 * at the nominal band frequencies (3 significant figures) and ISO 8041-1:2017 Annex B at the exact
 * band centres (4 significant figures), in FrequencyWeightingTableTest.
 */
public enum FrequencyWeighting {
    /** Wk: vertical (z) whole-body vibration, seated, standing, recumbent (ISO 2631-1:1997 Table 3). */
    WK("Wk", "ISO 2631-1:1997 Annex A, Table 3", 0.4, 100, 12.5, 12.5, 0.63, 2.37, 0.91, 3.35, 0.91, 1.0),
    /** Wd: horizontal (x, y) whole-body vibration, seated, standing, recumbent (ISO 2631-1:1997 Table 3). */
    WD("Wd", "ISO 2631-1:1997 Annex A, Table 3", 0.4, 100, 2.0, 2.0, 0.63, Double.POSITIVE_INFINITY, 0,
            Double.POSITIVE_INFINITY, 0, 1.0),
    /** Wm: vibration in buildings, every axis (ISO 2631-2:2003; ISO 8041-1:2017 Table 3, f3 = f4 = 1/(0.028 2 pi)). */
    WM("Wm", "ISO 2631-2:2003, ISO 8041-1:2017 Table 3", Math.pow(10, -0.1), 100, 1 / (0.028 * 2 * Math.PI),
            1 / (0.028 * 2 * Math.PI), 0.5, Double.POSITIVE_INFINITY, 0, Double.POSITIVE_INFINITY, 0, 1.0);

    private final String symbol;
    private final String source;
    private final double f1;
    private final double f2;
    private final double f3;
    private final double f4;
    private final double q4;
    private final double f5;
    private final double q5;
    private final double f6;
    private final double q6;
    private final double gain;

    FrequencyWeighting(String symbol, String source, double f1, double f2, double f3, double f4, double q4,
            double f5, double q5, double f6, double q6, double gain) {
        this.symbol = symbol;
        this.source = source;
        this.f1 = f1;
        this.f2 = f2;
        this.f3 = f3;
        this.f4 = f4;
        this.q4 = q4;
        this.f5 = f5;
        this.q5 = q5;
        this.f6 = f6;
        this.q6 = q6;
        this.gain = gain;
    }

    /** @return the symbol the standard uses (Wk, Wd, Wm) */
    public String symbol() {
        return symbol;
    }

    /** @return standard, edition and table the constants come from */
    public String source() {
        return source;
    }

    /** @return the id in project files: the symbol in lower case */
    public String id() {
        return symbol.toLowerCase(Locale.ROOT);
    }

    /**
     * The weighting as a rational function of the same variable as the structure's transfer
     * functions, s = i g with g = omega / referenceFrequency, so that the product of the two is
     * again a {@link TransferFunction} and the exact peak search applies unchanged.
     *
     * @param referenceFrequency the reference angular frequency omega1, rad/s (&gt; 0)
     * @return W(i g)
     */
    public TransferFunction relativeTo(double referenceFrequency) {
        double[] num = {gain};
        double[] den = {1};
        // every corner as a non-dimensional frequency ratio r = w_i / omega1; s = i g
        double r1 = 2 * Math.PI * f1 / referenceFrequency;
        double r2 = 2 * Math.PI * f2 / referenceFrequency;
        // high-pass: s^2 / (s^2 + sqrt2 r1 s + r1^2)
        num = RealPolynomials.multiply(num, new double[] {0, 0, 1});
        den = RealPolynomials.multiply(den, new double[] {r1 * r1, Math.sqrt(2) * r1, 1});
        // low-pass: 1 / (1 + sqrt2 s/r2 + (s/r2)^2)
        den = RealPolynomials.multiply(den, new double[] {1, Math.sqrt(2) / r2, 1 / (r2 * r2)});
        if (Double.isFinite(f3)) {
            double r3 = 2 * Math.PI * f3 / referenceFrequency;
            num = RealPolynomials.multiply(num, new double[] {1, 1 / r3});
        }
        if (Double.isFinite(f4)) {
            double r4 = 2 * Math.PI * f4 / referenceFrequency;
            den = RealPolynomials.multiply(den, new double[] {1, 1 / (q4 * r4), 1 / (r4 * r4)});
        }
        if (Double.isFinite(f5)) {
            double r5 = 2 * Math.PI * f5 / referenceFrequency;
            double r6 = 2 * Math.PI * f6 / referenceFrequency;
            num = RealPolynomials.multiply(num, new double[] {(r5 * r5) / (r6 * r6), r5 / (q5 * r6 * r6),
                    1 / (r6 * r6)});
            den = RealPolynomials.multiply(den, new double[] {1, 1 / (q6 * r6), 1 / (r6 * r6)});
        }
        return TransferFunction.of(num, den);
    }

    /**
     * @param frequency frequency, Hz (&gt; 0)
     * @return the weighting factor |W| there
     */
    public double factorAt(double frequency) {
        return relativeTo(2 * Math.PI).magnitude(frequency);
    }
}
