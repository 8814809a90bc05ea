package org.counterpoise.ui.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import org.counterpoise.io.text.WarningText;

import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.event.KeyEvent;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.function.BooleanSupplier;
import javax.imageio.ImageIO;
import javax.swing.AbstractButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JTextField;
import javax.swing.JTextPane;
import javax.swing.SwingUtilities;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.units.Gravity;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.ui.gui.wizard.WizardFrame;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Issue 10, items 4 and 5, in a real window (Xvfb in CI): numbers typed with grouping marks are
 * read in the user's locale or refused inline; a change of unit or of form converts the physical
 * quantity; every control of every step can be reached at 1366 x 768 and at 960 x 540 (a
 * 1920 x 1080 screen at 200 % scaling); the result's warnings are shown whole; the window's size
 * and place are remembered across a reopen. Screenshots go to target/gui.
 */
class FieldsAndLayoutGuiTest {
    private static final Path SHOTS = Path.of("target", "gui");
    private static final Locale US = Locale.forLanguageTag("en-US");
    private static final Locale GERMANY = Locale.forLanguageTag("de-DE");
    private WizardFrame frame;
    private Locale saved;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.requireDisplay(FieldsAndLayoutGuiTest.class);
        System.setProperty("counterpoise.prefs", "memory");
        Files.createDirectories(SHOTS);
        SwingUtilities.invokeAndWait(() -> Themes.apply(false));
    }

    @AfterEach
    void close() throws Exception {
        if (saved != null) {
            Locale.setDefault(Locale.Category.FORMAT, saved);
        }
        if (frame != null) {
            // Leave the remembered placement as a first start would, for the next test's window.
            onEdt(() -> {
                Rectangle screen = frame.getGraphicsConfiguration().getBounds();
                frame.setBounds(screen.x, screen.y, Math.min(1280, screen.width), Math.min(800, screen.height));
                frame.dispose();
                return null;
            });
        }
    }

    private void open(Locale locale) throws Exception {
        saved = Locale.getDefault(Locale.Category.FORMAT);
        Locale.setDefault(Locale.Category.FORMAT, locale);
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        settled("first design");
    }

    @Test
    void groupedNumbersAreReadInTheUsersLocaleOrRefusedInline() throws Exception {
        open(US);
        JTextField mass = (JTextField) find("structure.mass");
        JLabel message = (JLabel) find("structure.mass.message");
        // Typed through the keyboard like a person (java.awt.Robot): select all, then 1,800.
        onEdt(() -> {
            frame.toFront();
            mass.requestFocusInWindow();
            return null;
        });
        waitFor(() -> onEdtQuietly(mass::isFocusOwner), "focus on the mass field");
        Robot robot = new Robot();
        robot.setAutoDelay(20);
        robot.keyPress(KeyEvent.VK_CONTROL);
        robot.keyPress(KeyEvent.VK_A);
        robot.keyRelease(KeyEvent.VK_A);
        robot.keyRelease(KeyEvent.VK_CONTROL);
        for (int key : new int[] {KeyEvent.VK_2, KeyEvent.VK_COMMA, KeyEvent.VK_4, KeyEvent.VK_0, KeyEvent.VK_0}) {
            robot.keyPress(key);
            robot.keyRelease(key);
        }
        // en-US: "2,400" is two thousand four hundred, and the field says how it was read.
        waitFor(() -> onEdtQuietly(() -> "2,400".equals(mass.getText()) && frame.settled() && frame.shownResult() != null
                && frame.shownResult().study().structure().modalMass() == 2400), "2,400 read as 2400 kg");
        assertEquals("read as 2400", onEdt(message::getText));
        // en-US: "1,8" cannot be a grouping of thousands: refused inline, never read as 1.8 or 18.
        type(mass, "1,8");
        waitFor(() -> onEdtQuietly(() -> !frame.nextEnabled()), "Next disabled");
        String refusal = onEdt(message::getText);
        assertTrue(refusal.contains("decimal mark is \u201c.\u201d") && refusal.contains("\u201c,\u201d groups"), refusal);
        assertEquals(null, onEdt(frame::shownResult), "no result for a number that was not read");
        assertEquals("1,8", onEdt(mass::getText), "what was typed stays");
        screenshot("locale-en-refused");
        // de-DE (a new window, as a German user would start it): the comma is the decimal mark and the
        // point groups thousands; the values shown are written that way too.
        onEdt(() -> {
            frame.dispose();
            return null;
        });
        Locale.setDefault(Locale.Category.FORMAT, GERMANY);
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        settled("first design in de-DE");
        JTextField massDe = (JTextField) find("structure.mass");
        JLabel messageDe = (JLabel) find("structure.mass.message");
        assertEquals("14,2", onEdt(((JTextField) find("structure.stiffness"))::getText));
        type(massDe, "1,800");
        waitFor(() -> modalMassIs(1.8), "1,800 read as 1.8 kg in de-DE");
        type(massDe, "1.800");
        waitFor(() -> modalMassIs(1800), "1.800 read as 1800 kg in de-DE");
        assertEquals("read as 1800", onEdt(messageDe::getText));
        type(massDe, "1.8");
        waitFor(() -> onEdtQuietly(() -> !frame.nextEnabled()), "1.8 refused in de-DE");
        refusal = onEdt(messageDe::getText);
        assertTrue(refusal.contains("decimal mark is \u201c,\u201d") && refusal.contains("\u201c.\u201d groups"), refusal);
        screenshot("locale-de-refused");
        type(massDe, "1,5e3");
        waitFor(() -> modalMassIs(1500), "1,5e3 read as 1500 kg in de-DE");
    }

    @Test
    void pickingAnotherUnitConvertsTheNumberShown() throws Exception {
        open(US);
        JTextField mass = (JTextField) find("structure.mass");
        JTextField stiffness = (JTextField) find("structure.stiffness");
        assertEquals("1800", onEdt(mass::getText));
        select("structure.mass.unit", Unit.TONNE);
        assertEquals("1.8", onEdt(mass::getText));
        settled("tonnes");
        assertEquals(1800, onEdt(() -> frame.shownResult().study().structure().modalMass()), 1e-9);
        // 14.2 Hz = 852 rpm (x 60)
        assertEquals("14.2", onEdt(stiffness::getText));
        select("structure.stiffness.unit", Unit.REV_PER_MINUTE);
        assertEquals("852", onEdt(stiffness::getText));
        // The highest speed is typed in the lowest speed's unit, so it follows: 820-900 rpm = 13.667-15 Hz.
        onEdt(() -> {
            frame.showStep(1);
            return null;
        });
        JTextField low = (JTextField) find("disturbance.band.low");
        JTextField high = (JTextField) find("disturbance.band.high");
        assertEquals("820", onEdt(low::getText));
        assertEquals("900", onEdt(high::getText));
        double bandBefore = onEdt(() -> frame.shownResult().study().excitation().band().high());
        select("disturbance.band.low.unit", Unit.HERTZ);
        assertEquals(820.0 / 60, Double.parseDouble(onEdt(low::getText)), 1e-9);
        assertEquals("15", onEdt(high::getText));
        settled("band in Hz");
        assertEquals(bandBefore, onEdt(() -> frame.shownResult().study().excitation().band().high()), 1e-9 * bandBefore);
        screenshot("unit-switch");
    }

    @Test
    void changingTheFormOfAQuantityConvertsIt() throws Exception {
        open(US);
        DesignResult before = onEdt(frame::shownResult);
        // Goal: a mass ratio of 0.05 becomes the absorber mass it means (0.05 x 1800 kg = 90 kg), not 0.05 kg.
        onEdt(() -> {
            frame.showStep(2);
            return null;
        });
        JTextField size = (JTextField) find("absorber.mass_ratio");
        assertEquals("0.05", onEdt(size::getText));
        selectIndex("absorber.sizing", 1);
        assertEquals("90", onEdt(size::getText));
        JComboBox<?> sizeUnit = (JComboBox<?>) find("absorber.mass_ratio.unit");
        assertEquals(Unit.KILOGRAM, onEdt(sizeUnit::getSelectedItem));
        settled("sized by mass");
        assertEquals(before.absorber().mass(), onEdt(() -> frame.shownResult().absorber().mass()), 1e-9);
        screenshot("form-switch-mass");
        // ... and back again.
        selectIndex("absorber.sizing", 0);
        assertEquals("0.05", onEdt(size::getText));
        // Structure: mass 1800 kg <-> weight 1800 x 9.80665 N; natural frequency <-> stiffness m (2 pi f)^2.
        onEdt(() -> {
            frame.showStep(0);
            return null;
        });
        JTextField mass = (JTextField) find("structure.mass");
        selectIndex("structure.massForm", 1);
        assertEquals(1800 * Gravity.STANDARD, Double.parseDouble(onEdt(mass::getText)), 1e-6);
        JTextField stiffness = (JTextField) find("structure.stiffness");
        selectIndex("structure.stiffnessForm", 0);
        double k = 1800 * Math.pow(2 * Math.PI * 14.2, 2);
        assertEquals(k / 1000, Double.parseDouble(onEdt(stiffness::getText)), 1e-6, "kN/m");
        selectIndex("structure.stiffnessForm", 2);
        // static deflection g0 / omega^2, in mm (common practice)
        assertEquals(1000 * Gravity.STANDARD / Math.pow(2 * Math.PI * 14.2, 2), Double.parseDouble(onEdt(
                stiffness::getText)), 1e-6);
        // damping ratio 0.02 <-> Q = 1 / (2 x 0.02) = 25 <-> half-power bandwidth 2 x 0.02 x 14.2 Hz = 0.568 Hz
        JTextField damping = (JTextField) find("structure.damping");
        selectIndex("structure.dampingForm", 2);
        assertEquals("25", onEdt(damping::getText));
        selectIndex("structure.dampingForm", 3);
        assertEquals(0.568, Double.parseDouble(onEdt(damping::getText)), 1e-9);
        settled("structure in other forms");
        var s = onEdt(() -> frame.shownResult().study().structure());
        assertEquals(before.study().structure().modalMass(), s.modalMass(), 1e-9 * s.modalMass());
        assertEquals(before.study().structure().modalStiffness(), s.modalStiffness(), 1e-9 * s.modalStiffness());
        assertEquals(before.study().structure().dampingRatio(), s.dampingRatio(), 1e-9);
        screenshot("form-switch-structure");
        // Disturbance: an unbalance is no force. The field is emptied and says so; going back restores it.
        onEdt(() -> {
            frame.showStep(1);
            return null;
        });
        JTextField amplitude = (JTextField) find("disturbance.amplitude");
        String unbalance = onEdt(amplitude::getText);
        selectIndex("disturbance.kind", 0);
        assertEquals("", onEdt(amplitude::getText));
        waitFor(() -> onEdtQuietly(() -> ((JLabel) find(frame.getContentPane(), "disturbance.amplitude.message")).getText()
                .contains("type the force amplitude")), "the emptied field says what to type");
        assertFalse(onEdt(frame::nextEnabled));
        selectIndex("disturbance.kind", 1);
        assertEquals(unbalance, onEdt(amplitude::getText));
        settled("unbalance restored");
        assertEquals(before.study().excitation().amplitude(),
                onEdt(() -> frame.shownResult().study().excitation().amplitude()), 1e-12);
    }

    @Test
    void everyControlIsReachableAt1366x768AndAt200PercentOf1920x1080() throws Exception {
        open(US);
        onEdt(() -> {
            frame.load(Presets.load("pump-skid-mezzanine.json"), null);
            return null;
        });
        settled("preset with warnings");
        List<Warning> warnings = Designer.design(Presets.load("pump-skid-mezzanine.json").project().toStudy())
                .warnings();
        assertTrue(warnings.size() >= 2, "the scenario has warnings to show");
        for (Dimension screen : List.of(new Dimension(1366, 768), new Dimension(960, 540))) {
            onEdt(() -> {
                frame.setBounds(0, 0, screen.width, screen.height);
                frame.validate();
                return null;
            });
            for (int step = 0; step < 7; step++) {
                int index = step;
                onEdt(() -> {
                    frame.showStep(index);
                    frame.validate();
                    return null;
                });
                List<String> unreachable = onEdt(this::unreachableControls);
                assertTrue(unreachable.isEmpty(), "at " + screen.width + "x" + screen.height + ", step " + (step + 1)
                        + ": " + unreachable);
            }
            onEdt(() -> {
                frame.showStep(4);
                return null;
            });
            JTextPane notes = (JTextPane) find("result.notes");
            String text = onEdt(notes::getText);
            for (Warning w : warnings) {
                assertTrue(text.contains(WarningText.of(w)), "warning shown whole: " + WarningText.of(w));
            }
            // Wrapped, not cut: the text is no wider than the pane that shows it, and the pane can be seen.
            assertTrue(onEdt(() -> notes.getWidth() <= notes.getParent().getWidth() && notes.getParent().isShowing()
                    && notes.getParent().getHeight() > 40), "notes pane wraps and is visible");
            assertTrue(onEdt(() -> reachable(find(frame.getContentPane(), "next"))), "Next is on screen");
            screenshot("result-" + screen.width + "x" + screen.height);
        }
    }

    @Test
    void sizeAndPlaceAreRememberedAcrossAReopen() throws Exception {
        open(US);
        Rectangle screen = onEdt(() -> frame.getGraphicsConfiguration().getBounds());
        Rectangle first = onEdt(frame::getBounds);
        assertTrue(screen.contains(first), first + " opens within " + screen);
        Rectangle chosen = new Rectangle(screen.x + 30, screen.y + 20, 1000, 640);
        onEdt(() -> {
            frame.setBounds(chosen);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> frame.getBounds().equals(chosen)), "window moved");
        onEdt(() -> {
            frame.dispose();
            return null;
        });
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        assertEquals(chosen, onEdt(frame::getBounds));
        // A placement remembered from a larger monitor comes back within this screen.
        Rectangle huge = new Rectangle(screen.x + screen.width - 100, screen.y + 50, screen.width * 2, screen.height * 3);
        onEdt(() -> {
            frame.setBounds(huge);
            frame.dispose();
            return null;
        });
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        Rectangle reopened = onEdt(frame::getBounds);
        assertTrue(screen.contains(reopened), reopened + " within " + screen);
    }

    // --- helpers ----------------------------------------------------------------------------------

    private boolean modalMassIs(double kg) {
        return onEdtQuietly(() -> frame.settled() && frame.shownResult() != null
                && Math.abs(frame.shownResult().study().structure().modalMass() - kg) < 1e-9 * kg);
    }

    private void settled(String what) throws InterruptedException {
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null), what);
    }

    private static void type(JTextField field, String text) throws Exception {
        onEdt(() -> {
            field.setText(text);
            return null;
        });
    }

    private void select(String name, Object item) throws Exception {
        JComboBox<?> box = (JComboBox<?>) find(name);
        onEdt(() -> {
            box.setSelectedItem(item);
            return null;
        });
    }

    private void selectIndex(String name, int index) throws Exception {
        JComboBox<?> box = (JComboBox<?>) find(name);
        onEdt(() -> {
            box.setSelectedIndex(index);
            return null;
        });
    }

    /** Every input control of the step on screen, scrolled to, lies wholly within the window. */
    private List<String> unreachableControls() {
        List<String> out = new ArrayList<>();
        collect(frame.getContentPane(), out);
        return out;
    }

    private void collect(Container root, List<String> out) {
        for (Component c : root.getComponents()) {
            if (!c.isShowing() || c instanceof javax.swing.JScrollBar) {
                continue; // a scroll bar is how the rest is reached
            }
            if (c instanceof JTextField || c instanceof JComboBox || c instanceof AbstractButton) {
                if (!reachable(c)) {
                    out.add(c.getClass().getSimpleName() + " " + (c.getName() != null ? c.getName()
                            : c instanceof AbstractButton b ? b.getText() : "?") + " at "
                            + SwingUtilities.convertRectangle(c.getParent(), c.getBounds(), frame.getRootPane())
                            + " seen " + ((JComponent) c).getVisibleRect());
                }
                    if (c instanceof JComboBox) {
                    continue;
                }
            }
            if (c instanceof Container sub) {
                collect(sub, out);
            }
        }
    }

    private boolean reachable(Component c) {
        // Asked of the parent: a text field's own scrollRectToVisible only scrolls its text.
        if (c.getParent() instanceof JComponent parent) {
            parent.scrollRectToVisible(c.getBounds());
        }
        frame.getRootPane().validate();
        Rectangle inRoot = SwingUtilities.convertRectangle(c.getParent(), c.getBounds(), frame.getRootPane());
        Rectangle visible = new Rectangle(0, 0, frame.getRootPane().getWidth(), frame.getRootPane().getHeight());
        Rectangle clip = c instanceof JComponent j ? j.getVisibleRect() : new Rectangle(c.getSize());
        return c.getWidth() > 0 && c.getHeight() > 0 && visible.contains(inRoot) && clip.width == c.getWidth()
                && clip.height == c.getHeight();
    }

    private Component find(String name) throws Exception {
        Component c = onEdt(() -> find(frame.getContentPane(), name));
        assertNotNull(c, "component " + name);
        return c;
    }

    private static Component find(Container root, String name) {
        return Edt.find(root, name);
    }

    private void screenshot(String name) throws Exception {
        Thread.sleep(400); // let the window paint (not a timing assertion)
        Rectangle bounds = onEdt(() -> frame.getBounds());
        BufferedImage image = new Robot().createScreenCapture(bounds);
        ImageIO.write(image, "png", SHOTS.resolve(name + ".png").toFile());
    }

    private static <T> T onEdt(Callable<T> task) throws Exception {
        return Edt.call(task);
    }

    private static boolean onEdtQuietly(Callable<Boolean> task) {
        return Edt.callQuietly(task);
    }

    private static void waitFor(BooleanSupplier condition, String what) throws InterruptedException {
        Edt.waitFor(condition, what);
    }
}
