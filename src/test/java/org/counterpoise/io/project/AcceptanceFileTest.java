package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.StringReader;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
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
import org.counterpoise.core.criteria.RoomUse;
import org.counterpoise.core.criteria.SeverityZone;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.criteria.VibrationCriterionCurve;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Unit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The acceptance criterion, the display convention and designing to meet the criterion in project
 * files of format 3, and the migration of {@code absorber.target} of formats 1 and 2.
 */
class AcceptanceFileTest {
    /** An invented scenario (not measured data), format 3, with a user limit. */
    private static final String WITHOUT = """
            {"format_version": 3, "name": "invented acceptance scenario",
             "structure": {"mass": {"value": 1000, "unit": "kg"}, "natural_frequency": {"value": 10, "unit": "Hz"},
                           "damping": {"ratio": 0.02}},
             "disturbance": {"kind": "force", "amplitude": {"value": 100, "unit": "N"},
                             "frequency": {"value": 600, "unit": "rpm"}},
             "absorber": {"mass_ratio": 0.05, "method": "exact-peak", "response": "velocity"}ACCEPTANCE}
            """;
    private static final String USER_LIMIT = "\"criterion\": \"user-limit\", \"quantity\": \"velocity\","
            + " \"convention\": \"rms\", \"limit\": {\"value\": 2.8, \"unit\": \"mm/s\"}";
    /** The same with the criterion and display convention of format 3. */
    private static final String BASE = WITHOUT.replace("ACCEPTANCE", ",\n \"acceptance\": {" + USER_LIMIT
            + "},\n \"display_convention\": \"rms\"");
    /** The compressor preset as shipped in format 2, sized by absorber.target (kept verbatim). */
    private static final Path KEPT_V2_TARGET = Path.of("src", "test", "resources", "golden", "v2-target.json");

    private static Project read(String text) {
        LoadedProject loaded = ProjectReader.read(new StringReader(text));
        assertEquals(List.of(), loaded.unknownFields());
        return loaded.project();
    }

    private static Project withAcceptance(String criterionFields) {
        return read(BASE.replace(USER_LIMIT, criterionFields));
    }

    private static Project roundTrip(Project p) {
        return ProjectReader.read(new StringReader(ProjectWriter.toJson(p))).project();
    }

    @Test
    void aStatedLimitOfOneValueIsReadInSiAndJudgesTheOrdersTogether() {
        Project p = read(BASE);
        assertEquals(AcceptanceInput.StatedLimit.flat(ResponseKind.VELOCITY, AmplitudeConvention.RMS,
                new QuantityInput(2.8, Unit.MILLIMETRE_PER_SECOND)), p.acceptance());
        Criterion c = p.toStudy().criterion().orElseThrow();
        assertEquals(new UserLimit(ResponseKind.VELOCITY, AmplitudeConvention.RMS, LimitCurve.flat(2.8e-3)), c);
        assertEquals(AmplitudeConvention.RMS, p.displayConvention());
        assertEquals(p, roundTrip(p));
    }

    @Test
    void aStatedLimitCurveIsReadInHertzAndSi() {
        Project p = withAcceptance("\"criterion\": \"user-limit\", \"quantity\": \"displacement\", \"convention\":"
                + " \"peak-to-peak\", \"limit_curve\": ["
                + "{\"frequency\": {\"value\": 300, \"unit\": \"rpm\"}, \"limit\": {\"value\": 0.2, \"unit\": \"mm\"}},"
                + "{\"frequency\": {\"value\": 20, \"unit\": \"Hz\"}, \"limit\": {\"value\": 50, \"unit\": \"um\"}}]");
        UserLimit u = (UserLimit) p.toStudy().criterion().orElseThrow();
        assertEquals(AmplitudeConvention.PEAK_TO_PEAK, u.convention());
        // 300 rpm is 5 Hz; 0.2 mm and 50 um in m
        assertEquals(5.0, u.limit().points().get(0).frequency(), 1e-12);
        assertEquals(2e-4, u.limit().points().get(0).limit(), 1e-18);
        assertEquals(20.0, u.limit().points().get(1).frequency(), 1e-12);
        assertEquals(5e-5, u.limit().points().get(1).limit(), 1e-18);
        assertFalse(u.limit().isFlat());
        assertEquals(p, roundTrip(p));
    }

