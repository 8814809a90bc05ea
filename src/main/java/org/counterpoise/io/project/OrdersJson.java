package org.counterpoise.io.project;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.PhysicalRange;
import org.counterpoise.io.PlainText;

/**
 * The parts of the project file's {@code disturbance} added in format 3, read and written here
 * (the one list of their keys): an unbalance given by its balance grade instead of its amplitude,
 * the rotor's other harmonic orders, and the order the design is for. See docs/project-file.md.
 */
final class OrdersJson {
    static final String AMPLITUDE = "amplitude";
    static final String BALANCE_GRADE = "balance_grade";
    static final String HARMONIC_ORDER = "harmonic_order";
    static final String KIND = "kind";
    static final String ORDERS = "orders";
    static final String DESIGN_ORDER = "design_order";
    /** The value of {@code design_order} that asks for the governing order. */
    static final String GOVERNING = "governing";

    private OrdersJson() {
    }

    /**
     * An order's amplitude: {@code amplitude}, or for an unbalance {@code balance_grade} instead.
     * @param o the object holding it (the disturbance or one of its orders)
     * @param kind the order's kind
     * @param harmonicOrder the order's harmonic order
     * @return the order as given
     */
    static OrderInput amplitudeOf(JsonFields o, ExcitationKind kind, double harmonicOrder) {
        boolean graded = o.has(BALANCE_GRADE);
        if (graded && kind != ExcitationKind.UNBALANCE) {
            throw new InvalidInputException(o.pathOf(BALANCE_GRADE), "given with kind \"" + Ids.of(kind) + "\"",
                    "a balance grade gives an unbalance: use it with kind unbalance, or give " + o.pathOf(AMPLITUDE));
        }
        if (graded && o.has(AMPLITUDE)) {
            throw new InvalidInputException(o.pathOf(BALANCE_GRADE), "given with " + o.pathOf(AMPLITUDE),
                    "give either the unbalance (amplitude) or the balance grade it comes from, not both");
        }
        if (!graded) {
            return OrderInput.of(harmonicOrder, kind, o.quantity(AMPLITUDE, kind.amplitudeDimension()));
        }
        JsonFields g = o.object(BALANCE_GRADE);
        BalanceGradeInput grade = new BalanceGradeInput(g.quantity(BalanceGradeInput.GRADE, Dimension.VELOCITY),
                g.quantity(BalanceGradeInput.ROTOR_MASS, Dimension.MASS),
                g.quantity(BalanceGradeInput.MAX_SPEED, Dimension.FREQUENCY));
        g.finish();
        return new OrderInput(harmonicOrder, kind, null, grade);
    }

    /**
     * @param d the disturbance object
     * @return its other orders, in the file's order (empty when none)
     */
    static List<OrderInput> orders(JsonFields d) {
        List<OrderInput> out = new ArrayList<>();
        for (JsonFields o : d.objectList(ORDERS)) {
            double order = PhysicalRange.HARMONIC_ORDER.check(o.pathOf(HARMONIC_ORDER), o.number(HARMONIC_ORDER), null);
            String kindText = o.text(KIND);
            ExcitationKind kind = Ids.parse(ExcitationKind.class, kindText).orElseThrow(() -> new InvalidInputException(
                    o.pathOf(KIND), "\"" + PlainText.quote(kindText) + "\"", "one of " + Ids.list(ExcitationKind.values())));
            out.add(amplitudeOf(o, kind, order));
            o.finish();
        }
        return out;
    }

    /**
     * @param d the disturbance object
     * @return the harmonic order picked for the design, empty for the governing one (also when absent)
     */
    static OptionalDouble designOrder(JsonFields d) {
        if (!d.has(DESIGN_ORDER) || d.isText(DESIGN_ORDER)) {
            String text = d.text(DESIGN_ORDER, GOVERNING);
            if (!text.equals(GOVERNING)) {
                throw new InvalidInputException(d.pathOf(DESIGN_ORDER), "\"" + PlainText.quote(text) + "\"",
                        "\"" + GOVERNING + "\" or the harmonic order of one of the orders (a number)");
            }
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(PhysicalRange.HARMONIC_ORDER.check(d.pathOf(DESIGN_ORDER), d.number(DESIGN_ORDER),
                null));
    }

    /**
     * Writes an order's amplitude or balance grade.
     * @param o the object
     * @param order the order (its harmonic order and kind are written by the caller)
     */
    static void writeAmplitude(JsonObject o, OrderInput order) {
        if (order.balanceGrade() != null) {
            BalanceGradeInput g = order.balanceGrade();
            JsonObject grade = new JsonObject();
            grade.add(BalanceGradeInput.GRADE, ProjectWriter.quantity(g.grade()));
            grade.add(BalanceGradeInput.ROTOR_MASS, ProjectWriter.quantity(g.rotorMass()));
            grade.add(BalanceGradeInput.MAX_SPEED, ProjectWriter.quantity(g.maxSpeed()));
            o.add(BALANCE_GRADE, grade);
        } else {
            o.add(AMPLITUDE, ProjectWriter.quantity(order.amplitude()));
        }
    }

    /**
     * Writes the other orders and the design order, when there are other orders.
     * @param o the disturbance object
     * @param d the disturbance
     */
    static void writeOrders(JsonObject o, DisturbanceInput d) {
        if (d.orders().isEmpty() && d.designOrder().isEmpty()) {
            return;
        }
        JsonArray list = new JsonArray();
        for (OrderInput order : d.orders()) {
            JsonObject one = new JsonObject();
            one.addProperty(HARMONIC_ORDER, order.harmonicOrder());
            one.addProperty(KIND, Ids.of(order.kind()));
            writeAmplitude(one, order);
            list.add(one);
        }
        o.add(ORDERS, list);
        if (d.designOrder().isPresent()) {
            o.addProperty(DESIGN_ORDER, d.designOrder().getAsDouble());
        } else {
            o.addProperty(DESIGN_ORDER, GOVERNING);
        }
    }
}
