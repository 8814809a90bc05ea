package org.counterpoise.io.sheet;

import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import java.awt.Color;
import java.io.IOException;
import java.io.InterruptedIOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;
import java.util.function.Supplier;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.util.Matrix;
import org.counterpoise.io.chart.ChartFactory;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.ValueText;
import org.knowm.xchart.XYChart;

/*
 * Longer than 400 lines because it is the one place that knows the sheet's page state (the
 * content stream, the current height, page breaks): every block (tables, grids, the procedure,
 * charts, further pages) draws through it; what draws on its own is outside (SheetType,
 * TitleBlock, IdentityBlocks, ArrangementSketch, SheetPanels). The grids and the procedure are
 * the next candidates to move out.
 */
/**
 * Lays out a {@link SheetContent} and the design's charts on A4 pages with PDFBox: tables with
 * labels on the left, numbers right-aligned in one column and units in the next; the charts as
 * vector graphics through the pdfbox-graphics2d bridge; the revision history, the sign-off and
 * the arrangement sketch; a title block with "page k of n" on every page. The type is
 * {@link SheetType}'s.
 */
public final class SheetWriter {
    /** Left and right margin, points (also the further pages' layout, {@link SheetPanels}). */
    static final float MARGIN = 48f;
    /** Page width, points. */
    static final float WIDTH = PDRectangle.A4.getWidth();
    private static final float HEIGHT = PDRectangle.A4.getHeight();
    private static final float CHART_WIDTH = WIDTH - 2 * MARGIN;
    private static final float CHART_HEIGHT = 290f;
    private static final float VALUE_RIGHT = 420f;
    private static final float UNIT_LEFT = 426f;
    private static final float TEXT_LEFT = 262f;
    private static final float BODY = 9.5f;
    private static final float LINE = 12.5f;
    private static final Color INK = new Color(0x1d, 0x23, 0x2b);
    // dark enough to stay readable when printed in black and white
    private static final Color MUTED = new Color(0x4a, 0x50, 0x58);
    private static final Color ACCENT = new Color(0x0b, 0x5a, 0x56);
    private static final Color RULE = new Color(0x9a, 0xa0, 0xa8);
    /** The lowest baseline of the flowing content, above the title block, points. */
    private static final float BOTTOM = TitleBlock.BOTTOM + TitleBlock.HEIGHT + 14f;

    private final PDDocument document;
    private final SheetType type;
    private final SheetContent content;
    private final List<PDPage> pages = new ArrayList<>();
    private final Map<XYChart, PDFormXObject> forms;
    private PDPageContentStream stream;
    private float y;

    private SheetWriter(PDDocument document, SheetType type, SheetContent content,
            Map<XYChart, PDFormXObject> forms) {
        this.document = document;
        this.content = content;
        this.type = type;
        this.forms = forms;
    }

    /**
     * Writes the sheet.
     * @param content the sheet content
     * @param charts the charts to print, in order (each takes half a page)
     * @param out where the PDF goes
     * @throws IOException when it cannot be written
     */
    public static void write(SheetContent content, List<XYChart> charts, OutputStream out) throws IOException {
        write(content, charts, List.of(), out);
    }

    /**
     * Writes the sheet with further pages (the run-up) after the design's charts.
     * @param content the sheet content
     * @param charts the charts to print, in order (each takes half a page)
     * @param panels further pages, in order
     * @param out where the PDF goes
     * @throws IOException when it cannot be written
     */
    public static void write(SheetContent content, List<XYChart> charts, List<SheetPanel> panels, OutputStream out)
            throws IOException {
        write(() -> content, charts, panels, out);
    }

