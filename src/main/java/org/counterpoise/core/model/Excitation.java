package org.counterpoise.core.model;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * A disturbance: its kind, its harmonic amplitude (SI, by kind: N, kg*m, m or m/s^2), the forcing
 * frequencies it occurs at, and its spectrum (harmonic, or broadband white noise of a stated
 * spectral density, see {@link Spectrum}).
 *
 * @param kind what drives the structure
 * @param amplitude amplitude in the SI unit of {@link ExcitationKind#amplitudeDimension()}
 * @param band forcing frequencies, rad/s
 * @param spectrum harmonic, or white noise with its PSD level
 * @param runUpRate how fast the forcing frequency changes at start and stop, rad/s^2 (the shaft's
 *     angular acceleration times the harmonic order), when the project states it; the design then
 *     reports the transient stroke of a run-up at this rate
 * @param otherOrders the other harmonics of the same rotor that act at the same time (empty for one
 *     order); the design is for this excitation's own order, the acceptance verdict counts them all
 */
public record Excitation(ExcitationKind kind, double amplitude, FrequencyBand band, Spectrum spectrum,
        OptionalDouble runUpRate, List<ExcitationOrder> otherOrders) {

    /**
     * A disturbance of one order.
     * @param kind what drives the structure
     * @param amplitude SI amplitude
     * @param band forcing frequencies, rad/s
     * @param spectrum harmonic, or white noise
     * @param runUpRate the forcing frequency's rate of change at start and stop, rad/s^2, if stated
     */
    public Excitation(ExcitationKind kind, double amplitude, FrequencyBand band, Spectrum spectrum,
            OptionalDouble runUpRate) {
        this(kind, amplitude, band, spectrum, runUpRate, List.of());
    }

    /**
     * A disturbance without a run-up rate.
     * @param kind what drives the structure
     * @param amplitude SI amplitude
     * @param band forcing frequencies, rad/s
     * @param spectrum harmonic, or white noise
     */
    public Excitation(ExcitationKind kind, double amplitude, FrequencyBand band, Spectrum spectrum) {
        this(kind, amplitude, band, spectrum, OptionalDouble.empty());
    }

    /**
     * A harmonic disturbance.
     * @param kind what drives the structure
     * @param amplitude SI amplitude
     * @param band forcing frequencies, rad/s
     */
    public Excitation(ExcitationKind kind, double amplitude, FrequencyBand band) {
        this(kind, amplitude, band, Spectrum.HARMONIC);
    }

    /** Validates the record. */
    public Excitation {
        Checks.present("disturbance.kind", kind, "one of force, unbalance, base-displacement, base-acceleration");
        Checks.positive("disturbance.amplitude", amplitude);
        Checks.present("disturbance.frequency", band, "a frequency or a band");
        Checks.present("disturbance.spectrum", spectrum, "harmonic or white-noise");
        Checks.present("disturbance.run_up_rate", runUpRate, "a run-up rate or none");
        runUpRate.ifPresent(r -> Checks.positive("disturbance.run_up_rate", r));
        Checks.present("disturbance.orders", otherOrders, "a list of orders (may be empty)");
        otherOrders = List.copyOf(otherOrders);
        if (!otherOrders.isEmpty() && spectrum.isWhiteNoise()) {
            throw new InvalidInputException("disturbance.orders", otherOrders.size() + " orders",
                    "several orders are harmonic; leave them out under white noise");
        }
    }

    /**
     * @return every order, the design order first (frequency factor 1), then the others as given
     */
    public List<ExcitationOrder> orders() {
        List<ExcitationOrder> all = new ArrayList<>();
        all.add(new ExcitationOrder(kind, amplitude, 1.0));
        all.addAll(otherOrders);
        return List.copyOf(all);
    }

    /**
     * @param orders the other orders
     * @return this disturbance with those other orders
     */
    public Excitation withOtherOrders(List<ExcitationOrder> orders) {
        return new Excitation(kind, amplitude, band, spectrum, runUpRate, orders);
    }

    /**
     * @param forcingRate the forcing frequency's rate of change at start and stop, rad/s^2 (&gt; 0)
     * @return this disturbance with that run-up rate
     */
    public Excitation withRunUpRate(double forcingRate) {
        return new Excitation(kind, amplitude, band, spectrum, OptionalDouble.of(forcingRate), otherOrders);
    }
}
