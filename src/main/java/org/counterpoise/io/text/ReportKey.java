package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.counterpoise.core.criteria.AmplitudeConvention;

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
    // The convention the response values are shown in: the JSON keeps them as peaks under the
    // peak_ keys and, for another convention, adds them under keys with its prefix (jsonKeysIn).
    AMPLITUDE_CONVENTION("amplitude_convention"),
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

    // The verdict against the project's criterion (design JSON): the object "acceptance", or null
    // under ACCEPTANCE when the project states no criterion. Values in the SI unit under
    // "acceptance.unit", in the convention under "acceptance.convention".
    ACCEPTANCE("acceptance"),
    ACCEPTANCE_NEEDED("acceptance.absorber_needed"),
    ACCEPTANCE_CRITERION("acceptance.criterion", "acceptance.criterion_text"),
    ACCEPTANCE_SOURCE("acceptance.source"),
    ACCEPTANCE_MEASURE("acceptance.quantity", "acceptance.convention", "acceptance.unit"),
    ACCEPTANCE_WEIGHTING("acceptance.weighting"),
    ACCEPTANCE_LIMIT("acceptance.limit_before", "acceptance.limit_after"),
    ACCEPTANCE_VALUE("acceptance.value_before", "acceptance.value_after"),
    ACCEPTANCE_PASSES("acceptance.passes_before", "acceptance.passes_after"),
    ACCEPTANCE_MARGIN("acceptance.margin_ratio_before", "acceptance.margin_ratio_after",
            "acceptance.margin_dB_before", "acceptance.margin_dB_after"),
    ACCEPTANCE_WORST("acceptance.worst_forcing_frequency_before_Hz", "acceptance.worst_forcing_frequency_after_Hz"),
    ACCEPTANCE_GOVERNING_ORDER("acceptance.governing_order_before", "acceptance.governing_order_after"),
    ACCEPTANCE_ZONES("acceptance.zones_before", "acceptance.zones_after"),
    ACCEPTANCE_OUTSIDE_RANGE("acceptance.outside_range_before", "acceptance.outside_range_after"),
    ACCEPTANCE_UNBOUNDED("acceptance.unbounded_reason"),
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

    /**
     * The keys a row's values go under when they are stated in another amplitude convention: the
     * word "peak" in a key becomes the convention's prefix ({@link AmplitudeConvention#keyPrefix}:
     * {@code peak_displacement_before_m} to {@code rms_displacement_before_m},
     * {@code worst_case_peak} to {@code worst_case_rms}); a key without it gets the prefix in front
     * ({@code target} to {@code rms_target}; {@code monte_carlo.mean} to
     * {@code monte_carlo.rms_mean}).
     *
     * @param convention the convention
     * @return the keys, in the order of {@link #jsonKeys}
     */
    public List<String> jsonKeysIn(AmplitudeConvention convention) {
        if (convention == AmplitudeConvention.PEAK) {
            return jsonKeys;
        }
        List<String> out = new ArrayList<>();
        for (String key : jsonKeys) {
            int dot = key.lastIndexOf('.');
            String parent = key.substring(0, dot + 1);
            List<String> words = new ArrayList<>(Arrays.asList(key.substring(dot + 1).split("_")));
            int peak = words.indexOf("peak");
            if (peak >= 0) {
                words.set(peak, convention.keyPrefix());
            } else {
                words.add(0, convention.keyPrefix());
            }
            out.add(parent + String.join("_", words));
        }
        return out;
    }
}
