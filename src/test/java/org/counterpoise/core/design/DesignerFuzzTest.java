package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.OptionalDouble;
import java.util.Random;
import java.util.Set;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/**
 * Random valid studies over every method, excitation and response: a design either comes back
 * with figures that are finite or flagged unbounded, or is refused with a message naming a field;
 * nothing else (the rule that no stack trace reaches a user).
 */
class DesignerFuzzTest {
    private static final ResponseKind[] RESPONSES = {ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY,
        ResponseKind.ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT, ResponseKind.TRANSMITTED_FORCE};

    @Test
    void everyStudyDesignsOrIsRefusedWithAMessage() {
        Random random = new Random(Long.getLong("fuzzSeed", 77L));
        int designed = 0;
        for (int trial = 0; trial < Integer.getInteger("fuzzTrials", 250); trial++) {
            double omega1 = 2 * Math.PI * (2 + 100 * random.nextDouble());
            double mass = 10 + 5000 * random.nextDouble();
            Structure s = new Structure(mass, mass * omega1 * omega1, random.nextInt(4) == 0 ? 0 : 0.08 * random.nextDouble(),
                    0.3 + 0.7 * random.nextDouble());
            double lo = omega1 * (0.3 + 1.4 * random.nextDouble());
            FrequencyBand band = random.nextBoolean() ? FrequencyBand.single(lo)
                    : new FrequencyBand(lo, lo * (1 + 0.4 * random.nextDouble()));
            ExcitationKind kind = ExcitationKind.values()[random.nextInt(4)];
            Excitation e = new Excitation(kind, 0.01 + 100 * random.nextDouble(), band);
            DesignMethod method = DesignMethod.values()[random.nextInt(DesignMethod.values().length)];
            AbsorberSizing sizing = random.nextInt(5) == 0 && method == DesignMethod.EXACT_PEAK
                    ? AbsorberSizing.ofTarget(1e-6 + random.nextDouble() * 1e-3, 0.2)
                    : AbsorberSizing.ofMassRatio(0.005 + 0.3 * random.nextDouble());
            DesignStudy study = new DesignStudy("fuzz", s, e, RESPONSES[random.nextInt(RESPONSES.length)], sizing,
                    method, random.nextBoolean(), 1.5);
            try {
                DesignResult r = Designer.design(study);
                designed++;
                if (designed % 8 == 0) {
                    RobustnessResult rr = RobustnessAnalysis.run(r, new RobustnessSettings(0.1, 0.02, OptionalDouble.empty(),
                            new org.counterpoise.core.robust.ToleranceSet(
                                    org.counterpoise.core.robust.Tolerance.uniform(0.05),
                                    org.counterpoise.core.robust.Tolerance.normal(0.05),
                                    org.counterpoise.core.robust.Tolerance.NONE,
                                    org.counterpoise.core.robust.Tolerance.uniform(0.03),
                                    org.counterpoise.core.robust.Tolerance.uniform(0.2)), 200, trial));
                    assertTrue(rr.robust().worstCase().peak() <= rr.worstCase().peak() * (1 + 1e-9)
                            || Double.isInfinite(rr.worstCase().peak()), "robust never worse, trial " + trial + " " + r.tuning() + " " + study.method() + " " + rr.worstCase() + " " + rr.robust());
                }
                for (Warning w : r.warnings()) {
                    // the design never emits a warning without its kind and exactly the kind's parameters
                    assertNotNull(w.kind(), "trial " + trial);
                    assertEquals(Set.copyOf(w.kind().parameters()), w.parameters().keySet(), "trial " + trial);
                    assertEquals(w.kind().name(), w.code());
                }
                for (double v : new double[] {r.absorber().mass(), r.absorber().stiffness(), r.absorber().damping(),
                    r.clearance(), r.responseAfter().value(), r.strokeInBand().value(), r.springForce().value()}) {
                    assertTrue(v >= 0 && !Double.isNaN(v), "trial " + trial + " value " + v + " " + study + " " + r);
                }
            } catch (InvalidInputException refused) {
                assertTrue(refused.getMessage().contains(":") && !refused.field().isEmpty(), refused.getMessage());
            } catch (RuntimeException other) {
                fail("trial " + trial + " " + study + " threw " + other, other);
            }
        }
        assertTrue(designed > Integer.getInteger("fuzzTrials", 250) / 3, "most random studies design: " + designed);
    }
}
