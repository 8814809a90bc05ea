package org.counterpoise.io.text;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.realisation.CheckKind;
import org.counterpoise.core.realisation.DamperDesign;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.DesignCheck;
import org.counterpoise.core.realisation.EddyCurrentChoice;
import org.counterpoise.core.realisation.EddyCurrentDamper;
import org.counterpoise.core.realisation.ElastomerChoice;
import org.counterpoise.core.realisation.ElastomerDesign;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.HystereticOptimum;
import org.counterpoise.core.realisation.PartTolerances;
import org.counterpoise.core.realisation.PredictedPoint;
import org.counterpoise.core.realisation.ProcedureStep;
import org.counterpoise.core.realisation.ProcedureStepKind;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.SpringDesign;
import org.counterpoise.core.realisation.SpringKind;
import org.counterpoise.core.realisation.SpringMaterial;
import org.counterpoise.core.realisation.StepFigure;
import org.counterpoise.core.realisation.StepFigure.StepQuantity;
import org.counterpoise.core.realisation.TrimPlan;
import org.counterpoise.core.units.Dimension;

/**
 * Realisations made by hand for the report's tests, with round numbers a reader can convert by hand:
 * the report must show exactly these records, whatever the core's producers compute.
 */
final class HandMadeRealisation {
    static final double WIRE = 0.006;
    static final double COIL = 0.040;
    static final double ACTIVE = 6.25;
    /** R = G d^4 / (8 D^3 n) for the wire above (EN 13906-1 rate formula). */
    static final double RATE = SpringMaterial.EN10270_1_DH.shearModulus() * Math.pow(WIRE, 4)
            / (8 * Math.pow(COIL, 3) * ACTIVE);
    static final double SURGE_DEMAND = 2 * Math.PI * 18.0;
    static final double SURGE_CAPACITY = 2 * Math.PI * 150.0;

    private HandMadeRealisation() {
    }

    /** Four helical springs and a dashpot, for the design d. */
    static Realisation helical(DesignResult d) {
        HardwareChoice choice = HardwareChoice.DEFAULT;
        List<DesignCheck> springChecks = List.of(
                new DesignCheck(CheckKind.SPRING_SURGE, SURGE_DEMAND, SURGE_CAPACITY, Dimension.FREQUENCY,
                        "EN 13906-1:2013, surge frequency"),
                new DesignCheck(CheckKind.SPRING_SOLID, 0.030, 0.025, Dimension.LENGTH, "EN 13906-1:2013, solid length"));
        SpringDesign spring = new SpringDesign(SpringMaterial.EN10270_1_DH, 4, WIRE, COIL, ACTIVE, ACTIVE + 2, 0.120,
                0.051, 0.100, RATE, 4 * RATE, 4 * RATE / d.absorber().stiffness() - 1, 150.0, 60.0, 2.7e9,
                springChecks);
        return new Realisation(choice, Optional.of(spring), Optional.empty(), dashpot(d), tolerances(), trim(d),
                procedure(d), predicted(d), List.of());
    }

    /** An elastomer element (its own loss as the damper), for the design d. */
    static Realisation elastomer(DesignResult d) {
        HardwareChoice choice = new HardwareChoice(SpringKind.ELASTOMER, SpringMaterial.EN10270_1_DH, 0,
                DamperKind.ELASTOMER_LOSS, EddyCurrentChoice.DEFAULT, new ElastomerChoice(1.4, 0.1), 50_000, 0.01,
                0.01);
        double k = d.absorber().stiffness();
        HystereticOptimum optimum = new HystereticOptimum(0.95, 0.35, 0.002, 0.0021, Optional.of(
                new HystereticOptimum.PublishedHysteretic(0.96, 0.36, "Snowdon 1968, fixed-point optimum")));
        ElastomerDesign e = new ElastomerDesign(k, k / 1.4, 1.4, 0.35, optimum, List.of(new DesignCheck(
                CheckKind.ELASTOMER_LOSS_FACTOR, 0.35, 0.1, Dimension.RATIO, "compound data")));
        DamperDesign loss = new DamperDesign(DamperKind.ELASTOMER_LOSS, d.absorber().damping(), 0.004, 0.009, 0.5,
                0.5 * d.absorber().damping(), Optional.empty(), List.of());
        return new Realisation(choice, Optional.empty(), Optional.of(e), loss, tolerances(), trim(d), procedure(d),
                predicted(d), List.of());
    }

