package org.counterpoise.io.commission;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.commission.AsBuiltAbsorber;
import org.counterpoise.core.commission.CommissioningCheck;
import org.counterpoise.core.commission.CommissioningWarning;
import org.counterpoise.core.commission.OperatingComparison;
import org.counterpoise.core.commission.TrimCorrection;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitSystem;

/** A site check as plain text for the terminal, with the usual cautions. */
public final class SiteCheckReport {
    /** What every site check says after its numbers. */
    static final List<String> CAUTIONS = List.of(
            "The comparison holds at the absorber's point, on the model's one mode; a spectrum or response measured"
                    + " elsewhere, or a second mode near the band, is not compared by it.",
            "Lock the absorber or take it off before measuring the structure alone; tune, fit and measure with the"
                    + " machine stopped and isolated, the absorber mass secured against falling.",
            "A disturbance larger than the project's scales the absorber's stroke and forces with it: redesign"
                    + " with the site's disturbance before running the machine.",
            "These are site checks for design; follow local codes and licensed engineering practice.");

    private SiteCheckReport() {
    }

    /**
     * @param check the site check
     * @return the report
     */
    public static String render(SiteCheck check) {
        StringBuilder b = new StringBuilder("Site check of ").append(PlainText.escape(check.project())).append('\n');
        check.operating().ifPresent(o -> operating(b, o, check.design(), check.units()));
        check.fitted().ifPresent(f -> fitted(b, f, check.design(), check.plan().plateMass(), check.units()));
        b.append("Cautions\n");
        for (String c : CAUTIONS) {
            b.append("  - ").append(c).append('\n');
        }
        return b.toString();
    }

    private static void operating(StringBuilder b, SiteCheck.Operating o, DesignResult design, UnitSystem units) {
        OperatingComparison c = o.comparison();
        b.append("Operating response (").append(PlainText.escape(o.file())).append(", ").append(c.kind().label())
                .append(", ").append(o.convention().label()).append(c.withAbsorber() ? ", absorber fitted" : ", no absorber")
                .append(")\n");
        line(b, o.runningGiven() ? "running frequency" : "running frequency (from the band)",
                QuantityFormat.format(c.runningFrequency(), Unit.HERTZ));
        line(b, "line compared", QuantityFormat.format(c.lineFrequency(), Unit.HERTZ));
        line(b, "measured", amplitude(c.measured(), o));
        line(b, c.withAbsorber() ? "predicted (with the absorber)" : "predicted (bare structure)",
                amplitude(c.predicted(), o));
        line(b, "measured / predicted", QuantityFormat.number(c.ratio(), 3));
        Dimension drive = design.study().excitation().kind().amplitudeDimension();
        line(b, "disturbance the site shows", DisplayUnits.format(c.impliedDriveAmplitude(), drive, units)
                + " (project: " + DisplayUnits.format(c.impliedDriveAmplitude() / c.ratio(), drive, units) + ")");
        line(b, "absorber stroke", DisplayUnits.format(c.impliedStroke(), Dimension.LENGTH, units) + " (design "
                + DisplayUnits.format(c.designStroke(), Dimension.LENGTH, units) + ", clearance "
                + DisplayUnits.format(c.clearance(), Dimension.LENGTH, units) + ")");
        if (c.warnings().contains(CommissioningWarning.OTHER_LINE_DOMINATES)) {
            line(b, "largest line", QuantityFormat.format(c.largestLineFrequency(), Unit.HERTZ) + ", "
                    + amplitude(c.largestLine(), o));
        }
        c.warnings().forEach(w -> b.append("Warning: ").append(words(w)).append('\n'));
    }

