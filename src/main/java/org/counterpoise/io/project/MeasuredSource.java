package org.counterpoise.io.project;

import java.util.OptionalDouble;
import org.counterpoise.core.error.InvalidInputException;

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
 * @param naturalFrequencySd the standard uncertainty of the natural frequency, rad/s, when given
 * @param dampingRatioSd the standard uncertainty of the damping ratio, when given
 * @param modalMassSd the standard uncertainty of the modal mass, kg, when given
 */
public record MeasuredSource(String method, String file, String date, OptionalDouble normalisedResidual,
        OptionalDouble naturalFrequencySd, OptionalDouble dampingRatioSd, OptionalDouble modalMassSd) {

    /** Nulls become empty; the date must be a calendar date when given. */
    public MeasuredSource {
        method = method == null ? "" : method.strip();
        file = file == null ? "" : file.strip();
        date = date == null ? "" : date.strip();
        ProjectIdentity.checkDate("structure.measured.date", date);
        normalisedResidual = normalisedResidual == null ? OptionalDouble.empty() : normalisedResidual;
        naturalFrequencySd = naturalFrequencySd == null ? OptionalDouble.empty() : naturalFrequencySd;
        dampingRatioSd = dampingRatioSd == null ? OptionalDouble.empty() : dampingRatioSd;
        modalMassSd = modalMassSd == null ? OptionalDouble.empty() : modalMassSd;
    }

    /** The key of this section under {@code structure} in a project file. */
    static final String KEY = "measured";
    /**
     * The keys of the uncertainties: plain numbers in the unit their name says, not quantities with
     * units, since an uncertainty may be far smaller than any plausible frequency or mass (an exact
     * fit gives 1e-12 Hz) and must still read back.
     */
    static final String FREQUENCY_SD_HZ = "natural_frequency_sd_Hz";
    static final String DAMPING_SD = "damping_ratio_sd";
    static final String MASS_SD_KG = "modal_mass_sd_kg";
    static final String RESIDUAL = "normalised_residual";

    /**
     * @param m the section's fields
     * @return the source they give
     */
    static MeasuredSource read(JsonFields m) {
        OptionalDouble hz = optional(m, FREQUENCY_SD_HZ);
        MeasuredSource s = new MeasuredSource(m.text("method"), m.text("file", ""), m.text("date", ""),
                optional(m, RESIDUAL), hz.isPresent() ? OptionalDouble.of(2.0 * Math.PI * hz.getAsDouble())
                        : hz, optional(m, DAMPING_SD), optional(m, MASS_SD_KG));
        m.finish();
        return s;
    }

    private static OptionalDouble optional(JsonFields m, String key) {
        return m.has(key) ? OptionalDouble.of(nonNegative(m, key)) : OptionalDouble.empty();
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
