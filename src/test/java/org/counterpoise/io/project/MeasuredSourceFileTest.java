package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.OptionalDouble;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.preset.Presets;
import org.junit.jupiter.api.Test;

/** structure.measured (format 5): where a structure identified from a measurement came from. */
class MeasuredSourceFileTest {
    private static final Project FAN = Presets.defaultProject().project();
    private static final MeasuredSource SOURCE = new MeasuredSource("least_squares", "floor impact.csv", "2026-12-04",
            OptionalDouble.of(0.0123), OptionalDouble.of(2 * Math.PI * 0.0011), OptionalDouble.of(0.0002),
            OptionalDouble.of(33.0));

    private static Project read(String text) {
        return ProjectReader.read(new StringReader(text)).project();
    }

    private static String withMeasured(String measured) {
        return ProjectWriter.toJson(FAN).replaceFirst("\"structure\":\\s*\\{", "\"structure\": {\"measured\": "
                + measured + ",");
    }

    @Test
    void aMeasuredStructureIsWrittenAndReadBackUnchanged() {
        Project p = FAN.withStructure(FAN.structure().withMeasured(SOURCE));
        String json = ProjectWriter.toJson(p);
        assertTrue(json.contains("\"format_version\": " + Project.FORMAT_VERSION), json);
        Project back = read(json);
        assertEquals(SOURCE.naturalFrequencySd().getAsDouble(), back.structure().measured().naturalFrequencySd()
                .getAsDouble(), 1e-15, "written in Hz, read back in rad/s");
        assertEquals(SOURCE.modalMassSd(), back.structure().measured().modalMassSd());
        assertEquals(SOURCE.normalisedResidual(), back.structure().measured().normalisedResidual());
    }

    @Test
    void theUncertaintiesOfAnExactFitReadBack() {
        // an exact fit gives uncertainties far below any plausible frequency or mass: the file keeps them
        // as plain numbers so that a file this version writes always reopens
        MeasuredSource exact = new MeasuredSource("least_squares", "", "", OptionalDouble.of(1e-15),
                OptionalDouble.of(2.6e-11), OptionalDouble.of(1e-14), OptionalDouble.of(3e-9));
        Project back = read(ProjectWriter.toJson(FAN.withStructure(FAN.structure().withMeasured(exact))));
        assertEquals(3e-9, back.structure().measured().modalMassSd().getAsDouble(), 0.0);
        assertEquals(2.6e-11, back.structure().measured().naturalFrequencySd().getAsDouble(), 1e-25);
    }

    @Test
    void aFileOfAnOlderFormatHasATypedStructure() {
        for (int version = Project.OLDEST_FORMAT_VERSION; version < Project.FORMAT_VERSION; version++) {
            String older = ProjectWriter.toJson(FAN).replaceFirst("\"format_version\":\\s*\\d",
                    "\"format_version\": " + version);
            assertNull(read(older).structure().measured(), "format " + version);
        }
    }

    @Test
    void onlyTheMethodIsRequired() {
        MeasuredSource s = read(withMeasured("{\"method\": \"log_decrement\"}")).structure().measured();
        assertEquals("log_decrement", s.method());
        assertEquals("", s.file());
        assertEquals(OptionalDouble.empty(), s.normalisedResidual());
        assertEquals(OptionalDouble.empty(), s.modalMassSd());
    }

    @Test
    void badEntriesAreNamedWithWhatIsAllowed() {
        InvalidInputException residual = assertThrows(InvalidInputException.class,
                () -> read(withMeasured("{\"method\": \"least_squares\", \"normalised_residual\": -0.1}")));
        assertEquals("structure.measured.normalised_residual: -0.1 is not allowed; a number 0 or more",
                residual.getMessage());
        InvalidInputException date = assertThrows(InvalidInputException.class,
                () -> read(withMeasured("{\"method\": \"least_squares\", \"date\": \"4 Dec\"}")));
        assertTrue(date.getMessage().startsWith("structure.measured.date"), date.getMessage());
        InvalidInputException sd = assertThrows(InvalidInputException.class, () -> read(withMeasured(
                "{\"method\": \"least_squares\", \"modal_mass_sd_kg\": -3}")));
        assertEquals("structure.measured.modal_mass_sd_kg: -3 is not allowed; a number 0 or more", sd.getMessage());
    }
}
