package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalInt;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.JointArrangement;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Format 7: one absorber per mode, designed jointly ({@code "arrangement": "one-per-mode"}); files of
 * formats 1 to 6 read unchanged (their absorbers all on one mode). The scenarios are invented.
 */
class OnePerModeFileTest {
    /** An invented frame: three modes (the twisting mode written first), three named points. */
    static final String V7 = """
            {"format_version": 7, "name": "Invented frame",
             "structure": {"modes": [{"name": "twisting", "natural_frequency": {"value": 21, "unit": "Hz"},
                                      "damping": {"ratio": 0.01}, "modal_mass": {"value": 800, "unit": "kg"},
                                      "mode_shape": {"mid": 0.2, "edge": 1.0, "foot": 0.1}},
                                     {"name": "bending", "natural_frequency": {"value": 9, "unit": "Hz"},
                                      "damping": {"ratio": 0.02}, "modal_mass": {"value": 1500, "unit": "kg"},
                                      "mode_shape": {"mid": 1.0, "edge": 0.6, "foot": 0.1}},
                                     {"name": "sway", "natural_frequency": {"value": 40, "unit": "Hz"},
                                      "damping": {"ratio": 0.02}, "modal_mass": {"value": 900, "unit": "kg"},
                                      "mode_shape": {"mid": 0.3, "edge": -0.2, "foot": 0.0}}],
                           "excitation_point": "edge", "response_point": "mid"},
             "disturbance": {"kind": "force", "amplitude": {"value": 100, "unit": "N"},
                             "band": {"low": 6, "high": 25, "unit": "Hz"}},
             "absorber": {"mass": {"value": 60, "unit": "kg"}, "method": "exact-peak"},
             "absorbers": {"arrangement": "one-per-mode", "modes": ["bending", "twisting"]ABSORBERS}}
            """;

    private static Project read(String text) {
        return ProjectReader.read(new StringReader(text)).project();
    }

    private static Project v7(String absorbers) {
        return read(V7.replace("ABSORBERS", absorbers));
    }

    @Test
    void pointsDefaultToWhereEachModeMovesMostAndTheTargetIsTheFirstMode() {
        Project p = v7("");
        AbsorbersInput a = p.absorbers();
        assertTrue(a.onePerMode());
        assertEquals(List.of("bending", "twisting"), a.modes());
        assertEquals(2, a.count());
        assertEquals(AbsorberSetTuning.INDIVIDUAL, a.tuning());
        AbsorberLayout layout = SeveralModes.layout(p).orElseThrow();
        // the core keeps the modes in ascending frequency: bending 9 Hz, twisting 21 Hz, sway 40 Hz
        assertEquals(List.of("bending", "twisting", "sway"), layout.modeNames());
        JointArrangement joint = layout.joint().orElseThrow();
        assertEquals(List.of(0, 1), joint.modes());
        assertEquals(List.of("mid", "edge"), joint.points(), "each mode's largest shape value in size");
        assertEquals(List.of(true, true), joint.pointsChosen());
        assertEquals(OptionalInt.of(0), layout.targetMode());
        assertEquals("mid", layout.absorberPoint());
        assertEquals(2, layout.count());
    }

    @Test
    void givenPointsAndTargetAreKeptInTheOrderOfTheModes() {
        AbsorberLayout layout = SeveralModes.layout(v7(", \"points\": [\"edge\", \"mid\"], \"target_mode\": \"twisting\""))
                .orElseThrow();
        JointArrangement joint = layout.joint().orElseThrow();
        assertEquals(List.of("edge", "mid"), joint.points(), "bending at edge, twisting at mid");
        assertEquals(List.of(false, false), joint.pointsChosen());
        assertEquals(OptionalInt.of(1), layout.targetMode());
        assertEquals("mid", layout.absorberPoint(), "the twisting mode's absorber's point");
        // written modes in descending frequency: the core still takes them ascending
        joint = SeveralModes.layout(read(V7.replace("\"modes\": [\"bending\", \"twisting\"]ABSORBERS",
                "\"modes\": [\"twisting\", \"bending\"], \"point\": \"foot\""))).orElseThrow().joint().orElseThrow();
        assertEquals(List.of(0, 1), joint.modes());
        assertEquals(List.of("foot", "foot"), joint.points());
    }

    @Test
    void aWrittenFileOfFormat7ReopensToTheSameProject(@TempDir Path dir) throws IOException {
        for (String absorbers : List.of("", ", \"points\": [\"edge\", \"mid\"], \"target_mode\": \"twisting\"",
                ", \"point\": \"foot\", \"count\": 2")) {
            Project p = v7(absorbers);
            Path file = dir.resolve("frame.json");
            ProjectWriter.save(p, file);
            String written = Files.readString(file);
            assertTrue(written.contains("\"format_version\": " + Project.FORMAT_VERSION), written);
            assertTrue(written.contains("\"arrangement\": \"one-per-mode\""), written);
            assertFalse(written.contains("\"tuning\""), written);
            Project back = ProjectReader.read(file).project();
            assertEquals(p, back);
            assertEquals(SeveralModes.layout(p), SeveralModes.layout(back));
        }
    }

