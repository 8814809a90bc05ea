package org.counterpoise.core.identify;

import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.model.Structure;

/**
 * One mode as identified at the measurement point, SI, with standard uncertainties where the
 * method gives them (empty otherwise).
 *
 * <p>Its receptance is 1 / (m (omega_n^2 - omega^2 + 2 i zeta omega_n omega)) (viscous damping;
 * Ewins 2000, Modal Testing, 2nd ed., eq. 2.38 in modal-constant form with A = 1/m). For a
 * driving-point FRF the modal constant is phi^2 with unit-modal-mass shapes, so m is the modal
 * (effective) mass at that point, the mass an absorber there sees.
 *
 * @param naturalFrequency undamped natural frequency omega_n, rad/s
 * @param dampingRatio viscous damping ratio zeta
 * @param modalMass modal mass at the measurement point, kg (negative or huge when the point is not
 *     a driving point or lies near a node)
 * @param naturalFrequencySd standard uncertainty of omega_n, rad/s
 * @param dampingRatioSd standard uncertainty of zeta
 * @param modalMassSd standard uncertainty of the modal mass, kg
 */
public record IdentifiedMode(double naturalFrequency, double dampingRatio, double modalMass,
        OptionalDouble naturalFrequencySd, OptionalDouble dampingRatioSd, OptionalDouble modalMassSd) {

    /**
     * A mode without uncertainties.
     * @param naturalFrequency rad/s
     * @param dampingRatio zeta
     * @param modalMass kg
     * @return the mode
     */
    public static IdentifiedMode of(double naturalFrequency, double dampingRatio, double modalMass) {
        return new IdentifiedMode(naturalFrequency, dampingRatio, modalMass, OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty());
    }

    /** @return modal stiffness k = m omega_n^2, N/m */
    public double modalStiffness() {
        return modalMass * naturalFrequency * naturalFrequency;
    }

    /**
     * @param omega angular frequency, rad/s
     * @return this mode's receptance there, m/N
     */
    public Complex receptance(double omega) {
        return Complex.ONE.divide(new Complex(modalMass * (naturalFrequency * naturalFrequency - omega * omega),
                modalMass * 2.0 * dampingRatio * naturalFrequency * omega));
    }

    /**
     * @return the structure of the design (absorber at the measurement point, phi = 1)
     * @throws org.counterpoise.core.error.InvalidInputException when the modal mass is not positive
     *     or the damping outside what a design accepts
     */
    public Structure toStructure() {
        return Structure.of(modalMass, modalStiffness(), dampingRatio);
    }
}
