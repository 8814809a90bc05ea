package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.io.text.ReportSection.SectionId;

/**
 * The one report model: what a design reports, in which sections, with which words, built once
 * from the core results ({@link DesignContent}) and rendered by the text report
 * ({@link DesignReport}), the JSON ({@code io.export.ResultJson}), the PDF sheet
 * ({@code io.sheet.SheetContent}) and the wizard's result table (all tables through
 * {@link ReportTable}). A quantity added here appears in all of them.
 *
 * @param name the project name
 * @param sections sections in print order
 * @param warnings the design's warnings, in words, with their stable codes
 * @param cautions the standing cautions
 * @param comparison the comparison of design methods, when one was computed
 * @param units the unit system every renderer shows the quantities in (the sections hold SI values;
 *     the warnings were worded in this system when the content was built)
 */
public record ReportContent(String name, List<ReportSection> sections, List<Note> warnings, List<String> cautions,
        Optional<ReportComparison> comparison, UnitSystem units) {

    /**
     * A report shown in SI.
     * @param name the project name
     * @param sections sections in print order
     * @param warnings the warnings
     * @param cautions the cautions
     * @param comparison the comparison of methods, when one was computed
     */
    public ReportContent(String name, List<ReportSection> sections, List<Note> warnings, List<String> cautions,
            Optional<ReportComparison> comparison) {
        this(name, sections, warnings, cautions, comparison, UnitSystem.SI);
    }

    /**
     * A report without a comparison of methods.
     * @param name the project name
     * @param sections sections in print order
     * @param warnings the warnings
     * @param cautions the cautions
     */
    public ReportContent(String name, List<ReportSection> sections, List<Note> warnings, List<String> cautions) {
        this(name, sections, warnings, cautions, Optional.empty());
    }

    /** Defensive copies. */
    public ReportContent {
        sections = List.copyOf(sections);
        warnings = List.copyOf(warnings);
        cautions = List.copyOf(cautions);
        comparison = comparison == null ? Optional.empty() : comparison;
        units = units == null ? UnitSystem.SI : units;
    }

    /**
     * @param system the unit system to show the quantities in
     * @return this report shown in it (warnings keep the words they were built with: build them in the
     *     same system with the {@code DesignContent.of} that takes the unit system)
     */
    public ReportContent in(UnitSystem system) {
        return new ReportContent(name, sections, warnings, cautions, comparison, system);
    }

    /**
     * @param c a comparison of methods
     * @return this report with it
     */
    public ReportContent with(ReportComparison c) {
        return new ReportContent(name, sections, warnings, cautions, Optional.of(c), units);
    }

    /**
     * @param display the amplitude convention the user picked
     * @return this report with every response value that follows the display convention stated in
     *     it (stroke and forces stay peaks, the response to white noise stays r.m.s.), and the row
     *     that names the convention saying so
     */
    public ReportContent shownIn(AmplitudeConvention display) {
        List<ReportSection> shown = new ArrayList<>();
        for (ReportSection s : sections) {
            List<ReportRow> rows = new ArrayList<>();
            for (ReportRow r : s.rows()) {
                rows.add(r.key() == ReportKey.AMPLITUDE_CONVENTION ? conventionRow(display) : r.shownIn(display));
            }
            shown.add(new ReportSection(s.id(), s.title(), rows));
        }
        return new ReportContent(name, shown, warnings, cautions, comparison, units);
    }

    /**
     * @param display the convention response values are shown in
     * @return the row that names it (the JSON's {@code amplitude_convention})
     */
    static ReportRow conventionRow(AmplitudeConvention display) {
        String how = switch (display) {
            case PEAK -> "peak (amplitude)";
            case RMS -> "r.m.s. (peak / sqrt 2 for a steady harmonic)";
            case PEAK_TO_PEAK -> "peak-to-peak (2 x peak for a steady harmonic)";
        };
        return new ReportRow(ReportKey.AMPLITUDE_CONVENTION, "response values stated as", "",
                new ReportValue.Words(how, List.of(display.id())), "chosen for display; stroke and forces stay peaks",
                "");
    }

    /**
     * @param id a section
     * @return the section, if the report has it
     */
    public Optional<ReportSection> section(SectionId id) {
        return sections.stream().filter(s -> s.id() == id).findFirst();
    }

    /**
     * @param key a row key
     * @return the row with that key, if the report has it
     */
    public Optional<ReportRow> row(ReportKey key) {
        return sections.stream().flatMap(s -> s.rows().stream()).filter(r -> r.key() == key).findFirst();
    }

    /**
     * A finding in words.
     * @param code its stable code
     * @param text the sentence
     */
    public record Note(String code, String text) {
    }
}
