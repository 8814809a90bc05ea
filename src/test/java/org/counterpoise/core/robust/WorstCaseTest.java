package org.counterpoise.core.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/**
 * The worst case over the three tolerance ranges against an independent route: a dense brute force
 * over structure frequency x absorber frequency x absorber damping, with interior damping factors
 * (the search itself evaluates only the two ends of the damping range).
 */
class WorstCaseTest {
    private static final ExcitationKind[] KINDS = {ExcitationKind.FORCE, ExcitationKind.FORCE, ExcitationKind.UNBALANCE,
        ExcitationKind.BASE_DISPLACEMENT, ExcitationKind.BASE_ACCELERATION, ExcitationKind.FORCE};
    private static final ResponseKind[] RESPONSES = {ResponseKind.DISPLACEMENT, ResponseKind.ACCELERATION,
        ResponseKind.DISPLACEMENT, ResponseKind.DISPLACEMENT, ResponseKind.RELATIVE_DISPLACEMENT,
        ResponseKind.TRANSMITTED_FORCE};

    @Test
    void threeRangeWorstCaseAgreesWithADenseThreeDimensionalBruteForce() {
        Random random = new Random(12);
        for (int trial = 0; trial < 12; trial++) {
            int pair = trial % KINDS.length;
            // damped and undamped structures; bands and single speeds (independent route: brute force)
            double zeta1 = trial % 3 == 0 ? 0.0 : 0.05 * random.nextDouble();
            double w1 = 2 * Math.PI * 10;
            Structure s = Structure.of(1000, 1000 * w1 * w1, zeta1);
            FrequencyBand band = trial % 4 == 1 ? FrequencyBand.single(w1 * (0.9 + 0.2 * random.nextDouble()))
                    : new FrequencyBand(w1 * (0.8 + 0.15 * random.nextDouble()), w1 * (1.05 + 0.2 * random.nextDouble()));
            Mistuning m = new Mistuning(s, new Excitation(KINDS[pair], 100, band), RESPONSES[pair]);
            Absorber a = Absorber.of(s, new Tuning(0.02 + 0.15 * random.nextDouble(), 0.9 + 0.15 * random.nextDouble(),
                    0.03 + 0.2 * random.nextDouble()));
            double ds = 0.03 + 0.07 * random.nextDouble();
            double da = 0.01 + 0.04 * random.nextDouble();
            double dc = 0.1 + 0.4 * random.nextDouble();
            WorstCase.Point found = WorstCase.of(m, a, ds, da, dc);
            String where = "trial " + trial + " " + found;
            // a real point of the ranges, and its peak is what is reported
            assertTrue(within(found.structureFactor(), ds) && within(found.absorberFactor(), da)
                    && within(found.dampingFactor(), dc), where);
            assertEquals(m.peak(a, found.structureFactor(), found.absorberFactor(), found.dampingFactor()), found.peak(),
                    1e-12 * found.peak(), where);
            double brute = bruteForce(m, a, ds, da, dc);
            // no point of the dense grid (interior damping factors included) beats the search
            assertTrue(found.peak() >= brute * (1 - 1e-9), where + " below brute force " + brute);
        }
    }

    @Test
    void zeroDampingRangeIsTheFrequencyWorstCaseAndTheDampingFactorIsAnEnd() {
        double w1 = 2 * Math.PI * 10;
        Structure s = Structure.of(1000, 1000 * w1 * w1, 0.02);
        Mistuning m = new Mistuning(s, new Excitation(ExcitationKind.FORCE, 100, new FrequencyBand(0.9 * w1, 1.1 * w1)),
                ResponseKind.DISPLACEMENT);
        Absorber a = Absorber.of(s, new Tuning(0.05, 0.95, 0.12));
        WorstCase.Point two = WorstCase.of(m, a, 0.05, 0.03);
        assertEquals(two, WorstCase.of(m, a, 0.05, 0.03, 0.0));
        assertEquals(1.0, two.dampingFactor(), 0.0);
        WorstCase.Point three = WorstCase.of(m, a, ToleranceRanges.stated(0.05, 0.03, 0.2));
        assertTrue(three.dampingFactor() == 0.8 || three.dampingFactor() == 1.2, three.toString());
        // more variation can only make the worst case worse (a superset of builds)
        assertTrue(three.peak() >= two.peak(), three + " vs " + two);
    }

    private static boolean within(double factor, double range) {
        return factor >= 1 - range && factor <= 1 + range;
    }

    /** Every point of a 61 x 61 grid at the damping ends and a 31 x 31 x 9 grid inside. */
    private static double bruteForce(Mistuning m, Absorber a, double ds, double da, double dc) {
        double brute = 0;
        for (int k = 0; k <= 10; k++) {
            double c = 1 - dc + 2 * dc * k / 10.0;
            int n = k == 0 || k == 10 ? 61 : 31;
            for (int i = 0; i < n; i++) {
                double sf = 1 - ds + 2 * ds * i / (n - 1);
                for (int j = 0; j < n; j++) {
                    double af = 1 - da + 2 * da * j / (n - 1);
                    brute = Math.max(brute, m.peak(a, sf, af, c));
                }
            }
        }
        return brute;
    }
}
