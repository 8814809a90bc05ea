package org.counterpoise.core.robust;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;
import org.apache.commons.math3.random.Well19937c;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.tuning.DenHartogEqualPeak;
import org.counterpoise.core.tuning.NishiharaAsamiExact;
import org.junit.jupiter.api.Test;

/** Robustness: known behaviour of tuned absorbers, the worst-case search and the Monte Carlo. */
class RobustnessTest {
    private static final Structure FLOOR = Structure.of(1500, 1500 * Math.pow(2 * Math.PI * 12, 2), 0.0);
    private static final Excitation ALL = new Excitation(ExcitationKind.FORCE, 300,
            new FrequencyBand(1e-3, 2 * Math.PI * 12 * 50));

    @Test
    void exactEqualPeakDesignGetsWorseWhenTheAbsorberIsOffTuneEitherWay() {
        // At the exact H-infinity optimum (Nishihara and Asami 2002) the two peaks are equal and the
        // optimum is a kink: moving the tuning either way raises one of them (first-order rise).
        Mistuning m = new Mistuning(FLOOR, ALL, ResponseKind.DISPLACEMENT);
        Absorber a = Absorber.of(FLOOR, NishiharaAsamiExact.tuning(0.05));
        double nominal = m.peak(a, 1, 1);
        for (double d : new double[] {0.005, 0.02, 0.05}) {
            assertTrue(m.peak(a, 1, 1 + d) > nominal * (1 + d / 2), "absorber +" + d);
            assertTrue(m.peak(a, 1, 1 - d) > nominal * (1 + d / 2), "absorber -" + d);
        }
    }

    @Test
    void worstCaseSearchAgreesWithADenseBruteForce() {
        Random random = new Random(21);
        for (int trial = 0; trial < 8; trial++) {
            double mu = 0.02 + 0.15 * random.nextDouble();
            Structure s = Structure.of(1000, 1000 * Math.pow(2 * Math.PI * 10, 2), 0.03 * random.nextDouble());
            double w1 = 2 * Math.PI * 10;
            Excitation e = new Excitation(ExcitationKind.FORCE, 100,
                    new FrequencyBand(w1 * (0.85 + 0.1 * random.nextDouble()), w1 * (1.05 + 0.15 * random.nextDouble())));
            Mistuning m = new Mistuning(s, e, ResponseKind.DISPLACEMENT);
            Absorber a = Absorber.of(s, new Tuning(mu, 0.9 + 0.15 * random.nextDouble(),
                    0.02 + 0.2 * random.nextDouble()));
            double sRange = 0.05 + 0.1 * random.nextDouble();
            double aRange = trial % 2 == 0 ? 0 : 0.05 * random.nextDouble();
            double found = WorstCase.of(m, a, sRange, aRange).peak();
            double brute = 0;
            int n = aRange == 0 ? 4001 : 301;
            int na = aRange == 0 ? 1 : 101;
            for (int i = 0; i < n; i++) {
                double sf = 1 - sRange + 2 * sRange * i / (n - 1);
                for (int j = 0; j < na; j++) {
                    double af = na == 1 ? 1 : 1 - aRange + 2 * aRange * j / (na - 1);
                    brute = Math.max(brute, m.peak(a, sf, af));
                }
            }
            assertTrue(found >= brute * (1 - 1e-9), "trial " + trial + ": " + found + " < " + brute);
            assertTrue(found <= brute * (1 + 1e-3), "worst case is a real point: " + found + " vs " + brute);
        }
    }

    @Test
    void robustDesignIsNeverWorseThanTheEqualPeakDesignOverTheSameRange() {
        Structure s = Structure.of(1000, 1000 * Math.pow(2 * Math.PI * 10, 2), 0.02);
        Excitation e = new Excitation(ExcitationKind.FORCE, 100, new FrequencyBand(2 * Math.PI * 9, 2 * Math.PI * 11));
        Mistuning m = new Mistuning(s, e, ResponseKind.DISPLACEMENT);
        Tuning classical = DenHartogEqualPeak.tuning(0.05);
        RobustDesign r = RobustOptimiser.optimise(m, 0.05, 0.1, 0.02, List.of(classical));
        double classicalWorst = WorstCase.of(m, Absorber.of(s, classical), 0.1, 0.02).peak();
        assertTrue(r.worstCase().peak() <= classicalWorst, r.worstCase().peak() + " vs " + classicalWorst);
        assertTrue(r.worstCase().peak() < 0.97 * classicalWorst, "a real improvement is expected here");
    }

