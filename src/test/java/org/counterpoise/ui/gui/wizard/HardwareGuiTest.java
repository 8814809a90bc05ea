package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.DesignCheck;
import org.counterpoise.core.realisation.HardwareCaution;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.Realiser;
import org.counterpoise.core.realisation.SpringKind;
import org.counterpoise.io.text.CautionText;
import org.counterpoise.ui.gui.Edt;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The hardware step in a real window: its edits reach the project through the document (so Undo
 * takes them back, one step each), the damper list never offers a damper that does not go with
 * the spring, and a value out of range is refused under its field in the unit shown. Same
 * skip/fail rule as the other wizard tests.
 */
class HardwareGuiTest {
    private static final int HARDWARE_STEP = 3;
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(HardwareGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(frame);
    }

    @Test
    void editsReachTheProjectAndUndoTakesThemBackOneByOne() throws Exception {
        open();
        // the new project is a copy of a preset, which names its own hardware (format 4)
        HardwareChoice start = hardware();
        type("hardware.mass_tolerance", "2.5");
        // percent to fraction: 1 % = 0.01 (definition of the percent, ISO 80000-1)
        assertEquals(0.025, hardware().massTolerance(), 1e-15);
        pick("hardware.damper", DamperKind.EDDY_CURRENT);
        assertEquals(DamperKind.EDDY_CURRENT, hardware().damperKind());
        assertTrue(onEdt(() -> find("hardware.eddy_current.plate_thickness").isShowing()),
                "the eddy-current rows show with that damper");
        type("hardware.eddy_current.plate_thickness", "8");
        assertEquals(0.008, hardware().eddyCurrent().plateThickness(), 1e-15, "8 mm in metres");
        type("hardware.service_hours", "20000");
        assertEquals(20_000, hardware().serviceHours());
        undo();
        assertEquals(start.serviceHours(), hardware().serviceHours(), "hours undone");
        assertEquals(String.valueOf(Math.round(start.serviceHours())),
                onEdt(() -> text("hardware.service_hours").getText()), "the field shows it again");
        undo();
        assertEquals(EddyCurrentDefaults.THICKNESS, hardware().eddyCurrent().plateThickness(), "thickness undone");
        undo();
        assertEquals(DamperKind.VISCOUS_DASHPOT, hardware().damperKind(), "the damper pick is its own undo step");
        assertFalse(onEdt(() -> find("hardware.eddy_current.plate_thickness").isShowing()));
        undo();
        assertEquals(start, hardware(), "back to where it started");
        assertFalse(onEdt(frame::dirty));
    }

    @Test
    void theDamperListOffersOnlyWhatGoesWithTheSpring() throws Exception {
        open();
        pick("hardware.damper", DamperKind.EDDY_CURRENT);
        pick("hardware.spring", SpringKind.ELASTOMER);
        assertEquals(List.of(DamperKind.ELASTOMER_LOSS), offered(), "an elastomer damps by its own loss only");
        assertFalse(onEdt(() -> find("hardware.damper").isEnabled()), "nothing to pick");
        assertEquals(SpringKind.ELASTOMER, hardware().springKind());
        assertEquals(DamperKind.ELASTOMER_LOSS, hardware().damperKind(), "spring and damper changed in one edit");
        assertTrue(onEdt(() -> find("hardware.elastomer.loss_factor").isShowing()), "the compound's rows show");
        pick("hardware.spring", SpringKind.HELICAL_COMPRESSION);
        assertEquals(List.of(DamperKind.VISCOUS_DASHPOT, DamperKind.EDDY_CURRENT), offered(),
                "helical springs need a separate damper");
        assertEquals(DamperKind.EDDY_CURRENT, hardware().damperKind(), "the helical springs' damper comes back");
        // every pair the lists can show is one the project accepts (HardwareChoice refuses the others)
        for (SpringKind spring : SpringKind.values()) {
            pick("hardware.spring", spring);
            for (DamperKind damper : offered()) {
                pick("hardware.damper", damper);
                assertEquals(spring, hardware().springKind());
                assertEquals(damper, hardware().damperKind());
            }
        }
    }

