package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.counterpoise.ui.cli.CliTest.Run;
import org.junit.jupiter.api.Test;

/**
 * {@code --convention} on the commands that print response values: it overrides the project's
 * display convention, r.m.s. is the peak over sqrt 2 (definition for one steady harmonic), and a
 * wrong word gets a plain message. Presets are invented scenarios.
 */
class ConventionOptionTest {
    private static final String PUMP = "presets/pump-skid-mezzanine.json";

    @Test
    void theOptionOverridesTheProjectsDisplayConvention() {
        // the preset states r.m.s. for display; the option asks for peak-to-peak
        JsonObject byProject = JsonParser.parseString(CliTest.run("design", PUMP, "--json").out()).getAsJsonObject();
        assertEquals("rms", byProject.get("amplitude_convention").getAsString());
        Run r = CliTest.run("design", PUMP, "--json", "--convention", "peak-to-peak");
        assertEquals(0, r.code(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        assertEquals("peak-to-peak", o.get("amplitude_convention").getAsString());
        double peak = o.get("peak_velocity_after_m_per_s").getAsDouble();
        assertEquals(2 * peak, o.get("peak_to_peak_velocity_after_m_per_s").getAsDouble(), 1e-15 * peak);
        assertFalse(o.has("rms_velocity_after_m_per_s"));
        assertEquals(peak / Math.sqrt(2), byProject.get("rms_velocity_after_m_per_s").getAsDouble(), 1e-15 * peak);
    }

    @Test
    void theTextReportAndTheRobustnessStudySayTheirConvention() {
        Run design = CliTest.run("design", PUMP, "--convention", "peak");
        assertEquals(0, design.code(), design.err());
        assertTrue(design.out().contains("structure displacement (peak)"), design.out());
        assertTrue(design.out().contains("absorber stroke in band (peak)"));
        Run robust = CliTest.run("robustness", PUMP, "--json", "--convention", "rms", "--samples", "200");
        assertEquals(0, robust.code(), robust.err());
        JsonObject o = JsonParser.parseString(robust.out()).getAsJsonObject();
        double nominal = o.get("nominal_peak").getAsDouble();
        assertEquals(nominal / Math.sqrt(2), o.get("nominal_rms").getAsDouble(), 1e-15 * nominal);
    }

    @Test
    void aWrongWordGetsAPlainMessage() {
        Run r = CliTest.run("design", PUMP, "--convention", "average");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--convention") && r.err().contains("peak, rms, peak-to-peak"), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
    }
}
