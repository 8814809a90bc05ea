package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Unit;
import org.junit.jupiter.api.Test;

/** The optional {@code disturbance.run_up_rate}: read with its unit, written back, absent in old files. */
class RunUpRateFileTest {
    private static String withRate(String rate) throws Exception {
        return Files.readString(Path.of("presets/rooftop-fan-platform.json")).replace("\"harmonic_order\": 1",
                "\"harmonic_order\": 1,\n    \"run_up_rate\": " + rate);
    }

    @Test
    void oldFilesHaveNoRate() {
        Project p = ProjectReader.read(Path.of("presets/rooftop-fan-platform.json")).project();
        assertTrue(p.runUpRate().isEmpty());
    }

    @Test
    void rateIsReadInItsUnitAndSurvivesARoundTrip() throws Exception {
        LoadedProject loaded = ProjectReader.read(new StringReader(withRate("{\"value\": 30, \"unit\": \"RPM/s\"}")));
        assertTrue(loaded.unknownFields().isEmpty(), loaded.unknownFields().toString());
        // 30 rpm/s = 30 * 2 pi / 60 rad/s^2 (definition of the rpm).
        assertEquals(30 * 2 * Math.PI / 60, loaded.project().runUpRate().getAsDouble(), 1e-12);
        Project again = ProjectReader.read(new StringReader(ProjectWriter.toJson(loaded.project()))).project();
        assertEquals(Unit.RPM_PER_SECOND, again.disturbance().runUpRate().unit());
        assertEquals(30.0, again.disturbance().runUpRate().value(), 0.0);
        Project hz = ProjectReader.read(new StringReader(withRate("{\"value\": 0.5, \"unit\": \"Hz/s\"}"))).project();
        assertEquals(0.5 * 2 * Math.PI, hz.runUpRate().getAsDouble(), 1e-12);
    }

    @Test
    void aWrongUnitOrValueNamesTheField() throws Exception {
        InvalidInputException unit = assertThrows(InvalidInputException.class,
                () -> ProjectReader.read(new StringReader(withRate("{\"value\": 30, \"unit\": \"rpm\"}"))));
        assertTrue(unit.getMessage().contains("run_up_rate") && unit.getMessage().contains("rpm/s"), unit.getMessage());
        Project p = ProjectReader.read(new StringReader(withRate("{\"value\": -3, \"unit\": \"rpm/s\"}"))).project();
        InvalidInputException value = assertThrows(InvalidInputException.class, p::runUpRate);
        assertEquals("disturbance.run_up_rate.value", value.field());
    }
}
