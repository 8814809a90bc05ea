package org.counterpoise.io.commission;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.commission.AsBuiltSet;
import org.counterpoise.core.commission.CommissioningWarning;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The site-check demo file of the gallery-floor preset (two absorbers on a floor of two close modes)
 * is made here, invented and not measured: the accelerance at mid-span with both absorbers fitted,
 * absorber 1 built with a spring 4 % stiff (its frequency 1.98 % high) and absorber 2 with one 3 %
 * soft (1.51 % low), both dampers 25 % above the design's, 1 % noise of a fixed seed. The response
 * comes from the equations of motion of the modes and absorbers solved directly
 * ({@link ModalDirectSolve}). The test checks the shipped file is what the generator writes and that
 * the site check finds what was put in. To rewrite it:
 * {@code mvn -q test -Dtest=GallerySitePresetTest -Dcounterpoise.preset.update=true}.
 */
class GallerySitePresetTest {
    static final Path PROJECT = Path.of("presets", "gallery-floor-two-modes.json");
    static final Path FITTED = Path.of("presets", "gallery-floor-fitted-frf.csv");
    static final double[] SPRING = {1.04, 0.97};
    static final double DAMPER = 1.25;

    static SeveralAbsorbers design() {
        LoadedProject loaded = ProjectReader.read(PROJECT);
        return SeveralAbsorbersDesigner.design(Designer.design(loaded.project().toStudy()),
                SeveralModes.layout(loaded.project()).orElseThrow());
    }

    static List<PointAbsorber> asBuilt(SeveralAbsorbers design) {
        List<PointAbsorber> out = new ArrayList<>();
        for (int j = 0; j < design.absorbers().size(); j++) {
            PointAbsorber d = design.absorbers().get(j);
            out.add(new PointAbsorber(d.point(), d.mass(), d.stiffness() * SPRING[j], d.damping() * DAMPER));
        }
        return out;
    }

    static String fitted() {
        SeveralAbsorbers design = design();
        List<PointAbsorber> built = asBuilt(design);
        Random noise = new Random(2029L);
        StringBuilder b = new StringBuilder()
                .append("# INVENTED demo data, not a measurement: the accelerance at mid-span of the gallery-floor\n")
                .append("# preset with both absorbers fitted, absorber 1 built with a spring 4 % stiff, absorber 2\n")
                .append("# with one 3 % soft, both dampers 25 % above the design's, 1 % random noise of a fixed seed;\n")
                .append("# made by GallerySitePresetTest. Read it with: site-check presets/gallery-floor-two-modes.json\n")
                .append("# --fitted-frf presets/gallery-floor-fitted-frf.csv\n")
                .append("frequency_Hz,real,imag\n");
        for (int i = 0; i <= 240; i++) {
            double hz = 6 + 0.025 * i;
            double w = 2 * Math.PI * hz;
            Complex h = ModalDirectSolve.solve(design.layout().structure().modes(), built, "midspan", "midspan", w)[0]
                    .multiply(-w * w);
            b.append(String.format(Locale.ROOT, "%.4f,%.6e,%.6e%n", hz,
                    h.getReal() * (1 + 0.01 * noise.nextGaussian()),
                    h.getImaginary() * (1 + 0.01 * noise.nextGaussian())));
        }
        return b.toString().replace(System.lineSeparator(), "\n");
    }

    @Test
    void theShippedFileIsWhatTheGeneratorWrites() throws IOException {
        if (Boolean.getBoolean("counterpoise.preset.update")) {
            Files.writeString(FITTED, fitted());
        }
        assertEquals(fitted(), Files.readString(FITTED));
    }

    @Test
    void theSiteCheckFindsWhatWasPutIn() {
        SeveralAbsorbers design = design();
        SetSiteCheck check = SetSiteCheck.run("gallery", design, FITTED, FrfUnit.si(FrfKind.ACCELERANCE), all -> all,
                false, List.of(), List.of(), UnitSystem.SI);
        AsBuiltSet built = check.check().built();
        for (int j = 0; j < 2; j++) {
            double expected = Math.sqrt(SPRING[j]) * design.absorbers().get(j).frequency();
            // 1 % noise on 241 lines: each frequency to 0.1 %, each damping ratio to 10 %
            assertEquals(expected, built.absorbers().get(j).frequency(), 1e-3 * expected, "absorber " + (j + 1));
            PointAbsorber d = design.absorbers().get(j);
            double zeta = DAMPER * d.damping() / (2 * d.mass() * Math.sqrt(SPRING[j]) * d.frequency());
            assertEquals(zeta, built.absorbers().get(j).dampingRatio(), 0.1 * zeta, "absorber " + (j + 1));
        }
        assertEquals(List.of(), built.warnings());
        assertTrue(check.check().corrections().get(0).massToAdd() > 0, "a stiff spring needs mass added");
        assertTrue(check.check().corrections().get(1).massToAdd() < 0, "a soft spring needs mass taken off");
        assertTrue(check.check().afterTrimPeak() < check.check().asBuiltPeak());
        String text = SetSiteCheckReport.render(check);
        assertTrue(text.contains("absorber 2: trim") && text.contains("take off"), text);
        assertTrue(text.contains("licensed engineering practice"), text);
        assertFalse(text.contains("NaN") || text.contains("Infinity"), text);
        assertFalse(check.check().built().warnings().contains(CommissioningWarning.POOR_FIT));
    }
}
