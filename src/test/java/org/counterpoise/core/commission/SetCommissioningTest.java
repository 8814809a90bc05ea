package org.counterpoise.core.commission;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.realisation.TrimPlan;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.InventedFloor;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The site check of several absorbers at one point. The "measured" responses are made by an
 * independent route, the equations of motion of the modes and absorbers solved as a dense complex
 * system by Commons Math's LU decomposition ({@link ModalDirectSolve}); the peaks are checked
 * against dense sweeps of that solve refined by golden section ({@link DenseSweep}). The structure
 * is invented: a floor with two close modes (11 % apart) and two individually tuned absorbers.
 */
class SetCommissioningTest {
    private static final double HZ = 2 * Math.PI;
    private static final ModalStructure FLOOR = InventedFloor.MODES;
    private static final FrequencyBand BAND = InventedFloor.BAND;
    private static SeveralAbsorbers design;

    @BeforeAll
    static void designTheFloor() {
        AbsorberLayout layout = new AbsorberLayout(FLOOR, List.of("bending", "twisting"), "display", "midspan",
                "midspan", OptionalInt.empty(), 2, AbsorberSetTuning.INDIVIDUAL);
        Mode target = FLOOR.modes().get(layout.target(BAND));
        double mass = layout.effectiveMass(BAND);
        Structure single = new Structure(mass, mass * target.naturalFrequency() * target.naturalFrequency(),
                target.dampingRatio(), 1.0);
        DesignStudy study = new DesignStudy("invented floor", single, new Excitation(ExcitationKind.FORCE, 400, BAND),
                ResponseKind.DISPLACEMENT, AbsorberSizing.ofMass(900), DesignMethod.EXACT_PEAK, false, 1.5);
        design = SeveralAbsorbersDesigner.design(Designer.design(study), layout);
    }

    /** The absorbers as built: each design absorber with its frequency and damping ratio scaled. */
    private static List<PointAbsorber> built(double[] frequencyFactor, double[] dampingFactor) {
        List<PointAbsorber> out = new ArrayList<>();
        for (int j = 0; j < design.absorbers().size(); j++) {
            PointAbsorber d = design.absorbers().get(j);
            double zeta = d.damping() / (2 * d.mass() * d.frequency());
            out.add(PointAbsorber.tuned(d.point(), d.mass(), d.frequency() * frequencyFactor[j],
                    zeta * dampingFactor[j]));
        }
        return out;
    }

    /** Driving-point accelerance at midspan from 6 to 12 Hz, 241 lines, by the dense solve; noise relative to the largest. */
    private static MeasuredFrf measured(ModalStructure structure, List<PointAbsorber> absorbers, double noise, long seed) {
        int lines = 241;
        double[] w = new double[lines];
        double[] re = new double[lines];
        double[] im = new double[lines];
        Random random = new Random(seed);
        double largest = 0;
        Complex[] a = new Complex[lines];
        for (int i = 0; i < lines; i++) {
            w[i] = (6.0 + 6.0 * i / (lines - 1)) * HZ;
            Complex receptance = ModalDirectSolve.solve(structure.modes(), absorbers, "midspan", "midspan", w[i])[0];
            a[i] = receptance.multiply(-w[i] * w[i]);
            largest = Math.max(largest, a[i].abs());
        }
        for (int i = 0; i < lines; i++) {
            re[i] = a[i].getReal() + noise * largest * random.nextGaussian();
            im[i] = a[i].getImaginary() + noise * largest * random.nextGaussian();
        }
        return new MeasuredFrf(w, re, im, new double[0], FrfKind.ACCELERANCE);
    }

    @Test
    void eachAbsorberAsBuiltIsFoundFromTheWholeStructuresResponse() {
        double[] f = {1.03, 0.96};
        double[] z = {1.3, 0.8};
        SetCommissioning check = SetCommissioning.of(design, measured(FLOOR, built(f, z), 0, 1), false, List.of());
        for (int j = 0; j < 2; j++) {
            PointAbsorber d = design.absorbers().get(j);
            AsBuiltSet.Built b = check.built().absorbers().get(j);
            assertEquals(d.frequency() * f[j], b.frequency(), 1e-6 * d.frequency(), "frequency of absorber " + j);
            double zeta = d.damping() / (2 * d.mass() * d.frequency());
            assertEquals(zeta * z[j], b.dampingRatio(), 1e-5 * zeta, "damping of absorber " + j);
            assertEquals(f[j] - 1, check.corrections().get(j).frequencyOff(), 1e-6);
            // a trim of mass m (r^2 - 1) brings sqrt(k / m') to the target (omega = sqrt(k / m), Den Hartog 1956, ch. 1)
            double k = d.mass() * b.frequency() * b.frequency();
            assertEquals(d.frequency(), Math.sqrt(k / (d.mass() + check.corrections().get(j).massToAdd())),
                    1e-9 * d.frequency());
        }
        assertTrue(check.built().normalisedResidual() < 1e-6, "exact data fit to round-off");
        assertTrue(check.built().warnings().isEmpty(), check.built().warnings().toString());
    }

