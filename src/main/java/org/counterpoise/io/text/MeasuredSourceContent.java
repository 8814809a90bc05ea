package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.project.MeasuredSource;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportValue.Field;
import org.counterpoise.io.text.ReportValue.Fields;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * Says beside the structure where its data came from when they were identified from a measurement
 * (a project's {@code structure.measured}): the report, the sheet, the wizard and the JSON then show
 * that the modal mass, frequency and damping were measured, with the fit's quality and uncertainties.
 * A typed structure gets no row.
 */
public final class MeasuredSourceContent {
    /** What a reviewer must know of measured data, in every output that shows them. */
    static final String CAUTION = "identified from a measurement: valid at the measured point and in the state"
            + " measured (a driving-point measurement at the absorber's point); measure again with the absorber"
            + " locked before tuning on site";

    private MeasuredSourceContent() {
    }

    /**
     * @param content a design's report
     * @param measured where the project's structure data came from, or null when typed
     * @return the report with the structure's source row, when the structure was measured
     */
    public static ReportContent with(ReportContent content, MeasuredSource measured) {
        if (measured == null) {
            return content;
        }
        ReportRow row = row(measured);
        List<ReportSection> sections = new ArrayList<>();
        for (ReportSection s : content.sections()) {
            if (s.id() == SectionId.STRUCTURE) {
                List<ReportRow> rows = new ArrayList<>(s.rows().stream()
                        .filter(r -> r.key() != ReportKey.STRUCTURE_MEASURED).toList());
                rows.add(row);
                sections.add(new ReportSection(s.id(), s.title(), rows));
            } else {
                sections.add(s);
            }
        }
        return new ReportContent(content.name(), sections, content.warnings(), content.cautions(),
                content.comparison(), content.units());
    }

    private static ReportRow row(MeasuredSource m) {
        List<Field> fields = new ArrayList<>();
        fields.add(new Field(ReportKey.MEASURED_METHOD, "method", new Words(methodWords(m.method()),
                List.of(m.method()))));
        if (!m.file().isEmpty()) {
            fields.add(new Field(ReportKey.MEASURED_FILE, "file", new Words(m.file(), List.of())));
        }
        if (!m.date().isEmpty()) {
            fields.add(new Field(ReportKey.MEASURED_DATE, "fitted on", new Words(m.date(), List.of())));
        }
        m.normalisedResidual().ifPresent(r -> fields.add(new Field(ReportKey.MEASURED_RESIDUAL,
                "normalised residual", new Percent(r, 2))));
        m.naturalFrequencySd().ifPresent(sd -> fields.add(new Field(ReportKey.MEASURED_FREQUENCY_SD,
                "natural frequency \u00b1", new Quantity(sd, Dimension.FREQUENCY, 2))));
        m.dampingRatioSd().ifPresent(sd -> fields.add(new Field(ReportKey.MEASURED_DAMPING_SD,
                "damping ratio \u00b1", new Quantity(sd, Dimension.RATIO, 2))));
        m.modalMassSd().ifPresent(sd -> fields.add(new Field(ReportKey.MEASURED_MASS_SD, "modal mass \u00b1",
                new Quantity(sd, Dimension.MASS, 2))));
        return new ReportRow(ReportKey.STRUCTURE_MEASURED, "structure data from a measurement", "",
                new Fields("", fields), "project file, structure.measured (uncertainties: one standard deviation"
                        + " from the fit)", CAUTION);
    }

    /**
     * @param id an identification method's id as the project file names it
     * @return the method in words (an id this version does not know is shown as written)
     */
    public static String methodWords(String id) {
        return switch (id) {
            case "least_squares" -> "least-squares fit of the FRF (rational-fraction start)";
            case "rational_fraction" -> "rational-fraction polynomial fit of the FRF";
            case "circle_fit" -> "circle fit of the FRF";
            case "peak_picking" -> "peak picking with the half-power bandwidth";
            case "log_decrement" -> "logarithmic decrement of a free decay";
            case "added_mass" -> "natural frequencies before and after a known added mass";
            default -> id;
        };
    }
}
