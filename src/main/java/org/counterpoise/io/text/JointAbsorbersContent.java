package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.JointArrangement;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.text.ReportValue.Field;
import org.counterpoise.io.text.ReportValue.Fields;
import org.counterpoise.io.text.ReportValue.Flag;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The rows and cautions of the section "Several absorbers and modes" that only one absorber per mode,
 * designed jointly, has (a project of format 7 with {@code "arrangement": "one-per-mode"}): each
 * absorber's mode and point, the sequential design beside the joint one and the gain, and the
 * certificate's status; {@link SeveralAbsorbersContent} places them.
 */
final class JointAbsorbersContent {
    /**
     * @param d one absorber per mode
     * @return the tuning row's value
     */
    static Words tuning(SeveralAbsorbers d) {
        return new Words("one absorber per mode, designed jointly: each its own tuning and damping, chosen together"
                + " for the least " + (d.robust().isPresent() ? "worst peak over the ranges" : "peak")
                + " of the whole structure", List.of("one-per-mode"));
    }
    /** A joint optimum that failed its certificate. */
    static final String NOT_FOUND = "One absorber per mode: the joint optimum was not found (its certificate failed,"
            + " docs/several-modes.md); the absorbers shown are the best design seen, never worse than the"
            + " sequential design: treat them as a good design, not the best.";
    /** One absorber per mode designed for the least worst case (method robust-worst-case). */
    static final String ROBUST = "One absorber per mode: the absorbers are designed jointly for the least worst peak"
            + " over the band with each absorber's mode's frequency anywhere in its range on its own and both"
            + " absorbers' frequencies off together (one spring batch), the whole structure seen; each absorber's own"
            + " scatter, the other modes' frequencies and the damping range are not in that worst case (the sheet"
            + " gives each absorber's tolerance on its own frequency within the set): check their tuning on site"
            + " with care.";
    /** A robust joint optimum that failed its certificate. */
    static final String ROBUST_NOT_FOUND = "One absorber per mode: the robust joint optimum was not found (its"
            + " certificate failed, docs/several-modes.md); the absorbers shown are the best design seen: compare"
            + " the worst peaks of the three designs in the section \"Several absorbers and modes\" before building"
            + " them.";
    private static final String SOURCE = "each absorber the certified least peak on its own mode alone, as seen at"
            + " its point (the usual practice; docs/several-modes.md)";

    private JointAbsorbersContent() {
    }

    /**
     * The rows of the robust design (method robust-worst-case): what it was designed for, its ranges
     * and damping floor, and this design, the joint least-peak design and the sequential one over them.
     *
     * @param rows where they go
     * @param d one absorber per mode
     * @param r the robust figures
     */
    static void robustRows(List<ReportRow> rows, SeveralAbsorbers d, SeveralAbsorbers.RobustSet r) {
        String source = "exact response of the structure's modes with the absorbers (docs/several-modes.md)";
        rows.add(SeveralAbsorbersContent.row(ReportKey.SEVERAL_DESIGNED_FOR, "designed for", new Words("the least worst"
                + " peak over the band (robust-worst-case), jointly, the whole structure seen",
                List.of("robust-worst-case")), "docs/several-modes.md, robust design of one absorber per mode"));
        rows.add(SeveralAbsorbersContent.row(ReportKey.SEVERAL_ROBUST_RANGES, "+/- modes independently, absorbers together",
                new Pair(new Percent(r.structureRange(), 2), new Percent(r.absorberRange(), 2), PairKind.SIDE_BY_SIDE),
                "robustness ranges of the project: each absorber's mode's natural frequency on its own (every"
                        + " combination of the two), both absorbers' by one common factor (one spring batch)"));
        rows.add(SeveralAbsorbersContent.row(ReportKey.SEVERAL_ROBUST_DAMPING_FLOOR, "least damping ratio of every"
                + " absorber", DesignContent.quantity(r.dampingFloor(), Dimension.RATIO), "the practical damping floor"
                + " (docs/robustness.md)"));
        String target = d.layout().modeNames().get(d.targetMode());
        rows.add(SeveralAbsorbersContent.compared(r.set(), "this design", "robust_set", source + "; the ranges: +/- each"
                + " absorber's mode's frequency on its own, both absorbers' frequencies together; the tolerance: mode "
                + target + " alone"));
        rows.add(SeveralAbsorbersContent.compared(r.leastPeakSet(), "joint design, least nominal peak", "least_peak_set", source));
        rows.add(SeveralAbsorbersContent.compared(r.alternative(), "sequential design, least nominal peak", "sequential", source));
    }

