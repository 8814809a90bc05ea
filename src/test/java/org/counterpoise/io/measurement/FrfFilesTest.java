package org.counterpoise.io.measurement;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.MeasuredFrf;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Units of FRF values and the CSV layouts people export. */
class FrfFilesTest {
    @Test
    void unitsScaleToSi() {
        // g is standard gravity, 9.80665 m/s^2 (ISO 80000-3; CGPM 1901)
        assertEquals(9.80665, FrfUnit.parse("g/N", FrfKind.ACCELERANCE, "--units").toSi(), 1e-12);
        // 1 in/s/lbf = 0.0254 / 4.4482216152605 m/s/N (exact definitions of the inch and the pound-force)
        assertEquals(0.0254 / 4.4482216152605, FrfUnit.parse("in/s/lbf", FrfKind.MOBILITY, "--units").toSi(),
                1e-15);
        assertEquals(1e-3, FrfUnit.parse("mm/N", FrfKind.RECEPTANCE, "--units").toSi(), 1e-18);
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> FrfUnit.parse("m/N", FrfKind.MOBILITY, "--units"));
        assertEquals("--units", e.field());
        assertTrue(e.allowed().contains("m/s/N"), e.allowed());
    }

    @Test
    void quotedHeadersTabsAndMagnitudePhaseAreRead(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("export.txt");
        StringBuilder b = new StringBuilder("\"Frequency (Hz)\"\t\"Magnitude\"\t\"Phase (deg)\"\n");
        for (int i = 0; i < 6; i++) {
            b.append(10 + i).append("\t2,5\t180\n");
        }
        Files.writeString(file, b.toString());
        MeasuredFrf frf = FrfCsv.read(file, FrfUnit.si(FrfKind.ACCELERANCE));
        assertEquals(6, frf.size());
        assertEquals(2 * Math.PI * 10, frf.omega()[0], 1e-12);
        assertEquals(-2.5, frf.real()[0], 1e-12); // 2.5 at 180 degrees
        assertEquals(0.0, frf.imaginary()[0], 1e-12);
    }

    @Test
    void coherenceOutsideZeroToOneAndShortFilesAreRefused(@TempDir Path dir) throws Exception {
        Path coh = dir.resolve("coh.csv");
        Files.writeString(coh, "f,re,im,coherence\n10,1,0,0.9\n11,1,0,1.2\n12,1,0,1\n13,1,0,1\n14,1,0,1\n");
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> FrfCsv.read(coh, FrfUnit.si(FrfKind.RECEPTANCE)));
        assertTrue(e.field().endsWith("line 3, column 4 (coherence)"), e.field());
        Path shortFile = dir.resolve("short.csv");
        Files.writeString(shortFile, "f,re,im\n10,1,0\n11,1,0\n");
        assertThrows(InvalidInputException.class, () -> FrfCsv.read(shortFile, FrfUnit.si(FrfKind.RECEPTANCE)));
        Path decay = dir.resolve("decay.csv");
        Files.writeString(decay, "time_s,x\n0,1\n0.1,0.5\n0.1,0.2\n");
        InvalidInputException d = assertThrows(InvalidInputException.class, () -> DecayCsv.read(decay));
        assertTrue(d.field().endsWith("line 4, column 1 (time_s)"), d.field());
    }
}
