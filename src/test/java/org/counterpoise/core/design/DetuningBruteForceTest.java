package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;
import java.util.Set;
import java.util.function.IntPredicate;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.remedy.DetuningAlternative;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.junit.jupiter.api.Test;

/**
 * The detuning alternatives of a design mean what docs/glossary.md says: the smallest change of the
 * bare structure's stiffness (or mass), each way, whose peak over the band is at or below what the
 * absorber achieves. Checked against an independent brute force: a sweep of 20001 factors,
 * log-spaced over each direction's search range, the bare structure's band peak at each; the
 * expected factor is the first swept factor that meets the target, and the reported one must lie
 * between it and the swept factor before it, and meet the target. Cases: seeded random
 * structures (undamped and damped), bands (one speed, narrow, wide, around, above and below the
 * resonance), every excitation and response pair, and damped and undamped absorbers (equal-peak,
 * exact-peak, and the undamped absorber tuned to the centre of the band, whose coupled resonances
 * may lie in the band). Default 60 cases; {@code -DdetuningCases=N} for more.
 */
class DetuningBruteForceTest {
    private static final int SWEEP = 20001;
    private static final ResponseKind[] RESPONSES = {ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY,
        ResponseKind.ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT, ResponseKind.TRANSMITTED_FORCE};
    private static final DesignMethod[] METHODS = {DesignMethod.UNDAMPED_SINGLE_SPEED, DesignMethod.EXACT_PEAK,
        DesignMethod.EQUAL_PEAK};

    /** One direction of the search: the factor range from 1 to its far end, and what it changes. */
    private enum Direction {
        STIFFER(1e4, true), SOFTER(1e-6, true), LIGHTER(1e-4, false), HEAVIER(1e4, false);

        final double end;
        final boolean stiffness;

        Direction(double end, boolean stiffness) {
            this.end = end;
            this.stiffness = stiffness;
        }
    }

    /** A case and how it went. */
    private record Outcome(String name, Direction direction, OptionalDouble reported, double sweptBefore,
            double sweptFirst, boolean agrees) {
    }

    static DesignStudy randomStudy(Random r) {
        double mass = 100 + 4900 * r.nextDouble();
        double fn = 5 + 45 * r.nextDouble();
        double zeta1 = switch (r.nextInt(3)) {
            case 0 -> 0.0;
            case 1 -> 0.002 + 0.02 * r.nextDouble();
            default -> 0.02 + 0.1 * r.nextDouble();
        };
        Structure s = Structure.of(mass, mass * Math.pow(2 * Math.PI * fn, 2), zeta1);
        double w1 = s.naturalFrequency();
        FrequencyBand band = switch (r.nextInt(6)) {
            case 0 -> FrequencyBand.single(w1 * (0.7 + 0.6 * r.nextDouble()));
            case 1 -> { // narrow around the resonance
                double lo = w1 * (0.9 + 0.15 * r.nextDouble());
                yield new FrequencyBand(lo, lo * (1.01 + 0.05 * r.nextDouble()));
            }
            case 2 -> { // wide
                double lo = w1 * (0.5 + 0.4 * r.nextDouble());
                yield new FrequencyBand(lo, lo * (1.5 + r.nextDouble()));
            }
            case 3 -> { // above
                double lo = w1 * (1.1 + 0.5 * r.nextDouble());
                yield new FrequencyBand(lo, lo * (1.05 + 0.3 * r.nextDouble()));
            }
            case 4 -> { // below
                double hi = w1 * (0.5 + 0.4 * r.nextDouble());
                yield new FrequencyBand(hi / (1.05 + 0.3 * r.nextDouble()), hi);
            }
            default -> { // around
                double lo = w1 * (0.8 + 0.15 * r.nextDouble());
                yield new FrequencyBand(lo, w1 * (1.05 + 0.2 * r.nextDouble()));
            }
        };
        ExcitationKind e = ExcitationKind.values()[r.nextInt(ExcitationKind.values().length)];
        ResponseKind response = RESPONSES[r.nextInt(RESPONSES.length)];
        DesignMethod method = METHODS[r.nextInt(METHODS.length)];
        double mu = 0.01 + 0.15 * r.nextDouble();
        return new DesignStudy("detuning case", s, new Excitation(e, 1.0 + 100 * r.nextDouble(), band), response,
                AbsorberSizing.ofMassRatio(mu), method, false, 1.5);
    }

    private static double bandPeak(DesignStudy st, Direction d, double factor) {
        Structure s = st.structure();
        Structure changed = d.stiffness ? s.withStiffnessKeepingDamper(s.modalStiffness() * factor)
                : s.withMassKeepingDamper(s.modalMass() * factor);
        return new SystemResponse(changed, null, st.excitation().kind(), st.excitation().amplitude())
                .peakOver(st.response(), st.excitation().band()).value();
    }

