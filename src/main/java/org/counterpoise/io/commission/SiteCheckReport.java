package org.counterpoise.io.commission;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.commission.AsBuiltAbsorber;
import org.counterpoise.core.commission.BuiltResponse;
import org.counterpoise.core.commission.CommissioningCheck;
import org.counterpoise.core.commission.CommissioningWarning;
import org.counterpoise.core.commission.OperatingComparison;
import org.counterpoise.core.commission.TrimCorrection;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.realisation.TrimPlan;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitSystem;

/** A site check as plain text for the terminal, with the usual cautions. */
public final class SiteCheckReport {
    /** What every site check says after its numbers. */
    static final String SCOPE = "The comparison holds at the absorber's point, on the model's one mode; a spectrum or"
            + " response measured elsewhere, or a second mode near the band, is not compared by it.";
    /** Said with an operating spectrum. */
    static final String RUNNING = "Measure the operating spectrum with the machine at its normal duty, from outside"
            + " guards and clear of moving parts.";
    /** Said when the site shows more disturbance than the project. */
    static final String LARGER = "A disturbance larger than the project's scales the absorber's stroke and forces with"
            + " it: design again with the site's disturbance before running the machine with the absorber.";
    /** Said with a response measured with the absorber fitted. */
    static final String STOPPED = "Tune, fit and tap-test the absorber with the machine stopped and isolated, the"
            + " absorber mass secured against falling; the uncertainties shown are the data's scatter about the model"
            + " (one standard deviation), not errors of the model.";
    /** Said always, last. */
    static final String PRACTICE = "These are site checks for design; follow local codes and licensed engineering"
            + " practice.";

    private SiteCheckReport() {
    }

    /**
     * @param check the site check
     * @return the report
     */
    public static String render(SiteCheck check) {
        StringBuilder b = new StringBuilder("Site check of ").append(PlainText.escape(check.project())).append('\n');
        check.operating().ifPresent(o -> operating(b, o, check.design(), check.units()));
        check.fitted().ifPresent(f -> fitted(b, f, check.design(), check.plan(), check.keptAbsorberFrequency(),
                check.units()));
        b.append("Cautions\n");
        for (String c : cautions(check)) {
            b.append("  - ").append(c).append('\n');
        }
        return b.toString();
    }

    /**
     * @param check the site check
     * @return the cautions that go with what was measured
     */
    static List<String> cautions(SiteCheck check) {
        List<String> out = new ArrayList<>(List.of(SCOPE));
        check.operating().ifPresent(o -> {
            out.add(RUNNING);
            if (o.comparison().ratio() > 1) {
                out.add(LARGER);
            }
        });
        check.fitted().ifPresent(f -> out.add(STOPPED));
        out.add(PRACTICE);
        return out;
    }

    private static void operating(StringBuilder b, SiteCheck.Operating o, DesignResult design, UnitSystem units) {
        OperatingComparison c = o.comparison();
        b.append("Operating response (").append(PlainText.escape(o.file())).append(", ").append(c.kind().label())
                .append(", ").append(o.convention().label()).append(c.withAbsorber() ? ", absorber fitted" : ", no absorber")
                .append(")\n");
        FrequencyBand band = design.study().excitation().band();
        line(b, "running frequency", QuantityFormat.format(c.runningFrequency(), Unit.HERTZ) + (o.runningGiven()
                ? " (as given)" : band.low() == band.high() ? " (the project's speed)" : " (the line found in the band)"));
        line(b, "line compared", QuantityFormat.format(c.lineFrequency(), Unit.HERTZ));
        line(b, "measured", amplitude(c.measured(), o));
        line(b, c.withAbsorber() ? "predicted (with the absorber)" : "predicted (bare structure)",
                amplitude(c.predicted(), o));
        line(b, "measured / predicted", QuantityFormat.number(c.ratio(), 3));
        Dimension drive = design.study().excitation().kind().amplitudeDimension();
        line(b, "disturbance the site shows", DisplayUnits.format(c.impliedDriveAmplitude(), drive, units)
                + " (project: " + DisplayUnits.format(c.impliedDriveAmplitude() / c.ratio(), drive, units) + ")");
        line(b, "stroke, band or run-up", DisplayUnits.format(c.impliedStroke(), Dimension.LENGTH, units) + " (design "
                + DisplayUnits.format(c.designStroke(), Dimension.LENGTH, units) + ", clearance "
                + DisplayUnits.format(c.clearance(), Dimension.LENGTH, units) + ")");
        if (c.warnings().contains(CommissioningWarning.OTHER_LINE_DOMINATES)) {
            line(b, "largest line", QuantityFormat.format(c.largestLineFrequency(), Unit.HERTZ) + ", "
                    + amplitude(c.largestLine(), o));
        }
        c.warnings().forEach(w -> b.append("Warning: ").append(words(w)).append('\n'));
    }

