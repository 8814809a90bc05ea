package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.time.Duration;
import org.counterpoise.core.optim.AbsorberSetOptimiser;
import org.counterpoise.core.optim.AbsorberSetOptimum;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.tuning.NishiharaAsamiExact;
import org.junit.jupiter.api.Test;

/** {@code optimum --absorbers N}: output equal to the core's optimum, and plain refusals. */
class AbsorberSetCliTest {

    @Test
    void severalAbsorbersPrintEachAbsorbersTuningAndTheCertificate() {
        CliTest.Run text = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "2");
        assertEquals(0, text.code(), text.err());
        assertTrue(text.out().contains("2 absorbers, uniform tuning"), text.out());
        assertTrue(text.out().contains("certified"), text.out());

        CliTest.Run json = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "2", "--tuning", "individual",
                "--json");
        assertEquals(0, json.code(), json.err());
        JsonObject o = JsonParser.parseString(json.out()).getAsJsonArray().get(0).getAsJsonObject();
        AbsorberSetOptimum core = AbsorberSetOptimiser.optimise(AbsorberSetProblem.allFrequencies(2, 0.05, 0.0,
                AbsorberSetTuning.INDIVIDUAL));
        assertEquals(core.peak(), o.get("peak").getAsDouble(), 0.0, "the core's optimum, printed exactly");
        JsonArray absorbers = o.getAsJsonArray("absorber");
        assertEquals(2, absorbers.size());
        assertEquals(core.design().tuningRatios().get(1), absorbers.get(1).getAsJsonObject().get("tuning_ratio")
                .getAsDouble(), 0.0);
        assertEquals("certified", o.get("status").getAsString());
        // Nishihara and Asami (2002): the exact single-absorber optimum peak of the same total mass.
        assertEquals(NishiharaAsamiExact.optimumPeak(0.05), o.get("single_absorber_peak").getAsDouble(),
                1e-9 * o.get("single_absorber_peak").getAsDouble());
        assertTrue(o.get("peak").getAsDouble() < o.get("single_absorber_peak").getAsDouble());

        CliTest.Run csv = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "3", "--csv");
        assertEquals(0, csv.code(), csv.err());
        assertEquals(4, csv.out().strip().lines().count(), "a header and one line per absorber");
    }

    @Test
    void aSecondModeReportsTheSpilloverWithoutInfinityInJson() {
        CliTest.Run json = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "2", "--second-mode", "2.5",
                "--json");
        assertEquals(0, json.code(), json.err());
        JsonArray modes = JsonParser.parseString(json.out()).getAsJsonArray().get(0).getAsJsonObject()
                .getAsJsonObject("spillover").getAsJsonArray("modes");
        assertEquals(2, modes.size());
        // undamped structure: both bare peaks are unbounded, written as null with a flag
        assertTrue(modes.get(0).getAsJsonObject().get("peak_without_absorbers").isJsonNull());
        assertTrue(modes.get(0).getAsJsonObject().get("peak_without_absorbers_unbounded").getAsBoolean());
        assertFalse(json.out().contains("Infinity"), json.out());
        CliTest.Run text = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "2", "--second-mode", "2.5",
                "--structure-damping", "0.01");
        assertEquals(0, text.code(), text.err());
        assertTrue(text.out().contains("spillover"), text.out());
    }

    @Test
    void threeIndividualAbsorbersWithASecondModeFinish() {
        // the example of docs/several-modes.md once never returned: Commons Math's pole search allowed
        // unlimited Laguerre steps on a degree-14 denominator; the guard is against a hang, not a speed figure
        CliTest.Run r = assertTimeoutPreemptively(Duration.ofMinutes(2), () -> CliTest.run("optimum", "--mass-ratio",
                "0.05", "--absorbers", "3", "--tuning", "individual", "--second-mode", "2.5", "--structure-damping",
                "0.01"));
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("certified: "), r.out());
        // three absorbers of the same total mass do better than one: the order the optimiser guarantees
        assertTrue(r.out().contains("one absorber of the same total mass"), r.out());
    }

    @Test
    void optionsSeveralAbsorbersDoNotTakeAreRefusedByName() {
        CliTest.Run r = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "2", "--excitation", "unbalance");
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().contains("--excitation"), r.err());
        r = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "0");
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().contains("--absorbers"), r.err());
        r = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "2", "--tuning", "spread");
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().contains("uniform or individual"), r.err());
        r = CliTest.run("optimum", "--mass-ratio", "0.05", "--absorbers", "2", "--second-mode", "0.5");
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().contains("--second-mode"), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
    }
}
