package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.counterpoise.core.realisation.ProcedureStep;
import org.counterpoise.core.realisation.ProcedureStepKind;
import org.counterpoise.core.realisation.StepFigure;
import org.counterpoise.core.realisation.StepFigure.StepQuantity;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.text.ReportValue.Count;
import org.counterpoise.io.text.ReportValue.Field;
import org.counterpoise.io.text.ReportValue.Fields;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The tuning and commissioning procedure in words a technician follows: one sentence per
 * {@link ProcedureStepKind}, with the step's {@link StepFigure}s in the display units, numbered in
 * order; and the figures as the JSON's {@code figures} object of each step (keys per
 * {@link StepQuantity} in {@link ReportKey}). A figure a step does not carry leaves its clause out.
 */
public final class ProcedureText {
    private ProcedureText() {
    }

    /**
     * @param steps the procedure, in order
     * @param units the unit system the sentences state their figures in
     * @return one row per step: label the step's number, value its record whose text is the sentence
     */
    static List<ReportRow> rows(List<ProcedureStep> steps, UnitSystem units) {
        List<ReportRow> rows = new ArrayList<>();
        for (int i = 0; i < steps.size(); i++) {
            ProcedureStep step = steps.get(i);
            String sentence = sentence(step, units);
            List<Field> figures = new ArrayList<>();
            for (StepFigure f : step.figures()) {
                figures.add(new Field(key(f.quantity()), label(f.quantity()), value(f)));
            }
            List<Field> fields = List.of(new Field(ReportKey.STEP_NUMBER, "step", new Count(i + 1)),
                    new Field(ReportKey.STEP_KIND, "kind", new Words(id(step.kind()), List.of())),
                    new Field(ReportKey.STEP_TEXT, "what to do", new Words(sentence, List.of())),
                    new Field(ReportKey.STEP_FIGURES, "figures", new Fields("", figures)));
            rows.add(new ReportRow(ReportKey.PROCEDURE_STEP, Integer.toString(i + 1), "", new Fields(sentence, fields),
                    "", ""));
        }
        return rows;
    }

