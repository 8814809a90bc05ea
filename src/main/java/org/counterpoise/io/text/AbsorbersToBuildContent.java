package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.design.JointArrangement;
import org.counterpoise.core.design.RunUpStroke;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.realisation.ProcedureStep;
import org.counterpoise.core.realisation.ProcedureStepKind;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportValue.Field;
import org.counterpoise.io.text.ReportValue.Fields;
import org.counterpoise.io.text.ReportValue.Tolerance;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * What the sheet prints of a set of several absorbers ({@link AbsorbersToBuild}): the table of
 * every absorber to build (mass, own frequency, spring rate, damping coefficient and ratio, point,
 * tolerance on its own frequency within the set), and for each absorber its own parts, checks, part
 * tolerances, trim and tuning steps, from the realisation of its own design.
 */
public final class AbsorbersToBuildContent {
    /** The title of the table of absorbers. */
    public static final String TITLE = "Absorbers to build";
    /** The mark of a section that still describes one absorber of the total mass. */
    public static final String SINGLE_MARK = " (one absorber of the total mass, for comparison)";
    /** The steps of the procedure that tune one absorber of the set (the others are done for the set). */
    private static final Set<ProcedureStepKind> OWN_STEPS = Set.of(ProcedureStepKind.COMPUTE_ABSORBER_TARGET,
            ProcedureStepKind.TUNE_ABSORBER);

    private AbsorbersToBuildContent() {
    }

    /**
     * One absorber's own pages.
     *
     * @param title its heading
     * @param sentences what its parts are sized from, one sentence each
     * @param sections its parts, checks, part tolerances, trim and tuning steps (empty when its
     *     hardware could not be sized: the sentences say why)
     */
    public record Absorber(String title, List<String> sentences, List<ReportSection> sections) {
        /** Copies the lists. */
        public Absorber {
            sentences = List.copyOf(sentences);
            sections = List.copyOf(sections);
        }
    }

    /**
     * @param b the absorbers to build
     * @return the table of them, one row (a record of the same fields) per absorber
     */
    public static ReportSection table(AbsorbersToBuild b) {
        List<ReportRow> rows = new ArrayList<>();
        int n = b.absorbers().size();
        for (int j = 0; j < n; j++) {
            AbsorbersToBuild.Built built = b.absorbers().get(j);
            PointAbsorber a = built.absorber();
            double w = a.frequency();
            List<Field> fields = List.of(
                    new Field(ReportKey.ITEM_NAME, "absorber", new Words((j + 1) + " of " + n, List.of())),
                    new Field(ReportKey.ITEM_MASS, "mass", DesignContent.quantity(a.mass(), Dimension.MASS)),
                    new Field(ReportKey.ITEM_FREQUENCY, "own frequency", DesignContent.quantity(w, Dimension.FREQUENCY)),
                    new Field(ReportKey.ITEM_STIFFNESS, "spring rate", DesignContent.quantity(a.stiffness(),
                            Dimension.STIFFNESS)),
                    new Field(ReportKey.ITEM_DAMPING, "damping coefficient", DesignContent.quantity(a.damping(),
                            Dimension.DAMPING_COEFFICIENT)),
                    new Field(ReportKey.ITEM_DAMPING_RATIO, "damping ratio", DesignContent.quantity(
                            a.damping() / (2 * a.mass() * w), Dimension.RATIO)),
                    new Field(ReportKey.ITEM_POINT, "point", new Words(a.point(), List.of(a.point()))),
                    new Field(ReportKey.ITEM_TOLERANCE_IN_SET, "own frequency may be off",
                            new Tolerance(built.toleranceInSet(), 1)));
            rows.add(new ReportRow(ReportKey.BUILD_ABSORBER, "absorber " + (j + 1), "", new Fields("", fields),
                    "", ""));
        }
        return new ReportSection(SectionId.SEVERAL_ABSORBERS, TITLE, rows);
    }

    /**
     * @param b the absorbers to build
     * @return the sentences under the table: what the figures are and where the tolerance comes from
     */
    public static List<String> sentences(AbsorbersToBuild b) {
        return List.of("Build every absorber of this table: " + arrangement(b) + " on the whole structure, at its"
                        + " response point, for " + AbsorbersToBuild.goal(b.set()) + " (docs/several-modes.md).",
                "Own frequency may be off: how far that absorber's own frequency may be from its value, the others as"
                        + " built, before the set's peak over the band rises by "
                        + ValueText.percent(DesignResult.TOLERANCE_ALLOWANCE, 2) + " (its spring rate off, its damper"
                        + " kept; exact peak of the whole structure, searched to "
                        + ValueText.percent(DesignResult.TOLERANCE_SEARCH, 2) + " each side). Its parts are made to"
                        + " this tolerance.",
                "Each absorber's parts follow on its own pages, sized from that absorber's own figures.");
    }

