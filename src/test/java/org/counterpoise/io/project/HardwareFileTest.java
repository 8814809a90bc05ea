package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.StringReader;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.realisation.Conductor;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.EddyCurrentChoice;
import org.counterpoise.core.realisation.ElastomerChoice;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.SpringKind;
import org.counterpoise.core.realisation.SpringMaterial;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.text.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Format 4: the hardware choices, the display unit system, the document number, the revision history
 * and the sign-off. Absent sections read as the defaults (so every older file reads), a saved project
 * reopens identically (property over random choices), and a bad value gets a plain message.
 */
class HardwareFileTest {
    private static final Project FAN = Presets.defaultProject().project();

    private static final String HARDWARE = """
            "display_units": "us",
            "document_number": "CP-0042",
            "revisions": [{"mark": "A", "date": "2026-11-02", "description": "first issue", "by": "JD"},
                          {"mark": "B", "date": "2026-11-30", "description": "damper changed", "by": "RA"}],
            "sign_off": {"prepared": {"name": "J. Doe", "date": "2026-11-30"}, "checked": {"name": "R. Aberg"}},
            "hardware": {"spring": "helical-compression", "spring_material": "EN10270-3-1.4310", "spring_count": 4,
              "damper": "eddy-current",
              "eddy_current": {"conductor": "aluminium", "flux_density": {"value": 600, "unit": "mT"},
                               "plate_thickness": {"value": 0.25, "unit": "in"}},
              "service_life": {"value": 20000, "unit": "h"},
              "mass_tolerance": {"value": 2, "unit": "%"}, "trim_step": {"value": 0.5, "unit": "%"}},
            """;

    private static LoadedProject read(String text) {
        return ProjectReader.read(new StringReader(text));
    }

    private static String fanWith(String topLevel) {
        return ProjectWriter.toJson(FAN).replaceFirst("\\{", "{" + topLevel);
    }

    private static String withoutFormat4(String json) {
        JsonObject o = JsonParser.parseString(json).getAsJsonObject();
        for (String key : List.of("hardware", "display_units", "document_number", "revisions", "sign_off")) {
            o.remove(key);
        }
        return o.toString();
    }

    @Test
    void aFormatFourFileReadsEveryChoiceWithItsUnits() {
        String text = withoutFormat4(ProjectWriter.toJson(FAN));
        LoadedProject loaded = read(text.replaceFirst("\\{", "{" + HARDWARE));
        assertEquals(List.of(), loaded.unknownFields());
        Project p = loaded.project();
        HardwareChoice h = p.hardware();
        assertEquals(SpringKind.HELICAL_COMPRESSION, h.springKind());
        assertEquals(SpringMaterial.EN10270_3_1_4310, h.springMaterial(), "ids read as ids: case does not matter");
        assertEquals(4, h.springCount());
        assertEquals(DamperKind.EDDY_CURRENT, h.damperKind());
        assertEquals(Conductor.ALUMINIUM, h.eddyCurrent().conductor());
        assertEquals(0.6, h.eddyCurrent().fluxDensity(), 1e-15);
        // 1 in = 0.0254 m exactly (NIST SP 811:2008, B.8)
        assertEquals(0.25 * 0.0254, h.eddyCurrent().plateThickness(), 1e-18);
        assertEquals(20000, h.serviceHours());
        assertEquals(0.02, h.massTolerance(), 1e-17);
        assertEquals(0.005, h.trimStepFraction(), 1e-17);
        assertEquals(ElastomerChoice.DEFAULT, h.elastomer(), "absent: the default");
        assertEquals(UnitSystem.US_CUSTOMARY, p.displayUnits());
        ProjectIdentity id = p.identity();
        assertEquals("CP-0042", id.documentNumber());
        assertEquals(List.of(new Revision("A", "2026-11-02", "first issue", "JD"),
                new Revision("B", "2026-11-30", "damper changed", "RA")), id.history());
        assertEquals(new Signature("J. Doe", "2026-11-30"), id.signOff().prepared());
        assertEquals(new Signature("R. Aberg", ""), id.signOff().checked());
        assertEquals(Signature.BLANK, id.signOff().approved());
        assertEquals(p, read(ProjectWriter.toJson(p)).project());
    }

    @Test
    void anElastomerSpringDefaultsToItsOwnLossAsTheDamper() {
        String text = withoutFormat4(ProjectWriter.toJson(FAN)).replaceFirst("\\{", "{\"hardware\": {\"spring\":"
                + " \"elastomer\", \"elastomer\": {\"dynamic_to_static_ratio\": 1.6, \"loss_factor\": 0.25}},");
        HardwareChoice h = read(text).project().hardware();
        assertEquals(DamperKind.ELASTOMER_LOSS, h.damperKind());
        assertEquals(new ElastomerChoice(1.6, 0.25), h.elastomer());
    }

