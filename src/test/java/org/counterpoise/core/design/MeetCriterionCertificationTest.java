package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.function.ToDoubleFunction;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.LimitCurve;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.robust.Mistuning;
import org.counterpoise.core.robust.WorstCase;
import org.junit.jupiter.api.Test;

/**
 * Certifies "meet the criterion" against an independent route, a coarse global brute force: on a
 * grid of tuning ratio (0.70 to 1.30 in steps of 0.5 %) and damping ratio (the practical floor 0.01
 * to 0.6, 24 steps, log-spaced), no absorber 2 % lighter than the one found meets the criterion
 * (the stated accuracy: 2 % in mass ratio at the grid's resolution), and the design found meets it
 * (utilisation at most 1 within 1e-9), each utilisation evaluated independently of the design: the
 * exact band peak of {@link SystemResponse} in the criterion's convention (the definitions in
 * {@link AmplitudeConvention}: r.m.s. = peak / sqrt 2, peak-to-peak = 2 peak) over the limit, and for
 * the robust worst case the {@link WorstCase} over the tolerance ranges (itself checked against a
 * dense three-dimensional brute force in WorstCaseTest). Invented cases: 1000 kg at 10 Hz.
 */
class MeetCriterionCertificationTest {
    private static final double W1 = 2 * Math.PI * 10;
    private static final Structure STRUCTURE = Structure.of(1000, 1000 * W1 * W1, 0.02);
    private static final double LIGHTER = 0.98;

    private static DesignStudy study(Excitation e, ResponseKind response, DesignMethod method, Criterion c) {
        return new DesignStudy("certify", STRUCTURE, e, response, new AbsorberSizing.MeetCriterion(0.3), method,
                false, 1.5, DesignConstraints.NONE, RobustnessSettings.DEFAULT, Optional.of(c));
    }

    /** The nominal utilisation of a flat user limit, by the exact band peak of SystemResponse. */
    private static double nominal(DesignStudy s, UserLimit u, Tuning t) {
        Excitation e = s.excitation();
        double peak = new SystemResponse(STRUCTURE, t, e.kind(), e.amplitude()).peakOver(u.quantity(), e.band())
                .value();
        return u.convention().ofHarmonic(peak) / u.limit().at(1.0);
    }

    /** The worst-case utilisation over the study's tolerance ranges. */
    private static double worstCase(DesignStudy s, UserLimit u, Tuning t) {
        double peak = WorstCase.of(new Mistuning(STRUCTURE, s.excitation(), u.quantity()), Absorber.of(STRUCTURE, t),
                s.robustness().ranges()).peak();
        return u.convention().ofHarmonic(peak) / u.limit().at(1.0);
    }

    /** The least utilisation on the grid at one mass ratio. */
    static double gridMinimum(double mu, ToDoubleFunction<Tuning> utilisation, int tunings, int dampings) {
        double least = Double.POSITIVE_INFINITY;
        for (int i = 0; i < tunings; i++) {
            double f = 0.7 + 0.6 * i / (tunings - 1.0);
            for (int j = 0; j < dampings; j++) {
                double zeta = 0.01 * Math.pow(60, j / (dampings - 1.0));
                least = Math.min(least, utilisation.applyAsDouble(new Tuning(mu, f, zeta)));
            }
        }
        return least;
    }

    /** The checks: the design meets it; no 2 % lighter absorber on the grid does; no warning of a miss. */
    private static void certify(DesignStudy s, ToDoubleFunction<Tuning> utilisation, int tunings, int dampings) {
        DesignResult r = Designer.design(s);
        double mu = r.tuning().massRatio();
        assertTrue(mu > CriterionChoice.lowest(0.3) && mu < 0.3, "an absorber between the ends: " + r.tuning());
        double found = utilisation.applyAsDouble(r.tuning());
        assertTrue(found <= 1 + 1e-9, "the design meets it: " + found);
        double lighter = gridMinimum(mu * LIGHTER, utilisation, tunings, dampings);
        assertTrue(lighter > 1, "a 2 % lighter absorber meets it on the grid: " + lighter);
        assertTrue(r.warnings().stream().noneMatch(w -> w.kind() == WarningKind.CRITERION_NOT_MET
                || w.kind() == WarningKind.NO_ABSORBER_NEEDED), r.warnings().toString());
    }

