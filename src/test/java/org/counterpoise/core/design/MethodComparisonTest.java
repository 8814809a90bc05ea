package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Supplier;
import org.counterpoise.core.design.MethodComparison.Candidate;
import org.counterpoise.core.design.MethodComparison.LeftOutReason;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Spectrum;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.robust.ToleranceRanges;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** The comparison of design methods on invented cases. */
class MethodComparisonTest {
    private static final double OMEGA1 = 2 * Math.PI * 12;
    private static final Structure DAMPED = Structure.of(1500, 1500 * OMEGA1 * OMEGA1, 0.02);
    private static final Structure UNDAMPED = Structure.of(1500, 1500 * OMEGA1 * OMEGA1, 0.0);
    private static final Excitation BAND = new Excitation(ExcitationKind.UNBALANCE, 0.02,
            new FrequencyBand(0.92 * OMEGA1, 1.08 * OMEGA1));

    private static DesignStudy study(Structure s, Excitation e, DesignMethod m, AbsorberSizing sizing) {
        return new DesignStudy("invented", s, e, ResponseKind.DISPLACEMENT, sizing, m, false, 1.5);
    }

    private static MethodComparison compare(DesignStudy s) {
        return MethodComparison.of(Designer.design(s), ProgressListener.NONE);
    }

    @ParameterizedTest(name = "chosen {0}")
    @EnumSource(value = DesignMethod.class, names = {"EQUAL_PEAK", "EXACT_PEAK", "ROBUST_WORST_CASE"})
    void everyCandidateIsTheDirectDesignByItsMethod(DesignMethod chosen) {
        DesignStudy s = study(DAMPED, BAND, chosen, AbsorberSizing.ofMassRatio(0.04));
        MethodComparison c = compare(s);
        assertEquals(List.of(DesignMethod.EQUAL_PEAK, DesignMethod.EXACT_PEAK, DesignMethod.ROBUST_WORST_CASE,
                DesignMethod.ROBUST_P95), c.candidates().stream().map(Candidate::method).toList());
        for (Candidate k : c.candidates()) {
            // The same route: a direct design of the study with the candidate's method, and the one
            // place for the robust figures, give the very same numbers.
            DesignStudy direct = s.withMethod(k.method());
            DesignResult d = Designer.design(direct);
            assertEquals(d.tuning(), k.tuning(), k.method().id());
            assertEquals(d.responseAfter(), k.nominalPeak());
            assertEquals(d.strokeInBand(), k.strokeInBand());
            assertEquals(d.springForce(), k.springForce());
            assertEquals(d.runUpStroke(), k.strokeRunUp());
            assertEquals(RobustMeasures.worstCase(direct, d.tuning()).peak(), k.worstPeak());
            assertEquals(RobustMeasures.percentile95(direct, d.tuning()), k.p95());
            // Nominal peak checked against an independent evaluation on a dense frequency grid.
            SystemResponse fitted = new SystemResponse(DAMPED, k.tuning(), ExcitationKind.UNBALANCE, 0.02);
            double sampled = 0;
            for (int i = 0; i <= 4000; i++) {
                double w = BAND.band().low() + (BAND.band().high() - BAND.band().low()) * i / 4000.0;
                sampled = Math.max(sampled, fitted.amplitudeAt(ResponseKind.DISPLACEMENT, w));
            }
            assertEquals(sampled, k.nominalPeak().value(), 1e-6 * sampled);
            assertTrue(k.p95() <= k.worstPeak() * (1 + 1e-12), "P95 never above the worst case");
            assertTrue(k.worstPeak() >= k.nominalPeak().value() * (1 - 1e-12), "the worst case includes nominal");
        }
        assertEquals(chosen, c.chosen());
        assertEquals(1, c.candidates().stream().filter(k -> k.method() == c.chosen()).count());
        // An undamped absorber works at one speed: with a band it is left out, with its reason.
        assertEquals(List.of(new MethodComparison.LeftOut(DesignMethod.UNDAMPED_SINGLE_SPEED,
                LeftOutReason.NOT_ONE_SPEED)), c.leftOut());
    }

    /**
     * The recommended candidate's worst case is the least. Checked against an independent brute
     * force over the tolerance box (structure and absorber frequency factors 21 x 21, absorber
     * damping at its ends and nominal), peaks from a dense frequency grid, not the project's search.
     */
    @Test
    void theRecommendedCandidateHasTheLeastWorstCase() {
        DesignStudy s = study(DAMPED, BAND, DesignMethod.EXACT_PEAK, AbsorberSizing.ofMassRatio(0.04));
        MethodComparison c = compare(s);
        assertEquals(DesignMethod.ROBUST_WORST_CASE, c.recommended());
        assertEquals(MethodComparison.RecommendationReason.LEAST_WORST_CASE, c.why());
        double least = c.candidates().stream().mapToDouble(Candidate::worstPeak).min().orElseThrow();
        assertEquals(least, c.recommendedCandidate().orElseThrow().worstPeak());
        double robust = bruteWorst(s, c.candidate(DesignMethod.ROBUST_WORST_CASE).orElseThrow());
        for (DesignMethod other : List.of(DesignMethod.EQUAL_PEAK, DesignMethod.EXACT_PEAK)) {
            assertTrue(robust < bruteWorst(s, c.candidate(other).orElseThrow()), other.id());
        }
        // The user's explicit choice stays the design: the comparison marks it beside the recommended one.
        assertEquals(DesignMethod.EXACT_PEAK, c.chosen());
    }

