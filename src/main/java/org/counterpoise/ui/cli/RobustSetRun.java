package org.counterpoise.ui.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.optim.RobustSetOptimiser;
import org.counterpoise.core.optim.RobustSetOptimum;
import org.counterpoise.core.optim.RobustSetProblem;
import org.counterpoise.core.units.PhysicalRange;
import org.counterpoise.io.export.OptimumTable;
import org.counterpoise.io.export.RobustSetTable;

/**
 * {@code optimum --absorbers N --structure-range S [--absorber-range A] [--tuning ...]}: several
 * absorbers on one mode designed for the least worst peak over the ranges (core.optim.RobustSetOptimiser),
 * every damping ratio at least the practical floor of the single robust design.
 */
final class RobustSetRun {
    private RobustSetRun() {
    }

    static int run(OptimumCommand.Options o, PrintWriter out) {
        if (o.structureRange() == null) {
            throw InvalidInputException.missing("--structure-range", "give the structure's frequency range as a"
                    + " fraction, such as 0.05 for +/-5 % (--absorber-range is taken with it)");
        }
        if (o.onePerMode() || o.secondMode() != null || o.secondPoint() != null || o.secondModeMass() != null) {
            throw new InvalidInputException("--structure-range", Checks.show(o.structureRange()), "only for several"
                    + " absorbers on one mode: not with --second-mode, --one-per-mode, --second-point or"
                    + " --second-mode-mass");
        }
        double s = o.structureRange();
        double a = o.absorberRange() == null ? 0.0 : o.absorberRange();
        int n = o.absorbers() == null ? 1 : o.absorbers();
        AbsorberSetTuning tuning = AbsorberSetRun.parseTuning(o.tuning());
        double[][] grid = AbsorberSetRun.grid(o);
        double[] g = BandOption.parse(o.band());
        List<RobustSetTable.Row> rows = new ArrayList<>();
        for (double mu : grid[0]) {
            PhysicalRange.MASS_RATIO.check("--mass-ratio", mu, null);
            for (double z : grid[1]) {
                RobustSetProblem problem;
                try {
                    problem = new RobustSetProblem(new AbsorberSetProblem(n, mu, z, g[0], g[1], tuning), s, a,
                            Designer.PRACTICAL_DAMPING_RATIO);
                } catch (InvalidInputException bad) {
                    throw bad.renamed(FIELDS.getOrDefault(bad.field(),
                            AbsorberSetRun.FIELDS.getOrDefault(bad.field(), bad.field())));
                }
                RobustSetOptimum optimum = RobustSetOptimiser.optimise(problem);
                rows.add(new RobustSetTable.Row(optimum,
                        RobustSetOptimiser.worstCase(problem, optimum.leastPeak().design()).peak()));
            }
        }
        OptimumTable.Format format = o.json() ? OptimumTable.Format.JSON
                : o.csv() ? OptimumTable.Format.CSV : OptimumTable.Format.TEXT;
        out.print(RobustSetTable.render(rows, format));
        out.flush();
        return 0;
    }

    private static final Map<String, String> FIELDS = Map.of("structure frequency range", "--structure-range",
            "absorber frequency range", "--absorber-range");
}
