package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.counterpoise.core.criteria.Acceptance;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.CriterionKind;
import org.counterpoise.core.criteria.Reading;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.project.Ids;
import org.counterpoise.io.text.ReportRow.Amplitude;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportValue.Count;
import org.counterpoise.io.text.ReportValue.Flag;
import org.counterpoise.io.text.ReportValue.Margin;
import org.counterpoise.io.text.ReportValue.Names;
import org.counterpoise.io.text.ReportValue.NotApplicable;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Unbounded;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The verdict of a design against its criterion as a report section (the rows of the JSON's
 * {@code acceptance} object, {@link ReportKey}): whether an absorber is needed at all, the
 * criterion and its source in words ({@link CriterionText}), the limit and the value before and
 * after in the criterion's convention, pass or fail, the margin, the forcing frequency where each
 * is worst, the governing order and the zones. The section comes first in the report, so a
 * structure that passes untreated says so before anything else.
 */
public final class AcceptanceContent {
    /** Why a value has no finite bound, in the report's words. */
    static final String UNBOUNDED = "undamped structure forced at its natural frequency: the response has no"
            + " finite bound";

    private AcceptanceContent() {
    }

    /**
     * @param content a design's report
     * @param acceptance its verdict, or empty when the project states no criterion
     * @return the report with the verdict's section first (after the project's details), or with
     *     the one hidden row that writes {@code "acceptance": null} to the JSON; a verdict already
     *     in the report is replaced
     */
    public static ReportContent with(ReportContent content, Optional<Acceptance> acceptance) {
        // a verdict given again replaces the one there (or the row that says there is none)
        List<ReportSection> sections = new ArrayList<>();
        for (ReportSection s : content.sections()) {
            if (s.id() != SectionId.ACCEPTANCE) {
                sections.add(new ReportSection(s.id(), s.title(), s.rows().stream()
                        .filter(r -> r.key() != ReportKey.ACCEPTANCE).toList()));
            }
        }
        if (acceptance.isPresent()) {
            int at = sections.isEmpty() || sections.get(0).id() != SectionId.PROJECT ? 0 : 1;
            sections.add(at, section(acceptance.get(), content.units()));
        } else {
            int design = -1;
            for (int i = 0; i < sections.size(); i++) {
                design = sections.get(i).id() == SectionId.DESIGN ? i : design;
            }
            ReportRow none = new ReportRow(ReportKey.ACCEPTANCE, "acceptance criterion", "", new NotApplicable(),
                    "the project states none", "");
            if (design < 0) {
                return content;
            }
            ReportSection d = sections.get(design);
            List<ReportRow> rows = new ArrayList<>(d.rows());
            rows.add(none);
            sections.set(design, new ReportSection(d.id(), d.title(), rows));
        }
        return new ReportContent(content.name(), sections, content.warnings(), content.cautions(),
                content.comparison(), content.units());
    }

    /**
     * @param a a verdict
     * @return its section
     */
    public static ReportSection section(Acceptance a) {
        return section(a, UnitSystem.SI);
    }

