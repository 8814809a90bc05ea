package org.counterpoise.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.counterpoise.core.error.InvalidInputException;
import org.junit.jupiter.api.Test;

/** The ISO 21940-11 permissible residual unbalance U_per = G m / Omega_max against worked examples. */
class BalanceGradeTest {
    private static final double RPM = 2 * Math.PI / 60;
    /** 1 kg*m is 10^6 g*mm. */
    private static final double GRAM_MILLIMETRE = 1e-6;

    @Test
    void aPublishedWorkedExample() {
        // WIDIA tooling catalogue, Technical Information "Balancing", p. K53 (public catalogue page,
        // after ISO 1940-1): a 2 kg tool holder balanced to G 6.3 for 10 000 rpm may keep
        // U_per = 9549 x 6.3 x 2 / 10 000 = 12 g*mm ("6 g*mm/kg" read from the standard's chart).
        // The catalogue rounds to 12; the formula gives 12.03 g*mm.
        BalanceGrade g = new BalanceGrade(6.3e-3, 2.0, 10_000 * RPM);
        assertEquals(12.0, g.permissibleUnbalance() / GRAM_MILLIMETRE, 0.05);
        assertEquals(6.0, g.specificUnbalance() / 1e-6, 0.02, "e_per in um (= g*mm/kg)");
    }

    @Test
    void aHandCalculation() {
        // Computed by hand: G 2.5 (2.5 mm/s), a 120 kg rotor, 3000 rpm at most.
        // Omega_max = 3000 x 2 pi / 60 = 314.159 rad/s; e_per = 2.5e-3 / 314.159 = 7.9577e-6 m = 7.958 um;
        // U_per = 7.9577e-6 m x 120 kg = 9.5493e-4 kg*m = 954.93 g*mm
        // (the trade's shortcut 9549 x G[mm/s] x m[kg] / n[rpm] = 9549 x 2.5 x 120 / 3000 = 954.9 g*mm agrees).
        BalanceGrade g = new BalanceGrade(2.5e-3, 120.0, 3000 * RPM);
        assertEquals(7.9577e-6, g.specificUnbalance(), 1e-10);
        assertEquals(954.93, g.permissibleUnbalance() / GRAM_MILLIMETRE, 0.01);
        // the grade is the speed of the centre of mass at the maximum service speed: e_per Omega = G
        assertEquals(2.5e-3, g.specificUnbalance() * g.maxServiceSpeed(), 1e-18);
    }

    @Test
    void nonPositiveInputsAreRefusedNamingTheField() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new BalanceGrade(0, 10, 100));
        assertEquals("disturbance.balance_grade.grade", e.field());
        e = assertThrows(InvalidInputException.class, () -> new BalanceGrade(6.3e-3, -1, 100));
        assertEquals("disturbance.balance_grade.rotor_mass", e.field());
        e = assertThrows(InvalidInputException.class, () -> new BalanceGrade(6.3e-3, 10, 0));
        assertEquals("disturbance.balance_grade.max_speed", e.field());
    }
}
