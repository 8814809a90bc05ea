package org.counterpoise.io.sheet;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.MethodComparison;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.robust.MonteCarloOutcome;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.io.project.MeasuredSource;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.text.AbsorbersToBuildContent;
import org.counterpoise.io.text.ComparisonContent;
import org.counterpoise.io.text.DesignContent;
import org.counterpoise.io.text.HardwareContent;
import org.counterpoise.io.text.MeasuredSourceContent;
import org.counterpoise.io.text.ReportContent;
import org.counterpoise.io.text.ReportKey;
import org.counterpoise.io.text.ReportSection;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.SeveralAbsorbersContent;
import org.counterpoise.io.text.UnitSystem;

/**
 * Everything the parameter sheet prints, as text: the design's {@link ReportContent} as tables
 * ({@link ReportTable}), so that the numbers and words on the sheet are those of the text report,
 * the JSON and the wizard, plus what only the sheet carries (notes, date, revision, the model's
 * assumptions). Kept apart from the PDF layout so that it can be tested without a PDF.
 *
 * @param projectName project name
 * @param notes the project's notes (who, what, whether the data are invented), may be empty
 * @param date date of issue (ISO)
 * @param revision revision mark
 * @param sections tables of label, value and unit
 * @param assumptions the model's assumptions, one sentence each
 * @param warnings the design's warnings
 * @param cautions the standard cautions
 * @param comparison the comparison of design methods as a table, when one was computed
 * @param identity the project's identity (document number, client, engineer, revisions, sign-off)
 *     for the title block, the revision history and the sign-off
 * @param sketch what the arrangement sketch draws, when there is a design to draw
 * @param grids the sections whose rows are records of the same fields (the checks, the predicted
 *     response), as tables printed in their place
 * @param toBuild for several absorbers: the table of every absorber to build and each one's own parts,
 *     printed first; empty otherwise
 * @param singleMark what the titles of the sections, the sketch and the charts that still describe one
 *     absorber of the total mass add to say so; empty when the design is the absorber to build
 */
