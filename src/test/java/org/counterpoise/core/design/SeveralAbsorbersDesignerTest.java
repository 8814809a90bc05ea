package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.system.AbsorberSensitivity;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.ModalPeak;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.InventedFloor;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * Several absorbers on a structure of several modes, at the design, against an independent route:
 * the equations of motion in modal coordinates and absorber displacements solved as a dense complex
 * linear system by Commons Math's LU decomposition ({@link ModalDirectSolve}), swept densely and
 * refined by golden section ({@link DenseSweep}). The structures are invented.
 */
class SeveralAbsorbersDesignerTest {
    private static final double HZ = 2 * Math.PI;
    /** Two close modes (11 % apart) and three named points: an invented floor. */
    private static final ModalStructure FLOOR = InventedFloor.MODES;
    private static final FrequencyBand BAND = InventedFloor.BAND;

    static SeveralAbsorbers design(ModalStructure structure, String force, String response, String at,
            int count, AbsorberSetTuning tuning, double totalMass, FrequencyBand band, double amplitude) {
        AbsorberLayout layout = new AbsorberLayout(structure, structure.modes().stream().map(m -> "mode at "
                + m.naturalFrequency()).toList(), force, response, at, OptionalInt.empty(), count, tuning);
        Mode target = structure.modes().get(layout.target(band));
        double mass = layout.effectiveMass(band);
        Structure single = new Structure(mass, mass * target.naturalFrequency() * target.naturalFrequency(),
                target.dampingRatio(), 1.0);
        DesignStudy study = new DesignStudy("invented", single, new Excitation(ExcitationKind.FORCE, amplitude, band),
                ResponseKind.DISPLACEMENT, AbsorberSizing.ofMass(totalMass), DesignMethod.EXACT_PEAK, false, 1.5);
        return SeveralAbsorbersDesigner.design(Designer.design(study), layout);
    }

    static double sweep(ModalStructure s, List<PointAbsorber> absorbers, String force, String response,
            double low, double high) {
        return DenseSweep.maximum(w -> ModalDirectSolve.solve(s.modes(), absorbers, force, response, w)[0].abs(),
                low, high, 20_000);
    }

    @Test
    void theWholeStructuresResponseAtTheDesignMatchesADenseComplexSolve() {
        double force = 400;
        SeveralAbsorbers d = design(FLOOR, "display", "midspan", "midspan", 2, AbsorberSetTuning.INDIVIDUAL, 900, BAND,
                force);
        assertEquals(0, d.targetMode(), "the bending mode lies in the band; the twisting mode above it");
        assertEquals(900, d.totalMass(), 1e-9);
        assertTrue(d.certified());
        // the exact transfer function at 401 frequencies equals the dense solve (to 1e-9 relative)
        ModalSystem system = ModalSystem.of(FLOOR, d.absorbers());
        for (int i = 0; i <= 400; i++) {
            double w = 5 * HZ + i * (10 * HZ) / 400;
            Complex direct = ModalDirectSolve.solve(FLOOR.modes(), d.absorbers(), "display", "midspan", w)[0];
            double[] v = system.transferFunction("display", "midspan").value(w / system.referenceFrequency());
            Complex exact = new Complex(v[0], v[1]).divide(system.referenceStiffness());
            assertEquals(0, exact.subtract(direct).abs(), 1e-9 * direct.abs(), "at " + w / HZ + " Hz");
        }
        // the peaks over the band before and after, and with one absorber of the same mass
        assertEquals(force * sweep(FLOOR, List.of(), "display", "midspan", BAND.low(), BAND.high()), d.peakBefore(),
                1e-9 * d.peakBefore());
        assertEquals(force * sweep(FLOOR, d.absorbers(), "display", "midspan", BAND.low(), BAND.high()), d.peakAfter(),
                1e-9 * d.peakAfter());
        SeveralAbsorbers.SingleAbsorber one = d.single().orElseThrow();
        assertEquals(450 * 2, one.absorber().mass(), 1e-9);
        assertEquals(force * sweep(FLOOR, List.of(one.absorber()), "display", "midspan", BAND.low(), BAND.high()),
                one.peak(), 1e-9 * one.peak());
        assertTrue(d.gain().orElseThrow() > 1.0, "two individually tuned absorbers beat one here: " + d.gain());
        // spillover: each mode's neighbourhood (between the geometric means of neighbouring frequencies)
        double middle = Math.sqrt(8.2 * 9.1) * HZ;
        double[][] spans = {{0.2 * 8.2 * HZ, middle}, {middle, 4 * 9.1 * HZ}};
        for (SeveralAbsorbers.ModePeak p : d.modes()) {
            double[] span = spans[p.mode()];
            assertEquals(force * sweep(FLOOR, List.of(), "display", "midspan", span[0], span[1]), p.before(),
                    1e-9 * p.before(), "before, mode " + p.mode());
            assertEquals(force * sweep(FLOOR, d.absorbers(), "display", "midspan", span[0], span[1]), p.after(),
                    1e-9 * p.after(), "after, mode " + p.mode());
        }
    }

