package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.BalanceGrade;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.SpectralDensityUnit;
import org.counterpoise.core.units.Unit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The rotor's other harmonic orders, the order the design is for and an unbalance from its balance
 * grade in project files of format 3, and their mapping to the core's excitation.
 */
class OrdersFileTest {
    private static final double RPM = 2 * Math.PI / 60;
    /** An invented scenario (not measured data): 1x unbalance designed for, 6x blade-pass force beside it. */
    private static final String BASE = """
            {"format_version": 3, "name": "invented orders scenario",
             "structure": {"mass": {"value": 1000, "unit": "kg"}, "natural_frequency": {"value": 10, "unit": "Hz"},
                           "damping": {"ratio": 0.02}},
             "disturbance": {"kind": "unbalance", "amplitude": {"value": 500, "unit": "g*mm"},
                             "band": {"low": 560, "high": 640, "unit": "rpm"},
                             "run_up_rate": {"value": 20, "unit": "rpm/s"},
                             "orders": [{"harmonic_order": 6, "kind": "force", "amplitude": {"value": 20, "unit": "N"}}],
                             "design_order": 1},
             "absorber": {"mass_ratio": 0.05, "method": "exact-peak", "response": "displacement"}}
            """;
    private static final Path BLOWER = Path.of("presets", "blower-frame-single-speed.json");

    private static Project read(String text) {
        LoadedProject loaded = ProjectReader.read(new StringReader(text));
        assertEquals(List.of(), loaded.unknownFields());
        return loaded.project();
    }

    private static Project roundTrip(Project p) {
        return ProjectReader.read(new StringReader(ProjectWriter.toJson(p))).project();
    }

    @Test
    void theDesignOrderIsTheExcitationAndTheOthersAreMultiplesOfItsFrequency() {
        Project p = read(BASE);
        assertEquals(List.of(OrderInput.of(6, ExcitationKind.FORCE, new QuantityInput(20, Unit.NEWTON))),
                p.disturbance().orders());
        assertEquals(OptionalDouble.of(1), p.disturbance().designOrder());
        Excitation e = p.toStudy().excitation();
        assertEquals(ExcitationKind.UNBALANCE, e.kind());
        assertEquals(500e-6, e.amplitude(), 1e-18);
        assertEquals(560 * RPM, e.band().low(), 1e-12);
        assertEquals(640 * RPM, e.band().high(), 1e-12);
        assertEquals(List.of(new ExcitationOrder(ExcitationKind.FORCE, 20, 6.0)), e.otherOrders());
        assertEquals(20 * RPM, e.runUpRate().getAsDouble(), 1e-12);
        assertEquals(p, roundTrip(p));

        // designed for the blade-pass order instead: its band is the shaft's times 6, the unbalance
        // acts at 1/6 of that frequency, and the run-up rate is the forcing frequency's (x 6)
        Excitation six = read(BASE.replace("\"design_order\": 1", "\"design_order\": 6")).toStudy().excitation();
        assertEquals(ExcitationKind.FORCE, six.kind());
        assertEquals(20, six.amplitude(), 0);
        assertEquals(6 * 560 * RPM, six.band().low(), 1e-9);
        assertEquals(6 * 640 * RPM, six.band().high(), 1e-9);
        assertEquals(List.of(new ExcitationOrder(ExcitationKind.UNBALANCE, 500e-6, 1.0 / 6)), six.otherOrders());
        assertEquals(6 * 20 * RPM, six.runUpRate().getAsDouble(), 1e-12);
    }

    @Test
    void whicheverOrderIsDesignedForTheRotorExcitesTheSameFrequenciesWithTheSameAmplitudes() {
        // Invariant: the pick (1, 6 or governing) moves the reference, never the forcing itself.
        Set<List<Double>> picked1 = absolute(read(BASE).toStudy().excitation());
        Set<List<Double>> picked6 = absolute(read(BASE.replace("\"design_order\": 1", "\"design_order\": 6"))
                .toStudy().excitation());
        Project governing = read(BASE.replace(",\n                 \"design_order\": 1", "")
                .replace("\"design_order\": 1", ""));
        assertEquals(OptionalDouble.empty(), governing.disturbance().designOrder(), "absent means governing");
        Set<List<Double>> picked = absolute(governing.toStudy().excitation());
        assertEquals(picked1, picked6);
        assertEquals(picked1, picked);
        assertEquals(governing, roundTrip(governing));
        assertTrue(ProjectWriter.toJson(governing).contains("\"design_order\": \"governing\""));
    }

