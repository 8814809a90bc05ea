package org.counterpoise.core.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.system.BandPeak;
import org.counterpoise.core.system.LinearSystem;
import org.counterpoise.testing.DirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The one-mode-plus-absorber model seen only through the {@link LinearSystem} interface: its exact
 * transfer function, scaled to SI by the interface's reference frequency and response scale, must
 * agree with the direct complex solve of (M s^2 + C s + K) X = F ({@link DirectSolve}, an
 * independent route) at many frequencies, and the band peak through the objective with a dense
 * scan of that direct solve.
 */
class SingleModeSystemTest {
    private static final Structure STRUCTURE = new Structure(1800, 1.433e7, 0.02, 1.0);
    private static final Tuning TUNING = new Tuning(0.05, 0.9759, 0.1353);
    private static final ResponseKind[] RESPONSES = {ResponseKind.DISPLACEMENT, ResponseKind.ACCELERATION,
        ResponseKind.STROKE, ResponseKind.ABSORBER_FORCE, ResponseKind.TRANSMITTED_FORCE};

    @Test
    void transferFunctionsAgreeWithTheDirectSolveAtManyFrequencies() {
        LinearSystem<ExcitationKind, ResponseKind> system = SingleModeSystem.withAbsorber(STRUCTURE, TUNING);
        double omega1 = STRUCTURE.naturalFrequency();
        assertEquals(omega1, system.referenceFrequency(), 0.0);
        int checked = 0;
        for (ExcitationKind kind : ExcitationKind.values()) {
            double amplitude = 40.0;
            for (ResponseKind r : RESPONSES) {
                double scale = system.responseScale(kind, amplitude, r);
                var h = system.transferFunction(kind, r);
                for (int i = 0; i <= 400; i++) {
                    double omega = omega1 * 0.05 * Math.pow(60.0, i / 400.0); // 0.05 to 3 omega1
                    double[] value = h.value(omega / system.referenceFrequency());
                    Complex viaInterface = new Complex(value[0], value[1]).multiply(scale);
                    Complex direct = TransferFunctionsTest.direct(STRUCTURE, TUNING, kind, amplitude, omega, r);
                    assertEquals(0.0, viaInterface.subtract(direct).abs(), 1e-9 * direct.abs(),
                            kind + " " + r + " at " + omega + " rad/s");
                    checked++;
                }
            }
        }
        assertEquals(4 * RESPONSES.length * 401, checked);
    }

    @Test
    void bareSystemAgreesWithTheOneDegreeOfFreedomSolution() {
        // Common practice: X = F / (k - m w^2 + i c w) for one mass on a spring and damper.
        LinearSystem<ExcitationKind, ResponseKind> system = SingleModeSystem.bare(STRUCTURE);
        double m = STRUCTURE.effectiveMass();
        double k = STRUCTURE.effectiveStiffness();
        double c = STRUCTURE.effectiveDampingCoefficient();
        var h = system.transferFunction(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT);
        for (int i = 1; i <= 300; i++) {
            double w = system.referenceFrequency() * i / 100.0;
            double[] v = h.value(w / system.referenceFrequency());
            Complex actual = new Complex(v[0], v[1]).multiply(system.responseScale(ExcitationKind.FORCE, 100,
                    ResponseKind.DISPLACEMENT));
            Complex expected = new Complex(100).divide(new Complex(k - m * w * w, c * w));
            assertEquals(0.0, actual.subtract(expected).abs(), 1e-12 * expected.abs(), "at " + w);
        }
    }

    @Test
    void bandPeakThroughTheObjectiveMatchesADenseScanOfTheDirectSolve() {
        LinearSystem<ExcitationKind, ResponseKind> system = SingleModeSystem.withAbsorber(STRUCTURE, TUNING);
        double omega1 = system.referenceFrequency();
        BandPeak band = new BandPeak(0.6 * omega1, 1.5 * omega1);
        for (ResponseKind r : RESPONSES) {
            Peak exact = band.peakOf(system.transferFunction(ExcitationKind.FORCE, r), omega1);
            double scale = system.responseScale(ExcitationKind.FORCE, 1.0, r);
            double scanned = 0;
            int points = 50_000;
            for (int i = 0; i <= points; i++) {
                double w = band.omegaLow() + (band.omegaHigh() - band.omegaLow()) * i / points;
                scanned = Math.max(scanned, TransferFunctionsTest.direct(STRUCTURE, TUNING, ExcitationKind.FORCE,
                        1.0, w, r).abs());
            }
            double peak = exact.magnitude() * scale;
            assertTrue(scanned <= peak * (1 + 1e-9), r + ": the scan never exceeds the exact peak");
            assertEquals(peak, scanned, 1e-6 * peak, r + ": the scan comes within its grid error");
            assertEquals(exact.magnitude(), band.of(system, ExcitationKind.FORCE, r), 0.0);
        }
    }
}