    @Test
    void monteCarloPercentileOfAMonotoneResponseIsTheResponseOfThePercentile() {
        // An absorber tuned to the forcing frequency holds the structure still there when undamped;
        // more damping spoils the notch, so the response there grows monotonically with c2 (Den
        // Hartog 1956, section 3.2). Vary c2 alone, uniformly by +/-50 %.
        Structure s = Structure.of(500, 500 * Math.pow(2 * Math.PI * 20, 2), 0.01);
        double w = 2 * Math.PI * 21;
        Excitation e = new Excitation(ExcitationKind.FORCE, 50, FrequencyBand.single(w));
        Mistuning m = new Mistuning(s, e, ResponseKind.DISPLACEMENT);
        Absorber a = Absorber.of(s, new Tuning(0.05, 21.0 / 20, 0.02));
        ToleranceSet one = new ToleranceSet(Tolerance.NONE, Tolerance.NONE, Tolerance.NONE, Tolerance.NONE,
                Tolerance.uniform(0.5));
        int n = 10_000;
        MonteCarloResult r = MonteCarlo.run(m, a, one, n, 42L, OptionalDouble.empty());
        // The same draws, made here: c2_i = c2 (1 + 0.5 (2 u_i - 1)).
        Well19937c random = new Well19937c(42L);
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            c[i] = a.damping() * (1 + 0.5 * (2 * random.nextDouble() - 1));
        }
        java.util.Arrays.sort(c);
        double[] ps = {0.5, 0.9, 0.95, 0.99};
        double[] mc = {r.p50(), r.p90(), r.p95(), r.p99()};
        for (int k = 0; k < ps.length; k++) {
            double cp = MonteCarlo.rank(c, ps[k]);
            // Exactly: nearest-rank percentiles commute with an increasing function.
            assertEquals(m.peak(s, new Absorber(a.mass(), a.stiffness(), cp)), mc[k], 0.0);
            // And against the exact quantile of the uniform: within 4 binomial standard errors
            // (sqrt(p(1-p)/N) in probability, common practice for sample quantiles).
            double se = 4 * Math.sqrt(ps[k] * (1 - ps[k]) / n);
            double lo = m.peak(s, new Absorber(a.mass(), a.stiffness(), a.damping() * (1 + 0.5 * (2 * (ps[k] - se) - 1))));
            double hi = m.peak(s, new Absorber(a.mass(), a.stiffness(),
                    a.damping() * (1 + 0.5 * (2 * Math.min(ps[k] + se, 1) - 1))));
            assertTrue(mc[k] >= lo && mc[k] <= hi, "percentile " + ps[k]);
        }
    }

    @Test
    void monteCarloIsReproducibleAndZeroToleranceGivesTheNominalExactly() {
        Mistuning m = new Mistuning(FLOOR, new Excitation(ExcitationKind.FORCE, 300,
                new FrequencyBand(2 * Math.PI * 11, 2 * Math.PI * 13)), ResponseKind.DISPLACEMENT);
        Absorber a = Absorber.of(FLOOR, DenHartogEqualPeak.tuning(0.05));
        ToleranceSet spread = new ToleranceSet(Tolerance.uniform(0.05), Tolerance.normal(0.03), Tolerance.uniform(0.02),
                Tolerance.normal(0.03), Tolerance.uniform(0.2));
        MonteCarloResult first = MonteCarlo.run(m, a, spread, 2000, 9L, OptionalDouble.of(1e-4));
        MonteCarloResult again = MonteCarlo.run(m, a, spread, 2000, 9L, OptionalDouble.of(1e-4));
        assertArrayEquals(new double[] {first.mean(), first.p50(), first.p90(), first.p95(), first.p99(), first.min(),
            first.max(), first.probabilityExceeding().orElseThrow()}, new double[] {again.mean(), again.p50(), again.p90(), again.p95(),
            again.p99(), again.min(), again.max(), again.probabilityExceeding().orElseThrow()}, 0.0);
        assertArrayEquals(first.counts(), again.counts());
        assertArrayEquals(first.binEdges(), again.binEdges(), 0.0);
        assertNotEquals(first.p90(), MonteCarlo.run(m, a, spread, 2000, 10L, OptionalDouble.of(1e-4)).p90());
        MonteCarloResult none = MonteCarlo.run(m, a, ToleranceSet.NONE, 500, 1L, OptionalDouble.empty());
        double nominal = m.peak(a, 1, 1);
        for (double v : new double[] {none.mean(), none.p50(), none.p90(), none.p95(), none.p99(), none.min(),
            none.max(), none.nominal()}) {
            assertEquals(nominal, v, 0.0);
        }
        assertEquals(500, java.util.Arrays.stream(none.counts()).sum());
    }
}
