package org.counterpoise.core.realisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.error.WarningParameter;
import org.junit.jupiter.api.Test;

/**
 * Properties of the spring sizing, each checked against the EN 13906-1:2013 formulas written out
 * again here (not read back from the design): the rate met within the stated deviation, every check
 * passing for a demand that has a design, more load giving more springs or thicker wire, springs that
 * never unload, and bad input named by its field. The demands are invented absorbers: a mass m tuned
 * to a frequency f has k = m (2 pi f)^2, the static load m g when it stands on its springs, and the
 * dynamic load k times the stroke amplitude.
 */
class SpringSizingTest {

    private static final double G_N = 9.80665;

    /** Invented absorbers: mass kg, tuned frequency Hz, stroke amplitude m, seated (true) or horizontal. */
    private static final double[][] ABSORBERS = {
        {5, 12, 1.0e-3, 1}, {20, 25, 0.5e-3, 1}, {80, 8, 2.0e-3, 1}, {200, 15, 1.0e-3, 1}, {1, 40, 0.2e-3, 1},
        {20, 25, 1.0e-3, 0}, {50, 10, 3.0e-3, 0}, {300, 20, 0.5e-3, 0}, {10, 30, 2.0e-3, 1}, {500, 5, 4.0e-3, 1},
    };

    private static SpringDemand absorber(double[] a) {
        double k = a[0] * Math.pow(2 * Math.PI * a[1], 2);
        double staticLoad = a[3] > 0 ? a[0] * G_N : 0;
        double forcing = 1.2 * 2 * Math.PI * a[1];
        return new SpringDemand(k, staticLoad, k * a[2], forcing, 50_000 * 3600 * a[1]);
    }

    private static HardwareChoice choice(SpringMaterial material, int count) {
        return new HardwareChoice(SpringKind.HELICAL_COMPRESSION, material, count, DamperKind.VISCOUS_DASHPOT,
                EddyCurrentChoice.DEFAULT, ElastomerChoice.DEFAULT, 50_000, 0.01, 0.01);
    }

    @Test
    void everyInventedAbsorberGetsSpringsThatPassEveryCheckAndMeetTheRate() {
        for (double[] a : ABSORBERS) {
            for (SpringMaterial material : SpringMaterial.values()) {
                SpringDemand demand = absorber(a);
                SpringDesign s = SpringSizing.size(demand, choice(material, 0));
                String what = Arrays.toString(a) + " " + material;
                assertTrue(s.passes(), what + " " + s.checks());
                assertEquals(5, s.checks().size(), what);
                // total rate = count * G d^4 / (8 D^3 n) (EN 13906-1, 9.4), written out again
                double rate = s.count() * material.shearModulus() * Math.pow(s.wireDiameter(), 4)
                        / (8 * Math.pow(s.meanCoilDiameter(), 3) * s.activeCoils());
                assertEquals(rate, s.totalRate(), 1e-9 * rate, what);
                assertEquals(rate / demand.rate() - 1, s.rateDeviation(), 1e-12, what);
                assertTrue(Math.abs(s.rateDeviation()) <= SpringSizing.RATE_DEVIATION_BOUND, what);
                geometryFollowsTheStandard(s, what);
            }
        }
    }

    private static void geometryFollowsTheStandard(SpringDesign s, String what) {
        double[] stock = s.material().stockDiameters();
        assertTrue(Arrays.stream(stock).anyMatch(d -> d == s.wireDiameter()), what + " wire not in stock");
        assertTrue(s.springIndex() >= 4 && s.springIndex() <= 20, what + " index " + s.springIndex());
        assertTrue(s.activeCoils() >= 2, what);
        assertEquals(0, (s.activeCoils() * 4) % 1, 1e-9, what + " quarter coils");
        assertEquals(s.activeCoils() + 2, s.totalCoils(), 1e-12, what + " closed and ground ends");
        assertEquals(s.totalCoils() * s.wireDiameter(), s.solidLength(), 1e-12, what);
        assertTrue(s.count() >= 1 && s.count() <= HardwareChoice.MOST_SPRINGS, what);
        // installed between the shortest working length (solid plus gaps) and free
        assertTrue(s.installedLength() < s.freeLength() || s.staticLoadPerSpring() == 0, what);
        assertTrue(s.installedLength() > s.solidLength() + s.minimumGapSum(), what);
        // mass rho (pi d^2 / 4)(pi D n_t)
        assertEquals(s.material().density() * Math.PI * Math.PI / 4 * s.wireDiameter() * s.wireDiameter()
                * s.meanCoilDiameter() * s.totalCoils(), s.massPerSpring(), 1e-12, what);
    }

