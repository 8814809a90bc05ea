package org.counterpoise.ui.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.optim.AbsorberSetOptimiser;
import org.counterpoise.core.optim.AbsorberSetOptimum;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.optim.HInfinityOptimiser;
import org.counterpoise.core.optim.JointAbsorberProblem;
import org.counterpoise.core.optim.PeakProblem;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.system.Spillover;
import org.counterpoise.core.units.PhysicalRange;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.export.AbsorberSetTable;
import org.counterpoise.io.export.OptimumTable;
import org.counterpoise.io.export.SpilloverTable;

/**
 * {@code optimum --absorbers N [--tuning uniform|individual] [--second-mode RATIO]}: several absorbers
 * on one mode (core.optim.AbsorberSetOptimiser), and the spillover of that design onto a second mode.
 * Only the pair the several-absorber optimiser solves is taken (force to displacement, peak over the
 * band); the options it does not take are refused by name.
 */
final class AbsorberSetRun {
    private static final String POINT = "absorbers";

    private AbsorberSetRun() {
    }

    static int run(OptimumCommand command, PrintWriter out) {
        OptimumCommand.Options o = command.options();
        if (o.json() && o.csv()) {
            throw new InvalidInputException("--json", "given with --csv", "choose one output format");
        }
        refuseOtherProblems(o);
        if (o.structureRange() != null || o.absorberRange() != null) {
            return RobustSetRun.run(o, out);
        }
        if (o.onePerMode()) {
            return JointAbsorberRun.run(o, out);
        }
        if (o.secondPoint() != null) {
            throw new InvalidInputException("--second-point", PlainText.quote(o.secondPoint()), "only with --one-per-mode");
        }
        if (o.secondModeMass() != null) {
            throw new InvalidInputException("--second-mode-mass", Checks.show(o.secondModeMass()),
                    "only with --one-per-mode (the spillover of absorbers on mode 1 takes a second mode of the first's"
                            + " modal mass)");
        }
        int n = o.absorbers() == null ? 1 : o.absorbers();
        AbsorberSetTuning tuning = parseTuning(o.tuning());
        double[][] grid = grid(o);
        double[] mus = grid[0];
        double[] zetas = grid[1];
        double[] g = BandOption.parse(o.band());
        if (o.secondMode() != null && !(o.secondMode() > 1 && o.secondMode() <= 100)) {
            throw new InvalidInputException("--second-mode", PlainText.quote(String.valueOf(o.secondMode())),
                    "a ratio of the second natural frequency to the first, above 1 and at most 100");
        }
        if (!(Math.abs(o.secondModeShape()) <= JointAbsorberProblem.MAX_SHAPE)) {
            // far beyond that the spillover's receptances overflow double precision (NaN in the table)
            throw new InvalidInputException("--second-mode-shape", String.valueOf(o.secondModeShape()),
                    "a number from -" + (int) JointAbsorberProblem.MAX_SHAPE + " to " + (int) JointAbsorberProblem.MAX_SHAPE
                            + " (the second mode's shape at the absorbers' point, the first's being 1)");
        }
        List<AbsorberSetTable.Row> rows = new ArrayList<>();
        List<SpilloverTable.Row> spill = new ArrayList<>();
        for (double mu : mus) {
            PhysicalRange.MASS_RATIO.check("--mass-ratio", mu, null);
            for (double z : zetas) {
                AbsorberSetProblem problem;
                try {
                    problem = new AbsorberSetProblem(n, mu, z, g[0], g[1], tuning);
                } catch (InvalidInputException bad) {
                    throw bad.renamed(FIELDS.getOrDefault(bad.field(), bad.field()));
                }
                AbsorberSetOptimum optimum = AbsorberSetOptimiser.optimise(problem);
                double single = HInfinityOptimiser.optimise(PeakProblem.free(ExcitationKind.FORCE,
                        ResponseKind.DISPLACEMENT, mu, z, g[0], g[1])).peak();
                rows.add(new AbsorberSetTable.Row(optimum, single));
                if (o.secondMode() != null) {
                    spill.add(new SpilloverTable.Row(optimum, o.secondMode(), o.secondModeShape(),
                            Spillover.of(twoModes(optimum, o.secondMode(), o.secondModeShape()), POINT, POINT)));
                }
            }
        }
        OptimumTable.Format format = o.json() ? OptimumTable.Format.JSON
                : o.csv() ? OptimumTable.Format.CSV : OptimumTable.Format.TEXT;
        out.print(o.secondMode() == null ? AbsorberSetTable.render(rows, format) : SpilloverTable.render(rows, spill,
                format));
        out.flush();
        return 0;
    }

