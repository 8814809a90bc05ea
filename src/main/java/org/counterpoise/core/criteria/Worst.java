package org.counterpoise.core.criteria;

/**
 * Where one system is worst against the criterion, before it is dressed as a {@link Reading}.
 *
 * @param value the measure there, SI, in the criterion's convention (+infinity when unbounded)
 * @param limit the limit there, SI
 * @param ratio the design order's frequency ratio g = omega / omega1 there
 * @param order the governing order's index, or -1 when the orders are judged together
 * @param outsideRange true when the point lies outside the limit curve's range of use
 */
record Worst(double value, double limit, double ratio, int order, boolean outsideRange) {

    /** @return value over limit (+infinity when unbounded) */
    double utilisation() {
        return value / limit;
    }
}