    private static void fitted(StringBuilder b, SiteCheck.Fitted f, DesignResult design, TrimPlan plan,
            double kept, UnitSystem units) {
        double plateMass = plan.plateMass();
        CommissioningCheck c = f.check();
        AsBuiltAbsorber a = c.built();
        TrimCorrection t = c.trim();
        b.append("Absorber as built (").append(PlainText.escape(f.file())).append(", ").append(f.unit().kind().id())
                .append(" in ").append(f.unit().symbol()).append(", ").append(a.lines()).append(" lines)\n");
        if (c.absorberMass() != design.absorber().mass()) {
            line(b, "absorber mass (as weighed)", DisplayUnits.format(c.absorberMass(), Dimension.MASS, units)
                    + " (design " + DisplayUnits.format(design.absorber().mass(), Dimension.MASS, units) + ")");
        }
        line(b, "absorber frequency", QuantityFormat.format(a.absorberFrequency(), Unit.HERTZ) + " +/- "
                + QuantityFormat.number(Unit.HERTZ.fromSi(a.absorberFrequencySd()), 2) + " Hz (needed "
                + QuantityFormat.format(t.targetFrequency(), Unit.HERTZ) + ": " + signedPercent(t.frequencyOff()) + ")");
        line(b, "damping ratio", percent(a.dampingRatio()) + " +/- " + QuantityFormat.number(100 * a.dampingRatioSd(), 2)
                + " % (design "
                + percent(design.tuning().dampingRatio())
                + (design.tuning().dampingRatio() > 0 ? "; relative change " + signedPercent(t.dampingOff()) : "") + ")");
        line(b, a.structureFrequencySd().isPresent() ? "structure frequency (fitted)" : "structure frequency (design)",
                QuantityFormat.format(a.structureFrequency(), Unit.HERTZ) + (a.structureFrequencySd().isPresent()
                        ? " +/- " + QuantityFormat.number(Unit.HERTZ.fromSi(a.structureFrequencySd().getAsDouble()), 2)
                        + " Hz" : ""));
        if (a.structureFrequencySd().isPresent() && !a.warnings().contains(CommissioningWarning.POOR_FIT)) {
            line(b, "target", targetBasis(a.structureFrequency(), design.study().structure().naturalFrequency(),
                    design.structureTolerance(), "re-optimised for the structure as measured",
                    "the absorber frequency of the design, " + QuantityFormat.format(kept, Unit.HERTZ)));
        }
        line(b, "normalised residual", QuantityFormat.number(a.normalisedResidual(), 3));
        line(b, "part tolerances", "frequency +/- " + percent(t.frequencyTolerance()) + ", damping +/- "
                + percent(t.dampingTolerance()));
        String mass = DisplayUnits.format(plateMass, Dimension.MASS, units);
        BuiltResponse peak = c.response();
        Dimension shown = peak.kind().dimension();
        line(b, "peak over the band (amplitude)", peak.kind().label() + ": design "
                + DisplayUnits.format(peak.design(), shown, units) + ", as built "
                + DisplayUnits.format(peak.asBuilt(), shown, units) + " (" + signedPercent(peak.asBuilt()
                / peak.design() - 1) + ")" + (t.advised() && t.platesToAdd() != 0 ? ", after the trim "
                + DisplayUnits.format(peak.afterTrim(), shown, units) : ""));
        if (t.warnings().contains(CommissioningWarning.TRIM_DOES_NOT_HELP)) {
            line(b, "trim", "none advised: trimming to the frequency needed would not lower the peak (see below)");
        } else if (!t.advised()) {
            line(b, "trim", "none advised: the fit is poor, so the absorber's frequency is not known (see below)");
        } else {
            line(b, "frequency as built", t.frequencyInTolerance() ? "inside its part tolerance"
                    : "OUTSIDE its part tolerance");
            String why = peak.trimRequired() ? "; REQUIRED: the response as built is more than "
                    + percent(DesignResult.TOLERANCE_ALLOWANCE) + " above the design's"
                    : "; optional: the response is within " + percent(DesignResult.TOLERANCE_ALLOWANCE)
                    + " of the design's";
            int n = Math.abs(t.platesToAdd());
            String noPlate = peak.trimRequired() ? "; the response as built is more than "
                    + percent(DesignResult.TOLERANCE_ALLOWANCE) + " above the design's, and no trim brings it back:"
                    + " the structure differs from the design's; design again for it" : why;
            line(b, "trim", t.platesToAdd() == 0 ? "none: no whole plate (" + mass + " each) brings it nearer" + noPlate
                    : (t.platesToAdd() > 0 ? "add " : "take off ") + n + " plate" + (n == 1 ? "" : "s") + " of " + mass
                            + (t.platesToAdd() < 0 && n == plan.platesFitted() ? " (all of them)" : "")
                            + " (frequency then " + signedPercent(t.frequencyOffAfter()) + why + ")");
        }
        List<CommissioningWarning> all = new ArrayList<>(a.warnings());
        all.addAll(t.warnings());
        all.forEach(w -> b.append("Warning: ").append(words(w, a.structureFrequencySd().isPresent())).append('\n'));
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
        return words(w, false);
    }