    @Test
    void theGoverningOrderIsTheOneFarthestOverTheCriterionUntreated() {
        // Independent route, by hand (single-mode receptance X = F / k / |1 - r^2 + 2 i zeta r|, k =
        // m omega1^2 = 1000 (2 pi 10)^2 = 3.948e6 N/m, zeta 0.02):
        // 1x unbalance 500 g*mm over 9.33-10.67 Hz passes the 10 Hz resonance: F = m e Omega^2 =
        // 500e-6 (2 pi 10)^2 = 1.97 N, X = 1.97 / 3.948e6 / 0.04 = 12.5 um.
        // 6x force 20 N over 56-64 Hz (r = 5.6 to 6.4): X <= 20 / 3.948e6 / (5.6^2 - 1) = 0.17 um,
        // so the 1x order governs; a 6x force of 200 kN gives 1700 um and governs instead.
        String governing = BASE.replace(",\n                 \"design_order\": 1", "")
                .replace("\"response\": \"displacement\"}}", "\"response\": \"displacement\"},"
                        + " \"acceptance\": {\"criterion\": \"user-limit\", \"quantity\": \"displacement\","
                        + " \"convention\": \"peak\", \"limit\": {\"value\": 5, \"unit\": \"um\"}}}");
        assertFalse(governing.contains("design_order"), governing);
        Excitation small = read(governing).toStudy().excitation();
        assertEquals(ExcitationKind.UNBALANCE, small.kind(), "the 1x unbalance governs");
        assertEquals(6.0, small.otherOrders().get(0).frequencyFactor(), 0);
        Excitation large = read(governing.replace("\"value\": 20, \"unit\": \"N\"", "\"value\": 200, \"unit\": \"kN\""))
                .toStudy().excitation();
        assertEquals(ExcitationKind.FORCE, large.kind(), "the 6x force governs");
        assertEquals(6 * 560 * RPM, large.band().low(), 1e-9);
        assertEquals(List.of(new ExcitationOrder(ExcitationKind.UNBALANCE, 500e-6, 1.0 / 6)), large.otherOrders());
    }

    /** Each order as (kind, amplitude, lowest forcing frequency rad/s), rounded to 1e-9 relative. */
    private static Set<List<Double>> absolute(Excitation e) {
        Set<List<Double>> out = new HashSet<>();
        for (ExcitationOrder o : e.orders()) {
            double low = e.band().low() * o.frequencyFactor();
            out.add(List.of((double) o.kind().ordinal(), o.amplitude(), Math.rint(low * 1e6) / 1e6));
        }
        return out;
    }

