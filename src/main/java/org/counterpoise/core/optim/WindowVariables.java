package org.counterpoise.core.optim;

import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The same variables judged over another range of frequency (a window: the neighbourhood of one of
 * the structure's other modes) with |H| times a weight: one piece of a spillover-limited design
 * ({@link SpilloverLimitedOptimiser}). The weight is a constant factor, so the maxima's places, the
 * slopes and the gradients of ln|H|^2 are the variables' own; only the levels move by 2 ln(weight).
 */
final class WindowVariables implements MinimaxVariables {
    private final MinimaxVariables variables;
    private final double low;
    private final double high;
    private final double logWeightSquared;
    private final double weight;

    /**
     * @param variables the variables
     * @param low the window's low end, as a frequency ratio g
     * @param high its high end (+infinity for no end)
     * @param weight the factor on |H| (&gt; 0)
     */
    WindowVariables(MinimaxVariables variables, double low, double high, double weight) {
        this.variables = variables;
        this.low = low;
        this.high = high;
        this.weight = weight;
        this.logWeightSquared = 2 * Math.log(weight);
    }

    @Override
    public int dimension() {
        return variables.dimension();
    }

    @Override
    public double[] lower() {
        return variables.lower();
    }

    @Override
    public double[] upper() {
        return variables.upper();
    }

    @Override
    public double bandLow() {
        return low;
    }

    @Override
    public double bandHigh() {
        return high;
    }

    @Override
    public TransferFunction transferFunction(double[] p) {
        return variables.transferFunction(p);
    }

    @Override
    public DoubleUnaryOperator logMagnitudeSquared(double[] p) {
        DoubleUnaryOperator own = variables.logMagnitudeSquared(p);
        return x -> own.applyAsDouble(x) + logWeightSquared;
    }

    @Override
    public double[] gradient(double[] p, double x) {
        return variables.gradient(p, x);
    }

    @Override
    public double polynomialPeak(double[] p) {
        return weight * MinimaxVariables.super.polynomialPeak(p);
    }
}
