package org.counterpoise.io.sheet;

import java.awt.Color;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.apache.pdfbox.pdmodel.graphics.state.RenderingMode;

/**
 * The sheet's type: Liberation Sans (shipped inside PDFBox), embedded as a subset so that Greek
 * letters and subscripts print, measured and shown without PDFBox's glyph substitution. Widths
 * come from a per-character cache; a character the font cannot show becomes '?', so a name in any
 * script never breaks the sheet.
 */
final class SheetType {
    private static final String FONT_RESOURCE = "/org/apache/pdfbox/resources/ttf/LiberationSans-Regular.ttf";

    private final PDType0Font font;
    private final Map<Integer, Boolean> printable = new HashMap<>();
    private final Map<Integer, Float> advances = new HashMap<>();

    /**
     * @param document the document the font is embedded in
     * @throws IOException when the font cannot be read
     */
    SheetType(PDDocument document) throws IOException {
        try (InputStream in = SheetType.class.getResourceAsStream(FONT_RESOURCE)) {
            if (in == null) {
                throw new IOException("the sheet font " + FONT_RESOURCE + " is missing from the PDFBox library");
            }
            TrueTypeFont ttf = new TTFParser().parse(new RandomAccessReadBuffer(in));
            // No glyph substitution: the sheet needs no ligatures, and PDFBox's substitution for
            // Latin text compiles regular expressions for every string shown (most of the sheet's
            // writing time before, docs/performance.md).
            ttf.setEnableGsub(false);
            this.font = PDType0Font.load(document, ttf, true);
        }
    }

    /**
     * @param text any text
     * @param size font size, points
     * @return its width, points
     * @throws IOException when the font cannot be read
     */
    float width(String text, float size) throws IOException {
        // per character from a cache: PDFBox's string width encodes and decodes the whole string
        // through the font's CMap on every call, and wrapping measures each line word by word
        float units = 0;
        String clean = clean(text);
        for (int i = 0; i < clean.length(); ) {
            int cp = clean.codePointAt(i);
            Float advance = advances.get(cp);
            if (advance == null) {
                advance = font.getStringWidth(new String(Character.toChars(cp)));
                advances.put(cp, advance);
            }
            units += advance;
            i += Character.charCount(cp);
        }
        return units / 1000f * size;
    }

    /**
     * Shows one line of text.
     * @param stream the page's content stream
     * @param text the text (unprintable characters become '?')
     * @param x left, points
     * @param y baseline, points
     * @param size font size, points
     * @param color ink
     * @param bold true for the semi-bold of headings
     * @throws IOException when the stream cannot be written
     */
    void show(PDPageContentStream stream, String text, float x, float y, float size, Color color, boolean bold)
            throws IOException {
        stream.beginText();
        stream.setFont(font, size);
        stream.setNonStrokingColor(color);
        if (bold) {
            // Liberation Sans ships in regular weight only: a thin outline makes it semi-bold.
            stream.setRenderingMode(RenderingMode.FILL_STROKE);
            stream.setStrokingColor(color);
            stream.setLineWidth(size * 0.035f);
        } else {
            stream.setRenderingMode(RenderingMode.FILL);
        }
        stream.newLineAtOffset(x, y);
        stream.showText(clean(text));
        stream.endText();
    }

    /**
     * @param text a paragraph
     * @param maxWidth the width of a line, points
     * @param size font size, points
     * @return its lines, broken at spaces (a word longer than a line stands alone)
     * @throws IOException when the font cannot be read
     */
    List<String> wrap(String text, float maxWidth, float size) throws IOException {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        float lineWidth = 0;
        float space = width(" ", size);
        for (String word : clean(text).split(" ")) {
            float w = width(word, size);
            if (line.length() > 0 && lineWidth + space + w > maxWidth) {
                lines.add(line.toString());
                line.setLength(0);
                lineWidth = 0;
            }
            if (line.length() > 0) {
                line.append(' ');
                lineWidth += space;
            }
            line.append(word);
            lineWidth += w;
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }

    /**
     * @param text a line
     * @param maxWidth the room, points
     * @param size font size, points
     * @return the line, cut with an ellipsis when it is wider than the room
     * @throws IOException when the font cannot be read
     */
    String fit(String text, float maxWidth, float size) throws IOException {
        String clean = clean(text);
        if (width(clean, size) <= maxWidth) {
            return clean;
        }
        int end = clean.length();
        while (end > 0 && width(clean.substring(0, end) + "\u2026", size) > maxWidth) {
            end = clean.offsetByCodePoints(end, -1);
        }
        return clean.substring(0, end) + "\u2026";
    }

    /**
     * @param text any text
     * @return the text with every character the font cannot show replaced by '?'
     */
    String clean(String text) {
        StringBuilder out = null;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            int n = Character.charCount(cp);
            boolean ok = printable.computeIfAbsent(cp, this::encodable);
            if (!ok && out == null) {
                out = new StringBuilder(text.length()).append(text, 0, i);
            }
            if (out != null) {
                if (ok) {
                    out.appendCodePoint(cp);
                } else {
                    out.append('?');
                }
            }
            i += n;
        }
        return out == null ? text : out.toString();
    }

    private boolean encodable(int cp) {
        if (Character.isISOControl(cp)) {
            return false;
        }
        try {
            font.encode(new String(Character.toChars(cp)));
            return true;
        } catch (IllegalArgumentException | IOException e) {
            return false;
        }
    }
}
