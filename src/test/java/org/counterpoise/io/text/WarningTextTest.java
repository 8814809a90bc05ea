package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.counterpoise.core.design.RunUpStroke;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.error.WarningParameter;
import org.counterpoise.core.error.WarningParameter.PeakBand;
import org.junit.jupiter.api.Test;

/** Every warning kind becomes a plain English sentence, in one place, with no NaN or Infinity. */
class WarningTextTest {

    /** Representative SI values for each parameter, tiny and huge (a design can reach either). */
    private static List<Object> values(WarningKind kind, double scale, String token) {
        List<Object> values = new ArrayList<>();
        for (WarningParameter p : kind.parameters()) {
            values.add(p.token() ? token : scale * (p.ordinal() + 1));
        }
        return values;
    }

    @Test
    void everyKindRendersToASentenceWithoutNaNOrInfinity() {
        for (WarningKind kind : WarningKind.values()) {
            for (double scale : new double[] {1e-9, 0.05, 1.0, 3e4, 1e12}) {
                List<String> tokens = kind.parameters().contains(WarningParameter.PEAK_BAND)
                        ? List.of(PeakBand.ALL_FREQUENCIES.name(), PeakBand.RUN_UP.name(), PeakBand.OCTAVE.name())
                        : kind.parameters().contains(WarningParameter.RUN_UP_BASIS)
                        ? Arrays.stream(RunUpStroke.Basis.values()).map(Enum::name).toList()
                        : List.of("equal-peak");
                for (String token : tokens) {
                    String text = WarningText.of(Warning.of(kind, values(kind, scale, token).toArray()));
                    assertTrue(text.length() > 40 && Character.isUpperCase(text.charAt(0)) && text.endsWith("."),
                            kind + ": " + text);
                    assertFalse(text.contains("NaN") || text.contains("Infinity") || text.contains("null"),
                            kind + ": " + text);
                }
            }
        }
    }

    @Test
    void numbersAreWordedAsBeforeTheTypedWarnings() {
        // The sentences the design wrote before warnings were typed (kept verbatim in the golden results).
        assertEquals("The equal-peak closed form assumes an undamped structure; with the structure's damping ratio"
                + " of 0.0167 the tuning is close to, but not exactly, the optimum.",
                WarningText.of(Warning.of(WarningKind.DAMPED_STRUCTURE, "equal-peak", 0.016666)));
        // 24.75 Hz and 31.57 Hz given in rad/s: f = omega / (2 pi).
        assertEquals("Start-up hazard: the structure with the absorber has natural frequencies at 24.75 Hz and"
                + " 31.57 Hz (undamped values); the machine passes through the lower one each time it starts and"
                + " stops. Pass through it quickly.",
                WarningText.of(Warning.of(WarningKind.START_UP_RESONANCE, 2 * Math.PI * 24.75, 2 * Math.PI * 31.57)));
        assertEquals("A mass ratio of 0.300 is unusually large; check that the structure can carry the added mass.",
                WarningText.of(Warning.of(WarningKind.HEAVY_ABSORBER, 0.3)));
    }

    @Test
    void aWarningRefusesMissingWrongOrNonFiniteParameters() {
        assertThrows(IllegalArgumentException.class, () -> Warning.of(WarningKind.HEAVY_ABSORBER));
        assertThrows(IllegalArgumentException.class, () -> Warning.of(WarningKind.HEAVY_ABSORBER, Double.NaN));
        assertThrows(IllegalArgumentException.class,
                () -> Warning.of(WarningKind.HEAVY_ABSORBER, Double.POSITIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> Warning.of(WarningKind.HEAVY_ABSORBER, "0.3"));
        assertThrows(IllegalArgumentException.class,
                () -> new Warning(WarningKind.NO_DAMPING, Map.of(WarningParameter.MASS_RATIO, 0.3)));
        assertThrows(NullPointerException.class, () -> new Warning(null, Map.of()));
        assertEquals("NO_DAMPING", Warning.of(WarningKind.NO_DAMPING).code());
    }

    @Test
    void aMissedCriterionSaysByHowMuchAndWhereItWasJudged() {
        // 20 log10(2) = 6.02 dB (the definition of the decibel for amplitudes)
        assertEquals("No absorber up to a mass ratio of 0.250 meets the criterion: the best at that mass ratio,"
                + " shown, reaches 2.00 times the limit in the worst case over the tolerances, missing it by 6.02 dB.",
                WarningText.of(Warning.of(WarningKind.CRITERION_NOT_MET, 0.25, 2.0, "robust-worst-case")));
        assertTrue(WarningText.of(Warning.of(WarningKind.CRITERION_NOT_MET, 0.25, 2.0, "exact-peak"))
                .contains("limit as designed"));
        assertTrue(WarningText.of(Warning.of(WarningKind.CRITERION_NOT_MET, 0.25, 2.0, "robust-p95"))
                .contains("in 95 % of builds"));
        // a utilisation of 0.5 leaves a margin of 6.02 dB
        assertEquals("The structure already meets the criterion without an absorber (0.500 times the limit, a"
                + " margin of 6.02 dB): no absorber is needed. The design shown is the lightest considered, at a"
                + " mass ratio of 0.00100, for comparison.",
                WarningText.of(Warning.of(WarningKind.NO_ABSORBER_NEEDED, 0.5, 0.001)));
    }

    @Test
    void aFailingSpringSaysWhichCheckAndByHowMuch() {
        assertEquals("No helical spring design passes every check: the spring's stress amplitude is 1.25 times its"
                + " fatigue strength at its mean stress: it would break in service and the mass would fall. Choose"
                + " another wire or spring count, or an elastomer element.",
                WarningText.of(Warning.of(WarningKind.SPRING_FATIGUE, 1.25)));
    }
}
