package org.counterpoise.core.design;

import java.util.Arrays;
import java.util.Map;
import java.util.Optional;

/** The ways Counterpoise can choose the absorber's tuning and damping. */
public enum DesignMethod {
    /** Published fixed-point equal-peak closed form for the excitation/response pair. */
    EQUAL_PEAK("equal-peak", "classical equal-peak (fixed-point) closed form"),
    /** Published minimum mean-square (H2) closed form for white-noise excitation. */
    MINIMUM_VARIANCE("minimum-variance", "classical minimum-variance (H2) closed form"),
    /** Undamped absorber tuned exactly to one forcing frequency. */
    UNDAMPED_SINGLE_SPEED("undamped-single-speed", "undamped absorber tuned to the forcing frequency"),
    /** Exact minimum of the peak response over the band (H-infinity), computed. */
    EXACT_PEAK("exact-peak", "exact minimum of the peak response over the band (H-infinity)"),
    /** Exact minimum of the mean-square response to white noise (H2), computed. */
    EXACT_VARIANCE("exact-variance", "exact minimum of the mean-square response to white noise (H2)"),
    /**
     * Least worst-case peak over the project's tolerance ranges (structure frequency, absorber
     * frequency, absorber damping), computed: the recommended method.
     */
    ROBUST_WORST_CASE("robust-worst-case", "least worst-case peak over the tolerance ranges of structure and absorber"),
    /**
     * Least 95th percentile of the peak over builds drawn from the project's tolerance
     * distributions (uniform over the tolerance ranges when none are given), computed.
     */
    ROBUST_P95("robust-p95", "least 95th percentile of the peak over the tolerances of structure and absorber");

    /** @return true for the methods that minimise a figure over the tolerances (they share their machinery) */
    public boolean robust() {
        return this == ROBUST_WORST_CASE || this == ROBUST_P95;
    }

    /** The method new projects get: the one whose design holds over real tolerances. */
    public static final DesignMethod RECOMMENDED = ROBUST_WORST_CASE;

    /** Identifiers older project files may use, and the method each now names. */
    private static final Map<String, DesignMethod> OLDER_IDS = Map.of("robust-peak",
            ROBUST_WORST_CASE);

    private final String id;
    private final String description;

    DesignMethod(String id, String description) {
        this.id = id;
        this.description = description;
    }

    /** @return the identifier used in files and on the command line */
    public String id() {
        return id;
    }

    /** @return words for reports */
    public String description() {
        return description;
    }

    /**
     * @param id an identifier
     * @return the method with that id
     */
    public static Optional<DesignMethod> byId(String id) {
        Optional<DesignMethod> current = Arrays.stream(values()).filter(m -> m.id.equals(id)).findFirst();
        return current.isPresent() ? current : Optional.ofNullable(OLDER_IDS.get(id));
    }

    /** @return all ids, comma separated */
    public static String ids() {
        return String.join(", ", Arrays.stream(values()).map(DesignMethod::id).toList());
    }
}