    /** How the set is arranged, in words: equal masses on one mode, or one absorber per mode with its point. */
    private static String arrangement(AbsorbersToBuild b) {
        AbsorberLayout layout = b.set().layout();
        if (layout.joint().isPresent()) {
            JointArrangement joint = layout.joint().get();
            List<String> each = new ArrayList<>();
            for (int a = 0; a < joint.modes().size(); a++) {
                each.add("absorber " + (a + 1) + " on mode " + layout.modeNames().get(joint.modes().get(a)) + " at "
                        + joint.points().get(a));
            }
            return "one absorber per mode (" + String.join(", ", each) + "), each with its own mass, tuning and"
                    + " damping, designed together";
        }
        return b.absorbers().size() + " absorbers of equal mass at " + layout.absorberPoint() + ", tuned together ("
                + layout.tuning().name().toLowerCase(Locale.ROOT) + " tuning)";
    }

    /**
     * @param b the absorbers to build
     * @param j the absorber
     * @param realisation its hardware, or empty when it could not be sized
     * @param whyNot why it could not be sized, a sentence (used when realisation is empty)
     * @param units the unit system
     * @return its pages
     */
    public static Absorber absorber(AbsorbersToBuild b, int j, Optional<Realisation> realisation, String whyNot,
            UnitSystem units) {
        AbsorbersToBuild.Built built = b.absorbers().get(j);
        int n = b.absorbers().size();
        List<String> sentences = new ArrayList<>();
        sentences.add("The parts of absorber " + (j + 1) + " are sized from that absorber's own figures: its mass "
                + ValueText.inline(DesignContent.quantity(built.absorber().mass(), Dimension.MASS), units)
                + ", its own frequency and damping as tabled, its strokes, spring force and damper velocity as it"
                + " works within the set on the whole structure (the clearance is " + ValueText.inline(
                        DesignContent.quantity(built.design().clearance(), Dimension.LENGTH), units)
                + "), and the tolerance on its own frequency within the set."
                + (built.design().runUpStroke().basis() == RunUpStroke.Basis.TRANSIENT
                        ? " Its run-up stroke is taken as if it worked alone on its mode (the set's run-up is"
                                + " not computed), and the clearance holds it." : ""));
        AbsorberLayout layout = b.set().layout();
        layout.joint().filter(joint -> realisation.isPresent()).ifPresent(joint -> sentences.add("Absorber " + (j + 1)
                + " is tuned to mode " + layout.modeNames().get(joint.modes().get(j)) + " at " + joint.points().get(j)
                + ": in its tuning below, \"the structure\" is that mode, "
                + ValueText.inline(DesignContent.quantity(built.design().study().structure().naturalFrequency(),
                        Dimension.FREQUENCY), units) + " as designed; measure that mode's natural frequency."
                + " site-check does not yet take one absorber per mode: outside the range, design again."));
        List<ReportSection> sections = new ArrayList<>();
        if (realisation.isEmpty()) {
            sentences.add(whyNot.isBlank() ? "Its hardware could not be sized with the project's hardware choices."
                    : whyNot);
        } else {
            String which = "Absorber " + (j + 1) + " of " + n + " \u00b7 ";
            for (ReportSection s : HardwareContent.sections(realisation.get(), built.design(), units)) {
                switch (s.id()) {
                    case PART_LIST, CHECKS, PART_TOLERANCES, TRIM -> sections.add(
                            new ReportSection(s.id(), which + s.title(), s.rows()));
                    case PROCEDURE -> sections.add(new ReportSection(s.id(), which + "Its own tuning",
                            tuningSteps(realisation.get(), units)));
                    default -> {
                        // the predicted response is the set's, not this absorber's alone
                    }
                }
            }
        }
        return new Absorber("Absorber " + (j + 1) + " of " + n + ": its own parts", sentences, sections);
    }

    private static List<ReportRow> tuningSteps(Realisation r, UnitSystem units) {
        List<ProcedureStep> own = r.procedure().stream().filter(s -> OWN_STEPS.contains(s.kind())).toList();
        return ProcedureText.rows(own, units);
    }
}