    /** The brute force for one direction: {swept factor before the first that meets, first that meets} (NaN: none). */
    private static double[] sweep(DesignStudy st, Direction d, double target) {
        double before = Double.NaN;
        for (int i = 0; i < SWEEP; i++) {
            double factor = Math.pow(d.end, i / (SWEEP - 1.0));
            if (bandPeak(st, d, factor) <= target) {
                return new double[] {before, factor};
            }
            before = factor;
        }
        return new double[] {Double.NaN, Double.NaN};
    }

    private static OptionalDouble reported(DesignResult r, Direction d) {
        DetuningAlternative a = d.stiffness ? r.stiffnessDetuning() : r.massDetuning();
        boolean raise = d == Direction.STIFFER || d == Direction.LIGHTER;
        return raise ? a.raiseFactor() : a.lowerFactor();
    }

    private static List<Outcome> compare(DesignStudy st, DesignResult r, String name) {
        List<Outcome> out = new ArrayList<>();
        double target = r.responseAfter().value();
        for (Direction d : Direction.values()) {
            OptionalDouble got = reported(r, d);
            double[] swept = sweep(st, d, target);
            boolean agrees;
            if (Double.isNaN(swept[1])) {
                // nothing in the sweep meets the target: none reported, or one the sweep stepped over
                agrees = got.isEmpty() || bandPeak(st, d, got.getAsDouble()) <= target * (1 + 1e-8);
            } else if (Double.isNaN(swept[0])) {
                agrees = got.isPresent() && got.getAsDouble() == 1.0; // no change needed
            } else {
                double lo = Math.min(swept[0], swept[1]);
                double hi = Math.max(swept[0], swept[1]);
                agrees = got.isPresent() && got.getAsDouble() >= lo * (1 - 1e-9) && got.getAsDouble() <= hi * (1 + 1e-9)
                        && bandPeak(st, d, got.getAsDouble()) <= target * (1 + 1e-8);
            }
            out.add(new Outcome(name, d, got, swept[0], swept[1], agrees));
        }
        return out;
    }

    /**
     * Compares the designs of the seeded draws whose index passes the filter, up to {@code cases}
     * compared designs.
     *
     * @return {designs compared}; the wrong outcomes are added to {@code wrong}
     */
    private static int run(int cases, int draws, IntPredicate which, List<Outcome> wrong) {
        Random random = new Random(20261203L);
        int compared = 0;
        for (int i = 0; compared < cases && i < draws; i++) {
            DesignStudy st = randomStudy(random);
            if (!which.test(i)) {
                continue;
            }
            DesignResult r;
            try {
                r = Designer.design(st);
            } catch (CoreException refused) {
                continue; // a pair without a closed form or a finite peak: no design to compare
            }
            double target = r.responseAfter().value();
            if (r.responseAfter().unbounded() || target == 0.0) {
                continue; // no alternative is sought (DetuningRuleTest)
            }
            compared++;
            for (Outcome o : compare(st, r, "case " + i + " " + st.method().id() + " " + st.excitation().kind() + " "
                    + st.response() + " zeta1 " + st.structure().dampingRatio() + " band "
                    + st.excitation().band())) {
                if (!o.agrees()) {
                    wrong.add(o);
                }
            }
        }
        return compared;
    }

    @Test
    void everyAlternativeIsTheSmallestChangeThatMeetsTheTarget() {
        int cases = Integer.getInteger("detuningCases", 60);
        List<Outcome> wrong = new ArrayList<>();
        int compared = run(cases, 20 * cases, i -> true, wrong);
        assertTrue(compared >= cases / 2, "compared " + compared);
        assertEquals(List.of(), wrong, wrong.size() + " of " + 4 * compared + " alternatives disagree");
    }

    /**
     * The draws (of the first 1000 designs compared) where the earlier search, which started at the
     * factor putting the resonance on the band edge and took any crossing after it, disagreed with the
     * brute force: 28 of 4000 alternatives in 21 designs, 8 of them undamped absorbers (over a band
     * or at one speed), 10 exact-peak and 3 equal-peak designs. All agree now.
     */
    @Test
    void theDesignsTheEarlierSearchGotWrongAgree() {
        Set<Integer> before = Set.of(10, 149, 183, 191, 274, 278, 324, 455, 517, 573, 593, 640, 693,
                712, 770, 818, 922, 1151, 1282, 1295, 1303);
        List<Outcome> wrong = new ArrayList<>();
        int compared = run(before.size(), 1304, before::contains, wrong);
        assertEquals(before.size(), compared);
        assertEquals(List.of(), wrong, wrong.size() + " of " + 4 * compared + " alternatives disagree");
    }
}
