package org.counterpoise.core.realisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.realisation.PartTolerances.ToleranceBasis;
import org.counterpoise.core.robust.ToleranceRanges;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Part tolerances against the differential df/f = (dk/k - dm/m) / 2 of f = sqrt(k/m) / (2 pi) and
 * against a direct recomputation of sqrt(k/m) at the tolerance corners; the trim plan by hand.
 */
class TolerancesAndTrimTest {

    static List<Path> presets() {
        return Presets.files();
    }

    @Test
    void rateToleranceAgreesWithTheDifferentialToSecondOrder() {
        // first order: t_k = 2 t_f - t_m; 3 % and 1 % -> 5 %; the exact corner form differs by O(t^2)
        assertEquals(0.05, ToleranceSizing.rateTolerance(0.03, 0.01), 2e-3);
        assertEquals(0.002, ToleranceSizing.rateTolerance(0.001, 0.0), 1e-5);
        // by hand: min((1.03)^2 0.99 - 1, 1 - 0.97^2 1.01) = min(0.050291, 0.049691) = 0.049691
        assertEquals(0.049691, ToleranceSizing.rateTolerance(0.03, 0.01), 1e-6);
    }

    @Test
    void everyCornerOfThePartTolerancesKeepsTheFrequencyWithinItsTolerance() {
        for (double tf : new double[] {0.005, 0.01, 0.03, 0.1}) {
            for (double tm : new double[] {0.0, 0.002, 0.5 * tf}) {
                double tk = ToleranceSizing.rateTolerance(tf, tm);
                double worst = 0;
                for (int sk = -1; sk <= 1; sk += 2) {
                    for (int sm = -1; sm <= 1; sm += 2) {
                        // f / f0 = sqrt((k / k0) / (m / m0)), recomputed directly at the corner
                        double ratio = Math.sqrt((1 + sk * tk) / (1 + sm * tm));
                        worst = Math.max(worst, Math.abs(ratio - 1));
                    }
                }
                assertTrue(worst <= tf * (1 + 1e-12), tf + ", " + tm + ": corner off by " + worst);
                assertEquals(tf, worst, 1e-12, "the tolerance is used to the full at the worst corner");
            }
        }
    }

    @Test
    void aMassToleranceThatUsesTheWholeFrequencyToleranceIsATypedWarning() {
        DesignResult fan = Presets.fan(); // robust: absorber range +/-3 %
        HardwareChoice loose = withTolerances(0.07, 0.01);
        List<Warning> warnings = new ArrayList<>();
        PartTolerances t = ToleranceSizing.of(fan, loose, warnings);
        assertEquals(0.0, t.springRate(), 0.0);
        assertEquals(List.of(WarningKind.MASS_TOLERANCE_TOO_LOOSE), warnings.stream().map(Warning::kind).toList());
        List<Warning> none = new ArrayList<>();
        ToleranceSizing.of(fan, HardwareChoice.DEFAULT, none);
        assertTrue(none.isEmpty());
    }

    @ParameterizedTest
    @MethodSource("presets")
    void tolerancesComeFromTheRangesOrTheToleratedMistuning(Path preset) {
        DesignResult d = Presets.design(preset);
        PartTolerances t = ToleranceSizing.of(d, HardwareChoice.DEFAULT, new ArrayList<>());
        ToleranceRanges ranges = d.study().robustness().ranges();
        if (d.study().method().robust()) {
            assertEquals(ToleranceBasis.ROBUST_RANGES, t.basis());
            assertEquals(ranges.absorber(), t.absorberFrequency(), 0.0);
        } else if (d.absorberTolerance().defined()) {
            assertEquals(ToleranceBasis.ALLOWED_RISE, t.basis());
            double low = d.absorberTolerance().low().orElse(0.7);
            double high = d.absorberTolerance().high().orElse(1.3);
            assertEquals(Math.min(1 - low, high - 1), t.absorberFrequency(), 1e-15);
        }
        assertEquals(ranges.damping(), t.damping(), 0.0);
        assertEquals(HardwareChoice.DEFAULT.massTolerance(), t.mass(), 0.0);
        assertEquals(Math.max(0, ToleranceSizing.rateTolerance(t.absorberFrequency(), t.mass())), t.springRate(), 0.0);
    }

    @Test
    void trimPlanByHand() {
        // absorber at 100 rad/s to be moved +/-10 %, 90 kg absorber, 1 % plates (0.9 kg):
        // lightest 90 / 1.1^2 = 74.380 kg -> 15.620 kg off = 17.36 plates -> 18 fitted;
        // heaviest 90 / 0.9^2 = 111.111 kg -> 21.111 kg on = 23.46 plates -> 24 spare; 42 in all;
        // reached: all on 100 sqrt(90 / 111.6) = 89.803 rad/s, none on 100 sqrt(90 / 73.8) = 110.432 rad/s;
        // one plate 1 % of the mass moves the frequency by 0.5 % (df/f = -dm/(2m)): 2 plates per percent
        TrimPlan p = TrimSizing.plan(100, 0.10, 0.10, 90, 0.01);
        assertEquals(89.80265, p.absorberFrequencyLow(), 1e-5);
        assertEquals(110.43153, p.absorberFrequencyHigh(), 1e-5);
        assertEquals(0.9, p.plateMass(), 1e-15);
        assertEquals(18, p.platesFitted());
        assertEquals(42, p.platesTotal());
        assertEquals(0.5, p.percentPerPlate(), 1e-15);
        assertEquals(2.0, p.platesPerPercent(), 1e-15);
        // 2 % plates (1.8 kg): 15.620 / 1.8 = 8.68 -> 9 fitted, 21.111 / 1.8 = 11.73 -> 12 spare
        TrimPlan q = TrimSizing.plan(50, 0.10, 0.10, 90, 0.02);
        assertEquals(9, q.platesFitted());
        assertEquals(9 + 12, q.platesTotal());
        assertEquals(50 * Math.sqrt(90 / (90 + 12 * 1.8)), q.absorberFrequencyLow(), 1e-12);
    }

    @Test
    void theFanTrimMovesItsAbsorberOverItsStatedStructureRange() {
        DesignResult fan = Presets.fan(); // robust: structure range +/-10 % as stated in the preset
        TrimPlan p = TrimSizing.of(fan, HardwareChoice.DEFAULT);
        double omegaA = fan.absorber().naturalFrequency();
        double s = fan.study().robustness().ranges().structure();
        assertTrue(p.absorberFrequencyLow() <= omegaA * (1 - s) * (1 + 1e-12));
        assertTrue(p.absorberFrequencyHigh() >= omegaA * (1 + s) * (1 - 1e-12));
        double m0 = fan.absorber().mass();
        double k = fan.absorber().stiffness();
        // the stated reach is the spring over the mass with all plates on, and with none
        assertEquals(Math.sqrt(k / (m0 + (p.platesTotal() - p.platesFitted()) * p.plateMass())),
                p.absorberFrequencyLow(), 1e-9 * omegaA);
        assertEquals(Math.sqrt(k / (m0 - p.platesFitted() * p.plateMass())), p.absorberFrequencyHigh(), 1e-9 * omegaA);
        assertTrue(m0 - (p.platesFitted() - 1) * p.plateMass() > k / Math.pow(omegaA * (1 + s), 2),
                "no plate more than needed");
    }

    static HardwareChoice withTolerances(double mass, double trim) {
        HardwareChoice c = HardwareChoice.DEFAULT;
        return new HardwareChoice(c.springKind(), c.springMaterial(), c.springCount(), c.damperKind(), c.eddyCurrent(),
                c.elastomer(), c.serviceHours(), mass, trim);
    }
}
