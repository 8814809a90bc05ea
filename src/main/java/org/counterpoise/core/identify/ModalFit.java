package org.counterpoise.core.identify;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.apache.commons.math3.util.Pair;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Least-squares fit of a sum of modes to a measured FRF: a rational-fraction start
 * ({@link RationalFraction}; peak picking when that finds no mode and one is asked for), polished
 * by Commons Math's Levenberg-Marquardt optimiser on the model of {@link ModalModel#receptance},
 * converted to the measured kind, with its analytic Jacobian. Per mode the parameters are omega_n,
 * zeta and m (scaled by their start values); the residual terms 1/M_L and 1/K_U are optional.
 *
 * <p>The standard uncertainties come from the Jacobian at the optimum: cov = s^2 (J^T J)^-1 with
 * s^2 = sum of squared residuals / (2 lines - parameters), the usual linearised covariance of
 * non-linear least squares (e.g. Press et al. 2007, Numerical Recipes, 3rd ed., section 15.5). They
 * describe the scatter of the data about the model; a model error (a missing mode, non-viscous
 * damping, a non-driving point) is not in them.
 */
public final class ModalFit {
    private static final int PER_MODE = 3;

    private ModalFit() {
    }

    /**
     * @param measured the measurement (any kind)
     * @param modes the number of modes in the band, 1..4
     * @param residuals whether to fit residual terms for the modes outside the band
     * @return the fitted model
     * @throws InvalidInputException when the data do not hold that many modes or the fit fails
     */
    public static ModalModel fit(MeasuredFrf measured, int modes, boolean residuals) {
        List<IdentifiedMode> start;
        try {
            start = RationalFraction.fit(measured, modes, residuals);
        } catch (InvalidInputException e) {
            if (modes != 1) {
                throw e;
            }
            start = List.of(HalfPowerPeak.estimate(measured));
        }
        return polish(measured, start.subList(0, modes), residuals);
    }