    /**
     * @param kind a step
     * @return its identifier in the JSON ("measure-structure")
     */
    public static String id(ProcedureStepKind kind) {
        return kind.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /**
     * @param step a step with its figures
     * @return what the technician does, one sentence, in SI
     */
    public static String sentence(ProcedureStep step) {
        return sentence(step, UnitSystem.SI);
    }

    /**
     * @param step a step with its figures
     * @param units the unit system its figures are stated in
     * @return what the technician does, one sentence
     */
    public static String sentence(ProcedureStep step, UnitSystem units) {
        return switch (step.kind()) {
            case MEASURE_STRUCTURE -> "Measure the structure's natural frequency with the absorber locked or not yet"
                    + " fitted (tap test, run-down or shaker)" + clause(units, step, "; the design expects ",
                            StepQuantity.EXPECTED_STRUCTURE_FREQUENCY) + ".";
            case COMPUTE_ABSORBER_TARGET -> "Check the measured structure frequency against the range the design holds"
                    + clause(units, step, " (", StepQuantity.STRUCTURE_RANGE_LOW, " to")
                    + clause(units, step, " ", StepQuantity.STRUCTURE_RANGE_HIGH, ")") + ": inside it, keep the"
                    + " absorber frequency of the design" + clause(units, step, ", ", StepQuantity.ABSORBER_TARGET_FREQUENCY)
                    + ", whatever the structure measured (the forcing sets it: do not scale it with the structure"
                    + clause(units, step, "; the peak in the band then stays within ",
                            StepQuantity.STRUCTURE_RANGE_ALLOWANCE, " of the design's")
                    + clause(units, step, "; the response in the band then stays below ",
                            StepQuantity.STRUCTURE_RANGE_ALLOWANCE_OF_BARE, " of the bare structure's")
                    + "; after fitting, site-check with --free-structure on the response measured with the absorber"
                    + " fitted gives the frequency re-optimised for the structure as measured); outside it, do not"
                    + " tune: design again with the measured frequency.";
            case TUNE_ABSORBER -> "Tune the absorber alone, clamped to a rigid base, by tap test or shaker to that"
                    + " frequency" + clause(units, step, " (", StepQuantity.ABSORBER_TARGET_FREQUENCY, ")")
                    + clause(units, step, " within +/-",
                                    StepQuantity.ABSORBER_FREQUENCY_TOLERANCE) + ", adding or taking off trim plates.";
            case FIT -> "Fit the absorber with its retention and secondary catch, check"
                    + clause(units, step, " the clearance of ", StepQuantity.CLEARANCE, " around the mass in every"
                            + " direction,") + " that the stroke stops are in place and that every fixing is"
                    + " tightened and locked.";
            case MEASURE_RESPONSE -> "Run the machine and measure the structure's response at the running speed"
                    + clause(units, step, " ", StepQuantity.RUNNING_FREQUENCY) + clause(units, step, " (the design predicts a peak"
                            + " of ", StepQuantity.PREDICTED_RESPONSE, " there with the absorber)")
                    + " and over the whole band.";
            case COMPARE -> "Compare the readings with the predicted response table"
                    + clause(units, step, "; over the band the peak with the absorber should not exceed ",
                            StepQuantity.PREDICTED_PEAK_IN_BAND) + ".";
            case ADJUST -> "If the readings are off, adjust by the trim step"
                    + clause(units, step, " (one plate is ", StepQuantity.TRIM_PLATE_MASS, ";")
                    + clause(units, step, " ", StepQuantity.PLATES_PER_PERCENT, " plates per percent of frequency)")
                    + ": add plates to lower the absorber frequency, take them off to raise it, then tune and measure"
                    + " again.";
        };
    }

    /**
     * @param q a step's number
     * @return its words, lower case
     */
    static String label(StepQuantity q) {
        return switch (q) {
            case EXPECTED_STRUCTURE_FREQUENCY -> "expected structure frequency";
            case STRUCTURE_RANGE_LOW -> "lowest structure frequency the design holds";
            case STRUCTURE_RANGE_HIGH -> "highest structure frequency the design holds";
            case STRUCTURE_RANGE_ALLOWANCE -> "rise of the design's peak allowed over that range";
            case STRUCTURE_RANGE_ALLOWANCE_OF_BARE -> "response over that range, at most, of the bare structure's";
            case ABSORBER_TARGET_FREQUENCY -> "absorber target frequency";
            case ABSORBER_FREQUENCY_TOLERANCE -> "absorber frequency tolerance, +/-";
            case CLEARANCE -> "clearance";
            case RUNNING_FREQUENCY -> "running frequency";
            case PREDICTED_RESPONSE -> "predicted response";
            case PREDICTED_PEAK_IN_BAND -> "predicted peak in the band";
            case TRIM_PLATE_MASS -> "trim plate mass";
            case PLATES_PER_PERCENT -> "plates per percent of frequency";
        };
    }

    /**
     * @param q a step's number
     * @return its key in the step's {@code figures} object
     */
    static ReportKey key(StepQuantity q) {
        return switch (q) {
            case EXPECTED_STRUCTURE_FREQUENCY -> ReportKey.FIGURE_EXPECTED_STRUCTURE_FREQUENCY;
            case STRUCTURE_RANGE_LOW -> ReportKey.FIGURE_STRUCTURE_RANGE_LOW;
            case STRUCTURE_RANGE_HIGH -> ReportKey.FIGURE_STRUCTURE_RANGE_HIGH;
            case STRUCTURE_RANGE_ALLOWANCE -> ReportKey.FIGURE_STRUCTURE_RANGE_ALLOWANCE;
            case STRUCTURE_RANGE_ALLOWANCE_OF_BARE -> ReportKey.FIGURE_STRUCTURE_RANGE_ALLOWANCE_OF_BARE;
            case ABSORBER_TARGET_FREQUENCY -> ReportKey.FIGURE_ABSORBER_TARGET_FREQUENCY;
            case ABSORBER_FREQUENCY_TOLERANCE -> ReportKey.FIGURE_ABSORBER_FREQUENCY_TOLERANCE;
            case CLEARANCE -> ReportKey.FIGURE_CLEARANCE;
            case RUNNING_FREQUENCY -> ReportKey.FIGURE_RUNNING_FREQUENCY;
            case PREDICTED_RESPONSE -> ReportKey.FIGURE_PREDICTED_RESPONSE;
            case PREDICTED_PEAK_IN_BAND -> ReportKey.FIGURE_PREDICTED_PEAK_IN_BAND;
            case TRIM_PLATE_MASS -> ReportKey.FIGURE_TRIM_PLATE_MASS;
            case PLATES_PER_PERCENT -> ReportKey.FIGURE_PLATES_PER_PERCENT;
        };
    }

    /** A figure's value: a tolerance as a percentage, everything else a quantity of its dimension. */
    private static ReportValue value(StepFigure f) {
        if (f.quantity() == StepQuantity.ABSORBER_FREQUENCY_TOLERANCE || f.quantity() == StepQuantity.STRUCTURE_RANGE_ALLOWANCE
                || f.quantity() == StepQuantity.STRUCTURE_RANGE_ALLOWANCE_OF_BARE) {
            return new Percent(f.value(), 2);
        }
        return f.dimension() == Dimension.RATIO ? new Quantity(f.value(), Dimension.RATIO, 4)
                : DesignContent.quantity(f.value(), f.dimension());
    }

    private static String clause(UnitSystem units, ProcedureStep step, String before, StepQuantity q) {
        return clause(units, step, before, q, "");
    }

    /** The figure in words between its words before and after, or nothing when the step does not carry it. */
    private static String clause(UnitSystem units, ProcedureStep step, String before, StepQuantity q,
            String after) {
        Optional<StepFigure> f = step.figures().stream().filter(x -> x.quantity() == q).findFirst();
        return f.map(x -> before + ValueText.inline(value(x), units) + after).orElse("");
    }
}
