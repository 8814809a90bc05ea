package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import com.google.gson.stream.JsonReader;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import org.counterpoise.ui.cli.CliTest.Run;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code runup FILE}: options, the JSON keys and values, and plain messages for bad input. */
class RunUpCommandTest {
    private static final String FAN = "presets/rooftop-fan-platform.json";
    private static final String BLOWER = "presets/blower-frame-single-speed.json";

    private static JsonObject strictJson(String text) {
        // Strict parsing: NaN or Infinity would be refused here.
        JsonReader reader = new JsonReader(new StringReader(text));
        reader.setLenient(false);
        return JsonParser.parseReader(reader).getAsJsonObject();
    }

    @Test
    void jsonGivesBothSidesWithSiKeysAndShaftSpeeds() {
        Run r = CliTest.run("runup", FAN, "--rate", "20", "--json");
        assertEquals(0, r.code(), r.err());
        assertFalse(r.out().contains("NaN") || r.out().contains("Infinity"));
        JsonObject o = strictJson(r.out());
        assertEquals("run-up", o.get("direction").getAsString());
        assertEquals(20.0, o.get("rate_rpm_per_s").getAsDouble(), 1e-12);
        // Default final speed: 1.25 x the top of the band (900 rpm in the preset).
        assertEquals(1125.0, o.get("end_speed_rpm").getAsDouble(), 1e-9);
        assertEquals(1125.0 / 20.0, o.get("duration_s").getAsDouble(), 1e-9);
        JsonObject with = o.getAsJsonObject("with_absorber");
        JsonObject without = o.getAsJsonObject("without_absorber");
        for (String q : new String[] {"structure_displacement_m", "structure_velocity_m_per_s",
            "structure_acceleration_m_per_s2"}) {
            assertTrue(with.has("peak_" + q) && without.has("peak_" + q), q);
            assertTrue(with.has("steady_peak_" + q) && without.has("steady_peak_" + q), q);
        }
        assertTrue(with.has("peak_absorber_stroke_m") && with.has("peak_absorber_spring_force_N"));
        assertTrue(with.has("speed_at_peak_absorber_stroke_rpm") && with.has("time_at_peak_absorber_stroke_s"));
        assertFalse(without.has("peak_absorber_stroke_m"), "no stroke without an absorber");
        // Under an unbalance the bare structure's steady peak displacement sits at
        // omega1 / sqrt(1 - 2 zeta^2) (common practice), with the preset's 852.0 rpm and zeta = 0.02.
        double expected = 852.0 / Math.sqrt(1 - 2 * 0.02 * 0.02);
        assertEquals(expected, without.get("speed_at_steady_peak_structure_displacement_rpm").getAsDouble(), 0.1);
        // At 20 rpm/s the transit is slow: peaks within 6 % of the steady state, not above it by more than 1 %.
        double steady = without.get("steady_peak_structure_displacement_m").getAsDouble();
        double transit = without.get("peak_structure_displacement_m").getAsDouble();
        assertTrue(transit < 1.01 * steady && transit > 0.94 * steady, transit + " vs " + steady);
    }

    @Test
    void harmonicOrderTurnsForcingBackIntoShaftSpeedAndTheFileRateIsUsed(@TempDir Path dir) throws Exception {
        String preset = Files.readString(Path.of(BLOWER));
        String shipped = "\"run_up_rate\": {\"value\": 500, \"unit\": \"rpm/s\"}";
        assertTrue(preset.contains(shipped), "the preset states its rate");
        String text = preset.replace(shipped, "\"run_up_rate\": {\"value\": 100, \"unit\": \"rpm/s\"}");
        Path file = dir.resolve("blower.json");
        Files.writeString(file, text);
        Run r = CliTest.run("runup", file.toString(), "--json");
        assertEquals(0, r.code(), r.err());
        JsonObject o = strictJson(r.out());
        assertEquals(100.0, o.get("rate_rpm_per_s").getAsDouble(), 1e-9);
        assertEquals(1.25 * 1450, o.get("end_speed_rpm").getAsDouble(), 1e-9);
        // Forcing cycles = order x shaft revolutions = 4 x Omega^2 / (2 alpha) / (2 pi).
        double omega = 1.25 * 1450 * 2 * Math.PI / 60;
        double alpha = 100 * 2 * Math.PI / 60;
        assertEquals(4 * omega * omega / (2 * alpha) / (2 * Math.PI), o.get("forcing_cycles").getAsDouble(), 1e-6);
    }

