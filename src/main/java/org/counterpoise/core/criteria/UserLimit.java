package org.counterpoise.core.criteria;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.response.ResponseKind;

/**
 * A limit the user states: a response quantity, the convention of the value, and a flat limit or a
 * curve of points over frequency. A flat limit judges the orders together; a curve judges each at
 * its own frequency.
 *
 * @param quantity displacement, velocity, acceleration, relative displacement or transmitted force
 * @param convention peak, r.m.s. or peak-to-peak
 * @param limit the limit, SI
 */
public record UserLimit(ResponseKind quantity, AmplitudeConvention convention, LimitCurve limit)
        implements Criterion {

    /** Validates the record. */
    public UserLimit {
        Checks.present("acceptance.quantity", quantity, "displacement, velocity, acceleration,"
                + " relative-displacement or transmitted-force");
        Checks.present("acceptance.convention", convention, "one of " + AmplitudeConvention.ids());
        Checks.present("acceptance.limit", limit, "a value or a curve");
        if (quantity.needsAbsorber()) {
            throw new InvalidInputException("acceptance.quantity", quantity.name(),
                    "a criterion judges a response of the structure, not of the absorber");
        }
    }

    @Override
    public CriterionKind kind() {
        return CriterionKind.USER_LIMIT;
    }

    @Override
    public Optional<FrequencyWeighting> weighting() {
        return Optional.empty();
    }

    @Override
    public OrderCombination combination() {
        return limit.isFlat() ? OrderCombination.TOGETHER : OrderCombination.EACH_ORDER;
    }

    @Override
    public List<Zone> zones() {
        return List.of();
    }

    @Override
    public String source() {
        return "stated by the user";
    }
}
