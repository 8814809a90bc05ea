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
    // where the structure's data came from when measured (format 5); absent for a typed structure
    STRUCTURE_MEASURED("structure_measured"),
    MEASURED_METHOD("method_id"),
    MEASURED_FILE("file"),
    MEASURED_DATE("date"),
    MEASURED_RESIDUAL("normalised_residual"),
    MEASURED_FREQUENCY_SD("natural_frequency_sd_Hz"),
    MEASURED_DAMPING_SD("damping_ratio_sd"),
    MEASURED_MASS_SD("modal_mass_sd_kg"),
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

    // The hardware that realises the design (design JSON): the object "hardware" (docs/cli.md), SI
    // throughout, frequencies in Hz. A key ending in [] is an array: every row with that key is one
    // element, an object with the keys of its fields (the field keys below, listed after their array).
    // "hardware.spring" is null with an elastomer element, "hardware.elastomer" null with springs.
    HARDWARE_KINDS("hardware.spring_kind", "hardware.damper_kind"),
    HARDWARE_ABSORBER_MASS("hardware.absorber_mass_kg"),
    HARDWARE_MASS_TOLERANCE("hardware.absorber_mass_tolerance"),
    SPRING_NONE("hardware.spring"),
    SPRING_COUNT("hardware.spring.count"),
    SPRING_MATERIAL("hardware.spring.material", "hardware.spring.standard"),
    SPRING_WIRE_DIAMETER("hardware.spring.wire_diameter_m"),
    SPRING_MEAN_COIL_DIAMETER("hardware.spring.mean_coil_diameter_m"),
    SPRING_INDEX("hardware.spring.spring_index"),
    SPRING_COILS("hardware.spring.active_coils", "hardware.spring.total_coils"),
    SPRING_FREE_LENGTH("hardware.spring.free_length_m"),
    SPRING_SOLID_LENGTH("hardware.spring.solid_length_m"),
    SPRING_INSTALLED_LENGTH("hardware.spring.installed_length_m"),
    SPRING_RATE_PER_SPRING("hardware.spring.rate_per_spring_N_per_m"),
    SPRING_TOTAL_RATE("hardware.spring.total_rate_N_per_m"),
    SPRING_RATE_DEVIATION("hardware.spring.rate_deviation"),
    SPRING_LOADS("hardware.spring.static_load_per_spring_N", "hardware.spring.dynamic_load_per_spring_N"),
    SPRING_CYCLES("hardware.spring.service_cycles"),
    ELASTOMER_NONE("hardware.elastomer"),
    ELASTOMER_STIFFNESS("hardware.elastomer.dynamic_stiffness_N_per_m", "hardware.elastomer.static_stiffness_N_per_m"),
    ELASTOMER_RATIO("hardware.elastomer.dynamic_to_static_ratio"),
    ELASTOMER_LOSS_FACTOR("hardware.elastomer.loss_factor_needed", "hardware.elastomer.compound_loss_factor"),
    HYSTERETIC_OPTIMUM("hardware.elastomer.hysteretic_tuning_ratio", "hardware.elastomer.hysteretic_loss_factor"),
    VISCOUS_DESIGN("hardware.elastomer.viscous_tuning_ratio", "hardware.elastomer.viscous_damping_ratio"),
    HYSTERETIC_PEAKS("hardware.elastomer.hysteretic_peak_response", "hardware.elastomer.viscous_peak_response"),
    HYSTERETIC_PUBLISHED("hardware.elastomer.published_tuning_ratio", "hardware.elastomer.published_loss_factor"),
    HYSTERETIC_PUBLISHED_SOURCE("hardware.elastomer.published_source"),
    DAMPER_KIND("hardware.damper.kind"),
    DAMPER_COEFFICIENT("hardware.damper.coefficient_Ns_per_m"),
    DAMPER_STROKE("hardware.damper.stroke_m", "hardware.damper.run_up_stroke_m"),
    DAMPER_PEAK_VELOCITY("hardware.damper.peak_velocity_m_per_s"),
    DAMPER_PEAK_FORCE("hardware.damper.peak_force_N"),
    EDDY_CURRENT_NONE("hardware.damper.eddy_current"),
    EDDY_CURRENT_CONDUCTOR("hardware.damper.eddy_current.conductor"),
    EDDY_CURRENT_PLATE_THICKNESS("hardware.damper.eddy_current.plate_thickness_m"),
    EDDY_CURRENT_FLUX_DENSITY("hardware.damper.eddy_current.flux_density_T"),
    EDDY_CURRENT_POLE_AREA("hardware.damper.eddy_current.pole_area_m2"),
    EDDY_CURRENT_EDGE_FACTOR("hardware.damper.eddy_current.edge_factor"),
    EDDY_CURRENT_COEFFICIENT("hardware.damper.eddy_current.coefficient_Ns_per_m"),
    EDDY_CURRENT_SOURCE("hardware.damper.eddy_current.source"),
    CHECK("hardware.checks[]"),
    CHECK_KIND("kind"),
    CHECK_DEMAND("demand"),
    CHECK_CAPACITY("capacity"),
    CHECK_UNIT("unit"),
    CHECK_UTILISATION("utilisation"),
    CHECK_PASSES("passes"),
    CHECK_SOURCE("source"),
    PART_TOLERANCE_MASS("hardware.tolerances.mass"),
    PART_TOLERANCE_SPRING_RATE("hardware.tolerances.spring_rate"),
    PART_TOLERANCE_DAMPING("hardware.tolerances.damping"),
    PART_TOLERANCE_ABSORBER_FREQUENCY("hardware.tolerances.absorber_frequency"),
    PART_TOLERANCE_BASIS("hardware.tolerances.basis"),
    TRIM_PLATE_MASS("hardware.trim.plate_mass_kg"),
    TRIM_PLATES("hardware.trim.plates_fitted", "hardware.trim.plates_total"),
    TRIM_PERCENT_PER_PLATE("hardware.trim.percent_per_plate"),
    TRIM_PLATES_PER_PERCENT("hardware.trim.plates_per_percent"),
    TRIM_RANGE("hardware.trim.absorber_frequency_low_Hz", "hardware.trim.absorber_frequency_high_Hz"),
    PROCEDURE_STEP("hardware.procedure[]"),
    STEP_NUMBER("number"),
    STEP_KIND("step"),
    STEP_TEXT("text"),
    STEP_FIGURES("figures"),
    FIGURE_EXPECTED_STRUCTURE_FREQUENCY("expected_structure_frequency_Hz"),
    FIGURE_STRUCTURE_RANGE_LOW("structure_frequency_low_Hz"),
    FIGURE_STRUCTURE_RANGE_HIGH("structure_frequency_high_Hz"),
    FIGURE_STRUCTURE_RANGE_ALLOWANCE("structure_range_peak_rise"),
    FIGURE_STRUCTURE_RANGE_ALLOWANCE_OF_BARE("structure_range_response_of_bare"),
    FIGURE_ABSORBER_TARGET_FREQUENCY("absorber_target_frequency_Hz"),
    FIGURE_ABSORBER_FREQUENCY_TOLERANCE("absorber_frequency_tolerance"),
    FIGURE_CLEARANCE("clearance_m"),
    FIGURE_RUNNING_FREQUENCY("running_frequency_Hz"),
    FIGURE_PREDICTED_RESPONSE("predicted_response"),
    FIGURE_PREDICTED_PEAK_IN_BAND("predicted_peak_in_band"),
    FIGURE_TRIM_PLATE_MASS("trim_plate_mass_kg"),
    FIGURE_PLATES_PER_PERCENT("plates_per_percent"),
    PREDICTED_POINT("hardware.predicted[]"),
    PREDICTED_FREQUENCY("frequency_Hz"),
    PREDICTED_BEFORE("before"),
    PREDICTED_AFTER("after"),
    PREDICTED_STROKE("stroke_m"),

    // Several modes and several absorbers (design JSON, format 6): the object "several_absorbers",
    // SI, frequencies in Hz, peaks as displacement amplitudes at the response point. Arrays: one
    // element per absorber (the keys after SEVERAL_ABSORBER) and per mode (after SEVERAL_MODE).
    SEVERAL_COUNT("several_absorbers.count"),
    SEVERAL_TUNING("several_absorbers.tuning"),
    SEVERAL_POINTS("several_absorbers.excitation_point", "several_absorbers.response_point",
            "several_absorbers.absorber_point"),
    SEVERAL_TARGET_MODE("several_absorbers.target_mode"),
    SEVERAL_TARGET_FREQUENCY("several_absorbers.target_mode_frequency_Hz"),
    SEVERAL_EFFECTIVE_MASS("several_absorbers.target_mode_effective_mass_kg"),
    SEVERAL_TOTAL_MASS("several_absorbers.total_mass_kg"),
    SEVERAL_ABSORBER("several_absorbers.absorbers[]"),
    ITEM_MASS("mass_kg"),
    ITEM_STIFFNESS("stiffness_N_per_m"),
    ITEM_DAMPING("damping_Ns_per_m"),
    ITEM_FREQUENCY("frequency_Hz"),
    ITEM_DAMPING_RATIO("damping_ratio"),
    SEVERAL_PEAKS("several_absorbers.peak_displacement_before_m", "several_absorbers.peak_displacement_after_m"),
    SEVERAL_MODE("several_absorbers.modes[]"),
    ITEM_NAME("name"),
    ITEM_NATURAL_FREQUENCY("natural_frequency_Hz"),
    ITEM_PEAKS("peak_displacement_before_m", "peak_displacement_after_m"),
    /** with a spillover limit (format 8): the largest peak allowed near that mode (not for the target mode) */
    ITEM_PEAK_LIMIT("peak_limit_m"),
    SEVERAL_SINGLE_PEAK("several_absorbers.single_absorber_peak_displacement_m"),
    SEVERAL_GAIN("several_absorbers.gain"),
    SEVERAL_STRUCTURE_TOLERANCE("several_absorbers.tolerated_structure_frequency_factor_low",
            "several_absorbers.tolerated_structure_frequency_factor_high",
            "several_absorbers.tolerated_structure_frequency_basis"),
    SEVERAL_SINGLE_STRUCTURE_TOLERANCE("several_absorbers.single_absorber_tolerated_structure_frequency_factor_low",
            "several_absorbers.single_absorber_tolerated_structure_frequency_factor_high",
            "several_absorbers.single_absorber_tolerated_structure_frequency_basis"),
    // a set designed by robust-worst-case: what it was designed for and its figures over the ranges
    // beside the least-peak set and one absorber (one element of "compared" each)
    SEVERAL_DESIGNED_FOR("several_absorbers.designed_for"),
    SEVERAL_ROBUST_RANGES("several_absorbers.robust_structure_frequency_range",
            "several_absorbers.robust_absorber_frequency_range"),
    SEVERAL_ROBUST_DAMPING_FLOOR("several_absorbers.robust_damping_ratio_floor"),
    SEVERAL_COMPARED("several_absorbers.compared[]"),
    ITEM_DESIGN("design"),
    ITEM_NOMINAL_PEAK("nominal_peak_displacement_m"),
    ITEM_WORST_PEAK("worst_peak_displacement_m"),
    ITEM_STRUCTURE_TOLERANCE("tolerated_structure_frequency_factor_low", "tolerated_structure_frequency_factor_high",
            "tolerated_structure_frequency_basis"),
    // a set designed with the peak near each other mode limited (format 8, absorbers.spillover_limit)
    SEVERAL_SPILLOVER_LIMIT("several_absorbers.spillover_limit_ratio"),
    SEVERAL_SPILLOVER_MET("several_absorbers.spillover_limit_met"),
    SEVERAL_UNLIMITED_PEAK("several_absorbers.unlimited_peak_displacement_m"),
    SEVERAL_CERTIFIED("several_absorbers.certified"),
    // One absorber per mode, designed jointly (format 7): the absorbers[] elements add their mode and
    // point; the sequential design (each absorber on its own mode alone) beside the joint one.
    ITEM_MODE("mode"),
    ITEM_AT_POINT("point"),
    ITEM_POINT_CHOSEN("point_chosen"),
    SEVERAL_SEQUENTIAL_ABSORBER("several_absorbers.sequential_absorbers[]"),
    SEVERAL_SEQUENTIAL_PEAK("several_absorbers.sequential_peak_displacement_m"),
    SEVERAL_JOINT_GAIN("several_absorbers.joint_gain"),
    SEVERAL_STATUS("several_absorbers.status"),
    // Each absorber of a set as it works within the set on the whole structure (core.design.AbsorbersToBuild):
    // what its parts are sized from, one element of "in_set" per absorber in the absorbers[] order.
    SEVERAL_IN_SET("several_absorbers.in_set[]"),
    ITEM_STROKE_IN_BAND("stroke_in_band_m"),
    ITEM_STROKE_FROM_REST("stroke_from_rest_m"),
    ITEM_CLEARANCE("clearance_m"),
    ITEM_SPRING_FORCE("spring_force_N"),
    ITEM_DAMPER_FORCE("damper_force_N"),
    ITEM_ABSORBER_FORCE("absorber_force_N"),
    ITEM_DAMPER_VELOCITY("damper_velocity_m_per_s"),
    ITEM_OWN_FREQUENCY_TOLERANCE("tolerated_own_frequency_factor_low", "tolerated_own_frequency_factor_high",
            "tolerated_own_frequency_basis"),

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
    ROBUSTNESS_DESIGN,
    /** one absorber of a set on the sheet's "absorbers to build" (a record of the ITEM_ fields and these two) */
    BUILD_ABSORBER,
    ITEM_POINT,
    ITEM_TOLERANCE_IN_SET;

    private final List<String> jsonKeys;

    ReportKey(String... jsonKeys) {
        this.jsonKeys = List.of(jsonKeys);
    }

    /** @return true when every row with this key is one element of the JSON array its key names */
    public boolean array() {
        return jsonKeys.size() == 1 && jsonKeys.get(0).endsWith("[]");
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
