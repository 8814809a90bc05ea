package org.counterpoise.core.runup;

import java.util.Map;
import java.util.Optional;
import org.counterpoise.core.response.ResponseKind;

/**
 * What one time integration through the speed ramp gives.
 *
 * @param ramp the forcing frequency against time
 * @param withAbsorber true when the absorber was fitted
 * @param peaks per quantity, the largest magnitude and when it occurs
 * @param envelope the per-cycle envelope of each quantity
 * @param steps accepted integration steps
 * @param evaluations right-hand-side evaluations
 */
public record RunUpResult(SpeedRamp ramp, boolean withAbsorber, Map<ResponseKind, TransientPeak> peaks,
        Envelope envelope, int steps, int evaluations) {

    /** Defensive copy. */
    public RunUpResult {
        peaks = Map.copyOf(peaks);
    }

    /**
     * @param kind a quantity
     * @return its peak, or empty when the quantity does not exist (stroke without an absorber)
     */
    public Optional<TransientPeak> peak(ResponseKind kind) {
        return Optional.ofNullable(peaks.get(kind));
    }
}