    private static double bruteWorst(DesignStudy s, Candidate k) {
        ToleranceRanges r = s.robustness().ranges();
        Absorber a = Absorber.of(s.structure(), k.tuning());
        double worst = 0;
        for (int i = 0; i <= 20; i++) {
            double sf = 1 - r.structure() + 2 * r.structure() * i / 20.0;
            Structure st = Structure.of(s.structure().effectiveMass(), s.structure().effectiveStiffness() * sf * sf,
                    s.structure().dampingRatio());
            for (int j = 0; j <= 20; j++) {
                double af = 1 - r.absorber() + 2 * r.absorber() * j / 20.0;
                for (double dc : new double[] {-r.damping(), 0.0, r.damping()}) {
                    Absorber varied = new Absorber(a.mass(), a.stiffness() * af * af, a.damping() * (1 + dc));
                    SystemResponse fitted = new SystemResponse(st, varied.tuningOn(st), ExcitationKind.UNBALANCE, 0.02);
                    for (int f = 0; f <= 400; f++) {
                        double w = BAND.band().low() + (BAND.band().high() - BAND.band().low()) * f / 400.0;
                        worst = Math.max(worst, fitted.amplitudeAt(ResponseKind.DISPLACEMENT, w));
                    }
                }
            }
        }
        return worst;
    }

    /**
     * Den Hartog (1956), Mechanical Vibrations, 4th ed., eqs. 3.23 and 3.24, for an undamped
     * structure under force, displacement response: f = 1/(1+mu) and (c/c_c)^2 = 3 mu / (8 (1+mu)^3)
     * with c_c = 2 m2 omega1, i.e. f zeta_a = sqrt(3 mu / (8 (1+mu)^3)) in the absorber-referred
     * zeta_a = c2/(2 m2 omega_a) used here (reference/absorber-formulas.md, the damping-reference trap).
     */
    @Test
    void theEqualPeakCandidateIsDenHartogs() {
        double mu = 0.05;
        Excitation force = new Excitation(ExcitationKind.FORCE, 500, new FrequencyBand(0.8 * OMEGA1, 1.2 * OMEGA1));
        MethodComparison c = compare(study(UNDAMPED, force, DesignMethod.ROBUST_WORST_CASE,
                AbsorberSizing.ofMassRatio(mu)));
        Candidate ep = c.candidate(DesignMethod.EQUAL_PEAK).orElseThrow();
        assertEquals(1 / (1 + mu), ep.tuning().tuningRatio(), 1e-15);
        assertEquals(Math.sqrt(3 * mu / (8 * Math.pow(1 + mu, 3))),
                ep.tuning().tuningRatio() * ep.tuning().dampingRatio(), 1e-15);
        // The damper itself: c2 = 2 m2 omega1 sqrt(3 mu / (8 (1+mu)^3)).
        Absorber a = Absorber.of(UNDAMPED, ep.tuning());
        assertEquals(2 * a.mass() * OMEGA1 * Math.sqrt(3 * mu / (8 * Math.pow(1 + mu, 3))), a.damping(),
                1e-9 * a.damping());
        assertEquals(mu, ep.tuning().massRatio(), 1e-15);
    }

    @Test
    void aMethodWithoutAClosedFormIsLeftOutWithItsReason() {
        // No published equal-peak form for the velocity of a structure under a force.
        DesignStudy s = new DesignStudy("invented", DAMPED, new Excitation(ExcitationKind.FORCE, 500,
                new FrequencyBand(0.9 * OMEGA1, 1.1 * OMEGA1)), ResponseKind.VELOCITY, AbsorberSizing.ofMassRatio(0.05),
                DesignMethod.EXACT_PEAK, false, 1.5);
        MethodComparison c = compare(s);
        assertTrue(c.leftOut().contains(new MethodComparison.LeftOut(DesignMethod.EQUAL_PEAK,
                LeftOutReason.NO_CLOSED_FORM)));
        assertFalse(c.candidate(DesignMethod.EQUAL_PEAK).isPresent());
    }

