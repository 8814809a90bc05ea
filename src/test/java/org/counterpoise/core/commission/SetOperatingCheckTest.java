package org.counterpoise.core.commission;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.testing.InventedFloor;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The operating check of several absorbers against an independent route: the amplitude the model
 * predicts at the response point is F |x(omega)| omega^p, x the response of the equations of motion of
 * the modes and absorbers solved directly as a dense complex system by Commons Math's LU
 * ({@link ModalDirectSolve}), p = 0, 1, 2 for displacement, velocity, acceleration (harmonic motion,
 * any vibration text), to 1e-9; the strokes are each absorber's within the set, scaled by the ratio
 * measured / predicted (the model is linear). The floor is the invented one of the other set tests
 * (force at the display, response and absorbers at mid-span).
 */
class SetOperatingCheckTest {
    private static final double HZ = 2 * Math.PI;

    private static AbsorbersToBuild floor() {
        ModalStructure floor = InventedFloor.MODES;
        FrequencyBand band = InventedFloor.BAND;
        AbsorberLayout layout = new AbsorberLayout(floor, List.of("bending", "twisting"), "display", "midspan",
                "midspan", OptionalInt.empty(), 2, AbsorberSetTuning.INDIVIDUAL);
        Mode target = floor.modes().get(layout.target(band));
        double mass = layout.effectiveMass(band);
        Structure single = new Structure(mass, mass * target.naturalFrequency() * target.naturalFrequency(),
                target.dampingRatio(), 1.0);
        DesignStudy study = new DesignStudy("invented floor", single, new Excitation(ExcitationKind.FORCE, 400, band),
                ResponseKind.DISPLACEMENT, AbsorberSizing.ofMass(900), DesignMethod.EXACT_PEAK, false, 1.5);
        DesignResult one = Designer.design(study);
        SeveralAbsorbers set = SeveralAbsorbersDesigner.design(one, layout);
        return AbsorbersToBuild.of(one, set);
    }

    /** A spectrum of lines 0.05 Hz apart, a floor of 1e-3 of the tone, the tone at the given line. */
    private static OperatingSpectrum spectrum(double toneHz, double tone, ResponseKind kind) {
        int n = 400;
        double[] w = new double[n];
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = (i + 1) * 0.05 * HZ;
            a[i] = Math.abs((i + 1) * 0.05 - toneHz) < 1e-9 ? tone : 1e-3 * tone;
        }
        return new OperatingSpectrum(w, a, kind);
    }

    @Test
    void thePredictionIsTheWholeStructuresResponseAndTheStrokesScaleWithTheRatio() {
        AbsorbersToBuild build = floor();
        SeveralAbsorbers set = build.set();
        int power = 0;
        for (ResponseKind kind : List.of(ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY, ResponseKind.ACCELERATION)) {
            double omega = 8.25 * HZ;
            double x = ModalDirectSolve.solve(set.layout().structure().modes(), set.absorbers(), "display", "midspan",
                    omega)[0].abs();
            double expected = 400 * x * Math.pow(omega, power++);
            // a tone 1.2 times the prediction, running frequency stated
            SetOperatingCheck check = SetOperatingCheck.of(build, spectrum(8.25, 1.2 * expected, kind),
                    OptionalDouble.of(omega), true);
            OperatingComparison c = check.comparison();
            assertEquals(expected, c.predicted(), 1e-9 * expected, kind.name());
            assertEquals(1.2, c.ratio(), 1e-9);
            assertEquals(480, c.impliedDriveAmplitude(), 1e-6);
            for (int j = 0; j < 2; j++) {
                DesignResult own = build.absorbers().get(j).design();
                double stroke = Math.max(own.strokeInBand().value(), own.strokeRunUp().value());
                assertEquals(stroke, check.designStrokes().get(j), 1e-12 * stroke);
                assertEquals(own.clearance(), check.clearances().get(j), 0.0);
            }
            // 1.2 times the design's stroke stays inside a clearance of 1.5 times it
            assertFalse(c.warnings().contains(CommissioningWarning.STROKE_BEYOND_CLEARANCE), c.warnings().toString());
        }
        // without the absorbers: the bare structure's response
        double omega = 8.25 * HZ;
        double bare = 400 * ModalDirectSolve.solve(set.layout().structure().modes(), List.of(), "display", "midspan",
                omega)[0].abs();
        SetOperatingCheck without = SetOperatingCheck.of(build, spectrum(8.25, bare, ResponseKind.DISPLACEMENT),
                OptionalDouble.of(omega), false);
        assertEquals(bare, without.comparison().predicted(), 1e-9 * bare);
    }

    @Test
    void aForceTwiceTheProjectsUsesUpAClearanceAndNoLineIsRefused() {
        AbsorbersToBuild build = floor();
        SeveralAbsorbers set = build.set();
        double omega = 8.0 * HZ;
        double x = 400 * ModalDirectSolve.solve(set.layout().structure().modes(), set.absorbers(), "display",
                "midspan", omega)[0].abs();
        SetOperatingCheck check = SetOperatingCheck.of(build, spectrum(8.0, 2.0 * x, ResponseKind.DISPLACEMENT),
                OptionalDouble.empty(), true);
        assertEquals(2.0, check.comparison().ratio(), 1e-9);
        assertTrue(check.comparison().warnings().contains(CommissioningWarning.OPERATING_DISAGREES));
        assertTrue(check.comparison().warnings().contains(CommissioningWarning.STROKE_BEYOND_CLEARANCE));
        int worst = check.worstAbsorber();
        assertEquals(check.designStrokes().get(worst) * 2.0, check.comparison().impliedStroke(), 1e-15);
        // a spectrum with no line within 3 % of the running frequency: refused in plain words
        OperatingSpectrum far = new OperatingSpectrum(new double[] {20 * HZ, 20.5 * HZ, 21 * HZ},
                new double[] {1e-3, 2e-3, 1e-3}, ResponseKind.VELOCITY);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> SetOperatingCheck.of(build, far,
                OptionalDouble.of(8.0 * HZ), true));
        assertTrue(e.getMessage().contains("running"), e.getMessage());
    }
}
