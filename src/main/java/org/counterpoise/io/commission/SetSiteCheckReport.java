package org.counterpoise.io.commission;

import static org.counterpoise.io.commission.SiteCheckReport.line;
import static org.counterpoise.io.commission.SiteCheckReport.percent;
import static org.counterpoise.io.commission.SiteCheckReport.signedPercent;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.counterpoise.core.commission.OperatingComparison;
import org.counterpoise.core.commission.SetOperatingCheck;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.commission.AsBuiltSet;
import org.counterpoise.core.commission.CommissioningWarning;
import org.counterpoise.core.commission.SetCommissioning;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitSystem;

/** The site check of several absorbers as plain text for the terminal, with the usual cautions. */
public final class SetSiteCheckReport {
    /** What the check of several absorbers covers. */
    static final String SCOPE = "The fit holds at the absorbers' point, on the project's modes with their masses,"
            + " shapes and damping. Absorbers of equal mass are told apart only by their frequencies, so they are"
            + " paired with the design's in order of frequency (the lowest measured with the lowest designed): mark"
            + " each absorber and tap-test it alone to confirm which is which before trimming it.";

    /** Said with a response measured with the absorbers fitted. */
    static final String STOPPED = "Tune, fit and tap-test each absorber with the machine stopped and isolated, every"
            + " absorber mass secured against falling; the uncertainties shown are the data's scatter about the model"
            + " (one standard deviation), not errors of the model.";

    /** What the operating check of several absorbers covers. */
    static final String OPERATING_SCOPE = "The operating comparison holds at the project's response point, on the"
            + " project's modes with the absorbers as designed; a spectrum measured elsewhere is not compared by it."
            + " Every absorber's stroke scales with the force the site shows.";

    /** Said when the site shows more force than the project. */
    static final String LARGER = "A force larger than the project's scales every absorber's stroke and forces with it:"
            + " design again with the site's force before running the machine with the absorbers.";

    private SetSiteCheckReport() {
    }

    /** The trim of one absorber: whole plates when its plates are known, else the mass to add or take off. */
    private static String trim(SetCommissioning.Correction k, double absorberMass, UnitSystem units) {
        double m = k.massToAdd();
        String mass = DisplayUnits.format(Math.abs(m), Dimension.MASS, units);
        String beyond = k.beyondTrimRange() ? "; the plates supplied are not enough: see the warning" : "";
        if (k.platesToAdd().isPresent()) {
            int plates = k.platesToAdd().getAsInt();
            int n = Math.abs(plates);
            String none = k.beyondTrimRange() ? "none possible: " + (m >= 0 ? "no plate is spare" : "no plate is fitted")
                    + " (" + (m >= 0 ? "add " : "take off ") + mass + " would bring it to its frequency)" + beyond
                    : "none: no whole plate brings it nearer (" + (m >= 0 ? "add " : "take off ") + mass + " would)";
            return plates == 0 ? none : (plates > 0 ? "add " : "take off ") + n + " trim plate" + (n == 1 ? "" : "s")
                    + " of " + DisplayUnits.format(k.plateMass(), Dimension.MASS, units) + " (" + (m >= 0 ? "add "
                    : "take off ") + mass + " would bring it exactly to its frequency; spring and damper kept" + beyond
                    + ")";
        }
        return Math.abs(m) < 5e-7 * absorberMass ? "none"
                : (m > 0 ? "add " : "take off ") + mass + " of trim mass (spring and damper kept)";
    }

    /**
     * @param check the site check
     * @return the report
     */
    public static String render(SetSiteCheck check) {
        return render(check.project(), check.design(), Optional.empty(), Optional.of(check), check.units());
    }