public record SheetContent(String projectName, String notes, String date, String revision, List<ReportTable.Section> sections,
        List<String> assumptions, List<String> warnings, List<String> cautions, Optional<ReportTable.Grid> comparison,
        ProjectIdentity identity, Optional<SketchFigures> sketch, Map<SectionId, ReportTable.Grid> grids,
        List<SheetBlock> toBuild, String singleMark) {

    /** Immutable copies. */
    public SheetContent {
        sections = List.copyOf(sections);
        grids = Map.copyOf(grids);
        toBuild = List.copyOf(toBuild);
    }

    /** The assumptions printed on every sheet. */
    public static final List<String> ASSUMPTIONS = List.of(
            "The structure is represented by one mode: its modal mass, stiffness and viscous damping, seen at the"
                    + " absorber point through the mode-shape value there.",
            "The absorber is a rigid mass on a linear spring and a linear viscous damper acting along the"
                    + " direction of the mode.",
            "The disturbance is harmonic and steady; responses are steady-state amplitudes. Start-up, run-down"
                    + " and shock transients are not analysed (see the run-up stroke and the cautions).",
            "Response figures are exact for this model (peaks from polynomial roots); they are only as good as"
                    + " the measured or estimated structure data.");

    /**
     * @param r the design result
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @return the sheet content
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision) {
        return of(r, notes, date, revision, null);
    }

    /**
     * @param r the design result
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param monteCarlo a tolerance Monte Carlo of the design, or null when none was run
     * @return the sheet content
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision,
            MonteCarloResult monteCarlo) {
        return of(r, notes, date, revision, monteCarlo, ProjectIdentity.EMPTY);
    }

    /**
     * @param r the design result
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param monteCarlo a tolerance Monte Carlo of the design, or null when none was run
     * @param identity the project's engineer and client or site, printed first when given (its
     *     revision and date are the caller's to pass as {@code revision} and {@code date})
     * @return the sheet content
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision,
            MonteCarloResult monteCarlo, ProjectIdentity identity) {
        return of(r, notes, date, revision, monteCarlo == null ? Optional.empty() : Optional.of(monteCarlo), identity);
    }

    /**
     * @param r the design result
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param monteCarlo the design's tolerance Monte Carlo, or why it was not run
     * @param identity the project's engineer and client or site
     * @return the sheet content
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision,
            MonteCarloOutcome monteCarlo, ProjectIdentity identity) {
        return of(DesignContent.of(r, identity, monteCarlo), notes, date, revision, identity,
                SketchFigures.of(r, Optional.empty(), UnitSystem.SI));
    }

    private static SheetContent of(DesignResult r, String notes, String date, String revision,
            Optional<MonteCarloResult> monteCarlo, ProjectIdentity identity) {
        return of(DesignContent.of(r, identity, monteCarlo), notes, date, revision, identity,
                SketchFigures.of(r, Optional.empty(), UnitSystem.SI));
    }

    private static SheetContent of(ReportContent report, String notes, String date, String revision,
            ProjectIdentity identity, SketchFigures sketch) {
        return of(report, notes, date, revision, identity, sketch, List.of(), List.of(), "");
    }

    private static SheetContent of(ReportContent report, String notes, String date, String revision,
            ProjectIdentity identity, SketchFigures sketch, List<SheetBlock> toBuild, List<String> moreWarnings,
            String singleMark) {
        // The header prints the date and revision of issue.
        List<ReportTable.Section> sections = ReportTable.of(report, Set.of(ReportKey.REVISION, ReportKey.DATE));
        List<String> warnings = new ArrayList<>(report.warnings().stream().map(ReportContent.Note::text).toList());
        warnings.addAll(moreWarnings);
        Map<SectionId, ReportTable.Grid> grids = new EnumMap<>(SectionId.class);
        for (ReportSection section : report.sections()) {
            ReportTable.grid(section, report.units()).ifPresent(g -> grids.put(section.id(), g));
        }
        Optional<ReportTable.Grid> comparison = report.comparison().map(c -> ReportTable.comparison(c, report.units()))
                .map(g -> new ReportTable.Grid(g.title() + singleMark, g.headings(), g.cells(), g.recommended(),
                        g.chosen(), g.sentences()));
        return new SheetContent(report.name(), notes, date, revision, sections, ASSUMPTIONS, warnings,
                report.cautions(), comparison, identity, Optional.of(sketch), grids, toBuild, singleMark);
    }

    /**
     * @param r the design result
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param monteCarlo the design's tolerance Monte Carlo, or why it was not run
     * @param identity the project's engineer and client or site
     * @param comparison the comparison of design methods for the design's study
     * @return the sheet content with the comparison's table
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision,
            MonteCarloOutcome monteCarlo, ProjectIdentity identity, MethodComparison comparison) {
        return of(r, notes, date, revision, monteCarlo, identity, comparison, AmplitudeConvention.PEAK);
    }

    /**
     * @param r the design result
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param monteCarlo the design's tolerance Monte Carlo, or why it was not run
     * @param identity the project's engineer and client or site
     * @param comparison the comparison of design methods for the design's study
     * @param convention the convention response values are stated in
     * @return the sheet content with the comparison's table
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision,
            MonteCarloOutcome monteCarlo, ProjectIdentity identity, MethodComparison comparison,
            AmplitudeConvention convention) {
        return of(r, notes, date, revision, monteCarlo, identity, comparison, convention, Optional.empty(),
                UnitSystem.SI, null);
    }

    /**
     * @param r the design result
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param monteCarlo the design's tolerance Monte Carlo, or why it was not run
     * @param identity the project's identity
     * @param comparison the comparison of design methods for the design's study
     * @param convention the convention response values are stated in
     * @param realisation the design's hardware, when made
     * @param units the unit system of the tables, the warnings and the sketch's dimensions
     * @param measured where the structure's data came from when measured, or null when typed
     * @return the sheet content with the comparison's table and the arrangement sketch
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision,
            MonteCarloOutcome monteCarlo, ProjectIdentity identity, MethodComparison comparison,
            AmplitudeConvention convention, Optional<Realisation> realisation, UnitSystem units,
            MeasuredSource measured) {
        return of(report(r, monteCarlo, identity, comparison, realisation, units, measured).shownIn(convention), notes,
                date, revision, identity, SketchFigures.of(r, realisation, units));
    }

    /**
     * The sheet of a project with several modes or absorbers: the design's sheet with the section on
     * the whole structure, and for several absorbers first every absorber to build with its own
     * parts; the sections, sketch and charts of one absorber of the total mass say so in their title.
     *
     * @param r the design result (the target mode at the absorbers' point, one absorber of the total mass)
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param monteCarlo the design's tolerance Monte Carlo, or why it was not run
     * @param identity the project's identity
     * @param comparison the comparison of design methods for the design's study
     * @param convention the convention response values are stated in
     * @param realisation the design's hardware, when made
     * @param units the unit system
     * @param measured where the structure's data came from when measured, or null when typed
     * @param several the several absorbers designed for the same project
     * @param hardware the project's hardware choices (each absorber's parts)
     * @return the sheet content
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision,
            MonteCarloOutcome monteCarlo, ProjectIdentity identity, MethodComparison comparison,
            AmplitudeConvention convention, Optional<Realisation> realisation, UnitSystem units,
            MeasuredSource measured, SeveralAbsorbers several, HardwareChoice hardware) {
        // the criterion is judged on the whole structure with every absorber, not on the target mode alone
        DesignResult judged = several.judged(r);
        ReportContent report = SeveralAbsorbersContent.with(report(judged, monteCarlo, identity, comparison,
                realisation, units, measured), several);
        SketchFigures sketch = SketchFigures.of(r, realisation, units);
        if (several.absorbers().size() == 1) {
            return of(report.shownIn(convention), notes, date, revision, identity, sketch);
        }
        SeveralAbsorbersSheet build = SeveralAbsorbersSheet.of(AbsorbersToBuild.of(r, several), hardware, units);
        return of(SeveralAbsorbersSheet.marked(report).shownIn(convention), notes, date, revision, identity, sketch,
                build.blocks(), build.warnings(), AbsorbersToBuildContent.SINGLE_MARK);
    }

    private static ReportContent report(DesignResult r, MonteCarloOutcome monteCarlo, ProjectIdentity identity,
            MethodComparison comparison, Optional<Realisation> realisation, UnitSystem units, MeasuredSource measured) {
        ReportContent report = MeasuredSourceContent.with(DesignContent.of(r, identity, monteCarlo, units)
                .with(ComparisonContent.of(comparison, r.study())), measured);
        return realisation.map(value -> HardwareContent.with(report, value, r)).orElse(report);
    }
}
