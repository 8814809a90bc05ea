package org.counterpoise.core.realisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RunUpStroke;
import org.counterpoise.core.error.WarningParameter;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.units.Dimension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;

/** The damper's coefficient, velocity, force and eddy-current size against hand calculations and a brute-force grid. */
class DamperSizingTest {

    static List<Path> presets() {
        return Presets.files();
    }

    @Test
    void returnPathFactorIsAHalfForASquarePoleAndTendsToItsLimits() {
        // Wiederick et al. (1987): alpha = 1 - [4 atan A + A ln(1 + 1/A^2) - ln(1 + A^2)/A] / (2 pi), by hand:
        // A = 1: 1 - (pi + ln 2 - ln 2) / (2 pi) = 1/2.
        assertEquals(0.5, DamperSizing.returnPathFactor(1.0), 1e-15);
        // A = 2: 4 atan 2 = 4.428594, 2 ln 1.25 = 0.446287, ln 5 / 2 = 0.804719 -> 1 - 4.070162 / 6.283185 = 0.352213
        assertEquals(0.352213, DamperSizing.returnPathFactor(2.0), 1e-6);
        // a long pole across the motion (A -> 0) gives the full sigma delta S B^2 (alpha -> 1), one along it none
        assertEquals(1.0, DamperSizing.returnPathFactor(1e-6), 1e-4);
        assertEquals(0.0, DamperSizing.returnPathFactor(1e6), 1e-4);
    }

    @Test
    void eddyCurrentPoleAreaByHand() {
        // c = alpha sigma delta S B^2 (Wiederick et al. 1987), square poles alpha = 1/2:
        // copper 58 MS/m, 5 mm plate, 0.5 T, c = 1234 N s/m -> S = 1234 / (0.5 * 58e6 * 0.005 * 0.25) = 0.034041 m^2
        EddyCurrentDamper d = DamperSizing.eddyCurrent(EddyCurrentChoice.DEFAULT, 1234.0);
        assertEquals(1234.0 / 36250.0, d.poleArea(), 1e-12);
        assertEquals(0.034041, d.poleArea(), 1e-6);
        assertEquals(0.5, d.edgeFactor(), 0.0);
        assertEquals(1234.0, d.coefficient(), 0.0);
        assertTrue(d.source().contains("Wiederick") && d.source().contains("1987"), d.source());
        // aluminium, 35 MS/m, 10 mm plate, 0.8 T, c = 500: S = 500 / (0.5 * 35e6 * 0.01 * 0.64) = 4.4643e-3 m^2
        EddyCurrentDamper al = DamperSizing.eddyCurrent(new EddyCurrentChoice(Conductor.ALUMINIUM, 0.8, 0.01), 500);
        assertEquals(4.4643e-3, al.poleArea(), 1e-7);
    }

    @Test
    void skinDepthOfCopperAtFiftyHertzIsTheHandbookValue() {
        // common practice (electrical handbooks): copper's skin depth at 50 Hz is about 9.3 mm;
        // sqrt(2 / (2 pi 50 * 4 pi 1e-7 * 58e6)) = 9.346 mm
        assertEquals(9.346e-3, DamperSizing.skinDepth(58e6, 2 * Math.PI * 50), 1e-6);
    }

    @Test
    void theFanDamperCarriesTheDesignsCoefficientStrokesAndForce() {
        DesignResult fan = Presets.fan();
        List<Warning> warnings = new ArrayList<>();
        DamperDesign d = DamperSizing.size(fan, HardwareChoice.DEFAULT, warnings);
        assertEquals(DamperKind.VISCOUS_DASHPOT, d.kind());
        assertEquals(fan.absorber().damping(), d.coefficient(), 0.0);
        assertEquals(fan.strokeInBand().value(), d.strokeAmplitude(), 0.0);
        assertEquals(fan.strokeRunUp().value(), d.runUpStroke(), 0.0);
        assertEquals(d.coefficient() * d.peakVelocity(), d.peakForce(), 1e-12 * d.peakForce());
        // the damper force in band is c times the relative velocity in band, so it bounds c v from below
        assertTrue(d.peakForce() >= fan.damperForce().value() * (1 - 1e-12));
        assertTrue(d.eddyCurrent().isEmpty());
        assertEquals(1, d.checks().size());
        DesignCheck stroke = d.checks().get(0);
        assertEquals(CheckKind.DAMPER_STROKE, stroke.kind());
        assertEquals(Dimension.LENGTH, stroke.dimension());
        assertEquals(fan.clearance(), stroke.capacity(), 0.0);
        assertTrue(stroke.passes() && warnings.isEmpty(), stroke + " " + warnings);
    }

