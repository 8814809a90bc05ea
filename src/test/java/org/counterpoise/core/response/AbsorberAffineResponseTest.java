package org.counterpoise.core.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.testing.DirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The response written out in the absorber polynomial gives the same |H| as the direct complex
 * solve of the equations of motion ({@link DirectSolve}, an independent route) and as the
 * transfer function built for the design, for every pair the optimisers use.
 */
class AbsorberAffineResponseTest {

    @Test
    void forceToDisplacementMatchesTheDirectSolve() {
        Random random = new Random(17L);
        for (int trial = 0; trial < 200; trial++) {
            double mu = 0.005 + 0.5 * random.nextDouble();
            double zeta1 = 0.2 * random.nextDouble();
            double f = 0.3 + 1.5 * random.nextDouble();
            double zeta = 0.4 * random.nextDouble();
            double g = 0.05 + 3 * random.nextDouble();
            // m1 = 1, k1 = 1 (so omega1 = 1 and w = g); m2 = mu, k2 = mu f^2, c2 = 2 mu zeta f
            Complex[] x = DirectSolve.solve(1, 1, 2 * zeta1, mu, mu * f * f, 2 * mu * zeta * f, g, Complex.ONE,
                    Complex.ZERO);
            double expected = x[0].abs() * x[0].abs();
            AbsorberAffineResponse h = TransferFunctions.affineInAbsorber(ExcitationKind.FORCE,
                    ResponseKind.DISPLACEMENT, zeta1, mu);
            assertEquals(expected, h.magnitudeSquared(f, zeta, g), 1e-10 * expected, "trial " + trial);
        }
    }

    @Test
    void everyPairMatchesTheTransferFunctionOfTheDesign() {
        Random random = new Random(18L);
        ResponseKind[] responses = {ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY, ResponseKind.ACCELERATION,
            ResponseKind.RELATIVE_DISPLACEMENT, ResponseKind.TRANSMITTED_FORCE, ResponseKind.STROKE,
            ResponseKind.ABSORBER_FORCE};
        for (int trial = 0; trial < 100; trial++) {
            double mu = 0.005 + 0.5 * random.nextDouble();
            double zeta1 = 0.3 * random.nextDouble();
            double f = 0.3 + 1.5 * random.nextDouble();
            double zeta = 0.4 * random.nextDouble();
            double g = 0.05 + 3 * random.nextDouble();
            for (ExcitationKind e : ExcitationKind.values()) {
                for (ResponseKind r : responses) {
                    double expected = TransferFunctions.of(e, r, zeta1,
                            new Tuning(mu, f, zeta)).magnitude(g);
                    double actual = Math.sqrt(TransferFunctions.affineInAbsorber(e, r, zeta1, mu)
                            .magnitudeSquared(f, zeta, g));
                    assertEquals(expected, actual, 1e-10 * expected, e + " " + r + " trial " + trial);
                }
            }
        }
    }

    @Test
    void theSpringOrDamperForceAloneIsNotAffineInTheAbsorberAndIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> TransferFunctions.affineInAbsorber(ExcitationKind.FORCE,
                ResponseKind.SPRING_FORCE, 0.02, 0.05));
    }
}
