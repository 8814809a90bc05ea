package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.EddyCurrentChoice;
import org.counterpoise.core.realisation.ElastomerChoice;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.SpringKind;
import org.counterpoise.core.realisation.SpringMaterial;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.text.DesignContent;
import org.counterpoise.io.text.DesignReport;
import org.counterpoise.io.text.HardwareContent;
import org.counterpoise.io.text.ReportContent;
import org.counterpoise.io.text.ReportTable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code design} and {@code design --json} with the realisation, for every preset: the hardware
 * object is there with its parts; the procedure's absorber target is the tuning ratio times the
 * structure frequency, recomputed here from the JSON's own structure mass and stiffness
 * (omega = sqrt(k/m)); and nothing anywhere is NaN or Infinity, for every spring and damper kind.
 */
class DesignHardwareTest {
    static Stream<String> presets() throws IOException {
        return Files.readAllLines(Path.of("presets", "index.txt")).stream().map(String::strip)
                .filter(l -> !l.isEmpty() && !l.startsWith("#"));
    }

    private static final List<HardwareChoice> CHOICES = List.of(HardwareChoice.DEFAULT,
            new HardwareChoice(SpringKind.HELICAL_COMPRESSION, SpringMaterial.EN10270_3_1_4310, 0,
                    DamperKind.EDDY_CURRENT, EddyCurrentChoice.DEFAULT, ElastomerChoice.DEFAULT, 50_000, 0.01, 0.01),
            new HardwareChoice(SpringKind.ELASTOMER, SpringMaterial.EN10270_1_DH, 0, DamperKind.ELASTOMER_LOSS,
                    EddyCurrentChoice.DEFAULT, ElastomerChoice.DEFAULT, 50_000, 0.01, 0.01));

    @ParameterizedTest(name = "{0}")
    @MethodSource("presets")
    void jsonHasTheHardwareAndTheTargetIsTheDesignFrequencyOverTheStructuresTolerance(String preset) {
        CliTest.Run r = CliTest.run("design", "--json", Path.of("presets", preset).toString());
        assertEquals(0, r.code(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        JsonObject hw = o.getAsJsonObject("hardware");
        // each preset names its own hardware (format 4); the JSON says the kind the project chose
        HardwareChoice chosen = ProjectReader.read(Path.of("presets", preset)).project().hardware();
        assertEquals(chosen.damperKind().id(), hw.getAsJsonObject("damper").get("kind").getAsString());
        boolean elastomer = chosen.springKind() == SpringKind.ELASTOMER;
        if (!elastomer) {
            // a dashpot or an eddy-current plate realises the design's own coefficient
            assertEquals(o.get("absorber_damping_Ns_per_m").getAsDouble(),
                    hw.getAsJsonObject("damper").get("coefficient_Ns_per_m").getAsDouble());
        }
        assertEquals(o.get("absorber_mass_kg").getAsDouble(), hw.get("absorber_mass_kg").getAsDouble());
        assertFalse(hw.getAsJsonArray("checks").isEmpty());
        assertFalse(hw.getAsJsonArray("predicted").isEmpty());
        JsonArray steps = hw.getAsJsonArray("procedure");
        assertEquals(7, steps.size());
        double omega = Math.sqrt(o.get("structure_stiffness_N_per_m").getAsDouble()
                / o.get("structure_mass_kg").getAsDouble());
        double expectedHz = omega / (2 * Math.PI);
        JsonObject first = steps.get(0).getAsJsonObject().getAsJsonObject("figures");
        assertEquals(expectedHz, first.get("expected_structure_frequency_Hz").getAsDouble(), 1e-9 * expectedHz);
        JsonObject compute = steps.get(1).getAsJsonObject();
        assertEquals("compute-absorber-target", compute.get("step").getAsString());
        // an elastomer element is tuned to the hysteretic optimum's ratio, a spring to the design's
        double f = elastomer ? hw.getAsJsonObject("elastomer").get("hysteretic_tuning_ratio").getAsDouble()
                : o.get("tuning_ratio").getAsDouble();
        JsonObject figures = compute.getAsJsonObject("figures");
        assertEquals(f * expectedHz, figures.get("absorber_target_frequency_Hz").getAsDouble(), 1e-9 * expectedHz);
        // the range the design holds: its tolerated structure factors (an end beyond the 30 % searched at 30 %)
        double low = o.get("tolerated_structure_frequency_factor_low").isJsonNull() ? 0.7
                : o.get("tolerated_structure_frequency_factor_low").getAsDouble();
        double high = o.get("tolerated_structure_frequency_factor_high").isJsonNull() ? 1.3
                : o.get("tolerated_structure_frequency_factor_high").getAsDouble();
        assertEquals(low * expectedHz, figures.get("structure_frequency_low_Hz").getAsDouble(), 1e-9 * expectedHz);
        assertEquals(high * expectedHz, figures.get("structure_frequency_high_Hz").getAsDouble(), 1e-9 * expectedHz);
        // and the text says the same target in Hz
        CliTest.Run text = CliTest.run("design", Path.of("presets", preset).toString());
        assertTrue(text.out().contains("\nTuning and commissioning\n  1. Measure"), text.out());
        assertTrue(text.out().contains("\nPart list\n"), text.out());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("presets")
    void noNotANumberOrInfinityForAnyHardware(String preset) {
        Project p = ProjectReader.read(Path.of("presets", preset)).project();
        for (HardwareChoice choice : CHOICES) {
            DesignDossier dossier = DesignDossier.of(p.withHardware(choice).toStudy());
            ReportContent c = HardwareContent.with(DesignContent.of(dossier.design(), ProjectIdentity.EMPTY,
                    Optional.empty()), dossier, choice);
            StringBuilder all = new StringBuilder(DesignReport.render(c));
            String json = ResultJson.toJson(c);
            all.append(json);
            for (ReportTable.Section s : ReportTable.of(c, Set.of())) {
                s.rows().forEach(row -> all.append(row.value()).append(row.unit()).append('\n'));
            }
            for (String bad : List.of("NaN", "Infinity", "\nnot available", " not available\n", "not available /",
                    "/ not available")) {
                assertFalse(all.toString().contains(bad), preset + " " + choice.damperKind() + ": " + bad);
            }
            JsonObject hw = JsonParser.parseString(json).getAsJsonObject().getAsJsonObject("hardware");
            assertEquals(choice.damperKind().id(), hw.getAsJsonObject("damper").get("kind").getAsString());
            assertEquals(choice.damperKind() == DamperKind.EDDY_CURRENT,
                    hw.getAsJsonObject("damper").get("eddy_current").isJsonObject(), preset);
            for (JsonElement check : hw.getAsJsonArray("checks")) {
                JsonObject k = check.getAsJsonObject();
                assertEquals(k.get("demand").getAsDouble() <= k.get("capacity").getAsDouble(),
                        k.get("passes").getAsBoolean(), preset + " " + k);
                assertEquals(k.get("demand").getAsDouble() / k.get("capacity").getAsDouble(),
                        k.get("utilisation").getAsDouble(), 1e-12, preset + " " + k);
            }
        }
    }
}
