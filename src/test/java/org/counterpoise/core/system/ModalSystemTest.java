package org.counterpoise.core.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.complex.ComplexField;
import org.apache.commons.math3.linear.Array2DRowFieldMatrix;
import org.apache.commons.math3.linear.ArrayFieldVector;
import org.apache.commons.math3.linear.FieldLUDecomposition;
import org.apache.commons.math3.linear.FieldMatrix;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.TransferFunctions;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The exact polynomial route of {@link ModalSystem} against independent dense complex solves of
 * the equations of motion (Commons Math LU): in modal coordinates ({@link ModalDirectSolve}) and,
 * for a two-mass chain, in physical coordinates. All structures are invented for the test.
 */
class ModalSystemTest {

    /** Five absorbers on one mode, structure damped: the rational H (degree 12) against the dense 6x6 solve. */
    @Test
    void fiveAbsorbersOnOneModeMatchTheDenseSolveToOnePartIn1e9() {
        Random random = new Random(20261204L);
        for (int trial = 0; trial < 20; trial++) {
            double w1 = 20 + 200 * random.nextDouble();
            double m1 = 500 + 5000 * random.nextDouble();
            ModalStructure s = ModalStructure.singleMode("deck", w1, 0.05 * random.nextDouble(), m1);
            List<PointAbsorber> absorbers = new ArrayList<>();
            for (int j = 0; j < 5; j++) {
                absorbers.add(PointAbsorber.tuned("deck", m1 * (0.002 + 0.02 * random.nextDouble()),
                        w1 * (0.85 + 0.25 * random.nextDouble()), 0.01 + 0.1 * random.nextDouble()));
            }
            ModalSystem system = ModalSystem.of(s, absorbers);
            TransferFunction h = system.transferFunction("deck", "deck");
            assertEquals(13, h.denominator().length, "degree 2 + 2 x 5");
            for (int i = 0; i <= 400; i++) {
                double w = w1 * (0.5 + i / 400.0);
                Complex[] direct = ModalDirectSolve.solve(s.modes(), absorbers, "deck", "deck", w);
                assertComplex(direct[0], h.value(w / system.referenceFrequency()), system.referenceStiffness(),
                        1e-9, "trial " + trial + " w " + w);
                for (int j = 0; j < 5; j++) {
                    assertComplex(direct[1 + j], system.strokeTransferFunction("deck", j)
                            .value(w / system.referenceFrequency()), system.referenceStiffness(), 1e-9, "stroke " + j);
                }
            }
        }
    }

    /** Three modes, three points, two absorbers at one point: every pair of points. */
    @Test
    void threeModesWithTwoAbsorbersMatchTheDenseSolveAtEveryPair() {
        List<Mode> modes = List.of(
                new Mode(2 * Math.PI * 4.0, 0.02, 1200, Map.of("a", 1.0, "b", 0.6, "c", -0.3)),
                new Mode(2 * Math.PI * 4.6, 0.015, 900, Map.of("a", -0.4, "b", 1.0, "c", 0.8)),
                new Mode(2 * Math.PI * 11.0, 0.03, 700, Map.of("a", 0.2, "b", -0.5, "c", 1.0)));
        List<PointAbsorber> absorbers = List.of(PointAbsorber.tuned("a", 30, 2 * Math.PI * 3.8, 0.08),
                PointAbsorber.tuned("a", 25, 2 * Math.PI * 4.3, 0.06));
        ModalSystem system = ModalSystem.of(new ModalStructure(modes), absorbers);
        for (String p : List.of("a", "b", "c")) {
            for (String q : List.of("a", "b", "c")) {
                TransferFunction h = system.transferFunction(q, p);
                for (int i = 1; i <= 300; i++) {
                    double w = 2 * Math.PI * 15.0 * i / 300.0;
                    Complex direct = ModalDirectSolve.solve(modes, absorbers, q, p, w)[0];
                    assertComplex(direct, h.value(w / system.referenceFrequency()), system.referenceStiffness(), 1e-9,
                            q + "->" + p + " at " + w);
                }
            }
        }
    }

