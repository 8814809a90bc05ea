package org.counterpoise.io.text;

import java.util.List;

/**
 * The comparison of design methods as the report model holds it (built by {@link ComparisonContent}):
 * columns keyed by {@link ReportKey} (so the JSON keys live in that one table), one line per
 * candidate with a typed value per column, which line is recommended and which chosen, and the
 * recommendation and notes in words. Rendered by the text report, the JSON, the PDF sheet and the
 * wizard (tables through {@link ReportTable#comparison}).
 *
 * @param title heading
 * @param columns the columns, in order
 * @param lines one per candidate
 * @param recommendation why the recommended method is recommended; its ids are the method's id and
 *     the reason's id (JSON {@link ReportKey#RECOMMENDATION})
 * @param chosen whether the design shown is the recommended one or another the user chose, in words
 * @param notes what else a reader must know: the run-up basis, methods left out, constraints
 * @param leftOut the methods left out, for the JSON
 */
public record ReportComparison(String title, List<Column> columns, List<Line> lines,
        ReportValue.Words recommendation, String chosen, List<String> notes, List<LeftOut> leftOut) {

    /** Defensive copies. */
    public ReportComparison {
        columns = List.copyOf(columns);
        lines = List.copyOf(lines);
        notes = List.copyOf(notes);
        leftOut = List.copyOf(leftOut);
    }

    /**
     * One column.
     * @param key its identity and JSON key
     * @param heading the words over it in a table (short)
     * @param tabled false for a column only the JSON writes (the tables say it in a note)
     */
    public record Column(ReportKey key, String heading, boolean tabled) {
    }

    /**
     * One candidate.
     * @param methodId the method's id
     * @param cells one value per column, in the columns' order
     * @param recommended true for the recommended method
     * @param chosen true for the method the design used
     * @param constrained false when the study's constraints were left out for this method
     */
    public record Line(String methodId, List<ReportValue> cells, boolean recommended, boolean chosen,
            boolean constrained) {
        /** Defensive copy. */
        public Line {
            cells = List.copyOf(cells);
        }
    }

    /**
     * A method not compared.
     * @param methodId the method's id
     * @param reasonId the reason's id
     */
    public record LeftOut(String methodId, String reasonId) {
    }
}