    /**
     * @param w a warning
     * @param structureFreed whether the fit freed the structure's frequency (a poor fit then has other causes)
     * @return its words, the one place they are written
     */
    public static String words(CommissioningWarning w, boolean structureFreed) {
        return switch (w) {
            case POOR_FIT -> "the model misses more than " + Math.round(CommissioningWarning.POOR_FIT_LIMIT * 100)
                    + " % of the measured response" + (structureFreed ? " even with the structure's frequency fitted:"
                    + " the response was not measured at the absorbers' point, its kind or units are not as stated, or"
                    + " the structure is not as the project describes" : ": the structure's frequency may differ from"
                    + " the design's (try --free-structure), or the response was not measured at the absorber's point");
            case FREQUENCY_AT_SEARCH_EDGE -> "an absorber's frequency came out far from its design's (below 0.55 or"
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
            case STRUCTURE_FREQUENCY_FAR -> "the structure's natural frequency came out more than "
                    + Math.round(CommissioningWarning.STRUCTURE_FAR * 100) + " % from the design's: check that the"
                    + " response was measured at the absorbers' point, the FRF kind and units, and the project's modes";
            case TRIM_DOES_NOT_HELP -> "trimming the absorbers to the frequencies the structure needs would not lower"
                    + " the peak over the band: no trim is advised; the structure as measured may need a new design";
            case SPILLOVER_LIMIT_NOT_KEPT -> "on the structure as measured, no tuning of these absorbers found keeps the"
                    + " peak near every other mode within absorbers.spillover_limit: the targets shown come nearest;"
                    + " the structure may need a new design";
        };
    }

    private static String amplitude(double peak, SiteCheck.Operating o) {
        return QuantityFormat.format(o.convention().ofHarmonic(peak), o.unit()) + " " + o.convention().label();
    }

    /**
     * Where the target of a check with the structure's frequency fitted comes from, against the sheet's
     * procedure: re-optimised for the structure as measured; inside the range the design holds the
     * procedure keeps the design's frequency, which also leaves the peak within the allowance.
     *
     * @param measured the structure (or target mode) frequency fitted, rad/s
     * @param design its design value, rad/s
     * @param range the factors on it the design holds
     * @param why where the target comes from, words
     * @param kept what the procedure keeps inside the range, words
     * @return the sentence
     */
    static String targetBasis(double measured, double design, MistuningRange range, String why, String kept) {
        if (!range.defined()) {
            return why + "; the design holds no range of structure frequency (its own response is unbounded)";
        }
        double factor = measured / design;
        boolean inside = factor >= range.low().orElse(1 - range.searchLimit())
                && factor <= range.high().orElse(1 + range.searchLimit());
        String bound = range.ofBareResponse() ? "keeps the response below " + percent(range.allowance())
                + " of the bare structure's" : "leaves the peak within " + percent(range.allowance()) + " of the design's";
        String held = " (" + QuantityFormat.format(design * range.low().orElse(1 - range.searchLimit()), Unit.HERTZ)
                + " to " + QuantityFormat.format(design * range.high().orElse(1 + range.searchLimit()), Unit.HERTZ) + ")";
        return inside ? why + "; the measured frequency lies inside the range the design holds" + held + ", where the"
                + " sheet's procedure keeps " + kept + ", which also " + bound
                : why + "; the measured frequency lies outside the range the design holds" + held
                        + ", where the sheet's procedure says to design again";
    }

    static void line(StringBuilder b, String label, String value) {
        b.append("  ").append(String.format("%-36s", label)).append(value).append('\n');
    }

    /** Three significant figures: a site reading is no better (the design's own numbers keep four). */
    static String percent(double ratio) {
        return QuantityFormat.number(100 * ratio, 3) + " %";
    }

    static String signedPercent(double ratio) {
        // below half a part in a million it is round-off of an exact fit: shown as nothing at all
        return Math.abs(ratio) < 5e-7 ? "0 %" : (ratio > 0 ? "+" : "") + percent(ratio);
    }
}
