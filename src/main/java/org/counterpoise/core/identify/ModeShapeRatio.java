package org.counterpoise.core.identify;

import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * The mode shape at a second point A relative to the driving point P, from a driving-point FRF
 * (force and response at P) and a transfer FRF (force at P, response at A, or the reverse by
 * reciprocity) fitted with the same mode. The modal constant of mode r is phi_jr phi_kr / M_r, so
 * the fitted "modal masses" are m_PP = M / phi_P^2 and m_AP = M / (phi_A phi_P), and
 * phi_A / phi_P = m_PP / m_AP (Ewins 2000, Modal Testing, 2nd ed., sections 2.6 and 5.2: modal
 * constants and mode shapes from a row or column of the FRF matrix). The effective mass at A is
 * then m_PP / (phi_A / phi_P)^2.
 *
 * @param ratio phi_A / phi_P, signed (negative when A moves against P)
 * @param ratioSd its standard uncertainty from the two fits' modal-mass uncertainties (their
 *     correlation left out; first-order propagation, common practice), when both give one
 * @param driving the mode fitted at the driving point
 * @param transfer the matched mode of the transfer fit
 */
public record ModeShapeRatio(double ratio, OptionalDouble ratioSd, IdentifiedMode driving, IdentifiedMode transfer) {

    /** The largest relative difference of natural frequency for two fitted modes to be one mode. */
    public static final double SAME_MODE = 0.02;

    /**
     * @param driving the mode fitted to the driving-point FRF
     * @param transfer the modes fitted to the transfer FRF
     * @return the ratio for the transfer mode nearest in frequency
     * @throws InvalidInputException when no transfer mode lies within {@link #SAME_MODE} of the
     *     driving-point mode's frequency, or its modal constant is zero
     */
    public static ModeShapeRatio of(IdentifiedMode driving, List<IdentifiedMode> transfer) {
        IdentifiedMode nearest = null;
        for (IdentifiedMode t : transfer) {
            if (nearest == null || Math.abs(t.naturalFrequency() - driving.naturalFrequency())
                    < Math.abs(nearest.naturalFrequency() - driving.naturalFrequency())) {
                nearest = t;
            }
        }
        double hz = driving.naturalFrequency() / (2.0 * Math.PI);
        if (nearest == null
                || Math.abs(nearest.naturalFrequency() / driving.naturalFrequency() - 1.0) > SAME_MODE) {
            throw new InvalidInputException("transfer FRF", nearest == null ? "no mode"
                    : "a mode at " + Checks.show(nearest.naturalFrequency() / (2.0 * Math.PI)) + " Hz",
                    "a mode within " + Math.round(100 * SAME_MODE) + " % of the driving point's "
                            + Checks.show(hz) + " Hz (fit the same band and number of modes)");
        }
        double ratio = driving.modalMass() / nearest.modalMass();
        if (!(Double.isFinite(ratio) && ratio != 0.0)) {
            throw new InvalidInputException("transfer FRF", "a modal constant of zero",
                    "a transfer point that moves in the mode (not at a node)");
        }
        OptionalDouble sd = OptionalDouble.empty();
        if (driving.modalMassSd().isPresent() && nearest.modalMassSd().isPresent()) {
            double relative = Math.hypot(driving.modalMassSd().getAsDouble() / driving.modalMass(),
                    nearest.modalMassSd().getAsDouble() / nearest.modalMass());
            sd = OptionalDouble.of(Math.abs(ratio) * relative);
        }
        return new ModeShapeRatio(ratio, sd, driving, nearest);
    }

    /**
     * @return the mode as seen at A: its modal mass there, m_PP / ratio^2 = m_AP^2 / m_PP (frequency
     *     and damping are the driving-point fit's), with both fits' modal-mass uncertainties carried
     *     into it: relative sqrt((2 u_AP)^2 + u_PP^2), first-order, correlation left out
     */
    public IdentifiedMode atTransferPoint() {
        double mass = driving.modalMass() / (ratio * ratio);
        OptionalDouble massSd = OptionalDouble.empty();
        if (driving.modalMassSd().isPresent() && transfer.modalMassSd().isPresent()) {
            massSd = OptionalDouble.of(mass * Math.hypot(driving.modalMassSd().getAsDouble() / driving.modalMass(),
                    2.0 * transfer.modalMassSd().getAsDouble() / transfer.modalMass()));
        }
        return new IdentifiedMode(driving.naturalFrequency(), driving.dampingRatio(), mass,
                driving.naturalFrequencySd(), driving.dampingRatioSd(), massSd);
    }
}
