package org.counterpoise.ui.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import javax.swing.JTable;
import javax.swing.SwingUtilities;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.text.ComparisonContent;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.wizard.WizardFrame;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The result step's comparison of methods in a real window: it arrives off the event thread after
 * the design, shows the comparison of the project on screen, and after the project changes shows
 * the new project's comparison, never the old one. Same skip/fail rule as {@link WizardGuiTest}.
 */
class ComparisonGuiTest {
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.requireDisplay(ComparisonGuiTest.class);
        System.setProperty("counterpoise.prefs", "memory");
        SwingUtilities.invokeAndWait(() -> Themes.apply(false));
    }

    @AfterEach
    void close() throws Exception {
        if (frame != null) {
            SwingUtilities.invokeAndWait(frame::dispose);
        }
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
        List<List<String>> first = expected(onEdt(() -> frame.shownResult().study()));
        Edt.waitFor(() -> Edt.callQuietly(() -> rows(table).equals(first)), "the first comparison");

        // Another project: a single speed, so five candidates with the undamped absorber.
        onEdt(() -> {
            frame.load(Presets.load("blower-frame-single-speed.json"), null);
            return null;
        });
        settled("blower");
        DesignStudy blower = onEdt(() -> frame.shownResult().study());
        List<List<String>> second = expected(blower);
        assertEquals(5, second.size());
        Edt.waitFor(() -> Edt.callQuietly(() -> rows(table).equals(second)), "the blower's comparison");
        assertTrue(second.stream().anyMatch(r -> r.get(0).startsWith("undamped-single-speed")));
        assertTrue(!second.equals(first));
    }

    /** The comparison's table as the report model gives it, computed here for the study on screen. */
    private static List<List<String>> expected(DesignStudy study) {
        ReportTable.Grid grid = ReportTable.comparison(ComparisonContent.of(
                DesignDossier.of(study).comparison(ProgressListener.NONE), study));
        return grid.cells().stream().map(r -> r.stream().map(ValueText::pretty).toList()).toList();
    }

    private static List<List<String>> rows(JTable table) {
        List<List<String>> out = new ArrayList<>();
        for (int r = 0; r < table.getRowCount(); r++) {
            List<String> row = new ArrayList<>();
            for (int c = 0; c < table.getColumnCount(); c++) {
                row.add(String.valueOf(table.getValueAt(r, c)));
            }
            out.add(row);
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
