package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RunUpStroke;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportValue.Count;
import org.counterpoise.io.text.ReportValue.Field;
import org.counterpoise.io.text.ReportValue.Fields;
import org.counterpoise.io.text.ReportValue.Flag;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.Tolerance;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The section on several absorbers and several modes (a project of format 6 with
 * {@code structure.modes} or {@code absorbers}): each absorber's parts and tuning, the peak over the
 * band at the response point before and after, each mode's peak before and after (spillover) and the
 * gain over one absorber of the same total mass; with the cautions that say which other sections do
 * not yet take several absorbers or modes.
 */
public final class SeveralAbsorbersContent {
    /** Where the other sections stand when the absorber mass is split. */
    static final String ONE_ABSORBER_SECTIONS = "Several absorbers: the sections other than \"Several absorbers and"
            + " modes\" (the absorber, stroke and forces, tolerance, method comparison, hardware) are for one absorber"
            + " of the total mass on the target mode; the sheet lists every absorber to build with its own parts,"
            + " tolerance and tuning step, and the wizard shows them on the result step; robustness does not yet take"
            + " several absorbers.";
    /** What the wizard says when it opens a project with several modes or absorbers. */
    public static final String IN_THE_WIZARD = "This project has several modes or absorbers: the result step's tab"
            + " \"Several absorbers\" shows each absorber and the whole structure's response; the other steps and"
            + " tabs are for one absorber of the total mass on the target mode alone; the modes are edited in the file.";
    /** What the sheet of a project with several absorbers says first. */
    public static final String SHEET_SEVERAL_ABSORBERS = "This project has several absorbers: every absorber to build,"
            + " with its own parts, tolerance and tuning step, is under \"" + AbsorbersToBuildContent.TITLE + "\" and on"
            + " the pages after it. The sections marked \"" + AbsorbersToBuildContent.SINGLE_MARK.strip() + "\" are"
            + " for one absorber of the total mass on the target mode alone; \"Several absorbers and modes\" gives the"
            + " whole structure's response.";
    /** What the sheet of a project with several modes and one absorber says first. */
    public static final String SHEET_SEVERAL_MODES = "This project has several modes: the absorber is designed on the"
            + " target mode alone, at its point; \"Several absorbers and modes\" gives the whole structure's response.";
    /** What a front end that takes one absorber on one mode (sheet, robustness, run-up, wizard) says of such a project. */
    public static final String ONE_ABSORBER_ONLY = "This project has several modes or absorbers: what follows is for"
            + " one absorber of the total mass on the target mode alone; 'design' reports the several absorbers.";
    /** Where the other sections stand for a structure of several modes. */
    static final String TARGET_MODE_SECTIONS = "Several modes: the sections other than \"Several absorbers and modes\""
            + " see the target mode alone, at the absorbers' point; the other modes and points are in that section only.";
    /** A split designed for the nominal peak whatever the method. */
    static final String NOMINAL_SPLIT = "The split absorbers are tuned for the least nominal peak over the band"
            + " (H-infinity), not for the project's method; the sheet gives each absorber's tolerance on its own"
            + " frequency within the set, and no robust design of the set is made, so check their tuning on site with"
            + " care.";
    /** A split designed for the least worst case (method robust-worst-case). */
    static final String ROBUST_SPLIT = "The split absorbers are designed for the least worst peak over the band with"
            + " the target mode's frequency anywhere in its range and all absorbers' frequencies off together (one"
            + " spring batch), the whole structure seen; each absorber's own scatter, the other modes' frequencies and"
            + " the damping range are not in that worst case (the sheet gives each absorber's tolerance on its own"
            + " frequency within the set): check their tuning on site with care.";
    /** One absorber designed on the target mode alone that the whole structure's own optimum beats by 5 % or more. */
    static final double WHOLE_STRUCTURE_BETTER = 0.95;
    static final String ONE_ABSORBER_ON_THE_MODE_ALONE = "One absorber: it is designed on the target mode alone (the"
            + " project's method); on this structure one absorber of the same mass designed on the whole structure"
            + " has a peak over the band %.0f %% lower (own frequency %.4g Hz, damping ratio %.3g; \"the same mass"
            + " designed on the whole structure\"). Two or more absorbers (absorbers.count) are designed on the whole"
            + " structure.";
    /** A spillover limit no design of the absorbers keeps. */
    static final String SPILLOVER_NOT_KEPT = "Spillover limit NOT kept: no tuning of these absorbers found keeps the"
            + " peak near every other mode within absorbers.spillover_limit; the design shown came nearest. Raise the"
            + " limit, move the absorbers to a point the other modes move less, or treat those modes on their own.";
    /** Where the criterion is judged for several modes or absorbers. */
    static final String ACCEPTANCE_WHOLE = "Acceptance: the criterion is judged on the whole structure, every mode with"
            + " every absorber (and every mode without them), at the response point under the project's force; the"
            + " other single-mode sections are not.";
    /** An optimum of the split that failed its certificate. */
    static final String NOT_CERTIFIED = "The optimum of the split absorbers' tunings could not be certified"
            + " (docs/several-modes.md): treat their tunings as a good design, not the best.";

