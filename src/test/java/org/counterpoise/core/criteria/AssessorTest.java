package org.counterpoise.core.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Random;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.junit.jupiter.api.Test;

/**
 * The exact verdict against the direct solve of the equations of motion ({@link NewtonReference},
 * Den Hartog 1956 ch. 3) maximised by brute force ({@link BruteVerdict}), for every criterion
 * family, several orders, weighting, curves, bands and single speeds, damped and undamped
 * structures. Invented scenarios.
 */
class AssessorTest {
    private static final double TWO_PI = 2 * Math.PI;
    private static final List<ResponseKind> QUANTITIES = List.of(ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY,
            ResponseKind.ACCELERATION, ResponseKind.TRANSMITTED_FORCE);

    private static Structure structure(double hertz, double zeta) {
        double mass = 1200;
        return Structure.of(mass, mass * Math.pow(TWO_PI * hertz, 2), zeta);
    }

    private static void assertAgrees(Criterion criterion, Structure s, Tuning t, Excitation e, double tolerance) {
        Reading reading = Assessor.of(criterion, e).read(s, Optional.ofNullable(t));
        if (t == null && s.dampingRatio() == 0 && e.orders().stream().anyMatch(o -> o.frequencyFactor()
                * e.band().low() <= s.naturalFrequency() && s.naturalFrequency() <= o.frequencyFactor() * e.band().high())) {
            // an undamped structure forced at its natural frequency: no bound (Den Hartog 1956, 3.1)
            assertTrue(reading.unbounded() && reading.utilisation() == Double.POSITIVE_INFINITY, reading.toString());
            assertEquals(Double.POSITIVE_INFINITY, Assessor.of(criterion, e).utilisationBare(s));
            return;
        }
        double[] brute = BruteVerdict.utilisation(criterion, s, t, e);
        assertEquals(brute[1], reading.utilisation(), tolerance * brute[1], criterion + " " + s + " " + t + " " + e);
        assertEquals(reading.utilisation(), Assessor.of(criterion, e).utilisation(s, t == null ? null : t),
                1e-15 * reading.utilisation(), "the fast path reads the same");
        // the value at the worst point: the same utilisation there (a flat maximum may sit anywhere
        // within round-off, so the place is compared through the value it gives)
        double[] there = BruteVerdict.utilisation(criterion, s, t, withBand(e, FrequencyBand.single(
                reading.worstFrequency())));
        assertEquals(brute[1], there[1], 1e-7 * brute[1], "worst frequency " + reading.worstFrequency());
    }

    private static Excitation withBand(Excitation e, FrequencyBand band) {
        return new Excitation(e.kind(), e.amplitude(), band, e.spectrum(), e.runUpRate(), e.otherOrders());
    }

    @Test
    void oneOrderFlatLimitIsTheExactPeakInEachConvention() {
        // the check: a user limit in r.m.s. against peak / sqrt 2 of the computed response
        // (definition, Harris and Piersol 2002 ch. 1); the peak from SystemResponse.peakOver (the
        // design's response peak) and from the direct solve
        Structure s = structure(8, 0.02);
        Tuning t = new Tuning(0.05, 0.95, 0.12);
        Excitation e = new Excitation(ExcitationKind.FORCE, 900, new FrequencyBand(TWO_PI * 6, TWO_PI * 11));
        for (ResponseKind q : QUANTITIES) {
            double peakAfter = new SystemResponse(s, t, e.kind(), e.amplitude()).peakOver(q, e.band()).value();
            double peakBefore = new SystemResponse(s, null, e.kind(), e.amplitude()).peakOver(q, e.band()).value();
            for (AmplitudeConvention c : AmplitudeConvention.values()) {
                Criterion limit = new UserLimit(q, c, LimitCurve.flat(1e-3));
                Acceptance a = Assessor.of(limit, e).acceptance(s, t);
                double factor = c == AmplitudeConvention.RMS ? 1 / Math.sqrt(2)
                        : c == AmplitudeConvention.PEAK_TO_PEAK ? 2 : 1;
                assertEquals(peakAfter * factor, a.after().value(), 1e-12 * peakAfter * factor, q + " " + c);
                assertEquals(peakBefore * factor, a.before().value(), 1e-12 * peakBefore * factor, q + " " + c);
                assertEquals(OptionalInt.empty(), a.after().governingOrder());
                assertFalse(a.after().outsideRange());
                assertAgrees(limit, s, t, e, 1e-9);
                assertAgrees(limit, s, null, e, 1e-9);
            }
        }
    }

