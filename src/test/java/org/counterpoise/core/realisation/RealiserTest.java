package org.counterpoise.core.realisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.error.WarningParameter;
import org.counterpoise.core.realisation.StepFigure.StepQuantity;
import org.counterpoise.io.project.ProjectReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The assembled realisation and the dossier's once-per-choice rule (counted, never timed). */
class RealiserTest {

    static List<Path> presets() {
        return Presets.files();
    }

    @ParameterizedTest
    @MethodSource("presets")
    void everyPresetGetsAllItsPartsWithFiniteFigures(Path preset) {
        DesignResult d = Presets.design(preset);
        Realisation r = Realiser.realise(d, HardwareChoice.DEFAULT);
        assertEquals(HardwareChoice.DEFAULT, r.choice());
        assertEquals(List.of(ProcedureStepKind.values()), r.procedure().stream().map(ProcedureStep::kind).toList());
        for (ProcedureStep step : r.procedure()) {
            assertTrue(!step.figures().isEmpty(), step.kind() + " has no figures");
            step.figures().forEach(f -> assertTrue(Double.isFinite(f.value()), preset + ": " + f));
        }
        assertTrue(r.elastomer().isEmpty());
        List<DesignCheck> all = new ArrayList<>();
        // the default choice is helical springs: always present; off the design's rate only with its warning
        SpringDesign spring = r.spring().orElseThrow();
        // first the total rate against the rate tolerance: |sum of G d^4/(8 D^3 n)| over k2 - 1, by hand
        DesignCheck rate = r.checks().get(0);
        assertEquals(CheckKind.SPRING_RATE, rate.kind());
        assertEquals(Math.abs(spring.count() * spring.ratePerSpring() / d.absorber().stiffness() - 1), rate.demand(),
                1e-12, preset.toString());
        assertEquals(r.tolerances().springRate(), rate.capacity());
        all.add(rate);
        all.addAll(spring.checks());
        boolean rateMissed = r.warnings().stream().anyMatch(w -> w.kind() == WarningKind.SPRING_RATE_NOT_MET);
        // the springs realise the design's rate (the sizing rounds the coil diameter to a workshop step)
        assertEquals(!rateMissed, Math.abs(spring.totalRate() / d.absorber().stiffness() - 1)
                <= SpringSizing.RATE_DEVIATION_BOUND, preset.toString());
        all.addAll(r.damper().checks());
        assertEquals(all, r.checks());
        assertTrue(Double.isFinite(r.damper().peakForce()) && r.damper().peakForce() >= 0, preset.toString());
        assertTrue(r.trim().platesTotal() >= r.trim().platesFitted() && r.trim().platesFitted() >= 0);
        r.predicted().forEach(p -> assertTrue(Double.isFinite(p.before()) && Double.isFinite(p.after())
                && Double.isFinite(p.stroke()), preset + ": " + p));
    }

    @Test
    void aRateNoStockSpringGivesIsShownAsTheClosestSpringsWithTheirDeviation() {
        // the compressor frame's absorber asks for about 50 MN/m, beyond 8 springs of the stock wire sizes
        DesignResult stiff = Presets.design(Path.of("presets", "compressor-frame-speed-band.json"));
        Realisation r = Realiser.realise(stiff, HardwareChoice.DEFAULT);
        SpringDesign closest = r.spring().orElseThrow();
        Warning missed = r.warnings().stream().filter(w -> w.kind() == WarningKind.SPRING_RATE_NOT_MET)
                .findFirst().orElseThrow();
        // the warning carries the deviation of the springs shown, total rate over the design's minus one
        assertEquals(closest.totalRate() / stiff.absorber().stiffness() - 1,
                missed.number(WarningParameter.RATE_DEVIATION), 1e-12);
        assertTrue(Math.abs(missed.number(WarningParameter.RATE_DEVIATION)) > SpringSizing.RATE_DEVIATION_BOUND);
        // and the part list does not say "all pass": the rate check fails (0.87 off against a 5 % tolerance)
        DesignCheck rate = r.checks().get(0);
        assertEquals(CheckKind.SPRING_RATE, rate.kind());
        assertFalse(rate.passes(), rate.toString());
        assertEquals(7, r.procedure().size());
    }

    @Test
    void anElastomerChoiceGetsTheElementAndNoSprings() {
        HardwareChoice rubber = new HardwareChoice(SpringKind.ELASTOMER, SpringMaterial.EN10270_1_DH, 0,
                DamperKind.ELASTOMER_LOSS, EddyCurrentChoice.DEFAULT, ElastomerChoice.DEFAULT, 50_000, 0.01, 0.01);
        Realisation r = Realiser.realise(Presets.fan(), rubber);
        assertTrue(r.spring().isEmpty());
        ElastomerDesign element = r.elastomer().orElseThrow();
        assertEquals(element.checks().get(0), r.checks().get(0));
        // the element's dynamic stiffness is the absorber mass at the hysteretic optimum's frequency squared
        double omegaA = element.optimum().tuningRatio() * Presets.fan().study().structure().naturalFrequency();
        assertEquals(Presets.fan().absorber().mass() * omegaA * omegaA, element.dynamicStiffness(),
                1e-9 * element.dynamicStiffness());
    }