    /**
     * Refuses, by name, the options the optimisers of several absorbers do not take: they solve force
     * to displacement, least peak, with no fixed variable, stroke limit or file of cases.
     *
     * @param o the options as typed
     */
    static void refuseOtherProblems(OptimumCommand.Options o) {
        refuseUnless(o.objective().equals("peak"), "--objective", o.objective(), "peak (several absorbers are designed"
                + " for the least peak only)");
        refuseUnless(o.excitation().equals("force"), "--excitation", o.excitation(), "force (several absorbers are"
                + " designed for force to displacement)");
        refuseUnless(o.response().equals("displacement"), "--response", o.response(), "displacement (several absorbers"
                + " are designed for force to displacement)");
        refuseUnless(o.fixedDamping() == null && o.fixedTuning() == null && o.strokeLimit() == null && o.cases() == null,
                "--absorbers", String.valueOf(o.absorbers()), "no --fixed-damping, --fixed-tuning, --stroke-limit or"
                        + " --cases with several absorbers");
    }

    /**
     * @param o the options as typed
     * @return the mass ratios and structure damping ratios asked for, {mus, zetas}, at most
     *     {@value #MAX_CASES} cases together
     */
    static double[][] grid(OptimumCommand.Options o) {
        if (o.massRatio() == null) {
            throw InvalidInputException.missing("--mass-ratio", "give a value such as 0.05 or a range LO:HI:N");
        }
        double[] mus = OptimumCommand.range("--mass-ratio", o.massRatio());
        double[] zetas = OptimumCommand.range("--structure-damping", o.structureDamping());
        if ((long) mus.length * zetas.length > MAX_CASES) {
            throw new InvalidInputException("--mass-ratio", mus.length + " values times --structure-damping "
                    + zetas.length + " values", "at most " + MAX_CASES + " cases with several absorbers (each takes up"
                    + " to about a second)");
        }
        return new double[][] {mus, zetas};
    }

    /** Most cases in one run with several absorbers: each takes a few hundred milliseconds. */
    static final int MAX_CASES = 400;

    static final Map<String, String> FIELDS = Map.of("absorber count", "--absorbers", "mass ratio",
            "--mass-ratio", "structure damping", "--structure-damping", "band", "--band");

    /**
     * The non-dimensional structure with a second mode: both of modal mass 1 and the structure's
     * damping, mode 1 at omega = 1 with shape 1 and mode 2 at the ratio with the given shape at the
     * absorbers' point, where the force acts and the displacement is taken.
     */
    private static ModalSystem twoModes(AbsorberSetOptimum optimum, double ratio, double shape) {
        double z = optimum.problem().structureDamping();
        ModalStructure structure = new ModalStructure(List.of(new Mode(1.0, z, 1.0, Map.of(POINT, 1.0)),
                new Mode(ratio, z, 1.0, Map.of(POINT, shape))));
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < optimum.design().count(); j++) {
            absorbers.add(PointAbsorber.tuned(POINT, optimum.design().massRatios().get(j),
                    optimum.design().tuningRatios().get(j), optimum.design().dampingRatios().get(j)));
        }
        return new ModalSystem(structure, absorbers, 1.0, 1.0);
    }

    static AbsorberSetTuning parseTuning(String text) {
        if (text == null) {
            return AbsorberSetTuning.UNIFORM;
        }
        for (AbsorberSetTuning t : AbsorberSetTuning.values()) {
            if (t.name().toLowerCase(Locale.ROOT).equals(text.strip().toLowerCase(Locale.ROOT))) {
                return t;
            }
        }
        throw new InvalidInputException("--tuning", PlainText.quote(text), "uniform or individual");
    }

    private static void refuseUnless(boolean ok, String field, String value, String allowed) {
        if (!ok) {
            throw new InvalidInputException(field, PlainText.quote(value), allowed);
        }
    }
}
