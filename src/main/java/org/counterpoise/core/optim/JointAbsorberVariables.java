package org.counterpoise.core.optim;

import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.system.AbsorberSensitivity;
import org.counterpoise.core.system.ModalSystem;

/**
 * The variables of one absorber per mode designed jointly: p = (ln f_1, ln f_2, ln zeta_1,
 * ln zeta_2), f_j = omega_j / omega1. Box: each absorber's tuning within its own mode's
 * neighbourhood, so that it stays that mode's absorber: absorber 1 from 0.05 to sqrt(R), absorber 2
 * from sqrt(R) to 5 R (the geometric mean of the two natural frequencies divides them, as in
 * {@code Spillover}; the outer ends are the single absorber's box, docs/optimiser.md, on that mode);
 * each damping ratio within [1e-4, 4]. ln|H|^2 comes from the factored form of {@link AbsorberSensitivity#value} (each
 * modal and absorber term on its own) and its gradient from {@link AbsorberSensitivity#gradient}.
 */
final class JointAbsorberVariables implements MinimaxVariables {
    private static final int N = JointAbsorberProblem.MODES;
    private static final String POINT = JointAbsorberProblem.POINT;
    private final JointAbsorberProblem problem;

    JointAbsorberVariables(JointAbsorberProblem problem) {
        this.problem = problem;
    }

    @Override
    public int dimension() {
        return 2 * N;
    }

    @Override
    public double[] lower() {
        double[] out = new double[2 * N];
        out[0] = Math.log(AbsorberSetProblem.MIN_TUNING);
        out[1] = Math.log(boundary());
        out[N] = Math.log(AbsorberSetProblem.MIN_DAMPING);
        out[N + 1] = out[N];
        return out;
    }

    @Override
    public double[] upper() {
        double[] out = new double[2 * N];
        out[0] = Math.log(boundary());
        out[1] = Math.log(AbsorberSetProblem.MAX_TUNING * problem.secondModeRatio());
        out[N] = Math.log(AbsorberSetProblem.MAX_DAMPING);
        out[N + 1] = out[N];
        return out;
    }

    /** sqrt(omega1 omega2) / omega1: where mode 1's neighbourhood ends and mode 2's begins (as in Spillover). */
    private double boundary() {
        return Math.sqrt(problem.secondModeRatio());
    }

    @Override
    public double bandLow() {
        return problem.bandLow();
    }

    @Override
    public double bandHigh() {
        return problem.bandHigh();
    }

    AbsorberSetDesign design(double[] p) {
        double[] f = new double[N];
        double[] z = new double[N];
        for (int j = 0; j < N; j++) {
            f[j] = Math.exp(p[j]);
            z[j] = Math.exp(p[N + j]);
        }
        return problem.design(f, z);
    }

    /** @return the point of a design (a damping of 0 is taken at the box's least) */
    double[] point(AbsorberSetDesign design) {
        double[] p = new double[2 * N];
        for (int j = 0; j < N; j++) {
            p[j] = Math.log(design.tuningRatios().get(j));
            p[N + j] = Math.log(Math.max(AbsorberSetProblem.MIN_DAMPING, design.dampingRatios().get(j)));
        }
        return p;
    }

    @Override
    public TransferFunction transferFunction(double[] p) {
        return problem.system(design(p)).transferFunction(POINT, POINT);
    }

    @Override
    public DoubleUnaryOperator logMagnitudeSquared(double[] p) {
        ModalSystem system = problem.system(design(p));
        return x -> 2 * Math.log(AbsorberSensitivity.value(system, POINT, POINT, Math.sqrt(x)).abs());
    }

    @Override
    public double[] gradient(double[] p, double x) {
        AbsorberSetDesign d = design(p);
        double[][] g = AbsorberSensitivity.gradient(problem.system(d), POINT, POINT, Math.sqrt(x));
        double[] out = new double[2 * N];
        for (int j = 0; j < N; j++) {
            out[j] = g[j][0];
            out[N + j] = g[j][1] * d.dampingRatios().get(j); // d / d ln zeta = zeta d / d zeta
        }
        return out;
    }
}
