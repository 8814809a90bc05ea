package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.realisation.DesignCheck;
import org.counterpoise.core.realisation.HardwareCaution;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.PartTolerances;
import org.counterpoise.core.realisation.PartTolerances.ToleranceBasis;
import org.counterpoise.core.realisation.PredictedPoint;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.Realiser;
import org.counterpoise.core.realisation.TrimPlan;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportValue.Count;
import org.counterpoise.io.text.ReportValue.Field;
import org.counterpoise.io.text.ReportValue.Fields;
import org.counterpoise.io.text.ReportValue.Level;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The design turned into hardware, as sections of the one report: the part list
 * ({@link PartListRows}), the checks ({@link CheckText}), the part tolerances, the trim, the tuning
 * and commissioning procedure ({@link ProcedureText}) and the predicted response table; the
 * realisation's warnings join the design's, and the cautions of its hardware ({@link CautionText})
 * join the standing ones. The JSON writes these rows as the object {@code hardware}.
 */
public final class HardwareContent {
    /** The sections this class writes, in print order. */
    public static final Set<SectionId> SECTIONS = EnumSet.of(SectionId.PART_LIST, SectionId.CHECKS,
            SectionId.PART_TOLERANCES, SectionId.TRIM, SectionId.PROCEDURE, SectionId.PREDICTED);

    private HardwareContent() {
    }

    /**
     * @param content a design's report
     * @param r the realisation of that design
     * @param d the design
     * @return the report with the hardware sections after the design's (a realisation already in it
     *     is replaced), the realisation's warnings after the design's and the hardware's cautions
     *     before the last standing one (which defers to local codes)
     */
    public static ReportContent with(ReportContent content, Realisation r, DesignResult d) {
        List<ReportSection> sections = new ArrayList<>(content.sections().stream()
                .filter(s -> !SECTIONS.contains(s.id())).toList());
        sections.addAll(sections(r, d, content.units()));
        List<ReportContent.Note> warnings = new ArrayList<>(content.warnings());
        r.warnings().forEach(w -> warnings.add(new ReportContent.Note(w.code(), WarningText.of(w, content.units()))));
        List<String> cautions = new ArrayList<>(content.cautions());
        int at = Math.max(0, cautions.size() - 1);
        for (HardwareCaution c : HardwareCaution.of(r.choice())) {
            String words = CautionText.of(c);
            if (!cautions.contains(words)) {
                cautions.add(at++, words);
            }
        }
        ReportContent out = new ReportContent(content.name(), sections, warnings, cautions, Optional.empty(),
                content.units());
        return content.comparison().map(out::with).orElse(out);
    }

    /**
     * @param content the report of the dossier's design
     * @param dossier the dossier (its design and its realisation for the choice, each computed once)
     * @param choice the project's hardware choices ({@code Project.hardware()})
     * @return the report with the realisation, as {@link #with(ReportContent, Realisation, DesignResult)}
     */
    public static ReportContent with(ReportContent content, DesignDossier dossier, HardwareChoice choice) {
        return with(content, Realiser.realisation(dossier, choice), dossier.design());
    }

    /**
     * @param r a realisation
     * @param d the design it realises
     * @return its sections, in print order, in SI
     */
    public static List<ReportSection> sections(Realisation r, DesignResult d) {
        return sections(r, d, UnitSystem.SI);
    }

    /**
     * @param r a realisation
     * @param d the design it realises
     * @param units the unit system the procedure's sentences state their figures in
     * @return its sections, in print order
     */
    public static List<ReportSection> sections(Realisation r, DesignResult d, UnitSystem units) {
        List<ReportSection> out = new ArrayList<>();
        out.add(new ReportSection(SectionId.PART_LIST, "Part list", PartListRows.of(r, d)));
        List<ReportRow> checks = new ArrayList<>();
        for (DesignCheck c : r.checks()) {
            checks.add(CheckText.row(c));
        }
        out.add(new ReportSection(SectionId.CHECKS, r.checks().stream().allMatch(DesignCheck::passes)
                ? "Checks of the parts (demand against capacity): all pass"
                : "Checks of the parts (demand against capacity): NOT ALL PASS", checks));
        out.add(new ReportSection(SectionId.PART_TOLERANCES, "Tolerances the parts must hold", tolerances(r.tolerances())));
        out.add(new ReportSection(SectionId.TRIM, "Trim on site", trim(r.trim())));
        out.add(new ReportSection(SectionId.PROCEDURE, "Tuning and commissioning", ProcedureText.rows(r.procedure(), units)));
        out.add(new ReportSection(SectionId.PREDICTED, "Predicted response to compare readings with (peak)",
                predicted(r.predicted(), d.study().response().dimension())));
        return out;
    }

