package org.counterpoise.core.commission;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
        CommissioningCheck c = CommissioningCheck.of(PUMP, r, measured, false);
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
}
