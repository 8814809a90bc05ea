package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.counterpoise.core.criteria.Acceptance;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.BuildingAxis;
import org.counterpoise.core.criteria.BuildingVibration;
import org.counterpoise.core.criteria.ComfortReaction;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.EquipmentVibration;
import org.counterpoise.core.criteria.FrequencyWeighting;
import org.counterpoise.core.criteria.HumanComfort;
import org.counterpoise.core.criteria.LimitCurve;
import org.counterpoise.core.criteria.MachineClass;
import org.counterpoise.core.criteria.MachineSeverity;
import org.counterpoise.core.criteria.Reading;
import org.counterpoise.core.criteria.RoomUse;
import org.counterpoise.core.criteria.SeverityZone;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.criteria.VibrationCriterionCurve;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.export.RobustnessJson;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The verdict in the text report, the design JSON's {@code acceptance} object and the tables: from
 * hand-made verdicts (values chosen here, so every figure is known) and from real designs (the
 * verdict engine's values, with the r.m.s. of a harmonic checked as peak / sqrt 2, its
 * definition). Scenarios invented.
 */
class AcceptanceReportTest {
    private static final MachineSeverity MACHINE = new MachineSeverity(MachineClass.GROUP_2_RIGID, SeverityZone.B);
    private static final double HZ = 2 * Math.PI;

    /** A machine verdict: 3.6 mm/s in zone C before, 1.2 mm/s in zone A after, against 2.8 mm/s. */
    private static Acceptance machineVerdict() {
        return new Acceptance(MACHINE, new Reading(3.6e-3, 2.8e-3, 24 * HZ, OptionalInt.empty(), List.of("C"), false),
                new Reading(1.2e-3, 2.8e-3, 25 * HZ, OptionalInt.empty(), List.of("A"), false));
    }

    private static ReportContent designWith(Optional<Acceptance> a) {
        DesignResult r = Designer.design(Presets.load(Presets.names().get(0)).project().toStudy());
        return AcceptanceContent.with(DesignContent.of(r), a);
    }

    @Test
    void theAcceptanceObjectHoldsTheVerdictUnderItsKeys() {
        JsonObject a = ResultJson.of(designWith(Optional.of(machineVerdict()))).getAsJsonObject("acceptance");
        Set<String> expected = new TreeSet<>(List.of("absorber_needed", "criterion", "criterion_text", "source",
                "quantity", "convention", "unit", "weighting", "limit_before", "limit_after", "value_before",
                "value_after", "passes_before", "passes_after", "margin_ratio_before", "margin_ratio_after",
                "margin_dB_before", "margin_dB_after", "worst_forcing_frequency_before_Hz",
                "worst_forcing_frequency_after_Hz", "governing_order_before", "governing_order_after", "zones_before",
                "zones_after", "outside_range_before", "outside_range_after", "unbounded_reason"));
        assertEquals(expected, new TreeSet<>(a.keySet()));
        assertTrue(a.get("absorber_needed").getAsBoolean());
        assertEquals("machine", a.get("criterion").getAsString());
        assertEquals("velocity", a.get("quantity").getAsString());
        assertEquals("rms", a.get("convention").getAsString());
        assertEquals("m/s", a.get("unit").getAsString());
        assertTrue(a.get("weighting").isJsonNull());
        assertEquals(2.8e-3, a.get("limit_after").getAsDouble(), 0.0);
        assertEquals(3.6e-3, a.get("value_before").getAsDouble(), 0.0);
        assertEquals(1.2e-3, a.get("value_after").getAsDouble(), 0.0);
        assertFalse(a.get("passes_before").getAsBoolean());
        assertTrue(a.get("passes_after").getAsBoolean());
        // margin = limit / value and 20 log10 of it (the definition of a level difference in dB)
        assertEquals(2.8 / 1.2, a.get("margin_ratio_after").getAsDouble(), 1e-12);
        assertEquals(20 * Math.log10(2.8 / 1.2), a.get("margin_dB_after").getAsDouble(), 1e-12);
        assertEquals(20 * Math.log10(2.8 / 3.6), a.get("margin_dB_before").getAsDouble(), 1e-12);
        assertEquals(24.0, a.get("worst_forcing_frequency_before_Hz").getAsDouble(), 1e-12);
        assertEquals("C", a.getAsJsonArray("zones_before").get(0).getAsString());
        assertEquals("A", a.getAsJsonArray("zones_after").get(0).getAsString());
        assertTrue(a.get("governing_order_after").isJsonNull(), "the orders are judged together");
        assertTrue(a.get("outside_range_after").isJsonNull(), "a flat limit has no range to leave");
        assertTrue(a.get("unbounded_reason").isJsonNull());
    }