    /**
     * @param measured the measurement
     * @param start start values of the modes
     * @param residuals whether to fit residual terms
     * @return the polished model
     */
    public static ModalModel polish(MeasuredFrf measured, List<IdentifiedMode> start, boolean residuals) {
        int n = measured.size();
        int modes = start.size();
        int parameters = PER_MODE * modes + (residuals ? 2 : 0);
        if (2 * n <= parameters) {
            throw new InvalidInputException("band", n + " lines", "more than " + parameters / 2 + " lines in the band");
        }
        double scale = 0.0;
        for (int i = 0; i < n; i++) {
            scale = Math.max(scale, measured.value(i).abs());
        }
        double[] w = measured.omega();
        Complex[] toKind = new Complex[n];
        double[] target = new double[2 * n];
        for (int i = 0; i < n; i++) {
            toKind[i] = FrfKind.RECEPTANCE.convert(Complex.ONE, w[i], measured.kind()).divide(scale);
            target[2 * i] = measured.real()[i] / scale;
            target[2 * i + 1] = measured.imaginary()[i] / scale;
        }
        double[] unit = new double[parameters]; // each parameter in units of its start value
        double receptanceScale = 1.0 / toKind[n - 1].abs();
        for (int r = 0; r < modes; r++) {
            unit[PER_MODE * r] = start.get(r).naturalFrequency();
            unit[PER_MODE * r + 1] = Math.max(start.get(r).dampingRatio(), 1e-4);
            unit[PER_MODE * r + 2] = start.get(r).modalMass();
        }
        if (residuals) {
            unit[PER_MODE * modes] = receptanceScale * w[0] * w[0];
            unit[PER_MODE * modes + 1] = receptanceScale;
        }
        double[] x0 = new double[parameters];
        for (int p = 0; p < PER_MODE * modes; p++) {
            x0[p] = 1.0;
        }
        LeastSquaresOptimizer.Optimum optimum;
        try {
            optimum = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                    .model(x -> evaluate(x, unit, modes, residuals, w, toKind))
                    .target(target).start(x0).maxEvaluations(2000).maxIterations(1000).build());
        } catch (MathIllegalStateException e) {
            throw notFitted(modes);
        }
        double[] x = optimum.getPoint().toArray();
        double dof = 2 * n - parameters;
        double s2 = optimum.getCost() * optimum.getCost() / dof;
        RealMatrix cov;
        try {
            cov = optimum.getCovariances(1e-14);
        } catch (SingularMatrixException e) {
            throw notFitted(modes);
        }
        List<IdentifiedMode> fitted = new ArrayList<>();
        for (int r = 0; r < modes; r++) {
            int p = PER_MODE * r;
            double wn = x[p] * unit[p];
            double zeta = x[p + 1] * unit[p + 1];
            double mass = x[p + 2] * unit[p + 2];
            if (!(wn > 0 && zeta > 0 && zeta < 1 && Double.isFinite(mass))) {
                throw notFitted(modes);
            }
            fitted.add(new IdentifiedMode(wn, zeta, mass, sd(cov, p, s2, unit), sd(cov, p + 1, s2, unit),
                    sd(cov, p + 2, s2, unit)));
        }
        fitted.sort((a, b) -> Double.compare(a.naturalFrequency(), b.naturalFrequency()));
        ResidualTerms terms = residuals ? new ResidualTerms(x[PER_MODE * modes] * unit[PER_MODE * modes],
                x[PER_MODE * modes + 1] * unit[PER_MODE * modes + 1]) : ResidualTerms.NONE;
        return new ModalModel(fitted, terms, ModalModel.Method.LEAST_SQUARES,
                ModalModel.normalisedResidual(measured, fitted, terms), measured.meanCoherence(), n);
    }

    private static OptionalDouble sd(RealMatrix cov, int p, double s2, double[] unit) {
        double v = cov.getEntry(p, p) * s2;
        return v >= 0 && Double.isFinite(v) ? OptionalDouble.of(Math.sqrt(v) * Math.abs(unit[p])) : OptionalDouble.empty();
    }

    private static InvalidInputException notFitted(int modes) {
        return new InvalidInputException("modes", Integer.toString(modes),
                "a band whose data a sum of " + modes + " damped mode(s) can fit; try fewer modes or another band");
    }

    /**
     * The model and its Jacobian. For one mode term H_r = 1/(m D_r), D_r = omega_r^2 - omega^2 +
     * 2 i zeta omega_r omega: dH_r/d omega_r = -(2 omega_r + 2 i zeta omega) / (m D_r^2),
     * dH_r/d zeta = -2 i omega_r omega / (m D_r^2), dH_r/dm = -1/(m^2 D_r); residuals -1/omega^2 and 1.
     */
    private static Pair<RealVector, RealMatrix> evaluate(RealVector xv, double[] unit, int modes, boolean residuals,
            double[] w, Complex[] toKind) {
        int n = w.length;
        int parameters = unit.length;
        double[] value = new double[2 * n];
        double[][] jacobian = new double[2 * n][parameters];
        for (int i = 0; i < n; i++) {
            Complex sum = Complex.ZERO;
            Complex[] d = new Complex[parameters];
            for (int r = 0; r < modes; r++) {
                int p = PER_MODE * r;
                double wr = xv.getEntry(p) * unit[p];
                double zeta = xv.getEntry(p + 1) * unit[p + 1];
                double m = xv.getEntry(p + 2) * unit[p + 2];
                Complex hr = IdentifiedMode.of(wr, zeta, m).receptance(w[i]);
                Complex hr2m = hr.multiply(hr).multiply(m); // 1/(m D^2)
                sum = sum.add(hr);
                d[p] = hr2m.multiply(new Complex(-2.0 * wr, -2.0 * zeta * w[i])).multiply(unit[p]);
                d[p + 1] = hr2m.multiply(new Complex(0.0, -2.0 * wr * w[i])).multiply(unit[p + 1]);
                d[p + 2] = hr.divide(-m).multiply(unit[p + 2]);
            }
            if (residuals) {
                int p = PER_MODE * modes;
                double lower = xv.getEntry(p) * unit[p];
                double upper = xv.getEntry(p + 1) * unit[p + 1];
                sum = sum.add(new ResidualTerms(lower, upper).receptance(w[i]));
                d[p] = new Complex(-unit[p] / (w[i] * w[i]), 0.0);
                d[p + 1] = new Complex(unit[p + 1], 0.0);
            }
            Complex v = sum.multiply(toKind[i]);
            value[2 * i] = v.getReal();
            value[2 * i + 1] = v.getImaginary();
            for (int p = 0; p < parameters; p++) {
                Complex dv = d[p].multiply(toKind[i]);
                jacobian[2 * i][p] = dv.getReal();
                jacobian[2 * i + 1][p] = dv.getImaginary();
            }
        }
        return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jacobian, false));
    }
}