    @Test
    void thePeaksAsBuiltAndAfterTrimEqualADenseSweepOfTheDirectSolve() {
        List<PointAbsorber> asBuilt = built(new double[] {1.05, 0.97}, new double[] {1.2, 1.1});
        SetCommissioning check = SetCommissioning.of(design, measured(FLOOR, asBuilt, 0, 2), false, List.of());
        double sweep = 400 * DenseSweep.maximum(w -> ModalDirectSolve.solve(FLOOR.modes(), asBuilt, "display",
                "midspan", w)[0].abs(), BAND.low(), BAND.high(), 20_000);
        assertEquals(sweep, check.asBuiltPeak(), 1e-6 * sweep);
        List<PointAbsorber> trimmed = new ArrayList<>();
        for (int j = 0; j < 2; j++) {
            PointAbsorber b = asBuilt.get(j);
            trimmed.add(new PointAbsorber(b.point(), b.mass() + check.corrections().get(j).massToAdd(), b.stiffness(),
                    b.damping()));
        }
        double afterSweep = 400 * DenseSweep.maximum(w -> ModalDirectSolve.solve(FLOOR.modes(), trimmed, "display",
                "midspan", w)[0].abs(), BAND.low(), BAND.high(), 20_000);
        assertEquals(afterSweep, check.afterTrimPeak(), 1e-6 * afterSweep);
        assertTrue(check.afterTrimPeak() < check.asBuiltPeak(), "trimming the masses brings the peak down");
        assertEquals(design.peakAfter(), check.designPeak(), 0.0);
    }

    /** Invented trim plates: each 1 % of the absorber's mass, 10 fitted as built of 20 supplied; frequency tolerance 1.5 %. */
    private static List<Optional<SetCommissioning.Plates>> plates() {
        List<Optional<SetCommissioning.Plates>> out = new ArrayList<>();
        for (PointAbsorber d : design.absorbers()) {
            double plate = 0.01 * d.mass();
            double k = d.stiffness();
            double m = d.mass();
            out.add(Optional.of(new SetCommissioning.Plates(new TrimPlan(Math.sqrt(k / (m + 10 * plate)),
                    Math.sqrt(k / (m - 10 * plate)), plate, 10, 20, 0.5, 2.0), 0.015)));
        }
        return out;
    }

    /**
     * With its trim plates known each absorber's trim is whole plates: the nearest whole number to the
     * mass to add (omega = sqrt(k / m) at the spring rate as built, Den Hartog 1956, ch. 1), within the
     * plates spare and fitted; the peak after the trim is the dense solve's with those plates fitted.
     * An absorber built 15 % high needs about 32 % more mass, beyond its 10 spare plates of 1 %, and
     * the check says so (BEYOND_TRIM_RANGE) for it alone.
     */
    @Test
    void trimsAreWholePlatesWithinThoseSuppliedAndAShortfallIsSaid() {
        List<PointAbsorber> asBuilt = built(new double[] {1.03, 0.975}, new double[] {1, 1});
        SetCommissioning check = SetCommissioning.of(design, measured(FLOOR, asBuilt, 0, 2), false, List.of(),
                plates());
        assertTrue(check.advised(), check.warnings().toString());
        List<PointAbsorber> trimmed = new ArrayList<>();
        for (int j = 0; j < 2; j++) {
            PointAbsorber b = asBuilt.get(j);
            SetCommissioning.Correction k = check.corrections().get(j);
            double plate = 0.01 * design.absorbers().get(j).mass();
            long expected = Math.round(k.massToAdd() / plate);
            assertEquals(expected, k.platesToAdd().getAsInt(), "absorber " + j + ", mass to add " + k.massToAdd());
            assertTrue(Math.abs(expected) <= 10 && expected != 0, "a trim within the plates: " + expected);
            assertFalse(k.beyondTrimRange());
            trimmed.add(new PointAbsorber(b.point(), b.mass() + expected * plate, b.stiffness(), b.damping()));
        }
        double afterSweep = 400 * DenseSweep.maximum(w -> ModalDirectSolve.solve(FLOOR.modes(), trimmed, "display",
                "midspan", w)[0].abs(), BAND.low(), BAND.high(), 20_000);
        assertEquals(afterSweep, check.afterTrimPeak(), 1e-6 * afterSweep);
        assertFalse(check.warnings().contains(CommissioningWarning.BEYOND_TRIM_RANGE));

        List<PointAbsorber> far = built(new double[] {1.15, 1.0}, new double[] {1, 1});
        SetCommissioning short_ = SetCommissioning.of(design, measured(FLOOR, far, 0, 3), false, List.of(), plates());
        assertTrue(short_.warnings().contains(CommissioningWarning.BEYOND_TRIM_RANGE), short_.warnings().toString());
        assertTrue(short_.corrections().get(0).beyondTrimRange());
        assertFalse(short_.corrections().get(1).beyondTrimRange());
        // the plates it has still lower the peak, so the trim is advised: every spare plate
        assertTrue(short_.advised(), short_.warnings().toString());
        assertEquals(10, short_.corrections().get(0).platesToAdd().getAsInt(), "every spare plate");
    }

