package org.counterpoise.ui.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.awt.Frame;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import javax.swing.SwingUtilities;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.ui.gui.wizard.WizardFrame;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** {@code java -jar counterpoise.jar FILE.json}: the wizard opens on that project. */
class OpenFromCommandLineTest {
    @BeforeAll
    static void needsADisplay() {
        Edt.requireDisplay(OpenFromCommandLineTest.class);
        System.setProperty("counterpoise.prefs", "memory");
    }

    @Test
    void aProjectFileGivenAloneOpensInTheWizard() throws Exception {
        Path file = Path.of("presets/rooftop-fan-platform.json");
        GuiMain.open(file);
        AtomicReference<WizardFrame> found = new AtomicReference<>();
        for (int i = 0; i < 400 && found.get() == null; i++) {
            SwingUtilities.invokeAndWait(() -> {
                for (Frame f : Frame.getFrames()) {
                    if (f instanceof WizardFrame w && w.isShowing() && w.currentProject() != null
                            && w.currentProject().name().equals("Rooftop fan platform")) {
                        found.set(w);
                    }
                }
            });
            if (found.get() == null) {
                Thread.sleep(50); // waiting for the window, not measuring it
            }
        }
        if (found.get() == null) {
            fail("the wizard did not open on " + file);
        }
        AtomicReference<Object> shown = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> shown.set(found.get().currentProject().structure()));
        assertEquals(ProjectReader.read(file).project().structure(), shown.get());
        SwingUtilities.invokeAndWait(found.get()::dispose);
    }
}
