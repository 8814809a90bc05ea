package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.util.Optional;
import org.counterpoise.core.optim.JointAbsorberOptimiser;
import org.counterpoise.core.optim.JointAbsorberOptimum;
import org.counterpoise.core.optim.JointAbsorberProblem;
import org.junit.jupiter.api.Test;

/** {@code optimum --second-mode R --one-per-mode}: output equal to the core's optimum, and plain refusals. */
class JointAbsorberCliTest {

    @Test
    void onePerModePrintsTheCoresJointAndSequentialDesigns() {
        CliTest.Run json = CliTest.run("optimum", "--mass-ratio", "0.05", "--structure-damping", "0.01", "--second-mode",
                "3", "--second-mode-mass", "0.1", "--one-per-mode", "--json");
        assertEquals(0, json.code(), json.err());
        JsonObject o = JsonParser.parseString(json.out()).getAsJsonArray().get(0).getAsJsonObject();
        JointAbsorberOptimum core = JointAbsorberOptimiser.optimise(new JointAbsorberProblem(0.05, 0.01, 3.0, 0.1, 1.0,
                0.0, Double.POSITIVE_INFINITY));
        assertEquals(core.peak(), o.get("peak").getAsDouble(), 0.0, "the core's optimum, printed exactly");
        assertEquals(core.sequentialPeak(), o.get("sequential_peak").getAsDouble(), 0.0);
        assertEquals(core.sequentialPeak() / core.peak(), o.get("gain").getAsDouble(), 0.0);
        JsonArray absorbers = o.getAsJsonArray("absorber");
        assertEquals(2, absorbers.size());
        JsonObject second = absorbers.get(1).getAsJsonObject();
        assertEquals(core.design().tuningRatios().get(1), second.get("tuning_ratio").getAsDouble(), 0.0);
        assertEquals(core.design().tuningRatios().get(1) / 3.0, second.get("own_tuning_ratio").getAsDouble(), 1e-15);
        // the split rule: mu_j proportional to the modal mass seen at the point, 1 and 0.1
        assertEquals(0.05 * 0.1 / 1.1, second.get("mass_ratio").getAsDouble(), 1e-15);
        assertEquals(core.certificate().certified() ? "certified" : "not found", o.get("status").getAsString());
        assertFalse(json.out().contains("Infinity"), json.out());

        CliTest.Run text = CliTest.run("optimum", "--mass-ratio", "0.05", "--structure-damping", "0.01",
                "--second-mode", "2.5", "--one-per-mode");
        assertEquals(0, text.code(), text.err());
        assertTrue(text.out().contains("one absorber per mode, designed jointly"), text.out());
        assertTrue(text.out().contains("sequential, each absorber designed on its mode alone"), text.out());

        CliTest.Run csv = CliTest.run("optimum", "--mass-ratio", "0.05", "--second-mode", "2.5", "--one-per-mode",
                "--csv");
        assertEquals(0, csv.code(), csv.err());
        assertEquals(3, csv.out().strip().lines().count(), "a header and one line per absorber");
    }

    @Test
    void aSecondPointTakesTheAbsorberOfTheModeThatMovesItMost() {
        CliTest.Run json = CliTest.run("optimum", "--mass-ratio", "0.05", "--structure-damping", "0.01", "--second-mode",
                "2.5", "--second-mode-shape", "0.3", "--second-point", "0.5:1", "--one-per-mode", "--json");
        assertEquals(0, json.code(), json.err());
        JsonObject o = JsonParser.parseString(json.out()).getAsJsonArray().get(0).getAsJsonObject();
        JointAbsorberOptimum core = JointAbsorberOptimiser.optimise(new JointAbsorberProblem(0.05, 0.01, 2.5, 1.0, 0.3,
                0.0, Double.POSITIVE_INFINITY, Optional.of(new JointAbsorberProblem.OtherPoint(0.5, 1.0))));
        assertEquals(core.peak(), o.get("peak").getAsDouble(), 0.0);
        JsonArray absorbers = o.getAsJsonArray("absorber");
        assertEquals("first_point", absorbers.get(0).getAsJsonObject().get("point").getAsString());
        assertEquals("second_point", absorbers.get(1).getAsJsonObject().get("point").getAsString());
    }

    @Test
    void badInputIsRefusedInPlainWords() {
        String[][] cases = {
            {"--second-mode", "1", "--one-per-mode"},
            {"--one-per-mode"},
            {"--second-mode", "2", "--one-per-mode", "--second-mode-shape", "0"},
            {"--second-mode", "2", "--one-per-mode", "--second-mode-mass", "-1"},
            {"--second-mode", "2", "--second-mode-mass", "2"},
            {"--second-mode", "2", "--one-per-mode", "--absorbers", "3"},
            {"--second-mode", "2", "--one-per-mode", "--tuning", "uniform"},
            {"--second-mode", "2", "--one-per-mode", "--second-point", "1"},
            {"--second-mode", "2", "--one-per-mode", "--second-point", "1:x"},
            {"--second-mode", "2", "--second-point", "1:2"},
        };
        String[] fields = {"--second-mode", "--second-mode", "--second-mode-shape", "--second-mode-mass",
            "--second-mode-mass", "--absorbers", "--tuning", "--second-point", "--second-point", "--second-point"};
        for (int i = 0; i < cases.length; i++) {
            String[] args = new String[cases[i].length + 3];
            args[0] = "optimum";
            args[1] = "--mass-ratio";
            args[2] = "0.05";
            System.arraycopy(cases[i], 0, args, 3, cases[i].length);
            CliTest.Run r = CliTest.run(args);
            assertEquals(Cli.BAD_INPUT, r.code(), String.join(" ", args));
            assertTrue(r.err().startsWith("error: " + fields[i] + ":"), r.err());
            assertFalse(r.err().contains("Exception") || r.err().contains("NaN"), r.err());
        }
    }
}