    private SeveralAbsorbersContent() {
    }

    /**
     * @param content a design's report
     * @param d the several absorbers designed for the same project
     * @return the report with the section after the response (or at the end) and the cautions
     */
    public static ReportContent with(ReportContent content, SeveralAbsorbers d) {
        return with(content, d, Optional.empty());
    }

    /**
     * @param content a design's report
     * @param d the several absorbers designed for the same project
     * @param built each absorber of the set as it works within the set (its strokes, forces, clearance,
     *     damper velocity and tolerance on its own frequency: what its parts are sized from), a row each
     *     after the peaks; empty for none (the sheet gives them on each absorber's pages)
     * @return the report with the section after the response (or at the end) and the cautions
     */
    public static ReportContent with(ReportContent content, SeveralAbsorbers d, Optional<AbsorbersToBuild> built) {
        ReportSection section = new ReportSection(SectionId.SEVERAL_ABSORBERS, "Several absorbers and modes",
                rows(d, built));
        List<ReportSection> sections = new ArrayList<>();
        boolean placed = false;
        for (ReportSection s : content.sections()) {
            sections.add(s);
            if (s.id() == SectionId.RESPONSE) {
                sections.add(section);
                placed = true;
            }
        }
        if (!placed) {
            sections.add(section);
        }
        List<String> cautions = new ArrayList<>(content.cautions());
        if (content.sections().stream().anyMatch(s -> s.id() == SectionId.ACCEPTANCE)) {
            cautions.add(ACCEPTANCE_WHOLE);
        }
        if (d.joint().isPresent()) {
            cautions.add(JointAbsorbersContent.sectionsCaution(d));
            cautions.addAll(JointAbsorbersContent.edgeCautions(d));
            cautions.add(d.robust().isPresent() ? JointAbsorbersContent.ROBUST : NOMINAL_SPLIT);
            if (!d.certified()) {
                cautions.add(d.robust().isPresent() ? JointAbsorbersContent.ROBUST_NOT_FOUND
                        : JointAbsorbersContent.NOT_FOUND);
            }
            return new ReportContent(content.name(), sections, content.warnings(), cautions, content.comparison(),
                    content.units());
        }
        d.single().filter(s -> d.absorbers().size() == 1 && s.peak() < WHOLE_STRUCTURE_BETTER * d.peakAfter())
                .ifPresent(s -> cautions.add(String.format(Locale.ROOT, ONE_ABSORBER_ON_THE_MODE_ALONE,
                        100 * (1 - s.peak() / d.peakAfter()), s.absorber().frequency() / (2 * Math.PI),
                        s.absorber().damping() / (2 * s.absorber().mass() * s.absorber().frequency()))));
        if (d.absorbers().size() > 1) {
            cautions.add(ONE_ABSORBER_SECTIONS);
            cautions.add(d.robust().isPresent() ? ROBUST_SPLIT : NOMINAL_SPLIT);
            if (d.spillover().isPresent() && !d.spillover().get().met()) {
                cautions.add(SPILLOVER_NOT_KEPT);
            }
        }
        if (d.layout().structure().size() > 1) {
            cautions.add(TARGET_MODE_SECTIONS);
        }
        if (!d.certified()) {
            cautions.add(NOT_CERTIFIED);
        }
        return new ReportContent(content.name(), sections, content.warnings(), cautions, content.comparison(),
                content.units());
    }

