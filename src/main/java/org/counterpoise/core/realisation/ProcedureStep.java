package org.counterpoise.core.realisation;

import java.util.List;

/**
 * One step of the tuning and commissioning procedure with the numbers it gives.
 *
 * @param kind which step
 * @param figures its numbers, in the order shown
 */
public record ProcedureStep(ProcedureStepKind kind, List<StepFigure> figures) {

    /** Defensive copy. */
    public ProcedureStep {
        figures = List.copyOf(figures);
    }
}
