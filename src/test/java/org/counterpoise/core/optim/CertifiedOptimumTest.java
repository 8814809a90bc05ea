package org.counterpoise.core.optim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.rational.MeanSquare;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Every optimum the optimisers report is certified or marked not found, over the whole input
 * space the project file allows: structure damping 0 to 0.5, mass ratios 0.001 to 1.9, bands
 * narrow, wide, low, high and open, every excitation and response pair, both exact objectives.
 *
 * <p>Two checks. (1) A seeded fuzz (default 600 problems; {@code -DoptimumFuzzCases=N} for more):
 * no exception escapes except the two refusals of problems that have no finite answer for any
 * absorber (field "band": no finite peak; field "response": infinite mean square), so no internal
 * value is ever reported as if the user typed it. (2) An independent brute force written here
 * (a dense grid over the search box, 130 tunings x 41 dampings, refined by Commons Math's
 * Nelder-Mead from the four best grid points): a certified optimum is never beaten by more than
 * 1e-7 relative. Before the certification rule, 300 random problems gave 13 internal
 * "absorber.damping_ratio ... is not allowed" refusals, 2 singular-matrix crashes, 6 vanishing
 * absorbers (f down to 1e-25) reported as converged, and exact-variance with base acceleration
 * and relative displacement at structure damping 0.30 stopped 1.8 % above the optimum.
 */
class CertifiedOptimumTest {
    private static final ResponseKind[] RESPONSES = {ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY,
        ResponseKind.ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT, ResponseKind.TRANSMITTED_FORCE};
    private static final Set<String> NO_ANSWER_FIELDS = Set.of("band", "response");

    /** One random problem of the whole space; variance problems are over all frequencies. */
    static PeakProblem randomProblem(Random r, boolean variance) {
        ExcitationKind e = ExcitationKind.values()[r.nextInt(4)];
        ResponseKind resp = RESPONSES[r.nextInt(RESPONSES.length)];
        double mu = Math.min(1.9, Math.exp(Math.log(0.001) + r.nextDouble() * Math.log(1900)));
        double zeta1 = 0.5 * r.nextDouble();
        double lo = 0;
        double hi = Double.POSITIVE_INFINITY;
        switch (variance ? 0 : r.nextInt(6)) {
            case 1 -> { // narrow, low
                lo = 0.02 + 0.5 * r.nextDouble();
                hi = lo * (1 + 1e-4 + 0.05 * r.nextDouble());
            }
            case 2 -> { // wide
                lo = 0.05 + r.nextDouble();
                hi = lo + 0.5 + 2 * r.nextDouble();
            }
            case 3 -> { // high
                lo = 2 + 8 * r.nextDouble();
                hi = lo * (1 + r.nextDouble());
            }
            case 4 -> lo = 0.3 + r.nextDouble(); // open above
            case 5 -> { // around resonance
                lo = 0.5 + r.nextDouble();
                hi = lo * (1 + 0.1 * r.nextDouble());
            }
            default -> { }
        }
        return new PeakProblem(e, resp, mu, zeta1, lo, hi, Double.NaN, Double.NaN);
    }

    @Test
    void fuzzOverTheWholeInputSpaceNeverCrashesNorBlamesTheUser() {
        Random random = new Random(Long.getLong("optimumFuzzSeed", 20261203L));
        int cases = Integer.getInteger("optimumFuzzCases", 600);
        int notFound = 0;
        int answered = 0;
        for (int i = 0; i < cases; i++) {
            boolean variance = random.nextInt(3) == 0;
            PeakProblem p = randomProblem(random, variance);
            try {
                boolean certified;
                double f;
                if (variance) {
                    VarianceOptimum o = VarianceOptimiser.optimise(p);
                    certified = o.converged();
                    f = o.tuning().tuningRatio();
                } else {
                    PeakOptimum o = HInfinityOptimiser.optimise(p);
                    certified = o.converged();
                    f = o.tuning().tuningRatio();
                }
                answered++;
                if (!certified) {
                    notFound++;
                }
                assertTrue(f >= p.minTuning() * (1 - 1e-12) && f <= p.maxTuning() * (1 + 1e-12),
                        "tuning outside the documented box: " + f + " for " + p);
            } catch (InvalidInputException refused) {
                assertTrue(NO_ANSWER_FIELDS.contains(refused.field()),
                        "an internal value reported as the user's: " + refused.getMessage() + " for " + p);
            } catch (RuntimeException crash) {
                fail("crash on valid input " + p + ": " + crash);
            }
        }
        // measured on the default seed: 0 crashes, 0 internal refusals; "not found" is rare
        assertTrue(answered > cases / 2, "too few problems with an answer: " + answered);
        assertTrue(notFound <= Math.max(2, cases / 100), notFound + " of " + answered + " not found");
    }

    @Test
    void certifiedPeakOptimaAreNeverBeatenByAnIndependentBruteForce() {
        Random random = new Random(Long.getLong("bruteForceSeed", 7L));
        int checked = 0;
        while (checked < Integer.getInteger("certifiedBruteForceCases", 16)) {
            PeakProblem p = randomProblem(random, false);
            PeakOptimum o;
            try {
                o = HInfinityOptimiser.optimise(p);
            } catch (InvalidInputException noFinitePeak) {
                continue;
            }
            if (!o.converged()) {
                continue; // reported as not found: nothing claimed
            }
            double brute = bruteForce(p, false);
            assertTrue(o.peak() <= brute * (1 + 1e-7), "brute force better: " + brute + " vs " + o + " for " + p);
            checked++;
        }
    }

