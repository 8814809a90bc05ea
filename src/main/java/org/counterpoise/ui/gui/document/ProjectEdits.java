package org.counterpoise.ui.gui.document;

import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.io.measurement.StructureFromMeasurement;
import org.counterpoise.io.project.AbsorberInput;
import org.counterpoise.io.project.AbsorbersInput;
import org.counterpoise.io.project.AcceptanceInput;
import org.counterpoise.io.project.DisturbanceInput;
import org.counterpoise.io.project.ModesInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.io.project.StructureInput;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitSystem;

/**
 * The edits the wizard's views make, one per section of the project, and the rule that keeps a
 * project consistent after any of them. Plain Java (no Swing), so tests apply exactly the edits
 * the views apply.
 */
public final class ProjectEdits {
    private ProjectEdits() {
    }

    /**
     * @param key the field edited
     * @param s the structure section as now shown
     * @return the edit
     */
    public static Edit structure(String key, StructureInput s) {
        return new Edit(key, "structure", p -> p.withStructure(s));
    }

    /**
     * @param s the structure section made from an identified mode (saying where it came from)
     * @param mode the mode, whose standard uncertainties become the structure's tolerances where the
     *     project states none ({@link StructureFromMeasurement#withUncertainties})
     * @return the edit, one undo step
     */
    public static Edit measuredStructure(StructureInput s, IdentifiedMode mode) {
        return new Edit("structure.measured", "structure from a measurement",
                p -> StructureFromMeasurement.withUncertainties(p.withStructure(s), mode));
    }

    /**
     * An edit of the structure's modes on the structure step's table ({@link ModesEdits}): the modes,
     * their named points and the absorbers' count, tuning, point and target, all else kept.
     * @param key the control used
     * @param edited the project as the table made it (only its modes and absorbers are taken)
     * @return the edit
     */
    public static Edit modes(String key, Project edited) {
        ModesInput modes = edited.modes();
        AbsorbersInput absorbers = edited.absorbers();
        return new Edit(key, "the structure's modes", p -> p.withSeveral(modes, absorbers));
    }

    /**
     * @param key the field edited
     * @param d the disturbance section as now shown
     * @return the edit
     */
    public static Edit disturbance(String key, DisturbanceInput d) {
        return new Edit(key, "disturbance", p -> p.withDisturbance(d));
    }

    /**
     * @param key the field edited
     * @param a the absorber section as now shown
     * @return the edit
     */
    public static Edit absorber(String key, AbsorberInput a) {
        return new Edit(key, "absorber goal", p -> p.withAbsorber(a));
    }

    /**
     * An edit of the robustness step: target, Monte Carlo and manufacturing tolerances. The ranges
     * the design must hold over are kept as the project has them: they are edited on the
     * absorber-goal step ({@link #ranges}), so a view that has not yet shown a change of them never
     * writes an older value back.
     *
     * @param key the field edited
     * @param r the robustness section as now shown (its ranges are ignored)
     * @return the edit
     */
    public static Edit robustness(String key, RobustnessInput r) {
        return new Edit(key, "robustness", p -> p.withRobustness(r.withRanges(p.robustness() == null
                ? RobustnessInput.Ranges.NONE : p.robustness().ranges())));
    }

    /**
     * The ranges the design must hold over, edited on the absorber-goal step: they live in the
     * robustness section (the one place the file, the robustness step and the reports read them),
     * which is created for them when the project had none and stays absent while nothing is stated.
     *
     * @param key the field edited
     * @param ranges the ranges as now shown
     * @return the edit
     */
    public static Edit ranges(String key, RobustnessInput.Ranges ranges) {
        return new Edit(key, "tolerance ranges", p -> p.withRobustness(withRanges(p.robustness(), ranges)));
    }

    private static RobustnessInput withRanges(RobustnessInput r, RobustnessInput.Ranges ranges) {
        if (r != null) {
            return r.withRanges(ranges);
        }
        // samples 0 and seed 1 are what a section that names neither means (docs/project-file.md)
        return ranges.isEmpty() ? null : new RobustnessInput(ranges, null, 0, 1, null, null, null, null, null);
    }

    /**
     * @param key the field edited
     * @param name project name
     * @param notes notes
     * @param identity revision, engineer, client or site, date
     * @return the edit
     */
    public static Edit identity(String key, String name, String notes, ProjectIdentity identity) {
        return new Edit(key, "project details", p -> p.withDetails(name, notes, identity));
    }

    /**
     * @param key the field edited
     * @param criterion the acceptance criterion as now shown, or null for none
     * @return the edit
     */
    public static Edit acceptance(String key, AcceptanceInput criterion) {
        return new Edit(key, "criterion", p -> p.withAcceptance(criterion));
    }

    /**
     * @param key the field edited
     * @param convention how response values are shown: peak, r.m.s. or peak-to-peak
     * @return the edit
     */
    public static Edit displayConvention(String key, AmplitudeConvention convention) {
        return new Edit(key, "display convention", p -> p.withDisplayConvention(convention));
    }

    /**
     * @param key the field edited
     * @param choice the hardware choices as now shown
     * @return the edit
     */
    public static Edit hardware(String key, HardwareChoice choice) {
        return new Edit(key, "hardware", p -> p.withHardware(choice));
    }

    /**
     * @param key the control used
     * @param system the unit system every value is shown in
     * @return the edit
     */
    public static Edit displayUnits(String key, UnitSystem system) {
        return new Edit(key, "unit system", p -> p.withDisplayUnits(system));
    }

    /**
     * A new project: the numbers of a template to start from (an invented scenario), but none of
     * its name, notes or identity, which belong to the scenario and not to the user's project (its
     * criterion and display convention are numbers of the scenario, kept, so a first project shows a
     * verdict); and
     * the recommended design method ({@link DesignMethod#RECOMMENDED}, issue 12), whatever the
     * scenario's was.
     * @param template the scenario to start from
     * @return an untitled project
     */
    public static Project untitled(Project template) {
        return template.withAbsorber(template.absorber().withMethod(DesignMethod.RECOMMENDED))
                .withDetails(Project.UNTITLED, "", ProjectIdentity.EMPTY);
    }

    /**
     * The project after an edit, made consistent: a robustness target whose quantity no longer
     * matches the response that matters (say a displacement target after the response became a
     * velocity) cannot be converted without a frequency, so it is cleared and the user is told.
     *
     * @param p the project as edited
     * @return the consistent project and what was changed beyond the edit (null when nothing)
     */
    public static Consistent consistent(Project p) {
        RobustnessInput r = p.robustness();
        ResponseKind response = p.absorber().response();
        if (r == null || r.target() == null || r.target().unit().dimension() == response.dimension()) {
            return new Consistent(p, null);
        }
        QuantityInput old = r.target();
        RobustnessInput cleared = r.withTarget(null);
        String note = "The robustness target (" + QuantityFormat.number(old.value(), 4) + " " + old.unit().symbol()
                + ") was cleared: the response that matters is now the " + response.label()
                + ". Give a new target on the Robustness step.";
        return new Consistent(p.withRobustness(cleared), note);
    }

    /**
     * A consistent project and a note on what was changed to make it so.
     *
     * @param project the project
     * @param note what changed beyond the edit, or null
     */
    public record Consistent(Project project, String note) {
    }
}
