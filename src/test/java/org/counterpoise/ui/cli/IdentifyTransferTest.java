package org.counterpoise.ui.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.testing.SyntheticFrf;
import org.counterpoise.testing.SyntheticFrf.Mode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * identify --transfer: the mode shape at the absorber's point from a driving-point and a transfer FRF.
 * Synthetic files: a mode of generalised mass M = 4200 kg with shape 1 at the measured point and 0.6
 * at the absorber's, so the driving point sees M and the transfer M / 0.6 (modal constant
 * phi_j phi_k / M; Ewins 2000, Modal Testing, 2nd ed., sec. 2.6); the absorber's point sees
 * M / 0.6^2 = 11 666.7 kg (by hand).
 */
class IdentifyTransferTest {

    private static Path csv(Path dir, String name, MeasuredFrf frf) throws IOException {
        StringBuilder b = new StringBuilder("frequency_Hz,real,imag\n");
        for (int i = 0; i < frf.size(); i++) {
            b.append(String.format(Locale.ROOT, "%.6f,%.9e,%.9e%n", frf.omega()[i] / (2 * Math.PI), frf.real()[i],
                    frf.imaginary()[i]));
        }
        Path p = dir.resolve(name);
        Files.writeString(p, b.toString());
        return p;
    }

    @Test
    void theShapeRatioAndTheMassAtTheAbsorbersPoint(@TempDir Path dir) throws Exception {
        Path driving = csv(dir, "driving.csv", SyntheticFrf.of(FrfKind.ACCELERANCE, 15, 31, 161, 0.0, 1,
                new Mode(23.0, 0.02, 4200.0)));
        Path transfer = csv(dir, "transfer.csv", SyntheticFrf.of(FrfKind.ACCELERANCE, 15, 31, 161, 0.0, 2,
                new Mode(23.0, 0.02, 4200.0 / 0.6)));
        CliTest.Run json = CliTest.run("identify", driving.toString(), "--transfer", transfer.toString(), "--json");
        assertEquals(0, json.code(), json.err());
        JsonObject t = JsonParser.parseString(json.out()).getAsJsonObject().getAsJsonObject("transfer");
        // the files hold 10 significant figures, so the ratio comes back to about 1e-8
        assertEquals(0.6, t.get("shape_ratio").getAsDouble(), 1e-6);
        assertEquals(4200.0 / 0.36, t.get("modal_mass_at_transfer_point_kg").getAsDouble(), 1e-3);
        assertEquals(23.0, t.get("transfer_frequency_Hz").getAsDouble(), 1e-6);

        CliTest.Run text = CliTest.run("identify", driving.toString(), "--transfer", transfer.toString());
        assertTrue(text.out().matches("(?s).*shape ratio phi_A/phi_P +0.6000.*"), text.out());

        Path project = dir.resolve("project.json");
        Files.copy(Path.of("presets/pump-skid-mezzanine.json"), project);
        CliTest.Run write = CliTest.run("identify", driving.toString(), "--transfer", transfer.toString(),
                "--write-structure", project.toString());
        assertEquals(0, write.code(), write.err());
        assertEquals(11667.0, ProjectReader.read(project).project().toStructure().effectiveMass(), 1e-9,
                "the absorber's point sees M / 0.6^2 = 11666.67, written to 5 significant figures: 11667");
    }

    @Test
    void aTransferWithoutTheModeIsRefusedByName(@TempDir Path dir) throws Exception {
        Path driving = csv(dir, "driving.csv", SyntheticFrf.of(FrfKind.ACCELERANCE, 15, 35, 161, 0.0, 1,
                new Mode(23.0, 0.02, 4200.0)));
        Path transfer = csv(dir, "other.csv", SyntheticFrf.of(FrfKind.ACCELERANCE, 15, 35, 161, 0.0, 2,
                new Mode(30.0, 0.02, 4200.0)));
        CliTest.Run r = CliTest.run("identify", driving.toString(), "--transfer", transfer.toString());
        assertEquals(Cli.BAD_INPUT, r.code());
        assertTrue(r.err().contains("--transfer") && r.err().contains("within 2 %"), r.err());
        assertTrue(!r.err().contains("Exception"), r.err());
    }
}
