package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.OptionalDouble;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.preset.Presets;
import org.junit.jupiter.api.Test;

/** structure.measured (format 5): where a structure identified from a measurement came from. */
class MeasuredSourceFileTest {
    private static final Project FAN = Presets.defaultProject().project();
    private static final MeasuredSource SOURCE = new MeasuredSource("least_squares", "floor impact.csv", "2026-12-04",
            OptionalDouble.of(0.0123), new QuantityInput(0.0011, Unit.HERTZ), OptionalDouble.of(0.0002),
            new QuantityInput(33.0, Unit.KILOGRAM));

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
        assertTrue(json.contains("\"format_version\": 5") || json.contains("\"format_version\":5"), json);
        Project back = read(json);
        assertEquals(SOURCE, back.structure().measured());
        assertEquals(p, back);
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
        assertNull(s.modalMassSd());
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
        InvalidInputException unit = assertThrows(InvalidInputException.class, () -> read(withMeasured(
                "{\"method\": \"least_squares\", \"modal_mass_sd\": {\"value\": 3, \"unit\": \"Hz\"}}")));
        assertTrue(unit.getMessage().startsWith("structure.measured.modal_mass_sd.unit"), unit.getMessage());
    }
}