    @Test
    void withoutACriterionTheAcceptanceIsNull() {
        JsonObject o = ResultJson.of(designWith(Optional.empty()));
        assertTrue(o.has("acceptance") && o.get("acceptance").isJsonNull());
        assertTrue(DesignContent.of(Designer.design(Presets.load(Presets.names().get(0)).project().toStudy()))
                .section(SectionId.ACCEPTANCE).isEmpty());
    }

    @Test
    void aStructureThatAlreadyPassesSaysFirstThatNoAbsorberIsNeeded() {
        Acceptance passes = new Acceptance(MACHINE, new Reading(2.0e-3, 2.8e-3, 24 * HZ, OptionalInt.empty(),
                List.of("B"), false), new Reading(0.9e-3, 2.8e-3, 25 * HZ, OptionalInt.empty(), List.of("A"), false));
        ReportContent c = designWith(Optional.of(passes));
        assertEquals(SectionId.ACCEPTANCE, c.sections().get(0).id(), "the verdict comes first");
        String text = DesignReport.render(c);
        int verdict = text.indexOf("no: the structure already meets the criterion without an absorber");
        assertTrue(verdict > 0, text);
        assertTrue(verdict < text.indexOf("Structure (effective values"), "said before anything else");
        assertTrue(text.contains("Acceptance: no absorber is needed"));
        assertFalse(ResultJson.of(c).getAsJsonObject("acceptance").get("absorber_needed").getAsBoolean());
    }

    @Test
    void theTextReportSaysTheVerdictInWords() {
        String text = DesignReport.render(designWith(Optional.of(machineVerdict())));
        assertTrue(text.contains("machine vibration severity (ISO 20816-3): group 2 (15 to 300 kW), rigid support,"
                + " zone B accepted (unrestricted long-term operation)"), text);
        assertTrue(text.contains("ISO 10816-3:2009 Table A.2"), "the source: " + text);
        String limit = line(text, "limit (r.m.s.)");
        assertTrue(limit.contains("2.800 mm/s"), limit);
        String value = line(text, "value (r.m.s.)");
        assertTrue(value.contains("3.600 mm/s") && value.contains("1.200 mm/s"), value);
        String verdict = line(text, "verdict");
        assertTrue(verdict.contains("fails") && verdict.indexOf("fails") < verdict.indexOf("passes"), verdict);
        String margin = line(text, "margin, limit / value");
        assertTrue(margin.contains("x2.33 (+7.36 dB)"), margin);
        String worst = line(text, "worst at forcing frequency");
        assertTrue(worst.contains("24.00 Hz (1440 rpm)"), worst);
        String zone = line(text, "zone");
        assertTrue(zone.contains("C (unsatisfactory for long-term operation)") && zone.contains("A (newly commissioned)"),
                zone);
    }

    private static String line(String text, String label) {
        return text.lines().filter(l -> l.strip().startsWith(label)).findFirst()
                .orElseThrow(() -> new AssertionError("no line " + label + " in\n" + text));
    }

    @Test
    void anUnboundedValueIsNullWithItsReasonNeverInfinity() {
        Acceptance unbounded = new Acceptance(MACHINE, new Reading(Double.POSITIVE_INFINITY, 2.8e-3, 24 * HZ,
                OptionalInt.empty(), List.of("D"), false), new Reading(1.2e-3, 2.8e-3, 25 * HZ, OptionalInt.empty(),
                List.of("A"), false));
        ReportContent c = designWith(Optional.of(unbounded));
        JsonObject a = ResultJson.of(c).getAsJsonObject("acceptance");
        assertTrue(a.get("value_before").isJsonNull());
        assertTrue(a.get("value_before_unbounded").getAsBoolean());
        assertTrue(a.get("margin_dB_before").isJsonNull());
        assertEquals(0.0, a.get("margin_ratio_before").getAsDouble(), 0.0);
        assertTrue(a.get("unbounded_reason").getAsString().contains("undamped"));
        String text = DesignReport.render(c);
        assertTrue(line(text, "margin, limit / value").contains("none (the value is unbounded)"));
        assertNoNonFinite(text + ResultJson.toJson(c));
    }

