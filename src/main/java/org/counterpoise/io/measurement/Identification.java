package org.counterpoise.io.measurement;

import java.util.Optional;
import java.util.function.Supplier;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.AddedMass;
import org.counterpoise.core.identify.CircleFit;
import org.counterpoise.core.identify.HalfPowerPeak;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.identify.LogDecrement;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.identify.ModalFit;
import org.counterpoise.core.identify.ModalModel;

/** What one identification found, from an FRF, a free decay or an added mass; rendered by JSON, text and charts. */
public sealed interface Identification {

    /** @return the id of the method, as in JSON */
    String method();

    /** @return the source file as the user named it, or empty (added mass has none) */
    String source();

    /**
     * A fit of an FRF.
     * @param source the file
     * @param unit the kind and unit of the values read
     * @param fitted the measured lines within the band fitted
     * @param model the least-squares model
     * @param halfPower the half-power estimate of the highest peak (one mode only), if it could be made
     * @param circle the circle fit of the highest peak (one mode only), if it could be made
     */
    record Frf(String source, FrfUnit unit, MeasuredFrf fitted, ModalModel model, Optional<IdentifiedMode> halfPower,
            Optional<CircleFit> circle) implements Identification {
        @Override
        public String method() {
            return model.method().id();
        }

        /**
         * Fits the lines given: the least-squares model and, for one mode, the classical half-power
         * and circle-fit estimates beside it as a check (left out when they cannot be made). The one
         * route of the command line and the wizard.
         * @param source the file as the user named it
         * @param unit the kind and unit of the values read
         * @param fitted the measured lines within the band to fit
         * @param modes the number of modes in the band
         * @param residuals whether to fit residual terms for the modes outside the band
         * @return the identification
         * @throws InvalidInputException (fields "modes", "band") when the lines do not give that many modes
         */
        public static Frf fit(String source, FrfUnit unit, MeasuredFrf fitted, int modes, boolean residuals) {
            ModalModel model = ModalFit.fit(fitted, modes, residuals);
            Optional<IdentifiedMode> halfPower = Optional.empty();
            Optional<CircleFit> circle = Optional.empty();
            if (modes == 1) {
                halfPower = optional(() -> HalfPowerPeak.estimate(fitted));
                circle = optional(() -> CircleFit.fit(fitted));
            }
            return new Frf(source, unit, fitted, model, halfPower, circle);
        }

        private static <T> Optional<T> optional(Supplier<T> estimate) {
            try {
                return Optional.of(estimate.get());
            } catch (InvalidInputException e) {
                return Optional.empty(); // the fit itself is reported; a check that cannot be made is left out
            }
        }
    }

    /**
     * A free decay.
     * @param source the file
     * @param decay the logarithmic decrement
     */
    record Decay(String source, LogDecrement decay) implements Identification {
        @Override
        public String method() {
            return "log_decrement";
        }
    }

    /**
     * Two natural frequencies around a known added mass.
     * @param addedMass the mass added, kg
     * @param frequencyAfter the natural frequency with it, rad/s
     * @param result modal mass and stiffness
     */
    record Added(double addedMass, double frequencyAfter, AddedMass result) implements Identification {
        @Override
        public String method() {
            return "added_mass";
        }

        @Override
        public String source() {
            return "";
        }
    }
}
