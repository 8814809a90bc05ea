package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.criteria.Acceptance;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.Assessor;
import org.counterpoise.core.criteria.EquipmentVibration;
import org.counterpoise.core.criteria.LimitCurve;
import org.counterpoise.core.criteria.MachineClass;
import org.counterpoise.core.criteria.MachineSeverity;
import org.counterpoise.core.criteria.SeverityZone;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.criteria.VibrationCriterionCurve;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Spectrum;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/** Every design result carries the verdict of the study's criterion, before and after. Invented scenarios. */
class DesignAcceptanceTest {
    private static final Structure FLOOR = Structure.of(2000, 2000 * Math.pow(2 * Math.PI * 12, 2), 0.015);
    private static final Excitation FAN = new Excitation(ExcitationKind.UNBALANCE, 0.05,
            new FrequencyBand(2 * Math.PI * 10, 2 * Math.PI * 14));

    private static DesignStudy study(Excitation e) {
        return new DesignStudy("verdict", FLOOR, e, ResponseKind.VELOCITY, AbsorberSizing.ofMassRatio(0.05),
                DesignMethod.EXACT_PEAK, false, 1.5);
    }

    @Test
    void aStudyRefusesACriterionThatCannotJudgeWhiteNoise() {
        Excitation noise = new Excitation(ExcitationKind.FORCE, 1, FrequencyBand.single(2 * Math.PI * 12),
                Spectrum.whiteNoise(100));
        DesignStudy study = new DesignStudy("noise", FLOOR, noise, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(0.05), DesignMethod.MINIMUM_VARIANCE, false, 1.5);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> study.withCriterion(
                Optional.of(new EquipmentVibration(VibrationCriterionCurve.VC_A))));
        assertEquals("acceptance", e.field());
        // an r.m.s. criterion on the whole response is judged: the exact r.m.s. of the design
        UserLimit rms = new UserLimit(ResponseKind.DISPLACEMENT, AmplitudeConvention.RMS, LimitCurve.flat(1e-3));
        DesignResult r = Designer.design(study.withCriterion(Optional.of(rms)));
        assertEquals(r.rms().orElseThrow().after(), r.acceptance().orElseThrow().after().value(),
                1e-12 * r.acceptance().orElseThrow().after().value());
    }

    @Test
    void withoutACriterionThereIsNoVerdict() {
        assertTrue(Designer.design(study(FAN)).acceptance().isEmpty());
    }

    @Test
    void aFlatRmsLimitReadsTheDesignPeakOverRootTwo() {
        // the check: a user limit in r.m.s. is peak / sqrt 2 of the computed response
        // (definition of the r.m.s. of a harmonic, Harris and Piersol 2002 ch. 1)
        UserLimit limit = new UserLimit(ResponseKind.VELOCITY, AmplitudeConvention.RMS, LimitCurve.flat(2e-3));
        DesignResult r = Designer.design(study(FAN).withCriterion(Optional.of(limit)));
        Acceptance a = r.acceptance().orElseThrow();
        assertEquals(r.responseAfter().value() / Math.sqrt(2), a.after().value(), 1e-12 * a.after().value());
        assertEquals(r.responseBefore().value() / Math.sqrt(2), a.before().value(), 1e-12 * a.before().value());
        assertEquals(r.responseAfter().frequency(), a.after().worstFrequency(), 1e-9 * a.after().worstFrequency());
        assertEquals(2e-3, a.after().limit(), 0.0);
        assertEquals(limit, a.criterion());
    }

    @Test
    void theVerdictCountsEveryOrderWithTheDesignedAbsorber() {
        Excitation withBladePass = FAN.withOtherOrders(List.of(new ExcitationOrder(ExcitationKind.FORCE, 40, 6.0)));
        MachineSeverity machine = new MachineSeverity(MachineClass.GROUP_2_FLEXIBLE, SeverityZone.B);
        DesignResult r = Designer.design(study(withBladePass).withCriterion(Optional.of(machine)));
        Acceptance a = r.acceptance().orElseThrow();
        Acceptance direct = Assessor.of(machine, withBladePass).acceptance(FLOOR, r.tuning());
        assertEquals(direct, a);
        // two orders add in r.m.s.: more than the design order alone
        assertTrue(a.after().value() > r.responseAfter().value() / Math.sqrt(2));
        assertTrue(a.before().value() > a.after().value());
        assertFalse(a.after().zones().isEmpty());
    }
}
