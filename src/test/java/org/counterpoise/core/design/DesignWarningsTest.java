package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.OptionalDouble;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.error.WarningParameter;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.ToleranceSet;
import org.counterpoise.core.runup.RunUp;
import org.counterpoise.core.runup.SpeedRamp;
import org.junit.jupiter.api.Test;

/** The issue-12 warnings, each on an invented case built to trigger it and on one that must not. */
class DesignWarningsTest {
    private static final double OMEGA1 = 2 * Math.PI * 15;
    private static final Structure FRAME = Structure.of(800, 800 * OMEGA1 * OMEGA1, 0.02);
    private static final Excitation BAND = new Excitation(ExcitationKind.UNBALANCE, 0.01,
            new FrequencyBand(0.9 * OMEGA1, 1.05 * OMEGA1));
    private static final Excitation ONE_SPEED = new Excitation(ExcitationKind.UNBALANCE, 0.01,
            FrequencyBand.single(1.03 * OMEGA1));

    private static DesignStudy study(Excitation e, DesignMethod m, DesignConstraints c) {
        return new DesignStudy("invented", FRAME, e, ResponseKind.DISPLACEMENT, AbsorberSizing.ofMassRatio(0.03), m,
                false, 1.5, c);
    }

    private static DesignConstraints none() {
        return DesignConstraints.NONE;
    }

    private static Optional<Warning> warning(DesignResult r, WarningKind kind) {
        return r.warnings().stream().filter(w -> w.kind() == kind).findFirst();
    }

    private static DesignStudy withRanges(DesignStudy s, double structure, double absorber) {
        return s.withRobustness(new RobustnessSettings(ToleranceRanges.stated(structure, absorber, 0.2),
                OptionalDouble.empty(), ToleranceSet.NONE, 1000, 1L));
    }

    /** Peak of the displacement over the band on a dense grid: an independent route to the tolerated range. */
    private static double sampledPeak(Structure s, Absorber a, Excitation e) {
        SystemResponse fitted = new SystemResponse(s, a.tuningOn(s), e.kind(), e.amplitude());
        double peak = 0;
        for (int i = 0; i <= 4000; i++) {
            double w = e.band().low() + (e.band().high() - e.band().low()) * i / 4000.0;
            peak = Math.max(peak, fitted.amplitudeAt(ResponseKind.DISPLACEMENT, w));
        }
        return peak;
    }

    @Test
    void aToleratedAbsorberRangeNarrowerThanTheStatedOneWarns() {
        // A stroke-limited exact-peak design over a band with a fixed light damper: sharply tuned.
        DesignStudy s = study(BAND, DesignMethod.EXACT_PEAK, new DesignConstraints(OptionalDouble.empty(),
                OptionalDouble.of(0.004), OptionalDouble.empty()));
        DesignResult r = Designer.design(withRanges(s, 0.05, 0.03));
        Warning w = warning(r, WarningKind.ABSORBER_TOLERANCE_NARROW).orElseThrow();
        assertEquals(r.absorberTolerance().low().orElseThrow() - 1, w.number(WarningParameter.TOLERATED_LOW), 1e-15);
        assertEquals(r.absorberTolerance().high().orElseThrow() - 1, w.number(WarningParameter.TOLERATED_HIGH), 1e-15);
        assertEquals(0.03, w.number(WarningParameter.STATED_RANGE));
        // Independently: at one end of the stated +/-3 % the peak in band rises by more than 10 % (grid peaks).
        double nominal = sampledPeak(FRAME, r.absorber(), BAND);
        double worstEnd = 0;
        for (double f : new double[] {0.97, 1.03}) {
            Absorber a = new Absorber(r.absorber().mass(), r.absorber().stiffness() * f * f, r.absorber().damping());
            worstEnd = Math.max(worstEnd, sampledPeak(FRAME, a, BAND));
        }
        assertTrue(worstEnd > 1.1 * nominal, worstEnd / nominal + "");
        // Stated ranges inside the tolerated ones: no warning.
        double inside = Math.min(-w.number(WarningParameter.TOLERATED_LOW), w.number(WarningParameter.TOLERATED_HIGH))
                / 2;
        DesignResult narrowStated = Designer.design(withRanges(s, 0.001, inside));
        assertFalse(warning(narrowStated, WarningKind.ABSORBER_TOLERANCE_NARROW).isPresent());
        assertFalse(warning(narrowStated, WarningKind.STRUCTURE_TOLERANCE_NARROW).isPresent());
    }