    /**
     * @param d one absorber per mode
     * @return the caution on what the single-mode sections of the report (and the sheet) take
     */
    static String sectionsCaution(SeveralAbsorbers d) {
        String target = d.layout().modeNames().get(d.targetMode());
        return "One absorber per mode: the sections other than \"Several absorbers and modes\" (the absorber, stroke"
                + " and forces, tolerance, method comparison, hardware, procedure) are for one absorber of the total"
                + " mass on mode " + target + " alone, at " + d.layout().absorberPoint() + "; the other modes and the"
                + " second absorber are in that section only. The sheet lists both absorbers to build, each with its"
                + " parts and tuning procedure on its own mode at its own point, and its strokes and forces as it works"
                + " with the other on the whole structure.";
    }

    /**
     * @param d one absorber per mode
     * @return a caution for each absorber whose tuning ended at the edge of its mode's neighbourhood
     */
    static List<String> edgeCautions(SeveralAbsorbers d) {
        JointArrangement j = d.layout().joint().orElseThrow();
        double lower = d.layout().structure().modes().get(j.modes().get(0)).naturalFrequency();
        double upper = d.layout().structure().modes().get(j.modes().get(1)).naturalFrequency();
        double edge = Math.sqrt(lower * upper);
        List<String> out = new ArrayList<>();
        for (int a = 0; a < d.absorbers().size(); a++) {
            if (Math.abs(d.absorbers().get(a).frequency() / edge - 1) < 1e-9) {
                out.add("One absorber per mode: absorber " + (a + 1) + " (mode " + modeName(d, a) + ") is tuned to the"
                        + " edge of its mode's neighbourhood (" + ValueText.frequency(edge) + ", the geometric mean of the"
                        + " two modes' natural frequencies): the joint design would rather move it further, toward"
                        + " the other mode, where it would serve that mode instead (docs/several-modes.md).");
            }
        }
        return out;
    }

    /**
     * @param d one absorber per mode
     * @param a the absorber's index
     * @return its mode, its point and whether the program chose the point, as fields of its row
     */
    static List<Field> modeAndPoint(SeveralAbsorbers d, int a) {
        JointArrangement j = d.layout().joint().orElseThrow();
        boolean chosen = j.pointsChosen().get(a);
        return List.of(new Field(ReportKey.ITEM_MODE, "mode", new Words(modeName(d, a), List.of())),
                new Field(ReportKey.ITEM_AT_POINT, "at", new Words(j.points().get(a), List.of())),
                new Field(ReportKey.ITEM_POINT_CHOSEN, "point", new Flag(chosen, chosen
                        ? "chosen: the mode's largest shape value" : "given")));
    }

    /**
     * @param d one absorber per mode
     * @return the sequential design's absorbers, its peak and the gain of the joint design
     */
    static List<ReportRow> sequentialRows(SeveralAbsorbers d) {
        SeveralAbsorbers.Sequential s = d.joint().orElseThrow();
        List<ReportRow> rows = new ArrayList<>();
        for (int a = 0; a < s.absorbers().size(); a++) {
            PointAbsorber absorber = s.absorbers().get(a);
            List<Field> fields = new ArrayList<>(modeAndPoint(d, a));
            fields.addAll(SeveralAbsorbersContent.absorberFields(absorber));
            rows.add(SeveralAbsorbersContent.row(ReportKey.SEVERAL_SEQUENTIAL_ABSORBER, "sequential absorber " + (a + 1),
                    new Fields("", fields), SOURCE));
        }
        rows.add(SeveralAbsorbersContent.row(ReportKey.SEVERAL_SEQUENTIAL_PEAK, "peak over the band, sequential design",
                DesignContent.quantity(s.peak(), Dimension.LENGTH), SOURCE));
        rows.add(SeveralAbsorbersContent.row(ReportKey.SEVERAL_JOINT_GAIN, d.robust().isPresent()
                ? "gain of the joint design over the ranges (sequential worst peak / joint worst peak)"
                : "gain of the joint design (sequential peak / joint peak)",
                DesignContent.quantity(d.jointGain().orElseThrow(), Dimension.RATIO), ""));
        return rows;
    }

    /**
     * @param d one absorber per mode
     * @return the certificate's status in words: certified, or not found with the best design seen
     */
    static ReportRow status(SeveralAbsorbers d) {
        return SeveralAbsorbersContent.row(ReportKey.SEVERAL_STATUS, "joint optimum", new Words(d.certified()
                ? "certified" : "not found: the best design seen is shown", List.of(d.certified() ? "certified"
                        : "not found")), "docs/several-modes.md, the certificate");
    }

    static String modeName(SeveralAbsorbers d, int a) {
        return d.layout().modeNames().get(d.layout().joint().orElseThrow().modes().get(a));
    }
}