    @Test
    void everyFamilyOfCriteriaIsPutInWords() {
        assertEquals("limit stated by the user: r.m.s. structure velocity at most 2.000 mm/s",
                CriterionText.of(new UserLimit(ResponseKind.VELOCITY, AmplitudeConvention.RMS, LimitCurve.flat(2e-3))));
        assertTrue(CriterionText.of(new UserLimit(ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK_TO_PEAK,
                new LimitCurve(List.of(new LimitCurve.Point(5, 1e-4), new LimitCurve.Point(50, 1e-5)))))
                .contains("peak-to-peak structure displacement under a curve of 2 points from 5.000 to 50.00 Hz"));
        assertEquals("human comfort (ISO 2631-1): weighted r.m.s. acceleration, Wk (vertical), up to \"a little"
                + " uncomfortable\" accepted", CriterionText.of(new HumanComfort(FrequencyWeighting.WK,
                        ComfortReaction.A_LITTLE_UNCOMFORTABLE)));
        assertEquals("people in buildings (ISO 10137): vertical base curve times 1.4 (residential night)",
                CriterionText.of(new BuildingVibration(BuildingAxis.VERTICAL, RoomUse.RESIDENTIAL_NIGHT)));
        assertEquals("machine vibration severity (ISO 20816-3): group 1 (above 300 kW), flexible support, zone A"
                + " accepted (newly commissioned)", CriterionText.of(new MachineSeverity(MachineClass.GROUP_1_FLEXIBLE,
                        SeverityZone.A)));
        assertEquals("sensitive equipment (vibration criterion curves): VC-C curve, 0.01250 mm/s r.m.s. in"
                + " one-third-octave bands", CriterionText.of(new EquipmentVibration(VibrationCriterionCurve.VC_C)));
        assertEquals("r.m.s. structure acceleration, weighted Wd, the orders combined", CriterionText.measure(
                new HumanComfort(FrequencyWeighting.WD, ComfortReaction.UNCOMFORTABLE)));
        // the values from memory say so wherever their source is shown (reference/acceptance-criteria.md tags)
        for (Criterion c : List.of(new BuildingVibration(BuildingAxis.HORIZONTAL, RoomUse.WORKSHOP),
                new EquipmentVibration(VibrationCriterionCurve.VC_E), new HumanComfort(FrequencyWeighting.WK,
                        ComfortReaction.UNCOMFORTABLE))) {
            assertTrue(CriterionText.source(c).contains("verify before use as a hard limit"), CriterionText.source(c));
        }
        assertEquals("stated by the user", CriterionText.source(new UserLimit(ResponseKind.VELOCITY,
                AmplitudeConvention.RMS, LimitCurve.flat(2e-3))));
        assertEquals("a little uncomfortable; fairly uncomfortable", CriterionText.zones(new HumanComfort(
                FrequencyWeighting.WK, ComfortReaction.UNCOMFORTABLE), List.of("a-little-uncomfortable",
                        "fairly-uncomfortable")));
    }

    /** An invented floor with a fan on it. */
    private static DesignStudy floor(Criterion c) {
        Structure floor = Structure.of(2000, 2000 * Math.pow(2 * Math.PI * 12, 2), 0.015);
        Excitation fan = new Excitation(ExcitationKind.UNBALANCE, 0.05, new FrequencyBand(2 * Math.PI * 10,
                2 * Math.PI * 14));
        return new DesignStudy("verdict", floor, fan, ResponseKind.VELOCITY, AbsorberSizing.ofMassRatio(0.05),
                DesignMethod.EXACT_PEAK, false, 1.5).withCriterion(Optional.of(c));
    }

