package org.counterpoise.core.commission;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.testing.TwoMassReference;
import org.junit.jupiter.api.Test;

/**
 * The operating check on two shipped presets (invented scenarios), the predicted amplitude
 * recomputed from the equations of motion ({@link TwoMassReference}): the velocity amplitude under a
 * force F is w F |X / F|.
 */
class OperatingCheckTest {
    static final DesignResult PUMP = Designer.design(ProjectReader.readStudy(Path.of("presets", "pump-skid-mezzanine.json")));
    static final DesignResult COMPRESSOR = Designer.design(
            ProjectReader.readStudy(Path.of("presets", "compressor-frame-speed-band.json")));

    /** Velocity amplitude of the structure under the design's force, bare or with its absorber, m/s. */
    static double velocity(DesignResult d, boolean withAbsorber, double w) {
        Structure s = d.study().structure();
        Absorber a = d.absorber();
        return w * d.study().excitation().amplitude() * TwoMassReference.receptance(s.effectiveMass(),
                s.effectiveStiffness(), s.effectiveDampingCoefficient(), withAbsorber ? a.mass() : 0, a.stiffness(),
                a.damping(), w).abs();
    }

    /** Lines every 0.25 Hz from 5 to 150 Hz at 0.1 mm/s, and `value` at the line nearest `atHz`. */
    /** The pump's speed, 1480 rpm: the model is taken there, whatever line shows the tone. */
    static final double PUMP_SPEED = 2 * Math.PI * 1480 / 60.0;

    static OperatingSpectrum spectrum(double atHz, double value, double otherHz, double other) {
        int n = 581;
        double[] w = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            double hz = 5 + 0.25 * i;
            w[i] = 2 * Math.PI * hz;
            v[i] = Math.abs(hz - atHz) < 0.125 ? value : Math.abs(hz - otherHz) < 0.125 ? other : 1e-4;
        }
        return new OperatingSpectrum(w, v, ResponseKind.VELOCITY);
    }

    @Test
    void aSiteResponseThirtyPercentAboveTheModelImpliesThirtyPercentMoreForce() {
        double line = 2 * Math.PI * 24.75;
        double measured = 1.3 * velocity(PUMP, false, PUMP_SPEED);
        OperatingComparison c = OperatingCheck.of(PUMP, spectrum(24.75, measured, 0, 0), OptionalDouble.of(PUMP_SPEED),
                false);
        assertEquals(line, c.lineFrequency(), 1e-12);
        // the tone at 24.667 Hz shows on the 24.75 Hz line; the model is taken at the tone's frequency
        assertEquals(PUMP_SPEED, c.runningFrequency(), 1e-12);
        assertEquals(velocity(PUMP, false, PUMP_SPEED), c.predicted(), 1e-9 * c.predicted());
        assertEquals(1.3, c.ratio(), 1e-9);
        assertEquals(1.3 * 600, c.impliedDriveAmplitude(), 1e-6);
        assertEquals(1.3 * c.designStroke(), c.impliedStroke(), 1e-15);
        assertEquals(List.of(), c.warnings());
    }

    @Test
    void twiceTheModelDisagreesAndUsesUpTheClearance() {
        OperatingComparison c = OperatingCheck.of(PUMP, spectrum(24.75, 2.2 * velocity(PUMP, false, PUMP_SPEED), 0, 0),
                OptionalDouble.empty(), false);
        assertEquals(2.2, c.ratio(), 1e-9);
        assertTrue(c.warnings().contains(CommissioningWarning.OPERATING_DISAGREES));
        // the clearance is the design's stroke times its margin (1.5, common practice): 2.2 exceeds it
        assertTrue(c.impliedStroke() > c.clearance());
        assertTrue(c.warnings().contains(CommissioningWarning.STROKE_BEYOND_CLEARANCE));
    }

    @Test
    void aLargerLineElsewhereIsReported() {
        double v = velocity(PUMP, false, PUMP_SPEED);
        OperatingComparison c = OperatingCheck.of(PUMP, spectrum(24.75, v, 50, 5 * v), OptionalDouble.empty(), false);
        assertEquals(1.0, c.ratio(), 1e-9);
        assertEquals(List.of(CommissioningWarning.OTHER_LINE_DOMINATES), c.warnings());
        assertEquals(2 * Math.PI * 50, c.largestLineFrequency(), 1e-9);
    }

    @Test
    void overABandTheLargestLineInItIsComparedWithTheAbsorberFitted() {
        // the band is 2 x 2900 to 2 x 3300 rpm = 96.7 to 110 Hz; the line at 104 Hz
        double line = 2 * Math.PI * 104;
        double v = 0.9 * velocity(COMPRESSOR, true, line);
        OperatingComparison c = OperatingCheck.of(COMPRESSOR, spectrum(104, v, 30, 1.5 * v), OptionalDouble.empty(),
                true);
        assertEquals(line, c.lineFrequency(), 1e-12);
        assertEquals(velocity(COMPRESSOR, true, line), c.predicted(), 1e-9 * c.predicted());
        assertEquals(0.9, c.ratio(), 1e-9);
        assertTrue(c.withAbsorber());
    }

    @Test
    void noLineNearTheRunningSpeedIsAPlainRefusal() {
        double[] w = {2 * Math.PI * 5, 2 * Math.PI * 6, 2 * Math.PI * 7};
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> OperatingCheck.of(PUMP,
                new OperatingSpectrum(w, new double[] {1e-3, 1e-3, 1e-3}, ResponseKind.VELOCITY),
                OptionalDouble.empty(), false));
        assertTrue(e.getMessage().contains("running"), e.getMessage());
    }
}
