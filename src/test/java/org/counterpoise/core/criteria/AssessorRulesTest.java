package org.counterpoise.core.criteria;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Spectrum;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.RandomResponse;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/**
 * The verdict's rules: one-third-octave grouping, unbounded responses, zones, the governing order,
 * and white noise (exact r.m.s. against a numerical integral of the response's spectral density).
 * Invented scenarios.
 */
class AssessorRulesTest {
    private static final double TWO_PI = 2 * Math.PI;
    private static final Structure FLOOR = Structure.of(1500, 1500 * Math.pow(TWO_PI * 9, 2), 0.02);
    private static final Tuning ABSORBER = new Tuning(0.06, 0.94, 0.14);

    @Test
    void ordersWithinAThirdOctaveAreJudgedAsOneBand() {
        assertArrayEquals(new int[][] {{0, 1}, {2}, {3}}, Assessor.thirdOctaveGroups(List.of(
                new ExcitationOrder(ExcitationKind.FORCE, 1, 1.0), new ExcitationOrder(ExcitationKind.FORCE, 1, 1.2),
                new ExcitationOrder(ExcitationKind.FORCE, 1, 1.3), new ExcitationOrder(ExcitationKind.FORCE, 1, 3.0))));
        // orders 1x and 1.2x share a band: their r.m.s. sum (sqrt of the sum of squares over 2, the
        // r.m.s. of a sum of harmonics at distinct frequencies, Harris and Piersol 2002 ch. 1)
        // against the lower of their two limits; order 4x on its own
        Excitation e = new Excitation(ExcitationKind.FORCE, 300, new FrequencyBand(TWO_PI * 5, TWO_PI * 12))
                .withOtherOrders(List.of(new ExcitationOrder(ExcitationKind.UNBALANCE, 0.2, 1.2),
                        new ExcitationOrder(ExcitationKind.FORCE, 40, 4.0)));
        LimitCurve curve = new LimitCurve(List.of(new LimitCurve.Point(3, 2e-3), new LimitCurve.Point(10, 4e-4),
                new LimitCurve.Point(60, 9e-4)));
        for (AmplitudeConvention convention : AmplitudeConvention.values()) {
            Criterion limit = new UserLimit(ResponseKind.VELOCITY, convention, curve);
            for (Tuning t : new Tuning[] {null, ABSORBER}) {
                NewtonReference newton = new NewtonReference(FLOOR, t);
                double[] brute = NewtonReference.maximise(w -> {
                    double[] a = newton.amplitudes(ResponseKind.VELOCITY, e.orders(), null, w);
                    double low = Math.min(BruteVerdict.limitAt(curve.points(), w / TWO_PI),
                            BruteVerdict.limitAt(curve.points(), 1.2 * w / TWO_PI));
                    double band = BruteVerdict.combined(convention, new double[] {a[0], a[1]}) / low;
                    double alone = BruteVerdict.harmonic(convention, a[2])
                            / BruteVerdict.limitAt(curve.points(), 4 * w / TWO_PI);
                    return Math.max(band, alone);
                }, e.band().low(), e.band().high());
                Reading r = Assessor.of(limit, e).read(FLOOR, Optional.ofNullable(t));
                assertEquals(brute[1], r.utilisation(), 1e-9 * brute[1], convention + " " + t);
                assertTrue(r.governingOrder().isPresent());
            }
        }
    }