    @Test
    void aRealDesignWritesTheEngineVerdictAndItsRmsIsThePeakOverRootTwo() {
        UserLimit limit = new UserLimit(ResponseKind.VELOCITY, AmplitudeConvention.RMS, LimitCurve.flat(2e-3));
        DesignResult r = Designer.design(floor(limit));
        JsonObject o = ResultJson.of(DesignContent.of(r));
        JsonObject a = o.getAsJsonObject("acceptance");
        Acceptance v = r.acceptance().orElseThrow();
        assertEquals(v.after().value(), a.get("value_after").getAsDouble(), 0.0);
        assertEquals(v.before().value(), a.get("value_before").getAsDouble(), 0.0);
        assertEquals(v.after().passes(), a.get("passes_after").getAsBoolean());
        // the r.m.s. of one harmonic is its peak over sqrt 2 (definition), against the peak key of the same JSON
        double peak = o.get("peak_velocity_after_m_per_s").getAsDouble();
        assertEquals(peak / Math.sqrt(2), a.get("value_after").getAsDouble(), 1e-12 * peak);
        assertEquals("user-limit", a.get("criterion").getAsString());
        assertEquals(SectionId.ACCEPTANCE, DesignContent.of(r).sections().get(0).id());
    }

    static Stream<Criterion> criteria() {
        return Stream.of(new UserLimit(ResponseKind.DISPLACEMENT, AmplitudeConvention.PEAK_TO_PEAK,
                        LimitCurve.flat(5e-5)),
                new UserLimit(ResponseKind.VELOCITY, AmplitudeConvention.RMS, new LimitCurve(List.of(
                        new LimitCurve.Point(5, 4e-3), new LimitCurve.Point(40, 1e-3)))),
                new HumanComfort(FrequencyWeighting.WK, ComfortReaction.NOT_UNCOMFORTABLE),
                new BuildingVibration(BuildingAxis.VERTICAL, RoomUse.GENERAL_OFFICE),
                new MachineSeverity(MachineClass.GROUP_1_FLEXIBLE, SeverityZone.B),
                new EquipmentVibration(VibrationCriterionCurve.VC_A));
    }

    @ParameterizedTest
    @MethodSource("criteria")
    void noOutputEverShowsNanOrInfinityForAnyPresetCriterionOrConvention(Criterion c) {
        List<String> outputs = new ArrayList<>();
        for (String preset : Presets.names()) {
            DesignStudy study = Presets.load(preset).project().toStudy().withCriterion(Optional.of(c));
            DesignDossier d = DesignDossier.of(study);
            DesignResult r = d.design();
            assertTrue(r.acceptance().isPresent());
            for (AmplitudeConvention conv : AmplitudeConvention.values()) {
                ReportContent content = DesignContent.of(r).shownIn(conv);
                outputs.add(DesignReport.render(content));
                outputs.add(ResultJson.toJson(content));
                outputs.add(ReportTable.of(content, Set.of()).toString());
            }
        }
        // an undamped structure forced at its natural frequency: the value before is unbounded
        Structure undamped = Structure.of(1000, 1000 * Math.pow(2 * Math.PI * 20, 2), 0.0);
        DesignStudy resonant = new DesignStudy("undamped", undamped, new Excitation(ExcitationKind.FORCE, 100,
                new FrequencyBand(2 * Math.PI * 18, 2 * Math.PI * 22)), ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(0.05), DesignMethod.EXACT_PEAK, false, 1.5).withCriterion(Optional.of(c));
        DesignDossier d = DesignDossier.of(resonant);
        for (AmplitudeConvention conv : AmplitudeConvention.values()) {
            ReportContent content = DesignContent.of(d.design()).shownIn(conv);
            outputs.add(DesignReport.render(content));
            outputs.add(ResultJson.toJson(content));
            outputs.add(RobustnessJson.toJson(d.design(), d.robustness(ProgressListener.NONE), conv));
        }
        outputs.forEach(AcceptanceReportTest::assertNoNonFinite);
        JsonObject a = JsonParser.parseString(ResultJson.toJson(DesignContent.of(d.design()))).getAsJsonObject()
                .getAsJsonObject("acceptance");
        assertTrue(a.get("value_before").isJsonNull() && a.get("value_before_unbounded").getAsBoolean(), a.toString());
    }

    private static void assertNoNonFinite(String s) {
        assertFalse(s.contains("NaN"), s);
        assertFalse(s.contains("Infinity"), s);
    }
}
