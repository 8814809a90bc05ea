package org.counterpoise.core.runup;

import java.util.List;
import org.counterpoise.core.response.ResponseKind;

/**
 * A run-up study as the reports show it: the project's name, the direction, the harmonic order
 * that turns forcing frequencies back into shaft speeds, and the comparison.
 *
 * @param name project name
 * @param runDown true for a run-down (from steady running to rest), false for a run-up
 * @param harmonicOrder forcing cycles per shaft revolution (&gt; 0)
 * @param comparison the runs with and without the absorber and the steady-state peaks
 */
public record RunUpReportData(String name, boolean runDown, double harmonicOrder, RunUpComparison comparison) {

    /** The quantities reported, in order (those without an absorber are the first three). */
    public static final List<ResponseKind> QUANTITIES = RunUp.quantities(true);

    /**
     * @param forcingFrequency forcing frequency, rad/s
     * @return the shaft speed, rad/s
     */
    public double shaftSpeed(double forcingFrequency) {
        return forcingFrequency / harmonicOrder;
    }

    /** @return the shaft's angular acceleration, rad/s^2 (positive) */
    public double shaftRate() {
        return Math.abs(comparison.withAbsorber().ramp().acceleration()) / harmonicOrder;
    }
}
