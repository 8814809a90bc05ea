package org.counterpoise.core.criteria;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.response.ResponseKind;

/**
 * Machine vibration severity: the broadband r.m.s. velocity (the orders add) against the upper
 * boundary of the zone the user accepts (B, unrestricted long-term operation, is the usual
 * acceptance; A for a newly commissioned machine), with the zone reported before and after.
 *
 * @param machine group and support
 * @param acceptable the worst zone accepted (A, B or C)
 */
public record MachineSeverity(MachineClass machine, SeverityZone acceptable) implements Criterion {

    /** Validates the record. */
    public MachineSeverity {
        Checks.present("acceptance.machine", machine, "a machine group and support");
        Checks.present("acceptance.zone", acceptable, "A, B or C");
        if (acceptable == SeverityZone.D) {
            throw new InvalidInputException("acceptance.zone", "D",
                    "zone D is severe enough to cause damage and has no upper boundary; choose A, B or C");
        }
    }

    @Override
    public CriterionKind kind() {
        return CriterionKind.MACHINE;
    }

    @Override
    public ResponseKind quantity() {
        return ResponseKind.VELOCITY;
    }

    @Override
    public AmplitudeConvention convention() {
        return AmplitudeConvention.RMS;
    }

    @Override
    public Optional<FrequencyWeighting> weighting() {
        return Optional.empty();
    }

    @Override
    public LimitCurve limit() {
        return LimitCurve.flat(machine.upperBoundary(acceptable));
    }

    @Override
    public OrderCombination combination() {
        return OrderCombination.TOGETHER;
    }

    @Override
    public List<Zone> zones() {
        return machine.zones();
    }

    @Override
    public String source() {
        return machine.source();
    }

    /**
     * The check of a rigid support's class against the structure (ISO 10816-3:2009, 4.3: rigid when the
     * lowest natural frequency is at least {@value MachineClass#RIGID_FREQUENCY_RATIO} times the main
     * excitation frequency).
     *
     * @param criterion the study's criterion, if any
     * @param naturalFrequency the structure's natural frequency, rad/s
     * @param forcing the highest forcing frequency, rad/s
     * @return {@link WarningKind#SUPPORT_NOT_RIGID} when the criterion is a rigid support's machine class
     *     and the structure's natural frequency is below that multiple of the forcing; empty otherwise
     */
    public static Optional<Warning> supportWarning(Optional<Criterion> criterion, double naturalFrequency,
            double forcing) {
        boolean rigid = criterion.orElse(null) instanceof MachineSeverity m && m.machine().rigidSupport();
        return rigid && naturalFrequency < MachineClass.RIGID_FREQUENCY_RATIO * forcing
                ? Optional.of(Warning.of(WarningKind.SUPPORT_NOT_RIGID, naturalFrequency, forcing))
                : Optional.empty();
    }
}