    /**
     * Three light absorbers (mu = 0.02 in total) on an undamped mode: the case where the polynomial peak
     * search on the expanded |H|^2 lost digits (docs/several-modes.md). The design's peak, taken on the
     * factored route, equals the dense sweep of the dense solve.
     */
    @Test
    void threeLightAbsorbersOnAnUndampedModeHaveTheirTruePeak() {
        ModalStructure one = ModalStructure.singleMode("p", 10 * HZ, 0.0, 500);
        FrequencyBand band = new FrequencyBand(8 * HZ, 12 * HZ);
        SeveralAbsorbers d = design(one, "p", "p", "p", 3, AbsorberSetTuning.INDIVIDUAL, 10, band, 1.0);
        double sweep = sweep(one, d.absorbers(), "p", "p", band.low(), band.high());
        assertEquals(sweep, d.peakAfter(), 1e-9 * sweep);
        ModalSystem system = ModalSystem.of(one, d.absorbers());
        assertEquals(sweep, ModalPeak.over(system, "p", "p", band.low(), band.high()), 1e-9 * sweep);
        // the factored value is the dense solve's at any frequency (the route ModalPeak refines on)
        double w = 10.3 * HZ;
        assertEquals(ModalDirectSolve.solve(one.modes(), d.absorbers(), "p", "p", w)[0].abs(),
                AbsorberSensitivity.value(system, "p", "p", w / system.referenceFrequency()).abs()
                        / system.referenceStiffness(), 1e-12 * sweep);
        assertTrue(Double.isInfinite(d.peakBefore()), "an undamped mode in the band is unbounded without absorbers");
        assertTrue(d.gain().orElseThrow() >= 1.0 - 1e-9, "individual tuning never does worse than one absorber");
        // for the record: the polynomial search alone (not asserted beyond being no higher than the truth)
        double polynomial = PeakFinder.over(system.transferFunction("p", "p"), band.low() / system.referenceFrequency(),
                band.high() / system.referenceFrequency()).magnitude() / system.referenceStiffness();
        assertTrue(polynomial <= sweep * (1 + 1e-9), polynomial + " vs " + sweep);
    }

    @Test
    void aSplitOfThreeUniformlySpreadAbsorbersOnOneModeGainsOverOne() {
        ModalStructure one = ModalStructure.singleMode("p", 31 * HZ, 0.01, 1200);
        FrequencyBand band = new FrequencyBand(26 * HZ, 36 * HZ);
        SeveralAbsorbers d = design(one, "p", "p", "p", 3, AbsorberSetTuning.UNIFORM, 60, band, 250);
        assertEquals(3, d.absorbers().size());
        for (PointAbsorber a : d.absorbers()) {
            assertEquals(20, a.mass(), 1e-12, "equal masses");
        }
        double f1 = d.absorbers().get(0).frequency();
        double f2 = d.absorbers().get(1).frequency();
        double f3 = d.absorbers().get(2).frequency();
        assertEquals(f2 - f1, f3 - f2, 1e-9 * f2, "a uniform spread of the tunings (Xu and Igusa 1992)");
        assertEquals(250 * sweep(one, d.absorbers(), "p", "p", band.low(), band.high()), d.peakAfter(),
                1e-9 * d.peakAfter());
        assertTrue(d.gain().orElseThrow() > 1.0, "the split beats one absorber of the same mass: " + d.gain());
    }

    @Test
    void theStructureToleranceOfTheSetEndsWhereTheDirectSolvesPeakRisesByTheAllowance() {
        ModalStructure one = ModalStructure.singleMode("p", 31 * HZ, 0.01, 1200);
        FrequencyBand band = new FrequencyBand(26 * HZ, 36 * HZ);
        SeveralAbsorbers d = design(one, "p", "p", "p", 3, AbsorberSetTuning.UNIFORM, 60, band, 250);
        MistuningRange r = d.structureTolerance();
        double limit = 1.1 * d.peakAfter();
        for (double factor : new double[] {r.low().orElseThrow(), r.high().orElseThrow()}) {
            ModalStructure off = ModalStructure.singleMode("p", factor * 31 * HZ, 0.01, 1200);
            // the mode's stiffness by factor^2, its mass and damping ratio kept: the end is where the peak over
            // the band, by a dense sweep of the direct solve, is 10 % above the nominal one
            assertEquals(limit, 250 * sweep(off, d.absorbers(), "p", "p", band.low(), band.high()), 1e-7 * limit,
                    "at factor " + factor);
            double inside = 1 + 0.5 * (factor - 1);
            ModalStructure half = ModalStructure.singleMode("p", inside * 31 * HZ, 0.01, 1200);
            assertTrue(250 * sweep(half, d.absorbers(), "p", "p", band.low(), band.high()) < limit);
        }
        MistuningRange single = d.single().orElseThrow().structureTolerance();
        assertTrue(single.low().isPresent() && single.high().isPresent(), single.toString());
    }

    @Test
    void theTargetIsTheModeNearestTheBandAndBetweenModesInItTheHigherPeak() {
        // both modes in the band: the one with the higher resonance peak at the point, phi^2 / (2 zeta m w^2)
        FrequencyBand wide = new FrequencyBand(7 * HZ, 10 * HZ);
        assertEquals(0, FLOOR.nearestMode("midspan", wide.low(), wide.high()));
        assertEquals(1, FLOOR.nearestMode("display", wide.low(), wide.high()));
        // above both: the higher one is nearer
        assertEquals(1, FLOOR.nearestMode("midspan", 12 * HZ, 14 * HZ));
    }

    @Test
    void severalAbsorbersRefuseOneForcingFrequencyAndOtherExcitations() {
        FrequencyBand single = FrequencyBand.single(8.2 * HZ);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> design(FLOOR, "display", "midspan",
                "midspan", 2, AbsorberSetTuning.UNIFORM, 900, single, 400));
        assertTrue(e.getMessage().contains("disturbance.band"), e.getMessage());
    }
}