    @Test
    void aToleratedStructureRangeNarrowerThanTheStatedOneWarns() {
        DesignStudy s = study(BAND, DesignMethod.EXACT_PEAK, new DesignConstraints(OptionalDouble.empty(),
                OptionalDouble.of(0.004), OptionalDouble.empty()));
        DesignResult r = Designer.design(withRanges(s, 0.30 - 1e-9, 0.001));
        Warning w = warning(r, WarningKind.STRUCTURE_TOLERANCE_NARROW).orElseThrow();
        assertEquals(r.structureTolerance().low().orElse(0.7) - 1, w.number(WarningParameter.TOLERATED_LOW), 1e-15);
        // The same design against a stated range inside the tolerated one: no warning.
        DesignResult inside = Designer.design(withRanges(s, 0.001, 0.001));
        assertFalse(warning(inside, WarningKind.STRUCTURE_TOLERANCE_NARROW).isPresent());
    }

    /** The practical damping figure is common practice, no source (see Designer.PRACTICAL_DAMPING_RATIO). */
    @Test
    void aDampingRatioBelowWhatAPracticalDamperGivesWarns() {
        DesignResult light = Designer.design(study(BAND, DesignMethod.EXACT_PEAK, new DesignConstraints(
                OptionalDouble.empty(), OptionalDouble.of(0.005), OptionalDouble.empty())));
        Warning w = warning(light, WarningKind.DAMPING_BELOW_PRACTICAL).orElseThrow();
        assertEquals(0.005, w.number(WarningParameter.ABSORBER_DAMPING_RATIO), 1e-15);
        assertEquals(0.01, w.number(WarningParameter.PRACTICAL_DAMPING_RATIO));
        DesignResult practical = Designer.design(study(BAND, DesignMethod.EXACT_PEAK, new DesignConstraints(
                OptionalDouble.empty(), OptionalDouble.of(0.012), OptionalDouble.empty())));
        assertFalse(warning(practical, WarningKind.DAMPING_BELOW_PRACTICAL).isPresent());
        // An undamped absorber has no damper to fall short: NO_DAMPING or nothing, never this warning.
        DesignResult undamped = Designer.design(study(ONE_SPEED, DesignMethod.UNDAMPED_SINGLE_SPEED, none()));
        assertFalse(warning(undamped, WarningKind.DAMPING_BELOW_PRACTICAL).isPresent());
    }

    @Test
    void aRunUpStrokeOverTwiceTheInBandStrokeWarns() {
        // Frahm's absorber at one speed above resonance: the machine passes the lower coupled
        // frequency on start-up, where the stroke is unbounded in steady state and large in a run-up.
        double shaftRate = 2 * Math.PI * 2; // forcing frequency rises 2 Hz per second
        Excitation ramped = ONE_SPEED.withRunUpRate(shaftRate);
        DesignStudy s = new DesignStudy("invented", FRAME, ramped, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(0.03), DesignMethod.UNDAMPED_SINGLE_SPEED, false, 1.5);
        DesignResult r = Designer.design(s);
        assertEquals(RunUpStroke.Basis.TRANSIENT, r.runUpStroke().basis());
        // The transient figure is the time integration's peak stroke, asked for directly.
        double direct = RunUp.simulate(FRAME, r.tuning(), ExcitationKind.UNBALANCE, 0.01,
                SpeedRamp.runUp(1.25 * ONE_SPEED.band().high(), shaftRate), RunUp.Start.REST, ProgressListener.NONE)
                .peak(ResponseKind.STROKE).orElseThrow().value();
        assertEquals(direct, r.runUpStroke().peak().value(), 1e-12 * direct);
        Warning w = warning(r, WarningKind.RUN_UP_STROKE_LARGE).orElseThrow();
        assertEquals(direct, w.number(WarningParameter.RUN_UP_STROKE));
        assertEquals(r.strokeInBand().value(), w.number(WarningParameter.IN_BAND_STROKE));
        assertTrue(direct > 2 * r.strokeInBand().value());
        assertEquals("TRANSIENT", w.token(WarningParameter.RUN_UP_BASIS));
        // Without a rate: the steady-state stroke over [0, top], which for a broad equal-peak design
        // over a band at resonance is the in-band stroke itself: no warning.
        DesignResult band = Designer.design(study(BAND, DesignMethod.EQUAL_PEAK, none()));
        assertEquals(RunUpStroke.Basis.STEADY_STATE, band.runUpStroke().basis());
        assertEquals(band.strokeRunUp(), band.runUpStroke().peak());
        assertTrue(band.runUpStroke().peak().value() <= 2 * band.strokeInBand().value());
        assertFalse(warning(band, WarningKind.RUN_UP_STROKE_LARGE).isPresent());
    }

