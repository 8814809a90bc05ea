package org.counterpoise.ui.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.awt.Component;
import java.awt.Container;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import java.util.function.BooleanSupplier;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JRadioButton;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RmsFigures;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Spectrum;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.SpectralDensityUnit;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.project.AbsorberInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.ProjectWriter;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.SpectrumInput;
import org.counterpoise.io.text.DesignContent;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.ui.gui.wizard.WizardFrame;
import org.counterpoise.testing.Scenarios;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The disturbance's optional run-up rate and its spectrum (harmonic or white noise) in a real
 * window: a file that states them opens with them shown and is saved back with them (issue 10,
 * item 1: what is saved is what is shown), and the broadband choice designs with a variance
 * method and shows the rms values the core computes (item 8). Same skip/fail rule as
 * {@link WizardGuiTest}.
 */
class DisturbanceSpectrumGuiTest {
    private WizardFrame frame;

    @BeforeAll
    static void needsADisplay() throws Exception {
        Edt.prepareWizardTests(DisturbanceSpectrumGuiTest.class);
    }

    @AfterEach
    void close() throws Exception {
        Edt.dispose(frame);
    }

    private void open() throws Exception {
        frame = onEdt(() -> {
            WizardFrame f = new WizardFrame();
            f.setVisible(true);
            return f;
        });
        settled("first design");
    }

    /** An invented scenario: the first preset's structure under a white-noise force, minimum-variance design. */
    private static Project whiteNoiseProject() {
        return Scenarios.whiteNoiseProject();
    }

    @Test
    void aWhiteNoiseFileAndARunUpRateAreShownAndSavedBack(@TempDir Path dir) throws Exception {
        open();
        Project written = whiteNoiseProject();
        Path file = dir.resolve("white noise.json");
        ProjectWriter.writeAtomically(file, ProjectWriter.toJson(written));
        Project inFile = ProjectReader.read(file).project();
        assertTrue(onEdt(() -> frame.openFile(file)));
        settled("white-noise file");
        assertTrue(((JRadioButton) find("disturbance.spectrum.whiteNoise")).isSelected());
        assertEquals("2.5", onEdt(() -> ((JTextField) find("disturbance.spectrum.psd.value")).getText()));
        assertEquals(SpectralDensityUnit.KILONEWTON_SQUARED_PER_HERTZ,
                onEdt(() -> ((JComboBox<?>) find("disturbance.spectrum.psd.unit")).getSelectedItem()));
        assertEquals("12", onEdt(() -> ((JTextField) find("disturbance.run_up_rate")).getText()));
        assertTrue(onEdt(() -> frame.shownResult().rms().isPresent()), "a white-noise design reports rms values");
        Path saved = dir.resolve("saved.json");
        save(saved);
        Project back = ProjectReader.read(saved).project();
        assertEquals(inFile, back);
        assertEquals(Spectrum.Kind.WHITE_NOISE, back.disturbance().spectrum().kind());
        assertEquals(2.5, back.disturbance().spectrum().psdValue());
        assertEquals(new QuantityInput(12, Unit.RPM_PER_SECOND), back.disturbance().runUpRate());

        // A harmonic file with a run-up rate stays harmonic and keeps its rate.
        Project harmonic = new Project(written.name(), written.notes(), written.structure(),
                written.disturbance().withSpectrum(null).withRunUpRate(new QuantityInput(0.5, Unit.HERTZ_PER_SECOND)),
                new AbsorberInput(OptionalDouble.of(0.05), null, DesignMethod.EQUAL_PEAK, ResponseKind.DISPLACEMENT, false, 1.5),
                written.robustness(), written.identity());
        Path harmonicFile = dir.resolve("harmonic.json");
        ProjectWriter.writeAtomically(harmonicFile, ProjectWriter.toJson(harmonic));
        assertTrue(onEdt(() -> frame.openFile(harmonicFile)));
        settled("harmonic file");
        assertTrue(((JRadioButton) find("disturbance.spectrum.harmonic")).isSelected());
        assertFalse(onEdt(() -> find("disturbance.spectrum.psd.value").isEnabled()));
        assertTrue(onEdt(() -> frame.shownResult().rms().isEmpty()));
        Path savedHarmonic = dir.resolve("saved harmonic.json");
        save(savedHarmonic);
        Project harmonicBack = ProjectReader.read(savedHarmonic).project();
        assertEquals(ProjectReader.read(harmonicFile).project(), harmonicBack);
        assertNull(harmonicBack.disturbance().spectrum());
        assertEquals(new QuantityInput(0.5, Unit.HERTZ_PER_SECOND), harmonicBack.disturbance().runUpRate());
        assertFalse(Files.readString(savedHarmonic).contains("spectrum"));

        // Emptying the optional rate removes it from the project, and Undo brings it back.
        JTextField rate = (JTextField) find("disturbance.run_up_rate");
        onEdt(() -> {
            rate.setText("");
            return null;
        });
        settled("rate emptied");
        assertNull(onEdt(frame::currentProject).disturbance().runUpRate());
        onEdt(() -> frame.document().undo());
        settled("undo");
        assertEquals(new QuantityInput(0.5, Unit.HERTZ_PER_SECOND), onEdt(frame::currentProject).disturbance().runUpRate());
        assertEquals("0.5", onEdt(rate::getText));
    }

