package org.counterpoise.core.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.InventedFloor;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * Each absorber's stroke and forces within a set ({@link AbsorberPeak}) against brute force on the
 * dense complex LU solve of the equations of motion in modal and absorber coordinates
 * ({@code ModalDirectSolve}, Commons Math; shares nothing with the polynomial or factored routes):
 * a dense sweep of the stroke it solves, times k, c omega or |k + i c omega|, refined by golden
 * section ({@code DenseSweep}).
 */
class AbsorberPeakTest {
    private static final List<String> POINTS = List.of("a", "b");

    /**
     * Twelve seeded random structures of two or three modes with one to four absorbers (at one point,
     * or at two), a band around the modes: every absorber's four peaks equal the brute force to 1e-7
     * relative (the sweep of 20 000 samples, refined, is good to about 1e-9 on these peaks), and so does
     * the receptance's peak ({@link ModalPeak}). Case 7 (four absorbers) failed before the fix of
     * {@code FactoredPeaks.poles}: Laguerre's method did not converge, no sweep was made, and two
     * maxima shared one bracket.
     */
    @Test
    void everyAbsorbersStrokeAndForcesEqualTheDenseSolvesSweep() {
        Random random = new Random(23);
        for (int c = 0; c < 12; c++) {
            List<Mode> modes = new ArrayList<>();
            double w = 1.0;
            int modeCount = 2 + random.nextInt(2);
            for (int r = 0; r < modeCount; r++) {
                modes.add(new Mode(w, 0.005 + 0.03 * random.nextDouble(), 0.5 + random.nextDouble(),
                        Map.of("a", 0.3 + 0.7 * random.nextDouble(), "b", 2 * random.nextDouble() - 1)));
                w *= 1.1 + 0.8 * random.nextDouble();
            }
            List<PointAbsorber> absorbers = new ArrayList<>();
            int count = 1 + random.nextInt(4);
            boolean twoPoints = c % 3 == 2 && count > 1;
            for (int j = 0; j < count; j++) {
                absorbers.add(PointAbsorber.tuned(twoPoints && j == 1 ? "b" : "a", 0.005 + 0.03 * random.nextDouble(),
                        modes.get(0).naturalFrequency() * (0.85 + 0.3 * random.nextDouble()),
                        0.02 + 0.15 * random.nextDouble()));
            }
            ModalSystem system = ModalSystem.of(new ModalStructure(modes), absorbers);
            double low = 0.6 * modes.get(0).naturalFrequency();
            double high = 1.3 * modes.get(modes.size() - 1).naturalFrequency();
            double receptance = ModalPeak.over(system, "a", "b", low, high);
            double bruteReceptance = DenseSweep.maximum(omega -> ModalDirectSolve.solve(modes, absorbers, "a", "b", omega)[0].abs(),
                    low, high, 20_000);
            assertEquals(bruteReceptance, receptance, 1e-7 * bruteReceptance, "receptance, case " + c);
            for (int j = 0; j < count; j++) {
                for (AbsorberPeak.Quantity q : AbsorberPeak.Quantity.values()) {
                    AbsorberPeak peak = AbsorberPeak.over(system, "a", j, q, low, high);
                    double brute = DenseSweep.maximum(direct(modes, absorbers, j, q), low, high, 20_000);
                    assertEquals(brute, peak.value(), 1e-7 * brute, "case " + c + " absorber " + j + " " + q);
                    assertEquals(peak.value(), direct(modes, absorbers, j, q).applyAsDouble(peak.frequency()),
                            1e-9 * peak.value(), "its frequency, case " + c + " absorber " + j + " " + q);
                }
            }
        }
    }

    /**
     * The invented two-mode floor with two absorbers of 450 kg at mid-span, from 0 to the top of the
     * band (the run-up's steady state).
     */
    @Test
    void fromRestToTheTopOfTheBandOnTheInventedFloor() {
        List<PointAbsorber> absorbers = List.of(PointAbsorber.tuned("midspan", 450, 7.6 * 2 * Math.PI, 0.06),
                PointAbsorber.tuned("midspan", 450, 8.3 * 2 * Math.PI, 0.05));
        ModalSystem system = ModalSystem.of(InventedFloor.MODES, absorbers);
        double high = InventedFloor.BAND.high();
        for (int j = 0; j < 2; j++) {
            AbsorberPeak peak = AbsorberPeak.over(system, "display", j, AbsorberPeak.Quantity.STROKE, 0.0, high);
            double brute = DenseSweep.maximum(direct(InventedFloor.MODES.modes(), absorbers, j,
                    AbsorberPeak.Quantity.STROKE), 0.0, high, 20_000);
            assertEquals(brute, peak.value(), 1e-7 * brute, "absorber " + j);
            assertTrue(peak.frequency() >= 0 && peak.frequency() <= high, "its frequency lies in the range");
        }
    }

    /** The absorber's quantity per unit force (at "display" on the floor, else at "a"), from the dense solve's stroke. */
    private static DoubleUnaryOperator direct(List<Mode> modes, List<PointAbsorber> absorbers, int j,
            AbsorberPeak.Quantity q) {
        PointAbsorber a = absorbers.get(j);
        String force = modes.get(0).shape().containsKey("display") ? "display" : "a";
        return w -> {
            Complex stroke = ModalDirectSolve.solve(modes, absorbers, force, force, w)[1 + j];
            double factor = switch (q) {
                case STROKE -> 1.0;
                case VELOCITY -> w;
                case SPRING_FORCE -> a.stiffness();
                case DAMPER_FORCE -> a.damping() * w;
                case ABSORBER_FORCE -> Math.hypot(a.stiffness(), a.damping() * w);
            };
            return stroke.abs() * factor;
        };
    }
}
