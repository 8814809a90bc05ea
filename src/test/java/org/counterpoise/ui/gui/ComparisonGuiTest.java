package org.counterpoise.ui.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import javax.swing.JTabbedPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.SwingUtilities;
import javax.swing.table.TableModel;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.text.ComparisonContent;
import org.counterpoise.io.text.ReportComparison;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.wizard.WizardFrame;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The result step's comparison of methods in a real window: a tab of its own, it arrives off the
 * event thread after the design, shows the comparison of the project on screen (the recommended and
 * the chosen candidate marked in words), the line beside the design says which method is
 * recommended and whether the design shown is it, and after the project changes both show the new
 * project's comparison, never the old one. Same skip/fail rule as {@link WizardGuiTest}.
 */
class ComparisonGuiTest {
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(ComparisonGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(frame);
    }

    @Test
    void theResultStepShowsTheComparisonOfTheProjectOnScreen() throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        settled("first design");
        JTable table = onEdt(() -> (JTable) Edt.find(frame.getContentPane(), "result.comparison"));
        JTextArea line = onEdt(() -> (JTextArea) Edt.find(frame.getContentPane(), "result.recommendation"));
        // the comparison is a tab of the result step of its own, beside the steady state, the run-up and
        // the hardware
        JTabbedPane views = onEdt(() -> (JTabbedPane) Edt.find(frame.getContentPane(), "result.views"));
        assertEquals(5, onEdt(views::getTabCount));
        assertTrue(onEdt(() -> SwingUtilities.isDescendingFrom(table, views.getComponentAt(2))));
        assertTrue(onEdt(() -> !SwingUtilities.isDescendingFrom(line, views)), "the line beside the design is on"
                + " every tab");
        ReportComparison first = expected(onEdt(() -> frame.shownResult().study()));
        Edt.waitFor(() -> Edt.callQuietly(() -> columns(table).equals(columns(first))), "the first comparison");
        assertEquals(first.chosen(), onEdt(line::getText));

        // Another project: a single speed, so five candidates with the undamped absorber.
        onEdt(() -> {
            frame.load(Presets.load("blower-frame-single-speed.json"), null);
            return null;
        });
        settled("blower");
        DesignStudy blower = onEdt(() -> frame.shownResult().study());
        ReportComparison second = expected(blower);
        assertEquals(5, second.lines().size());
        Edt.waitFor(() -> Edt.callQuietly(() -> columns(table).equals(columns(second))), "the blower's comparison");
        assertTrue(second.lines().stream().anyMatch(l -> l.methodId().equals("undamped-single-speed")));
        assertNotEquals(columns(first), columns(second));
        // the preset uses the recommended method, and the line says so (the sentence for a project that
        // chose another method is checked on the same content by ComparisonOutputTest)
        String said = onEdt(line::getText);
        assertEquals(second.chosen(), said);
        assertTrue(said.contains("the recommended one"), said);
        // the recommended and the chosen candidate are marked in words, not by colour alone
        List<List<String>> shown = onEdt(() -> columns(table));
        for (int i = 0; i < second.lines().size(); i++) {
            ReportComparison.Line l = second.lines().get(i);
            assertEquals(l.recommended() ? "yes" : "", shown.get(i).get(1), l.methodId());
            assertEquals(l.chosen() ? "yes" : "", shown.get(i).get(2), l.methodId());
        }
    }

    /** The comparison as the report model gives it, computed here for the study on screen. */
    private static ReportComparison expected(DesignStudy study) {
        return ComparisonContent.of(DesignDossier.of(study).comparison(ProgressListener.NONE), study);
    }

    /**
     * One list per candidate: its method id, its two marks, then the figures of the report model's
     * table (its cells without the method cell), the way the tab shows them.
     */
    private static List<List<String>> columns(ReportComparison c) {
        ReportTable.Grid grid = ReportTable.comparison(c);
        List<List<String>> out = new ArrayList<>();
        for (int i = 0; i < c.lines().size(); i++) {
            ReportComparison.Line l = c.lines().get(i);
            List<String> column = new ArrayList<>(List.of(l.methodId(), l.recommended() ? "yes" : "",
                    l.chosen() ? "yes" : ""));
            grid.cells().get(i).stream().skip(1).map(ValueText::pretty).forEach(column::add);
            out.add(column);
        }
        return out;
    }

    /** The tab's table read from its model: one list per candidate's column, heading first. */
    private static List<List<String>> columns(JTable table) {
        TableModel m = table.getModel();
        List<List<String>> out = new ArrayList<>();
        for (int c = 1; c < m.getColumnCount(); c++) {
            List<String> column = new ArrayList<>(List.of(m.getColumnName(c)));
            for (int r = 0; r < m.getRowCount(); r++) {
                column.add(String.valueOf(m.getValueAt(r, c)));
            }
            out.add(column);
        }
        return out;
    }

    private void settled(String what) throws Exception {
        Thread.sleep(150); // let the pause before recomputing start (not a timing assertion)
        Edt.waitFor(() -> Edt.callQuietly(frame::settled), what);
    }

    private static <T> T onEdt(Callable<T> task) throws Exception {
        return Edt.call(task);
    }
}
