package org.counterpoise.io.sheet;

import java.awt.Color;
import java.io.IOException;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.SpringKind;

/**
 * The arrangement sketch: the structure's face (hatched), the spring or springs (zig-zag, up to
 * four drawn, the count written when there are more) or the elastomer element (hatched block),
 * the damper (a dashpot, a plate in a magnet gap, or the elastomer itself), the absorber mass with
 * its trim plates, the stroke stops on both sides with the clearance, and the dimensions that
 * matter (clearance, spring free and installed length) in display units; a legend under it gives
 * every symbol's figures. It stands on the structure when the absorber hangs on its spring and
 * lies on its side otherwise. Schematic: the proportions are not to scale, the figures are.
 */
final class ArrangementSketch {
    private static final float INSTALLED = 100f;
    private static final float MASS_HEIGHT = 44f;
    private static final float MASS_HALF = 70f;
    private static final float PLATE = 4f;
    private static final int MOST_PLATES_DRAWN = 6;
    private static final float GAP = 8f;
    /** Drawn length of the far springs of opposed pairs, points. */
    private static final float OPPOSED = 64f;
    private static final float PAD = 6f;
    private static final float POST = MASS_HALF + 16f;
    private static final float DIMENSION = POST + 18f;
    private static final float LEGEND_SIZE = 8.5f;
    private static final float LEGEND_LINE = 11.5f;
    private static final float LABEL = 8f;
    private static final float SYMBOL_COLUMN = 34f;

    private ArrangementSketch() {
    }

    /**
     * @param stream the page's content stream
     * @param type the sheet's type
     * @param f what to draw
     * @param left the block's left edge, points
     * @param top the block's top edge, points
     * @param width the block's width, points
     * @throws IOException when the stream cannot be written
     */
    static void draw(PDPageContentStream stream, SheetType type, SketchFigures f, float left, float top, float width)
            throws IOException {
        float legendTop = top - drawingHeight(f);
        SketchPen pen = f.vertical()
                ? new SketchPen(stream, type, true, left + width * 0.42f, legendTop + 30f)
                : new SketchPen(stream, type, false, left + width * 0.5f - 90f, legendTop + 24f + DIMENSION);
        structure(pen);
        float springEnd = INSTALLED;
        if (f.springKind() == SpringKind.ELASTOMER) {
            pen.box(0, -40, springEnd, 40, SketchPen.HEAVY, true);
            pen.hatch(0, -40, springEnd, 40, 5f);
            sideLabel(pen, "k, c", springEnd * 0.5f, -40f);
        } else {
            springs(pen, f.opposed() ? f.springCount() / 2 : f.springCount(), springEnd, 0);
            damper(pen, f.damperKind(), springEnd);
        }
        float massTop = springEnd + MASS_HEIGHT;
        pen.box(springEnd, -MASS_HALF, massTop, MASS_HALF, SketchPen.HEAVY * 1.4f, true);
        pen.label("m", springEnd + MASS_HEIGHT / 2, 0, 10f);
        int plates = Math.min(f.trimFitted(), MOST_PLATES_DRAWN);
        for (int i = 0; i < plates; i++) {
            pen.box(massTop + i * PLATE, -MASS_HALF + 14, massTop + (i + 1) * PLATE, MASS_HALF - 14, SketchPen.THIN, true);
        }
        if (plates > 0) {
            // beside the stack, on the side the far springs of an opposed pair leave free
            pen.label("trim", massTop + plates * PLATE + 7, f.opposed() ? 0 : -MASS_HALF + 34, LABEL - 1);
        }
        stops(pen, springEnd, massTop, f.opposed() ? massTop + plates * PLATE + OPPOSED : 0);
        if (f.opposed()) {
            // the other half of each pair, between the mass and a cross-bar on the stop posts
            float from = massTop + plates * PLATE;
            springs(pen, f.springCount() / 2, OPPOSED, from);
            pen.line(from + OPPOSED, -POST, from + OPPOSED, POST, SketchPen.HEAVY * 1.4f);
            pen.hatch(from + OPPOSED, -POST, from + OPPOSED + 6, POST, 6f);
        }
        dimensions(pen, f, springEnd, massTop);
        legend(stream, type, f, left, legendTop, width);
    }

    private static void structure(SketchPen pen) throws IOException {
        float half = DIMENSION + 6;
        pen.line(0, -half, 0, half, SketchPen.HEAVY * 1.4f);
        pen.hatch(-10, -half, 0, half, 6f);
        if (pen.vertical()) {
            pen.label("structure", -20, half - 26, LABEL);
        } else {
            pen.text("structure", pen.x(-14, 0) - pen.width("structure", LABEL), pen.y(0, -half + 20), LABEL);
        }
    }

    private static void springs(SketchPen pen, int count, float length, float from) throws IOException {
        float[] at = switch (Math.min(count, 4)) {
            case 1 -> new float[] {-40};
            case 2 -> new float[] {-45, 45};
            case 3 -> new float[] {-50, -28, 45};
            default -> new float[] {-50, -28, 28, 50};
        };
        for (float b : at) {
            pen.spring(from, from + length, b, 7f, 6);
        }
        sideLabel(pen, count > 4 ? "k (" + count + " springs)" : "k", from + length * 0.5f, at[0] - 8f);
    }

