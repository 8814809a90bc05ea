package org.counterpoise.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * US customary units against NIST Special Publication 811 (2008 edition), appendix B.8 and B.9: the
 * exact definitions (in, lb, oz) and the published conversion factors of the derived units (given
 * there to seven figures; checked to that many).
 */
class UsCustomaryUnitsTest {
    private static double si(Unit u) {
        return u.toSi(1.0);
    }

    @Test
    void theDefiningUnitsAreExact() {
        assertEquals(0.0254, si(Unit.INCH)); // NIST SP 811 B.8: inch = 2.54 E-02 m exactly
        assertEquals(0.45359237, si(Unit.POUND)); // pound (avoirdupois) = 4.535 923 7 E-01 kg exactly
        assertEquals(2.54e-5, si(Unit.MIL)); // mil = 2.54 E-05 m exactly
        // pound-force = lb x standard acceleration of gravity (9.80665 m/s^2): an independent route
        assertEquals(si(Unit.POUND) * Gravity.STANDARD, si(Unit.POUND_FORCE), 1e-15);
        assertEquals(4.4482216152605, si(Unit.POUND_FORCE));
    }

    @Test
    void derivedUnitsMatchThePublishedFactors() {
        // NIST SP 811 B.9 factors, seven significant figures
        assertEquals(1.751268e2, si(Unit.POUND_FORCE_PER_INCH), 1e-4); // lbf/in to N/m
        assertEquals(1.751268e2, si(Unit.POUND_FORCE_SECOND_PER_INCH), 1e-4); // (lbf*s/in) to N*s/m
        assertEquals(6.894757e3, si(Unit.PSI), 1e-3); // psi to Pa
        assertEquals(6.894757e6, si(Unit.KSI), 1.0); // ksi to Pa
        assertEquals(2.540000e-2, si(Unit.INCH_PER_SECOND), 1e-12); // in/s to m/s
        // ounce (avoirdupois) = 2.834 952 E-02 kg; oz*in as an unbalance is the product with 0.0254 m
        assertEquals(2.834952e-2 * 0.0254, si(Unit.OUNCE_INCH), 1e-10);
        assertEquals(9.80665, si(Unit.STANDARD_GRAVITY)); // standard gravity, ISO 80000-3
        assertEquals(1e6, si(Unit.NEWTON_PER_SQUARE_MILLIMETRE));
        assertEquals(3600.0, si(Unit.HOUR));
    }

    @Test
    void symbolsAreFoundWithinTheirDimensionSoGIsGravityOrGramByDimension() {
        assertEquals(Optional.of(Unit.STANDARD_GRAVITY), Unit.find("g", Dimension.ACCELERATION));
        assertEquals(Optional.of(Unit.STANDARD_GRAVITY), Unit.find("g0", Dimension.ACCELERATION), "older files");
        assertEquals(Optional.of(Unit.GRAM), Unit.find("g", Dimension.MASS));
        assertEquals(Optional.empty(), Unit.find("g0", Dimension.MASS));
        assertEquals(Optional.of(Unit.POUND_FORCE_PER_INCH), Unit.find("lb/in", Dimension.STIFFNESS),
                "spring catalogues write lb/in for a rate (common practice)");
        assertEquals(Optional.of(Unit.POUND_FORCE_SECOND_PER_INCH), Unit.find("lbf.s/in", Dimension.DAMPING_COEFFICIENT));
        assertEquals(Optional.of(Unit.NEWTON_PER_SQUARE_MILLIMETRE), Unit.find("N/mm2", Dimension.STRESS));
        assertEquals(Optional.empty(), Unit.find("lb", Dimension.FORCE), "a pound is a mass: lbf is the force");
    }
}