    @Test
    void theChecksStateTheStandardsNumbersForTheChosenSpring() {
        SpringDemand demand = absorber(ABSORBERS[1]);
        SpringDesign s = SpringSizing.size(demand, HardwareChoice.DEFAULT);
        double d = s.wireDiameter();
        double meanD = s.meanCoilDiameter();
        double w = meanD / d;
        double k = (w + 0.5) / (w - 0.75);
        double largest = s.staticLoadPerSpring() + s.dynamicLoadPerSpring();
        DesignCheck stress = s.checks().get(0);
        assertEquals(CheckKind.SPRING_STATIC_STRESS, stress.kind());
        // tau_k = k 8 D F / (pi d^3) at the largest load, or tau at solid length, whichever is larger
        double atLargest = k * 8 * meanD * largest / (Math.PI * d * d * d);
        double atSolid = 8 * meanD * s.ratePerSpring() * (s.freeLength() - s.solidLength()) / (Math.PI * d * d * d);
        assertEquals(Math.max(atLargest, atSolid), stress.demand(), 1e-6 * stress.demand());
        assertEquals(0.56 * s.material().minimumTensileStrength(d), stress.capacity(), 1e-3);
        assertTrue(stress.source().contains("EN 13906-1:2013"));
        DesignCheck surge = s.checks().get(3);
        assertEquals(CheckKind.SPRING_SURGE, surge.kind());
        assertEquals(3 * demand.forcingFrequency(), surge.demand(), 1e-9);
        assertEquals(d / (s.activeCoils() * meanD * meanD) * Math.sqrt(s.material().shearModulus()
                / (2 * s.material().density())), surge.capacity(), 1e-9 * surge.capacity());
        DesignCheck solid = s.checks().get(4);
        assertEquals(largest / s.ratePerSpring(), solid.demand(), 1e-12);
        assertEquals(s.freeLength() - s.solidLength() - s.minimumGapSum(), solid.capacity(), 1e-12);
    }

    @Test
    void moreLoadGivesMoreSpringsOrThickerWire() {
        for (double[] a : ABSORBERS) {
            SpringDemand base = absorber(a);
            SpringDesign before = SpringSizing.size(base, HardwareChoice.DEFAULT);
            for (double factor : new double[] {1.5, 2.5, 4}) {
                SpringDemand heavier = new SpringDemand(base.rate(), factor * base.staticLoad(),
                        factor * base.dynamicLoad(), base.forcingFrequency(), base.serviceCycles());
                SpringDesign after = SpringSizing.size(heavier, HardwareChoice.DEFAULT);
                assertTrue(after.count() > before.count()
                        || after.count() == before.count() && after.wireDiameter() >= before.wireDiameter(),
                        Arrays.toString(a) + " x" + factor + ": " + before.count() + " of " + before.wireDiameter()
                                + " then " + after.count() + " of " + after.wireDiameter());
            }
        }
    }

    @Test
    void aHorizontalAbsorberGetsOpposedPreloadedPairsThatNeverUnload() {
        for (double[] a : ABSORBERS) {
            SpringDemand demand = absorber(a);
            SpringDesign s = SpringSizing.size(demand, HardwareChoice.DEFAULT);
            double staticShare = demand.staticLoad() / s.count();
            double amplitude = demand.dynamicLoad() / s.count();
            // opposed pairs unless the weight exceeds the amplitude by the reserve
            if (demand.staticLoad() < (1 + SpringSizing.PRELOAD_RESERVE) * demand.dynamicLoad()) {
                assertEquals(SpringArrangement.OPPOSED_PRELOADED_PAIRS, s.arrangement(), Arrays.toString(a));
                assertEquals(0, s.count() % 2, Arrays.toString(a));
                // the spring on the unloaded side: preload - static share - amplitude, kept above zero
                double least = s.preloadPerSpring() - staticShare - amplitude;
                assertEquals(SpringSizing.PRELOAD_RESERVE * amplitude, least, 1e-9 * s.preloadPerSpring());
                assertEquals(s.preloadPerSpring() + staticShare, s.staticLoadPerSpring(), 1e-9);
            } else {
                assertEquals(SpringArrangement.SEATED, s.arrangement(), Arrays.toString(a));
                assertEquals(0, s.preloadPerSpring());
                assertTrue(s.staticLoadPerSpring() - s.dynamicLoadPerSpring()
                        >= SpringSizing.PRELOAD_RESERVE * s.dynamicLoadPerSpring(), Arrays.toString(a));
            }
        }
    }

    @Test
    void aChosenCountIsKept() {
        SpringDemand demand = absorber(ABSORBERS[3]);
        for (int count : new int[] {2, 4, 8}) {
            assertEquals(count, SpringSizing.size(demand, choice(SpringMaterial.EN10270_1_DH, count)).count());
        }
    }

