package org.counterpoise.ui.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.awt.Component;
import java.awt.Container;
import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import javax.imageio.ImageIO;
import javax.swing.JLabel;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.text.DesignContent;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportTable;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.wizard.WizardFrame;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The wizard in a real window (under Xvfb in CI): the values shown equal the core's result for the
 * same input, a bad value is shown inline and stops Next without losing what was typed, and a
 * saved project reopens equal. Screenshots go to target/gui.
 */
class WizardGuiTest {
    private static final Path SHOTS = Path.of("target", "gui");
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.requireDisplay(WizardGuiTest.class);
        System.setProperty("counterpoise.prefs", "memory");
        Files.createDirectories(SHOTS);
        SwingUtilities.invokeAndWait(() -> Themes.apply(false));
    }

    @AfterEach
    void close() throws Exception {
        if (frame != null) {
            SwingUtilities.invokeAndWait(frame::dispose);
        }
    }

    private void open() throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null), "first design");
    }

    @Test
    void defaultScenarioShowsTheCoresNumbersOnEveryStep() throws Exception {
        open();
        // Measured, not asserted (speed belongs to benchmarks): the longest event on the event thread
        // from here on (after start-up, which loads the classes), test steps included.
        EventTimer timer = new EventTimer();
        java.awt.Toolkit.getDefaultToolkit().getSystemEventQueue().push(timer);
        onEdt(() -> {
            frame.load(Presets.defaultProject(), null);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null), "the scenario");
        DesignResult expected = Designer.design(Presets.defaultProject().project().toStudy());
        List<String[]> rows = onEdt(frame::resultRows);
        assertEquals(QuantityFormat.number(Unit.KILONEWTON_PER_METRE.fromSi(expected.absorber().stiffness()), 4),
                value(rows, "Spring rate k2"));
        assertEquals(QuantityFormat.number(expected.absorber().mass(), 4), value(rows, "Absorber mass m2"));
        assertEquals(QuantityFormat.number(expected.absorber().damping(), 4), value(rows, "Damping coefficient c2"));
        assertEquals(QuantityFormat.number(Unit.MILLIMETRE.fromSi(expected.clearance()), 4),
                value(rows, "Clearance to leave (x1.50)"));
        // The wizard's table renders the one report model: every row of its tables, with the same
        // cells, what to build first and the inputs echoed last.
        List<String[]> model = new ArrayList<>();
        List<ReportTable.Section> tables = new ArrayList<>(ReportTable.of(DesignContent.of(expected), Set.of()));
        for (ReportTable.Section section : tables) {
            for (ReportTable.Row row : section.rows()) {
                model.add(new String[] {row.label(), row.value(), ValueText.pretty(row.unit())});
            }
        }
        assertEquals(model.size() + tables.size(), rows.size(), "one wizard row per model row and section");
        for (String[] row : model) {
            assertTrue(rows.stream().anyMatch(r -> Arrays.equals(r, row)), "wizard lacks " + row[0]);
        }
        assertTrue(rows.get(0)[0].endsWith(tables.stream().filter(t -> t.id() == SectionId.ABSORBER).findFirst()
                .orElseThrow().title()), "the absorber to build comes first: " + rows.get(0)[0]);
        String[] names = {"1-structure", "2-disturbance", "3-goal", "4-hardware", "5-result", "6-robustness", "7-sheet"};
        for (int i = 0; i < names.length; i++) {
            int step = i;
            STEP.set("step " + step);
            onEdt(() -> {
                frame.showStep(step);
                return null;
            });
            if (i == 5) {
                waitFor(() -> onEdtQuietly(() -> frame.robustnessSummary().contains("Worst case")), "robustness");
            }
            if (i == 6) {
                waitFor(() -> onEdtQuietly(frame::sheetPreviewShown), "sheet preview");
            }
            screenshot(names[i]);
        }
        String readout = onEdt(() -> frame.readoutAt(14.0));
        var fitted = new org.counterpoise.core.response.SystemResponse(expected.study().structure(), expected.tuning(),
                expected.study().excitation().kind(), expected.study().excitation().amplitude());
        String after = org.counterpoise.io.text.DisplayUnits.format(fitted.amplitudeAt(
                org.counterpoise.core.response.ResponseKind.DISPLACEMENT, Unit.HERTZ.toSi(14.0)),
                org.counterpoise.core.units.Dimension.LENGTH);
        // the values say their convention: the project's display convention, peak unless chosen
        assertTrue(readout.startsWith("At 14.00 Hz (peak):") && readout.contains("with " + after + ","), readout);
        System.out.println("longest event on the event thread during the tour: " + timer.longest());
    }

    /** Times every event the event thread dispatches (a measurement for the notes, never a pass/fail). */
    private static final AtomicReference<String> STEP = new AtomicReference<>("");

    private static final class EventTimer extends java.awt.EventQueue {
        private long longestNanos;
        private String what = "";

        @Override
        protected void dispatchEvent(java.awt.AWTEvent event) {
            long start = System.nanoTime();
            super.dispatchEvent(event);
            long took = System.nanoTime() - start;
            if (took > 50_000_000L && Boolean.getBoolean("counterpoise.edt.log")) {
                System.out.println("EDT " + took / 1_000_000 + " ms " + event.paramString() + " " + STEP.get());
            }
            if (took > longestNanos) {
                longestNanos = took;
                what = event.getClass().getSimpleName() + " " + event.paramString();
            }
        }

        String longest() {
            return String.format(java.util.Locale.ROOT, "%.1f ms (%s)", longestNanos / 1e6,
                    what.length() > 120 ? what.substring(0, 120) : what);
        }
    }

    @Test
    void badValueIsShownInlineStopsNextAndKeepsWhatWasTyped() throws Exception {
        open();
        JTextField mass = (JTextField) find("structure.mass");
        onEdt(() -> {
            mass.setText("12o0");
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> !frame.nextEnabled()), "Next disabled");
        JLabel message = (JLabel) find("structure.mass.message");
        assertTrue(onEdt(message::getText).contains("type a number"), onEdt(message::getText));
        assertTrue(onEdt(frame::statusText).startsWith("Next is not possible: Structure"), onEdt(frame::statusText));
        assertEquals("12o0", onEdt(mass::getText));
        assertEquals(null, onEdt(frame::shownResult), "no stale result is shown as current");
        screenshot("invalid-mass");
        onEdt(() -> {
            mass.setText("-5");
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> message.getText().contains("greater than 0")), "range message");
        onEdt(() -> {
            mass.setText("2000");
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null && frame.nextEnabled()),
                "fixed");
        assertEquals(2000, onEdt(() -> frame.shownResult().study().structure().modalMass()), 1e-9);
        assertTrue(onEdt(frame::dirty));
        // Typed through the keyboard like a person (java.awt.Robot): select all, then 1500.
        onEdt(() -> {
            frame.toFront();
            mass.requestFocusInWindow();
            return null;
        });
        waitFor(() -> onEdtQuietly(mass::isFocusOwner), "focus on the mass field");
        Robot robot = new Robot();
        robot.setAutoDelay(20);
        robot.keyPress(java.awt.event.KeyEvent.VK_CONTROL);
        robot.keyPress(java.awt.event.KeyEvent.VK_A);
        robot.keyRelease(java.awt.event.KeyEvent.VK_A);
        robot.keyRelease(java.awt.event.KeyEvent.VK_CONTROL);
        for (int key : new int[] {java.awt.event.KeyEvent.VK_1, java.awt.event.KeyEvent.VK_5,
            java.awt.event.KeyEvent.VK_0, java.awt.event.KeyEvent.VK_0}) {
            robot.keyPress(key);
            robot.keyRelease(key);
        }
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null
                && frame.shownResult().study().structure().modalMass() == 1500), "typed 1500");
        assertEquals("1500", onEdt(mass::getText));
        // A method that has no published form for the chosen response is refused with the reason.
        @SuppressWarnings("unchecked")
        javax.swing.JComboBox<org.counterpoise.core.response.ResponseKind> response =
                (javax.swing.JComboBox<org.counterpoise.core.response.ResponseKind>) find("absorber.response");
        // A new project starts with the recommended method, which designs for any response; equal-peak is chosen here.
        @SuppressWarnings("unchecked")
        javax.swing.JComboBox<DesignMethod> method = (javax.swing.JComboBox<DesignMethod>) find("absorber.method");
        assertEquals(DesignMethod.RECOMMENDED, onEdt(method::getSelectedItem), "a new project's method");
        onEdt(() -> {
            frame.showStep(2);
            method.setSelectedItem(DesignMethod.EQUAL_PEAK);
            response.setSelectedItem(org.counterpoise.core.response.ResponseKind.VELOCITY);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> !frame.nextEnabled()), "method refused");
        assertTrue(onEdt(frame::statusText).contains("no published equal-peak closed form"), onEdt(frame::statusText));
        screenshot("method-refused");
    }

    @Test
    void savedProjectReopensEqualAndEveryScenarioDesigns(@TempDir Path dir) throws Exception {
        open();
        JTextField order = (JTextField) find("disturbance.harmonic_order");
        onEdt(() -> {
            order.setText("2");
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null), "edit");
        Path file = dir.resolve("saved project.json");
        Project saved = onEdt(frame::currentProject);
        onEdt(() -> {
            frame.saveTo(file);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> !frame.dirty() && Files.exists(file)), "saved in the background");
        assertEquals(saved, ProjectReader.read(file).project());
        assertFalse(onEdt(frame::dirty));
        for (String name : Presets.names()) {
            onEdt(() -> {
                frame.load(Presets.load(name), null);
                return null;
            });
            waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null), name);
            DesignResult expected = Designer.design(Presets.load(name).project().toStudy());
            assertEquals(expected.absorber().stiffness(), onEdt(() -> frame.shownResult().absorber().stiffness()),
                    1e-9 * expected.absorber().stiffness(), name);
        }
        assertTrue(onEdt(() -> frame.openFile(file)));
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null), "reopen");
        assertEquals(saved, onEdt(frame::currentProject));
        Path broken = dir.resolve("broken.json");
        Files.writeString(broken, "{\"format_version\": 1");
        // A bad file is refused with a message (dialog) and the open project stays: run it off the
        // test thread and close the dialog.
        new Thread(() -> SwingUtilities.invokeLater(() -> frame.openFile(broken))).start();
        waitFor(() -> onEdtQuietly(() -> java.util.Arrays.stream(java.awt.Window.getWindows())
                .anyMatch(w -> w instanceof javax.swing.JDialog && w.isShowing())), "dialog");
        screenshot("bad-file");
        onEdt(() -> {
            for (java.awt.Window w : java.awt.Window.getWindows()) {
                if (w instanceof javax.swing.JDialog && w.isShowing()) {
                    w.dispose();
                }
            }
            return null;
        });
        assertEquals(saved, onEdt(frame::currentProject));
    }

    @Test
    void aResponseSwitchClearsTheTargetVisiblyAndTheSavedFileIsAcceptedByEveryCommand(@TempDir Path dir)
            throws Exception {
        open();
        JTextField target = (JTextField) find("robustness.target");
        assertEquals("0.15", onEdt(target::getText), "the scenario's target, in mm");
        @SuppressWarnings("unchecked")
        javax.swing.JComboBox<org.counterpoise.core.response.ResponseKind> response =
                (javax.swing.JComboBox<org.counterpoise.core.response.ResponseKind>) find("absorber.response");
        @SuppressWarnings("unchecked")
        javax.swing.JComboBox<org.counterpoise.core.design.DesignMethod> method =
                (javax.swing.JComboBox<org.counterpoise.core.design.DesignMethod>) find("absorber.method");
        onEdt(() -> {
            frame.showStep(2);
            method.setSelectedItem(org.counterpoise.core.design.DesignMethod.EXACT_PEAK);
            response.setSelectedItem(org.counterpoise.core.response.ResponseKind.VELOCITY);
            return null;
        });
        assertEquals("", onEdt(target::getText), "the mm target is cleared, not read as mm/s");
        assertTrue(onEdt(frame::statusText).contains("robustness target (0.1500 mm) was cleared"),
                onEdt(frame::statusText));
        assertEquals(null, onEdt(() -> frame.document().project().robustness().target()));
        onEdt(() -> {
            frame.showStep(5);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.robustnessSummary().contains("Worst case")),
                "robustness after the switch");
        assertFalse(onEdt(frame::robustnessSummary).contains("above the target"), "no stale target is judged");
        // A new target typed in the unit now offered (mm/s) is the one the study judges against.
        onEdt(() -> {
            target.setText("12");
            return null;
        });
        String expected = "above the target of " + org.counterpoise.io.text.DisplayUnits.format(0.012,
                org.counterpoise.core.units.Dimension.VELOCITY);
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.robustnessSummary().contains(expected)),
                "robustness judged against 12 mm/s");
        screenshot("robustness-velocity-target");
        Path file = dir.resolve("velocity.json");
        Project shown = onEdt(frame::currentProject);
        onEdt(() -> {
            frame.saveTo(file);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> !frame.dirty() && Files.exists(file)), "saved");
        assertEquals(shown, ProjectReader.read(file).project());
        for (String[] args : List.of(new String[] {"design", file.toString()},
                new String[] {"robustness", file.toString()},
                new String[] {"sheet", file.toString(), "-o", dir.resolve("velocity.pdf").toString()})) {
            java.io.StringWriter err = new java.io.StringWriter();
            int code = org.counterpoise.ui.cli.Cli.run(args, new java.io.PrintWriter(new java.io.StringWriter()),
                    new java.io.PrintWriter(err));
            assertEquals(0, code, args[0] + ": " + err);
        }
        assertTrue(onEdt(() -> frame.openFile(file)));
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null), "reopened");
        assertEquals(shown, onEdt(frame::currentProject));
        assertEquals("12", onEdt(target::getText));
    }

    @Test
    void aStatedLimitToMeetIsEmptiedWhenTheResponseChangesQuantityAndNotReadInTheNewUnit() throws Exception {
        open();
        onEdt(() -> {
            frame.load(Presets.load("compressor-frame-speed-band.json"), null);
            frame.showStep(2);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null), "the scenario");
        // The scenario's absorber is the lightest that meets its stated limit (2 m/s² peak acceleration).
        JTextField limit = (JTextField) find("acceptance.limit");
        assertEquals("2", onEdt(limit::getText), "2 m/s², the scenario's acceleration limit");
        assertTrue(onEdt(() -> frame.document().project().absorber().meetAcceptance()));
        JTextField maxRatio = (JTextField) find("absorber.max_mass_ratio");
        assertEquals("0.2", onEdt(maxRatio::getText), "the largest mass ratio is shown, not kept hidden");
        @SuppressWarnings("unchecked")
        javax.swing.JComboBox<org.counterpoise.core.response.ResponseKind> response =
                (javax.swing.JComboBox<org.counterpoise.core.response.ResponseKind>) find("absorber.response");
        onEdt(() -> {
            response.setSelectedItem(org.counterpoise.core.response.ResponseKind.VELOCITY);
            return null;
        });
        assertEquals("", onEdt(limit::getText), "2 m/s² is not read as 2 mm/s");
        JLabel note = (JLabel) find("absorber.methodNote");
        assertTrue(onEdt(note::getText).contains("was emptied"), onEdt(note::getText));
        waitFor(() -> onEdtQuietly(() -> frame.settled() && !frame.nextEnabled()), "Next waits for a limit");
        // The reason stands under the field itself too (a new user saw only "an empty field" there).
        JLabel fieldMessage = (JLabel) find("acceptance.limit.message");
        assertTrue(onEdt(fieldMessage::getText).contains("(2 for the structure acceleration) was emptied"),
                onEdt(fieldMessage::getText));
        assertEquals(null, onEdt(frame::shownResult), "no result for the old limit");
        onEdt(() -> {
            limit.setText("5");
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null), "designed for 5 mm/s");
        assertEquals(org.counterpoise.core.response.ResponseKind.VELOCITY,
                onEdt(() -> frame.shownResult().study().response()));
        assertEquals(org.counterpoise.io.project.AcceptanceInput.StatedLimit.flat(
                org.counterpoise.core.response.ResponseKind.VELOCITY,
                org.counterpoise.core.criteria.AmplitudeConvention.PEAK,
                new org.counterpoise.io.project.QuantityInput(5, Unit.MILLIMETRE_PER_SECOND)),
                onEdt(() -> frame.document().project().acceptance()));
    }

    @Test
    void undoAndRedoWorkFromTheKeyboardOnEveryEdit() throws Exception {
        open();
        JTextField mass = (JTextField) find("structure.mass");
        JTextField order = (JTextField) find("disturbance.harmonic_order");
        focus(mass);
        Robot robot = new Robot();
        robot.setAutoDelay(20);
        keys(robot, java.awt.event.KeyEvent.VK_CONTROL, java.awt.event.KeyEvent.VK_A);
        for (int key : new int[] {java.awt.event.KeyEvent.VK_2, java.awt.event.KeyEvent.VK_0,
            java.awt.event.KeyEvent.VK_0, java.awt.event.KeyEvent.VK_0}) {
            keys(robot, key);
        }
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null
                && frame.shownResult().study().structure().modalMass() == 2000), "typed 2000");
        onEdt(() -> {
            frame.showStep(1);
            order.setText("3");
            frame.showStep(0);
            return null;
        });
        focus(mass);
        assertTrue(onEdt(frame::dirty));
        assertTrue(onEdt(frame::getTitle).startsWith("\u2022 Untitled"), onEdt(frame::getTitle));
        keys(robot, java.awt.event.KeyEvent.VK_CONTROL, java.awt.event.KeyEvent.VK_Z);
        waitFor(() -> onEdtQuietly(() -> order.getText().equals("1")), "order undone");
        assertEquals("2000", onEdt(mass::getText));
        keys(robot, java.awt.event.KeyEvent.VK_CONTROL, java.awt.event.KeyEvent.VK_Z);
        waitFor(() -> onEdtQuietly(() -> mass.getText().equals("1800")), "typing undone as one step");
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null
                && frame.shownResult().study().structure().modalMass() == 1800), "result of the undone state");
        assertFalse(onEdt(frame::dirty), "undone to the state it started from");
        keys(robot, java.awt.event.KeyEvent.VK_CONTROL, java.awt.event.KeyEvent.VK_Y);
        waitFor(() -> onEdtQuietly(() -> mass.getText().equals("2000")), "redo with Ctrl+Y");
        keys(robot, java.awt.event.KeyEvent.VK_CONTROL, java.awt.event.KeyEvent.VK_SHIFT,
                java.awt.event.KeyEvent.VK_Z);
        waitFor(() -> onEdtQuietly(() -> order.getText().equals("3")), "redo with Ctrl+Shift+Z");
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null
                && frame.shownResult().study().excitation().band().low() > 0
                && frame.shownResult().study().structure().modalMass() == 2000), "result of the redone state");
        assertEquals(3.0, onEdt(() -> frame.document().project().disturbance().harmonicOrder()));
    }

    @Test
    void ctrlSOnTheGoalStepSavesTheProjectAndOpensNoChartDialog(@TempDir Path dir) throws Exception {
        open();
        Path file = dir.resolve("fan.json");
        Files.copy(Path.of("presets", "rooftop-fan-platform.json"), file);
        assertTrue(onEdt(() -> frame.openFile(file)));
        JTextField margin = (JTextField) find("absorber.stroke_margin");
        onEdt(() -> {
            frame.showStep(2);
            margin.setText("2");
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> frame.settled() && frame.shownResult() != null), "design");
        Component chart = find("chart.massRatio");
        waitFor(() -> onEdtQuietly(() -> ((org.counterpoise.ui.gui.plot.ChartHost) chart).shownChart() != null),
                "mass-ratio chart");
        // Click the chart (where XChart would take Ctrl+S for its own PNG dialog), then Ctrl+S.
        java.awt.Point at = onEdt(() -> {
            java.awt.Point p = chart.getLocationOnScreen();
            return new java.awt.Point(p.x + chart.getWidth() / 2, p.y + chart.getHeight() / 2);
        });
        Robot robot = new Robot();
        robot.setAutoDelay(20);
        onEdt(() -> {
            frame.toFront();
            margin.requestFocusInWindow();
            return null;
        });
        robot.mouseMove(at.x, at.y);
        robot.mousePress(java.awt.event.InputEvent.BUTTON1_DOWN_MASK);
        robot.mouseRelease(java.awt.event.InputEvent.BUTTON1_DOWN_MASK);
        keys(robot, java.awt.event.KeyEvent.VK_CONTROL, java.awt.event.KeyEvent.VK_S);
        waitFor(() -> onEdtQuietly(() -> !frame.dirty()), "saved by Ctrl+S");
        assertEquals(2.0, ProjectReader.read(file).project().absorber().strokeMargin());
        assertFalse(onEdt(() -> java.util.Arrays.stream(java.awt.Window.getWindows())
                .anyMatch(w -> w instanceof javax.swing.JDialog && w.isShowing())), "no chart save dialog");
        // Every step: click in the middle of the page (a chart, a table or a field), then Ctrl+S.
        for (int step = 0; step < 7; step++) {
            int index = step;
            Files.delete(file);
            onEdt(() -> {
                frame.showStep(index);
                return null;
            });
            java.awt.Point middle = onEdt(() -> {
                Component page = frame.getContentPane();
                java.awt.Point p = page.getLocationOnScreen();
                return new java.awt.Point(p.x + page.getWidth() * 3 / 5, p.y + page.getHeight() / 2);
            });
            robot.mouseMove(middle.x, middle.y);
            robot.mousePress(java.awt.event.InputEvent.BUTTON1_DOWN_MASK);
            robot.mouseRelease(java.awt.event.InputEvent.BUTTON1_DOWN_MASK);
            keys(robot, java.awt.event.KeyEvent.VK_CONTROL, java.awt.event.KeyEvent.VK_S);
            waitFor(() -> Files.exists(file), "Ctrl+S on step " + (index + 1));
            assertFalse(onEdt(() -> java.util.Arrays.stream(java.awt.Window.getWindows())
                    .anyMatch(w -> w instanceof javax.swing.JDialog && w.isShowing())), "no dialog, step " + index);
        }
    }

    @Test
    void aNewProjectIsUntitledAndItsDetailsRoundTripThroughTheFile(@TempDir Path dir) throws Exception {
        open();
        assertEquals("Untitled", onEdt(() -> frame.document().project().name()));
        assertTrue(onEdt(frame::getTitle).startsWith("Untitled"), onEdt(frame::getTitle));
        onEdt(() -> {
            frame.load(Presets.load(Presets.names().get(1)), null);
            frame.toFront();
            return null;
        });
        focus((JTextField) find("structure.mass"));
        keys(new Robot(), java.awt.event.KeyEvent.VK_CONTROL, java.awt.event.KeyEvent.VK_N);
        waitFor(() -> onEdtQuietly(() -> frame.document().project().name().equals("Untitled")), "Ctrl+N");
        onEdt(() -> {
            frame.showProjectDetails();
            return null;
        });
        javax.swing.JDialog dialog = onEdt(() -> (javax.swing.JDialog) java.util.Arrays.stream(
                java.awt.Window.getWindows()).filter(w -> "project.dialog".equals(w.getName())
                        && w.getOwner() == frame && w.isShowing()).findFirst().orElseThrow()); // not an earlier frame's
        java.util.Map<String, javax.swing.text.JTextComponent> fields = new java.util.HashMap<>();
        for (String id : List.of("project.name", "project.revision", "project.date", "project.engineer",
                "project.client", "project.notes")) {
            fields.put(id, (javax.swing.text.JTextComponent) onEdt(() -> find(dialog.getContentPane(), id)));
        }
        onEdt(() -> {
            fields.get("project.name").setText("Dryer hall walkway");
            fields.get("project.revision").setText("B");
            fields.get("project.date").setText("30.11.2026");
            fields.get("project.engineer").setText("M. Okafor");
            fields.get("project.client").setText("Invented mill, hall 3");
            fields.get("project.notes").setText("Invented for this test.\nSecond line.");
            return null;
        });
        JLabel dateMessage = (JLabel) onEdt(() -> find(dialog.getContentPane(), "project.date.message"));
        assertTrue(onEdt(dateMessage::getText).contains("YYYY-MM-DD"), onEdt(dateMessage::getText));
        assertEquals("", onEdt(() -> frame.document().project().identity().date()), "a bad date is not taken");
        assertTrue(onEdt(() -> {
            dialog.validate();
            javax.swing.text.JTextComponent engineer = fields.get("project.engineer");
            return engineer.getWidth() >= engineer.getPreferredSize().width;
        }), "the fields keep their width while a refused date's message is shown");
        onEdt(() -> {
            fields.get("project.date").setText("2026-11-30");
            return null;
        });
        screenshot("project-details");
        org.counterpoise.io.project.ProjectIdentity expected = new org.counterpoise.io.project.ProjectIdentity("B",
                "M. Okafor", "Invented mill, hall 3", "2026-11-30");
        assertEquals(expected, onEdt(() -> frame.document().project().identity()));
        assertTrue(onEdt(frame::getTitle).contains("Dryer hall walkway"));
        Path file = dir.resolve("walkway.json");
        onEdt(() -> {
            dialog.dispose();
            frame.saveTo(file);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> !frame.dirty() && Files.exists(file)), "saved");
        Project read = ProjectReader.read(file).project();
        assertEquals("Dryer hall walkway", read.name());
        assertEquals("Invented for this test.\nSecond line.", read.notes());
        assertEquals(expected, read.identity());
        java.io.StringWriter out = new java.io.StringWriter();
        assertEquals(0, org.counterpoise.ui.cli.Cli.run(new String[] {"design", file.toString()},
                new java.io.PrintWriter(out), new java.io.PrintWriter(new java.io.StringWriter())));
        assertTrue(out.toString().contains("M. Okafor") && out.toString().contains("Invented mill, hall 3"));
        onEdt(() -> {
            frame.load(Presets.defaultProject(), null);
            return null;
        });
        assertTrue(onEdt(() -> frame.openFile(file)));
        assertEquals("M. Okafor", onEdt(() -> fields.get("project.engineer").getText()));
        assertEquals("2026-11-30", onEdt(() -> fields.get("project.date").getText()));
    }

    @Test
    void unsavedChangesAreAskedAboutBeforeANewProject() throws Exception {
        open();
        JTextField mass = (JTextField) find("structure.mass");
        onEdt(() -> {
            mass.setText("2200");
            return null;
        });
        waitFor(() -> onEdtQuietly(frame::dirty), "edited");
        focus(mass);
        Robot robot = new Robot();
        robot.setAutoDelay(20);
        keys(robot, java.awt.event.KeyEvent.VK_CONTROL, java.awt.event.KeyEvent.VK_N);
        waitFor(() -> onEdtQuietly(() -> showingDialog() != null), "the unsaved-changes question");
        screenshot("unsaved-changes");
        keys(robot, java.awt.event.KeyEvent.VK_ESCAPE);
        waitFor(() -> onEdtQuietly(() -> showingDialog() == null), "question dismissed");
        assertEquals("2200", onEdt(mass::getText), "Escape keeps the edited project");
        assertTrue(onEdt(frame::dirty));
        // Without a window manager the focus does not come back to the window by itself: click the field.
        java.awt.Point inField = onEdt(() -> {
            java.awt.Point p = mass.getLocationOnScreen();
            return new java.awt.Point(p.x + mass.getWidth() / 2, p.y + mass.getHeight() / 2);
        });
        robot.mouseMove(inField.x, inField.y);
        robot.mousePress(java.awt.event.InputEvent.BUTTON1_DOWN_MASK);
        robot.mouseRelease(java.awt.event.InputEvent.BUTTON1_DOWN_MASK);
        waitFor(() -> onEdtQuietly(mass::isFocusOwner), "focus back on the mass field");
        keys(robot, java.awt.event.KeyEvent.VK_CONTROL, java.awt.event.KeyEvent.VK_N);
        waitFor(() -> onEdtQuietly(() -> showingDialog() != null), "asked again");
        onEdt(() -> {
            javax.swing.JButton no = (javax.swing.JButton) findButton(showingDialog(), "No");
            no.doClick();
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> !frame.dirty() && mass.getText().equals("1800")), "discarded: new project");
        assertEquals("Untitled", onEdt(() -> frame.document().project().name()));
    }

    private static javax.swing.JDialog showingDialog() {
        for (java.awt.Window w : java.awt.Window.getWindows()) {
            if (w instanceof javax.swing.JDialog d && d.isShowing()) {
                return d;
            }
        }
        return null;
    }

    private static Component findButton(Container root, String text) {
        for (Component c : root.getComponents()) {
            if (c instanceof javax.swing.JButton b && text.equals(b.getText())) {
                return c;
            }
            if (c instanceof Container sub) {
                Component found = findButton(sub, text);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    private void focus(JTextField field) throws Exception {
        onEdt(() -> {
            frame.toFront();
            field.requestFocusInWindow();
            return null;
        });
        waitFor(() -> onEdtQuietly(field::isFocusOwner), "focus on " + field.getName());
    }

    /** Presses the keys in order and releases them in reverse, like a person's chord. */
    private static void keys(Robot robot, int... codes) {
        for (int k : codes) {
            robot.keyPress(k);
        }
        for (int i = codes.length - 1; i >= 0; i--) {
            robot.keyRelease(codes[i]);
        }
        robot.waitForIdle();
    }

    private static String value(List<String[]> rows, String label) {
        return rows.stream().filter(r -> r[0].equals(label)).findFirst().map(r -> r[1])
                .orElseThrow(() -> new AssertionError("no row " + label + " in "
                        + rows.stream().map(r -> r[0]).toList()));
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