    /**
     * Writes the sheet while its content is still being made: the content is made on a thread of
     * its own (the analyses it prints: Monte Carlo, method comparison, hardware) while this thread
     * sets up the document, its font and the charts' vector forms (docs/performance.md).
     * @param content makes the sheet content (any exception it throws is rethrown here as it is)
     * @param charts the charts to print, in order (each takes half a page)
     * @param panels further pages, in order
     * @param out where the PDF goes
     * @throws IOException when it cannot be written
     */
    public static void write(Supplier<SheetContent> content, List<XYChart> charts, List<SheetPanel> panels,
            OutputStream out) throws IOException {
        FutureTask<SheetContent> making = new FutureTask<>(content::get);
        Thread maker = new Thread(making, "sheet-content");
        maker.setDaemon(true);
        maker.start();
        try (PDDocument document = new PDDocument()) {
            SheetType type = new SheetType(document);
            Map<XYChart, PDFormXObject> forms = new IdentityHashMap<>();
            for (XYChart chart : charts) {
                forms.put(chart, form(document, chart));
            }
            for (SheetPanel panel : panels) {
                for (XYChart chart : panel.charts()) {
                    forms.put(chart, form(document, chart));
                }
            }
            SheetContent made = made(making);
            document.getDocumentInformation().setTitle("Absorber parameter sheet: " + made.projectName());
            document.getDocumentInformation().setCreator("Counterpoise");
            new SheetWriter(document, type, made, forms).layout(charts, panels);
            document.save(out);
        } finally {
            making.cancel(true);
        }
    }