    /**
     * A two-mass chain (ground - k1 - m1 - k2 - m2, stiffness-proportional damping C = beta K so
     * that its modes are classically damped; Rayleigh damping, common practice) with an absorber
     * tuned to its first mode at m2: the modal model (modes from the 2x2 eigenproblem in closed
     * form) against a dense 3x3 complex solve of the physical chain.
     */
    @Test
    void twoMassChainWithAnAbsorberOnItsFirstModeMatchesThePhysicalSolve() {
        double m1 = 800;
        double m2 = 500;
        double k1 = 2.0e6;
        double k2 = 1.0e6;
        double beta = 4e-4;
        // K phi = w^2 M phi: det(K - w^2 M) = 0, a quadratic in w^2.
        double a = m1 * m2;
        double b = -(m1 * k2 + m2 * (k1 + k2));
        double c = k1 * k2;
        double disc = Math.sqrt(b * b - 4 * a * c);
        double[] lambda = {(-b - disc) / (2 * a), (-b + disc) / (2 * a)};
        List<Mode> modes = new ArrayList<>();
        for (double l : lambda) {
            double ratio = (k1 + k2 - l * m1) / k2; // phi2 / phi1 from the first row
            double modalMass = m1 + m2 * ratio * ratio;
            double w = Math.sqrt(l);
            modes.add(new Mode(w, beta * w / 2, modalMass, Map.of("m1", 1.0, "m2", ratio)));
        }
        double w1 = Math.sqrt(lambda[0]);
        double ma = 0.05 * modes.get(0).modalMass() / Math.pow(modes.get(0).shapeAt("m2"), 2);
        PointAbsorber absorber = PointAbsorber.tuned("m2", ma, w1 / 1.05, 0.12);
        ModalSystem system = ModalSystem.of(new ModalStructure(modes), List.of(absorber));
        for (String p : List.of("m1", "m2")) {
            TransferFunction h = system.transferFunction("m1", p);
            for (int i = 1; i <= 400; i++) {
                double w = 3 * Math.sqrt(lambda[1]) * i / 400.0;
                Complex direct = physicalChain(m1, m2, k1, k2, beta, absorber, w)[p.equals("m1") ? 0 : 1];
                assertComplex(direct, h.value(w / system.referenceFrequency()), system.referenceStiffness(), 1e-9,
                        p + " at " + w);
            }
        }
        // the peak over all frequencies agrees with a dense sweep of the physical solve
        double peak = PeakFinder.overAllFrequencies(system.transferFunction("m1", "m2")).magnitude()
                / system.referenceStiffness();
        double sweep = 0;
        for (int i = 1; i <= 200_000; i++) {
            double w = 2 * Math.sqrt(lambda[1]) * i / 200_000.0;
            sweep = Math.max(sweep, physicalChain(m1, m2, k1, k2, beta, absorber, w)[1].abs());
        }
        assertEquals(sweep, peak, 1e-6 * peak, "a 200 000-point sweep reaches the exact peak to its grid spacing");
    }

    /** One mode and one absorber reproduce the two-mass algebra of the rest of the program exactly. */
    @Test
    void oneModeOneAbsorberIsTheSingleAbsorberReceptance() {
        Tuning t = new Tuning(0.05, 0.95, 0.12);
        TransferFunction single = TransferFunctions.of(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.02, t);
        ModalSystem system = ModalSystem.of(ModalStructure.singleMode("x", 1.0, 0.02, 1.0),
                List.of(PointAbsorber.tuned("x", 0.05, 0.95, 0.12)));
        TransferFunction multi = system.transferFunction("x", "x");
        double[] a = single.denominator();
        double[] b = multi.denominator();
        assertEquals(a.length, b.length);
        for (int i = 0; i < a.length; i++) {
            assertEquals(a[i], b[i], 1e-15 * Math.abs(a[a.length - 1]) + 1e-15, "denominator coefficient " + i);
        }
    }

