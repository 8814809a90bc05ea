package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.util.concurrent.Callable;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import org.counterpoise.core.criteria.Acceptance;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.ComfortReaction;
import org.counterpoise.core.criteria.CriterionKind;
import org.counterpoise.core.criteria.MachineClass;
import org.counterpoise.core.criteria.MachineSeverity;
import org.counterpoise.core.criteria.SeverityZone;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.ui.gui.Edt;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The criterion on the absorber-goal step, in a real window: each family chosen there reaches the
 * project (through the document, so Undo takes it back) and the design on screen; the result step
 * says the verdict in words; the display convention is stored and shown. Same skip/fail rule as
 * the other wizard tests.
 */
class CriterionGuiTest {
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(CriterionGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(frame);
    }

    @Test
    void everyFamilyReachesTheProjectAndTheDesignAndUndoRestoresThePreviousOne() throws Exception {
        open();
        JComboBox<?> family = (JComboBox<?>) find("acceptance.criterion");
        for (CriterionForm.Family f : CriterionForm.Family.values()) {
            choose(family, f);
            if (f == CriterionForm.Family.USER_LIMIT) {
                JTextField limit = (JTextField) find("acceptance.limit");
                onEdt(() -> {
                    limit.setText("0.05");
                    return null;
                });
            }
            settled("the design with " + f);
            DesignResult shown = onEdt(frame::shownResult);
            assertNotNull(shown, f + " designs");
            if (f == CriterionForm.Family.NONE) {
                assertNull(onEdt(() -> frame.document().project().acceptance()));
                assertTrue(shown.study().criterion().isEmpty());
                assertTrue(shown.acceptance().isEmpty());
                assertFalse(onEdt(() -> find("result.verdict").isShowing()), "no verdict without a criterion");
                continue;
            }
            CriterionKind kind = f.kind().orElseThrow();
            assertEquals(kind, onEdt(() -> frame.document().project().acceptance().kind()), "the project holds " + f);
            assertEquals(kind, shown.study().criterion().orElseThrow().kind(), "the design is judged against " + f);
            Acceptance a = shown.acceptance().orElseThrow();
            String headline = verdictText();
            // pass or fail in words, never by colour alone
            String expected = !a.absorberNeeded() ? "No absorber is needed"
                    : a.after().passes() ? "Passes with the absorber" : "Fails even with the absorber";
            assertTrue(headline.contains(expected), f + ": " + headline);
        }
        // Undo takes the last choice back: equipment, then machine again (on screen and in the project).
        onEdt(() -> frame.document().undo());
        settled("after undo");
        assertEquals(CriterionKind.MACHINE, onEdt(() -> frame.document().project().acceptance().kind()));
        assertEquals(CriterionForm.Family.MACHINE, onEdt(family::getSelectedItem));
        assertEquals(CriterionKind.MACHINE, onEdt(() -> frame.shownResult().study().criterion().orElseThrow().kind()));
    }

    @Test
    void aStatedLimitIsJudgedAsThePeakTheDesignFindsAndInRmsAsThatPeakOverRootTwo() throws Exception {
        open();
        choose((JComboBox<?>) find("acceptance.criterion"), CriterionForm.Family.USER_LIMIT);
        JComboBox<?> quantity = (JComboBox<?>) find("acceptance.quantity");
        JComboBox<?> convention = (JComboBox<?>) find("acceptance.convention");
        JComboBox<?> response = (JComboBox<?>) find("absorber.response");
        onEdt(() -> {
            quantity.setSelectedItem(response.getSelectedItem());
            ((JTextField) find("acceptance.limit")).setText("1000");
            return null;
        });
        settled("a generous peak limit");
        DesignResult peak = onEdt(frame::shownResult);
        Acceptance a = peak.acceptance().orElseThrow();
        // The verdict engine and the design's own peak search are two routes to the same peak in band
        // (one order, the same response): they agree.
        assertEquals(peak.responseAfter().value(), a.after().value(), 1e-6 * a.after().value());
        assertTrue(a.after().passes());
        onEdt(() -> {
            convention.setSelectedItem(AmplitudeConvention.RMS);
            return null;
        });
        settled("the same limit in r.m.s.");
        DesignResult rms = onEdt(frame::shownResult);
        UserLimit limit = (UserLimit) rms.study().criterion().orElseThrow();
        assertEquals(AmplitudeConvention.RMS, limit.convention());
        // r.m.s. of one steady harmonic = peak / sqrt 2 (definition; any vibration text)
        assertEquals(peak.responseAfter().value() / Math.sqrt(2), rms.acceptance().orElseThrow().after().value(),
                1e-6 * peak.responseAfter().value());
        assertTrue(verdictText().contains("r.m.s."), verdictText());
    }

