package org.counterpoise.io.project;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.BuildingAxis;
import org.counterpoise.core.criteria.BuildingVibration;
import org.counterpoise.core.criteria.ComfortReaction;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.CriterionKind;
import org.counterpoise.core.criteria.EquipmentVibration;
import org.counterpoise.core.criteria.FrequencyWeighting;
import org.counterpoise.core.criteria.HumanComfort;
import org.counterpoise.core.criteria.MachineClass;
import org.counterpoise.core.criteria.MachineSeverity;
import org.counterpoise.core.criteria.RoomUse;
import org.counterpoise.core.criteria.SeverityZone;
import org.counterpoise.core.criteria.VibrationCriterionCurve;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.PlainText;

/**
 * The project file's {@code acceptance} object (since format 3), read and written here: the one
 * list of its keys. The criterion is named by its {@link CriterionKind} id, its parameters by the
 * ids of the {@code core.criteria} enums; a stated limit's quantities are {"value", "unit"} objects.
 * See docs/project-file.md.
 */
final class AcceptanceJson {
    /** The key of the object in a project file. */
    static final String KEY = "acceptance";
    static final String CRITERION = "criterion";
    static final String QUANTITY = "quantity";
    static final String CONVENTION = "convention";
    static final String LIMIT = "limit";
    static final String LIMIT_CURVE = "limit_curve";
    static final String FREQUENCY = "frequency";
    static final String WEIGHTING = "weighting";
    static final String ACCEPTABLE = "acceptable";
    static final String DIRECTION = "direction";
    static final String ROOM_USE = "room_use";
    static final String MACHINE = "machine";
    static final String ZONE = "zone";
    static final String CURVE = "curve";

    static final String QUANTITY_PATH = KEY + "." + QUANTITY;
    static final String CONVENTION_PATH = KEY + "." + CONVENTION;
    static final String LIMIT_PATH = KEY + "." + LIMIT;
    static final String CURVE_PATH = KEY + "." + LIMIT_CURVE;

    /** The weightings of human comfort after ISO 2631-1 (the others are not for this criterion). */
    private static final FrequencyWeighting[] COMFORT_WEIGHTINGS = {FrequencyWeighting.WK, FrequencyWeighting.WD};

    private AcceptanceJson() {
    }

    /** @return the ids of the quantities a stated limit may judge, for messages */
    static String quantityIds() {
        return Ids.list(Project.DESIGN_RESPONSES.toArray(new ResponseKind[0]));
    }

    /**
     * @param a the {@code acceptance} object
     * @return the criterion as given (a published one is checked here; a stated limit when designed)
     */
    static AcceptanceInput read(JsonFields a) {
        CriterionKind kind = choice(a, CRITERION, CriterionKind.values(), CriterionKind::id);
        AcceptanceInput out = switch (kind) {
            case USER_LIMIT -> statedLimit(a);
            case HUMAN_COMFORT -> new AcceptanceInput.Published(new HumanComfort(
                    choice(a, WEIGHTING, COMFORT_WEIGHTINGS, FrequencyWeighting::id),
                    choice(a, ACCEPTABLE, ComfortReaction.values(), ComfortReaction::id)));
            case BUILDING -> new AcceptanceInput.Published(new BuildingVibration(
                    choice(a, DIRECTION, BuildingAxis.values(), BuildingAxis::id),
                    choice(a, ROOM_USE, RoomUse.values(), RoomUse::id)));
            case MACHINE -> new AcceptanceInput.Published(new MachineSeverity(
                    choice(a, MACHINE, MachineClass.values(), MachineClass::id),
                    choice(a, ZONE, SeverityZone.values(), SeverityZone::name)));
            case EQUIPMENT -> new AcceptanceInput.Published(new EquipmentVibration(
                    choice(a, CURVE, VibrationCriterionCurve.values(), VibrationCriterionCurve::id)));
        };
        a.finish();
        return out;
    }

