package org.counterpoise.core.criteria;

/**
 * Where people are, and the multiplying factor on the base curve for continuous or intermittent
 * vibration (a rotor runs for hours): ISO 10137:2007 Annex C, as in ISO 2631-2:1989 Annex A and
 * BS 6472:1992 Table 5. The factors are from memory in reference/acceptance-criteria.md section 4.1:
 * verify before using them as hard limits. Residential by day is given there as 2 to 4; the lower
 * (stricter) end is taken.
 */
public enum RoomUse {
    CRITICAL_WORK_AREA("critical-work-area", 1.0),
    RESIDENTIAL_NIGHT("residential-night", 1.4),
    RESIDENTIAL_DAY("residential-day", 2.0),
    QUIET_OFFICE("quiet-office", 2.0),
    GENERAL_OFFICE("general-office", 4.0),
    WORKSHOP("workshop", 8.0);

    /** Source of the factors. */
    public static final String SOURCE = "ISO 10137:2007 Annex C, continuous vibration";

    private final String id;
    private final double factor;

    RoomUse(String id, double factor) {
        this.id = id;
        this.factor = factor;
    }

    /** @return the id in project files */
    public String id() {
        return id;
    }

    /** @return the multiplying factor on the base curve */
    public double factor() {
        return factor;
    }
}