    private static List<ReportRow> rows(SeveralAbsorbers d, Optional<AbsorbersToBuild> built) {
        String source = "exact response of the structure's modes with the absorbers (docs/several-modes.md)";
        List<ReportRow> rows = new ArrayList<>();
        int n = d.absorbers().size();
        AbsorberSetTuning tuning = d.layout().tuning();
        String tuningId = tuning.name().toLowerCase(Locale.ROOT);
        boolean joint = d.joint().isPresent();
        rows.add(row(ReportKey.SEVERAL_COUNT, joint ? "absorbers, one per mode" : "absorbers, equal masses",
                new Count(n), ""));
        rows.add(row(ReportKey.SEVERAL_TUNING, "tuning", joint ? JointAbsorbersContent.tuning(d)
                : new Words(n == 1 ? "one absorber, the design above"
                : tuning == AbsorberSetTuning.UNIFORM ? "uniform spread, one damping ratio (Xu and Igusa 1992)"
                : "each absorber its own tuning and damping (Zuo and Nayfeh 2005)", List.of(tuningId)), ""));
        rows.add(row(ReportKey.SEVERAL_POINTS, joint ? "force, response, target absorber at"
                : "force at, response at, absorbers at", new Words(
                d.layout().excitationPoint() + ", " + d.layout().responsePoint() + ", " + d.layout().absorberPoint(),
                List.of(d.layout().excitationPoint(), d.layout().responsePoint(), d.layout().absorberPoint())), ""));
        Mode target = d.layout().structure().modes().get(d.targetMode());
        String targetName = d.layout().modeNames().get(d.targetMode());
        rows.add(row(ReportKey.SEVERAL_TARGET_MODE, joint ? "the single-mode sections take mode" : "fitted to mode",
                new Words(targetName, List.of(targetName)), joint ? "absorbers.target_mode, or the first of absorbers.modes"
                        : d.layout().targetMode().isPresent() ? "absorbers.target_mode" : "the mode nearest the band"));
        rows.add(row(ReportKey.SEVERAL_TARGET_FREQUENCY, "its natural frequency",
                DesignContent.quantity(target.naturalFrequency(), Dimension.FREQUENCY), ""));
        rows.add(row(ReportKey.SEVERAL_EFFECTIVE_MASS, joint ? "its modal mass at its absorber's point"
                : "its modal mass at the absorbers' point",
                DesignContent.quantity(d.effectiveMass(), Dimension.MASS), "m_r / phi_r(a)^2"));
        rows.add(row(ReportKey.SEVERAL_TOTAL_MASS, "total absorber mass", DesignContent.quantity(d.totalMass(),
                Dimension.MASS), ""));
        for (int j = 0; j < n; j++) {
            List<Field> fields = new ArrayList<>(joint ? JointAbsorbersContent.modeAndPoint(d, j) : List.of());
            fields.addAll(absorberFields(d.absorbers().get(j)));
            rows.add(row(ReportKey.SEVERAL_ABSORBER, "absorber " + (j + 1), new Fields("", fields), joint
                    ? "designed jointly, the whole structure seen (docs/several-modes.md)" : source));
        }
        built.ifPresent(b -> rows.addAll(inSetRows(b)));
        rows.add(row(ReportKey.SEVERAL_PEAKS, joint ? "peak over the band (joint design)"
                : "peak displacement over the band", new Pair(
                DesignContent.quantity(d.peakBefore(), Dimension.LENGTH),
                DesignContent.quantity(d.peakAfter(), Dimension.LENGTH), PairKind.BEFORE_AFTER), source));
        if (joint) {
            rows.addAll(JointAbsorbersContent.sequentialRows(d));
        }
        for (SeveralAbsorbers.ModePeak p : d.modes()) {
            String name = d.layout().modeNames().get(p.mode());
            Mode m = d.layout().structure().modes().get(p.mode());
            List<Field> fields = new ArrayList<>(List.of(
                    new Field(ReportKey.ITEM_NAME, "", new Words(name, List.of())),
                    new Field(ReportKey.ITEM_NATURAL_FREQUENCY, "at", DesignContent.quantity(m.naturalFrequency(),
                            Dimension.FREQUENCY)),
                    new Field(ReportKey.ITEM_PEAKS, "peak before, after", new Pair(
                            DesignContent.quantity(p.before(), Dimension.LENGTH),
                            DesignContent.quantity(p.after(), Dimension.LENGTH), PairKind.BEFORE_AFTER))));
            d.spilloverLimitOf(p).ifPresent(limit -> fields.add(new Field(ReportKey.ITEM_PEAK_LIMIT, "limit",
                    DesignContent.quantity(limit, Dimension.LENGTH))));
            rows.add(row(ReportKey.SEVERAL_MODE, "near mode " + name + ", any speed", new Fields("", fields),
                    "the largest response at any frequency of each mode's neighbourhood (between the geometric means"
                            + " of its natural frequency and its neighbours'), in the band or not: a run-up passes"
                            + " through it (spillover)"));
        }
        d.single().filter(s -> n == 1).ifPresent(s -> rows.add(row(ReportKey.SEVERAL_SINGLE_PEAK,
                "the same mass designed on the whole structure: peak", DesignContent.quantity(s.peak(), Dimension.LENGTH),
                "for comparison: one absorber for the least peak over the band, every mode seen (the design above sees"
                        + " the target mode alone), own frequency " + ValueText.frequency(s.absorber().frequency())
                        + ", damping ratio " + String.format(Locale.ROOT, "%.4g", s.absorber().damping()
                                / (2 * s.absorber().mass() * s.absorber().frequency())))));
        d.single().filter(s -> n > 1).ifPresent(s -> {
            rows.add(row(ReportKey.SEVERAL_SINGLE_PEAK, "one absorber of the same total mass: peak",
                    DesignContent.quantity(s.peak(), Dimension.LENGTH), d.robust().isPresent()
                            ? "least worst peak over the ranges, the whole structure seen (as the split)"
                            : d.spillover().isPresent() ? (d.spillover().get().singleMet()
                                    ? "least peak over the band, the whole structure seen, under the same spillover limit"
                                    : "NOT within the spillover limit: no design of one absorber found keeps it; the"
                                            + " one shown came nearest")
                            : "least peak over the band, the whole structure seen"));
            rows.add(row(ReportKey.SEVERAL_GAIN, "gain of the split (one absorber's peak / this peak)",
                    DesignContent.quantity(d.gain().orElseThrow(), Dimension.RATIO), ""));
        });
        String tolerance = "peak over the band within " + ValueText.percent(DesignResult.TOLERANCE_ALLOWANCE, 2)
                + " of its nominal, the mode's stiffness off, searched to "
                + ValueText.percent(DesignResult.TOLERANCE_SEARCH, 2) + " each side (exact peak of the whole structure)";
        rows.add(row(ReportKey.SEVERAL_STRUCTURE_TOLERANCE, "mode " + targetName + " frequency may be off by",
                new Tolerance(d.structureTolerance(), 1), tolerance));
        d.single().ifPresent(s -> rows.add(row(ReportKey.SEVERAL_SINGLE_STRUCTURE_TOLERANCE,
                "the same, one absorber of the same total mass", new Tolerance(s.structureTolerance(), 1), tolerance)));
        d.robust().ifPresent(r -> {
            if (joint) {
                JointAbsorbersContent.robustRows(rows, d, r);
            } else {
                robustRows(rows, r, targetName);
            }
        });
        d.spillover().ifPresent(s -> {
            rows.add(row(ReportKey.SEVERAL_SPILLOVER_LIMIT, "spillover limit (x each mode's bare peak)", DesignContent.quantity(s.ratio(), Dimension.RATIO),
                    "absorbers.spillover_limit: the set is the least peak over the band with every other mode's peak"
                            + " within it (docs/several-modes.md, spillover limited)"));
            rows.add(row(ReportKey.SEVERAL_SPILLOVER_MET, "spillover limit kept", new Flag(s.met(), s.met() ? "yes"
                    : "NO"), s.met() ? "" : "no design of these absorbers found keeps it: the one shown came nearest"));
            rows.add(row(ReportKey.SEVERAL_UNLIMITED_PEAK, "least peak over the band with no limit",
                    DesignContent.quantity(s.unlimitedPeak(), Dimension.LENGTH), s.limited()
                            ? "what the limit costs: the set above is higher in the band" : "the limit does not bind"));
        });
        rows.add(row(ReportKey.SEVERAL_CERTIFIED, "optimum certified", new Flag(d.certified(),
                d.certified() ? "yes" : "NO"), n == 1 ? "the design above" : "docs/several-modes.md, the certificate"));
        if (joint) {
            rows.add(JointAbsorbersContent.status(d));
        }
        return rows;
    }