    /**
     * @param a a verdict
     * @param units the unit system the criterion's limit is stated in
     * @return its section
     */
    public static ReportSection section(Acceptance a, UnitSystem units) {
        Criterion c = a.criterion();
        Reading before = a.before();
        Reading after = a.after();
        Dimension d = c.quantity().dimension();
        Amplitude stated = new Amplitude(c.convention(), false);
        String source = CriterionText.source(c);
        List<ReportRow> rows = new ArrayList<>();
        rows.add(row(ReportKey.ACCEPTANCE_NEEDED, "absorber needed", new Flag(a.absorberNeeded(), a.absorberNeeded()
                ? "yes: without it the structure exceeds the limit"
                : "no: the structure already meets the criterion without an absorber"), source));
        String words = CriterionText.of(c, units);
        rows.add(row(ReportKey.ACCEPTANCE_CRITERION, "criterion", new Words(words, List.of(c.kind().id(), words)),
                source));
        rows.add(row(ReportKey.ACCEPTANCE_SOURCE, "limits taken from", new Words(source, List.of()), ""));
        rows.add(row(ReportKey.ACCEPTANCE_MEASURE, "judged on", new Words(CriterionText.measure(c),
                List.of(Ids.of(c.quantity()), c.convention().id(), d.siSymbol())), source));
        rows.add(row(ReportKey.ACCEPTANCE_WEIGHTING, "frequency weighting", c.weighting()
                .<ReportValue>map(w -> new Words(w.symbol() + " (" + w.source() + ")", List.of(w.id())))
                .orElse(new NotApplicable()), source));
        rows.add(new ReportRow(ReportKey.ACCEPTANCE_LIMIT, "limit", "", pair(value(before.limit(), d),
                value(after.limit(), d)), source, c.limit().isFlat() ? "" : "at the worst point of each",
                Optional.of(stated)));
        rows.add(new ReportRow(ReportKey.ACCEPTANCE_VALUE, "value", "", pair(value(before.value(), d),
                value(after.value(), d)), "exact verdict over the forcing band", "", Optional.of(stated)));
        rows.add(row(ReportKey.ACCEPTANCE_PASSES, "verdict", pair(verdict(before), verdict(after)), source));
        rows.add(row(ReportKey.ACCEPTANCE_MARGIN, "margin, limit / value", pair(margin(before), margin(after)),
                "20 log10(limit / value) in dB"));
        rows.add(row(ReportKey.ACCEPTANCE_WORST, "worst at forcing frequency", pair(frequency(before),
                frequency(after)), "the design order's forcing frequency (and shaft speed) where value / limit is"
                        + " largest"));
        rows.add(row(ReportKey.ACCEPTANCE_GOVERNING_ORDER, "governing order (0 = the design order)",
                pair(order(before), order(after)), "each order judged at its own frequency"));
        rows.add(row(ReportKey.ACCEPTANCE_ZONES, c.kind() == CriterionKind.HUMAN_COMFORT
                ? "comfort reaction" : "zone", c.zones().isEmpty() ? pair(new NotApplicable(), new NotApplicable())
                        : pair(zones(c, before), zones(c, after)), source));
        rows.add(row(ReportKey.ACCEPTANCE_OUTSIDE_RANGE, "worst point outside the limit's range", c.limit().isFlat()
                ? pair(new NotApplicable(), new NotApplicable()) : pair(outside(before), outside(after)),
                "outside its range a curve is held at its end value"));
        rows.add(row(ReportKey.ACCEPTANCE_UNBOUNDED, "unbounded", before.unbounded() || after.unbounded()
                ? new Words(UNBOUNDED, List.of()) : new NotApplicable(), ""));
        return new ReportSection(SectionId.ACCEPTANCE, a.absorberNeeded()
                ? "Acceptance: the verdict without / with the absorber"
                : "Acceptance: no absorber is needed (verdict without / with it)", rows);
    }

    private static ReportRow row(ReportKey key, String label, ReportValue value, String source) {
        return new ReportRow(key, label, "", value, source, "");
    }

    private static Pair pair(ReportValue before, ReportValue after) {
        return new Pair(before, after, PairKind.BEFORE_AFTER);
    }

    private static ReportValue value(double si, Dimension d) {
        return Double.isInfinite(si) ? new Unbounded(d, "undamped resonance") : new Quantity(si, d, QuantityFormat.FIGURES);
    }

    private static Flag verdict(Reading r) {
        return new Flag(r.passes(), r.passes() ? "passes" : "fails");
    }

    private static Margin margin(Reading r) {
        return new Margin(r.marginRatio(), r.marginDecibels());
    }

    private static ReportValue frequency(Reading r) {
        return Double.isFinite(r.worstFrequency()) && r.worstFrequency() > 0
                ? new Quantity(r.worstFrequency(), Dimension.FREQUENCY, QuantityFormat.FIGURES) : new NotApplicable();
    }

    private static ReportValue order(Reading r) {
        return r.governingOrder().isPresent() ? new Count(r.governingOrder().getAsInt()) : new NotApplicable();
    }

    private static Names zones(Criterion c, Reading r) {
        return new Names(r.zones(), CriterionText.zones(c, r.zones()));
    }

    private static Flag outside(Reading r) {
        return new Flag(r.outsideRange(), r.outsideRange() ? "yes: the end value was held" : "no");
    }
}
