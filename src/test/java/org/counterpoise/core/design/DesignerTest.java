package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.optim.ActiveConstraint;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.tuning.DenHartogEqualPeak;
import org.junit.jupiter.api.Test;

/** The design facade on invented cases, checked against the closed forms and independent evaluations. */
class DesignerTest {
    private static final Structure FLOOR = Structure.of(2000, 2000 * Math.pow(2 * Math.PI * 10, 2), 0.0);

    private static DesignStudy study(Structure s, Excitation e, DesignMethod m, AbsorberSizing size) {
        return new DesignStudy("test", s, e, ResponseKind.DISPLACEMENT, size, m, true, 1.5);
    }

    @Test
    void equalPeakDesignOnAnUndampedStructureIsDenHartogs() {
        double omega1 = FLOOR.naturalFrequency();
        Excitation e = new Excitation(ExcitationKind.FORCE, 1000, new FrequencyBand(0.5 * omega1, 1.5 * omega1));
        DesignResult r = Designer.design(study(FLOOR, e, DesignMethod.EQUAL_PEAK, AbsorberSizing.ofMass(100)));
        assertEquals(DenHartogEqualPeak.tuning(0.05), r.tuning());
        // Absorber: m2 = 100 kg, omega_a = f omega1, k2 = m2 omega_a^2, c2 = 2 zeta_a m2 omega_a.
        double wa = omega1 / 1.05;
        assertEquals(100 * wa * wa, r.absorber().stiffness(), 1e-6);
        assertEquals(2 * Math.sqrt(3 * 0.05 / (8 * 1.05)) * 100 * wa, r.absorber().damping(), 1e-9);
        // Static sag g / omega_a^2 (common practice).
        assertEquals(9.80665 / (wa * wa), r.staticDeflection().orElseThrow(), 1e-15);
        // The bare undamped structure is resonant in the band: unbounded before, finite after.
        assertTrue(r.responseBefore().unbounded());
        assertFalse(r.responseAfter().unbounded());
        // After: close to the fixed-point height sqrt(1 + 2/mu) times F/k1 (Den Hartog 1956, eq. 3.24).
        double xst = 1000 / FLOOR.effectiveStiffness();
        assertEquals(Math.sqrt(1 + 2 / 0.05) * xst, r.responseAfter().value(), 0.003 * Math.sqrt(41) * xst);
        assertTrue(r.warnings().stream().anyMatch(w -> w.code().equals("RESONANT_UNDAMPED")));
    }

    @Test
    void clearanceIsTheMarginTimesTheLargerStroke() {
        Structure s = Structure.of(2000, 2000 * Math.pow(2 * Math.PI * 10, 2), 0.02);
        Excitation e = new Excitation(ExcitationKind.FORCE, 1000, FrequencyBand.single(2 * Math.PI * 10.5));
        DesignResult r = Designer.design(study(s, e, DesignMethod.EQUAL_PEAK, AbsorberSizing.ofMassRatio(0.05)));
        assertEquals(1.5 * Math.max(r.strokeInBand().value(), r.strokeRunUp().value()), r.clearance(), 1e-15);
        // At one frequency the in-band stroke is the stroke at that frequency.
        SystemResponse fitted = new SystemResponse(s, r.tuning(), ExcitationKind.FORCE, 1000);
        assertEquals(fitted.amplitudeAt(ResponseKind.STROKE, 2 * Math.PI * 10.5), r.strokeInBand().value(), 1e-15);
        // Spring force is k2 times stroke, exactly.
        assertEquals(r.absorber().stiffness() * r.strokeInBand().value(), r.springForce().value(), 1e-9);
    }

    @Test
    void detuningAlternativeReachesTheTargetExactly() {
        Structure s = Structure.of(2000, 2000 * Math.pow(2 * Math.PI * 10, 2), 0.02);
        FrequencyBand band = new FrequencyBand(2 * Math.PI * 9.5, 2 * Math.PI * 10.5);
        Excitation e = new Excitation(ExcitationKind.FORCE, 1000, band);
        DesignResult r = Designer.design(study(s, e, DesignMethod.EQUAL_PEAK, AbsorberSizing.ofMassRatio(0.05)));
        double stiffer = r.stiffnessDetuning().raiseFactor().orElseThrow();
        double softer = r.stiffnessDetuning().lowerFactor().orElseThrow();
        assertTrue(stiffer > 1.21 && softer < 0.9025, "resonance moved out of the band both ways");
        for (double factor : new double[] {stiffer, softer}) {
            Structure changed = s.withStiffnessKeepingDamper(s.modalStiffness() * factor);
            double peak = new SystemResponse(changed, null, ExcitationKind.FORCE, 1000)
                    .peakOver(ResponseKind.DISPLACEMENT, band).value();
            assertEquals(r.responseAfter().value(), peak, 1e-8 * peak);
        }
        // The same by a mass change: heavier pushes the resonance below the band, lighter above.
        double heavier = r.massDetuning().lowerFactor().orElseThrow();
        assertTrue(heavier > 1 / 0.9025, "heavier " + heavier);
        Structure heavy = s.withMassKeepingDamper(s.modalMass() * heavier);
        double peak = new SystemResponse(heavy, null, ExcitationKind.FORCE, 1000).peakOver(ResponseKind.DISPLACEMENT,
                band).value();
        assertEquals(r.responseAfter().value(), peak, 1e-8 * peak);
    }

