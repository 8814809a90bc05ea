package org.counterpoise.io.project;

import java.util.OptionalDouble;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Dimension;

/**
 * Where a structure's data came from when they were identified from a measurement (since format 5):
 * the method, the file, the day of the fit, its quality and the standard uncertainties it gave.
 * Printed beside the structure on the report and the sheet, so a reviewer sees that the modal mass,
 * frequency and damping were measured, not assumed. Every figure is optional (a decay record gives no
 * modal mass; an added-mass test no residual).
 *
 * @param method the identification method's id, e.g. {@code least_squares}, {@code log_decrement}
 * @param file the measurement file's name as the user gave it (no folder), or empty
 * @param date the day of the fit, YYYY-MM-DD, or empty
 * @param normalisedResidual the fit's normalised residual (0 is a perfect fit), when the method gives one
 * @param naturalFrequencySd the standard uncertainty of the natural frequency, or null
 * @param dampingRatioSd the standard uncertainty of the damping ratio, when given
 * @param modalMassSd the standard uncertainty of the modal mass, or null
 */
public record MeasuredSource(String method, String file, String date, OptionalDouble normalisedResidual,
        QuantityInput naturalFrequencySd, OptionalDouble dampingRatioSd, QuantityInput modalMassSd) {

    /** Nulls become empty; the date must be a calendar date when given. */
    public MeasuredSource {
        method = method == null ? "" : method.strip();
        file = file == null ? "" : file.strip();
        date = date == null ? "" : date.strip();
        ProjectIdentity.checkDate("structure.measured.date", date);
        normalisedResidual = normalisedResidual == null ? OptionalDouble.empty() : normalisedResidual;
        dampingRatioSd = dampingRatioSd == null ? OptionalDouble.empty() : dampingRatioSd;
    }

    /** The key of this section under {@code structure} in a project file. */
    static final String KEY = "measured";

    /**
     * @param m the section's fields
     * @return the source they give
     */
    static MeasuredSource read(JsonFields m) {
        MeasuredSource s = new MeasuredSource(m.text("method"), m.text("file", ""), m.text("date", ""),
                m.has("normalised_residual") ? OptionalDouble.of(nonNegative(m, "normalised_residual"))
                        : OptionalDouble.empty(),
                m.optionalQuantity("natural_frequency_sd", Dimension.FREQUENCY),
                m.has("damping_ratio_sd") ? OptionalDouble.of(nonNegative(m, "damping_ratio_sd"))
                        : OptionalDouble.empty(),
                m.optionalQuantity("modal_mass_sd", Dimension.MASS));
        m.finish();
        return s;
    }

    private static double nonNegative(JsonFields m, String key) {
        double v = m.number(key);
        if (!(v >= 0)) {
            throw new InvalidInputException(m.pathOf(key), m.shown(key),
                    "a number 0 or more");
        }
        return v;
    }
}