    @Test
    void theBroadbandChoiceDesignsWithAVarianceMethodAndShowsRmsValues(@TempDir Path dir) throws Exception {
        open();
        onEdt(() -> {
            frame.load(Presets.defaultProject(), null);
            return null;
        });
        settled("default scenario");
        @SuppressWarnings("unchecked")
        JComboBox<String> kind = (JComboBox<String>) find("disturbance.kind");
        JRadioButton broadband = (JRadioButton) find("disturbance.spectrum.whiteNoise");
        JTextField psd = (JTextField) find("disturbance.spectrum.psd.value");
        JTextField amplitude = (JTextField) find("disturbance.amplitude");
        // An unbalance cannot be white noise (core allows a force or a base acceleration): said under the level.
        onEdt(() -> {
            broadband.doClick();
            psd.setText("0.8");
            return null;
        });
        settled("white-noise unbalance");
        assertNull(onEdt(frame::shownResult));
        String said = onEdt(() -> ((JLabel) find("disturbance.spectrum.psd.value.message")).getText());
        assertTrue(said.contains("force or a base acceleration"), said);
        // A base acceleration: the level's units are those of an acceleration spectrum.
        onEdt(() -> {
            kind.setSelectedIndex(ExcitationKind.BASE_ACCELERATION.ordinal());
            amplitude.setText("0.5");
            psd.setText("0.8");
            return null;
        });
        settled("white-noise base acceleration");
        assertEquals(SpectralDensityUnit.ACCELERATION_SQUARED_PER_HERTZ,
                onEdt(() -> ((JComboBox<?>) find("disturbance.spectrum.psd.unit")).getSelectedItem()));
        // A force: a level typed for an acceleration means nothing now, so it is emptied and said so.
        onEdt(() -> {
            kind.setSelectedIndex(ExcitationKind.FORCE.ordinal());
            return null;
        });
        settled("white-noise force, level emptied");
        assertEquals("", onEdt(psd::getText));
        String emptied = onEdt(() -> ((JLabel) find("disturbance.spectrum.psd.value.message")).getText());
        assertTrue(emptied.contains("PSD level of the force"), emptied);
        onEdt(() -> {
            amplitude.setText("300");
            psd.setText("800");
            return null;
        });
        settled("white-noise force");
        assertEquals(SpectralDensityUnit.NEWTON_SQUARED_PER_HERTZ,
                onEdt(() -> ((JComboBox<?>) find("disturbance.spectrum.psd.unit")).getSelectedItem()));
        // The scenario's equal-peak method judges peaks: refused at the method, in core's words.
        assertNull(onEdt(frame::shownResult));
        String methodNote = onEdt(() -> ((JLabel) find("absorber.methodNote")).getText());
        assertTrue(methodNote.contains("minimum-variance"), methodNote);
        @SuppressWarnings("unchecked")
        JComboBox<DesignMethod> method = (JComboBox<DesignMethod>) find("absorber.method");
        onEdt(() -> {
            method.setSelectedItem(DesignMethod.MINIMUM_VARIANCE);
            return null;
        });
        settled("minimum-variance design");
        DesignResult shown = onEdt(frame::shownResult);
        assertNotNull(shown, onEdt(frame::statusText) + " / " + onEdt(() -> ((JLabel) find("absorber.methodNote")).getText()));
        assertEquals(DesignMethod.MINIMUM_VARIANCE, shown.study().method());
        RmsFigures rms = shown.rms().orElseThrow();
        assertEquals(800, rms.psdLevel(), 1e-12);
        // Independent route for the bare structure, Miles' equation (Miles 1954, J. Aeronaut. Sci. 21(11)):
        // sigma^2 = (pi / 2) f_n Q G0 / k^2 with Q = 1 / (2 zeta), k = m wn^2, f_n = wn / (2 pi), which is
        // G0 / (8 zeta m^2 wn^3), on the structure's effective mass at the absorber point.
        var structure = shown.study().structure();
        double wn = structure.naturalFrequency();
        double bare = Math.sqrt(800 / (8 * structure.dampingRatio() * structure.effectiveMass()
                * structure.effectiveMass() * wn * wn * wn));
        assertEquals(bare, rms.before(), 1e-6 * bare);
        List<String[]> rows = onEdt(frame::resultRows);
        Dimension d = shown.study().response().dimension();
        assertEquals(QuantityFormat.number(DisplayUnits.of(d).fromSi(rms.after()), QuantityFormat.FIGURES),
                value(rows, "With absorber (r.m.s.)"));
        assertEquals(QuantityFormat.number(DisplayUnits.of(d).fromSi(rms.before()), QuantityFormat.FIGURES),
                value(rows, "Without absorber (r.m.s.)"));
        assertTrue(rms.after() < rms.before(), "the absorber lowers the rms response");
        String harmonicPeaks = DesignContent.of(shown).section(SectionId.RESPONSE).orElseThrow().title();
        assertTrue(rows.stream().noneMatch(r -> r[0].contains(harmonicPeaks)),
                "no harmonic peak section beside the rms values");
        Path saved = dir.resolve("broadband.json");
        save(saved);
        Project back = ProjectReader.read(saved).project();
        assertEquals(onEdt(frame::currentProject), back);
        assertEquals(SpectrumInput.whiteNoise(800, SpectralDensityUnit.NEWTON_SQUARED_PER_HERTZ),
                back.disturbance().spectrum());
        // Back to harmonic: no spectrum in the project, and peaks again.
        onEdt(() -> {
            ((JRadioButton) find("disturbance.spectrum.harmonic")).doClick();
            return null;
        });
        settled("harmonic again");
        assertNull(onEdt(frame::currentProject).disturbance().spectrum());
        assertTrue(onEdt(() -> frame.shownResult().rms().isEmpty()));
    }

    private void save(Path file) throws Exception {
        onEdt(() -> {
            frame.saveTo(file);
            return null;
        });
        waitFor(() -> onEdtQuietly(() -> !frame.dirty() && Files.exists(file)), "saved in the background");
    }

    private void settled(String what) throws Exception {
        Thread.sleep(150); // let the pause before recomputing start (not a timing assertion)
        waitFor(() -> onEdtQuietly(frame::settled), what);
    }

    private static String value(List<String[]> rows, String label) {
        return rows.stream().filter(r -> r[0].equals(label)).findFirst().map(r -> r[1])
                .orElseThrow(() -> new AssertionError("no row " + label + " in " + rows.stream().map(r -> r[0]).toList()));
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
