package org.counterpoise.ui.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.optim.JointAbsorberOptimiser;
import org.counterpoise.core.optim.JointAbsorberOptimum;
import org.counterpoise.core.optim.JointAbsorberProblem;
import org.counterpoise.core.units.PhysicalRange;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.export.JointAbsorberTable;
import org.counterpoise.io.export.OptimumTable;
import picocli.CommandLine;

/**
 * {@code optimum --second-mode R --one-per-mode [--second-mode-mass M] [--second-mode-shape PHI]}:
 * one absorber on each of two modes, at one point, designed jointly (core.optim.JointAbsorberOptimiser),
 * with the sequential design beside it. The options the joint optimiser does not take are refused
 * by name ({@link AbsorberSetRun#refuseOtherProblems}).
 */
final class JointAbsorberRun {
    private static final Map<String, String> FIELDS = Map.of("mass ratio", "--mass-ratio", "structure damping",
            "--structure-damping", "band", "--band", "second mode ratio", "--second-mode", "second mode mass",
            "--second-mode-mass", "second mode shape", "--second-mode-shape");

    private JointAbsorberRun() {
    }

    static int run(OptimumCommand.Options o, PrintWriter out) {
        if (o.tuning() != null) {
            throw new InvalidInputException("--tuning", PlainText.quote(o.tuning()), "left out with --one-per-mode (each"
                    + " absorber is tuned and damped on its own)");
        }
        if (o.absorbers() != null && o.absorbers() != JointAbsorberProblem.MODES) {
            throw new InvalidInputException("--absorbers", String.valueOf(o.absorbers()), "left out, or 2, with"
                    + " --one-per-mode (one absorber on each of the two modes)");
        }
        if (o.secondMode() == null) {
            throw InvalidInputException.missing("--second-mode", "--one-per-mode needs the second mode: give its natural"
                    + " frequency over the first's, above 1, such as 2.5");
        }
        double[][] grid = AbsorberSetRun.grid(o);
        double[] g = BandOption.parse(o.band());
        double mass = o.secondModeMass() == null ? 1.0 : o.secondModeMass();
        Optional<JointAbsorberProblem.OtherPoint> other = o.secondPoint() == null ? Optional.empty()
                : Optional.of(otherPoint(o.secondPoint()));
        List<JointAbsorberOptimum> rows = new ArrayList<>();
        for (double mu : grid[0]) {
            PhysicalRange.MASS_RATIO.check("--mass-ratio", mu, null);
            for (double z : grid[1]) {
                JointAbsorberProblem problem;
                try {
                    problem = new JointAbsorberProblem(mu, z, o.secondMode(), mass, o.secondModeShape(), g[0], g[1], other);
                } catch (InvalidInputException bad) {
                    throw bad.renamed(FIELDS.getOrDefault(bad.field(), bad.field()));
                }
                rows.add(JointAbsorberOptimiser.optimise(problem));
            }
        }
        out.print(JointAbsorberTable.render(rows, o.json() ? OptimumTable.Format.JSON
                : o.csv() ? OptimumTable.Format.CSV : OptimumTable.Format.TEXT));
        out.flush();
        return 0;
    }

    /** @return the second point's shape values from PHI1:PHI2 */
    private static JointAbsorberProblem.OtherPoint otherPoint(String text) {
        String[] parts = text.split(":", -1);
        if (parts.length != 2) {
            throw new InvalidInputException("--second-point", PlainText.quote(text), "PHI1:PHI2, mode 1's and mode 2's"
                    + " shape values at the second point, such as 0.5:1");
        }
        try {
            return new JointAbsorberProblem.OtherPoint(Converters.real(parts[0]), Converters.real(parts[1]));
        } catch (CommandLine.TypeConversionException e) {
            throw new InvalidInputException("--second-point", PlainText.quote(text), e.getMessage());
        } catch (InvalidInputException bad) {
            throw bad.renamed("--second-point");
        }
    }
}
