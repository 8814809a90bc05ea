package org.counterpoise.io.measurement;

/** The one table of the JSON keys of an identification (docs/cli.md, identify). */
enum IdentificationKey {
    METHOD("method"),
    SOURCE("source"),
    FRF_KIND("frf_kind"),
    FRF_UNIT("frf_unit"),
    BAND("band_Hz"),
    LINES("lines"),
    MODES("modes"),
    FREQUENCY("frequency_Hz"),
    FREQUENCY_SD("frequency_Hz_sd"),
    DAMPING("damping_ratio"),
    DAMPING_SD("damping_ratio_sd"),
    MASS("modal_mass_kg"),
    MASS_SD("modal_mass_kg_sd"),
    STIFFNESS("modal_stiffness_N_per_m"),
    RESIDUALS("residuals"),
    LOWER_INVERSE_MASS("lower_inverse_mass_per_kg"),
    UPPER_COMPLIANCE("upper_compliance_m_per_N"),
    FIT_QUALITY("fit_quality"),
    NORMALISED_RESIDUAL("normalised_residual"),
    COHERENCE_MEAN("coherence_mean"),
    WARNINGS("warnings"),
    START_ESTIMATES("start_estimates"),
    HALF_POWER("half_power"),
    CIRCLE_FIT("circle_fit"),
    DAMPING_PAIR_SCATTER("damping_ratio_pair_scatter"),
    LOG_DECREMENT("log_decrement"),
    LOG_DECREMENT_SD("log_decrement_sd"),
    CYCLES("cycles"),
    ADDED_MASS("added_mass_kg"),
    FREQUENCY_WITH_ADDED_MASS("frequency_with_added_mass_Hz"),
    TRANSFER("transfer"),
    MODE("mode"),
    SHAPE_RATIO("shape_ratio"),
    SHAPE_RATIO_SD("shape_ratio_sd"),
    TRANSFER_FREQUENCY("transfer_frequency_Hz"),
    MASS_AT_TRANSFER_POINT("modal_mass_at_transfer_point_kg"),
    MASS_AT_TRANSFER_POINT_SD("modal_mass_at_transfer_point_kg_sd");

    private final String key;

    IdentificationKey(String key) {
        this.key = key;
    }

    /** @return the JSON key */
    String key() {
        return key;
    }
}