    @Test
    void aValueOutOfRangeIsRefusedUnderItsFieldInTheUnitShown() throws Exception {
        open();
        type("hardware.trim_step", "50");
        Edt.waitFor(() -> Edt.callQuietly(() -> !frame.nextEnabled()), "Next disabled");
        String message = onEdt(() -> ((JLabel) find("hardware.trim_step.message")).getText());
        assertTrue(message.contains("50 %") && message.contains("20 %"), message);
        assertFalse(message.contains("0.2 "), "said in percent, not as a fraction: " + message);
        assertEquals(HardwareChoice.DEFAULT.trimStepFraction(), hardware().trimStepFraction(), "nothing saved");
        type("hardware.trim_step", "2");
        settled("fixed");
        assertEquals(0.02, hardware().trimStepFraction(), 1e-15);
        assertTrue(onEdt(frame::nextEnabled));
    }

    @Test
    void theHardwareTabShowsTheChoiceOnScreenAndNeverAnOlderOne() throws Exception {
        open();
        Edt.waitFor(() -> Edt.callQuietly(() -> hardware().equals(frame.hardwareView().shownChoice())),
                "the hardware of the first design");
        String headline = onEdt(() -> ((JLabel) Edt.find(frame.getContentPane(), "hardware.headline")).getText());
        Realisation expected = Realiser.realise(onEdt(frame::shownResult), HardwareChoice.DEFAULT);
        boolean allPass = expected.checks().stream().allMatch(DesignCheck::passes);
        // pass or fail in words and with a symbol, never by colour alone
        assertTrue(headline.contains(allPass ? "\u2713 Every check of the parts passes"
                : "\u2717 Not every check of the parts passes"), headline);
        // every check row says its verdict in words with a symbol, as the core's typed check decides
        List<String> verdicts = onEdt(() -> {
            JTable checks = (JTable) Edt.find(frame.getContentPane(), "hardware.checks");
            int column = checks.getColumnModel().getColumnIndex("Verdict");
            List<String> out = new ArrayList<>();
            for (int row = 0; row < checks.getRowCount(); row++) {
                out.add(((JLabel) checks.prepareRenderer(checks.getCellRenderer(row, column), row, column)).getText());
            }
            return out;
        });
        assertEquals(expected.checks().stream().map(c -> c.passes() ? "\u2713 passes" : "\u2717 FAILS").toList(),
                verdicts);
        // the cautions of this hardware (a spring that breaks, a damper that leaks or a magnet that traps
        // fingers) are on the tab beside its parts, each once
        String cautions = onEdt(() -> ((JTextArea) Edt.find(frame.getContentPane(), "hardware.cautions")).getText());
        for (HardwareCaution c : HardwareCaution.of(hardware())) {
            assertTrue(cautions.contains(CautionText.of(c)), c + " in " + cautions);
        }
        assertFalse(cautions.isBlank());
        HardwareChoice before = hardware();
        HardwareChoice shownAfterEdit = onEdt(() -> {
            text("hardware.service_hours").setText("30000");
            return frame.hardwareView().shownChoice();
        });
        assertEquals(null, shownAfterEdit, "the parts of the old choice are gone as soon as the choice changes");
        assertEquals(30_000, hardware().serviceHours());
        Edt.waitFor(() -> Edt.callQuietly(() -> hardware().equals(frame.hardwareView().shownChoice())),
                "the hardware of the new choice");
        assertFalse(before.equals(onEdt(() -> frame.hardwareView().shownChoice())));
    }

    /** The foundation's default plate, named so the undo check reads. */
    private static final class EddyCurrentDefaults {
        static final double THICKNESS = HardwareChoice.DEFAULT.eddyCurrent().plateThickness();
    }

    private List<DamperKind> offered() throws Exception {
        return onEdt(() -> {
            JComboBox<?> c = (JComboBox<?>) find("hardware.damper");
            List<DamperKind> out = new ArrayList<>();
            for (int i = 0; i < c.getItemCount(); i++) {
                out.add((DamperKind) c.getItemAt(i));
            }
            return out;
        });
    }

    private HardwareChoice hardware() throws Exception {
        return onEdt(() -> frame.document().project().hardware());
    }

    private void type(String field, String value) throws Exception {
        onEdt(() -> {
            text(field).setText(value);
            return null;
        });
    }

    private void pick(String list, Object item) throws Exception {
        onEdt(() -> {
            ((JComboBox<?>) find(list)).setSelectedItem(item);
            return null;
        });
    }

    private void undo() throws Exception {
        onEdt(() -> frame.document().undo());
    }

    private JTextField text(String name) {
        return (JTextField) find(name);
    }

    private void open() throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        settled("first design");
        onEdt(() -> {
            frame.showStep(HARDWARE_STEP);
            return null;
        });
    }

    private void settled(String what) throws InterruptedException {
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.settled() && frame.shownResult() != null), what);
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
