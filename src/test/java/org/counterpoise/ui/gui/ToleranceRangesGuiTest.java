package org.counterpoise.ui.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Container;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.function.BooleanSupplier;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.ToleranceRanges.FrequencyBasis;
import org.counterpoise.core.robust.ToleranceRanges.Range;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.ui.gui.wizard.WizardFrame;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The ranges the design must hold over on the absorber-goal step (issue 12), in a real window: an
 * empty range shows its default in grey, marked as the default; a typed range and the basis go into
 * the project through the document (so Undo takes them back), reach the design, show on the
 * robustness step in the reports' words and are saved. Same skip/fail rule as {@link WizardGuiTest}.
 */
class ToleranceRangesGuiTest {
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(ToleranceRangesGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(frame);
    }

    @Test
    void theGoalStepShowsEditsAndSavesTheRanges(@TempDir Path dir) throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        settled("first design");
        assertEquals(DesignMethod.RECOMMENDED, onEdt(frame::currentProject).absorber().method(),
                "a new project uses the recommended method");
        onEdt(() -> {
            frame.showStep(2);
            return null;
        });
        JTextField structure = (JTextField) find("robustness.structure_mistuning");
        JTextField absorber = (JTextField) find("robustness.absorber_mistuning");
        JTextField damping = (JTextField) find("robustness.absorber_damping_range");
        @SuppressWarnings("unchecked")
        JComboBox<FrequencyBasis> basis = (JComboBox<FrequencyBasis>) find("robustness.structure_frequency_basis");
        JLabel onRobustnessStep = (JLabel) find("robustness.ranges");

        // The default scenario states the two frequency ranges (10 % and 3 %) and not the damping range:
        // that field is empty and shows the default of issue 12 (20 %, common practice) in grey.
        RobustnessInput.Ranges stated = onEdt(frame::currentProject).robustness().ranges();
        assertEquals(OptionalDouble.of(10), stated.structurePercent());
        assertEquals("10", onEdt(structure::getText));
        assertEquals("3", onEdt(absorber::getText));
        assertEquals("", onEdt(damping::getText));
        assertEquals("20 (default)", onEdt(() -> damping.getClientProperty("JTextField.placeholderText")));
        assertEquals(FrequencyBasis.NOT_STATED, onEdt(basis::getSelectedItem));
        String before = onEdt(onRobustnessStep::getText);
        assertTrue(before.contains("+/-20.0 % (default: common practice, no source)"), before);

        // Typed and chosen: into the project, the design's settings and the robustness step.
        onEdt(() -> {
            damping.setText("12");
            basis.setSelectedItem(FrequencyBasis.MEASURED);
            return null;
        });
        settled("damping range and basis");
        RobustnessInput.Ranges now = onEdt(frame::currentProject).robustness().ranges();
        assertEquals(OptionalDouble.of(12), now.dampingPercent());
        assertEquals(FrequencyBasis.MEASURED, now.basis());
        ToleranceRanges used = onEdt(() -> frame.shownResult().study().robustness().ranges());
        assertEquals(0.12, used.damping(), 1e-15);
        assertEquals(Set.of(), used.defaulted(), "all three stated now");
        String after = onEdt(onRobustnessStep::getText);
        assertTrue(after.contains("+/-12.0 %") && after.contains("measured"), after);
        assertFalse(after.contains("default:"), after);

        // A value out of range is said under the field, by the file's field name.
        onEdt(() -> {
            structure.setText("60");
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> !frame.nextEnabled()), "60 % refused");
        String said = onEdt(() -> ((JLabel) find("robustness.structure_mistuning.message")).getText());
        assertTrue(said.contains("0 to 50"), said);
        onEdt(() -> {
            structure.setText("10");
            return null;
        });
        settled("back to 10 %");

        // Edits go through the document: Undo walks back to before the damping range was typed, Redo forward.
        for (int i = 0; i < 12 && onEdt(frame::currentProject).robustness().ranges().dampingPercent().isPresent(); i++) {
            onEdt(() -> frame.document().undo());
        }
        settled("undone");
        Project undone = onEdt(frame::currentProject);
        assertEquals(OptionalDouble.empty(), undone.robustness().ranges().dampingPercent(), "undone to empty");
        assertEquals("", onEdt(damping::getText));
        assertTrue(onEdt(() -> frame.shownResult().study().robustness().ranges().isDefault(Range.ABSORBER_DAMPING)));
        for (int i = 0; i < 12 && onEdt(() -> frame.document().redo()); i++) {
            // forward to the last edit
        }
        settled("redone");
        assertEquals("12", onEdt(damping::getText));
        assertEquals("10", onEdt(structure::getText));

        Path saved = dir.resolve("ranges.json");
        onEdt(() -> {
            frame.saveTo(saved);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> !frame.dirty() && Files.exists(saved)), "saved");
        Project back = ProjectReader.read(saved).project();
        assertEquals(onEdt(frame::currentProject), back);
        assertEquals(DesignMethod.RECOMMENDED, back.absorber().method());
        assertEquals(new RobustnessInput.Ranges(OptionalDouble.of(10), OptionalDouble.of(3), OptionalDouble.of(12),
                FrequencyBasis.MEASURED), back.robustness().ranges());
    }

    private void settled(String what) throws Exception {
        Thread.sleep(150); // let the pause before recomputing start (not a timing assertion)
        waitFor(() -> onEdtQuietly(frame::settled), what);
    }

    private Component find(String name) throws Exception {
        Component c = SwingUtilities.isEventDispatchThread() ? find(frame.getContentPane(), name)
                : onEdt(() -> find(frame.getContentPane(), name));
        assertNotNull(c, "component " + name);
        return c;
    }

    private static Component find(Container root, String name) {
        return Edt.find(root, name);
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
