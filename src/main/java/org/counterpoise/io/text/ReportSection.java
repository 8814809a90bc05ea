package org.counterpoise.io.text;

import java.util.List;
import java.util.Optional;

/**
 * A section of the report.
 *
 * @param id which section, so renderers order and choose sections by type, never by title
 * @param title heading
 * @param rows rows in order
 */
public record ReportSection(SectionId id, String title, List<ReportRow> rows) {

    /** Defensive copy. */
    public ReportSection {
        rows = List.copyOf(rows);
    }

    /**
     * @param key a row key
     * @return the row with that key, if this section has it
     */
    public Optional<ReportRow> row(ReportKey key) {
        return rows.stream().filter(r -> r.key() == key).findFirst();
    }

    /** The sections a report can have, in the order the text report and the sheet print them. */
    public enum SectionId {
        /** revision, date, engineer, client or site */
        PROJECT,
        /** the verdict against the project's criterion, first so that "no absorber is needed" comes first */
        ACCEPTANCE,
        /** the structure's effective values at the absorber point */
        STRUCTURE,
        /** the disturbance */
        DISTURBANCE,
        /** the method and the non-dimensional design */
        DESIGN,
        /** the absorber to build */
        ABSORBER,
        /** harmonic peaks without and with the absorber */
        RESPONSE,
        /** root-mean-square responses to a white-noise disturbance */
        RMS,
        /** absorber stroke and forces */
        STROKE_AND_FORCES,
        /** several absorbers, several modes: each absorber, the whole structure's peaks, the gain of the split */
        SEVERAL_ABSORBERS,
        /** how far structure and absorber may be mistuned */
        TOLERANCE,
        /** a change of the structure that would do as well */
        ALTERNATIVE,
        /** the tolerance Monte Carlo of the peak in band */
        MONTE_CARLO,
        /** the parts that realise the design: spring or elastomer element, damper, mass */
        PART_LIST,
        /** the checks of the parts, one row per check (a grid: {@link ReportTable#grid}) */
        CHECKS,
        /** the tolerance each part must be made to */
        PART_TOLERANCES,
        /** the trim plates that adjust the absorber on site */
        TRIM,
        /** the tuning and commissioning procedure, one numbered step per row */
        PROCEDURE,
        /** the predicted response a technician compares readings against (a grid) */
        PREDICTED,
        /** what a robustness study examines: the design, the response, the expected mistuning */
        ROBUSTNESS_STUDY,
        /** the worst case of the design, and the robust design at the same mass */
        WORST_CASE
    }
}
