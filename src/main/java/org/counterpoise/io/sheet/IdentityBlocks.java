package org.counterpoise.io.sheet;

import java.awt.Color;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.Revision;
import org.counterpoise.io.project.Signature;

/**
 * The revision history (earlier issues, oldest first, then this issue) and the sign-off block
 * (prepared, checked, approved: name and date, and a line to sign by hand; an empty name or date
 * is a blank line to write on).
 */
final class IdentityBlocks {
    private static final float SIZE = 8.5f;
    private static final float LINE = 12f;
    private static final Color INK = Color.BLACK;
    private static final Color CAPTION = new Color(0x40, 0x40, 0x40);

    private IdentityBlocks() {
    }

    /**
     * @param w the writer, where the blocks go
     * @param content the sheet's content
     * @throws IOException when the stream cannot be written
     */
    static void draw(SheetWriter w, SheetContent content) throws IOException {
        ProjectIdentity id = content.identity();
        List<Revision> rows = new ArrayList<>(id.history());
        boolean listed = rows.stream().anyMatch(r -> r.mark().equals(content.revision()));
        if (!listed) {
            rows.add(new Revision(content.revision(), "", "this issue", id.engineer()));
        }
        w.ensure(LINE * (rows.size() + 3) + 8 * LINE);
        w.title("Revisions");
        float left = SheetWriter.MARGIN;
        float[] lefts = {left, left + 44, left + 120, left + 390};
        w.cells(List.of("rev.", "date", "description", "by"), lefts, true);
        for (Revision r : rows) {
            String date = r.date().isEmpty() && r.mark().equals(content.revision()) ? content.date() : r.date();
            w.cells(List.of(r.mark(), date, r.description(), r.by()), lefts, false);
        }
        w.title("Sign-off");
        signOff(w, content);
    }

    private static void signOff(SheetWriter w, SheetContent content) throws IOException {
        PDPageContentStream s = w.stream();
        SheetType type = w.type();
        float width = (SheetWriter.WIDTH - 2 * SheetWriter.MARGIN) / 3f;
        String[] roles = {"prepared", "checked", "approved"};
        Signature[] who = {content.identity().signOff().prepared(), content.identity().signOff().checked(),
            content.identity().signOff().approved()};
        float top = w.y();
        for (int i = 0; i < 3; i++) {
            float x = SheetWriter.MARGIN + i * width;
            float y = top;
            type.show(s, roles[i], x, y, SIZE, INK, true);
            y -= LINE + 2;
            y = entry(s, type, "name", who[i].name(), x, y, width - 16);
            y = entry(s, type, "date", who[i].date(), x, y, width - 16);
            entry(s, type, "signature", "", x, y - 6, width - 16);
        }
        w.down(5 * LINE + 10);
    }

    /** A caption and its value, or a line to write on when the value is empty; returns the next baseline. */
    private static float entry(PDPageContentStream s, SheetType type, String caption, String value, float x, float y,
            float width) throws IOException {
        float captionWidth = 44f;
        type.show(s, caption, x, y, 7f, CAPTION, false);
        if (value.isEmpty()) {
            s.setStrokingColor(INK);
            s.setLineWidth(0.5f);
            s.moveTo(x + captionWidth, y - 1.5f);
            s.lineTo(x + width, y - 1.5f);
            s.stroke();
        } else {
            type.show(s, type.fit(value, width - captionWidth, SIZE), x + captionWidth, y, SIZE, INK, false);
        }
        return y - LINE - 2;
    }
}
