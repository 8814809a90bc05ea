package org.counterpoise.ui.gui.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Container;
import java.awt.Toolkit;
import java.awt.event.KeyEvent;
import java.awt.event.MouseEvent;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.BooleanSupplier;
import javax.swing.InputMap;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JToggleButton;
import javax.swing.KeyStroke;
import javax.swing.MenuElement;
import javax.swing.SwingUtilities;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.io.chart.ChartFactory;
import org.counterpoise.io.chart.ChartTheme;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.ui.gui.Edt;
import org.counterpoise.ui.gui.Themes;
import org.counterpoise.ui.gui.wizard.WizardFrame;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;

/**
 * The chart panels in a real window (under Xvfb in CI): shortcuts belong to the application (no
 * chart-library key binding or menu anywhere in the wizard), charts follow the dark look, and the
 * pointer readout is cleared when the chart's data changes. Skips without a display, unless
 * counterpoise.gui.required is set (as in CI), where it fails.
 */
class ChartHostGuiTest {
    private static final DesignResult FAN = Designer.design(ProjectReader.readStudy(
            Path.of("presets/rooftop-fan-platform.json")));
    private JFrame window;
    private WizardFrame wizard;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.requireDisplay(ChartHostGuiTest.class);
        System.setProperty("counterpoise.prefs", "memory");
        SwingUtilities.invokeAndWait(() -> Themes.apply(false));
    }

    @AfterEach
    void close() throws Exception {
        SwingUtilities.invokeAndWait(() -> {
            Themes.apply(false);
            if (window != null) {
                window.dispose();
            }
            if (wizard != null) {
                wizard.dispose();
            }
        });
    }

    private ChartHost showInWindow() throws Exception {
        return onEdt(() -> {
            ChartHost host = new ChartHost("chart.test");
            window = new JFrame("chart test");
            window.getContentPane().add(host, BorderLayout.CENTER);
            window.setSize(640, 360);
            window.setVisible(true);
            DesignCurves c = DesignCurves.of(FAN);
            host.show(theme -> ChartFactory.response(FAN, c, true, theme, 600, 300));
            return host;
        });
    }

    @Test
    void noChartLibraryShortcutOrMenuAnywhereInTheWizard() throws Exception {
        wizard = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        waitFor(() -> onEdtQuietly(() -> wizard.settled() && wizard.shownResult() != null), "first design");
        // Visit every step so every chart has been shown (the goal step's mass-ratio chart included).
        for (int step = 0; step < 7; step++) {
            int s = step;
            onEdt(() -> {
                wizard.showStep(s);
                return null;
            });
        }
        waitFor(() -> onEdtQuietly(() -> !charts(wizard).isEmpty()
                // the run-up tab draws only when it is opened and the project gives a rate (RunUpViewGuiTest);
                // the several-absorbers tab only for a project of several (SeveralAbsorbersGuiTest)
                && charts(wizard).stream().allMatch(h -> h.shownChart() != null || h.getName().equals("chart.map")
                        || h.getName().startsWith("runup.") || h.getName().equals("chart.several"))),
                "charts shown");
        onEdt(() -> {
            int menuKey = Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
            List<KeyStroke> libraryKeys = List.of(KeyStroke.getKeyStroke(KeyEvent.VK_S, menuKey),
                    KeyStroke.getKeyStroke(KeyEvent.VK_E, menuKey), KeyStroke.getKeyStroke(KeyEvent.VK_P, menuKey));
            List<ChartHost> hosts = charts(wizard);
            assertTrue(hosts.size() >= 5, "response, stroke, mass ratio, sensitivity, histogram, map: " + hosts.size());
            for (Component c : all(wizard.getContentPane())) {
                // The chart library's own panel is nowhere in the window.
                assertFalse(c.getClass().getName().startsWith("org.knowm"), c.getClass().getName());
                if (c instanceof JComponent j) {
                    for (int condition : new int[] {JComponent.WHEN_FOCUSED,
                        JComponent.WHEN_ANCESTOR_OF_FOCUSED_COMPONENT, JComponent.WHEN_IN_FOCUSED_WINDOW}) {
                        for (KeyStroke k : libraryKeys) {
                            Object key = binding(j.getInputMap(condition), k);
                            if (key != null) {
                                var action = j.getActionMap().get(key);
                                assertTrue(action == null || !action.getClass().getName().startsWith("org.knowm"),
                                        k + " on " + c.getName() + " runs " + action);
                            }
                        }
                    }
                    for (var l : j.getMouseListeners()) {
                        assertFalse(l.getClass().getName().startsWith("org.knowm"), l.getClass().getName());
                    }
                }
            }
            for (ChartHost host : hosts) {
                if (host.getComponentCount() == 0 || !(host.getComponent(0) instanceof JComponent canvas)
                        || canvas.getComponentPopupMenu() == null) {
                    continue;
                }
                // The right-click menu holds the application's actions only.
                List<String> items = new ArrayList<>();
                for (MenuElement e : canvas.getComponentPopupMenu().getSubElements()) {
                    items.add(((javax.swing.JMenuItem) e.getComponent()).getText());
                }
                assertEquals(List.of("Copy values"), items, host.getName());
            }
            return null;
        });
    }

    private static Object binding(InputMap map, KeyStroke k) {
        for (InputMap m = map; m != null; m = m.getParent()) {
            Object v = m.get(k);
            if (v != null) {
                return v;
            }
        }
        return null;
    }

    @Test
    void chartsFollowTheDarkLookAndBack() throws Exception {
        ChartHost host = showInWindow();
        assertEquals(ChartTheme.LIGHT.background(), onEdt(() -> host.chart().getStyler().getChartBackgroundColor()));
        onEdt(() -> {
            Themes.apply(true, window);
            return null;
        });
        XYChart dark = onEdt(host::chart);
        assertEquals(ChartTheme.DARK.background(), dark.getStyler().getChartBackgroundColor());
        assertEquals(ChartTheme.DARK.text(), dark.getStyler().getChartFontColor());
        assertEquals(ChartTheme.DARK.after(), dark.getSeriesMap().get("with absorber").getLineColor());
        onEdt(() -> {
            Themes.apply(false, window);
            return null;
        });
        assertEquals(ChartTheme.LIGHT.background(), onEdt(() -> host.chart().getStyler().getChartBackgroundColor()));
    }

    @Test
    void pointerReportsFrequencyAndNothingOnceTheDataChange() throws Exception {
        ChartHost host = showInWindow();
        List<Double> heard = new ArrayList<>();
        onEdt(() -> {
            host.onPointer(heard::add);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> host.getComponent(0).isShowing()), "chart shown");
        // Paint once so the chart knows its axes, then move the pointer to the middle of it.
        onEdt(() -> {
            JComponent canvas = (JComponent) host.getComponent(0);
            canvas.paintImmediately(canvas.getBounds());
            canvas.dispatchEvent(new MouseEvent(canvas, MouseEvent.MOUSE_MOVED, System.currentTimeMillis(), 0,
                    canvas.getWidth() / 2, canvas.getHeight() / 2, 0, false));
            return null;
        });
        assertEquals(1, heard.size(), heard.toString());
        double hz = heard.get(0);
        assertTrue(hz > 2 && hz < 36, "a frequency inside the plotted range (2.8 to 35.5 Hz): " + hz);
        onEdt(() -> {
            DesignCurves c = DesignCurves.of(FAN);
            host.show(theme -> ChartFactory.response(FAN, c, false, theme, 600, 300));
            return null;
        });
        assertEquals(2, heard.size());
        assertTrue(Double.isNaN(heard.get(1)), "new data: the readout is told to clear");
        onEdt(() -> {
            host.message("nothing to show");
            return null;
        });
        assertTrue(Double.isNaN(heard.get(2)));
        assertNotNull(onEdt(host::actions));
    }

    @Test
    void theResultStepsReadoutClearsWhenItsChartsChange() throws Exception {
        wizard = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        waitFor(() -> onEdtQuietly(() -> wizard.settled() && wizard.shownResult() != null), "first design");
        onEdt(() -> {
            wizard.showStep(4);
            return null;
        });
        String reading = onEdt(() -> wizard.readoutAt(14.0));
        assertTrue(reading.startsWith("At 14.00 Hz (peak):"), reading);
        onEdt(() -> {
            for (Component c : all(wizard.getContentPane())) {
                if ("result.log".equals(c.getName())) {
                    ((JToggleButton) c).doClick();
                }
            }
            return null;
        });
        String after = onEdt(() -> {
            for (Component c : all(wizard.getContentPane())) {
                if ("result.readout".equals(c.getName())) {
                    return ((javax.swing.JLabel) c).getText();
                }
            }
            return null;
        });
        assertFalse(after.startsWith("At "), "the readout of the old chart is gone: " + after);
    }

    private static List<ChartHost> charts(Container root) {
        List<ChartHost> out = new ArrayList<>();
        for (Component c : all(root)) {
            if (c instanceof ChartHost h) {
                out.add(h);
            }
        }
        return out;
    }

    private static List<Component> all(Container root) {
        List<Component> out = new ArrayList<>();
        for (Component c : root.getComponents()) {
            out.add(c);
            if (c instanceof Container k) {
                out.addAll(all(k));
            }
        }
        return out;
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
