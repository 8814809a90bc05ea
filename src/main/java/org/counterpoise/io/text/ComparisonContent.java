package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.MethodComparison;
import org.counterpoise.core.design.MethodComparison.Candidate;
import org.counterpoise.core.design.RunUpStroke;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.runup.SpeedRamp;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.text.ReportComparison.Column;
import org.counterpoise.io.text.ReportComparison.Line;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * Builds the {@link ReportComparison} of a {@link MethodComparison}: the only place that decides
 * the comparison's columns, and the one place the words for its typed reasons are written.
 */
public final class ComparisonContent {
    /** The columns, in order: the one list. */
    static final List<Column> COLUMNS = List.of(
            new Column(ReportKey.METHOD, "Method", true),
            new Column(ReportKey.MASS_RATIO, "\u03bc", false),
            new Column(ReportKey.TUNING_RATIO, "f", true),
            new Column(ReportKey.ABSORBER_DAMPING_RATIO, "\u03b6a", true),
            new Column(ReportKey.NOMINAL_PEAK, "Nominal peak", true),
            new Column(ReportKey.WORST_CASE_PEAK, "Worst case", true),
            new Column(ReportKey.P95_PEAK, "P95", true),
            new Column(ReportKey.STROKE, "Stroke", true),
            new Column(ReportKey.STROKE_RUN_UP, "Run-up stroke", true),
            new Column(ReportKey.RUN_UP_STROKE_BASIS, "Run-up basis", false),
            new Column(ReportKey.SPRING_FORCE, "Spring force", true));

    private ComparisonContent() {
    }

    /**
     * @param c the comparison
     * @param study the study compared (its response and tolerance ranges name the figures)
     * @return the comparison as the report model holds it
     */
    public static ReportComparison of(MethodComparison c, DesignStudy study) {
        Dimension response = study.response().dimension();
        List<Line> lines = new ArrayList<>();
        for (Candidate k : c.candidates()) {
            List<ReportValue> cells = List.of(
                    new Words(k.method().id(), List.of(k.method().id())),
                    DesignContent.quantity(k.tuning().massRatio(), Dimension.RATIO),
                    DesignContent.quantity(k.tuning().tuningRatio(), Dimension.RATIO),
                    DesignContent.quantity(k.tuning().dampingRatio(), Dimension.RATIO),
                    DesignContent.quantity(k.nominalPeak().value(), response),
                    DesignContent.quantity(k.worstPeak(), response),
                    DesignContent.quantity(k.p95(), response),
                    DesignContent.quantity(k.strokeInBand().value(), Dimension.LENGTH),
                    DesignContent.quantity(k.strokeRunUp().peak().value(), Dimension.LENGTH),
                    new Words(basis(k.strokeRunUp().basis()), List.of(id(k.strokeRunUp().basis()))),
                    DesignContent.quantity(k.springForce().value(), Dimension.FORCE));
            lines.add(new Line(k.method().id(), cells, k.method() == c.recommended(), k.method() == c.chosen(),
                    k.constrained()));
        }
        List<String> notes = new ArrayList<>();
        c.candidates().stream().map(k -> k.strokeRunUp().basis()).distinct()
                .forEach(b -> notes.add("Run-up stroke: " + basis(b) + "."));
        for (Candidate k : c.candidates()) {
            if (!k.constrained()) {
                notes.add(k.method().id() + " does not take the project's constraints (stroke limit, fixed tuning or"
                        + " damping): it is compared without them.");
            }
        }
        for (MethodComparison.LeftOut l : c.leftOut()) {
            notes.add(l.method().id() + " is not compared: " + leftOut(l.reason()) + ".");
        }
        List<ReportComparison.LeftOut> leftOut = c.leftOut().stream()
                .map(l -> new ReportComparison.LeftOut(l.method().id(), id(l.reason()))).toList();
        String title = "Method comparison (same absorber mass"
                + (c.candidates().isEmpty() ? "" : ", mass ratio " + QuantityFormat.number(
                        c.candidates().get(0).tuning().massRatio(), 4))
                + "; peaks of " + study.response().label() + (study.excitation().band().isSingle()
                        ? " at the forcing frequency)" : " over the band)");
        return new ReportComparison(title, COLUMNS, lines, new Words(recommendation(c, study.robustness().ranges()),
                List.of(c.recommended().id(), id(c.why()))), chosen(c), notes, leftOut);
    }

    private static String recommendation(MethodComparison c, ToleranceRanges r) {
        return switch (c.why()) {
            case LEAST_WORST_CASE -> c.recommended().id() + ": the least worst-case peak over the tolerance ranges"
                    + " (structure frequency +/-" + ValueText.percent(r.structure(), 2) + ", absorber frequency +/-"
                    + ValueText.percent(r.absorber(), 2) + ", absorber damping +/-" + ValueText.percent(r.damping(), 2)
                    + ") among the designs with an absorber damping ratio of at least "
                    + ValueText.percent(Designer.PRACTICAL_DAMPING_RATIO, 2) + " (the least a practical damper gives;"
                    + " common practice, no source)" + (c.recommended() == DesignMethod.ROBUST_WORST_CASE
                            ? "; robust-worst-case minimises exactly this figure at the same mass, so it is"
                                    + " recommended by construction" : "");
            case WHITE_NOISE -> c.recommended().id() + ": under white noise the design minimises the rms response;"
                    + " the peak methods do not apply";
        };
    }

    private static String chosen(MethodComparison c) {
        if (c.chosen() == c.recommended()) {
            return "The design shown is the recommended one (" + c.chosen().id() + ").";
        }
        String figures = c.chosenCandidate().flatMap(ch -> c.recommendedCandidate().map(rec ->
                String.format(Locale.ROOT, "; its worst case over the tolerances is %.3g times the recommended"
                        + " design's", ch.worstPeak() / rec.worstPeak()))).orElse("");
        return "The design shown is " + c.chosen().id() + ", as the project chose, not the recommended "
                + c.recommended().id() + figures + ".";
    }

    private static String basis(RunUpStroke.Basis b) {
        return switch (b) {
            case TRANSIENT -> "transient peak of a run-up from rest at the project's run-up rate to "
                    + QuantityFormat.number(SpeedRamp.DEFAULT_OVERSPEED, 3) + " times the top of the band, integrated"
                    + " in time";
            case STEADY_STATE -> "steady-state peak from rest to the top of the band (the project states no run-up"
                    + " rate; a real run-up passes faster but rings on)";
            case STEADY_STATE_NOT_INTEGRATED -> "steady-state peak from rest to the top of the band (this disturbance"
                    + " or ramp is not integrated in time)";
        };
    }

    private static String leftOut(MethodComparison.LeftOutReason reason) {
        return switch (reason) {
            case NO_CLOSED_FORM -> "no published closed form exists for this disturbance and response";
            case NO_CERTIFIED_OPTIMUM -> "its optimum could not be certified";
            case NOT_ONE_SPEED -> "an undamped absorber works at one speed only, and the disturbance has a band";
            case WHITE_NOISE -> "under white noise the design minimises the rms response, not a peak";
            case NOT_FOR_THIS_STUDY -> "it does not take this project's inputs";
        };
    }

    /** @return an enum constant as a JSON id: lower case, words joined by '-' */
    static String id(Enum<?> e) {
        return e.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