    @Test
    void aSpringThatCannotPassIsReturnedWithItsFailuresAsWarnings() {
        // one pair of springs for 500 kg at 5 Hz swinging 40 mm: far beyond two 20 mm wire springs
        SpringDemand demand = absorber(new double[] {500, 5, 40e-3, 1});
        SpringDesign s = SpringSizing.size(demand, choice(SpringMaterial.EN10270_1_DH, 2));
        assertFalse(s.passes());
        List<Warning> warnings = SpringChecks.warnings(s);
        assertEquals(s.checks().stream().filter(c -> !c.passes()).count(), warnings.size());
        for (Warning w : warnings) {
            assertTrue(List.of(WarningKind.SPRING_OVERSTRESSED, WarningKind.SPRING_FATIGUE, WarningKind.SPRING_BUCKLES,
                    WarningKind.SPRING_SURGE, WarningKind.SPRING_GOES_SOLID).contains(w.kind()));
        }
        for (DesignCheck c : s.checks()) {
            assertTrue(Double.isFinite(c.utilisation()) && c.capacity() > 0 && c.demand() >= 0, c.toString());
        }
        assertTrue(SpringChecks.warnings(SpringSizing.size(absorber(ABSORBERS[0]), HardwareChoice.DEFAULT))
                .isEmpty());
    }

    @Test
    void aRateBeyondStockWireGivesTheClosestSpringsAndSaysSo() {
        // 5e7 N/m: eight springs of 20 mm wire at w = 4 and n = 2 give at most
        // 8 * G d / (8 n w^3) = 8 * 81.5e9 * 0.02 / (8 * 2 * 64) = 8 * 1.5918e6 = 1.2734e7 N/m
        SpringDesign stiff = SpringSizing.size(new SpringDemand(5e7, 3e4, 1e3, 200, 1e9), HardwareChoice.DEFAULT);
        assertEquals(8, stiff.count());
        assertEquals(20e-3, stiff.wireDiameter(), 1e-15);
        assertEquals(1.2734e7, stiff.totalRate(), 0.0001e7);
        assertEquals(1.2734e7 / 5e7 - 1, stiff.rateDeviation(), 1e-4);
        Warning first = SpringChecks.warnings(stiff).get(0);
        assertEquals(WarningKind.SPRING_RATE_NOT_MET, first.kind());
        // 5 N/m on one spring: 0.5 mm wire at w = 20 and n = 60 gives G d / (8 n w^3)
        // = 81.5e9 * 5e-4 / (8 * 60 * 8000) = 10.61 N/m at the softest
        SpringDesign soft = SpringSizing.size(new SpringDemand(5, 1, 0.1, 10, 1e6), HardwareChoice.DEFAULT);
        assertEquals(1, soft.count());
        assertEquals(10.61, soft.totalRate(), 0.01);
        assertEquals(WarningKind.SPRING_RATE_NOT_MET, SpringChecks.warnings(soft).get(0).kind());
    }

    @Test
    void badInputIsNamedByItsField() {
        assertField("spring.rate", () -> new SpringDemand(-1, 10, 1, 100, 1e9));
        assertField("spring.rate", () -> new SpringDemand(Double.NaN, 10, 1, 100, 1e9));
        assertField("spring.static_load", () -> new SpringDemand(1e5, -10, 1, 100, 1e9));
        assertField("spring.dynamic_load", () -> new SpringDemand(1e5, 10, Double.POSITIVE_INFINITY, 100, 1e9));
        assertField("spring.forcing_frequency", () -> new SpringDemand(1e5, 10, 1, 0, 1e9));
        assertField("spring.service_cycles", () -> new SpringDemand(1e5, 10, 1, 100, -1));
    }

    @Test
    void anOddCountForOpposedPairsIsSizedAsTheNextEvenOneAndSaysSo() {
        // no static load: the springs stand in opposed preloaded pairs (common practice: a spring
        // that unloads in each cycle rattles and wears its seats), so 3 asked becomes 4 sized
        SpringDemand horizontal = new SpringDemand(1e5, 0, 100, 100, 1e9);
        HardwareChoice three = choice(SpringMaterial.EN10270_1_DH, 3);
        SpringDesign s = SpringSizing.size(horizontal, three);
        assertEquals(4, s.count());
        assertEquals(SpringArrangement.OPPOSED_PRELOADED_PAIRS, SpringSizing.arrangementFor(horizontal));
        Warning first = SpringChecks.warnings(s, three).get(0);
        assertEquals(WarningKind.SPRING_COUNT_MADE_EVEN, first.kind());
        assertEquals(4.0, first.number(WarningParameter.SPRING_COUNT));
        // an even count asked for, or the automatic choice, is used as it is and draws no such warning
        SpringDesign four = SpringSizing.size(horizontal, choice(SpringMaterial.EN10270_1_DH, 4));
        assertEquals(4, four.count());
        assertTrue(SpringChecks.warnings(four, choice(SpringMaterial.EN10270_1_DH, 4)).stream()
                .noneMatch(w -> w.kind() == WarningKind.SPRING_COUNT_MADE_EVEN));
        // a seated absorber (weight well above the dynamic force) keeps an odd count of 3
        SpringDesign seated = SpringSizing.size(new SpringDemand(1e5, 1000, 100, 100, 1e9), three);
        assertEquals(3, seated.count());
    }

    private static void assertField(String field, Runnable r) {
        InvalidInputException e = assertThrows(InvalidInputException.class, r::run);
        assertEquals(field, e.field());
        assertFalse(e.getMessage().contains("NaN") || e.getMessage().contains("Infinity"), e.getMessage());
    }
}
