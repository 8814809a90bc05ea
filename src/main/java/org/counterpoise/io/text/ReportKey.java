package org.counterpoise.io.text;

import java.util.List;

/**
 * The stable identity of every report row and the one table of the design JSON's keys: a row
 * carries its key, and {@code io.export.ResultJson} writes the rows' values under these JSON keys,
 * in this order. A key renamed here is renamed in the JSON; a row whose constant lists no JSON
 * key is shown in the text report, the sheet and the wizard but not written to the JSON. A JSON key
 * {@code a.b} is the key {@code b} of the nested object {@code a}.
 */
public enum ReportKey {
    METHOD("method"),
    METHOD_SOURCE("method_source"),
    EXCITATION("excitation"),
    FORCING("forcing_frequency_low_Hz", "forcing_frequency_high_Hz"),
    MASS_RATIO("mass_ratio"),
    TUNING_RATIO("tuning_ratio"),
    ABSORBER_DAMPING_RATIO("absorber_damping_ratio"),
    STRUCTURE_MASS("structure_mass_kg"),
    STRUCTURE_STIFFNESS("structure_stiffness_N_per_m"),
    STRUCTURE_FREQUENCY("structure_frequency_Hz"),
    STRUCTURE_DAMPING_RATIO("structure_damping_ratio"),
    ABSORBER_MASS("absorber_mass_kg"),
    ABSORBER_STIFFNESS("absorber_stiffness_N_per_m"),
    ABSORBER_DAMPING("absorber_damping_Ns_per_m"),
    ABSORBER_FREQUENCY("absorber_frequency_Hz"),
    STATIC_DEFLECTION("absorber_static_deflection_m"),
    RESPONSE("response_quantity", "response_unit"),
    REDUCTION("peak_response_before", "peak_response_after", "reduction_factor"),
    DISPLACEMENT_PEAKS("peak_displacement_before_m", "peak_displacement_after_m"),
    VELOCITY_PEAKS("peak_velocity_before_m_per_s", "peak_velocity_after_m_per_s"),
    ACCELERATION_PEAKS("peak_acceleration_before_m_per_s2", "peak_acceleration_after_m_per_s2"),
    STROKE("peak_stroke_m"),
    STROKE_RUN_UP("peak_stroke_run_up_m"),
    CLEARANCE("stroke_clearance_m"),
    SPRING_FORCE("peak_spring_force_N"),
    DAMPER_FORCE("peak_damper_force_N"),
    ABSORBER_FORCE("peak_absorber_force_N"),
    COUPLED_FREQUENCIES("coupled_natural_frequencies_Hz"),
    STIFFER("detuning_stiffer_factor"),
    SOFTER("detuning_softer_factor"),
    LIGHTER("detuning_lighter_factor"),
    HEAVIER("detuning_heavier_factor"),
    SPECTRUM("spectrum"),
    PSD_LEVEL("psd_level_SI_per_Hz"),
    RMS_BEFORE("rms_before"),
    RMS_AFTER("rms_after"),
    RMS_STROKE("rms_stroke_m"),
    TOLERATED_STRUCTURE_FREQUENCY("tolerated_structure_frequency_factor_low",
            "tolerated_structure_frequency_factor_high", "tolerated_structure_frequency_basis"),
    TOLERATED_ABSORBER_FREQUENCY("tolerated_absorber_frequency_factor_low",
            "tolerated_absorber_frequency_factor_high", "tolerated_absorber_frequency_basis"),
    TOLERANCE_ALLOWANCE("tolerance_allowance"),

    // The ranges the design must hold over (design and robustness JSON): each with "stated" or
    // "default" (common practice, no source) under its _origin key.
    STRUCTURE_MISTUNING("structure_mistuning_range", "structure_mistuning_range_origin"),
    STRUCTURE_FREQUENCY_BASIS("structure_frequency_basis"),
    ABSORBER_MISTUNING("absorber_mistuning_range", "absorber_mistuning_range_origin"),
    ABSORBER_DAMPING_RANGE("absorber_damping_range", "absorber_damping_range_origin"),

    // The robustness study (robustness --json; RESPONSE above names its response too).
    TARGET("target"),
    NOMINAL_PEAK("nominal_peak"),
    WORST_CASE_PEAK("worst_case_peak"),
    WORST_CASE_AT("worst_case_structure_factor", "worst_case_absorber_factor"),
    ROBUST_TUNING_RATIO("robust_tuning_ratio"),
    ROBUST_ABSORBER_DAMPING_RATIO("robust_absorber_damping_ratio"),
    ROBUST_ABSORBER_STIFFNESS("robust_absorber_stiffness_N_per_m"),
    ROBUST_ABSORBER_DAMPING("robust_absorber_damping_Ns_per_m"),
    ROBUST_WORST_CASES("robust_worst_case_peak", "robust_nominal_peak"),
    TOLERATED_FOR_TARGET("target_structure_factor_low", "target_structure_factor_high"),
    MONTE_CARLO_SAMPLES("monte_carlo.samples"),
    MONTE_CARLO_SEED("monte_carlo.seed"),
    MONTE_CARLO_MEAN("monte_carlo.mean"),
    MONTE_CARLO_P50_P90("monte_carlo.p50", "monte_carlo.p90"),
    MONTE_CARLO_P95_P99("monte_carlo.p95", "monte_carlo.p99"),
    MONTE_CARLO_RANGE("monte_carlo.min", "monte_carlo.max"),
    MONTE_CARLO_EXCEEDING("monte_carlo.probability_exceeding_target"),
    MONTE_CARLO_NOT_RUN("monte_carlo_not_run"),

    // The comparison of methods (design --json): an array under COMPARISON, one object per candidate
    // with the keys of its columns (METHOD, MASS_RATIO, TUNING_RATIO, ABSORBER_DAMPING_RATIO,
    // NOMINAL_PEAK, WORST_CASE_PEAK, P95_PEAK, STROKE, STROKE_RUN_UP, RUN_UP_STROKE_BASIS,
    // SPRING_FORCE) and the flags below; the methods left out under COMPARISON_LEFT_OUT.
    COMPARISON("comparison"),
    P95_PEAK("p95_peak"),
    RUN_UP_STROKE_BASIS("peak_stroke_run_up_basis"),
    CONSTRAINTS_APPLIED("constraints_applied"),
    RECOMMENDED_FLAG("recommended"),
    CHOSEN_FLAG("chosen"),
    RECOMMENDATION("recommended_method", "recommendation_reason"),
    COMPARISON_LEFT_OUT("comparison_left_out"),
    LEFT_OUT_REASON("reason"),

    // Rows not in the design JSON.
    REVISION,
    DATE,
    ENGINEER,
    CLIENT,
    MODE_SHAPE,
    MODAL_MASS,
    AMPLITUDE,
    FREQUENCY_RATIO,
    METHOD_NOTE,
    RESPONSE_PEAKS,
    TOLERATED_SPRING_RATE,
    DETUNING_TARGET,
    ROBUSTNESS_DESIGN;

    private final List<String> jsonKeys;

    ReportKey(String... jsonKeys) {
        this.jsonKeys = List.of(jsonKeys);
    }

    /** @return the JSON keys the row's value is written under, in order; empty when not in the JSON */
    public List<String> jsonKeys() {
        return jsonKeys;
    }
}