    @Test
    void anUnbalanceFromItsBalanceGradeIsTheIsoPermissibleUnbalance() {
        // the blower preset: the 1x order is an unbalance of grade G 6.3, a 45 kg rotor, 1450 rpm at most;
        // U_per = G m / Omega_max (ISO 21940-11, BalanceGradeTest) = 6.3e-3 x 45 / 151.84 = 1.867e-3 kg*m
        Project p = ProjectReader.read(BLOWER).project();
        Excitation e = p.toStudy().excitation();
        assertEquals(ExcitationKind.FORCE, e.kind(), "the design order is the 4x lobe force");
        assertEquals(1450 * RPM * 4, e.band().low(), 1e-9);
        assertEquals(1, e.otherOrders().size());
        ExcitationOrder unbalance = e.otherOrders().get(0);
        assertEquals(ExcitationKind.UNBALANCE, unbalance.kind());
        assertEquals(0.25, unbalance.frequencyFactor(), 0);
        assertEquals(6.3e-3 * 45 / (1450 * RPM), unbalance.amplitude(), 1e-15);
        assertEquals(1.867e-3, unbalance.amplitude(), 1e-6);
        assertEquals(p, roundTrip(p));

        // the same on the disturbance itself, instead of its amplitude
        String graded = BASE.replace("\"amplitude\": {\"value\": 500, \"unit\": \"g*mm\"}", "\"balance_grade\": {"
                + "\"grade\": {\"value\": 2.5, \"unit\": \"mm/s\"}, \"rotor_mass\": {\"value\": 120, \"unit\": \"kg\"},"
                + " \"max_speed\": {\"value\": 3000, \"unit\": \"rpm\"}}");
        Project q = read(graded);
        assertEquals(null, q.disturbance().amplitude());
        assertEquals(new BalanceGrade(2.5e-3, 120, 3000 * RPM).permissibleUnbalance(),
                q.toStudy().excitation().amplitude(), 1e-18);
        assertEquals(q, roundTrip(q));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"design_order\": 1|\"design_order\": 2|disturbance.design_order: 2 is not allowed; \"governing\" or the harmonic order of one of the orders: 1, 6",
        "\"design_order\": 1|\"design_order\": \"largest\"|disturbance.design_order: \"largest\" is not allowed; \"governing\" or the harmonic order of one of the orders (a number)",
        "\"design_order\": 1|\"design_order\": true|disturbance.design_order: true is not allowed; must be a number",
        "\"harmonic_order\": 6|\"harmonic_order\": 1|disturbance.orders[0].harmonic_order: 1 is not allowed; each harmonic order once (it is also disturbance.harmonic_order); orders at the same frequency are one order: give their combined amplitude",
        "\"harmonic_order\": 6|\"harmonic_order\": -6|disturbance.orders[0].harmonic_order: -6 is not allowed; must be a finite number greater than 0",
        "\"kind\": \"force\"|\"kind\": \"wind\"|disturbance.orders[0].kind: \"wind\" is not allowed; one of force, unbalance, base-displacement, base-acceleration",
        "\"kind\": \"force\", \"amplitude\": {\"value\": 20, \"unit\": \"N\"}|\"kind\": \"force\"|disturbance.orders[0].amplitude: missing; expected an object { ... }",
        "\"kind\": \"force\", \"amplitude\": {\"value\": 20, \"unit\": \"N\"}|\"kind\": \"force\", \"balance_grade\": {}|disturbance.orders[0].balance_grade: given with kind \"force\" is not allowed; a balance grade gives an unbalance: use it with kind unbalance, or give disturbance.orders[0].amplitude",
        "\"kind\": \"force\"|\"kind\": \"unbalance\"|disturbance.orders[0].amplitude.unit: \"N\" is not allowed; allowed units: kg*m, g*mm, oz*in",
        "\"orders\": [|\"orders\": [3, |disturbance.orders[0]: 3 is not allowed; must be an object { ... }",
        "\"value\": 500, \"unit\": \"g*mm\"}|\"value\": 500, \"unit\": \"g*mm\"}, \"balance_grade\": {}|disturbance.balance_grade: given with disturbance.amplitude is not allowed; give either the unbalance (amplitude) or the balance grade it comes from, not both",
        "\"amplitude\": {\"value\": 500, \"unit\": \"g*mm\"}|\"balance_grade\": {\"grade\": {\"value\": 0, \"unit\": \"mm/s\"}, \"rotor_mass\": {\"value\": 40, \"unit\": \"kg\"}, \"max_speed\": {\"value\": 600, \"unit\": \"rpm\"}}|disturbance.balance_grade.grade.value: 0 mm/s is not allowed; must be a finite number greater than 0",
        "\"amplitude\": {\"value\": 500, \"unit\": \"g*mm\"}|\"balance_grade\": {\"grade\": {\"value\": 6.3, \"unit\": \"mm/s\"}, \"max_speed\": {\"value\": 600, \"unit\": \"rpm\"}}|disturbance.balance_grade.rotor_mass: missing; expected an object { ... }",
        "\"amplitude\": {\"value\": 500, \"unit\": \"g*mm\"}|\"balance_grade\": {\"grade\": {\"value\": 6.3, \"unit\": \"mm/s\"}, \"rotor_mass\": {\"value\": 40, \"unit\": \"kg\"}, \"max_speed\": {\"value\": 600, \"unit\": \"mm\"}}|disturbance.balance_grade.max_speed.unit: \"mm\" is not allowed; allowed units: rad/s, Hz, rpm",
        "\"kind\": \"unbalance\", \"amplitude\": {\"value\": 500, \"unit\": \"g*mm\"}|\"kind\": \"force\", \"balance_grade\": {}|disturbance.balance_grade: given with kind \"force\" is not allowed; a balance grade gives an unbalance: use it with kind unbalance, or give disturbance.amplitude",
        "\"mass_ratio\": 0.05|\"meet_acceptance\": true|acceptance: missing; absorber.meet_acceptance needs a criterion to meet: give the acceptance object",
    })
    void badOrdersAreRefusedNamingTheFieldWhatIsWrongAndWhatIsAllowed(String from, String to, String message) {
        String text = BASE.replaceFirst(Pattern.quote(from), Matcher.quoteReplacement(to));
        assertFalse(text.equals(BASE), "the case changes the file");
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> read(text).toStudy());
        assertEquals(message, e.getMessage());
    }

    @Test
    void ordersBuiltInMemoryAreCheckedAsTheFileIs() {
        Project p = read(BASE);
        DisturbanceInput twice = p.disturbance().withOrders(List.of(OrderInput.of(6, ExcitationKind.FORCE,
                new QuantityInput(20, Unit.NEWTON)), OrderInput.of(6, ExcitationKind.FORCE,
                new QuantityInput(5, Unit.NEWTON))), OptionalDouble.empty());
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> p.withDisturbance(twice).toStudy());
        assertEquals("disturbance.orders[1].harmonic_order", e.field());
        DisturbanceInput noise = p.disturbance().withSpectrum(SpectrumInput.whiteNoise(1,
                SpectralDensityUnit.bySymbol("N^2/Hz", Dimension.FORCE).orElseThrow()));
        e = assertThrows(InvalidInputException.class, () -> p.withDisturbance(noise).toExcitation());
        assertEquals("disturbance.orders", e.field());
        assertTrue(e.getMessage().contains("several orders are harmonic"), e.getMessage());
    }
}