    @Test
    void anUndampedStructureForcedAtResonanceIsUnboundedNeverNaN() {
        // Den Hartog 1956, 3.1: no damping, forcing at the natural frequency: no steady bound
        Structure undamped = Structure.of(900, 900 * Math.pow(TWO_PI * 7, 2), 0.0);
        Excitation e = new Excitation(ExcitationKind.FORCE, 100, new FrequencyBand(TWO_PI * 6, TWO_PI * 8));
        MachineSeverity machine = new MachineSeverity(MachineClass.GROUP_2_RIGID, SeverityZone.B);
        Acceptance a = Assessor.of(machine, e).acceptance(undamped, ABSORBER);
        assertEquals(Double.POSITIVE_INFINITY, a.before().value());
        assertTrue(a.before().unbounded());
        assertFalse(a.before().passes());
        assertEquals(0.0, a.before().marginRatio());
        assertEquals(List.of("D"), a.before().zones());
        assertEquals(TWO_PI * 7, a.before().worstFrequency(), 1e-9 * TWO_PI * 7);
        assertTrue(a.absorberNeeded());
        assertTrue(Double.isFinite(a.after().value()) && a.after().value() > 0);
        // a second order reaching the natural frequency (2 x 3.5 Hz) is unbounded too, judged alone
        Excitation low = new Excitation(ExcitationKind.FORCE, 100, new FrequencyBand(TWO_PI * 3, TWO_PI * 3.6))
                .withOtherOrders(List.of(new ExcitationOrder(ExcitationKind.FORCE, 5, 2.0)));
        Reading r = Assessor.of(new EquipmentVibration(VibrationCriterionCurve.VC_A), low).read(undamped,
                Optional.empty());
        assertTrue(r.unbounded());
        assertEquals(OptionalInt.of(1), r.governingOrder());
        assertEquals(TWO_PI * 3.5, r.worstFrequency(), 1e-9 * TWO_PI * 3.5);
        assertFalse(Double.isNaN(r.limit()));
    }

    @Test
    void overlappingComfortReactionsAreAllReported() {
        // ISO 2631-1:1997 Annex C, C.2.3: 0.8 to 1 m/s^2 is both fairly uncomfortable and uncomfortable
        HumanComfort comfort = new HumanComfort(FrequencyWeighting.WK, ComfortReaction.FAIRLY_UNCOMFORTABLE);
        Excitation unit = new Excitation(ExcitationKind.FORCE, 1, FrequencyBand.single(TWO_PI * 6));
        double perNewton = Assessor.of(comfort, unit).read(FLOOR, Optional.empty()).value();
        Excitation e = new Excitation(ExcitationKind.FORCE, 0.9 / perNewton, FrequencyBand.single(TWO_PI * 6));
        Reading r = Assessor.of(comfort, e).read(FLOOR, Optional.empty());
        assertEquals(0.9, r.value(), 1e-12);
        assertEquals(List.of("fairly-uncomfortable", "uncomfortable"), r.zones());
        assertTrue(r.passes());
    }

    @Test
    void theGoverningOrderHasTheLargestUntreatedUtilisation() {
        // each order alone against the limit, bare structure, by brute force over the direct solve
        Excitation e = new Excitation(ExcitationKind.UNBALANCE, 0.02, new FrequencyBand(TWO_PI * 2, TWO_PI * 3))
                .withOtherOrders(List.of(new ExcitationOrder(ExcitationKind.FORCE, 200, 3.0),
                        new ExcitationOrder(ExcitationKind.FORCE, 30, 7.0)));
        for (Criterion c : List.of(new EquipmentVibration(VibrationCriterionCurve.VC_B),
                new UserLimit(ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK, LimitCurve.flat(1e-4)),
                new BuildingVibration(BuildingAxis.VERTICAL, RoomUse.GENERAL_OFFICE))) {
            int expected = -1;
            double largest = -1;
            for (int j = 0; j < e.orders().size(); j++) {
                ExcitationOrder o = e.orders().get(j);
                Excitation alone = new Excitation(o.kind(), o.amplitude(), new FrequencyBand(
                        o.frequencyFactor() * e.band().low(), o.frequencyFactor() * e.band().high()));
                double u = BruteVerdict.utilisation(c, FLOOR, null, alone)[1];
                if (u > largest) {
                    largest = u;
                    expected = j;
                }
            }
            assertEquals(expected, Assessor.governingOrder(c, FLOOR, e), c.toString());
        }
    }

