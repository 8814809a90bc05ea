package org.counterpoise.io.text;

import java.util.List;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.ToleranceRanges.FrequencyBasis;
import org.counterpoise.core.robust.ToleranceRanges.Range;
import org.counterpoise.io.project.Ids;
import org.counterpoise.io.text.ReportValue.PlusMinus;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The rows that name the ranges a design must hold over, the same in the design report and the
 * robustness report (and so in their JSON, the sheet and the wizard): each range with "stated" or
 * "default", a default's source said as common practice with no source, and how the structure's
 * natural frequency was found.
 */
public final class ToleranceRangeRows {
    /** What a range the project did not state rests on: the defaults of {@link ToleranceRanges}. */
    public static final String DEFAULT_SOURCE = "common practice, no source";
    private static final String STATED_SOURCE = "project";

    private ToleranceRangeRows() {
    }

    /**
     * @param r the ranges
     * @return structure range, its basis, absorber range and damping range, in that order
     */
    public static List<ReportRow> of(ToleranceRanges r) {
        FrequencyBasis basis = r.structureBasis();
        return List.of(range(ReportKey.STRUCTURE_MISTUNING, "expected structure mistuning", r,
                        Range.STRUCTURE_FREQUENCY),
                new ReportRow(ReportKey.STRUCTURE_FREQUENCY_BASIS, "structure natural frequency found by", "",
                        new Words(words(basis), List.of(Ids.of(basis))),
                        basis == FrequencyBasis.NOT_STATED ? "" : STATED_SOURCE, ""),
                range(ReportKey.ABSORBER_MISTUNING, "expected absorber mistuning", r, Range.ABSORBER_FREQUENCY),
                range(ReportKey.ABSORBER_DAMPING_RANGE, "expected absorber damping change", r,
                        Range.ABSORBER_DAMPING));
    }

    private static ReportRow range(ReportKey key, String label, ToleranceRanges r, Range range) {
        boolean stated = !r.isDefault(range);
        return new ReportRow(key, label, "", new PlusMinus(r.of(range), 3, stated),
                stated ? STATED_SOURCE : DEFAULT_SOURCE, "");
    }

    /**
     * @param basis how the structure's natural frequency was found
     * @return it in words, the one place they are written (reports and the wizard's list)
     */
    public static String words(FrequencyBasis basis) {
        return switch (basis) {
            case NOT_STATED -> "not stated";
            case ESTIMATED -> "estimated";
            case CALCULATED -> "calculated (a model)";
            case MEASURED -> "measured";
        };
    }
}