    @Test
    void undampedAbsorberHoldsTheStructureStillAtItsFrequency() {
        Structure s = Structure.of(500, 500 * Math.pow(2 * Math.PI * 30, 2), 0.01);
        double w = 2 * Math.PI * 31;
        Excitation e = new Excitation(ExcitationKind.FORCE, 200, FrequencyBand.single(w));
        DesignResult r = Designer.design(study(s, e, DesignMethod.UNDAMPED_SINGLE_SPEED, AbsorberSizing.ofMassRatio(0.1)));
        assertEquals(0.0, r.responseAfter().value(), 1e-18);
        assertEquals(200 / r.absorber().stiffness(), r.strokeInBand().value(), 1e-12 * r.strokeInBand().value());
        assertTrue(r.warnings().stream().anyMatch(x -> x.code().equals("START_UP_RESONANCE")));
    }

    @Test
    void pairWithoutAPublishedClosedFormIsRefusedWithTheReason() {
        Excitation e = new Excitation(ExcitationKind.UNBALANCE, 0.01, FrequencyBand.single(60));
        DesignStudy s = new DesignStudy("x", FLOOR, e, ResponseKind.VELOCITY, AbsorberSizing.ofMassRatio(0.05),
                DesignMethod.EQUAL_PEAK, false, 1.5);
        InvalidInputException ex = assertThrows(InvalidInputException.class, () -> Designer.design(s));
        assertEquals("absorber.method", ex.field());
        assertTrue(ex.getMessage().contains("no published equal-peak closed form"));
    }

    @Test
    void exactPeakDesignIsNeverWorseThanTheClosedFormAndMeetsItsConstraints() {
        Structure s = Structure.of(800, 800 * Math.pow(2 * Math.PI * 25, 2), 0.02);
        FrequencyBand band = new FrequencyBand(2 * Math.PI * 22, 2 * Math.PI * 28);
        Excitation e = new Excitation(ExcitationKind.FORCE, 400, band);
        DesignResult classical = Designer.design(study(s, e, DesignMethod.EQUAL_PEAK, AbsorberSizing.ofMassRatio(0.05)));
        DesignResult exact = Designer.design(study(s, e, DesignMethod.EXACT_PEAK, AbsorberSizing.ofMassRatio(0.05)));
        assertTrue(exact.responseAfter().value() <= classical.responseAfter().value());
        // With a stroke limit below the free optimum's stroke, the stroke during run-up (from
        // standstill to the top of the band: the limit covers it) sits on the limit.
        double limit = 0.8 * exact.strokeRunUp().value();
        DesignStudy limited = new DesignStudy("t", s, e, ResponseKind.DISPLACEMENT, AbsorberSizing.ofMassRatio(0.05),
                DesignMethod.EXACT_PEAK, false, 1.5, new DesignConstraints(OptionalDouble.of(limit), OptionalDouble.empty(),
                        OptionalDouble.empty()));
        DesignResult r = Designer.design(limited);
        assertEquals(limit, r.strokeRunUp().value(), 1e-9 * limit);
        assertTrue(r.strokeInBand().value() <= limit * (1 + 1e-9));
        assertTrue(r.responseAfter().value() >= exact.responseAfter().value());
        assertEquals(ActiveConstraint.STROKE_LIMIT, r.activeConstraint());
    }

