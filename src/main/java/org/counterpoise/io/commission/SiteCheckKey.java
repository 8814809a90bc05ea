package org.counterpoise.io.commission;

/** The one table of the JSON keys of a site check (docs/cli.md, site-check). */
enum SiteCheckKey {
    PROJECT("project"),
    OPERATING("operating"),
    SOURCE("source"),
    QUANTITY("quantity"),
    WITH_ABSORBER("with_absorber"),
    RUNNING_FREQUENCY("running_frequency_Hz"),
    RUNNING_GIVEN("running_frequency_given"),
    LINE_FREQUENCY("line_frequency_Hz"),
    MEASURED_PEAK("measured_peak_SI"),
    PREDICTED_PEAK("predicted_peak_SI"),
    RATIO("measured_over_predicted"),
    DRIVE("disturbance_amplitude_SI"),
    IMPLIED_DRIVE("disturbance_amplitude_site_SI"),
    DESIGN_STROKE("design_stroke_m"),
    IMPLIED_STROKE("stroke_under_site_disturbance_m"),
    CLEARANCE("clearance_m"),
    LARGEST_LINE_FREQUENCY("largest_line_frequency_Hz"),
    LARGEST_LINE("largest_line_peak_SI"),
    WARNINGS("warnings"),
    FITTED("fitted_absorber"),
    FRF_KIND("frf_kind"),
    LINES("lines"),
    ABSORBER_FREQUENCY("absorber_frequency_Hz"),
    ABSORBER_FREQUENCY_SD("absorber_frequency_Hz_sd"),
    DESIGN_ABSORBER_FREQUENCY("design_absorber_frequency_Hz"),
    DAMPING("damping_ratio"),
    DAMPING_SD("damping_ratio_sd"),
    DESIGN_DAMPING("design_damping_ratio"),
    STRUCTURE_FREQUENCY("structure_frequency_Hz"),
    STRUCTURE_FREQUENCY_SD("structure_frequency_Hz_sd"),
    STRUCTURE_FITTED("structure_frequency_fitted"),
    NORMALISED_RESIDUAL("normalised_residual"),
    TRIM("trim"),
    TARGET_FREQUENCY("target_absorber_frequency_Hz"),
    FREQUENCY_OFF("frequency_off"),
    FREQUENCY_TOLERANCE("frequency_tolerance"),
    IN_TOLERANCE("frequency_in_tolerance"),
    PLATES_TO_ADD("plates_to_add"),
    BEYOND_TRIM_RANGE("beyond_trim_range"),
    PLATE_MASS("plate_mass_kg"),
    FREQUENCY_OFF_AFTER("frequency_off_after_trim"),
    DAMPING_OFF("damping_off"),
    DAMPING_TOLERANCE("damping_tolerance"),
    ROWS("rows"),
    FREQUENCY("frequency_Hz"),
    MEASURED("measured_SI"),
    DESIGN("design_SI"),
    AS_BUILT("as_built_SI"),
    MEASURED_PEAK_FREQUENCY("measured_peak_frequency_Hz"),
    MEASURED_PEAK_FRF("measured_peak_SI"),
    DESIGN_PEAK_FREQUENCY("design_peak_frequency_Hz"),
    DESIGN_PEAK_FRF("design_peak_SI"),
    ADVISED("advised"),
    BAND_PEAK("band_peak"),
    RESPONSE("response"),
    AFTER_TRIM("after_trim_SI"),
    TRIM_REQUIRED("trim_required"),
    ABSORBER_MASS("absorber_mass_kg"),
    FITTED_SET("fitted_absorbers"),
    ABSORBERS("absorbers"),
    MASS_TO_ADD("mass_to_add_kg"),
    TARGET_MODE("target_mode"),
    TARGET_MODE_FREQUENCY("target_mode_frequency_Hz"),
    TARGET_MODE_FREQUENCY_SD("target_mode_frequency_Hz_sd");

    private final String key;

    SiteCheckKey(String key) {
        this.key = key;
    }

    /** @return the JSON key */
    String key() {
        return key;
    }
}