    @Test
    void olderFilesAndAFileWithoutTheNewSectionsReadAsTheDefaults() {
        Project p = read(withoutFormat4(ProjectWriter.toJson(FAN))).project();
        assertEquals(HardwareChoice.DEFAULT, p.hardware());
        assertEquals(UnitSystem.SI, p.displayUnits());
        assertEquals("", p.identity().documentNumber());
        assertEquals(List.of(), p.identity().history());
        assertEquals(SignOff.BLANK, p.identity().signOff());
        for (int version = Project.OLDEST_FORMAT_VERSION; version < Project.FORMAT_VERSION; version++) {
            String older = withoutFormat4(ProjectWriter.toJson(FAN)).replaceFirst("\"format_version\":\\d",
                    "\"format_version\":" + version);
            Project q = read(older).project();
            assertEquals(HardwareChoice.DEFAULT, q.hardware(), "format " + version);
            assertEquals(UnitSystem.SI, q.displayUnits(), "format " + version);
        }
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"display_units\": \"imperial\",|display_units: \"imperial\" is not allowed; one of si, us",
        "\"hardware\": {\"spring\": \"leaf\"},|hardware.spring: \"leaf\" is not allowed; one of helical-compression, elastomer",
        "\"hardware\": {\"spring_material\": \"brass\"},|hardware.spring_material: \"brass\" is not allowed; one of en10270-1-sh, en10270-1-dh, en10270-3-1.4310",
        "\"hardware\": {\"spring_count\": 2.5},|hardware.spring_count: 2.5 is not allowed; a whole number from 0 (the design chooses) to 8",
        "\"hardware\": {\"damper\": \"elastomer-loss\"},|hardware.damper: elastomer-loss with a helical-compression spring is not allowed; elastomer-loss with an elastomer spring, and viscous-dashpot or eddy-current with helical springs",
        "\"hardware\": {\"eddy_current\": {\"conductor\": \"iron\"}},|hardware.eddy_current.conductor: \"iron\" is not allowed; one of copper, aluminium",
        "\"hardware\": {\"eddy_current\": {\"flux_density\": {\"value\": 3, \"unit\": \"T\"}}},|hardware.eddy_current.flux_density: 3 is not allowed; must lie between 0.001 and 2 (in tesla)",
        "\"hardware\": {\"eddy_current\": {\"plate_thickness\": {\"value\": 5, \"unit\": \"kg\"}}},|hardware.eddy_current.plate_thickness.unit: \"kg\" is not allowed; allowed units: m, mm, um, in, mil",
        "\"hardware\": {\"mass_tolerance\": {\"value\": 50, \"unit\": \"%\"}},|hardware.mass_tolerance: 0.5 is not allowed; must lie between 0 and 0.2 (as a fraction of the absorber mass: 0.01 is 1 %)",
        "\"hardware\": {\"service_life\": {\"value\": 0.5, \"unit\": \"h\"}},|hardware.service_life: 0.5 is not allowed; must lie between 1 and 10000000 (in hours)",
        "\"hardware\": {\"elastomer\": {\"loss_factor\": 0}},|hardware.elastomer.loss_factor: 0 is not allowed; must lie between 0.001 and 2",
        "\"revisions\": [{\"mark\": \"A\", \"date\": \"2 Nov\"}],|revisions[0].date: \"2 Nov\" is not allowed; a date written YYYY-MM-DD, such as 2026-03-31, or nothing",
        "\"sign_off\": {\"approved\": {\"date\": \"2026-13-01\"}},|sign_off.approved.date: \"2026-13-01\" is not allowed; a date written YYYY-MM-DD, such as 2026-03-31, or nothing",
        "\"revisions\": {\"mark\": \"A\"},|revisions: an object { ... } is not allowed; must be a list [ {...}, {...} ]",
    })
    void badValuesNameTheFieldAndWhatIsAllowed(String topLevel, String message) {
        String text = withoutFormat4(ProjectWriter.toJson(FAN)).replaceFirst("\\{", "{" + topLevel);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> read(text));
        assertEquals(message, e.getMessage());
    }

    @Test
    void unknownKeysInTheNewSectionsAreReportedNotDropped() {
        String text = withoutFormat4(ProjectWriter.toJson(FAN)).replaceFirst("\\{",
                "{\"hardware\": {\"sprign\": \"elastomer\"}, \"sign_off\": {\"checker\": {}},");
        assertEquals(List.of("sign_off.checker", "hardware.sprign"), read(text).unknownFields());
    }

    @Property(tries = 200)
    void aSavedProjectReopensIdentically(@ForAll("projects") Project p) {
        Project back = read(ProjectWriter.toJson(p)).project();
        assertEquals(p, back);
        assertEquals(ProjectWriter.toJson(p), ProjectWriter.toJson(back), "the file is a fixed point");
    }

    @Provide
    Arbitrary<Project> projects() {
        Arbitrary<DamperKind> damper = Arbitraries.of(DamperKind.values());
        Arbitrary<EddyCurrentChoice> eddy = Combinators.combine(Arbitraries.of(Conductor.values()),
                Arbitraries.doubles().between(1e-3, 2.0).ofScale(6), Arbitraries.doubles().between(1e-4, 0.1).ofScale(6))
                .as(EddyCurrentChoice::new);
        Arbitrary<ElastomerChoice> compound = Combinators.combine(Arbitraries.doubles().between(1.0, 5.0).ofScale(6),
                Arbitraries.doubles().between(1e-3, 2.0).ofScale(6)).as(ElastomerChoice::new);
        Arbitrary<HardwareChoice> hardware = Combinators.combine(damper, Arbitraries.of(SpringMaterial.values()),
                Arbitraries.integers().between(0, HardwareChoice.MOST_SPRINGS), eddy, compound,
                Arbitraries.doubles().between(1.0, 1e7).ofScale(6), Arbitraries.doubles().between(0.0, 0.2).ofScale(6),
                Arbitraries.doubles().between(1e-4, 0.2).ofScale(6)).as((d, m, n, ec, ch, hours, tol, trim) ->
                        new HardwareChoice(d == DamperKind.ELASTOMER_LOSS ? SpringKind.ELASTOMER
                                : SpringKind.HELICAL_COMPRESSION, m, n, d, ec, ch, hours, tol, trim));
        Arbitrary<String> text = Arbitraries.strings().withCharRange('A', 'z').withChars(' ', '\u00e5', '"')
                .ofMaxLength(12);
        Arbitrary<String> date = Arbitraries.of("", "2026-01-31", "2027-12-01");
        Arbitrary<Signature> signature = Combinators.combine(text, date).as(Signature::new);
        Arbitrary<Revision> revision = Combinators.combine(text, date, text, text).as(Revision::new);
        Arbitrary<ProjectIdentity> identity = Combinators.combine(text, text, date, text,
                revision.list().ofMaxSize(3), signature, signature, signature).as((rev, eng, d, doc, hist, a, b, c) ->
                        new ProjectIdentity(rev, eng, "", d, doc, hist, new SignOff(a, b, c)));
        return Combinators.combine(hardware, Arbitraries.of(UnitSystem.values()), identity)
                .as((h, u, id) -> FAN.withHardware(h).withDisplayUnits(u).withDetails(FAN.name(), FAN.notes(), id));
    }

    @Test
    void theNewSectionsAreWrittenWithExplicitUnitsAndIds() {
        HardwareChoice h = new HardwareChoice(SpringKind.HELICAL_COMPRESSION, SpringMaterial.EN10270_1_SH, 2,
                DamperKind.EDDY_CURRENT, new EddyCurrentChoice(Conductor.COPPER, 0.4, 0.006), ElastomerChoice.DEFAULT,
                30_000, 0.01, 0.02);
        JsonObject o = JsonParser.parseString(ProjectWriter.toJson(FAN.withHardware(h))).getAsJsonObject();
        assertEquals(Project.FORMAT_VERSION, o.get("format_version").getAsInt());
        assertEquals("si", o.get("display_units").getAsString());
        JsonObject hw = o.getAsJsonObject("hardware");
        assertEquals("en10270-1-sh", hw.get("spring_material").getAsString());
        assertEquals("eddy-current", hw.get("damper").getAsString());
        JsonObject t = hw.getAsJsonObject("eddy_current").getAsJsonObject("plate_thickness");
        assertEquals("mm", t.get("unit").getAsString());
        assertEquals(6.0, t.get("value").getAsDouble(), 1e-12);
        assertEquals("h", hw.getAsJsonObject("service_life").get("unit").getAsString());
        assertEquals("%", hw.getAsJsonObject("trim_step").get("unit").getAsString());
        assertEquals(2.0, hw.getAsJsonObject("trim_step").get("value").getAsDouble(), 1e-12);
        assertTrue(hw.has("elastomer"), "every key written, so a reader sees every choice");
    }
}