    /**
     * @param project the project's name
     * @param design the absorbers as designed
     * @param operating the operating check, if a spectrum was given
     * @param fitted the check with the absorbers fitted, if a response was given
     * @param units the display unit system
     * @return the report: the operating check, then the absorbers as built, then the cautions
     */
    public static String render(String project, SeveralAbsorbers design, Optional<SetOperatingSite> operating,
            Optional<SetSiteCheck> fitted, UnitSystem units) {
        StringBuilder b = new StringBuilder("Site check of ").append(PlainText.escape(project)).append('\n');
        operating.ifPresent(o -> operating(b, o, design, units));
        fitted.ifPresent(f -> fitted(b, f));
        b.append("Cautions\n");
        List<String> cautions = new ArrayList<>();
        operating.ifPresent(o -> {
            cautions.add(OPERATING_SCOPE);
            cautions.add(SiteCheckReport.RUNNING);
            if (o.check().comparison().ratio() > 1) {
                cautions.add(LARGER);
            }
        });
        fitted.ifPresent(f -> {
            cautions.add(SCOPE);
            cautions.add(STOPPED);
        });
        cautions.add(SiteCheckReport.PRACTICE);
        cautions.forEach(c -> b.append("  - ").append(c).append('\n'));
        return b.toString();
    }

    private static void operating(StringBuilder b, SetOperatingSite o, SeveralAbsorbers design, UnitSystem units) {
        OperatingComparison c = o.check().comparison();
        b.append("Operating response (").append(PlainText.escape(o.file())).append(", ").append(c.kind().label())
                .append(" at ").append(PlainText.escape(design.layout().responsePoint())).append(", ")
                .append(o.convention().label()).append(c.withAbsorber() ? ", absorbers fitted" : ", no absorbers")
                .append(")\n");
        FrequencyBand band = design.band();
        line(b, "running frequency", QuantityFormat.format(c.runningFrequency(), Unit.HERTZ) + (o.runningGiven()
                ? " (as given)" : band.low() == band.high() ? " (the project's speed)" : " (the line found in the band)"));
        line(b, "line compared", QuantityFormat.format(c.lineFrequency(), Unit.HERTZ));
        line(b, "measured", amplitude(c.measured(), o));
        line(b, c.withAbsorber() ? "predicted (with the absorbers)" : "predicted (bare structure)",
                amplitude(c.predicted(), o));
        line(b, "measured / predicted", QuantityFormat.number(c.ratio(), 3));
        line(b, "force the site shows", DisplayUnits.format(c.impliedDriveAmplitude(), Dimension.FORCE, units)
                + " (project: " + DisplayUnits.format(design.forceAmplitude(), Dimension.FORCE, units) + ")");
        SetOperatingCheck check = o.check();
        for (int j = 0; j < check.designStrokes().size(); j++) {
            double stroke = check.designStrokes().get(j);
            line(b, "absorber " + (j + 1) + ": stroke", DisplayUnits.format(stroke * c.ratio(), Dimension.LENGTH, units)
                    + " (design " + DisplayUnits.format(stroke, Dimension.LENGTH, units) + ", clearance "
                    + DisplayUnits.format(check.clearances().get(j), Dimension.LENGTH, units) + ")"
                    + (stroke * c.ratio() > check.clearances().get(j) ? ": BEYOND its clearance" : ""));
        }
        if (c.warnings().contains(CommissioningWarning.OTHER_LINE_DOMINATES)) {
            line(b, "largest line", QuantityFormat.format(c.largestLineFrequency(), Unit.HERTZ) + ", "
                    + amplitude(c.largestLine(), o));
        }
        c.warnings().forEach(w -> b.append("Warning: ").append(SiteCheckReport.words(w)).append('\n'));
    }

    private static String amplitude(double peak, SetOperatingSite o) {
        return QuantityFormat.format(o.convention().ofHarmonic(peak), o.unit()) + " " + o.convention().label();
    }

