package org.counterpoise.io.sheet;

import java.util.List;
import java.util.Map;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportTable;

/**
 * A run of the sheet's tables under one heading, printed before the design's own tables: the
 * table of several absorbers to build, and each absorber's own parts ({@link SheetWriter} lays it
 * out with the same tables, grids and steps as the design's sections).
 *
 * @param title the heading, on a fresh page; empty for none
 * @param sentences paragraphs under the heading
 * @param sections the tables, in order
 * @param grids the sections printed as grids, by their id (within this block)
 */
public record SheetBlock(String title, List<String> sentences, List<ReportTable.Section> sections,
        Map<SectionId, ReportTable.Grid> grids) {

    /** Immutable copies. */
    public SheetBlock {
        sentences = List.copyOf(sentences);
        sections = List.copyOf(sections);
        grids = Map.copyOf(grids);
    }
}