    /** A format-6 file (every absorber on one mode) reads unchanged and is written back without an arrangement. */
    @Test
    void aFileOfFormat6ReadsUnchanged() {
        Project p = read(SeveralModesFileTest.V6_TWO_MODES);
        assertEquals(new AbsorbersInput(2, AbsorberSetTuning.INDIVIDUAL, "a", null, AbsorberArrangement.ONE_MODE,
                List.of(), List.of()), p.absorbers());
        assertTrue(SeveralModes.layout(p).orElseThrow().joint().isEmpty());
        String written = ProjectWriter.toJson(p);
        assertFalse(written.contains("arrangement"), written);
        assertEquals(p, read(written));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"modes\": [\"bending\", \"twisting\"]ABSORBERS|\"modes\": [\"bending\", \"twisting\", \"sway\"]"
                + "|absorbers.modes: 3 names bending, twisting, sway is not allowed; the names of exactly two different modes",
        "\"modes\": [\"bending\", \"twisting\"]ABSORBERS|\"modes\": [\"bending\", \"bending\"]"
                + "|absorbers.modes: 2 names bending, bending is not allowed; the names of exactly two different modes",
        "\"modes\": [\"bending\", \"twisting\"]ABSORBERS|\"modes\": [\"bending\", \"torsion\"]"
                + "|absorbers.modes[1]: \"torsion\" is not allowed; the name of one of structure.modes: bending, twisting, sway",
        "\"modes\": [\"bending\", \"twisting\"]ABSORBERS|\"modes\": \"bending\""
                + "|absorbers.modes: \"bending\" is not allowed; must be a list of texts",
        "ABSORBERS|, \"tuning\": \"uniform\""
                + "|absorbers.tuning: \"uniform\" is not allowed; leave it out with one absorber per mode",
        "ABSORBERS|, \"count\": 3|absorbers.count: 3 is not allowed; 2 with one absorber per mode",
        "ABSORBERS|, \"points\": [\"mid\"]|absorbers.points: 1 points is not allowed; two named points, one per mode",
        "ABSORBERS|, \"points\": [\"mid\", \"roof\"]|absorbers.points[1]: \"roof\" is not allowed; one of the points the"
                + " modes name: mid, edge, foot",
        "ABSORBERS|, \"point\": \"mid\", \"points\": [\"mid\", \"edge\"]|absorbers.point: \"mid\" with absorbers.points is"
                + " not allowed; one of them",
        "ABSORBERS|, \"target_mode\": \"sway\"|absorbers.target_mode: \"sway\" is not allowed; one of the modes of"
                + " absorbers.modes: bending, twisting",
        "\"one-per-mode\"|\"one-each\"|absorbers.arrangement: \"one-each\" is not allowed; one of one-mode, one-per-mode",
    })
    void badArrangementsAreRefusedNamingTheField(String from, String to, String message) {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> SeveralModes.layout(read(V7.replace(from, to).replace("ABSORBERS", ""))));
        assertTrue(e.getMessage().startsWith(message), e.getMessage());
    }

    @Test
    void aPointTheModeDoesNotMoveIsRefused() {
        String text = V7.replace("\"modes\": [\"bending\", \"twisting\"]ABSORBERS",
                "\"modes\": [\"bending\", \"sway\"], \"points\": [\"mid\", \"foot\"]");
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> SeveralModes.layout(read(text)));
        assertTrue(e.getMessage().startsWith("absorbers.points[1]: \"foot\" is not allowed; a point that mode sway moves"),
                e.getMessage());
    }

    @Test
    void listsOfAbsorbersOnOneModeAndOnePerModeOnASingleModeAreRefused() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> read(SeveralModesFileTest.V6_TWO_MODES
                .replace("\"point\": \"a\"", "\"point\": \"a\", \"points\": [\"a\", \"b\"]")));
        assertTrue(e.getMessage().startsWith("absorbers.points: given with all absorbers on one mode is not allowed"),
                e.getMessage());
        String single = """
                {"format_version": 7, "name": "Invented floor",
                 "structure": {"mass": {"value": 2000, "unit": "kg"}, "natural_frequency": {"value": 12, "unit": "Hz"}},
                 "disturbance": {"kind": "force", "amplitude": {"value": 150, "unit": "N"},
                                 "band": {"low": 10, "high": 14, "unit": "Hz"}},
                 "absorber": {"mass": {"value": 120, "unit": "kg"}},
                 "absorbers": {"arrangement": "one-per-mode", "modes": ["a", "b"]}}
                """;
        e = assertThrows(InvalidInputException.class, () -> SeveralModes.layout(read(single)));
        assertTrue(e.getMessage().startsWith("absorbers.arrangement: \"one-per-mode\" without structure.modes is not"
                + " allowed"), e.getMessage());
    }

    @Test
    void oneForcingFrequencyIsRefusedNamingIt() {
        String text = V7.replace("\"band\": {\"low\": 6, \"high\": 25, \"unit\": \"Hz\"}",
                "\"frequency\": {\"value\": 9, \"unit\": \"Hz\"}").replace("ABSORBERS", "");
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> SeveralModes.layout(read(text)));
        assertTrue(e.getMessage().startsWith("disturbance.frequency: one forcing frequency with absorbers.arrangement"
                + " \"one-per-mode\" is not allowed; a band of forcing frequencies"), e.getMessage());
    }

    /** A reader of format 6 refuses this file with its plain message; this reader refuses format 8 the same way. */
    @Test
    void aNewerFileIsRefusedPlainly() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> read(V7.replace("ABSORBERS", "").replace("\"format_version\": 7", "\"format_version\": 9")));
        assertEquals("format_version: 9 is not allowed; this file was written by a newer Counterpoise; this version"
                + " of Counterpoise reads format_version 1 to 8", e.getMessage());
    }
}
