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
import org.counterpoise.core.system.AbsorberSensitivity;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;

/**
 * Several absorbers at one point as built, from the driving-point frequency response measured at
 * that point with all of them fitted: each absorber's own frequency omega_j and damping ratio zeta_j
 * (and, if asked, the target mode's natural frequency) are the values for which the model of the
 * whole structure (every mode, {@link ModalSystem}) with the absorbers best matches the measured
 * complex values in the least-squares sense. The masses are known (weighed, or the design's); the
 * modes' masses, shapes and damping are the project's.
 *
 * <p>Method, as {@link AsBuiltFit} for one absorber: a coarse scan of one common factor on every
 * absorber's design frequency (from 1/1.6 to 1.6 times, 61 steps even in log), one common multiple
 * of their damping ratios (a fifth to five times) and, when freed, the target mode's frequency
 * (+/- 8 %, 9 steps) gives the start; Commons Math's Levenberg-Marquardt optimiser then frees every
 * absorber's frequency and damping on its own, the parameters being logarithms (so values stay
 * positive) and the Jacobian central differences. Each absorber keeps its design's place: the fit
 * starts from the design's order of frequencies, and absorbers of equal mass that swap places fit
 * equally well, so the report pairs fitted and designed absorbers in order of frequency. The
 * uncertainties are the usual ones of non-linear least squares, the diagonal of s^2 (J^T J)^-1
 * (Bates and Watts 1988, Nonlinear Regression Analysis and its Applications, sec. 2.3).
 */
public final class AsBuiltSetFit {
    static final int FREQUENCY_STEPS = 61;
    static final double FREQUENCY_SPAN = 1.6;
    private static final double DIFFERENCE_STEP = 1e-6;

    private final ModalStructure structure;
    private final int targetMode;
    private final List<PointAbsorber> design;
    private final MeasuredFrf measured;
    private final FrfResiduals residuals;

    private AsBuiltSetFit(ModalStructure structure, int targetMode, List<PointAbsorber> design, MeasuredFrf measured) {
        this.structure = structure;
        this.targetMode = targetMode;
        this.design = List.copyOf(design);
        this.measured = measured;
        this.residuals = new FrfResiduals(measured, "the absorbers");
    }

    /**
     * @param structure the structure's modes as designed for
     * @param targetMode the index of the mode the absorbers were fitted to (the one freed with freeStructure)
     * @param design the absorbers as designed, with their masses as weighed (all at one point)
     * @param measured the driving-point FRF at the absorbers' point with all of them fitted
     * @param freeStructure whether to fit the target mode's natural frequency too
     * @return the absorbers as built
     */
    public static AsBuiltSet fit(ModalStructure structure, int targetMode, List<PointAbsorber> design,
            MeasuredFrf measured, boolean freeStructure) {
        AsBuiltSetFit f = new AsBuiltSetFit(structure, targetMode, design, measured);
        int n = design.size();
        int parameters = 2 * n + (freeStructure ? 1 : 0);
        if (2 * measured.size() <= parameters) {
            throw new InvalidInputException("fitted-absorber FRF", measured.size() + " lines",
                    "more than " + parameters / 2 + " lines (two numbers per line, " + parameters + " values fitted)");
        }
        double[] start = f.scan(freeStructure);
        return f.polish(start, parameters);
    }

    /** The scan's best common factors, as the logarithmic parameters LM starts from. */
    private double[] scan(boolean freeStructure) {
        int n = design.size();
        double best = Double.POSITIVE_INFINITY;
        double[] at = new double[2 * n + (freeStructure ? 1 : 0)];
        int structureSteps = freeStructure ? AsBuiltFit.STRUCTURE_STEPS : 1;
        for (int s = 0; s < structureSteps; s++) {
            double lnStructure = freeStructure ? Math.log(1 - AsBuiltFit.STRUCTURE_SPAN
                    + 2 * AsBuiltFit.STRUCTURE_SPAN * s / (AsBuiltFit.STRUCTURE_STEPS - 1)) : 0.0;
            for (int i = 0; i < FREQUENCY_STEPS; i++) {
                double lnFrequency = Math.log(FREQUENCY_SPAN) * (-1.0 + 2.0 * i / (FREQUENCY_STEPS - 1));
                for (double multiple : AsBuiltFit.DAMPING_MULTIPLES) {
                    double[] p = new double[at.length];
                    for (int j = 0; j < n; j++) {
                        p[j] = lnFrequency;
                        p[n + j] = Math.log(multiple);
                    }
                    if (freeStructure) {
                        p[2 * n] = lnStructure;
                    }
                    double cost = cost(p);
                    if (cost < best) {
                        best = cost;
                        at = p;
                    }
                }
            }
        }
        return at;
    }

