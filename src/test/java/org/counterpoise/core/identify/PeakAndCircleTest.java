package org.counterpoise.core.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.testing.SyntheticFrf;
import org.counterpoise.testing.SyntheticFrf.Mode;
import org.junit.jupiter.api.Test;

/** Peak picking, the circle fit and the rational-fraction start against closed forms of one mode. */
class PeakAndCircleTest {
    private static final double TWO_PI = 2.0 * Math.PI;

    @Test
    void halfPowerOnMobilityIsExactEvenForHeavyDamping() {
        // On mobility omega_2 - omega_1 = 2 zeta omega_n and omega_1 omega_2 = omega_n^2 exactly
        // (closed form of 1/(c + i(m omega - k/omega)); Ewins 2000, Modal Testing, 2nd ed., sec. 4.2):
        // at zeta = 0.1 the same rule on receptance would be off by about zeta^2 = 1 %.
        Mode heavy = new Mode(10.0, 0.1, 100.0);
        for (FrfKind kind : FrfKind.values()) {
            IdentifiedMode m = HalfPowerPeak.estimate(SyntheticFrf.of(kind, 5, 15, 4001, 0.0, 1, heavy));
            assertEquals(10.0, m.naturalFrequency() / TWO_PI, 1e-4, kind.id());
            assertEquals(0.1, m.dampingRatio(), 2e-5, kind.id()); // linear interpolation at 0.0025 Hz
            assertEquals(100.0, m.modalMass(), 0.02, kind.id());
        }
    }

    @Test
    void halfPowerOnAFloorSampledAt005Hz() {
        // resolution 0.05 Hz against a half-power bandwidth of 0.92 Hz: 0.1 % in damping and mass
        IdentifiedMode m = HalfPowerPeak.estimate(SyntheticFrf.of(FrfKind.ACCELERANCE, 18, 28, 201, 0.0, 1,
                new Mode(23.0, 0.02, 4200.0)));
        assertEquals(23.0, m.naturalFrequency() / TWO_PI, 1e-3);
        assertEquals(0.02, m.dampingRatio(), 0.02 * 2e-3);
        assertEquals(4200.0, m.modalMass(), 4200.0 * 2e-3);
    }

    @Test
    void aPeakAtTheBandEdgeIsRefusedByPeakPicking() {
        MeasuredFrf data = SyntheticFrf.of(FrfKind.MOBILITY, 18, 22, 101, 0.0, 1, new Mode(23.0, 0.02, 4200.0));
        assertEquals("band", assertThrows(InvalidInputException.class, () -> HalfPowerPeak.estimate(data)).field());
    }

    @Test
    void circleOfOneModeHasDiameterOneOverC() {
        // Ewins 2000, Modal Testing, 2nd ed., sec. 4.3: mobility 1/(c + iX) is a circle through the
        // origin, centre (1/(2c), 0), diameter 1/c, c = 2 zeta omega_n m
        Mode mode = new Mode(23.0, 0.02, 4200.0);
        double c = 2.0 * 0.02 * TWO_PI * 23.0 * 4200.0;
        CircleFit fit = CircleFit.fit(SyntheticFrf.of(FrfKind.RECEPTANCE, 18, 28, 401, 0.0, 1, mode));
        assertEquals(1.0 / (2.0 * c), fit.radius(), 1e-9 / c);
        assertEquals(1.0 / (2.0 * c), fit.centre().getReal(), 1e-9 / c);
        assertEquals(0.0, fit.centre().getImaginary(), 1e-9 / c);
        // frequency at the largest sweep rate, interpolated: 0.01 %; damping from the pairs: 0.1 %
        assertEquals(23.0, fit.mode().naturalFrequency() / TWO_PI, 23.0 * 1e-4);
        assertEquals(0.02, fit.mode().dampingRatio(), 0.02 * 1e-3);
        assertEquals(4200.0, fit.mode().modalMass(), 4200.0 * 1e-3);
    }

    @Test
    void rationalFractionRecoversTwoModesExactly() {
        // exact data of two modes: the linearised fit of Richardson and Formenti (1982) is exact
        Mode a = new Mode(20.0, 0.015, 3000.0);
        Mode b = new Mode(31.0, 0.03, 1500.0);
        var modes = RationalFraction.fit(SyntheticFrf.of(FrfKind.MOBILITY, 12, 40, 141, 0.0, 1, a, b), 2, false);
        assertEquals(20.0, modes.get(0).naturalFrequency() / TWO_PI, 1e-9);
        assertEquals(0.015, modes.get(0).dampingRatio(), 1e-10);
        assertEquals(3000.0, modes.get(0).modalMass(), 1e-6);
        assertEquals(31.0, modes.get(1).naturalFrequency() / TWO_PI, 1e-9);
        assertEquals(0.03, modes.get(1).dampingRatio(), 1e-10);
        assertEquals(1500.0, modes.get(1).modalMass(), 1e-6);
    }

    @Test
    void kindsConvertByPowersOfIOmega() {
        // accelerance = -omega^2 receptance, mobility = i omega receptance (common practice)
        Complex h = new Complex(2e-6, -3e-6);
        double w = 100.0;
        Complex a = FrfKind.RECEPTANCE.convert(h, w, FrfKind.ACCELERANCE);
        assertEquals(-w * w * 2e-6, a.getReal(), 1e-15);
        assertEquals(-w * w * -3e-6, a.getImaginary(), 1e-15);
        Complex y = FrfKind.ACCELERANCE.convert(a, w, FrfKind.MOBILITY);
        assertEquals(-w * -3e-6, y.getReal(), 1e-15);
        assertEquals(w * 2e-6, y.getImaginary(), 1e-15);
    }
}