    /**
     * @param basis where the ranges come from
     * @return its words
     */
    static String basisWords(ToleranceBasis basis) {
        return switch (basis) {
            case ROBUST_RANGES -> "the tolerance ranges the robust design holds over";
            case ALLOWED_RISE -> "the mistuning at which the peak in band rises by the allowance";
        };
    }

    private static List<ReportRow> tolerances(PartTolerances t) {
        String source = basisWords(t.basis());
        return List.of(
                row(ReportKey.PART_TOLERANCE_MASS, "absorber mass, +/-", new Percent(t.mass(), 2), source, ""),
                row(ReportKey.PART_TOLERANCE_SPRING_RATE, "spring rate, +/-", new Percent(t.springRate(), 2), source,
                        ""),
                row(ReportKey.PART_TOLERANCE_DAMPING, "damping coefficient, +/-", new Percent(t.damping(), 2), source,
                        ""),
                row(ReportKey.PART_TOLERANCE_ABSORBER_FREQUENCY, "absorber frequency, +/-",
                        new Percent(t.absorberFrequency(), 2), source, "mass and rate together; tune on site to it"),
                row(ReportKey.PART_TOLERANCE_BASIS, "held to", new Words(source, List.of(basisId(t.basis()))), "",
                        ""));
    }

    private static String basisId(ToleranceBasis basis) {
        return basis.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    private static List<ReportRow> trim(TrimPlan t) {
        return List.of(
                row(ReportKey.TRIM_PLATE_MASS, "one trim plate", DesignContent.quantity(t.plateMass(), Dimension.MASS),
                        "", ""),
                row(ReportKey.TRIM_PLATES, "plates fitted as built / supplied", new Pair(new Count(t.platesFitted()),
                        new Count(t.platesTotal()), PairKind.SIDE_BY_SIDE), "", "all fitted to none fitted reaches"
                                + " the range below"),
                row(ReportKey.TRIM_PERCENT_PER_PLATE, "absorber frequency change per plate",
                        new Level(t.percentPerPlate(), 3, "%"), "half the mass change, frequency ~ 1/sqrt(mass)", ""),
                row(ReportKey.TRIM_PLATES_PER_PERCENT, "plates per percent of frequency",
                        new Quantity(t.platesPerPercent(), Dimension.RATIO, 3), "", ""),
                row(ReportKey.TRIM_RANGE, "absorber frequencies the plates reach", new Pair(DesignContent.quantity(
                        t.absorberFrequencyLow(), Dimension.FREQUENCY), DesignContent.quantity(t.absorberFrequencyHigh(),
                                Dimension.FREQUENCY), PairKind.RANGE), "spring rate fixed, frequency ~ 1/sqrt(mass)",
                        "sized for the structure's stated frequency range: for a new design if the structure is"
                                + " measured outside the range this design holds"));
    }

    private static List<ReportRow> predicted(List<PredictedPoint> points, Dimension response) {
        List<ReportRow> rows = new ArrayList<>();
        for (PredictedPoint p : points) {
            List<Field> fields = List.of(
                    new Field(ReportKey.PREDICTED_FREQUENCY, "frequency", DesignContent.quantity(p.frequency(),
                            Dimension.FREQUENCY)),
                    new Field(ReportKey.PREDICTED_BEFORE, "without absorber", DesignContent.quantity(p.before(), response)),
                    new Field(ReportKey.PREDICTED_AFTER, "with absorber", DesignContent.quantity(p.after(), response)),
                    new Field(ReportKey.PREDICTED_STROKE, "stroke", DesignContent.quantity(p.stroke(), Dimension.LENGTH)));
            rows.add(new ReportRow(ReportKey.PREDICTED_POINT, "", "", new Fields("", fields), "", ""));
        }
        return rows;
    }

    private static ReportRow row(ReportKey key, String label, ReportValue value, String source, String caution) {
        return new ReportRow(key, label, "", value, source, caution);
    }
}