    private AsBuiltSet polish(double[] start, int parameters) {
        int lines = measured.size();
        double[] target = residuals.target();
        LeastSquaresOptimizer.Optimum optimum;
        RealMatrix cov;
        try {
            optimum = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                    .model(p -> FrfResiduals.valueAndJacobian(q -> residuals.scaled(model(q)), p.toArray()))
                    .target(target).start(start)
                    .maxEvaluations(4000).maxIterations(1000).build());
            cov = optimum.getCovariances(1e-14);
        } catch (MathIllegalStateException | SingularMatrixException | InvalidInputException e) {
            // the search ran off (no convergence, or to values no absorber has): no fit
            throw notFitted();
        }
        double[] p = optimum.getPoint().toArray();
        double s2 = optimum.getCost() * optimum.getCost() / Math.max(1, 2 * lines - parameters);
        int n = design.size();
        List<AsBuiltSet.Built> built = new ArrayList<>();
        List<CommissioningWarning> warnings = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            PointAbsorber d = design.get(j);
            double frequency = d.frequency() * Math.exp(p[j]);
            double zeta = startDamping(d) * Math.exp(p[n + j]);
            if (!(Double.isFinite(frequency) && Double.isFinite(zeta) && frequency > 0)) {
                throw notFitted();
            }
            built.add(new AsBuiltSet.Built(d.mass(), frequency, frequency * sd(cov, j, s2), zeta,
                    zeta * sd(cov, n + j, s2)));
            double relative = Math.exp(p[j]);
            if ((relative < AsBuiltFit.EDGE_LOW || relative > AsBuiltFit.EDGE_HIGH)
                    && !warnings.contains(CommissioningWarning.FREQUENCY_AT_SEARCH_EDGE)) {
                warnings.add(CommissioningWarning.FREQUENCY_AT_SEARCH_EDGE);
            }
        }
        double residual = residuals.normalisedResidual(model(p));
        if (!Double.isFinite(residual)) {
            throw notFitted();
        }
        if (residual > CommissioningWarning.POOR_FIT_LIMIT) {
            warnings.add(0, CommissioningWarning.POOR_FIT);
        }
        double modeFrequency = structure.modes().get(targetMode).naturalFrequency()
                * (parameters > 2 * n ? Math.exp(p[2 * n]) : 1.0);
        OptionalDouble modeSd = parameters > 2 * n ? OptionalDouble.of(modeFrequency * sd(cov, 2 * n, s2))
                : OptionalDouble.empty();
        return new AsBuiltSet(built, targetMode, modeFrequency, modeSd, residual, lines, warnings);
    }

    private static double startDamping(PointAbsorber d) {
        double zeta = d.damping() / (2 * d.mass() * d.frequency());
        return Math.max(zeta, AsBuiltFit.SMALLEST_START_DAMPING);
    }

    private static double sd(RealMatrix cov, int p, double s2) {
        return Math.sqrt(Math.max(0.0, cov.getEntry(p, p) * s2));
    }

    private double cost(double[] p) {
        return residuals.cost(model(p));
    }

    /** The model at every measured line for the logarithmic parameters p. */
    private Complex[] model(double[] p) {
        int n = design.size();
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            PointAbsorber d = design.get(j);
            double frequency = d.frequency() * Math.exp(p[j]);
            double zeta = startDamping(d) * Math.exp(p[n + j]);
            if (!(Double.isFinite(frequency) && Double.isFinite(zeta))) {
                throw notFitted();
            }
            absorbers.add(PointAbsorber.tuned(d.point(), d.mass(), frequency, zeta));
        }
        ModalStructure modes = p.length > 2 * n ? structure.withFrequency(targetMode,
                structure.modes().get(targetMode).naturalFrequency() * Math.exp(p[2 * n])) : structure;
        return predicted(modes, absorbers, measured.omega(), measured.kind());
    }

    /**
     * @param structure the modes
     * @param absorbers the absorbers (all at one point; at least one)
     * @param omega the frequencies, rad/s
     * @param kind the FRF kind wanted
     * @return the driving-point FRF at the absorbers' point at each frequency, SI
     */
    public static Complex[] predicted(ModalStructure structure, List<PointAbsorber> absorbers, double[] omega,
            FrfKind kind) {
        String point = absorbers.get(0).point();
        ModalSystem system = ModalSystem.of(structure, absorbers);
        double perUnit = system.responseScale(point, 1.0, point);
        Complex[] out = new Complex[omega.length];
        for (int i = 0; i < omega.length; i++) {
            Complex h = AbsorberSensitivity.value(system, point, point, omega[i] / system.referenceFrequency());
            out[i] = FrfKind.RECEPTANCE.convert(h.multiply(perUnit), omega[i], kind);
        }
        return out;
    }

    private static InvalidInputException notFitted() {
        return InvalidInputException.unusable("fitted-absorber FRF",
                "matches no model of the structure with these absorbers",
                "a driving-point response at the absorbers' point with all of them fitted, over the band around the"
                        + " target mode, with frequencies in Hz and the FRF kind and unit stated as measured");
    }
}
