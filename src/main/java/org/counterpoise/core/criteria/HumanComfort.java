package org.counterpoise.core.criteria;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.response.ResponseKind;

/**
 * Human comfort after ISO 2631-1:1997: the frequency-weighted r.m.s. acceleration (Wk vertical, Wd
 * horizontal; orders add as the root of the sum of squares, its Eq. 9) judged against the upper end
 * of the comfort reaction the user accepts (Annex C). Axis multiplying factor 1 (seat, standing,
 * recumbent; clause 8.2.3).
 *
 * @param axisWeighting {@link FrequencyWeighting#WK} (vertical) or {@link FrequencyWeighting#WD} (horizontal)
 * @param acceptable the worst reaction accepted; its upper end is the limit
 */
public record HumanComfort(FrequencyWeighting axisWeighting, ComfortReaction acceptable) implements Criterion {

    /** Validates the record. */
    public HumanComfort {
        Checks.present("acceptance.weighting", axisWeighting, "wk (vertical) or wd (horizontal)");
        Checks.present("acceptance.acceptable", acceptable, "one of " + ComfortReaction.ids());
        if (axisWeighting != FrequencyWeighting.WK && axisWeighting != FrequencyWeighting.WD) {
            throw new InvalidInputException("acceptance.weighting", axisWeighting.id(),
                    "comfort after ISO 2631-1 uses wk (vertical) or wd (horizontal)");
        }
        if (acceptable == ComfortReaction.EXTREMELY_UNCOMFORTABLE) {
            throw new InvalidInputException("acceptance.acceptable", acceptable.id(),
                    "has no upper end to judge against; choose a reaction up to very-uncomfortable");
        }
    }

    @Override
    public CriterionKind kind() {
        return CriterionKind.HUMAN_COMFORT;
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
        return Optional.of(axisWeighting);
    }

    @Override
    public LimitCurve limit() {
        return LimitCurve.flat(acceptable.upper());
    }

    @Override
    public OrderCombination combination() {
        return OrderCombination.TOGETHER;
    }

    @Override
    public List<Zone> zones() {
        return Arrays.stream(ComfortReaction.values()).map(ComfortReaction::zone).toList();
    }

    @Override
    public String source() {
        return axisWeighting.source() + "; " + ComfortReaction.SOURCE;
    }
}
