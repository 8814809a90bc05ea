package org.counterpoise.core.commission;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.testing.TwoMassReference;
import org.junit.jupiter.api.Test;

/**
 * The absorber as built, fitted to responses computed by {@link TwoMassReference} (the equations of
 * motion solved directly) for absorbers built off their design: the fit returns the frequency and
 * damping that made the response.
 */
class AsBuiltFitTest {
    // an invented structure: 2000 kg modal mass at 12 Hz, 1.5 % damping; a 100 kg absorber
    static final double M1 = 2000;
    static final double W1 = 2 * Math.PI * 12;
    static final double ZETA1 = 0.015;
    static final Structure STRUCTURE = Structure.of(M1, M1 * W1 * W1, ZETA1);
    static final Tuning DESIGN = new Tuning(0.05, 1 / 1.05, 0.127);

    static MeasuredFrf accelerance(double m1, double w1, double m2, double wa, double zetaA, double noise, long seed) {
        Random random = new Random(seed);
        int n = 241;
        double[] w = new double[n];
        double[] re = new double[n];
        double[] im = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = 2 * Math.PI * (8 + 8.0 * i / (n - 1));
            Complex h = TwoMassReference.accelerance(m1, m1 * w1 * w1, 2 * ZETA1 * m1 * w1, m2, m2 * wa * wa,
                    2 * zetaA * m2 * wa, w[i]);
            // noise proportional to the value at each line, as a percentage of each part
            re[i] = h.getReal() * (1 + noise * random.nextGaussian());
            im[i] = h.getImaginary() * (1 + noise * random.nextGaussian());
        }
        return new MeasuredFrf(w, re, im, new double[0], FrfKind.ACCELERANCE);
    }

    @Test
    void anAbsorberBuiltFourPercentHighWithLessDampingIsFoundExactly() {
        double wa = 1.04 * DESIGN.tuningRatio() * W1;
        double zeta = 0.8 * DESIGN.dampingRatio();
        MeasuredFrf measured = accelerance(M1, W1, 0.05 * M1, wa, zeta, 0, 1);
        AsBuiltAbsorber built = AsBuiltFit.fit(STRUCTURE, DESIGN, measured, false);
        assertEquals(wa, built.absorberFrequency(), 1e-8 * wa);
        assertEquals(zeta, built.dampingRatio(), 1e-8 * zeta);
        assertTrue(built.normalisedResidual() < 1e-9, "residual " + built.normalisedResidual());
        assertTrue(built.warnings().isEmpty());
    }

    @Test
    void aStructureOffByThreePercentIsFoundWhenFreed() {
        double w1 = 0.97 * W1;
        double wa = 0.98 * DESIGN.tuningRatio() * W1;
        double zeta = 1.3 * DESIGN.dampingRatio();
        MeasuredFrf measured = accelerance(M1, w1, 0.05 * M1, wa, zeta, 0, 1);
        AsBuiltAbsorber held = AsBuiltFit.fit(STRUCTURE, DESIGN, measured, false);
        AsBuiltAbsorber freed = AsBuiltFit.fit(STRUCTURE, DESIGN, measured, true);
        assertEquals(w1, freed.structureFrequency(), 1e-8 * w1);
        assertEquals(wa, freed.absorberFrequency(), 1e-8 * wa);
        assertEquals(zeta, freed.dampingRatio(), 1e-7 * zeta);
        // held at the design's frequency the model cannot match: the misfit says so
        assertTrue(held.normalisedResidual() > 100 * freed.normalisedResidual() + 1e-3,
                held.normalisedResidual() + " against " + freed.normalisedResidual());
    }

    @Test
    void withTwoPercentNoiseTheFitLiesWithinItsUncertainty() {
        double wa = 0.95 * DESIGN.tuningRatio() * W1;
        double zeta = 1.2 * DESIGN.dampingRatio();
        int outside = 0;
        for (long seed = 1; seed <= 10; seed++) {
            AsBuiltAbsorber built = AsBuiltFit.fit(STRUCTURE, DESIGN,
                    accelerance(M1, W1, 0.05 * M1, wa, zeta, 0.02, seed), false);
            assertEquals(wa, built.absorberFrequency(), 0.005 * wa);
            assertEquals(zeta, built.dampingRatio(), 0.05 * zeta);
            assertTrue(built.absorberFrequencySd() > 0 && built.dampingRatioSd() > 0);
            if (Math.abs(built.absorberFrequency() - wa) > 3 * built.absorberFrequencySd()) {
                outside++;
            }
        }
        // three standard uncertainties hold the truth in all but about 3 of 1000 fits
        assertTrue(outside <= 1, outside + " of 10 fits outside 3 sd");
    }

    @Test
    void theModelIsTheTwoMassSystem() {
        double[] w = {0.5 * W1, 0.95 * W1, W1, 1.07 * W1, 2 * W1};
        Complex[] h = AsBuiltFit.predicted(STRUCTURE, DESIGN, w, FrfKind.RECEPTANCE);
        double m2 = 0.05 * M1;
        double wa = DESIGN.tuningRatio() * W1;
        for (int i = 0; i < w.length; i++) {
            Complex expected = TwoMassReference.receptance(M1, M1 * W1 * W1, 2 * ZETA1 * M1 * W1, m2, m2 * wa * wa,
                    2 * DESIGN.dampingRatio() * m2 * wa, w[i]);
            assertEquals(0, h[i].subtract(expected).abs(), 1e-12 * expected.abs());
        }
    }
}
