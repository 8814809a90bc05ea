package org.counterpoise.io.text;

import java.util.List;
import java.util.stream.Collectors;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.ReportValue.Change;
import org.counterpoise.io.text.ReportValue.Count;
import org.counterpoise.io.text.ReportValue.Factor;
import org.counterpoise.io.text.ReportValue.Fields;
import org.counterpoise.io.text.ReportValue.Flag;
import org.counterpoise.io.text.ReportValue.Level;
import org.counterpoise.io.text.ReportValue.Margin;
import org.counterpoise.io.text.ReportValue.Names;
import org.counterpoise.io.text.ReportValue.NotApplicable;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;
import org.counterpoise.io.text.ReportValue.PeakAt;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.PlusMinus;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Reduction;
import org.counterpoise.io.text.ReportValue.Series;
import org.counterpoise.io.text.ReportValue.Tolerance;
import org.counterpoise.io.text.ReportValue.Unbounded;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The words of report values: one line of the text report ({@link #inline}) or the value and
 * unit cells of a table ({@link #cells}), and the small phrasing helpers every report shares
 * (tolerance, percentages, frequencies, unit symbols, capitals). The one place a report value
 * becomes text.
 */
public final class ValueText {
    private static final String GREEK = "\u03bc\u03b6\u03c6\u03c9";
    private static final List<String> GREEK_NAMES = List.of("mu", "zeta", "phi", "omega");

    private ValueText() {
    }

    /**
     * The value and unit cells of a table row (the sheet, the wizard).
     *
     * @param value the value
     * @param textual true when the value is words (wrapped, left-aligned) rather than a number
     *     (right-aligned before its unit)
     * @param unit the unit symbol as typed ({@link #pretty} for print), or empty
     */
    public record Cells(String value, String unit, boolean textual) {
    }

    /**
     * @param v a value
     * @return its table cells in SI
     */
    public static Cells cells(ReportValue v) {
        return cells(v, UnitSystem.SI);
    }

    /**
     * @param v a value
     * @param system the unit system quantities are shown in
     * @return its table cells
     */
    public static Cells cells(ReportValue v, UnitSystem system) {
        if (v instanceof Quantity q) {
            Unit unit = DisplayUnits.of(q.dimension(), system);
            return new Cells(QuantityFormat.number(unit.fromSi(q.si()), q.figures()), unit.symbol(), false);
        } else if (v instanceof Unbounded) {
            return new Cells("unbounded", "", true);
        } else if (v instanceof NotApplicable) {
            return new Cells("not applicable", "", true);
        } else if (v instanceof Words w) {
            return new Cells(w.text(), "", true);
        } else if (v instanceof Flag f) {
            return new Cells(f.text(), "", true);
        } else if (v instanceof Margin m) {
            return new Cells(margin(m), "", true);
        } else if (v instanceof Names n) {
            return new Cells(n.text(), "", true);
        } else if (v instanceof Level l) {
            return new Cells(QuantityFormat.number(l.value(), l.figures()), l.unit(), false);
        } else if (v instanceof Percent p) {
            return new Cells(QuantityFormat.number(100 * p.fraction(), p.figures()), "%", false);
        } else if (v instanceof PlusMinus p) {
            return new Cells(plusMinus(p), "", true);
        } else if (v instanceof Pair p) {
            return pairCells(p, system);
        } else if (v instanceof Series s) {
            Unit unit = DisplayUnits.of(s.dimension(), system);
            return new Cells(s.si().stream().map(x -> QuantityFormat.number(unit.fromSi(x), QuantityFormat.FIGURES))
                    .collect(Collectors.joining(" and ")), unit.symbol(), false);
        } else if (v instanceof Tolerance t) {
            return new Cells(tolerance(t), "", true);
        } else if (v instanceof Factor f) {
            return new Cells(signedPercent(f.factor(), f.figures()), "", false);
        } else if (v instanceof Count c) {
            return new Cells(Long.toString(c.value()), "", false);
        } else if (v instanceof Reduction r) {
            return new Cells(reduction(r), "", true);
        } else if (v instanceof Change c) {
            return new Cells(change(c, false), "", true);
        } else if (v instanceof PeakAt p) {
            return cells(p.peak(), system);
        } else if (v instanceof Fields f) {
            return new Cells(inline(f, system), "", true);
        }
        throw new IllegalStateException("bug: no table cells for " + v);
    }

    /** A range in words: "+/-5 %", and for a default "+/-5 % (default: common practice, no source)". */
    private static String plusMinus(PlusMinus p) {
        return "+/-" + QuantityFormat.number(100 * p.fraction(), p.figures()) + " %"
                + (p.stated() ? "" : " (default: " + ToleranceRangeRows.DEFAULT_SOURCE + ")");
    }

    private static Cells pairCells(Pair p, UnitSystem system) {
        Cells a = cells(p.first(), system);
        Cells b = cells(p.second(), system);
        String unit = a.unit().isEmpty() ? b.unit() : a.unit();
        if (p.kind() == PairKind.RANGE) {
            return a.equals(b) ? a : new Cells(a.value() + " to " + b.value(), unit, false);
        }
        // two phrases (verdicts, zones) read as words, left-aligned; numbers stay in the number column
        return new Cells(a.value() + "  /  " + b.value(), unit, a.textual() && b.textual());
    }

    /**
     * @param v a value
     * @return the value as one phrase of the text report in SI, e.g. "23.50 Hz (1410 rpm)"
     */
    public static String inline(ReportValue v) {
        return inline(v, UnitSystem.SI);
    }

    /**
     * @param v a value
     * @param system the unit system quantities are shown in
     * @return the value as one phrase of the text report, e.g. "23.50 Hz (1410 rpm)"
     */
    public static String inline(ReportValue v, UnitSystem system) {
        if (v instanceof Quantity q) {
            return quantity(q.si(), q.dimension(), q.figures(), system) + (q.dimension() == Dimension.FREQUENCY
                    ? " (" + QuantityFormat.format(q.si(), Unit.REV_PER_MINUTE) + ")" : "");
        } else if (v instanceof Unbounded u) {
            return u.why().isEmpty() ? "unbounded" : "unbounded (" + u.why() + ")";
        } else if (v instanceof NotApplicable) {
            return "not applicable";
        } else if (v instanceof Words w) {
            return w.text();
        } else if (v instanceof Flag f) {
            return f.text();
        } else if (v instanceof Margin m) {
            return margin(m);
        } else if (v instanceof Names n) {
            return n.text();
        } else if (v instanceof Level l) {
            return QuantityFormat.number(l.value(), l.figures()) + " " + l.unit();
        } else if (v instanceof Percent p) {
            return percent(p.fraction(), p.figures());
        } else if (v instanceof PlusMinus p) {
            return plusMinus(p);
        } else if (v instanceof Pair p) {
            return inlinePair(p, system);
        } else if (v instanceof Series s) {
            return s.si().stream().map(x -> quantity(x, s.dimension(), QuantityFormat.FIGURES, system))
                    .collect(Collectors.joining(" and "));
        } else if (v instanceof Tolerance t) {
            return tolerance(t);
        } else if (v instanceof Factor f) {
            return signedPercent(f.factor(), f.figures());
        } else if (v instanceof Count c) {
            return Long.toString(c.value());
        } else if (v instanceof Reduction r) {
            return reduction(r);
        } else if (v instanceof Change c) {
            return change(c, true);
        } else if (v instanceof PeakAt p) {
            return p.peak() instanceof Quantity ? inline(p.peak(), system) + " at " + frequency(p.frequency())
                    : inline(p.peak(), system);
        } else if (v instanceof Fields f) {
            return !f.text().isEmpty() ? f.text() : f.fields().stream().filter(x -> !x.label().isEmpty())
                    .map(x -> x.label() + " " + cell(x.value(), system)).collect(Collectors.joining(", "));
        }
        throw new IllegalStateException("bug: no words for " + v);
    }

    /**
     * @param v a value
     * @return its table cell with the unit after the number ("14.20 Hz", "412.0 N"), for a column
     *     of a grid ({@link ReportTable#grid})
     */
    public static String cell(ReportValue v) {
        return cell(v, UnitSystem.SI);
    }

    /**
     * @param v a value
     * @param system the unit system quantities are shown in
     * @return its table cell with the unit after the number
     */
    public static String cell(ReportValue v, UnitSystem system) {
        Cells c = cells(v, system);
        return c.unit().isEmpty() ? c.value() : c.value() + " " + c.unit();
    }

    private static String inlinePair(Pair p, UnitSystem system) {
        if (p.kind() == PairKind.RANGE && p.first() instanceof Quantity a && p.second() instanceof Quantity b) {
            if (a.equals(b)) {
                return inline(a, system);
            }
            Unit unit = DisplayUnits.of(a.dimension(), system);
            String range = QuantityFormat.number(unit.fromSi(a.si()), a.figures()) + " to "
                    + QuantityFormat.format(b.si(), unit);
            if (a.dimension() == Dimension.FREQUENCY) {
                range += " (" + QuantityFormat.number(Unit.REV_PER_MINUTE.fromSi(a.si()), a.figures()) + " to "
                        + QuantityFormat.format(b.si(), Unit.REV_PER_MINUTE) + ")";
            }
            return range;
        }
        return inline(p.first(), system) + (p.kind() == PairKind.RANGE ? " to " : " / ") + inline(p.second(), system);
    }

    private static String quantity(double si, Dimension dimension, int figures, UnitSystem system) {
        Unit unit = DisplayUnits.of(dimension, system);
        String number = QuantityFormat.number(unit.fromSi(si), figures);
        return unit.symbol().isEmpty() ? number : number + " " + unit.symbol();
    }

    private static String tolerance(Tolerance t) {
        return !t.range().defined() && !t.ifUndefined().isEmpty() ? t.ifUndefined() : tolerance(t.range(), t.power());
    }

    /**
     * @param range tolerated frequency factors
     * @param power 1 for a frequency, 2 for a stiffness (proportional to frequency squared)
     * @return e.g. "-3.1 % to +2.7 %"
     */
    public static String tolerance(MistuningRange range, int power) {
        if (!range.defined()) {
            return "not defined (the nominal response is zero or unbounded)";
        }
        return side(range.low().orElse(Double.NaN), power, range.searchLimit(), -1) + " to "
                + side(range.high().orElse(Double.NaN), power, range.searchLimit(), 1)
                + (range.ofBareResponse() ? " (response kept below " + percent(range.allowance(), 2)
                        + " of the bare structure's: the design cancels it at its one speed)" : "");
    }

    private static String side(double factor, int power, double limit, int sign) {
        if (Double.isNaN(factor)) {
            return "beyond " + signedPercent(Math.pow(1 + sign * limit, power), 2);
        }
        return signedPercent(Math.pow(factor, power), 2);
    }

    private static String reduction(Reduction r) {
        if (r.before() instanceof Unbounded) {
            return "from unbounded (undamped resonance) to a finite level";
        }
        if (r.after() instanceof Quantity q && q.si() == 0.0) {
            return "complete: the structure stands still at the tuned frequency";
        }
        return "factor " + QuantityFormat.number(r.factor(), 3) + " (" + QuantityFormat.number(r.decibels(), 3)
                + " dB)";
    }

    /**
     * @param m a margin
     * @return e.g. "x1.52 (+3.63 dB)", or words when the value is zero or unbounded
     */
    private static String margin(Margin m) {
        if (m.ratio() == 0) {
            return "none (the value is unbounded)";
        }
        if (Double.isInfinite(m.ratio())) {
            return "unlimited (the value is zero)";
        }
        return "x" + QuantityFormat.number(m.ratio(), 3) + " (" + (m.decibels() > 0 ? "+" : "")
                + QuantityFormat.number(m.decibels(), 3) + " dB)";
    }

    private static String change(Change c, boolean withRpm) {
        if (c.targetIsZero()) {
            return "not possible (the absorber holds the structure still)";
        }
        if (!c.reachable()) {
            return "not reachable by " + c.what().word() + " alone";
        }
        if (c.factor() == 1.0) {
            return "no change needed";
        }
        return signedPercent(c.factor(), 3) + " " + c.what().word() + " (natural frequency "
                + (withRpm ? frequency(c.naturalFrequency()) : QuantityFormat.format(c.naturalFrequency(),
                        Unit.HERTZ)) + ")";
    }

    /**
     * @param omega an angular frequency, rad/s
     * @return e.g. "23.50 Hz (1410 rpm)"
     */
    public static String frequency(double omega) {
        // Hz and rpm in both unit systems
        return inline(new Quantity(omega, Dimension.FREQUENCY, QuantityFormat.FIGURES), UnitSystem.SI);
    }

    /**
     * @param fraction a fraction (0.1 for 10 %)
     * @param figures significant figures
     * @return e.g. "10 %"
     */
    public static String percent(double fraction, int figures) {
        return QuantityFormat.number(100 * fraction, figures) + " %";
    }

    /**
     * @param factor a factor (1 = no change)
     * @param figures significant figures
     * @return the change it makes with its sign, e.g. "+2.7 %" or "-3.1 %"
     */
    public static String signedPercent(double factor, int figures) {
        double change = 100 * (factor - 1);
        return (change > 0 ? "+" : "") + QuantityFormat.number(change, figures) + " %";
    }

    /**
     * @param symbol a unit symbol as typed ("N*s/m", "m/s^2")
     * @return the symbol for print ("N·s/m", "m/s²")
     */
    public static String pretty(String symbol) {
        return symbol.replace("*", "\u00b7").replace("^2", "\u00b2");
    }

    /**
     * @param s a phrase
     * @return the phrase with its first letter in upper case
     */
    public static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    /**
     * @param symbol a symbol with Greek letters and subscript digits ("ζa", "μ", "ζ₁")
     * @return the symbol spelled in ASCII for the plain-text report ("zeta_a", "mu", "zeta_1")
     */
    public static String ascii(String symbol) {
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < symbol.length(); i++) {
            char c = symbol.charAt(i);
            int greek = GREEK.indexOf(c);
            if (greek >= 0) {
                String name = GREEK_NAMES.get(greek);
                out.append(name);
                if (i + 1 < symbol.length() && symbol.charAt(i + 1) != ' ') {
                    out.append('_');
                }
            } else if (c >= '\u2080' && c <= '\u2089') {
                out.append((char) ('0' + (c - '\u2080')));
            } else {
                out.append(c);
            }
        }
        return out.toString();
    }
}
