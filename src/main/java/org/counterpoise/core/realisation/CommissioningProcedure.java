package org.counterpoise.core.realisation;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.realisation.StepFigure.StepQuantity;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Dimension;

/**
 * The tuning and commissioning procedure: the steps of {@link ProcedureStepKind} in order, each with
 * the numbers the technician needs (the words are in io.text). The absorber's target follows the
 * MEASURED structure frequency at the design's tuning ratio; the figures give the value for the
 * expected structure frequency.
 */
public final class CommissioningProcedure {

    private CommissioningProcedure() {
    }

    /**
     * @param design the design
     * @param tolerances the part tolerances (the absorber frequency tolerance)
     * @param trim the trim plan
     * @return the steps, in {@link ProcedureStepKind} order
     */
    public static List<ProcedureStep> of(DesignResult design, PartTolerances tolerances, TrimPlan trim) {
        double omega1 = design.study().structure().naturalFrequency();
        double ratio = design.tuning().tuningRatio();
        double target = ratio * omega1;
        Excitation e = design.study().excitation();
        double running = DamperSizing.runningFrequency(e.band());
        ResponseKind kind = design.study().response();
        double predicted = DamperSizing.fitted(design).amplitudeAt(kind, running);
        List<ProcedureStep> steps = new ArrayList<>();
        for (ProcedureStepKind step : ProcedureStepKind.values()) {
            List<StepFigure> figures = switch (step) {
                case MEASURE_STRUCTURE -> List.of(
                        new StepFigure(StepQuantity.EXPECTED_STRUCTURE_FREQUENCY, omega1, Dimension.FREQUENCY));
                case COMPUTE_ABSORBER_TARGET -> List.of(
                        new StepFigure(StepQuantity.TUNING_RATIO, ratio, Dimension.RATIO),
                        new StepFigure(StepQuantity.ABSORBER_TARGET_FREQUENCY, target, Dimension.FREQUENCY));
                case TUNE_ABSORBER -> List.of(
                        new StepFigure(StepQuantity.ABSORBER_TARGET_FREQUENCY, target, Dimension.FREQUENCY),
                        new StepFigure(StepQuantity.ABSORBER_FREQUENCY_TOLERANCE, tolerances.absorberFrequency(),
                                Dimension.RATIO));
                case FIT -> List.of(new StepFigure(StepQuantity.CLEARANCE, design.clearance(), Dimension.LENGTH));
                case MEASURE_RESPONSE -> List.of(
                        new StepFigure(StepQuantity.RUNNING_FREQUENCY, running, Dimension.FREQUENCY),
                        new StepFigure(StepQuantity.PREDICTED_RESPONSE, predicted, kind.dimension()));
                case COMPARE -> List.of(new StepFigure(StepQuantity.PREDICTED_PEAK_IN_BAND,
                        design.responseAfter().value(), kind.dimension()));
                case ADJUST -> List.of(
                        new StepFigure(StepQuantity.TRIM_PLATE_MASS, trim.plateMass(), Dimension.MASS),
                        new StepFigure(StepQuantity.PLATES_PER_PERCENT, trim.platesPerPercent(), Dimension.RATIO));
            };
            steps.add(new ProcedureStep(step, figures));
        }
        return List.copyOf(steps);
    }
}
