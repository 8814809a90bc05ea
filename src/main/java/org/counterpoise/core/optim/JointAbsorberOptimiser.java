package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.response.ResponseKind;

/**
 * One absorber on each of two modes of a structure, their tunings and dampings designed JOINTLY for
 * the least peak of the whole structure's receptance over the band ({@link JointAbsorberProblem},
 * non-dimensional, two modes; {@link JointAbsorberSetup}, the general form: each mode its own
 * damping, any number of modes, the force, the response and each absorber at its own point).
 *
 * <p>Method: the minimax machinery of several absorbers on one mode ({@link MinimaxSearch}:
 * trust-region linear programming, Newton on the first-order minimax conditions, the certificate of
 * {@link AbsorberSetCertificate}) on the four variables of {@link JointAbsorberVariables}. Seeds:
 * the sequential design, which is the usual practice (each absorber the certified single-absorber
 * optimum of {@link HInfinityOptimiser} on its own mode alone, as the program designs one mode:
 * modal mass m_r / phi_r^2 seen at the point, the same damping, all frequencies, its own mass
 * ratio), always pursued; then the two best points of the coarse scan (512 seeded random designs in
 * the box), when they start within 20 % of a result already found. So the joint peak is never above
 * the sequential one.
 */
public final class JointAbsorberOptimiser {
    private JointAbsorberOptimiser() {
    }

    /**
     * @param problem the problem
     * @return the joint optimum with its certificate, and the sequential design
     */
    public static JointAbsorberOptimum optimise(JointAbsorberProblem problem) {
        JointAbsorberResult r = optimise(problem.setup());
        return new JointAbsorberOptimum(problem, r.design(), r.peak(), r.certificate(), r.sequentialDesign(),
                r.sequentialPeak(), r.evaluations());
    }

    /**
     * @param setup one absorber on each of two modes of a structure, in any consistent units
     * @return the joint optimum with its certificate, and the sequential design, in the setup's units
     */
    public static JointAbsorberResult optimise(JointAbsorberSetup setup) {
        EvaluationCounter counter = new EvaluationCounter();
        JointAbsorberVariables v = new JointAbsorberVariables(setup);
        AbsorberSetDesign sequential = sequential(setup, counter);
        List<double[]> scan = AbsorberSetScan.evaluate(v, AbsorberSetScan.random(v), counter);
        List<double[]> seeds = List.of(v.point(sequential), Arrays.copyOf(scan.get(0), v.dimension()),
                Arrays.copyOf(scan.get(1), v.dimension()));
        MinimaxSearch.Result result = MinimaxSearch.run(v, seeds, 1, scan, counter);
        if (!result.certificate().certified()) {
            // once more from where the search ended (a fresh trust region) and with the flat variables at their bounds
            MinimaxSearch.Result jumped = MinimaxSearch.run(v, List.of(result.point(),
                    towardBounds(v, result.point(), result.peak())), 2, scan, counter);
            if (jumped.peak() < result.peak()) {
                result = jumped;
            }
        }
        return new JointAbsorberResult(setup, v.design(result.point()), result.peak() / v.referenceStiffness(),
                result.certificate(), sequential, setup.peak(sequential), counter.count());
    }

    /**
     * The sequential design: each absorber designed on its own mode alone, as the program designs one
     * mode (the certified single-absorber optimum of {@link HInfinityOptimiser}, all frequencies), in
     * that mode's frequency ratio and taken back to f_j = f_own omega_mode / omega1 (the damping ratio
     * is the absorber's own, unchanged). Absorber 1's mode carries absorber 2's mass as a rigid mass
     * at the point (absorber 2 is tuned far above mode 1 and moves with the point there: the usual
     * practice of adding attached masses to the modal mass, common practice with no single source):
     * modal mass 1 + mu_2 (mu_2 times (phi_1(a_2) / phi_1(a_1))^2 when the absorbers sit at different
     * points), frequency 1 / sqrt(1 + mu_2), damping ratio zeta / sqrt(1 + mu_2) (the same
     * damper). Absorber 2's mode is taken bare: absorber 1, tuned far below it, is isolated there.
     * Each mode with its own damping ratio; in the setup's units (f_j is then absorber j's own frequency).
     *
     * @param problem the problem
     * @param counter counts the work
     * @return the two absorbers
     */
    static AbsorberSetDesign sequential(JointAbsorberSetup problem, EvaluationCounter counter) {
        double[] f = new double[JointAbsorberProblem.MODES];
        double[] z = new double[JointAbsorberProblem.MODES];
        for (int j = 0; j < f.length; j++) {
            // absorber 2's mass adds m_a2 phi_1(a_2)^2 to mode 1's modal mass, seen at absorber 1's point
            double carried = j == 0 ? problem.absorberMass(1) * square(problem.shape(0, problem.absorberPoints().get(1))
                    / problem.shape(0, problem.absorberPoints().get(0))) : 0.0;
            double seen = problem.seenMass(j) + carried;
            double frequency = problem.mode(j).naturalFrequency() * Math.sqrt(problem.seenMass(j) / seen);
            double damping = problem.mode(j).dampingRatio() * Math.sqrt(problem.seenMass(j) / seen);
            PeakOptimum own = HInfinityOptimiser.optimise(PeakProblem.allFrequencies(ExcitationKind.FORCE,
                    ResponseKind.DISPLACEMENT, problem.absorberMass(j) / seen, damping));
            counter.add(own.evaluations());
            f[j] = own.tuning().tuningRatio() * frequency;
            z[j] = own.tuning().dampingRatio();
        }
        return problem.design(f, z);
    }

    /**
     * Where one absorber barely moves the active peaks (modes far apart: absorber 2 acts on mode 1's
     * peaks only as a slightly springy added mass), the trust region crawls along that flat
     * direction: its first-order gain is tiny against the curvature in the other variables. The
     * least-norm convex combination of the active gradients (each variable scaled by its largest
     * component, as the certificate does) says which way each variable still lowers the peak; every
     * variable it says is not stationary is moved to the end of the box that way, for one more search.
     */
    private static double[] towardBounds(MinimaxVariables v, double[] p, double peak) {
        List<double[]> gradients = new ArrayList<>();
        for (double[] m : v.maxima(p)) {
            if (Math.exp(m[2] / 2) >= peak * (1 - 1e-6)) {
                gradients.add(v.gradient(p, m[0]));
            }
        }
        double[] q = p.clone();
        if (gradients.isEmpty()) {
            return q;
        }
        double[][] scaled = new double[gradients.size()][p.length];
        for (int k = 0; k < p.length; k++) {
            double scale = 0;
            for (double[] g : gradients) {
                scale = Math.max(scale, Math.abs(g[k]));
            }
            for (int i = 0; i < scaled.length; i++) {
                scaled[i][k] = scale > 0 ? gradients.get(i)[k] / scale : 0.0;
            }
        }
        double[] r = SimplexLeastNorm.combination(scaled, SimplexLeastNorm.weights(scaled));
        for (int k = 0; k < p.length; k++) {
            if (Math.abs(r[k]) > AbsorberSetCertificate.STATIONARY) {
                q[k] = r[k] > 0 ? v.lower()[k] : v.upper()[k];
            }
        }
        return q;
    }

    private static double square(double v) {
        return v * v;
    }
}
