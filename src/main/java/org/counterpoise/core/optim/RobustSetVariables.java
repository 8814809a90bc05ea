package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The variables of a set of absorbers judged over a finite set of builds (scenarios: structure
 * frequency factors and a common absorber frequency factor each): the peak is the largest over the
 * builds, so its smooth pieces are every build's pieces, each marked with its build in a fourth
 * column ({@link MinimaxVariables#scenario}) so that the minimax solvers take its gradient and value
 * from that build. Each build is variables on the same point ({@link AbsorberSetVariables} for
 * several absorbers on one mode, {@link JointAbsorberVariables} for one absorber per mode), with its
 * own exact transfer function and exact gradient. The box is the nominal one with every damping
 * ratio at or above the floor.
 */
final class RobustSetVariables implements MinimaxVariables {
    private final MinimaxVariables layout;
    private final List<MinimaxVariables> builds;
    private final double[] lower;

    /**
     * @param problem the absorbers, structure and band
     * @param scenarios {structure factor, absorber factor} of each build, the nominal one first
     * @param dampingFloor least damping ratio (0 for none)
     */
    RobustSetVariables(AbsorberSetProblem problem, List<double[]> scenarios, double dampingFloor) {
        this(new AbsorberSetVariables(problem), builds(problem, scenarios),
                floored(new AbsorberSetVariables(problem), dampingFloor));
    }

    /**
     * @param layout the variables as drawn (their box, band and dimension)
     * @param builds the same variables judged on each build, the nominal one first
     * @param lower the box's lower corner
     */
    RobustSetVariables(MinimaxVariables layout, List<? extends MinimaxVariables> builds, double[] lower) {
        this.layout = layout;
        this.builds = List.copyOf(builds);
        this.lower = lower.clone();
    }

    private static List<MinimaxVariables> builds(AbsorberSetProblem problem, List<double[]> scenarios) {
        List<MinimaxVariables> out = new ArrayList<>();
        for (double[] s : scenarios) {
            out.add(new AbsorberSetVariables(problem, s[0], s[1]));
        }
        return out;
    }

    /** @return the box's lower corner with every damping ratio at or above the floor */
    private static double[] floored(AbsorberSetVariables layout, double dampingFloor) {
        double[] lower = layout.lower();
        for (int k = 0; k < lower.length; k++) {
            if (layout.isDamping(k) && dampingFloor > 0) {
                lower[k] = Math.max(lower[k], Math.log(dampingFloor));
            }
        }
        return lower;
    }

    /** @return the number of builds */
    int builds() {
        return builds.size();
    }

    @Override
    public int dimension() {
        return layout.dimension();
    }

    @Override
    public double[] lower() {
        return lower.clone();
    }

    @Override
    public double[] upper() {
        return layout.upper();
    }

    @Override
    public double bandLow() {
        return layout.bandLow();
    }

    @Override
    public double bandHigh() {
        return layout.bandHigh();
    }

    /** The first build's (the nominal one): the peak itself is over every build, {@link #pieces}. */
    @Override
    public TransferFunction transferFunction(double[] p) {
        return builds.get(0).transferFunction(p);
    }

    /** The first build's (the nominal one). */
    @Override
    public DoubleUnaryOperator logMagnitudeSquared(double[] p) {
        return builds.get(0).logMagnitudeSquared(p);
    }

    /** The first build's (the nominal one). */
    @Override
    public double[] gradient(double[] p, double x) {
        return builds.get(0).gradient(p, x);
    }

    @Override
    public double logMagnitudeSquared(double[] p, int scenario, double x) {
        return builds.get(scenario).logMagnitudeSquared(p, x);
    }

    @Override
    public double slope(double[] p, int scenario, double x) {
        return builds.get(scenario).slope(p, x);
    }

    @Override
    public double[] gradient(double[] p, int scenario, double x) {
        return builds.get(scenario).gradient(p, x);
    }

    /** @return the largest polynomial peak over the builds (for the coarse scan) */
    @Override
    public double polynomialPeak(double[] p) {
        double max = 0;
        for (MinimaxVariables b : builds) {
            max = Math.max(max, b.polynomialPeak(p));
        }
        return max;
    }

    /** @return the largest of the builds' lower bounds (for the coarse scan) */
    @Override
    public double sampledPeak(double[] p) {
        double max = 0;
        for (MinimaxVariables b : builds) {
            max = Math.max(max, b.sampledPeak(p));
        }
        return max;
    }

    /** @return every build's pieces, each with its build's index as a fourth column */
    @Override
    public List<double[]> pieces(double[] p, boolean shoulders) {
        List<double[]> out = new ArrayList<>();
        for (int k = 0; k < builds.size(); k++) {
            for (double[] piece : builds.get(k).pieces(p, shoulders)) {
                out.add(new double[] {piece[0], piece[1], piece[2], k});
            }
        }
        return out;
    }
}
