package org.counterpoise.io.sheet;

import java.io.IOException;
import java.util.List;
import org.counterpoise.io.text.ValueText;

/** Lays out a {@link SheetPanel} with the {@link SheetWriter}'s type, rules and chart drawing. */
final class SheetPanels {
    private SheetPanels() {
    }

    /**
     * @param w the writer, on a fresh page
     * @param panel the page's content
     * @throws IOException when the PDF cannot be written
     */
    static void draw(SheetWriter w, SheetPanel panel) throws IOException {
        w.title(panel.title());
        for (String sentence : panel.sentences()) {
            w.paragraph(sentence);
        }
        if (!panel.table().isEmpty()) {
            float left = SheetWriter.MARGIN;
            float[] lefts = {left, left + 0.36f * (SheetWriter.WIDTH - 2 * SheetWriter.MARGIN), left + 0.68f * (SheetWriter.WIDTH - 2 * SheetWriter.MARGIN)};
            boolean head = true;
            for (List<String> row : panel.table()) {
                // a blank row ends a block; the row after it heads the next block
                w.cells(row.stream().map(ValueText::pretty).toList(), lefts, head);
                head = row.stream().allMatch(String::isEmpty);
            }
        }
        w.charts(panel.charts());
    }
}
