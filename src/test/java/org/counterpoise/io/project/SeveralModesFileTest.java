package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Format 6: a structure of several modes ({@code structure.modes}) and several absorbers
 * ({@code absorbers}); files of formats 1 to 5 read as one mode and one absorber to the same numbers.
 * The scenarios are invented.
 */
class SeveralModesFileTest {
    /** An invented floor: one mode in the form of format 5 (modal mass 2000 kg seen with shape 0.8). */
    private static final String V5 = """
            {"format_version": 5, "name": "Invented floor",
             "structure": {"mass": {"value": 2000, "unit": "kg"}, "natural_frequency": {"value": 12, "unit": "Hz"},
                           "damping": {"ratio": 0.02}, "mode_shape_at_absorber": 0.8},
             "disturbance": {"kind": "force", "amplitude": {"value": 150, "unit": "N"},
                             "band": {"low": 10, "high": 14, "unit": "Hz"}},
             "absorber": {"mass": {"value": 120, "unit": "kg"}, "method": "exact-peak"}}
            """;

    /** The same mode in the form of format 6: one mode with its shape at a named point. */
    private static final String V6_ONE_MODE = """
            {"format_version": 6, "name": "Invented floor",
             "structure": {"modes": [{"name": "first", "natural_frequency": {"value": 12, "unit": "Hz"},
                                      "damping": {"ratio": 0.02}, "modal_mass": {"value": 2000, "unit": "kg"},
                                      "mode_shape": {"deck": 0.8}}],
                           "excitation_point": "deck", "response_point": "deck"},
             "disturbance": {"kind": "force", "amplitude": {"value": 150, "unit": "N"},
                             "band": {"low": 10, "high": 14, "unit": "Hz"}},
             "absorber": {"mass": {"value": 120, "unit": "kg"}, "method": "exact-peak"},
             "absorbers": {"count": 1, "point": "deck"}}
            """;

    /** Two modes 9 % apart, three named points, two absorbers. */
    static final String V6_TWO_MODES = """
            {"format_version": 6, "name": "Invented two-mode floor",
             "structure": {"modes": [{"name": "bending", "natural_frequency": {"value": 11, "unit": "Hz"},
                                      "damping": {"ratio": 0.02}, "modal_mass": {"value": 3000, "unit": "kg"},
                                      "mode_shape": {"a": 1.0, "b": 0.5, "c": 0.7}},
                                     {"name": "twisting", "natural_frequency": {"value": 12, "unit": "Hz"},
                                      "damping": {"loss_factor": 0.03}, "modal_mass": {"value": 2500, "unit": "kg"},
                                      "mode_shape": {"a": 0.4, "b": 1.0, "c": -0.6}}],
                           "excitation_point": "b", "response_point": "c"},
             "disturbance": {"kind": "force", "amplitude": {"value": 200, "unit": "N"},
                             "band": {"low": 9.5, "high": 13, "unit": "Hz"}},
             "absorber": {"mass_ratio": 0.04, "method": "exact-peak"},
             "absorbers": {"count": 2, "tuning": "individual", "point": "a"}}
            """;

    private static Project read(String text) {
        return ProjectReader.read(new StringReader(text)).project();
    }

    @Test
    void aFileOfFormat5IsOneModeAndOneAbsorberAndDesignsAsBefore() {
        Project p = read(V5);
        assertNull(p.modes());
        assertNull(p.absorbers());
        assertTrue(FormatMigration.isOneModeOneAbsorber(p));
        assertTrue(SeveralModes.layout(p).isEmpty(), "no section on several absorbers");
        // written as format 6, it reopens to the same project and the same design, number for number
        String written = ProjectWriter.toJson(p);
        assertTrue(written.contains("\"format_version\": " + Project.FORMAT_VERSION), written);
        assertFalse(written.contains("\"modes\"") || written.contains("\"absorbers\""), written);
        Project back = read(written);
        assertEquals(p, back);
        DesignResult a = Designer.design(p.toStudy());
        DesignResult b = Designer.design(back.toStudy());
        assertEquals(a.absorber(), b.absorber());
        assertEquals(a.responseAfter().value(), b.responseAfter().value(), 0.0);
    }

    /**
     * One mode and one absorber in the new form design exactly as in the old: the mode of modal mass
     * m seen with shape value phi is the single mode of effective mass m / phi^2 (the modal mass and
     * the shape go together; Ewins 2000, Modal Testing, 2nd ed., section 2.3).
     */
    @Test
    void oneModeInTheNewFormDesignsAsTheOldFormTo1e12() {
        DesignResult old = Designer.design(read(V5).toStudy());
        Project p = read(V6_ONE_MODE);
        DesignResult now = Designer.design(p.toStudy());
        assertEquals(old.study().structure().effectiveMass(), now.study().structure().effectiveMass(),
                1e-12 * old.study().structure().effectiveMass());
        assertEquals(old.absorber().mass(), now.absorber().mass(), 1e-12 * old.absorber().mass());
        assertEquals(old.absorber().stiffness(), now.absorber().stiffness(), 1e-12 * old.absorber().stiffness());
        assertEquals(old.absorber().damping(), now.absorber().damping(), 1e-12 * old.absorber().damping());
        assertEquals(old.responseBefore().value(), now.responseBefore().value(), 1e-12 * old.responseBefore().value());
        assertEquals(old.responseAfter().value(), now.responseAfter().value(), 1e-12 * old.responseAfter().value());
        // the modal route (modal superposition with the structural modification identity) gives the
        // peak of the 2-DOF algebra of the single-mode design: two routes that share no code
        AbsorberLayout layout = SeveralModes.layout(p).orElseThrow();
        SeveralAbsorbers several = SeveralAbsorbersDesigner.design(now, layout);
        assertEquals(now.responseAfter().value(), several.peakAfter(), 1e-9 * several.peakAfter());
        assertEquals(now.responseBefore().value(), several.peakBefore(), 1e-9 * several.peakBefore());
        assertEquals(1, several.absorbers().size());
        assertTrue(several.single().isEmpty());
    }