    @Test
    void ordersTogetherAgreeWithTheDirectSolveInEveryConvention() {
        Random random = new Random(13);
        for (int trial = 0; trial < 24; trial++) {
            Case c = Case.random(random, trial % 3 == 0);
            AmplitudeConvention convention = AmplitudeConvention.values()[trial % 3];
            ResponseKind q = QUANTITIES.get(random.nextInt(QUANTITIES.size()));
            Criterion limit = new UserLimit(q, convention, LimitCurve.flat(1e-3));
            // the sum of amplitudes is scanned (ScanMaximum), r.m.s. is exact: both to 1e-9 here
            assertAgrees(limit, c.structure, c.tuning, c.excitation, 1e-9);
            assertAgrees(limit, c.structure, null, c.excitation, 1e-9);
        }
    }

    @Test
    void machineSeverityReadsTheBroadbandVelocityAndItsZone() {
        Random random = new Random(20816);
        for (int trial = 0; trial < 12; trial++) {
            Case c = Case.random(random, false);
            Criterion machine = new MachineSeverity(MachineClass.values()[trial % 4], SeverityZone.B);
            assertAgrees(machine, c.structure, c.tuning, c.excitation, 1e-9);
            Reading r = Assessor.of(machine, c.excitation).read(c.structure, Optional.of(c.tuning));
            // ISO 20816-3 zones do not overlap: exactly one holds the value, bounds as in MachineClass
            assertEquals(1, r.zones().size());
            Zone zone = machine.zones().stream().filter(z -> z.id().equals(r.zones().get(0))).findFirst()
                    .orElseThrow();
            assertTrue(r.value() > zone.lower() && r.value() <= zone.upper(), r + " " + zone);
        }
    }

    @Test
    void humanComfortIsTheWeightedRmsOfTheOrders() {
        // weighting from ISO 2631-1:1997 Annex A written out independently in NewtonReference
        Random random = new Random(2631);
        for (int trial = 0; trial < 12; trial++) {
            Case c = Case.random(random, trial % 2 == 0);
            Criterion comfort = new HumanComfort(trial % 2 == 0 ? FrequencyWeighting.WK : FrequencyWeighting.WD,
                    ComfortReaction.A_LITTLE_UNCOMFORTABLE);
            assertAgrees(comfort, c.structure, c.tuning, c.excitation, 1e-9);
            assertAgrees(comfort, c.structure, null, c.excitation, 1e-9);
        }
    }

    @Test
    void theIndependentWeightingReproducesTable3OfTheStandard() {
        // ISO 2631-1:1997 Table 3 (x 1000) at nominal frequencies, as printed (Wd at 10 Hz corrected
        // to 202: reference/acceptance-criteria.md section 1.4); 3 significant figures
        double[][] wk = {{1, 482}, {2.5, 631}, {6.3, 1054}, {16, 768}, {63, 186}};
        double[][] wd = {{1, 1011}, {2, 890}, {10, 202}, {31.5, 63.2}};
        for (double[] row : wk) {
            assertEquals(row[1] / 1000, NewtonReference.weighting(FrequencyWeighting.WK, row[0]), 0.002 * row[1] / 1000);
        }
        for (double[] row : wd) {
            assertEquals(row[1] / 1000, NewtonReference.weighting(FrequencyWeighting.WD, row[0]), 0.002 * row[1] / 1000);
        }
    }

    @Test
    void atOneSpeedTheWeightedValueIsTheWeightingFactorTimesTheResponse() {
        // pointwise: a_w = |W(f)| |a(f)| / sqrt 2 for one harmonic (ISO 2631-1:1997 6.4.2, Eq. 9 with
        // one band), |W| from FrequencyWeighting.factorAt
        Structure s = structure(5, 0.03);
        Tuning t = new Tuning(0.08, 0.93, 0.15);
        for (double hertz : new double[] {0.7, 2.0, 4.6, 5.0, 9.3, 31.0}) {
            double omega = TWO_PI * hertz;
            Excitation e = new Excitation(ExcitationKind.UNBALANCE, 0.4, FrequencyBand.single(omega));
            for (FrequencyWeighting w : List.of(FrequencyWeighting.WK, FrequencyWeighting.WD)) {
                Reading r = Assessor.of(new HumanComfort(w, ComfortReaction.UNCOMFORTABLE), e).read(s, Optional.of(t));
                double a = new SystemResponse(s, t, e.kind(), e.amplitude()).amplitudeAt(ResponseKind.ACCELERATION,
                        omega);
                assertEquals(w.factorAt(hertz) * a / Math.sqrt(2), r.value(), 1e-12 * r.value(), w + " " + hertz);
                assertEquals(omega, r.worstFrequency(), 0.0);
                assertEquals(ComfortReaction.UNCOMFORTABLE.upper(), r.limit(), 0.0);
            }
        }
    }