    @Test
    void aFreedModeFrequencyIsFoundAndTheTargetsAreTheSetDesignedForIt() {
        double mode = FLOOR.modes().get(design.targetMode()).naturalFrequency();
        ModalStructure shifted = FLOOR.withFrequency(design.targetMode(), mode * 0.97);
        // the set designed again for the mode as measured (same band, masses and rule): the band sets the tunings
        List<PointAbsorber> needed = SeveralAbsorbersDesigner.retuned(design, 0.97 * mode);
        double[] off = {1.02, 0.99};
        List<PointAbsorber> asBuilt = new ArrayList<>();
        for (int j = 0; j < 2; j++) {
            PointAbsorber n = needed.get(j);
            asBuilt.add(PointAbsorber.tuned(n.point(), n.mass(), n.frequency() * off[j], 0.03));
        }
        SetCommissioning check = SetCommissioning.of(design, measured(shifted, asBuilt, 0, 3), true, List.of());
        assertEquals(0.97 * mode, check.built().targetModeFrequency(), 1e-6 * mode);
        assertTrue(check.built().targetModeFrequencySd().isPresent());
        assertEquals(0.02, check.corrections().get(0).frequencyOff(), 1e-5);
        assertEquals(-0.01, check.corrections().get(1).frequencyOff(), 1e-5);
        assertTrue(check.afterTrimPeak() <= check.asBuiltPeak(), "a trim advised lowers the peak");
    }

    @Test
    void absorbersBuiltAsDesignedOnAModeThatMovedAreNeverTrimmedIntoAHigherPeak() {
        double mode = FLOOR.modes().get(design.targetMode()).naturalFrequency();
        for (double factor : new double[] {0.95, 0.97, 1.03}) {
            ModalStructure shifted = FLOOR.withFrequency(design.targetMode(), mode * factor);
            SetCommissioning check = SetCommissioning.of(design, measured(shifted, design.absorbers(), 0, 7), true,
                    List.of());
            assertTrue(check.afterTrimPeak() <= check.asBuiltPeak() * (1 + 1e-12), "factor " + factor + ": "
                    + check.afterTrimPeak() + " after against " + check.asBuiltPeak() + " as built");
        }
    }

    @Test
    void absorbersWhoseFrequenciesCrossedArePairedWithTheDesignInOrderOfFrequency() {
        // absorber 1 built 12 % high and absorber 2 7 % low: the one now lower is reported as absorber 1
        double[] f = {1.12, 0.93};
        SetCommissioning check = SetCommissioning.of(design, measured(FLOOR, built(f, new double[] {1, 1}), 0, 8),
                false, List.of());
        double first = check.built().absorbers().get(0).frequency();
        double second = check.built().absorbers().get(1).frequency();
        assertTrue(first < second, first + " then " + second);
        List<Double> expected = new ArrayList<>(List.of(design.absorbers().get(0).frequency() * f[0],
                design.absorbers().get(1).frequency() * f[1]));
        expected.sort(Double::compare);
        assertEquals(expected.get(0), first, 1e-6 * first);
        assertEquals(expected.get(1), second, 1e-6 * second);
    }

    @Test
    void noisyDataGiveValuesWithinTheirUncertainty() {
        double[] f = {1.02, 0.98};
        double[] z = {1.0, 1.0};
        AsBuiltSet built = SetCommissioning.of(design, measured(FLOOR, built(f, z), 0.01, 4), false, List.of()).built();
        for (int j = 0; j < 2; j++) {
            PointAbsorber d = design.absorbers().get(j);
            AsBuiltSet.Built b = built.absorbers().get(j);
            assertTrue(b.frequencySd() > 0);
            assertEquals(d.frequency() * f[j], b.frequency(), 4 * b.frequencySd(), "within 4 standard deviations");
            double zeta = d.damping() / (2 * d.mass() * d.frequency());
            assertEquals(zeta, b.dampingRatio(), 4 * b.dampingRatioSd());
        }
        assertFalse(built.warnings().contains(CommissioningWarning.POOR_FIT));
    }

