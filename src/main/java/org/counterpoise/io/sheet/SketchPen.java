package org.counterpoise.io.sheet;

import java.awt.Color;
import java.io.IOException;
import org.apache.pdfbox.pdmodel.PDPageContentStream;

/**
 * Draws the arrangement sketch's symbols as PDF vector paths in a frame that follows the
 * absorber's axis: {@code a} runs along the axis of motion away from the structure's face, and
 * {@code b} across it. A vertical frame puts the axis up the page, a horizontal one to the right;
 * text always stays upright. Black lines of a few widths only, so the sketch prints in black and white.
 */
final class SketchPen {
    /** Outline of a part, points. */
    static final float HEAVY = 1.1f;
    /** Symbols and hatching, points. */
    static final float THIN = 0.5f;
    private static final Color INK = Color.BLACK;

    private final PDPageContentStream stream;
    private final SheetType type;
    private final boolean vertical;
    private final float originX;
    private final float originY;

    /**
     * @param stream the page's content stream
     * @param type the sheet's type, for labels
     * @param vertical true: the axis runs up the page; false: to the right
     * @param originX page x of a = 0, b = 0
     * @param originY page y of a = 0, b = 0
     */
    SketchPen(PDPageContentStream stream, SheetType type, boolean vertical, float originX, float originY) {
        this.stream = stream;
        this.type = type;
        this.vertical = vertical;
        this.originX = originX;
        this.originY = originY;
    }

    float x(float a, float b) {
        return vertical ? originX + b : originX + a;
    }

    float y(float a, float b) {
        return vertical ? originY + a : originY - b;
    }

    void line(float a1, float b1, float a2, float b2, float width) throws IOException {
        stream.setStrokingColor(INK);
        stream.setLineWidth(width);
        stream.moveTo(x(a1, b1), y(a1, b1));
        stream.lineTo(x(a2, b2), y(a2, b2));
        stream.stroke();
    }

    /** A rectangle between two corners, outlined, optionally filled white first (to hide what is behind). */
    void box(float a1, float b1, float a2, float b2, float width, boolean white) throws IOException {
        float left = Math.min(x(a1, b1), x(a2, b2));
        float bottom = Math.min(y(a1, b1), y(a2, b2));
        float w = Math.abs(x(a2, b2) - x(a1, b1));
        float h = Math.abs(y(a2, b2) - y(a1, b1));
        if (white) {
            stream.setNonStrokingColor(Color.WHITE);
            stream.addRect(left, bottom, w, h);
            stream.fill();
        }
        stream.setStrokingColor(INK);
        stream.setLineWidth(width);
        stream.addRect(left, bottom, w, h);
        stream.stroke();
    }

    /** Diagonal hatching inside a rectangle (a section through the structure, a stop pad, rubber). */
    void hatch(float a1, float b1, float a2, float b2, float pitch) throws IOException {
        float left = Math.min(x(a1, b1), x(a2, b2));
        float right = Math.max(x(a1, b1), x(a2, b2));
        float bottom = Math.min(y(a1, b1), y(a2, b2));
        float top = Math.max(y(a1, b1), y(a2, b2));
        stream.setStrokingColor(INK);
        stream.setLineWidth(THIN * 0.8f);
        float h = top - bottom;
        for (float s = left - h; s < right; s += pitch) {
            // the segment x - y = s - bottom, clipped to the rectangle by hand
            float x1 = Math.max(s, left);
            float y1 = bottom + (x1 - s);
            float x2 = Math.min(s + h, right);
            float y2 = bottom + (x2 - s);
            if (x2 > x1) {
                stream.moveTo(x1, y1);
                stream.lineTo(x2, y2);
            }
        }
        stream.stroke();
    }

    /** A zig-zag spring symbol from a1 to a2 on the line b, with straight end leads. */
    void spring(float a1, float a2, float b, float halfWidth, int zigs) throws IOException {
        float lead = Math.min(8f, (a2 - a1) * 0.12f);
        float start = a1 + lead;
        float end = a2 - lead;
        float step = (end - start) / (2 * zigs);
        stream.setStrokingColor(INK);
        stream.setLineWidth(THIN * 1.6f);
        stream.moveTo(x(a1, b), y(a1, b));
        stream.lineTo(x(start, b), y(start, b));
        for (int i = 0; i < 2 * zigs; i++) {
            float a = start + (i + 0.5f) * step;
            float side = i % 2 == 0 ? halfWidth : -halfWidth;
            stream.lineTo(x(a, b + side), y(a, b + side));
        }
        stream.lineTo(x(end, b), y(end, b));
        stream.lineTo(x(a2, b), y(a2, b));
        stream.stroke();
    }

    /** An arrowhead at (a, b) pointing along +a (forward) or -a, or across when {@code across}. */
    void arrowHead(float a, float b, boolean forward, boolean across) throws IOException {
        float len = 5f;
        float half = 1.8f;
        float sign = forward ? -1f : 1f;
        float[] p1 = across ? new float[] {a - half, b + sign * len} : new float[] {a + sign * len, b - half};
        float[] p2 = across ? new float[] {a + half, b + sign * len} : new float[] {a + sign * len, b + half};
        stream.setNonStrokingColor(INK);
        stream.moveTo(x(a, b), y(a, b));
        stream.lineTo(x(p1[0], p1[1]), y(p1[0], p1[1]));
        stream.lineTo(x(p2[0], p2[1]), y(p2[0], p2[1]));
        stream.closePath();
        stream.fill();
    }

    /**
     * A dimension along the axis from a1 to a2 at the offset b, with extension lines from the
     * parts at bFrom, arrowheads and its value beside it.
     * @param labelBefore true to put the value on the smaller-b side of the line (vertical frame: left)
     */
    void dimension(float a1, float a2, float b, float bFrom, String label, boolean labelBefore)
            throws IOException {
        float ext = b > bFrom ? 3f : -3f;
        line(a1, bFrom, a1, b + ext, THIN * 0.7f);
        line(a2, bFrom, a2, b + ext, THIN * 0.7f);
        line(a1, b, a2, b, THIN * 0.8f);
        arrowHead(a1, b, false, false);
        arrowHead(a2, b, true, false);
        float size = 7.5f;
        float mid = (a1 + a2) / 2;
        float w = type.width(label, size);
        float px = x(mid, b);
        float py = y(mid, b);
        if (vertical) {
            text(label, labelBefore ? px - 4 - w : px + 4, py - size / 3, size);
        } else {
            text(label, px - w / 2, labelBefore ? py + 3 : py - size - 2, size);
        }
    }

    /** Text at a page position (left, baseline), upright. */
    void text(String label, float left, float baseline, float size) throws IOException {
        type.show(stream, label, left, baseline, size, INK, false);
    }

    /** Text centred on the frame point (a, b). */
    void label(String label, float a, float b, float size) throws IOException {
        float w = type.width(label, size);
        text(label, x(a, b) - w / 2, y(a, b) - size / 3, size);
    }

    float width(String label, float size) throws IOException {
        return type.width(label, size);
    }

    boolean vertical() {
        return vertical;
    }
}
