package org.counterpoise.core.realisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.error.WarningParameter;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Dimension;
import org.junit.jupiter.api.Test;

/**
 * The elastomer element of a design: stiffness from the exact hysteretic optimum, the static
 * stiffness from the compound's ratio, the fixed-point values beside it where they apply, and the
 * loss-factor check and its warning. Invented scenarios: a 1200 kg machine frame at 20 Hz.
 */
class ElastomerSizingTest {
    private static final double OMEGA1 = 2 * Math.PI * 20;
    private static final double MASS = 1200;

    private static DesignResult design(double zeta1, Excitation e) {
        Structure s = Structure.of(MASS, MASS * OMEGA1 * OMEGA1, zeta1);
        return Designer.design(new DesignStudy("elastomer", s, e, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(0.05), DesignMethod.EXACT_PEAK, false, 1.5));
    }

    private static HardwareChoice elastomer(double ratio, double lossFactor) {
        HardwareChoice d = HardwareChoice.DEFAULT;
        return new HardwareChoice(SpringKind.ELASTOMER, d.springMaterial(), d.springCount(), DamperKind.ELASTOMER_LOSS,
                d.eddyCurrent(), new ElastomerChoice(ratio, lossFactor), d.serviceHours(), d.massTolerance(),
                d.trimStepFraction());
    }

    @Test
    void undampedFrameForcedAtOneSpeedGetsTheExactHystereticOptimum() {
        // one forcing frequency: the exact-peak design minimises over all frequencies, the case the
        // fixed-point method covers (undamped structure, force in, displacement out)
        DesignResult d = design(0.0, new Excitation(ExcitationKind.FORCE, 500, FrequencyBand.single(OMEGA1)));
        double mu = 0.05;
        ElastomerDesign e = ElastomerSizing.size(d, elastomer(1.4, 0.1));
        // exact optimum found here (docs/realisation.md): f = 1/(1+mu), eta^2 = mu (3 + mu)/2
        double f = 1 / (1 + mu);
        assertEquals(f, e.optimum().tuningRatio(), 1e-8);
        assertEquals(Math.sqrt(mu * (3 + mu) / 2), e.lossFactorNeeded(), 1e-7);
        // k = m2 (f omega1)^2 with the viscous design's absorber mass
        assertEquals(d.absorber().mass(), mu * MASS, 1e-9 * MASS);
        assertEquals(mu * MASS * Math.pow(f * OMEGA1, 2), e.dynamicStiffness(), 1e-6 * e.dynamicStiffness());
        assertEquals(e.dynamicStiffness() / 1.4, e.staticStiffness(), 1e-9 * e.staticStiffness());
        assertEquals(1.4, e.dynamicToStaticRatio());
        // the peak in SI: sqrt(2 (1 + mu)/mu) times F/k1, beside the viscous design's own
        double reference = 500 / (MASS * OMEGA1 * OMEGA1);
        assertEquals(Math.sqrt(2 * (1 + mu) / mu) * reference, e.optimum().peakResponse(),
                1e-8 * e.optimum().peakResponse());
        // the viscous design's peak over the same band (all frequencies): the exact optimum's peak
        // (16 + 9 mu + 4 sqrt(4 + 3 mu)) / (3 sqrt(mu (16 + 9 mu + 8 sqrt(4 + 3 mu)))) (Nishihara and
        // Asami 2002, J. Vib. Acoust. 124(4); peak from their equal double roots, reference sheet)
        double root = Math.sqrt(4 + 3 * mu);
        double viscous = (16 + 9 * mu + 4 * root) / (3 * Math.sqrt(mu * (16 + 9 * mu + 8 * root)));
        assertEquals(viscous * reference, e.optimum().viscousPeakResponse(), 1e-8 * viscous * reference);
        assertTrue(e.optimum().peakResponse() > e.optimum().viscousPeakResponse());
        // fixed-point values beside it: f = 1/(1+mu), eta^2 = mu (3 + 2 mu)/(2 + mu)
        HystereticOptimum.PublishedHysteretic p = e.optimum().published().orElseThrow();
        assertEquals(f, p.tuningRatio(), 1e-15);
        assertEquals(Math.sqrt(mu * (3 + 2 * mu) / (2 + mu)), p.lossFactor(), 1e-15);
        assertTrue(p.source().contains("Snowdon (1968)"), p.source());
    }

    @Test
    void aLowLossCompoundFailsTheCheckAndWarnsWhileTheNeededOnePasses() {
        DesignResult d = design(0.0, new Excitation(ExcitationKind.FORCE, 500, FrequencyBand.single(OMEGA1)));
        HardwareChoice natural = elastomer(1.4, 0.1);
        ElastomerDesign soft = ElastomerSizing.size(d, natural);
        DesignCheck check = soft.checks().get(0);
        assertEquals(CheckKind.ELASTOMER_LOSS_FACTOR, check.kind());
        assertEquals(Dimension.LENGTH, check.dimension());
        assertEquals(1.10 * soft.optimum().viscousPeakResponse(), check.capacity(), 1e-12 * check.capacity());
        assertFalse(check.passes(), "a loss factor of 0.1 against 0.276 needed at mu = 0.05");
        List<Warning> warnings = ElastomerSizing.warnings(soft, natural);
        assertEquals(1, warnings.size());
        Warning w = warnings.get(0);
        assertEquals(WarningKind.ELASTOMER_LOSS_FACTOR_MISSED, w.kind());
        assertEquals(0.1, w.number(WarningParameter.COMPOUND_LOSS_FACTOR));
        assertEquals(soft.lossFactorNeeded(), w.number(WarningParameter.LOSS_FACTOR_NEEDED));
        assertEquals(check.utilisation(), w.number(WarningParameter.UTILISATION));

        HardwareChoice matched = elastomer(1.4, soft.lossFactorNeeded());
        ElastomerDesign right = ElastomerSizing.size(d, matched);
        assertTrue(right.checks().get(0).passes());
        assertEquals(right.optimum().peakResponse(), right.checks().get(0).demand(), 1e-9 * right.optimum().peakResponse());
        assertTrue(ElastomerSizing.warnings(right, matched).isEmpty());
    }

    @Test
    void aDampedStructureOverABandHasNoPublishedValues() {
        DesignResult d = design(0.02, new Excitation(ExcitationKind.FORCE, 500,
                new FrequencyBand(0.85 * OMEGA1, 1.2 * OMEGA1)));
        ElastomerDesign e = ElastomerSizing.size(d, elastomer(1.2, 0.3));
        assertTrue(e.optimum().published().isEmpty());
        assertTrue(e.lossFactorNeeded() > 0.05 && e.lossFactorNeeded() < 1, "eta " + e.lossFactorNeeded());
        // over the band the hysteretic optimum is never far from the viscous one (measured: within 2 %)
        double ratio = e.optimum().peakResponse() / e.optimum().viscousPeakResponse();
        assertTrue(ratio > 0.95 && ratio < 1.05, "ratio " + ratio);
    }
}