    @Test
    void aWrittenFileOfFormat6ReopensToTheSameProject(@org.junit.jupiter.api.io.TempDir Path dir) throws IOException {
        Project p = read(V6_TWO_MODES);
        assertEquals(2, p.modes().modes().size());
        assertEquals(new AbsorbersInput(2, AbsorberSetTuning.INDIVIDUAL, "a", null), p.absorbers());
        Path file = dir.resolve("two modes.json");
        ProjectWriter.save(p, file);
        Project back = ProjectReader.read(file).project();
        assertEquals(p, back);
        assertEquals(ProjectWriter.toJson(p), Files.readString(file));
        AbsorberLayout layout = SeveralModes.layout(back).orElseThrow();
        assertEquals(java.util.List.of("bending", "twisting"), layout.modeNames());
        assertEquals("b", layout.excitationPoint());
        assertEquals("c", layout.responsePoint());
    }

    @Test
    void theModesAreKeptInAscendingFrequencyWithTheirNames() {
        // written in descending order: the core sorts by frequency and the names follow
        String swapped = V6_TWO_MODES.replace("\"value\": 11, \"unit\": \"Hz\"", "\"value\": 13.5, \"unit\": \"Hz\"");
        AbsorberLayout layout = SeveralModes.layout(read(swapped)).orElseThrow();
        assertEquals(java.util.List.of("twisting", "bending"), layout.modeNames());
        assertEquals(2 * Math.PI * 12, layout.structure().modes().get(0).naturalFrequency(), 1e-12);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"excitation_point\": \"b\"|\"excitation_point\": \"desk\"|structure.excitation_point|one of the points the modes name: a, b, c",
        "\"response_point\": \"c\"|\"response_point\": \"\"|structure.response_point|one of the points the modes name",
        "\"point\": \"a\"|\"point\": \"roof\"|absorbers.point|one of the points the modes name: a, b, c",
        "\"value\": 2500, \"unit\": \"kg\"|\"value\": -5, \"unit\": \"kg\"|structure.modes[1].modal_mass.value|",
        "\"count\": 2|\"count\": 0|absorbers.count|a whole number from 1 to 8",
        "\"count\": 2|\"count\": 2.5|absorbers.count|a whole number from 1 to 8",
        "\"count\": 2|\"count\": 9|absorbers.count|a whole number from 1 to 8",
        "\"name\": \"twisting\"|\"name\": \"bending\"|structure.modes[1].name|a name no other mode has",
        "\"c\": -0.6|\"d\": -0.6|structure.modes[1].mode_shape|the same named points as structure.modes[0]: a, b, c",
        "\"tuning\": \"individual\"|\"tuning\": \"random\"|absorbers.tuning|one of uniform, individual",
        "\"point\": \"a\"}|\"point\": \"a\", \"target_mode\": \"sway\"}|absorbers.target_mode|the name of one of structure.modes: bending, twisting",
        "\"kind\": \"force\", \"amplitude\": {\"value\": 200, \"unit\": \"N\"}|\"kind\": \"unbalance\", \"amplitude\": {\"value\": 0.02, \"unit\": \"kg*m\"}|disturbance.kind|\"force\" with structure.modes",
        "\"method\": \"exact-peak\"}|\"method\": \"exact-peak\", \"response\": \"velocity\"}|absorber.response|\"displacement\" with structure.modes",
        "\"excitation_point\": \"b\",|\"excitation_point\": \"b\", \"mass\": {\"value\": 3, \"unit\": \"kg\"},|structure.mass|leave it out: with structure.modes",
        "\"modes\": [|\"modes\": [], \"x\": [|structure.modes|at least one mode",
    })
    void badFieldsAreRefusedInPlainWordsNamingTheField(String from, String to, String field, String allowed) {
        String text = V6_TWO_MODES.replace(from, to);
        assertFalse(text.equals(V6_TWO_MODES), "the case changes the file");
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> read(text).toStudy());
        assertEquals(field, e.field(), e.getMessage());
        if (allowed != null) {
            assertTrue(e.getMessage().contains(allowed), e.getMessage());
        }
        assertFalse(e.getMessage().contains("Exception") || e.getMessage().contains("NaN"), e.getMessage());
    }

    @Test
    void severalAbsorbersNeedABandAndAMassAndAPointForSeveralModes() {
        String single = V6_TWO_MODES.replace("\"band\": {\"low\": 9.5, \"high\": 13, \"unit\": \"Hz\"}",
                "\"frequency\": {\"value\": 11, \"unit\": \"Hz\"}");
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> read(single).toStudy());
        assertEquals("absorbers.count", e.field());
        assertTrue(e.getMessage().contains("disturbance.band"), e.getMessage());
        String noPoint = V6_TWO_MODES.replace(", \"point\": \"a\"", "");
        e = assertThrows(InvalidInputException.class, () -> read(noPoint).toStudy());
        assertEquals("absorbers.point", e.field());
        String oneModePoint = V5.replace("\"method\": \"exact-peak\"}", "\"method\": \"exact-peak\"},"
                + " \"absorbers\": {\"count\": 3, \"point\": \"deck\"}");
        e = assertThrows(InvalidInputException.class, () -> read(oneModePoint).toStudy());
        assertEquals("absorbers.point", e.field());
        assertTrue(e.getMessage().contains("leave it out for a structure of one mode"), e.getMessage());
    }
}
