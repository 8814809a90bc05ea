package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Structure;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** The size of an absorber is one of three typed forms, each refusing what it cannot mean in plain words. */
class AbsorberSizingTest {

    private static void refused(String field, Executable build) {
        InvalidInputException e = assertThrows(InvalidInputException.class, build);
        assertEquals(field, e.field());
        assertFalse(e.allowed().isBlank(), "says what is allowed: " + e.getMessage());
        assertFalse(e.getMessage().contains("NaN") || e.getMessage().contains("Infinity")
                || e.getMessage().contains("Exception"), e.getMessage());
    }

    @Test
    void eachFormRefusesValuesItCannotMean() {
        for (double bad : new double[] {0.0, -0.05, 2.0, Double.NaN, Double.POSITIVE_INFINITY}) {
            refused("absorber.mass_ratio", () -> AbsorberSizing.ofMassRatio(bad));
        }
        for (double bad : new double[] {0.0, -1.0, Double.NaN, Double.POSITIVE_INFINITY}) {
            refused("absorber.mass", () -> AbsorberSizing.ofMass(bad));
            refused("absorber.target", () -> AbsorberSizing.ofTarget(bad, 0.2));
        }
        for (double bad : new double[] {0.0, 2.5, Double.NaN}) {
            refused("absorber.max_mass_ratio", () -> AbsorberSizing.ofTarget(1e-3, bad));
        }
    }

    @Test
    void theFormIsTheTypeAndTheMassRatioFollowsFromIt() {
        // mu = m2 / m1 with the structure's effective mass (common practice): 50 kg on 1000 kg is 0.05.
        Structure s = Structure.of(1000, 1000 * Math.pow(2 * Math.PI * 10, 2), 0.01);
        assertEquals(0.05, AbsorberSizing.ofMass(50).massRatioOn(s), 1e-15);
        assertEquals(0.07, AbsorberSizing.ofMassRatio(0.07).massRatioOn(s), 0.0);
        AbsorberSizing target = AbsorberSizing.ofTarget(1e-4, 0.2);
        assertInstanceOf(AbsorberSizing.ByTarget.class, target);
        assertTrue(target.byTarget());
        assertFalse(AbsorberSizing.ofMass(50).byTarget());
        // A mass that is too heavy for this structure is refused as a ratio, naming the mass field.
        refused("absorber.mass (as a ratio of the structure's effective mass)",
                () -> AbsorberSizing.ofMass(5000).massRatioOn(s));
    }

    @Test
    void constraintsAreEmptyWhenFreeAndRefuseValuesOutOfRange() {
        assertFalse(DesignConstraints.NONE.any());
        assertTrue(new DesignConstraints(OptionalDouble.of(0.01), OptionalDouble.empty(), OptionalDouble.empty()).any());
        refused("absorber.stroke_limit", () -> new DesignConstraints(OptionalDouble.of(-1), OptionalDouble.empty(),
                OptionalDouble.empty()));
        refused("absorber.fixed_damping_ratio", () -> new DesignConstraints(OptionalDouble.empty(),
                OptionalDouble.of(5), OptionalDouble.empty()));
        refused("absorber.fixed_tuning_ratio", () -> new DesignConstraints(OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.of(0)));
        refused("absorber.stroke_limit", () -> new DesignConstraints(null, OptionalDouble.empty(),
                OptionalDouble.empty()));
        refused("robustness.target", () -> new RobustnessSettings(0.1, 0.02, OptionalDouble.of(0),
                RobustnessSettings.DEFAULT.tolerances(), 100, 1L));
    }
}
