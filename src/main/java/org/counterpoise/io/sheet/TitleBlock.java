package org.counterpoise.io.sheet;

import java.awt.Color;
import java.io.IOException;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.counterpoise.io.project.ProjectIdentity;

/**
 * The title block at the foot of every page: project, document number, revision and page in the
 * first row; client or site, engineer and date of issue in the second; the standing caution in
 * the third. Each cell has a small caption over its value; a value too long for its cell is cut
 * with an ellipsis (the full text is in the tables).
 */
final class TitleBlock {
    /** Bottom of the block, points from the page's foot. */
    static final float BOTTOM = 24f;
    /** Height of the block, points. */
    static final float HEIGHT = 56f;
    private static final float ROW = 21f;
    private static final float CAPTION = 6f;
    private static final float VALUE = 8.5f;
    private static final Color INK = Color.BLACK;
    private static final Color CAPTION_INK = new Color(0x40, 0x40, 0x40);

    private TitleBlock() {
    }

    /**
     * @param stream the page's content stream (appending)
     * @param type the sheet's type
     * @param content the sheet's content (project, revision, date, identity)
     * @param page this page, from 1
     * @param pages the number of pages
     * @throws IOException when the stream cannot be written
     */
    static void draw(PDPageContentStream stream, SheetType type, SheetContent content, int page, int pages)
            throws IOException {
        float left = SheetWriter.MARGIN;
        float width = SheetWriter.WIDTH - 2 * SheetWriter.MARGIN;
        float top = BOTTOM + HEIGHT;
        ProjectIdentity id = content.identity();
        stream.setStrokingColor(INK);
        stream.setLineWidth(0.8f);
        stream.addRect(left, BOTTOM, width, HEIGHT);
        stream.stroke();
        float[] first = {0.50f, 0.26f, 0.11f, 0.13f};
        float[] second = {0.50f, 0.26f, 0.24f};
        row(stream, type, left, top, width, first, new String[][] {
            {"project", content.projectName()},
            {"document no.", orDash(id.documentNumber())},
            {"revision", content.revision()},
            {"page", page + " of " + pages}});
        row(stream, type, left, top - ROW, width, second, new String[][] {
            {"client / site", orDash(id.client())},
            {"engineer", orDash(id.engineer())},
            {"date of issue", content.date()}});
        stream.setLineWidth(0.5f);
        stream.moveTo(left, top - 2 * ROW);
        stream.lineTo(left + width, top - 2 * ROW);
        stream.stroke();
        String caution = "Counterpoise absorber sheet. Preliminary design aid: verify by measurement; local codes and"
                + " licensed engineering practice govern.";
        type.show(stream, type.fit(caution, width - 8, 6.5f), left + 4, BOTTOM + 4.5f, 6.5f, CAPTION_INK, false);
    }

    private static void row(PDPageContentStream stream, SheetType type, float left, float top, float width,
            float[] shares, String[][] cells) throws IOException {
        float x = left;
        stream.setLineWidth(0.5f);
        stream.moveTo(left, top - ROW);
        stream.lineTo(left + width, top - ROW);
        stream.stroke();
        for (int i = 0; i < cells.length; i++) {
            float w = shares[i] * width;
            if (i > 0) {
                stream.moveTo(x, top);
                stream.lineTo(x, top - ROW);
                stream.stroke();
            }
            type.show(stream, cells[i][0], x + 4, top - 7.5f, CAPTION, CAPTION_INK, false);
            type.show(stream, type.fit(cells[i][1], w - 8, VALUE), x + 4, top - 17.5f, VALUE, INK, i == 0);
            x += w;
        }
    }

    private static String orDash(String text) {
        return text.isBlank() ? "\u2013" : text;
    }
}
