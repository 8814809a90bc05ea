package org.counterpoise.core.realisation;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.realisation.StepFigure.StepQuantity;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.units.Dimension;

/**
 * The tuning and commissioning procedure: the steps of {@link ProcedureStepKind} in order, each with
 * the numbers the technician needs (the words are in io.text). The absorber's target is its design
 * frequency (the tuning ratio of the absorber as built, the design's or the hysteretic optimum's for
 * an elastomer element, times the expected structure frequency), kept whatever the structure
 * measures while that lies in the range the design holds (its tolerated structure mistuning: the
 * peak in band within {@link DesignResult#TOLERANCE_ALLOWANCE}; an end beyond the search is given at
 * the search limit). Scaling the target with a structure found off, the usual rule for an absorber
 * designed over all frequencies, is wrong at one speed or over a band, where the forcing sets the
 * tuning: on the one-speed presets, plates so chosen for a structure 5 % off raised the peak 3 to
 * 6 times (docs/identify.md, the site check). Outside the range the design does not hold.
 */
public final class CommissioningProcedure {

    private CommissioningProcedure() {
    }

    /**
     * @param design the design
     * @param built the absorber as built (its tuning ratio and responses)
     * @param tolerances the part tolerances (the absorber frequency tolerance)
     * @param trim the trim plan
     * @return the steps, in {@link ProcedureStepKind} order
     */
    static List<ProcedureStep> of(DesignResult design, BuiltAbsorber built, PartTolerances tolerances,
            TrimPlan trim) {
        double omega1 = design.study().structure().naturalFrequency();
        double target = built.tuningRatio() * omega1;
        Excitation e = design.study().excitation();
        double running = DamperSizing.runningFrequency(e.band());
        ResponseKind kind = design.study().response();
        double predicted = built.amplitudeAt(kind, running);
        List<ProcedureStep> steps = new ArrayList<>();
        for (ProcedureStepKind step : ProcedureStepKind.values()) {
            List<StepFigure> figures = switch (step) {
                case MEASURE_STRUCTURE -> List.of(
                        new StepFigure(StepQuantity.EXPECTED_STRUCTURE_FREQUENCY, omega1, Dimension.FREQUENCY));
                case COMPUTE_ABSORBER_TARGET -> targetFigures(design.structureTolerance(), omega1, target);
                case TUNE_ABSORBER -> List.of(
                        new StepFigure(StepQuantity.ABSORBER_TARGET_FREQUENCY, target, Dimension.FREQUENCY),
                        new StepFigure(StepQuantity.ABSORBER_FREQUENCY_TOLERANCE, tolerances.absorberFrequency(),
                                Dimension.RATIO));
                case FIT -> List.of(new StepFigure(StepQuantity.CLEARANCE, design.clearance(), Dimension.LENGTH));
                case MEASURE_RESPONSE -> List.of(
                        new StepFigure(StepQuantity.RUNNING_FREQUENCY, running, Dimension.FREQUENCY),
                        new StepFigure(StepQuantity.PREDICTED_RESPONSE, predicted, kind.dimension()));
                case COMPARE -> List.of(new StepFigure(StepQuantity.PREDICTED_PEAK_IN_BAND,
                        built.peakInBand(kind), kind.dimension()));
                case ADJUST -> List.of(
                        new StepFigure(StepQuantity.TRIM_PLATE_MASS, trim.plateMass(), Dimension.MASS),
                        new StepFigure(StepQuantity.PLATES_PER_PERCENT, trim.platesPerPercent(), Dimension.RATIO));
            };
            steps.add(new ProcedureStep(step, figures));
        }
        return List.copyOf(steps);
    }

    /** The structure range the design holds (when defined) and the absorber frequency to keep. */
    private static List<StepFigure> targetFigures(MistuningRange range, double omega1, double target) {
        List<StepFigure> figures = new ArrayList<>();
        if (range.defined()) {
            double limit = range.searchLimit();
            figures.add(new StepFigure(StepQuantity.STRUCTURE_RANGE_LOW, omega1 * range.low().orElse(1 - limit),
                    Dimension.FREQUENCY));
            figures.add(new StepFigure(StepQuantity.STRUCTURE_RANGE_HIGH, omega1 * range.high().orElse(1 + limit),
                    Dimension.FREQUENCY));
            figures.add(new StepFigure(range.ofBareResponse() ? StepQuantity.STRUCTURE_RANGE_ALLOWANCE_OF_BARE
                    : StepQuantity.STRUCTURE_RANGE_ALLOWANCE, range.allowance(), Dimension.RATIO));
        }
        figures.add(new StepFigure(StepQuantity.ABSORBER_TARGET_FREQUENCY, target, Dimension.FREQUENCY));
        return List.copyOf(figures);
    }
}