    @Test
    void exactPeakOnAnotherQuantityInRmsOverABand() {
        // velocity limit r.m.s. while the study's response is displacement: the general route
        Excitation e = new Excitation(ExcitationKind.FORCE, 100, new FrequencyBand(0.85 * W1, 1.15 * W1));
        double bare = new SystemResponse(STRUCTURE, null, e.kind(), e.amplitude())
                .peakOver(ResponseKind.VELOCITY, e.band()).value();
        UserLimit u = new UserLimit(ResponseKind.VELOCITY, AmplitudeConvention.RMS,
                LimitCurve.flat(AmplitudeConvention.RMS.ofHarmonic(bare) / 5));
        DesignStudy s = study(e, ResponseKind.DISPLACEMENT, DesignMethod.EXACT_PEAK, u);
        certify(s, t -> nominal(s, u, t), 121, 24);
    }

    @Test
    void exactPeakOnTheStudysResponsePeakToPeakUnderUnbalance() {
        // transmitted force, peak-to-peak, by the H-infinity route of the target sizing
        Excitation e = new Excitation(ExcitationKind.UNBALANCE, 0.05, new FrequencyBand(0.8 * W1, 1.2 * W1));
        double bare = new SystemResponse(STRUCTURE, null, e.kind(), e.amplitude())
                .peakOver(ResponseKind.TRANSMITTED_FORCE, e.band()).value();
        UserLimit u = new UserLimit(ResponseKind.TRANSMITTED_FORCE, AmplitudeConvention.PEAK_TO_PEAK,
                LimitCurve.flat(2 * bare / 8));
        DesignStudy s = study(e, ResponseKind.TRANSMITTED_FORCE, DesignMethod.EXACT_PEAK, u);
        certify(s, t -> nominal(s, u, t), 121, 24);
    }

    @Test
    void robustWorstCaseOnAccelerationAtOneSpeed() {
        Excitation e = new Excitation(ExcitationKind.FORCE, 100, FrequencyBand.single(1.02 * W1));
        double bare = new SystemResponse(STRUCTURE, null, e.kind(), e.amplitude())
                .peakOver(ResponseKind.ACCELERATION, e.band()).value();
        UserLimit u = new UserLimit(ResponseKind.ACCELERATION, AmplitudeConvention.RMS,
                LimitCurve.flat(AmplitudeConvention.RMS.ofHarmonic(bare) / 4));
        DesignStudy s = study(e, ResponseKind.ACCELERATION, DesignMethod.ROBUST_WORST_CASE, u);
        certify(s, t -> worstCase(s, u, t), 41, 16);
    }

    @Test
    void whenTheBareStructureMeetsItNoAbsorberIsNeededAndTheLightestConsideredIsShown() {
        Excitation e = new Excitation(ExcitationKind.FORCE, 100, new FrequencyBand(0.9 * W1, 1.1 * W1));
        double bare = new SystemResponse(STRUCTURE, null, e.kind(), e.amplitude())
                .peakOver(ResponseKind.DISPLACEMENT, e.band()).value();
        UserLimit u = new UserLimit(ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK, LimitCurve.flat(1.2 * bare));
        for (DesignMethod method : new DesignMethod[] {DesignMethod.EXACT_PEAK, DesignMethod.ROBUST_WORST_CASE}) {
            DesignResult r = Designer.design(study(e, ResponseKind.DISPLACEMENT, method, u));
            assertTrue(r.tuning().massRatio() == CriterionChoice.lowest(0.3), r.tuning().toString());
            assertTrue(r.warnings().stream().anyMatch(w -> w.kind() == WarningKind.NO_ABSORBER_NEEDED),
                    r.warnings().toString());
        }
    }

    @Test
    void theComparisonOfMethodsAndTheRobustnessStudyTakeTheMassRatioFound() {
        Excitation e = new Excitation(ExcitationKind.FORCE, 100, new FrequencyBand(0.9 * W1, 1.1 * W1));
        double bare = new SystemResponse(STRUCTURE, null, e.kind(), e.amplitude())
                .peakOver(ResponseKind.DISPLACEMENT, e.band()).value();
        UserLimit u = new UserLimit(ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK, LimitCurve.flat(bare / 5));
        DesignDossier dossier = DesignDossier.of(study(e, ResponseKind.DISPLACEMENT, DesignMethod.EXACT_PEAK, u));
        double mu = dossier.design().tuning().massRatio();
        MethodComparison comparison = dossier.comparison(ProgressListener.NONE);
        // every method compared at the same absorber mass (the comparison's rule)
        assertTrue(comparison.candidates().size() >= 3, comparison.candidates().toString());
        for (MethodComparison.Candidate c : comparison.candidates()) {
            assertEquals(mu, c.tuning().massRatio(), 1e-15, c.method().id());
        }
        assertEquals(mu, dossier.robustness(ProgressListener.NONE).robust().tuning().massRatio(), 1e-15);
    }
}
