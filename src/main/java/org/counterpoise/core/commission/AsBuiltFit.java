package org.counterpoise.core.commission;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SingleModeSystem;

/**
 * The absorber as built, from a driving-point frequency response measured at the absorber's point
 * with the absorber fitted: its own frequency omega_a and damping ratio zeta_a (and, if asked, the
 * structure's natural frequency) are the values for which the model of the structure with the
 * absorber (the design's own transfer function, {@link SingleModeSystem}) best matches the
 * measured complex values in the least-squares sense. The absorber mass is known (weighed), the
 * structure's modal mass and damping are the design's.
 *
 * <p>Method: a coarse scan of omega_a from half to twice the design's value (97 steps, even in
 * log), zeta_a from a fifth to five times the design's (5 steps) and, when freed, omega_1 within
 * +/- 8 % (9 steps) gives the start; Commons Math's Levenberg-Marquardt optimiser polishes it, the
 * parameters being the logarithms of the values (so they stay positive) and the Jacobian central
 * differences of the model. The uncertainties are the usual ones of non-linear least squares: the
 * diagonal of s^2 (J^T J)^-1 with s^2 the residual sum of squares over the degrees of freedom
 * (e.g. Bates and Watts 1988, Nonlinear Regression Analysis and its Applications, sec. 2.3). On a
 * response computed from the model itself the fit returns omega_a and zeta_a to 1e-8 relative (test).
 */
public final class AsBuiltFit {
    /** Scan steps of the absorber frequency, from half to twice the design's. */
    static final int FREQUENCY_STEPS = 97;
    /** Multiples of the design's damping ratio tried in the scan. */
    static final double[] DAMPING_MULTIPLES = {0.2, 0.5, 1.0, 2.0, 5.0};
    /** Scan of the structure's frequency when freed: +/- 8 % in 9 steps. */
    static final double STRUCTURE_SPAN = 0.08;
    static final int STRUCTURE_STEPS = 9;
    /** The damping ratio assumed to start from when the design's is zero (an undamped absorber). */
    static final double SMALLEST_START_DAMPING = 0.01;
    /** Fitted frequencies beyond these multiples of the design's are reported as at the search's edge. */
    static final double EDGE_LOW = 0.55;
    static final double EDGE_HIGH = 1.8;

    private final Structure structure;
    private final double massRatio;
    private final MeasuredFrf measured;
    private final FrfResiduals residuals;

    private AsBuiltFit(Structure structure, double massRatio, MeasuredFrf measured) {
        this.structure = structure;
        this.massRatio = massRatio;
        this.measured = measured;
        this.residuals = new FrfResiduals(measured, "the absorber");
    }

    /**
     * @param structure the structure as designed (its effective mass and damping are held)
     * @param design the absorber as designed (its mass ratio is held; its frequency and damping start the search)
     * @param measured the driving-point FRF at the absorber's point with the absorber fitted
     * @param freeStructure whether to fit the structure's natural frequency too
     * @return the absorber as built
     */
    public static AsBuiltAbsorber fit(Structure structure, Tuning design, MeasuredFrf measured, boolean freeStructure) {
        AsBuiltFit f = new AsBuiltFit(structure, design.massRatio(), measured);
        double omega1 = structure.naturalFrequency();
        double omegaA = design.tuningRatio() * omega1;
        double zeta = Math.max(design.dampingRatio(), SMALLEST_START_DAMPING);
        double[] start;
        try {
            start = f.scan(omegaA, zeta, omega1, freeStructure);
        } catch (InvalidInputException e) {
            throw notFitted();
        }
        return f.polish(start, omegaA, freeStructure);
    }

    /** The best point of the coarse scan: {omega_a, zeta_a, omega_1}. */
    private double[] scan(double omegaA, double zeta, double omega1, boolean freeStructure) {
        double best = Double.POSITIVE_INFINITY;
        double[] at = {omegaA, zeta, omega1};
        int structureSteps = freeStructure ? STRUCTURE_STEPS : 1;
        for (int s = 0; s < structureSteps; s++) {
            double w1 = freeStructure ? omega1 * (1 - STRUCTURE_SPAN + 2 * STRUCTURE_SPAN * s / (STRUCTURE_STEPS - 1))
                    : omega1;
            for (int i = 0; i < FREQUENCY_STEPS; i++) {
                double wa = omegaA * Math.pow(2.0, -1.0 + 2.0 * i / (FREQUENCY_STEPS - 1));
                for (double multiple : DAMPING_MULTIPLES) {
                    double z = zeta * multiple;
                    double cost = cost(wa, z, w1);
                    if (cost < best) {
                        best = cost;
                        at = new double[] {wa, z, w1};
                    }
                }
            }
        }
        return at;
    }

