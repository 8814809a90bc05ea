package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.optim.RobustSetOptimiser;
import org.counterpoise.core.optim.RobustSetOptimum;
import org.counterpoise.core.optim.RobustSetProblem;
import org.junit.jupiter.api.Test;

/**
 * {@code optimum --absorbers N --structure-range S [--absorber-range A]}: the core's robust set
 * printed exactly (the core is checked against the direct solve in RobustSetOptimiserTest), and
 * plain refusals.
 */
class RobustSetCliTest {

    @Test
    void theRobustSetIsPrintedAsTheCoreFindsIt() {
        CliTest.Run json = CliTest.run("optimum", "--mass-ratio", "0.05", "--structure-damping", "0.01", "--absorbers",
                "2", "--band", "0.7:1.3", "--structure-range", "0.05", "--absorber-range", "0.02", "--json");
        assertEquals(0, json.code(), json.err());
        JsonObject o = JsonParser.parseString(json.out()).getAsJsonArray().get(0).getAsJsonObject();
        RobustSetOptimum core = RobustSetOptimiser.optimise(new RobustSetProblem(new AbsorberSetProblem(2, 0.05, 0.01,
                0.7, 1.3, AbsorberSetTuning.UNIFORM), 0.05, 0.02, 0.01));
        assertEquals(core.worstPeak(), o.get("worst_peak").getAsDouble(), 0.0);
        assertEquals(core.nominalPeak(), o.get("nominal_peak").getAsDouble(), 0.0);
        assertEquals(core.leastPeak().peak(), o.get("least_peak_set_peak").getAsDouble(), 0.0);
        assertEquals(RobustSetOptimiser.worstCase(core.problem(), core.leastPeak().design()).peak(),
                o.get("least_peak_set_worst_peak").getAsDouble(), 0.0);
        assertTrue(o.get("worst_peak").getAsDouble() < o.get("least_peak_set_worst_peak").getAsDouble());
        JsonArray absorbers = o.getAsJsonArray("absorber");
        assertEquals(core.design().tuningRatios().get(1), absorbers.get(1).getAsJsonObject().get("tuning_ratio")
                .getAsDouble(), 0.0);
        assertEquals(0.02, o.get("absorber_frequency_range").getAsDouble(), 0.0);
        assertEquals("certified", o.get("status").getAsString());
        assertTrue(o.get("exchange_closed").getAsBoolean());

        CliTest.Run text = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "2", "--structure-range",
                "0.03");
        assertEquals(0, text.code(), text.err());
        assertTrue(text.out().contains("least worst peak over the structure's frequency within +/-3.000 %"), text.out());
        assertTrue(text.out().contains("certified: "), text.out());
        CliTest.Run csv = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "2", "--structure-range",
                "0.03", "--csv");
        assertEquals(0, csv.code(), csv.err());
        assertEquals(3, csv.out().strip().lines().count(), "a header and one line per absorber");
    }

    @Test
    void badRangesAreRefusedInPlainWords() {
        String[][] bad = {
            {"--structure-range", "0.7"},
            {"--structure-range", "-0.01"},
            {"--absorber-range", "0.02"},
            {"--structure-range", "0.05", "--absorber-range", "0.6"},
            {"--structure-range", "0.05", "--second-mode", "2"},
            {"--structure-range", "0.05", "--one-per-mode", "--second-mode", "2"},
        };
        String[] field = {"--structure-range", "--structure-range", "--structure-range", "--absorber-range",
            "--structure-range", "--structure-range"};
        for (int i = 0; i < bad.length; i++) {
            String[] args = new String[4 + bad[i].length];
            args[0] = "optimum";
            args[1] = "--mass-ratio";
            args[2] = "0.05";
            args[3] = "--absorbers=2";
            System.arraycopy(bad[i], 0, args, 4, bad[i].length);
            CliTest.Run r = CliTest.run(args);
            assertEquals(2, r.code(), String.join(" ", args) + ": " + r.err());
            assertTrue(r.err().startsWith("error: " + field[i] + ":"), r.err());
            assertFalse(r.err().contains("Exception"), r.err());
        }
    }
}
