package org.counterpoise.ui.gui.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import javax.swing.JFrame;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.RunUpStudy;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.text.RunUpReport;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.Edt;
import org.counterpoise.ui.gui.task.TaskRunner;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The result step's run-up view: it computes only when shown, shows the core's figures for the
 * design on screen, takes the rate from the project or from its own field, and never shows a
 * result for an older design or rate.
 */
class RunUpViewGuiTest {
    @BeforeAll
    static void display() {
        Edt.requireDisplay(RunUpViewGuiTest.class);
    }

    private static Project withRate(Project p, double rpmPerSecond) {
        return new Project(p.name(), p.notes(), p.structure(),
                p.disturbance().withRunUpRate(new QuantityInput(rpmPerSecond, Unit.RPM_PER_SECOND)), p.absorber(),
                p.robustness(), p.identity());
    }

    /** The stroke row as the core computes it for this design and rate. */
    private static String strokeWith(DesignResult d, double rpmPerSecond) {
        RunUpStudy.Result r = RunUpStudy.runUp(d, 1.0, Unit.RPM_PER_SECOND.toSi(rpmPerSecond)).run(ProgressListener.NONE);
        return ValueText.pretty(RunUpReport.transientPeak(r.data(), r.data().comparison().withAbsorber(),
                ResponseKind.STROKE, Unit.REV_PER_MINUTE));
    }

    @Test
    void showsTheCoreFiguresForTheDesignOnScreenAndNeverAnOldOne() throws Exception {
        Project fan = withRate(ProjectReader.read(Path.of("presets/rooftop-fan-platform.json")).project(), 200);
        DesignResult design = Designer.design(fan.toStudy());
        Project pump = withRate(ProjectReader.read(Path.of("presets/pump-skid-mezzanine.json")).project(), 300);
        DesignResult other = Designer.design(pump.toStudy());
        AtomicLong generation = new AtomicLong();
        RunUpView view = Edt.call(() -> new RunUpView(new TaskRunner(generation::get, null)));
        JFrame frame = Edt.call(() -> {
            JFrame f = new JFrame("run-up");
            view.design(design, fan); // not shown yet: nothing runs
            return f;
        });
        assertTrue(Edt.call(view::rows).isEmpty(), "nothing is computed before the view is shown");
        Edt.call(() -> {
            frame.add(view.component());
            frame.setSize(1000, 800);
            frame.setVisible(true);
            return null;
        });
        Edt.waitFor(() -> Edt.callQuietly(() -> !view.rows().isEmpty()), "the run-up of the fan");
        List<List<String>> rows = Edt.call(view::rows);
        assertEquals("absorber stroke", rows.get(3).get(0));
        assertEquals(strokeWith(design, 200), rows.get(3).get(1));
        assertEquals("-", rows.get(3).get(2));
        assertEquals("from the Disturbance step", Edt.call(view::rateSource));
        assertEquals("200", Edt.call(() -> view.rateField().getText()));

        // A new design arrives while shown: the old figures go at once, the new ones come for the new design.
        Edt.call(() -> {
            generation.incrementAndGet();
            view.design(other, pump);
            return null;
        });
        assertTrue(Edt.call(view::rows).isEmpty(), "the fan's figures are cleared with the new design");
        Edt.waitFor(() -> Edt.callQuietly(() -> !view.rows().isEmpty()), "the run-up of the pump skid");
        assertEquals(strokeWith(other, 300), Edt.call(view::rows).get(3).get(1));

        // A rate typed here (not saved): a result for the rate typed, said to be changed here.
        Edt.call(() -> {
            view.rateField().setText("600");
            view.start();
            return null;
        });
        assertTrue(Edt.call(view::rows).isEmpty());
        Edt.waitFor(() -> Edt.callQuietly(() -> !view.rows().isEmpty()), "the run-up at 600 rpm/s");
        assertEquals(strokeWith(other, 600), Edt.call(view::rows).get(3).get(1));
        assertEquals("changed here, not saved", Edt.call(view::rateSource));

        // A bad rate: a plain sentence, no figures.
        Edt.call(() -> {
            view.rateField().setText("-3");
            view.start();
            return null;
        });
        assertTrue(Edt.call(view::rows).isEmpty());
        Edt.call(() -> {
            frame.dispose();
            return null;
        });
    }
}