    private static AcceptanceInput statedLimit(JsonFields a) {
        ResponseKind quantity = choice(a, QUANTITY, Project.DESIGN_RESPONSES.toArray(new ResponseKind[0]), Ids::of);
        AmplitudeConvention convention = choice(a, CONVENTION, AmplitudeConvention.values(), AmplitudeConvention::id);
        String either = "give either " + LIMIT_PATH + " (one value, e.g. {\"value\": 2.8, \"unit\": \"mm/s\"}) or "
                + CURVE_PATH + " (a list of points {\"frequency\": ..., \"limit\": ...})";
        if (!a.has(LIMIT) && !a.has(LIMIT_CURVE)) {
            throw InvalidInputException.missing(LIMIT_PATH, either);
        }
        if (a.has(LIMIT) && a.has(LIMIT_CURVE)) {
            throw new InvalidInputException(LIMIT_PATH, "given with " + CURVE_PATH, either);
        }
        if (a.has(LIMIT)) {
            return AcceptanceInput.StatedLimit.flat(quantity, convention, a.quantity(LIMIT, quantity.dimension()));
        }
        List<AcceptanceInput.CurvePoint> points = new ArrayList<>();
        for (JsonFields p : a.objectList(LIMIT_CURVE)) {
            points.add(new AcceptanceInput.CurvePoint(p.quantity(FREQUENCY, Dimension.FREQUENCY),
                    p.quantity(LIMIT, quantity.dimension())));
            p.finish();
        }
        if (points.isEmpty()) {
            throw new InvalidInputException(a.pathOf(LIMIT_CURVE), "an empty list",
                    "at least one point {\"frequency\": ..., \"limit\": ...}");
        }
        return new AcceptanceInput.StatedLimit(quantity, convention, null, points);
    }

    /**
     * @param criterion the criterion as given
     * @return its {@code acceptance} object
     */
    static JsonObject write(AcceptanceInput criterion) {
        JsonObject o = new JsonObject();
        o.addProperty(CRITERION, criterion.kind().id());
        if (criterion instanceof AcceptanceInput.StatedLimit s) {
            o.addProperty(QUANTITY, Ids.of(s.quantity()));
            o.addProperty(CONVENTION, s.convention().id());
            if (s.value() != null) {
                o.add(LIMIT, ProjectWriter.quantity(s.value()));
            } else {
                JsonArray points = new JsonArray();
                for (AcceptanceInput.CurvePoint p : s.curve()) {
                    JsonObject point = new JsonObject();
                    point.add(FREQUENCY, ProjectWriter.quantity(p.frequency()));
                    point.add(LIMIT, ProjectWriter.quantity(p.limit()));
                    points.add(point);
                }
                o.add(LIMIT_CURVE, points);
            }
            return o;
        }
        Criterion c = criterion.toCriterion();
        if (c instanceof HumanComfort h) {
            o.addProperty(WEIGHTING, h.axisWeighting().id());
            o.addProperty(ACCEPTABLE, h.acceptable().id());
        } else if (c instanceof BuildingVibration b) {
            o.addProperty(DIRECTION, b.axis().id());
            o.addProperty(ROOM_USE, b.use().id());
        } else if (c instanceof MachineSeverity m) {
            o.addProperty(MACHINE, m.machine().id());
            o.addProperty(ZONE, m.acceptable().name());
        } else if (c instanceof EquipmentVibration e) {
            o.addProperty(CURVE, e.curve().id());
        } else {
            throw new IllegalStateException("bug: a user limit is written as a stated limit");
        }
        return o;
    }

    /**
     * A choice from a list by its id: case, surrounding spaces and underscores for dashes do not
     * matter (as for every id in a project file).
     */
    static <E> E choice(JsonFields o, String key, E[] values, Function<E, String> id) {
        String text = o.text(key);
        String wanted = normal(text);
        return Arrays.stream(values).filter(v -> normal(id.apply(v)).equals(wanted)).findFirst()
                .orElseThrow(() -> new InvalidInputException(o.pathOf(key), "\"" + PlainText.quote(text) + "\"",
                        "one of " + Arrays.stream(values).map(id).collect(Collectors.joining(", "))));
    }

    private static String normal(String id) {
        return id.trim().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