    @Test
    void eachPublishedCriterionIsReadByItsIdsAndWrittenBack() {
        List<String> fields = List.of(
                "\"criterion\": \"human-comfort\", \"weighting\": \"wd\", \"acceptable\": \"fairly-uncomfortable\"",
                "\"criterion\": \"building\", \"direction\": \"horizontal\", \"room_use\": \"residential-night\"",
                "\"criterion\": \"machine\", \"machine\": \"group-1-rigid\", \"zone\": \"A\"",
                "\"criterion\": \"equipment\", \"curve\": \"vc-c\"");
        List<Criterion> expected = List.of(new HumanComfort(FrequencyWeighting.WD, ComfortReaction.FAIRLY_UNCOMFORTABLE),
                new BuildingVibration(BuildingAxis.HORIZONTAL, RoomUse.RESIDENTIAL_NIGHT),
                new MachineSeverity(MachineClass.GROUP_1_RIGID, SeverityZone.A),
                new EquipmentVibration(VibrationCriterionCurve.VC_C));
        for (int i = 0; i < fields.size(); i++) {
            Project p = withAcceptance(fields.get(i));
            assertEquals(new AcceptanceInput.Published(expected.get(i)), p.acceptance(), fields.get(i));
            assertEquals(Optional.of(expected.get(i)), p.toStudy().criterion());
            assertEquals(p, roundTrip(p), fields.get(i));
        }
        // ids are read as every id of the file: case and underscores for dashes do not matter
        assertEquals(new AcceptanceInput.Published(new MachineSeverity(MachineClass.GROUP_2_FLEXIBLE, SeverityZone.B)),
                withAcceptance("\"criterion\": \"machine\", \"machine\": \"Group_2_Flexible\", \"zone\": \"b\"")
                        .acceptance());
    }