    /** Helical springs with an eddy-current damper, for the design d. */
    static Realisation eddyCurrent(DesignResult d) {
        HardwareChoice choice = new HardwareChoice(SpringKind.HELICAL_COMPRESSION, SpringMaterial.EN10270_1_DH, 0,
                DamperKind.EDDY_CURRENT, EddyCurrentChoice.DEFAULT, ElastomerChoice.DEFAULT, 50_000, 0.01, 0.01);
        Realisation r = helical(d);
        EddyCurrentDamper eddy = new EddyCurrentDamper(EddyCurrentChoice.DEFAULT, 0.0125, 0.6, d.absorber().damping(),
                "eddy-current brake, force = sigma B^2 A t v (drag of a thin plate)");
        DamperDesign damper = new DamperDesign(DamperKind.EDDY_CURRENT, d.absorber().damping(), 0.004, 0.009, 0.5,
                0.5 * d.absorber().damping(), Optional.of(eddy), List.of());
        return new Realisation(choice, r.spring(), Optional.empty(), damper, r.tolerances(), r.trim(), r.procedure(),
                r.predicted(), List.of());
    }

    private static DamperDesign dashpot(DesignResult d) {
        return new DamperDesign(DamperKind.VISCOUS_DASHPOT, d.absorber().damping(), 0.004, 0.009, 0.5,
                0.5 * d.absorber().damping(), Optional.empty(), List.of(new DesignCheck(CheckKind.DAMPER_STROKE, 0.018,
                        0.025, Dimension.LENGTH, "the damper's catalogue stroke")));
    }

    private static PartTolerances tolerances() {
        return new PartTolerances(0.01, 0.02, 0.2, 0.015, PartTolerances.ToleranceBasis.ROBUST_RANGES);
    }

    private static TrimPlan trim(DesignResult d) {
        double wn = d.study().structure().naturalFrequency();
        return new TrimPlan(0.95 * wn, 1.05 * wn, 0.01 * d.absorber().mass(), 5, 10, 0.5, 2.0);
    }

    /** The design's own figures: expected structure frequency, a range of +/-5 % about it, the absorber frequency. */
    static List<ProcedureStep> procedure(DesignResult d) {
        double wn = d.study().structure().naturalFrequency();
        double f = d.tuning().tuningRatio();
        return List.of(
                new ProcedureStep(ProcedureStepKind.MEASURE_STRUCTURE, List.of(new StepFigure(
                        StepQuantity.EXPECTED_STRUCTURE_FREQUENCY, wn, Dimension.FREQUENCY))),
                new ProcedureStep(ProcedureStepKind.COMPUTE_ABSORBER_TARGET, List.of(
                        new StepFigure(StepQuantity.STRUCTURE_RANGE_LOW, 0.95 * wn, Dimension.FREQUENCY),
                        new StepFigure(StepQuantity.STRUCTURE_RANGE_HIGH, 1.05 * wn, Dimension.FREQUENCY),
                        new StepFigure(StepQuantity.ABSORBER_TARGET_FREQUENCY, f * wn, Dimension.FREQUENCY))),
                new ProcedureStep(ProcedureStepKind.TUNE_ABSORBER, List.of(new StepFigure(
                        StepQuantity.ABSORBER_FREQUENCY_TOLERANCE, 0.015, Dimension.RATIO))),
                new ProcedureStep(ProcedureStepKind.FIT, List.of(new StepFigure(StepQuantity.CLEARANCE,
                        d.clearance(), Dimension.LENGTH))),
                new ProcedureStep(ProcedureStepKind.MEASURE_RESPONSE, List.of(new StepFigure(
                        StepQuantity.RUNNING_FREQUENCY, d.study().excitation().band().high(), Dimension.FREQUENCY))),
                new ProcedureStep(ProcedureStepKind.COMPARE, List.of()),
                new ProcedureStep(ProcedureStepKind.ADJUST, List.of(
                        new StepFigure(StepQuantity.TRIM_PLATE_MASS, 0.01 * d.absorber().mass(), Dimension.MASS),
                        new StepFigure(StepQuantity.PLATES_PER_PERCENT, 2.0, Dimension.RATIO))));
    }

    private static List<PredictedPoint> predicted(DesignResult d) {
        double wn = d.study().structure().naturalFrequency();
        return List.of(new PredictedPoint(0.9 * wn, 1e-4, 2e-5, 3e-4), new PredictedPoint(wn,
                Double.POSITIVE_INFINITY, 3e-5, 5e-4), new PredictedPoint(1.1 * wn, 1.2e-4, 2.5e-5, 2e-4));
    }
}
