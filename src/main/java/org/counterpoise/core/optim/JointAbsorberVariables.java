package org.counterpoise.core.optim;

import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.system.AbsorberSensitivity;
import org.counterpoise.core.system.FactoredReceptance;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.Mode;

/**
 * The variables of one absorber per mode designed jointly ({@link JointAbsorberSetup}): p = (ln f_1,
 * ln f_2, ln zeta_1, ln zeta_2), f_j absorber j's own frequency in the setup's unit (omega_j / omega1
 * for {@link JointAbsorberProblem}). Box: each absorber's tuning within its own mode's
 * neighbourhood, so that it stays that mode's absorber: absorber 1 from 0.05 omega_a to
 * sqrt(omega_a omega_b), absorber 2 from there to 5 omega_b, omega_a &lt; omega_b the two designed modes'
 * natural frequencies (0.05 to sqrt(R) and sqrt(R) to 5 R for {@link JointAbsorberProblem}; the
 * geometric mean divides them, as in {@code Spillover}; the outer ends are the single absorber's box,
 * docs/optimiser.md, on that mode; another mode of the structure may lie inside a box: it is just there);
 * each damping ratio within [1e-4, 4]. ln|H|^2 comes from the factored form of {@link AbsorberSensitivity#value} (each
 * modal and absorber term on its own) and its gradient from {@link AbsorberSensitivity#gradient}.
 */
final class JointAbsorberVariables implements MinimaxVariables {
    private static final int N = JointAbsorberProblem.MODES;
    private final JointAbsorberSetup problem;
    /** The transfer functions' frequency scale: the structure's lowest natural frequency (ModalSystem.of). */
    private final double reference;
    /** The build judged ({@link JointAbsorberSetup#system(AbsorberSetDesign, double[])}), or null for the nominal one. */
    private final double[] build;

    JointAbsorberVariables(JointAbsorberSetup problem) {
        this(problem, null);
    }

    /**
     * The same variables judged on a build off nominal (a scenario of {@link RobustSetVariables}): the
     * variables stay those of the design as drawn.
     *
     * @param problem the setup
     * @param build {lower designed mode's factor, upper designed mode's factor, absorbers' common
     *     factor}, or null for the nominal build
     */
    JointAbsorberVariables(JointAbsorberSetup problem, double[] build) {
        this.problem = problem;
        this.reference = problem.structure().modes().get(0).naturalFrequency();
        this.build = build == null ? null : build.clone();
    }

    /** @return the structure and the absorbers of point p as this build has them */
    private ModalSystem system(AbsorberSetDesign d) {
        return build == null ? problem.system(d) : problem.system(d, build);
    }

    /** @return the damping ratio of absorber j as built (the absorbers' factor divides it) */
    private double builtDamping(AbsorberSetDesign d, int j) {
        return build == null ? d.dampingRatios().get(j) : d.dampingRatios().get(j) / build[N];
    }

    @Override
    public int dimension() {
        return 2 * N;
    }

    @Override
    public double[] lower() {
        double[] out = new double[2 * N];
        out[0] = Math.log(AbsorberSetProblem.MIN_TUNING * modeFrequency(0));
        out[1] = Math.log(boundary());
        out[N] = Math.log(AbsorberSetProblem.MIN_DAMPING);
        out[N + 1] = out[N];
        return out;
    }

    @Override
    public double[] upper() {
        double[] out = new double[2 * N];
        out[0] = Math.log(boundary());
        out[1] = Math.log(AbsorberSetProblem.MAX_TUNING * modeFrequency(1));
        out[N] = Math.log(AbsorberSetProblem.MAX_DAMPING);
        out[N + 1] = out[N];
        return out;
    }

    /** sqrt(omega_a omega_b): where the lower designed mode's neighbourhood ends and the upper's begins (as in Spillover). */
    private double boundary() {
        return Math.sqrt(modeFrequency(0) * modeFrequency(1));
    }

    private double modeFrequency(int j) {
        return problem.mode(j).naturalFrequency();
    }

    @Override
    public double bandLow() {
        return problem.bandLow() / reference;
    }

    @Override
    public double bandHigh() {
        return problem.bandHigh() / reference;
    }

    /** @return the transfer functions' stiffness scale: |H| of the variables times it is the setup's receptance */
    double referenceStiffness() {
        Mode first = problem.structure().modes().get(0);
        return first.modalMass() * reference * reference; // as ModalSystem.of
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
        return system(design(p)).transferFunction(problem.excitationPoint(), problem.responsePoint());
    }

    @Override
    public DoubleUnaryOperator logMagnitudeSquared(double[] p) {
        FactoredReceptance h = FactoredReceptance.of(system(design(p)), problem.excitationPoint(),
                problem.responsePoint());
        return x -> Math.log(h.magnitudeSquared(Math.sqrt(x)));
    }

    @Override
    public double[] gradient(double[] p, double x) {
        AbsorberSetDesign d = design(p);
        double[][] g = AbsorberSensitivity.gradient(system(d), problem.excitationPoint(), problem.responsePoint(),
                Math.sqrt(x));
        double[] out = new double[2 * N];
        for (int j = 0; j < N; j++) {
            // d ln f and d ln zeta as built equal those as drawn (a build scales them by constants),
            // so the chain rule only takes each damping ratio as built: d / d ln zeta = zeta d / d zeta
            out[j] = g[j][0];
            out[N + j] = g[j][1] * builtDamping(d, j);
        }
        return out;
    }
}