    private static SheetContent made(FutureTask<SheetContent> making) throws IOException {
        try {
            return making.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new InterruptedIOException("the sheet was interrupted while its content was being made");
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException runtime) {
                throw runtime;
            }
            if (cause instanceof Error error) {
                throw error;
            }
            throw new IOException(cause);
        }
    }

    /** A chart as a vector form of the width and height every chart of the sheet has. */
    private static PDFormXObject form(PDDocument document, XYChart chart) throws IOException {
        PdfBoxGraphics2D g = new PdfBoxGraphics2D(document, CHART_WIDTH, CHART_HEIGHT);
        chart.paint(g, (int) CHART_WIDTH, (int) CHART_HEIGHT);
        g.dispose();
        return g.getXFormObject();
    }

    private void layout(List<XYChart> charts, List<SheetPanel> panels) throws IOException {
        newPage();
        heading(clean(content.projectName()), 17f, INK);
        y -= 8;
        String document = content.identity().documentNumber().isEmpty() ? ""
                : " \u00b7 document " + content.identity().documentNumber();
        say("Absorber parameter sheet" + document + " \u00b7 issued " + content.date() + " \u00b7 revision "
                + content.revision(), MARGIN, 9f, MUTED, false);
        y -= LINE;
        if (!content.notes().isBlank()) {
            for (String line : wrap(clean(content.notes()), WIDTH - 2 * MARGIN, 8.5f)) {
                say(line, MARGIN, 8.5f, MUTED, false);
                y -= 11;
            }
        }
        IdentityBlocks.draw(this, content);
        for (SheetBlock block : content.toBuild()) {
            block(block);
        }
        if (!content.toBuild().isEmpty()) {
            newPage(); // the one absorber of the total mass, for comparison, after the absorbers to build
        }
        for (ReportTable.Section section : content.sections()) {
            section(section, content.grids());
        }
        if (content.sketch().isPresent()) {
            SketchFigures sketch = content.sketch().get();
            float height = ArrangementSketch.height(type, sketch, WIDTH - 2 * MARGIN);
            ensure(height + 40);
            title("Arrangement (schematic, not to scale; the figures are)" + content.singleMark());
            ArrangementSketch.draw(stream, type, sketch, MARGIN, y, WIDTH - 2 * MARGIN);
            y -= height + 8;
        }
        if (content.comparison().isPresent()) {
            comparison(content.comparison().get());
        }
        ensure(CHART_HEIGHT + 60);
        title("Response with and without the absorber" + content.singleMark());
        charts(charts);
        for (SheetPanel panel : panels) {
            if (!panel.charts().isEmpty()) {
                newPage(); // a page with charts starts on its own; a sentence follows the charts above
            }
            SheetPanels.draw(this, panel);
        }
        newPage();
        paragraphs("Assumptions of the model", content.assumptions());
        if (!content.warnings().isEmpty()) {
            paragraphs("Warnings for this design", content.warnings());
        }
        paragraphs("Cautions", content.cautions());
        stream.close();
        footers();
    }

    /** Draws charts one under the other, each followed by the notes of what it cannot draw. */
    void charts(List<XYChart> charts) throws IOException {
        for (XYChart chart : charts) {
            List<String> notes = ChartFactory.notes(chart);
            ensure(CHART_HEIGHT + 10 + notes.size() * LINE);
            drawChart(chart, MARGIN, y - CHART_HEIGHT);
            y -= CHART_HEIGHT + 14;
            // What the chart cannot draw (an unbounded resonance) is also said in the text.
            for (String note : notes) {
                say("Note: " + note + "; drawn to the top of the chart.", MARGIN, 8.5f, INK, false);
                y -= LINE;
            }
        }
    }

    /** A heading in the accent colour with a rule under it. */
    void title(String text) throws IOException {
        ensure(LINE * 4);
        y -= 6;
        heading(text, 11.5f, ACCENT);
        rule();
    }

    /** A paragraph wrapped to the page's width. */
    void paragraph(String text) throws IOException {
        for (String line : wrap(clean(text), WIDTH - 2 * MARGIN, BODY)) {
            ensure(LINE);
            say(line, MARGIN, BODY, INK, false);
            y -= LINE;
        }
        y -= 4;
    }

    /**
     * A row of text cells at the given left edges (the first in the muted label colour, unless a head).
     * @param cells the cells
     * @param lefts the left edge of each cell, points from the page's left
     * @param head true for the column heads
     */
    void cells(List<String> cells, float[] lefts, boolean head) throws IOException {
        ensure(LINE);
        for (int i = 0; i < cells.size() && i < lefts.length; i++) {
            float right = i + 1 < lefts.length ? lefts[i + 1] - 6 : WIDTH - MARGIN;
            say(type.fit(cells.get(i), right - lefts[i], BODY), lefts[i], BODY, head ? ACCENT : i == 0 ? MUTED : INK,
                    head);
        }
        y -= LINE;
    }

    /** A block of tables under its own heading, on a fresh page when it has one. */
    private void block(SheetBlock block) throws IOException {
        if (!block.title().isEmpty()) {
            newPage();
            heading(clean(block.title()), 13f, INK);
            y -= 4;
            for (String sentence : block.sentences()) {
                paragraph(sentence);
            }
        }
        for (ReportTable.Section section : block.sections()) {
            section(section, block.grids());
        }
    }

    private void section(ReportTable.Section section, Map<SectionId, ReportTable.Grid> grids) throws IOException {
        ReportTable.Grid grid = grids.get(section.id());
        if (grid != null) {
            comparison(grid);
            return;
        }
        if (section.id() == SectionId.PROCEDURE) {
            steps(section);
            return;
        }
        // A short table starts on a new page rather than leave its last rows alone on the next one.
        ensure(LINE * Math.min(3 + section.rows().size(), 14));
        y -= 6;
        heading(section.title(), 11.5f, ACCENT);
        rule();
        for (ReportTable.Row row : section.rows()) {
            row(row);
        }
        y -= 4;
    }

    /** The procedure: each step's number, then its sentence wrapped across the page. */
    private void steps(ReportTable.Section section) throws IOException {
        ensure(LINE * 6);
        y -= 6;
        heading(section.title(), 11.5f, ACCENT);
        rule();
        for (ReportTable.Row row : section.rows()) {
            List<String> lines = wrap(clean(row.value()), WIDTH - 2 * MARGIN - 22, BODY);
            ensure(LINE * lines.size());
            say(row.label(), MARGIN, BODY, ACCENT, true);
            for (String line : lines) {
                say(line, MARGIN + 22, BODY, INK, false);
                y -= LINE;
            }
            y -= 3;
        }
        y -= 4;
    }

    private void row(ReportTable.Row row) throws IOException {
        if (row.textual()) {
            List<String> lines = wrap(clean(ValueText.pretty(row.value())), WIDTH - MARGIN - TEXT_LEFT, BODY);
            ensure(LINE * lines.size());
            say(row.label(), MARGIN, BODY, MUTED, false);
            for (String line : lines) {
                say(line, TEXT_LEFT, BODY, INK, false);
                y -= LINE;
            }
            return;
        }
        ensure(LINE);
        say(row.label(), MARGIN, BODY, MUTED, false);
        String value = clean(row.value());
        say(value, VALUE_RIGHT - width(value, BODY), BODY, INK, false);
        say(ValueText.pretty(row.unit()), UNIT_LEFT, BODY, INK, false);
        y -= LINE;
    }

    /** The comparison of methods: a grid across the page (the recommended line in the accent colour), then its sentences. */
    private void comparison(ReportTable.Grid grid) throws IOException {
        float size = 7.5f;
        ensure(LINE * (4 + grid.cells().size()));
        y -= 6;
        for (String line : wrap(clean(grid.title()), WIDTH - 2 * MARGIN, 11.5f)) {
            heading(line, 11.5f, ACCENT);
        }
        rule();
        float room = WIDTH - 2 * MARGIN;
        // a column of long words (a check's source) goes under its row, wrapped, not across the page
        float[] all = columns(grid.headings(), grid.cells(), size);
        List<Integer> narrow = new ArrayList<>();
        List<Integer> under = new ArrayList<>();
        for (int i = 0; i < all.length; i++) {
            (i > 0 && all[i] > 0.3f * room ? under : narrow).add(i);
        }
        List<String> headings = pick(grid.headings(), narrow);
        List<List<String>> rows = new ArrayList<>();
        for (List<String> row : grid.cells()) {
            rows.add(pick(row, narrow));
        }
        int n = headings.size();
        float[] widths = columns(headings, rows, size);
        if (sum(widths) + 4f * (n - 1) > room) {
            // a wide table is printed smaller rather than run off the page
            size = Math.max(5.5f, size * room / (sum(widths) + 4f * (n - 1)));
            widths = columns(headings, rows, size);
        }
        float gap = n > 1 ? Math.max(4f, (room - sum(widths)) / (n - 1)) : 0f;
        cells(headings, widths, gap, size, MUTED);
        for (int r = 0; r < rows.size(); r++) {
            cells(rows.get(r), widths, gap, size, grid.recommended().get(r) ? ACCENT : INK);
            for (int j : under) {
                String text = grid.headings().get(j) + ": " + ValueText.pretty(grid.cells().get(r).get(j));
                for (String line : wrap(clean(text), room - 12, size)) {
                    ensure(LINE);
                    say(line, MARGIN + 12, size, MUTED, false);
                    y -= LINE - 2;
                }
            }
        }
        y -= 4;
        for (String sentence : grid.sentences()) {
            List<String> lines = wrap(clean(sentence), WIDTH - 2 * MARGIN - 12, 8.5f);
            ensure(11 * lines.size());
            say("\u2022", MARGIN, 8.5f, ACCENT, false);
            for (String line : lines) {
                say(line, MARGIN + 12, 8.5f, INK, false);
                y -= 11;
            }
        }
        y -= 4;
    }

    /** One line of the grid: the first cell left-aligned, the figures right-aligned in their columns. */
    private void cells(List<String> cells, float[] widths, float gap, float size, Color color) throws IOException {
        ensure(LINE);
        float x = MARGIN;
        for (int i = 0; i < cells.size(); i++) {
            String cell = clean(ValueText.pretty(cells.get(i)));
            say(cell, i == 0 ? x : x + widths[i] - width(cell, size), size, color, false);
            x += widths[i] + gap;
        }
        y -= LINE - 1;
    }

    private float[] columns(List<String> headings, List<List<String>> rows, float size) throws IOException {
        int n = headings.size();
        float[] widths = new float[n];
        for (int i = 0; i < n; i++) {
            widths[i] = width(headings.get(i), size);
            for (List<String> row : rows) {
                widths[i] = Math.max(widths[i], width(ValueText.pretty(row.get(i)), size));
            }
        }
        return widths;
    }

    private static List<String> pick(List<String> cells, List<Integer> columns) {
        return columns.stream().map(cells::get).toList();
    }

    private static float sum(float[] values) {
        float s = 0;
        for (float v : values) {
            s += v;
        }
        return s;
    }

    private void paragraphs(String title, List<String> texts) throws IOException {
        ensure(LINE * 4);
        y -= 6;
        heading(title, 11.5f, ACCENT);
        rule();
        for (String text : texts) {
            List<String> lines = wrap(clean(text), WIDTH - 2 * MARGIN - 12, BODY);
            ensure(LINE * lines.size());
            say("\u2022", MARGIN, BODY, ACCENT, false);
            for (String line : lines) {
                say(line, MARGIN + 12, BODY, INK, false);
                y -= LINE;
            }
            y -= 3;
        }
    }

    private void heading(String text, float size, Color color) throws IOException {
        ensure(size + LINE);
        y -= size;
        say(text, MARGIN, size, color, true);
        y -= 6;
    }

    private void rule() throws IOException {
        stream.setStrokingColor(RULE);
        stream.setLineWidth(0.6f);
        stream.moveTo(MARGIN, y + 4);
        stream.lineTo(WIDTH - MARGIN, y + 4);
        stream.stroke();
        y -= LINE - 4;
    }

    private void drawChart(XYChart chart, float x, float bottom) throws IOException {
        PDFormXObject form = forms.get(chart);
        if (form == null) {
            form = form(document, chart);
        }
        stream.saveGraphicsState();
        stream.transform(Matrix.getTranslateInstance(x, bottom));
        stream.drawForm(form);
        stream.restoreGraphicsState();
    }

    private void say(String text, float x, float size, Color color, boolean bold) throws IOException {
        type.show(stream, text, x, y, size, color, bold);
    }

    /**
     * Starts a new page when fewer than {@code needed} points are left above the title block.
     * @param needed the height the next block takes, points
     */
    void ensure(float needed) throws IOException {
        if (y - needed < BOTTOM) {
            newPage();
        }
    }

    private void newPage() throws IOException {
        if (stream != null) {
            stream.close();
        }
        PDPage page = new PDPage(PDRectangle.A4);
        document.addPage(page);
        pages.add(page);
        stream = new PDPageContentStream(document, page);
        y = HEIGHT - 40f;
    }

    /** The title block on every page, once the number of pages is known. */
    private void footers() throws IOException {
        int n = pages.size();
        for (int i = 0; i < n; i++) {
            try (PDPageContentStream s = new PDPageContentStream(document, pages.get(i),
                    PDPageContentStream.AppendMode.APPEND, true, true)) {
                TitleBlock.draw(s, type, content, i + 1, n);
            }
        }
        stream = null;
    }

    /** @return the current page's content stream */
    PDPageContentStream stream() {
        return stream;
    }

    /** @return the sheet's type */
    SheetType type() {
        return type;
    }

    /** @return the baseline of the next line, points from the page's foot */
    float y() {
        return y;
    }

    /** @param points how far to move the next line down */
    void down(float points) {
        y -= points;
    }

    private List<String> wrap(String text, float maxWidth, float size) throws IOException {
        return type.wrap(text, maxWidth, size);
    }

    private float width(String text, float size) throws IOException {
        return type.width(text, size);
    }

    private String clean(String text) {
        return type.clean(text);
    }
}