    private static void damper(SketchPen pen, DamperKind kind, float end) throws IOException {
        if (kind == DamperKind.EDDY_CURRENT) {
            pen.line(0, 0, end * 0.15f, 0, SketchPen.HEAVY);
            pen.box(end * 0.15f, -13, end * 0.22f, 13, SketchPen.HEAVY, true);
            pen.box(end * 0.22f, -13, end * 0.62f, -4, SketchPen.HEAVY, true);
            pen.box(end * 0.22f, 4, end * 0.62f, 13, SketchPen.HEAVY, true);
            pen.box(end * 0.32f, -1.5f, end, 1.5f, SketchPen.THIN, true);
            pen.label("c", end * 0.42f, 22, LABEL);
            return;
        }
        // a dashpot: a cylinder open towards the mass, a piston on a rod to the mass
        pen.line(0, 0, end * 0.15f, 0, SketchPen.HEAVY);
        pen.line(end * 0.15f, -9, end * 0.15f, 9, SketchPen.HEAVY);
        pen.line(end * 0.15f, -9, end * 0.62f, -9, SketchPen.HEAVY);
        pen.line(end * 0.15f, 9, end * 0.62f, 9, SketchPen.HEAVY);
        pen.line(end * 0.45f, -6.5f, end * 0.45f, 6.5f, SketchPen.HEAVY * 1.6f);
        pen.line(end * 0.45f, 0, end, 0, SketchPen.HEAVY);
        pen.label("c", end * 0.32f, 18, LABEL);
    }

    /** The stops: a post on each side with a pad facing each face of the mass at the clearance. */
    private static void stops(SketchPen pen, float massBottom, float massFace, float postEnd) throws IOException {
        for (int side = -1; side <= 1; side += 2) {
            float post = side * POST;
            float inner = side * (MASS_HALF - 8);
            float outer = side * (MASS_HALF + 4);
            float farPad = massFace + GAP;
            float nearPad = massBottom - GAP;
            pen.line(0, post, Math.max(farPad + PAD + 3, postEnd), post, SketchPen.HEAVY);
            pen.box(farPad + PAD, post, farPad + PAD + 3, inner, SketchPen.THIN, true);
            pen.box(farPad, inner, farPad + PAD, outer, SketchPen.THIN, true);
            pen.hatch(farPad, inner, farPad + PAD, outer, 2.5f);
            pen.box(nearPad - PAD - 3, post, nearPad - PAD, inner, SketchPen.THIN, true);
            pen.box(nearPad - PAD, inner, nearPad, outer, SketchPen.THIN, true);
            pen.hatch(nearPad - PAD, inner, nearPad, outer, 2.5f);
        }
        pen.label("s", massFace + GAP + PAD + 10, POST - 8, LABEL);
    }

    private static void dimensions(SketchPen pen, SketchFigures f, float springEnd, float massFace)
            throws IOException {
        pen.dimension(massFace, massFace + GAP, DIMENSION, MASS_HALF + 4, f.clearance(), false);
        if (f.installedLength().isPresent()) {
            pen.dimension(0, springEnd, DIMENSION, POST, "L1 " + f.installedLength().get(), false);
        }
        if (f.freeLength().isPresent()) {
            float free = springEnd * (float) Math.max(1.0, Math.min(1.5, f.freeOverInstalled()));
            pen.dimension(0, free, -DIMENSION, -POST, "L0 " + f.freeLength().get(), true);
        }
    }

    /** A label just outside a symbol on the smaller-b side. */
    private static void sideLabel(SketchPen pen, String text, float a, float b) throws IOException {
        float w = pen.width(text, LABEL);
        if (pen.vertical()) {
            pen.text(text, pen.x(a, b) - w - 2, pen.y(a, b) - LABEL / 3, LABEL);
        } else {
            pen.text(text, pen.x(a, b) - w / 2, pen.y(a, b) + 3, LABEL);
        }
    }

    /**
     * @param type the sheet's type
     * @param f what to draw
     * @param width the block's width, points
     * @return the height the sketch and its legend take, points
     * @throws IOException when the font cannot be read
     */
    static float height(SheetType type, SketchFigures f, float width) throws IOException {
        return drawingHeight(f) + legendHeight(type, f, width);
    }

    private static float drawingHeight(SketchFigures f) {
        return f.vertical() ? 215f + (f.opposed() ? OPPOSED + 10 : 0) : 2 * (DIMENSION + 6) + 40f;
    }

    private static float legendHeight(SheetType type, SketchFigures f, float width) throws IOException {
        int lines = 0;
        for (SketchFigures.Legend line : f.legend()) {
            lines += type.wrap(line.text(), width - SYMBOL_COLUMN, LEGEND_SIZE).size();
        }
        return lines * LEGEND_LINE + 4;
    }

    private static void legend(PDPageContentStream stream, SheetType type, SketchFigures f, float left, float top,
            float width) throws IOException {
        float y = top - LEGEND_SIZE;
        for (SketchFigures.Legend entry : f.legend()) {
            List<String> lines = type.wrap(entry.text(), width - SYMBOL_COLUMN, LEGEND_SIZE);
            type.show(stream, entry.symbol(), left, y, LEGEND_SIZE, Color.BLACK, true);
            for (String line : lines) {
                type.show(stream, line, left + SYMBOL_COLUMN, y, LEGEND_SIZE, Color.BLACK, false);
                y -= LEGEND_LINE;
            }
        }
    }
}
