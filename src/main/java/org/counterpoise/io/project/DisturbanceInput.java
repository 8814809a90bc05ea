package org.counterpoise.io.project;

import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.units.Unit;

/**
 * The disturbance as the user gave it: one frequency or a band (low, high in one unit), times a
 * harmonic order (1 unless the speed is a shaft speed and the force comes, say, once per blade).
 *
 * <p>Since format 3 the rotor may excite at several harmonic orders at once ({@link #orders}, the
 * others beside this one), and the design is for the order the user picks or for the governing one
 * ({@link #designOrder}); an unbalance may be given by its balance grade instead of its amplitude.
 *
 * @param kind what drives the structure
 * @param amplitude its amplitude, or null when {@code balanceGrade} gives it
 * @param frequency one frequency, or null for a band
 * @param bandLow low end of the band, or NaN
 * @param bandHigh high end of the band, or NaN
 * @param bandUnit unit of the band ends, or null
 * @param harmonicOrder forcing cycles per revolution (&gt; 0)
 * @param runUpRate how fast the shaft speed changes at start and stop (e.g. rpm/s), or null when
 *     not stated (optional since format 1; files without it load unchanged)
 * @param spectrum the spectrum (white noise and its level), or null for harmonic (optional since
 *     format 1; files without it load unchanged)
 * @param balanceGrade for an unbalance: the balance grade giving its amplitude instead of
 *     {@code amplitude}, or null (since format 3)
 * @param orders the rotor's other harmonic orders acting at the same time (empty for one; since format 3)
 * @param designOrder the harmonic order the design is for, as picked by the user; empty for the
 *     governing order (since format 3; with one order, that order)
 */
public record DisturbanceInput(ExcitationKind kind, QuantityInput amplitude, QuantityInput frequency,
        double bandLow, double bandHigh, Unit bandUnit, double harmonicOrder, QuantityInput runUpRate,
        SpectrumInput spectrum, BalanceGradeInput balanceGrade, List<OrderInput> orders, OptionalDouble designOrder) {

    /** Absent orders are an empty list and an absent design order is empty, never null. */
    public DisturbanceInput {
        orders = orders == null ? List.of() : List.copyOf(orders);
        designOrder = designOrder == null ? OptionalDouble.empty() : designOrder;
    }

    /**
     * A disturbance of one order with its amplitude.
     * @param kind what drives the structure
     * @param amplitude its amplitude
     * @param frequency one frequency, or null for a band
     * @param bandLow low end of the band, or NaN
     * @param bandHigh high end of the band, or NaN
     * @param bandUnit unit of the band ends, or null
     * @param harmonicOrder forcing cycles per revolution (&gt; 0)
     * @param runUpRate the run-up rate, or null
     * @param spectrum the spectrum, or null for harmonic
     */
    public DisturbanceInput(ExcitationKind kind, QuantityInput amplitude, QuantityInput frequency,
            double bandLow, double bandHigh, Unit bandUnit, double harmonicOrder, QuantityInput runUpRate,
            SpectrumInput spectrum) {
        this(kind, amplitude, frequency, bandLow, bandHigh, bandUnit, harmonicOrder, runUpRate, spectrum, null,
                List.of(), OptionalDouble.empty());
    }

    /**
     * A harmonic disturbance with a run-up rate.
     * @param kind what drives the structure
     * @param amplitude its amplitude
     * @param frequency one frequency, or null for a band
     * @param bandLow low end of the band, or NaN
     * @param bandHigh high end of the band, or NaN
     * @param bandUnit unit of the band ends, or null
     * @param harmonicOrder forcing cycles per revolution (&gt; 0)
     * @param runUpRate the run-up rate, or null
     */
    public DisturbanceInput(ExcitationKind kind, QuantityInput amplitude, QuantityInput frequency,
            double bandLow, double bandHigh, Unit bandUnit, double harmonicOrder, QuantityInput runUpRate) {
        this(kind, amplitude, frequency, bandLow, bandHigh, bandUnit, harmonicOrder, runUpRate, null);
    }

    /**
     * A disturbance without a run-up rate.
     * @param kind what drives the structure
     * @param amplitude its amplitude
     * @param frequency one frequency, or null for a band
     * @param bandLow low end of the band, or NaN
     * @param bandHigh high end of the band, or NaN
     * @param bandUnit unit of the band ends, or null
     * @param harmonicOrder forcing cycles per revolution (&gt; 0)
     */
    public DisturbanceInput(ExcitationKind kind, QuantityInput amplitude, QuantityInput frequency,
            double bandLow, double bandHigh, Unit bandUnit, double harmonicOrder) {
        this(kind, amplitude, frequency, bandLow, bandHigh, bandUnit, harmonicOrder, null, null);
    }

    /**
     * @param rate the run-up rate, or null
     * @return this disturbance with that run-up rate
     */
    public DisturbanceInput withRunUpRate(QuantityInput rate) {
        return new DisturbanceInput(kind, amplitude, frequency, bandLow, bandHigh, bandUnit, harmonicOrder, rate,
                spectrum, balanceGrade, orders, designOrder);
    }

    /**
     * @param newSpectrum the spectrum (white noise and its level), or null for harmonic
     * @return this disturbance with that spectrum
     */
    public DisturbanceInput withSpectrum(SpectrumInput newSpectrum) {
        return new DisturbanceInput(kind, amplitude, frequency, bandLow, bandHigh, bandUnit, harmonicOrder, runUpRate,
                newSpectrum, balanceGrade, orders, designOrder);
    }

    /**
     * @param grade the balance grade giving the unbalance (the amplitude is then dropped), or null
     *     to keep the amplitude
     * @return this disturbance with it
     */
    public DisturbanceInput withBalanceGrade(BalanceGradeInput grade) {
        return new DisturbanceInput(kind, grade == null ? amplitude : null, frequency, bandLow, bandHigh, bandUnit,
                harmonicOrder, runUpRate, spectrum, grade, orders, designOrder);
    }

    /**
     * @param others the rotor's other harmonic orders (empty for none)
     * @param picked the harmonic order the design is for, empty for the governing one
     * @return this disturbance with them
     */
    public DisturbanceInput withOrders(List<OrderInput> others, OptionalDouble picked) {
        return new DisturbanceInput(kind, amplitude, frequency, bandLow, bandHigh, bandUnit, harmonicOrder, runUpRate,
                spectrum, balanceGrade, others, picked);
    }

    /** @return true when a band is given */
    public boolean isBand() {
        return frequency == null;
    }
}
