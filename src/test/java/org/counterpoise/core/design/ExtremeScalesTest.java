package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import java.util.Set;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.robust.Tolerance;
import org.counterpoise.core.robust.ToleranceSet;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Magnitudes far outside physics (1e-300 kg, 1e300 N) must end: with a result or a typed
 * refusal, never a hang or a NaN. (The command line refuses such inputs earlier with plausibility
 * ranges; the core must still terminate.) Before the fix, 1e300 kg under 1e-300 N underflowed
 * every response to 0 and the robust design ran Nelder-Mead on ln 0 to its evaluation limit for
 * each seed (hours), and 1e-300 kg gave an internal damping ratio of 0/0 reported as
 * "structure.damping: not a number is not allowed". Nothing here is timed: the test only has to
 * finish.
 */
class ExtremeScalesTest {

    /** The same study at any scale: the non-dimensional problem does not change with mass or force. */
    private static DesignStudy study(double mass, double force, RobustnessSettings settings) {
        Structure s = Structure.of(mass, mass * Math.pow(2 * Math.PI * 10, 2), 0.02);
        Excitation e = new Excitation(ExcitationKind.FORCE, force,
                new FrequencyBand(2 * Math.PI * 500 / 60, 2 * Math.PI * 700 / 60));
        return new DesignStudy("extreme", s, e, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(0.05), DesignMethod.EXACT_PEAK, false, 1.5, DesignConstraints.NONE,
                settings);
    }

    private static RobustnessSettings settings() {
        return new RobustnessSettings(0.1, 0.02, OptionalDouble.empty(), new ToleranceSet(
                Tolerance.normal(0.05), Tolerance.NONE, Tolerance.NONE, Tolerance.uniform(0.05), Tolerance.NONE),
                200, 1L);
    }

    @ParameterizedTest
    @CsvSource({"1e-300, 1e-300", "1e-300, 1e300", "1e300, 1e-300", "1e300, 1e300", "1e-30, 1e30", "1e6, 1e-3"})
    void designAndRobustnessTerminateWithTheScaleFreeResultOrATypedRefusal(double mass, double force) {
        RobustnessSettings settings = settings();
        // Reference at ordinary magnitudes: this one must design.
        DesignResult reference = Designer.design(study(1, 1, settings));
        try {
            DesignResult r = Designer.design(study(mass, force, settings));
            // Scale invariance (common practice: the response is F/k times a function of mu, f,
            // zeta_a, zeta1 and g only), so the optimum tuning and damping are those of the reference.
            assertEquals(reference.tuning().tuningRatio(), r.tuning().tuningRatio(), 1e-6);
            assertEquals(reference.tuning().dampingRatio(), r.tuning().dampingRatio(), 1e-6);
            RobustnessResult robust = RobustnessAnalysis.run(r, settings);
            assertFalse(Double.isNaN(robust.monteCarlo().result().orElseThrow().mean()), "NaN mean");
            assertFalse(Double.isNaN(robust.worstCase().peak()), "NaN worst case");
        } catch (InvalidInputException refused) {
            // Only a value the user gave may be named; the damping ratio here is 0.02, never refused.
            assertTrue(Set.of("structure.mass.value", "structure.stiffness.value", "disturbance.amplitude.value")
                    .contains(refused.field()), refused.field());
        } catch (CoreException typed) {
            assertNotEquals(Messages.BUG, typed.key(), typed.getMessage());
        }
    }
}