    @Test
    void withoutACriterionOrConventionTheProjectHasNoneAndShowsPeaks() {
        Project p = read(WITHOUT.replace("ACCEPTANCE", ""));
        assertNull(p.acceptance());
        assertEquals(AmplitudeConvention.PEAK, p.displayConvention(), "common practice: amplitudes are peaks");
        assertEquals(Optional.empty(), p.toStudy().criterion());
        JsonObject written = JsonParser.parseString(ProjectWriter.toJson(p)).getAsJsonObject();
        assertFalse(written.has("acceptance"));
        assertEquals("peak", written.get("display_convention").getAsString());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"user-limit\"|\"strict\"|acceptance.criterion: \"strict\" is not allowed; one of user-limit, human-comfort, building, machine, equipment",
        "\"quantity\": \"velocity\"|\"quantity\": \"stroke\"|acceptance.quantity: \"stroke\" is not allowed; one of displacement, velocity, acceleration, relative-displacement, transmitted-force",
        "\"convention\": \"rms\"|\"convention\": \"average\"|acceptance.convention: \"average\" is not allowed; one of peak, rms, peak-to-peak",
        "\"unit\": \"mm/s\"|\"unit\": \"mm\"|acceptance.limit.unit: \"mm\" is not allowed; allowed units: m/s, mm/s, in/s",
        "\"value\": 2.8|\"value\": -2.8|acceptance.limit.value: -2.8 mm/s is not allowed; must be a finite number greater than 0",
        "\"limit\": {\"value\": 2.8, \"unit\": \"mm/s\"}|\"limit_curve\": []|acceptance.limit_curve: an empty list is not allowed; at least one point {\"frequency\": ..., \"limit\": ...}",
        "\"limit\": {\"value\": 2.8, \"unit\": \"mm/s\"}|\"limit_curve\": 3|acceptance.limit_curve: 3 is not allowed; must be a list [ {...}, {...} ]",
        "\"limit\": {\"value\": 2.8, \"unit\": \"mm/s\"}|\"limits\": 3|acceptance.limit: missing; give either acceptance.limit (one value, e.g. {\"value\": 2.8, \"unit\": \"mm/s\"}) or acceptance.limit_curve (a list of points {\"frequency\": ..., \"limit\": ...})",
        "\"display_convention\": \"rms\"|\"display_convention\": \"mean\"|display_convention: \"mean\" is not allowed; one of peak, rms, peak-to-peak",
        "\"mass_ratio\": 0.05|\"mass_ratio\": 0.05, \"meet_acceptance\": true|absorber: 2 sizes given is not allowed; give one of absorber.mass_ratio, absorber.mass and absorber.meet_acceptance",
        "\"mass_ratio\": 0.05|\"meet_acceptance\": \"yes\"|absorber.meet_acceptance: \"yes\" is not allowed; must be true or false",
        "\"format_version\": 3|\"format_version\": 9|format_version: 9 is not allowed; this file was written by a newer Counterpoise; this version of Counterpoise reads format_version 1 to 8",
    })
    void badValuesAreRefusedNamingTheFieldWhatIsWrongAndWhatIsAllowed(String from, String to, String message) {
        String text = BASE.replaceFirst(Pattern.quote(from), Matcher.quoteReplacement(to));
        assertFalse(text.equals(BASE), "the case changes the file");
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> read(text).toStudy());
        assertEquals(message, e.getMessage());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"criterion\": \"human-comfort\", \"weighting\": \"wm\", \"acceptable\": \"uncomfortable\"|acceptance.weighting: \"wm\" is not allowed; one of wk, wd",
        "\"criterion\": \"human-comfort\", \"weighting\": \"wk\", \"acceptable\": \"calm\"|acceptance.acceptable: \"calm\" is not allowed; one of not-uncomfortable, a-little-uncomfortable, fairly-uncomfortable, uncomfortable, very-uncomfortable, extremely-uncomfortable",
        "\"criterion\": \"human-comfort\", \"weighting\": \"wk\", \"acceptable\": \"extremely-uncomfortable\"|acceptance.acceptable: extremely-uncomfortable is not allowed; has no upper end to judge against; choose a reaction up to very-uncomfortable",
        "\"criterion\": \"building\", \"direction\": \"up\", \"room_use\": \"workshop\"|acceptance.direction: \"up\" is not allowed; one of vertical, horizontal",
        "\"criterion\": \"building\", \"direction\": \"vertical\", \"room_use\": \"office\"|acceptance.room_use: \"office\" is not allowed; one of critical-work-area, residential-night, residential-day, quiet-office, general-office, workshop",
        "\"criterion\": \"machine\", \"machine\": \"group-3\", \"zone\": \"B\"|acceptance.machine: \"group-3\" is not allowed; one of group-1-rigid, group-1-flexible, group-2-rigid, group-2-flexible",
        "\"criterion\": \"machine\", \"machine\": \"group-1-rigid\", \"zone\": \"D\"|acceptance.zone: D is not allowed; zone D is severe enough to cause damage and has no upper boundary; choose A, B or C",
        "\"criterion\": \"machine\", \"machine\": \"group-1-rigid\"|acceptance.zone: missing; expected a text in quotes",
        "\"criterion\": \"equipment\", \"curve\": \"vc-z\"|acceptance.curve: \"vc-z\" is not allowed; one of vc-a, vc-b, vc-c, vc-d, vc-e, vc-f, vc-g",
        "\"criterion\": \"user-limit\", \"quantity\": \"velocity\", \"convention\": \"rms\", \"limit_curve\": [{\"frequency\": {\"value\": 10, \"unit\": \"Hz\"}, \"limit\": {\"value\": 2, \"unit\": \"mm/s\"}}, {\"frequency\": {\"value\": 300, \"unit\": \"rpm\"}, \"limit\": {\"value\": 2, \"unit\": \"mm/s\"}}]|acceptance.limit_curve[1].frequency.value: 300 rpm is not allowed; the frequencies must rise from point to point (the previous point is at 10 Hz)",
        "\"criterion\": \"user-limit\", \"quantity\": \"velocity\", \"convention\": \"rms\", \"limit_curve\": [{\"frequency\": {\"value\": 10, \"unit\": \"mm\"}, \"limit\": {\"value\": 2, \"unit\": \"mm/s\"}}]|acceptance.limit_curve[0].frequency.unit: \"mm\" is not allowed; allowed units: rad/s, Hz, rpm",
        "\"criterion\": \"user-limit\", \"quantity\": \"velocity\", \"convention\": \"rms\", \"limit_curve\": [{\"frequency\": {\"value\": 10, \"unit\": \"Hz\"}}]|acceptance.limit_curve[0].limit: missing; expected an object { ... }",
        "\"criterion\": \"user-limit\", \"quantity\": \"velocity\", \"convention\": \"rms\", \"limit_curve\": [7]|acceptance.limit_curve[0]: 7 is not allowed; must be an object { ... }",
    })
    void badCriteriaAreRefusedNamingTheFieldWhatIsWrongAndWhatIsAllowed(String fields, String message) {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> withAcceptance(fields).toStudy());
        assertEquals(message, e.getMessage());
    }

    @Test
    void aKeptFormatTwoTargetIsReadAsAUserLimitToMeetAndWrittenBackInFormatThree() {
        LoadedProject loaded = ProjectReader.read(KEPT_V2_TARGET);
        assertEquals(List.of(), loaded.unknownFields());
        Project p = loaded.project();
        // the migration rule (docs/project-file.md): quantity = absorber.response, peak, flat at the target
        assertEquals(AcceptanceInput.StatedLimit.flat(ResponseKind.ACCELERATION, AmplitudeConvention.PEAK,
                new QuantityInput(2.0, Unit.METRE_PER_SECOND_SQUARED)), p.acceptance());
        assertTrue(p.absorber().meetAcceptance());
        assertNull(p.absorber().target());
        assertEquals(OptionalDouble.of(0.2), p.absorber().maxMassRatio());
        assertEquals(AmplitudeConvention.PEAK, p.displayConvention());

        DesignStudy s = p.toStudy();
        assertEquals(Optional.of(new UserLimit(ResponseKind.ACCELERATION, AmplitudeConvention.PEAK,
                LimitCurve.flat(2.0))), s.criterion());
        // the migrated target is a criterion to meet, with the file's largest mass ratio
        assertEquals(new AbsorberSizing.MeetCriterion(0.2), s.sizing());

        JsonObject written = JsonParser.parseString(ProjectWriter.toJson(p)).getAsJsonObject();
        assertEquals(Project.FORMAT_VERSION, written.get("format_version").getAsInt());
        JsonObject absorber = written.getAsJsonObject("absorber");
        assertFalse(absorber.has("target"), "format 3 has no absorber.target");
        assertTrue(absorber.get("meet_acceptance").getAsBoolean());
        assertEquals("user-limit", written.getAsJsonObject("acceptance").get("criterion").getAsString());
        assertEquals(p, roundTrip(p));

        // shown as the target it stands for (the wizard's goal step), it is saved back the same
        AbsorberInput shown = p.absorberWithTarget().orElseThrow();
        assertEquals(new QuantityInput(2.0, Unit.METRE_PER_SECOND_SQUARED), shown.target());
        assertFalse(shown.meetAcceptance());
        assertEquals(p, p.withAbsorber(shown).withTargetAsAcceptance());
        assertEquals(Optional.empty(), read(BASE).absorberWithTarget(), "a mass ratio is no target");
    }

    @Test
    void aFormatOneTargetIsMigratedTheSameWayAndFormatThreeRefusesIt() {
        String v1 = WITHOUT.replace("ACCEPTANCE", "").replace("\"format_version\": 3", "\"format_version\": 1")
                .replace("\"mass_ratio\": 0.05", "\"target\": {\"value\": 4, \"unit\": \"mm/s\"}, \"max_mass_ratio\": 0.3");
        assertFalse(v1.contains("\"acceptance\""), v1);
        Project p = read(v1);
        assertEquals(AcceptanceInput.StatedLimit.flat(ResponseKind.VELOCITY, AmplitudeConvention.PEAK,
                new QuantityInput(4, Unit.MILLIMETRE_PER_SECOND)), p.acceptance());
        assertEquals(OptionalDouble.of(0.3), p.absorber().maxMassRatio());
        assertTrue(p.absorber().meetAcceptance());

        String v3 = v1.replace("\"format_version\": 1", "\"format_version\": 3");
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> read(v3));
        assertEquals("absorber.target", e.field());
        assertTrue(e.getMessage().contains("format 3 states the limit as the acceptance criterion"), e.getMessage());
    }

    @Test
    void aTargetTypedInMemoryIsDesignedAsBeforeAndSavedAsTheCriterionItMeans() {
        Project p = read(BASE);
        Project typed = p.withAcceptance(null).withAbsorber(new AbsorberInput(OptionalDouble.empty(), null,
                p.absorber().method(), ResponseKind.VELOCITY, false, 1.5, new QuantityInput(3, Unit.MILLIMETRE_PER_SECOND),
                OptionalDouble.empty(), null, OptionalDouble.empty(), OptionalDouble.empty()));
        DesignStudy s = typed.toStudy();
        assertEquals(new AbsorberSizing.ByTarget(3e-3, AbsorberSizing.DEFAULT_MAX_MASS_RATIO), s.sizing());
        assertEquals(Optional.of(new UserLimit(ResponseKind.VELOCITY, AmplitudeConvention.PEAK, LimitCurve.flat(3e-3))),
                s.criterion());
        Project saved = roundTrip(typed);
        assertEquals(typed.withTargetAsAcceptance(), saved);
        // reopened, the limit is the criterion to meet; a peak limit on the response designs exactly as
        // the target did (MeetCriterionEquivalenceTest)
        assertEquals(new AbsorberSizing.MeetCriterion(AbsorberSizing.DEFAULT_MAX_MASS_RATIO),
                saved.toStudy().sizing());
        assertEquals(Designer.design(s).tuning(), Designer.design(saved.toStudy()).tuning(),
                "saved and reopened, it designs the same");
    }

    @Test
    void meetingAStatedRmsLimitOnTheResponseIsTheTargetOfItsPeak() {
        // One harmonic: r.m.s. = peak / sqrt 2 (definition; AmplitudeConvention), so an r.m.s. limit of
        // 2.8 mm/s is a peak of 2.8 sqrt 2 mm/s
        Project p = read(BASE.replace("\"mass_ratio\": 0.05", "\"meet_acceptance\": true"));
        assertEquals(new AbsorberSizing.MeetCriterion(AbsorberSizing.DEFAULT_MAX_MASS_RATIO), p.toStudy().sizing());
        DesignResult r = Designer.design(p.toStudy());
        // the design meets the r.m.s. limit: its peak response over root 2 is at most 2.8 mm/s
        assertTrue(r.responseAfter().value() / Math.sqrt(2) <= 2.8e-3 * (1 + 1e-9),
                r.responseAfter().value() / Math.sqrt(2) + " m/s r.m.s.");
        Project noCriterion = p.withAcceptance(null);
        InvalidInputException e = assertThrows(InvalidInputException.class, noCriterion::toStudy);
        assertEquals("acceptance: missing; absorber.meet_acceptance needs a criterion to meet: give the acceptance"
                + " object", e.getMessage());
    }
}
