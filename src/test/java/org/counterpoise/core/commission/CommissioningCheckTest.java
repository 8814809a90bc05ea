package org.counterpoise.core.commission;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.Realiser;
import org.counterpoise.testing.TwoMassReference;
import org.junit.jupiter.api.Test;

/**
 * The commissioning check on the pump-skid preset (an invented scenario) with an absorber built
 * 3 % high in frequency and with 30 % more damping, its measured accelerance computed from the
 * equations of motion ({@link TwoMassReference}).
 */
class CommissioningCheckTest {
    static final DesignResult PUMP = OperatingCheckTest.PUMP;

    @Test
    void theBuiltAbsorberIsFoundAndTheTrimBringsItBack() {
        Structure s = PUMP.study().structure();
        Absorber a = PUMP.absorber();
        double wa = 1.03 * a.naturalFrequency();
        double zeta = 1.3 * PUMP.tuning().dampingRatio();
        double w1 = s.naturalFrequency();
        int n = 301;
        double[] w = new double[n];
        double[] re = new double[n];
        double[] im = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = w1 * (0.7 + 0.6 * i / (n - 1));
            Complex h = TwoMassReference.accelerance(s.effectiveMass(), s.effectiveStiffness(),
                    s.effectiveDampingCoefficient(), a.mass(), a.mass() * wa * wa, 2 * zeta * a.mass() * wa, w[i]);
            re[i] = h.getReal();
            im[i] = h.getImaginary();
        }
        MeasuredFrf measured = new MeasuredFrf(w, re, im, new double[0], FrfKind.ACCELERANCE);
        Realisation r = Realiser.realise(PUMP, HardwareChoice.DEFAULT);
        CommissioningCheck c = CommissioningCheck.of(PUMP, r, measured, false, OptionalDouble.empty());
        assertEquals(wa, c.built().absorberFrequency(), 1e-7 * wa);
        assertEquals(zeta, c.built().dampingRatio(), 1e-6 * zeta);
        assertEquals(0.03, c.trim().frequencyOff(), 1e-7);
        // by hand: m (1.03^2 - 1) over one plate, rounded
        long plates = Math.round(a.mass() * (1.03 * 1.03 - 1) / r.trim().plateMass());
        int spare = r.trim().platesTotal() - r.trim().platesFitted();
        assertEquals(Math.min(plates, spare), c.trim().platesToAdd());
        assertTrue(c.trim().warnings().contains(CommissioningWarning.DAMPING_OUT_OF_TOLERANCE));
        // every row's as-built magnitude is the measured one (linear interpolation between 301 lines aside)
        assertTrue(c.rows().size() >= 5, c.rows().size() + " rows");
        for (CommissioningCheck.Row row : c.rows()) {
            assertEquals(row.asBuilt(), row.measured(), 0.02 * row.asBuilt());
        }
    }

    @Test
    void aWeighedMassFivePercentHeavyIsHeldAndItsPlatesComeOff() {
        // the absorber built with 5 % too much mass (plates) on the design's spring and damper: its frequency is
        // the design's / sqrt(1.05); with the weighed mass held the fit is exact, and the trim takes the extra
        // mass off: 1.05 m ((1 / sqrt(1.05))^2 - 1) = -0.05 m, over plates of the design's trim plan (by hand)
        Structure s = PUMP.study().structure();
        Absorber a = PUMP.absorber();
        double heavy = 1.05 * a.mass();
        int n = 301;
        double[] w = new double[n];
        double[] re = new double[n];
        double[] im = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = s.naturalFrequency() * (0.7 + 0.6 * i / (n - 1));
            Complex h = TwoMassReference.accelerance(s.effectiveMass(), s.effectiveStiffness(),
                    s.effectiveDampingCoefficient(), heavy, a.stiffness(), a.damping(), w[i]);
            re[i] = h.getReal();
            im[i] = h.getImaginary();
        }
        MeasuredFrf measured = new MeasuredFrf(w, re, im, new double[0], FrfKind.ACCELERANCE);
        Realisation r = Realiser.realise(PUMP, HardwareChoice.DEFAULT);
        CommissioningCheck c = CommissioningCheck.of(PUMP, r, measured, false, OptionalDouble.of(heavy));
        assertEquals(a.naturalFrequency() / Math.sqrt(1.05), c.built().absorberFrequency(), 1e-7 * a.naturalFrequency());
        assertTrue(c.built().normalisedResidual() < 1e-8, "residual " + c.built().normalisedResidual());
        assertEquals(heavy, c.absorberMass());
        long plates = Math.round(-0.05 * a.mass() / r.trim().plateMass());
        assertEquals(Math.max(plates, -r.trim().platesFitted()), c.trim().platesToAdd());
        // held at the design's mass instead, the same response is not matched as well
        CommissioningCheck held = CommissioningCheck.of(PUMP, r, measured, false, OptionalDouble.empty());
        assertTrue(held.built().normalisedResidual() > 100 * c.built().normalisedResidual());
    }
}