    @Test
    void anUndampedStructureGivesNullAndUnboundedNeverInfinity(@TempDir Path dir) throws Exception {
        String text = Files.readString(Path.of(FAN));
        String undamped = text.replaceFirst("\"damping\": \\{[^}]*}", "\"damping\": {\"ratio\": 0}");
        assertTrue(!undamped.equals(text), "the preset's damping was replaced");
        Path file = dir.resolve("undamped.json");
        Files.writeString(file, undamped);
        Run r = CliTest.run("runup", file.toString(), "--rate", "30", "--json");
        assertEquals(0, r.code(), r.err());
        JsonObject without = strictJson(r.out()).getAsJsonObject("without_absorber");
        assertTrue(without.get("steady_peak_structure_displacement_m").isJsonNull());
        assertTrue(without.get("steady_peak_structure_displacement_m_unbounded").getAsBoolean());
        // The transit itself stays finite: the undamped passage peaks near 1.17 sqrt(pi/(2 eta)) times static.
        assertTrue(without.get("peak_structure_displacement_m").getAsDouble() > 0);
        Run text2 = CliTest.run("runup", file.toString(), "--rate", "30");
        assertTrue(text2.out().contains("unbounded (undamped resonance)"), text2.out());
    }

    @Test
    void runDownStartsFromSteadyRunning() {
        Run r = CliTest.run("runup", FAN, "--rate", "40", "--run-down", "--final-speed", "1000", "--json");
        assertEquals(0, r.code(), r.err());
        JsonObject o = strictJson(r.out());
        assertEquals("run-down", o.get("direction").getAsString());
        assertEquals(1000.0, o.get("start_speed_rpm").getAsDouble(), 1e-9);
        assertEquals(0.0, o.get("end_speed_rpm").getAsDouble(), 1e-9);
    }

    @Test
    void textReportIsAlignedInTwoColumns() {
        Run r = CliTest.run("runup", FAN, "--rate", "60");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("with absorber"), r.out());
        String stroke = r.out().lines().filter(l -> l.startsWith("  absorber stroke")).findFirst().orElseThrow();
        // Values start in column 41, as in the design report.
        assertEquals(' ', stroke.charAt(40), stroke);
        assertTrue(Character.isDigit(stroke.charAt(41)), stroke);
        assertFalse(r.out().contains("NaN") || r.out().contains("Infinity"));
    }

    @Test
    void badOptionsExitTwoAndNameTheOption() {
        Run missing = CliTest.run("runup", FAN);
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("--rate") && missing.err().contains("rpm/s"), missing.err());
        Run negative = CliTest.run("runup", FAN, "--rate", "-5");
        assertEquals(2, negative.code());
        assertTrue(negative.err().contains("--rate") && negative.err().contains("greater than 0"), negative.err());
        Run nan = CliTest.run("runup", FAN, "--rate", "NaN");
        assertEquals(2, nan.code());
        assertTrue(nan.err().contains("--rate"), nan.err());
        Run tooSlow = CliTest.run("runup", FAN, "--rate", "0.0001");
        assertEquals(2, tooSlow.code());
        assertTrue(tooSlow.err().contains("--rate") && tooSlow.err().contains("forcing cycles"), tooSlow.err());
        Run speed = CliTest.run("runup", FAN, "--rate", "20", "--final-speed", "0");
        assertEquals(2, speed.code());
        assertTrue(speed.err().contains("--final-speed"), speed.err());
        for (Run r : new Run[] {missing, negative, nan, tooSlow, speed}) {
            assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), r.err());
        }
    }

    @Test
    void plotsWritesTheEnvelopeChartsAsASetAndKeepsJsonClean(@TempDir Path dir) throws Exception {
        Path plots = dir.resolve("charts");
        Run r = CliTest.run("runup", FAN, "--rate", "200", "--json", "--plots", plots.toString());
        assertEquals(0, r.code(), r.err());
        strictJson(r.out()); // stdout stays one JSON object
        for (String name : new String[] {"runup-response", "runup-stroke"}) {
            byte[] png = Files.readAllBytes(plots.resolve(name + ".png"));
            assertEquals((byte) 0x89, png[0], name + " is a PNG");
            assertEquals('P', png[1]);
            assertTrue(Files.readString(plots.resolve(name + ".svg")).contains("<svg"), name + " is an SVG");
        }
        Run again = CliTest.run("runup", FAN, "--rate", "200", "--plots", plots.toString());
        assertEquals(2, again.code());
        assertTrue(again.err().contains("--plots") && again.err().contains("already exists"), again.err());
        Run forced = CliTest.run("runup", FAN, "--rate", "200", "--plots", plots.toString(), "--force");
        assertEquals(0, forced.code(), forced.err());
        assertTrue(forced.out().contains("wrote " + plots.resolve("runup-stroke.svg")), forced.out());
    }
}
