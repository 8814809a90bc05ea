package org.counterpoise.io.text;

import java.util.List;
import org.counterpoise.core.realisation.CheckKind;
import org.counterpoise.core.realisation.DesignCheck;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.ReportValue.Field;
import org.counterpoise.io.text.ReportValue.Fields;
import org.counterpoise.io.text.ReportValue.Flag;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The checks of a realisation in words: one report row per {@link DesignCheck}, a record of the
 * check, its demand and capacity (in the display unit of their dimension), the utilisation, the
 * verdict and the source, so that the text report and the sheet show the checks as one table and
 * the JSON as the array {@code hardware.checks}. The words of every {@link CheckKind} live here.
 */
public final class CheckText {
    private CheckText() {
    }

    /**
     * @param kind a check
     * @return what it checks, lower case
     */
    public static String of(CheckKind kind) {
        return switch (kind) {
            case SPRING_RATE -> "springs' total rate off the design's, against the rate tolerance";
            case SPRING_STATIC_STRESS -> "spring stress at the largest load";
            case SPRING_FATIGUE -> "spring fatigue at the service cycles";
            case SPRING_BUCKLING -> "spring buckling at the working deflection";
            case SPRING_SURGE -> "forcing against the spring's surge frequency";
            case SPRING_SOLID -> "compression before the coils touch";
            case ELASTOMER_LOSS_FACTOR -> "elastomer loss factor needed against the compound's";
            case DAMPER_STROKE -> "largest damper stroke against the clearance it must allow";
            case EDDY_CURRENT_SKIN_DEPTH -> "eddy-current plate thickness against the skin depth";
        };
    }

    /**
     * @param c a check
     * @return its row: the label is the check in words, the value its record
     */
    static ReportRow row(DesignCheck c) {
        String words = of(c.kind());
        Dimension d = c.dimension();
        List<Field> fields = List.of(
                new Field(ReportKey.CHECK_KIND, "check", new Words(words, List.of(c.kind().id()))),
                new Field(ReportKey.CHECK_DEMAND, "demand", amount(c, c.demand())),
                new Field(ReportKey.CHECK_CAPACITY, "capacity", amount(c, c.capacity())),
                // the unit of demand and capacity in the JSON; tables show each value with its unit
                new Field(ReportKey.CHECK_UNIT, "", new Words(jsonUnit(d), List.of())),
                new Field(ReportKey.CHECK_UTILISATION, "utilisation", new Percent(c.utilisation(), 3)),
                new Field(ReportKey.CHECK_PASSES, "verdict", new Flag(c.passes(), c.passes() ? "passes" : "FAILS")),
                // the source goes under the table as a sentence (ReportTable.grid), in the JSON as a field
                new Field(ReportKey.CHECK_SOURCE, "", new Words(c.source(), List.of())));
        return new ReportRow(ReportKey.CHECK, words, "", new Fields("", fields), c.source(), "");
    }

    /**
     * A check's demand or capacity as shown: a deviation from the design (the springs' rate off the
     * design's) reads as a percentage, every other value in its dimension's units; the JSON writes the
     * same SI number either way.
     */
    private static ReportValue amount(DesignCheck c, double value) {
        return switch (c.kind()) {
            case SPRING_RATE -> new Percent(value, 3);
            default -> new Quantity(value, c.dimension(), QuantityFormat.FIGURES);
        };
    }

    /** The unit the JSON writes a dimension's values in: Hz for frequencies, else SI. */
    private static String jsonUnit(Dimension d) {
        return d == Dimension.FREQUENCY ? Unit.HERTZ.symbol() : d.siSymbol();
    }
}