    /** The exact gradient against central differences of |H| at the same frequency. */
    @Test
    void absorberSensitivityMatchesFiniteDifferences() {
        List<Mode> modes = List.of(new Mode(1.0, 0.01, 1.0, Map.of("a", 1.0, "b", 0.5)),
                new Mode(1.2, 0.02, 1.5, Map.of("a", 0.7, "b", -1.0)));
        double[] f = {0.9, 1.0, 1.1};
        double[] zeta = {0.05, 0.07, 0.04};
        for (double g : new double[] {0.8, 0.97, 1.15, 1.4}) {
            double[][] grad = AbsorberSensitivity.gradient(system(modes, f, zeta), "a", "b", g);
            for (int j = 0; j < 3; j++) {
                double h = 1e-6;
                double[] fp = f.clone();
                double[] fm = f.clone();
                fp[j] *= Math.exp(h);
                fm[j] *= Math.exp(-h);
                double df = (logMagnitude(modes, fp, zeta, g) - logMagnitude(modes, fm, zeta, g)) / (2 * h);
                assertEquals(df, grad[j][0], 1e-6 * (1 + Math.abs(df)), "d/d ln f_" + j + " at g " + g);
                double[] zp = zeta.clone();
                double[] zm = zeta.clone();
                zp[j] += h;
                zm[j] -= h;
                double dz = (logMagnitude(modes, f, zp, g) - logMagnitude(modes, f, zm, g)) / (2 * h);
                assertEquals(dz, grad[j][1], 1e-6 * (1 + Math.abs(dz)), "d/d zeta_" + j + " at g " + g);
            }
        }
    }

    @Test
    void modeShapesAtDifferentPointsAreRefusedInPlainWords() {
        List<Mode> modes = List.of(new Mode(1.0, 0.01, 1.0, Map.of("a", 1.0, "b", 0.5)));
        assertThrows(InvalidInputException.class, () -> new ModalStructure(List.of(modes.get(0),
                new Mode(2.0, 0.01, 1.0, Map.of("a", 1.0)))));
    }

    private static ModalSystem system(List<Mode> modes, double[] f, double[] zeta) {
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < f.length; j++) {
            absorbers.add(PointAbsorber.tuned("a", 0.02, f[j], zeta[j]));
        }
        return ModalSystem.of(new ModalStructure(modes), absorbers);
    }

    private static double logMagnitude(List<Mode> modes, double[] f, double[] zeta, double g) {
        return Math.log(Math.pow(ModalDirectSolve.solve(modes, system(modes, f, zeta).absorbers(), "a", "b", g)[0].abs(), 2));
    }

    /** Dense 3x3 complex solve of ground-k1-m1-k2-m2 with C = beta K and the absorber on m2; force on m1. */
    private static Complex[] physicalChain(double m1, double m2, double k1, double k2, double beta, PointAbsorber ab,
            double w) {
        FieldMatrix<Complex> z = new Array2DRowFieldMatrix<>(ComplexField.getInstance(), 3, 3);
        Complex s1 = new Complex(k1, beta * k1 * w);
        Complex s2 = new Complex(k2, beta * k2 * w);
        Complex sa = new Complex(ab.stiffness(), ab.damping() * w);
        z.setEntry(0, 0, s1.add(s2).subtract(m1 * w * w));
        z.setEntry(0, 1, s2.negate());
        z.setEntry(1, 0, s2.negate());
        z.setEntry(1, 1, s2.add(sa).subtract(m2 * w * w));
        z.setEntry(1, 2, sa.negate());
        z.setEntry(2, 1, sa.negate());
        z.setEntry(2, 2, sa.subtract(ab.mass() * w * w));
        z.setEntry(0, 2, Complex.ZERO);
        z.setEntry(2, 0, Complex.ZERO);
        Complex[] x = new FieldLUDecomposition<>(z).getSolver()
                .solve(new ArrayFieldVector<>(new Complex[] {Complex.ONE, Complex.ZERO, Complex.ZERO})).toArray();
        return x;
    }

    private static void assertComplex(Complex expected, double[] scaled, double kRef, double tolerance, String what) {
        Complex actual = new Complex(scaled[0] / kRef, scaled[1] / kRef);
        assertEquals(0.0, actual.subtract(expected).abs(), tolerance * expected.abs(), what);
    }
}
