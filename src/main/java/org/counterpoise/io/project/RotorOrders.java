package org.counterpoise.io.project;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Spectrum;

/**
 * The rotor's harmonic orders of a project's disturbance in SI, and the core {@link Excitation} for
 * the one the design is for: that order's kind and amplitude, the shaft band times its harmonic
 * order, and every other order with its frequency as a multiple of the design order's
 * ({@link ExcitationOrder#frequencyFactor} = its harmonic order / the design order's).
 */
final class RotorOrders {
    private final List<Order> orders;
    private final double shaftLow;
    private final double shaftHigh;
    private final Spectrum spectrum;
    private final OptionalDouble shaftRunUpRate;

    /**
     * One harmonic order of the rotor in SI.
     *
     * @param path where the user gave it, e.g. {@code disturbance} or {@code disturbance.orders[0]}
     * @param harmonicOrder forcing cycles per revolution
     * @param kind what it is
     * @param amplitude its amplitude, SI
     */
    record Order(String path, double harmonicOrder, ExcitationKind kind, double amplitude) {
    }

    /**
     * @param d the disturbance as given
     * @param shaftRunUpRate the shaft's angular acceleration at start and stop, rad/s^2, if stated
     */
    RotorOrders(DisturbanceInput d, OptionalDouble shaftRunUpRate) {
        this.shaftRunUpRate = shaftRunUpRate;
        List<Order> all = new ArrayList<>();
        all.add(order("disturbance", OrderInput.ofDisturbance(d)));
        for (int i = 0; i < d.orders().size(); i++) {
            Order o = order("disturbance.orders[" + i + "]", d.orders().get(i));
            for (Order before : all) {
                if (before.harmonicOrder() == o.harmonicOrder()) {
                    throw new InvalidInputException(o.path() + ".harmonic_order", Checks.show(o.harmonicOrder()),
                            "each harmonic order once (it is also " + before.path() + ".harmonic_order); orders at the"
                                    + " same frequency are one order: give their combined amplitude");
                }
            }
            all.add(o);
        }
        this.orders = List.copyOf(all);
        if (d.isBand()) {
            Checks.positive("disturbance.band.low", d.bandLow());
            Checks.positive("disturbance.band.high", d.bandHigh());
            if (d.bandHigh() < d.bandLow()) {
                throw new InvalidInputException("disturbance.band.high", Checks.show(d.bandHigh()),
                        "must not be below disturbance.band.low (" + Checks.show(d.bandLow()) + ")");
            }
            shaftLow = d.bandUnit().toSi(d.bandLow());
            shaftHigh = d.bandUnit().toSi(d.bandHigh());
        } else {
            shaftLow = d.frequency().positiveSi("disturbance.frequency.value");
            shaftHigh = shaftLow;
        }
        Spectrum s = Spectrum.HARMONIC;
        if (d.spectrum() != null && d.spectrum().kind() == Spectrum.Kind.WHITE_NOISE) {
            s = Spectrum.whiteNoise(Checks.positive("disturbance.spectrum.psd.value",
                    d.spectrum().psdUnit().toSi(d.spectrum().psdValue())));
        }
        spectrum = s;
    }

    private static Order order(String path, OrderInput o) {
        double h = Checks.positive(path + ".harmonic_order", o.harmonicOrder());
        Checks.present(path + ".kind", o.kind(), "one of " + Ids.list(ExcitationKind.values()));
        if ((o.amplitude() == null) == (o.balanceGrade() == null)) {
            throw new InvalidInputException(path + ".amplitude", o.amplitude() == null ? "missing" : "given with"
                    + " " + path + ".balance_grade", "give either the amplitude or, for an unbalance, the balance grade");
        }
        if (o.balanceGrade() != null && o.kind() != ExcitationKind.UNBALANCE) {
            throw new InvalidInputException(path + ".balance_grade", "given with kind \"" + Ids.of(o.kind()) + "\"",
                    "a balance grade gives an unbalance: use it with kind unbalance, or give " + path + ".amplitude");
        }
        double amplitude = o.amplitude() != null ? o.amplitude().positiveSi(path + ".amplitude.value")
                : o.balanceGrade().toCore(path + ".balance_grade").permissibleUnbalance();
        return new Order(path, h, o.kind(), amplitude);
    }

    /** @return every order, the disturbance's own first, then the others as given */
    List<Order> orders() {
        return orders;
    }

    /**
     * @param picked a harmonic order the user picked
     * @return the index of that order in {@link #orders}
     */
    int indexOf(double picked) {
        for (int i = 0; i < orders.size(); i++) {
            if (orders.get(i).harmonicOrder() == picked) {
                return i;
            }
        }
        throw new InvalidInputException("disturbance.design_order", Checks.show(picked), "\"governing\" or the"
                + " harmonic order of one of the orders: " + String.join(", ",
                        orders.stream().map(o -> Checks.show(o.harmonicOrder())).toList()));
    }

    /**
     * @param design the index in {@link #orders} of the order the design is for
     * @return the core excitation: that order, with every other one beside it
     */
    Excitation excitation(int design) {
        Order d = orders.get(design);
        List<ExcitationOrder> others = new ArrayList<>();
        for (int i = 0; i < orders.size(); i++) {
            Order o = orders.get(i);
            if (i != design) {
                others.add(new ExcitationOrder(o.kind(), o.amplitude(), o.harmonicOrder() / d.harmonicOrder()));
            }
        }
        Excitation e = new Excitation(d.kind(), d.amplitude(), FrequencyBand.ofRotor(shaftLow, shaftHigh,
                d.harmonicOrder()), spectrum, OptionalDouble.empty(), others);
        // the core's rate is the forcing frequency's (the shaft's times the design order's harmonic order)
        return shaftRunUpRate.isPresent() ? e.withRunUpRate(shaftRunUpRate.getAsDouble() * d.harmonicOrder()) : e;
    }
}
