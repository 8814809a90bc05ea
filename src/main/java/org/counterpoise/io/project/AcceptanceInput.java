package org.counterpoise.io.project;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.CriterionKind;
import org.counterpoise.core.criteria.LimitCurve;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;

/**
 * The project's acceptance criterion as the user gave it (since format 3): either one of the
 * published criteria, whose parameters are choices from tables and carry no units
 * ({@link Published}), or a limit the user states with its unit ({@link StatedLimit}).
 */
public sealed interface AcceptanceInput {

    /** @return the family of the criterion */
    CriterionKind kind();

    /**
     * @return the criterion in SI, checked (messages name the {@code acceptance.*} field)
     * @throws InvalidInputException for a value that cannot be judged against
     */
    Criterion toCriterion();

    /**
     * A published criterion: human comfort, building, machine or equipment.
     *
     * @param criterion the criterion (not a {@link UserLimit}, which is a {@link StatedLimit})
     */
    record Published(Criterion criterion) implements AcceptanceInput {
        /** Validates the record. */
        public Published {
            Checks.present("acceptance", criterion, "a criterion");
            if (criterion instanceof UserLimit) {
                throw new IllegalArgumentException("bug: a user limit is a StatedLimit, with its unit");
            }
        }

        @Override
        public CriterionKind kind() {
            return criterion.kind();
        }

        @Override
        public Criterion toCriterion() {
            return criterion;
        }
    }

    /**
     * A limit the user states: the response quantity of the structure, the convention of the value,
     * and either one value (the same at every frequency) or a curve of points.
     *
     * @param quantity displacement, velocity, acceleration, relative displacement or transmitted force
     * @param convention peak, r.m.s. or peak-to-peak
     * @param value the limit at every frequency, in a unit of the quantity; null with a curve
     * @param curve the points of a limit that depends on frequency (empty with a value)
     */
    record StatedLimit(ResponseKind quantity, AmplitudeConvention convention, QuantityInput value,
            List<CurvePoint> curve) implements AcceptanceInput {

        /** An absent curve is empty, never null. */
        public StatedLimit {
            curve = curve == null ? List.of() : List.copyOf(curve);
        }

        /**
         * @param quantity the response quantity
         * @param convention the convention of the value
         * @param value the limit at every frequency
         * @return a flat limit
         */
        public static StatedLimit flat(ResponseKind quantity, AmplitudeConvention convention, QuantityInput value) {
            return new StatedLimit(quantity, convention, value, List.of());
        }

        @Override
        public CriterionKind kind() {
            return CriterionKind.USER_LIMIT;
        }

        @Override
        public Criterion toCriterion() {
            Checks.present(AcceptanceJson.QUANTITY_PATH, quantity, "one of " + AcceptanceJson.quantityIds());
            Checks.present(AcceptanceJson.CONVENTION_PATH, convention, "one of " + AmplitudeConvention.ids());
            if (!Project.DESIGN_RESPONSES.contains(quantity)) {
                throw new InvalidInputException(AcceptanceJson.QUANTITY_PATH, Ids.of(quantity),
                        "a response of the structure: one of " + AcceptanceJson.quantityIds());
            }
            if ((value == null) == curve.isEmpty()) {
                throw new InvalidInputException(AcceptanceJson.LIMIT_PATH, value == null
                        ? "neither " + AcceptanceJson.LIMIT + " nor " + AcceptanceJson.LIMIT_CURVE + " given"
                        : "both " + AcceptanceJson.LIMIT + " and " + AcceptanceJson.LIMIT_CURVE + " given",
                        "give either acceptance." + AcceptanceJson.LIMIT + " (one value) or acceptance."
                                + AcceptanceJson.LIMIT_CURVE + " (points over frequency)");
            }
            if (value != null) {
                return new UserLimit(quantity, convention, LimitCurve.flat(
                        inDimension(value, AcceptanceJson.LIMIT_PATH).positiveSi(AcceptanceJson.LIMIT_PATH + ".value")));
            }
            List<LimitCurve.Point> points = new ArrayList<>();
            for (int i = 0; i < curve.size(); i++) {
                String path = AcceptanceJson.CURVE_PATH + "[" + i + "]";
                CurvePoint p = curve.get(i);
                double hertz = inDimension(p.frequency(), path + "." + AcceptanceJson.FREQUENCY, Dimension.FREQUENCY)
                        .positiveSi(path + "." + AcceptanceJson.FREQUENCY + ".value") / (2 * Math.PI);
                double limit = inDimension(p.limit(), path + "." + AcceptanceJson.LIMIT)
                        .positiveSi(path + "." + AcceptanceJson.LIMIT + ".value");
                if (i > 0 && !(hertz > points.get(i - 1).frequency())) {
                    throw new InvalidInputException(path + "." + AcceptanceJson.FREQUENCY + ".value",
                            Checks.show(p.frequency().value()) + " " + p.frequency().unit().symbol(),
                            "the frequencies must rise from point to point (the previous point is at "
                                    + Checks.show(points.get(i - 1).frequency()) + " Hz)");
                }
                points.add(new LimitCurve.Point(hertz, limit));
            }
            return new UserLimit(quantity, convention, new LimitCurve(points));
        }

        private QuantityInput inDimension(QuantityInput q, String path) {
            return inDimension(q, path, quantity.dimension());
        }

        private static QuantityInput inDimension(QuantityInput q, String path, Dimension dimension) {
            Checks.present(path, q, "a value with its unit");
            if (q.unit().dimension() != dimension) {
                throw new InvalidInputException(path + ".unit", "\"" + q.unit().symbol() + "\"",
                        "allowed units: " + Unit.symbolsOf(dimension));
            }
            return q;
        }
    }

    /**
     * One point of a stated limit curve.
     *
     * @param frequency the forcing frequency (Hz, rad/s, rpm)
     * @param limit the limit there, in a unit of the criterion's quantity
     */
    record CurvePoint(QuantityInput frequency, QuantityInput limit) {
    }
}