    private static void fitted(StringBuilder b, SiteCheck.Fitted f, DesignResult design, double plateMass,
            UnitSystem units) {
        CommissioningCheck c = f.check();
        AsBuiltAbsorber a = c.built();
        TrimCorrection t = c.trim();
        b.append("Absorber as built (").append(PlainText.escape(f.file())).append(", ").append(f.unit().kind().id())
                .append(" in ").append(f.unit().symbol()).append(", ").append(a.lines()).append(" lines)\n");
        line(b, "absorber frequency", QuantityFormat.format(a.absorberFrequency(), Unit.HERTZ) + " +/- "
                + QuantityFormat.format(a.absorberFrequencySd(), Unit.HERTZ) + " (needed "
                + QuantityFormat.format(t.targetFrequency(), Unit.HERTZ) + ": " + signedPercent(t.frequencyOff()) + ")");
        line(b, "damping ratio", percent(a.dampingRatio()) + " +/- " + percent(a.dampingRatioSd()) + " (design "
                + percent(design.tuning().dampingRatio())
                + (design.tuning().dampingRatio() > 0 ? ": " + signedPercent(t.dampingOff()) : "") + ")");
        line(b, a.structureFrequencySd().isPresent() ? "structure frequency (fitted)" : "structure frequency (design)",
                QuantityFormat.format(a.structureFrequency(), Unit.HERTZ) + (a.structureFrequencySd().isPresent()
                        ? " +/- " + QuantityFormat.format(a.structureFrequencySd().getAsDouble(), Unit.HERTZ) : ""));
        line(b, "normalised residual", QuantityFormat.number(a.normalisedResidual(), 3));
        line(b, "part tolerances", "frequency +/- " + percent(t.frequencyTolerance()) + ", damping +/- "
                + percent(t.dampingTolerance()));
        String mass = DisplayUnits.format(plateMass, Dimension.MASS, units);
        line(b, "frequency as built", t.frequencyInTolerance() ? "inside its tolerance" : "OUTSIDE its tolerance");
        line(b, "trim", t.platesToAdd() == 0 ? "none: no whole plate (" + mass + " each) brings it nearer"
                : (t.platesToAdd() > 0 ? "add " : "take off ") + Math.abs(t.platesToAdd()) + " plate"
                        + (Math.abs(t.platesToAdd()) == 1 ? "" : "s") + " of " + mass + " (frequency then "
                        + signedPercent(t.frequencyOffAfter()) + (t.frequencyInTolerance() ? "; worth doing inside the tolerance too" : "") + ")");
        List<CommissioningWarning> all = new ArrayList<>(a.warnings());
        all.addAll(t.warnings());
        all.forEach(w -> b.append("Warning: ").append(words(w)).append('\n'));
        double toUnit = f.unit().toSi();
        b.append("Measured against predicted (").append(f.unit().kind().id()).append(", ").append(f.unit().symbol())
                .append(")\n");
        b.append(String.format("  %-12s %-12s %-12s %-12s%n", "frequency", "measured", "design", "as built"));
        for (CommissioningCheck.Row r : c.rows()) {
            b.append(String.format("  %-12s %-12s %-12s %-12s%n", QuantityFormat.format(r.frequency(), Unit.HERTZ),
                    QuantityFormat.number(r.measured() / toUnit, 4), QuantityFormat.number(r.design() / toUnit, 4),
                    QuantityFormat.number(r.asBuilt() / toUnit, 4)));
        }
        line(b, "largest measured", QuantityFormat.number(c.measuredPeak() / toUnit, 4) + " at "
                + QuantityFormat.format(c.measuredPeakFrequency(), Unit.HERTZ));
        line(b, "largest predicted", QuantityFormat.number(c.designPeak() / toUnit, 4) + " at "
                + QuantityFormat.format(c.designPeakFrequency(), Unit.HERTZ));
    }

    /**
     * @param w a warning
     * @return its words, the one place they are written
     */
    public static String words(CommissioningWarning w) {
        return switch (w) {
            case POOR_FIT -> "the model misses more than " + Math.round(CommissioningWarning.POOR_FIT_LIMIT * 100)
                    + " % of the measured response: the structure's frequency may differ from the design's"
                    + " (try --free-structure), or the response was not measured at the absorber's point";
            case FREQUENCY_AT_SEARCH_EDGE -> "the absorber's frequency came out far from the design's (below half or"
                    + " above 1.8 times): check that the absorber moves freely and the FRF kind and units";
            case BEYOND_TRIM_RANGE -> "the trim plates supplied cannot bring the absorber to its frequency: the"
                    + " spring rate or the mass is off; change the springs or the mass, then measure again";
            case DAMPING_OUT_OF_TOLERANCE -> "the absorber's damping is outside its tolerance: adjust or change the"
                    + " damper, then measure again";
            case OPERATING_DISAGREES -> "the site's response differs from the model's by more than a factor "
                    + QuantityFormat.number(CommissioningWarning.DISAGREEMENT_FACTOR, 2)
                    + ": the disturbance or the structure is not what the project says; correct it and design again";
            case STROKE_BEYOND_CLEARANCE -> "under the disturbance the site shows, the absorber's stroke exceeds its"
                    + " clearance: do not run the machine with this absorber; design again with that disturbance";
            case OTHER_LINE_DOMINATES -> "the spectrum's largest line is not at the running speed and is more than "
                    + QuantityFormat.number(CommissioningWarning.OTHER_LINE_FACTOR, 2)
                    + " times the line there: another source may govern, which this absorber does not treat";
        };
    }

    private static String amplitude(double peak, SiteCheck.Operating o) {
        return QuantityFormat.format(o.convention().ofHarmonic(peak), o.unit()) + " " + o.convention().label();
    }

    private static void line(StringBuilder b, String label, String value) {
        b.append("  ").append(String.format("%-36s", label)).append(value).append('\n');
    }

    private static String percent(double ratio) {
        return QuantityFormat.format(ratio, Unit.PERCENT);
    }

    private static String signedPercent(double ratio) {
        return (ratio > 0 ? "+" : "") + percent(ratio);
    }
}