    @Test
    void anEddyCurrentDamperAddsItsPoleAreaAndSkinDepthCheck() {
        DesignResult fan = Presets.fan();
        HardwareChoice eddy = withDamper(HardwareChoice.DEFAULT, DamperKind.EDDY_CURRENT,
                new EddyCurrentChoice(Conductor.COPPER, 0.5, 0.005));
        List<Warning> warnings = new ArrayList<>();
        DamperDesign d = DamperSizing.size(fan, eddy, warnings);
        assertEquals(fan.absorber().damping() / (0.5 * 58e6 * 0.005 * 0.25), d.eddyCurrent().orElseThrow().poleArea(),
                1e-12);
        DesignCheck skin = d.checks().get(1);
        assertEquals(CheckKind.EDDY_CURRENT_SKIN_DEPTH, skin.kind());
        assertEquals(DamperSizing.skinDepth(58e6, fan.study().excitation().band().high()), skin.capacity(), 0.0);
        assertTrue(skin.passes(), skin.toString()); // 5 mm against about 16 mm at 15 Hz
        // a 60 mm plate is thicker than the skin depth: the check fails, with its typed warning
        HardwareChoice thick = withDamper(HardwareChoice.DEFAULT, DamperKind.EDDY_CURRENT,
                new EddyCurrentChoice(Conductor.COPPER, 0.5, 0.06));
        List<Warning> thickWarnings = new ArrayList<>();
        DamperDesign t = DamperSizing.size(fan, thick, thickWarnings);
        assertFalse(t.checks().get(1).passes());
        assertEquals(List.of(WarningKind.EDDY_CURRENT_PLATE_THICK), thickWarnings.stream().map(Warning::kind).toList());
    }

    @Test
    void elastomerLossIsTheEquivalentViscousCoefficientAtTheRunningFrequency() {
        DesignResult fan = Presets.fan();
        HardwareChoice elastomer = new HardwareChoice(SpringKind.ELASTOMER, SpringMaterial.EN10270_1_DH, 0,
                DamperKind.ELASTOMER_LOSS, EddyCurrentChoice.DEFAULT, new ElastomerChoice(1.4, 0.15), 50_000, 0.01, 0.01);
        DamperDesign d = DamperSizing.size(fan, elastomer, new ArrayList<>());
        // c = eta k / omega (equal energy per cycle): 0.15 * k2 / band centre
        FrequencyBand band = fan.study().excitation().band();
        assertEquals(0.15 * fan.absorber().stiffness() / (0.5 * (band.low() + band.high())), d.coefficient(), 1e-9);
        assertEquals(DamperKind.ELASTOMER_LOSS, d.kind());
    }

    @Test
    void aTransientRunUpBeyondTheClearanceFailsTheStrokeCheckWithItsWarning() {
        DesignResult fan = Presets.fan();
        // the same design, as if its run-up at a stated rate rang to twice the clearance
        double rung = 2 * fan.clearance();
        DesignResult rings = withRunUp(fan, new RunUpStroke(new ResponsePeak(fan.coupledNaturalFrequencies()[0], rung),
                RunUpStroke.Basis.TRANSIENT));
        List<Warning> warnings = new ArrayList<>();
        DesignCheck stroke = DamperSizing.size(rings, HardwareChoice.DEFAULT, warnings).checks().get(0);
        assertEquals(rung, stroke.demand(), 0.0);
        assertEquals(2.0, stroke.utilisation(), 1e-15);
        assertFalse(stroke.passes());
        assertEquals(List.of(WarningKind.DAMPER_STROKE_OVER_CLEARANCE), warnings.stream().map(Warning::kind).toList());
        assertEquals(rung, warnings.get(0).number(WarningParameter.DAMPER_STROKE), 0.0);
    }

    static DesignResult withRunUp(DesignResult d, RunUpStroke runUp) {
        return new DesignResult(d.study(), d.methodSource(), d.methodNote(), d.tuning(), d.absorber(),
                d.staticDeflection(), d.responseBefore(), d.responseAfter(), d.motionBefore(), d.motionAfter(),
                d.strokeInBand(), d.strokeRunUp(), d.clearance(), d.springForce(), d.damperForce(), d.absorberForce(),
                d.coupledNaturalFrequencies(), d.stiffnessDetuning(), d.massDetuning(), d.structureTolerance(),
                d.absorberTolerance(), d.warnings(), d.activeConstraint(), runUp, d.acceptance(), d.afterWorstCase());
    }

    /** The exact peak relative velocity is never below a dense grid, and a dense grid comes within 1e-4 of it. */
    @ParameterizedTest
    @MethodSource("presets")
    void peakVelocityAgreesWithABruteForceGrid(Path preset) {
        DesignResult design = Presets.design(preset);
        double exact = DamperSizing.peakVelocity(design);
        SystemResponse fitted = DamperSizing.fitted(design);
        double top = design.study().excitation().band().high();
        double grid = 0;
        int n = 200_000;
        for (int i = 1; i <= n; i++) {
            double w = top * i / n;
            grid = Math.max(grid, w * fitted.amplitudeAt(ResponseKind.STROKE, w));
        }
        assertTrue(grid <= exact * (1 + 1e-9), preset + ": grid " + grid + " above exact " + exact);
        assertTrue(grid >= exact * (1 - 1e-4), preset + ": grid " + grid + " far below exact " + exact);
    }

    static HardwareChoice withDamper(HardwareChoice c, DamperKind kind, EddyCurrentChoice eddy) {
        return new HardwareChoice(c.springKind(), c.springMaterial(), c.springCount(), kind, eddy, c.elastomer(),
                c.serviceHours(), c.massTolerance(), c.trimStepFraction());
    }
}
