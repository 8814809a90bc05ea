package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Spectrum;
import org.counterpoise.core.response.RandomResponse;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/** The disturbance spectrum in the project file: white noise reads, designs and round-trips; old files load. */
class SpectrumFileTest {
    private static final String WHITE = """
            {"format_version": 1, "name": "invented white-noise scenario",
             "structure": {"mass": {"value": 1000, "unit": "kg"}, "natural_frequency": {"value": 2, "unit": "Hz"},
                           "damping": {"ratio": 0.02}},
             "disturbance": {"kind": "base-acceleration", "amplitude": {"value": 1, "unit": "m/s^2"},
                             "frequency": {"value": 2, "unit": "Hz"},
                             "spectrum": {"kind": "white-noise", "psd": {"value": 0.001, "unit": "g0^2/Hz"}}},
             "absorber": {"mass_ratio": 0.05, "method": "exact-variance", "response": "relative-displacement"}}
            """;

    @Test
    void whiteNoiseReadsDesignsForLeastRmsAndRoundTrips() {
        Project p = ProjectReader.read(new StringReader(WHITE)).project();
        DesignStudy study = p.toStudy();
        assertTrue(study.excitation().spectrum().isWhiteNoise());
        assertEquals(0.001 * 9.80665 * 9.80665, study.excitation().spectrum().psdLevel().orElseThrow(), 1e-15);
        DesignResult r = Designer.design(study);
        var rms = r.rms().orElseThrow();
        // the design minimises the rms: no other tuning nearby does better (independent probe)
        for (double df : new double[] {-0.01, 0.01}) {
            for (double dz : new double[] {-0.01, 0.0, 0.01}) {
                var t = new org.counterpoise.core.model.Tuning(0.05, r.tuning().tuningRatio() + df,
                        r.tuning().dampingRatio() + dz);
                assertTrue(RandomResponse.rms(study.structure(), t, study.excitation().kind(),
                        rms.psdLevel(), ResponseKind.RELATIVE_DISPLACEMENT) >= rms.after());
            }
        }
        assertTrue(rms.after() < rms.before());
        assertEquals(p, ProjectReader.read(new StringReader(ProjectWriter.toJson(p))).project());
    }

    @Test
    void anOldExactVarianceFileWithoutASpectrumLoadsAsHarmonicAndWritesBackWithoutOne() {
        String old = WHITE.replace(",\n                 \"spectrum\": {\"kind\": \"white-noise\", \"psd\": {\"value\": 0.001,"
                + " \"unit\": \"g0^2/Hz\"}}", "");
        Project p = ProjectReader.read(new StringReader(old)).project();
        assertEquals(Spectrum.HARMONIC, p.toStudy().excitation().spectrum());
        assertTrue(Designer.design(p.toStudy()).rms().isEmpty());
        assertFalse(ProjectWriter.toJson(p).contains("spectrum"));
    }

    @Test
    void whiteNoiseIsRefusedWhereItMeansNothingNamingTheField() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> ProjectReader.read(
                new StringReader(WHITE.replace("exact-variance", "exact-peak"))).project().toStudy());
        assertEquals("absorber.method", e.field());
        e = assertThrows(InvalidInputException.class, () -> ProjectReader.read(
                new StringReader(WHITE.replace("g0^2/Hz", "N^2/Hz"))).project());
        assertEquals("disturbance.spectrum.psd.unit", e.field());
        e = assertThrows(InvalidInputException.class, () -> ProjectReader.read(
                new StringReader(WHITE.replace("white-noise", "pink-noise"))).project());
        assertEquals("disturbance.spectrum.kind", e.field());
    }
}
