package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;

/** The plain-text design report printed by the command line: {@link DesignContent} rendered as aligned lines. */
public final class DesignReport {
    private static final int LABEL = 40;

    private DesignReport() {
    }

    /**
     * @param r the design result
     * @return the report, lines ending in '\n'
     */
    public static String render(DesignResult r) {
        return render(r, ProjectIdentity.EMPTY);
    }

    /**
     * @param r the design result
     * @param identity revision, engineer, client or site and date, printed under the title when given
     * @return the report, lines ending in '\n'
     */
    public static String render(DesignResult r, ProjectIdentity identity) {
        return render(DesignContent.of(r, identity, Optional.empty()));
    }

    /**
     * @param content a design's report content
     * @return the report, lines ending in '\n'
     */
    public static String render(ReportContent content) {
        StringBuilder out = new StringBuilder();
        out.append("Counterpoise absorber design: ").append(content.name()).append('\n');
        for (ReportSection section : content.sections()) {
            ReportTable.grid(section, content.units()).ifPresentOrElse(g -> comparison(out, g),
                    () -> section(out, section, content.units()));
        }
        content.comparison().ifPresent(c -> comparison(out, ReportTable.comparison(c, content.units())));
        if (!content.warnings().isEmpty()) {
            out.append("\nWarnings\n");
            for (ReportContent.Note warning : content.warnings()) {
                bullet(out, warning.text());
            }
        }
        out.append("\nCautions\n");
        for (String caution : content.cautions()) {
            bullet(out, caution);
        }
        return out.toString();
    }

    /**
     * Appends a section: its title after a blank line, then one aligned line per row shown (two
     * columns for values before and after).
     * @param out the report being written
     * @param section the section
     * @param units the unit system its quantities are shown in
     */
    static void section(StringBuilder out, ReportSection section, UnitSystem units) {
        out.append('\n').append(section.title()).append('\n');
        // the "before" column is as wide as its longest value plus two spaces (16 at least), so
        // that a long phrase (a comfort reaction, a margin with its decibels) never runs into "after"
        int before = 16;
        for (ReportRow row : section.rows()) {
            if (row.shown() && row.shownValue() instanceof Pair p && p.kind() == PairKind.BEFORE_AFTER) {
                before = Math.max(before, ValueText.inline(p.first(), units).length() + 2);
            }
        }
        String pairLine = "  %-" + (LABEL - 2) + "s %-" + before + "s %s%n";
        boolean columns = false;
        for (ReportRow row : section.rows()) {
            if (!row.shown()) {
                continue;
            }
            String label = (row.symbol().isEmpty() ? row.label() : row.label() + " " + ValueText.ascii(row.symbol()))
                    + row.conventionSuffix();
            ReportValue value = row.shownValue();
            if (value instanceof ReportValue.Fields f && !f.text().isEmpty()) {
                // a step of a procedure: its number, then the sentence wrapped under it
                wrapped(out, "  " + row.label() + ". ", f.text());
            } else if (value instanceof Pair p && p.kind() == PairKind.BEFORE_AFTER) {
                if (!columns) {
                    out.append(String.format(Locale.ROOT, pairLine, "", "before", "after"));
                    columns = true;
                }
                out.append(String.format(Locale.ROOT, pairLine, label, ValueText.inline(p.first(), units),
                        ValueText.inline(p.second(), units)));
            } else {
                row(out, label, ValueText.inline(value, units));
            }
        }
    }

    /**
     * @param range tolerated frequency factors
     * @param power 1 for a frequency, 2 for a stiffness (proportional to frequency squared)
     * @return e.g. "-3.1 % to +2.7 %"
     * @see ValueText#tolerance
     */
    public static String tolerance(MistuningRange range, int power) {
        return ValueText.tolerance(range, power);
    }

    private static void row(StringBuilder out, String label, String value) {
        out.append(String.format(Locale.ROOT, "  %-" + (LABEL - 2) + "s %s%n", label, value));
    }

    /**
     * Appends the comparison of methods: a table with columns as wide as their widest cell, then
     * its sentences as bullets.
     * @param out the report being written
     * @param grid the comparison's table
     */
    static void comparison(StringBuilder out, ReportTable.Grid grid) {
        out.append('\n').append(grid.title()).append('\n');
        List<List<String>> rows = new ArrayList<>();
        rows.add(grid.headings().stream().map(ValueText::ascii).toList());
        rows.addAll(grid.cells());
        int[] widths = new int[grid.headings().size()];
        for (List<String> row : rows) {
            for (int i = 0; i < row.size(); i++) {
                widths[i] = Math.max(widths[i], row.get(i).length());
            }
        }
        for (List<String> row : rows) {
            StringBuilder line = new StringBuilder(" ");
            for (int i = 0; i < row.size(); i++) {
                // the method left-aligned, the figures right-aligned
                String f = i == 0 ? "%-" + widths[i] + "s" : "%" + widths[i] + "s";
                line.append(' ').append(String.format(Locale.ROOT, f, row.get(i))).append(i == 0 ? " " : "");
            }
            out.append(line.toString().stripTrailing()).append('\n');
        }
        for (String sentence : grid.sentences()) {
            bullet(out, sentence);
        }
    }

    static void bullet(StringBuilder out, String text) {
        wrapped(out, "  - ", text);
    }

    /** The text after its lead ("  - ", "  3. "), wrapped at 98 characters, continued under its first word. */
    private static void wrapped(StringBuilder out, String lead, String text) {
        StringBuilder line = new StringBuilder(lead);
        for (String word : text.split(" ")) {
            if (line.length() + word.length() > 98) {
                out.append(line.toString().stripTrailing()).append('\n');
                line = new StringBuilder(" ".repeat(lead.length()));
            }
            line.append(word).append(' ');
        }
        out.append(line.toString().stripTrailing()).append('\n');
    }
}
