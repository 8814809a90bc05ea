package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.optim.ActiveConstraint;
import org.counterpoise.core.design.Cautions;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.robust.WorstCase;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.project.Ids;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportValue.Factor;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;
import org.counterpoise.io.text.ReportValue.Tolerance;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * Builds the {@link ReportContent} of a robustness study: what it reports and in which words,
 * rendered by {@link RobustnessReport} and {@code io.export.RobustnessJson}. The sensitivity
 * curves and the histogram are series, not rows: those renderers write them from the result.
 */
public final class RobustnessContent {
    private static final String WORST_CASE = "worst case over the expected mistuning (corners and interior maxima)";

    private static final Set<ReportKey> AMPLITUDES = Set.of(ReportKey.NOMINAL_PEAK, ReportKey.WORST_CASE_PEAK,
            ReportKey.ROBUST_WORST_CASES, ReportKey.TARGET);

    private RobustnessContent() {
    }

    /**
     * @param design the design examined
     * @param r its robustness study
     * @return the report
     */
    public static ReportContent of(DesignResult design, RobustnessResult r) {
        ResponseKind k = design.study().response();
        Dimension d = k.dimension();
        List<ReportSection> sections = new ArrayList<>();
        List<ReportRow> study = new ArrayList<>();
        study.add(row(ReportKey.ROBUSTNESS_DESIGN, "design", "", new Words(design.study().method().id() + ", mu "
                + QuantityFormat.number(design.tuning().massRatio(), 4) + ", f "
                + QuantityFormat.number(design.tuning().tuningRatio(), 4) + ", zeta_a "
                + QuantityFormat.number(design.tuning().dampingRatio(), 4), List.of()), ""));
        study.add(row(ReportKey.RESPONSE, "response", "", new Words(k.label() + ", worst in the forcing band",
                List.of(Ids.of(k), d.siSymbol())), ""));
        study.add(ReportContent.conventionRow(AmplitudeConvention.PEAK));
        study.addAll(ToleranceRangeRows.of(r.settings().ranges()));
        sections.add(new ReportSection(SectionId.ROBUSTNESS_STUDY, "Study", study));

        WorstCase.Point w = r.worstCase();
        List<ReportRow> worst = new ArrayList<>();
        worst.add(row(ReportKey.NOMINAL_PEAK, "nominal design", "", DesignContent.quantity(design.responseAfter().value(),
                d), "exact peak over the band (docs/peak-search.md)"));
        worst.add(row(ReportKey.WORST_CASE_PEAK, "worst case of this design", "", DesignContent.quantity(w.peak(), d),
                WORST_CASE));
        worst.add(row(ReportKey.WORST_CASE_AT, "worst case at structure / absorber", "",
                new Pair(new Factor(w.structureFactor(), 3), new Factor(w.absorberFactor(), 3), PairKind.SIDE_BY_SIDE),
                WORST_CASE));
        String robust = "least worst case at the same mass";
        worst.add(row(ReportKey.ROBUST_TUNING_RATIO, "robust design: tuning ratio", "f",
                DesignContent.quantity(r.robust().tuning().tuningRatio(), Dimension.RATIO), robust));
        // the search holds a free damping at or above the practical floor (RobustnessAnalysis)
        boolean onFloor = r.robust().tuning().dampingRatio() == Designer.PRACTICAL_DAMPING_RATIO;
        worst.add(row(ReportKey.ROBUST_ABSORBER_DAMPING_RATIO, "robust design: damping ratio", "\u03b6a",
                DesignContent.quantity(r.robust().tuning().dampingRatio(), Dimension.RATIO), onFloor
                        ? robust + "; " + MethodNoteText.words(ActiveConstraint.PRACTICAL_DAMPING_FLOOR) : robust));
        worst.add(row(ReportKey.ROBUST_ABSORBER_STIFFNESS, "robust design: spring rate", "",
                DesignContent.quantity(r.robustAbsorber().stiffness(), Dimension.STIFFNESS), robust));
        worst.add(row(ReportKey.ROBUST_ABSORBER_DAMPING, "robust design: damping", "",
                DesignContent.quantity(r.robustAbsorber().damping(), Dimension.DAMPING_COEFFICIENT), robust));
        worst.add(row(ReportKey.ROBUST_WORST_CASES, "its worst case / nominal", "",
                new Pair(DesignContent.quantity(r.robust().worstCase().peak(), d),
                        DesignContent.quantity(r.robust().nominalPeak(), d), PairKind.SIDE_BY_SIDE), robust));
        worst.add(row(ReportKey.TARGET, "target", "", DesignContent.quantity(r.settings().target().orElse(Double.NaN), d), "project"));
        if (r.settings().target().isPresent() && r.toleratedForTarget().isPresent()) {
            worst.add(row(ReportKey.TOLERATED_FOR_TARGET, "structure mistuning within target", "",
                    new Tolerance(r.toleratedForTarget().get(), 1, "none: the nominal design misses the target"), ""));
        } else {
            worst.add(row(ReportKey.TOLERATED_FOR_TARGET, "structure mistuning within target", "",
                    new Pair(new ReportValue.NotApplicable(), new ReportValue.NotApplicable(), PairKind.RANGE), ""));
        }
        // the response values follow the display convention; the factors and the robust design's
        // own figures are no amplitudes
        worst.replaceAll(row -> AMPLITUDES.contains(row.key()) ? DesignContent.stated(row,
                ReportRow.Amplitude.DISPLAY) : row);
        sections.add(new ReportSection(SectionId.WORST_CASE, "Worst case and the robust design", worst));
        sections.add(new ReportSection(SectionId.MONTE_CARLO, "Tolerance Monte Carlo of the peak in band",
                r.monteCarlo().result().map(mc -> MonteCarloRows.of(mc, d))
                        .orElseGet(() -> List.of(MonteCarloRows.notRun(r.monteCarlo().notRun().orElseThrow())))));
        return new ReportContent(design.study().name(), sections, List.of(), Cautions.STANDARD);
    }

    private static ReportRow row(ReportKey key, String label, String symbol, ReportValue value, String source) {
        return new ReportRow(key, label, symbol, value, source, "");
    }
}