    @Test
    void certifiedVarianceOptimaAreNeverBeatenByAnIndependentBruteForce() {
        Random random = new Random(Long.getLong("bruteForceSeed", 8L));
        int checked = 0;
        while (checked < Integer.getInteger("certifiedBruteForceCases", 10)) {
            PeakProblem p = randomProblem(random, true);
            VarianceOptimum o;
            try {
                o = VarianceOptimiser.optimise(p);
            } catch (InvalidInputException infinite) {
                continue;
            }
            if (!o.converged()) {
                continue;
            }
            double brute = bruteForce(p, true);
            assertTrue(o.variance() <= brute * (1 + 1e-7), "brute force better: " + brute + " vs " + o + " for " + p);
            checked++;
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.30, 0.32, 0.45, 0.5})
    void baseAccelerationVarianceOnAHeavilyDampedStructureReachesTheTrueOptimum(double zeta1) {
        // Was 1.8 % (zeta1 0.30) and 2 % (0.32) above the optimum, reported as exit 0.
        for (ResponseKind r : new ResponseKind[] {ResponseKind.RELATIVE_DISPLACEMENT, ResponseKind.ACCELERATION,
            ResponseKind.TRANSMITTED_FORCE}) {
            PeakProblem p = PeakProblem.allFrequencies(ExcitationKind.BASE_ACCELERATION, r, 0.05, zeta1);
            VarianceOptimum o = VarianceOptimiser.optimise(p);
            assertTrue(o.converged(), r + " " + zeta1);
            double brute = bruteForce(p, true);
            assertEquals(brute, o.variance(), 1e-7 * brute, r + " " + zeta1);
        }
    }

    @Test
    void aVanishingAbsorberIsNeverTheOptimum() {
        // Cases that came back "converged" with f of 1e-9 to 1e-25 (an absorber that does nothing)
        // while a real absorber does better.
        PeakProblem[] cases = {
            new PeakProblem(ExcitationKind.BASE_ACCELERATION, ResponseKind.VELOCITY, 0.026, 0.384, 0.329, 1.725,
                    Double.NaN, Double.NaN),
            new PeakProblem(ExcitationKind.BASE_DISPLACEMENT, ResponseKind.ACCELERATION, 0.0299, 0.425, 7.93, 11.2,
                    Double.NaN, Double.NaN),
            PeakProblem.allFrequencies(ExcitationKind.FORCE, ResponseKind.ACCELERATION, 0.01, 0.411),
            new PeakProblem(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.0368, 0.1545, 0.258, 0.2664,
                    Double.NaN, Double.NaN)};
        for (PeakProblem p : cases) {
            PeakOptimum o = HInfinityOptimiser.optimise(p);
            assertTrue(o.converged(), p.toString());
            assertTrue(o.tuning().tuningRatio() >= p.minTuning(), o.toString());
            assertTrue(o.peak() <= bruteForce(p, false) * (1 + 1e-7), o.toString());
        }
    }

    /** Dense grid over the search box plus Nelder-Mead from the four best points (independent route). */
    static double bruteForce(PeakProblem p, boolean variance) {
        double fLow = p.minTuning();
        double fHigh = p.maxTuning();
        List<Double> tunings = new ArrayList<>();
        for (int i = 0; i < 100; i++) {
            tunings.add(fLow * Math.pow(fHigh / fLow, i / 99.0));
        }
        if (!p.allFrequencies()) {
            double top = Double.isFinite(p.bandHigh()) ? p.bandHigh() : 2 * p.bandLow();
            for (int i = 0; i <= 30; i++) {
                tunings.add(Math.min(fHigh, 0.9 * p.bandLow() + (1.1 * top - 0.9 * p.bandLow()) * i / 30.0));
            }
        }
        List<double[]> points = new ArrayList<>();
        for (double f : tunings) {
            for (int j = -1; j < 40; j++) {
                double zeta = j < 0 ? 0 : 1e-4 * Math.pow(4 / 1e-4, j / 39.0);
                double v = value(p, f, zeta, variance);
                if (Double.isFinite(v)) {
                    points.add(new double[] {f, zeta, v});
                }
            }
        }
        points.sort((a, b) -> Double.compare(a[2], b[2]));
        double best = points.get(0)[2];
        for (int k = 0; k < Math.min(4, points.size()); k++) {
            double[] start = points.get(k);
            try {
                PointValuePair r = new SimplexOptimizer(1e-13, 1e-15).optimize(new MaxEval(6000),
                        new ObjectiveFunction(v -> {
                            double f = Math.exp(v[0]);
                            double zeta = Math.exp(v[1]);
                            if (f < fLow || f > fHigh || zeta > 4) {
                                return 1e300;
                            }
                            double x = value(p, f, zeta, variance);
                            return Double.isFinite(x) ? x : 1e300;
                        }), GoalType.MINIMIZE,
                        new InitialGuess(new double[] {Math.log(start[0]), Math.log(Math.max(start[1], 1e-5))}),
                        new NelderMeadSimplex(new double[] {0.02, 0.2}));
                best = Math.min(best, r.getValue());
            } catch (TooManyEvaluationsException limit) {
                // the grid value stands
            }
        }
        return best;
    }

    private static double value(PeakProblem p, double f, double zeta, boolean variance) {
        if (variance) {
            return zeta > 0 ? MeanSquare.of(p.transferFunction(f, zeta)) : Double.POSITIVE_INFINITY;
        }
        return PeakFinder.over(p.transferFunction(f, zeta), p.bandLow(), p.bandHigh()).magnitude();
    }
}
