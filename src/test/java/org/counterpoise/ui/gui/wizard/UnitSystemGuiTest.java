package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.util.List;
import java.util.concurrent.Callable;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.gui.Edt;
import org.counterpoise.ui.gui.plot.ChartHost;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * The unit system in a real window: switching to US customary is one edit of the project (Undo
 * takes it back), the result step's stroke chart then reads in inches by exactly 25.4 mm per inch
 * (NIST SP 811:2008, appendix B: 1 in = 0.0254 m, exact), the readout says inches, an empty field
 * offers its US unit first and a field holding a number keeps the unit it was typed in. Same
 * skip/fail rule as the other wizard tests.
 */
class UnitSystemGuiTest {
    private static final double MM_PER_INCH = 25.4;
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(UnitSystemGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(frame);
    }

    @Test
    void switchingToUsCustomaryShowsTheSameValuesInInchesAndUndoSwitchesBack() throws Exception {
        open();
        double[] mm = strokeData();
        String mmTitle = onEdt(() -> stroke().chart().getYAxisTitle());
        assertTrue(mmTitle.contains("(mm)"), mmTitle);
        assertTrue(onEdt(() -> frame.readoutAt(14.0)).contains(" mm"), "the readout in mm");
        XYChart before = onEdt(() -> stroke().chart());
        onEdt(() -> {
            ((JComboBox<?>) find("display.units")).setSelectedItem(UnitSystem.US_CUSTOMARY);
            return null;
        });
        assertEquals(UnitSystem.US_CUSTOMARY, onEdt(() -> frame.document().project().displayUnits()));
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.settled() && stroke().chart() != before), "the charts in inches");
        double[] inches = strokeData();
        assertEquals(mm.length, inches.length);
        for (int i = 0; i < mm.length; i++) {
            assertEquals(mm[i] / MM_PER_INCH, inches[i], 1e-12 * Math.abs(mm[i]), "point " + i);
        }
        // the result table speaks the same system: mass in lb, lengths in in, no SI unit left
        Edt.waitFor(() -> Edt.callQuietly(() -> units(frame.resultRows()).contains("lb")), "the result table in lb");
        List<String> usUnits = units(frame.resultRows());
        for (String si : List.of("kg", "mm", "m", "N/m", "N", "N s/m", "m/s", "m/s^2")) {
            assertFalse(usUnits.contains(si), "SI unit " + si + " in the US result table: " + usUnits);
        }
        assertTrue(usUnits.contains("lbf/in"), "the stiffness in lbf/in: " + usUnits);
        // the structure step's derived values too (they stayed in kg and N/m before, 5 Dec 2026)
        String derivedMass = onEdt(() -> ((JLabel) find("derived.mass")).getText());
        String derivedStiffness = onEdt(() -> ((JLabel) find("derived.stiffness")).getText());
        assertTrue(derivedMass.endsWith(" lb") && !derivedMass.contains("kg"), derivedMass);
        assertTrue(derivedStiffness.contains("lbf/in") && !derivedStiffness.contains("N/m"), derivedStiffness);
        String inTitle = onEdt(() -> stroke().chart().getYAxisTitle());
        assertTrue(inTitle.contains("(in)"), inTitle);
        String readout = onEdt(() -> frame.readoutAt(14.0));
        assertTrue(readout.matches(".*stroke [0-9.]+ in$"), readout);
        // an empty field offers the system's unit first; a number keeps the unit it was typed in
        assertEquals(Unit.INCH, onEdt(() -> ((JComboBox<?>) find("absorber.stroke_limit.unit")).getSelectedItem()));
        assertEquals(Unit.KILOGRAM, onEdt(() -> ((JComboBox<?>) find("structure.mass.unit")).getSelectedItem()));
        assertEquals("1800", onEdt(() -> ((JTextField) find("structure.mass")).getText()));
        XYChart us = onEdt(() -> stroke().chart());
        onEdt(() -> frame.document().undo());
        assertEquals(UnitSystem.SI, onEdt(() -> frame.document().project().displayUnits()), "Undo switches back");
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.settled() && stroke().chart() != us), "the charts in mm");
        double[] again = strokeData();
        for (int i = 0; i < mm.length; i++) {
            assertEquals(mm[i], again[i], 1e-12 * Math.abs(mm[i]));
        }
        assertEquals(Unit.MILLIMETRE, onEdt(() -> ((JComboBox<?>) find("absorber.stroke_limit.unit")).getSelectedItem()));
        assertTrue(onEdt(() -> ((JComboBox<?>) find("display.units")).getSelectedItem() == UnitSystem.SI));
        Edt.waitFor(() -> Edt.callQuietly(() -> units(frame.resultRows()).contains("kg")), "the result table in kg again");
        assertTrue(onEdt(() -> ((JLabel) find("derived.mass")).getText()).endsWith(" kg"), "the derived mass in kg again");
    }

    /** @return the unit column of the result table's rows */
    private static List<String> units(List<String[]> rows) {
        return rows.stream().map(r -> r[2].strip()).toList();
    }

    private double[] strokeData() throws Exception {
        return onEdt(() -> {
            List<XYSeries> series = List.copyOf(stroke().chart().getSeriesMap().values());
            XYSeries stroke = series.stream().filter(s -> s.getName().equals("stroke")).findFirst().orElseThrow();
            return stroke.getYData().clone();
        });
    }

    private ChartHost stroke() {
        return (ChartHost) find("chart.stroke");
    }

    private void open() throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.settled() && frame.shownResult() != null), "first design");
        onEdt(() -> {
            frame.showStep(4);
            return null;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> stroke().chart() != null), "the stroke chart");
    }

    private Component find(String name) {
        Component c = Edt.find(frame.getContentPane(), name);
        assertNotNull(c, name);
        return c;
    }

    private static <T> T onEdt(Callable<T> task) throws Exception {
        return SwingUtilities.isEventDispatchThread() ? task.call() : Edt.call(task);
    }
}