    @Test
    void aStrokeLimitMetInTheBandButNotDuringRunUpHoldsTheRunUpStroke() {
        // A band above the structure's resonance: starting up, the machine passes through the lower
        // coupled frequency, where the absorber swings more than anywhere in the band.
        Structure s = Structure.of(800, 800 * Math.pow(2 * Math.PI * 25, 2), 0.02);
        Excitation e = new Excitation(ExcitationKind.FORCE, 400, new FrequencyBand(2 * Math.PI * 29, 2 * Math.PI * 33));
        DesignResult free = Designer.design(study(s, e, DesignMethod.EXACT_PEAK, AbsorberSizing.ofMassRatio(0.05)));
        double inBand = free.strokeInBand().value();
        double runUp = free.strokeRunUp().value();
        assertTrue(runUp > 1.2 * inBand, "run-up " + runUp + " in band " + inBand);
        double limit = 0.5 * (inBand + runUp);
        DesignResult r = Designer.design(new DesignStudy("t", s, e, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(0.05), DesignMethod.EXACT_PEAK, false, 1.5,
                new DesignConstraints(OptionalDouble.of(limit), OptionalDouble.empty(), OptionalDouble.empty())));
        // independent route: the run-up stroke by the exact peak search of SystemResponse over [0, top of band]
        double held = new SystemResponse(s, r.tuning(), ExcitationKind.FORCE, 400)
                .peakBetween(ResponseKind.STROKE, 0.0, 2 * Math.PI * 33).value();
        assertEquals(limit, held, 1e-9 * limit);
        assertEquals(ActiveConstraint.STROKE_LIMIT, r.activeConstraint());
        assertTrue(r.responseAfter().value() > free.responseAfter().value());
    }

    @Test
    void aStrokeLimitOnOneSpeedHoldsFromStandstillToThatSpeed() {
        Structure s = Structure.of(800, 800 * Math.pow(2 * Math.PI * 25, 2), 0.02);
        double speed = 2 * Math.PI * 27;
        Excitation e = new Excitation(ExcitationKind.FORCE, 400, FrequencyBand.single(speed));
        DesignResult free = Designer.design(study(s, e, DesignMethod.EXACT_PEAK, AbsorberSizing.ofMassRatio(0.05)));
        double limit = 0.7 * free.strokeRunUp().value();
        DesignResult r = Designer.design(new DesignStudy("t", s, e, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(0.05), DesignMethod.EXACT_PEAK, false, 1.5,
                new DesignConstraints(OptionalDouble.of(limit), OptionalDouble.empty(), OptionalDouble.empty())));
        double held = new SystemResponse(s, r.tuning(), ExcitationKind.FORCE, 400)
                .peakBetween(ResponseKind.STROKE, 0.0, speed).value();
        assertEquals(limit, held, 1e-9 * limit);
        assertEquals(limit, r.strokeRunUp().value(), 1e-9 * limit);
    }

    @Test
    void targetSizingFindsTheLightestSufficientAbsorber() {
        Structure s = Structure.of(800, 800 * Math.pow(2 * Math.PI * 25, 2), 0.02);
        Excitation e = new Excitation(ExcitationKind.FORCE, 400,
                new FrequencyBand(2 * Math.PI * 23, 2 * Math.PI * 27));
        double target = 2.0e-5; // m
        DesignStudy st = new DesignStudy("t", s, e, ResponseKind.DISPLACEMENT, AbsorberSizing.ofTarget(target, 0.3),
                DesignMethod.EXACT_PEAK, false, 1.5);
        DesignResult r = Designer.design(st);
        assertTrue(r.responseAfter().value() <= target);
        // A slightly lighter absorber, optimally tuned, cannot meet the target.
        double lighter = r.tuning().massRatio() * (1 - 1e-5);
        DesignResult less = Designer.design(study(s, e, DesignMethod.EXACT_PEAK, AbsorberSizing.ofMassRatio(lighter)));
        assertTrue(less.responseAfter().value() > target);
        // Unreachable target: warned, best design at the largest mass ratio shown.
        DesignResult none = Designer.design(new DesignStudy("t", s, e, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofTarget(1e-9, 0.1), DesignMethod.EXACT_PEAK, false, 1.5));
        assertTrue(none.warnings().stream().anyMatch(w -> w.code().equals("TARGET_NOT_MET")));
        assertEquals(0.1, none.tuning().massRatio(), 1e-15);
    }

    @Test
    void exactVarianceOnAnUndampedStructureIsCrandallAndMarks() {
        Excitation e = new Excitation(ExcitationKind.FORCE, 10, FrequencyBand.single(50));
        DesignResult r = Designer.design(study(FLOOR, e, DesignMethod.EXACT_VARIANCE, AbsorberSizing.ofMassRatio(0.05)));
        // Crandall and Mark (1963); Warburton (1982), Table I.
        assertEquals(org.counterpoise.core.tuning.MinimumVariance.forceDisplacement(0.05).tuningRatio(),
                r.tuning().tuningRatio(), 1e-7);
    }

    @Test
    void massBudgetTooLargeForTheStructureIsRefused() {
        Excitation e = new Excitation(ExcitationKind.FORCE, 1, FrequencyBand.single(60));
        InvalidInputException ex = assertThrows(InvalidInputException.class,
                () -> Designer.design(study(FLOOR, e, DesignMethod.EQUAL_PEAK, AbsorberSizing.ofMass(5000))));
        assertTrue(ex.field().startsWith("absorber.mass"));
    }
}