    @Test
    void whiteNoiseComfortIsTheIntegralOfTheWeightedSpectralDensity() {
        // a_w^2 = integral over f of |W(f)|^2 |A(f)|^2 G0 df for a one-sided PSD G0 per hertz
        // (ISO 2631-1:1997 6.4.2 in its continuous form; Crandall and Mark 1963 ch. 2), integrated
        // here by Gauss-Legendre over 0 to 1e4 Hz in logarithmic pieces (Commons Math)
        double g0 = 400.0;
        Excitation noise = new Excitation(ExcitationKind.FORCE, 1, FrequencyBand.single(TWO_PI * 9),
                Spectrum.whiteNoise(g0));
        for (FrequencyWeighting w : List.of(FrequencyWeighting.WK, FrequencyWeighting.WD)) {
            for (Tuning t : new Tuning[] {null, ABSORBER}) {
                NewtonReference newton = new NewtonReference(FLOOR, t);
                double meanSquare = integral(f -> {
                    double a = newton.response(ResponseKind.ACCELERATION, ExcitationKind.FORCE, 1, TWO_PI * f).abs()
                            * NewtonReference.weighting(w, f);
                    return a * a * g0;
                });
                Reading r = Assessor.of(new HumanComfort(w, ComfortReaction.NOT_UNCOMFORTABLE), noise)
                        .read(FLOOR, Optional.ofNullable(t));
                assertEquals(Math.sqrt(meanSquare), r.value(), 1e-8 * r.value(), w + " " + t);
            }
        }
        // unweighted: the same as the design's r.m.s. response to white noise (Miles 1954 bare)
        UserLimit rms = new UserLimit(ResponseKind.DISPLACEMENT, AmplitudeConvention.RMS, LimitCurve.flat(1e-3));
        assertEquals(RandomResponse.rms(FLOOR, ABSORBER, ExcitationKind.FORCE, g0, ResponseKind.DISPLACEMENT),
                Assessor.of(rms, noise).read(FLOOR, Optional.of(ABSORBER)).value(), 1e-12 * 1e-4);
        NewtonReference bare = new NewtonReference(FLOOR, null);
        double meanSquare = integral(f -> Math.pow(bare.response(ResponseKind.DISPLACEMENT, ExcitationKind.FORCE, 1,
                TWO_PI * f).abs(), 2) * g0);
        assertEquals(Math.sqrt(meanSquare), Assessor.of(rms, noise).read(FLOOR, Optional.empty()).value(),
                1e-8 * Math.sqrt(meanSquare));
        // an undamped structure has no finite mean square
        Structure undamped = Structure.of(1500, 1500 * Math.pow(TWO_PI * 9, 2), 0.0);
        assertTrue(Assessor.of(rms, noise).read(undamped, Optional.empty()).unbounded());
    }

    @Test
    void whiteNoiseRefusesWhatCannotJudgeIt() {
        Excitation noise = new Excitation(ExcitationKind.FORCE, 1, FrequencyBand.single(TWO_PI * 9),
                Spectrum.whiteNoise(1.0));
        for (Criterion c : List.of(new EquipmentVibration(VibrationCriterionCurve.VC_A),
                new BuildingVibration(BuildingAxis.HORIZONTAL, RoomUse.WORKSHOP),
                new UserLimit(ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK, LimitCurve.flat(1e-3)))) {
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> Assessor.of(c, noise));
            assertEquals("acceptance", e.field());
            assertEquals(c.kind().id(), e.value());
            assertTrue(e.allowed().contains("human-comfort, machine, or a user limit in r.m.s. with one value"));
            assertFalse(Assessor.judgesWhiteNoise(c));
        }
        assertTrue(Assessor.judgesWhiteNoise(new MachineSeverity(MachineClass.GROUP_1_RIGID, SeverityZone.A)));
    }

    /** Integral of f(hertz) from 0 to 1e4 Hz: 0 to 1e-3 Hz in one piece, then 700 logarithmic pieces. */
    private static double integral(DoubleUnaryOperator f) {
        IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(8, 1e-13, 1e-300);
        double sum = gauss.integrate(100000, f::applyAsDouble, 0, 1e-3);
        for (int i = 0; i < 700; i++) {
            double a = 1e-3 * Math.pow(10, i / 100.0);
            double b = 1e-3 * Math.pow(10, (i + 1) / 100.0);
            sum += gauss.integrate(100000, f::applyAsDouble, a, b);
        }
        return sum;
    }
}
