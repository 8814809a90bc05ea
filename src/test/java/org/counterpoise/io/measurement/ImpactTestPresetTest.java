package org.counterpoise.io.measurement;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.identify.ModalFit;
import org.counterpoise.testing.SyntheticFrf;
import org.counterpoise.testing.SyntheticFrf.Mode;
import org.junit.jupiter.api.Test;

/**
 * The demo measurement presets/impact-test-floor-frf.csv is made here, from an invented floor
 * (a mode at 23 Hz with 2 % damping and 4200 kg modal mass, and one at 48 Hz, 2.5 %, 3000 kg, above
 * the file's band) with 1.5 % proportional noise of a fixed seed. The test checks that the shipped
 * file is exactly what this generator writes, and that the identification finds the invented mode.
 * To rewrite the file: {@code mvn -q test -Dtest=ImpactTestPresetTest -Dcounterpoise.preset.update=true}.
 */
class ImpactTestPresetTest {
    static final Path FILE = Path.of("presets", "impact-test-floor-frf.csv");
    static final Mode FLOOR = new Mode(23.0, 0.02, 4200.0);
    static final Mode ABOVE = new Mode(48.0, 0.025, 3000.0);

    static String generate() {
        MeasuredFrf frf = SyntheticFrf.of(FrfKind.ACCELERANCE, 10.0, 35.0, 201, 0.015, 2026L, FLOOR, ABOVE);
        Random coherence = new Random(7L);
        StringBuilder b = new StringBuilder();
        b.append("# INVENTED demo data, not a measurement: the accelerance of an invented office floor,\n")
                .append("# driving point at mid-span (hammer and accelerometer at the same point), made by\n")
                .append("# ImpactTestPresetTest from a mode at 23 Hz (damping 2 %, modal mass 4200 kg) and a mode\n")
                .append("# at 48 Hz above the band, with 1.5 % random noise of a fixed seed.\n")
                .append("# Values in m/s^2/N; read it with: identify presets/impact-test-floor-frf.csv --kind accelerance\n")
                .append("frequency_Hz,real,imag,coherence\n");
        for (int i = 0; i < frf.size(); i++) {
            b.append(String.format(Locale.ROOT, "%.4f,%.6e,%.6e,%.3f%n", frf.omega()[i] / (2.0 * Math.PI),
                    frf.real()[i], frf.imaginary()[i], 0.96 + 0.035 * coherence.nextDouble()));
        }
        return b.toString().replace(System.lineSeparator(), "\n");
    }

    @Test
    void theShippedFileIsWhatTheGeneratorWrites() throws IOException {
        if (Boolean.getBoolean("counterpoise.preset.update")) {
            Files.writeString(FILE, generate());
        }
        assertEquals(generate(), Files.readString(FILE));
    }

    @Test
    void theInventedFloorModeIsFound() {
        MeasuredFrf read = FrfCsv.read(FILE, FrfUnit.si(FrfKind.ACCELERANCE));
        assertEquals(201, read.size());
        IdentifiedMode m = ModalFit.fit(read, 1, true).modes().get(0);
        // with 1.5 % noise and residual terms: 0.05 % in frequency, 3 % in damping and mass (ModalFitTest)
        assertEquals(23.0, m.naturalFrequency() / (2.0 * Math.PI), 23.0 * 5e-4);
        assertEquals(0.02, m.dampingRatio(), 0.02 * 0.03);
        assertEquals(4200.0, m.modalMass(), 4200.0 * 0.03);
    }
}
