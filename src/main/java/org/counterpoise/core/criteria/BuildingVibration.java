package org.counterpoise.core.criteria;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.response.ResponseKind;

/**
 * People in buildings: the r.m.s. acceleration of each order (a one-third-octave band value, or a
 * sine) against the base curve of its direction times the factor of the room's use (ISO 10137:2007
 * Annex C).
 *
 * @param axis vertical or horizontal
 * @param use the room's use
 */
public record BuildingVibration(BuildingAxis axis, RoomUse use) implements Criterion {

    /** Validates the record. */
    public BuildingVibration {
        Checks.present("acceptance.direction", axis, "vertical or horizontal");
        Checks.present("acceptance.room_use", use, "a room use");
    }

    @Override
    public CriterionKind kind() {
        return CriterionKind.BUILDING;
    }

    @Override
    public ResponseKind quantity() {
        return ResponseKind.ACCELERATION;
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
        return axis.baseCurve().times(use.factor());
    }

    @Override
    public OrderCombination combination() {
        return OrderCombination.EACH_ORDER;
    }

    @Override
    public List<Zone> zones() {
        return List.of();
    }

    @Override
    public String source() {
        return BuildingAxis.SOURCE + "; " + RoomUse.SOURCE;
    }
}