    @Test
    void oneSpeedAddsTheUndampedAbsorber() {
        Excitation one = new Excitation(ExcitationKind.FORCE, 500, FrequencyBand.single(1.02 * OMEGA1));
        MethodComparison c = compare(study(DAMPED, one, DesignMethod.UNDAMPED_SINGLE_SPEED,
                AbsorberSizing.ofMassRatio(0.05)));
        Candidate u = c.candidate(DesignMethod.UNDAMPED_SINGLE_SPEED).orElseThrow();
        // Frahm's absorber: tuned to the forcing frequency, f = omega / omega1, no damping; the
        // structure then stands still at that speed.
        assertEquals(1.02, u.tuning().tuningRatio(), 1e-12);
        assertEquals(0.0, u.tuning().dampingRatio());
        assertEquals(0.0, u.nominalPeak().value(), 1e-12 * 500 / DAMPED.effectiveStiffness());
        assertTrue(c.leftOut().isEmpty());
        assertEquals(DesignMethod.UNDAMPED_SINGLE_SPEED, c.chosen());
    }

    @Test
    void aTargetSizedStudyIsComparedAtTheMassItsDesignFound() {
        DesignStudy s = new DesignStudy("invented", DAMPED, BAND, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofTarget(0.02 / 1500 * 2.5, 0.25), DesignMethod.EXACT_PEAK, false, 1.5,
                new DesignConstraints(OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty()));
        DesignResult d = Designer.design(s);
        MethodComparison c = MethodComparison.of(d, ProgressListener.NONE);
        for (Candidate k : c.candidates()) {
            assertEquals(d.tuning().massRatio(), k.tuning().massRatio(), 1e-15, k.method().id());
        }
        assertEquals(d.tuning(), c.chosenCandidate().orElseThrow().tuning());
    }

    @Test
    void underWhiteNoiseNoPeakMethodIsCompared() {
        Excitation noise = new Excitation(ExcitationKind.FORCE, 1, new FrequencyBand(0.5 * OMEGA1, 2 * OMEGA1),
                Spectrum.whiteNoise(1.0));
        MethodComparison c = compare(study(DAMPED, noise, DesignMethod.EXACT_VARIANCE, AbsorberSizing.ofMassRatio(0.05)));
        assertTrue(c.candidates().isEmpty());
        assertEquals(MethodComparison.RecommendationReason.WHITE_NOISE, c.why());
        assertEquals(DesignMethod.EXACT_VARIANCE, c.recommended());
        assertTrue(c.leftOut().stream().allMatch(l -> l.reason() == LeftOutReason.WHITE_NOISE));
    }

    @Test
    void candidatesStartedBesideTheDesignGiveTheComparisonMadeAfterIt() {
        // Every candidate is a pure function of its study: started before the design is made (the
        // study fixes the mass ratio) or after it (a target, at the mass the design found), the
        // comparison is, record for record, the one made from the finished design.
        DesignStudy fixed = study(DAMPED, BAND, DesignMethod.EXACT_PEAK, AbsorberSizing.ofMassRatio(0.04));
        DesignResult design = Designer.design(fixed);
        assertEquals(MethodComparison.of(design, ProgressListener.NONE),
                MethodComparison.of(fixed, () -> Designer.design(fixed), ProgressListener.NONE));
        DesignStudy target = study(DAMPED, BAND, DesignMethod.EXACT_PEAK,
                AbsorberSizing.ofTarget(1.2 * design.responseAfter().value(), 0.25));
        assertEquals(compare(target),
                MethodComparison.of(target, () -> Designer.design(target), ProgressListener.NONE));
        // a design that cannot be made: its own refusal reaches the caller, whatever the candidates do
        InvalidInputException refused = new InvalidInputException("absorber.stroke_limit", "0.001", "cannot be met");
        InvalidInputException thrown = assertThrows(InvalidInputException.class,
                () -> MethodComparison.of(fixed, () -> {
                    throw refused;
                }, ProgressListener.NONE));
        assertSame(refused, thrown);
    }

    @Test
    void theDossierComputesTheComparisonOnceAndStopsWhenCancelled() {
        AtomicInteger runs = new AtomicInteger();
        DesignDossier.Computations counting = new DesignDossier.Computations() {
            @Override
            public MethodComparison comparison(DesignStudy study, Supplier<DesignResult> design,
                    ProgressListener listener) {
                runs.incrementAndGet();
                return DesignDossier.Computations.super.comparison(study, design, listener);
            }
        };
        DesignStudy s = study(DAMPED, BAND, DesignMethod.EQUAL_PEAK, AbsorberSizing.ofMassRatio(0.04));
        DesignDossier.Cache cache = new DesignDossier.Cache(counting);
        ProgressListener cancelled = new ProgressListener() {
            @Override
            public boolean cancelled() {
                return true;
            }
        };
        CoreException e = assertThrows(CoreException.class, () -> cache.dossier(s).comparison(cancelled));
        assertEquals(Messages.CANCELLED, e.key());
        MethodComparison first = cache.dossier(s).comparison(ProgressListener.NONE);
        assertEquals(first, cache.dossier(s).comparison(ProgressListener.NONE));
        assertEquals(2, runs.get(), "the cancelled run kept nothing; the next computed once");
    }
}