    @Test
    void theSpringDemandOfTheFanByHand() {
        DesignResult fan = Presets.fan(); // hangs vertically: the absorber rests on its springs
        SpringDemand demand = Realiser.springDemand(fan, HardwareChoice.DEFAULT);
        assertEquals(fan.absorber().stiffness(), demand.rate(), 0.0);
        // weight m2 g with standard gravity 9.80665 m/s^2: 90 kg -> 882.60 N
        assertEquals(90 * 9.80665, demand.staticLoad(), 1e-9);
        // the run-up stroke (0.5186 mm at 723.4 kN/m = 375.2 N) is worse than the band's spring force (331.9 N)
        assertEquals(fan.absorber().stiffness() * fan.strokeRunUp().value(), demand.dynamicLoad(), 1e-9);
        assertTrue(demand.dynamicLoad() > fan.springForce().value());
        assertEquals(375.2, demand.dynamicLoad(), 0.1);
        // 50 000 h at the top of the band, 900 rpm = 15 Hz: 50 000 * 3600 * 15 = 2.7e9 cycles
        assertEquals(fan.study().excitation().band().high(), demand.forcingFrequency(), 0.0);
        assertEquals(2.7e9, demand.serviceCycles(), 1e-3 * 2.7e9);
    }

    @Test
    void theProcedureCarriesTheDesignsNumbers() {
        DesignResult fan = Presets.fan();
        Realisation r = Realiser.realise(fan, HardwareChoice.DEFAULT);
        double omega1 = fan.study().structure().naturalFrequency();
        assertEquals(omega1, figure(r, ProcedureStepKind.MEASURE_STRUCTURE, StepQuantity.EXPECTED_STRUCTURE_FREQUENCY),
                0.0);
        assertEquals(fan.tuning().tuningRatio() * omega1,
                figure(r, ProcedureStepKind.TUNE_ABSORBER, StepQuantity.ABSORBER_TARGET_FREQUENCY), 1e-12 * omega1);
        // the absorber alone at its target: sqrt(k2 / m2) is the design's absorber frequency
        assertEquals(Math.sqrt(fan.absorber().stiffness() / fan.absorber().mass()),
                figure(r, ProcedureStepKind.TUNE_ABSORBER, StepQuantity.ABSORBER_TARGET_FREQUENCY), 1e-9 * omega1);
        assertEquals(0.03, figure(r, ProcedureStepKind.TUNE_ABSORBER, StepQuantity.ABSORBER_FREQUENCY_TOLERANCE), 0.0);
        assertEquals(fan.clearance(), figure(r, ProcedureStepKind.FIT, StepQuantity.CLEARANCE), 0.0);
        assertEquals(0.01 * fan.absorber().mass(), figure(r, ProcedureStepKind.ADJUST, StepQuantity.TRIM_PLATE_MASS),
                1e-12);
        assertEquals(2.0, figure(r, ProcedureStepKind.ADJUST, StepQuantity.PLATES_PER_PERCENT), 1e-12);
        assertEquals(fan.responseAfter().value(),
                figure(r, ProcedureStepKind.COMPARE, StepQuantity.PREDICTED_PEAK_IN_BAND), 0.0);
    }

    private static double figure(Realisation r, ProcedureStepKind kind, StepQuantity q) {
        return r.procedure().stream().filter(s -> s.kind() == kind).flatMap(s -> s.figures().stream())
                .filter(f -> f.quantity() == q).findFirst().orElseThrow().value();
    }

    @Test
    void theDossierRealisesOncePerChoiceHoweverOftenAndFromHowManyThreads() throws Exception {
        DesignDossier dossier = DesignDossier.of(ProjectReader.readStudy(Path.of("presets", "rooftop-fan-platform.json")));
        AtomicInteger count = new AtomicInteger();
        HardwareChoice eddy = DamperSizingTest.withDamper(HardwareChoice.DEFAULT, DamperKind.EDDY_CURRENT,
                EddyCurrentChoice.DEFAULT);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Callable<Realisation>> askers = new ArrayList<>();
            for (int i = 0; i < 8; i++) {
                HardwareChoice c = i % 2 == 0 ? HardwareChoice.DEFAULT : eddy;
                askers.add(() -> Realiser.realisation(dossier, c, (d, ch) -> {
                    count.incrementAndGet();
                    return Realiser.realise(d, ch);
                }));
            }
            List<Realisation> got = new ArrayList<>();
            for (Future<Realisation> f : pool.invokeAll(askers)) {
                got.add(f.get());
            }
            assertEquals(2, count.get(), "one computation per choice");
            assertSame(got.get(0), got.get(2));
            assertSame(got.get(1), got.get(3));
            assertNotSame(got.get(0), got.get(1));
        } finally {
            pool.shutdownNow();
        }
        // an equal choice (a record equal by value) finds the same realisation; the public route too
        HardwareChoice again = DamperSizingTest.withDamper(HardwareChoice.DEFAULT, DamperKind.VISCOUS_DASHPOT,
                EddyCurrentChoice.DEFAULT);
        assertSame(Realiser.realisation(dossier, HardwareChoice.DEFAULT), Realiser.realisation(dossier, again));
        assertEquals(2, count.get());
        assertEquals(Realiser.realise(dossier.design(), eddy), Realiser.realisation(dossier, eddy));
    }
}
