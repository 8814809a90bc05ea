package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.counterpoise.io.text.ReportSection.SectionId;

/**
 * The report as tables of label, value and unit cells: what the PDF sheet and the wizard's result
 * table show. Labels are capitalised and carry their symbols; the cells come from {@link ValueText}.
 */
public final class ReportTable {
    private ReportTable() {
    }

    /**
     * One table.
     * @param id the section it shows
     * @param title its heading
     * @param rows its rows
     */
    public record Section(SectionId id, String title, List<Row> rows) {
        /** Defensive copy. */
        public Section {
            rows = List.copyOf(rows);
        }
    }

    /**
     * One row of a table.
     * @param key the report row it shows
     * @param label what it is, capitalised, with its symbol
     * @param value the value as printed
     * @param unit the unit symbol as typed ({@link ValueText#pretty} for print), or empty
     * @param textual true when the value is words (left-aligned, wrapped), false for a number
     * @param note the row's source and caution, for a tooltip, or empty
     */
    public record Row(ReportKey key, String label, String value, String unit, boolean textual, String note) {
    }

    /**
     * @param content the report
     * @param leftOut rows the caller shows elsewhere (the sheet prints revision and date in its header)
     * @return its tables, in the report's order; a section left with no rows is dropped
     */
    public static List<Section> of(ReportContent content, Set<ReportKey> leftOut) {
        List<Section> tables = new ArrayList<>();
        for (ReportSection section : content.sections()) {
            List<Row> rows = new ArrayList<>();
            for (ReportRow row : section.rows()) {
                if (row.shown() && !leftOut.contains(row.key())) {
                    ValueText.Cells cells = ValueText.cells(row.shownValue(), content.units());
                    rows.add(new Row(row.key(), ValueText.capitalised(row.labelWithSymbol()), cells.value(),
                            cells.unit(), cells.textual(), note(row)));
                }
            }
            if (!rows.isEmpty()) {
                tables.add(new Section(section.id(), section.title(), rows));
            }
        }
        return tables;
    }

    /**
     * The comparison of methods as one table of printed cells (values with their units), for the
     * text report, the sheet and the wizard.
     * @param title its heading
     * @param headings the column headings
     * @param cells one list of cells per candidate, one per heading
     * @param recommended per candidate, true for the recommended one
     * @param chosen per candidate, true for the one the design used
     * @param sentences the recommendation, whose design is shown, and the notes, one sentence each
     */
    public record Grid(String title, List<String> headings, List<List<String>> cells, List<Boolean> recommended,
            List<Boolean> chosen, List<String> sentences) {
        /** Defensive copies. */
        public Grid {
            headings = List.copyOf(headings);
            cells = cells.stream().map(List::copyOf).toList();
            recommended = List.copyOf(recommended);
            chosen = List.copyOf(chosen);
            sentences = List.copyOf(sentences);
        }
    }

    /**
     * @param c the comparison
     * @return its table in SI
     */
    public static Grid comparison(ReportComparison c) {
        return comparison(c, UnitSystem.SI);
    }

    /**
     * @param c the comparison
     * @param units the unit system its quantities are shown in
     * @return its table: the tabled columns, the method cell marked "(recommended)" and "(chosen)"
     */
    public static Grid comparison(ReportComparison c, UnitSystem units) {
        List<String> headings = new ArrayList<>();
        for (ReportComparison.Column col : c.columns()) {
            if (col.tabled()) {
                headings.add(col.heading());
            }
        }
        List<List<String>> cells = new ArrayList<>();
        for (ReportComparison.Line line : c.lines()) {
            List<String> row = new ArrayList<>();
            for (int i = 0; i < c.columns().size(); i++) {
                if (!c.columns().get(i).tabled()) {
                    continue;
                }
                String cell = ValueText.inline(line.cells().get(i), units);
                if (c.columns().get(i).key() == ReportKey.METHOD) {
                    List<String> marks = new ArrayList<>();
                    if (line.recommended()) {
                        marks.add("recommended");
                    }
                    if (line.chosen()) {
                        marks.add("chosen");
                    }
                    cell = marks.isEmpty() ? cell : cell + " (" + String.join(", ", marks) + ")";
                }
                row.add(cell);
            }
            cells.add(row);
        }
        List<String> sentences = new ArrayList<>();
        sentences.add("Recommended: " + c.recommendation().text() + ".");
        sentences.add(c.chosen());
        sentences.addAll(c.notes());
        return new Grid(c.title(), headings, cells, c.lines().stream().map(ReportComparison.Line::recommended).toList(),
                c.lines().stream().map(ReportComparison.Line::chosen).toList(), sentences);
    }

    /**
     * A section whose rows are records of the same fields (the checks, the predicted response) as
     * one table: a column per field, a line per row, each cell with its unit.
     * @param section a section
     * @return its grid, or empty when its rows are not such records
     */
    public static Optional<Grid> grid(ReportSection section) {
        return grid(section, UnitSystem.SI);
    }

    /**
     * @param section a section
     * @param units the unit system its quantities are shown in
     * @return its grid, or empty when its rows are not such records
     */
    public static Optional<Grid> grid(ReportSection section, UnitSystem units) {
        List<ReportRow> shown = section.rows().stream().filter(ReportRow::shown).toList();
        if (shown.isEmpty() || !shown.stream().allMatch(r -> r.value() instanceof ReportValue.Fields f
                && f.text().isEmpty())) {
            return Optional.empty();
        }
        // a field without a label is for the JSON only (the unit of a check's figures)
        List<String> headings = ((ReportValue.Fields) shown.get(0).value()).fields().stream()
                .filter(f -> !f.label().isEmpty()).map(f -> ValueText.capitalised(f.label())).toList();
        List<List<String>> cells = new ArrayList<>();
        for (ReportRow row : shown) {
            cells.add(((ReportValue.Fields) row.value()).fields().stream().filter(f -> !f.label().isEmpty())
                    .map(f -> ValueText.cell(f.value(), units)).toList());
        }
        List<Boolean> none = shown.stream().map(r -> false).toList();
        // the sources are sentences under the table, not a column: they are long
        List<String> sources = shown.stream().filter(r -> !r.source().isEmpty())
                .map(r -> ValueText.capitalised(r.label()) + ": " + r.source() + ".").toList();
        return Optional.of(new Grid(section.title(), headings, cells, none, none, sources));
    }

    private static String note(ReportRow row) {
        if (row.source().isEmpty() || row.caution().isEmpty()) {
            return row.source().isEmpty() ? ValueText.capitalised(row.caution()) : "Source: " + row.source();
        }
        return "Source: " + row.source() + ". " + ValueText.capitalised(row.caution());
    }
}