    @Test
    void limitCurvesWithFractionalExponentsAreExactPieceByPiece() {
        // a user's curve with slopes -1.16, +0.46 and -0.58 on log-log axes (not integers), and the
        // building and equipment curves (ISO 10137 base curve: f^-1/2 and f^1 pieces)
        LimitCurve curve = new LimitCurve(List.of(new LimitCurve.Point(2, 1.0e-3), new LimitCurve.Point(5, 3.5e-4),
                new LimitCurve.Point(12, 5.0e-4), new LimitCurve.Point(40, 2.5e-4)));
        List<Criterion> criteria = List.of(new UserLimit(ResponseKind.VELOCITY, AmplitudeConvention.RMS, curve),
                new UserLimit(ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK_TO_PEAK, curve.times(0.01)),
                new BuildingVibration(BuildingAxis.VERTICAL, RoomUse.RESIDENTIAL_NIGHT),
                new BuildingVibration(BuildingAxis.HORIZONTAL, RoomUse.WORKSHOP),
                new EquipmentVibration(VibrationCriterionCurve.VC_C));
        Random random = new Random(10137);
        for (int trial = 0; trial < 30; trial++) {
            Case c = Case.random(random, trial % 4 == 0);
            Criterion criterion = criteria.get(trial % criteria.size());
            assertAgrees(criterion, c.structure, c.tuning, c.excitation, 1e-9);
            assertAgrees(criterion, c.structure, null, c.excitation, 1e-9);
            Reading r = Assessor.of(criterion, c.excitation).read(c.structure, Optional.of(c.tuning));
            int governing = r.governingOrder().orElseThrow();
            double hertz = c.excitation.orders().get(governing).frequencyFactor() * r.worstFrequency() / TWO_PI;
            assertEquals(BruteVerdict.limitAt(criterion.limit().points(), hertz), r.limit(), 1e-9 * r.limit());
            assertEquals(hertz < criterion.limit().lowFrequency() || hertz > criterion.limit().highFrequency(),
                    r.outsideRange(), r.toString());
        }
    }

    /** A random invented rotor case: structure, absorber, band, one to three orders far apart. */
    private record Case(Structure structure, Tuning tuning, Excitation excitation) {
        static Case random(Random random, boolean undampedStructure) {
            double hertz = 3 + 25 * random.nextDouble();
            Structure s = AssessorTest.structure(hertz, undampedStructure ? 0 : 0.005 + 0.05 * random.nextDouble());
            Tuning t = new Tuning(0.01 + 0.15 * random.nextDouble(), 0.8 + 0.25 * random.nextDouble(),
                    0.03 + 0.2 * random.nextDouble());
            double omega1 = TWO_PI * hertz;
            double low = omega1 * (0.4 + 1.0 * random.nextDouble());
            double high = random.nextInt(5) == 0 ? low : low * (1 + 0.8 * random.nextDouble());
            ExcitationKind kind = random.nextBoolean() ? ExcitationKind.FORCE : ExcitationKind.UNBALANCE;
            double amplitude = kind == ExcitationKind.FORCE ? 50 + 500 * random.nextDouble() : 0.01 + 0.5 * random.nextDouble();
            int others = random.nextInt(3);
            double[] factors = {0.5, 2.0, 3.0, 4.7};
            List<ExcitationOrder> orders = new ArrayList<>();
            int start = random.nextInt(factors.length);
            for (int i = 0; i < others; i++) {
                double f = factors[(start + i) % factors.length];
                boolean force = random.nextBoolean();
                orders.add(new ExcitationOrder(force ? ExcitationKind.FORCE : ExcitationKind.UNBALANCE,
                        force ? 20 + 300 * random.nextDouble() : 0.01 + 0.3 * random.nextDouble(), f));
            }
            return new Case(s, t, new Excitation(kind, amplitude, new FrequencyBand(low, high)).withOtherOrders(orders));
        }
    }
}
