package org.counterpoise.core.realisation;

import java.util.List;
import java.util.Optional;

/**
 * The damper that realises the absorber's damping coefficient, and what it must withstand, SI.
 *
 * @param kind dashpot, eddy-current plate or elastomer loss
 * @param coefficient the damping coefficient, N*s/m
 * @param strokeAmplitude relative displacement amplitude in the band, m
 * @param runUpStroke relative displacement amplitude over the run-up, m (+infinity when unbounded: nothing damps the
 *     resonances the run-up passes)
 * @param peakVelocity relative velocity amplitude, the larger of band and run-up, m/s
 * @param peakForce damper force amplitude, coefficient times peak velocity, N
 * @param eddyCurrent the eddy-current sizing, when the kind is {@link DamperKind#EDDY_CURRENT}
 * @param checks the damper's checks
 */
public record DamperDesign(DamperKind kind, double coefficient, double strokeAmplitude, double runUpStroke,
        double peakVelocity, double peakForce, Optional<EddyCurrentDamper> eddyCurrent, List<DesignCheck> checks) {

    /** Defensive copy. */
    public DamperDesign {
        checks = List.copyOf(checks);
    }
}