    private static void fitted(StringBuilder b, SetSiteCheck check) {
        SetCommissioning c = check.check();
        AsBuiltSet built = c.built();
        UnitSystem units = check.units();
        String mode = check.design().layout().modeNames().get(built.targetMode());
        b.append("Absorbers as built (").append(PlainText.escape(check.file())).append(", ")
                .append(check.unit().kind().id()).append(" in ").append(check.unit().symbol()).append(", ")
                .append(built.lines()).append(" lines; ").append(built.absorbers().size()).append(" absorbers at ")
                .append(PlainText.escape(check.design().layout().absorberPoint())).append(" on the mode ")
                .append(PlainText.escape(mode)).append(")\n");
        line(b, built.targetModeFrequencySd().isPresent() ? "mode frequency (fitted)" : "mode frequency (design)",
                QuantityFormat.format(built.targetModeFrequency(), Unit.HERTZ)
                        + built.targetModeFrequencySd().stream().mapToObj(sd -> " +/- "
                        + QuantityFormat.number(Unit.HERTZ.fromSi(sd), 2) + " Hz").findFirst().orElse(""));
        if (built.targetModeFrequencySd().isPresent() && !c.warnings().contains(CommissioningWarning.POOR_FIT)) {
            SeveralAbsorbers set = check.design();
            line(b, "targets", SiteCheckReport.targetBasis(built.targetModeFrequency(), set.layout().structure()
                    .modes().get(built.targetMode()).naturalFrequency(), set.structureTolerance(),
                    "the set designed again for the mode as measured", "each absorber's design frequency"));
        }
        line(b, "normalised residual", QuantityFormat.number(built.normalisedResidual(), 3));
        boolean advised = c.advised();
        boolean poor = c.warnings().contains(CommissioningWarning.POOR_FIT);
        for (int j = 0; j < built.absorbers().size(); j++) {
            AsBuiltSet.Built a = built.absorbers().get(j);
            SetCommissioning.Correction k = c.corrections().get(j);
            String name = "absorber " + (j + 1);
            line(b, name + ": mass", DisplayUnits.format(a.mass(), Dimension.MASS, units)
                    + (check.weighed() ? " (as weighed)" : " (design)"));
            line(b, name + ": frequency", QuantityFormat.format(a.frequency(), Unit.HERTZ) + " +/- "
                    + QuantityFormat.number(Unit.HERTZ.fromSi(a.frequencySd()), 2) + " Hz (needed "
                    + QuantityFormat.format(k.targetFrequency(), Unit.HERTZ) + ": " + signedPercent(k.frequencyOff())
                    + ")");
            line(b, name + ": damping ratio", percent(a.dampingRatio()) + " +/- "
                    + QuantityFormat.number(100 * a.dampingRatioSd(), 2) + " % (design " + percent(k.designDampingRatio())
                    + (k.designDampingRatio() > 0 ? "; relative change " + signedPercent(k.dampingOff()) : "") + ")");
            if (advised) {
                line(b, name + ": trim", trim(k, a.mass(), units));
            }
        }
        Dimension length = Dimension.LENGTH;
        line(b, "peak over the band (amplitude)", "displacement at "
                + PlainText.escape(check.design().layout().responsePoint()) + ": design "
                + DisplayUnits.format(c.designPeak(), length, units) + ", as built "
                + DisplayUnits.format(c.asBuiltPeak(), length, units) + " ("
                + signedPercent(c.asBuiltPeak() / c.designPeak() - 1) + (poor ? "; from a poor fit, not to be relied on"
                        : "") + ")"
                + (advised ? ", after the trims " + DisplayUnits.format(c.afterTrimPeak(), length, units) : ""));
        line(b, "trim", poor ? "none advised: the fit is poor, so the absorbers' frequencies are not known"
                : !advised ? "none advised: trimming to the frequencies needed would not lower the peak (see below)"
                : c.trimRequired() ? "REQUIRED: the response as built is more than "
                        + percent(DesignResult.TOLERANCE_ALLOWANCE) + " above the design's"
                        : "optional: the response is within " + percent(DesignResult.TOLERANCE_ALLOWANCE)
                                + " of the design's");
        boolean freed = built.targetModeFrequencySd().isPresent();
        List<String> shortOfPlates = new ArrayList<>();
        for (int j = 0; j < c.corrections().size(); j++) {
            if (c.corrections().get(j).beyondTrimRange()) {
                shortOfPlates.add(Integer.toString(j + 1));
            }
        }
        c.warnings().forEach(w -> b.append("Warning: ").append(SiteCheckReport.words(w, freed))
                .append(w == CommissioningWarning.BEYOND_TRIM_RANGE ? " (absorber " + String.join(", ", shortOfPlates) + ")"
                        : "").append('\n'));
    }
}