    @Test
    void aResponseNoModelMatchesIsCalledPoorOrRefusedInPlainWords() {
        Random random = new Random(5);
        double[] w = new double[60];
        double[] re = new double[60];
        double[] im = new double[60];
        for (int i = 0; i < w.length; i++) {
            w[i] = (6 + 0.1 * i) * HZ;
            re[i] = random.nextGaussian();
            im[i] = random.nextGaussian();
        }
        MeasuredFrf noise = new MeasuredFrf(w, re, im, new double[0], FrfKind.ACCELERANCE);
        try {
            SetCommissioning check = SetCommissioning.of(design, noise, false, List.of());
            assertTrue(check.built().warnings().contains(CommissioningWarning.POOR_FIT));
            assertEquals(0.0, check.corrections().get(0).massToAdd(), "no trim advised on a poor fit");
        } catch (InvalidInputException e) {
            assertTrue(e.getMessage().contains("fitted-absorber FRF"), e.getMessage());
        }
    }

    @Test
    void weighedMassesMustBeOnePerAbsorberAndNearTheDesigns() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> SetCommissioning.of(design,
                measured(FLOOR, design.absorbers(), 0, 6), false, List.of(450.0)));
        assertEquals("absorber masses as weighed", e.field());
        InvalidInputException far = assertThrows(InvalidInputException.class, () -> SetCommissioning.of(design,
                measured(FLOOR, design.absorbers(), 0, 6), false, List.of(0.001, 450.0)));
        assertEquals("absorber 1 mass as weighed", far.field());
    }

    @Test
    void threeUniformlySpreadAbsorbersOnOneModeWithTheModeOffAreEachFound() {
        // an invented rig: one mode of 1200 kg at 31 Hz, 1 % damping, three absorbers of 20 kg over 26 to 36 Hz
        ModalStructure rig = ModalStructure.singleMode("rig", 31 * HZ, 0.01, 1200);
        FrequencyBand band = new FrequencyBand(26 * HZ, 36 * HZ);
        AbsorberLayout layout = new AbsorberLayout(rig, List.of("rig mode"), "rig", "rig", "rig", OptionalInt.empty(),
                3, AbsorberSetTuning.UNIFORM);
        Structure single = new Structure(1200, 1200 * 31 * HZ * 31 * HZ, 0.01, 1.0);
        DesignStudy study = new DesignStudy("invented rig", single, new Excitation(ExcitationKind.FORCE, 250, band),
                ResponseKind.DISPLACEMENT, AbsorberSizing.ofMass(60), DesignMethod.EXACT_PEAK, false, 1.5);
        SeveralAbsorbers set = SeveralAbsorbersDesigner.design(Designer.design(study), layout);
        double[] f = {1.03, 0.98, 1.01};
        ModalStructure off = rig.withFrequency(0, 31 * HZ * 1.04);
        List<PointAbsorber> built = new ArrayList<>();
        for (int j = 0; j < 3; j++) {
            PointAbsorber d = set.absorbers().get(j);
            built.add(new PointAbsorber("rig", d.mass(), d.stiffness() * f[j] * f[j], d.damping() * 0.8));
        }
        int lines = 321;
        double[] w = new double[lines];
        double[] re = new double[lines];
        double[] im = new double[lines];
        for (int i = 0; i < lines; i++) {
            w[i] = (20 + 20.0 * i / (lines - 1)) * HZ;
            Complex h = ModalDirectSolve.solve(off.modes(), built, "rig", "rig", w[i])[0].multiply(-w[i] * w[i]);
            re[i] = h.getReal();
            im[i] = h.getImaginary();
        }
        SetCommissioning check = SetCommissioning.of(set, new MeasuredFrf(w, re, im, new double[0],
                FrfKind.ACCELERANCE), true, List.of());
        assertEquals(31 * HZ * 1.04, check.built().targetModeFrequency(), 1e-6 * 31 * HZ);
        for (int j = 0; j < 3; j++) {
            PointAbsorber d = set.absorbers().get(j);
            assertEquals(d.frequency() * f[j], check.built().absorbers().get(j).frequency(), 1e-6 * d.frequency());
            // the targets are the set designed again for the mode as measured
            double target = SeveralAbsorbersDesigner.retuned(set, 31 * HZ * 1.04).get(j).frequency();
            assertEquals(d.frequency() * f[j] / target - 1, check.corrections().get(j).frequencyOff(), 1e-6);
        }
    }
}
