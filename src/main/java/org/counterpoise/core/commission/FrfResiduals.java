package org.counterpoise.core.commission;

import java.util.function.Function;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.MeasuredFrf;

/**
 * The least-squares residuals of a model FRF against a measured one, shared by the fits of one
 * absorber ({@link AsBuiltFit}) and of several ({@link AsBuiltSetFit}): real and imaginary parts
 * interleaved, each over the largest measured magnitude so that Levenberg-Marquardt sees numbers
 * near one, and a Jacobian by central differences in the fit's parameters.
 */
final class FrfResiduals {
    private static final double DIFFERENCE_STEP = 1e-6;

    private final MeasuredFrf measured;
    private final double scale;

    /**
     * @param measured the measured FRF
     * @param what what the absorbers fitted are, for the refusal of an all-zero response
     */
    FrfResiduals(MeasuredFrf measured, String what) {
        this.measured = measured;
        double largest = 0.0;
        for (int i = 0; i < measured.size(); i++) {
            largest = Math.max(largest, measured.value(i).abs());
        }
        if (!(largest > 0)) {
            throw new InvalidInputException("fitted-absorber FRF", "all values zero",
                    "a measured response with " + what + " fitted");
        }
        this.scale = largest;
    }

    /** @return the measured values, interleaved and scaled: what the model's are compared with */
    double[] target() {
        return scaled(measured.real(), measured.imaginary());
    }

    /**
     * @param h the model at every measured line
     * @return its values, interleaved and scaled as {@link #target()}
     */
    double[] scaled(Complex[] h) {
        double[] re = new double[h.length];
        double[] im = new double[h.length];
        for (int i = 0; i < h.length; i++) {
            re[i] = h[i].getReal();
            im[i] = h[i].getImaginary();
        }
        return scaled(re, im);
    }

    private double[] scaled(double[] re, double[] im) {
        double[] out = new double[2 * re.length];
        for (int i = 0; i < re.length; i++) {
            out[2 * i] = re[i] / scale;
            out[2 * i + 1] = im[i] / scale;
        }
        return out;
    }

    /**
     * @param h the model at every measured line
     * @return the sum of |H_measured - H_model|^2, unscaled
     */
    double cost(Complex[] h) {
        double sum = 0.0;
        for (int i = 0; i < h.length; i++) {
            double dr = h[i].getReal() - measured.real()[i];
            double di = h[i].getImaginary() - measured.imaginary()[i];
            sum += dr * dr + di * di;
        }
        return sum;
    }

    /**
     * @param h the model at every measured line
     * @return sqrt(sum |H_measured - H_model|^2 / sum |H_measured|^2)
     */
    double normalisedResidual(Complex[] h) {
        double den = 0.0;
        for (int i = 0; i < measured.size(); i++) {
            den += Math.pow(measured.value(i).abs(), 2);
        }
        return Math.sqrt(cost(h) / den);
    }

    /**
     * @param model the scaled model values at a parameter point
     * @param p the point
     * @return the values there and their Jacobian by central differences of step 1e-6
     */
    static Pair<RealVector, RealMatrix> valueAndJacobian(Function<double[], double[]> model, double[] p) {
        double[] value = model.apply(p);
        double[][] jacobian = new double[value.length][p.length];
        for (int k = 0; k < p.length; k++) {
            double[] up = p.clone();
            double[] down = p.clone();
            up[k] += DIFFERENCE_STEP;
            down[k] -= DIFFERENCE_STEP;
            double[] vu = model.apply(up);
            double[] vd = model.apply(down);
            for (int r = 0; r < value.length; r++) {
                jacobian[r][k] = (vu[r] - vd[r]) / (2 * DIFFERENCE_STEP);
            }
        }
        return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jacobian, false));
    }
}