    @Test
    void aStrokeLimitHoldsDuringRunUpSoTheExactPeakDesignIsNotWarned() {
        // Acceleration under a force over a band around resonance: the exact-peak optimum is a
        // lightly damped notch whose lower coupled resonance, passed on run-up, has a large stroke.
        Excitation force = new Excitation(ExcitationKind.FORCE, 900, new FrequencyBand(0.94 * OMEGA1, 1.07 * OMEGA1));
        DesignResult free = Designer.design(accelerationStudy(force, DesignConstraints.NONE));
        double runUp = free.runUpStroke().peak().value();
        double inBand = free.strokeInBand().value();
        assertTrue(runUp > 2 * inBand, "the case passes a larger stroke on run-up: " + runUp + " " + inBand);
        // A limit between the two: exact-peak holds the steady-state stroke during run-up too (the
        // stroke limit covers [0, top of band]), so the design moves onto the limit and is not warned.
        double limit = 0.5 * (runUp + inBand);
        DesignResult limited = Designer.design(accelerationStudy(force, new DesignConstraints(OptionalDouble.of(limit),
                OptionalDouble.empty(), OptionalDouble.empty())));
        assertEquals(limit, limited.runUpStroke().peak().value(), 1e-9 * limit);
        assertFalse(warning(limited, WarningKind.RUN_UP_OVER_STROKE_LIMIT).isPresent());
        // With a run-up rate the figure is the time integration's (from rest to 1.25 times the top of
        // the band); passing the resonance at a finite rate gives less than the steady state (Lewis
        // 1932), so the limited design stays within its limit and is not warned either.
        Excitation ramped = force.withRunUpRate(2 * Math.PI * 2);
        DesignResult transit = Designer.design(accelerationStudy(ramped, new DesignConstraints(OptionalDouble.of(limit),
                OptionalDouble.empty(), OptionalDouble.empty())));
        assertEquals(RunUpStroke.Basis.TRANSIENT, transit.runUpStroke().basis());
        assertTrue(transit.runUpStroke().peak().value() < limit);
        assertFalse(warning(transit, WarningKind.RUN_UP_OVER_STROKE_LIMIT).isPresent());
        // A limit above the run-up stroke: no warning.
        DesignResult roomy = Designer.design(accelerationStudy(force, new DesignConstraints(
                OptionalDouble.of(2 * runUp), OptionalDouble.empty(), OptionalDouble.empty())));
        assertFalse(warning(roomy, WarningKind.RUN_UP_OVER_STROKE_LIMIT).isPresent());
    }

    private static DesignStudy accelerationStudy(Excitation e, DesignConstraints c) {
        return new DesignStudy("invented", FRAME, e, ResponseKind.ACCELERATION, AbsorberSizing.ofMassRatio(0.09),
                DesignMethod.EXACT_PEAK, false, 1.5, c);
    }
}
