package org.counterpoise.io.sheet;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.SetAbsorberHardware;
import org.counterpoise.io.text.AbsorbersToBuildContent;
import org.counterpoise.io.text.ReportContent;
import org.counterpoise.io.text.ReportSection;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.io.text.WarningText;

/**
 * The sheet's pages of several absorbers ({@link AbsorbersToBuild}): the table of every absorber to
 * build, then each absorber's own parts, realised from its own design by the same {@link Realiser}
 * as any design; and the marks on the sections that still describe one absorber of the total mass.
 *
 * @param blocks the table's block, then one block per absorber
 * @param warnings what each absorber's hardware checks found, each naming its absorber
 */
record SeveralAbsorbersSheet(List<SheetBlock> blocks, List<String> warnings) {

    /** The sections of the design's report that describe one absorber of the total mass. */
    private static final Set<SectionId> SINGLE = EnumSet.of(SectionId.ACCEPTANCE, SectionId.DESIGN,
            SectionId.ABSORBER, SectionId.RESPONSE, SectionId.RMS, SectionId.STROKE_AND_FORCES, SectionId.TOLERANCE,
            SectionId.ALTERNATIVE, SectionId.MONTE_CARLO, SectionId.PART_LIST, SectionId.CHECKS,
            SectionId.PART_TOLERANCES, SectionId.TRIM, SectionId.PROCEDURE, SectionId.PREDICTED);

    SeveralAbsorbersSheet {
        blocks = List.copyOf(blocks);
        warnings = List.copyOf(warnings);
    }

    /**
     * @param b the absorbers to build
     * @param hardware the project's hardware choices
     * @param units the unit system
     * @return the blocks and warnings
     */
    static SeveralAbsorbersSheet of(AbsorbersToBuild b, HardwareChoice hardware, UnitSystem units) {
        List<SheetBlock> blocks = new ArrayList<>();
        ReportSection table = AbsorbersToBuildContent.table(b);
        ReportTable.Grid grid = ReportTable.grid(table, units).orElseThrow();
        blocks.add(new SheetBlock("", List.of(), List.of(tabled(table, units)), Map.of(table.id(),
                new ReportTable.Grid(grid.title(), grid.headings(), grid.cells(), grid.recommended(), grid.chosen(),
                        AbsorbersToBuildContent.sentences(b)))));
        List<String> warnings = new ArrayList<>();
        for (int j = 0; j < b.absorbers().size(); j++) {
            Sized sized = realisation(b.absorbers().get(j), hardware);
            Optional<Realisation> realisation = sized.realisation();
            int number = j + 1;
            realisation.ifPresent(r -> r.warnings().forEach(w -> warnings.add("Absorber " + number + ": "
                    + WarningText.of(w, units))));
            AbsorbersToBuildContent.Absorber own = AbsorbersToBuildContent.absorber(b, j, realisation, sized.whyNot(),
                    units);
            List<ReportTable.Section> sections = new ArrayList<>();
            Map<SectionId, ReportTable.Grid> grids = new EnumMap<>(SectionId.class);
            for (ReportSection s : own.sections()) {
                sections.add(tabled(s, units));
                ReportTable.grid(s, units).ifPresent(g -> grids.put(s.id(), g));
            }
            blocks.add(new SheetBlock(own.title(), own.sentences(), sections, grids));
        }
        return new SeveralAbsorbersSheet(blocks, warnings);
    }

    /**
     * @param report the design's report
     * @return the report with the sections of one absorber of the total mass saying so in their title
     */
    static ReportContent marked(ReportContent report) {
        // "Absorber to build" is not one to build here: the absorbers to build are listed first
        List<ReportSection> sections = report.sections().stream().map(s -> SINGLE.contains(s.id())
                ? new ReportSection(s.id(), (s.id() == SectionId.ABSORBER ? "Absorber" : s.title())
                        + AbsorbersToBuildContent.SINGLE_MARK, s.rows()) : s).toList();
        return new ReportContent(report.name(), sections, report.warnings(), report.cautions(), report.comparison(),
                report.units());
    }

    private static ReportTable.Section tabled(ReportSection s, UnitSystem units) {
        ReportContent one = new ReportContent("", List.of(s), List.of(), List.of(), Optional.empty(), units);
        return ReportTable.of(one, Set.of()).get(0);
    }

    /** An absorber's hardware, or why it has none (a sentence for its page). */
    private record Sized(Optional<Realisation> realisation, String whyNot) {
    }

    /**
     * Its hardware, or none when it cannot be sized for this absorber. An elastomer element is not sized
     * for an absorber of a set: the element's own optimum (of the absorber alone on the mode) would
     * replace the tuning the set needs.
     */
    private static Sized realisation(AbsorbersToBuild.Built built, HardwareChoice hardware) {
        SetAbsorberHardware h = SetAbsorberHardware.of(built, hardware);
        return new Sized(h.realisation(), switch (h.notSized()) {
            case NONE -> "";
            case ELASTOMER_IN_SET -> "An elastomer element is not sized for an absorber of a set: its own optimum"
                    + " tuning, that of the absorber alone, would replace the tuning the set needs. Choose helical"
                    + " springs and a damper for a set.";
            case UNREALISABLE -> "Its hardware could not be sized with the project's hardware choices: "
                    + h.failure().orElseThrow().getMessage();
        });
    }
}
