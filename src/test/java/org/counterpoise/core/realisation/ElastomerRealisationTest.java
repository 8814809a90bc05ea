package org.counterpoise.core.realisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.realisation.StepFigure.StepQuantity;
import org.counterpoise.testing.DirectSolve;
import org.junit.jupiter.api.Test;

/**
 * An elastomer absorber as built: tuned to the hysteretic optimum's ratio, damped by its compound's loss
 * factor; its predicted table against a direct complex solve with the complex stiffness k (1 + i eta),
 * which at each frequency w is the spring k with a dashpot c = k eta / w (the same force k eta X i).
 */
class ElastomerRealisationTest {
    private static final double ETA = 0.15;
    private static final HardwareChoice ELASTOMER = new HardwareChoice(SpringKind.ELASTOMER,
            SpringMaterial.EN10270_1_DH, 0, DamperKind.ELASTOMER_LOSS, EddyCurrentChoice.DEFAULT,
            new ElastomerChoice(1.4, ETA), 50_000, 0.01, 0.01);

    @Test
    void theFanWithAnElastomerElement() {
        DesignResult fan = Presets.fan();
        Realisation r = Realiser.realise(fan, ELASTOMER);
        assertTrue(r.spring().isEmpty());
        ElastomerDesign e = r.elastomer().orElseThrow();
        double omega1 = fan.study().structure().naturalFrequency();
        double f = e.optimum().tuningRatio();
        // the element is tuned to the hysteretic optimum, not the viscous design's ratio
        double target = r.procedure().get(2).figures().stream()
                .filter(x -> x.quantity() == StepQuantity.ABSORBER_TARGET_FREQUENCY).findFirst().orElseThrow().value();
        assertEquals(f * omega1, target, 1e-12 * target);
        // the element's dynamic rate is m2 (f omega1)^2, and the damper is its loss: c = eta k / omega at the band centre
        assertEquals(fan.absorber().mass() * target * target, e.dynamicStiffness(), 1e-9 * e.dynamicStiffness());
        double centre = fan.study().excitation().band().centre();
        assertEquals(ETA * e.dynamicStiffness() / centre, r.damper().coefficient(), 1e-9 * r.damper().coefficient());
        List<DesignCheck> all = new ArrayList<>(e.checks());
        all.addAll(r.damper().checks());
        assertEquals(all, r.checks());

        Structure s = fan.study().structure();
        Excitation x = fan.study().excitation();
        double m2 = fan.absorber().mass();
        double k2 = e.dynamicStiffness();
        for (PredictedPoint p : r.predicted()) {
            double w = p.frequency();
            Complex force = new Complex(x.amplitude() * w * w); // the fan: rotating unbalance
            Complex[] sol = DirectSolve.solve(s.effectiveMass(), s.effectiveStiffness(), s.effectiveDampingCoefficient(),
                    m2, k2, k2 * ETA / w, w, force, Complex.ZERO);
            assertEquals(sol[0].abs(), p.after(), 1e-9 * p.after(), "displacement at " + w);
            assertEquals(sol[1].subtract(sol[0]).abs(), p.stroke(), 1e-9 * p.stroke(), "stroke at " + w);
        }
        double peak = r.procedure().get(5).figures().get(0).value();
        double grid = 0;
        double low = x.band().low();
        double high = x.band().high();
        for (int i = 0; i <= 20_000; i++) {
            double w = low + (high - low) * i / 20_000;
            Complex[] sol = DirectSolve.solve(s.effectiveMass(), s.effectiveStiffness(), s.effectiveDampingCoefficient(),
                    m2, k2, k2 * ETA / w, w, new Complex(x.amplitude() * w * w), Complex.ZERO);
            grid = Math.max(grid, sol[0].abs());
        }
        assertTrue(grid <= peak * (1 + 1e-9) && grid >= peak * (1 - 1e-6), grid + " against " + peak);
    }
}
