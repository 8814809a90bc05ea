package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.OrderInput;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.ui.gui.Edt;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The disturbance step's other orders and balance grade, in a real window: an order added there
 * reaches the project and the design's excitation at its own frequency, the order picked is the
 * one designed for, and an unbalance given by its balance grade is the ISO 21940-11 permissible
 * residual unbalance.
 */
class OrdersAndBalanceGradeGuiTest {
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(OrdersAndBalanceGradeGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(frame);
    }

    @Test
    void anOrderAddedReachesTheDesignAndThePickedOrderIsDesignedFor() throws Exception {
        open();
        Excitation before = onEdt(() -> frame.shownResult().study().excitation());
        onEdt(() -> {
            ((JButton) find("disturbance.orders.add")).doClick();
            return null;
        });
        onEdt(() -> {
            ((JTextField) find("disturbance.orders[0].amplitude")).setText("500");
            return null;
        });
        settled("two orders");
        assertEquals(List.of(OrderInput.of(2, ExcitationKind.FORCE, new QuantityInput(500, Unit.NEWTON))),
                onEdt(() -> frame.document().project().disturbance().orders()));
        Excitation both = onEdt(() -> frame.shownResult().study().excitation());
        assertEquals(2, both.orders().size());
        // the orders of one shaft: the second at twice the forcing frequency of the first (harmonic 2 over 1)
        assertEquals(2.0, both.otherOrders().get(0).frequencyFactor(), 1e-12);
        assertEquals(500.0, both.otherOrders().get(0).amplitude(), 1e-12);
        // designed for order 2: its band is twice the shaft's
        JComboBox<?> designFor = (JComboBox<?>) find("disturbance.design_order");
        onEdt(() -> {
            designFor.setSelectedItem(new OrdersForm.DesignOrder(OptionalDouble.of(2)));
            return null;
        });
        settled("designed for order 2");
        assertEquals(OptionalDouble.of(2), onEdt(() -> frame.document().project().disturbance().designOrder()));
        Excitation second = onEdt(() -> frame.shownResult().study().excitation());
        assertEquals(ExcitationKind.FORCE, second.kind());
        assertEquals(2 * before.band().low(), second.band().low(), 1e-9 * before.band().low());
        onEdt(() -> {
            ((JButton) find("disturbance.orders[0].remove")).doClick();
            return null;
        });
        settled("one order again");
        assertEquals(List.of(), onEdt(() -> frame.document().project().disturbance().orders()));
        assertEquals(1, onEdt(() -> frame.shownResult().study().excitation().orders().size()));
    }

    @Test
    void anUnbalanceFromItsBalanceGradeIsThePermissibleResidualUnbalance() throws Exception {
        open();
        onEdt(() -> {
            ((JComboBox<?>) find("disturbance.kind")).setSelectedItem(ExcitationKind.UNBALANCE);
            ((JComboBox<?>) find("disturbance.balance_grade.source")).setSelectedItem(BalanceGradeForm.Source.GRADE);
            ((JTextField) find("disturbance.balance_grade.grade")).setText("6.3");
            ((JTextField) find("disturbance.balance_grade.rotor_mass")).setText("200");
            ((JTextField) find("disturbance.balance_grade.max_speed")).setText("900");
            return null;
        });
        settled("unbalance from G 6.3");
        assertNotNull(onEdt(() -> frame.document().project().disturbance().balanceGrade()));
        // ISO 21940-11: U_per = G m / Omega_max = 6.3 mm/s x 200 kg / (900 rpm = 94.25 rad/s) = 13 369 g mm
        double expected = 6.3e-3 * 200 / (900 * 2 * Math.PI / 60);
        Excitation e = onEdt(() -> frame.shownResult().study().excitation());
        assertEquals(ExcitationKind.UNBALANCE, e.kind());
        assertEquals(expected, e.amplitude(), 1e-12);
        String derived = onEdt(() -> ((JLabel) find("derived.balanceGrade")).getText());
        assertTrue(derived.startsWith(QuantityFormat.format(expected, Unit.GRAM_MILLIMETRE).replace("*", "\u00b7")),
                derived);
    }

    private void open() throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        settled("first design");
        onEdt(() -> {
            frame.showStep(1);
            return null;
        });
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
