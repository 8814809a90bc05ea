package org.counterpoise.io.sheet;

import java.util.List;
import org.knowm.xchart.XYChart;

/**
 * A page of the sheet beyond the design's own tables: a title, sentences, a table of text cells
 * (its first row the column heads) and charts. {@link SheetWriter} lays it out after the design's
 * charts; what it holds is decided by the class that builds it (the run-up page: {@link RunUpPanel}).
 *
 * @param title the page's heading
 * @param sentences paragraphs, printed before the table
 * @param table rows of cells, the first row the column heads; empty for none
 * @param charts charts printed after the table, each half a page
 */
public record SheetPanel(String title, List<String> sentences, List<List<String>> table, List<XYChart> charts) {

    /** Immutable copies. */
    public SheetPanel {
        sentences = List.copyOf(sentences);
        table = table.stream().map(List::copyOf).toList();
        charts = List.copyOf(charts);
    }
}