    /**
     * Each absorber as it works within the set on the whole structure, from rest to the top of the band
     * and in the band: the figures its parts are sized from (docs/several-modes.md, "absorbers to build").
     */
    private static List<ReportRow> inSetRows(AbsorbersToBuild b) {
        List<ReportRow> rows = new ArrayList<>();
        for (int j = 0; j < b.absorbers().size(); j++) {
            AbsorbersToBuild.Built built = b.absorbers().get(j);
            DesignResult own = built.design();
            List<Field> fields = new ArrayList<>();
            if (b.set().joint().isPresent()) {
                // its own mode, as its procedure measures it, and the range of that mode's frequency it holds
                fields.add(new Field(ReportKey.ITEM_MODE, "mode", new Words(JointAbsorbersContent.modeName(b.set(), j),
                        List.of())));
                fields.add(new Field(ReportKey.ITEM_NATURAL_FREQUENCY, "at", DesignContent.quantity(
                        own.study().structure().naturalFrequency(), Dimension.FREQUENCY)));
                fields.add(new Field(ReportKey.ITEM_STRUCTURE_TOLERANCE, "its frequency may be off by",
                        new Tolerance(own.structureTolerance(), 1)));
            }
            fields.addAll(List.of(
                    new Field(ReportKey.ITEM_STROKE_IN_BAND, "stroke in band", DesignContent.quantity(
                            own.strokeInBand().value(), Dimension.LENGTH)),
                    new Field(ReportKey.ITEM_STROKE_FROM_REST, "from rest", DesignContent.quantity(
                            own.strokeRunUp().value(), Dimension.LENGTH)),
                    new Field(ReportKey.ITEM_CLEARANCE, "clearance", DesignContent.quantity(own.clearance(),
                            Dimension.LENGTH)),
                    new Field(ReportKey.ITEM_SPRING_FORCE, "spring force", DesignContent.quantity(
                            own.springForce().value(), Dimension.FORCE)),
                    new Field(ReportKey.ITEM_DAMPER_FORCE, "damper force", DesignContent.quantity(
                            own.damperForce().value(), Dimension.FORCE)),
                    new Field(ReportKey.ITEM_ABSORBER_FORCE, "total force", DesignContent.quantity(
                            own.absorberForce().value(), Dimension.FORCE)),
                    new Field(ReportKey.ITEM_DAMPER_VELOCITY, "damper velocity", DesignContent.quantity(
                            built.damperVelocity(), Dimension.VELOCITY)),
                    new Field(ReportKey.ITEM_OWN_FREQUENCY_TOLERANCE, "own frequency may be off by",
                            new Tolerance(built.toleranceInSet(), 1))));
            rows.add(row(ReportKey.SEVERAL_IN_SET, "absorber " + (j + 1) + " within the set", new Fields("", fields),
                    "peaks with every absorber on the whole structure; the clearance is the stroke margin times the"
                            + " larger stroke" + (own.runUpStroke().basis() == RunUpStroke.Basis.TRANSIENT
                                    ? " or the absorber's transient run-up stroke" : "")
                            + "; its own frequency off with the others as built, the set's peak up by "
                            + ValueText.percent(DesignResult.TOLERANCE_ALLOWANCE, 2)));
        }
        return rows;
    }

