package org.counterpoise.io.text;

/**
 * One line of the report.
 *
 * @param key its stable identity and JSON keys
 * @param label what it is, lower case (tables capitalise it)
 * @param symbol the symbol in the trade's notation (Greek letters and subscripts), or empty; the
 *     text report spells it in ASCII ({@link ValueText#ascii})
 * @param value the value, typed, in SI
 * @param source which method, standard or input gave it, or empty
 * @param caution what to keep in mind when using it, or empty
 */
public record ReportRow(ReportKey key, String label, String symbol, ReportValue value, String source,
        String caution) {

    /** @return the label followed by the symbol when there is one */
    public String labelWithSymbol() {
        return symbol.isEmpty() ? label : label + " " + symbol;
    }

    /** @return true when renderers of tables and text show this row (a value that does not apply is left out) */
    public boolean shown() {
        if (value instanceof ReportValue.Pair p) {
            return !(p.first() instanceof ReportValue.NotApplicable && p.second() instanceof ReportValue.NotApplicable);
        }
        return !(value instanceof ReportValue.NotApplicable);
    }
}
