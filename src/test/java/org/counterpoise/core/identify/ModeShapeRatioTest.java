package org.counterpoise.core.identify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.testing.SyntheticFrf;
import org.counterpoise.testing.SyntheticFrf.Mode;
import org.junit.jupiter.api.Test;

/**
 * The mode shape at a second point from a driving-point and a transfer FRF. Synthetic data: a mode of
 * generalised mass M with shape values phi_P and phi_A has the modal constant phi_j phi_k / M, i.e.
 * a single oscillator of mass M / (phi_j phi_k) (Ewins 2000, Modal Testing, 2nd ed., sec. 2.6).
 */
class ModeShapeRatioTest {
    private static final double M = 4200.0;
    private static final double PHI_P = 1.0;
    private static final double PHI_A = 0.6;

    @Test
    void theRatioOfModalConstantsIsTheModeShapeRatio() {
        MeasuredFrf driving = SyntheticFrf.of(FrfKind.ACCELERANCE, 18, 28, 201, 0.0, 1,
                new Mode(23.0, 0.02, M / (PHI_P * PHI_P)));
        MeasuredFrf transfer = SyntheticFrf.of(FrfKind.ACCELERANCE, 18, 28, 201, 0.0, 2,
                new Mode(23.0, 0.02, M / (PHI_A * PHI_P)));
        IdentifiedMode p = ModalFit.fit(driving, 1, false).modes().get(0);
        ModeShapeRatio r = ModeShapeRatio.of(p, ModalFit.fit(transfer, 1, false).modes());
        assertEquals(PHI_A / PHI_P, r.ratio(), 1e-9);
        // effective mass at A: M / phi_A^2 = 4200 / 0.36 = 11666.67 kg (by hand)
        assertEquals(M / (PHI_A * PHI_A), r.atTransferPoint().modalMass(), 1e-6 * M);
        assertEquals(p.naturalFrequency(), r.atTransferPoint().naturalFrequency(), 0.0);
    }

    @Test
    void noiseGivesAnUncertaintyThatCoversTheError() {
        MeasuredFrf driving = SyntheticFrf.of(FrfKind.ACCELERANCE, 18, 28, 201, 0.02, 3, new Mode(23.0, 0.02, M));
        MeasuredFrf transfer = SyntheticFrf.of(FrfKind.ACCELERANCE, 18, 28, 201, 0.02, 4,
                new Mode(23.0, 0.02, M / PHI_A));
        ModeShapeRatio r = ModeShapeRatio.of(ModalFit.fit(driving, 1, false).modes().get(0),
                ModalFit.fit(transfer, 1, false).modes());
        double sd = r.ratioSd().orElseThrow();
        assertTrue(sd > 0 && sd < 0.01, "sd " + sd);
        assertTrue(Math.abs(r.ratio() - PHI_A) < 4 * sd, "error " + (r.ratio() - PHI_A) + " against sd " + sd);
        assertTrue(r.atTransferPoint().modalMassSd().isPresent());
    }

    @Test
    void aTransferFitWithoutTheModeIsRefusedInWords() {
        IdentifiedMode p = IdentifiedMode.of(2 * Math.PI * 23.0, 0.02, M);
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> ModeShapeRatio.of(p, List.of(IdentifiedMode.of(2 * Math.PI * 30.0, 0.02, M))));
        assertTrue(e.getMessage().contains("within 2 %"), e.getMessage());
        assertTrue(e.getMessage().contains("23"), e.getMessage());
    }
}