    @Test
    void aMachineIsJudgedAgainstThePublishedZoneBoundaryAndTheConventionIsShown() throws Exception {
        open();
        choose((JComboBox<?>) find("acceptance.criterion"), CriterionForm.Family.MACHINE);
        onEdt(() -> {
            ((JComboBox<?>) find("acceptance.machine")).setSelectedItem(MachineClass.GROUP_2_FLEXIBLE);
            ((JComboBox<?>) find("acceptance.zone")).setSelectedItem(SeverityZone.B);
            return null;
        });
        settled("machine group 2, flexible, zone B");
        DesignResult shown = onEdt(frame::shownResult);
        MachineSeverity m = (MachineSeverity) shown.study().criterion().orElseThrow();
        assertEquals(MachineClass.GROUP_2_FLEXIBLE, m.machine());
        // ISO 10816-3:2009 Table A.2 (group 2), flexible support: the B/C boundary is 4.5 mm/s r.m.s.
        assertEquals(4.5e-3, shown.acceptance().orElseThrow().after().limit(), 1e-12);
        assertTrue(verdictText().contains("zone "), "the zone is named: " + verdictText());
        // The display convention is the user's choice, stored in the project and said in the readout.
        onEdt(() -> {
            ((JComboBox<?>) find("display.convention")).setSelectedItem(AmplitudeConvention.RMS);
            return null;
        });
        settled("values shown as r.m.s.");
        assertEquals(AmplitudeConvention.RMS, onEdt(() -> frame.document().project().displayConvention()));
        assertTrue(onEdt(() -> frame.readoutAt(14.0)).contains("r.m.s."), onEdt(() -> frame.readoutAt(14.0)));
        onEdt(() -> frame.document().undo());
        assertEquals(AmplitudeConvention.PEAK, onEdt(() -> frame.document().project().displayConvention()));
    }

    @Test
    void comfortWithTheReactionAcceptedUsesTheUpperEndOfItsRange() throws Exception {
        open();
        choose((JComboBox<?>) find("acceptance.criterion"), CriterionForm.Family.HUMAN_COMFORT);
        onEdt(() -> {
            ((JComboBox<?>) find("acceptance.acceptable")).setSelectedItem(ComfortReaction.NOT_UNCOMFORTABLE);
            return null;
        });
        settled("comfort");
        DesignResult shown = onEdt(frame::shownResult);
        // ISO 2631-1:1997 Annex C: less than 0.315 m/s^2 is "not uncomfortable"
        assertEquals(0.315, shown.acceptance().orElseThrow().after().limit(), 1e-12);
        assertEquals(ResponseKind.ACCELERATION, shown.study().criterion().orElseThrow().quantity());
        String summary = onEdt(() -> ((JLabel) find("acceptance.summary")).getText());
        assertTrue(summary.contains("weighted Wk"), summary);
    }

    private void open() throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        settled("first design");
        onEdt(() -> {
            frame.showStep(2);
            return null;
        });
    }

    private void choose(JComboBox<?> family, CriterionForm.Family f) throws Exception {
        onEdt(() -> {
            family.setSelectedItem(f);
            return null;
        });
    }

    private String verdictText() throws Exception {
        return onEdt(() -> ((JLabel) find("result.verdict")).getText() + " "
                + ((JLabel) find("result.verdict.details")).getText());
    }

    private void settled(String what) throws InterruptedException {
        Edt.waitFor(() -> Edt.callQuietly(() -> frame.settled() && frame.shownResult() != null), what);
    }

    private Component find(String name) throws Exception {
        Component c = SwingUtilities.isEventDispatchThread() ? Edt.find(frame.getContentPane(), name)
                : onEdt(() -> Edt.find(frame.getContentPane(), name));
        assertNotNull(c, name);
        return c;
    }

    private static <T> T onEdt(Callable<T> task) throws Exception {
        return Edt.call(task);
    }
}
