package org.counterpoise.core.response;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.testing.DirectSolve;
import org.junit.jupiter.api.Test;

/**
 * Every excitation and response kind, with and without the absorber, in SI, against the direct
 * complex solve of the physical equations of motion (an independent route: {@link DirectSolve}).
 */
class TransferFunctionsTest {

    @Test
    void everyPairMatchesTheDirectSolveOfTheEquationsOfMotion() {
        Random random = new Random(20261202L);
        for (int trial = 0; trial < 60; trial++) {
            Structure s = new Structure(50 + 2000 * random.nextDouble(), 1e4 + 1e7 * random.nextDouble(),
                    0.1 * random.nextDouble(), 0.4 + 0.6 * random.nextDouble());
            Tuning t = new Tuning(0.01 + 0.3 * random.nextDouble(), 0.7 + 0.6 * random.nextDouble(),
                    0.3 * random.nextDouble());
            double omega = s.naturalFrequency() * (0.1 + 2.5 * random.nextDouble());
            for (ExcitationKind kind : ExcitationKind.values()) {
                double amplitude = 0.5 + 10 * random.nextDouble();
                for (boolean fitted : new boolean[] {false, true}) {
                    SystemResponse response = new SystemResponse(s, fitted ? t : null, kind, amplitude);
                    for (ResponseKind r : ResponseKind.values()) {
                        if (r.needsAbsorber() && !fitted) {
                            continue;
                        }
                        Complex expected = direct(s, fitted ? t : null, kind, amplitude, omega, r);
                        double actual = response.amplitudeAt(r, omega);
                        assertEquals(expected.abs(), actual, 1e-9 * expected.abs(),
                                kind + " " + r + " fitted=" + fitted + " trial " + trial);
                        if (expected.abs() > 0) {
                            assertEquals(0.0, Math.sin(expected.getArgument() - response.phaseAt(r, omega)), 1e-8,
                                    "phase " + kind + " " + r);
                        }
                    }
                }
            }
        }
    }

    @Test
    void staticLimitOfTheForceReceptanceIsTheStaticDeflection() {
        // Common practice: at zero frequency a force F deflects the structure by F/k1, absorber or not.
        Structure s = Structure.of(1000, 4e6, 0.02);
        SystemResponse r = new SystemResponse(s, new Tuning(0.05, 0.95, 0.1), ExcitationKind.FORCE, 100);
        assertEquals(100 / 4e6, r.amplitudeAt(ResponseKind.DISPLACEMENT, 1e-9), 1e-18);
    }

    /** The SI complex amplitude of a response by the direct solve of the equations of motion. */
    static Complex direct(Structure s, Tuning t, ExcitationKind kind, double amplitude, double w,
            ResponseKind r) {
        double m1 = s.effectiveMass();
        double k1 = s.effectiveStiffness();
        double c1 = s.effectiveDampingCoefficient();
        double m2 = t == null ? 0 : t.massRatio() * m1;
        double wa = t == null ? 0 : t.tuningRatio() * s.naturalFrequency();
        double k2 = t == null ? 0 : m2 * wa * wa;
        double c2 = t == null ? 0 : 2 * t.dampingRatio() * m2 * wa;
        Complex force = Complex.ZERO;
        Complex base = Complex.ZERO;
        switch (kind) {
            case FORCE -> force = new Complex(amplitude);
            case UNBALANCE -> force = new Complex(amplitude * w * w);
            case BASE_DISPLACEMENT -> base = new Complex(amplitude);
            case BASE_ACCELERATION -> base = new Complex(-amplitude / (w * w));
            default -> throw new IllegalStateException();
        }
        Complex[] x;
        if (t == null) {
            Complex rhs = force.add(base.multiply(new Complex(k1, c1 * w)));
            x = new Complex[] {rhs.divide(new Complex(k1 - m1 * w * w, c1 * w)), Complex.ZERO};
        } else {
            x = DirectSolve.solve(m1, k1, c1, m2, k2, c2, w, force, base);
        }
        Complex iw = new Complex(0, w);
        Complex stroke = x[1].subtract(x[0]);
        return switch (r) {
            case DISPLACEMENT -> x[0];
            case VELOCITY -> x[0].multiply(iw);
            case ACCELERATION -> x[0].multiply(iw).multiply(iw);
            case RELATIVE_DISPLACEMENT -> x[0].subtract(base);
            case STROKE -> stroke;
            case TRANSMITTED_FORCE -> x[0].subtract(base).multiply(new Complex(k1, c1 * w));
            case ABSORBER_FORCE -> stroke.multiply(new Complex(k2, c2 * w));
            case SPRING_FORCE -> stroke.multiply(k2);
            case DAMPER_FORCE -> stroke.multiply(new Complex(0, c2 * w));
        };
    }
}