    private AsBuiltAbsorber polish(double[] start, double designOmegaA, boolean freeStructure) {
        int parameters = freeStructure ? 3 : 2;
        int n = measured.size();
        if (2 * n <= parameters) {
            throw new InvalidInputException("fitted-absorber FRF", n + " lines", "more lines than parameters fitted");
        }
        double[] target = residuals.target();
        LeastSquaresOptimizer.Optimum optimum;
        try {
            optimum = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                    .model(p -> FrfResiduals.valueAndJacobian(q -> residuals.scaled(model(values(q, start))),
                            p.toArray()))
                    .target(target).start(new double[parameters]).maxEvaluations(2000).maxIterations(500).build());
        } catch (MathIllegalStateException | InvalidInputException e) {
            // the search ran off (no convergence, or to a frequency or damping no absorber has): no fit
            throw notFitted();
        }
        double[] p = optimum.getPoint().toArray();
        double[] x = values(p, start);
        double s2 = optimum.getCost() * optimum.getCost() / Math.max(1, 2 * n - parameters);
        RealMatrix cov;
        try {
            cov = optimum.getCovariances(1e-14);
        } catch (SingularMatrixException e) {
            throw notFitted();
        }
        if (!(x[0] > 0 && x[1] >= 0 && Double.isFinite(x[0]) && Double.isFinite(x[1]) && x[2] > 0)) {
            throw notFitted();
        }
        double residual = normalisedResidual(x[0], x[1], x[2]);
        List<CommissioningWarning> warnings = new ArrayList<>();
        if (residual > CommissioningWarning.POOR_FIT_LIMIT) {
            warnings.add(CommissioningWarning.POOR_FIT);
        }
        double relative = x[0] / designOmegaA;
        if (relative < EDGE_LOW || relative > EDGE_HIGH) {
            warnings.add(CommissioningWarning.FREQUENCY_AT_SEARCH_EDGE);
        }
        return new AsBuiltAbsorber(x[0], x[0] * sd(cov, 0, s2), x[1], x[1] * sd(cov, 1, s2), x[2],
                freeStructure ? OptionalDouble.of(x[2] * sd(cov, 2, s2)) : OptionalDouble.empty(), massRatio,
                residual, n, warnings);
    }

    private static double sd(RealMatrix cov, int p, double s2) {
        return Math.sqrt(Math.max(0.0, cov.getEntry(p, p) * s2));
    }

    private static double[] values(double[] p, double[] start) {
        return new double[] {start[0] * Math.exp(p[0]), start[1] * Math.exp(p[1]),
            p.length > 2 ? start[2] * Math.exp(p[2]) : start[2]};
    }

    private double cost(double omegaA, double zeta, double omega1) {
        return residuals.cost(model(omegaA, zeta, omega1));
    }

    private double normalisedResidual(double omegaA, double zeta, double omega1) {
        return residuals.normalisedResidual(model(omegaA, zeta, omega1));
    }

    /** The model for {omega_a, zeta_a, omega_1}. */
    private Complex[] model(double[] x) {
        return model(x[0], x[1], x[2]);
    }

    /**
     * @return the model's FRF, of the measured kind, at every measured line: the structure's
     *     displacement per force at the absorber's point with the absorber (omega_a, zeta_a) fitted
     */
    Complex[] model(double omegaA, double zeta, double omega1) {
        return predicted(structure.naturalFrequency() == omega1 ? structure : withFrequency(structure, omega1),
                new Tuning(massRatio, omegaA / omega1, zeta), measured.omega(), measured.kind());
    }

    /**
     * @param structure the structure
     * @param tuning the absorber on it, or null for the bare structure
     * @param omega the frequencies, rad/s
     * @param kind the FRF kind wanted
     * @return the driving-point FRF at the absorber's point at each frequency
     */
    public static Complex[] predicted(Structure structure, Tuning tuning, double[] omega, FrfKind kind) {
        SingleModeSystem system = tuning == null ? SingleModeSystem.bare(structure)
                : SingleModeSystem.withAbsorber(structure, tuning);
        TransferFunction tf = system.transferFunction(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT);
        double perUnit = system.responseScale(ExcitationKind.FORCE, 1.0, ResponseKind.DISPLACEMENT);
        double reference = system.referenceFrequency();
        Complex[] out = new Complex[omega.length];
        for (int i = 0; i < omega.length; i++) {
            double[] h = tf.value(omega[i] / reference);
            out[i] = FrfKind.RECEPTANCE.convert(new Complex(h[0] * perUnit, h[1] * perUnit), omega[i], kind);
        }
        return out;
    }

    /**
     * @param structure a structure
     * @param omega1 another natural frequency, rad/s
     * @return the structure with the same modal mass, damping ratio and mode shape at that frequency
     */
    static Structure withFrequency(Structure structure, double omega1) {
        return new Structure(structure.modalMass(), structure.modalMass() * omega1 * omega1,
                structure.dampingRatio(), structure.modeShapeAtAbsorber());
    }

    private static InvalidInputException notFitted() {
        return InvalidInputException.unusable("fitted-absorber FRF", "matches no model of the structure with one absorber",
                "a driving-point response at the absorber's point with the absorber fitted, over both its peaks, with"
                        + " frequencies in Hz and the FRF kind and unit stated as measured");
    }
}