    /** An absorber's mass, spring, damper, own frequency and damping ratio, as fields of its row. */
    static List<Field> absorberFields(PointAbsorber a) {
        double w = a.frequency();
        return List.of(
                new Field(ReportKey.ITEM_MASS, "mass", DesignContent.quantity(a.mass(), Dimension.MASS)),
                new Field(ReportKey.ITEM_STIFFNESS, "stiffness", DesignContent.quantity(a.stiffness(),
                        Dimension.STIFFNESS)),
                new Field(ReportKey.ITEM_DAMPING, "damping", DesignContent.quantity(a.damping(),
                        Dimension.DAMPING_COEFFICIENT)),
                new Field(ReportKey.ITEM_FREQUENCY, "own frequency", DesignContent.quantity(w, Dimension.FREQUENCY)),
                new Field(ReportKey.ITEM_DAMPING_RATIO, "damping ratio", DesignContent.quantity(
                        a.damping() / (2 * a.mass() * w), Dimension.RATIO)));
    }

    /** What a set designed by robust-worst-case was designed for, and its figures beside the others'. */
    private static void robustRows(List<ReportRow> rows, SeveralAbsorbers.RobustSet r, String targetName) {
        String source = "exact response of the structure's modes with the absorbers (docs/several-modes.md)";
        rows.add(row(ReportKey.SEVERAL_DESIGNED_FOR, "split designed for", new Words("the least worst peak over the"
                + " band (robust-worst-case), the whole structure seen", List.of("robust-worst-case")),
                "docs/several-modes.md, robust design of the set"));
        rows.add(row(ReportKey.SEVERAL_ROBUST_RANGES, "+/- mode " + targetName + ", absorbers together", new Pair(
                new Percent(r.structureRange(), 2), new Percent(r.absorberRange(), 2), PairKind.SIDE_BY_SIDE),
                "robustness ranges of the project: mode " + targetName + "'s natural frequency, all absorbers' by one"
                        + " common factor (one spring batch)"));
        rows.add(row(ReportKey.SEVERAL_ROBUST_DAMPING_FLOOR, "least damping ratio of every absorber",
                DesignContent.quantity(r.dampingFloor(), Dimension.RATIO), "the practical damping floor"
                + " (docs/robustness.md)"));
        rows.add(compared(r.set(), "this set", "robust_set", source));
        rows.add(compared(r.leastPeakSet(), "same absorbers, least nominal peak", "least_peak_set",
                source));
        rows.add(compared(r.alternative(), "one absorber of the total mass, least worst", "one_absorber", source));
    }

    static ReportRow compared(SeveralAbsorbers.Figures f, String label, String id, String source) {
        List<Field> fields = List.of(
                new Field(ReportKey.ITEM_DESIGN, "", new Words(label, List.of(id))),
                new Field(ReportKey.ITEM_NOMINAL_PEAK, "nominal peak", DesignContent.quantity(f.nominalPeak(),
                        Dimension.LENGTH)),
                new Field(ReportKey.ITEM_WORST_PEAK, "worst peak over the ranges", DesignContent.quantity(f.worstPeak(),
                        Dimension.LENGTH)),
                new Field(ReportKey.ITEM_STRUCTURE_TOLERANCE, "mode frequency may be off by",
                        new Tolerance(f.structureTolerance(), 1)));
        return row(ReportKey.SEVERAL_COMPARED, label, new Fields("", fields), source);
    }

    static ReportRow row(ReportKey key, String label, ReportValue value, String source) {
        return new ReportRow(key, label, "", value, source, "");
    }
}
