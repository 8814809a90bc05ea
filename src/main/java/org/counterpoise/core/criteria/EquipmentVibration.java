package org.counterpoise.core.criteria;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.response.ResponseKind;

/**
 * Sensitive equipment (microscopes, lithography, metrology): the r.m.s. velocity of each order (a
 * one-third-octave band value) against a vibration criterion curve.
 *
 * @param curve the curve the equipment needs
 */
public record EquipmentVibration(VibrationCriterionCurve curve) implements Criterion {

    /** Validates the record. */
    public EquipmentVibration {
        Checks.present("acceptance.curve", curve, "vc-a to vc-g");
    }

    @Override
    public CriterionKind kind() {
        return CriterionKind.EQUIPMENT;
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
        return curve.curve();
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
        return VibrationCriterionCurve.SOURCE;
    }
}
