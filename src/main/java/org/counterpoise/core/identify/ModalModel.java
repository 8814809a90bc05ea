package org.counterpoise.core.identify;

import java.util.List;
import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;

/**
 * The modes identified in a band, their residual terms and the fit's quality.
 *
 * @param modes the modes, by increasing natural frequency
 * @param residuals residual terms of the modes outside the band
 * @param method how the numbers were found
 * @param normalisedResidual sqrt(sum |H_measured - H_model|^2 / sum |H_measured|^2) over the fitted
 *     lines (0 = perfect)
 * @param meanCoherence the measurement's mean coherence over the fitted lines, when given
 * @param lines the number of fitted lines
 */
public record ModalModel(List<IdentifiedMode> modes, ResidualTerms residuals, Method method,
        double normalisedResidual, OptionalDouble meanCoherence, int lines) {

    /** How a model was identified. */
    public enum Method {
        /** peak picking with the half-power bandwidth. */
        PEAK_PICKING("peak_picking"),
        /** circle fit of the mobility near the peak. */
        CIRCLE_FIT("circle_fit"),
        /** rational-fraction polynomial least squares. */
        RATIONAL_FRACTION("rational_fraction"),
        /** rational-fraction start polished by Levenberg-Marquardt. */
        LEAST_SQUARES("least_squares");

        private final String id;

        Method(String id) {
            this.id = id;
        }

        /** @return the id used in JSON */
        public String id() {
            return id;
        }
    }

    /** Keeps an unmodifiable copy. */
    public ModalModel {
        modes = List.copyOf(modes);
    }

    /**
     * The model's receptance: sum over modes of 1/(m_r (omega_r^2 - omega^2 + 2 i zeta_r omega_r
     * omega)) plus the residual terms (Ewins 2000, Modal Testing, 2nd ed., eq. 2.38 and section 4.4).
     * @param omega angular frequency, rad/s
     * @return receptance, m/N
     */
    public Complex receptance(double omega) {
        Complex sum = residuals.receptance(omega);
        for (IdentifiedMode m : modes) {
            sum = sum.add(m.receptance(omega));
        }
        return sum;
    }

    /**
     * @param omega angular frequency, rad/s
     * @param kind the kind wanted
     * @return the model's FRF of that kind
     */
    public Complex value(double omega, FrfKind kind) {
        return FrfKind.RECEPTANCE.convert(receptance(omega), omega, kind);
    }

    /**
     * @param data a measurement
     * @param modes the modes
     * @param residuals the residual terms
     * @return sqrt(sum |H_measured - H_model|^2 / sum |H_measured|^2) over its lines, in its kind
     */
    public static double normalisedResidual(MeasuredFrf data, List<IdentifiedMode> modes, ResidualTerms residuals) {
        ModalModel m = new ModalModel(modes, residuals, Method.LEAST_SQUARES, 0.0, OptionalDouble.empty(), 0);
        double num = 0.0;
        double den = 0.0;
        for (int i = 0; i < data.size(); i++) {
            Complex measured = data.value(i);
            num += Math.pow(measured.subtract(m.value(data.omega()[i], data.kind())).abs(), 2);
            den += Math.pow(measured.abs(), 2);
        }
        return Math.sqrt(num / den);
    }
}
